import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyse, sumReactions } from './analyse.js';
import { sumLoads } from './loads.js';
import type { ElementLineLoad, GirderModel, GirderNode, NodalLoad, PointSpring, SectionStiffness, Vec3 } from './model.js';

// Property-based checks of the contact solver on random small frames (fixed seeds, reproducible).
// Sources: statics (equilibrium of reactions and loads), the definition of a tensionless bearing
// (no tensile force, no penetration of an open bearing beyond tolerance), and symmetry (a
// mirror-symmetric model under a mirror-symmetric load has a mirror-symmetric unique solution,
// the energy being strictly convex).

const ipe300: SectionStiffness = { A: 53.81e-4, Iy: 8356e-8, Iz: 603.8e-8, It: 20.12e-8, Iw: 125.9e-9, E: 210e9, G: 81e9, density: 7850 };
const C = { name: 'P', factors: { P: 1 } };
const HALF_WIDTH = 0.075;

interface FrameSpec {
  /** Member lengths (m) and the plan angle (rad) each member turns from the previous one. */
  members: { length: number; turn: number; segments: number; q: number; eccentricity: number }[];
  /** Interior spring offsets across the flange, as fractions of the half width. */
  interior: number[];
  stiffness: number;
  pointLoad: { at: number; force: number; torque: number };
}

const frameSpec: fc.Arbitrary<FrameSpec> = fc.record({
  members: fc.array(
    fc.record({
      length: fc.double({ min: 1, max: 4, noNaN: true }),
      turn: fc.double({ min: -1.2, max: 1.2, noNaN: true }),
      segments: fc.integer({ min: 1, max: 3 }),
      q: fc.double({ min: 1e3, max: 10e3, noNaN: true }),
      // Within ±0.95 of the half width: every load lies inside the bearing lines.
      eccentricity: fc.double({ min: -0.95 * HALF_WIDTH, max: 0.95 * HALF_WIDTH, noNaN: true }),
    }),
    { minLength: 1, maxLength: 3 },
  ),
  interior: fc.array(fc.double({ min: -0.9, max: 0.9, noNaN: true }), { maxLength: 2 }),
  stiffness: fc.double({ min: 1e7, max: 1e9, noNaN: true }),
  pointLoad: fc.record({
    at: fc.double({ min: 0, max: 1, noNaN: true }),
    force: fc.double({ min: 20e3, max: 200e3, noNaN: true }),
    // Eccentricity of the point load across the flange, as a fraction of the half width.
    torque: fc.double({ min: -0.95, max: 0.95, noNaN: true }),
  }),
});

/** A polyline frame in plan on compression-only bearings at both flange edges (and inside) of every node. */
function buildFrame(spec: FrameSpec): GirderModel {
  const nodes: GirderNode[] = [{ id: 'N0', x: 0, y: 0, z: 0 }];
  const elements: GirderModel['elements'] = [];
  const lineLoads: ElementLineLoad[] = [];
  const across: Vec3[] = [];
  let heading = 0;
  let x = 0;
  let y = 0;
  for (const member of spec.members) {
    heading += member.turn;
    const t: Vec3 = [Math.cos(heading), Math.sin(heading), 0];
    const n: Vec3 = [-t[1], t[0], 0];
    if (across.length === 0) across.push(n);
    else {
      // At a kink, bearing points lie along the mean of the two normals.
      const last = across[across.length - 1] as Vec3;
      const mean: Vec3 = [last[0] + n[0], last[1] + n[1], 0];
      const size = Math.hypot(mean[0], mean[1]);
      across[across.length - 1] = [mean[0] / size, mean[1] / size, 0];
    }
    for (let s = 0; s < member.segments; s++) {
      x += (t[0] * member.length) / member.segments;
      y += (t[1] * member.length) / member.segments;
      const id = `N${nodes.length}`;
      const element = `E${elements.length}`;
      elements.push({ id: element, nodeI: `N${nodes.length - 1}`, nodeJ: id, section: 'S' });
      nodes.push({ id, x, y, z: 0 });
      across.push(n);
      lineLoads.push({ element, q: [0, 0, -member.q], offset: [n[0] * member.eccentricity, n[1] * member.eccentricity, 0.15] });
    }
  }
  const fractions = [-1, ...spec.interior, 1];
  const springs: PointSpring[] = nodes.flatMap((node, i) =>
    fractions.map((fraction, j) => {
      const n = across[i] as Vec3;
      return {
        id: `${node.id}.${j}`,
        node: node.id,
        direction: [0, 0, 1] as Vec3,
        stiffness: spec.stiffness,
        offset: [n[0] * fraction * HALF_WIDTH, n[1] * fraction * HALF_WIDTH, -0.15] as Vec3,
        behaviour: 'compression-only' as const,
        group: `line ${j}`,
      };
    }),
  );
  const loaded = nodes[Math.min(nodes.length - 1, Math.floor(spec.pointLoad.at * nodes.length))] as GirderNode;
  // The couple of the load −F ẑ at e n̂ across the flange: (e n̂) × (−F ẑ) = −e F (n_y, −n_x, 0).
  const n = across[nodes.indexOf(loaded)] as Vec3;
  const eF = spec.pointLoad.torque * HALF_WIDTH * spec.pointLoad.force;
  const nodalLoads: NodalLoad[] = [{ node: loaded.id, force: [0, 0, -spec.pointLoad.force], moment: [-eF * n[1], eF * n[0], 0] }];
  return {
    nodes,
    elements,
    sections: { S: ipe300 },
    // In-plane rigid-body motion only (vertical loads on vertical bearings load none of these).
    supports: [
      { node: 'N0', fix: ['ux', 'uy', 'rz'] },
      { node: `N${nodes.length - 1}`, fix: spec.members.length > 1 ? ['ux', 'uy'] : ['uy'] },
    ],
    springs,
    loadCases: [{ name: 'P', lineLoads, nodalLoads }],
  };
}

