import { solveQP } from 'quadprog';
import { describe, expect, it } from 'vitest';
import { analyse, sumReactions } from './analyse.js';
import { addSpringStiffness, assembleLoads, assembleStiffness, prepareElements, prepareSprings } from './assemble.js';
import { GirderError } from './errors.js';
import { combineLoads, sumLoads } from './loads.js';
import type { Combination, Dof, GirderModel, NodalLoad, PointSpring, SectionStiffness, SpringBehaviour } from './model.js';
import { numberEquations } from './numbering.js';
import type { AnalysisResult } from './results.js';

const C: Combination = { name: 'P', factors: { P: 1 } };
const planar: Dof[] = ['ux', 'uy', 'rx', 'rz'];

function errorOf(run: () => unknown): GirderError {
  try {
    run();
  } catch (error) {
    if (error instanceof GirderError) return error;
    throw error;
  }
  throw new Error('expected a GirderError');
}

/**
 * Straight beam along x on vertical springs, bending in the x-z plane only (ux, uy, rx, rz fixed at
 * every node). Spring i sits at node `N${i}`; `nodes` lists the x of each node.
 */
function beamOnSprings(xs: number[], section: SectionStiffness, springAt: (i: number, x: number) => PointSpring[], loads: NodalLoad[]): GirderModel {
  return {
    nodes: xs.map((x, i) => ({ id: `N${i}`, x, y: 0, z: 0 })),
    elements: xs.slice(1).map((_, i) => ({ id: `E${i}`, nodeI: `N${i}`, nodeJ: `N${i + 1}`, section: 'S' })),
    sections: { S: section },
    supports: xs.map((_, i) => ({ node: `N${i}`, fix: planar })),
    springs: xs.flatMap((x, i) => springAt(i, x)),
    loadCases: [{ name: 'P', lineLoads: [], nodalLoads: loads }],
  };
}

function forceOf(result: AnalysisResult, id: string): number {
  const spring = result.springForces.find((s) => s.id === id);
  if (spring === undefined) throw new Error(`no spring ${id}`);
  return spring.force;
}

