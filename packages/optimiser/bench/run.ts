/**
 * Benchmark: 4 member groups x 120 candidates, a distinct-key cap, depth couplings and a key cost,
 * solved by solveSelection; prints wall-clock times. Target: under 1 s per solve.
 */
import { solveSelection } from '../src/index.js';
import type { SelectionProblem } from '../src/index.js';

/** mulberry32, seeded, so every run solves the same problems. */
function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function problem(seed: number, variant: 'cap' | 'cap+depth' | 'cap+keyCost'): SelectionProblem {
  const random = prng(seed);
  // 120 section-like keys: 40 sizes in 3 grades; cost grows with size, feasibility from a random threshold per group.
  const keys = Array.from({ length: 120 }, (_, s) => ({ key: `S${Math.floor(s / 3)}-G${s % 3}`, size: Math.floor(s / 3), grade: [235, 355, 460][s % 3] ?? 235 }));
  const groups = Array.from({ length: 4 }, (_, g) => {
    const threshold = 8 + Math.floor(random() * 20);
    return {
      id: `group-${g}`,
      candidates: keys.map((k, s) => ({
        id: `c${s}`,
        key: k.key,
        cost: Math.round((50 + 12 * k.size) * (1 + 0.15 * (k.grade === 235 ? 0 : k.grade === 355 ? 1 : 2)) * (0.9 + 0.2 * random()) * 10) / 10,
        feasible: k.size * (k.grade / 235) >= threshold && random() < 0.9,
        attributes: { depth: 100 + 20 * k.size, grade: k.grade },
      })),
    };
  });
  const base: SelectionProblem = { groups, maxDistinctKeys: 2 };
  if (variant === 'cap+depth') base.sameAttributeGroups = [{ groups: ['group-0', 'group-1'], attribute: 'depth' }];
  if (variant === 'cap+keyCost') base.distinctKeyCost = 40;
  return base;
}

const rows: string[] = [];
let worst = 0;
for (const variant of ['cap', 'cap+depth', 'cap+keyCost'] as const) {
  for (const seed of [1, 2, 3]) {
    const p = problem(seed, variant);
    const start = performance.now();
    const result = await solveSelection(p, { timeLimitSeconds: 10 });
    const ms = performance.now() - start;
    worst = Math.max(worst, ms);
    rows.push(`${variant.padEnd(12)} seed ${seed}: ${ms.toFixed(1).padStart(7)} ms  status ${result.status}  objective ${result.objective.toFixed(1)}  keys ${new Set(Object.values(result.choice).map((id) => p.groups[0]?.candidates.find((c) => c.id === id)?.key)).size}`);
  }
}
console.log('optimiser benchmark: 4 groups x 120 candidates, maxDistinctKeys 2');
for (const row of rows) console.log(row);
console.log(`worst ${worst.toFixed(1)} ms (target < 1000 ms): ${worst < 1000 ? 'met' : 'NOT met'}`);

// A tight time limit: the solve must stop near it and report either a proven optimum, a feasible
// choice with the gap to the LP-relaxation bound, or that nothing was found in time.
for (const limit of [0.005, 0.05]) {
  const p = problem(1, 'cap+keyCost');
  const start = performance.now();
  try {
    const result = await solveSelection(p, { timeLimitSeconds: limit });
    const gap = result.gap === null ? 'n/a' : `${(100 * result.gap).toFixed(2)} %`;
    console.log(`time limit ${limit} s: ${(performance.now() - start).toFixed(1)} ms, status ${result.status}, gap ${gap}`);
  } catch (error) {
    console.log(`time limit ${limit} s: ${(performance.now() - start).toFixed(1)} ms, ${(error as Error).message}`);
  }
}
