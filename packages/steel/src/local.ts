import type { ClassifiableSection } from './classification.js';
import type { CheckResult } from './checks.js';
import { SteelError } from './errors.js';
import { strengthsForThickness } from './grades.js';
import type { SteelGrade } from './grades.js';

function positive(name: string, value: number): number {
  if (!Number.isFinite(value) || value <= 0) throw new SteelError('INVALID_OPTIONS', `${name} must be a positive number in SI units; got ${value}.`, name);
  return value;
}

function nonNegative(name: string, value: number): number {
  if (!Number.isFinite(value) || value < 0) throw new SteelError('INVALID_FORCES', `${name} must be zero or a positive number in SI units; got ${value}.`, name);
  return value;
}

function ratio(effect: number, resistance: number): number {
  if (effect === 0) return 0;
  return resistance > 0 ? effect / resistance : Number.POSITIVE_INFINITY;
}

/** How a transverse force enters the web, EN 1993-1-5 Figure 6.1. */
export type PatchLoadType = 'a' | 'b' | 'c';

export interface PatchLoadingInput {
  /** F_Ed, the transverse force on the flange [N] (magnitude) */
  force: number;
  /** s_s, stiff bearing length along the girder [m] (EN 1993-1-5 6.3) */
  stiffBearingLength: number;
  /**
   * 'a' (default): force through one flange, resisted by web shear; 'b': applied to one flange and
   * carried through the web straight to the other (e.g. a column directly below a point load);
   * 'c': near an unstiffened end, resisted by web shear.
   */
  type?: PatchLoadType;
  /** a, spacing of transverse stiffeners [m]; omitted for an unstiffened web (h_w/a taken as 0, no cap on l_y) */
  stiffenerSpacing?: number;
  /** c, distance from the end of the stiff bearing to the member end [m] (type c only) */
  endDistance?: number;
}

/**
 * Resistance of the web to a transverse force (patch loading), EN 1993-1-5 section 6 (REFERENCES section 6):
 *   k_F = 6 + 2 (h_w/a)^2 (type a), 3.5 + 2 (h_w/a)^2 (type b), 2 + 6 (s_s + c)/h_w <= 6 (type c);
 *   F_cr = 0.9 k_F E t_w^3 / h_w;
 *   m1 = f_yf b_f / (f_yw t_w), m2 = 0.02 (h_w/t_f)^2 if lambda_F > 0.5, else 0;
 *   types a, b: l_y = s_s + 2 t_f (1 + sqrt(m1 + m2)) <= a;
 *   type c: l_e = k_F E t_w^2 / (2 f_yw h_w) <= s_s + c,
 *           l_y = min(l_e + t_f sqrt(m1/2 + (l_e/t_f)^2 + m2), l_e + t_f sqrt(m1 + m2));
 *   lambda_F = sqrt(l_y t_w f_yw / F_cr), chi_F = 0.5 / lambda_F <= 1, L_eff = chi_F l_y,
 *   F_Rd = f_yw L_eff t_w / gamma_M1; check eta_2 = F_Ed / F_Rd <= 1 (6.6).
 * h_w is the clear web depth between the flanges (h - 2 t_f). m2 is first taken as for lambda_F > 0.5
 * and dropped when the resulting lambda_F is 0.5 or less (common practice). Equal flange and web
 * yield strength (one grade; for rolled sections the flange thickness decides). A utilisation above 1
 * adds the note "web stiffener needed".
 */
