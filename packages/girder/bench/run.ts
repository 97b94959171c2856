/**
 * Benchmarks of the girder solver (run with `npm run bench` in packages/girder). Prints:
 *  1. the median time of a full analysis (validation, assembly, contact iterations, recovery) of a
 *     720-segment ring on 3600 compression-only bearing points; target < 50 ms;
 *  2. time against size from 180 to 2880 segments, with the growth ratio per doubling (about 2
 *     for linear growth);
 *  3. the banded LDLᵀ solve against a dense Cholesky solve (ml-matrix) of the same converged
 *     system at 720 segments; target: banded at least 50 times faster.
 */
import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { analyse } from '../src/index.js';
import { assembleLoads, prepareElements, prepareSprings } from '../src/assemble.js';
import { factorState, prepareContactSystem, solveContact, stateMatrix } from '../src/contact.js';
import { combineLoads } from '../src/loads.js';
import { solveChecked } from '../src/solve.js';
import { numberEquations } from '../src/numbering.js';
import { ringOnBearings } from './ring-model.js';

const combination = { name: 'Q', factors: { Q: 1 } };
const WARM_UP = 5;
/** `npm run bench -- --no-dense` skips the dense solve (about a minute on one core). */
const withDense = !process.argv.includes('--no-dense');

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

function timeAnalysis(segments: number, runs: number): { median: number; iterations: number; liftedOff: number; springs: number } {
  const model = ringOnBearings(segments);
  let iterations = 0;
  let liftedOff = 0;
  const times: number[] = [];
  for (let r = 0; r < runs + WARM_UP; r++) {
    const start = performance.now();
    const result = analyse(model, combination, { stationsPerElement: 3 });
    const elapsed = performance.now() - start;
    if (r >= WARM_UP) times.push(elapsed); // after warm-up runs (JIT compilation)
    iterations = result.iterations;
    liftedOff = result.springForces.filter((s) => s.state === 'open').length;
  }
  return { median: median(times), iterations, liftedOff, springs: model.springs.length };
}

const pad = (s: string | number, n: number): string => String(s).padStart(n);

console.log('1. Full analysis, 720-segment ring, 5 compression-only bearing points per node');
const main = timeAnalysis(720, 21);
console.log(`   median ${main.median.toFixed(1)} ms over 21 runs; ${main.iterations} contact solves; ${main.liftedOff} of ${main.springs} points lifted off; target < 50 ms: ${main.median < 50 ? 'met' : 'NOT met'}`);

{
  // The solver part alone: contact iterations (factorisations not cached between runs) and the
  // checked final solve, on a prepared system.
  const model = ringOnBearings(720);
  const numbering = numberEquations(model);
  const elements = prepareElements(model, numbering);
  const system = prepareContactSystem(model, numbering, elements, prepareSprings(model, numbering), (e) => ({ text: `equation ${e}`, path: '' }));
  const combined = combineLoads(model, combination);
  const { f } = assembleLoads(elements, combined.elements, combined.nodal, numbering);
  const times: number[] = [];
  for (let r = 0; r < 21 + WARM_UP; r++) {
    system.cache.clear();
    const start = performance.now();
    const contact = solveContact(system, f);
    solveChecked(stateMatrix(system, contact.state), contact.factorisation, contact.rhs);
    if (r >= WARM_UP) times.push(performance.now() - start);
  }
  console.log(`   of which contact iterations + checked final solve: median ${median(times).toFixed(1)} ms (prepared system, no cached factorisations)`);
}

console.log('\n2. Time against size');
console.log(`   ${pad('segments', 9)} ${pad('equations', 10)} ${pad('median ms', 10)} ${pad('solves', 7)} ${pad('ms/segment', 11)} ${pad('ratio', 6)}`);
let previous: number | undefined;
for (const segments of [180, 360, 720, 1440, 2880]) {
  const t = timeAnalysis(segments, segments >= 1440 ? 5 : 9);
  const ratio = previous === undefined ? '' : (t.median / previous).toFixed(2);
  console.log(`   ${pad(segments, 9)} ${pad(segments * 7 - 3, 10)} ${pad(t.median.toFixed(1), 10)} ${pad(t.iterations, 7)} ${pad((t.median / segments).toFixed(4), 11)} ${pad(ratio, 6)}`);
  previous = t.median;
}
console.log('   (ratio: time over the time of half the size; 2.00 is linear growth)');

console.log('\n3. Banded LDLT against dense Cholesky, same converged system, 720 segments');
if (!withDense) console.log('   skipped (--no-dense)');
else {
  const model = ringOnBearings(720);
  const numbering = numberEquations(model);
  const elements = prepareElements(model, numbering);
  const springs = prepareSprings(model, numbering);
  const system = prepareContactSystem(model, numbering, elements, springs, (e) => ({ text: `equation ${e}`, path: '' }));
  const combined = combineLoads(model, combination);
  const { f } = assembleLoads(elements, combined.elements, combined.nodal, numbering);
  const contact = solveContact(system, f);
  const H = stateMatrix(system, contact.state);
  const bandedTimes: number[] = [];
  let uBanded: Float64Array = new Float64Array(0);
  for (let r = 0; r < 12; r++) {
    system.cache.clear();
    const start = performance.now();
    uBanded = factorState(system, contact.state).solve(contact.rhs);
    if (r >= 2) bandedTimes.push(performance.now() - start);
  }
  const n = H.size;
  const dense = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    for (let k = H.rowStart[i] as number; k < (H.rowStart[i + 1] as number); k++) dense.set(i, H.column[k] as number, H.value[k] as number);
  }
  const start = performance.now();
  const uDense = new CholeskyDecomposition(dense).solve(Matrix.columnVector(Array.from(contact.rhs))).getColumn(0);
  const denseTime = performance.now() - start;
  let diff = 0;
  let size = 0;
  uDense.forEach((x, i) => {
    diff = Math.max(diff, Math.abs(x - (uBanded[i] as number)));
    size = Math.max(size, Math.abs(x));
  });
  const banded = median(bandedTimes);
  console.log(`   equations ${n}, half-bandwidth ${system.halfBandwidth} (RCM)`);
  console.log(`   ${pad('solver', 28)} ${pad('ms', 10)}`);
  console.log(`   ${pad('banded LDLT (factor + solve)', 28)} ${pad(banded.toFixed(2), 10)}`);
  console.log(`   ${pad('dense Cholesky (ml-matrix)', 28)} ${pad(denseTime.toFixed(0), 10)}`);
  console.log(`   speed-up ${(denseTime / banded).toFixed(0)}x (target >= 50x: ${denseTime / banded >= 50 ? 'met' : 'NOT met'}); max |u_dense - u_banded| / max |u| = ${(diff / size).toExponential(2)}`);
}
