import { SteelError } from './errors.js';
import { steelDensity } from './properties.js';
import type { ISectionDimensions, SectionProperties } from './properties.js';
import { standardFlangeThicknesses, standardWebThicknesses, steps } from './welded.js';
import type { WeldedGirderLimits } from './welded.js';

/**
 * Where the two webs of a welded box sit between its flanges [m]. The webs' outer faces are inset from
 * the flange tips by the outstand c (c = 0: flush webs); webCentreDistance = b - 2 c - t_w is the
 * distance between the web centre lines, the width of the closed cell on the plate mid-lines.
 */
export interface BoxGeometry {
  flangeOutstand: number;
  webCentreDistance: number;
}

/** Plate dimensions of a doubly symmetric welded box girder [m]; webThickness is that of ONE web. */
export interface WeldedBoxPlates {
  depth: number;
  flangeWidth: number;
  webThickness: number;
  flangeThickness: number;
  /** c, from the flange tip to the outer face of the web (0 = flush webs) */
  flangeOutstand: number;
}

/** A doubly symmetric welded box: two flange plates b x t_f, two webs h_w x t_w between the flanges. */
export interface WeldedBoxSection {
  /** "WB h x b x t_w x t_f" in mm, e.g. "WB 600x400x10x20" (the outstand is not part of the name) */
  designation: string;
  series: 'welded box';
  fabrication: 'welded';
  /** webThickness is one web's; rootRadius is 0 (fillet welds ignored) */
  dimensions: ISectionDimensions;
  box: BoxGeometry;
  properties: SectionProperties;
  source: string;
}

/** Ranges for generating welded boxes: those of the welded I girders plus the outstand [m]. */
export interface WeldedBoxLimits extends WeldedGirderLimits {
  /** c for every generated box (default 0.02 m, room for the fillet welds outside the webs; common practice) */
  flangeOutstand?: number;
}

/** 20 mm from the flange tip to the web face, for the outside fillet welds (common practice). */
export const defaultBoxFlangeOutstand = 0.02;

/**
 * Thin-walled constants of the box on the plate mid-lines (origin at the centroid, which is the shear
 * centre by double symmetry; y along the flanges, z along the webs). Quantities in one quadrant
 * (y >= 0, z >= 0); the others follow by the antisymmetry of omega in y and in z.
 */
export interface BoxThinWalled {
  /** d, distance between web centre lines (cell width) [m] */
  cellWidth: number;
  /** h0 = h - t_f, distance between flange mid-planes (cell height) [m] */
  cellHeight: number;
  /** e = (b - d) / 2 = c + t_w / 2, mid-line length of each flange outstand beyond the web centre line [m] */
  outstandLength: number;
  /** A_m = d h0, area enclosed by the mid-line of the cell [m2] */
  enclosedArea: number;
  /** psi = 2 A_m / (closed integral of ds / t), the St Venant shear flow per unit G theta' [m2] */
  shearFlowConstant: number;
  /** I_t of the closed cell alone, 4 A_m^2 / (2 d / t_f + 2 h0 / t_w) [m4] */
  closedTorsionConstant: number;
  /** I_t of the four open outstands, 4 (1/3) c t_f^3 [m4] */
  openTorsionConstant: number;
  /** omega at the cell corner (flange-web mid-line intersection, +y +z) [m2] */
  sectorialCorner: number;
  /** omega at the flange tip (+y +z) [m2] */
  sectorialTip: number;
  /** omega on the flange mid-line at the web's outer face, y = b/2 - c [m2] */
  sectorialFlangeAtWebFace: number;
  /** omega on the web mid-line where it meets the flange, z = h_w / 2 [m2] */
  sectorialWebAtFlange: number;
  /** I_w [m6] */
  warpingConstant: number;
  /**
   * |S_omega - k|: first sectorial moments with the closed cell's circulating part k, at the points where
   * they are extreme (warping shear flow q = T_w |S| / I_w, stress q / t) [m4]
   */
  warpingMoment: {
    /** flange mid-point between the webs (the flange's own extreme is there or at the web) */
    flangeMid: number;
    /** flange in the cell, at the web */
    flangeAtWeb: number;
    /** largest along an outstand (at the web, or inside it where omega changes sign) */
    outstand: number;
    /** web at the flange */
    webAtFlange: number;
    /** web at mid-depth */
    webMid: number;
  };
}

function checkPositive(name: string, value: number): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new SteelError('INVALID_DIMENSIONS', `Box ${name} must be a positive length in metres; got ${value}.`, name);
  }
}

