import { describe, expect, it } from 'vitest';
import { analyse } from './analyse.js';
import type { GirderModel, PointSpring, SectionStiffness, Vec3 } from './model.js';
import type { AnalysisResult } from './results.js';

// Demo girder: a square frame of four straight HE 300 B beams (EN 10365 properties, REFERENCES.md
// section 5) on a continuous bearing, with a vertical line load at an inward eccentricity (like a
// hopper hanging inside the girder line). The same frame under four bearing assumptions.
const heb300: SectionStiffness = { A: 149.1e-4, Iy: 25170e-8, Iz: 8563e-8, It: 185.0e-8, Iw: 1688e-9, E: 210e9, G: 81e9, density: 7850 };
const SIDE = 4;
const SEGMENTS_PER_SIDE = 8;
const FLANGE_WIDTH = 0.3;
const DEPTH = 0.3;
/** Bedding modulus, N/m3 (demo value: about E/t of a 0.1 m bed of E = 10 GPa). */
const BEDDING = 1e11;
const q = 100e3;
const eccentricity = 0.25;

type Layout = 'contact' | 'bonded' | 'web line' | 'inner edge';

/**
 * Square frame, nodes counter-clockwise from corner (0, 0); bearing points across the bottom flange
 * along the inward normal (the bisector at corners): five compression-only or bilateral points
 * (contact, bonded), or one bilateral line of the same total stiffness under the web or at the
 * inner flange edge. Warping continuous through the corners, or released there.
 */
function squareFrame(layout: Layout, warpingReleasedAtCorners: boolean): GirderModel {
  const count = 4 * SEGMENTS_PER_SIDE;
  const h = SIDE / SEGMENTS_PER_SIDE;
  const corners: Vec3[] = [
    [0, 0, 0],
    [SIDE, 0, 0],
    [SIDE, SIDE, 0],
    [0, SIDE, 0],
  ];
  const nodes = Array.from({ length: count }, (_, k) => {
    const side = Math.floor(k / SEGMENTS_PER_SIDE);
    const a = corners[side] as Vec3;
    const b = corners[(side + 1) % 4] as Vec3;
    const s = (k % SEGMENTS_PER_SIDE) / SEGMENTS_PER_SIDE;
    const corner = k % SEGMENTS_PER_SIDE === 0;
    return { id: `N${k}`, x: a[0] + s * (b[0] - a[0]), y: a[1] + s * (b[1] - a[1]), z: 0, ...(corner && warpingReleasedAtCorners ? { warpingRelease: true } : {}) };
  });
  const normals: Vec3[] = [
    [0, 1, 0],
    [-1, 0, 0],
    [0, -1, 0],
    [1, 0, 0],
  ];
  const inward = (k: number): Vec3 => {
    const side = Math.floor(k / SEGMENTS_PER_SIDE);
    const n = normals[side] as Vec3;
    if (k % SEGMENTS_PER_SIDE !== 0) return n;
    // At a corner the bearing points lie along the bisector of the two sides' inward normals.
    const p = normals[(side + 3) % 4] as Vec3;
    return [(n[0] + p[0]) / Math.SQRT2, (n[1] + p[1]) / Math.SQRT2, 0];
  };
  const pointStiffness = (BEDDING * FLANGE_WIDTH * h) / 5;
  const springs: PointSpring[] = [];
  nodes.forEach((node, k) => {
    const n = inward(k);
    const points =
      layout === 'web line' ? [{ at: 0, stiffness: 5 * pointStiffness }] : layout === 'inner edge' ? [{ at: FLANGE_WIDTH / 2, stiffness: 5 * pointStiffness }] : [-2, -1, 0, 1, 2].map((j) => ({ at: (j * FLANGE_WIDTH) / 4, stiffness: pointStiffness }));
    points.forEach((point, j) =>
      springs.push({
        id: `${node.id}.${j}`,
        node: node.id,
        direction: [0, 0, 1],
        stiffness: point.stiffness,
        offset: [n[0] * point.at, n[1] * point.at, -DEPTH / 2],
        behaviour: layout === 'contact' ? 'compression-only' : 'bilateral',
        group: `line ${j}`,
        tributaryLength: h,
      }),
    );
  });
  return {
    nodes,
    elements: Array.from({ length: count }, (_, k) => ({ id: `E${k}`, nodeI: `N${k}`, nodeJ: `N${(k + 1) % count}`, section: 'HEB300' })),
    sections: { HEB300: heb300 },
    supports: [
      { node: 'N0', fix: ['ux', 'uy'] },
      { node: `N${SEGMENTS_PER_SIDE}`, fix: ['uy'] },
    ],
    springs,
    loadCases: [
      {
        name: 'hopper',
        lineLoads: Array.from({ length: count }, (_, k) => {
          const n = normals[Math.floor(k / SEGMENTS_PER_SIDE)] as Vec3;
          return { element: `E${k}`, q: [0, 0, -q] as Vec3, offset: [n[0] * eccentricity, n[1] * eccentricity, DEPTH / 2] as Vec3 };
        }),
        nodalLoads: [],
      },
    ],
  };
}

