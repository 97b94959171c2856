import { describe, expect, it } from 'vitest';
import { analyse, sumReactions } from './analyse.js';
import { GirderError } from './errors.js';
import { sumLoads } from './loads.js';
import type { Combination, Dof, GirderModel, SectionStiffness, Vec3 } from './model.js';
import { STANDARD_GRAVITY } from './model.js';

const ipe400: SectionStiffness = { A: 84.46e-4, Iy: 23130e-8, Iz: 1318e-8, It: 51.08e-8, Iw: 490e-9, E: 210e9, G: 81e9, density: 7850 };
const all: Dof[] = ['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'];

function beam(): GirderModel {
  return {
    nodes: [
      { id: 'N0', x: 0, y: 0, z: 0 },
      { id: 'N1', x: 2, y: 0, z: 0 },
      { id: 'N2', x: 4, y: 0, z: 0 },
    ],
    elements: [
      { id: 'E0', nodeI: 'N0', nodeJ: 'N1', section: 'IPE400' },
      { id: 'E1', nodeI: 'N1', nodeJ: 'N2', section: 'IPE400' },
    ],
    sections: { IPE400: ipe400 },
    supports: [{ node: 'N0', fix: all }],
    springs: [],
    loadCases: [{ name: 'P', lineLoads: [], nodalLoads: [{ node: 'N2', force: [0, 0, -1e4] }] }],
  };
}
const P: Combination = { name: 'P', factors: { P: 1 } };

function errorOf(run: () => unknown): GirderError {
  try {
    run();
  } catch (error) {
    if (error instanceof GirderError) return error;
    throw error;
  }
  throw new Error('expected a GirderError');
}

describe('model validation (exact code, path and message)', () => {
  it('unknown node id', () => {
    const model = beam();
    (model.elements[1] as { nodeJ: string }).nodeJ = 'N9';
    const error = errorOf(() => analyse(model, P));
    expect(error.code).toBe('BAD_MODEL');
    expect(error.path).toBe('elements[1].nodeJ');
    expect(error.message).toBe("elements[1].nodeJ refers to node 'N9', which is not defined");
  });

  it('zero-length element', () => {
    const model = beam();
    model.nodes[1] = { id: 'N1', x: 0, y: 0, z: 0 };
    const error = errorOf(() => analyse(model, P));
    expect([error.code, error.path, error.message]).toEqual(['BAD_MODEL', 'elements[0]', "elements[0] 'E0' has zero length: nodes 'N0' and 'N1' are at the same point"]);
  });

  it('non-positive section constant, negative warping constant', () => {
    const model = beam();
    model.sections.IPE400 = { ...ipe400, Iy: 0 };
    const error = errorOf(() => analyse(model, P));
    expect([error.code, error.path, error.message]).toEqual(['BAD_MODEL', 'sections.IPE400.Iy', 'sections.IPE400.Iy must be positive; got 0']);
    model.sections.IPE400 = { ...ipe400, Iw: -1e-9 };
    expect(errorOf(() => analyse(model, P)).message).toBe('sections.IPE400.Iw must be zero or positive; got -1e-9');
  });

  it('duplicate ids', () => {
    const model = beam();
    model.nodes.push({ id: 'N1', x: 9, y: 0, z: 0 });
    const error = errorOf(() => analyse(model, P));
    expect([error.code, error.path, error.message]).toEqual(['BAD_MODEL', 'nodes[3].id', "nodes[3].id 'N1' is already used by nodes[1]"]);
    const springs = beam();
    springs.springs = [
      { id: 'S', node: 'N2', direction: [0, 0, 1], stiffness: 1e6 },
      { id: 'S', node: 'N1', direction: [0, 0, 1], stiffness: 1e6 },
    ];
    expect(errorOf(() => analyse(springs, P)).message).toBe("springs[1].id 'S' is already used by springs[0]");
  });

  it('up parallel to the element (a column along Z with the default up)', () => {
    const model = beam();
    model.nodes.push({ id: 'C', x: 0, y: 0, z: -3 });
    model.elements.push({ id: 'COL', nodeI: 'C', nodeJ: 'N0', section: 'IPE400' });
    const error = errorOf(() => analyse(model, P));
    expect([error.code, error.path]).toEqual(['BAD_MODEL', 'elements[2].up']);
    expect(error.message).toBe('elements[2].up [0, 0, 1] is parallel to the element axis, so it cannot fix the local z axis; give an up vector across the element');
    model.elements[2] = { id: 'COL', nodeI: 'C', nodeJ: 'N0', section: 'IPE400', up: [1, 0, 0] };
    expect(() => analyse(model, P)).not.toThrow();
  });

  it('spring direction, unknown dof, unknown load case, station count', () => {
    const model = beam();
    model.springs = [{ id: 'S', node: 'N2', direction: [0, 0, 2], stiffness: 1e6 }];
    expect(errorOf(() => analyse(model, P)).message).toBe('springs[0].direction must be a unit vector; its length is 2');
    const dof = beam();
    dof.supports = [{ node: 'N0', fix: ['uz', 'phi' as Dof] }];
    expect(errorOf(() => analyse(dof, P)).message).toBe("supports[0].fix[1] 'phi' is not a degree of freedom; use one of ux, uy, uz, rx, ry, rz, w");
    const error = errorOf(() => analyse(beam(), { name: 'C1', factors: { P: 1, Wind: 1.5 } }));
    expect([error.path, error.message]).toEqual(['combination.factors.Wind', "combination.factors.Wind refers to load case 'Wind', which is not defined"]);
    expect(errorOf(() => analyse(beam(), P, { stationsPerElement: 1 })).message).toBe('options.stationsPerElement must be an integer of at least 2; got 1');
  });
});

