import { describe, expect, it } from 'vitest';
import { checkAnchorTension, checkBearingStiffeners, checkConcreteBearing, checkDeflection, checkFlangeLocalBending, checkPatchLoading, checkTwist } from './local.js';
import { checkJunctionRingCompression, checkRingInPlaneBuckling } from './junction.js';
import { steelGrade } from './grades.js';
import { rolledSection } from './sections.js';
import { sectionProperties } from './properties.js';
import { weldedBoxSection } from './box.js';

describe('patch loading, EN 1993-1-5 section 6', () => {
  // IPE 300 (EN 10365: h 300, b 150, t_w 7.1, t_f 10.7 mm), S235, unstiffened web, s_s = 50 mm, type a.
  const section = rolledSection('IPE 300');
  const grade = steelGrade('S235');
  const E = 210e9;
  const fy = 235e6;
  const tw = 0.0071;
  const tf = 0.0107;
  const hw = 0.3 - 2 * tf;
  const ss = 0.05;

  it('reproduces the REFERENCES section 6 expressions evaluated by hand', () => {
    const kF = 6; // 6 + 2 (h_w/a)^2 with a -> infinity
    const Fcr = (0.9 * kF * E * tw ** 3) / hw;
    const m1 = (fy * 0.15) / (fy * tw);
    // First try with m2 = 0.02 (h_w/t_f)^2: lambda_F = 0.4755 <= 0.5, so m2 = 0 (by hand).
    const lyWithM2 = ss + 2 * tf * (1 + Math.sqrt(m1 + 0.02 * (hw / tf) ** 2));
    expect(Math.sqrt((lyWithM2 * tw * fy) / Fcr)).toBeLessThan(0.5);
    const ly = ss + 2 * tf * (1 + Math.sqrt(m1));
    const lambdaF = Math.sqrt((ly * tw * fy) / Fcr);
    const chiF = Math.min(1, 0.5 / lambdaF);
    const FRd = fy * chiF * ly * tw;
    expect(FRd / 1e3).toBeCloseTo(283.2, 0); // by hand: l_y = 169.8 mm, chi_F = 1
    const result = checkPatchLoading(section, grade, { force: 200e3, stiffBearingLength: ss });
    expect(result.clause).toBe('EN 1993-1-5 6.2-6.6');
    expect(result.intermediate['k_F']).toBe(6);
    expect(result.intermediate['m2']).toBe(0);
    expect(result.intermediate['F_cr'] ?? 0).toBeCloseTo(Fcr, 6);
    expect(result.intermediate['l_y'] ?? 0).toBeCloseTo(ly, 12);
    expect(result.utilisation).toBeCloseTo(200e3 / FRd, 9);
    expect(result.notes).toBeUndefined();
  });

  it('a slender case keeps m2, reduces by chi_F = 0.5/lambda_F and flags the stiffener', () => {
    // A slender welded web (no fillets): h 1000, b 300, t_w 8, t_f 20 mm, stiffeners at a = 1.0 m, s_s = 20 mm:
    // k_F = 6 + 2 (h_w/a)^2; by hand lambda_F = 1.01 > 0.5, so m2 stays; force twice the resistance.
    const d = { depth: 1.0, flangeWidth: 0.3, webThickness: 0.008, flangeThickness: 0.02, rootRadius: 0 };
    const slender = { dimensions: d, properties: sectionProperties(d) };
    const hw6 = 1.0 - 2 * 0.02;
    const a = 1.0;
    const kF = 6 + 2 * (hw6 / a) ** 2;
    const Fcr = (0.9 * kF * E * 0.008 ** 3) / hw6;
    const m1 = 0.3 / 0.008;
    const m2 = 0.02 * (hw6 / 0.02) ** 2;
    const ly = Math.min(a, 0.02 + 2 * 0.02 * (1 + Math.sqrt(m1 + m2)));
    const lambdaF = Math.sqrt((ly * 0.008 * fy) / Fcr);
    expect(lambdaF).toBeGreaterThan(0.5);
    const FRd = fy * Math.min(1, 0.5 / lambdaF) * ly * 0.008;
    const result = checkPatchLoading(slender, grade, { force: 2 * FRd, stiffBearingLength: 0.02, stiffenerSpacing: a });
    expect(result.intermediate['m2'] ?? 0).toBeCloseTo(m2, 9);
    expect(result.utilisation).toBeCloseTo(2, 9);
    expect(result.notes).toEqual(['web stiffener needed']);
    expect(result.intermediate['stiffenerNeeded']).toBe(1);
  });

  it('IPE 500 S355, type c, s_s = 100 mm, c = 10 mm: m1, m2 and k_F of a published worked example', () => {
    // Steel Buildings in Europe, Multi-storey buildings Part 8, Worked Example 5 "Web resistance", sheet 1
    // (public page; sheet 2 with F_Rd not read): m1 = 200/10.2 = 19.6, m2 = 0.02 (468/16)^2 = 17.11,
    // k_F = 2 + 6 (100 + 10)/468.
    const result = checkPatchLoading(rolledSection('IPE 500'), steelGrade('S355'), { force: 100e3, stiffBearingLength: 0.1, type: 'c', endDistance: 0.01 });
    expect(result.intermediate['m1'] ?? 0).toBeCloseTo(19.6, 1);
    expect(result.intermediate['m2'] ?? 0).toBeCloseTo(17.11, 2);
    expect(result.intermediate['k_F'] ?? 0).toBeCloseTo(2 + (6 * 0.11) / 0.468, 9);
    // Rest by the EN 1993-1-5 expressions (REFERENCES section 6), evaluated here: l_e = k_F E t_w^2 / (2 f_yw h_w)
    // = 0.224 m > s_s + c, so l_e = 0.11 m; l_y = min(l_e + t_f sqrt(m1/2 + (l_e/t_f)^2 + m2), l_e + t_f sqrt(m1 + m2)).
    const m1 = 200 / 10.2;
    const m2 = 0.02 * (468 / 16) ** 2;
    const le = 0.11;
    const ly = Math.min(le + 0.016 * Math.sqrt(m1 / 2 + (le / 0.016) ** 2 + m2), le + 0.016 * Math.sqrt(m1 + m2));
    expect(result.intermediate['l_y'] ?? 0).toBeCloseTo(ly, 9);
    const kF = 2 + (6 * 0.11) / 0.468;
    const lambdaF = Math.sqrt((ly * 0.0102 * 355e6) / ((0.9 * kF * E * 0.0102 ** 3) / 0.468));
    expect(result.intermediate['F_Rd'] ?? 0).toBeCloseTo(355e6 * Math.min(1, 0.5 / lambdaF) * ly * 0.0102, 3);
  });

  it('type b has the lower buckling coefficient 3.5 + 2 (h_w/a)^2 and type c 2 + 6 (s_s + c)/h_w <= 6', () => {
    const b = checkPatchLoading(section, grade, { force: 1, stiffBearingLength: ss, type: 'b' });
    expect(b.intermediate['k_F']).toBe(3.5);
    const c = checkPatchLoading(section, grade, { force: 1, stiffBearingLength: ss, type: 'c', endDistance: 0.01 });
    expect(c.intermediate['k_F'] ?? 0).toBeCloseTo(2 + (6 * 0.06) / hw, 12);
  });
});

