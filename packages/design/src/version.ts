export const TOOL_NAME = 'binsupport';
/** The tool's version, written into every result. */
export const TOOL_VERSION = '0.1.0';
