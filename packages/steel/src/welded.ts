import { SteelError } from './errors.js';
import { sectionProperties } from './properties.js';
import type { ISectionDimensions, SectionProperties } from './properties.js';

/** A doubly symmetric welded plate I-girder: two equal flange plates and a web plate. */
export interface WeldedSection {
  /** "WI h x b x t_w x t_f" in mm, e.g. "WI 800x300x10x25" */
  designation: string;
  series: 'welded I';
  fabrication: 'welded';
  /** rootRadius is 0: the fillet welds are ignored (their throats add a little area and stiffness) */
  dimensions: ISectionDimensions;
  properties: SectionProperties;
  source: string;
}

/** Plate dimensions of a welded I section [m]. */
export interface WeldedPlates {
  depth: number;
  flangeWidth: number;
  webThickness: number;
  flangeThickness: number;
}

const mm = (metres: number): string => String(Math.round(metres * 1e4) / 10);

/**
 * Properties of a welded I section from its plates, by the same formulas as the rolled sections with
 * no fillets (weld throats ignored, which is slightly conservative), except:
 *  - I_t = (2/3)(b - 0.63 t_f) t_f^3 + (1/3)(h - 2 t_f) t_w^3: open thin rectangles with the end
 *    correction for the flanges, the junctions neglected (conservative; common practice);
 *  - A_vz = h_w t_w, EN 1993-1-1 6.2.6(3)d with eta = 1.
 */
export function weldedISection(plates: WeldedPlates): WeldedSection {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf } = plates;
  const dimensions: ISectionDimensions = { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: 0 };
  const base = sectionProperties(dimensions);
  const torsionConstant = (2 / 3) * (b - 0.63 * tf) * tf ** 3 + (1 / 3) * (h - 2 * tf) * tw ** 3;
  return {
    designation: `WI ${mm(h)}x${mm(b)}x${mm(tw)}x${mm(tf)}`,
    series: 'welded I',
    fabrication: 'welded',
    dimensions,
    properties: { ...base, torsionConstant, shearAreaZ: (h - 2 * tf) * tw },
    source: 'generated from plate sizes; properties computed, fillet welds ignored',
  };
}

/** Ranges for generating welded girders [m]. */
export interface WeldedGirderLimits {
  minDepth: number;
  maxDepth: number;
  /** depth increment (default 0.05 m) */
  depthStep?: number;
  minFlangeWidth: number;
  maxFlangeWidth: number;
  /** flange width increment (default 0.05 m) */
  flangeWidthStep?: number;
  /** flange plate thicknesses [m] (default 8, 10, 12, 15, 20, 25, 30, 35, 40 mm) */
  flangeThicknesses?: number[];
  /** web plate thicknesses [m] (default 6, 8, 10, 12, 15, 20 mm) */
  webThicknesses?: number[];
  /** keep only sections whose web is no thicker than the flanges (default true; common practice) */
  webNotThickerThanFlange?: boolean;
}

/** Commonly stocked plate thicknesses (common practice; EN 10029 allows any thickness). */
export const standardFlangeThicknesses: readonly number[] = Object.freeze([8, 10, 12, 15, 20, 25, 30, 35, 40].map((t) => t * 1e-3));
export const standardWebThicknesses: readonly number[] = Object.freeze([6, 8, 10, 12, 15, 20].map((t) => t * 1e-3));

/** Lengths from min to max in steps, rounded to 0.1 mm; shared by the welded I and box generators. */
export function steps(min: number, max: number, step: number, name: string): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max) || min <= 0 || max < min) {
    throw new SteelError('INVALID_OPTIONS', `${name}: the range ${min} to ${max} m must be positive and increasing.`, name);
  }
  if (!Number.isFinite(step) || step <= 0) throw new SteelError('INVALID_OPTIONS', `${name} step must be a positive length; got ${step}.`, name);
  const values: number[] = [];
  // Whole-millimetre values, so that floating-point drift does not make e.g. 0.30000000000000004.
  for (let i = 0; ; i++) {
    const value = Math.round((min + i * step) * 1e4) / 1e4;
    if (value > max + 1e-9) break;
    values.push(value);
  }
  return values;
}

/**
 * All welded I sections within the limits, ordered by depth, flange width, flange thickness and web
 * thickness. Combinations that leave no web (2 t_f >= h) are skipped. No class filter: classify or
 * check them like any section (a slender web can be class 4 and out of scope).
 */
export function generateWeldedSections(limits: WeldedGirderLimits): WeldedSection[] {
  const depths = steps(limits.minDepth, limits.maxDepth, limits.depthStep ?? 0.05, 'depth');
  const widths = steps(limits.minFlangeWidth, limits.maxFlangeWidth, limits.flangeWidthStep ?? 0.05, 'flangeWidth');
  const flangeThicknesses = limits.flangeThicknesses ?? [...standardFlangeThicknesses];
  const webThicknesses = limits.webThicknesses ?? [...standardWebThicknesses];
  for (const [name, list] of [['flangeThicknesses', flangeThicknesses], ['webThicknesses', webThicknesses]] as const) {
    if (list.length === 0 || list.some((t) => !Number.isFinite(t) || t <= 0)) {
      throw new SteelError('INVALID_OPTIONS', `${name} must be a non-empty list of positive thicknesses in metres.`, name);
    }
  }
  const thinWeb = limits.webNotThickerThanFlange ?? true;
  const sections: WeldedSection[] = [];
  for (const h of depths) {
    for (const b of widths) {
      for (const tf of flangeThicknesses) {
        for (const tw of webThicknesses) {
          if (h - 2 * tf <= 0 || tw >= b || (thinWeb && tw > tf)) continue;
          sections.push(weldedISection({ depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf }));
        }
      }
    }
  }
  return sections;
}
