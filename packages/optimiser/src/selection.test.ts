import { describe, expect, it } from 'vitest';
import { bruteForceSelection, OptimiserError, relaxationBound, solveSelection } from './index.js';
import type { SelectionProblem, SelectionResult } from './index.js';

/** mulberry32: a small seeded PRNG, so every run draws the same problems. */
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

function randomProblem(random: () => number, caseNumber: number): SelectionProblem {
  const int = (lo: number, hi: number): number => lo + Math.floor(random() * (hi - lo + 1));
  const keys = ['A', 'B', 'C', 'D', 'E'].slice(0, int(1, 5));
  const groupCount = int(1, 5);
  const integerCosts = random() < 0.6; // integer costs make ties common
  const groups = Array.from({ length: groupCount }, (_, g) => ({
    id: `g${g}`,
    candidates: Array.from({ length: int(g === 0 ? 1 : 0, 5) }, (_, s) => ({
      id: `c${s}`,
      key: keys[int(0, keys.length - 1)] ?? 'A',
      cost: integerCosts ? int(1, 6) : Math.round(random() * 1000) / 100,
      feasible: random() < 0.8,
    })),
  }));
  const problem: SelectionProblem = { groups };
  if (random() < 0.6) problem.maxDistinctKeys = int(1, 3);
  if (random() < 0.5 && groupCount > 1) {
    problem.sameKeyGroups = Array.from({ length: int(1, 2) }, () => {
      const size = int(2, Math.min(3, groupCount));
      const ids = [...groups.map((g) => g.id)].sort(() => random() - 0.5).slice(0, size);
      return ids;
    });
  }
  if (caseNumber % 50 === 0) problem.maxDistinctKeys = 0;
  return problem;
}

function expectSame(glpkResult: SelectionResult, reference: SelectionResult, label: string): void {
  expect(glpkResult.status, label).toBe(reference.status);
  expect(glpkResult.choice, label).toEqual(reference.choice);
  expect(glpkResult.objective, label).toBe(reference.objective);
  if (reference.status === 'infeasible') {
    expect(glpkResult.objective).toBe(Number.POSITIVE_INFINITY);
    expect(glpkResult.gap).toBeNull();
    expect(glpkResult.explanation ?? '', label).not.toBe('');
    expect(glpkResult.conflictingGroups.length, label).toBeGreaterThan(0);
  } else {
    expect(glpkResult.gap).toBe(0);
  }
}

describe('solveSelection against exhaustive enumeration', () => {
  it('agrees with brute force on 400 seeded random problems (with and without coupling, some infeasible)', async () => {
    const random = prng(20240611);
    const tally = { infeasible: 0, keyCapInfeasible: 0, coupled: 0, capped: 0, optimal: 0 };
    for (let n = 0; n < 400; n++) {
      const problem = randomProblem(random, n);
      const reference = bruteForceSelection(problem);
      const result = await solveSelection(problem);
      expectSame(result, reference, `case ${n}: ${JSON.stringify(problem)}`);
      if (reference.status === 'infeasible') tally.infeasible++;
      else tally.optimal++;
      if (reference.explanation?.includes('maxDistinctKeys')) tally.keyCapInfeasible++;
      if (problem.sameKeyGroups) tally.coupled++;
      if (problem.maxDistinctKeys !== undefined) tally.capped++;
    }
    // The draw must exercise every branch, or the agreement proves little.
    expect(tally.optimal).toBeGreaterThan(150);
    expect(tally.infeasible).toBeGreaterThan(40);
    expect(tally.keyCapInfeasible).toBeGreaterThan(10);
    expect(tally.coupled).toBeGreaterThan(100);
    expect(tally.capped).toBeGreaterThan(150);
  });

  it('agrees with brute force on larger problems (6 groups x 8 candidates, distinct-key cap)', async () => {
    const random = prng(7);
    for (let n = 0; n < 12; n++) {
      const groups = Array.from({ length: 6 }, (_, g) => ({
        id: `member-${g}`,
        candidates: Array.from({ length: 8 }, (_, s) => ({
          id: `section-${s}`,
          key: `S${(s + Math.floor(random() * 3)) % 8}`,
          cost: 10 + s * 3 + Math.floor(random() * 6),
          feasible: random() < 0.85,
        })),
      }));
      const problem: SelectionProblem = { groups, maxDistinctKeys: 1 + (n % 3), sameKeyGroups: n % 2 === 0 ? [['member-0', 'member-5']] : [] };
      expectSame(await solveSelection(problem), bruteForceSelection(problem), `large case ${n}`);
    }
  });

  it('gives the same choice every time for the same input', async () => {
    const problem: SelectionProblem = {
      groups: [
        { id: 'a', candidates: [{ id: 'p', key: 'K1', cost: 2, feasible: true }, { id: 'q', key: 'K2', cost: 2, feasible: true }] },
        { id: 'b', candidates: [{ id: 'r', key: 'K2', cost: 1, feasible: true }, { id: 's', key: 'K1', cost: 1, feasible: true }] },
      ],
      maxDistinctKeys: 1,
    };
    const first = await solveSelection(problem);
    // Both {a: p, b: s} and {a: q, b: r} cost 3; candidate order decides: a takes its first candidate p.
    expect(first.choice).toEqual({ a: 'p', b: 's' });
    for (let i = 0; i < 5; i++) expect(await solveSelection(problem)).toEqual(first);
  });
});

