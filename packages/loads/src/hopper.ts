import { LoadsError } from './errors.js';

/**
 * Hopper pressures, EN 1991-4:2006 6.1-6.3 (REFERENCES.md §1, from memory; the steep/shallow test
 * (6.1), p_vft = C_b p_vf (6.2) and the shallow-hopper n (6.28) seen in a published worked example).
 * x is measured up from the apex of the full cone, h_h = r / tan(beta) is the cone's height to
 * the transition, S = 2 for a cone. Slice equilibrium of the solid in the cone, with the wall pressure
 * p_n = F p_v and the friction p_t = mu F p_v, reads dp_v/dx = -gamma + n p_v / x with
 * n = S (F mu cot(beta) + F) - 2, whose solution with p_v(h_h) = p_vft is the standard's (6.6):
 *   p_v(x) = (gamma h_h / (n - 1)) ((x/h_h) - (x/h_h)^n) + p_vft (x/h_h)^n.
 */
export interface HopperParameters {
  unitWeight: number;
  /** Lateral pressure ratio K (lower characteristic value, Table 3.1), for the steep/shallow test. */
  lateralPressureRatio: number;
  /** Hopper wall friction coefficient mu_h (lower characteristic value). */
  wallFrictionCoefficient: number;
  /** Angle of internal friction phi_i (upper characteristic value), rad. */
  internalFrictionAngle: number;
  apexHalfAngle: number;
  /** Radius at the transition and at the outlet, m. */
  radius: number;
  outletRadius: number;
  /** Vertical stress at the transition p_vft = C_b p_vf(h_c), Pa. */
  transitionStress: number;
}

export interface HopperState {
  x: number;
  pv: number;
  pn: number;
  pt: number;
}

export interface HopperPressureSet {
  /** F: ratio of the normal wall pressure to the mean vertical stress. */
  F: number;
  /** Friction coefficient used in p_t = mu F p_v (mu_h, or mu_heff for a shallow hopper). */
  mu: number;
  n: number;
  at(x: number): HopperState;
}

export interface HopperPressures {
  kind: 'steep' | 'shallow';
  /** Limit of the steep/shallow test (1 - K) / (2 mu_h) against tan(beta). */
  steepLimit: number;
  /** Height of the full cone h_h and of the outlet above the apex x_o, m. */
  coneHeight: number;
  outletHeight: number;
  filling: HopperPressureSet;
  discharge: HopperPressureSet;
  /** Whether the mass-flow discharge expression applies (phi_wh < phi_i); otherwise discharge = filling. */
  dischargeExpression: 'mass-flow' | 'filling';
  dischargeDetail: { eps: number; phiWh: number };
}

const HOPPER_ROUGHNESS_B = 0.2; // b of EN 1991-4 6.3.2 (6.20), empirical, from memory

function pressureSet(gamma: number, coneHeight: number, pvft: number, F: number, mu: number, n: number): HopperPressureSet {
  return {
    F,
    mu,
    n,
    at(x: number): HopperState {
      const xi = x / coneHeight;
      // n = 1 is the limit of (xi - xi^n)/(n - 1) = -xi ln(xi).
      const part = Math.abs(n - 1) < 1e-9 ? -xi * Math.log(xi) : (xi - Math.pow(xi, n)) / (n - 1);
      const pv = gamma * coneHeight * part + pvft * Math.pow(xi, n);
      return { x, pv, pn: F * pv, pt: mu * F * pv };
    },
  };
}

/**
 * The hopper pressures with the shape coefficient S of EN 1991-4 6.3: 2 for a cone or a pyramid
 * (default), 1 for a wedge (plane flow). For a wedge, `radius` and `outletRadius` are the half widths
 * across the slot. The "- 2" in the steep n is the standard's form as we have it (from memory): slice
 * equilibrium of a wedge (plan area growing as x, not x^2) gives S (F mu_h cot(beta) + F) - S, so with
 * S = 1 these pressures do not satisfy the statics of the solid (see `hopperWallVerticalForce`).
 */
