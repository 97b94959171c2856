import { classifySection } from './classification.js';
import type { ClassifiableSection, Fabrication, SectionClass } from './classification.js';
import type { CheckResult } from './checks.js';
import { SteelError } from './errors.js';
import type { SteelGrade } from './grades.js';

/** A doubly symmetric I/H section or welded box for member checks; `fabrication` defaults to 'rolled'. */
export type MemberSection = ClassifiableSection;
export type { Fabrication };

export type BucklingCurve = 'a0' | 'a' | 'b' | 'c' | 'd';

/** Imperfection factors alpha, EN 1993-1-1 Table 6.1 (flexural) and Table 6.3 (lateral-torsional, a-d). */
export const imperfectionFactor: Readonly<Record<BucklingCurve, number>> = Object.freeze({ a0: 0.13, a: 0.21, b: 0.34, c: 0.49, d: 0.76 });

function positive(name: string, value: number): number {
  if (!Number.isFinite(value) || value <= 0) throw new SteelError('INVALID_OPTIONS', `${name} must be a positive number in SI units; got ${value}.`, name);
  return value;
}

function finite(name: string, value: number): number {
  if (!Number.isFinite(value)) throw new SteelError('INVALID_FORCES', `${name} must be a finite number in SI units; got ${value}.`, name);
  return value;
}

function ratio(effect: number, resistance: number): number {
  if (effect === 0) return 0;
  return resistance > 0 ? effect / resistance : Number.POSITIVE_INFINITY;
}

/**
 * Reduction factor of EN 1993-1-1 6.3.1.2(1), eq. (6.49):
 *   chi = 1 / (Phi + sqrt(Phi^2 - lambda^2)) <= 1, Phi = 0.5 (1 + alpha (lambda - 0.2) + lambda^2).
 * The same expression gives chi_LT of 6.3.2.2 (eq. 6.56) with alpha_LT.
 */
export function bucklingReductionFactor(slenderness: number, alpha: number): number {
  if (!Number.isFinite(slenderness) || slenderness < 0) throw new SteelError('INVALID_OPTIONS', `Relative slenderness must be zero or positive; got ${slenderness}.`, 'slenderness');
  if (slenderness <= 0.2) return 1;
  const phi = 0.5 * (1 + alpha * (slenderness - 0.2) + slenderness ** 2);
  return Math.min(1, 1 / (phi + Math.sqrt(phi ** 2 - slenderness ** 2)));
}

/** Moment shapes over the unrestrained length with their C1 (REFERENCES section 6) and k_c (EN 1993-1-1 Table 6.6). */
export type MomentShape = 'uniform' | 'uniformLoad' | 'midspanPointLoad';

/**
 * C1 for fork supports and load at the shear centre (REFERENCES section 6, from memory). A public
 * technical specification (Steel Buildings in Europe, Part 10, Table 5.1) prints 1.13 and 1.35 for the
 * uniform and mid-span point load; the values here are the more precise 1.132 and 1.365.
 */
export const equivalentMomentFactorC1: Readonly<Record<MomentShape, number>> = Object.freeze({ uniform: 1.0, uniformLoad: 1.132, midspanPointLoad: 1.365 });

/** k_c of EN 1993-1-1 Table 6.6 for a simply supported span (from memory): 1.0, 0.94, 0.86. */
export const correctionFactorKc: Readonly<Record<MomentShape, number>> = Object.freeze({ uniform: 1.0, uniformLoad: 0.94, midspanPointLoad: 0.86 });

/**
 * Elastic critical moment for lateral-torsional buckling of a doubly symmetric I section between fork
 * supports (k = k_w = 1), load at the shear centre (REFERENCES section 6; the classical expression):
 *   M_cr = C1 (pi^2 E I_z / L^2) sqrt(I_w / I_z + L^2 G I_t / (pi^2 E I_z)).
 */
export function criticalMomentForkSupports(section: ClassifiableSection, grade: SteelGrade, length: number, c1 = 1.0): number {
  positive('length', length);
  positive('C1', c1);
  const { secondMomentOfAreaZ: Iz, warpingConstant: Iw, torsionConstant: It } = section.properties;
  const E = grade.youngsModulus;
  const G = grade.shearModulus;
  const euler = (Math.PI ** 2 * E * Iz) / length ** 2;
  return c1 * euler * Math.sqrt(Iw / Iz + (length ** 2 * G * It) / (Math.PI ** 2 * E * Iz));
}

