/**
 * Characteristic values of the stored solid's properties chosen per load effect:
 * EN 1991-4:2006 3.3 and Table 3.1 (upper value x_u = a x_m, lower value x_l = x_m / a).
 * The unit weight is always the upper characteristic value (EN 1991-4 3.3(2)).
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
}

export type LoadEffect = 'maxNormalPressure' | 'maxWallFriction' | 'maxHopperLoad';

export interface CharacteristicSet {
  effect: LoadEffect;
  description: string;
  unitWeight: number;
  lateralPressureRatio: number;
  wallFrictionCoefficient: number;
}

export function characteristicSet(solid: SolidProperties, effect: LoadEffect): CharacteristicSet {
  const Ku = solid.lateralPressureRatio * solid.lateralPressureRatioFactor;
  const Kl = solid.lateralPressureRatio / solid.lateralPressureRatioFactor;
  const muU = solid.wallFrictionCoefficient * solid.wallFrictionFactor;
  const muL = solid.wallFrictionCoefficient / solid.wallFrictionFactor;
  switch (effect) {
    case 'maxNormalPressure':
      return { effect, description: 'maximum normal pressure on the vertical wall: K upper, mu lower', unitWeight: solid.unitWeight, lateralPressureRatio: Ku, wallFrictionCoefficient: muL };
    case 'maxWallFriction':
      return { effect, description: 'maximum frictional traction on the vertical wall: K upper, mu upper', unitWeight: solid.unitWeight, lateralPressureRatio: Ku, wallFrictionCoefficient: muU };
    case 'maxHopperLoad':
      return { effect, description: 'maximum vertical load on the hopper: K lower, mu lower', unitWeight: solid.unitWeight, lateralPressureRatio: Kl, wallFrictionCoefficient: muL };
  }
}