/** The clear width between the webs must be a real gap, not floating-point residue of b - 2 c - 2 t_w. */
function websFit(clearWidth: number): boolean {
  return clearWidth > 1e-9;
}

function checkBoxDimensions(d: ISectionDimensions, flangeOutstand: number): void {
  checkPositive('depth', d.depth);
  checkPositive('flangeWidth', d.flangeWidth);
  checkPositive('webThickness', d.webThickness);
  checkPositive('flangeThickness', d.flangeThickness);
  if (!Number.isFinite(flangeOutstand) || flangeOutstand < 0) {
    throw new SteelError('INVALID_DIMENSIONS', `Box flangeOutstand must be zero or a positive length in metres; got ${flangeOutstand}.`, 'flangeOutstand');
  }
  if (d.depth - 2 * d.flangeThickness <= 0) {
    throw new SteelError('INVALID_DIMENSIONS', `Box depth ${d.depth} m leaves no web between the flanges (2 t_f = ${2 * d.flangeThickness} m).`, 'depth');
  }
  const clear = d.flangeWidth - 2 * flangeOutstand - 2 * d.webThickness;
  if (!websFit(clear)) {
    throw new SteelError(
      'INVALID_DIMENSIONS',
      `Box flangeWidth ${d.flangeWidth} m leaves no room between the webs: b - 2 c - 2 t_w = ${(clear * 1000).toFixed(1)} mm must be positive.`,
      'flangeWidth',
    );
  }
}

/**
 * Warping of the closed cell with its four open outstands, by the thin-walled theory of closed sections
 * (Benscoter's warping function as presented by Kollbrunner and Basler, "Torsion in Structures", closed
 * sections; from memory): along the mid-line d(omega)/ds = r_n - psi / t in the cell and r_n in the open
 * outstands, with r_n the distance of the wall's tangent from the shear centre. For the doubly symmetric
 * cell omega is zero at the wall mid-points, linear along each wall:
 *   top flange in the cell  omega = alpha y, alpha = h0/2 - psi/t_f, corner omega_c = alpha d/2
 *   web                     omega = 2 omega_c z / h0
 *   outstand                omega = omega_c + (h0/2)(y - d/2), tip omega_t = omega_c + h0 e / 2
 *   I_w = 4 [t_f alpha^2 d^3/24 + t_f (omega_c^2 e + omega_c h0 e^2/2 + h0^2 e^3/12) + t_w omega_c^2 h0/6]
 * With e = 0 this is the closed form of the rectangular cell,
 *   I_w = d^2 h0^2 (h0 t_f - d t_w)^2 (d t_f + h0 t_w) / (24 (d t_w + h0 t_f)^2),
 * which vanishes when d / t_f = h0 / t_w (the known warping-free box, e.g. the square tube of one
 * thickness). The warping shear flow is q = (T_w / I_w)(S_omega - k), S_omega = integral of omega t ds
 * (from the free tips in the outstands), with the circulating part k = (closed integral of S_omega / t ds)
 * / (closed integral of ds / t), so that the warping shear stresses add no twist around the cell.
 */
