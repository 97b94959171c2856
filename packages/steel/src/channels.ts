import { z } from 'zod';
import channelTable from './data/channels.json' with { type: 'json' };
import type { CheckResult } from './checks.js';
import { SteelError } from './errors.js';
import { strengthsForThickness } from './grades.js';
import type { SteelGrade } from './grades.js';
import { filletGeometry, steelDensity } from './properties.js';

/**
 * Nominal dimensions of a parallel-flange channel [m]. Axes: y across the flanges (from the back of
 * the web towards the flange tips), z along the web; the section is symmetric about y only.
 */
export interface ChannelDimensions {
  depth: number;
  flangeWidth: number;
  webThickness: number;
  flangeThickness: number;
  /** root radius between web and flanges */
  rootRadius: number;
}

/** Gross properties of a channel, SI units. Not doubly symmetric: centroid and shear centre differ. */
export interface ChannelProperties {
  area: number;
  /** strong axis (normal to the web) */
  secondMomentOfAreaY: number;
  /** weak axis, through the centroid */
  secondMomentOfAreaZ: number;
  elasticModulusY: number;
  /** W_el,z = I_z / (b - y_c), at the flange tips (the smaller of the two) */
  elasticModulusZ: number;
  plasticModulusY: number;
  plasticModulusZ: number;
  /** I_t, thin rectangles with the flange end correction, junctions neglected (conservative) */
  torsionConstant: number;
  /** I_w, thin-walled mid-line model */
  warpingConstant: number;
  /** y_c, centroid from the back of the web */
  centroidFromWebBack: number;
  /** e_M, shear centre from the web mid-plane, on the side away from the flanges (thin-walled model) */
  shearCentreFromWebCentre: number;
  /** y_M, shear centre from the centroid (y_c - t_w/2 + e_M) */
  shearCentreFromCentroid: number;
  /** A_vz, EN 1993-1-1 6.2.6(3)c: A - 2 b t_f + (t_w + r) t_f */
  shearAreaZ: number;
  massPerMetre: number;
}

/** A channel for secondary members only: no torsion or lateral-torsional buckling checks are provided. */
export interface ChannelSection {
  designation: string;
  series: 'UPE';
  role: 'secondary';
  dimensions: ChannelDimensions;
  properties: ChannelProperties;
  source: string;
}

const positiveMm = z.number().finite().positive();
const channelFile = z
  .object({
    schemaVersion: z.literal(1),
    title: z.string(),
    units: z.literal('mm'),
    sections: z
      .array(
        z
          .object({
            designation: z.string().regex(/^UPE \d+$/),
            series: z.literal('UPE'),
            depthMm: positiveMm,
            flangeWidthMm: positiveMm,
            webThicknessMm: positiveMm,
            flangeThicknessMm: positiveMm,
            rootRadiusMm: z.number().finite().nonnegative(),
            source: z.string().min(1),
          })
          .strict()
          .refine((row) => row.depthMm - 2 * row.flangeThicknessMm - 2 * row.rootRadiusMm > 0, { message: 'depth leaves no straight web' })
          .refine((row) => row.webThicknessMm + row.rootRadiusMm < row.flangeWidthMm, { message: 'flange width leaves no outstand' }),
      )
      .min(1),
  })
  .strict();

/**
 * Properties of a parallel-flange channel from its dimensions: web rectangle t_w x h, two flange
 * rectangles (b - t_w) x t_f, two root fillets (as in filletGeometry), exact parallel-axis terms.
 * W_pl,z: the equal-area axis is found with each fillet lumped at its centroid (a small approximation).
 * Shear centre and warping constant from the thin-walled mid-line model (b' = b - t_w/2, h' = h - t_f):
 *   e_M = 3 b'^2 t_f / (6 b' t_f + h' t_w),  I_w = t_f b'^3 h'^2 (3 b' t_f + 2 h' t_w) / (12 (6 b' t_f + h' t_w)).
 */
