import type { BoxGeometry } from './box.js';
import { strengthsForThickness } from './grades.js';
import type { SteelGrade } from './grades.js';
import type { ISectionDimensions, SectionProperties } from './properties.js';

export type SectionClass = 1 | 2 | 3 | 4;

/** How the section was made: decides shear areas and the buckling curves of EN 1993-1-1 Tables 6.2, 6.4, 6.5. */
export type Fabrication = 'rolled' | 'welded';

/** What a classification needs of a section. */
export interface ClassifiableSection {
  designation?: string;
  /** 'rolled' unless stated; a welded section has rootRadius 0 (weld throats ignored) */
  fabrication?: Fabrication;
  /** webThickness is one web's for a box */
  dimensions: ISectionDimensions;
  /** present for a welded box (two webs between the flanges); absent for an I section */
  box?: BoxGeometry;
  properties: SectionProperties;
}

/** One compression part of EN 1993-1-1 Table 5.2 with its width-to-thickness limits. */
export interface ElementClassification {
  element: 'flange outstand' | 'flange between webs' | 'web';
  stress: 'compression' | 'bending' | 'bending and compression' | 'tension';
  /** c, the flat width of the part [m] */
  width: number;
  /** t [m] */
  thickness: number;
  /** c / t */
  slenderness: number;
  /** c / t limits for class 1, 2 and 3 (already multiplied by epsilon) */
  limits: { class1: number; class2: number; class3: number };
  sectionClass: SectionClass;
}

/** Classification of the web under a given axial force and strong-axis moment. */
export interface CombinedClassification {
  /** N used (tension positive) [N] */
  axialForce: number;
  /** M_y used [N m] */
  bendingMomentY: number;
  /** M_z used [N m] (box only: M_z compresses one web; an I's web lies on the M_z neutral axis) */
  bendingMomentZ?: number;
  /** alpha, compressed fraction of the web depth c at the plastic state (Table 5.2, class 1 and 2) */
  alpha: number;
  /** psi, ratio of the end stresses of c at the elastic state (Table 5.2, class 3); NaN with no compression */
  psi: number;
  web: ElementClassification;
  /** class of the whole section under these forces (worst of web and, if any compression, flange) */
  sectionClass: SectionClass;
}

export interface SectionClassification {
  /** epsilon = sqrt(235 N/mm2 / f_y) */
  epsilon: number;
  /** f_y used, for the largest element thickness of the section [Pa] */
  yieldStrength: number;
  /** the flange outstand (for a box: from the tip to the web's outer face, c) */
  flange: ElementClassification;
  /** box only: the flange between the webs, an internal part in compression (Table 5.2 sheet 1) */
  flangeBetweenWebs?: ElementClassification;
  webBending: ElementClassification;
  webCompression: ElementClassification;
  /** class for bending about the strong axis (flange in compression, web in bending) */
  bendingY: SectionClass;
  /**
   * class for bending about the weak axis: the flange outstands, taken with the uniform-compression
   * limits of Table 5.2 (conservative for class 3, where a stress gradient would allow 21 eps sqrt(k_sigma))
   */
  bendingZ: SectionClass;
  /** class for uniform compression */
  compression: SectionClass;
  /** present when forces were given */
  combined?: CombinedClassification;
}

/**
 * Yield strength for a rolled section: EN 1993-1-1 Table 3.1 by nominal thickness, taken for the
 * thickest element (the flange of every IPE and HE B section), which is conservative for the web.
 */
export function sectionYieldStrength(section: ClassifiableSection, grade: SteelGrade): number {
  const { flangeThickness, webThickness } = section.dimensions;
  return strengthsForThickness(grade, Math.max(flangeThickness, webThickness)).yieldStrength;
}