export function checkPatchLoading(section: ClassifiableSection, grade: SteelGrade, input: PatchLoadingInput): CheckResult {
  const force = nonNegative('force', Math.abs(input.force));
  const ss = nonNegative('stiffBearingLength', input.stiffBearingLength);
  const type = input.type ?? 'a';
  const { depth: h, flangeWidth: bf, webThickness: tw, flangeThickness: tf } = section.dimensions;
  const hw = h - 2 * tf;
  const a = input.stiffenerSpacing === undefined ? Number.POSITIVE_INFINITY : positive('stiffenerSpacing', input.stiffenerSpacing);
  const c = input.endDistance ?? 0;
  if (type === 'c') nonNegative('endDistance', c);
  const E = grade.youngsModulus;
  const fyw = strengthsForThickness(grade, tw).yieldStrength;
  const fyf = strengthsForThickness(grade, tf).yieldStrength;
  const hwOverA = Number.isFinite(a) ? hw / a : 0;
  const kF = type === 'a' ? 6 + 2 * hwOverA ** 2 : type === 'b' ? 3.5 + 2 * hwOverA ** 2 : Math.min(6, 2 + (6 * (ss + c)) / hw);
  const Fcr = (0.9 * kF * E * tw ** 3) / hw;
  const m1 = (fyf * bf) / (fyw * tw);
  const effectiveLoadedLength = (m2: number): number => {
    if (type === 'c') {
      const le = Math.min((kF * E * tw ** 2) / (2 * fyw * hw), ss + c);
      return Math.min(le + tf * Math.sqrt(m1 / 2 + (le / tf) ** 2 + m2), le + tf * Math.sqrt(m1 + m2));
    }
    return Math.min(a, ss + 2 * tf * (1 + Math.sqrt(m1 + m2)));
  };
  let m2 = 0.02 * (hw / tf) ** 2;
  let ly = effectiveLoadedLength(m2);
  let lambdaF = Math.sqrt((ly * tw * fyw) / Fcr);
  if (lambdaF <= 0.5) {
    m2 = 0;
    ly = effectiveLoadedLength(m2);
    lambdaF = Math.sqrt((ly * tw * fyw) / Fcr);
  }
  const chiF = Math.min(1, 0.5 / lambdaF);
  const Leff = chiF * ly;
  const FRd = (fyw * Leff * tw) / grade.gammaM1;
  const utilisation = ratio(force, FRd);
  const result: CheckResult = {
    id: 'patch-loading',
    title: `Web under a transverse force (patch loading, type ${type})`,
    clause: 'EN 1993-1-5 6.2-6.6',
    utilisation,
    inputs: { F_Ed: force, s_s: ss, a: Number.isFinite(a) ? a : 0, ...(type === 'c' ? { c } : {}), h_w: hw, t_w: tw, t_f: tf, b_f: bf, f_yw: fyw, f_yf: fyf, E, gamma_M1: grade.gammaM1 },
    intermediate: { k_F: kF, F_cr: Fcr, m1, m2, l_y: ly, lambda_F: lambdaF, chi_F: chiF, L_eff: Leff, F_Rd: FRd, stiffenerNeeded: utilisation > 1 ? 1 : 0 },
  };
  if (utilisation > 1) result.notes = ['web stiffener needed'];
  return result;
}

export interface FlangeContactInput {
  /** line load on one flange outstand along the girder, e.g. the bearing pressure resultant per metre [N/m] */
  lineLoad: number;
  /** distance of that resultant from the web centre line, across the flange [m] */
  distanceFromWebCentre: number;
}

/**
 * Local bending of a flange outstand under a contact line load (common practice: the outstand as a
 * cantilever from the web root, a yield line along the root):
 *   m_Ed = q e, e = d - (t_w/2 + r) >= 0 (lever from the root to the resultant at d from the web centre),
 *   m_pl,Rd = t_f^2 f_y / (4 gamma_M0) per unit length (plastic moment of a plate strip).
 * Per unit length along the girder; no spread along the girder is assumed, which is conservative for
 * a short bearing. The resultant must lie on the flange (d <= b/2).
 */
/**
 * The lever of a contact line load on a box flange at d from the box centre line: beyond a web's
 * outer face the outstand is a cantilever from that face (lever d - w/2 - t_w/2); between the webs'
 * inner faces the flange is a strip fixed at both, whose plastic collapse under a line load at a and
 * b from the faces (hinges at both faces and under the load; virtual work) is q = 2 m_pl L / (a b),
 * i.e. an equivalent lever a b / (2 L); over a web, 0.
 */
