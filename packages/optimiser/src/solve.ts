import GLPK from 'glpk.js/node';
import type { LP } from 'glpk.js/node';
import { OptimiserError } from './errors.js';
import { commonKeys, immediateInfeasibility, indexProblem, infeasibleResult, quoted, tieTolerance, totalCost } from './problem.js';
import type { IndexedCandidate, IndexedProblem, SelectionProblem, SelectionResult } from './problem.js';

export interface SolveOptions {
  /** wall-clock limit for the whole solve, in seconds; without it the search runs to optimality */
  timeLimitSeconds?: number;
}

type Glpk = Awaited<ReturnType<typeof GLPK>>;
let glpkInstance: Promise<Glpk> | undefined;

function glpk(): Promise<Glpk> {
  glpkInstance ??= GLPK();
  return glpkInstance;
}

/** Candidates still in play per group, after pruning or fixing. */
type Allowed = IndexedCandidate[][];

const variableName = (g: number, entry: IndexedCandidate): string => `x${g}_${entry.position}`;

/**
 * Keep only candidates that can be in the chosen solution (provably safe under every constraint):
 *  - in a same-key component, only keys that are feasible in all of its groups;
 *  - among candidates whose keys are interchangeable (the same key; or any key when the group is
 *    coupled to nothing), a candidate goes when an earlier one is no dearer (it could never win the tie
 *    break), or when another is dearer by more than any possible tie tolerance (it could never be optimal).
 */
function pruneCandidates(p: IndexedProblem): Allowed {
  const costBound = p.feasible.reduce((sum, list) => sum + Math.max(0, ...list.map((e) => Math.abs(e.candidate.cost))), 0);
  const slack = tieTolerance(costBound);
  return p.feasible.map((list, g) => {
    const c = p.component[g] ?? -1;
    const keys = c >= 0 ? new Set(commonKeys(p, p.components[c] ?? [])) : undefined;
    const admissible = keys ? list.filter((e) => keys.has(e.candidate.key)) : list;
    const keysMatter = p.maxDistinctKeys !== undefined || c >= 0;
    const classOf = (e: IndexedCandidate): string => (keysMatter ? e.candidate.key : '');
    const cheapest = new Map<string, number>();
    for (const e of admissible) cheapest.set(classOf(e), Math.min(cheapest.get(classOf(e)) ?? Number.POSITIVE_INFINITY, e.candidate.cost));
    const lowestSoFar = new Map<string, number>();
    return admissible.filter((e) => {
      const cls = classOf(e);
      const earlierLowest = lowestSoFar.get(cls) ?? Number.POSITIVE_INFINITY;
      lowestSoFar.set(cls, Math.min(earlierLowest, e.candidate.cost));
      return e.candidate.cost < earlierLowest && e.candidate.cost <= (cheapest.get(cls) ?? 0) + slack;
    });
  });
}

interface ModelOptions {
  objective: 'cost' | 'distinctKeys' | { rankOfGroup: number };
  /** upper bound on the total cost */
  costBound?: number;
  /** apply maxDistinctKeys */
  keyCap: boolean;
  binaries: boolean;
}

