import { abandonPendingWrites } from '@binsupport/deliverables';
import { runCli } from './cli.js';

// A closed pipe (e.g. `binsupport analyse m.json --json | head`) ends the output, not the program with a trace.
process.stdout.on('error', (error: NodeJS.ErrnoException) => {
  if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw error;
});

// Ctrl-C or a scheduler's SIGTERM mid-run: remove the temp file of any write in progress (every
// output is written to a temp file and renamed, so no target is ever half written), say so, and stop
// with the conventional code 128 + signal number. Worker threads stop with the process.
for (const [signal, code] of [['SIGINT', 130], ['SIGTERM', 143]] as const) {
  process.on(signal, () => {
    const removed = abandonPendingWrites();
    process.stderr.write(`\nbinsupport: stopped by ${signal}; no output file was left half written${removed.length > 0 ? ` (removed ${removed.length} temp file(s))` : ''}\n`);
    process.exit(code);
  });
}

process.exitCode = await runCli(process.argv.slice(2), { stdout: process.stdout, stderr: process.stderr });