/**
 * Random problems with every kind of constraint: attributes (depth 1-3, grade 235/355) on every
 * candidate, group limits, same-attribute couplings, same-key couplings, a key cap and a cost per key.
 */
function randomExtendedProblem(random: () => number): SelectionProblem {
  const int = (lo: number, hi: number): number => lo + Math.floor(random() * (hi - lo + 1));
  const keys = ['A', 'B', 'C', 'D'].slice(0, int(1, 4));
  const groupCount = int(1, 4);
  const groups = Array.from({ length: groupCount }, (_, g) => {
    const group: SelectionProblem['groups'][number] = {
      id: `g${g}`,
      candidates: Array.from({ length: int(1, 5) }, (_, s) => ({
        id: `c${s}`,
        key: keys[int(0, keys.length - 1)] ?? 'A',
        cost: int(1, 6),
        feasible: random() < 0.85,
        attributes: { depth: int(1, 3), grade: random() < 0.5 ? 235 : 355 },
      })),
    };
    if (random() < 0.3) group.limits = random() < 0.5 ? { depth: { max: int(1, 3) } } : { depth: { min: int(1, 3) }, grade: { max: 300 } };
    return group;
  });
  const ids = groups.map((g) => g.id);
  const subset = (): string[] => [...ids].sort(() => random() - 0.5).slice(0, int(2, Math.max(2, groupCount)));
  const problem: SelectionProblem = { groups };
  if (groupCount > 1 && random() < 0.6) {
    problem.sameAttributeGroups = [{ groups: subset(), attribute: random() < 0.6 ? 'depth' : 'grade' }];
    if (random() < 0.3) problem.sameAttributeGroups.push({ groups: subset(), attribute: 'depth' });
  }
  if (groupCount > 1 && random() < 0.3) problem.sameKeyGroups = [subset()];
  if (random() < 0.4) problem.maxDistinctKeys = int(1, 3);
  if (random() < 0.5) problem.distinctKeyCost = [0.5, 2, 5][int(0, 2)] ?? 0;
  return problem;
}

describe('solveSelection against exhaustive enumeration, attribute limits and couplings', () => {
  it('agrees with brute force on 400 seeded problems with limits, same-attribute couplings and key costs', async () => {
    const random = prng(20261202);
    const tally = { infeasible: 0, couplingConflict: 0, limitInfeasible: 0, attributeCoupled: 0, keyCost: 0, optimal: 0 };
    for (let n = 0; n < 400; n++) {
      const problem = randomExtendedProblem(random);
      const reference = bruteForceSelection(problem);
      const result = await solveSelection(problem);
      expectSame(result, reference, `extended case ${n}: ${JSON.stringify(problem)}`);
      if (reference.status === 'infeasible') tally.infeasible++;
      else tally.optimal++;
      if (reference.explanation?.includes('within the limits')) tally.limitInfeasible++;
      if (reference.explanation?.includes('cannot meet') || reference.explanation?.includes('the same value of attribute')) tally.couplingConflict++;
      if (problem.sameAttributeGroups) tally.attributeCoupled++;
      if (problem.distinctKeyCost) tally.keyCost++;
    }
    // Every branch must be exercised, or the agreement proves little.
    expect(tally.optimal).toBeGreaterThan(150);
    expect(tally.infeasible).toBeGreaterThan(30);
    expect(tally.couplingConflict).toBeGreaterThan(10);
    expect(tally.limitInfeasible).toBeGreaterThan(5);
    expect(tally.attributeCoupled).toBeGreaterThan(150);
    expect(tally.keyCost).toBeGreaterThan(100);
  });

  it('the LP relaxation bound never exceeds the enumerated optimum, and equals it without couplings', async () => {
    const random = prng(99);
    let compared = 0;
    for (let n = 0; n < 150; n++) {
      const problem = randomExtendedProblem(random);
      const reference = bruteForceSelection(problem);
      if (reference.status !== 'optimal') continue;
      const bound = await relaxationBound(problem);
      expect(bound, `case ${n}`).not.toBeNull();
      expect(bound ?? Number.POSITIVE_INFINITY, `case ${n}`).toBeLessThanOrEqual(reference.objective + 1e-9);
      compared++;
    }
    expect(compared).toBeGreaterThan(60);
    // One candidate per group and nothing else: the assignment LP has integral optima (by hand: 1 + 2).
    const plain: SelectionProblem = {
      groups: [
        { id: 'a', candidates: [{ id: 'p', key: 'K1', cost: 3, feasible: true }, { id: 'q', key: 'K2', cost: 1, feasible: true }] },
        { id: 'b', candidates: [{ id: 'r', key: 'K1', cost: 2, feasible: true }, { id: 's', key: 'K3', cost: 4, feasible: true }] },
      ],
    };
    expect(await relaxationBound(plain)).toBeCloseTo(3, 9);
  });
});