export interface LateralTorsionalBucklingOptions {
  /** unrestrained length between fork supports [m]; needed unless criticalMoment is given */
  length?: number;
  /** shape of the moment diagram over the length; sets C1 and k_c (default 'uniform') */
  momentShape?: MomentShape;
  /** C1 given directly (overrides momentShape for M_cr) */
  c1?: number;
  /** M_cr [N m] from a separate analysis (overrides the fork-support formula) */
  criticalMoment?: number;
  /** 'general': 6.3.2.2; 'rolled' (default): 6.3.2.3, rolled or equivalent welded sections */
  method?: 'general' | 'rolled';
  /** 6.3.2.3 lambda_LT,0 (recommended, maximum 0.4) */
  lambdaLT0?: number;
  /** 6.3.2.3 beta (recommended, minimum 0.75) */
  beta?: number;
  /** apply the modification f of 6.3.2.3(2) (default false) */
  modifyForMomentDistribution?: boolean;
  /** k_c of Table 6.6 given directly (overrides momentShape for f) */
  kc?: number;
}

/**
 * Buckling curve for lateral-torsional buckling, EN 1993-1-1 Table 6.4 (general: rolled I h/b <= 2 a,
 * > 2 b; welded I <= 2 c, > 2 d; from memory) and Table 6.5 (6.3.2.3: rolled I h/b <= 2 b, > 2 c;
 * welded I <= 2 c, > 2 d; rolled limits confirmed in Steel Buildings in Europe, Part 10, section 5).
 * Sections outside these shapes use curve d, Table 6.4 "other cross-sections": a welded box gets d by either
 * method (6.3.2.3 is written for I sections; a box's M_cr is so high that chi_LT is 1 or close to it).
 */
export function lateralTorsionalBucklingCurve(section: MemberSection, method: 'general' | 'rolled'): BucklingCurve {
  if (section.box) return 'd';
  const { depth: h, flangeWidth: b } = section.dimensions;
  const welded = (section.fabrication ?? 'rolled') === 'welded';
  const slender = h / b > 2;
  if (method === 'general') return welded ? (slender ? 'd' : 'c') : slender ? 'b' : 'a';
  return welded ? (slender ? 'd' : 'c') : slender ? 'c' : 'b';
}

interface BendingCapacity {
  sectionClass: SectionClass;
  modulus: number;
  yieldStrength: number;
  outOfScope: string | undefined;
}

function strongAxisBending(section: MemberSection, grade: SteelGrade): BendingCapacity {
  const c = classifySection(section, grade);
  const sectionClass = c.bendingY;
  const modulus = sectionClass <= 2 ? section.properties.plasticModulusY : section.properties.elasticModulusY;
  const outOfScope =
    sectionClass === 4 ? `${section.designation ?? 'section'} is class 4 in bending (EN 1993-1-1 Table 5.2); effective properties per EN 1993-1-5 are outside the scope of these checks.` : undefined;
  return { sectionClass, modulus, yieldStrength: c.yieldStrength, outOfScope };
}

/** Numbers of a lateral-torsional buckling calculation, for the interaction check and reports. */
export interface LateralTorsionalBucklingFactors {
  criticalMoment: number;
  slenderness: number;
  curve: BucklingCurve;
  alpha: number;
  chi: number;
  /** chi_LT,mod (equals chi without the modification) */
  chiModified: number;
  f: number;
  /** M_b,Rd [N m] */
  resistance: number;
  /** W_y f_y, characteristic moment resistance [N m] */
  characteristicResistance: number;
  sectionClass: SectionClass;
  outOfScope: string | undefined;
}

