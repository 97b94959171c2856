export const packageName = '@binsupport/deliverables';