describe('rigid footing on a compression-only foundation (kern rule)', () => {
  // Symbols: footing length L, width b = 1 m, n equal springs at the centres of n equal strips
  // h = L/n, load P at eccentricity e from the centre. Common practice, the kern rule (any
  // foundation-engineering text; REFERENCES.md section 4): e <= L/6: p = P/(bL)(1 +- 6e/L);
  // e > L/6: contact length 3(L/2 - e), p_max = 2P/(3b(L/2 - e)).
  const L = 2;
  const n = 40;
  const h = L / n;
  const b = 1;
  const P = 1e6;
  const ks = 1e8; // foundation modulus, N/m3
  // EI = 2.1e10 N m2: beta L = (ks b/(4 EI))^(1/4) L = 0.37, rigid for this purpose (a much stiffer
  // beam only adds rounding: element stiffness times the rigid rotation of the lifted part).
  const rigid: SectionStiffness = { A: 1, Iy: 0.1, Iz: 0.1, It: 0.1, Iw: 0, E: 210e9, G: 81e9, density: 0 };
  const xs = [...Array.from({ length: n / 2 }, (_, i) => (i + 0.5) * h), L / 2, ...Array.from({ length: n / 2 }, (_, i) => L / 2 + (i + 0.5) * h)];
  const footing = (e: number): GirderModel =>
    beamOnSprings(
      xs,
      rigid,
      (i, x) => (x === L / 2 ? [] : [{ id: `K${i}`, node: `N${i}`, direction: [0, 0, 1], stiffness: ks * b * h, behaviour: 'compression-only', group: 'base', tributaryLength: h }]),
      // P at the centre node with the couple of its eccentricity: (e x̂) × (−P ẑ) = P e ŷ.
      [{ node: `N${n / 2}`, force: [0, 0, -P], moment: [0, P * e, 0] }],
    );
  /** Edge pressure p(x = L) extrapolated linearly from the two outermost strips, per unit length. */
  const edgePressure = (result: AnalysisResult): number => {
    const p1 = forceOf(result, `K${n}`) / h;
    const p2 = forceOf(result, `K${n - 1}`) / h;
    return p1 + (p1 - p2) / 2;
  };

  it('e <= L/6: full contact, p = P/(bL)(1 +- 6e/L)', () => {
    for (const e of [0, L / 12, L / 6 - h]) {
      const result = analyse(footing(e), C);
      const group = result.contact?.groups[0];
      expect(group?.inContact).toBe(n);
      expect(group?.contactLength).toBeCloseTo(L, 12);
      expect(Math.abs(edgePressure(result) / ((P / (b * L)) * (1 + (6 * e) / L)) - 1)).toBeLessThan(0.005);
      const p0 = forceOf(result, 'K0') / h;
      const p1 = forceOf(result, 'K1') / h;
      // The low edge, compared against the mean pressure P/(bL) (it tends to 0 as e → L/6).
      expect(Math.abs(p0 + (p0 - p1) / 2 - (P / (b * L)) * (1 - (6 * e) / L)) / (P / (b * L))).toBeLessThan(0.005);
    }
  });

  it('e > L/6: contact length 3(L/2 - e) and p_max = 2P/(3b(L/2 - e))', () => {
    for (const e of [0.25 * L, 0.3 * L, 0.4 * L]) {
      const result = analyse(footing(e), C);
      const group = result.contact?.groups[0];
      if (group === undefined) throw new Error('no contact summary');
      // Discretisation: the contact edge lies somewhere in a strip.
      expect(Math.abs(group.contactLength - 3 * (L / 2 - e))).toBeLessThanOrEqual(h * (1 + 1e-9));
      expect(Math.abs(edgePressure(result) / ((2 * P) / (3 * b * (L / 2 - e))) - 1)).toBeLessThan(0.03);
      // The lifted-off zone is one run from the far end; no spring carries tension.
      expect(group.liftOffZones).toHaveLength(1);
      expect(group.liftOffZones[0]?.from).toBe('K0');
      for (const s of result.springForces) expect(s.force).toBeGreaterThanOrEqual(0);
      expect(result.iterations).toBeGreaterThan(1);
      // Equilibrium (statics). Bound 1e-7, not 1e-8: the lifted end rises by ~0.2 m against element
      // stiffnesses of ~1e15 N/m, and rounding of K u (backward error ~1e-17 here) leaves ~0.05 N.
      expect(Math.abs(result.reactionSum[2] - P) / P).toBeLessThan(1e-7);
    }
  });

  it('regression: a very stiff footing (EI = 2.1e12 N m2) on the few springs left in contact is not taken for a mechanism', () => {
    // Its smallest pivot ratio (spring k over 12 EI/h^3, about 2.5e-11) is below the default 1e-10
    // threshold; states with lifted-off bearings are judged at 1e-12 (contact.ts, factorState).
    const model = footing(0.4 * L);
    model.sections.S = { ...rigid, Iy: 10, Iz: 10, It: 10 };
    const group = analyse(model, C).contact?.groups[0];
    expect(Math.abs((group?.contactLength ?? NaN) - 3 * (L / 2 - 0.4 * L))).toBeLessThanOrEqual(h * (1 + 1e-9));
  });
});

