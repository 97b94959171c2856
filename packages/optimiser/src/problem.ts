import { OptimiserError } from './errors.js';

/** One option for a group, e.g. one section for one member group. */
export interface SelectionCandidate {
  id: string;
  /** what the coupling constraints compare (e.g. the section designation) */
  key: string;
  /** what is minimised (e.g. mass or cost); any finite number */
  cost: number;
  /** false when the candidate fails a requirement; it is then never chosen */
  feasible: boolean;
}

export interface SelectionGroup {
  id: string;
  /** in order of preference: among equal-cost optima the earlier candidate wins */
  candidates: SelectionCandidate[];
}

/**
 * Choose exactly one feasible candidate per group at least total cost, with at most
 * `maxDistinctKeys` distinct keys over all groups, and the groups of each `sameKeyGroups` entry
 * choosing candidates with the same key.
 */
export interface SelectionProblem {
  groups: SelectionGroup[];
  maxDistinctKeys?: number;
  sameKeyGroups?: string[][];
}

export type SelectionStatus = 'optimal' | 'feasible' | 'infeasible';

export interface SelectionResult {
  /** 'feasible': a time limit stopped the search before optimality was proven */
  status: SelectionStatus;
  /** group id -> candidate id; empty when infeasible */
  choice: Record<string, string>;
  /** total cost of the choice; +Infinity when infeasible */
  objective: number;
  /** relative gap to the best bound: 0 when optimal, null when infeasible or unknown */
  gap: number | null;
  /** why there is no solution, naming the groups; null otherwise */
  explanation: string | null;
  /** the groups the explanation names */
  conflictingGroups: string[];
}

/**
 * Costs within this distance of the least total cost count as equal, and the tie is broken by
 * candidate order (group by group, in the order the groups are given).
 */
export function tieTolerance(leastCost: number): number {
  return 1e-6 * Math.max(1, Math.abs(leastCost));
}

/** A candidate with its position in its group's list (the tie-breaking rank). */
export interface IndexedCandidate {
  candidate: SelectionCandidate;
  position: number;
}

/** The problem with user identifiers mapped to indices and same-key groups merged into components. */
export interface IndexedProblem {
  groups: SelectionGroup[];
  /** feasible candidates of each group, in the given order */
  feasible: IndexedCandidate[][];
  maxDistinctKeys: number | undefined;
  /** component index of each group, or -1 when it is not coupled to another group */
  component: number[];
  /** group indices of each component (two or more groups), in group order */
  components: number[][];
}

function invalid(message: string, path: string): OptimiserError {
  return new OptimiserError('INVALID_PROBLEM', message, path);
}

