import { actionAssessmentClass, type ActionAssessmentClass } from './classification.js';
import { cylinderForceCoefficient, effectiveSlenderness, endEffectFactor, peakVelocityPressure, roofShapeCoefficient, AIR_DENSITY, AIR_VISCOSITY, type TerrainCategory } from './climate.js';
import { combineActions, type PartialFactors, type VariableGroup } from './combinations.js';
import { LoadsError } from './errors.js';
import { circularBinGeometry, type CircularBin } from './geometry.js';
import { globalBending } from './harmonics.js';
import { FLOW_CHANNEL_RADIUS_RATIOS, fitCosineSeries, flowChannelEtaRange, flowChannelGeometry, flowChannelPressures, flowChannelZones } from './flow-channel.js';
import { hopperPressures, hopperWallVerticalResultant, type HopperPressureSet } from './hopper.js';
import { janssenProfile, type JanssenState } from './janssen.js';
import { characteristicSet, type CharacteristicSet, type SolidProperties } from './properties.js';
import { slendernessClass, type SlendernessClass } from './slenderness.js';
import { squatProfile } from './squat.js';
import { topSurface } from './surface.js';
import type { DerivationStep, Harmonic, LoadSet, PressureProfile, SupportLineCase } from './types.js';
import { requireAngle, requireRange, validateStoredSolid } from './validate.js';
import { dischargeFactors, patchFactors, patchHeight, thinWalledPatchForce, uniformIncreaseFactor, uniformIncreaseZeta } from './wall.js';

export const STANDARD_GRAVITY = 9.80665; // m/s2

export interface StoredSolidInput extends SolidProperties {
  /** Angle of repose phi_r, rad. */
  angleOfRepose: number;
  /** Mean angle of internal friction phi_im, rad, and its conversion factor a_phi (Table E.1). */
  internalFrictionAngle: number;
  internalFrictionFactor: number;
  /** Patch load solid reference factor C_op (Table E.1). */
  patchLoadFactor: number;
  /** Solid prone to dynamic behaviour in the hopper (sets C_b = 1.3, EN 1991-4 6.1.2). */
  proneToDynamicBehaviour?: boolean;
}

export interface RoofInput {
  /** Roof dead load on plan, Pa. */
  deadLoad: number;
  /** Roof imposed load on plan, Pa (EN 1991-1-1 category H; 0 if not given). */
  imposedLoad?: number;
  /** Pitch of the (conical) roof, rad (0 for a flat roof); sets the snow shape coefficient. */
  pitch?: number;
}

export interface EquipmentLoad {
  name: string;
  /** Position of the load on plan: angle from +X counter-clockwise, rad, and radius from the axis, m. */
  angle: number;
  radius: number;
  /** Downward force, N. */
  force: number;
  /** 'permanent' (default) or 'variable' (EN 1990 category E, psi 1.0/0.9/0.8). */
  kind?: 'permanent' | 'variable';
}

export interface SnowInput {
  /** Characteristic ground snow load s_k, Pa. */
  groundLoad: number;
  /** Exposure coefficient C_e (EN 1991-1-3 Table 5.1; default 1.0) and thermal coefficient C_t (default 1.0). */
  exposureCoefficient?: number;
  thermalCoefficient?: number;
}

export interface WindInput {
  /** Basic wind velocity v_b = c_dir c_season v_b,0, m/s. */
  basicVelocity: number;
  terrainCategory: TerrainCategory;
  /** Height of the support line above ground, m. */
  supportLevelHeight: number;
  /** Directions toward which the wind blows, rad from +X counter-clockwise (default [0]). */
  directions?: number[];
  /** Orography factor c_o (default 1.0). */
  orographyFactor?: number;
  /** Structural factor c_s c_d (default 1.0, EN 1991-1-4 6.2; check 6.3 for a slender bin). */
  structuralFactor?: number;
  /** Equivalent surface roughness k, m (default 0.2 mm, galvanised steel, EN 1991-1-4 Table 7.13, from memory). */
  roughness?: number;
}

export interface SeismicInput {
  /** Horizontal seismic coefficient: horizontal force = coefficient x weight. */
  horizontalCoefficient: number;
  /** Fraction of the solid's mass that acts with the shell (default 0.8, EN 1998-4 3.3, from memory). */
  effectiveSolidMassFraction?: number;
  /** Directions of the horizontal action, rad from +X counter-clockwise (default [0]). */
  directions?: number[];
}

export interface CircularBinLoadInput {
  bin: CircularBin;
  solid: StoredSolidInput;
  partialFactors: PartialFactors;
  roof?: RoofInput;
  equipment?: EquipmentLoad[];
  snow?: SnowInput;
  wind?: WindInput;
  seismic?: SeismicInput;
  /** Number of points in each pressure profile. */
  profilePoints?: number;
}

export const PERMANENT_CASE = 'G';
export const SOLID_FILLING_CASE = 'Q_s,f';
export const SOLID_DISCHARGE_CASE = 'Q_s,e';
export const FILLING_PATCH_CASE = 'Q_s,pf';
export const DISCHARGE_PATCH_CASE = 'Q_s,pe';
export const FILLING_UNIFORM_INCREASE_CASE = 'Q_s,f,u';
export const DISCHARGE_UNIFORM_INCREASE_CASE = 'Q_s,e,u';
export const HOPPER_MAGNIFIER_CASE = 'Q_s,b';
export const ROOF_DEAD_CASE = 'G_roof';
export const ROOF_IMPOSED_CASE = 'Q_roof';
export const EQUIPMENT_PERMANENT_CASE = 'G_eq';
export const EQUIPMENT_VARIABLE_CASE = 'Q_eq';
export const SNOW_CASE = 'S';

function degrees(angle: number): number {
  return Math.round((angle * 180) / Math.PI);
}

export function windCaseName(direction: number): string {
  return `W_${degrees(direction)}`;
}

export function seismicCaseName(direction: number): string {
  return `E_${degrees(direction)}`;
}

function validate(input: CircularBinLoadInput): void {
  const { bin, solid } = input;
  requireRange('bin.diameter', bin.diameter, 0, 60, 'm (EN 1991-4 1.1.2: d_c < 60 m)', { strictLower: true, strictUpper: true });
  requireRange('bin.cylinderHeight', bin.cylinderHeight, 0, 100, 'm (EN 1991-4 1.1.2: h_b < 100 m)', { strictLower: true, strictUpper: true });
  requireRange('bin.fillHeight', bin.fillHeight, 0, bin.cylinderHeight, 'm (up to bin.cylinderHeight)', { strictLower: true });
  requireRange('bin.wallThickness', bin.wallThickness, 0, bin.diameter / 20, 'm (up to bin.diameter / 20)', { strictLower: true });
  requireAngle('bin.hopper.apexHalfAngle', bin.hopper.apexHalfAngle, 5, 85);
  requireRange('bin.hopper.outletDiameter', bin.hopper.outletDiameter, 0, bin.diameter, 'm (below bin.diameter)', { strictUpper: true });
  requireRange('bin.hopper.thickness', bin.hopper.thickness, 0, bin.diameter / 20, 'm (up to bin.diameter / 20)', { strictLower: true });
  if (bin.hopper.bottomLoadMagnifier !== undefined) requireRange('bin.hopper.bottomLoadMagnifier', bin.hopper.bottomLoadMagnifier, 1, 2, '(dimensionless)');
  requireRange('bin.steelDensity', bin.steelDensity, 1000, 20000, 'kg/m3');
  if (bin.patchLoadMethod !== undefined && bin.patchLoadMethod !== 'patch' && bin.patchLoadMethod !== 'uniform-increase') {
    throw new LoadsError('BAD_INPUT', 'bin.patchLoadMethod', `bin.patchLoadMethod must be 'patch' or 'uniform-increase'; got '${String(bin.patchLoadMethod)}'`);
  }
  requireRange('bin.fillingEccentricity', bin.fillingEccentricity ?? 0, 0, bin.diameter / 2, 'm (inside the bin radius)', { strictUpper: true });
  requireRange('bin.outletEccentricity', bin.outletEccentricity ?? 0, 0, bin.diameter / 2, 'm (inside the bin radius)', { strictUpper: true });
  validateStoredSolid(solid);
  const roofRadius = bin.diameter / 2 + bin.wallThickness;
  if (input.roof) {
    requireRange('roof.deadLoad', input.roof.deadLoad, 0, 50e3, 'Pa');
    requireRange('roof.imposedLoad', input.roof.imposedLoad ?? 0, 0, 50e3, 'Pa');
    requireAngle('roof.pitch', input.roof.pitch ?? 0, 0, 60);
  }
  (input.equipment ?? []).forEach((item, i) => {
    requireRange(`equipment[${i}].radius`, item.radius, 0, roofRadius, 'm (on the roof: up to the outer radius of the wall)');
    requireRange(`equipment[${i}].force`, item.force, 0, 1e8, 'N');
    requireRange(`equipment[${i}].angle`, item.angle, -4 * Math.PI, 4 * Math.PI, 'rad');
  });
  if (input.snow) {
    requireRange('snow.groundLoad', input.snow.groundLoad, 0, 20e3, 'Pa');
    requireRange('snow.exposureCoefficient', input.snow.exposureCoefficient ?? 1, 0.8, 1.2, '(EN 1991-1-3 Table 5.1)');
    requireRange('snow.thermalCoefficient', input.snow.thermalCoefficient ?? 1, 0, 1, '(EN 1991-1-3 5.2(8))');
  }
  if (input.wind) {
    requireRange('wind.basicVelocity', input.wind.basicVelocity, 0, 70, 'm/s', { strictLower: true });
    if (!['0', 'I', 'II', 'III', 'IV'].includes(input.wind.terrainCategory)) {
      throw new LoadsError('BAD_INPUT', 'wind.terrainCategory', `wind.terrainCategory must be one of 0, I, II, III, IV (EN 1991-1-4 Table 4.1); got '${String(input.wind.terrainCategory)}'`);
    }
    requireRange('wind.supportLevelHeight', input.wind.supportLevelHeight, 0, 200, 'm above ground');
    requireRange('wind.orographyFactor', input.wind.orographyFactor ?? 1, 1, 2, '(dimensionless)');
    requireRange('wind.structuralFactor', input.wind.structuralFactor ?? 1, 0.5, 2, '(dimensionless)');
    requireRange('wind.roughness', input.wind.roughness ?? 0.2e-3, 0, 0.01, 'm');
  }
  if (input.seismic) {
    requireRange('seismic.horizontalCoefficient', input.seismic.horizontalCoefficient, 0, 2, '(times the weight)');
    requireRange('seismic.effectiveSolidMassFraction', input.seismic.effectiveSolidMassFraction ?? 0.8, 0, 1, '(dimensionless)');
  }
}

