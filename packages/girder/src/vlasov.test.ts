import { describe, expect, it } from 'vitest';
import { analyse } from './analyse.js';
import type { Dof, GirderModel, LoadCase, SectionStiffness, Support } from './model.js';

// HE 300 B: I_t = 185.0 cm4, I_w = 1688e3 cm6 (EN 10365 tables, REFERENCES.md section 3 and 5);
// E = 210 GPa, G = 81 GPa.
const heb300: SectionStiffness = { A: 149.1e-4, Iy: 25170e-8, Iz: 8563e-8, It: 185.0e-8, Iw: 1688e-9, E: 210e9, G: 81e9, density: 7850 };
const { E, G, It, Iw } = heb300;
const GIt = G * It;
const lambda = Math.sqrt((G * It) / (E * Iw));

/** Straight member along X, `segments` elements, nodes N0..Nn. */
function member(length: number, segments: number, supports: Support[], loadCase: LoadCase): GirderModel {
  return {
    nodes: Array.from({ length: segments + 1 }, (_, i) => ({ id: `N${i}`, x: (length * i) / segments, y: 0, z: 0 })),
    elements: Array.from({ length: segments }, (_, i) => ({ id: `E${i}`, nodeI: `N${i}`, nodeJ: `N${i + 1}`, section: 'HEB300' })),
    sections: { HEB300: heb300 },
    supports,
    springs: [],
    loadCases: [loadCase],
  };
}

const all: Dof[] = ['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'];
const combination = { name: 'T', factors: { T: 1 } };

