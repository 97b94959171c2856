import { packageName as specName } from '@binsupport/spec';
export const packageName = '@binsupport/design';
export const uses = [specName];