interface WallProfile {
  z0: number;
  at(z: number): JanssenState;
}

function wallProfile(slenderness: SlendernessClass, set: CharacteristicSet, hydraulicRadius: number, angleOfRepose: number, h0: number): WallProfile {
  return slenderness === 'slender'
    ? janssenProfile({ unitWeight: set.unitWeight, lateralPressureRatio: set.lateralPressureRatio, wallFrictionCoefficient: set.wallFrictionCoefficient, hydraulicRadius })
    : squatProfile({ unitWeight: set.unitWeight, lateralPressureRatio: set.lateralPressureRatio, wallFrictionCoefficient: set.wallFrictionCoefficient, hydraulicRadius, angleOfRepose, h0 });
}

/** Name of the flow-channel case for the channel radius ratio G = r_c / r: Q_s,c25, Q_s,c40, Q_s,c60. */
export function flowChannelCaseName(radiusRatio: number): string {
  return `Q_s,c${Math.round(100 * radiusRatio)}`;
}

interface FlowChannelContext {
  /** Maximum-wall-friction properties (Table 3.1: K upper, mu upper, phi_i lower) and their Janssen profile. */
  set: CharacteristicSet;
  profile: WallProfile;
  radius: number;
  fillHeight: number;
  solidWeight: number;
  solidWeightCylinder: number;
  lineRadius: number;
  tanB: number;
  direction: number;
  pileBending: ReturnType<typeof globalBending> | undefined;
  solidName: string;
  points: number;
}

/**
 * The flow-channel cases of large-eccentricity discharge (EN 1991-4 5.2.4.3; see flow-channel.ts for
 * the expressions and which of them are from memory) on the support line.
 *
 * The wall friction resultant at the transition n_z(theta) = integral of p_w over the wall height is
 * n_z,ce in the channel zone, n_z,ae = 2 n_z,f - n_z,ce in the adjacent zones and n_z,f elsewhere;
 * it reaches the support line (radius r_s) as n_z r / r_s. Its total is exactly pi d_c n_z,f (the
 * adjacent zones take what the channel zone sheds), so the hopper carries W_s - pi d_c n_z,f, spread
 * evenly round the transition: no hopper pressure model for eccentric flow is available to us, and
 * the even spread keeps the hopper's share out of the moment (the variation the girder sees comes
 * from the wall). The vertical total is the weight of the solid: the friction moves load between wall
 * and hopper and adds none. The circumferential variation is a cosine series about the outlet
 * direction theta_e, long enough that every zone's resultant and first moment are within 2 %.
 */
