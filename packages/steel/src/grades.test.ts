import { describe, expect, it } from 'vitest';
import { steelGrade, steelGradeNames, strengthsForThickness } from './grades.js';
import { SteelError } from './errors.js';

const MPa = 1e6;
const mm = 1e-3;

describe('steel grades', () => {
  // EN 1993-1-1:2005 Table 3.1 (from memory): f_y / f_u [N/mm2] for t <= 40 mm and 40 < t <= 80 mm.
  const table3_1: Array<[string, number, number, number, number]> = [
    ['S235', 235, 360, 215, 360],
    ['S275', 275, 430, 255, 410],
    ['S355', 355, 490, 335, 470],
    ['S460', 460, 540, 430, 540],
  ];
  it.each(table3_1)('%s has f_y %d / f_u %d up to 40 mm and %d / %d up to 80 mm (EN 1993-1-1 Table 3.1)', (name, fy40, fu40, fy80, fu80) => {
    const grade = steelGrade(name);
    expect(strengthsForThickness(grade, 40 * mm)).toEqual({ maxThickness: 40 * mm, yieldStrength: fy40 * MPa, ultimateStrength: fu40 * MPa });
    expect(strengthsForThickness(grade, 40.5 * mm)).toEqual({ maxThickness: 80 * mm, yieldStrength: fy80 * MPa, ultimateStrength: fu80 * MPa });
    expect(strengthsForThickness(grade, 80 * mm).yieldStrength).toBe(fy80 * MPa);
  });

  it('uses E = 210 GPa, G = 81 GPa (EN 1993-1-1 3.2.6) and gamma_M0 = gamma_M1 = 1.0 (6.1 recommended) unless overridden', () => {
    const grade = steelGrade('s355');
    expect([grade.youngsModulus, grade.shearModulus, grade.gammaM0, grade.gammaM1]).toEqual([210e9, 81e9, 1.0, 1.0]);
    const annex = steelGrade('S355', { gammaM0: 1.05, gammaM1: 1.1 });
    expect([annex.gammaM0, annex.gammaM1]).toEqual([1.05, 1.1]);
    expect(steelGradeNames()).toEqual(['S235', 'S275', 'S355', 'S460']);
  });

  it('reports unknown grades, bad options and thicknesses beyond Table 3.1 by code and message', () => {
    expect(() => steelGrade('S420')).toThrowError(new SteelError('UNKNOWN_GRADE', 'Steel grade "S420" is not known; use one of S235, S275, S355, S460.', 'grade'));
    expect(() => steelGrade('S355', { gammaM0: 0 })).toThrowError(
      new SteelError('INVALID_OPTIONS', 'Steel grade option gammaM0 must be a positive number; got 0.', 'gammaM0'),
    );
    expect(() => strengthsForThickness(steelGrade('S355'), 90 * mm)).toThrowError(
      new SteelError('THICKNESS_OUT_OF_RANGE', 'S355: nominal thickness 90.0 mm exceeds 80 mm, the largest thickness EN 1993-1-1 Table 3.1 covers.', 'thickness'),
    );
  });
});
