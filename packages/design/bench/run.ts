// Benchmark: the whole demo design (loads, every combination and scenario, the analyse-select loop,
// verification), run several times; prints the median. Target (issue: sizing step): under 5 s.
import { readSpecFile } from '@binsupport/spec';
import { designFromSpec } from '../src/index.js';

const specPath = new URL('../../../demo-data/kestrel-grain-bin.yaml', import.meta.url).pathname;
const spec = await readSpecFile(specPath);
const runs = Number(process.env['BENCH_RUNS'] ?? 5);
const times: number[] = [];
let rounds = 0;
let sections = '';
for (let i = 0; i < runs; i++) {
  const start = performance.now();
  const { result } = await designFromSpec(spec);
  times.push(performance.now() - start);
  rounds = result.optimisation.iterations.length;
  sections = `${result.members.map((member) => `${member.id} ${member.section} ${member.grade}`).join(', ')}; steel ${result.totals.steelMass.toFixed(0)} kg; ${result.utilisations.length} utilisation rows`;
}
times.sort((a, b) => a - b);
const median = times[Math.floor(times.length / 2)] ?? Number.NaN;
console.log('design benchmark: demo bin (demo-data/kestrel-grain-bin.yaml)');
console.log(`  runs ${runs}, median ${median.toFixed(0)} ms, min ${times[0]?.toFixed(0)} ms, max ${times[times.length - 1]?.toFixed(0)} ms`);
console.log(`  ${rounds} rounds in the sizing loop (a section analysed under every design combination and credible scenario, or screened under the governing ones and set aside); result ${sections}`);
console.log(`  target: whole demo design under 5000 ms -> ${median < 5000 ? 'met' : 'NOT met'}`);
