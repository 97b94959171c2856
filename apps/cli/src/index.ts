export const packageName = '@binsupport/cli';
