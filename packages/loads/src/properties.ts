/**
 * Characteristic values of the stored solid's properties chosen per load effect:
 * EN 1991-4:2006 3.3 and Table 3.1 (upper value x_u = a x_m, lower value x_l = x_m / a; the table's
 * assignments as in REFERENCES.md §1, from memory). The unit weight is always the upper
 * characteristic value (EN 1991-4 3.3(2)).
 */
export interface SolidProperties {
  name: string;
  /** Upper characteristic unit weight gamma_u, N/m3. */
  unitWeight: number;
  /** Mean lateral pressure ratio K_m and its conversion factor a_K. */
  lateralPressureRatio: number;
  lateralPressureRatioFactor: number;
  /** Mean wall friction coefficient mu_m and its conversion factor a_mu. */
  wallFrictionCoefficient: number;
  wallFrictionFactor: number;
  /** Mean angle of internal friction phi_im, rad, and its conversion factor a_phi. */
  internalFrictionAngle?: number;
  internalFrictionFactor?: number;
}

export type LoadEffect = 'maxNormalPressure' | 'maxWallFriction' | 'maxHopperLoad';

export interface CharacteristicSet {
  effect: LoadEffect;
  description: string;
  unitWeight: number;
  lateralPressureRatio: number;
  wallFrictionCoefficient: number;
  /** Characteristic angle of internal friction, rad (NaN when the solid gives no phi_im). */
  internalFrictionAngle: number;
}

export function characteristicSet(solid: SolidProperties, effect: LoadEffect): CharacteristicSet {
  const Ku = solid.lateralPressureRatio * solid.lateralPressureRatioFactor;
  const Kl = solid.lateralPressureRatio / solid.lateralPressureRatioFactor;
  const muU = solid.wallFrictionCoefficient * solid.wallFrictionFactor;
  const muL = solid.wallFrictionCoefficient / solid.wallFrictionFactor;
  const phi = solid.internalFrictionAngle ?? Number.NaN;
  const aPhi = solid.internalFrictionFactor ?? 1;
  const phiU = phi * aPhi;
  const phiL = phi / aPhi;
  switch (effect) {
    case 'maxNormalPressure':
      return { effect, description: 'maximum normal pressure on the vertical wall: K upper, mu lower, phi_i lower', unitWeight: solid.unitWeight, lateralPressureRatio: Ku, wallFrictionCoefficient: muL, internalFrictionAngle: phiL };
    case 'maxWallFriction':
      return { effect, description: 'maximum frictional traction on the vertical wall: K upper, mu upper, phi_i lower', unitWeight: solid.unitWeight, lateralPressureRatio: Ku, wallFrictionCoefficient: muU, internalFrictionAngle: phiL };
    case 'maxHopperLoad':
      return { effect, description: 'maximum vertical load on the hopper: K lower, mu lower, phi_i upper', unitWeight: solid.unitWeight, lateralPressureRatio: Kl, wallFrictionCoefficient: muL, internalFrictionAngle: phiU };
  }
}
