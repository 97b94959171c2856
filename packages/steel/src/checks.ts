import { boxThinWalled } from './box.js';
import type { BoxThinWalled } from './box.js';
import { classifySection } from './classification.js';
import type { ClassifiableSection, SectionClass } from './classification.js';
import { SteelError } from './errors.js';
import type { SteelGrade } from './grades.js';
import { filletGeometry, shearAreaParallelToWeb } from './properties.js';

/**
 * Internal forces at one cross-section, in the member's local axes (x along the member, z the strong-axis
 * normal, y completing a right-handed set), SI units:
 *  - N [N], tension positive
 *  - Vy, Vz [N], shear parallel to the flanges and to the web
 *  - Tsv [N m], St Venant part of the torque; Tw [N m], warping part (T = Tsv + Tw)
 *  - My, Mz [N m], bending moments as vector components about y and z: the normal stress is
 *    sigma = N/A + My z / I_y - Mz y / I_z (so My > 0 stretches the +z flange)
 *  - B [N m2], bimoment, B = E I_w phi'' with phi the twist about +x; its normal stress is
 *    sigma = B omega / I_w with the sectorial coordinate omega = y z at the flange mid-planes
 *    (|omega| = W_n0 = h0 b / 4 at the tips; B > 0 stretches the tips at +y+z and -y-z). For a welded
 *    box omega is the closed section's sectorial coordinate of boxThinWalled, with the same sign in each
 *    quadrant as y z.
 */
export interface InternalForces {
  N: number;
  Vy: number;
  Vz: number;
  Tsv: number;
  Tw: number;
  My: number;
  Mz: number;
  B: number;
}

export interface CheckOptions {
  /** eta of EN 1993-1-1 6.2.6(3) and EN 1993-1-5 5.1; 1.0 (conservative) unless given */
  eta?: number;
}

export interface CheckResult {
  /** stable identifier, e.g. "shear-z" */
  id: string;
  title: string;
  /** e.g. "EN 1993-1-1 6.2.6" */
  clause: string;
  /** design effect / design resistance; Infinity when the resistance is nil or the check is out of scope */
  utilisation: number;
  inputs: Record<string, number>;
  intermediate: Record<string, number>;
  /** set when the check cannot be made by these rules (e.g. a class 4 section); utilisation is then Infinity */
  outOfScope?: string;
  /** advice that follows from the result, e.g. "web stiffener needed" */
  notes?: string[];
}

/** A section the checks can use: dimensions and properties (a SteelSection fits). */
export type CheckableSection = ClassifiableSection;

const forceNames: Array<keyof InternalForces> = ['N', 'Vy', 'Vz', 'Tsv', 'Tw', 'My', 'Mz', 'B'];

function checkForces(forces: InternalForces): void {
  for (const name of forceNames) {
    const value = forces[name];
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      throw new SteelError('INVALID_FORCES', `Internal force ${name} must be a finite number in SI units; got ${String(value)}.`, name);
    }
  }
}

function ratio(effect: number, resistance: number): number {
  if (effect === 0) return 0;
  return resistance > 0 ? effect / resistance : Number.POSITIVE_INFINITY;
}

/** Everything the individual checks share: strengths, class and resistances. */
interface Resistances {
  yieldStrength: number;
  gammaM0: number;
  /** f_y / gamma_M0 */
  designStrength: number;
  epsilon: number;
  sectionClass: SectionClass;
  axialResistance: number;
  momentResistanceY: number;
  momentResistanceZ: number;
  shearAreaZ: number;
  shearAreaY: number;
  shearResistanceZ: number;
  shearResistanceY: number;
  /** tau_t,Ed for the shear-z check (I: the largest St Venant stress; box: Bredt stress in the webs) */
  torsionShearStressZ: number;
  /** tau_t,Ed for the shear-y check (I: the same as for z; box: Bredt stress in the flanges) */
  torsionShearStressY: number;
  torsionReductionZ: number;
  torsionReductionY: number;
  shearTorsionResistanceZ: number;
  shearTorsionResistanceY: number;
  rhoZ: number;
  rhoY: number;
  momentShearResistanceY: number;
  momentShearResistanceZ: number;
  warpingNormalStress: number;
  classMessage: string | undefined;
  /** thin-walled constants of a welded box; undefined for an I section */
  thin: BoxThinWalled | undefined;
}

/** rho of EN 1993-1-1 6.2.8(3)/(4): (2 V_Ed / V_Rd - 1)^2 when V_Ed > 0.5 V_Rd, else 0. */
function shearReductionFactor(shearForce: number, shearResistance: number): number {
  const v = Math.abs(shearForce);
  if (v === 0) return 0;
  if (shearResistance <= 0) return 1;
  if (v <= 0.5 * shearResistance) return 0;
  return Math.min(1, (2 * v / shearResistance - 1) ** 2);
}

