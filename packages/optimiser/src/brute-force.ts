import { OptimiserError } from './errors.js';
import { immediateInfeasibility, indexProblem, infeasibleResult, quoted, tieTolerance, totalCost } from './problem.js';
import type { IndexedCandidate, IndexedProblem, SelectionCandidate, SelectionProblem, SelectionResult } from './problem.js';

/** Enumeration stops being sensible beyond this many combinations. */
const maxCombinations = 5_000_000;

/**
 * Visit every admissible combination (one feasible candidate per group, same keys within each
 * component, at most maxDistinctKeys distinct keys) in lexicographic order of candidate positions.
 * The visitor returns true to stop.
 */
function enumerate(p: IndexedProblem, ignoreKeyCap: boolean, visit: (chosen: IndexedCandidate[]) => boolean): void {
  const chosen: IndexedCandidate[] = [];
  const keyCount = new Map<string, number>();
  const componentKey: Array<string | undefined> = p.components.map(() => undefined);
  const cap = ignoreKeyCap ? undefined : p.maxDistinctKeys;
  const step = (g: number): boolean => {
    if (g === p.groups.length) return visit(chosen);
    const c = p.component[g] ?? -1;
    for (const entry of p.feasible[g] ?? []) {
      const key = entry.candidate.key;
      const bound = c >= 0 ? componentKey[c] : undefined;
      if (bound !== undefined && bound !== key) continue;
      const count = keyCount.get(key) ?? 0;
      if (cap !== undefined && count === 0 && keyCount.size >= cap) continue;
      keyCount.set(key, count + 1);
      const setsComponent = c >= 0 && bound === undefined;
      if (setsComponent) componentKey[c] = key;
      chosen.push(entry);
      const stop = step(g + 1);
      chosen.pop();
      if (setsComponent) componentKey[c] = undefined;
      if (count === 0) keyCount.delete(key);
      else keyCount.set(key, count);
      if (stop) return true;
    }
    return false;
  };
  step(0);
}

/**
 * Exhaustive reference solution of a SelectionProblem, for verification and for tiny problems: the
 * least total cost, ties (within tieTolerance) broken by the lexicographically first candidate positions.
 */
export function bruteForceSelection(problem: SelectionProblem): SelectionResult {
  const p = indexProblem(problem);
  const immediate = immediateInfeasibility(p);
  if (immediate) return infeasibleResult(immediate.explanation, immediate.conflictingGroups);
  const combinations = p.feasible.reduce((n, list) => n * list.length, 1);
  if (combinations > maxCombinations) {
    throw new OptimiserError(
      'PROBLEM_TOO_LARGE',
      `Exhaustive enumeration would visit ${combinations.toExponential(2)} combinations (limit ${maxCombinations}); use solveSelection.`,
    );
  }

  let least = Number.POSITIVE_INFINITY;
  enumerate(p, false, (chosen) => {
    least = Math.min(least, totalCost(chosen.map((e) => e.candidate)));
    return false;
  });

  if (least === Number.POSITIVE_INFINITY) {
    // Only the distinct-key cap can be at fault: same-key components were checked above.
    let fewest = Number.POSITIVE_INFINITY;
    enumerate(p, true, (chosen) => {
      fewest = Math.min(fewest, new Set(chosen.map((e) => e.candidate.key)).size);
      return false;
    });
    const ids = p.groups.map((g) => g.id);
    return infeasibleResult(
      `Groups ${quoted(ids)} need at least ${fewest} distinct keys between them, but maxDistinctKeys is ${p.maxDistinctKeys ?? 'unset'}.`,
      ids,
    );
  }

  const limit = least + tieTolerance(least);
  let best: SelectionCandidate[] = [];
  enumerate(p, false, (chosen) => {
    const candidates = chosen.map((e) => e.candidate);
    if (totalCost(candidates) <= limit) {
      best = candidates;
      return true;
    }
    return false;
  });
  const choice: Record<string, string> = {};
  p.groups.forEach((group, g) => {
    const c = best[g];
    if (c) choice[group.id] = c.id;
  });
  return { status: 'optimal', choice, objective: totalCost(best), gap: 0, explanation: null, conflictingGroups: [] };
}