export function boxThinWalled(dimensions: ISectionDimensions, box: BoxGeometry): BoxThinWalled {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = dimensions;
  const d = box.webCentreDistance;
  const h0 = h - tf;
  const hw = h - 2 * tf;
  const e = (b - d) / 2;
  const enclosedArea = d * h0;
  const circuit = (2 * d) / tf + (2 * h0) / tw;
  const psi = (2 * enclosedArea) / circuit;
  const alpha = h0 / 2 - psi / tf;
  const wc = (alpha * d) / 2;
  const wt = wc + (h0 * e) / 2;
  const warpingConstant =
    4 * ((tf * alpha ** 2 * d ** 3) / 24 + tf * (wc ** 2 * e + (wc * h0 * e ** 2) / 2 + (h0 ** 2 * e ** 3) / 12) + (tw * wc ** 2 * h0) / 6);

  // First sectorial moments in the quadrant, from the top flange's mid-point (s = 0) round to the web's mid-depth.
  const flangeAtCorner = (tf * alpha * d * d) / 8;
  // the outstand's own integral from its tip to the web: t_f (omega_c e + h0 e^2 / 4)
  const outstandAtWeb = tf * (wc * e + (h0 * e * e) / 4);
  const webTop = flangeAtCorner + outstandAtWeb;
  const webMid = webTop + (tw * wc * h0) / 4;
  // Circulation k over the quadrant (the four quadrants are alike): flange half alpha d^3 / 48,
  // half web S_c h0 / (2 t_w) + omega_c h0^2 / 12, over d / (2 t_f) + h0 / (2 t_w).
  const k = ((alpha * d ** 3) / 48 + (webTop * h0) / (2 * tw) + (wc * h0 * h0) / 12) / (d / (2 * tf) + h0 / (2 * tw));
  // Along an outstand from its tip, S = t_f (omega_t s - h0 s^2 / 4): interior extreme t_f omega_t^2 / h0 at s = 2 omega_t / h0.
  const turning = (2 * wt) / h0;
  const outstandInterior = turning > 0 && turning < e ? (tf * wt * wt) / h0 : 0;

  return {
    cellWidth: d,
    cellHeight: h0,
    outstandLength: e,
    enclosedArea,
    shearFlowConstant: psi,
    closedTorsionConstant: (4 * enclosedArea ** 2) / circuit,
    openTorsionConstant: (4 / 3) * box.flangeOutstand * tf ** 3,
    sectorialCorner: wc,
    sectorialTip: wt,
    sectorialFlangeAtWebFace: wc + (h0 / 2) * (b / 2 - box.flangeOutstand - d / 2),
    sectorialWebAtFlange: (2 * wc * (hw / 2)) / h0,
    warpingConstant,
    warpingMoment: {
      flangeMid: Math.abs(k),
      flangeAtWeb: Math.abs(flangeAtCorner - k),
      outstand: Math.max(Math.abs(outstandAtWeb), outstandInterior),
      webAtFlange: Math.abs(webTop - k),
      webMid: Math.abs(webMid - k),
    },
  };
}

/**
 * Gross properties of a welded box from its plates (weld throats ignored, slightly conservative).
 * Plates: flanges b x t_f at z = +-h0/2; webs t_w x h_w (h_w = h - 2 t_f) with centre lines at y = +-d/2.
 *   A = 2 b t_f + 2 h_w t_w
 *   I_y = 2 (b t_f^3 / 12 + b t_f (h0/2)^2) + 2 t_w h_w^3 / 12
 *   I_z = 2 t_f b^3 / 12 + 2 (h_w t_w^3 / 12 + h_w t_w (d/2)^2)
 *   W_el = I / (h/2) and I / (b/2) (flange fibres and tips are the extreme ones)
 *   W_pl,y = b t_f h0 + t_w h_w^2 / 2;  W_pl,z = t_f b^2 / 2 + h_w t_w d (each web lies wholly on one side)
 *   I_t = 4 A_m^2 / (2 d / t_f + 2 h0 / t_w) + 4 (1/3) c t_f^3: Bredt-Batho for the closed cell on the
 *     mid-lines (Timoshenko and Goodier, Theory of Elasticity, torsion of thin tubes; from memory) plus the
 *     open outstands as thin rectangles (the cell walls' own t^3 terms are neglected, conservative)
 *   I_w by boxThinWalled (closed cell and outstands)
 *   A_vz = sum h_w t_w = 2 h_w t_w and A_vy = A - sum h_w t_w = 2 b t_f, EN 1993-1-1 6.2.6(3)d and (3)e
 *     for welded box sections (eta = 1)
 * The I-section fields mean, for a box:
 *   flangeCentroidDistance  h0 = h - t_f, as for the I (the cell height)
 *   webDepth                h_w = h - 2 t_f of ONE web (the shear area is 2 h_w t_w)
 *   sectorialModulus        W_n0 = the largest |omega| of the section (tip or corner), so that
 *                           B W_n0 / I_w is the largest warping normal stress, as for the I
 *   warpingStaticMoment     S_w = the largest |S_omega - k| t_f / t over the plates, so that
 *                           T_w S_w / (I_w t_f) is the largest warping shear stress, as for the I
 */
