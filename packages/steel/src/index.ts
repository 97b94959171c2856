export const packageName = '@binsupport/steel';