describe('flange, concrete, anchors and serviceability', () => {
  it('flange outstand as a cantilever from the web root (common practice), by hand', () => {
    // HE 300 B: t_w 11, t_f 19, r 27 mm. q = 100 kN/m at 120 mm from the web centre: e = 120 - 5.5 - 27 = 87.5 mm,
    // m_Ed = q e = 8.75 kNm/m; m_pl = t_f^2 f_y / 4 = 0.019^2 * 235e6 / 4 = 21.21 kNm/m.
    const result = checkFlangeLocalBending(rolledSection('HE 300 B'), steelGrade('S235'), { lineLoad: 100e3, distanceFromWebCentre: 0.12 });
    expect(result.intermediate['e'] ?? 0).toBeCloseTo(0.0875, 12);
    expect(result.utilisation).toBeCloseTo((100e3 * 0.0875) / ((0.019 ** 2 * 235e6) / 4), 9);
    expect(() => checkFlangeLocalBending(rolledSection('HE 300 B'), steelGrade('S235'), { lineLoad: 1, distanceFromWebCentre: 0.2 })).toThrowError(/beyond the flange tip/);
  });

  it('concrete bearing by EN 1992-1-1 6.7(2) with the 3.0 f_cd A_c0 cap', () => {
    // C30/37: f_cd = 1.0 * 30 / 1.5 = 20 MPa. 300 x 300 plate spread to 600 x 600: F_Rdu = 0.09 * 20e6 * 2 = 3.6 MN.
    const spread = checkConcreteBearing({ force: 1.8e6, loadedArea: 0.09, distributionArea: 0.36, characteristicStrength: 30e6 });
    expect(spread.intermediate['F_Rdu']).toBeCloseTo(0.09 * 20e6 * Math.sqrt(0.36 / 0.09), 3);
    expect(spread.utilisation).toBeCloseTo(0.5, 12);
    // A_c1 = 16 A_c0 would give 4 f_cd A_c0; the cap 3.0 f_cd A_c0 governs.
    const capped = checkConcreteBearing({ force: 1e6, loadedArea: 0.09, distributionArea: 1.44, characteristicStrength: 30e6, alphaCc: 0.85 });
    expect(capped.intermediate['F_Rdu']).toBeCloseTo((3.0 * 0.85 * 30e6 * 0.09) / 1.5, 3);
  });

  it('anchor tension, deflection and twist limits', () => {
    expect(checkAnchorTension({ tensionPerAnchor: 30e3, resistancePerAnchor: 40e3 }).utilisation).toBeCloseTo(0.75, 12);
    expect(checkAnchorTension({ tensionPerAnchor: -5e3, resistancePerAnchor: 40e3 }).utilisation).toBe(0);
    expect(checkAnchorTension({ tensionPerAnchor: 1, resistancePerAnchor: 1 }).clause).toBe('resistance per EN 1992-4, supplied by the user');
    // span/500 (common practice): 6 m -> 12 mm.
    expect(checkDeflection({ deflection: -0.006, span: 6 }).utilisation).toBeCloseTo(0.5, 12);
    expect(checkDeflection({ deflection: 0.006, span: 6, limitRatio: 250 }).utilisation).toBeCloseTo(0.25, 12);
    expect(checkTwist({ twist: 0.005 }).utilisation).toBeCloseTo(0.5, 12);
    expect(() => checkTwist({ twist: 0.005, limit: 0 })).toThrowError(/limit must be a positive number/);
  });
});