/**
 * chi_LT and M_b,Rd of EN 1993-1-1 6.3.2:
 *   lambda_LT = sqrt(W_y f_y / M_cr) (6.3.2.2(1)), W_y = W_pl,y (class 1, 2) or W_el,y (class 3);
 *   6.3.2.2: chi_LT by eq. (6.56) with alpha_LT of Table 6.3 and the curve of Table 6.4;
 *   6.3.2.3: Phi = 0.5 (1 + alpha (lambda - lambda_0) + beta lambda^2),
 *            chi = 1 / (Phi + sqrt(Phi^2 - beta lambda^2)) <= 1 and <= 1 / lambda^2 (curve of Table 6.5);
 *   optional 6.3.2.3(2): f = 1 - 0.5 (1 - k_c)(1 - 2 (lambda - 0.8)^2) <= 1, chi_mod = chi / f <= 1, <= 1/lambda^2;
 *   M_b,Rd = chi_LT W_y f_y / gamma_M1 (eq. 6.55).
 * Below lambda_LT,0 (0.2 for 6.3.2.2, lambda_LT,0 for 6.3.2.3) chi_LT = 1 (6.3.2.2(4)).
 */
export function lateralTorsionalBucklingFactors(section: MemberSection, grade: SteelGrade, options: LateralTorsionalBucklingOptions): LateralTorsionalBucklingFactors {
  const method = options.method ?? 'rolled';
  const shape = options.momentShape ?? 'uniform';
  let criticalMoment: number;
  if (options.criticalMoment !== undefined) criticalMoment = positive('criticalMoment', options.criticalMoment);
  else if (options.length !== undefined) criticalMoment = criticalMomentForkSupports(section, grade, options.length, options.c1 ?? equivalentMomentFactorC1[shape]);
  else throw new SteelError('INVALID_OPTIONS', 'Lateral-torsional buckling needs the unrestrained length or a critical moment M_cr.', 'length');

  const bending = strongAxisBending(section, grade);
  const characteristicResistance = bending.modulus * bending.yieldStrength;
  const slenderness = Math.sqrt(characteristicResistance / criticalMoment);
  const curve = lateralTorsionalBucklingCurve(section, method);
  const alpha = imperfectionFactor[curve];
  let chi: number;
  if (method === 'general') {
    chi = bucklingReductionFactor(slenderness, alpha);
  } else {
    const lambda0 = options.lambdaLT0 ?? 0.4;
    const beta = options.beta ?? 0.75;
    if (lambda0 > 0.4 || lambda0 <= 0) throw new SteelError('INVALID_OPTIONS', `lambdaLT0 must lie in (0, 0.4] (EN 1993-1-1 6.3.2.3(1)); got ${lambda0}.`, 'lambdaLT0');
    if (beta < 0.75 || beta > 1) throw new SteelError('INVALID_OPTIONS', `beta must lie in [0.75, 1] (EN 1993-1-1 6.3.2.3(1)); got ${beta}.`, 'beta');
    if (slenderness <= lambda0) chi = 1;
    else {
      const phi = 0.5 * (1 + alpha * (slenderness - lambda0) + beta * slenderness ** 2);
      chi = Math.min(1, 1 / slenderness ** 2, 1 / (phi + Math.sqrt(phi ** 2 - beta * slenderness ** 2)));
    }
  }
  let f = 1;
  let chiModified = chi;
  if (options.modifyForMomentDistribution && method === 'rolled') {
    const kc = options.kc ?? correctionFactorKc[shape];
    if (!(kc > 0 && kc <= 1)) throw new SteelError('INVALID_OPTIONS', `kc must lie in (0, 1] (EN 1993-1-1 Table 6.6); got ${kc}.`, 'kc');
    f = Math.min(1, 1 - 0.5 * (1 - kc) * (1 - 2 * (slenderness - 0.8) ** 2));
    chiModified = Math.min(1, 1 / slenderness ** 2, chi / f);
    if (chi === 1) chiModified = 1;
  }
  return {
    criticalMoment,
    slenderness,
    curve,
    alpha,
    chi,
    chiModified,
    f,
    resistance: (chiModified * characteristicResistance) / grade.gammaM1,
    characteristicResistance,
    sectionClass: bending.sectionClass,
    outOfScope: bending.outOfScope,
  };
}

/**
 * Lateral-torsional buckling of a member in strong-axis bending, EN 1993-1-1 6.3.2.1: M_y,Ed / M_b,Rd <= 1.
 * Assumes a doubly symmetric I section, fork supports at both ends of the unrestrained length, load at
 * the shear centre (for load on the top flange a caller-supplied M_cr is needed).
 */