const hopper = { name: 'hopper', factors: { hopper: 1 } };
const maxTorque = (result: AnalysisResult): number => Math.max(...result.stations.map((s) => Math.abs(s.T)));

describe('support scenarios on a square frame with an eccentric hopper load (trade observations)', () => {
  for (const released of [false, true]) {
    it(`contact vs bonded vs web line vs inner edge, warping ${released ? 'released' : 'continuous'} at the corners`, () => {
      const results = Object.fromEntries((['contact', 'bonded', 'web line', 'inner edge'] as const).map((layout) => [layout, analyse(squareFrame(layout, released), hopper)])) as Record<Layout, AnalysisResult>;
      const T = Object.fromEntries(Object.entries(results).map(([k, r]) => [k, maxTorque(r)])) as Record<Layout, number>;
      // Common practice (bearing design of eccentrically loaded girders): modelling the flange as
      // bonded to its bearing lets tension that cannot exist hold the twist, so the girder looks
      // nearly unloaded in torsion; a line support under the web overstates the torsion; a line
      // support at the inner flange edge pulls down near the corners.
      expect(T.bonded).toBeLessThan(0.4 * T.contact);
      expect(T['web line']).toBeGreaterThan(1.5 * T.contact);
      // Derived (statics): on a line support under the web, each side carries its whole distributed
      // torque q e to the corners, T_max = q e L/2 at the corners (the frame is symmetric).
      expect(Math.abs(T['web line'] / ((q * eccentricity * SIDE) / 2) - 1)).toBeLessThan(1e-6);
      if (released) {
        // Derived (statics), checked here: the contact resultant can move at most to the inner
        // flange edge, so q (e − b/2) per unit length is left for the girder: T_max = q (e − b/2) L/2.
        expect(Math.abs(T.contact / ((q * (eccentricity - FLANGE_WIDTH / 2) * SIDE) / 2) - 1)).toBeLessThan(0.01);
      }
      // Contact: no tension, and the outer part of the flange lifts off.
      const contact = results.contact.contact;
      if (contact === undefined) throw new Error('no contact summary');
      for (const s of results.contact.springForces) expect(s.force).toBeGreaterThanOrEqual(0);
      const outer = contact.groups.find((g) => g.group === 'line 0');
      const inner = contact.groups.find((g) => g.group === 'line 4');
      expect(outer?.contactFraction ?? 1).toBeLessThan(0.5);
      expect(inner?.contactFraction ?? 0).toBeGreaterThan(0.5);
      expect(inner?.maxPressure ?? 0).toBeGreaterThan(q);
      expect(contact.tensionInBilateral).toEqual([]);
      // Bonded relies on tension (flagged); the inner-edge line pulls down at or next to the corners only.
      expect(results.bonded.contact?.tensionInBilateral.length ?? 0).toBeGreaterThan(0);
      const pulls = results['inner edge'].contact?.tensionInBilateral ?? [];
      expect(pulls.length).toBeGreaterThan(0);
      for (const pull of pulls) {
        const k = Number(/^N(\d+)\./.exec(pull.id)?.[1]) % SEGMENTS_PER_SIDE;
        expect([0, 1, SEGMENTS_PER_SIDE - 1]).toContain(k);
      }
    });
  }
});