/** c/t limits of an internal part in bending and compression, EN 1993-1-1 Table 5.2 (sheet 1): alpha for classes 1 and 2, psi for class 3. */
function internalPartLimits(epsilon: number, alpha: number, psi: number): { class1: number; class2: number; class3: number } {
  return {
    class1: alpha > 0.5 ? (396 * epsilon) / (13 * alpha - 1) : (36 * epsilon) / alpha,
    class2: alpha > 0.5 ? (456 * epsilon) / (13 * alpha - 1) : (41.5 * epsilon) / alpha,
    class3: psi > -1 ? (42 * epsilon) / (0.67 + 0.33 * psi) : 62 * epsilon * (1 - psi) * Math.sqrt(-psi),
  };
}

function classFromLimits(slenderness: number, limits: { class1: number; class2: number; class3: number }): SectionClass {
  if (slenderness <= limits.class1) return 1;
  if (slenderness <= limits.class2) return 2;
  if (slenderness <= limits.class3) return 3;
  return 4;
}

function element(
  kind: ElementClassification['element'],
  stress: ElementClassification['stress'],
  width: number,
  thickness: number,
  limits: { class1: number; class2: number; class3: number },
): ElementClassification {
  const slenderness = width / thickness;
  return { element: kind, stress, width, thickness, slenderness, limits, sectionClass: stress === 'tension' ? 1 : classFromLimits(slenderness, limits) };
}

function worst(...classes: SectionClass[]): SectionClass {
  return classes.reduce<SectionClass>((a, b) => (b > a ? b : a), 1);
}

/**
 * Web of an I section under N and M_y, EN 1993-1-1 Table 5.2 (sheet 1, "internal compression parts",
 * bending and compression):
 *   class 1: alpha > 0.5: c/t <= 396 eps / (13 alpha - 1); alpha <= 0.5: c/t <= 36 eps / alpha
 *   class 2: alpha > 0.5: c/t <= 456 eps / (13 alpha - 1); alpha <= 0.5: c/t <= 41.5 eps / alpha
 *   class 3: psi > -1: c/t <= 42 eps / (0.67 + 0.33 psi); psi <= -1: c/t <= 62 eps (1 - psi) sqrt(-psi)
 * alpha follows from the plastic neutral axis with the axial force carried by the web:
 *   alpha = 0.5 (1 + N_c / (c t_w f_y)), clipped to [0, 1] (N_c compression positive);
 * psi from the elastic stresses at the ends of c: sigma = N_c / A +- M_y (c/2) / I_y.
 */
function webUnderAxialAndBending(
  section: ClassifiableSection,
  epsilon: number,
  yieldStrength: number,
  axialForce: number,
  bendingMomentY: number,
): { alpha: number; psi: number; web: ElementClassification } {
  const { depth: h, webThickness: tw, flangeThickness: tf, rootRadius: r } = section.dimensions;
  const c = h - 2 * tf - 2 * r;
  const compressionForce = -axialForce;
  if (bendingMomentY === 0) {
    if (compressionForce > 0) {
      return { alpha: 1, psi: 1, web: element('web', 'compression', c, tw, webCompressionLimits(epsilon)) };
    }
    return { alpha: 0, psi: Number.NaN, web: element('web', 'tension', c, tw, webCompressionLimits(epsilon)) };
  }
  const alpha = Math.min(1, Math.max(0, 0.5 * (1 + compressionForce / (c * tw * yieldStrength))));
  const { area, secondMomentOfAreaY } = section.properties;
  const sigmaAxial = compressionForce / area;
  const sigmaBending = (Math.abs(bendingMomentY) * (c / 2)) / secondMomentOfAreaY;
  const sigma1 = sigmaAxial + sigmaBending;
  const sigma2 = sigmaAxial - sigmaBending;
  if (alpha === 0 || sigma1 <= 0) {
    return { alpha, psi: Number.NaN, web: element('web', 'tension', c, tw, webCompressionLimits(epsilon)) };
  }
  const psi = sigma2 / sigma1;
  return { alpha, psi, web: element('web', 'bending and compression', c, tw, internalPartLimits(epsilon, alpha, psi)) };
}