export function checkLateralTorsionalBuckling(section: MemberSection, grade: SteelGrade, momentY: number, options: LateralTorsionalBucklingOptions): CheckResult {
  finite('My', momentY);
  const ltb = lateralTorsionalBucklingFactors(section, grade, options);
  const method = options.method ?? 'rolled';
  const result: CheckResult = {
    id: 'lateral-torsional-buckling',
    title: 'Lateral-torsional buckling',
    clause: method === 'rolled' ? 'EN 1993-1-1 6.3.2.1, 6.3.2.3' : 'EN 1993-1-1 6.3.2.1, 6.3.2.2',
    utilisation: ratio(Math.abs(momentY), ltb.resistance),
    inputs: {
      My: momentY,
      ...(options.length !== undefined ? { L: options.length } : {}),
      C1: options.c1 ?? equivalentMomentFactorC1[options.momentShape ?? 'uniform'],
      I_z: section.properties.secondMomentOfAreaZ,
      I_w: section.properties.warpingConstant,
      I_t: section.properties.torsionConstant,
      E: grade.youngsModulus,
      G: grade.shearModulus,
      gamma_M1: grade.gammaM1,
    },
    intermediate: {
      M_cr: ltb.criticalMoment,
      sectionClass: ltb.sectionClass,
      'W_y f_y': ltb.characteristicResistance,
      lambda_LT: ltb.slenderness,
      alpha_LT: ltb.alpha,
      chi_LT: ltb.chi,
      f: ltb.f,
      chi_LT_mod: ltb.chiModified,
      M_b_Rd: ltb.resistance,
    },
  };
  if (ltb.outOfScope && result.utilisation > 0) return { ...result, utilisation: Number.POSITIVE_INFINITY, outOfScope: ltb.outOfScope };
  return result;
}

/** Ends of a column; the buckling length factor is the theoretical Euler value (common practice). */
export type ColumnEnds = 'pinned-pinned' | 'fixed-pinned' | 'fixed-fixed' | 'fixed-free';

/** Theoretical Euler effective-length factors (common practice; designers often raise 0.7 and 0.5 for imperfect fixity). */
export const effectiveLengthFactor: Readonly<Record<ColumnEnds, number>> = Object.freeze({ 'pinned-pinned': 1.0, 'fixed-pinned': 0.7, 'fixed-fixed': 0.5, 'fixed-free': 2.0 });

export interface ColumnBucklingOptions {
  /** system length of the column [m] */
  length: number;
  /** end conditions (default 'pinned-pinned'), for both axes unless a buckling length is given */
  ends?: ColumnEnds;
  /** L_cr about y [m], overrides ends */
  bucklingLengthY?: number;
  /** L_cr about z [m], overrides ends */
  bucklingLengthZ?: number;
}

/**
 * Flexural buckling curve of an I/H section, EN 1993-1-1 Table 6.2 (from memory):
 * rolled, h/b > 1.2: t_f <= 40 mm y a / z b (S460: a0 / a0); 40 < t_f <= 100 mm y b / z c (S460: a / a);
 * rolled, h/b <= 1.2: t_f <= 100 mm y b / z c (S460: a / a); t_f > 100 mm d / d (S460: c / c);
 * welded: t_f <= 40 mm y b / z c; t_f > 40 mm y c / z d.
 * Welded box (same table, from memory): b about both axes generally; c about both with thick welds
 * (throat a > 0.5 t_f) when b / t_f < 30 and h / t_w < 30. The weld throat is not part of the section
 * model, so c is taken whenever the two slenderness conditions hold.
 */
export function flexuralBucklingCurve(section: MemberSection, grade: SteelGrade, axis: 'y' | 'z'): BucklingCurve {
  const { depth: h, flangeWidth: b, flangeThickness: tf } = section.dimensions;
  if (section.box) return b / tf < 30 && h / section.dimensions.webThickness < 30 ? 'c' : 'b';
  const s460 = grade.name === 'S460';
  if ((section.fabrication ?? 'rolled') === 'welded') {
    if (tf <= 0.04 + 1e-12) return axis === 'y' ? 'b' : 'c';
    return axis === 'y' ? 'c' : 'd';
  }
  if (h / b > 1.2) {
    if (tf <= 0.04 + 1e-12) return s460 ? 'a0' : axis === 'y' ? 'a' : 'b';
    return s460 ? 'a' : axis === 'y' ? 'b' : 'c';
  }
  if (tf <= 0.1 + 1e-12) return s460 ? 'a' : axis === 'y' ? 'b' : 'c';
  return s460 ? 'c' : 'd';
}