describe('beam on elastic foundation (Hetényi, Beams on Elastic Foundation, 1946)', () => {
  // Symbols: foundation modulus k (N/m2), EI, beta = (k/(4EI))^(1/4), central point load P;
  // springs k h at nodes spaced h (k h/2 at the ends). REFERENCES.md section 4.
  const section: SectionStiffness = { A: 84.46e-4, Iy: 23130e-8, Iz: 1318e-8, It: 51.08e-8, Iw: 0, E: 210e9, G: 81e9, density: 0 };
  const EI = section.E * section.Iy;
  const k = 5e7;
  const beta = (k / (4 * EI)) ** 0.25;
  const P = 1e5;
  const run = (betaL: number, segments: number, behaviour: SpringBehaviour) => {
    const L = betaL / beta;
    const h = L / segments;
    const xs = Array.from({ length: segments + 1 }, (_, i) => i * h);
    const model = beamOnSprings(
      xs,
      section,
      (i) => [{ id: `K${i}`, node: `N${i}`, direction: [0, 0, 1], stiffness: k * h * (i === 0 || i === segments ? 0.5 : 1), behaviour, group: 'foundation', tributaryLength: h }],
      [{ node: `N${segments / 2}`, force: [0, 0, -P] }],
    );
    const result = analyse(model, C, { stationsPerElement: 2 });
    const w = -(result.displacements[segments / 2]?.uz ?? NaN);
    // Sagging moment under the load: −My at the end of the element left of the load.
    const left = result.stations.filter((s) => s.element === `E${segments / 2 - 1}`);
    const M = -(left[left.length - 1]?.My ?? NaN);
    return { result, w, M, h, L };
  };

  it('long beam, central point load: w0 = P beta/(2k), M0 = P/(4 beta)', () => {
    const { w, M } = run(12, 480, 'bilateral');
    expect(Math.abs(w / ((P * beta) / (2 * k)) - 1)).toBeLessThan(0.002);
    expect(Math.abs(M / (P / (4 * beta)) - 1)).toBeLessThan(0.002);
  });

  it('finite free beam, central load: w_c and M_c closed forms', () => {
    for (const bL of [1, 2, 3]) {
      const { w, M } = run(bL, 120, 'bilateral');
      const wc = ((P * beta) / (2 * k)) * ((Math.cosh(bL) + Math.cos(bL) + 2) / (Math.sinh(bL) + Math.sin(bL)));
      const Mc = (P / (4 * beta)) * ((Math.cosh(bL) - Math.cos(bL)) / (Math.sinh(bL) + Math.sin(bL)));
      expect(Math.abs(w / wc - 1)).toBeLessThan(0.002);
      expect(Math.abs(M / Mc - 1)).toBeLessThan(0.002);
    }
  });

  it('tensionless foundation: full contact for beta L < pi; beyond, contact pi/beta and coth(pi/2) times w0, M0', () => {
    // REFERENCES.md section 4 [derived]; verified here: the contact zone is a free beam with
    // beta L' = pi, whose end deflection vanishes, and the finite-beam forms at beta L = pi give
    // w = (P beta/2k)(cosh pi + 1)/sinh pi = (P beta/2k) coth(pi/2), and M likewise.
    const coth = 1 / Math.tanh(Math.PI / 2);
    expect(coth).toBeCloseTo(1.0903, 4);
    const full = run(3, 120, 'compression-only');
    expect(full.result.contact?.groups[0]?.inContact).toBe(121);
    for (const bL of [5, 8]) {
      const { result, w, M, h } = run(bL, 400, 'compression-only');
      const group = result.contact?.groups[0];
      if (group === undefined) throw new Error('no contact summary');
      // Springs in contact span (count − 1) h, to within one spacing of pi/beta at each edge.
      expect(Math.abs((group.inContact - 1) * h - Math.PI / beta)).toBeLessThan(2 * h);
      expect(group.liftOffZones).toHaveLength(2);
      expect(Math.abs(w / (((P * beta) / (2 * k)) * coth) - 1)).toBeLessThan(0.01);
      expect(Math.abs(M / ((P / (4 * beta)) * coth) - 1)).toBeLessThan(0.01);
    }
  });
});

