import { SteelError } from './errors.js';
import type { CheckResult } from './checks.js';

/**
 * Bolts in tension and the bolted flange as an equivalent T-stub (EN 1993-1-8 3.6.1 Table 3.4 and
 * 6.2.4 Table 6.2), for the bolts that hold a girder's bottom flange down on a column cap plate.
 */

/** Tensile stress area A_s, mm2 (ISO 898-1, coarse thread; from memory, the common tabulated values). */
const tensileStressAreaMm2: Record<BoltSize, number> = { M12: 84.3, M16: 157, M20: 245, M22: 303, M24: 353, M27: 459, M30: 561, M36: 817 };
/** Width across flats of the nut s, mm (ISO 4032; from memory). */
const nutAcrossFlatsMm: Record<BoltSize, number> = { M12: 18, M16: 24, M20: 30, M22: 34, M24: 36, M27: 41, M30: 46, M36: 55 };
/** Hole clearance d_0 - d, mm (EN 1090-2 normal round holes: 1 mm to M14, 2 mm to M24, 3 mm above; from memory). */
const holeClearanceMm = (diameterMm: number): number => (diameterMm <= 14 ? 1 : diameterMm <= 24 ? 2 : 3);
/** Nominal f_yb / f_ub of the bolt classes, Pa (EN 1993-1-8 Table 3.1). */
const boltStrengths: Record<BoltClass, { fyb: number; fub: number }> = {
  '4.6': { fyb: 240e6, fub: 400e6 },
  '5.6': { fyb: 300e6, fub: 500e6 },
  '8.8': { fyb: 640e6, fub: 800e6 },
  '10.9': { fyb: 900e6, fub: 1000e6 },
};

export type BoltSize = 'M12' | 'M16' | 'M20' | 'M22' | 'M24' | 'M27' | 'M30' | 'M36';
export type BoltClass = '4.6' | '5.6' | '8.8' | '10.9';

export interface Bolt {
  size: BoltSize;
  boltClass: BoltClass;
}

/** Geometry of a bolt: nominal diameter d, hole d_0, tensile stress area A_s, mean of nut flats and corners d_m (m, m2). */
export function boltGeometry(bolt: Bolt): { diameter: number; holeDiameter: number; tensileStressArea: number; meanNutDiameter: number; fyb: number; fub: number } {
  const area = tensileStressAreaMm2[bolt.size];
  const flats = nutAcrossFlatsMm[bolt.size];
  const strengths = boltStrengths[bolt.boltClass];
  if (area === undefined || flats === undefined) throw new SteelError('INVALID_OPTIONS', `bolt size must be one of ${Object.keys(tensileStressAreaMm2).join(', ')}; got ${String(bolt.size)}.`, 'size');
  if (strengths === undefined) throw new SteelError('INVALID_OPTIONS', `bolt class must be one of ${Object.keys(boltStrengths).join(', ')}; got ${String(bolt.boltClass)}.`, 'boltClass');
  const d = Number(bolt.size.slice(1));
  // d_m: mean of the width across flats and across corners (s / cos 30 deg), EN 1993-1-8 Table 3.4.
  const meanNut = (flats + flats / Math.cos(Math.PI / 6)) / 2;
  return { diameter: d * 1e-3, holeDiameter: (d + holeClearanceMm(d)) * 1e-3, tensileStressArea: area * 1e-6, meanNutDiameter: meanNut * 1e-3, ...strengths };
}

export interface BoltedFlangeInput {
  bolt: Bolt;
  /** bolts on this side of the web, in one line along the girder */
  bolts: number;
  /** design tension taken by this side's bolts together, N */
  tension: number;
  /** distance of the bolt line from the web centre line, m */
  gauge: number;
  /** length of the cap plate along the girder, m (the bolts are spaced evenly along it) */
  capLength: number;
  flangeWidth: number;
  flangeThickness: number;
  webThickness: number;
  /** root radius (rolled) or 0 (welded: the weld is ignored, which is conservative) */
  rootRadius: number;
  /** distance between the web centre lines of a box girder, m; 0 or absent for an I (one web on the centre line) */
  webCentreDistance?: number;
  /** yield and ultimate strength of the flange, Pa */
  flangeYieldStrength: number;
  flangeUltimateStrength: number;
  gammaM0?: number;
  gammaM2?: number;
}

/**
 * One side of a bolted bottom flange pulled off its cap plate: the flange and its bolts as an
 * equivalent T-stub whose stem is the web (EN 1993-1-8 6.2.4, Table 6.2, no backing plates, prying
 * assumed to develop). Per bolt: F_t,Rd = k2 f_ub A_s / gamma_M2 with k2 = 0.9 (Table 3.4) and the
 * punching shear through the flange B_p,Rd = 0.6 pi d_m t_f f_u / gamma_M2; the bolt row's design
 * value is the lesser. Geometry (Figure 6.2): m = g - t_w/2 - 0.8 r, e = b/2 - g, n = min(e, 1.25 m).
 * Effective lengths as for an unstiffened column flange (Table 6.4, from memory): per bolt circular
 * 2 pi m and non-circular 4 m + 1.25 e; for a group of n_b bolts at pitch p the end bolts give
 * pi m + p and 2 m + 0.625 e + p/2 and the inner ones 2 p and p, so the group totals are
 * 2 pi m + 2 (n_b - 1) p and 4 m + 1.25 e + (n_b - 1) p. sum l_eff,1 = min(circular, non-circular)
 * of the individual and group patterns; sum l_eff,2 = the non-circular. Modes (Table 6.2):
 * F_T,1 = 4 M_pl,1 / m, F_T,2 = (2 M_pl,2 + n sum B_t) / (m + n), F_T,3 = sum B_t, with
 * M_pl = 0.25 sum l_eff t_f^2 f_y / gamma_M0. Edge and end distances (Table 3.3): e, e_1 >= 1.2 d_0,
 * p >= 2.2 d_0, and the bolt must clear the web fillet (m >= d): otherwise out of scope.
 */