export function weldedBoxProperties(dimensions: ISectionDimensions, flangeOutstand: number): SectionProperties {
  checkBoxDimensions(dimensions, flangeOutstand);
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = dimensions;
  const hw = h - 2 * tf;
  const h0 = h - tf;
  const d = b - 2 * flangeOutstand - tw;
  const area = 2 * b * tf + 2 * hw * tw;
  const secondMomentOfAreaY = 2 * ((b * tf ** 3) / 12 + b * tf * (h0 / 2) ** 2) + (2 * tw * hw ** 3) / 12;
  const secondMomentOfAreaZ = (2 * tf * b ** 3) / 12 + 2 * ((hw * tw ** 3) / 12 + hw * tw * (d / 2) ** 2);
  const thin = boxThinWalled(dimensions, { flangeOutstand, webCentreDistance: d });
  const m = thin.warpingMoment;
  return {
    area,
    secondMomentOfAreaY,
    secondMomentOfAreaZ,
    elasticModulusY: secondMomentOfAreaY / (h / 2),
    elasticModulusZ: secondMomentOfAreaZ / (b / 2),
    plasticModulusY: b * tf * h0 + (tw * hw * hw) / 2,
    plasticModulusZ: (tf * b * b) / 2 + hw * tw * d,
    radiusOfGyrationY: Math.sqrt(secondMomentOfAreaY / area),
    radiusOfGyrationZ: Math.sqrt(secondMomentOfAreaZ / area),
    torsionConstant: thin.closedTorsionConstant + thin.openTorsionConstant,
    warpingConstant: thin.warpingConstant,
    shearAreaZ: 2 * hw * tw,
    shearAreaY: area - 2 * hw * tw,
    massPerMetre: steelDensity * area,
    flangeCentroidDistance: h0,
    webDepth: hw,
    sectorialModulus: Math.max(Math.abs(thin.sectorialTip), Math.abs(thin.sectorialCorner)),
    warpingStaticMoment: Math.max(m.flangeMid, m.flangeAtWeb, m.outstand, (Math.max(m.webAtFlange, m.webMid) * tf) / tw),
  };
}

const mm = (metres: number): string => String(Math.round(metres * 1e4) / 10);

/** A welded box girder from its plates, designated like the welded I ("WB 600x400x10x20", h x b x t_w x t_f in mm). */
export function weldedBoxSection(plates: WeldedBoxPlates): WeldedBoxSection {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, flangeOutstand: c } = plates;
  const dimensions: ISectionDimensions = { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: 0 };
  const properties = weldedBoxProperties(dimensions, c);
  return {
    designation: `WB ${mm(h)}x${mm(b)}x${mm(tw)}x${mm(tf)}`,
    series: 'welded box',
    fabrication: 'welded',
    dimensions,
    box: { flangeOutstand: c, webCentreDistance: b - 2 * c - tw },
    properties,
    source: 'generated from plate sizes; properties computed on the plate mid-lines (closed cell), fillet welds ignored',
  };
}

/**
 * All welded boxes within the limits, ordered by depth, flange width, flange thickness and web
 * thickness (as generateWeldedSections). Skipped: no web between the flanges (2 t_f >= h), webs that do
 * not fit side by side inside the outstands (b - 2 c - 2 t_w <= 0) and, unless webNotThickerThanFlange
 * is false, webs thicker than the flanges. No class filter.
 */
export function generateWeldedBoxes(limits: WeldedBoxLimits): WeldedBoxSection[] {
  const depths = steps(limits.minDepth, limits.maxDepth, limits.depthStep ?? 0.05, 'depth');
  const widths = steps(limits.minFlangeWidth, limits.maxFlangeWidth, limits.flangeWidthStep ?? 0.05, 'flangeWidth');
  const flangeThicknesses = limits.flangeThicknesses ?? [...standardFlangeThicknesses];
  const webThicknesses = limits.webThicknesses ?? [...standardWebThicknesses];
  for (const [name, list] of [['flangeThicknesses', flangeThicknesses], ['webThicknesses', webThicknesses]] as const) {
    if (list.length === 0 || list.some((t) => !Number.isFinite(t) || t <= 0)) {
      throw new SteelError('INVALID_OPTIONS', `${name} must be a non-empty list of positive thicknesses in metres.`, name);
    }
  }
  const c = limits.flangeOutstand ?? defaultBoxFlangeOutstand;
  if (!Number.isFinite(c) || c < 0) {
    throw new SteelError('INVALID_OPTIONS', `flangeOutstand must be zero or a positive length in metres; got ${c}.`, 'flangeOutstand');
  }
  const thinWeb = limits.webNotThickerThanFlange ?? true;
  const sections: WeldedBoxSection[] = [];
  for (const h of depths) {
    for (const b of widths) {
      for (const tf of flangeThicknesses) {
        for (const tw of webThicknesses) {
          if (h - 2 * tf <= 0 || !websFit(b - 2 * c - 2 * tw) || (thinWeb && tw > tf)) continue;
          sections.push(weldedBoxSection({ depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, flangeOutstand: c }));
        }
      }
    }
  }
  return sections;
}
