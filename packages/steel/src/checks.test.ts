import { describe, expect, it } from 'vitest';
import { checkSection, governingCheck } from './checks.js';
import type { CheckResult, InternalForces } from './checks.js';
import { steelGrade } from './grades.js';
import { rolledSection } from './sections.js';
import { sectionProperties } from './properties.js';
import { SteelError } from './errors.js';

const zero: InternalForces = { N: 0, Vy: 0, Vz: 0, Tsv: 0, Tw: 0, My: 0, Mz: 0, B: 0 };

function byId(results: CheckResult[], id: string): CheckResult {
  const found = results.find((r) => r.id === id);
  if (!found) throw new Error(`no check ${id}`);
  return found;
}

/** Relative closeness: |a/b - 1| < 5e-4 (the published properties carry four significant figures). */
function expectNear(actual: number, expected: number, relative = 5e-4): void {
  expect(Math.abs(actual / expected - 1), `${actual} vs ${expected}`).toBeLessThan(relative);
}

describe('cross-section checks, IPE 300 in S235 by hand', () => {
  // Published properties of IPE 300 (REFERENCES.md section 5 and the producer's table, from memory for
  // W_el,y, W_pl,z, A_vz): A = 53.81 cm2, W_pl,y = 628.4 cm3, W_el,y = 557.1 cm3, W_pl,z = 125.2 cm3,
  // A_vz = 25.68 cm2, I_t = 20.12 cm4, I_w = 125.9e3 cm6; t_f = 10.7 mm, b = 150 mm, h = 300 mm.
  const section = rolledSection('IPE 300');
  const grade = steelGrade('S235');
  const fy = 235e6;
  const A = 53.81e-4;
  const Wply = 628.4e-6;
  const Wely = 557.1e-6;
  const Wplz = 125.2e-6;
  const Avz = 25.68e-4;
  const It = 20.12e-8;
  const Iw = 125.9e-9;
  const tf = 0.0107;
  const b = 0.15;
  const h0 = 0.3 - tf;

  it('axial resistance N_pl,Rd = A f_y / gamma_M0 (EN 1993-1-1 6.2.3 and 6.2.4)', () => {
    const tension = byId(checkSection(section, grade, { ...zero, N: 500e3 }), 'axial');
    expect(tension.clause).toBe('EN 1993-1-1 6.2.3');
    expectNear(tension.intermediate['N_Rd'] ?? 0, A * fy);
    expectNear(tension.utilisation, 500e3 / (A * fy));
    const compression = byId(checkSection(section, grade, { ...zero, N: -500e3 }), 'axial');
    expect(compression.clause).toBe('EN 1993-1-1 6.2.4');
    expectNear(compression.utilisation, 500e3 / (A * fy));
  });

  it('bending resistance M_pl,Rd = W_pl f_y / gamma_M0 for a class 1 section (EN 1993-1-1 6.2.5)', () => {
    const results = checkSection(section, grade, { ...zero, My: 100e3, Mz: 10e3 });
    expectNear(byId(results, 'bending-y').intermediate['M_c,y,Rd'] ?? 0, Wply * fy);
    expectNear(byId(results, 'bending-y').utilisation, 100e3 / (Wply * fy));
    expectNear(byId(results, 'bending-z').utilisation, 10e3 / (Wplz * fy));
  });

  it('shear resistance V_pl,Rd = A_v (f_y / sqrt 3) / gamma_M0, reduced for St Venant torsion (6.2.6, 6.2.7(9))', () => {
    const plain = byId(checkSection(section, grade, { ...zero, Vz: 200e3 }), 'shear-z');
    expectNear(plain.intermediate['V_pl_Rd'] ?? 0, (Avz * fy) / Math.sqrt(3));
    expectNear(plain.utilisation, 200e3 / ((Avz * fy) / Math.sqrt(3)));
    // V_pl,y,Rd with the flanges as shear area, 2 b t_f.
    const sideways = byId(checkSection(section, grade, { ...zero, Vy: 100e3 }), 'shear-y');
    expectNear(sideways.utilisation, 100e3 / ((2 * b * tf * fy) / Math.sqrt(3)));
    // T_sv = 1 kNm: tau_t,Ed = T_sv t_f / I_t; V_pl,T,Rd = sqrt(1 - tau_t,Ed / (1.25 f_y / sqrt 3)) V_pl,Rd.
    const tauT = (1e3 * tf) / It;
    const reduced = byId(checkSection(section, grade, { ...zero, Vz: 200e3, Tsv: 1e3 }), 'shear-z');
    expectNear(reduced.intermediate['tau_t_Ed'] ?? 0, tauT);
    expectNear(reduced.utilisation, 200e3 / (Math.sqrt(1 - tauT / ((1.25 * fy) / Math.sqrt(3))) * ((Avz * fy) / Math.sqrt(3))));
  });

  it('high shear reduces the bending resistance per EN 1993-1-1 6.2.8(5)', () => {
    // V_Ed = 0.75 V_pl,Rd -> rho = (2 * 0.75 - 1)^2 = 0.25; M_y,V,Rd = (W_pl,y - rho A_w^2 / (4 t_w)) f_y, A_w = h_w t_w.
    const Vpl = (section.properties.shearAreaZ * fy) / Math.sqrt(3);
    const hw = 0.3 - 2 * tf;
    const tw = 0.0071;
    const bending = byId(checkSection(section, grade, { ...zero, Vz: 0.75 * Vpl, My: 50e3 }), 'bending-y');
    expect(bending.intermediate['rho']).toBeCloseTo(0.25, 12);
    expectNear(bending.intermediate['M_y,V,Rd'] ?? 0, (Wply - (0.25 * (hw * tw) ** 2) / (4 * tw)) * fy);
    // Below half the shear resistance nothing is reduced (6.2.8(2)).
    const low = byId(checkSection(section, grade, { ...zero, Vz: 0.5 * Vpl, My: 50e3 }), 'bending-y');
    expect(low.intermediate['rho']).toBe(0);
  });

  it('torsion stresses: tau_t = T t / I_t, tau_w = T_w S_w / (I_w t_f), sigma_w = B W_n0 / I_w (6.2.7)', () => {
    const forces = { ...zero, Tsv: 1e3, Tw: 2e3, B: 3e3 };
    const torsion = byId(checkSection(section, grade, forces), 'torsion');
    expectNear(torsion.intermediate['tau_t_flange'] ?? 0, (1e3 * tf) / It);
    expectNear(torsion.intermediate['tau_t_web'] ?? 0, (1e3 * 0.0071) / It);
    const Sw = (tf * b * b * h0) / 16;
    expectNear(torsion.intermediate['tau_w_flange'] ?? 0, (2e3 * Sw) / (Iw * tf));
    // The thin-walled closed form of the same stress: 1.5 T_w / (h0 b t_f).
    expectNear(torsion.intermediate['tau_w_flange'] ?? 0, (1.5 * 2e3) / (h0 * b * tf));
    expectNear(torsion.intermediate['sigma_w'] ?? 0, (3e3 * ((h0 * b) / 4)) / Iw);
    const tauFlange = (1e3 * tf) / It + (2e3 * Sw) / (Iw * tf);
    expectNear(torsion.utilisation, Math.max(tauFlange / (fy / Math.sqrt(3)), (3e3 * ((h0 * b) / 4)) / Iw / fy));
  });

  it('yield criterion under pure strong-axis bending is M / (W_el,y f_y) (6.2.1(5))', () => {
    const result = byId(checkSection(section, grade, { ...zero, My: 100e3 }), 'yield-criterion');
    expectNear(result.utilisation, 100e3 / (Wely * fy));
  });

  it('yield criterion with bending and bimoment at the worst tip: sigma = M/W_el,y + B W_n0 / I_w', () => {
    const result = byId(checkSection(section, grade, { ...zero, My: 100e3, B: 3e3 }), 'yield-criterion');
    expectNear(result.utilisation, (100e3 / Wely + (3e3 * ((h0 * b) / 4)) / Iw) / fy);
  });

  it('linear interaction adds N, M_y, M_z and the bimoment term (6.2.1(7))', () => {
    const forces = { ...zero, N: -200e3, My: 60e3, Mz: 5e3, B: 1e3 };
    const result = byId(checkSection(section, grade, forces), 'interaction');
    const expected = 200e3 / (A * fy) + 60e3 / (Wply * fy) + 5e3 / (Wplz * fy) + (1e3 * ((h0 * b) / 4)) / Iw / fy;
    expectNear(result.utilisation, expected);
    expect(result.intermediate['sectionClass']).toBe(1);
  });
});

