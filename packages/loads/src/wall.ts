import type { ActionAssessmentClass } from './classification.js';
import type { SlendernessClass } from './slenderness.js';

export interface DischargeFactors {
  /** C_h: p_he = C_h p_hf. */
  Ch: number;
  /** C_w: p_we = C_w p_wf. */
  Cw: number;
  expression: string;
  clause: string;
}

/**
 * Discharge factors for the vertical wall (REFERENCES.md §1, from memory):
 * - slender, AAC 2 and 3: C_h = 1.15, C_w = 1.10 (EN 1991-4 5.2.2.1);
 * - intermediate (1 < h_c/d_c < 2), AAC 2 and 3: C_h = 1 + 0.15 C_S, C_w = 1 + 0.10 C_S, C_S = h_c/d_c - 1
 *   (EN 1991-4 5.3.2);
 * - AAC 1 with h_c/d_c > 1, where enlarged symmetrical loads replace the patch loads:
 *   C_h = 1.15 + 1.5 (1 + 0.4 e/d_c) C_op, C_w = 1.4 (1 + 0.4 e/d_c), e = max(e_f, e_o)
 *   (EN 1991-4 5.2.2.1; from memory, to be confirmed against the standard);
 * - squat (h_c/d_c <= 1): C_h = C_w = 1.0 (EN 1991-4 5.3.2).
 */
export function dischargeFactors(slenderness: SlendernessClass, aac: ActionAssessmentClass, aspect: number, eccentricityRatio: number, patchLoadFactor: number): DischargeFactors {
  if (slenderness === 'squat' || slenderness === 'retaining') {
    return { Ch: 1, Cw: 1, expression: 'C_h = C_w = 1.0 (squat)', clause: 'EN 1991-4 5.3.2' };
  }
  if (aac === 1) {
    const bracket = 1 + 0.4 * eccentricityRatio;
    return { Ch: 1.15 + 1.5 * bracket * patchLoadFactor, Cw: 1.4 * bracket, expression: 'C_h = 1.15 + 1.5 (1 + 0.4 e/d_c) C_op; C_w = 1.4 (1 + 0.4 e/d_c)', clause: 'EN 1991-4 5.2.2.1 (AAC 1; from memory)' };
  }
  if (slenderness === 'intermediate') {
    const CS = aspect - 1;
    return { Ch: 1 + 0.15 * CS, Cw: 1 + 0.1 * CS, expression: 'C_h = 1 + 0.15 C_S; C_w = 1 + 0.10 C_S; C_S = h_c/d_c - 1', clause: 'EN 1991-4 5.3.2 (from memory)' };
  }
  return { Ch: 1.15, Cw: 1.1, expression: 'C_h = 1.15; C_w = 1.10', clause: 'EN 1991-4 5.2.2.1 (from memory)' };
}

/**
 * Patch load factors, EN 1991-4:2006 5.2.1.2 (5.8)-(5.9) and 5.2.2.2 (5.14)-(5.15) (REFERENCES.md §1,
 * from memory): C_pf = 0.21 C_op (1 + 2 E^2)(1 - exp(-1.5 (h_c/d_c - 1))), E = 2 e_f / d_c;
 * C_pe = 0.42 C_op (1 + 2 E^2)(1 - exp(-1.5 (h_c/d_c - 1))), E = 2 e / d_c, e = max(e_f, e_o);
 * both never negative (zero for h_c/d_c <= 1).
 */
export function patchFactors(aspect: number, patchLoadFactor: number, fillingEccentricityRatio: number, dischargeEccentricityRatio: number): { Cpf: number; Cpe: number } {
  const growth = 1 - Math.exp(-1.5 * (aspect - 1));
  const Ef = 2 * fillingEccentricityRatio;
  const E = 2 * dischargeEccentricityRatio;
  return {
    Cpf: Math.max(0, 0.21 * patchLoadFactor * (1 + 2 * Ef * Ef) * growth),
    Cpe: aspect <= 1 ? 0 : Math.max(0, 0.42 * patchLoadFactor * (1 + 2 * E * E) * growth),
  };
}

/** Height of the patch zone s = pi d_c / 16 (EN 1991-4 5.2.1.2 (5.10)). */
export function patchHeight(diameter: number): number {
  return (Math.PI * diameter) / 16;
}

/**
 * Net horizontal force of the thin-walled patch: p_p cos(theta) over a band of height s around the
 * whole circumference (EN 1991-4 5.2.1.3): F_p = integral p_p cos^2(theta) r dtheta s = (pi/2) s d_c p_p.
 */
export function thinWalledPatchForce(diameter: number, patchPressure: number): number {
  return (Math.PI / 2) * patchHeight(diameter) * diameter * patchPressure;
}

/**
 * Factor zeta of the substitute uniform pressure increase that may replace the patch loads of a
 * circular bin in action assessment class 2, EN 1991-4:2006 5.2.3 (filling and
 * discharge), as we recall it (from memory, not confirmed against the text):
 * zeta = 0.5 + 0.01 (d_c / t), at least 1.0, t the wall thickness. The filling pressures become
 * p_hf,u = (1 + zeta C_pf) p_hf and p_wf,u = (1 + zeta C_pf) p_wf; at discharge
 * p_he,u = (1 + zeta C_pe) p_he and p_we,u = (1 + zeta C_pe) p_we.
 */
export function uniformIncreaseZeta(diameter: number, wallThickness: number): number {
  return Math.max(1, 0.5 + 0.01 * (diameter / wallThickness));
}

/** The multiplier 1 + zeta C_p of the uniform pressure increase (C_p = C_pf at filling, C_pe at discharge). */
export function uniformIncreaseFactor(zeta: number, patchFactor: number): number {
  return 1 + zeta * Math.max(0, patchFactor);
}