describe('transition junction, EN 1993-4-1 (coefficients from memory)', () => {
  // r = 3 m, t_c = 6 mm, t_h = 8 mm, beta = 30 deg, skirt t_s = 6 mm, ring A_r = 100 cm2 (plates <= 40 mm), S235.
  const junction = { radius: 3, cylinderThickness: 0.006, hopperThickness: 0.008, hopperHalfAngle: Math.PI / 6, skirtThickness: 0.006, ringArea: 0.01, ringThickness: 0.02 };
  const grade = steelGrade('S235');

  it('effective lengths l_ec = 0.778 sqrt(r t_c), l_eh = 0.778 sqrt(r t_h / cos beta), plastic 0.975', () => {
    const q = 200e3; // inward radial line load [N/m]
    const result = checkJunctionRingCompression(junction, grade, q);
    const lec = 0.778 * Math.sqrt(3 * 0.006);
    const leh = 0.778 * Math.sqrt((3 * 0.008) / Math.cos(Math.PI / 6));
    expect(result.intermediate['l_ec'] ?? 0).toBeCloseTo(lec, 12);
    expect(result.intermediate['l_eh'] ?? 0).toBeCloseTo(leh, 12);
    expect(result.intermediate['l_es'] ?? 0).toBeCloseTo(lec, 12);
    const AeffPlastic = 0.01 + (0.975 / 0.778) * (lec * 0.006 + leh * 0.008 + lec * 0.006);
    expect(result.intermediate['A_eff_plastic'] ?? 0).toBeCloseTo(AeffPlastic, 12);
    // N = q r = 600 kN against A_eff f_y.
    expect(result.utilisation).toBeCloseTo((q * 3) / (AeffPlastic * 235e6), 9);
    const elastic = checkJunctionRingCompression(junction, grade, q, { method: 'elastic' });
    expect(elastic.utilisation).toBeGreaterThan(result.utilisation);
  });

  it('ring in-plane buckling q_cr = 3 E I / R^3 (Roark; REFERENCES section 2)', () => {
    const I = 8563e-8; // HE 300 B weak axis (REFERENCES section 5)
    const result = checkRingInPlaneBuckling({ radialLineLoad: 50e3, radius: 3, secondMomentOfArea: I }, grade);
    expect(result.intermediate['q_cr'] ?? 0).toBeCloseTo((3 * 210e9 * I) / 27, 3);
    expect(result.utilisation).toBeCloseTo(50e3 / ((3 * 210e9 * I) / 27), 9);
  });
});