describe('check behaviour', () => {
  const section = rolledSection('HE 300 B');
  const grade = steelGrade('S355');
  const forces: InternalForces = { N: -400e3, Vy: 60e3, Vz: 250e3, Tsv: 4e3, Tw: 6e3, My: 180e3, Mz: 25e3, B: 5e3 };

  it('zero forces give utilisation 0 in every check', () => {
    const results = checkSection(section, grade, zero);
    expect(results.map((r) => r.id)).toEqual(['axial', 'bending-y', 'bending-z', 'shear-z', 'shear-y', 'torsion', 'yield-criterion', 'interaction']);
    for (const r of results) expect(r.utilisation, r.id).toBe(0);
    expect(results.every((r) => r.clause.startsWith('EN 1993-1-1 6.2'))).toBe(true);
  });

  it('reversing M_y gives the same utilisations (section symmetric about y)', () => {
    // With B = 0 the mirror image about the y axis maps the section onto itself.
    const noBimoment = { ...forces, B: 0 };
    const a = checkSection(section, grade, noBimoment).map((r) => r.utilisation);
    const b = checkSection(section, grade, { ...noBimoment, My: -noBimoment.My }).map((r) => r.utilisation);
    b.forEach((u, i) => expect(u).toBeCloseTo(a[i] ?? Number.NaN, 12));
    // With a bimoment the mirror image also reverses B (omega = y z changes sign).
    const c = checkSection(section, grade, forces).map((r) => r.utilisation);
    const d = checkSection(section, grade, { ...forces, My: -forces.My, B: -forces.B }).map((r) => r.utilisation);
    d.forEach((u, i) => expect(u).toBeCloseTo(c[i] ?? Number.NaN, 12));
  });

  it('every utilisation grows with the load factor', () => {
    let previous = checkSection(section, grade, zero).map((r) => r.utilisation);
    for (let factor = 0.1; factor <= 2.5; factor += 0.1) {
      const scaled = Object.fromEntries(Object.entries(forces).map(([k, v]) => [k, v * factor])) as unknown as InternalForces;
      const current = checkSection(section, grade, scaled).map((r) => r.utilisation);
      current.forEach((u, i) => expect(u).toBeGreaterThanOrEqual((previous[i] ?? 0) - 1e-12));
      previous = current;
    }
    expect(Math.max(...previous)).toBeGreaterThan(1);
  });

  it('governingCheck returns the largest utilisation', () => {
    const results = checkSection(section, grade, forces);
    const governing = governingCheck(results);
    expect(governing?.utilisation).toBe(Math.max(...results.map((r) => r.utilisation)));
    expect(governingCheck([])).toBeUndefined();
  });

  it('a class 4 section in compression is reported out of scope, not passed', () => {
    // IPE 600 in S355, pure compression: web c/t = 42.8 > 42 eps = 34.2 (Table 5.2) -> class 4.
    const results = checkSection(rolledSection('IPE 600'), grade, { ...zero, N: -100e3 });
    const axial = byId(results, 'axial');
    expect(axial.utilisation).toBe(Number.POSITIVE_INFINITY);
    expect(axial.outOfScope).toMatch(/^IPE 600 is class 4 under these forces/);
    expect(byId(results, 'shear-z').utilisation).toBe(0);
  });

  it('rejects non-finite forces by code and path', () => {
    expect(() => checkSection(section, grade, { ...zero, My: Number.NaN })).toThrowError(
      new SteelError('INVALID_FORCES', 'Internal force My must be a finite number in SI units; got NaN.', 'My'),
    );
  });

  it('eta raises A_vz where eta h_w t_w governs, and lowers the shear-buckling limit 72 eps / eta (6.2.6(3)a, 6.2.6(6))', () => {
    // A deep, thin-flanged section (1000 x 300 x 17 x 15, r = 5 mm) where the floor eta h_w t_w governs:
    // A - 2 b t_f + (t_w + 2 r) t_f = h_w t_w + (4 - pi) r^2 + (t_w + 2 r) t_f = 16.49e-3 + 0.021e-3 + 0.405e-3 m2
    // < 1.2 h_w t_w = 19.79e-3 m2; h_w / t_w = 970 / 17 = 57.1 <= 72 / 1.2 = 60 (S235).
    const dimensions = { depth: 1.0, flangeWidth: 0.3, webThickness: 0.017, flangeThickness: 0.015, rootRadius: 0.005 };
    const deep = { designation: 'deep test section', dimensions, properties: sectionProperties(dimensions) };
    const s235 = steelGrade('S235');
    const hwtw = 0.97 * 0.017;
    const formula = hwtw + (4 - Math.PI) * 0.005 ** 2 + (0.017 + 0.01) * 0.015;
    const eta1 = byId(checkSection(deep, s235, { ...zero, Vz: 1e6 }), 'shear-z');
    const eta12 = byId(checkSection(deep, s235, { ...zero, Vz: 1e6 }, { eta: 1.2 }), 'shear-z');
    expect(eta1.inputs['A_v']).toBeCloseTo(formula, 12);
    expect(eta12.inputs['A_v']).toBeCloseTo(1.2 * hwtw, 12);
    expect(eta12.outOfScope).toBeUndefined();
    // A 12 mm web: h_w / t_w = 80.8 > 72 eps / eta = 72 -> shear buckling, outside these checks.
    const slenderDimensions = { ...dimensions, webThickness: 0.012 };
    const slender = { designation: 'slender test section', dimensions: slenderDimensions, properties: sectionProperties(slenderDimensions) };
    const buckling = byId(checkSection(slender, s235, { ...zero, Vz: 1e5 }), 'shear-z');
    expect(buckling.utilisation).toBe(Number.POSITIVE_INFINITY);
    expect(buckling.outOfScope).toBe(
      'Web slenderness h_w/t_w = 80.8 exceeds 72 eps/eta = 72.0: shear buckling per EN 1993-1-5 is outside the scope of these checks.',
    );
    expect(() => checkSection(section, grade, forces, { eta: 2 })).toThrowError(/eta must lie between 1.0 and 1.2/);
  });
});