function resistances(section: CheckableSection, grade: SteelGrade, forces: InternalForces, options: CheckOptions): Resistances {
  const { properties: p } = section;
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = section.dimensions;
  const eta = options.eta ?? 1.0;
  if (!Number.isFinite(eta) || eta < 1 || eta > 1.2) {
    throw new SteelError('INVALID_OPTIONS', `eta must lie between 1.0 and 1.2 (EN 1993-1-5 5.1); got ${eta}.`, 'eta');
  }
  const box = section.box;
  const thin = box ? boxThinWalled(section.dimensions, box) : undefined;
  // A box's webs are classified for M_z as well (M_z compresses one web); an I's web is on the M_z neutral axis.
  const classification = classifySection(section, grade, box ? { N: forces.N, My: forces.My, Mz: forces.Mz } : { N: forces.N, My: forces.My });
  const combined = classification.combined;
  const flangeCompressed = forces.N < 0 || forces.My !== 0 || forces.Mz !== 0 || forces.B !== 0;
  const flangeClass = classification.flangeBetweenWebs
    ? Math.max(classification.flange.sectionClass, classification.flangeBetweenWebs.sectionClass)
    : classification.flange.sectionClass;
  const sectionClass: SectionClass = Math.max(combined ? combined.web.sectionClass : 1, flangeCompressed ? flangeClass : 1) as SectionClass;
  const yieldStrength = classification.yieldStrength;
  const gammaM0 = grade.gammaM0;
  const designStrength = yieldStrength / gammaM0;
  const plastic = sectionClass <= 2;

  // EN 1993-1-1 6.2.3(2)a and 6.2.4(2): N_pl,Rd = N_c,Rd = A f_y / gamma_M0 (gross section, no holes).
  const axialResistance = p.area * designStrength;
  // EN 1993-1-1 6.2.5(2): M_c,Rd = W_pl f_y / gamma_M0 (class 1, 2) or W_el,min f_y / gamma_M0 (class 3).
  const momentResistanceY = (plastic ? p.plasticModulusY : p.elasticModulusY) * designStrength;
  const momentResistanceZ = (plastic ? p.plasticModulusZ : p.elasticModulusZ) * designStrength;

  // EN 1993-1-1 6.2.6(2): V_pl,Rd = A_v (f_y / sqrt 3) / gamma_M0.
  // 6.2.6(3)d for welded I and box sections (fillet welds ignored): A_v = eta sum(h_w t_w), two webs in a box.
  // For a box A_vy = A - sum(h_w t_w) (6.2.6(3)e), the property shearAreaY.
  const shearAreaZ = box
    ? eta * 2 * p.webDepth * tw
    : section.fabrication === 'welded'
      ? eta * p.webDepth * tw
      : shearAreaParallelToWeb(section.dimensions, eta);
  const shearAreaY = p.shearAreaY;
  const shearStrength = designStrength / Math.sqrt(3);
  const shearResistanceZ = shearAreaZ * shearStrength;
  const shearResistanceY = shearAreaY * shearStrength;

  // EN 1993-1-1 6.2.7(9), I or H section: V_pl,T,Rd = sqrt(1 - tau_t,Ed / (1.25 (f_y / sqrt 3) / gamma_M0)) V_pl,Rd,
  // with tau_t,Ed = T_sv t_max / I_t, the largest St Venant shear stress of the section.
  // Structural hollow section (the box): V_pl,T,Rd = (1 - tau_t,Ed / ((f_y / sqrt 3) / gamma_M0)) V_pl,Rd, with the
  // Bredt stress tau_t,Ed = T_sv / (2 A_m t) in the plates that carry the shear (webs for V_z, flanges for V_y).
  let torsionShearStressZ: number;
  let torsionShearStressY: number;
  let torsionReductionZ: number;
  let torsionReductionY: number;
  if (thin) {
    torsionShearStressZ = Math.abs(forces.Tsv) / (2 * thin.enclosedArea * tw);
    torsionShearStressY = Math.abs(forces.Tsv) / (2 * thin.enclosedArea * tf);
    torsionReductionZ = Math.max(0, 1 - torsionShearStressZ / shearStrength);
    torsionReductionY = Math.max(0, 1 - torsionShearStressY / shearStrength);
  } else {
    const torsionShearStress = (Math.abs(forces.Tsv) * Math.max(tf, tw)) / p.torsionConstant;
    const torsionReduction = Math.sqrt(Math.max(0, 1 - torsionShearStress / (1.25 * shearStrength)));
    torsionShearStressZ = torsionShearStress;
    torsionShearStressY = torsionShearStress;
    torsionReductionZ = torsionReduction;
    torsionReductionY = torsionReduction;
  }
  const shearTorsionResistanceZ = torsionReductionZ * shearResistanceZ;
  const shearTorsionResistanceY = torsionReductionY * shearResistanceY;

  // EN 1993-1-1 6.2.8: high shear reduces the yield strength of the shear area by (1 - rho).
  const rhoZ = shearReductionFactor(forces.Vz, shearTorsionResistanceZ);
  const rhoY = shearReductionFactor(forces.Vy, shearTorsionResistanceY);
  const webArea = p.webDepth * tw;
  // 6.2.8(5), I section with equal flanges, strong axis: M_y,V,Rd = (W_pl,y - rho A_w^2 / (4 t_w)) f_y / gamma_M0.
  // For class 3 the same reduction is applied to the web's elastic modulus t_w h_w^3 / (6 h).
  // A box has two webs, each reduced alike (6.2.8(3): (1 - rho) f_y on the shear area).
  const webs = box ? 2 : 1;
  const momentShearResistanceY = Math.min(
    momentResistanceY,
    Math.max(
      0,
      (plastic ? p.plasticModulusY - (webs * rhoZ * webArea * webArea) / (4 * tw) : p.elasticModulusY - (webs * rhoZ * tw * p.webDepth ** 3) / (6 * h)) *
        designStrength,
    ),
  );
  // Weak axis: the shear area is the flanges, which give W_pl,z ~ t_f b^2 / 2 (W_el,z ~ t_f b^2 / 3); the same for a box.
  const momentShearResistanceZ = Math.min(
    momentResistanceZ,
    Math.max(0, (plastic ? p.plasticModulusZ - (rhoY * tf * b * b) / 2 : p.elasticModulusZ - (rhoY * tf * b * b) / 3) * designStrength),
  );

  const warpingNormalStress = (Math.abs(forces.B) * p.sectorialModulus) / p.warpingConstant;
  const name = section.designation ?? 'section';
  const classMessage =
    sectionClass === 4 && classification.flangeBetweenWebs
      ? `${name} is class 4 under these forces (EN 1993-1-1 Table 5.2: flange outstand c/t = ${classification.flange.slenderness.toFixed(1)}, flange between webs c/t = ${classification.flangeBetweenWebs.slenderness.toFixed(1)}, web c/t = ${(combined?.web.slenderness ?? 0).toFixed(1)}, eps = ${classification.epsilon.toFixed(3)}); effective widths per EN 1993-1-5 are outside the scope of these checks.`
      : sectionClass === 4
      ? `${name} is class 4 under these forces (EN 1993-1-1 Table 5.2: flange c/t = ${classification.flange.slenderness.toFixed(1)}, web c/t = ${(combined?.web.slenderness ?? 0).toFixed(1)}, eps = ${classification.epsilon.toFixed(3)}); effective widths per EN 1993-1-5 are outside the scope of these checks.`
      : undefined;

  return {
    yieldStrength,
    gammaM0,
    designStrength,
    epsilon: classification.epsilon,
    sectionClass,
    axialResistance,
    momentResistanceY,
    momentResistanceZ,
    shearAreaZ,
    shearAreaY,
    shearResistanceZ,
    shearResistanceY,
    torsionShearStressZ,
    torsionShearStressY,
    torsionReductionZ,
    torsionReductionY,
    shearTorsionResistanceZ,
    shearTorsionResistanceY,
    rhoZ,
    rhoY,
    momentShearResistanceY,
    momentShearResistanceZ,
    warpingNormalStress,
    classMessage,
    thin,
  };
}