describe('independent cross-check: contact solution = QP minimum (quadprog)', () => {
  it('a fixed-base frame with compression-only bearings and mixed loads', () => {
    // Formulation: variables (u, c), c_i the compression of unilateral spring i. Its energy
    // ½ k min(δ, 0)² equals min ½ k c² over c ≥ 0, c ≥ −δ (δ = gᵀu), so the contact problem is the
    // strictly convex QP  min ½ uᵀ K0 u − fᵀ u + Σ ½ k_i c_i²  s.t.  c_i ≥ 0,  c_i + g_iᵀ u ≥ 0,
    // K0 holding the elements and the bilateral springs; solved by quadprog (Goldfarb–Idnani).
    const section: SectionStiffness = { A: 53.81e-4, Iy: 8356e-8, Iz: 603.8e-8, It: 20.12e-8, Iw: 125.9e-9, E: 210e9, G: 81e9, density: 0 };
    const model: GirderModel = {
      nodes: [
        { id: 'A', x: 0, y: 0, z: 0 },
        { id: 'B', x: 1.5, y: 0, z: 0 },
        { id: 'C', x: 3, y: 0, z: 0 },
        { id: 'D', x: 3, y: 1.5, z: 0 },
        { id: 'E', x: 3, y: 3, z: 0 },
      ],
      elements: [
        { id: 'AB', nodeI: 'A', nodeJ: 'B', section: 'S' },
        { id: 'BC', nodeI: 'B', nodeJ: 'C', section: 'S' },
        { id: 'CD', nodeI: 'C', nodeJ: 'D', section: 'S' },
        { id: 'DE', nodeI: 'D', nodeJ: 'E', section: 'S' },
      ],
      sections: { S: section },
      supports: [{ node: 'A', fix: ['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'] }],
      springs: ['B', 'C', 'D', 'E'].flatMap((node, j) =>
        [-0.075, 0, 0.075].map((s, i) => {
          const offset: [number, number, number] = node === 'B' || node === 'C' ? [0, s, -0.15] : [s, 0, -0.15];
          return { id: `${node}${i}`, node, direction: [0, 0, 1] as [number, number, number], stiffness: 2e7 * (1 + 0.3 * i + 0.1 * j), offset, behaviour: 'compression-only' as const };
        }),
      ),
      loadCases: [
        {
          name: 'P',
          lineLoads: [
            { element: 'BC', q: [0, 0, -20e3], offset: [0, 0.1, 0] },
            { element: 'DE', q: [0, 0, -15e3], offset: [-0.12, 0, 0] },
          ],
          nodalLoads: [
            { node: 'D', force: [0, 0, 25e3], moment: [4e3, 0, 0] },
            { node: 'E', force: [1e3, 0, -5e3] },
          ],
        },
      ],
    };
    model.springs.push({ id: 'side', node: 'E', direction: [1, 0, 0], stiffness: 1e6 });
    const result = analyse(model, C);

    const numbering = numberEquations(model);
    const elements = prepareElements(model, numbering);
    const springs = prepareSprings(model, numbering);
    const K0 = assembleStiffness(elements, numbering);
    const unilateral = springs.filter((_, i) => model.springs[i]?.behaviour === 'compression-only');
    springs.forEach((spring, i) => {
      if (model.springs[i]?.behaviour !== 'compression-only') addSpringStiffness(K0, numbering, spring);
    });
    const combined = combineLoads(model, C);
    const { f } = assembleLoads(elements, combined.elements, combined.nodal, numbering);
    const n = K0.size;
    const m = unilateral.length;
    expect(n).toBeLessThanOrEqual(60);
    // Scaled variables (u in mm keeps quadprog's tolerances meaningful): u = s x, c = s y; the
    // constraint y + gᵀx ≥ 0 is the same after dividing by s.
    const s = 1e-3;
    const size = n + m;
    const Dmat: number[][] = [[]];
    for (let i = 1; i <= size; i++) Dmat[i] = new Array<number>(size + 1).fill(0);
    K0.rows.forEach((row, i) => {
      for (const [j, v] of row) (Dmat[i + 1] as number[])[j + 1] = v * s * s;
    });
    unilateral.forEach((spring, c) => {
      (Dmat[n + c + 1] as number[])[n + c + 1] = spring.stiffness * s * s;
    });
    const dvec = [0, ...Array.from(f, (x) => x * s), ...new Array<number>(m).fill(0)];
    const Amat: number[][] = [[]];
    for (let i = 1; i <= size; i++) Amat[i] = new Array<number>(2 * m + 1).fill(0);
    unilateral.forEach((spring, c) => {
      (Amat[n + c + 1] as number[])[c + 1] = 1; // c ≥ 0
      (Amat[n + c + 1] as number[])[m + c + 1] = 1; // c + gᵀu ≥ 0
      for (let a = 0; a < 6; a++) {
        const p = numbering.equation[spring.slots[a] as number] as number;
        if (p >= 0) (Amat[p + 1] as number[])[m + c + 1] = spring.g[a] as number;
      }
    });
    const qp = solveQP(Dmat, dvec, Amat, new Array<number>(2 * m + 1).fill(0));
    expect(qp.message).toBe('');
    let uMax = 0;
    let diff = 0;
    numbering.equationSlot.forEach((slot, p) => {
      const node = result.displacements[Math.floor(slot / 7)];
      const dof = (['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'] as const)[slot % 7];
      if (node === undefined || dof === undefined) return;
      const mine = node[dof];
      const theirs = (qp.solution[p + 1] as number) * s;
      uMax = Math.max(uMax, Math.abs(theirs));
      diff = Math.max(diff, Math.abs(mine - theirs));
    });
    expect(diff / uMax).toBeLessThan(1e-6);
    // Spring compressions: QP c_i against our F_i / k_i; the uplift load opens some bearings.
    unilateral.forEach((spring, c) => {
      const compression = forceOf(result, spring.id) / spring.stiffness;
      expect(Math.abs(compression - (qp.solution[n + c + 1] as number) * s)).toBeLessThan(1e-6 * uMax);
    });
    const open = result.springForces.filter((x) => x.state === 'open').length;
    expect(open).toBeGreaterThan(0);
    expect(open).toBeLessThan(m);
    const applied = sumLoads(model, C);
    const reacted = sumReactions(model, result);
    for (const k of [0, 1, 2] as const) expect(Math.abs(reacted.force[k] + applied.force[k])).toBeLessThan(1e-8 * 60e3);
  });
});

