import { describe, expect, it } from 'vitest';
import { analyse, type SectionStiffness } from '@binsupport/girder';
import { buildRingModel, nodeId } from './ring.js';

// Ring of radius R on n equally spaced simple supports under a uniform vertical load q on the
// centroid line; alpha = pi/n, theta from mid-span (Timoshenko, Strength of Materials Part II, ring
// loaded normally to its plane; Roark's Formulas for Stress and Strain, circular ring beams):
//   M_mid = q R^2 (alpha/sin(alpha) - 1), M_sup = -q R^2 (1 - alpha cot(alpha)),
//   T(theta) = q R^2 (theta - alpha sin(theta)/sin(alpha)), |T| largest at cos(theta*) = sin(alpha)/alpha.
// Our sign convention: My > 0 puts the top fibre in tension, so sagging (M_mid > 0 in the book) is My < 0.
const R = 3;
const q = 100e3;
const heb300: SectionStiffness = { A: 149.1e-4, Iy: 25170e-8, Iz: 8563e-8, It: 185.0e-8, Iw: 1688e-9, E: 210e9, G: 81e9, density: 0 };

function ringUnder(columns: number, segmentsPerSpan: number, vertical: number, radial: number, depth = 0) {
  const model = buildRingModel({
    layout: { radius: R, columns, segmentsPerSpan },
    section: heb300,
    sectionDepth: depth,
    cases: [{ name: 'Q', description: 'test load', kind: 'variable', lineRadius: R, verticalLineLoad: vertical, radialLineLoad: radial, verticalResultant: vertical * 2 * Math.PI * R }],
    selfWeightCase: 'none',
  });
  return { model, result: analyse(model, { name: 'Q', factors: { Q: 1 } }, { stationsPerElement: 3 }) };
}

describe('ring girder model (design builder) against the closed-form ring on n supports', () => {
  for (const n of [4, 6, 8]) {
    it(`n = ${n}: support and mid-span moments and the largest torque within 1%`, () => {
      const alpha = Math.PI / n;
      const Mmid = q * R * R * (alpha / Math.sin(alpha) - 1);
      const Msup = -q * R * R * (1 - alpha / Math.tan(alpha));
      const thetaStar = Math.acos(Math.sin(alpha) / alpha);
      const Tmax = q * R * R * (thetaStar - (alpha * Math.sin(thetaStar)) / Math.sin(alpha));
      const segmentsPerSpan = 24;
      const { result } = ringUnder(n, segmentsPerSpan, q, 0);
      const atNode = (k: number) => result.stations.find((s) => s.element === `RG${k + 1}` && s.x === 0);
      const support = atNode(0);
      const mid = atNode(segmentsPerSpan / 2);
      expect(-(mid?.My ?? 0) / Mmid).toBeCloseTo(1, 2);
      expect(-(support?.My ?? 0) / Msup).toBeCloseTo(1, 2);
      const peakT = Math.max(...result.stations.map((s) => Math.abs(s.T)));
      expect(peakT / Math.abs(Tmax)).toBeCloseTo(1, 2);
    });
  }

  it('closed ring under the hopper pull at the top flange: uniform bending m R, ring force q_r R, no torque', () => {
    // A radial pull q_r at h/2 above the centroid is a uniform distributed moment m = q_r h/2 about
    // the ring's axis; a closed ring carries it in uniform bending M = m R and the pull itself as the
    // hoop force N = -q_r R (statics of a closed ring; REFERENCES.md §2, derived).
    const qr = 50e3;
    const h = 0.3;
    const { result } = ringUnder(8, 12, 0, qr, h);
    const m = qr * (h / 2);
    for (const station of result.stations) {
      expect(Math.abs(station.My) / (m * R)).toBeCloseTo(1, 3);
      expect(station.N / (-qr * R)).toBeCloseTo(1, 3);
      expect(Math.abs(station.T) / (m * R)).toBeLessThan(1e-6);
    }
  });

  it('applies the resultant of the support-line load: applied = reactions = q 2 pi R', () => {
    const { model, result } = ringUnder(6, 8, q, 20e3, 0.3);
    expect(model.nodes[0]?.id).toBe(nodeId(0));
    expect(-result.appliedSum[2] / (q * 2 * Math.PI * R)).toBeCloseTo(1, 12);
    expect(result.reactionSum[2] / (q * 2 * Math.PI * R)).toBeCloseTo(1, 9);
  });
});
