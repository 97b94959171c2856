// Benchmark: the demo option sweep (demo-data/kestrel-options.yaml, 51 options) through
// `binsupport compare`, as a user runs it, with 2 worker threads and with 1, side by side: wall time,
// options per second, the speed-up of 2 workers over 1, and whether both wrote the same compare.json.
// Target (issue: option comparison): at least 48 options in under 60 s on this 2-core machine.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';

const root = new URL('../../../', import.meta.url).pathname;
const launcher = join(root, 'apps', 'cli', 'bin', 'binsupport.mjs');
const options = join(root, 'demo-data', 'kestrel-options.yaml');
const folder = mkdtempSync(join(tmpdir(), 'binsupport-bench-compare-'));

function runWith(workers: number): { seconds: number; options: number; json: string } {
  const out = join(folder, `w${workers}`);
  const start = performance.now();
  const run = spawnSync(process.execPath, [launcher, 'compare', options, '--out', out, '--workers', String(workers), '--quiet'], { encoding: 'utf8' });
  const seconds = (performance.now() - start) / 1000;
  if (run.status !== 0) throw new Error(`compare with ${workers} worker(s) exited ${run.status}: ${run.stderr}`);
  const json = readFileSync(join(out, 'compare.json'), 'utf8');
  return { seconds, options: (JSON.parse(json) as { rows: unknown[] }).rows.length, json };
}

try {
  const two = runWith(2);
  const one = runWith(1);
  console.log(`compare benchmark: demo sweep (demo-data/kestrel-options.yaml), ${two.options} options, ${availableParallelism()} cores`);
  console.log('  workers   wall time   options/s');
  console.log(`  2         ${two.seconds.toFixed(1).padStart(6)} s   ${(two.options / two.seconds).toFixed(2)}`);
  console.log(`  1         ${one.seconds.toFixed(1).padStart(6)} s   ${(one.options / one.seconds).toFixed(2)}`);
  console.log(`  speed-up of 2 workers over 1: ${(one.seconds / two.seconds).toFixed(2)}x (wall time, process start and file writing included)`);
  console.log(`  compare.json identical for 1 and 2 workers: ${one.json === two.json ? 'yes' : 'NO'}`);
  console.log(`  target: at least 48 options in under 60 s with 2 workers -> ${two.options >= 48 && two.seconds < 60 ? 'met' : 'NOT met'}`);
} finally {
  rmSync(folder, { recursive: true, force: true });
}
