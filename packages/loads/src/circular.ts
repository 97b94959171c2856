import { LoadsError } from './errors.js';
import { circularBinGeometry, type CircularBin } from './geometry.js';
import { janssenProfile, type JanssenState } from './janssen.js';
import { characteristicSet, type SolidProperties } from './properties.js';
import { slendernessClass } from './slenderness.js';
import { squatProfile } from './squat.js';
import { gravityCombinations, type PartialFactors } from './combinations.js';
import type { DerivationStep, LoadSet, PressureProfile, SupportLineCase } from './types.js';

export const STANDARD_GRAVITY = 9.80665; // m/s2

export interface CircularBinLoadInput {
  bin: CircularBin;
  solid: SolidProperties & { angleOfRepose: number };
  partialFactors: PartialFactors;
  /** Number of points in each pressure profile. */
  profilePoints?: number;
}

export const PERMANENT_CASE = 'G';
export const SOLID_FILLING_CASE = 'Q_s,f';

/**
 * The loads that a circular bin puts on its support line (the junction of cylinder, hopper and
 * girder), for the gravity cases: plates (G) and the stored solid at filling (Q_s,f).
 *
 * The wall carries the solid's wall friction and its own weight straight down; the hopper carries
 * the rest of the solid (the vertical stress on the transition plane and the hopper's contents, outlet
 * closed) and its own weight, and delivers it along its meridian, so its horizontal component is an
 * inward pull on the support line (EN 1993-4-1 5.3.4, ring at the transition; statics of a cone).
 */
