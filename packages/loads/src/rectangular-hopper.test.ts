import { describe, expect, it } from 'vitest';
import { hopperPressures, type HopperParameters } from './hopper.js';
import { rectangularBinLoads, type RectangularBinLoadInput } from './rectangular.js';

const DEG = Math.PI / 180;
// EN 1991-4:2006 Table E.1, wheat (read in the standard).
const wheat = { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: 34 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.12, patchLoadFactor: 0.5 };

function wedgeBin(slotAlong: 'x' | 'y', lengthX: number, lengthY: number): RectangularBinLoadInput {
  return {
    bin: { lengthX, lengthY, cylinderHeight: 10, fillHeight: 9, wallThickness: 0.006, hopper: { kind: 'wedge', slotAlong, height: 3, outletWidth: 0.4, thickness: 0.008 }, steelDensity: 7850 },
    solid: wheat,
    partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
    stationsPerEdge: 201,
  };
}

describe('hopper pressures with the shape coefficient S (EN 1991-4 6.3)', () => {
  const base: HopperParameters = { unitWeight: 9000, lateralPressureRatio: 0.5, wallFrictionCoefficient: 0.3, internalFrictionAngle: 35 * DEG, apexHalfAngle: Math.atan(0.6), radius: 2, outletRadius: 0.2, transitionStress: 40_000 };

  it('steep wedge (S = 1) evaluated by hand: tan(beta) = 0.6, K = 0.5, mu_h = 0.3, phi_i = 35 deg, gamma = 9 kN/m3, p_vft = 40 kPa (standard\'s expressions as we have them, from memory)', () => {
    const wedge = hopperPressures(base, 1);
    // (6.1): (1 - K)/(2 mu_h) = 0.5/0.6 = 0.8333 > tan(beta) = 0.6: steep.
    expect(wedge.kind).toBe('steep');
    expect(wedge.steepLimit).toBeCloseTo(0.8333333333, 9);
    // (6.21) F_f = 1 - 0.2/(1 + 0.6/0.3) = 0.93333; (6.7) n = 1 (0.93333 x 0.3/0.6 + 0.93333) - 2 = -0.6.
    expect(wedge.filling.F).toBeCloseTo(0.9333333333, 9);
    expect(wedge.filling.n).toBeCloseTo(-0.6, 12);
    // h_h = (B/2)/tan(beta) = 2/0.6 = 3.3333 m; (6.6) at x = h_h/2:
    // p_v = (9000 x 3.3333 / (-1.6)) (0.5 - 0.5^-0.6) + 40000 x 0.5^-0.6 = 79673.35 Pa (hand calculation).
    expect(wedge.coneHeight).toBeCloseTo(3.333333333, 9);
    const mid = wedge.filling.at(wedge.coneHeight / 2);
    expect(mid.pv).toBeCloseTo(79673.35, 1);
    expect(mid.pn).toBeCloseTo(0.9333333333 * 79673.35, 0); // (6.19) p_nf = F_f p_v = 74361.8 Pa
    expect(mid.pt).toBeCloseTo(0.3 * 0.9333333333 * 79673.35, 0); // (6.20) p_tf = mu_h F_f p_v = 22308.5 Pa
    // At the slot, x_o = 0.2/0.6 = x/h_h = 0.1: p_v = 232013.0 Pa, p_n = 216545.4 Pa.
    expect(wedge.filling.at(wedge.outletHeight).pn).toBeCloseTo(216545.4, 0);
    // Discharge (6.22)-(6.25): phi_wh = atan(0.3); eps = phi_wh + asin(sin(phi_wh)/sin(35 deg)) = 46.764 deg;
    // F_e = (1 + sin(35) cos(eps)) / (1 - sin(35) cos(2 beta + eps)) = 1.17662; n_e = F_e (0.5 + 1) - 2 = -0.23506.
    expect(wedge.discharge.F).toBeCloseTo(1.176624, 5);
    expect(wedge.discharge.n).toBeCloseTo(-0.235064, 5);
    expect(wedge.discharge.at(wedge.coneHeight / 2).pn).toBeCloseTo(74741.3, 0);
  });

  it('the bin\'s wedge profiles are those expressions with the bin\'s own K, mu_h, beta and p_vft (EN 1991-4 6.3.2, Table 3.1 maximum hopper load)', () => {
    const loads = rectangularBinLoads(wedgeBin('x', 6, 4));
    const hopper = loads.profiles.find((p) => p.part === 'hopper' && p.case === 'Q_s,f');
    expect(hopper?.faces).toEqual(['south', 'north']);
    const K = 0.54 / 1.11;
    const mu = 0.38 / 1.16;
    const tanB = 1.8 / 3; // (b - b_o)/2 over the hopper height
    const F = 1 - 0.2 / (1 + tanB / mu);
    const n = F * mu / tanB + F - 2; // S = 1
    const hh = 2 / tanB;
    const pvft = loads.derivation.find((d) => d.symbol === 'p_vft')?.value ?? Number.NaN;
    const xi = (0.2 / tanB) / hh; // at the slot
    const pv = ((9000 * hh) / (n - 1)) * (xi - Math.pow(xi, n)) + pvft * Math.pow(xi, n);
    expect(hopper?.ph.at(-1)).toBeCloseTo(F * pv, 4);
    expect(hopper?.ph[0]).toBeCloseTo(F * pvft, 4);
    // (6.1) with the lower K and mu_h: steep since tan(beta) = 0.6 < (1 - K)/(2 mu_h) = 0.784.
    expect(loads.derivation.find((d) => d.symbol === '(1-K)/(2 mu_h) (south, north)')?.value).toBeCloseTo((1 - K) / (2 * mu), 12);
    expect(loads.classification.hopperFaces).toEqual([{ faces: ['south', 'north'], slope: Math.atan(tanB), kind: 'steep' }]);
  });
});

