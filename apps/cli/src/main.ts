import { runCli } from './cli.js';

// A closed pipe (e.g. `binsupport analyse m.json --json | head`) ends the output, not the program with a trace.
process.stdout.on('error', (error: NodeJS.ErrnoException) => {
  if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
  throw error;
});

process.exitCode = await runCli(process.argv.slice(2), { stdout: process.stdout, stderr: process.stderr });