function boxFlangeLever(d: number, tw: number, webCentreDistance: number): number {
  const outer = webCentreDistance / 2 + tw / 2;
  if (d >= outer) return d - outer;
  const inner = webCentreDistance / 2 - tw / 2;
  if (d >= inner || inner <= 0) return 0;
  const a = inner - d;
  const b = inner + d;
  return (a * b) / (2 * (a + b));
}

/** The quantities of checkFlangeLocalBending (shared with flangeLocalBendingUtilisation). */
function flangeLocalBending(section: ClassifiableSection, grade: SteelGrade, input: FlangeContactInput) {
  const q = nonNegative('lineLoad', Math.abs(input.lineLoad));
  const d = nonNegative('distanceFromWebCentre', input.distanceFromWebCentre);
  const { flangeWidth: b, webThickness: tw, flangeThickness: tf, rootRadius: r } = section.dimensions;
  if (d > b / 2 * (1 + 1e-9)) {
    throw new SteelError('INVALID_FORCES', `The contact resultant at ${d} m from the web lies beyond the flange tip (b/2 = ${b / 2} m).`, 'distanceFromWebCentre');
  }
  const lever = section.box ? boxFlangeLever(d, tw, section.box.webCentreDistance) : Math.max(0, d - (tw / 2 + r));
  const fy = strengthsForThickness(grade, tf).yieldStrength;
  const mEd = q * lever;
  const mRd = (tf ** 2 * fy) / (4 * grade.gammaM0);
  return { q, d, b, tw, tf, r, lever, fy, mEd, mRd };
}

/** The utilisation of checkFlangeLocalBending alone, without its report (for scanning many bearing points). */
export function flangeLocalBendingUtilisation(section: ClassifiableSection, grade: SteelGrade, input: FlangeContactInput): number {
  const { mEd, mRd } = flangeLocalBending(section, grade, input);
  return ratio(mEd, mRd);
}

export function checkFlangeLocalBending(section: ClassifiableSection, grade: SteelGrade, input: FlangeContactInput): CheckResult {
  const { q, d, b, tw, tf, r, lever, fy, mEd, mRd } = flangeLocalBending(section, grade, input);
  return {
    id: 'flange-local-bending',
    title: section.box ? 'Local bending of the box flange under contact (outstand cantilever, or strip fixed at both webs)' : 'Local bending of the flange outstand under contact (cantilever from the web root)',
    clause: section.box ? 'common practice: yield lines at the web faces (and under the load between the webs), m_pl = t_f^2 f_y / 4' : 'common practice: yield line at the web root, m_pl = t_f^2 f_y / 4',
    utilisation: ratio(mEd, mRd),
    inputs: { q, d, t_f: tf, t_w: tw, r, b, f_y: fy, gamma_M0: grade.gammaM0 },
    intermediate: { e: lever, m_Ed: mEd, m_pl_Rd: mRd },
  };
}

export interface ConcreteBearingInput {
  /** F_Ed, the compression on the bearing plate [N] */
  force: number;
  /** A_c0, loaded area (bearing plate) [m2] */
  loadedArea: number;
  /** A_c1, largest design distribution area similar in shape to A_c0 (EN 1992-1-1 Figure 6.29) [m2]; default A_c0 */
  distributionArea?: number;
  /** f_ck [Pa] */
  characteristicStrength: number;
  /** alpha_cc (recommended 1.0, EN 1992-1-1 3.1.6(1)) */
  alphaCc?: number;
  /** gamma_c (recommended 1.5, EN 1992-1-1 Table 2.1N) */
  gammaC?: number;
}

/**
 * Concrete under a bearing plate, EN 1992-1-1 6.7(2): F_Rdu = A_c0 f_cd sqrt(A_c1/A_c0) <= 3.0 f_cd A_c0,
 * f_cd = alpha_cc f_ck / gamma_c (3.1.6). Assumes uniform pressure on A_c0 and that the geometry
 * conditions of Figure 6.29 hold for the A_c1 given (the caller's responsibility).
 */
