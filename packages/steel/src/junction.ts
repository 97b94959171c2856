import type { CheckResult } from './checks.js';
import { SteelError } from './errors.js';
import type { SteelGrade } from './grades.js';
import { strengthsForThickness } from './grades.js';

function positive(name: string, value: number): number {
  if (!Number.isFinite(value) || value <= 0) throw new SteelError('INVALID_OPTIONS', `${name} must be a positive number in SI units; got ${value}.`, name);
  return value;
}

function ratio(effect: number, resistance: number): number {
  if (effect === 0) return 0;
  return resistance > 0 ? effect / resistance : Number.POSITIVE_INFINITY;
}

/** The shells that meet at the transition ring, and the ring itself. */
export interface TransitionJunction {
  /** r, radius of the junction (cylinder mid-surface) [m] */
  radius: number;
  /** t_c, cylinder wall thickness just above the junction [m] */
  cylinderThickness: number;
  /** t_h, hopper wall thickness just below the junction [m] */
  hopperThickness: number;
  /** beta, hopper apex half-angle [rad] (the hopper wall's angle to the vertical) */
  hopperHalfAngle: number;
  /** t_s, skirt thickness [m] where the cylinder continues below the junction; omitted or 0 for none */
  skirtThickness?: number;
  /** A_r, cross-sectional area of the ring itself (the girder) [m2] */
  ringArea: number;
  /** the ring's thickest plate [m], for its yield strength (EN 1993-1-1 Table 3.1) */
  ringThickness: number;
}

/** Effective lengths of shell acting with the ring, and the effective area. */
export interface JunctionEffectiveSection {
  /** coefficient used: 0.778 (elastic) or 0.975 (plastic) */
  coefficient: number;
  cylinderLength: number;
  hopperLength: number;
  skirtLength: number;
  /** A_eff = A_r + l_ec t_c + l_eh t_h + l_es t_s [m2] */
  area: number;
}

/**
 * Effective lengths of the shells at a transition junction, EN 1993-4-1 (REFERENCES section 6, from memory):
 *   l_ec = k sqrt(r t_c), l_eh = k sqrt(r t_h / cos beta), l_es = k sqrt(r t_s),
 * k = 0.778 for the elastic stress check, 0.975 in place of 0.778 for the plastic check (from memory).
 */
export function junctionEffectiveSection(junction: TransitionJunction, coefficient: number): JunctionEffectiveSection {
  const r = positive('radius', junction.radius);
  const tc = positive('cylinderThickness', junction.cylinderThickness);
  const th = positive('hopperThickness', junction.hopperThickness);
  const beta = junction.hopperHalfAngle;
  if (!Number.isFinite(beta) || beta <= 0 || beta >= Math.PI / 2) {
    throw new SteelError('INVALID_OPTIONS', `hopperHalfAngle must lie between 0 and pi/2 rad; got ${beta}.`, 'hopperHalfAngle');
  }
  const ts = junction.skirtThickness ?? 0;
  if (!Number.isFinite(ts) || ts < 0) throw new SteelError('INVALID_OPTIONS', `skirtThickness must be zero or positive; got ${ts}.`, 'skirtThickness');
  const Ar = positive('ringArea', junction.ringArea);
  const cylinderLength = coefficient * Math.sqrt(r * tc);
  const hopperLength = coefficient * Math.sqrt((r * th) / Math.cos(beta));
  const skirtLength = ts > 0 ? coefficient * Math.sqrt(r * ts) : 0;
  return { coefficient, cylinderLength, hopperLength, skirtLength, area: Ar + cylinderLength * tc + hopperLength * th + skirtLength * ts };
}

/**
 * Ring compression at the cylinder/hopper transition, EN 1993-4-1 (junction; REFERENCES section 6,
 * from memory). The hopper's meridional tension n_h pulls the junction inwards with the radial line
 * load q = n_h sin beta (the caller gives q, inward positive [N/m]); the ring's hoop compression is
 * N = q r. Resistance of the effective ring (the ring plus the effective shell lengths):
 *   plastic (default): N_Rd = A_eff(0.975) f_y / gamma_M0;  elastic: sigma = N / A_eff(0.778) <= f_y / gamma_M0.
 * One f_y (the lower of ring and shell plates) is used for the whole effective section; the
 * meridional/hoop stress interaction in the shell is not included.
 */