/** Numbers of a flexural buckling calculation about one axis. */
export interface FlexuralBucklingAxis {
  bucklingLength: number;
  criticalForce: number;
  slenderness: number;
  curve: BucklingCurve;
  alpha: number;
  chi: number;
  /** N_b,Rd [N] */
  resistance: number;
}

export interface FlexuralBucklingFactors {
  y: FlexuralBucklingAxis;
  z: FlexuralBucklingAxis;
  /** A f_y [N] */
  characteristicResistance: number;
  yieldStrength: number;
  compressionClass: SectionClass;
  outOfScope: string | undefined;
}

/**
 * Flexural buckling about both axes, EN 1993-1-1 6.3.1 (class 1-3, gross area):
 *   N_cr = pi^2 E I / L_cr^2, lambda = sqrt(A f_y / N_cr) (eq. 6.50), chi by eq. (6.49), N_b,Rd = chi A f_y / gamma_M1.
 */
export function flexuralBucklingFactors(section: MemberSection, grade: SteelGrade, options: ColumnBucklingOptions): FlexuralBucklingFactors {
  positive('length', options.length);
  const k = effectiveLengthFactor[options.ends ?? 'pinned-pinned'];
  const classification = classifySection(section, grade);
  const fy = classification.yieldStrength;
  const A = section.properties.area;
  const characteristicResistance = A * fy;
  const axis = (name: 'y' | 'z'): FlexuralBucklingAxis => {
    const given = name === 'y' ? options.bucklingLengthY : options.bucklingLengthZ;
    const bucklingLength = given === undefined ? k * options.length : positive(`bucklingLength${name.toUpperCase()}`, given);
    const I = name === 'y' ? section.properties.secondMomentOfAreaY : section.properties.secondMomentOfAreaZ;
    const criticalForce = (Math.PI ** 2 * grade.youngsModulus * I) / bucklingLength ** 2;
    const slenderness = Math.sqrt(characteristicResistance / criticalForce);
    const curve = flexuralBucklingCurve(section, grade, name);
    const alpha = imperfectionFactor[curve];
    const chi = bucklingReductionFactor(slenderness, alpha);
    return { bucklingLength, criticalForce, slenderness, curve, alpha, chi, resistance: (chi * characteristicResistance) / grade.gammaM1 };
  };
  const compressionClass = classification.compression;
  const outOfScope =
    compressionClass === 4 ? `${section.designation ?? 'section'} is class 4 in compression (EN 1993-1-1 Table 5.2); the effective area of EN 1993-1-5 is outside the scope of these checks.` : undefined;
  return { y: axis('y'), z: axis('z'), characteristicResistance, yieldStrength: fy, compressionClass, outOfScope };
}

/**
 * Flexural buckling of a column in compression, EN 1993-1-1 6.3.1.1: N_Ed / N_b,Rd <= 1 about the
 * weaker of the two axes. N is tension positive (as InternalForces); a tension gives utilisation 0.
 */
export function checkFlexuralBuckling(section: MemberSection, grade: SteelGrade, axialForce: number, options: ColumnBucklingOptions): CheckResult {
  finite('N', axialForce);
  const fb = flexuralBucklingFactors(section, grade, options);
  const compression = Math.max(0, -axialForce);
  const utilisation = Math.max(ratio(compression, fb.y.resistance), ratio(compression, fb.z.resistance));
  const result: CheckResult = {
    id: 'flexural-buckling',
    title: `Flexural buckling of the column (governing axis ${fb.z.resistance <= fb.y.resistance ? 'z' : 'y'})`,
    clause: 'EN 1993-1-1 6.3.1',
    utilisation,
    inputs: { N: axialForce, A: section.properties.area, I_y: section.properties.secondMomentOfAreaY, I_z: section.properties.secondMomentOfAreaZ, f_y: fb.yieldStrength, E: grade.youngsModulus, gamma_M1: grade.gammaM1 },
    intermediate: {
      L_cr_y: fb.y.bucklingLength,
      L_cr_z: fb.z.bucklingLength,
      N_cr_y: fb.y.criticalForce,
      N_cr_z: fb.z.criticalForce,
      lambda_y: fb.y.slenderness,
      lambda_z: fb.z.slenderness,
      alpha_y: fb.y.alpha,
      alpha_z: fb.z.alpha,
      chi_y: fb.y.chi,
      chi_z: fb.z.chi,
      N_b_y_Rd: fb.y.resistance,
      N_b_z_Rd: fb.z.resistance,
    },
  };
  if (fb.outOfScope && utilisation > 0) return { ...result, utilisation: Number.POSITIVE_INFINITY, outOfScope: fb.outOfScope };
  return result;
}