describe('anchored bearings (elastic–perfectly plastic in tension)', () => {
  it('an anchor at capacity holds exactly its capacity, equilibrium holds, and it is reported', () => {
    // Statics of a rigid lever (common practice): a very stiff cantilever stub on two bearings.
    const rigid: SectionStiffness = { A: 1, Iy: 0.1, Iz: 0.1, It: 0.1, Iw: 0, E: 210e9, G: 81e9, density: 0 };
    const capacity = 20e3;
    const model = beamOnSprings(
      [0, 1, 2],
      rigid,
      (i) => [{ id: `K${i}`, node: `N${i}`, direction: [0, 0, 1], stiffness: 1e8, behaviour: i === 0 ? { kind: 'anchored', tensionCapacity: capacity } : 'compression-only' }],
      // A downward force at N1 and a couple M that tips the beam towards N2: the anchor at N0 is pulled.
      [{ node: 'N1', force: [0, 0, -10e3], moment: [0, 48e3, 0] }],
    );
    const result = analyse(model, C);
    // Statics of a rigid beam on three equal springs at x = 0, 1, 2 m: all elastic, F = a + b x with
    // b = M/2, a = 10e3/3 − M/2, so F0 = −20.67e3 exceeds the capacity. With F0 = −capacity:
    // F1 + F2 = 30e3 and F1 + 2 F2 = 10e3 + M give F2 = M − 20e3 = 28e3, F1 = 50e3 − M = 2e3.
    expect(result.contact?.anchorsAtCapacity).toEqual(['K0']);
    expect(forceOf(result, 'K0')).toBeCloseTo(-capacity, 6);
    expect(Math.abs(forceOf(result, 'K1') - 2e3)).toBeLessThan(1);
    expect(Math.abs(forceOf(result, 'K2') - 28e3)).toBeLessThan(1);
  });
});

