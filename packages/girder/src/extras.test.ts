import { describe, expect, it } from 'vitest';
import { analyse, analyseAll } from './analyse.js';
import { prepareElements, prepareSprings, assembleLoads } from './assemble.js';
import { prepareContactSystem, solveContact } from './contact.js';
import { envelope } from './envelope.js';
import { GirderError } from './errors.js';
import { combineLoads } from './loads.js';
import type { GirderModel, SectionStiffness } from './model.js';
import { numberEquations } from './numbering.js';

// HE 300 B (EN 10365; REFERENCES.md sections 3 and 5).
const heb300: SectionStiffness = { A: 149.1e-4, Iy: 25170e-8, Iz: 8563e-8, It: 185.0e-8, Iw: 1688e-9, E: 210e9, G: 81e9, density: 7850 };

describe('warping release at a node', () => {
  // Symbols: cantilever of two parts L1 (root, warping fixed) and L2, torque T at the tip,
  // lambda = sqrt(G It/(E Iw)). REFERENCES.md section 3 [derived]: a cantilever with warping fixed
  // at the root and free at its end twists by T/(G It lambda)(lambda L1 − tanh lambda L1); the part
  // beyond a warping release warps freely at both ends under a constant torque, so it is in pure
  // St Venant torsion: T L2/(G It). The bimoment at the release is zero on both sides.
  const L1 = 3;
  const L2 = 2;
  const T = 10e3;
  const GIt = heb300.G * heb300.It;
  const lambda = Math.sqrt(GIt / (heb300.E * heb300.Iw));
  const model = (released: 'node' | 'element' | 'none'): GirderModel => ({
    nodes: [
      { id: 'A', x: 0, y: 0, z: 0 },
      { id: 'B', x: L1, y: 0, z: 0, ...(released === 'node' ? { warpingRelease: true } : {}) },
      { id: 'C', x: L1 + L2, y: 0, z: 0 },
    ],
    elements: [
      { id: 'AB', nodeI: 'A', nodeJ: 'B', section: 'S', ...(released === 'element' ? { warpingRelease: { J: true } } : {}) },
      { id: 'BC', nodeI: 'B', nodeJ: 'C', section: 'S', ...(released === 'element' ? { warpingRelease: { I: true } } : {}) },
    ],
    sections: { S: heb300 },
    supports: [{ node: 'A', fix: ['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'] }],
    springs: [],
    loadCases: [{ name: 'T', lineLoads: [], nodalLoads: [{ node: 'C', force: [0, 0, 0], moment: [T, 0, 0] }] }],
  });
  const C = { name: 'T', factors: { T: 1 } };

  it('released at node B (or at both element ends there): tip twist = warping cantilever + St Venant part', () => {
    const expected = (T / (GIt * lambda)) * (lambda * L1 - Math.tanh(lambda * L1)) + (T * L2) / GIt;
    for (const how of ['node', 'element'] as const) {
      const result = analyse(model(how), C);
      const tip = result.displacements.find((d) => d.node === 'C')?.rx ?? NaN;
      expect(Math.abs(tip / expected - 1)).toBeLessThan(1e-9);
      for (const s of result.stations.filter((st) => (st.element === 'AB' && st.x === L1) || (st.element === 'BC' && st.x === 0))) {
        expect(Math.abs(s.B)).toBeLessThan(1e-9 * T / lambda);
      }
      // A node release leaves the node's own warping freedom unused (reported 0).
      if (how === 'node') expect(result.displacements.find((d) => d.node === 'B')?.w).toBe(0);
    }
    // Continuous warping is stiffer (the second part is restrained by the first).
    const continuous = analyse(model('none'), C).displacements.find((d) => d.node === 'C')?.rx ?? NaN;
    expect(continuous).toBeLessThan(expected);
  });
});