/** A utilisation made Infinity when the check is out of scope (a nil effect stays 0). */
function scoped(utilisation: number, message: string | undefined): number {
  return message === undefined || utilisation === 0 ? utilisation : Number.POSITIVE_INFINITY;
}

function outOfScope(result: CheckResult, message: string | undefined): CheckResult {
  if (scoped(result.utilisation, message) === result.utilisation) return result;
  return { ...result, utilisation: Number.POSITIVE_INFINITY, outOfScope: message };
}

function axialCheck(section: CheckableSection, forces: InternalForces, r: Resistances): CheckResult {
  const tension = forces.N >= 0;
  const result: CheckResult = {
    id: 'axial',
    title: tension ? 'Axial tension' : 'Axial compression (cross-section)',
    clause: tension ? 'EN 1993-1-1 6.2.3' : 'EN 1993-1-1 6.2.4',
    utilisation: ratio(Math.abs(forces.N), r.axialResistance),
    inputs: { N: forces.N, A: section.properties.area, f_y: r.yieldStrength, gamma_M0: r.gammaM0 },
    intermediate: { N_Rd: r.axialResistance, sectionClass: r.sectionClass },
  };
  return tension ? result : outOfScope(result, r.classMessage);
}

function bendingCheck(section: CheckableSection, forces: InternalForces, r: Resistances, axis: 'y' | 'z'): CheckResult {
  const p = section.properties;
  const moment = axis === 'y' ? forces.My : forces.Mz;
  const shear = axis === 'y' ? forces.Vz : forces.Vy;
  const resistance = axis === 'y' ? r.momentShearResistanceY : r.momentShearResistanceZ;
  const result: CheckResult = {
    id: `bending-${axis}`,
    title: axis === 'y' ? 'Bending about the strong axis (with shear)' : 'Bending about the weak axis (with shear)',
    clause: 'EN 1993-1-1 6.2.5, 6.2.8',
    utilisation: ratio(Math.abs(moment), resistance),
    inputs: {
      [`M${axis}`]: moment,
      [`V${axis === 'y' ? 'z' : 'y'}`]: shear,
      [`W_pl,${axis}`]: axis === 'y' ? p.plasticModulusY : p.plasticModulusZ,
      [`W_el,${axis}`]: axis === 'y' ? p.elasticModulusY : p.elasticModulusZ,
      f_y: r.yieldStrength,
      gamma_M0: r.gammaM0,
    },
    intermediate: {
      sectionClass: r.sectionClass,
      [`M_c,${axis},Rd`]: axis === 'y' ? r.momentResistanceY : r.momentResistanceZ,
      rho: axis === 'y' ? r.rhoZ : r.rhoY,
      [`M_${axis},V,Rd`]: resistance,
    },
  };
  return outOfScope(result, r.classMessage);
}

