import { SteelError } from './errors.js';

/**
 * Nominal dimensions of a doubly symmetric rolled I or H section with root fillets, in metres.
 * Axes: y is the strong axis (parallel to the flanges), z the weak axis (along the web); the origin
 * is the centroid, which is also the shear centre.
 */
export interface ISectionDimensions {
  /** h, overall depth */
  depth: number;
  /** b, flange width */
  flangeWidth: number;
  /** t_w */
  webThickness: number;
  /** t_f */
  flangeThickness: number;
  /** r, root fillet radius between web and flange */
  rootRadius: number;
}

/** Gross cross-section properties in SI base units (m, m2, m3, m4, m6, kg/m). */
export interface SectionProperties {
  /** A [m2] */
  area: number;
  /** I_y, strong axis [m4] */
  secondMomentOfAreaY: number;
  /** I_z, weak axis [m4] */
  secondMomentOfAreaZ: number;
  /** W_el,y = I_y / (h/2) [m3] */
  elasticModulusY: number;
  /** W_el,z = I_z / (b/2) [m3] */
  elasticModulusZ: number;
  /** W_pl,y [m3] */
  plasticModulusY: number;
  /** W_pl,z [m3] */
  plasticModulusZ: number;
  /** i_y [m] */
  radiusOfGyrationY: number;
  /** i_z [m] */
  radiusOfGyrationZ: number;
  /** I_t, St Venant torsion constant [m4] */
  torsionConstant: number;
  /** I_w, warping constant [m6] */
  warpingConstant: number;
  /** A_vz, shear area for shear parallel to the web [m2] (EN 1993-1-1 6.2.6(3)a with eta = 1.0) */
  shearAreaZ: number;
  /** A_vy, shear area for shear parallel to the flanges [m2] (flanges only, 2 b t_f) */
  shearAreaY: number;
  /** mass per metre [kg/m] for rho = 7850 kg/m3 */
  massPerMetre: number;
  /** h0 = h - t_f, distance between flange mid-planes [m] */
  flangeCentroidDistance: number;
  /** h_w = h - 2 t_f, web depth between flanges [m] */
  webDepth: number;
  /** W_n0 = h0 b / 4, normalised sectorial coordinate at the flange tips [m2] */
  sectorialModulus: number;
  /** S_w = t_f b^2 h0 / 16, largest warping statical moment (flange at the web) [m4] */
  warpingStaticMoment: number;
}

/** Density of structural steel [kg/m3], the value behind the mass column of the EN 10365 tables. */
export const steelDensity = 7850;

/** Area, centroid offset from the inner corner and own second moment of one root fillet. */
export interface FilletGeometry {
  /** (1 - pi/4) r^2 */
  area: number;
  /** distance of the fillet centroid from the web face and from the flange face (equal by symmetry) */
  centroidOffset: number;
  /** second moment about its own centroidal axis parallel to the flange (equal for the other axis) */
  ownSecondMoment: number;
}

/**
 * One root fillet is the r x r square at the web-flange corner minus the quarter circle of radius r
 * centred at the square's far corner. Exact results (derived):
 *   area            (1 - pi/4) r^2
 *   centroid offset e = r (10 - 3 pi) / (12 - 3 pi) from both the web face and the flange face
 *   I about the flange face (a side of the square through the corner) = (1 - 5 pi / 16) r^4
 *   own second moment = that minus area * e^2 (parallel-axis theorem)
 */
export function filletGeometry(rootRadius: number): FilletGeometry {
  const r = rootRadius;
  const area = (1 - Math.PI / 4) * r * r;
  if (r === 0) return { area: 0, centroidOffset: 0, ownSecondMoment: 0 };
  const centroidOffset = (r * (10 - 3 * Math.PI)) / (12 - 3 * Math.PI);
  const secondMomentAboutFace = (1 - (5 * Math.PI) / 16) * r ** 4;
  return { area, centroidOffset, ownSecondMoment: secondMomentAboutFace - area * centroidOffset ** 2 };
}

function checkDimensions(d: ISectionDimensions): void {
  const named: Array<[keyof ISectionDimensions, number]> = [
    ['depth', d.depth],
    ['flangeWidth', d.flangeWidth],
    ['webThickness', d.webThickness],
    ['flangeThickness', d.flangeThickness],
  ];
  for (const [name, value] of named) {
    if (!Number.isFinite(value) || value <= 0) {
      throw new SteelError('INVALID_DIMENSIONS', `Section ${name} must be a positive length in metres; got ${value}.`, name);
    }
  }
  if (!Number.isFinite(d.rootRadius) || d.rootRadius < 0) {
    throw new SteelError('INVALID_DIMENSIONS', `Section rootRadius must be zero or a positive length in metres; got ${d.rootRadius}.`, 'rootRadius');
  }
  if (d.depth - 2 * d.flangeThickness - 2 * d.rootRadius <= 0) {
    throw new SteelError(
      'INVALID_DIMENSIONS',
      `Section depth ${d.depth} m leaves no straight web between the flanges and root fillets (2 t_f + 2 r = ${2 * d.flangeThickness + 2 * d.rootRadius} m).`,
      'depth',
    );
  }
  if (d.webThickness + 2 * d.rootRadius >= d.flangeWidth) {
    throw new SteelError(
      'INVALID_DIMENSIONS',
      `Section flangeWidth ${d.flangeWidth} m leaves no flange outstand beyond the web and root fillets (t_w + 2 r = ${d.webThickness + 2 * d.rootRadius} m).`,
      'flangeWidth',
    );
  }
}