describe('result envelopes', () => {
  it('max and min per station and resultant, with the combination that gave them', () => {
    const model: GirderModel = {
      nodes: [
        { id: 'A', x: 0, y: 0, z: 0 },
        { id: 'B', x: 2, y: 0, z: 0 },
      ],
      elements: [{ id: 'AB', nodeI: 'A', nodeJ: 'B', section: 'S' }],
      sections: { S: heb300 },
      supports: [{ node: 'A', fix: ['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'] }],
      springs: [],
      loadCases: [
        { name: 'G', lineLoads: [], nodalLoads: [{ node: 'B', force: [0, 0, -10e3] }] },
        { name: 'W', lineLoads: [], nodalLoads: [{ node: 'B', force: [0, 5e3, 0], moment: [1e3, 0, 0] }] },
      ],
    };
    const results = analyseAll(model, [
      { name: 'G', factors: { G: 1 } },
      { name: 'G+W', factors: { G: 1, W: 1.5 } },
      { name: 'G-W', factors: { G: 1, W: -1.5 } },
    ]);
    const env = envelope(results);
    expect(env).toHaveLength(results[0]?.stations.length ?? -1);
    // Cantilever statics: the lateral tip force 1.5 · 5 kN gives |Mz| = 1.5 · 5e3 · 2 at the root (x = 0).
    const root = env[0];
    expect(root?.max.Mz.value).toBeCloseTo(Math.max(...results.map((r) => r.stations[0]?.Mz ?? NaN)), 9);
    expect(Math.abs(root?.max.Mz.value ?? NaN)).toBeCloseTo(1.5 * 5e3 * 2, 6);
    expect(root?.max.T).toEqual({ value: results[1]?.stations[0]?.T, combination: 'G+W' });
    expect(root?.min.T).toEqual({ value: results[2]?.stations[0]?.T, combination: 'G-W' });
    // The first combination wins ties: My is the same in all three.
    expect(root?.max.My.combination).toBe('G');
    expect(() => envelope([])).toThrow(GirderError);
  });
});

describe('factorisation reuse', () => {
  it('a repeated contact state costs no new factorisation, and analyseAll equals analyse one by one', () => {
    const model: GirderModel = {
      nodes: Array.from({ length: 9 }, (_, i) => ({ id: `N${i}`, x: i * 0.5, y: 0, z: 0 })),
      elements: Array.from({ length: 8 }, (_, i) => ({ id: `E${i}`, nodeI: `N${i}`, nodeJ: `N${i + 1}`, section: 'S' })),
      sections: { S: heb300 },
      supports: [{ node: 'N0', fix: ['ux', 'uy', 'rz'] }, { node: 'N8', fix: ['uy'] }],
      springs: Array.from({ length: 9 }, (_, i) => [-0.15, 0, 0.15].map((y, j) => ({ id: `K${i}.${j}`, node: `N${i}`, direction: [0, 0, 1] as [number, number, number], stiffness: 1e8, offset: [0, y, -0.15] as [number, number, number], behaviour: 'compression-only' as const }))).flat(),
      loadCases: [{ name: 'Q', lineLoads: Array.from({ length: 8 }, (_, i) => ({ element: `E${i}`, q: [0, 0, -50e3] as [number, number, number], offset: [0, 0.12, 0.15] as [number, number, number] })), nodalLoads: [] }],
    };
    const numbering = numberEquations(model);
    const elements = prepareElements(model, numbering);
    const system = prepareContactSystem(model, numbering, elements, prepareSprings(model, numbering), (e) => ({ text: `${e}`, path: '' }));
    const combined = combineLoads(model, { name: 'Q', factors: { Q: 1 } });
    const { f } = assembleLoads(elements, combined.elements, combined.nodal, numbering);
    const first = solveContact(system, f);
    const after = system.factorisations;
    expect(first.iterations).toBeGreaterThan(1);
    expect(after).toBe(first.iterations);
    // Twice the load: the same contact states in the same order, all from the cache.
    const second = solveContact(system, Float64Array.from(f, (x) => 2 * x));
    expect(second.iterations).toBe(first.iterations);
    expect(system.factorisations).toBe(after);
    const together = analyseAll(model, [{ name: 'Q', factors: { Q: 1 } }, { name: '2Q', factors: { Q: 2 } }]);
    expect(JSON.stringify(together[1])).toBe(JSON.stringify(analyse(model, { name: '2Q', factors: { Q: 2 } })));
  });
});
