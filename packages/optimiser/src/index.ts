export const packageName = '@binsupport/optimiser';
