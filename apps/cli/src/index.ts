export { runCli, EXIT_OK, EXIT_NOT_SATISFIED, EXIT_BAD_INPUT, type CliStreams } from './cli.js';
export { version } from './version.js';