/** EN 1993-1-1 6.2.6(6): webs with h_w / t_w > 72 eps / eta need the shear buckling check of EN 1993-1-5. */
function shearBucklingLimit(section: CheckableSection, r: Resistances, eta: number): { webSlenderness: number; limit: number } {
  return { webSlenderness: section.properties.webDepth / section.dimensions.webThickness, limit: (72 * r.epsilon) / eta };
}

function shearCheck(section: CheckableSection, forces: InternalForces, r: Resistances, direction: 'y' | 'z', eta: number): CheckResult {
  const shear = direction === 'z' ? forces.Vz : forces.Vy;
  const resistance = direction === 'z' ? r.shearTorsionResistanceZ : r.shearTorsionResistanceY;
  const result: CheckResult = {
    id: `shear-${direction}`,
    title: direction === 'z' ? 'Shear parallel to the web (with St Venant torsion)' : 'Shear parallel to the flanges (with St Venant torsion)',
    clause: 'EN 1993-1-1 6.2.6, 6.2.7(9)',
    utilisation: ratio(Math.abs(shear), resistance),
    inputs: {
      [`V${direction}`]: shear,
      Tsv: forces.Tsv,
      A_v: direction === 'z' ? r.shearAreaZ : r.shearAreaY,
      I_t: section.properties.torsionConstant,
      f_y: r.yieldStrength,
      gamma_M0: r.gammaM0,
    },
    intermediate: {
      V_pl_Rd: direction === 'z' ? r.shearResistanceZ : r.shearResistanceY,
      tau_t_Ed: direction === 'z' ? r.torsionShearStressZ : r.torsionShearStressY,
      torsionReduction: direction === 'z' ? r.torsionReductionZ : r.torsionReductionY,
      V_pl_T_Rd: resistance,
    },
  };
  if (r.thin) result.inputs['A_m'] = r.thin.enclosedArea;
  if (direction === 'z') {
    const { webSlenderness, limit } = shearBucklingLimit(section, r, eta);
    result.intermediate['h_w/t_w'] = webSlenderness;
    result.intermediate['72eps/eta'] = limit;
    if (webSlenderness > limit) {
      return outOfScope(
        result,
        `Web slenderness h_w/t_w = ${webSlenderness.toFixed(1)} exceeds 72 eps/eta = ${limit.toFixed(1)}: shear buckling per EN 1993-1-5 is outside the scope of these checks.`,
      );
    }
  }
  return result;
}

/** St Venant and warping stresses of an open doubly symmetric I section. */
function torsionStresses(section: CheckableSection, forces: InternalForces): { flangeStVenant: number; webStVenant: number; warpingShear: number; warpingNormal: number } {
  const p = section.properties;
  const { webThickness: tw, flangeThickness: tf } = section.dimensions;
  return {
    // tau_t = T_sv t / I_t at the surface of each plate
    flangeStVenant: (Math.abs(forces.Tsv) * tf) / p.torsionConstant,
    webStVenant: (Math.abs(forces.Tsv) * tw) / p.torsionConstant,
    // tau_w = T_w S_w / (I_w t_f), largest in the flange at the web
    warpingShear: (Math.abs(forces.Tw) * p.warpingStaticMoment) / (p.warpingConstant * tf),
    // sigma_w = B W_n0 / I_w at the flange tips
    warpingNormal: (Math.abs(forces.B) * p.sectorialModulus) / p.warpingConstant,
  };
}

function torsionUtilisation(s: ReturnType<typeof torsionStresses>, r: Resistances): number {
  const shearStrength = r.designStrength / Math.sqrt(3);
  return Math.max(ratio(s.flangeStVenant + s.warpingShear, shearStrength), ratio(s.webStVenant, shearStrength), ratio(s.warpingNormal, r.designStrength));
}

/** St Venant (Bredt) and warping stresses of a welded box, per plate, at their largest. */
interface BoxTorsionStresses {
  /** T_sv / (2 A_m t_f) */
  flangeStVenant: number;
  /** T_sv / (2 A_m t_w) */
  webStVenant: number;
  /** T_sv t_f / I_t at the free outstands (the open part twists with the cell) */
  outstandStVenant: number;
  /** T_w |S_omega - k| / (I_w t), largest in the flange between the webs, the webs and the outstands */
  flangeWarpingShear: number;
  webWarpingShear: number;
  outstandWarpingShear: number;
  /** B W_n0 / I_w */
  warpingNormal: number;
}

/**
 * Torsion of the closed cell: the St Venant torque is a shear flow q = T_sv / (2 A_m) round the cell
 * (Bredt), stress q / t in each plate; it is all given to the cell (the outstands' open share, of order
 * c t_f^3 / I_t, is neglected there: conservative). Warping shear from boxThinWalled.
 */
