import { describe, expect, it } from 'vitest';
import { isNormalToWalls, rectangularEffectiveSlenderness, rectangularSectionForceCoefficient } from './rectangular-wind.js';

describe('wind on a rectangular section (EN 1991-1-4 7.6)', () => {
  it('c_f,0 at d/b = 1 is 2.1 and at d/b = 5 is 1.0 (Figure 7.23, read off, from memory)', () => {
    expect(rectangularSectionForceCoefficient(1)).toBeCloseTo(2.1, 12);
    expect(rectangularSectionForceCoefficient(5)).toBeCloseTo(1.0, 12);
  });

  it('c_f,0 peaks at 2.4 near d/b = 0.7, is 2.0 for a flat plate (d/b <= 0.2) and 0.9 for long sections (d/b >= 10) (Figure 7.23, from memory)', () => {
    expect(rectangularSectionForceCoefficient(0.7)).toBeCloseTo(2.4, 12);
    expect(rectangularSectionForceCoefficient(0.05)).toBeCloseTo(2.0, 12);
    expect(rectangularSectionForceCoefficient(0.2)).toBeCloseTo(2.0, 12);
    expect(rectangularSectionForceCoefficient(20)).toBeCloseTo(0.9, 12);
    // Straight between read-off points on the figure's log axis: at d/b = 0.6 about 2.35 (from memory).
    expect(rectangularSectionForceCoefficient(0.6)).toBeCloseTo(2.35, 2);
    for (let r = 0.71; r < 10; r *= 1.1) expect(rectangularSectionForceCoefficient(r * 1.1)).toBeLessThanOrEqual(rectangularSectionForceCoefficient(r) + 1e-12);
  });

  it('effective slenderness of a rectangular section by Table 7.16 (from memory): 2 l/b up to 15 m, 1.4 l/b from 50 m, linear between, at most 70', () => {
    expect(rectangularEffectiveSlenderness(10, 5)).toBeCloseTo(4, 12);
    expect(rectangularEffectiveSlenderness(60, 5)).toBeCloseTo(16.8, 12);
    expect(rectangularEffectiveSlenderness(32.5, 5)).toBeCloseTo((2 * 32.5) / 5 + ((1.4 * 32.5) / 5 - (2 * 32.5) / 5) * 0.5, 12);
    expect(rectangularEffectiveSlenderness(90, 1)).toBe(70);
  });

  it('accepts wind directions normal to a pair of walls only', () => {
    expect([0, Math.PI / 2, Math.PI, (3 * Math.PI) / 2, -Math.PI / 2, 2 * Math.PI].every(isNormalToWalls)).toBe(true);
    expect(isNormalToWalls(Math.PI / 4)).toBe(false);
    expect(isNormalToWalls(0.01)).toBe(false);
  });
});
