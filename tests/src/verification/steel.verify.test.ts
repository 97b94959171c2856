import { describe, it } from 'vitest';
import { checkLateralTorsionalBuckling, rolledSection, steelGrade } from '@binsupport/steel';
import { bruteForceSelection, solveSelection, type SelectionProblem } from '@binsupport/optimiser';
import { verificationSuite } from './registry.js';

const check = verificationSuite('steel');

describe('verification: sections, checks and selection', () => {
  it('IPE 300 properties from its dimensions against the published table', () => {
    // EN 10365 dimensions; tabulated properties (REFERENCES.md §5, seen in a public table).
    const p = rolledSection('IPE 300').properties;
    const source = 'EN 10365 section table (IPE 300 row)';
    check({ id: 'S-IPE300-A', title: 'IPE 300 area A', source, kind: 'published', expected: 53.81e-4, computed: p.area, tolerance: 0.0005, unit: 'm2' });
    check({ id: 'S-IPE300-Iy', title: 'IPE 300 second moment I_y', source, kind: 'published', expected: 8356e-8, computed: p.secondMomentOfAreaY, tolerance: 0.0005, unit: 'm4' });
    check({ id: 'S-IPE300-Wpl', title: 'IPE 300 plastic modulus W_pl,y', source, kind: 'published', expected: 628.4e-6, computed: p.plasticModulusY, tolerance: 0.0005, unit: 'm3' });
    check({ id: 'S-IPE300-It', title: 'IPE 300 torsion constant I_t', source, kind: 'published', expected: 20.12e-8, computed: p.torsionConstant, tolerance: 0.001, unit: 'm4' });
    check({ id: 'S-IPE300-Iw', title: 'IPE 300 warping constant I_w', source, kind: 'published', expected: 125.9e-9, computed: p.warpingConstant, tolerance: 0.001, unit: 'm6' });
  });

  it('elastic critical moment for lateral-torsional buckling', () => {
    // EN 1993-1-1 6.3.2 with M_cr = C1 (pi^2 E I_z / L^2) sqrt(I_w/I_z + L^2 G I_t / (pi^2 E I_z)), fork
    // supports, uniform moment: IPE 300, S235, L = 6 m gives 90.47 kNm (REFERENCES.md §6, derived).
    const result = checkLateralTorsionalBuckling(rolledSection('IPE 300'), steelGrade('S235'), 50e3, { length: 6 });
    check({ id: 'S-LTB-Mcr', title: 'IPE 300, 6 m, uniform moment: M_cr', source: 'EN 1993-1-1 6.3.2; M_cr formula for fork supports (REFERENCES.md §6)', kind: 'closed form', expected: 90.47e3, computed: result.intermediate['M_cr'] ?? Number.NaN, tolerance: 0.001, unit: 'N m' });
  });

  it('the integer program picks what exhaustive enumeration picks', async () => {
    // Independent check: brute-force enumeration of every choice, on seeded random problems.
    let seed = 20261201;
    const random = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
    let mismatches = 0;
    for (let trial = 0; trial < 60; trial++) {
      const problem: SelectionProblem = {
        groups: Array.from({ length: 3 }, (_, g) => ({ id: `G${g}`, candidates: Array.from({ length: 5 }, (_, c) => ({ id: `G${g}C${c}`, key: `K${Math.floor(random() * 4)}`, cost: Math.round(random() * 100) + 1, feasible: random() > 0.3 })) })),
        maxDistinctKeys: 1 + Math.floor(random() * 3),
      };
      const [mip, enumeration] = [await solveSelection(problem), bruteForceSelection(problem)];
      if (mip.status !== enumeration.status || (mip.status !== 'infeasible' && Math.abs(mip.objective - enumeration.objective) > 1e-9)) mismatches += 1;
    }
    check({ id: 'O-brute-force', title: 'glpk selection vs enumeration: mismatches in 60 random problems with a distinct-key cap', source: 'exhaustive enumeration (bruteForceSelection)', kind: 'independent library', expected: 0, computed: mismatches, tolerance: 0, unit: 'problems' });
  });
});