function boxTorsionStresses(section: CheckableSection, forces: InternalForces, thin: BoxThinWalled): BoxTorsionStresses {
  const p = section.properties;
  const { webThickness: tw, flangeThickness: tf } = section.dimensions;
  const torque = Math.abs(forces.Tsv);
  const warping = Math.abs(forces.Tw) / thin.warpingConstant;
  const m = thin.warpingMoment;
  return {
    flangeStVenant: torque / (2 * thin.enclosedArea * tf),
    webStVenant: torque / (2 * thin.enclosedArea * tw),
    outstandStVenant: (torque * tf) / p.torsionConstant,
    flangeWarpingShear: (warping * Math.max(m.flangeMid, m.flangeAtWeb)) / tf,
    webWarpingShear: (warping * Math.max(m.webAtFlange, m.webMid)) / tw,
    outstandWarpingShear: (warping * m.outstand) / tf,
    warpingNormal: (Math.abs(forces.B) * p.sectorialModulus) / p.warpingConstant,
  };
}

function boxTorsionUtilisation(s: BoxTorsionStresses, r: Resistances): number {
  const shearStrength = r.designStrength / Math.sqrt(3);
  return Math.max(
    ratio(s.flangeStVenant + s.flangeWarpingShear, shearStrength),
    ratio(s.webStVenant + s.webWarpingShear, shearStrength),
    ratio(s.outstandStVenant + s.outstandWarpingShear, shearStrength),
    ratio(s.warpingNormal, r.designStrength),
  );
}

/** The torsion utilisation of checkSection for either kind of section. */
function sectionTorsionUtilisation(section: CheckableSection, forces: InternalForces, r: Resistances): number {
  return r.thin ? boxTorsionUtilisation(boxTorsionStresses(section, forces, r.thin), r) : torsionUtilisation(torsionStresses(section, forces), r);
}

function boxTorsionCheck(section: CheckableSection, forces: InternalForces, r: Resistances, thin: BoxThinWalled): CheckResult {
  const p = section.properties;
  const s = boxTorsionStresses(section, forces, thin);
  return {
    id: 'torsion',
    title: 'Torsion: St Venant (Bredt shear flow) and warping stresses',
    clause: 'EN 1993-1-1 6.2.7',
    utilisation: boxTorsionUtilisation(s, r),
    inputs: {
      Tsv: forces.Tsv,
      Tw: forces.Tw,
      B: forces.B,
      A_m: thin.enclosedArea,
      I_t: p.torsionConstant,
      I_w: p.warpingConstant,
      W_n0: p.sectorialModulus,
      S_w: p.warpingStaticMoment,
      f_y: r.yieldStrength,
      gamma_M0: r.gammaM0,
    },
    intermediate: {
      tau_t_flange: s.flangeStVenant,
      tau_t_web: s.webStVenant,
      tau_t_outstand: s.outstandStVenant,
      tau_w_flange: s.flangeWarpingShear,
      tau_w_web: s.webWarpingShear,
      tau_w_outstand: s.outstandWarpingShear,
      sigma_w: s.warpingNormal,
      tau_Rd: r.designStrength / Math.sqrt(3),
      sigma_Rd: r.designStrength,
    },
  };
}

function torsionCheck(section: CheckableSection, forces: InternalForces, r: Resistances): CheckResult {
  if (r.thin) return boxTorsionCheck(section, forces, r, r.thin);
  const p = section.properties;
  const s = torsionStresses(section, forces);
  const shearStrength = r.designStrength / Math.sqrt(3);
  const utilisation = torsionUtilisation(s, r);
  return {
    id: 'torsion',
    title: 'Torsion: St Venant and warping stresses',
    clause: 'EN 1993-1-1 6.2.7',
    utilisation,
    inputs: {
      Tsv: forces.Tsv,
      Tw: forces.Tw,
      B: forces.B,
      I_t: p.torsionConstant,
      I_w: p.warpingConstant,
      W_n0: p.sectorialModulus,
      S_w: p.warpingStaticMoment,
      f_y: r.yieldStrength,
      gamma_M0: r.gammaM0,
    },
    intermediate: {
      tau_t_flange: s.flangeStVenant,
      tau_t_web: s.webStVenant,
      tau_w_flange: s.warpingShear,
      sigma_w: s.warpingNormal,
      tau_Rd: shearStrength,
      sigma_Rd: r.designStrength,
    },
  };
}

/** The critical points of the section where the yield criterion is evaluated, in the order of stressPointValues. */
const STRESS_POINT_NAMES = [
  'flange tip +y +z',
  'flange tip -y +z',
  'flange at web +z',
  'web at flange junction +z',
  'flange tip +y -z',
  'flange tip -y -z',
  'flange at web -z',
  'web at flange junction -z',
  'web at mid-depth',
] as const;
const STRESS_POINT_COUNT = STRESS_POINT_NAMES.length;

/** The critical points of a welded box, in the order of boxStressPointValues. */
const BOX_STRESS_POINT_NAMES = [
  'flange tip +y +z',
  'flange at web +y +z',
  'web at flange +y +z',
  'flange tip -y +z',
  'flange at web -y +z',
  'web at flange -y +z',
  'flange between webs +z',
  'flange tip +y -z',
  'flange at web +y -z',
  'web at flange +y -z',
  'flange tip -y -z',
  'flange at web -y -z',
  'web at flange -y -z',
  'flange between webs -z',
  'web at mid-depth +y',
  'web at mid-depth -y',
] as const;
const BOX_STRESS_POINT_COUNT = BOX_STRESS_POINT_NAMES.length;

