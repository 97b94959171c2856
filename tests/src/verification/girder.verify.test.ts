import { describe, it } from 'vitest';
import { buildRingModel } from '@binsupport/design';
import { analyse, type Dof, type SectionStiffness } from '@binsupport/girder';
import { verificationSuite } from './registry.js';

const check = verificationSuite('girder');
// HE 300 B constants (EN 10365 tables; REFERENCES.md §3, §5): I_t 185.0 cm4, I_w 1688e3 cm6.
const heb300: SectionStiffness = { A: 149.1e-4, Iy: 25170e-8, Iz: 8563e-8, It: 185.0e-8, Iw: 1688e-9, E: 210e9, G: 81e9, density: 0 };

describe('verification: girder analysis', () => {
  it('ring on n equally spaced simple supports under a uniform load', () => {
    // Timoshenko, Strength of Materials Part II (ring loaded normally to its plane); Roark's Formulas
    // for Stress and Strain (circular ring beams): M_mid = q R^2 (a/sin a - 1), M_sup = -q R^2 (1 - a cot a),
    // T_max = q R^2 (t - a sin t / sin a) at cos t = sin a / a, a = pi/n.
    const R = 3;
    const q = 100e3;
    for (const n of [4, 8]) {
      const model = buildRingModel({
        layout: { radius: R, columns: n, segmentsPerSpan: 24 },
        section: heb300,
        sectionDepth: 0,
        cases: [{ name: 'Q', description: 'uniform load', kind: 'variable', lineRadius: R, verticalLineLoad: q, radialLineLoad: 0, verticalResultant: q * 2 * Math.PI * R }],
        selfWeightCase: 'none',
      });
      const result = analyse(model, { name: 'Q', factors: { Q: 1 } }, { stationsPerElement: 3 });
      const at = (k: number) => result.stations.find((s) => s.element === `RG${k + 1}` && s.x === 0);
      const a = Math.PI / n;
      const t = Math.acos(Math.sin(a) / a);
      const source = "Timoshenko, Strength of Materials Part II; Roark's Formulas, circular ring beams";
      check({ id: `G-ring-${n}-mid`, title: `ring on ${n} supports: mid-span moment (24 segments per span)`, source, kind: 'closed form', expected: q * R * R * (a / Math.sin(a) - 1), computed: -(at(12)?.My ?? 0), tolerance: 0.01, unit: 'N m' });
      check({ id: `G-ring-${n}-sup`, title: `ring on ${n} supports: support moment`, source, kind: 'closed form', expected: -q * R * R * (1 - a / Math.tan(a)), computed: -(at(0)?.My ?? 0), tolerance: 0.01, unit: 'N m' });
      check({ id: `G-ring-${n}-T`, title: `ring on ${n} supports: largest torque`, source, kind: 'closed form', expected: q * R * R * (t - (a * Math.sin(t)) / Math.sin(a)), computed: -Math.max(...result.stations.map((s) => Math.abs(s.T))), tolerance: 0.01, unit: 'N m' });
    }
  });

  it('cantilever I-beam with warping restrained at the root under an end torque', () => {
    // Vlasov theory (AISC Design Guide 9 gives the same case): phi_tip = T/(G I_t lambda)(lambda L - tanh lambda L),
    // B_root = (T/lambda) tanh(lambda L), lambda = sqrt(G I_t / (E I_w)).
    const L = 3;
    const T = 10e3;
    const all: Dof[] = ['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'];
    const segments = 4;
    const result = analyse(
      {
        nodes: Array.from({ length: segments + 1 }, (_, i) => ({ id: `N${i}`, x: (L * i) / segments, y: 0, z: 0 })),
        elements: Array.from({ length: segments }, (_, i) => ({ id: `E${i}`, nodeI: `N${i}`, nodeJ: `N${i + 1}`, section: 'S' })),
        sections: { S: heb300 },
        supports: [{ node: 'N0', fix: all }],
        springs: [],
        loadCases: [{ name: 'T', lineLoads: [], nodalLoads: [{ node: `N${segments}`, force: [0, 0, 0], moment: [T, 0, 0] }] }],
      },
      { name: 'T', factors: { T: 1 } },
    );
    const lambda = Math.sqrt((heb300.G * heb300.It) / (heb300.E * heb300.Iw));
    check({ id: 'G-vlasov-phi', title: 'HE 300 B cantilever, 3 m, 10 kNm: tip twist', source: 'Vlasov theory; AISC Design Guide 9 (cantilever, warping fixed)', kind: 'closed form', expected: (T / (heb300.G * heb300.It * lambda)) * (lambda * L - Math.tanh(lambda * L)), computed: result.displacements[segments]?.rx ?? 0, tolerance: 1e-9, unit: 'rad' });
    check({ id: 'G-vlasov-B', title: 'HE 300 B cantilever, 3 m, 10 kNm: root bimoment', source: 'Vlasov theory; AISC Design Guide 9 (cantilever, warping fixed)', kind: 'closed form', expected: (T / lambda) * Math.tanh(lambda * L), computed: result.stations.find((s) => s.element === 'E0' && s.x === 0)?.B ?? 0, tolerance: 1e-9, unit: 'N m2' });
  });
});