/** Validate a problem and map it to indices; throws OptimiserError INVALID_PROBLEM. */
export function indexProblem(problem: SelectionProblem): IndexedProblem {
  if (!problem || !Array.isArray(problem.groups)) throw invalid('The selection problem needs a list of groups.', 'groups');
  const groupIndex = new Map<string, number>();
  problem.groups.forEach((group, g) => {
    const path = `groups[${g}]`;
    if (typeof group.id !== 'string' || group.id.length === 0) throw invalid(`${path}.id must be a non-empty string.`, `${path}.id`);
    if (groupIndex.has(group.id)) throw invalid(`Group id "${group.id}" appears twice (groups[${groupIndex.get(group.id)}] and ${path}).`, `${path}.id`);
    groupIndex.set(group.id, g);
    if (!Array.isArray(group.candidates)) throw invalid(`Group "${group.id}" needs a list of candidates.`, `${path}.candidates`);
    const seen = new Set<string>();
    group.candidates.forEach((c, s) => {
      const cpath = `${path}.candidates[${s}]`;
      if (typeof c.id !== 'string' || c.id.length === 0) throw invalid(`${cpath}.id must be a non-empty string.`, `${cpath}.id`);
      if (seen.has(c.id)) throw invalid(`Candidate id "${c.id}" appears twice in group "${group.id}".`, `${cpath}.id`);
      seen.add(c.id);
      if (typeof c.key !== 'string') throw invalid(`Candidate "${c.id}" of group "${group.id}" needs a string key.`, `${cpath}.key`);
      if (typeof c.cost !== 'number' || !Number.isFinite(c.cost)) {
        throw invalid(`Candidate "${c.id}" of group "${group.id}" has cost ${String(c.cost)}; a finite number is needed.`, `${cpath}.cost`);
      }
      if (typeof c.feasible !== 'boolean') throw invalid(`Candidate "${c.id}" of group "${group.id}" needs feasible: true or false.`, `${cpath}.feasible`);
    });
  });

  const k = problem.maxDistinctKeys;
  if (k !== undefined && (!Number.isInteger(k) || k < 0)) {
    throw invalid(`maxDistinctKeys must be a whole number of at least 0; got ${k}.`, 'maxDistinctKeys');
  }

  // Union-find over the same-key sets: overlapping sets form one component.
  const parent = problem.groups.map((_, g) => g);
  const find = (g: number): number => {
    let root = g;
    while (parent[root] !== root) root = parent[root] ?? root;
    return root;
  };
  (problem.sameKeyGroups ?? []).forEach((set, i) => {
    if (!Array.isArray(set)) throw invalid(`sameKeyGroups[${i}] must be a list of group ids.`, `sameKeyGroups[${i}]`);
    const members = set.map((id, j) => {
      const g = groupIndex.get(id);
      if (g === undefined) throw invalid(`sameKeyGroups[${i}] names group "${id}", which is not in the problem.`, `sameKeyGroups[${i}][${j}]`);
      return g;
    });
    for (const g of members.slice(1)) {
      const a = find(members[0] ?? g);
      const b = find(g);
      if (a !== b) parent[Math.max(a, b)] = Math.min(a, b);
    }
  });
  const byRoot = new Map<number, number[]>();
  problem.groups.forEach((_, g) => {
    const root = find(g);
    byRoot.set(root, [...(byRoot.get(root) ?? []), g]);
  });
  const components = [...byRoot.values()].filter((members) => members.length > 1).sort((a, b) => (a[0] ?? 0) - (b[0] ?? 0));
  const component = problem.groups.map(() => -1);
  components.forEach((members, c) => members.forEach((g) => (component[g] = c)));

  return {
    groups: problem.groups,
    feasible: problem.groups.map((group) =>
      group.candidates.map((candidate, position) => ({ candidate, position })).filter((entry) => entry.candidate.feasible),
    ),
    maxDistinctKeys: k,
    component,
    components,
  };
}

export function quoted(ids: readonly string[]): string {
  return ids.map((id) => `"${id}"`).join(', ');
}

/**
 * Reasons for infeasibility that need no search: groups with no feasible candidate, and same-key
 * components with no key that is feasible in all of their groups.
 */
export function immediateInfeasibility(p: IndexedProblem): { explanation: string; conflictingGroups: string[] } | undefined {
  const empty = p.groups.filter((_, g) => (p.feasible[g] ?? []).length === 0).map((group) => group.id);
  if (empty.length > 0) {
    return {
      explanation: `${empty.length === 1 ? 'Group' : 'Groups'} ${quoted(empty)} ${empty.length === 1 ? 'has' : 'have'} no feasible candidate.`,
      conflictingGroups: empty,
    };
  }
  const messages: string[] = [];
  const conflicting: string[] = [];
  for (const members of p.components) {
    if (commonKeys(p, members).length === 0) {
      const ids = members.map((g) => p.groups[g]?.id ?? '');
      messages.push(`Groups ${quoted(ids)} must share a key, but no key has a feasible candidate in all of them.`);
      conflicting.push(...ids);
    }
  }
  return messages.length > 0 ? { explanation: messages.join(' '), conflictingGroups: conflicting } : undefined;
}

/** Keys with a feasible candidate in every group of a component, in the order of the first group. */
export function commonKeys(p: IndexedProblem, members: readonly number[]): string[] {
  const [first, ...rest] = members;
  const keys = [...new Set((p.feasible[first ?? -1] ?? []).map((e) => e.candidate.key))];
  return keys.filter((key) => rest.every((g) => (p.feasible[g] ?? []).some((e) => e.candidate.key === key)));
}

/** Infeasible-result value. */
export function infeasibleResult(explanation: string, conflictingGroups: string[]): SelectionResult {
  return { status: 'infeasible', choice: {}, objective: Number.POSITIVE_INFINITY, gap: null, explanation, conflictingGroups };
}

/** Total cost of a choice (one candidate per group), summed in group order. */
export function totalCost(chosen: readonly SelectionCandidate[]): number {
  let sum = 0;
  for (const c of chosen) sum += c.cost;
  return sum;
}