export function circularBinLoads(input: CircularBinLoadInput): LoadSet {
  const { bin, solid } = input;
  const geometry = circularBinGeometry(bin);
  const beta = bin.hopper.apexHalfAngle;
  const hc = bin.fillHeight;
  const aspect = hc / bin.diameter;
  const slenderness = slendernessClass(aspect);
  if (slenderness === 'retaining') {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.fillHeight', `bin.fillHeight / bin.diameter = ${aspect.toFixed(3)}: retaining silos (h_c/d_c <= 0.4, EN 1991-4 5.4) are not covered; use a fill height above ${(0.4 * bin.diameter).toFixed(2)} m`);
  }
  // The girder's radial pull grows with the load the hopper carries, so the solid's properties are
  // those that maximise the vertical load on the hopper (EN 1991-4 Table 3.1).
  const props = characteristicSet(solid, 'maxHopperLoad');
  const profile =
    slenderness === 'slender'
      ? janssenProfile({ unitWeight: props.unitWeight, lateralPressureRatio: props.lateralPressureRatio, wallFrictionCoefficient: props.wallFrictionCoefficient, hydraulicRadius: geometry.hydraulicRadius })
      : squatProfile({ unitWeight: props.unitWeight, lateralPressureRatio: props.lateralPressureRatio, wallFrictionCoefficient: props.wallFrictionCoefficient, hydraulicRadius: geometry.hydraulicRadius, angleOfRepose: solid.angleOfRepose, h0: 0 });
  const pressureClause = slenderness === 'slender' ? 'EN 1991-4 5.2.1.1' : 'EN 1991-4 5.3.1.1';
  const atTransition: JanssenState = profile.at(hc);
  const gamma = props.unitWeight;
  const g = STANDARD_GRAVITY;

  const lineRadius = geometry.radius + bin.wallThickness / 2;
  const linePerimeter = 2 * Math.PI * lineRadius;

  const solidWeightCylinder = gamma * geometry.cylinderVolume;
  const solidWeightHopper = gamma * geometry.hopperVolume;
  const solidWeight = solidWeightCylinder + solidWeightHopper;
  const wallFrictionForce = geometry.perimeter * atTransition.nzSk;
  const transitionVerticalForce = atTransition.pv * geometry.planArea;
  const solidOnHopper = transitionVerticalForce + solidWeightHopper;

  const wallPlateWeight = bin.steelDensity * g * bin.wallThickness * geometry.wallPlateArea;
  const hopperPlateWeight = bin.steelDensity * g * bin.hopper.thickness * geometry.hopperPlateArea;
  const structureWeight = wallPlateWeight + hopperPlateWeight;

  const permanent: SupportLineCase = {
    name: PERMANENT_CASE,
    description: 'self weight of the cylinder wall and the hopper plates',
    kind: 'permanent',
    lineRadius,
    verticalLineLoad: structureWeight / linePerimeter,
    radialLineLoad: (hopperPlateWeight / linePerimeter) * Math.tan(beta),
    verticalResultant: structureWeight,
  };
  const filling: SupportLineCase = {
    name: SOLID_FILLING_CASE,
    description: `stored solid (${solid.name}) at filling, bin full`,
    kind: 'variable',
    lineRadius,
    verticalLineLoad: (wallFrictionForce + solidOnHopper) / linePerimeter,
    radialLineLoad: (solidOnHopper / linePerimeter) * Math.tan(beta),
    verticalResultant: wallFrictionForce + solidOnHopper,
  };

  const points = Math.max(input.profilePoints ?? 41, 2);
  const wallProfile: PressureProfile = { case: SOLID_FILLING_CASE, part: 'wall', z: [], ph: [], pw: [], pv: [] };
  for (let i = 0; i < points; i++) {
    const state = profile.at((hc * i) / (points - 1));
    wallProfile.z.push(state.z);
    wallProfile.ph.push(state.ph);
    wallProfile.pw.push(state.pw);
    wallProfile.pv.push(state.pv);
  }

  const derivation: DerivationStep[] = [
    { symbol: 'h_c/d_c', description: `aspect ratio of the stored solid: ${slenderness}`, expression: 'h_c / d_c', value: aspect, unit: '-', clause: 'EN 1991-4 1.5.45, 5.1' },
    { symbol: 'A/U', description: 'plan area over perimeter of the cylinder', expression: 'd_c / 4', value: geometry.hydraulicRadius, unit: 'm', clause: pressureClause },
    { symbol: 'gamma', description: 'upper characteristic unit weight', expression: 'gamma_u', value: gamma, unit: 'N/m3', clause: 'EN 1991-4 3.3(2), Table E.1' },
    { symbol: 'K', description: 'lateral pressure ratio, lower characteristic value', expression: 'K_m / a_K', value: props.lateralPressureRatio, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'mu', description: 'wall friction coefficient, lower characteristic value', expression: 'mu_m / a_mu', value: props.wallFrictionCoefficient, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'z_o', description: 'Janssen characteristic depth', expression: '(1 / (K mu)) (A/U)', value: profile.z0, unit: 'm', clause: pressureClause },
    { symbol: 'p_ho', description: 'asymptotic horizontal pressure', expression: 'gamma K z_o', value: profile.ph0, unit: 'Pa', clause: pressureClause },
    { symbol: 'p_hf(h_c)', description: 'horizontal pressure at the transition', expression: slenderness === 'slender' ? 'p_ho (1 - exp(-z/z_o))' : 'p_ho (1 - (z/z_o + 1)^n)', value: atTransition.ph, unit: 'Pa', clause: pressureClause },
    { symbol: 'p_vf(h_c)', description: 'mean vertical stress at the transition', expression: slenderness === 'slender' ? 'p_hf / K' : 'gamma z_V', value: atTransition.pv, unit: 'Pa', clause: pressureClause },
    { symbol: 'n_zSk(h_c)', description: 'wall friction force per unit perimeter at the transition', expression: slenderness === 'slender' ? 'mu p_ho (z - z_o Y_J)' : 'mu p_ho (z - z_V)', value: atTransition.nzSk, unit: 'N/m', clause: pressureClause },
    { symbol: 'W_s', description: 'weight of the stored solid (cylinder and hopper)', expression: 'gamma (V_cyl + V_hop)', value: solidWeight, unit: 'N', clause: 'statics' },
    { symbol: 'F_w', description: 'solid weight carried by wall friction', expression: 'pi d_c n_zSk(h_c)', value: wallFrictionForce, unit: 'N', clause: pressureClause },
    { symbol: 'F_h', description: 'solid weight carried by the hopper (outlet closed)', expression: 'p_vf(h_c) A + gamma V_hop', value: solidOnHopper, unit: 'N', clause: 'statics' },
    { symbol: 'G_plates', description: 'self weight of wall and hopper plates', expression: 'rho g (t_w A_wall + t_h A_hop)', value: structureWeight, unit: 'N', clause: 'EN 1991-1-1 Table A.4' },
    { symbol: 'r_s', description: 'radius of the support line (wall centre line)', expression: 'd_c/2 + t_w/2', value: lineRadius, unit: 'm', clause: 'geometry' },
    { symbol: 'n_v(Q_s)', description: 'vertical line load from the solid', expression: '(F_w + F_h) / (2 pi r_s)', value: filling.verticalLineLoad, unit: 'N/m', clause: 'statics' },
    { symbol: 'n_r(Q_s)', description: 'inward radial pull of the hopper from the solid', expression: 'F_h tan(beta) / (2 pi r_s)', value: filling.radialLineLoad, unit: 'N/m', clause: 'statics of the hopper meridian' },
    { symbol: 'n_v(G)', description: 'vertical line load from the plates', expression: 'G_plates / (2 pi r_s)', value: permanent.verticalLineLoad, unit: 'N/m', clause: 'statics' },
    { symbol: 'n_r(G)', description: 'inward radial pull of the hopper from its own weight', expression: 'G_hop tan(beta) / (2 pi r_s)', value: permanent.radialLineLoad, unit: 'N/m', clause: 'statics of the hopper meridian' },
  ];

  return {
    cases: [permanent, filling],
    combinations: gravityCombinations(input.partialFactors),
    profiles: [wallProfile],
    totals: { solidWeight, structureWeight },
    derivation,
  };
}
