#!/usr/bin/env node
// Launcher of the `binsupport` command. The workspace runs from TypeScript source (no build step
// after `npm ci`): start Node with the tsx loader and the workspace's source export condition, then
// hand over to src/main.ts. The child inherits stdio; its exit code and signals become ours.
import { spawn } from 'node:child_process';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const require = createRequire(import.meta.url);
const tsxLoader = pathToFileURL(require.resolve('tsx/esm')).href;
const entry = join(here, '..', 'src', 'main.ts');

const child = spawn(process.execPath, ['--conditions=@binsupport/source', '--import', tsxLoader, entry, ...process.argv.slice(2)], { stdio: 'inherit' });
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, () => child.kill(signal));
}
child.on('exit', (code, signal) => {
  if (signal) process.kill(process.pid, signal);
  else process.exit(code ?? 1);
});