export function checkJunctionRingCompression(
  junction: TransitionJunction,
  grade: SteelGrade,
  radialLineLoad: number,
  options: { method?: 'plastic' | 'elastic' } = {},
): CheckResult {
  if (!Number.isFinite(radialLineLoad)) throw new SteelError('INVALID_FORCES', `radialLineLoad must be a finite line load in N/m; got ${radialLineLoad}.`, 'radialLineLoad');
  const method = options.method ?? 'plastic';
  const elastic = junctionEffectiveSection(junction, 0.778);
  const plastic = junctionEffectiveSection(junction, 0.975);
  const thicknesses = [junction.ringThickness, junction.cylinderThickness, junction.hopperThickness, ...(junction.skirtThickness ? [junction.skirtThickness] : [])];
  const fy = Math.min(...thicknesses.map((t) => strengthsForThickness(grade, positive('thickness', t)).yieldStrength));
  const N = Math.max(0, radialLineLoad) * junction.radius;
  const used = method === 'plastic' ? plastic : elastic;
  const NRd = (used.area * fy) / grade.gammaM0;
  return {
    id: 'junction-ring-compression',
    title: `Transition ring in compression (${method}, effective shell lengths)`,
    clause: 'EN 1993-4-1 junction effective section (coefficients from memory)',
    utilisation: ratio(N, NRd),
    inputs: {
      q_r: radialLineLoad,
      r: junction.radius,
      t_c: junction.cylinderThickness,
      t_h: junction.hopperThickness,
      t_s: junction.skirtThickness ?? 0,
      beta: junction.hopperHalfAngle,
      A_r: junction.ringArea,
      f_y: fy,
      gamma_M0: grade.gammaM0,
    },
    intermediate: {
      N_Ed: N,
      l_ec: elastic.cylinderLength,
      l_eh: elastic.hopperLength,
      l_es: elastic.skirtLength,
      A_eff_elastic: elastic.area,
      l_ec_plastic: plastic.cylinderLength,
      l_eh_plastic: plastic.hopperLength,
      l_es_plastic: plastic.skirtLength,
      A_eff_plastic: plastic.area,
      N_Rd: NRd,
    },
  };
}

/**
 * In-plane buckling of a ring under uniform radial (inward) line load, q_cr = 3 E I / R^3 for load that
 * follows the deformation (Roark, rings under external pressure; REFERENCES section 2). I is about the
 * axis normal to the ring plane (the weak axis of a vertical-web girder, plus any shell the caller
 * counts). Stated check q / (q_cr / gamma_M1) <= 1: an elastic bifurcation load with gamma_M1, not the
 * buckling rules of EN 1993-4-1 (not implemented).
 */
export function checkRingInPlaneBuckling(input: { radialLineLoad: number; radius: number; secondMomentOfArea: number }, grade: SteelGrade): CheckResult {
  const q = input.radialLineLoad;
  if (!Number.isFinite(q)) throw new SteelError('INVALID_FORCES', `radialLineLoad must be a finite line load in N/m; got ${q}.`, 'radialLineLoad');
  const R = positive('radius', input.radius);
  const I = positive('secondMomentOfArea', input.secondMomentOfArea);
  const qcr = (3 * grade.youngsModulus * I) / R ** 3;
  return {
    id: 'ring-in-plane-buckling',
    title: 'In-plane buckling of the ring under radial load',
    clause: 'Roark, ring under uniform external pressure: q_cr = 3 E I / R^3 (stated check with gamma_M1)',
    utilisation: ratio(Math.max(0, q), qcr / grade.gammaM1),
    inputs: { q, R, I, E: grade.youngsModulus, gamma_M1: grade.gammaM1 },
    intermediate: { q_cr: qcr, q_Rd: qcr / grade.gammaM1 },
  };
}