export function checkConcreteBearing(input: ConcreteBearingInput): CheckResult {
  const F = nonNegative('force', Math.abs(input.force));
  const Ac0 = positive('loadedArea', input.loadedArea);
  const Ac1 = positive('distributionArea', input.distributionArea ?? Ac0);
  if (Ac1 < Ac0 * (1 - 1e-12)) throw new SteelError('INVALID_OPTIONS', `distributionArea A_c1 = ${Ac1} m2 must not be smaller than the loaded area A_c0 = ${Ac0} m2.`, 'distributionArea');
  const fck = positive('characteristicStrength', input.characteristicStrength);
  const alphaCc = positive('alphaCc', input.alphaCc ?? 1.0);
  const gammaC = positive('gammaC', input.gammaC ?? 1.5);
  const fcd = (alphaCc * fck) / gammaC;
  const spread = Ac0 * fcd * Math.sqrt(Ac1 / Ac0);
  const cap = 3.0 * fcd * Ac0;
  const FRdu = Math.min(spread, cap);
  return {
    id: 'concrete-bearing',
    title: 'Concrete bearing under the bearing plate (partially loaded area)',
    clause: 'EN 1992-1-1 6.7',
    utilisation: ratio(F, FRdu),
    inputs: { F_Ed: F, A_c0: Ac0, A_c1: Ac1, f_ck: fck, alpha_cc: alphaCc, gamma_c: gammaC },
    intermediate: { f_cd: fcd, 'A_c0 f_cd sqrt(A_c1/A_c0)': spread, '3.0 f_cd A_c0': cap, F_Rdu: FRdu },
  };
}

/**
 * Anchor in tension: the design tension per anchor against a design resistance per anchor that the
 * user supplies (resistance per EN 1992-4, supplied by the user; no failure modes are computed here).
 */
export function checkAnchorTension(input: { tensionPerAnchor: number; resistancePerAnchor: number }): CheckResult {
  const N = input.tensionPerAnchor;
  if (!Number.isFinite(N)) throw new SteelError('INVALID_FORCES', `tensionPerAnchor must be a finite number in newtons; got ${N}.`, 'tensionPerAnchor');
  const NRd = positive('resistancePerAnchor', input.resistancePerAnchor);
  const tension = Math.max(0, N);
  return {
    id: 'anchor-tension',
    title: 'Anchor in tension',
    clause: 'resistance per EN 1992-4, supplied by the user',
    utilisation: ratio(tension, NRd),
    inputs: { N_Ed: N, N_Rd: NRd },
    intermediate: { tension },
  };
}

/**
 * Deflection limit (serviceability): |delta| <= span / limit. The default span/500 for the support
 * girder of a bin is common practice (no EN 1993 requirement; EN 1993-1-1 7.2 leaves limits to the
 * project).
 */
export function checkDeflection(input: { deflection: number; span: number; limitRatio?: number }): CheckResult {
  const delta = input.deflection;
  if (!Number.isFinite(delta)) throw new SteelError('INVALID_FORCES', `deflection must be a finite length in metres; got ${delta}.`, 'deflection');
  const span = positive('span', input.span);
  const limitRatio = positive('limitRatio', input.limitRatio ?? 500);
  const allowed = span / limitRatio;
  return {
    id: 'deflection',
    title: `Deflection limit span/${limitRatio}`,
    clause: 'EN 1993-1-1 7.2 (limit by common practice)',
    utilisation: ratio(Math.abs(delta), allowed),
    inputs: { delta, L: span, limitRatio },
    intermediate: { delta_max: allowed },
  };
}

/**
 * Twist limit (serviceability): |phi| <= phi_max, default 0.01 rad (common practice, user-set; it keeps
 * the hopper junction and the bearings from seeing large rotations).
 */