/**
 * Elastic stresses at the critical points of a welded box, written to `out` as (sigma, tau) pairs in the
 * order of BOX_STRESS_POINT_NAMES. Normal stress as for the I with the box's omega; normal stress from
 * M_z at the web's outer face y = b/2 - c. Shear stresses, added by magnitude (conservative):
 *  - V_z: by symmetry the shear flow is nil at the flange mid-points, so q = V_z S_y / I_y from there;
 *    each web takes half the flanges' first moment b t_f h0 / 2;
 *  - V_y: the flow is nil at the webs' mid-depth, so q = V_y S_z / I_z from there;
 *  - St Venant: Bredt T_sv / (2 A_m t) in the cell, T_sv t_f / I_t in the open outstands;
 *  - warping: T_w |S_omega - k| / (I_w t) (boxThinWalled).
 * At a flange next to a web the cell side and the outstand side are both summed and the larger taken.
 */
function boxStressPointValues(section: CheckableSection, forces: InternalForces, thin: BoxThinWalled, out: Float64Array): void {
  const p = section.properties;
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = section.dimensions;
  const h0 = thin.cellHeight;
  const d = thin.cellWidth;
  const e = thin.outstandLength;
  const hw = p.webDepth;
  // the web's outer face, y = b/2 - c = d/2 + t_w/2
  const yFace = d / 2 + tw / 2;
  const t = boxTorsionStresses(section, forces, thin);
  const warping = Math.abs(forces.Tw) / thin.warpingConstant;
  const m = thin.warpingMoment;
  const vz = Math.abs(forces.Vz);
  const vy = Math.abs(forces.Vy);
  const sigmaAt = (y: number, z: number, omega: number): number =>
    forces.N / p.area + (forces.My * z) / p.secondMomentOfAreaY - (forces.Mz * y) / p.secondMomentOfAreaZ + (forces.B * omega) / p.warpingConstant;

  const flangeCellVz = (vz * (d / 2) * (h0 / 2)) / p.secondMomentOfAreaY;
  const outstandVz = (vz * e * (h0 / 2)) / p.secondMomentOfAreaY;
  const webTopVz = (vz * ((b * tf * h0) / 4)) / (p.secondMomentOfAreaY * tw);
  const webMidVz = (vz * ((b * tf * h0) / 4 + (tw * hw * hw) / 8)) / (p.secondMomentOfAreaY * tw);
  const webFirstMomentZ = tw * (hw / 2) * (d / 2);
  const webTopVy = (vy * webFirstMomentZ) / (p.secondMomentOfAreaZ * tw);
  const outstandVy = (vy * (b * b - d * d)) / (8 * p.secondMomentOfAreaZ);
  const flangeCellVy = (vy * (webFirstMomentZ + (tf * (b * b - d * d)) / 8)) / (p.secondMomentOfAreaZ * tf);
  const flangeMidVy = (vy * (webFirstMomentZ + (tf * b * b) / 8)) / (p.secondMomentOfAreaZ * tf);

  const tipShear = t.outstandStVenant;
  const flangeAtWebShear = Math.max(
    t.flangeStVenant + flangeCellVz + flangeCellVy + (warping * m.flangeAtWeb) / tf,
    t.outstandStVenant + outstandVz + outstandVy + (warping * m.outstand) / tf,
  );
  const webAtFlangeShear = t.webStVenant + webTopVz + webTopVy + (warping * m.webAtFlange) / tw;
  const flangeMidShear = t.flangeStVenant + flangeMidVy + (warping * m.flangeMid) / tf;
  const webMidShear = t.webStVenant + webMidVz + (warping * m.webMid) / tw;

  let k = 0;
  for (const zSign of [1, -1]) {
    for (const ySign of [1, -1]) {
      const quadrant = ySign * zSign;
      out[k++] = sigmaAt((ySign * b) / 2, (zSign * h) / 2, quadrant * thin.sectorialTip);
      out[k++] = tipShear;
      out[k++] = sigmaAt(ySign * yFace, (zSign * h) / 2, quadrant * thin.sectorialFlangeAtWebFace);
      out[k++] = flangeAtWebShear;
      out[k++] = sigmaAt(ySign * yFace, (zSign * hw) / 2, quadrant * thin.sectorialWebAtFlange);
      out[k++] = webAtFlangeShear;
    }
    out[k++] = sigmaAt(0, (zSign * h) / 2, 0);
    out[k++] = flangeMidShear;
  }
  for (const ySign of [1, -1]) {
    out[k++] = sigmaAt(ySign * yFace, 0, 0);
    out[k++] = webMidShear;
  }
}

/**
 * Elastic stresses at the critical points of the section, written to `out` as (sigma, tau) pairs in
 * the order of STRESS_POINT_NAMES. Normal stress from N, My, Mz and B with the sign conventions of
 * InternalForces; shear stresses from Vy, Vz (tau = V S / (I t)), St Venant torsion (T_sv t / I_t)
 * and warping torsion (T_w S_w / (I_w t_f)). Shear parts that may act in either sense at a point are
 * added by magnitude, which is conservative.
 */
