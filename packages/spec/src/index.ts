export const packageName = '@binsupport/spec';