export function checkTwist(input: { twist: number; limit?: number }): CheckResult {
  const phi = input.twist;
  if (!Number.isFinite(phi)) throw new SteelError('INVALID_FORCES', `twist must be a finite angle in radians; got ${phi}.`, 'twist');
  const limit = positive('limit', input.limit ?? 0.01);
  return {
    id: 'twist',
    title: 'Twist limit',
    clause: 'serviceability limit by common practice',
    utilisation: ratio(Math.abs(phi), limit),
    inputs: { phi, phi_max: limit },
    intermediate: {},
  };
}

/** A pair of bearing stiffeners, one each side of the web, over a support (fitted to the loaded flange). */
export interface BearingStiffenerPair {
  /** b_s, width of each stiffener plate from the web face [m] */
  width: number;
  /** t_s, thickness of each stiffener plate [m] */
  thickness: number;
  /** c, corner chamfer (cope) at the web-flange fillet, not in bearing [m] */
  chamfer: number;
}

export interface BearingStiffenerForces {
  /** Reaction on the side of one stiffener (e.g. inside the ring) [N], compression positive */
  sideA: number;
  /** Reaction on the side of the other stiffener [N], compression positive */
  sideB: number;
}

/** The effective cruciform of a stiffener pair with its web strip, EN 1993-1-5 9.1(2) and Figure 9.1. */
export function bearingStiffenerSection(section: ClassifiableSection, grade: SteelGrade, stiffener: BearingStiffenerPair) {
  const bs = positive('width', stiffener.width);
  const ts = positive('thickness', stiffener.thickness);
  const c = nonNegative('chamfer', stiffener.chamfer);
  if (c >= bs) throw new SteelError('INVALID_OPTIONS', `The stiffener chamfer (${c} m) must be smaller than its width (${bs} m).`, 'chamfer');
  const { webThickness: tw, depth: h, flangeThickness: tf } = section.dimensions;
  const fy = Math.min(strengthsForThickness(grade, ts).yieldStrength, strengthsForThickness(grade, tw).yieldStrength);
  const epsilon = Math.sqrt(235e6 / fy);
  // Web strip of 15 eps t_w each side of the stiffener pair acts with it (EN 1993-1-5 9.1(2)).
  const webStrip = 30 * epsilon * tw + ts;
  const area = 2 * bs * ts + webStrip * tw;
  // Second moment about the web's mid-plane (buckling out of the plane of the web).
  const secondMoment = (ts * (2 * bs + tw) ** 3) / 12 + ((webStrip - ts) * tw ** 3) / 12;
  const webDepth = h - 2 * tf;
  return { bs, ts, c, tw, fy, epsilon, webStrip, area, secondMoment, webDepth };
}

/**
 * Bearing stiffeners over a support, a pair welded each side of the web and fitted to the loaded
 * flange. Two checks:
 *  - 'stiffener-bearing': the fitted end of each stiffener in bearing, F_side <= (b_s - c) t_s f_y / gamma_M0
 *    (common practice; the web's own share of the bearing is neglected, which is conservative);
 *  - 'stiffener-buckling': the cruciform of the pair and a web strip of 15 eps t_w each side (EN 1993-1-5
 *    9.1(2)) as a strut out of the web's plane, buckling length 0.75 h_w with both flanges held laterally
 *    and curve c (EN 1993-1-5 9.4(2), from memory), chi by EN 1993-1-1 6.3.1.2; an unequal reaction of the
 *    two sides adds the moment (F_A - F_B) (t_w + b_s)/2, taken with a linear interaction N/N_b,Rd + M/M_el,Rd
 *    (common practice, conservative).
 */
