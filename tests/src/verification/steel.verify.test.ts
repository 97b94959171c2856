import { describe, it } from 'vitest';
import { boltGeometry, checkBoltedFlangeTension, checkLateralTorsionalBuckling, rolledSection, steelGrade, weldedBoxSection } from '@binsupport/steel';
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

  it('cap bolts: bolt tension resistance and the T-stub of a bolted flange', () => {
    // EN 1993-1-8 Table 3.4: F_t,Rd = 0.9 f_ub A_s / gamma_M2; M20 8.8 (A_s = 245 mm2, ISO 898-1)
    // is tabulated at 141 kN in connection design tables (from memory).
    const g = boltGeometry({ size: 'M20', boltClass: '8.8' });
    check({ id: 'S-bolt-FtRd', title: 'M20 8.8 bolt tension resistance F_t,Rd', source: 'EN 1993-1-8 Table 3.4; tabulated 141 kN (from memory)', kind: 'from memory', expected: 141.1e3, computed: (0.9 * g.fub * g.tensileStressArea) / 1.25, tolerance: 0.001, unit: 'N' });
    // HE 300 B flange, 2 M20 8.8 each side at 100 mm from the web, 300 mm cap: Table 6.2 modes
    // 861 / 370 / 282 kN, mode 3 governs: 2 x 141.12 kN (worked by hand in steel/bolts.test.ts).
    const tStub = checkBoltedFlangeTension({ bolt: { size: 'M20', boltClass: '8.8' }, bolts: 2, tension: 100e3, gauge: 0.1, capLength: 0.3, flangeWidth: 0.3, flangeThickness: 0.019, webThickness: 0.011, rootRadius: 0.027, flangeYieldStrength: 345e6, flangeUltimateStrength: 470e6 });
    check({ id: 'S-tstub-FTRd', title: 'Bolted HE 300 B flange, 2 M20 8.8 per side: T-stub resistance', source: 'EN 1993-1-8 6.2.4 Table 6.2 (modes 1-3), Table 6.4 effective lengths (from memory)', kind: 'closed form', expected: 282.24e3, computed: tStub.intermediate['FTRd'] ?? Number.NaN, tolerance: 0.0005, unit: 'N' });
  });

  it('welded box: St Venant torsion constant of a closed cell', () => {
    // Bredt-Batho: I_t = 4 A_m^2 / (sum s/t); a flush-web square box 400 x 400 x 10 x 10 has its
    // mid-line square of side 0.39 m, so I_t = 4 (0.39^2)^2 / (4 x 0.39 / 0.01) = 0.39^3 x 0.01.
    const box = weldedBoxSection({ depth: 0.4, flangeWidth: 0.4, webThickness: 0.01, flangeThickness: 0.01, flangeOutstand: 0 });
    check({ id: 'S-box-It', title: 'Welded square box 400 x 10: Bredt torsion constant', source: 'Bredt-Batho formula for a thin-walled closed section (e.g. Timoshenko and Goodier, Theory of Elasticity, torsion of thin tubes)', kind: 'closed form', expected: 0.39 ** 3 * 0.01, computed: box.properties.torsionConstant, tolerance: 1e-9, unit: 'm4' });
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
