import { LoadsError } from './errors.js';
import { hopperPressures, type HopperParameters, type HopperPressures, type HopperPressureSet, type HopperState } from './hopper.js';
import type { HopperFace, RectangularHopperGeometry } from './rectangular-geometry.js';

/**
 * Hopper pressures of a rectangular bin, EN 1991-4:2006 6.1-6.3 (REFERENCES.md §1, from memory; the
 * steep/shallow test (6.1) seen). The standard's expressions carry a shape coefficient S: 2 for a
 * cone or a pyramid, 1 for a wedge (plane flow). A pyramid uses hopperPressures (S = 2) of the
 * circular bin, once per pair of opposite faces with that pair's slope beta from the vertical (a
 * rectangular pyramid has two); a wedge uses the same expressions with S = 1 (below), for its two
 * sloping faces. In both, x is measured up from the apex of the full hopper: for a face pair whose
 * side across is B at the transition and B_o at the outlet, h_h = (B/2)/tan(beta) and x_o = (B_o/2)/tan(beta).
 */

const HOPPER_ROUGHNESS_B = 0.2; // b of EN 1991-4 6.3.2 (6.20), empirical, from memory

function shapedSet(gamma: number, coneHeight: number, pvft: number, F: number, mu: number, n: number): HopperPressureSet {
  return {
    F,
    mu,
    n,
    at(x: number): HopperState {
      const xi = x / coneHeight;
      // EN 1991-4 (6.6); n = 1 is the limit of (xi - xi^n)/(n - 1) = -xi ln(xi).
      const part = Math.abs(n - 1) < 1e-9 ? -xi * Math.log(xi) : (xi - Math.pow(xi, n)) / (n - 1);
      const pv = gamma * coneHeight * part + pvft * Math.pow(xi, n);
      return { x, pv, pn: F * pv, pt: mu * F * pv };
    },
  };
}

/**
 * The hopper expressions of EN 1991-4 6.3 with the shape coefficient S as a parameter (hopper.ts fixes
 * S = 2): steep filling F_f = 1 - b/(1 + tan(beta)/mu_h), n = S (F mu_h cot(beta) + F) - 2 (6.19)-(6.21);
 * steep discharge F_e = (1 + sin(phi_i) cos(eps))/(1 - sin(phi_i) cos(2 beta + eps)),
 * eps = phi_wh + asin(sin(phi_wh)/sin(phi_i)) (6.22)-(6.25); shallow mu_heff = (1 - K)/(2 tan(beta)),
 * n = S (1 - b) mu_heff cot(beta), F_f = 1 - b/(1 + tan(beta)/mu_heff), discharge = filling (6.26)-(6.28).
 * The "- 2" is the standard's form as we have it (from memory): slice equilibrium of a wedge (plan
 * area growing as x, not x^2) gives S (F mu_h cot(beta) + F) - S instead, so with S = 1 the
 * standard's pressures do not satisfy the statics of the solid; see `hopperWallVerticalForce`.
 */
export function shapedHopperPressures(params: HopperParameters, shapeFactor: number): HopperPressures {
  const { unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: beta, radius, outletRadius, transitionStress: pvft } = params;
  const S = shapeFactor;
  const b = HOPPER_ROUGHNESS_B;
  const tanB = Math.tan(beta);
  const cotB = 1 / tanB;
  const coneHeight = radius / tanB;
  const outletHeight = outletRadius / tanB;
  const steepLimit = (1 - K) / (2 * mu);
  const phiWh = Math.atan(mu);
  if (tanB >= steepLimit) {
    const muEff = (1 - K) / (2 * tanB);
    const F = 1 - b / (1 + tanB / muEff);
    const set = shapedSet(gamma, coneHeight, pvft, F, muEff, S * (1 - b) * muEff * cotB);
    return { kind: 'shallow', steepLimit, coneHeight, outletHeight, filling: set, discharge: set, dischargeExpression: 'filling', dischargeDetail: { eps: Number.NaN, phiWh } };
  }
  const Ff = 1 - b / (1 + tanB / mu);
  const filling = shapedSet(gamma, coneHeight, pvft, Ff, mu, S * (Ff * mu * cotB + Ff) - 2);
  if (!(phiI > 0)) {
    throw new LoadsError('BAD_INPUT', 'solid.internalFrictionAngle', 'solid.internalFrictionAngle must be between 0 and 90 degrees for the hopper discharge pressures (EN 1991-4 6.3.2); got none');
  }
  if (Math.sin(phiWh) >= Math.sin(phiI)) {
    return { kind: 'steep', steepLimit, coneHeight, outletHeight, filling, discharge: filling, dischargeExpression: 'filling', dischargeDetail: { eps: Number.NaN, phiWh } };
  }
  const eps = phiWh + Math.asin(Math.sin(phiWh) / Math.sin(phiI));
  const Fe = (1 + Math.sin(phiI) * Math.cos(eps)) / (1 - Math.sin(phiI) * Math.cos(2 * beta + eps));
  const discharge = shapedSet(gamma, coneHeight, pvft, Fe, mu, S * (Fe * mu * cotB + Fe) - 2);
  return { kind: 'steep', steepLimit, coneHeight, outletHeight, filling, discharge, dischargeExpression: 'mass-flow', dischargeDetail: { eps, phiWh } };
}

