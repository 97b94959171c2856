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
  /**
   * numbers that limits and same-attribute couplings compare (e.g. depth, flange width). Anything
   * without a natural number is encoded as one: a steel grade as its yield strength in MPa (355).
   */
  attributes?: Record<string, number>;
}

/** Inclusive bounds on one attribute. */
export interface AttributeLimit {
  min?: number;
  max?: number;
}

export interface SelectionGroup {
  id: string;
  /** in order of preference: among equal-cost optima the earlier candidate wins */
  candidates: SelectionCandidate[];
  /**
   * bounds on candidate attributes, e.g. { depth: { max: 0.6 }, flangeWidth: { min: 0.2 } }; a
   * candidate outside them is treated as infeasible; every candidate must carry the attributes named
   */
  limits?: Record<string, AttributeLimit>;
}

/** Groups that must choose candidates with the same value of one attribute (e.g. the same depth). */
export interface SameAttributeGroups {
  groups: string[];
  attribute: string;
}

/**
 * Choose exactly one feasible candidate per group at least total cost, where
 *  - total cost = sum of the chosen candidates' costs + distinctKeyCost x (number of distinct keys used);
 *  - at most `maxDistinctKeys` distinct keys over all groups;
 *  - the groups of each `sameKeyGroups` entry choose candidates with the same key;
 *  - the groups of each `sameAttributeGroups` entry choose candidates with equal values of its attribute;
 *  - every candidate chosen lies within its group's `limits`.
 * Grade choice: give each section in each grade as its own candidate, with a key that includes the
 * grade ("IPE 400 S355") and an attribute `grade` (e.g. 355); "one grade for all" is then a
 * sameAttributeGroups entry { groups: [all group ids], attribute: 'grade' }.
 */
export interface SelectionProblem {
  groups: SelectionGroup[];
  maxDistinctKeys?: number;
  sameKeyGroups?: string[][];
  sameAttributeGroups?: SameAttributeGroups[];
  /** cost added once for each distinct key used (e.g. the overhead of one more section size); >= 0 */
  distinctKeyCost?: number;
}

export type SelectionStatus = 'optimal' | 'feasible' | 'infeasible';

export interface SelectionResult {
  /** 'feasible': a time limit stopped the search before optimality was proven */
  status: SelectionStatus;
  /** group id -> candidate id; empty when infeasible */
  choice: Record<string, string>;
  /** total cost of the choice (candidate costs plus distinct-key costs); +Infinity when infeasible */
  objective: number;
  /**
   * relative gap (objective - bound) / |objective| to a lower bound: 0 when optimal, null when
   * infeasible or unknown. glpk.js reports no bound of its branch and bound, so for a 'feasible'
   * result the bound is the optimum of the LP relaxation (see `bound`).
   */
  gap: number | null;
  /** the lower bound behind a 'feasible' result's gap (LP relaxation); absent otherwise */
  bound?: number;
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

/**
 * One kind of coupling: groups of a component must choose candidates with the same label (the key,
 * or the value of one attribute).
 */
export interface Coupling {
  /** 'key' or the attribute name */
  name: string;
  kind: 'key' | 'attribute';
  label: (candidate: SelectionCandidate) => string;
  /** component index of each group, or -1 when the group is not coupled by this kind */
  component: number[];
  /** group indices of each component (two or more groups), in group order */
  components: number[][];
}

/** The problem with user identifiers mapped to indices and coupled groups merged into components. */
export interface IndexedProblem {
  groups: SelectionGroup[];
  /** feasible candidates (within the group's limits) of each group, in the given order */
  feasible: IndexedCandidate[][];
  maxDistinctKeys: number | undefined;
  distinctKeyCost: number;
  /** couplings[0] is always the same-key coupling; then one per attribute named in sameAttributeGroups */
  couplings: Coupling[];
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
  const keyCost = problem.distinctKeyCost ?? 0;
  if (typeof keyCost !== 'number' || !Number.isFinite(keyCost) || keyCost < 0) {
    throw invalid(`distinctKeyCost must be a finite number of at least 0; got ${String(keyCost)}.`, 'distinctKeyCost');
  }