export function checkBearingStiffeners(section: ClassifiableSection, grade: SteelGrade, stiffener: BearingStiffenerPair, forces: BearingStiffenerForces): CheckResult[] {
  // A pair wider than the flange outstand, or with no bearing width past its chamfer, does not fit:
  // both checks are out of scope (utilisation Infinity) with the reason, rather than an error.
  const outstand = (section.dimensions.flangeWidth - section.dimensions.webThickness) / 2;
  if (stiffener.width > outstand * (1 + 1e-9) || stiffener.width <= stiffener.chamfer) {
    const outOfScope = `a bearing stiffener ${(stiffener.width * 1000).toFixed(0)} mm wide with a ${(stiffener.chamfer * 1000).toFixed(0)} mm chamfer does not fit the flange outstand of ${(outstand * 1000).toFixed(0)} mm`;
    const unfit = (id: string, title: string, clause: string): CheckResult => ({ id, title, clause, utilisation: Number.POSITIVE_INFINITY, inputs: { b_s: stiffener.width, c: stiffener.chamfer, outstand }, intermediate: {}, outOfScope });
    return [
      unfit('stiffener-bearing', 'Bearing stiffener: fitted end in bearing (each side)', 'EN 1993-1-5 9.1; fitted end in bearing (common practice)'),
      unfit('stiffener-buckling', 'Bearing stiffener: strut out of the plane of the web, with the eccentricity of unequal sides', 'EN 1993-1-5 9.1(2), 9.4(2) (from memory); EN 1993-1-1 6.3.1.2 curve c'),
    ];
  }
  const s = bearingStiffenerSection(section, grade, stiffener);
  const sideA = Math.max(0, nonNegativeOrZero(forces.sideA));
  const sideB = Math.max(0, nonNegativeOrZero(forces.sideB));
  const bearingArea = (s.bs - s.c) * s.ts;
  const bearingResistance = (bearingArea * s.fy) / grade.gammaM0;
  const larger = Math.max(sideA, sideB);
  const bearing: CheckResult = {
    id: 'stiffener-bearing',
    title: 'Bearing stiffener: fitted end in bearing (each side)',
    clause: 'EN 1993-1-5 9.1; fitted end in bearing (common practice)',
    utilisation: ratio(larger, bearingResistance),
    inputs: { F_A: sideA, F_B: sideB, b_s: s.bs, t_s: s.ts, c: s.c, f_y: s.fy, gamma_M0: grade.gammaM0 },
    intermediate: { A_bearing: bearingArea, F_Rd: bearingResistance },
  };
  const total = sideA + sideB;
  const length = 0.75 * s.webDepth;
  const radius = Math.sqrt(s.secondMoment / s.area);
  const slenderness = length / radius / (93.9 * s.epsilon);
  const alpha = 0.49;
  const phi = 0.5 * (1 + alpha * (slenderness - 0.2) + slenderness ** 2);
  const chi = slenderness <= 0.2 ? 1 : Math.min(1, 1 / (phi + Math.sqrt(phi ** 2 - slenderness ** 2)));
  const gammaM1 = grade.gammaM1;
  const axialResistance = (chi * s.area * s.fy) / gammaM1;
  const lever = (s.tw + s.bs) / 2;
  const moment = Math.abs(sideA - sideB) * lever;
  const momentResistance = ((s.secondMoment / (s.bs + s.tw / 2)) * s.fy) / gammaM1;
  const buckling: CheckResult = {
    id: 'stiffener-buckling',
    title: 'Bearing stiffener: strut out of the plane of the web, with the eccentricity of unequal sides',
    clause: 'EN 1993-1-5 9.1(2), 9.4(2) (from memory); EN 1993-1-1 6.3.1.2 curve c',
    utilisation: ratio(total, axialResistance) + ratio(moment, momentResistance),
    inputs: { F_A: sideA, F_B: sideB, b_s: s.bs, t_s: s.ts, t_w: s.tw, h_w: s.webDepth, f_y: s.fy, gamma_M1: gammaM1 },
    intermediate: { eps: s.epsilon, A_eff: s.area, I: s.secondMoment, l: length, i: radius, lambda_bar: slenderness, chi, N_b_Rd: axialResistance, M_Ed: moment, M_el_Rd: momentResistance },
  };
  return [bearing, buckling];
}

function nonNegativeOrZero(value: number): number {
  if (!Number.isFinite(value)) throw new SteelError('INVALID_FORCES', `A stiffener force must be a finite number in N; got ${value}.`, 'forces');
  return value;
}
