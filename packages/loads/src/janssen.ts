/**
 * Filling pressures on the vertical wall of a slender bin: EN 1991-4:2006 5.2.1.1, expressions
 * (5.1)-(5.6), after Janssen (1895). Depth z is measured down from the equivalent surface.
 */
export interface JanssenParameters {
  /** Unit weight of the solid gamma, N/m3. */
  unitWeight: number;
  /** Lateral pressure ratio K. */
  lateralPressureRatio: number;
  /** Wall friction coefficient mu. */
  wallFrictionCoefficient: number;
  /** Ratio of plan area to plan perimeter A/U, m (d_c/4 for a circle). */
  hydraulicRadius: number;
}

export interface JanssenState {
  /** Depth below the equivalent surface, m. */
  z: number;
  /** Janssen depth variation Y_J(z) = 1 - exp(-z/z_o). */
  YJ: number;
  /** Horizontal pressure p_hf, Pa. */
  ph: number;
  /** Wall frictional traction p_wf, Pa. */
  pw: number;
  /** Mean vertical stress p_vf, Pa. */
  pv: number;
  /** Characteristic vertical force in the wall per unit perimeter from friction n_zSk, N/m (5.7). */
  nzSk: number;
}

export interface JanssenProfile {
  /** Janssen characteristic depth z_o = A / (K mu U), m (5.5). */
  z0: number;
  /** Asymptotic horizontal pressure p_ho = gamma K z_o, Pa (5.4). */
  ph0: number;
  at(z: number): JanssenState;
}

export function janssenProfile(params: JanssenParameters): JanssenProfile {
  const { unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, hydraulicRadius } = params;
  const z0 = hydraulicRadius / (K * mu);
  const ph0 = gamma * K * z0;
  return {
    z0,
    ph0,
    at(z: number): JanssenState {
      // -expm1 keeps Y_J accurate near the surface, where 1 - exp(-x) loses digits.
      const YJ = -Math.expm1(-z / z0);
      const ph = ph0 * YJ;
      return { z, YJ, ph, pw: mu * ph, pv: ph / K, nzSk: mu * ph0 * (z - z0 * YJ) };
    },
  };
}