describe('contact solver failure paths', () => {
  const section: SectionStiffness = { A: 53.81e-4, Iy: 8356e-8, Iz: 603.8e-8, It: 20.12e-8, Iw: 0, E: 210e9, G: 81e9, density: 0 };
  const xs = Array.from({ length: 11 }, (_, i) => i * 0.4);
  const onBearings = (Fz: number): GirderModel =>
    beamOnSprings(
      xs,
      section,
      (i) => [{ id: `K${i}`, node: `N${i}`, direction: [0, 0, 1], stiffness: 1e7, behaviour: 'compression-only' }],
      [{ node: 'N2', force: [0, 0, Fz] }],
    );

  it('iteration cap: CONTACT_NOT_CONVERGED naming the springs that kept changing', () => {
    const error = errorOf(() => analyse(onBearings(-1e4), C, { maxContactIterations: 1 }));
    expect(error.code).toBe('CONTACT_NOT_CONVERGED');
    expect(error.message).toMatch(/^contact iteration did not converge: no stable contact state after 1 solves \(the cap\); springs that kept changing between contact and lift-off: K\d+ \(1 changes\)/);
    expect(error.path).toBe('springs');
  });

  it('all bearings lift off: MECHANISM naming the freedom and saying that bearings lifted off', () => {
    const error = errorOf(() => analyse(onBearings(+1e4), C));
    expect(error.code).toBe('MECHANISM');
    expect(error.message).toMatch(/^mechanism: node N\d+ dof (uz|ry) is unrestrained after bearings lifted off \(\d+ of 11 unilateral springs in tension released\); the load lifts the girder off its bearings/);
    expect(error.freedom).toMatch(/^node N\d+ dof (uz|ry)$/);
    // Without the globalised fallback the singular state is reported at once, the same way.
    expect(errorOf(() => analyse(onBearings(+1e4), C, { contactFallback: false })).code).toBe('MECHANISM');
  });

  it('bad cap option is BAD_MODEL', () => {
    const error = errorOf(() => analyse(onBearings(-1e4), C, { maxContactIterations: 0 }));
    expect([error.code, error.message]).toEqual(['BAD_MODEL', 'options.maxContactIterations must be a positive integer; got 0']);
  });

  it('a downward load settles: some bearings lift off, no tension, iterations counted', () => {
    const result = analyse(onBearings(-1e4), C);
    expect(result.converged).toBe(true);
    expect(result.iterations).toBeGreaterThan(1);
    expect(result.contact?.activeSprings.length).toBeLessThan(11);
    for (const s of result.springForces) expect(s.force).toBeGreaterThanOrEqual(0);
  });
});