describe('bearing stiffeners over a support (EN 1993-1-5 9.1, 9.4), by hand', () => {
  // IPE 600 (EN 10365: h 600, t_w 12, t_f 19 mm), S355 (t <= 16 mm: f_y 355 MPa), a pair of plates
  // 15 x 100 mm with a 15 mm chamfer; reactions 300 kN inside and 200 kN outside the web.
  const section = rolledSection('IPE 600');
  const grade = steelGrade('S355');
  const bs = 0.1;
  const ts = 0.015;
  const c = 0.015;
  const tw = 0.012;
  const hw = 0.6 - 2 * 0.019;
  const fy = 355e6;
  const [bearing, buckling] = checkBearingStiffeners(section, grade, { width: bs, thickness: ts, chamfer: c }, { sideA: 300e3, sideB: 200e3 });

  it('fitted end in bearing: F_side / ((b_s - c) t_s f_y / gamma_M0) for the more loaded side', () => {
    expect(bearing?.id).toBe('stiffener-bearing');
    expect(bearing?.utilisation).toBeCloseTo(300e3 / (((bs - c) * ts * fy) / 1.0), 10);
  });

  it('strut of the cruciform with 15 eps t_w of web each side, 0.75 h_w, curve c, plus the eccentricity of the unequal sides', () => {
    const eps = Math.sqrt(235 / 355);
    const strip = 30 * eps * tw + ts;
    const A = 2 * bs * ts + strip * tw;
    const I = (ts * (2 * bs + tw) ** 3) / 12 + ((strip - ts) * tw ** 3) / 12;
    const lambda = (0.75 * hw) / Math.sqrt(I / A) / (93.9 * eps);
    // EN 1993-1-1 6.3.1.2: Phi = 0.5 (1 + alpha (lambda - 0.2) + lambda^2), alpha = 0.49 (curve c);
    // here lambda < 0.2, so chi = 1.
    expect(lambda).toBeLessThan(0.2);
    const NbRd = (A * fy) / 1.0;
    const M = (300e3 - 200e3) * ((tw + bs) / 2);
    const MRd = ((I / (bs + tw / 2)) * fy) / 1.0;
    expect(buckling?.id).toBe('stiffener-buckling');
    expect(buckling?.intermediate['chi']).toBe(1);
    expect(buckling?.utilisation).toBeCloseTo(500e3 / NbRd + M / MRd, 10);
  });

  it('a pair that does not fit the flange outstand is out of scope on both checks, with the reason', () => {
    // IPE 600 outstand (220 - 12)/2 = 104 mm: a 120 mm plate is too wide, a 15 mm one has no bearing past a 15 mm chamfer.
    for (const width of [0.12, 0.015]) {
      const results = checkBearingStiffeners(section, grade, { width, thickness: ts, chamfer: c }, { sideA: 1e5, sideB: 1e5 });
      expect(results.map((result) => result.utilisation)).toEqual([Infinity, Infinity]);
      expect(results[0]?.outOfScope).toMatch(/does not fit the flange outstand of 104 mm/);
    }
  });

  it('a slender pair buckles: chi below 1 from curve c', () => {
    const [, slender] = checkBearingStiffeners(rolledSection('HE 1000 B'), grade, { width: 0.04, thickness: 0.006, chamfer: 0.01 }, { sideA: 100e3, sideB: 100e3 });
    const lambda = slender?.intermediate['lambda_bar'] as number;
    const phi = 0.5 * (1 + 0.49 * (lambda - 0.2) + lambda ** 2);
    expect(lambda).toBeGreaterThan(0.2);
    expect(slender?.intermediate['chi']).toBeCloseTo(1 / (phi + Math.sqrt(phi ** 2 - lambda ** 2)), 12);
  });
});

describe('flange local bending of a welded box', () => {
  // WB 600x400x10x20 with 20 mm outstands: web centre lines 350 mm apart (b - 2c - t_w), S355
  // (f_y 355 MPa for t <= 40 mm, EN 1993-1-1 Table 3.1), m_pl = t_f^2 f_y / 4 = 0.02^2 x 355e6 / 4 = 35.5 kNm/m.
  const box = weldedBoxSection({ depth: 0.6, flangeWidth: 0.4, webThickness: 0.01, flangeThickness: 0.02, flangeOutstand: 0.02 });
  const grade = steelGrade('S355');
  it('between the webs: a strip fixed at both web faces, collapse load 2 m_pl L / (a b) (virtual work, three hinges)', () => {
    // Inner faces at +-170 mm (L = 340 mm); a line load at 50 mm from the centre: a = 120, b = 220 mm.
    const q = 100e3;
    const check = checkFlangeLocalBending(box, grade, { lineLoad: q, distanceFromWebCentre: 0.05 });
    const [a, b, L] = [0.12, 0.22, 0.34];
    expect(check.intermediate.e).toBeCloseTo((a * b) / (2 * L), 12);
    expect(check.utilisation).toBeCloseTo(q / ((2 * 35.5e3 * L) / (a * b)), 9);
  });
  it('beyond a web: the outstand is a cantilever from the web face; over a web, no lever', () => {
    const check = checkFlangeLocalBending(box, grade, { lineLoad: 50e3, distanceFromWebCentre: 0.2 });
    expect(check.intermediate.e).toBeCloseTo(0.2 - 0.175 - 0.005, 12);
    expect(check.utilisation).toBeCloseTo((50e3 * 0.02) / 35.5e3, 9);
    expect(checkFlangeLocalBending(box, grade, { lineLoad: 50e3, distanceFromWebCentre: 0.175 }).utilisation).toBe(0);
  });
});