function stressPointValues(section: CheckableSection, forces: InternalForces, out: Float64Array): void {
  const p = section.properties;
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = section.dimensions;
  const h0 = p.flangeCentroidDistance;
  const hw = p.webDepth;
  const t = torsionStresses(section, forces);
  const sigmaAt = (y: number, z: number, omega: number): number =>
    forces.N / p.area + (forces.My * z) / p.secondMomentOfAreaY - (forces.Mz * y) / p.secondMomentOfAreaZ + (forces.B * omega) / p.warpingConstant;

  // First moments of area about y: one flange (at the web-flange junction) and half the section (at mid-depth).
  const fillet = filletGeometry(r);
  const flangeFirstMoment = (b * tf * h0) / 2;
  const halfFirstMoment = flangeFirstMoment + (tw * (hw / 2) ** 2) / 2 + 2 * fillet.area * (h / 2 - tf - fillet.centroidOffset);
  const webShearAtJunction = (Math.abs(forces.Vz) * flangeFirstMoment) / (p.secondMomentOfAreaY * tw);
  const webShearAtCentre = (Math.abs(forces.Vz) * halfFirstMoment) / (p.secondMomentOfAreaY * tw);
  // Flange shear at the web: from Vz (flow turning into the web), from Vy (parabolic across each flange).
  const flangeShearFromVz = (Math.abs(forces.Vz) * (b / 2) * (h0 / 2)) / p.secondMomentOfAreaY;
  const flangeShearFromVy = (Math.abs(forces.Vy) * ((tf * b * b) / 8)) / (p.secondMomentOfAreaZ * tf);

  let k = 0;
  for (const zSign of [1, -1]) {
    for (const ySign of [1, -1]) {
      out[k++] = sigmaAt((ySign * b) / 2, (zSign * h) / 2, ((ySign * b) / 2) * ((zSign * h0) / 2));
      out[k++] = t.flangeStVenant;
    }
    out[k++] = sigmaAt(0, (zSign * h) / 2, 0);
    out[k++] = t.flangeStVenant + t.warpingShear + flangeShearFromVy + flangeShearFromVz;
    out[k++] = sigmaAt(0, (zSign * hw) / 2, 0);
    out[k++] = webShearAtJunction + t.webStVenant;
  }
  out[k++] = sigmaAt(0, 0, 0);
  out[k++] = webShearAtCentre + t.webStVenant;
}

/** EN 1993-1-1 6.2.1(5) with sigma_z,Ed = 0: (sigma_x / f)^2 + 3 (tau / f)^2, f = f_y / gamma_M0. */
function yieldCriterionAt(values: Float64Array, index: number, f: number): number {
  return ((values[2 * index] as number) / f) ** 2 + 3 * ((values[2 * index + 1] as number) / f) ** 2;
}

/** The largest criterion over the first `count` points and the first point that reaches it. */
function worstYieldPoint(values: Float64Array, f: number, count: number): { criterion: number; index: number } {
  let criterion = 0;
  let index = 0;
  for (let i = 0; i < count; i++) {
    const value = yieldCriterionAt(values, i, f);
    if (value > criterion) {
      criterion = value;
      index = i;
    }
  }
  return { criterion, index };
}

/** Fill `out` with the (sigma, tau) pairs of the section's critical points; returns their names. */
function criticalPointStresses(section: CheckableSection, forces: InternalForces, r: Resistances, out: Float64Array): readonly string[] {
  if (r.thin) {
    boxStressPointValues(section, forces, r.thin, out);
    return BOX_STRESS_POINT_NAMES;
  }
  stressPointValues(section, forces, out);
  return STRESS_POINT_NAMES;
}

function yieldCriterionCheck(section: CheckableSection, forces: InternalForces, r: Resistances): CheckResult {
  const values = new Float64Array(2 * (r.thin ? BOX_STRESS_POINT_COUNT : STRESS_POINT_COUNT));
  const names = criticalPointStresses(section, forces, r, values);
  const intermediate: Record<string, number> = {};
  names.forEach((name, index) => {
    intermediate[`sigma_x ${name}`] = values[2 * index] as number;
    intermediate[`tau ${name}`] = values[2 * index + 1] as number;
  });
  const worst = worstYieldPoint(values, r.designStrength, names.length);
  intermediate['criterion'] = worst.criterion;
  intermediate['governingPoint'] = worst.index;
  const result: CheckResult = {
    id: 'yield-criterion',
    title: `Yield criterion at the critical points (governing: ${names[worst.index]})`,
    clause: 'EN 1993-1-1 6.2.1(5)',
    utilisation: Math.sqrt(worst.criterion),
    inputs: { ...forces, f_y: r.yieldStrength, gamma_M0: r.gammaM0 },
    intermediate,
  };
  return outOfScope(result, r.classMessage);
}