export function channelProperties(d: ChannelDimensions): ChannelProperties {
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = d;
  for (const [name, value] of Object.entries(d)) {
    if (!Number.isFinite(value) || value < 0 || (name !== 'rootRadius' && value === 0)) {
      throw new SteelError('INVALID_DIMENSIONS', `Channel ${name} must be a positive length in metres; got ${value}.`, name);
    }
  }
  if (h - 2 * tf - 2 * r <= 0 || tw + r >= b) throw new SteelError('INVALID_DIMENSIONS', 'Channel dimensions leave no straight web or no flange outstand.', 'depth');
  const fillet = filletGeometry(r);
  const e = fillet.centroidOffset;
  const flangeLength = b - tw;
  const webArea = h * tw;
  const flangeArea = flangeLength * tf;
  const area = webArea + 2 * flangeArea + 2 * fillet.area;
  const yc = (webArea * (tw / 2) + 2 * flangeArea * ((b + tw) / 2) + 2 * fillet.area * (tw + e)) / area;
  const filletLeverZ = h / 2 - tf - e;
  const Iy = (tw * h ** 3) / 12 + 2 * ((flangeLength * tf ** 3) / 12 + flangeArea * ((h - tf) / 2) ** 2) + 2 * (fillet.ownSecondMoment + fillet.area * filletLeverZ ** 2);
  const Iz =
    (h * tw ** 3) / 12 +
    webArea * (tw / 2 - yc) ** 2 +
    2 * ((tf * flangeLength ** 3) / 12 + flangeArea * ((b + tw) / 2 - yc) ** 2) +
    2 * (fillet.ownSecondMoment + fillet.area * (tw + e - yc) ** 2);
  const plasticModulusY = (tw * h * h) / 4 + flangeArea * (h - tf) + 2 * fillet.area * filletLeverZ;
  // Equal-area axis y_p, then W_pl,z = sum |y - y_p| dA.
  let yp: number;
  if (webArea >= area / 2) yp = area / (2 * h);
  else {
    const filletLeft = tw + e;
    yp = tw + (area / 2 - webArea) / (2 * tf);
    if (yp > filletLeft) yp = tw + (area / 2 - webArea - 2 * fillet.area) / (2 * tf);
  }
  const webPart = yp >= tw ? webArea * (yp - tw / 2) : h * (yp ** 2 / 2 + (tw - yp) ** 2 / 2);
  const flangePart = yp >= tw ? 2 * tf * ((yp - tw) ** 2 / 2 + (b - yp) ** 2 / 2) : 2 * flangeArea * ((b + tw) / 2 - yp);
  const plasticModulusZ = webPart + flangePart + 2 * fillet.area * Math.abs(tw + e - yp);
  const bm = b - tw / 2;
  const hm = h - tf;
  const eM = (3 * bm ** 2 * tf) / (6 * bm * tf + hm * tw);
  const warpingConstant = (tf * bm ** 3 * hm ** 2 * (3 * bm * tf + 2 * hm * tw)) / (12 * (6 * bm * tf + hm * tw));
  return {
    area,
    secondMomentOfAreaY: Iy,
    secondMomentOfAreaZ: Iz,
    elasticModulusY: Iy / (h / 2),
    elasticModulusZ: Iz / (b - yc),
    plasticModulusY,
    plasticModulusZ,
    torsionConstant: (2 / 3) * (b - 0.63 * tf) * tf ** 3 + (1 / 3) * (h - 2 * tf) * tw ** 3,
    warpingConstant,
    centroidFromWebBack: yc,
    shearCentreFromWebCentre: eM,
    shearCentreFromCentroid: yc - tw / 2 + eM,
    shearAreaZ: area - 2 * b * tf + (tw + r) * tf,
    massPerMetre: steelDensity * area,
  };
}

let cachedChannels: readonly ChannelSection[] | undefined;

/** The UPE channels shipped with the package (secondary members), lightest first. */
export function loadChannels(): ChannelSection[] {
  if (!cachedChannels) {
    const parsed = channelFile.safeParse(channelTable);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const path = issue ? issue.path.join('.') : '';
      throw new SteelError('INVALID_SECTION_TABLE', `The channel table is invalid at "${path}": ${issue?.message ?? 'unknown problem'}.`, path);
    }
    cachedChannels = Object.freeze(
      parsed.data.sections.map((row) => {
        const dimensions: ChannelDimensions = Object.freeze({
          depth: row.depthMm * 1e-3,
          flangeWidth: row.flangeWidthMm * 1e-3,
          webThickness: row.webThicknessMm * 1e-3,
          flangeThickness: row.flangeThicknessMm * 1e-3,
          rootRadius: row.rootRadiusMm * 1e-3,
        });
        return Object.freeze({ designation: row.designation, series: 'UPE' as const, role: 'secondary' as const, dimensions, properties: Object.freeze(channelProperties(dimensions)), source: row.source });
      }),
    );
  }
  return [...cachedChannels];
}

/** A channel by designation ("UPE 200"); spacing and case are ignored. */
export function channelSection(designation: string): ChannelSection {
  const wanted = designation.toUpperCase().replace(/\s+/g, '');
  const found = loadChannels().find((c) => c.designation.replace(/\s+/g, '') === wanted);
  if (!found) throw new SteelError('UNKNOWN_SECTION', `Channel "${designation}" is not in the channel table (UPE 80 to UPE 400).`, 'section');
  return found;
}

