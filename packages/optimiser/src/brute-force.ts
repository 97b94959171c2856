import { OptimiserError } from './errors.js';
import { immediateInfeasibility, indexProblem, infeasibleResult, quoted, tieTolerance, totalCost } from './problem.js';
import type { IndexedCandidate, IndexedProblem, SelectionCandidate, SelectionProblem, SelectionResult } from './problem.js';

/** Enumeration stops being sensible beyond this many combinations. */
const maxCombinations = 5_000_000;

/**
 * Visit every admissible combination (one feasible candidate per group within its limits, equal
 * labels within each coupled component, at most maxDistinctKeys distinct keys) in lexicographic order
 * of candidate positions. The visitor returns true to stop.
 */
function enumerate(p: IndexedProblem, ignoreKeyCap: boolean, visit: (chosen: IndexedCandidate[]) => boolean): void {
  const chosen: IndexedCandidate[] = [];
  const keyCount = new Map<string, number>();
  const bound: Array<Array<string | undefined>> = p.couplings.map((coupling) => coupling.components.map(() => undefined));
  const cap = ignoreKeyCap ? undefined : p.maxDistinctKeys;
  const step = (g: number): boolean => {
    if (g === p.groups.length) return visit(chosen);
    for (const entry of p.feasible[g] ?? []) {
      const fits = p.couplings.every((coupling, k) => {
        const c = coupling.component[g] ?? -1;
        const label = bound[k]?.[c];
        return c < 0 || label === undefined || label === coupling.label(entry.candidate);
      });
      if (!fits) continue;
      const key = entry.candidate.key;
      const count = keyCount.get(key) ?? 0;
      if (cap !== undefined && count === 0 && keyCount.size >= cap) continue;
      keyCount.set(key, count + 1);
      const setHere: Array<[number, number]> = [];
      p.couplings.forEach((coupling, k) => {
        const c = coupling.component[g] ?? -1;
        const labels = bound[k];
        if (c >= 0 && labels && labels[c] === undefined) {
          labels[c] = coupling.label(entry.candidate);
          setHere.push([k, c]);
        }
      });
      chosen.push(entry);
      const stop = step(g + 1);
      chosen.pop();
      for (const [k, c] of setHere) {
        const labels = bound[k];
        if (labels) labels[c] = undefined;
      }
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
  const cost = (chosen: readonly IndexedCandidate[]): number => totalCost(chosen.map((e) => e.candidate), p.distinctKeyCost);

  let least = Number.POSITIVE_INFINITY;
  enumerate(p, false, (chosen) => {
    least = Math.min(least, cost(chosen));
    return false;
  });

  if (least === Number.POSITIVE_INFINITY) {
    let fewest = Number.POSITIVE_INFINITY;
    enumerate(p, true, (chosen) => {
      fewest = Math.min(fewest, new Set(chosen.map((e) => e.candidate.key)).size);
      return false;
    });
    const ids = p.groups.map((g) => g.id);
    if (fewest === Number.POSITIVE_INFINITY) {
      return infeasibleResult(`Groups ${quoted(ids)} cannot meet their same-key and same-attribute couplings together with their feasible candidates.`, ids);
    }
    return infeasibleResult(
      `Groups ${quoted(ids)} need at least ${fewest} distinct keys between them, but maxDistinctKeys is ${p.maxDistinctKeys ?? 'unset'}.`,
      ids,
    );
  }

  const limit = least + tieTolerance(least);
  let best: SelectionCandidate[] = [];
  enumerate(p, false, (chosen) => {
    if (cost(chosen) <= limit) {
      best = chosen.map((e) => e.candidate);
      return true;
    }
    return false;
  });
  const choice: Record<string, string> = {};
  p.groups.forEach((group, g) => {
    const c = best[g];
    if (c) choice[group.id] = c.id;
  });
  return { status: 'optimal', choice, objective: totalCost(best, p.distinctKeyCost), gap: 0, explanation: null, conflictingGroups: [] };
}
