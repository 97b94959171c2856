export const packageName = '@binsupport/loads';