function ratio(effect: number, resistance: number): number {
  if (effect === 0) return 0;
  return resistance > 0 ? effect / resistance : Number.POSITIVE_INFINITY;
}

/**
 * Restricted cross-section check of a channel used as a secondary member, EN 1993-1-1 6.2:
 * axial (6.2.3/6.2.4), shear parallel to the web (6.2.6, A_v of 6.2.6(3)c) and the linear
 * interaction N/N_Rd + M_y/M_y,Rd + M_z/M_z,Rd <= 1 (6.2.1(7)), with plastic moduli for class 1-2 and
 * elastic for class 3 (Table 5.2: outstand c = b - t_w - r, limits 9/10/14 eps; web c = h - 2 t_f - 2 r,
 * bending 72/83/124 eps, compression 33/38/42 eps). Assumes loads through the shear centre: no torsion
 * and no lateral-torsional buckling checks (the note says so). Class 4 is out of scope.
 */
export function checkChannelSecondaryMember(channel: ChannelSection, grade: SteelGrade, forces: { N: number; Vz: number; My: number; Mz: number }): CheckResult[] {
  for (const [name, value] of Object.entries(forces)) {
    if (!Number.isFinite(value)) throw new SteelError('INVALID_FORCES', `Internal force ${name} must be a finite number in SI units; got ${value}.`, name);
  }
  const { depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = channel.dimensions;
  const p = channel.properties;
  const fy = strengthsForThickness(grade, Math.max(tw, tf)).yieldStrength;
  const eps = Math.sqrt(235e6 / fy);
  const f = fy / grade.gammaM0;
  const classOf = (ct: number, l1: number, l2: number, l3: number): number => (ct <= l1 * eps ? 1 : ct <= l2 * eps ? 2 : ct <= l3 * eps ? 3 : 4);
  const flangeClass = classOf((b - tw - r) / tf, 9, 10, 14);
  const webCt = (h - 2 * tf - 2 * r) / tw;
  const webClass = forces.N < 0 ? classOf(webCt, 33, 38, 42) : classOf(webCt, 72, 83, 124);
  const sectionClass = Math.max(flangeClass, webClass);
  const plastic = sectionClass <= 2;
  const NRd = p.area * f;
  const MyRd = (plastic ? p.plasticModulusY : p.elasticModulusY) * f;
  const MzRd = (plastic ? p.plasticModulusZ : p.elasticModulusZ) * f;
  const VRd = (p.shearAreaZ * f) / Math.sqrt(3);
  const note = 'secondary member: loads assumed through the shear centre; no torsion or lateral-torsional buckling checks';
  const scope = sectionClass === 4 ? `${channel.designation} is class 4 (EN 1993-1-1 Table 5.2); effective properties are outside the scope of these checks.` : undefined;
  const withScope = (result: CheckResult): CheckResult => (scope && result.utilisation > 0 ? { ...result, utilisation: Number.POSITIVE_INFINITY, outOfScope: scope } : result);
  const terms = { axial: ratio(Math.abs(forces.N), NRd), y: ratio(Math.abs(forces.My), MyRd), z: ratio(Math.abs(forces.Mz), MzRd) };
  return [
    withScope({
      id: 'channel-axial',
      title: 'Channel: axial force',
      clause: forces.N >= 0 ? 'EN 1993-1-1 6.2.3' : 'EN 1993-1-1 6.2.4',
      utilisation: terms.axial,
      inputs: { N: forces.N, A: p.area, f_y: fy, gamma_M0: grade.gammaM0 },
      intermediate: { N_Rd: NRd, sectionClass },
      notes: [note],
    }),
    {
      id: 'channel-shear-z',
      title: 'Channel: shear parallel to the web',
      clause: 'EN 1993-1-1 6.2.6',
      utilisation: ratio(Math.abs(forces.Vz), VRd),
      inputs: { Vz: forces.Vz, A_v: p.shearAreaZ, f_y: fy, gamma_M0: grade.gammaM0 },
      intermediate: { V_pl_Rd: VRd },
      notes: [note],
    },
    withScope({
      id: 'channel-interaction',
      title: 'Channel: axial force and biaxial bending (linear interaction)',
      clause: 'EN 1993-1-1 6.2.1(7)',
      utilisation: terms.axial + terms.y + terms.z,
      inputs: { N: forces.N, My: forces.My, Mz: forces.Mz, f_y: fy, gamma_M0: grade.gammaM0 },
      intermediate: { sectionClass, N_Rd: NRd, M_y_Rd: MyRd, M_z_Rd: MzRd, axialTerm: terms.axial, bendingYTerm: terms.y, bendingZTerm: terms.z },
      notes: [note],
    }),
  ];
}