describe('solveSelection cases worked by hand', () => {
  it('a single group takes its cheapest feasible candidate, the first of equals', async () => {
    const problem: SelectionProblem = {
      groups: [
        {
          id: 'ring',
          candidates: [
            { id: 'IPE 300', key: 'IPE 300', cost: 42.2, feasible: false },
            { id: 'IPE 330', key: 'IPE 330', cost: 49.1, feasible: true },
            { id: 'HE 200 B', key: 'HE 200 B', cost: 61.3, feasible: true },
            { id: 'IPE 330 again', key: 'IPE 330', cost: 49.1, feasible: true },
          ],
        },
      ],
    };
    const result = await solveSelection(problem);
    expect(result).toEqual({ status: 'optimal', choice: { ring: 'IPE 330' }, objective: 49.1, gap: 0, explanation: null, conflictingGroups: [] });
    expect(bruteForceSelection(problem)).toEqual(result);
  });

  it('a distinct-key cap can make a dearer candidate the right one', async () => {
    // Alone, a takes X (1) and b takes Y (1): total 2 with two keys. With one key allowed the best is
    // both on Y (3 + 1 = 4) rather than both on X (1 + 5 = 6).
    const problem: SelectionProblem = {
      groups: [
        { id: 'a', candidates: [{ id: 'ax', key: 'X', cost: 1, feasible: true }, { id: 'ay', key: 'Y', cost: 3, feasible: true }] },
        { id: 'b', candidates: [{ id: 'bx', key: 'X', cost: 5, feasible: true }, { id: 'by', key: 'Y', cost: 1, feasible: true }] },
      ],
    };
    expect((await solveSelection(problem)).choice).toEqual({ a: 'ax', b: 'by' });
    const capped = await solveSelection({ ...problem, maxDistinctKeys: 1 });
    expect(capped.choice).toEqual({ a: 'ay', b: 'by' });
    expect(capped.objective).toBe(4);
    const shared = await solveSelection({ ...problem, sameKeyGroups: [['a', 'b']] });
    expect(shared.choice).toEqual({ a: 'ay', b: 'by' });
  });

  it('names the groups that have no feasible candidate', async () => {
    const problem: SelectionProblem = {
      groups: [
        { id: 'ring', candidates: [{ id: 'c1', key: 'K', cost: 1, feasible: false }] },
        { id: 'column', candidates: [] },
        { id: 'bracket', candidates: [{ id: 'c2', key: 'K', cost: 1, feasible: true }] },
      ],
    };
    const expected: SelectionResult = {
      status: 'infeasible',
      choice: {},
      objective: Number.POSITIVE_INFINITY,
      gap: null,
      explanation: 'Groups "ring", "column" have no feasible candidate.',
      conflictingGroups: ['ring', 'column'],
    };
    expect(await solveSelection(problem)).toEqual(expected);
    expect(bruteForceSelection(problem)).toEqual(expected);
  });

  it('names same-key groups without a common feasible key', async () => {
    const problem: SelectionProblem = {
      groups: [
        { id: 'north', candidates: [{ id: 'n1', key: 'IPE 400', cost: 1, feasible: true }] },
        { id: 'south', candidates: [{ id: 's1', key: 'IPE 450', cost: 1, feasible: true }, { id: 's2', key: 'IPE 400', cost: 1, feasible: false }] },
        { id: 'east', candidates: [{ id: 'e1', key: 'IPE 450', cost: 1, feasible: true }] },
      ],
      sameKeyGroups: [['north', 'south']],
    };
    const result = await solveSelection(problem);
    expect(result.status).toBe('infeasible');
    expect(result.explanation).toBe('Groups "north", "south" must share a key, but no key has a feasible candidate in all of them.');
    expect(result.conflictingGroups).toEqual(['north', 'south']);
  });

  it('explains a distinct-key cap that cannot be met with the smallest set of groups that needs more keys', async () => {
    // a, b and c each allow only their own key; d allows any. Three keys are needed, the cap is 2,
    // and d is not part of the conflict.
    const only = (id: string, key: string): SelectionProblem['groups'][number] => ({ id, candidates: [{ id: `${id}-${key}`, key, cost: 1, feasible: true }] });
    const problem: SelectionProblem = {
      groups: [
        only('a', 'K1'),
        { id: 'd', candidates: ['K1', 'K2', 'K3'].map((key) => ({ id: `d-${key}`, key, cost: 1, feasible: true })) },
        only('b', 'K2'),
        only('c', 'K3'),
      ],
      maxDistinctKeys: 2,
    };
    const result = await solveSelection(problem);
    expect(result.status).toBe('infeasible');
    expect(result.explanation).toBe(
      'Groups "a", "b", "c" need at least 3 distinct keys between them (counting their same-key couplings), but maxDistinctKeys is 2.',
    );
    expect(result.conflictingGroups).toEqual(['a', 'b', 'c']);
    expect(bruteForceSelection(problem).status).toBe('infeasible');
  });

  it('limits on attributes exclude candidates (a depth limit)', async () => {
    // The cheapest ring candidate is 0.6 m deep; with maxDepth 0.5 the next one wins.
    const problem: SelectionProblem = {
      groups: [
        {
          id: 'ring',
          limits: { depth: { max: 0.5 }, flangeWidth: { min: 0.2 } },
          candidates: [
            { id: 'deep', key: 'D600', cost: 10, feasible: true, attributes: { depth: 0.6, flangeWidth: 0.22 } },
            { id: 'narrow', key: 'N450', cost: 11, feasible: true, attributes: { depth: 0.45, flangeWidth: 0.19 } },
            { id: 'fits', key: 'F500', cost: 12, feasible: true, attributes: { depth: 0.5, flangeWidth: 0.2 } },
          ],
        },
      ],
    };
    expect((await solveSelection(problem)).choice).toEqual({ ring: 'fits' });
    expect(bruteForceSelection(problem).choice).toEqual({ ring: 'fits' });
    const tooTight: SelectionProblem = { groups: [{ ...problem.groups[0]!, limits: { depth: { max: 0.3 } } }] };
    expect((await solveSelection(tooTight)).explanation).toBe('Group "ring" has no feasible candidate within the limits.');
  });

  it('same-attribute groups share a depth; one grade for all through a grade attribute', async () => {
    // Alone: a takes a400 (cost 4, depth 400) and b takes b500 (3, depth 500). Same depth: 400 -> 4 + 5 = 9,
    // 500 -> 6 + 3 = 9: a tie, broken by candidate order in group a (a400 first).
    const c = (id: string, cost: number, depth: number, grade: number): SelectionProblem['groups'][number]['candidates'][number] => ({
      id,
      key: `${id} S${grade}`,
      cost,
      feasible: true,
      attributes: { depth, grade },
    });
    const problem: SelectionProblem = {
      groups: [
        { id: 'a', candidates: [c('a400', 4, 400, 355), c('a500', 6, 500, 235)] },
        { id: 'b', candidates: [c('b400', 5, 400, 235), c('b500', 3, 500, 355)] },
      ],
    };
    expect((await solveSelection(problem)).choice).toEqual({ a: 'a400', b: 'b500' });
    const sameDepth = { ...problem, sameAttributeGroups: [{ groups: ['a', 'b'], attribute: 'depth' }] };
    const solved = await solveSelection(sameDepth);
    expect(solved.choice).toEqual({ a: 'a400', b: 'b400' });
    expect(solved.objective).toBe(9);
    expect(bruteForceSelection(sameDepth)).toEqual(solved);
    // Same depth and one grade: 400 mixes S355 and S235, 500 mixes S235 and S355: nothing is left.
    const oneGrade = { ...sameDepth, sameAttributeGroups: [...sameDepth.sameAttributeGroups, { groups: ['a', 'b'], attribute: 'grade' }] };
    const none = await solveSelection(oneGrade);
    expect(none.status).toBe('infeasible');
    expect(none.explanation).toBe('Groups "a", "b" cannot meet their same-key and same-attribute couplings together with their feasible candidates.');
    expect(bruteForceSelection(oneGrade).status).toBe('infeasible');
  });

  it('a cost per distinct key can make sharing a key the cheaper design', async () => {
    // Without it: a takes X (1), b takes Y (1), total 2. With 2.5 per key: X+Y = 2 + 5 = 7, both Y = 3 + 1 + 2.5 = 6.5,
    // both X = 1 + 5 + 2.5 = 8.5 (by hand).
    const problem: SelectionProblem = {
      groups: [
        { id: 'a', candidates: [{ id: 'ax', key: 'X', cost: 1, feasible: true }, { id: 'ay', key: 'Y', cost: 3, feasible: true }] },
        { id: 'b', candidates: [{ id: 'bx', key: 'X', cost: 5, feasible: true }, { id: 'by', key: 'Y', cost: 1, feasible: true }] },
      ],
      distinctKeyCost: 2.5,
    };
    const result = await solveSelection(problem);
    expect(result.choice).toEqual({ a: 'ay', b: 'by' });
    expect(result.objective).toBe(6.5);
    expect(bruteForceSelection(problem)).toEqual(result);
  });

  it('rejects a coupled or limited candidate without the attribute, and a negative key cost', async () => {
    const problem: SelectionProblem = {
      groups: [
        { id: 'a', candidates: [{ id: 'p', key: 'K', cost: 1, feasible: true, attributes: { depth: 1 } }] },
        { id: 'b', candidates: [{ id: 'q', key: 'K', cost: 1, feasible: true }] },
      ],
      sameAttributeGroups: [{ groups: ['a', 'b'], attribute: 'depth' }],
    };
    await expect(solveSelection(problem)).rejects.toThrowError(
      new OptimiserError('INVALID_PROBLEM', 'Candidate "q" of group "b" needs a finite attribute "depth" (sameAttributeGroups on "depth").', 'groups[1].candidates[0].attributes.depth'),
    );
    await expect(solveSelection({ groups: [], distinctKeyCost: -1 })).rejects.toThrowError(/distinctKeyCost must be a finite number of at least 0/);
  });

  it('solves an empty problem and accepts a time limit', async () => {
    expect(await solveSelection({ groups: [] })).toEqual({ status: 'optimal', choice: {}, objective: 0, gap: 0, explanation: null, conflictingGroups: [] });
    const problem: SelectionProblem = { groups: [{ id: 'g', candidates: [{ id: 'c', key: 'k', cost: 3, feasible: true }] }] };
    expect((await solveSelection(problem, { timeLimitSeconds: 5 })).choice).toEqual({ g: 'c' });
  });

  it('rejects malformed problems by code, path and message', async () => {
    const duplicate: SelectionProblem = {
      groups: [
        { id: 'g', candidates: [] },
        { id: 'g', candidates: [] },
      ],
    };
    await expect(solveSelection(duplicate)).rejects.toThrowError(
      new OptimiserError('INVALID_PROBLEM', 'Group id "g" appears twice (groups[0] and groups[1]).', 'groups[1].id'),
    );
    const unknown: SelectionProblem = { groups: [{ id: 'g', candidates: [] }], sameKeyGroups: [['g', 'h']] };
    expect(() => bruteForceSelection(unknown)).toThrowError(
      new OptimiserError('INVALID_PROBLEM', 'sameKeyGroups[0] names group "h", which is not in the problem.', 'sameKeyGroups[0][1]'),
    );
    const badCost: SelectionProblem = { groups: [{ id: 'g', candidates: [{ id: 'c', key: 'k', cost: Number.NaN, feasible: true }] }] };
    await expect(solveSelection(badCost)).rejects.toThrowError(/has cost NaN; a finite number is needed/);
    await expect(solveSelection({ groups: [] }, { timeLimitSeconds: 0 })).rejects.toThrowError(/timeLimitSeconds must be a positive number/);
    await expect(solveSelection({ groups: [], maxDistinctKeys: 1.5 })).rejects.toThrowError(/maxDistinctKeys must be a whole number/);
  });
});