describe('active-set cycling', () => {
  // A small frame found by a random search on which the plain active-set iteration returns to a
  // contact state it has visited (a cycle). The numbers are kept as found (any rounding may move
  // the model off the cycle).
  const cycling: GirderModel = {"nodes": [{"id": "N0", "x": 0, "y": 0, "z": 0}, {"id": "N1", "x": 1.3449025630950928, "y": 0, "z": 0}, {"id": "N2", "x": 4.430041408538818, "y": 0, "z": 0}, {"id": "N3", "x": 5.855823183059693, "y": 0, "z": 0}], "elements": [{"id": "E0", "nodeI": "N0", "nodeJ": "N1", "section": "S"}, {"id": "E1", "nodeI": "N1", "nodeJ": "N2", "section": "S"}, {"id": "E2", "nodeI": "N2", "nodeJ": "N3", "section": "S"}], "sections": {"S": {"A": 0.005381, "Iy": 8.356e-05, "Iz": 6.038e-06, "It": 2.012e-07, "Iw": 1.259e-07, "E": 210000000000, "G": 81000000000, "density": 0}}, "supports": [{"node": "N0", "fix": ["ux", "uy", "rz"]}, {"node": "N3", "fix": ["uy"]}], "springs": [{"id": "K0.0", "node": "N0", "direction": [0, 0, 1], "stiffness": 113096993.80826806, "offset": [0.14242193698883057, -0.07359509468078614, -0.15], "behaviour": "compression-only"}, {"id": "K0.1", "node": "N0", "direction": [0, 0, 1], "stiffness": 4220499.243410272, "offset": [-0.2261890947818756, 0.17030251026153564, -0.15], "behaviour": "compression-only"}, {"id": "K1.0", "node": "N1", "direction": [0, 0, 1], "stiffness": 443142601.380325, "offset": [-0.01441068649291992, -0.1572328567504883, -0.15], "behaviour": "compression-only"}, {"id": "K1.1", "node": "N1", "direction": [0, 0, 1], "stiffness": 40679275.7199547, "offset": [0.0274308443069458, 0.1839597225189209, -0.15], "behaviour": "compression-only"}, {"id": "K2.0", "node": "N2", "direction": [0, 0, 1], "stiffness": 3852685635.2020335, "offset": [-0.2273001194000244, -0.0988291621208191, -0.15], "behaviour": "compression-only"}, {"id": "K3.0", "node": "N3", "direction": [0, 0, 1], "stiffness": 4182258251.7148366, "offset": [-0.03703615665435791, 0.07714085578918457, -0.15], "behaviour": "compression-only"}, {"id": "K3.1", "node": "N3", "direction": [0, 0, 1], "stiffness": 57166247.174408734, "offset": [0.22964007854461668, -0.17534308433532717, -0.15], "behaviour": "compression-only"}, {"id": "K3.2", "node": "N3", "direction": [0, 0, 1], "stiffness": 2025261019.0469108, "offset": [0.1430265426635742, -0.08739967346191407, -0.15], "behaviour": "compression-only"}], "loadCases": [{"name": "P", "lineLoads": [], "nodalLoads": [{"node": "N0", "force": [0, 0, -1168.954849243164], "moment": [742.6261901855469, -1793.9567565917969, 0]}, {"node": "N1", "force": [0, 0, 1424.4477152824402], "moment": [-1807.8138828277588, 176.9474744796753, 0]}, {"node": "N2", "force": [0, 0, -2131.4828395843506], "moment": [1174.9110221862793, 501.1153221130371, 0]}, {"node": "N3", "force": [0, 0, -6637.112379074097], "moment": [-765.383243560791, -1536.858081817627, 0]}]}]};

  it('with the fallback switched off: CONTACT_NOT_CONVERGED saying that the state cycles, naming the springs', () => {
    const error = errorOf(() => analyse(cycling, C, { contactFallback: false }));
    expect(error.code).toBe('CONTACT_NOT_CONVERGED');
    expect(error.message).toMatch(/^contact iteration did not converge: the contact state cycles \(globalised fallback switched off\); springs that kept changing between contact and lift-off: K\d\.\d \(\d+ changes\)/);
  });

  it('by default the globalised Newton method finishes, and the result satisfies the optimality conditions', () => {
    const result = analyse(cycling, C);
    expect(result.contact?.globalised).toBe(true);
    // Karush–Kuhn–Tucker conditions of the convex energy (sufficient for its minimum): equilibrium
    // (backward error), bearings in contact compressed, open bearings not penetrating.
    expect(result.backwardError).toBeLessThan(1e-12);
    const maxForce = Math.max(...result.springForces.map((s) => Math.abs(s.force)));
    const maxElongation = Math.max(...result.springForces.map((s) => Math.abs(s.elongation)));
    for (const s of result.springForces) {
      if (s.state === 'open') expect(s.elongation).toBeGreaterThanOrEqual(-1e-9 * maxElongation);
      else expect(s.force).toBeGreaterThanOrEqual(-1e-9 * maxForce);
    }
    const applied = sumLoads(cycling, C);
    const reacted = sumReactions(cycling, result);
    for (const k of [0, 1, 2] as const) expect(Math.abs(reacted.force[k] + applied.force[k])).toBeLessThan(1e-8 * Math.hypot(...applied.force));
  });
});
