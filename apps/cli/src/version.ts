export { TOOL_VERSION as version } from '@binsupport/design';
