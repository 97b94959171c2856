export const packageName = '@binsupport/girder';