function interactionTerms(forces: InternalForces, r: Resistances): { axialTerm: number; bendingYTerm: number; bendingZTerm: number; bimomentTerm: number } {
  return {
    axialTerm: ratio(Math.abs(forces.N), r.axialResistance),
    bendingYTerm: ratio(Math.abs(forces.My), r.momentShearResistanceY),
    bendingZTerm: ratio(Math.abs(forces.Mz), r.momentShearResistanceZ),
    bimomentTerm: ratio(r.warpingNormalStress, r.designStrength),
  };
}

function interactionCheck(forces: InternalForces, r: Resistances): CheckResult {
  // EN 1993-1-1 6.2.1(7): N_Ed/N_Rd + M_y,Ed/M_y,Rd + M_z,Ed/M_z,Rd <= 1, here with the warping normal
  // stress of the bimoment added as a fourth term sigma_w / (f_y / gamma_M0), and the moment
  // resistances reduced for shear per 6.2.8.
  const { axialTerm, bendingYTerm, bendingZTerm, bimomentTerm } = interactionTerms(forces, r);
  const result: CheckResult = {
    id: 'interaction',
    title: 'Axial force, biaxial bending and bimoment (linear interaction)',
    clause: 'EN 1993-1-1 6.2.1(7)',
    utilisation: axialTerm + bendingYTerm + bendingZTerm + bimomentTerm,
    inputs: { N: forces.N, My: forces.My, Mz: forces.Mz, B: forces.B, f_y: r.yieldStrength, gamma_M0: r.gammaM0 },
    intermediate: {
      sectionClass: r.sectionClass,
      N_Rd: r.axialResistance,
      M_y_Rd: r.momentShearResistanceY,
      M_z_Rd: r.momentShearResistanceZ,
      sigma_w: r.warpingNormalStress,
      axialTerm,
      bendingYTerm,
      bendingZTerm,
      bimomentTerm,
    },
  };
  return outOfScope(result, r.classMessage);
}

/**
 * Cross-section resistance checks of EN 1993-1-1 6.2 for one set of internal forces. The section class
 * is found for the actual N and M_y (Table 5.2, web in bending and compression); class 4 sections get
 * `outOfScope` and utilisation Infinity on the checks that involve normal stress.
 */
export function checkSection(section: CheckableSection, grade: SteelGrade, forces: InternalForces, options: CheckOptions = {}): CheckResult[] {
  checkForces(forces);
  const r = resistances(section, grade, forces, options);
  const eta = options.eta ?? 1.0;
  return [
    axialCheck(section, forces, r),
    bendingCheck(section, forces, r, 'y'),
    bendingCheck(section, forces, r, 'z'),
    shearCheck(section, forces, r, 'z', eta),
    shearCheck(section, forces, r, 'y', eta),
    torsionCheck(section, forces, r),
    yieldCriterionCheck(section, forces, r),
    interactionCheck(forces, r),
  ];
}

/** The ids of the checks of checkSection, in its order (also the order of sectionUtilisations). */
export const SECTION_CHECK_IDS = ['axial', 'bending-y', 'bending-z', 'shear-z', 'shear-y', 'torsion', 'yield-criterion', 'interaction'] as const;

const scratchStressPoints = new Float64Array(2 * Math.max(STRESS_POINT_COUNT, BOX_STRESS_POINT_COUNT));

/**
 * The utilisations of checkSection, in the order of SECTION_CHECK_IDS, written to `out` without
 * building the reports: the same resistances and the same expressions (the helpers above are shared
 * by both), for scanning many stations. Report the governing ones with checkSection.
 */
export function sectionUtilisations(section: CheckableSection, grade: SteelGrade, forces: InternalForces, out: Float64Array, options: CheckOptions = {}): Float64Array {
  checkForces(forces);
  const r = resistances(section, grade, forces, options);
  const eta = options.eta ?? 1.0;
  const message = r.classMessage;
  const axial = ratio(Math.abs(forces.N), r.axialResistance);
  out[0] = forces.N >= 0 ? axial : scoped(axial, message);
  out[1] = scoped(ratio(Math.abs(forces.My), r.momentShearResistanceY), message);
  out[2] = scoped(ratio(Math.abs(forces.Mz), r.momentShearResistanceZ), message);
  const shearZ = ratio(Math.abs(forces.Vz), r.shearTorsionResistanceZ);
  const { webSlenderness, limit } = shearBucklingLimit(section, r, eta);
  out[3] = webSlenderness > limit ? scoped(shearZ, 'shear buckling') : shearZ;
  out[4] = ratio(Math.abs(forces.Vy), r.shearTorsionResistanceY);
  out[5] = sectionTorsionUtilisation(section, forces, r);
  const pointCount = criticalPointStresses(section, forces, r, scratchStressPoints).length;
  out[6] = scoped(Math.sqrt(worstYieldPoint(scratchStressPoints, r.designStrength, pointCount).criterion), message);
  const terms = interactionTerms(forces, r);
  out[7] = scoped(terms.axialTerm + terms.bendingYTerm + terms.bendingZTerm + terms.bimomentTerm, message);
  return out;
}

/** The check with the largest utilisation (the first of equals); undefined for an empty list. */
export function governingCheck(results: readonly CheckResult[]): CheckResult | undefined {
  let governing: CheckResult | undefined;
  for (const result of results) {
    if (governing === undefined || result.utilisation > governing.utilisation) governing = result;
  }
  return governing;
}