export function hopperPressures(params: HopperParameters, shapeFactor = 2): HopperPressures {
  const { unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: beta, radius, outletRadius, transitionStress: pvft } = params;
  const S = shapeFactor;
  const b = HOPPER_ROUGHNESS_B;
  const tanB = Math.tan(beta);
  const cotB = 1 / tanB;
  const coneHeight = radius / tanB;
  const outletHeight = outletRadius / tanB;
  const steepLimit = (1 - K) / (2 * mu);
  const kind = tanB < steepLimit ? 'steep' : 'shallow';

  if (kind === 'shallow') {
    // EN 1991-4 6.3.3 (6.26)-(6.28): mu_heff = (1 - K)/(2 tan beta), n = S (1 - b) mu_heff cot beta,
    // F_f = 1 - b / (1 + tan beta / mu_heff); discharge pressures equal filling pressures.
    const muEff = (1 - K) / (2 * tanB);
    const F = 1 - b / (1 + tanB / muEff);
    const n = S * (1 - b) * muEff * cotB;
    const set = pressureSet(gamma, coneHeight, pvft, F, muEff, n);
    return { kind, steepLimit, coneHeight, outletHeight, filling: set, discharge: set, dischargeExpression: 'filling', dischargeDetail: { eps: Number.NaN, phiWh: Math.atan(mu) } };
  }

  // Steep filling, EN 1991-4 6.3.2 (6.19)-(6.21).
  const Ff = 1 - b / (1 + tanB / mu);
  const nf = S * (Ff * mu * cotB + Ff) - 2;
  const filling = pressureSet(gamma, coneHeight, pvft, Ff, mu, nf);

  // Steep discharge, EN 1991-4 6.3.2 (6.22)-(6.25).
  const phiWh = Math.atan(mu);
  if (!(phiI > 0)) {
    throw new LoadsError('BAD_INPUT', 'solid.internalFrictionAngle', 'solid.internalFrictionAngle must be between 0 and 90 degrees for the hopper discharge pressures (EN 1991-4 6.3.2); got none');
  }
  if (Math.sin(phiWh) >= Math.sin(phiI)) {
    // The solid shears within itself before it slides on the hopper wall: the mass-flow expression
    // has no solution; the filling pressures are kept and the report says so.
    return { kind, steepLimit, coneHeight, outletHeight, filling, discharge: filling, dischargeExpression: 'filling', dischargeDetail: { eps: Number.NaN, phiWh } };
  }
  const eps = phiWh + Math.asin(Math.sin(phiWh) / Math.sin(phiI));
  const Fe = (1 + Math.sin(phiI) * Math.cos(eps)) / (1 - Math.sin(phiI) * Math.cos(2 * beta + eps));
  const ne = S * (Fe * mu * cotB + Fe) - 2;
  const discharge = pressureSet(gamma, coneHeight, pvft, Fe, mu, ne);
  return { kind, steepLimit, coneHeight, outletHeight, filling, discharge, dischargeExpression: 'mass-flow', dischargeDetail: { eps, phiWh } };
}

/**
 * Vertical resultant of the wall tractions of a conical hopper between the outlet and the transition,
 * N, by Simpson's rule: per unit height the wall carries U(x) (p_n tan(beta) + p_t), U = 2 pi x tan(beta).
 */
export function hopperWallVerticalResultant(set: HopperPressureSet, apexHalfAngle: number, outletHeight: number, coneHeight: number, intervals = 400): number {
  const tanB = Math.tan(apexHalfAngle);
  const f = (x: number) => {
    const s = set.at(x);
    return 2 * Math.PI * x * tanB * (s.pn * tanB + s.pt);
  };
  const m = intervals % 2 === 0 ? intervals : intervals + 1;
  const h = (coneHeight - outletHeight) / m;
  let sum = f(outletHeight) + f(coneHeight);
  for (let i = 1; i < m; i++) sum += (i % 2 === 1 ? 4 : 2) * f(outletHeight + i * h);
  return (sum * h) / 3;
}