function buildModel(g: Glpk, p: IndexedProblem, allowed: Allowed, options: ModelOptions): LP {
  const keyIndex = new Map<string, number>();
  allowed.forEach((list) => list.forEach((e) => keyIndex.has(e.candidate.key) || keyIndex.set(e.candidate.key, keyIndex.size)));
  const keyVar = (key: string): string => `y${keyIndex.get(key) ?? -1}`;
  const needKeys = options.objective === 'distinctKeys' || (options.keyCap && p.maxDistinctKeys !== undefined);
  const subjectTo: LP['subjectTo'] = [];

  allowed.forEach((list, gi) => {
    subjectTo.push({ name: `one${gi}`, vars: list.map((e) => ({ name: variableName(gi, e), coef: 1 })), bnds: { type: g.GLP_FX, lb: 1, ub: 1 } });
    if (needKeys) {
      const byKey = new Map<string, IndexedCandidate[]>();
      list.forEach((e) => byKey.set(e.candidate.key, [...(byKey.get(e.candidate.key) ?? []), e]));
      for (const [key, entries] of byKey) {
        // x[g][s] <= y[key], aggregated over the group's candidates with that key
        subjectTo.push({
          name: `link${gi}_${keyIndex.get(key) ?? -1}`,
          vars: [...entries.map((e) => ({ name: variableName(gi, e), coef: 1 })), { name: keyVar(key), coef: -1 }],
          bnds: { type: g.GLP_UP, lb: 0, ub: 0 },
        });
      }
    }
  });
  if (options.keyCap && p.maxDistinctKeys !== undefined) {
    subjectTo.push({
      name: 'keys',
      vars: [...keyIndex.keys()].map((key) => ({ name: keyVar(key), coef: 1 })),
      bnds: { type: g.GLP_UP, lb: 0, ub: p.maxDistinctKeys },
    });
  }
  p.components.forEach((members, c) => {
    const [first, ...rest] = members;
    if (first === undefined) return;
    for (const [key] of keyIndex) {
      const pick = (gi: number, sign: number): Array<{ name: string; coef: number }> =>
        (allowed[gi] ?? []).filter((e) => e.candidate.key === key).map((e) => ({ name: variableName(gi, e), coef: sign }));
      rest.forEach((gi, i) => {
        const vars = [...pick(first, 1), ...pick(gi, -1)];
        if (vars.length > 0) subjectTo.push({ name: `same${c}_${i}_${keyIndex.get(key) ?? -1}`, vars, bnds: { type: g.GLP_FX, lb: 0, ub: 0 } });
      });
    }
  });
  if (options.costBound !== undefined) {
    subjectTo.push({
      name: 'cost',
      vars: allowed.flatMap((list, gi) => list.map((e) => ({ name: variableName(gi, e), coef: e.candidate.cost }))),
      bnds: { type: g.GLP_UP, lb: 0, ub: options.costBound },
    });
  }

  const objective = options.objective;
  const objectiveVars =
    objective === 'cost'
      ? allowed.flatMap((list, gi) => list.map((e) => ({ name: variableName(gi, e), coef: e.candidate.cost })))
      : objective === 'distinctKeys'
        ? [...keyIndex.keys()].map((key) => ({ name: keyVar(key), coef: 1 }))
        : (allowed[objective.rankOfGroup] ?? []).map((e) => ({ name: variableName(objective.rankOfGroup, e), coef: e.position }));

  const xNames = allowed.flatMap((list, gi) => list.map((e) => variableName(gi, e)));
  const yNames = needKeys ? [...keyIndex.keys()].map(keyVar) : [];
  const model: LP = {
    name: 'selection',
    objective: { direction: g.GLP_MIN, name: 'objective', vars: objectiveVars },
    subjectTo,
    bounds: [...xNames, ...yNames].map((name) => ({ name, type: g.GLP_DB, lb: 0, ub: 1 })),
  };
  if (options.binaries) model.binaries = [...xNames, ...yNames];
  return model;
}

type Outcome = { kind: 'optimal' | 'feasible'; values: Record<string, number>; z: number } | { kind: 'infeasible' } | { kind: 'timeout' };

/** Wall-clock end of the solve [ms since epoch], or undefined for no limit. */
type Deadline = number | undefined;

function remainingSeconds(deadline: Deadline): number | undefined {
  return deadline === undefined ? undefined : Math.max(0.001, (deadline - Date.now()) / 1000);
}

function expired(deadline: Deadline): boolean {
  return deadline !== undefined && Date.now() >= deadline;
}

