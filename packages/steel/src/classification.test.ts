import { describe, expect, it } from 'vitest';
import { classifySection } from './classification.js';
import { steelGrade } from './grades.js';
import { loadRolledSections, rolledSection } from './sections.js';

describe('cross-section classification (EN 1993-1-1 Table 5.2)', () => {
  it('every IPE and HE B section is class 1 in bending about the strong axis in S235, S355 and S460', () => {
    // Producer's EN 10365 tables list class 1 for pure bending y-y for all IPE and HE B sizes in these
    // grades (from memory); by hand, the largest web c/t of the table is 868/19 = 45.7 < 72 eps(S460) = 51.5.
    for (const name of ['S235', 'S355', 'S460']) {
      const grade = steelGrade(name);
      for (const section of loadRolledSections().filter((s) => s.series === 'IPE' || s.series === 'HE B')) {
        expect(classifySection(section, grade).bendingY, `${section.designation} ${name}`).toBe(1);
      }
    }
  });

  it('HE 180 A in S355 has a class 2 flange (Table 5.2 by hand)', () => {
    // EN 10365 HE 180 A (from memory): b 180, t_w 6, t_f 9.5, r 15 mm. c = (180 - 6 - 30)/2 = 72 mm,
    // c/t_f = 7.58; eps = sqrt(235/355) = 0.8136: 9 eps = 7.32 < 7.58 <= 10 eps = 8.14 -> class 2.
    const c = classifySection(rolledSection('HE 180 A'), steelGrade('S355'));
    expect(c.flange.slenderness).toBeCloseTo(72 / 9.5, 9);
    expect(c.flange.sectionClass).toBe(2);
    expect(c.bendingY).toBe(2);
  });

  it('IPE 300 in pure compression is class 2 in S235 and class 4 in S355 (Table 5.2 by hand)', () => {
    // Web c = h - 2 t_f - 2 r = 300 - 21.4 - 30 = 248.6 mm, c/t_w = 248.6 / 7.1 = 35.01.
    // S235 (eps = 1): 33 < 35.01 <= 38 -> class 2. S355 (eps = 0.8136): 42 eps = 34.17 < 35.01 -> class 4.
    // Producer's IPE table, pure compression column, gives the same classes (from memory).
    const ipe300 = rolledSection('IPE 300');
    const s235 = classifySection(ipe300, steelGrade('S235'));
    expect(s235.webCompression.slenderness).toBeCloseTo(248.6 / 7.1, 10);
    expect(s235.compression).toBe(2);
    const s355 = classifySection(ipe300, steelGrade('S355'));
    expect(s355.epsilon).toBeCloseTo(Math.sqrt(235 / 355), 12);
    expect(s355.webCompression.limits.class3).toBeCloseTo(42 * Math.sqrt(235 / 355), 10);
    expect(s355.compression).toBe(4);
  });

  it('IPE 200 in compression is class 1 / 2 / 3 in S235 / S355 / S460 (Table 5.2 by hand)', () => {
    // c/t_w = (200 - 17 - 24) / 5.6 = 28.39; 33 eps: 33.0 / 26.85 / 23.59; 38 eps: 38.0 / 30.92 / 27.16; 42 eps(S460) = 30.02.
    const ipe200 = rolledSection('IPE 200');
    expect(['S235', 'S355', 'S460'].map((g) => classifySection(ipe200, steelGrade(g)).compression)).toEqual([1, 2, 3]);
  });

  it('flange outstand uses c = (b - t_w - 2r)/2 with 9 / 10 / 14 eps', () => {
    // HE 300 B: c = (300 - 11 - 54) / 2 = 117.5 mm, c/t_f = 117.5 / 19 = 6.184 <= 9 eps in every grade.
    const flange = classifySection(rolledSection('HE 300 B'), steelGrade('S460')).flange;
    expect(flange.width).toBeCloseTo(0.1175, 12);
    expect(flange.slenderness).toBeCloseTo(117.5 / 19, 10);
    expect(flange.limits.class1).toBeCloseTo(9 * Math.sqrt(235 / 460), 10);
    expect(flange.sectionClass).toBe(1);
  });

  it('web under bending and compression follows the alpha and psi limits', () => {
    // IPE 600, S355: pure compression c/t = 514 / 12 = 42.83 > 42 eps = 34.17 -> class 4.
    // With N = -500 kN and a moment: alpha = 0.5 (1 + N_c / (c t_w f_y)) = 0.5 (1 + 0.5e6 / (0.514 * 0.012 * 355e6)) = 0.6142,
    // class 1 limit 396 eps / (13 alpha - 1) = 46.13 >= 42.83 -> class 1 (Table 5.2 sheet 1).
    const ipe600 = rolledSection('IPE 600');
    const grade = steelGrade('S355');
    expect(classifySection(ipe600, grade).compression).toBe(4);
    const combined = classifySection(ipe600, grade, { N: -500e3, My: 400e3 }).combined;
    const alpha = 0.5 * (1 + 0.5e6 / (0.514 * 0.012 * 355e6));
    expect(combined?.alpha).toBeCloseTo(alpha, 10);
    expect(combined?.web.limits.class1).toBeCloseTo((396 * Math.sqrt(235 / 355)) / (13 * alpha - 1), 8);
    expect(combined?.sectionClass).toBe(1);
    // A large compression with a small moment: alpha close to 1, the web is class 4 again
    // (psi close to 1, 42 eps / (0.67 + 0.33 psi) < 42.83).
    expect(classifySection(ipe600, grade, { N: -2000e3, My: 1e3 }).combined?.sectionClass).toBe(4);
    // Tension with no moment leaves nothing in compression.
    expect(classifySection(ipe600, grade, { N: 1000e3, My: 0 }).combined?.sectionClass).toBe(1);
  });

  it('at alpha = 0.5 and psi = -1 the combined limits meet the pure-bending limits 72 / 83 / 124 eps', () => {
    // Continuity of Table 5.2: 396 / (13 * 0.5 - 1) = 72, 36 / 0.5 = 72, 41.5 / 0.5 = 83, psi = -1: 62 (1 + 1) sqrt(1) = 124.
    const combined = classifySection(rolledSection('IPE 400'), steelGrade('S235'), { N: 0, My: 100e3 }).combined;
    expect(combined?.alpha).toBe(0.5);
    expect(combined?.psi).toBeCloseTo(-1, 12);
    expect(combined?.web.limits.class1).toBeCloseTo(72, 10);
    expect(combined?.web.limits.class2).toBeCloseTo(83, 10);
    expect(combined?.web.limits.class3).toBeCloseTo(124, 10);
  });
});