describe('mechanism detection', () => {
  it('a cantilever free to spin about its axis: MECHANISM naming an rx freedom', () => {
    const model = beam();
    model.supports = [{ node: 'N0', fix: ['ux', 'uy', 'uz', 'ry', 'rz', 'w'] }];
    const error = errorOf(() => analyse(model, P));
    expect(error.code).toBe('MECHANISM');
    // The null vector is a rigid twist (rx only), so the singular pivot is the last rx eliminated.
    expect(error.message).toMatch(/^mechanism: node N[0-2] dof rx is unrestrained \(pivot /);
    expect(error.path).toMatch(/^nodes\[[0-2]\]$/);
  });

  it('a node held by nothing but a vertical spring: MECHANISM at that node', () => {
    const model = beam();
    model.nodes.push({ id: 'LOOSE', x: 1, y: 1, z: 0 });
    model.springs = [{ id: 'S', node: 'LOOSE', direction: [0, 0, 1], stiffness: 1e6 }];
    const error = errorOf(() => analyse(model, P));
    expect(error.code).toBe('MECHANISM');
    expect(error.message).toMatch(/^mechanism: node LOOSE dof (ux|uy|rx|ry|rz) is unrestrained/);
    expect(error.path).toBe('nodes[3]');
  });

  it('a ring with vertical supports only slides in its plane: MECHANISM at an in-plane freedom', () => {
    const count = 12;
    const model: GirderModel = {
      nodes: Array.from({ length: count }, (_, k) => ({ id: `R${k}`, x: 4 * Math.cos((2 * Math.PI * k) / count), y: 4 * Math.sin((2 * Math.PI * k) / count), z: 0 })),
      elements: Array.from({ length: count }, (_, k) => ({ id: `S${k}`, nodeI: `R${k}`, nodeJ: `R${(k + 1) % count}`, section: 'IPE400' })),
      sections: { IPE400: ipe400 },
      supports: [0, 4, 8].map((k) => ({ node: `R${k}`, fix: ['uz'] as Dof[] })),
      springs: [],
      loadCases: [{ name: 'P', lineLoads: [], nodalLoads: [{ node: 'R2', force: [0, 0, -1e4] }] }],
    };
    const error = errorOf(() => analyse(model, P));
    expect(error.code).toBe('MECHANISM');
    expect(error.message).toMatch(/^mechanism: node R\d+ dof (ux|uy|rz) is unrestrained/);
  });
});

describe('overall equilibrium', () => {
  it('reactionSum = −appliedSum (fixed supports + springs, to 1e-8), moments about the origin too', () => {
    // A frame of two beams meeting at a kink, one end fixed, the other on an offset spring and a
    // pin; eccentric line loads, nodal loads and self weight in two factored load cases.
    const model: GirderModel = {
      nodes: [
        { id: 'A', x: 0, y: 0, z: 0 },
        { id: 'B', x: 3, y: 0, z: 0 },
        { id: 'C', x: 5, y: 2, z: 0.5 },
        { id: 'D', x: 5, y: 5, z: 0.5 },
      ],
      elements: [
        { id: 'AB', nodeI: 'A', nodeJ: 'B', section: 'IPE400' },
        { id: 'BC', nodeI: 'B', nodeJ: 'C', section: 'IPE400' },
        { id: 'CD', nodeI: 'C', nodeJ: 'D', section: 'IPE400', up: [0.2, 0, 1] },
      ],
      sections: { IPE400: ipe400 },
      supports: [
        { node: 'A', fix: all },
        { node: 'D', fix: ['ux', 'uy'] },
      ],
      springs: [
        { id: 'bearing', node: 'D', direction: [0, 0, 1], stiffness: 4e7, offset: [0.08, 0, -0.2] },
        { id: 'side', node: 'C', direction: [Math.SQRT1_2, -Math.SQRT1_2, 0], stiffness: 1e6 },
      ],
      loadCases: [
        {
          name: 'G',
          selfWeightFactor: 1,
          lineLoads: [{ element: 'BC', q: [0, 0, -8e3], offset: [0, 0.15, 0.2] }],
          nodalLoads: [{ node: 'C', force: [2e3, 0, -6e3], moment: [1e3, 0, 0] }],
        },
        {
          name: 'Q',
          lineLoads: [
            { element: 'AB', q: [500, 1e3, -12e3], offset: [0, -0.1, 0] },
            { element: 'CD', q: [0, -2e3, -4e3] },
          ],
          nodalLoads: [{ node: 'B', force: [0, 3e3, -5e3] }],
        },
      ],
    };
    const combination: Combination = { name: 'STR', factors: { G: 1.35, Q: 1.5 } };
    const result = analyse(model, combination);

    // Applied sum from the inputs (closed form: uniform load times length, plus nodal forces).
    const lengths = { AB: 3, BC: Math.hypot(2, 2, 0.5), CD: 3 };
    const weight = ipe400.density * ipe400.A * STANDARD_GRAVITY * (lengths.AB + lengths.BC + lengths.CD);
    const expected: Vec3 = [
      1.35 * 2e3 + 1.5 * 500 * lengths.AB,
      1.5 * (1e3 * lengths.AB - 2e3 * lengths.CD + 3e3),
      1.35 * (-weight - 8e3 * lengths.BC - 6e3) + 1.5 * (-12e3 * lengths.AB - 4e3 * lengths.CD - 5e3),
    ];
    const size = Math.hypot(...expected);
    for (const k of [0, 1, 2] as const) {
      expect(Math.abs(result.appliedSum[k] - expected[k]) / size).toBeLessThan(1e-12);
      expect(Math.abs(result.reactionSum[k] + result.appliedSum[k]) / size).toBeLessThan(1e-8);
    }
    const applied = sumLoads(model, combination);
    const reacted = sumReactions(model, result);
    const momentSize = Math.hypot(...applied.momentAboutOrigin);
    for (const k of [0, 1, 2] as const) expect(Math.abs(reacted.momentAboutOrigin[k] + applied.momentAboutOrigin[k]) / momentSize).toBeLessThan(1e-8);
    expect(result.residual).toBeLessThan(1e-8);
    expect(result.converged).toBe(true);
    expect(result.iterations).toBe(1);
    // The bearing is compressed (it carries load downward onto its support).
    expect(result.springForces.find((s) => s.id === 'bearing')?.force).toBeGreaterThan(0);
    // Free body of node C (statics): the applied load, the side spring, and the end resultants of
    // BC (end J: the element pulls the node with −S(L)) and CD (end I: +S(0)) balance, as forces and
    // as moments. Local axes from the geometry: x along the chord, z the part of up normal to x.
    const axes = (from: Vec3, to: Vec3, up: Vec3): [Vec3, Vec3, Vec3] => {
      const d: Vec3 = [to[0] - from[0], to[1] - from[1], to[2] - from[2]];
      const l = Math.hypot(...d);
      const x: Vec3 = [d[0] / l, d[1] / l, d[2] / l];
      const upx = up[0] * x[0] + up[1] * x[1] + up[2] * x[2];
      const zr: Vec3 = [up[0] - upx * x[0], up[1] - upx * x[1], up[2] - upx * x[2]];
      const zl = Math.hypot(...zr);
      const z: Vec3 = [zr[0] / zl, zr[1] / zl, zr[2] / zl];
      return [x, [z[1] * x[2] - z[2] * x[1], z[2] * x[0] - z[0] * x[2], z[0] * x[1] - z[1] * x[0]], z];
    };
    const globalOf = (R: [Vec3, Vec3, Vec3], v: Vec3): Vec3 => ([0, 1, 2] as const).map((k) => R[0][k] * v[0] + R[1][k] * v[1] + R[2][k] * v[2]) as Vec3;
    const bcAxes = axes([3, 0, 0], [5, 2, 0.5], [0, 0, 1]);
    const cdAxes = axes([5, 2, 0.5], [5, 5, 0.5], [0.2, 0, 1]);
    const bc = result.stations.filter((st) => st.element === 'BC');
    const endBC = bc[bc.length - 1];
    const startCD = result.stations.find((st) => st.element === 'CD' && st.x === 0);
    if (endBC === undefined || startCD === undefined) throw new Error('stations missing');
    expect(endBC.x).toBe(lengths.BC);
    const side = result.springForces.find((sp) => sp.id === 'side')?.force ?? NaN;
    const forceBC = globalOf(bcAxes, [endBC.N, endBC.Vy, endBC.Vz]);
    const forceCD = globalOf(cdAxes, [startCD.N, startCD.Vy, startCD.Vz]);
    const momentBC = globalOf(bcAxes, [endBC.T, endBC.My, endBC.Mz]);
    const momentCD = globalOf(cdAxes, [startCD.T, startCD.My, startCD.Mz]);
    const appliedC: Vec3 = [1.35 * 2e3, 0, 1.35 * -6e3];
    const sideForce: Vec3 = [side * Math.SQRT1_2, -side * Math.SQRT1_2, 0];
    for (const k of [0, 1, 2] as const) {
      expect(Math.abs(appliedC[k] + sideForce[k] - forceBC[k] + forceCD[k]) / size).toBeLessThan(1e-9);
      expect(Math.abs((k === 0 ? 1.35e3 : 0) - momentBC[k] + momentCD[k]) / (size * 3)).toBeLessThan(1e-9);
    }
  });

  it('is a pure function: the same input gives identical results, and the model is not changed', () => {
    const model = beam();
    const before = JSON.stringify(model);
    const a = analyse(model, P);
    const b = analyse(model, P);
    expect(JSON.stringify(a)).toBe(JSON.stringify(b));
    expect(JSON.stringify(model)).toBe(before);
  });
});