/** C_m for a linear moment diagram with end moment ratio psi, EN 1993-1-1 Table B.3: 0.6 + 0.4 psi >= 0.4. */
export function equivalentUniformMomentFactor(psi: number): number {
  if (!Number.isFinite(psi) || psi < -1 || psi > 1) throw new SteelError('INVALID_OPTIONS', `The end moment ratio psi must lie in [-1, 1]; got ${psi}.`, 'psi');
  return Math.max(0.4, 0.6 + 0.4 * psi);
}

export interface BeamColumnOptions extends ColumnBucklingOptions {
  /** lateral-torsional buckling of the member; 'restrained' for chi_LT = 1 (no torsional deformation) */
  lateralTorsional: LateralTorsionalBucklingOptions | 'restrained';
  /** equivalent uniform moment factors of Table B.3 (default 1.0, uniform moment: conservative) */
  Cmy?: number;
  Cmz?: number;
  CmLT?: number;
}

/**
 * Members in bending and axial compression, EN 1993-1-1 6.3.3 eqs. (6.61) and (6.62), with the
 * interaction factors of Annex B (method 2), class 1-3 I sections:
 *   N/(chi_y N_Rk/gM1) + k_yy M_y/(chi_LT M_y,Rk/gM1) + k_yz M_z/(M_z,Rk/gM1) <= 1
 *   N/(chi_z N_Rk/gM1) + k_zy M_y/(chi_LT M_y,Rk/gM1) + k_zz M_z/(M_z,Rk/gM1) <= 1
 * Table B.1 (class 1, 2): k_yy = C_my (1 + (lambda_y - 0.2) n_y) <= C_my (1 + 0.8 n_y),
 *   k_zz = C_mz (1 + (2 lambda_z - 0.6) n_z) <= C_mz (1 + 1.4 n_z), k_yz = 0.6 k_zz, k_zy = 0.6 k_yy;
 * class 3: k_yy = C_my (1 + 0.6 lambda_y n_y) <= C_my (1 + 0.6 n_y), k_zz likewise, k_yz = k_zz, k_zy = 0.8 k_yy.
 * Members susceptible to torsional deformation (lateralTorsional not 'restrained') take k_zy of Table B.2:
 *   class 1, 2: lambda_z >= 0.4: k_zy = max(1 - 0.1 lambda_z n_z/(C_mLT - 0.25), 1 - 0.1 n_z/(C_mLT - 0.25));
 *               lambda_z < 0.4: k_zy = min(0.6 + lambda_z, 1 - 0.1 lambda_z n_z/(C_mLT - 0.25));
 *   class 3: k_zy = max(1 - 0.05 lambda_z n_z/(C_mLT - 0.25), 1 - 0.05 n_z/(C_mLT - 0.25)).
 * n = N_Ed / (chi N_Rk / gamma_M1). No shift moments (class 4 only). Signs of N, M: as InternalForces;
 * a tensile N is taken as zero (conservative).
 */