/**
 * Saint-Venant torsion constant of a rolled I section with root fillets (the expression used for the
 * published EN 10365 tables; REFERENCES.md section 5, reproduces the tables to the printed digit):
 *   I_t = (2/3)(b - 0.63 t_f) t_f^3 + (1/3)(h - 2 t_f) t_w^3 + 2 alpha1 D^4,
 *   alpha1 = (t_w / t_f)(0.145 + 0.1 r / t_f), D = ((t_f + r)^2 + t_w (r + t_w / 4)) / (2 r + t_f).
 */
function torsionConstant(d: ISectionDimensions): number {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = d;
  const alpha1 = (tw / tf) * (0.145 + (0.1 * r) / tf);
  const D = ((tf + r) ** 2 + tw * (r + tw / 4)) / (2 * r + tf);
  return (2 / 3) * (b - 0.63 * tf) * tf ** 3 + (1 / 3) * (h - 2 * tf) * tw ** 3 + 2 * alpha1 * D ** 4;
}

/**
 * Shear area for shear parallel to the web of a rolled I or H section, EN 1993-1-1 6.2.6(3)a:
 * A_v = A - 2 b t_f + (t_w + 2 r) t_f, but not less than eta h_w t_w. EN 1993-1-1 allows eta = 1.0
 * conservatively (the EN 1993-1-5 recommendation of 1.2 for grades up to S460 is from memory).
 */
export function shearAreaParallelToWeb(d: ISectionDimensions, eta = 1.0): number {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = d;
  const area = 2 * b * tf + (h - 2 * tf) * tw + (4 - Math.PI) * r * r;
  return Math.max(area - 2 * b * tf + (tw + 2 * r) * tf, eta * (h - 2 * tf) * tw);
}

/**
 * Gross properties of a doubly symmetric rolled I/H section from its nominal dimensions, root fillets
 * included. The section is two flange rectangles b x t_f, the web rectangle t_w x (h - 2 t_f) and four
 * root fillets (see filletGeometry), each with its own centroid and exact parallel-axis terms.
 */
export function sectionProperties(dimensions: ISectionDimensions): SectionProperties {
  checkDimensions(dimensions);
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = dimensions;
  const hw = h - 2 * tf;
  const h0 = h - tf;
  const fillet = filletGeometry(r);
  const e = fillet.centroidOffset;

  const area = 2 * b * tf + hw * tw + 4 * fillet.area;

  // Strong axis: flanges at h0/2, fillet centroids at h/2 - t_f - e from the centroid.
  const filletLeverZ = h / 2 - tf - e;
  const secondMomentOfAreaY =
    2 * ((b * tf ** 3) / 12 + b * tf * (h0 / 2) ** 2) +
    (tw * hw ** 3) / 12 +
    4 * (fillet.ownSecondMoment + fillet.area * filletLeverZ ** 2);

  // Weak axis: fillet centroids at t_w/2 + e from the web centre line.
  const filletLeverY = tw / 2 + e;
  const secondMomentOfAreaZ =
    2 * ((tf * b ** 3) / 12) + (hw * tw ** 3) / 12 + 4 * (fillet.ownSecondMoment + fillet.area * filletLeverY ** 2);

  // Plastic moduli: equal-area axes are the axes of symmetry; W_pl = sum |first moment| of all parts.
  const plasticModulusY = b * tf * h0 + (tw * hw * hw) / 4 + 4 * fillet.area * filletLeverZ;
  const plasticModulusZ = (tf * b * b) / 2 + (hw * tw * tw) / 4 + 4 * fillet.area * filletLeverY;

  // Warping constant of the flanges only, as the published tables give it (REFERENCES.md section 5).
  const warpingConstant = (tf * b ** 3 * h0 ** 2) / 24;

  return {
    area,
    secondMomentOfAreaY,
    secondMomentOfAreaZ,
    elasticModulusY: secondMomentOfAreaY / (h / 2),
    elasticModulusZ: secondMomentOfAreaZ / (b / 2),
    plasticModulusY,
    plasticModulusZ,
    radiusOfGyrationY: Math.sqrt(secondMomentOfAreaY / area),
    radiusOfGyrationZ: Math.sqrt(secondMomentOfAreaZ / area),
    torsionConstant: torsionConstant(dimensions),
    warpingConstant,
    shearAreaZ: shearAreaParallelToWeb(dimensions, 1.0),
    // EN 1993-1-1 6.2.6(3) has no rule for rolled I/H sections sheared parallel to the flanges;
    // the flanges alone are taken (6.2.6(3)e for welded sections would add the fillets).
    shearAreaY: 2 * b * tf,
    massPerMetre: steelDensity * area,
    flangeCentroidDistance: h0,
    webDepth: hw,
    sectorialModulus: (h0 * b) / 4,
    warpingStaticMoment: (tf * b * b * h0) / 16,
  };
}
