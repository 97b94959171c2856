import type { JanssenState } from './janssen.js';

/**
 * Filling pressures on the vertical wall of a squat or intermediate bin: EN 1991-4:2006 5.3.1.1,
 * expressions (5.71)-(5.80) as we have them (REFERENCES.md §1, from memory and checked against a
 * published worked example). Depth z below the equivalent surface; h_o is the depth of the highest
 * wall contact below it (0 for a level surface).
 */
export interface SquatParameters {
  unitWeight: number;
  lateralPressureRatio: number;
  wallFrictionCoefficient: number;
  hydraulicRadius: number;
  /** Upper characteristic angle of repose phi_r, rad. */
  angleOfRepose: number;
  /** Depth of the highest wall contact below the equivalent surface h_o, m. */
  h0: number;
}

export interface SquatProfile {
  z0: number;
  ph0: number;
  /** Exponent n of the depth function Y_R. */
  n: number;
  at(z: number): JanssenState;
}

export function squatProfile(params: SquatParameters): SquatProfile {
  const { unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, hydraulicRadius, angleOfRepose, h0 } = params;
  const z0 = hydraulicRadius / (K * mu);
  const ph0 = gamma * K * z0;
  const n = -(1 + Math.tan(angleOfRepose)) * (1 - h0 / z0);
  return {
    z0,
    ph0,
    n,
    at(z: number): JanssenState {
      if (z <= h0) {
        return { z, YJ: 0, ph: 0, pw: 0, pv: gamma * z, nzSk: 0 };
      }
      const YR = 1 - Math.pow((z - h0) / (z0 - h0) + 1, n);
      // z_V: the denominator is (z_o - h_o)^n (writing (z - h_o)^n is a known misprint).
      const zV = h0 - (1 / (n + 1)) * (z0 - h0 - Math.pow(z + z0 - 2 * h0, n + 1) / Math.pow(z0 - h0, n));
      const ph = ph0 * YR;
      return { z, YJ: YR, ph, pw: mu * ph, pv: gamma * zV, nzSk: mu * ph0 * (z - zV) };
    },
  };
}