describe('contact solver properties on random frames', () => {
  it('equilibrium, no tension, no penetration (100 random frames)', () => {
    let withLiftOff = 0;
    fc.assert(
      fc.property(frameSpec, (spec) => {
        const model = buildFrame(spec);
        const result = analyse(model, C);
        const applied = sumLoads(model, C);
        const reacted = sumReactions(model, result);
        const size = Math.hypot(...applied.force);
        const momentSize = Math.hypot(...applied.momentAboutOrigin) + size;
        for (const k of [0, 1, 2] as const) {
          expect(Math.abs(result.reactionSum[k] + result.appliedSum[k]) / size).toBeLessThan(1e-8);
          expect(Math.abs(reacted.momentAboutOrigin[k] + applied.momentAboutOrigin[k]) / momentSize).toBeLessThan(1e-8);
        }
        const maxForce = Math.max(...result.springForces.map((s) => Math.abs(s.force)));
        const maxElongation = Math.max(...result.springForces.map((s) => Math.abs(s.elongation)));
        for (const s of result.springForces) {
          expect(s.force).toBeGreaterThanOrEqual(-1e-8 * maxForce);
          if (s.state === 'open') expect(s.elongation).toBeGreaterThanOrEqual(-1e-8 * maxElongation);
          else expect(s.elongation).toBeLessThanOrEqual(1e-8 * maxElongation);
        }
        expect(result.backwardError).toBeLessThan(1e-12);
        if (result.springForces.some((s) => s.state === 'open')) withLiftOff++;
      }),
      { seed: 20261202, numRuns: 100 },
    );
    // The sample must exercise contact: many frames lift off somewhere.
    expect(withLiftOff).toBeGreaterThan(40);
  });

  it('a mirror-symmetric beam under a mirror-symmetric load gives mirror-symmetric bearing forces (100 runs)', () => {
    const symmetric = fc.record({
      halfSegments: fc.integer({ min: 1, max: 4 }),
      length: fc.double({ min: 2, max: 8, noNaN: true }),
      loads: fc.array(fc.record({ q: fc.double({ min: 1e3, max: 30e3, noNaN: true }), e: fc.double({ min: -0.06, max: 0.06, noNaN: true }) }), { minLength: 4, maxLength: 4 }),
      interior: fc.array(fc.double({ min: -0.9, max: 0.9, noNaN: true }), { maxLength: 2 }),
      stiffness: fc.double({ min: 1e7, max: 1e9, noNaN: true }),
      central: fc.double({ min: 0, max: 80e3, noNaN: true }),
    });
    fc.assert(
      fc.property(symmetric, (spec) => {
        const segments = 2 * spec.halfSegments;
        const h = spec.length / segments;
        const fractions = [-1, ...spec.interior, 1];
        const model: GirderModel = {
          nodes: Array.from({ length: segments + 1 }, (_, i) => ({ id: `N${i}`, x: i * h, y: 0, z: 0 })),
          elements: Array.from({ length: segments }, (_, i) => ({ id: `E${i}`, nodeI: `N${i}`, nodeJ: `N${i + 1}`, section: 'S' })),
          sections: { S: ipe300 },
          supports: [
            { node: 'N0', fix: ['ux', 'uy', 'rz'] },
            { node: `N${segments}`, fix: ['uy'] },
          ],
          springs: Array.from({ length: segments + 1 }, (_, i) =>
            fractions.map((fraction, j) => ({
              id: `N${i}.${j}`,
              node: `N${i}`,
              direction: [0, 0, 1] as Vec3,
              stiffness: spec.stiffness,
              offset: [0, fraction * HALF_WIDTH, -0.15] as Vec3,
              behaviour: 'compression-only' as const,
            })),
          ).flat(),
          loadCases: [
            {
              name: 'P',
              // Element i and its mirror segments − 1 − i carry the same load.
              lineLoads: Array.from({ length: segments }, (_, i) => {
                const load = spec.loads[Math.min(i, segments - 1 - i) % 4] as { q: number; e: number };
                return { element: `E${i}`, q: [0, 0, -load.q] as Vec3, offset: [0, load.e, 0.15] as Vec3 };
              }),
              nodalLoads: [{ node: `N${spec.halfSegments}`, force: [0, 0, -spec.central] }],
            },
          ],
        };
        const result = analyse(model, C);
        const force = new Map(result.springForces.map((s) => [s.id, s.force]));
        const maxForce = Math.max(...result.springForces.map((s) => Math.abs(s.force)));
        for (let i = 0; i <= segments; i++) {
          for (let j = 0; j < fractions.length; j++) {
            const here = force.get(`N${i}.${j}`) ?? NaN;
            const mirror = force.get(`N${segments - i}.${j}`) ?? NaN;
            expect(Math.abs(here - mirror)).toBeLessThan(1e-7 * maxForce);
          }
        }
      }),
      { seed: 7, numRuns: 100 },
    );
  });
});