/** EN 1993-1-1 Table 5.2 sheet 1, internal part in compression: 33 / 38 / 42 eps. */
function webCompressionLimits(epsilon: number): { class1: number; class2: number; class3: number } {
  return { class1: 33 * epsilon, class2: 38 * epsilon, class3: 42 * epsilon };
}

/**
 * Cross-section classification of a rolled I/H section, EN 1993-1-1 5.5 and Table 5.2:
 *  - flange outstand in compression (sheet 2, rolled): c = (b - t_w - 2 r) / 2, limits 9 / 10 / 14 eps
 *  - web in bending (sheet 1): c = h - 2 t_f - 2 r, limits 72 / 83 / 124 eps
 *  - web in compression (sheet 1): limits 33 / 38 / 42 eps
 * The section takes the class of its least favourable compression part (5.5.2(6)).
 * With `forces`, the web is also classified for that combination of N (tension positive) and M_y
 * (M_z is used for a box only). A section with `box` is classified by classifyBox below.
 */
export function classifySection(
  section: ClassifiableSection,
  grade: SteelGrade,
  forces?: { N: number; My: number; Mz?: number },
): SectionClassification {
  const yieldStrength = sectionYieldStrength(section, grade);
  const epsilon = Math.sqrt(235e6 / yieldStrength);
  if (section.box) return classifyBox(section, section.box, epsilon, yieldStrength, forces);
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = section.dimensions;
  const flangeOutstand = (b - tw - 2 * r) / 2;
  const webFlat = h - 2 * tf - 2 * r;

  const flange = element('flange outstand', 'compression', flangeOutstand, tf, {
    class1: 9 * epsilon,
    class2: 10 * epsilon,
    class3: 14 * epsilon,
  });
  const webBending = element('web', 'bending', webFlat, tw, { class1: 72 * epsilon, class2: 83 * epsilon, class3: 124 * epsilon });
  const webCompression = element('web', 'compression', webFlat, tw, webCompressionLimits(epsilon));

  const result: SectionClassification = {
    epsilon,
    yieldStrength,
    flange,
    webBending,
    webCompression,
    bendingY: worst(flange.sectionClass, webBending.sectionClass),
    bendingZ: flange.sectionClass,
    compression: worst(flange.sectionClass, webCompression.sectionClass),
  };
  if (forces) {
    const { alpha, psi, web } = webUnderAxialAndBending(section, epsilon, yieldStrength, forces.N, forces.My);
    const flangeCompressed = forces.N < 0 || forces.My !== 0;
    result.combined = {
      axialForce: forces.N,
      bendingMomentY: forces.My,
      alpha,
      psi,
      web,
      sectionClass: worst(web.sectionClass, flangeCompressed ? flange.sectionClass : 1),
    };
  }
  return result;
}

/**
 * Webs of a welded box under N, M_y and M_z, EN 1993-1-1 Table 5.2 sheet 1 (internal compression parts),
 * the more compressed web:
 *  - alpha (plastic, class 1 and 2) from the web's axial force in the plastic distribution whose neutral
 *    axis crosses only the webs (both flanges yielded through, so they carry neither N nor M_z): the webs
 *    share N and carry M_z as a couple of forces d apart, N_web = N_c / 2 + |M_z| / d, and
 *    alpha = 0.5 (1 + N_web / (c t_w f_y)), clipped to [0, 1] (with M_z = 0 the I's expression, N shared);
 *  - psi (elastic, class 3) from the stresses at the ends of c, with M_z taken at the web's outer face:
 *    sigma = N_c / A +- |M_y| (c/2) / I_y + |M_z| (b/2 - c_o) / I_z.
 */