function flowChannelLoadCases(ctx: FlowChannelContext): { cases: SupportLineCase[]; derivation: DerivationStep[]; notes: string[]; profiles: PressureProfile[] } {
  const { set, profile, radius: r, fillHeight: hc, solidWeight, solidWeightCylinder, lineRadius: rs, tanB, direction, pileBending } = ctx;
  const clause = 'EN 1991-4 5.2.4.3.1 (from memory)';
  const pressureClause = 'EN 1991-4 5.2.4.3.2 (from memory)';
  const mu = set.wallFrictionCoefficient;
  const K = set.lateralPressureRatio;
  const phi = set.internalFrictionAngle;
  const eta = mu / Math.tan(phi);
  const linePerimeter = 2 * Math.PI * rs;
  const atF = profile.at(hc);
  const nzf = atF.nzSk;
  const cases: SupportLineCase[] = [];
  const profiles: PressureProfile[] = [];
  const derivation: DerivationStep[] = [
    { symbol: 'eta', description: 'ratio of wall friction to internal friction, maximum-wall-friction properties (mu upper, phi_i lower)', expression: 'mu / tan(phi_i)', value: eta, unit: '-', clause },
    { symbol: 'n_z,f(h_c) (flow channel)', description: 'wall friction resultant per unit perimeter at the transition in the static solid (filling, maximum-wall-friction properties)', expression: 'mu p_ho (h_c - z_o (1 - exp(-h_c/z_o)))', value: nzf, unit: 'N/m', clause: 'EN 1991-4 5.2.1.1 (5.7)' },
    { symbol: 'p_hf(h_c) (flow channel)', description: 'filling horizontal pressure at the transition (maximum-wall-friction properties)', expression: 'p_ho (1 - exp(-h_c/z_o))', value: atF.ph, unit: 'Pa', clause: 'EN 1991-4 5.2.1.1 (5.1)' },
  ];
  const pileHarmonic = pileBending?.verticalHarmonics?.[0];
  for (const G of FLOW_CHANNEL_RADIUS_RATIOS) {
    const name = flowChannelCaseName(G);
    const geo = flowChannelGeometry(r, G, eta);
    if (!geo) {
      const range = flowChannelEtaRange(G);
      throw new LoadsError('OUT_OF_SCOPE', 'solid.wallFrictionCoefficient', `solid.wallFrictionCoefficient (upper value) over tan(solid.internalFrictionAngle) (lower value) must be between ${range.lower.toFixed(3)} and ${range.upper.toFixed(3)} (dimensionless) for the flow channel r_c = ${G} r to cut the wall (EN 1991-4 5.2.4.3.1; e_c expression from memory); got eta = ${eta.toFixed(3)}`);
    }
    const pressures = flowChannelPressures(geo, { unitWeight: set.unitWeight, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phi });
    for (let i = 0; i <= 200; i++) {
      const z = (hc * i) / 200;
      if (2 * profile.at(z).ph - pressures.at(z).ph < 0) {
        throw new LoadsError('OUT_OF_SCOPE', 'solid.internalFrictionAngle', `the adjacent-zone pressure 2 p_hf - p_hce of the flow channel r_c = ${G} r would be negative at z = ${z.toFixed(2)} m (z_oc = ${pressures.z0c.toFixed(3)} m against z_o = ${profile.z0.toFixed(3)} m): the flow-channel model does not cover this solid`);
      }
    }
    const atC = pressures.at(hc);
    const nzce = atC.nz;
    const nzae = 2 * nzf - nzce;
    // Wall friction per unit perimeter, carried to the support line: n_z r / r_s.
    const toLine = r / rs;
    const zones = flowChannelZones(geo.wallContactHalfAngle, nzce * toLine, nzae * toLine, nzf * toLine);
    let wallForce = 2 * rs * zones.reduce((sum, z) => sum + z.value * (z.to - z.from), 0);
    let scale = 1;
    if (wallForce > solidWeightCylinder) {
      // Statics: the wall cannot carry more than the solid above the transition.
      scale = solidWeightCylinder / wallForce;
      wallForce = solidWeightCylinder;
    }
    const scaled = zones.map((z) => ({ ...z, value: z.value * scale }));
    const fit = fitCosineSeries(scaled, 0.02);
    const onHopper = solidWeight - wallForce;
    const harmonics: Harmonic[] = [];
    for (let k = 1; k <= fit.order; k++) {
      const ak = fit.coefficients[k] ?? 0;
      harmonics.push({ order: k, cos: ak * Math.cos(k * direction), sin: ak * Math.sin(k * direction) });
    }
    const first = harmonics[0];
    if (first && pileHarmonic) {
      first.cos += pileHarmonic.cos;
      first.sin += pileHarmonic.sin;
    }
    const a1 = fit.coefficients[1] ?? 0;
    const channelMoment = a1 * Math.PI * rs * rs;
    const overturningMoment = first ? { x: Math.PI * rs * rs * first.sin, y: -Math.PI * rs * rs * first.cos } : undefined;
    cases.push({
      name,
      description: `stored solid (${ctx.solidName}) at large-eccentricity discharge, flow channel r_c = ${G} r against the wall toward ${Math.round((direction * 180) / Math.PI)} degrees: wall friction lower in the channel zone, higher in the adjacent zones, filling elsewhere (maximum-wall-friction properties); the hopper carries the rest of the weight`,
      kind: 'variable',
      action: 'solid',
      lineRadius: rs,
      verticalLineLoad: solidWeight / linePerimeter,
      radialLineLoad: (onHopper * tanB) / linePerimeter,
      verticalResultant: solidWeight,
      verticalHarmonics: harmonics,
      ...(overturningMoment ? { overturningMoment } : {}),
      distribution: `EN 1991-4 5.2.4.3 flow channel (from memory): wall friction n_z(theta) piecewise constant about theta_e (channel |theta - theta_e| < theta_c, adjacent zones to 2 theta_c, filling elsewhere) as a cosine series of ${fit.order} harmonics (each zone's resultant within ${(100 * fit.resultantError).toFixed(2)} %, first moment within ${(100 * fit.momentError).toFixed(2)} %); hopper share uniform${pileHarmonic ? '; plus the eccentric top pile (M / (pi r^2)) cos(theta - theta_e)' : ''}`,
    });
    const thetaDeg = (geo.wallContactHalfAngle * 180) / Math.PI;
    derivation.push(
      { symbol: `r_c (${name})`, description: `flow channel radius, G = ${G}`, expression: 'G r', value: geo.channelRadius, unit: 'm', clause },
      { symbol: `e_c (${name})`, description: 'distance of the flow channel centre from the bin axis, toward the outlet', expression: 'r (eta (1 - G) + (1 - sqrt(G)))', value: geo.eccentricity, unit: 'm', clause },
      { symbol: `theta_c (${name})`, description: `half-angle of the channel's contact with the wall (${thetaDeg.toFixed(2)} degrees)`, expression: 'acos((r^2 + e_c^2 - r_c^2) / (2 r e_c))', value: geo.wallContactHalfAngle, unit: 'rad', clause: `${clause}; geometry` },
      { symbol: `psi (${name})`, description: 'angle at the channel centre between the outward direction and the wall intersection', expression: 'acos((r^2 - e_c^2 - r_c^2) / (2 e_c r_c))', value: geo.psi, unit: 'rad', clause: `${clause}; geometry` },
      { symbol: `U_wc (${name})`, description: 'arc of contact between the flowing solid and the wall', expression: '2 theta_c r', value: geo.wallContactArc, unit: 'm', clause: `${clause}; geometry` },
      { symbol: `U_sc (${name})`, description: 'arc of contact between the flowing and the static solid (channel circle inside the bin)', expression: '2 (pi - psi) r_c', value: geo.interfaceArc, unit: 'm', clause: `${clause}; geometry` },
      { symbol: `A_c (${name})`, description: 'plan area of the flow channel', expression: '(pi - psi) r_c^2 + theta_c r^2 - r r_c sin(psi - theta_c)', value: geo.area, unit: 'm2', clause: `${clause}; geometry` },
      { symbol: `z_oc (${name})`, description: 'characteristic depth of the flow channel', expression: '(1/K) A_c / (U_wc mu + U_sc tan(phi_i))', value: pressures.z0c, unit: 'm', clause: pressureClause },
      { symbol: `p_hco (${name})`, description: 'asymptotic horizontal pressure in the flow channel', expression: 'gamma K z_oc', value: pressures.ph0c, unit: 'Pa', clause: pressureClause },
      { symbol: `p_hce(h_c) (${name})`, description: 'horizontal pressure on the wall in the channel zone at the transition', expression: 'p_hco (1 - exp(-h_c/z_oc))', value: atC.ph, unit: 'Pa', clause: pressureClause },
      { symbol: `p_hae(h_c) (${name})`, description: 'horizontal pressure on the wall in the adjacent zones at the transition', expression: '2 p_hf - p_hce', value: 2 * atF.ph - atC.ph, unit: 'Pa', clause: pressureClause },
      { symbol: `n_z,ce(h_c) (${name})`, description: 'wall friction resultant per unit perimeter in the channel zone (integral of p_wce = mu p_hce)', expression: 'mu p_hco (h_c - z_oc (1 - exp(-h_c/z_oc)))', value: nzce, unit: 'N/m', clause: pressureClause },
      { symbol: `n_z,ae(h_c) (${name})`, description: 'wall friction resultant per unit perimeter in the adjacent zones (integral of p_wae = mu p_hae)', expression: '2 n_z,f - n_z,ce', value: nzae, unit: 'N/m', clause: pressureClause },
      { symbol: `F_w,c (${name})`, description: 'solid weight carried by wall friction (the adjacent zones take what the channel zone sheds)', expression: scale === 1 ? 'r (2 theta_c n_z,ce + 2 theta_c n_z,ae + (2 pi - 4 theta_c) n_z,f) = pi d_c n_z,f' : 'gamma V_cyl (capped: at most the weight in the cylinder)', value: wallForce, unit: 'N', clause: 'statics' },
      { symbol: `F_h,c (${name})`, description: 'solid weight carried by the hopper, spread evenly round the transition', expression: 'W_s - F_w,c', value: onHopper, unit: 'N', clause: 'statics' },
      { symbol: `n_v(${name})`, description: 'mean vertical line load from the solid (the weight of the solid)', expression: 'W_s / (2 pi r_s)', value: solidWeight / linePerimeter, unit: 'N/m', clause: 'statics' },
      { symbol: `n_r(${name})`, description: 'inward radial pull of the hopper', expression: 'F_h,c tan(beta) / (2 pi r_s)', value: (onHopper * tanB) / linePerimeter, unit: 'N/m', clause: 'statics of the hopper meridian' },
      { symbol: `N_h (${name})`, description: 'number of cosine harmonics of the wall friction about theta_e (each zone within 2 % in resultant and first moment)', expression: 'least N with |error| <= 2 %', value: fit.order, unit: '-', clause: 'Fourier series of a piecewise-constant function' },
      { symbol: `M_c (${name})`, description: 'overturning moment of the wall-friction variation about the support level (negative: it unloads the outlet side)', expression: 'pi r_s^2 a_1, a_1 = (2/pi) integral_0^pi q(phi) cos(phi) dphi', value: channelMoment, unit: 'N m', clause: 'statics' },
    );
    const channelProfile: PressureProfile = { case: `${name} channel zone`, part: 'wall', z: [], ph: [], pw: [], pv: [] };
    const adjacentProfile: PressureProfile = { case: `${name} adjacent zones`, part: 'wall', z: [], ph: [], pw: [], pv: [] };
    for (let i = 0; i < ctx.points; i++) {
      const z = (hc * i) / (ctx.points - 1);
      const c = pressures.at(z);
      const f = profile.at(z);
      const pha = 2 * f.ph - c.ph;
      channelProfile.z.push(z);
      channelProfile.ph.push(c.ph);
      channelProfile.pw.push(c.pw);
      // Mean vertical stress of the channel's Janssen state, p_h / K.
      channelProfile.pv.push(c.ph / K);
      adjacentProfile.z.push(z);
      adjacentProfile.ph.push(pha);
      adjacentProfile.pw.push(mu * pha);
      // The adjacent zones are static solid: the filling vertical stress.
      adjacentProfile.pv.push(f.pv);
    }
    profiles.push(channelProfile, adjacentProfile);
  }
  const notes = [
    'Large-eccentricity discharge (e_o > 0.25 d_c, AAC 3): flow-channel cases Q_s,c25, Q_s,c40 and Q_s,c60 (r_c = 0.25 r, 0.4 r, 0.6 r; EN 1991-4 5.2.4.3) as further alternatives of the solid action, without the patch loads. From memory, not confirmed against the text: the three radii, e_c = r (eta (1 - G) + (1 - sqrt G)) with eta = mu / tan(phi_i), z_oc = (1/K) A_c / (U_wc mu + U_sc tan(phi_i)), p_hce = gamma K z_oc (1 - exp(-z/z_oc)), p_hae = 2 p_hf - p_hce, the adjacent zones of width theta_c each side, and the choice of the maximum-wall-friction properties (K upper, mu upper, phi_i lower) for the whole case. The circle geometry (theta_c, psi, U_wc, U_sc = 2 (pi - psi) r_c, A_c) is plane geometry. The hopper share is spread evenly round the transition (no eccentric hopper pressure model).',
  ];
  return { cases, derivation, notes, profiles };
}

/**
 * The loads that a circular bin puts on its support line (the junction of cylinder, hopper and
 * girder): self weight, stored solid at filling and discharge with its patch loads (EN 1991-4 5, 6),
 * roof, equipment, snow, wind and an equivalent static seismic action, and their EN 1990 combinations.
 *
 * Stored solid on the support line: the wall carries the solid's wall friction straight down; the
 * hopper carries the rest (the vertical stress on the transition plane and the hopper's contents,
 * outlet closed) along its meridian, so its horizontal component is an inward pull on the support
 * line (EN 1993-4-1 5.3.4, ring at the transition; statics of a cone). Both symmetric solid cases
 * carry exactly the weight of the solid: the discharge friction C_w p_wf moves load from the hopper to
 * the wall, it does not add weight. The hopper bottom magnifier C_b > 1 is a local overpressure of the
 * hopper: it goes in a case of its own (Q_s,b) so that the symmetric cases still close on the weight.
 * Patch loads and wind reach the support line as global bending of the shell (see `globalBending`).
 * In AAC 2, `bin.patchLoadMethod: 'uniform-increase'` replaces the patch cases by the substitute
 * uniform pressure increase (EN 1991-4 5.2.3): two further solid states Q_s,f,u and
 * Q_s,e,u with the wall friction raised by (1 + zeta C_p), still closing on the weight.
 * Large-eccentricity discharge (e_o > 0.25 d_c) in a slender bin of AAC 3 adds the flow-channel cases
 * Q_s,c25, Q_s,c40 and Q_s,c60 (EN 1991-4 5.2.4.3, see `flowChannelLoadCases`); squat and
 * intermediate bins, and bins below AAC 3, are refused for it.
 */