describe('Vlasov warping torsion of HE 300 B (derived from Vlasov theory; AISC Design Guide 9 gives the same cases)', () => {
  it('cantilever L = 3 m, warping fixed at the root, end torque 10 kNm: phi_tip and root bimoment', () => {
    const L = 3;
    const T = 10e3;
    for (const segments of [1, 3, 8]) {
      const model = member(L, segments, [{ node: 'N0', fix: all }], {
        name: 'T',
        lineLoads: [],
        nodalLoads: [{ node: `N${segments}`, force: [0, 0, 0], moment: [T, 0, 0] }],
      });
      const result = analyse(model, combination, { stationsPerElement: 3 });
      const phiTip = result.displacements[segments]?.rx ?? 0;
      // phi_tip = T/(G It lambda) (lambda L - tanh lambda L) (REFERENCES.md 3, [derived]); 0.10163 rad.
      expect(phiTip).toBeCloseTo((T / (GIt * lambda)) * (lambda * L - Math.tanh(lambda * L)), 12);
      expect(phiTip).toBeCloseTo(0.10163, 5);
      const root = result.stations.find((s) => s.element === 'E0' && s.x === 0);
      // B_root = (T/lambda) tanh(lambda L) = 14.771 kNm2, positive with B = E Iw phi'' (phi is convex
      // at a warping-fixed root loaded by a positive torque).
      expect(root?.B).toBeCloseTo((T / lambda) * Math.tanh(lambda * L), 6);
      expect((root?.B ?? 0) / 1e3).toBeCloseTo(14.771, 3);
      // At the warping-fixed root phi' = 0: all torque is warping torque.
      expect(root?.Tw).toBeCloseTo(T, 6);
      expect(root?.Tsv).toBeCloseTo(0, 6);
      // The support applies −B_root as the generalised force on w, and −T about x.
      const reaction = result.reactions[0];
      expect(reaction?.bimoment).toBeCloseTo(-(T / lambda) * Math.tanh(lambda * L), 6);
      expect(reaction?.moment[0]).toBeCloseTo(-T, 6);
      // At the free tip B = 0 (warping free) and, from phi = T/(G It lambda)(lambda x - sinh lambda x
      // + tanh(lambda L)(cosh lambda x - 1)), Tsv = T (1 - 1/cosh(lambda L)) (closed form, same derivation).
      const tip = result.stations.find((s) => s.element === `E${segments - 1}` && s.x > 0 && Math.abs(s.x - L / segments) < 1e-12);
      expect(tip?.B).toBeCloseTo(0, 6);
      expect(tip?.Tsv).toBeCloseTo(T * (1 - 1 / Math.cosh(lambda * L)), 6);
    }
  });

  it('fork supports at both ends, torque T at mid-span: phi_mid, B_mid (negative: B = E Iw phi\'\' and phi is concave there)', () => {
    const L = 6;
    const T = 10e3;
    const fork = (node: string, axial: boolean): Support => ({ node, fix: [...(axial ? (['ux'] as Dof[]) : []), 'uy', 'uz', 'rx'] });
    const model = member(L, 2, [fork('N0', true), fork('N2', false)], {
      name: 'T',
      lineLoads: [],
      nodalLoads: [{ node: 'N1', force: [0, 0, 0], moment: [T, 0, 0] }],
    });
    const result = analyse(model, combination);
    const h = (lambda * L) / 2;
    // phi_mid = T/(2 G It lambda) (lambda L/2 - tanh(lambda L/2)) (REFERENCES.md 3, [derived]).
    expect(result.displacements[1]?.rx).toBeCloseTo((T / (2 * GIt * lambda)) * (h - Math.tanh(h)), 12);
    // B_mid = T tanh(lambda L/2)/(2 lambda) in magnitude; with B = E Iw phi'' it is negative under a positive torque.
    for (const s of result.stations.filter((x) => (x.element === 'E0' && x.x === L / 2) || (x.element === 'E1' && x.x === 0))) {
      expect(s.B).toBeCloseTo(-(T * Math.tanh(h)) / (2 * lambda), 6);
    }
    // Fork ends: B = 0.
    expect(result.stations[0]?.B).toBeCloseTo(0, 6);
    expect(result.stations[result.stations.length - 1]?.B).toBeCloseTo(0, 6);
  });

  it('fork supports, uniform torque from an eccentric line load: B_mid = (m/lambda^2)(1 - sech(lambda L/2)) in magnitude, M_mid = q L^2/8', () => {
    const L = 6;
    const q = 20e3;
    const e = 0.1;
    const fork = (node: string, axial: boolean): Support => ({ node, fix: [...(axial ? (['ux'] as Dof[]) : []), 'uy', 'uz', 'rx'] });
    // q along −Z at e along +Y: m = e × q = (0, e, 0) × (0, 0, −q) = (−e q, 0, 0).
    const m = -e * q;
    const segments = 4;
    const model = member(L, segments, [fork('N0', true), fork(`N${segments}`, false)], {
      name: 'T',
      lineLoads: Array.from({ length: segments }, (_, i) => ({ element: `E${i}`, q: [0, 0, -q] as [number, number, number], offset: [0, e, 0] as [number, number, number] })),
      nodalLoads: [],
    });
    const result = analyse(model, combination, { stationsPerElement: 3 });
    const h = (lambda * L) / 2;
    const middle = result.stations.find((s) => s.element === 'E1' && Math.abs(s.x - L / 4) < 1e-12);
    // REFERENCES.md 3 [derived]: |B_mid| = (m/lambda^2)(1 - sech(lambda L/2)); sign: B'' - lambda^2 B = m with
    // B(0) = B(L) = 0 gives B_mid = -(m/lambda^2)(1 - sech(lambda L/2)).
    expect(middle?.B).toBeCloseTo(-(m / lambda ** 2) * (1 - 1 / Math.cosh(h)), 6);
    // Statics, T' = −m: zero at mid-span by symmetry, so T(0) = m L/2.
    expect(middle?.T).toBeCloseTo(0, 6);
    expect(result.stations[0]?.T).toBeCloseTo((m * L) / 2, 6);
    // Simply supported beam, sagging q L^2/8, negative in our convention (My = ∫σ z dA).
    expect(middle?.My).toBeCloseTo((-q * L * L) / 8, 6);
    // phi_mid from the same derivation: (m/(G It lambda^2)) ((lambda L)^2/8 - (1 - sech(lambda L/2))).
    const phiMid = (m / (GIt * lambda ** 2)) * (h ** 2 / 2 - (1 - 1 / Math.cosh(h)));
    expect((result.displacements[2]?.rx ?? 0) / phiMid).toBeCloseTo(1, 10);
  });
});
