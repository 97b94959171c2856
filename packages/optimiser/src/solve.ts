import GLPK from 'glpk.js/node';
import type { LP } from 'glpk.js/node';
import { OptimiserError } from './errors.js';
import { couplableCandidates, couplingsOf, immediateInfeasibility, indexProblem, infeasibleResult, quoted, tieTolerance, totalCost } from './problem.js';
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
 *  - in a coupled component, only labels (keys, attribute values) that are feasible in all of its groups;
 *  - among candidates that are interchangeable (the same key where keys matter, the same value of every
 *    attribute the group is coupled by), a candidate goes when an earlier one is no dearer (it could never
 *    win the tie break), or when another is cheaper by more than any possible tie tolerance.
 */
function pruneCandidates(p: IndexedProblem): Allowed {
  const costBound =
    p.feasible.reduce((sum, list) => sum + Math.max(0, ...list.map((e) => Math.abs(e.candidate.cost))), 0) + p.distinctKeyCost * p.groups.length;
  const slack = tieTolerance(costBound);
  const keysEverywhere = p.maxDistinctKeys !== undefined || p.distinctKeyCost > 0;
  return couplableCandidates(p).map((admissible, g) => {
    const coupled = couplingsOf(p, g);
    const keysMatter = keysEverywhere || coupled.some((coupling) => coupling.kind === 'key');
    const attributes = coupled.filter((coupling) => coupling.kind === 'attribute');
    const classOf = (e: IndexedCandidate): string => [keysMatter ? e.candidate.key : '', ...attributes.map((a) => a.label(e.candidate))].join('\u0000');
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
  const keyCost = options.objective === 'distinctKeys' ? 0 : p.distinctKeyCost;
  const needKeys = options.objective === 'distinctKeys' || (options.keyCap && p.maxDistinctKeys !== undefined) || keyCost > 0;
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
  // Couplings: within a component, the share of each label is equal in every group,
  // sum_{s: label(s) = v} x[first][s] = sum_{s: label(s) = v} x[g][s].
  p.couplings.forEach((coupling, k) => {
    coupling.components.forEach((members, c) => {
      const [first, ...rest] = members;
      if (first === undefined) return;
      const labels = [...new Set(members.flatMap((gi) => (allowed[gi] ?? []).map((e) => coupling.label(e.candidate))))];
      labels.forEach((label, v) => {
        const pick = (gi: number, sign: number): Array<{ name: string; coef: number }> =>
          (allowed[gi] ?? []).filter((e) => coupling.label(e.candidate) === label).map((e) => ({ name: variableName(gi, e), coef: sign }));
        rest.forEach((gi, i) => {
          const vars = [...pick(first, 1), ...pick(gi, -1)];
          if (vars.length > 0) subjectTo.push({ name: `same${k}_${c}_${i}_${v}`, vars, bnds: { type: g.GLP_FX, lb: 0, ub: 0 } });
        });
      });
    });
  });
  const costVars = [
    ...allowed.flatMap((list, gi) => list.map((e) => ({ name: variableName(gi, e), coef: e.candidate.cost }))),
    ...(keyCost > 0 ? [...keyIndex.keys()].map((key) => ({ name: keyVar(key), coef: keyCost })) : []),
  ];
  if (options.costBound !== undefined) {
    subjectTo.push({ name: 'cost', vars: costVars, bnds: { type: g.GLP_UP, lb: 0, ub: options.costBound } });
  }

  const objective = options.objective;
  const objectiveVars =
    objective === 'cost'
      ? costVars
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

/** Fewest distinct keys any admissible choice needs (ignoring the cap); 'infeasible' when none exists; undefined on timeout. */
function fewestDistinctKeys(g: Glpk, problem: SelectionProblem, deadline: Deadline): number | 'infeasible' | undefined {
  const p = indexProblem({ ...problem, maxDistinctKeys: undefined, distinctKeyCost: undefined });
  if (immediateInfeasibility(p)) return 'infeasible';
  if (p.groups.length === 0) return 0;
  const outcome = run(g, buildModel(g, p, pruneCandidatesForKeyCount(p), { objective: 'distinctKeys', keyCap: false, binaries: true }), deadline);
  if (outcome.kind === 'infeasible') return 'infeasible';
  return outcome.kind === 'optimal' ? Math.round(outcome.z) : undefined;
}

/** For counting keys only the labels matter: one candidate per (key, coupled labels) per group is enough. */
function pruneCandidatesForKeyCount(p: IndexedProblem): Allowed {
  return couplableCandidates(p).map((list, gi) => {
    const coupled = couplingsOf(p, gi);
    const seen = new Set<string>();
    return list.filter((e) => {
      const cls = [e.candidate.key, ...coupled.map((coupling) => coupling.label(e.candidate))].join('\u0000');
      if (seen.has(cls)) return false;
      seen.add(cls);
      return true;
    });
  });
}

/** Restrict a problem to some of its groups, with the couplings among those groups only. */
function subProblem(problem: SelectionProblem, ids: ReadonlySet<string>): SelectionProblem {
  return {
    groups: problem.groups.filter((group) => ids.has(group.id)),
    sameKeyGroups: (problem.sameKeyGroups ?? []).map((set) => set.filter((id) => ids.has(id))).filter((set) => set.length > 1),
    sameAttributeGroups: (problem.sameAttributeGroups ?? [])
      .map((entry) => ({ attribute: entry.attribute, groups: entry.groups.filter((id) => ids.has(id)) }))
      .filter((entry) => entry.groups.length > 1),
  };
}

/**
 * Why the model has no solution. Either the couplings cannot be met together (a smallest-by-deletion
 * set of groups whose couplings alone conflict), or the distinct-key cap cannot be met (a
 * smallest-by-deletion set of groups that on their own already need more than maxDistinctKeys keys).
 */
function explainInfeasible(g: Glpk, problem: SelectionProblem, cap: number | undefined, deadline: Deadline): SelectionResult {
  const all = problem.groups.map((group) => group.id);
  const needed = fewestDistinctKeys(g, problem, deadline);
  let kept = new Set(all);
  if (needed === 'infeasible') {
    for (const id of all) {
      if (expired(deadline)) break;
      const trial = new Set([...kept].filter((other) => other !== id));
      if (trial.size > 0 && fewestDistinctKeys(g, subProblem(problem, trial), deadline) === 'infeasible') kept = trial;
    }
    const ids = all.filter((id) => kept.has(id));
    return infeasibleResult(`Groups ${quoted(ids)} cannot meet their same-key and same-attribute couplings together with their feasible candidates.`, ids);
  }
  const limit = cap ?? 0;
  let keptNeed = needed;
  if (needed !== undefined) {
    for (const id of all) {
      if (expired(deadline)) break;
      const trial = new Set([...kept].filter((other) => other !== id));
      const need = trial.size === 0 ? 0 : fewestDistinctKeys(g, subProblem(problem, trial), deadline);
      if (typeof need === 'number' && need > limit) {
        kept = trial;
        keptNeed = need;
      }
    }
  }
  const ids = all.filter((id) => kept.has(id));
  const count = keptNeed === undefined ? `more than ${limit}` : `at least ${keptNeed}`;
  return infeasibleResult(
    `${ids.length === 1 ? 'Group' : 'Groups'} ${quoted(ids)} need ${count} distinct keys between them (counting their same-key couplings), but maxDistinctKeys is ${limit}.`,
    ids,
  );
}

function result(p: IndexedProblem, chosen: IndexedCandidate[], status: 'optimal' | 'feasible', gap: number | null, bound?: number): SelectionResult {
  const choice: Record<string, string> = {};
  p.groups.forEach((group, gi) => {
    const entry = chosen[gi];
    if (entry) choice[group.id] = entry.candidate.id;
  });
  const out: SelectionResult = { status, choice, objective: totalCost(chosen.map((e) => e.candidate), p.distinctKeyCost), gap, explanation: null, conflictingGroups: [] };
  if (bound !== undefined) out.bound = bound;
  return out;
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
  if (first.kind === 'infeasible') return explainInfeasible(g, problem, p.maxDistinctKeys, deadline);
  if (first.kind === 'timeout') {
    throw new OptimiserError('NO_SOLUTION_WITHIN_TIME_LIMIT', `No admissible selection was found within the time limit of ${limit} s.`, 'timeLimitSeconds');
  }
  let chosen = readChoice(p, allowed, first.values);
  if (first.kind === 'feasible') {
    // glpk.js gives no branch-and-bound bound: the LP relaxation's optimum is a valid lower bound.
    const relaxation = run(g, buildModel(g, p, allowed, { objective: 'cost', keyCap: true, binaries: false }), undefined);
    const objective = totalCost(chosen.map((e) => e.candidate), p.distinctKeyCost);
    if (relaxation.kind !== 'optimal') return result(p, chosen, 'feasible', null);
    const gap = Math.max(0, objective - relaxation.z) / Math.max(Math.abs(objective), 1e-9);
    return result(p, chosen, 'feasible', gap, relaxation.z);
  }

  // Deterministic tie break: fix groups in order to their earliest candidate that still allows a
  // total within the tie tolerance of the optimum.
  const least = totalCost(chosen.map((e) => e.candidate), p.distinctKeyCost);
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

/**
 * Lower bound on the least total cost: the optimum of the LP relaxation of the model solveSelection
 * builds (binaries relaxed to 0 <= x, y <= 1, after the same safe pruning). Null when the problem is
 * infeasible already by its groups or couplings, or the relaxation has no solution.
 */
export async function relaxationBound(problem: SelectionProblem): Promise<number | null> {
  const p = indexProblem(problem);
  if (immediateInfeasibility(p)) return null;
  if (p.groups.length === 0) return 0;
  const g = await glpk();
  const outcome = run(g, buildModel(g, p, pruneCandidates(p), { objective: 'cost', keyCap: true, binaries: false }), undefined);
  return outcome.kind === 'optimal' ? outcome.z : null;
}