export function circularBinLoads(input: CircularBinLoadInput): LoadSet {
  validate(input);
  const { bin, solid } = input;
  const g = STANDARD_GRAVITY;
  const geometry = circularBinGeometry(bin);
  const beta = bin.hopper.apexHalfAngle;
  const tanB = Math.tan(beta);
  const hc = bin.fillHeight;
  const dc = bin.diameter;
  const aspect = hc / dc;
  const slenderness = slendernessClass(aspect);
  const notes: string[] = [];
  if (slenderness === 'retaining') {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.fillHeight', `bin.fillHeight / bin.diameter = ${aspect.toFixed(3)}: retaining silos (h_c/d_c <= 0.4, EN 1991-4 5.4) are not covered; use a fill height above ${(0.4 * dc).toFixed(2)} m`);
  }
  const totalHeight = bin.cylinderHeight + geometry.hopperHeight;
  if (totalHeight / dc >= 10) {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.cylinderHeight', `bin.cylinderHeight plus the hopper height over bin.diameter must be below 10 (EN 1991-4 1.1.2: h_b/d_c < 10); got ${(totalHeight / dc).toFixed(2)}`);
  }
  const ef = bin.fillingEccentricity ?? 0;
  const eo = bin.outletEccentricity ?? 0;
  const direction = bin.eccentricityAngle ?? 0;
  // Large-eccentricity discharge (e_o > 0.25 d_c): the flow-channel model of EN 1991-4 5.2.4.3
  // covers slender bins; squat and intermediate bins are refused (5.3.4 not covered).
  const largeEccentricity = eo > 0.25 * dc;
  if (largeEccentricity && slenderness !== 'slender') {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.outletEccentricity', `bin.outletEccentricity must be at most 0.25 bin.diameter (${(0.25 * dc).toFixed(3)} m) for ${slenderness === 'intermediate' ? 'an' : 'a'} ${slenderness} bin (h_c/d_c = ${aspect.toFixed(3)}); got ${eo} m: large-eccentricity discharge is covered by the flow-channel model of EN 1991-4 5.2.4.3 for slender bins (h_c/d_c >= 2) only`);
  }
  if (largeEccentricity && eo + bin.hopper.outletDiameter / 2 > dc / 2) {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.outletEccentricity', `bin.outletEccentricity must be at most (bin.diameter - bin.hopper.outletDiameter) / 2 = ${((dc - bin.hopper.outletDiameter) / 2).toFixed(3)} m so that the outlet lies inside the bin; got ${eo} m`);
  }

  // Top surface and equivalent surface (EN 1991-4 1.5, 5.3.1.1).
  const surfaceShape = bin.topSurface ?? 'level';
  const surface = topSurface(geometry.radius, solid.angleOfRepose, ef, surfaceShape);
  if (surface.lowestContactDepth >= hc) {
    throw new LoadsError('BAD_INPUT', 'bin.fillHeight', `bin.fillHeight must be above ${surface.lowestContactDepth.toFixed(3)} m for a pile with e_f = ${ef} m: the lowest wall contact would lie below the transition; got ${hc}`);
  }
  if (surfaceShape === 'pile' && hc + surface.apexHeight > bin.cylinderHeight) {
    notes.push(`The apex of the top pile is ${(hc + surface.apexHeight - bin.cylinderHeight).toFixed(2)} m above the top of the wall: it must fit under the roof.`);
  }

  const gamma = solid.unitWeight;
  const solidWeightCylinder = gamma * geometry.cylinderVolume;
  const solidWeightHopper = gamma * geometry.hopperVolume;
  const solidWeight = solidWeightCylinder + solidWeightHopper;
  const capacity = solidWeight / g;
  const classified = actionAssessmentClass({ capacity, slenderness, diameter: dc, outletEccentricity: eo, topSurfaceEccentricity: ef });
  let aac: ActionAssessmentClass = classified.aac;
  if (bin.actionAssessmentClass !== undefined) {
    if (bin.actionAssessmentClass < classified.aac) {
      throw new LoadsError('BAD_INPUT', 'bin.actionAssessmentClass', `bin.actionAssessmentClass must be at least ${classified.aac} (EN 1991-4 Table 2.1: ${classified.reason}); got ${bin.actionAssessmentClass}`);
    }
    aac = bin.actionAssessmentClass;
  }
  if (largeEccentricity && aac !== 3) {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.outletEccentricity', `bin.outletEccentricity must be at most 0.25 bin.diameter (${(0.25 * dc).toFixed(3)} m); got ${eo}: large-eccentricity discharge is covered by the flow-channel model of EN 1991-4 5.2.4.3, the action assessment class 3 procedure, and the bin is in class ${aac}: set bin.actionAssessmentClass to 3 to apply it`);
  }
  const patchLoadMethod = bin.patchLoadMethod ?? 'patch';
  if (patchLoadMethod === 'uniform-increase' && aac !== 2) {
    throw new LoadsError('BAD_INPUT', 'bin.patchLoadMethod', `bin.patchLoadMethod 'uniform-increase' is allowed in action assessment class 2 only (EN 1991-4 5.2.3); the bin is in class ${aac}: use 'patch'`);
  }
  const thinWalled = dc / bin.wallThickness > 200;

  // Characteristic property sets per effect (EN 1991-4 Table 3.1).
  const setN = characteristicSet(solid, 'maxNormalPressure');
  const setW = characteristicSet(solid, 'maxWallFriction');
  const setH = characteristicSet(solid, 'maxHopperLoad');
  const A = geometry.planArea;
  const U = geometry.perimeter;
  const profileN = wallProfile(slenderness, setN, geometry.hydraulicRadius, solid.angleOfRepose, surface.h0);
  const profileW = wallProfile(slenderness, setW, geometry.hydraulicRadius, solid.angleOfRepose, surface.h0);
  const profileH = wallProfile(slenderness, setH, geometry.hydraulicRadius, solid.angleOfRepose, surface.h0);
  if (slenderness !== 'slender' && surface.h0 >= Math.min(profileN.z0, profileW.z0, profileH.z0)) {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.topSurface', `bin.topSurface 'pile' gives h_o = ${surface.h0.toFixed(3)} m, which must be below z_o = ${Math.min(profileN.z0, profileW.z0, profileH.z0).toFixed(3)} m for the squat expressions (EN 1991-4 5.3.1.1)`);
  }
  const pressureClause = slenderness === 'slender' ? 'EN 1991-4 5.2.1.1' : 'EN 1991-4 5.3.1.1';
  const atH = profileH.at(hc);
  const atW = profileW.at(hc);

  const lineRadius = geometry.radius + bin.wallThickness / 2;
  const linePerimeter = 2 * Math.PI * lineRadius;
  const roofRadius = geometry.radius + bin.wallThickness;
  const roofArea = Math.PI * roofRadius * roofRadius;

  // Discharge factors and the hopper bottom magnifier.
  const e = Math.max(ef, eo);
  const discharge = dischargeFactors(slenderness, aac, aspect, e / dc, solid.patchLoadFactor);
  const Cb = bin.hopper.bottomLoadMagnifier ?? (aac === 1 || solid.proneToDynamicBehaviour ? 1.3 : 1.0);

  // Symmetric solid cases on the support line.
  const wallFrictionForce = U * atH.nzSk;
  const transitionVerticalForce = atH.pv * A;
  const solidOnHopper = transitionVerticalForce + solidWeightHopper;
  const dischargeWallFriction = Math.min(discharge.Cw * U * atW.nzSk, solidWeightCylinder);
  const dischargeOnHopper = solidWeight - dischargeWallFriction;
  const pileMoment = gamma * surface.volumeMoment;
  const pileBending = pileMoment > 0 ? globalBending(0, pileMoment, direction, lineRadius) : undefined;
  const pileHarmonics = pileBending ? { verticalHarmonics: pileBending.verticalHarmonics, overturningMoment: pileBending.overturningMoment, distribution: 'eccentric top pile: moment of the solid weight about the axis, gamma * integral f x dA, as (M / (pi r^2)) cos(theta - theta_e)' } : {};

  const wallPlateWeight = bin.steelDensity * g * bin.wallThickness * geometry.wallPlateArea;
  const hopperPlateWeight = bin.steelDensity * g * bin.hopper.thickness * geometry.hopperPlateArea;
  const structureWeight = wallPlateWeight + hopperPlateWeight;

  const uniform = (name: string, description: string, kind: 'permanent' | 'variable', action: SupportLineCase['action'], vertical: number, radialForce = 0): SupportLineCase => ({
    name,
    description,
    kind,
    action,
    lineRadius,
    verticalLineLoad: vertical / linePerimeter,
    radialLineLoad: radialForce / linePerimeter,
    verticalResultant: vertical,
  });

  const cases: SupportLineCase[] = [];
  const permanent = uniform(PERMANENT_CASE, 'self weight of the cylinder wall and the hopper plates', 'permanent', 'self-weight', structureWeight, hopperPlateWeight * tanB);
  const filling: SupportLineCase = { ...uniform(SOLID_FILLING_CASE, `stored solid (${solid.name}) at filling, bin full; properties for the maximum hopper load`, 'variable', 'solid', wallFrictionForce + solidOnHopper, solidOnHopper * tanB), ...pileHarmonics };
  const emptying: SupportLineCase = { ...uniform(SOLID_DISCHARGE_CASE, `stored solid (${solid.name}) at discharge: wall friction C_w n_zSk with the maximum-wall-friction properties, the hopper carries the rest of the weight`, 'variable', 'solid', dischargeWallFriction + dischargeOnHopper, dischargeOnHopper * tanB), ...pileHarmonics };
  cases.push(permanent, filling, emptying);

  const derivation: DerivationStep[] = [
    { symbol: 'h_c/d_c', description: `aspect ratio of the stored solid: ${slenderness}`, expression: 'h_c / d_c', value: aspect, unit: '-', clause: 'EN 1991-4 1.5.45, 5.1' },
    { symbol: 'm_s', description: `mass of stored solid (capacity): action assessment class ${aac} (${classified.reason}${aac !== classified.aac ? '; raised by the engineer' : ''})`, expression: 'gamma_u (V_cyl + V_hop) / g', value: capacity, unit: 'kg', clause: 'EN 1991-4 2.5, Table 2.1' },
    { symbol: 'd_c/t', description: thinWalled ? 'thin-walled (d_c/t > 200)' : 'thick-walled (d_c/t <= 200)', expression: 'd_c / t_w', value: dc / bin.wallThickness, unit: '-', clause: 'EN 1991-4 1.5, 5.2.1.2' },
    { symbol: 'A/U', description: 'plan area over perimeter of the cylinder', expression: 'd_c / 4', value: geometry.hydraulicRadius, unit: 'm', clause: pressureClause },
    { symbol: 'h_o', description: surfaceShape === 'pile' ? `depth of the highest wall contact below the equivalent surface (pile, e_f = ${ef} m)` : 'level top surface', expression: surfaceShape === 'pile' ? (ef === 0 ? '(d_c/6) tan(phi_r)' : 'tan(phi_r) (r - e_f - mean|P - apex|)') : '0', value: surface.h0, unit: 'm', clause: 'EN 1991-4 1.5, 5.3.1.1' },
    { symbol: 'gamma', description: 'upper characteristic unit weight', expression: 'gamma_u', value: gamma, unit: 'N/m3', clause: 'EN 1991-4 3.3(2), Table E.1' },
    { symbol: 'K (max p_h)', description: setN.description, expression: 'a_K K_m', value: setN.lateralPressureRatio, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'mu (max p_w)', description: setW.description, expression: 'a_mu mu_m', value: setW.wallFrictionCoefficient, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'K', description: 'lateral pressure ratio, lower characteristic value (max hopper load)', expression: 'K_m / a_K', value: setH.lateralPressureRatio, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'mu', description: 'wall friction coefficient, lower characteristic value (max hopper load)', expression: 'mu_m / a_mu', value: setH.wallFrictionCoefficient, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'z_o', description: 'Janssen characteristic depth (max hopper load properties)', expression: '(1 / (K mu)) (A/U)', value: profileH.z0, unit: 'm', clause: pressureClause },
    { symbol: 'p_hf(h_c)', description: 'horizontal pressure at the transition (max normal pressure properties)', expression: slenderness === 'slender' ? 'p_ho (1 - exp(-z/z_o))' : 'p_ho (1 - ((z - h_o)/(z_o - h_o) + 1)^n)', value: profileN.at(hc).ph, unit: 'Pa', clause: pressureClause },
    { symbol: 'p_vf(h_c)', description: 'mean vertical stress at the transition (max hopper load properties)', expression: slenderness === 'slender' ? 'p_hf / K' : 'gamma z_V', value: atH.pv, unit: 'Pa', clause: pressureClause },
    { symbol: 'n_zSk(h_c)', description: 'wall friction force per unit perimeter at the transition', expression: slenderness === 'slender' ? 'mu p_ho (z - z_o Y_J)' : 'mu p_ho (z - z_V)', value: atH.nzSk, unit: 'N/m', clause: pressureClause },
    { symbol: 'C_h', description: 'discharge factor for the normal pressure', expression: discharge.expression, value: discharge.Ch, unit: '-', clause: discharge.clause },
    { symbol: 'C_w', description: 'discharge factor for the wall friction', expression: discharge.expression, value: discharge.Cw, unit: '-', clause: discharge.clause },
    { symbol: 'W_s', description: 'weight of the stored solid (cylinder and hopper)', expression: 'gamma (V_cyl + V_hop)', value: solidWeight, unit: 'N', clause: 'statics' },
    { symbol: 'F_w', description: 'solid weight carried by wall friction at filling', expression: 'pi d_c n_zSk(h_c)', value: wallFrictionForce, unit: 'N', clause: pressureClause },
    { symbol: 'F_h', description: 'solid weight carried by the hopper at filling (outlet closed)', expression: 'p_vf(h_c) A + gamma V_hop', value: solidOnHopper, unit: 'N', clause: 'statics' },
    { symbol: 'F_w,e', description: 'wall friction at discharge (max wall friction properties), at most the weight in the cylinder', expression: 'min(C_w pi d_c n_zSk(h_c), gamma V_cyl)', value: dischargeWallFriction, unit: 'N', clause: `${discharge.clause}; statics` },
    { symbol: 'F_h,e', description: 'solid weight carried by the hopper at discharge', expression: 'W_s - F_w,e', value: dischargeOnHopper, unit: 'N', clause: 'statics' },
    { symbol: 'G_plates', description: 'self weight of wall and hopper plates', expression: 'rho g (t_w A_wall + t_h A_hop)', value: structureWeight, unit: 'N', clause: 'EN 1991-1-1 Table A.4' },
    { symbol: 'r_s', description: 'radius of the support line (wall centre line)', expression: 'd_c/2 + t_w/2', value: lineRadius, unit: 'm', clause: 'geometry' },
    { symbol: 'n_v(Q_s,f)', description: 'vertical line load from the solid at filling', expression: '(F_w + F_h) / (2 pi r_s)', value: filling.verticalLineLoad, unit: 'N/m', clause: 'statics' },
    { symbol: 'n_r(Q_s,f)', description: 'inward radial pull of the hopper from the solid at filling', expression: 'F_h tan(beta) / (2 pi r_s)', value: filling.radialLineLoad, unit: 'N/m', clause: 'statics of the hopper meridian' },
    { symbol: 'n_r(Q_s,e)', description: 'inward radial pull of the hopper from the solid at discharge', expression: 'F_h,e tan(beta) / (2 pi r_s)', value: emptying.radialLineLoad, unit: 'N/m', clause: 'statics of the hopper meridian' },
    { symbol: 'n_v(G)', description: 'vertical line load from the plates', expression: 'G_plates / (2 pi r_s)', value: permanent.verticalLineLoad, unit: 'N/m', clause: 'statics' },
    { symbol: 'n_r(G)', description: 'inward radial pull of the hopper from its own weight', expression: 'G_hop tan(beta) / (2 pi r_s)', value: permanent.radialLineLoad, unit: 'N/m', clause: 'statics of the hopper meridian' },
  ];
  if (pileMoment > 0) {
    derivation.push({ symbol: 'M_pile', description: 'moment of the solid weight about the bin axis from the eccentric top pile', expression: 'gamma integral (H_a - tan(phi_r) |P - apex|) x dA', value: pileMoment, unit: 'N m', clause: 'statics; EN 1991-4 1.5 (top surface)' });
  }

  // Hopper pressures (EN 1991-4 6), with the maximum hopper load properties.
  const pvft = Cb * atH.pv;
  const hopper = hopperPressures({ unitWeight: gamma, lateralPressureRatio: setH.lateralPressureRatio, wallFrictionCoefficient: setH.wallFrictionCoefficient, internalFrictionAngle: setH.internalFrictionAngle, apexHalfAngle: beta, radius: geometry.radius, outletRadius: geometry.outletRadius, transitionStress: pvft });
  const outletArea = Math.PI * geometry.outletRadius * geometry.outletRadius;
  const hopperWallVertical = hopperWallVerticalResultant(hopper.filling, beta, hopper.outletHeight, hopper.coneHeight);
  const outletForce = hopper.filling.at(Math.max(hopper.outletHeight, 1e-9 * hopper.coneHeight)).pv * outletArea;
  const hopperLoad = pvft * A + solidWeightHopper;
  const hopperMismatch = (hopperWallVertical + outletForce) / hopperLoad - 1;
  derivation.push(
    { symbol: 'tan(beta) vs (1-K)/(2 mu_h)', description: `hopper is ${hopper.kind}`, expression: 'steep if tan(beta) < (1 - K)/(2 mu_h)', value: hopper.steepLimit, unit: '-', clause: 'EN 1991-4 6.1.1(2) (6.1)' },
    { symbol: 'C_b', description: 'hopper bottom load magnifier', expression: bin.hopper.bottomLoadMagnifier !== undefined ? 'given' : aac === 1 || solid.proneToDynamicBehaviour ? '1.3 (AAC 1 or solid prone to dynamic behaviour)' : '1.0', value: Cb, unit: '-', clause: 'EN 1991-4 6.1.2 (6.3): 1.0 for AAC 2 without dynamic behaviour (seen in a published worked example); 1.3 otherwise (from memory)' },
    { symbol: 'p_vft', description: 'vertical stress on the hopper at the transition', expression: 'C_b p_vf(h_c)', value: pvft, unit: 'Pa', clause: 'EN 1991-4 6.1.2 (6.2)' },
    { symbol: 'F_f', description: 'hopper pressure ratio at filling', expression: hopper.kind === 'steep' ? '1 - b / (1 + tan(beta)/mu_h)' : '1 - b / (1 + tan(beta)/mu_heff)', value: hopper.filling.F, unit: '-', clause: hopper.kind === 'steep' ? 'EN 1991-4 6.3.2' : 'EN 1991-4 6.3.3' },
    { symbol: 'n_f', description: 'exponent of the hopper vertical stress at filling', expression: hopper.kind === 'steep' ? 'S (F_f mu_h cot(beta) + F_f) - 2' : 'S (1 - b) mu_heff cot(beta)', value: hopper.filling.n, unit: '-', clause: hopper.kind === 'steep' ? 'EN 1991-4 6.3.2' : 'EN 1991-4 6.3.3' },
    { symbol: 'F_e', description: hopper.dischargeExpression === 'mass-flow' ? 'hopper pressure ratio at discharge' : 'hopper pressure ratio at discharge (= filling)', expression: hopper.dischargeExpression === 'mass-flow' ? '(1 + sin(phi_i) cos(eps)) / (1 - sin(phi_i) cos(2 beta + eps))' : 'F_f', value: hopper.discharge.F, unit: '-', clause: 'EN 1991-4 6.3.2, 6.3.3' },
    { symbol: 'N_phi,t', description: 'meridional membrane force of the hopper at the transition per unit circumference (filling, statics)', expression: 'F_h / (2 pi r_s cos(beta))', value: solidOnHopper / (linePerimeter * Math.cos(beta)), unit: 'N/m', clause: 'statics of the hopper meridian (EN 1993-4-1 5.3.4)' },
    { symbol: 'V_hop,wall', description: 'vertical resultant of the hopper wall pressures at filling, outlet to transition', expression: 'integral 2 pi x tan(beta) (p_n tan(beta) + p_t) dx', value: hopperWallVertical, unit: 'N', clause: 'statics of EN 1991-4 (6.6)' },
    { symbol: 'F_outlet', description: 'vertical stress times outlet area (load on a closed outlet gate)', expression: 'p_v(x_o) pi r_o^2', value: outletForce, unit: 'N', clause: 'EN 1991-4 (6.6)' },
    { symbol: 'delta_hop', description: 'closure of the hopper: (V_hop,wall + F_outlet) / (p_vft A + gamma V_hop) - 1', expression: hopper.kind === 'steep' ? 'zero: (6.6) is exact slice equilibrium with p_n = F p_v, p_t = mu_h F p_v' : 'not zero by design: the shallow-hopper n and mu_heff are not linked by slice equilibrium', value: hopperMismatch, unit: '-', clause: 'statics' },
  );
  if (hopper.dischargeExpression === 'filling' && hopper.kind === 'steep') {
    notes.push('Hopper discharge: the hopper wall friction angle is not below the angle of internal friction, so the mass-flow discharge expression does not apply; the filling pressures are used (EN 1991-4 6.3.2).');
  }
  if (hopper.kind === 'shallow') {
    notes.push(`Shallow hopper: the standard's pressures (6.3.3) do not satisfy slice equilibrium exactly; their vertical resultant plus the outlet force differs from the hopper load by ${(100 * hopperMismatch).toFixed(2)} %. The support line uses the statics of the solid (F_h), not this resultant.`);
  }
  if (Cb > 1) {
    const increment = (Cb - 1) * atH.pv * A;
    cases.push({ ...uniform(HOPPER_MAGNIFIER_CASE, `hopper bottom overpressure (C_b - 1) p_vf A, C_b = ${Cb}: a local magnifier of the hopper load, carried along the hopper meridian; it comes with Q_s,f and Q_s,e in every combination`, 'variable', 'solid', increment, increment * tanB) });
    derivation.push({ symbol: 'dF_b', description: 'vertical force of the hopper bottom overpressure, above the weight of the solid by design', expression: '(C_b - 1) p_vf(h_c) A', value: increment, unit: 'N', clause: 'EN 1991-4 6.1.2' });
  }

  // Patch loads (EN 1991-4 5.2.1.2-5.2.2.3) and their global bending on the support line.
  const patch = patchFactors(aspect, solid.patchLoadFactor, ef / dc, e / dc);
  const s = patchHeight(dc);
  derivation.push(
    { symbol: 'C_pf', description: 'filling patch load factor', expression: '0.21 C_op (1 + 2 E^2)(1 - exp(-1.5 (h_c/d_c - 1))), E = 2 e_f/d_c', value: patch.Cpf, unit: '-', clause: 'EN 1991-4 5.2.1.2 (from memory)' },
    { symbol: 'C_pe', description: 'discharge patch load factor', expression: '0.42 C_op (1 + 2 E^2)(1 - exp(-1.5 (h_c/d_c - 1))), E = 2 e/d_c, e = max(e_f, e_o)', value: patch.Cpe, unit: '-', clause: 'EN 1991-4 5.2.2.2 (from memory)' },
    { symbol: 's', description: 'height of the patch zone', expression: 'pi d_c / 16', value: s, unit: 'm', clause: 'EN 1991-4 5.2.1.2' },
  );
  // Substitute uniform pressure increase (AAC 2 only, checked above): wall profiles scaled per case.
  const uniformIncrease: Array<{ name: string; ch: number; cw: number }> = [];
  if (aac === 1) {
    notes.push('AAC 1: patch loads are not applied; the enlarged discharge factors C_h and C_w stand for them (EN 1991-4 5.2.2.1).');
  } else if (patchLoadMethod === 'uniform-increase') {
    // EN 1991-4 5.2.3 (expressions from memory): p_h,u = (1 + zeta C_p) p_h and
    // p_w,u = (1 + zeta C_p) p_w at every depth. Axisymmetric, so no global bending of the shell. The
    // friction resultant is the integral of p_w,u down the wall, so it takes the same factor:
    // n_z,u(h_c) = (1 + zeta C_p) n_zSk(h_c). The solid still weighs W_s: what the wall carries more,
    // the hopper carries less (at most the weight in the cylinder goes to the wall), so the vertical
    // total on the support line is W_s and the inward pull of the hopper falls.
    const zeta = uniformIncreaseZeta(dc, bin.wallThickness);
    derivation.push({ symbol: 'zeta', description: 'factor of the substitute uniform pressure increase (replaces the patch loads, AAC 2)', expression: 'max(1, 0.5 + 0.01 d_c/t)', value: zeta, unit: '-', clause: 'EN 1991-4 5.2.3 (from memory)' });
    const increasedCase = (name: string, factor: number, Ch: number, Cw: number, label: string, clause: string) => {
      if (factor <= 1) return;
      const nzU = factor * Cw * atW.nzSk;
      const wallForce = Math.min(U * nzU, solidWeightCylinder);
      const onHopper = solidWeight - wallForce;
      const increased: SupportLineCase = {
        ...uniform(name, `stored solid (${solid.name}) at ${label} with the substitute uniform pressure increase (1 + zeta C_p) of the wall pressures in place of the patch load: wall friction with the maximum-wall-friction properties, the hopper carries the rest of the weight`, 'variable', 'solid', wallForce + onHopper, onHopper * tanB),
        ...pileHarmonics,
      };
      cases.push(increased);
      uniformIncrease.push({ name, ch: factor * Ch, cw: factor * Cw });
      const Cp = name === FILLING_UNIFORM_INCREASE_CASE ? 'C_pf' : 'C_pe';
      const CwText = Cw === 1 ? '' : ' C_w';
      derivation.push(
        { symbol: `f_u (${name})`, description: `multiplier of the ${label} wall pressures p_h and p_w`, expression: `1 + zeta ${Cp}`, value: factor, unit: '-', clause },
        { symbol: `n_z,u(h_c) (${name})`, description: `wall friction force per unit perimeter at the transition, ${label}, increased (max wall friction properties)`, expression: `(1 + zeta ${Cp})${CwText} n_zSk(h_c): integral of p_w,u = (1 + zeta ${Cp})${CwText} p_wf over the wall height`, value: nzU, unit: 'N/m', clause: `${clause}; ${pressureClause} (n_zSk)` },
        { symbol: `F_w,u (${name})`, description: `solid weight carried by wall friction, ${label}, uniform increase; at most the weight in the cylinder`, expression: 'min(pi d_c n_z,u(h_c), gamma V_cyl)', value: wallForce, unit: 'N', clause: 'statics' },
        { symbol: `F_h,u (${name})`, description: `solid weight carried by the hopper, ${label}, uniform increase`, expression: 'W_s - F_w,u', value: onHopper, unit: 'N', clause: 'statics' },
        { symbol: `n_v(${name})`, description: `vertical line load from the solid, ${label}, uniform increase (the weight of the solid)`, expression: '(F_w,u + F_h,u) / (2 pi r_s) = W_s / (2 pi r_s)', value: increased.verticalLineLoad, unit: 'N/m', clause: 'statics' },
        { symbol: `n_r(${name})`, description: `inward radial pull of the hopper, ${label}, uniform increase`, expression: 'F_h,u tan(beta) / (2 pi r_s)', value: increased.radialLineLoad, unit: 'N/m', clause: 'statics of the hopper meridian' },
      );
    };
    increasedCase(FILLING_UNIFORM_INCREASE_CASE, uniformIncreaseFactor(zeta, patch.Cpf), 1, 1, 'filling', 'EN 1991-4 5.2.3 (from memory)');
    increasedCase(DISCHARGE_UNIFORM_INCREASE_CASE, uniformIncreaseFactor(zeta, patch.Cpe), discharge.Ch, discharge.Cw, 'discharge', 'EN 1991-4 5.2.3 (from memory)');
    if (uniformIncrease.length === 0) {
      notes.push('AAC 2, substitute uniform pressure increase: C_pf = C_pe = 0 (h_c/d_c <= 1), so there is nothing to increase and no patch case either.');
    } else {
      notes.push(
        'AAC 2, substitute uniform pressure increase in place of the patch loads (EN 1991-4 5.2.3; expressions from memory, not yet confirmed against the text): the increase is axisymmetric, so the support line gets no global bending from it, unlike the patch method, whose overturning moment the girder then does not see. The increased wall friction moves load from the hopper to the wall: the vertical total stays the weight of the solid and the inward pull of the hopper is smaller; the cases without the increase (Q_s,f, Q_s,e) stay as alternatives, so the full hopper pull is still checked.',
      );
    }
  } else if (!thinWalled) {
    notes.push('Thick-walled bin (d_c/t <= 200): the patch acts outward on two opposite zones and is self-equilibrated, so it puts no resultant on the support line; it matters for the wall only.');
  } else {
    const zo = profileN.z0;
    const patchCase = (name: string, factor: number, ch: number, label: string) => {
      if (factor <= 0) return;
      const moment = (z: number) => thinWalledPatchForce(dc, factor * ch * profileN.at(z).ph) * (hc - z);
      let zp = Math.min(zo, 0.5 * hc);
      if (aac === 3) {
        // AAC 3: the patch may act at any level; take the level of the largest overturning moment.
        let best = -1;
        for (let i = 0; i <= 400; i++) {
          const z = surface.h0 + ((hc - surface.h0) * i) / 400;
          const m = moment(z);
          if (m > best) {
            best = m;
            zp = z;
          }
        }
      }
      const pressure = factor * ch * profileN.at(zp).ph;
      const force = thinWalledPatchForce(dc, pressure);
      const arm = hc - zp;
      const bending = globalBending(force, force * arm, direction, lineRadius);
      cases.push({ ...uniform(name, `${label} patch load, thin-walled cosine band p_p cos(theta - theta_e) of height s at z_p = ${zp.toFixed(2)} m: global bending of the shell`, 'variable', 'solid', 0), ...bending, distribution: 'EN 1991-4 5.2.1.3 / 5.2.2.3 band load; membrane (beam) theory of the shell: vertical (M / (pi r^2)) cos(theta - theta_e), shear -(F / (pi r)) sin(theta - theta_e)' });
      derivation.push(
        { symbol: `z_p (${name})`, description: `depth of the ${label} patch centre below the equivalent surface`, expression: aac === 3 ? 'level of the largest F_p (h_c - z_p)' : 'min(z_o, 0.5 h_c)', value: zp, unit: 'm', clause: 'EN 1991-4 5.2.1.3' },
        { symbol: `p_p (${name})`, description: `${label} patch pressure`, expression: ch === 1 ? 'C_pf p_hf(z_p)' : 'C_pe C_h p_hf(z_p)', value: pressure, unit: 'Pa', clause: 'EN 1991-4 5.2.1.2, 5.2.2.2' },
        { symbol: `F_p (${name})`, description: `net horizontal force of the ${label} patch`, expression: '(pi/2) s d_c p_p', value: force, unit: 'N', clause: 'EN 1991-4 5.2.1.3 (5.13)' },
        { symbol: `M_p (${name})`, description: `overturning moment of the ${label} patch about the support level`, expression: 'F_p (h_c - z_p)', value: force * arm, unit: 'N m', clause: 'statics' },
      );
    };
    patchCase(FILLING_PATCH_CASE, patch.Cpf, 1, 'filling');
    patchCase(DISCHARGE_PATCH_CASE, patch.Cpe, discharge.Ch, 'discharge');
  }

  // Large-eccentricity discharge: one flow-channel case per channel radius (EN 1991-4 5.2.4.3).
  const flowChannelCases = largeEccentricity ? flowChannelLoadCases({ set: setW, profile: profileW, radius: geometry.radius, fillHeight: hc, solidWeight, solidWeightCylinder, lineRadius, tanB, direction, pileBending, solidName: solid.name, points: Math.max(input.profilePoints ?? 41, 2) }) : undefined;
  if (flowChannelCases) {
    cases.push(...flowChannelCases.cases);
    derivation.push(...flowChannelCases.derivation);
    notes.push(...flowChannelCases.notes);
  }

  // Roof, equipment, snow.
  const roofDead = input.roof ? input.roof.deadLoad * roofArea : 0;
  const permanentNames = [PERMANENT_CASE];
  if (input.roof) {
    cases.push(uniform(ROOF_DEAD_CASE, 'roof dead load on plan', 'permanent', 'roof', roofDead));
    permanentNames.push(ROOF_DEAD_CASE);
    derivation.push({ symbol: 'G_roof', description: 'roof dead load', expression: 'g_roof pi (d_c/2 + t_w)^2', value: roofDead, unit: 'N', clause: 'EN 1991-1-1' });
  }
  const groups: VariableGroup[] = [];
  const solidFilling = [SOLID_FILLING_CASE, ...cases.filter((c) => c.name === FILLING_PATCH_CASE || c.name === HOPPER_MAGNIFIER_CASE).map((c) => c.name)];
  const solidDischarge = [SOLID_DISCHARGE_CASE, ...cases.filter((c) => c.name === DISCHARGE_PATCH_CASE || c.name === HOPPER_MAGNIFIER_CASE).map((c) => c.name)];
  const magnifier = cases.some((c) => c.name === HOPPER_MAGNIFIER_CASE) ? [HOPPER_MAGNIFIER_CASE] : [];
  // The uniform-increase cases are full solid states (not increments): further alternatives of Q_s.
  const increasedAlternatives = uniformIncrease.map(({ name }) => ({ label: name === FILLING_UNIFORM_INCREASE_CASE ? 'filling, uniform increase' : 'discharge, uniform increase', cases: [name, ...magnifier] }));
  // The flow-channel cases are full solid states at discharge: further alternatives of Q_s, each with
  // the hopper magnifier like the other states, without the patch loads (a load case of its own,
  // EN 1991-4 5.2.4.1, from memory).
  const flowChannelAlternatives = (flowChannelCases?.cases ?? []).map((c) => ({ label: `discharge, flow channel ${c.name}`, cases: [c.name, ...magnifier] }));
  groups.push({ action: 'solid', symbol: 'Q_s', alternatives: [{ label: 'filling', cases: solidFilling }, { label: 'discharge', cases: solidDischarge }, ...increasedAlternatives, ...flowChannelAlternatives] });
  const roofImposed = input.roof?.imposedLoad ?? 0;
  if (roofImposed > 0) {
    cases.push(uniform(ROOF_IMPOSED_CASE, 'roof imposed load on plan (category H)', 'variable', 'roof', roofImposed * roofArea));
    groups.push({ action: 'roofImposed', symbol: ROOF_IMPOSED_CASE, alternatives: [{ label: 'roof imposed', cases: [ROOF_IMPOSED_CASE] }] });
  }
  let permanentEquipment = 0;
  for (const kind of ['permanent', 'variable'] as const) {
    const items = (input.equipment ?? []).filter((item) => (item.kind ?? 'permanent') === kind);
    if (items.length === 0) continue;
    const total = items.reduce((sum, item) => sum + item.force, 0);
    const mx = items.reduce((sum, item) => sum + item.force * item.radius * Math.cos(item.angle), 0);
    const my = items.reduce((sum, item) => sum + item.force * item.radius * Math.sin(item.angle), 0);
    const name = kind === 'permanent' ? EQUIPMENT_PERMANENT_CASE : EQUIPMENT_VARIABLE_CASE;
    const q1 = 1 / (Math.PI * lineRadius * lineRadius);
    cases.push({
      ...uniform(name, `${kind} equipment: ${items.map((item) => item.name).join(', ')}`, kind, 'equipment', total),
      verticalHarmonics: [{ order: 1, cos: mx * q1, sin: my * q1 }],
      overturningMoment: { x: my, y: -mx },
      distribution: 'point loads on the roof carried by the shell as a beam: mean sum F / (2 pi r) plus (sum F r_i cos(theta - alpha_i)) / (pi r^2) (resultant and moment exact; local concentration below the loads not modelled)',
    });
    if (kind === 'permanent') {
      permanentEquipment = total;
      permanentNames.push(name);
    } else {
      groups.push({ action: 'equipment', symbol: name, alternatives: [{ label: 'equipment', cases: [name] }] });
    }
  }
  if (input.snow) {
    const mu1 = roofShapeCoefficient(input.roof?.pitch ?? 0);
    const Ce = input.snow.exposureCoefficient ?? 1;
    const Ct = input.snow.thermalCoefficient ?? 1;
    const sRoof = mu1 * Ce * Ct * input.snow.groundLoad;
    cases.push(uniform(SNOW_CASE, 'snow on the roof, undrifted', 'variable', 'snow', sRoof * roofArea));
    groups.push({ action: 'snow', symbol: SNOW_CASE, alternatives: [{ label: 'snow', cases: [SNOW_CASE] }] });
    derivation.push(
      { symbol: 'mu_1', description: 'roof snow load shape coefficient (pitch of the roof)', expression: '0.8 (0-30 deg); 0.8 (60 - alpha)/30 (30-60 deg); 0 above', value: mu1, unit: '-', clause: 'EN 1991-1-3 5.3.2, Table 5.2 (from memory)' },
      { symbol: 's', description: 'snow load on the roof', expression: 'mu_1 C_e C_t s_k', value: sRoof, unit: 'Pa', clause: 'EN 1991-1-3 5.2 (5.1)' },
    );
  }

  // Wind on the shell (EN 1991-1-4 4, 7.9.2): base shear and overturning moment at the support level.
  if (input.wind) {
    const w = input.wind;
    const b = dc + 2 * bin.wallThickness;
    const H = bin.cylinderHeight;
    const ze = w.supportLevelHeight + H;
    const qp = peakVelocityPressure(w.basicVelocity, w.terrainCategory, ze, w.orographyFactor ?? 1);
    const vPeak = Math.sqrt((2 * qp.qp) / AIR_DENSITY);
    const Re = (b * vPeak) / AIR_VISCOSITY;
    const k = w.roughness ?? 0.2e-3;
    const cf0 = cylinderForceCoefficient(Re, k, b);
    const lambda = effectiveSlenderness(H, b);
    const psi = endEffectFactor(lambda);
    const cf = cf0 * psi;
    const cscd = w.structuralFactor ?? 1;
    const force = cscd * cf * qp.qp * b * H;
    const moment = force * (H / 2);
    derivation.push(
      { symbol: 'q_p(z_e)', description: `peak velocity pressure at the top of the wall, z_e = ${ze.toFixed(2)} m, terrain ${w.terrainCategory}`, expression: '(1 + 7 I_v) (1/2) rho (c_r c_o v_b)^2', value: qp.qp, unit: 'Pa', clause: 'EN 1991-1-4 4.5 (4.8)' },
      { symbol: 'Re', description: 'Reynolds number at the peak velocity', expression: 'b sqrt(2 q_p / rho) / nu', value: Re, unit: '-', clause: 'EN 1991-1-4 7.9.1 (7.15)' },
      { symbol: 'c_f,0', description: 'force coefficient of a cylinder without free-end flow', expression: '1.2 + 0.18 log10(10 k/b) / (1 + 0.4 log10(Re/1e6))', value: cf0, unit: '-', clause: 'EN 1991-1-4 7.9.2 (7.19), Figure 7.28 (from memory)' },
      { symbol: 'lambda', description: 'effective slenderness of the cylinder', expression: 'Table 7.16: 2 l/b (l <= 15 m) .. 0.7 l/b (l >= 50 m), at most 70', value: lambda, unit: '-', clause: 'EN 1991-1-4 7.13, Table 7.16 (from memory)' },
      { symbol: 'psi_lambda', description: 'end-effect factor, solidity 1, log-linear between (1, 0.60), (10, 0.70), (100, 0.92)', expression: 'Figure 7.36', value: psi, unit: '-', clause: 'EN 1991-1-4 7.13, Figure 7.36 (read off, from memory)' },
      { symbol: 'F_w', description: 'wind force on the cylinder (roof and hopper not included)', expression: 'c_s c_d c_f,0 psi_lambda q_p(z_e) b h', value: force, unit: 'N', clause: 'EN 1991-1-4 5.3 (5.3)' },
      { symbol: 'M_w', description: 'overturning moment of the wind about the support level', expression: 'F_w h / 2', value: moment, unit: 'N m', clause: 'statics' },
    );
    const alternatives = (w.directions ?? [0]).map((theta) => {
      const name = windCaseName(theta);
      cases.push({ ...uniform(name, `wind toward ${degrees(theta)} degrees: base shear and overturning moment of the shell`, 'variable', 'wind', 0), ...globalBending(force, moment, theta, lineRadius), distribution: 'membrane (beam) theory of the shell: vertical (M / (pi r^2)) cos(theta - theta_w), shear -(F / (pi r)) sin(theta - theta_w); zero net vertical force' });
      return { label: `wind ${degrees(theta)} deg`, cases: [name] };
    });
    groups.push({ action: 'wind', symbol: 'W', alternatives });
    notes.push('Wind: one reference height (top of the wall) over the whole cylinder (conservative); wind on the roof (uplift) and on the hopper below the support line is not included.');
  }

  // Seismic action as an equivalent static horizontal force (coefficient given by the engineer).
  const seismicNames: string[] = [];
  if (input.seismic) {
    const a = input.seismic.horizontalCoefficient;
    const fraction = input.seismic.effectiveSolidMassFraction ?? 0.8;
    const H = bin.cylinderHeight;
    const hh = geometry.hopperHeight;
    const r = geometry.outletRadius;
    const R = geometry.radius;
    // Centroids below the transition: lateral surface and volume of the frustum (measured up from the outlet).
    const plateCentroid = hh - (hh * (r + 2 * R)) / (3 * (r + R));
    const volumeCentroid = hh - (hh * (r * r + 2 * r * R + 3 * R * R)) / (4 * (r * r + r * R + R * R));
    const weights: Array<[number, number]> = [
      [wallPlateWeight, H / 2],
      [hopperPlateWeight, -plateCentroid],
      [roofDead + permanentEquipment, H],
      [fraction * solidWeightCylinder, hc / 2],
      [fraction * solidWeightHopper, -volumeCentroid],
    ];
    const force = a * weights.reduce((sum, [w]) => sum + w, 0);
    const moment = a * weights.reduce((sum, [w, z]) => sum + w * z, 0);
    derivation.push(
      { symbol: 'F_E', description: `equivalent static horizontal seismic force (effective solid mass fraction ${fraction})`, expression: 'a_h (G_plates + G_roof + G_eq + f_s W_s)', value: force, unit: 'N', clause: 'EN 1998-4 (equivalent static; coefficient given by the engineer; mass fraction from memory)' },
      { symbol: 'M_E', description: 'overturning moment of the seismic force about the support level', expression: 'a_h sum W_i z_i', value: moment, unit: 'N m', clause: 'statics' },
    );
    for (const theta of input.seismic.directions ?? [0]) {
      const name = seismicCaseName(theta);
      seismicNames.push(name);
      cases.push({ ...uniform(name, `seismic action toward ${degrees(theta)} degrees, bin full (equivalent static)`, 'variable', 'seismic', 0), ...globalBending(force, moment, theta, lineRadius), distribution: 'membrane (beam) theory of the shell, as for wind' });
    }
  }

  // Pressure profiles: wall per effect (p_h max normal pressure set, p_w max wall friction set,
  // p_v max hopper load set), hopper per state.
  const points = Math.max(input.profilePoints ?? 41, 2);
  const wall = (name: string, ch: number, cw: number): PressureProfile => {
    const profile: PressureProfile = { case: name, part: 'wall', z: [], ph: [], pw: [], pv: [] };
    for (let i = 0; i < points; i++) {
      const z = (hc * i) / (points - 1);
      profile.z.push(z);
      profile.ph.push(ch * profileN.at(z).ph);
      profile.pw.push(cw * profileW.at(z).pw);
      profile.pv.push(profileH.at(z).pv);
    }
    return profile;
  };
  const hopperProfile = (name: string, set: HopperPressureSet): PressureProfile => {
    const profile: PressureProfile = { case: name, part: 'hopper', z: [], ph: [], pw: [], pv: [], x: [] };
    const x0 = Math.max(hopper.outletHeight, 1e-6 * hopper.coneHeight);
    for (let i = 0; i < points; i++) {
      const x = hopper.coneHeight - ((hopper.coneHeight - x0) * i) / (points - 1);
      const state = set.at(x);
      profile.x?.push(x);
      profile.z.push(hopper.coneHeight - x);
      profile.ph.push(state.pn);
      profile.pw.push(state.pt);
      profile.pv.push(state.pv);
    }
    return profile;
  };
  const profiles = [wall(SOLID_FILLING_CASE, 1, 1), wall(SOLID_DISCHARGE_CASE, discharge.Ch, discharge.Cw), ...uniformIncrease.map(({ name, ch, cw }) => wall(name, ch, cw)), ...(flowChannelCases?.profiles ?? []), hopperProfile(SOLID_FILLING_CASE, hopper.filling), hopperProfile(SOLID_DISCHARGE_CASE, hopper.discharge)];

  const combinations = combineActions({ permanent: permanentNames, groups, seismic: seismicNames, closure: [PERMANENT_CASE, SOLID_FILLING_CASE] }, input.partialFactors);

  return {
    cases,
    combinations,
    profiles,
    totals: { solidWeight, structureWeight, roofDeadLoad: roofDead, permanentEquipment },
    derivation,
    classification: { slenderness, actionAssessmentClass: aac, hopper: hopper.kind, thinWalled },
    notes,
  };
}

/** Whether a case is a symmetric gravity case whose vertical total is a weight (self weight, solid, roof, equipment, snow). */
export function isGravityCase(loadCase: SupportLineCase): boolean {
  return loadCase.verticalResultant > 0 && loadCase.action !== 'wind' && loadCase.action !== 'seismic';
}