function run(g: Glpk, lp: LP, deadline: Deadline): Outcome {
  const remaining = remainingSeconds(deadline);
  const options = remaining === undefined ? { msglev: g.GLP_MSG_OFF, presol: true } : { msglev: g.GLP_MSG_OFF, presol: true, tmlim: remaining };
  const { result } = g.solve(lp, options);
  // Never trust z alone: an infeasible model comes back with z = 0.
  if (result.status === g.GLP_OPT) return { kind: 'optimal', values: result.vars, z: result.z };
  if (result.status === g.GLP_FEAS) return { kind: 'feasible', values: result.vars, z: result.z };
  if (result.status === g.GLP_NOFEAS) return { kind: 'infeasible' };
  if (result.status === g.GLP_UNDEF && expired(deadline)) return { kind: 'timeout' };
  throw new OptimiserError('SOLVER_FAILED', `The integer-programming solver stopped with status ${result.status} and no usable solution.`);
}

/** The chosen candidate of each group from solver values. */
function readChoice(p: IndexedProblem, allowed: Allowed, values: Record<string, number>): IndexedCandidate[] {
  return allowed.map((list, gi) => {
    const picked = list.filter((e) => (values[variableName(gi, e)] ?? 0) > 0.5);
    const only = picked[0];
    if (picked.length !== 1 || !only) {
      throw new OptimiserError('SOLVER_FAILED', `The solver returned ${picked.length} candidates for group "${p.groups[gi]?.id ?? gi}" instead of one.`);
    }
    return only;
  });
}

function fewestDistinctKeys(g: Glpk, problem: SelectionProblem, deadline: Deadline): number | undefined {
  const p = indexProblem({ ...problem, maxDistinctKeys: undefined });
  if (immediateInfeasibility(p)) return undefined;
  const outcome = run(g, buildModel(g, p, pruneCandidatesForKeyCount(p), { objective: 'distinctKeys', keyCap: false, binaries: true }), deadline);
  return outcome.kind === 'optimal' ? Math.round(outcome.z) : undefined;
}

/** For counting keys only the keys matter: one candidate per key per group is enough. */
function pruneCandidatesForKeyCount(p: IndexedProblem): Allowed {
  return p.feasible.map((list, gi) => {
    const c = p.component[gi] ?? -1;
    const keys = c >= 0 ? new Set(commonKeys(p, p.components[c] ?? [])) : undefined;
    const seen = new Set<string>();
    return list.filter((e) => {
      if ((keys && !keys.has(e.candidate.key)) || seen.has(e.candidate.key)) return false;
      seen.add(e.candidate.key);
      return true;
    });
  });
}

/** Restrict a problem to some of its groups, with the same-key sets among those groups only. */
function subProblem(problem: SelectionProblem, ids: ReadonlySet<string>): SelectionProblem {
  return {
    groups: problem.groups.filter((group) => ids.has(group.id)),
    sameKeyGroups: (problem.sameKeyGroups ?? []).map((set) => set.filter((id) => ids.has(id))).filter((set) => set.length > 1),
  };
}

/**
 * Why the distinct-key cap cannot be met: a smallest-by-deletion set of groups that on their own
 * already need more than maxDistinctKeys keys.
 */
function explainKeyCap(g: Glpk, problem: SelectionProblem, cap: number, deadline: Deadline): SelectionResult {
  const all = problem.groups.map((group) => group.id);
  const needed = fewestDistinctKeys(g, problem, deadline);
  let kept = new Set(all);
  let keptNeed = needed;
  if (needed !== undefined) {
    for (const id of all) {
      if (expired(deadline)) break;
      const trial = new Set([...kept].filter((other) => other !== id));
      const need = trial.size === 0 ? 0 : fewestDistinctKeys(g, subProblem(problem, trial), deadline);
      if (need !== undefined && need > cap) {
        kept = trial;
        keptNeed = need;
      }
    }
  }
  const ids = all.filter((id) => kept.has(id));
  const count = keptNeed === undefined ? `more than ${cap}` : `at least ${keptNeed}`;
  return infeasibleResult(
    `${ids.length === 1 ? 'Group' : 'Groups'} ${quoted(ids)} need ${count} distinct keys between them (counting their same-key couplings), but maxDistinctKeys is ${cap}.`,
    ids,
  );
}