function boxWebUnderForces(
  section: ClassifiableSection,
  box: BoxGeometry,
  epsilon: number,
  yieldStrength: number,
  forces: { N: number; My: number; Mz?: number },
): { alpha: number; psi: number; web: ElementClassification } {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = section.dimensions;
  const c = h - 2 * tf;
  const compressionForce = -forces.N;
  const mz = forces.Mz ?? 0;
  if (forces.My === 0 && mz === 0) {
    if (compressionForce > 0) return { alpha: 1, psi: 1, web: element('web', 'compression', c, tw, webCompressionLimits(epsilon)) };
    return { alpha: 0, psi: Number.NaN, web: element('web', 'tension', c, tw, webCompressionLimits(epsilon)) };
  }
  const { area, secondMomentOfAreaY, secondMomentOfAreaZ } = section.properties;
  const sigmaAxial = compressionForce / area;
  const sigmaMy = (Math.abs(forces.My) * (c / 2)) / secondMomentOfAreaY;
  const sigmaMz = (Math.abs(mz) * (b / 2 - box.flangeOutstand)) / secondMomentOfAreaZ;
  const sigma1 = sigmaAxial + sigmaMy + sigmaMz;
  const sigma2 = sigmaAxial - sigmaMy + sigmaMz;
  const webForce = compressionForce / 2 + Math.abs(mz) / box.webCentreDistance;
  const alpha = Math.min(1, Math.max(0, 0.5 * (1 + webForce / (c * tw * yieldStrength))));
  if (alpha === 0 || sigma1 <= 0) {
    return { alpha, psi: Number.NaN, web: element('web', 'tension', c, tw, webCompressionLimits(epsilon)) };
  }
  const psi = sigma2 / sigma1;
  return { alpha, psi, web: element('web', 'bending and compression', c, tw, internalPartLimits(epsilon, alpha, psi)) };
}

/**
 * Classification of a welded box, EN 1993-1-1 5.5 and Table 5.2 (weld throats ignored, conservative):
 *  - flange outstands (sheet 2): c = c_o, tip to the web's outer face, limits 9 / 10 / 14 eps
 *  - flange between the webs (sheet 1, internal part in compression): c = d - t_w, the clear distance
 *    between the webs, limits 33 / 38 / 42 eps
 *  - webs (sheet 1): c = h - 2 t_f, bending 72 / 83 / 124 eps, compression 33 / 38 / 42 eps
 * bendingZ takes one web in compression (M_z compresses a whole web) and the flange between the webs
 * with the compression limits (it is in bending under M_z alone, so this is conservative).
 */
function classifyBox(
  section: ClassifiableSection,
  box: BoxGeometry,
  epsilon: number,
  yieldStrength: number,
  forces?: { N: number; My: number; Mz?: number },
): SectionClassification {
  const { depth: h, webThickness: tw, flangeThickness: tf } = section.dimensions;
  const webFlat = h - 2 * tf;
  const flange = element('flange outstand', 'compression', box.flangeOutstand, tf, { class1: 9 * epsilon, class2: 10 * epsilon, class3: 14 * epsilon });
  const flangeBetweenWebs = element('flange between webs', 'compression', box.webCentreDistance - tw, tf, webCompressionLimits(epsilon));
  const webBending = element('web', 'bending', webFlat, tw, { class1: 72 * epsilon, class2: 83 * epsilon, class3: 124 * epsilon });
  const webCompression = element('web', 'compression', webFlat, tw, webCompressionLimits(epsilon));
  const flanges = worst(flange.sectionClass, flangeBetweenWebs.sectionClass);
  const result: SectionClassification = {
    epsilon,
    yieldStrength,
    flange,
    flangeBetweenWebs,
    webBending,
    webCompression,
    bendingY: worst(flanges, webBending.sectionClass),
    bendingZ: worst(flanges, webCompression.sectionClass),
    compression: worst(flanges, webCompression.sectionClass),
  };
  if (forces) {
    const { alpha, psi, web } = boxWebUnderForces(section, box, epsilon, yieldStrength, forces);
    const mz = forces.Mz ?? 0;
    const flangeCompressed = forces.N < 0 || forces.My !== 0 || mz !== 0;
    result.combined = {
      axialForce: forces.N,
      bendingMomentY: forces.My,
      bendingMomentZ: mz,
      alpha,
      psi,
      web,
      sectionClass: worst(web.sectionClass, flangeCompressed ? flanges : 1),
    };
  }
  return result;
}