describe('sectionUtilisations (the scan used over many stations)', () => {
  // Equality with checkSection is the contract: the scan decides which station governs, checkSection
  // then reports it. Random forces over rolled sections, a slender welded web (shear-buckling and
  // class 4 paths) and welded boxes (typical, slender-webbed, flush-webbed and stocky), with a fixed seed.
  it('gives exactly the utilisations of checkSection, check by check, in SECTION_CHECK_IDS order', async () => {
    const { SECTION_CHECK_IDS, sectionUtilisations } = await import('./checks.js');
    const { weldedISection } = await import('./welded.js');
    const { weldedBoxSection } = await import('./box.js');
    // The welded girder (h_w/t_w ~ 196, c/t of the flange ~ 12) is class 4 and needs shear buckling.
    const sections = [
      rolledSection('IPE 300'),
      rolledSection('HE 300 B'),
      rolledSection('IPE 600'),
      rolledSection('HE 1000 M'),
      weldedISection({ depth: 1.2, flangeWidth: 0.3, flangeThickness: 0.012, webThickness: 0.006 }),
      weldedBoxSection({ depth: 0.6, flangeWidth: 0.3, webThickness: 0.01, flangeThickness: 0.02, flangeOutstand: 0.02 }),
      weldedBoxSection({ depth: 1.2, flangeWidth: 0.5, webThickness: 0.006, flangeThickness: 0.012, flangeOutstand: 0.02 }),
      weldedBoxSection({ depth: 0.4, flangeWidth: 0.4, webThickness: 0.012, flangeThickness: 0.025, flangeOutstand: 0 }),
      weldedBoxSection({ depth: 0.3, flangeWidth: 0.3, webThickness: 0.015, flangeThickness: 0.03, flangeOutstand: 0.03 }),
    ];
    const grades = ['S235', 'S355', 'S460'].map((name) => steelGrade(name));
    let seed = 12345;
    const random = (): number => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    const signed = (scale: number): number => (random() < 0.15 ? 0 : (2 * random() - 1) * scale);
    const out = new Float64Array(SECTION_CHECK_IDS.length);
    let compared = 0;
    let outOfScope = 0;
    let boxes = 0;
    for (let i = 0; i < 3000; i++) {
      const section = sections[i % sections.length] as (typeof sections)[number];
      const grade = grades[i % grades.length] as (typeof grades)[number];
      const forces: InternalForces = { N: signed(3e6), Vy: signed(4e5), Vz: signed(1.5e6), Tsv: signed(4e4), Tw: signed(4e4), My: signed(2e6), Mz: signed(3e5), B: signed(2e4) };
      const reports = checkSection(section, grade, forces);
      sectionUtilisations(section, grade, forces, out);
      expect(reports.map((report) => report.id)).toEqual([...SECTION_CHECK_IDS]);
      reports.forEach((report, k) => expect(out[k], `${report.id} of ${section.designation}`).toBe(report.utilisation));
      compared += 1;
      if ('box' in section) boxes += 1;
      if (reports.some((report) => report.outOfScope !== undefined)) outOfScope += 1;
    }
    expect(compared).toBe(3000);
    expect(boxes).toBeGreaterThan(1000);
    // the out-of-scope paths were exercised, not only the plain ratios
    expect(outOfScope).toBeGreaterThan(100);
  });
});