function result(p: IndexedProblem, chosen: IndexedCandidate[], status: 'optimal' | 'feasible', gap: number | null): SelectionResult {
  const choice: Record<string, string> = {};
  p.groups.forEach((group, gi) => {
    const entry = chosen[gi];
    if (entry) choice[group.id] = entry.candidate.id;
  });
  return { status, choice, objective: totalCost(chosen.map((e) => e.candidate)), gap, explanation: null, conflictingGroups: [] };
}

/**
 * Solve a SelectionProblem as a 0-1 integer program with GLPK: binaries x[g][s] (group g takes
 * candidate s) and y[key] (the key is used), sum_s x[g][s] = 1, x[g][s] <= y[key(s)], sum y <= K, and
 * equal key choices within each same-key set. Minimises total cost; ties within tieTolerance go to the
 * lexicographically first candidate positions (group by group), found by one extra solve per group
 * whose first pick was not its earliest candidate. The result matches bruteForceSelection.
 */
export async function solveSelection(problem: SelectionProblem, options: SolveOptions = {}): Promise<SelectionResult> {
  const limit = options.timeLimitSeconds;
  if (limit !== undefined && (!Number.isFinite(limit) || limit <= 0)) {
    throw new OptimiserError('INVALID_PROBLEM', `timeLimitSeconds must be a positive number of seconds; got ${limit}.`, 'timeLimitSeconds');
  }
  const p = indexProblem(problem);
  const immediate = immediateInfeasibility(p);
  if (immediate) return infeasibleResult(immediate.explanation, immediate.conflictingGroups);
  if (p.groups.length === 0) return result(p, [], 'optimal', 0);

  const deadline: Deadline = limit === undefined ? undefined : Date.now() + limit * 1000;
  const g = await glpk();
  let allowed = pruneCandidates(p);
  const first = run(g, buildModel(g, p, allowed, { objective: 'cost', keyCap: true, binaries: true }), deadline);
  if (first.kind === 'infeasible') return explainKeyCap(g, problem, p.maxDistinctKeys ?? 0, deadline);
  if (first.kind === 'timeout') {
    throw new OptimiserError('NO_SOLUTION_WITHIN_TIME_LIMIT', `No admissible selection was found within the time limit of ${limit} s.`, 'timeLimitSeconds');
  }
  let chosen = readChoice(p, allowed, first.values);
  if (first.kind === 'feasible') {
    const relaxation = run(g, buildModel(g, p, allowed, { objective: 'cost', keyCap: true, binaries: false }), undefined);
    const objective = totalCost(chosen.map((e) => e.candidate));
    const gap = relaxation.kind === 'optimal' ? Math.max(0, objective - relaxation.z) / Math.max(Math.abs(objective), 1e-9) : null;
    return result(p, chosen, 'feasible', gap);
  }

  // Deterministic tie break: fix groups in order to their earliest candidate that still allows a
  // total within the tie tolerance of the optimum.
  const least = totalCost(chosen.map((e) => e.candidate));
  const costBound = least + tieTolerance(least);
  for (let gi = 0; gi < allowed.length; gi++) {
    const list = allowed[gi] ?? [];
    const current = chosen[gi];
    if (!current) break;
    if (list[0] !== undefined && current.position !== list[0].position && !expired(deadline)) {
      const outcome = run(g, buildModel(g, p, allowed, { objective: { rankOfGroup: gi }, costBound, keyCap: true, binaries: true }), deadline);
      if (outcome.kind === 'optimal') chosen = readChoice(p, allowed, outcome.values);
    }
    const fixed = chosen[gi];
    if (fixed) allowed = allowed.map((l, i) => (i === gi ? [fixed] : l));
  }
  return result(p, chosen, 'optimal', 0);
}