  const attributeOf = (c: SelectionCandidate, name: string, g: number, s: number, path: string): number => {
    const value = c.attributes?.[name];
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      throw invalid(`Candidate "${c.id}" of group "${problem.groups[g]?.id ?? g}" needs a finite attribute "${name}" (${path}).`, `groups[${g}].candidates[${s}].attributes.${name}`);
    }
    return value;
  };
  const withinLimits = problem.groups.map((group, g) => {
    const limits = Object.entries(group.limits ?? {});
    for (const [name, limit] of limits) {
      for (const bound of ['min', 'max'] as const) {
        const value = limit[bound];
        if (value !== undefined && (typeof value !== 'number' || Number.isNaN(value))) {
          throw invalid(`Group "${group.id}" limit ${name}.${bound} must be a number; got ${String(value)}.`, `groups[${g}].limits.${name}.${bound}`);
        }
      }
    }
    return group.candidates.map((c, s) =>
      limits.every(([name, limit]) => {
        const value = attributeOf(c, name, g, s, `its group limits ${name}`);
        return (limit.min === undefined || value >= limit.min) && (limit.max === undefined || value <= limit.max);
      }),
    );
  });

  const components = (sets: ReadonlyArray<readonly string[]>, pathOf: (i: number) => string): { component: number[]; components: number[][] } => {
    // Union-find: overlapping sets form one component.
    const parent = problem.groups.map((_, g) => g);
    const find = (g: number): number => {
      let root = g;
      while (parent[root] !== root) root = parent[root] ?? root;
      return root;
    };
    sets.forEach((set, i) => {
      if (!Array.isArray(set)) throw invalid(`${pathOf(i)} must be a list of group ids.`, pathOf(i));
      const members = set.map((id, j) => {
        const g = groupIndex.get(id);
        if (g === undefined) throw invalid(`${pathOf(i)} names group "${id}", which is not in the problem.`, `${pathOf(i)}[${j}]`);
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
    const list = [...byRoot.values()].filter((members) => members.length > 1).sort((a, b) => (a[0] ?? 0) - (b[0] ?? 0));
    const component = problem.groups.map(() => -1);
    list.forEach((members, c) => members.forEach((g) => (component[g] = c)));
    return { component, components: list };
  };

  const couplings: Coupling[] = [{ name: 'key', kind: 'key', label: (c) => c.key, ...components(problem.sameKeyGroups ?? [], (i) => `sameKeyGroups[${i}]`) }];
  const attributeSets = problem.sameAttributeGroups ?? [];
  if (!Array.isArray(attributeSets)) throw invalid('sameAttributeGroups must be a list.', 'sameAttributeGroups');
  const attributeNames: string[] = [];
  attributeSets.forEach((entry, i) => {
    if (!entry || typeof entry.attribute !== 'string' || entry.attribute.length === 0) {
      throw invalid(`sameAttributeGroups[${i}].attribute must be a non-empty string.`, `sameAttributeGroups[${i}].attribute`);
    }
    if (!attributeNames.includes(entry.attribute)) attributeNames.push(entry.attribute);
  });
  for (const name of attributeNames) {
    const indices = attributeSets.map((entry, i) => ({ entry, i })).filter(({ entry }) => entry.attribute === name);
    const coupled = components(
      indices.map(({ entry }) => entry.groups),
      (j) => `sameAttributeGroups[${indices[j]?.i ?? j}].groups`,
    );
    // Every candidate of a coupled group needs the attribute.
    problem.groups.forEach((group, g) => {
      if ((coupled.component[g] ?? -1) >= 0) group.candidates.forEach((c, s) => attributeOf(c, name, g, s, `sameAttributeGroups on "${name}"`));
    });
    couplings.push({ name, kind: 'attribute', label: (c) => String(c.attributes?.[name]), ...coupled });
  }

  return {
    groups: problem.groups,
    feasible: problem.groups.map((group, g) =>
      group.candidates
        .map((candidate, position) => ({ candidate, position }))
        .filter((entry) => entry.candidate.feasible && (withinLimits[g]?.[entry.position] ?? false)),
    ),
    maxDistinctKeys: k,
    distinctKeyCost: keyCost,
    couplings,
  };
}

export function quoted(ids: readonly string[]): string {
  return ids.map((id) => `"${id}"`).join(', ');
}

/** What a coupling requires, for messages. */
function couplingPhrase(coupling: Coupling): string {
  return coupling.kind === 'key' ? 'a key' : `the same value of attribute "${coupling.name}"`;
}

/**
 * Reasons for infeasibility that need no search: groups with no feasible candidate (within their
 * limits), and coupled components with no label that is feasible in all of their groups.
 */
export function immediateInfeasibility(p: IndexedProblem): { explanation: string; conflictingGroups: string[] } | undefined {
  const empty = p.groups.filter((_, g) => (p.feasible[g] ?? []).length === 0).map((group) => group.id);
  if (empty.length > 0) {
    const limited = p.groups.some((group) => empty.includes(group.id) && Object.keys(group.limits ?? {}).length > 0);
    return {
      explanation: `${empty.length === 1 ? 'Group' : 'Groups'} ${quoted(empty)} ${empty.length === 1 ? 'has' : 'have'} no feasible candidate${limited ? ' within the limits' : ''}.`,
      conflictingGroups: empty,
    };
  }
  const messages: string[] = [];
  const conflicting: string[] = [];
  for (const coupling of p.couplings) {
    for (const members of coupling.components) {
      if (commonLabels(p, coupling, members).length === 0) {
        const ids = members.map((g) => p.groups[g]?.id ?? '');
        messages.push(
          coupling.kind === 'key'
            ? `Groups ${quoted(ids)} must share a key, but no key has a feasible candidate in all of them.`
            : `Groups ${quoted(ids)} must share ${couplingPhrase(coupling)}, but no value has a feasible candidate in all of them.`,
        );
        conflicting.push(...ids.filter((id) => !conflicting.includes(id)));
      }
    }
  }
  return messages.length > 0 ? { explanation: messages.join(' '), conflictingGroups: conflicting } : undefined;
}

/** Labels with a feasible candidate in every group of a component, in the order of the first group. */
export function commonLabels(p: IndexedProblem, coupling: Coupling, members: readonly number[]): string[] {
  const [first, ...rest] = members;
  const labels = [...new Set((p.feasible[first ?? -1] ?? []).map((e) => coupling.label(e.candidate)))];
  return labels.filter((label) => rest.every((g) => (p.feasible[g] ?? []).some((e) => coupling.label(e.candidate) === label)));
}

/**
 * Feasible candidates of each group whose labels can meet every coupling (labels common to the
 * group's component, for each coupling kind). Necessary, not sufficient, for a joint solution.
 */
export function couplableCandidates(p: IndexedProblem): IndexedCandidate[][] {
  const allowedLabels = p.couplings.map((coupling) => coupling.components.map((members) => new Set(commonLabels(p, coupling, members))));
  return p.feasible.map((list, g) =>
    list.filter((e) =>
      p.couplings.every((coupling, k) => {
        const c = coupling.component[g] ?? -1;
        return c < 0 || (allowedLabels[k]?.[c]?.has(coupling.label(e.candidate)) ?? false);
      }),
    ),
  );
}

/** Couplings that a group takes part in. */
export function couplingsOf(p: IndexedProblem, g: number): Coupling[] {
  return p.couplings.filter((coupling) => (coupling.component[g] ?? -1) >= 0);
}

/** Infeasible-result value. */
export function infeasibleResult(explanation: string, conflictingGroups: string[]): SelectionResult {
  return { status: 'infeasible', choice: {}, objective: Number.POSITIVE_INFINITY, gap: null, explanation, conflictingGroups };
}

/** Total cost of a choice (one candidate per group): costs summed in group order, plus the distinct-key cost. */
export function totalCost(chosen: readonly SelectionCandidate[], distinctKeyCost = 0): number {
  let sum = 0;
  for (const c of chosen) sum += c.cost;
  if (distinctKeyCost > 0) sum += distinctKeyCost * new Set(chosen.map((c) => c.key)).size;
  return sum;
}