describe('wedge hopper on the support line', () => {
  it('the slot direction turns the bin: a x b with the slot along X carries what b x a with the slot along Y carries, a quarter turn on (symmetry)', () => {
    const alongX = rectangularBinLoads(wedgeBin('x', 6, 4));
    const alongY = rectangularBinLoads(wedgeBin('y', 4, 6));
    expect(alongY.totals.solidWeight).toBeCloseTo(alongX.totals.solidWeight, 6);
    expect(alongY.totals.structureWeight).toBeCloseTo(alongX.totals.structureWeight, 6);
    // A quarter turn counter-clockwise takes the south edge of the first onto the east edge of the second.
    const pairs: Array<[string, string]> = [['south', 'east'], ['east', 'north'], ['north', 'west'], ['west', 'south']];
    for (const name of ['G', 'Q_s,f', 'Q_s,e']) {
      for (const [from, to] of pairs) {
        const e1 = alongX.edges.find((e) => e.case === name && e.edge === from);
        const e2 = alongY.edges.find((e) => e.case === name && e.edge === to);
        e1?.vertical.forEach((v, i) => expect(e2?.vertical[i]).toBeCloseTo(v, 6));
        e1?.inward.forEach((v, i) => expect(e2?.inward[i]).toBeCloseTo(v, 6));
      }
    }
  });

  it('the sloping faces hang the whole hopper load and pull inward by it times tan(beta); the vertical end walls carry wall friction only (plane-flow statics)', () => {
    const loads = rectangularBinLoads(wedgeBin('x', 6, 4));
    const south = loads.edges.find((e) => e.case === 'Q_s,f' && e.edge === 'south');
    const east = loads.edges.find((e) => e.case === 'Q_s,f' && e.edge === 'east');
    const nzSk = loads.derivation.find((d) => d.symbol === 'n_zSk(h_c)')?.value ?? Number.NaN;
    const Fh = loads.derivation.find((d) => d.symbol === 'F_h')?.value ?? Number.NaN;
    // Each sloping face: F_h / 2 spread uniformly over a = 6 m (the slot runs the full length).
    south?.vertical.forEach((v) => expect(v).toBeCloseTo(nzSk + Fh / 2 / 6, 6));
    south?.inward.forEach((v) => expect(v).toBeCloseTo((Fh / 2 / 6) * 0.6, 6));
    east?.vertical.forEach((v) => expect(v).toBeCloseTo(nzSk, 6));
    east?.inward.forEach((v) => expect(v).toBe(0));
    // Volume of the wedge: a h_h (b + b_o)/2 (geometry).
    expect(loads.derivation.find((d) => d.symbol === 'V_hop')?.value).toBeCloseTo((6 * 3 * (4 + 0.4)) / 2, 9);
  });

  it('a steep square pyramid\'s pressures close on the hopper load (slice equilibrium of EN 1991-4 (6.6) with S = 2, derived)', () => {
    const input = wedgeBin('x', 5, 5);
    const loads = rectangularBinLoads({ ...input, bin: { ...input.bin, hopper: { kind: 'pyramid', height: 4, outletLengthX: 0.5, outletLengthY: 0.5, thickness: 0.008 } } });
    expect(loads.classification.hopper).toBe('steep');
    expect(Math.abs(loads.derivation.find((d) => d.symbol === 'delta_hop')?.value ?? Number.NaN)).toBeLessThan(1e-6);
  });
});