/** The pressures of one pair of opposite sloping faces, and the faces they belong to. */
export interface FacePairPressures {
  faces: HopperFace[];
  /** Slope of the faces from the vertical beta, rad. */
  slope: number;
  shapeFactor: 1 | 2;
  pressures: HopperPressures;
}

/** Solid properties and transition stress for the hopper (maximum hopper load set, EN 1991-4 Table 3.1). */
export interface HopperSolid {
  unitWeight: number;
  lateralPressureRatio: number;
  wallFrictionCoefficient: number;
  internalFrictionAngle: number;
  transitionStress: number;
}

/**
 * Pressures per pair of sloping faces: pyramid, both pairs with S = 2 (hopperPressures); wedge, its
 * sloping pair with S = 1. The half-sides across a pair play the part of the cone's radii.
 */
export function rectangularHopperPressures(geometry: RectangularHopperGeometry, kind: 'pyramid' | 'wedge', solid: HopperSolid): FacePairPressures[] {
  const pairs: Array<{ faces: HopperFace[]; across: number; outletAcross: number }> = [];
  const alongX = geometry.faces.filter((f) => (f.edge === 'south' || f.edge === 'north') && f.sloping);
  const alongY = geometry.faces.filter((f) => (f.edge === 'east' || f.edge === 'west') && f.sloping);
  if (alongX.length > 0) pairs.push({ faces: alongX, across: geometry.lengthY, outletAcross: geometry.outletLengthY });
  if (alongY.length > 0) pairs.push({ faces: alongY, across: geometry.lengthX, outletAcross: geometry.outletLengthX });
  return pairs.map(({ faces, across, outletAcross }) => {
    const slope = Math.atan(faces[0]?.tanSlope ?? Number.NaN);
    const params: HopperParameters = { ...solid, apexHalfAngle: slope, radius: across / 2, outletRadius: outletAcross / 2 };
    const shapeFactor = kind === 'wedge' ? 1 : 2;
    return { faces, slope, shapeFactor, pressures: kind === 'wedge' ? shapedHopperPressures(params, 1) : hopperPressures(params) };
  });
}

/**
 * Vertical resultant of the wall tractions of all sloping faces between the outlet and the transition,
 * N, for one state: per unit height a face of horizontal length L(z) = L - (L - L_o) z/h_h carries
 * L(z) (p_n tan(beta) + p_t) (statics of the face); Simpson's rule. The vertical end walls of a wedge
 * carry nothing in the plane-flow model. Add p_v(x_o) a_o b_o for a closed outlet.
 */
export function hopperWallVerticalForce(pairs: FacePairPressures[], state: 'filling' | 'discharge', hopperHeight: number, intervals = 400): number {
  const m = intervals % 2 === 0 ? intervals : intervals + 1;
  const dz = hopperHeight / m;
  let total = 0;
  for (const pair of pairs) {
    const set = pair.pressures[state];
    const tanB = Math.tan(pair.slope);
    for (const face of pair.faces) {
      const f = (z: number) => {
        const s = set.at(Math.max(pair.pressures.coneHeight - z, 1e-6 * pair.pressures.coneHeight));
        const length = face.length - ((face.length - face.outletLength) * z) / hopperHeight;
        return length * (s.pn * tanB + s.pt);
      };
      let sum = f(0) + f(hopperHeight);
      for (let i = 1; i < m; i++) sum += (i % 2 === 1 ? 4 : 2) * f(i * dz);
      total += (sum * dz) / 3;
    }
  }
  return total;
}