export function checkBendingAndAxialCompression(
  section: MemberSection,
  grade: SteelGrade,
  forces: { N: number; My: number; Mz: number },
  options: BeamColumnOptions,
): CheckResult {
  finite('N', forces.N);
  finite('My', forces.My);
  finite('Mz', forces.Mz);
  const Cmy = options.Cmy ?? 1;
  const Cmz = options.Cmz ?? 1;
  const CmLT = options.CmLT ?? 1;
  for (const [name, value] of [['Cmy', Cmy], ['Cmz', Cmz], ['CmLT', CmLT]] as const) {
    if (!(value >= 0.4 && value <= 1)) throw new SteelError('INVALID_OPTIONS', `${name} must lie in [0.4, 1] (EN 1993-1-1 Table B.3); got ${value}.`, name);
  }
  const fb = flexuralBucklingFactors(section, grade, options);
  const classification = classifySection(section, grade, { N: forces.N, My: forces.My });
  const sectionClass = Math.max(classification.combined?.sectionClass ?? 1, classification.flange.sectionClass) as SectionClass;
  const plastic = sectionClass <= 2;
  const fy = fb.yieldStrength;
  const p = section.properties;
  const MyRk = (plastic ? p.plasticModulusY : p.elasticModulusY) * fy;
  const MzRk = (plastic ? p.plasticModulusZ : p.elasticModulusZ) * fy;
  const gM1 = grade.gammaM1;
  const restrained = options.lateralTorsional === 'restrained';
  const chiLT = restrained ? 1 : lateralTorsionalBucklingFactors(section, grade, options.lateralTorsional as LateralTorsionalBucklingOptions).chiModified;

  const NEd = Math.max(0, -forces.N);
  const MyEd = Math.abs(forces.My);
  const MzEd = Math.abs(forces.Mz);
  const ny = NEd / ((fb.y.chi * fb.characteristicResistance) / gM1);
  const nz = NEd / ((fb.z.chi * fb.characteristicResistance) / gM1);
  const ly = fb.y.slenderness;
  const lz = fb.z.slenderness;
  let kyy: number;
  let kzz: number;
  let kyz: number;
  let kzy: number;
  if (plastic) {
    kyy = Math.min(Cmy * (1 + (ly - 0.2) * ny), Cmy * (1 + 0.8 * ny));
    kzz = Math.min(Cmz * (1 + (2 * lz - 0.6) * nz), Cmz * (1 + 1.4 * nz));
    kyz = 0.6 * kzz;
    kzy = 0.6 * kyy;
    if (!restrained) {
      kzy =
        lz >= 0.4
          ? Math.max(1 - (0.1 * lz * nz) / (CmLT - 0.25), 1 - (0.1 * nz) / (CmLT - 0.25))
          : Math.min(0.6 + lz, 1 - (0.1 * lz * nz) / (CmLT - 0.25));
    }
  } else {
    kyy = Math.min(Cmy * (1 + 0.6 * ly * ny), Cmy * (1 + 0.6 * ny));
    kzz = Math.min(Cmz * (1 + 0.6 * lz * nz), Cmz * (1 + 0.6 * nz));
    kyz = kzz;
    kzy = 0.8 * kyy;
    if (!restrained) kzy = Math.max(1 - (0.05 * lz * nz) / (CmLT - 0.25), 1 - (0.05 * nz) / (CmLT - 0.25));
  }
  const axialY = ratio(NEd, (fb.y.chi * fb.characteristicResistance) / gM1);
  const axialZ = ratio(NEd, (fb.z.chi * fb.characteristicResistance) / gM1);
  const bendingY = ratio(MyEd, (chiLT * MyRk) / gM1);
  const bendingZ = ratio(MzEd, MzRk / gM1);
  const eq661 = axialY + kyy * bendingY + kyz * bendingZ;
  const eq662 = axialZ + kzy * bendingY + kzz * bendingZ;
  const result: CheckResult = {
    id: 'bending-axial-interaction',
    title: 'Member in bending and axial compression (Annex B interaction factors)',
    clause: 'EN 1993-1-1 6.3.3, Annex B',
    utilisation: Math.max(eq661, eq662),
    inputs: { N: forces.N, My: forces.My, Mz: forces.Mz, C_my: Cmy, C_mz: Cmz, C_mLT: CmLT, f_y: fy, gamma_M1: gM1 },
    intermediate: {
      sectionClass,
      chi_y: fb.y.chi,
      chi_z: fb.z.chi,
      chi_LT: chiLT,
      lambda_y: ly,
      lambda_z: lz,
      N_Rk: fb.characteristicResistance,
      M_y_Rk: MyRk,
      M_z_Rk: MzRk,
      n_y: ny,
      n_z: nz,
      k_yy: kyy,
      k_yz: kyz,
      k_zy: kzy,
      k_zz: kzz,
      'eq 6.61': eq661,
      'eq 6.62': eq662,
    },
  };
  if (sectionClass === 4 && result.utilisation > 0) {
    return { ...result, utilisation: Number.POSITIVE_INFINITY, outOfScope: `${section.designation ?? 'section'} is class 4 under these forces; Annex B with effective properties is outside the scope of these checks.` };
  }
  return result;
}