export function checkBoltedFlangeTension(input: BoltedFlangeInput): CheckResult {
  const gammaM0 = input.gammaM0 ?? 1.0;
  const gammaM2 = input.gammaM2 ?? 1.25;
  const { bolts: nb, tension, gauge: g, capLength, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r } = input;
  for (const [name, value] of Object.entries({ tension, gauge: g, capLength, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r, flangeYieldStrength: input.flangeYieldStrength, flangeUltimateStrength: input.flangeUltimateStrength })) {
    if (!Number.isFinite(value) || value < 0) throw new SteelError('INVALID_OPTIONS', `${name} must be a finite non-negative number in SI units; got ${value}.`, name);
  }
  if (!Number.isInteger(nb) || nb < 1) throw new SteelError('INVALID_OPTIONS', `bolts must be a whole number of at least 1; got ${nb}.`, 'bolts');
  const geometry = boltGeometry(input.bolt);
  const { diameter: d, holeDiameter: d0, tensileStressArea: As, meanNutDiameter: dm, fub } = geometry;
  const m = g - tw / 2 - 0.8 * r;
  const e = b / 2 - g;
  const p = capLength / nb;
  const endDistance = p / 2;
  const inputs = { tension, bolts: nb, gauge: g, capLength, flangeWidth: b, flangeThickness: tf, webThickness: tw, rootRadius: r, boltDiameter: d, tensileStressArea: As, fub, fy: input.flangeYieldStrength, fu: input.flangeUltimateStrength };
  const base = { id: 'cap-bolts', title: 'Cap bolts and bolted flange in tension (T-stub)', clause: 'EN 1993-1-8 3.6.1 Table 3.4, 6.2.4 Table 6.2', inputs };
  const geometryProblem =
    (input.webCentreDistance ?? 0) > 0 ? 'a box girder has no web on its centre line, so the T-stub with the web as its stem does not apply (cap bolts on a box are not covered)'
    : m < d ? `the bolt line (gauge ${(g * 1e3).toFixed(0)} mm) leaves m = ${(m * 1e3).toFixed(1)} mm to the web fillet, less than the bolt diameter ${(d * 1e3).toFixed(0)} mm`
    : e < 1.2 * d0 ? `the edge distance e = ${(e * 1e3).toFixed(1)} mm is below 1.2 d_0 = ${(1.2 * d0 * 1e3).toFixed(1)} mm (EN 1993-1-8 Table 3.3)`
    : nb > 1 && p < 2.2 * d0 ? `the pitch ${(p * 1e3).toFixed(1)} mm of ${nb} bolts along the cap is below 2.2 d_0 = ${(2.2 * d0 * 1e3).toFixed(1)} mm (EN 1993-1-8 Table 3.3)`
    : endDistance < 1.2 * d0 ? `the end distance ${(endDistance * 1e3).toFixed(1)} mm is below 1.2 d_0 = ${(1.2 * d0 * 1e3).toFixed(1)} mm (EN 1993-1-8 Table 3.3)`
    : undefined;
  if (geometryProblem !== undefined) {
    return { ...base, utilisation: Number.POSITIVE_INFINITY, intermediate: { m, e, pitch: p }, outOfScope: `the bolts do not fit this flange: ${geometryProblem}` };
  }
  const tensionResistance = (0.9 * fub * As) / gammaM2;
  const punchingResistance = (0.6 * Math.PI * dm * tf * input.flangeUltimateStrength) / gammaM2;
  const boltRow = Math.min(tensionResistance, punchingResistance);
  const n = Math.min(e, 1.25 * m);
  const individualCircular = nb * 2 * Math.PI * m;
  const individualNonCircular = nb * (4 * m + 1.25 * e);
  const groupCircular = nb > 1 ? 2 * Math.PI * m + 2 * (nb - 1) * p : individualCircular;
  const groupNonCircular = nb > 1 ? 4 * m + 1.25 * e + (nb - 1) * p : individualNonCircular;
  const leff1 = Math.min(individualCircular, individualNonCircular, groupCircular, groupNonCircular);
  const leff2 = Math.min(individualNonCircular, groupNonCircular);
  const plasticMoment = (leff: number) => (0.25 * leff * tf ** 2 * input.flangeYieldStrength) / gammaM0;
  const mode1 = (4 * plasticMoment(leff1)) / m;
  const mode2 = (2 * plasticMoment(leff2) + n * nb * boltRow) / (m + n);
  const mode3 = nb * boltRow;
  const resistance = Math.min(mode1, mode2, mode3);
  const governingMode = resistance === mode1 ? 1 : resistance === mode2 ? 2 : 3;
  return {
    ...base,
    utilisation: tension === 0 ? 0 : tension / resistance,
    intermediate: { m, e, n, pitch: p, holeDiameter: d0, meanNutDiameter: dm, FtRd: tensionResistance, BpRd: punchingResistance, leff1, leff2, FT1Rd: mode1, FT2Rd: mode2, FT3Rd: mode3, FTRd: resistance, governingMode },
    notes: ['the column and its base must hold the same uplift down (not checked here)'],
  };
}
