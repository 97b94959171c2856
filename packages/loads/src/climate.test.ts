import { describe, expect, it } from 'vitest';
import { cylinderForceCoefficient, effectiveSlenderness, endEffectFactor, peakVelocityPressure, roofShapeCoefficient } from './climate.js';

describe('wind (EN 1991-1-4)', () => {
  it('peak velocity pressure by (4.3)-(4.8) evaluated by hand, terrain III, z = 25 m, v_b = 27 m/s', () => {
    const z0 = 0.3; // Table 4.1, terrain III (from memory)
    const kr = 0.19 * Math.pow(z0 / 0.05, 0.07); // (4.5)
    const cr = kr * Math.log(25 / z0); // (4.4)
    const vm = cr * 27; // (4.3), c_o = 1
    const Iv = 1 / Math.log(25 / z0); // (4.7), k_I = 1
    const qp = (1 + 7 * Iv) * 0.5 * 1.25 * vm * vm; // (4.8)
    expect(peakVelocityPressure(27, 'III', 25).qp).toBeCloseTo(qp, 8);
  });

  it('exposure factor c_e(10 m) for terrain II is about 2.35 (EN 1991-1-4 Figure 4.2, read off, from memory)', () => {
    const vb = 25;
    const qb = 0.5 * 1.25 * vb * vb;
    expect(peakVelocityPressure(vb, 'II', 10).qp / qb).toBeCloseTo(2.35, 1);
  });

  it('uses z_min below the minimum height (EN 1991-1-4 4.3.2 (4.4))', () => {
    expect(peakVelocityPressure(25, 'IV', 3).qp).toBeCloseTo(peakVelocityPressure(25, 'IV', 10).qp, 10);
  });

  it('c_f,0 of a cylinder by (7.19) and near Figure 7.28 (from memory: about 0.7 for k/b = 1e-5 at Re = 1e7)', () => {
    const b = 10;
    const k = 1e-4;
    expect(cylinderForceCoefficient(1e7, k, b)).toBeCloseTo(1.2 + (0.18 * Math.log10(1e-4)) / (1 + 0.4 * Math.log10(10)), 12);
    expect(cylinderForceCoefficient(1e7, k, b)).toBeGreaterThan(0.65);
    expect(cylinderForceCoefficient(1e7, k, b)).toBeLessThan(0.75);
    // Rougher surfaces give larger coefficients (Figure 7.28).
    expect(cylinderForceCoefficient(1e7, 1e-2, b)).toBeGreaterThan(cylinderForceCoefficient(1e7, k, b));
    expect(cylinderForceCoefficient(2e5, k, b)).toBe(1.2);
  });

  it('psi_lambda passes through the points read off Figure 7.36 (REFERENCES.md §1, from memory) and interpolates in log10(lambda)', () => {
    expect(endEffectFactor(1)).toBeCloseTo(0.6, 12);
    expect(endEffectFactor(10)).toBeCloseTo(0.7, 12);
    expect(endEffectFactor(100)).toBeCloseTo(0.92, 12);
    expect(endEffectFactor(Math.sqrt(10))).toBeCloseTo(0.65, 12);
    expect(endEffectFactor(0.5)).toBe(0.6);
  });

  it('effective slenderness per Table 7.16 (from memory): 2 l/b up to 15 m, 0.7 l/b from 50 m, at most 70', () => {
    expect(effectiveSlenderness(12, 6)).toBeCloseTo(4, 12);
    expect(effectiveSlenderness(60, 6)).toBeCloseTo(7, 12);
    // Halfway between 15 m and 50 m: the mean of the two expressions at l = 32.5 m.
    expect(effectiveSlenderness(32.5, 5)).toBeCloseTo(((2 * 32.5) / 5 + (0.7 * 32.5) / 5) / 2, 9);
    expect(effectiveSlenderness(14, 0.1)).toBe(70);
  });
});

describe('snow (EN 1991-1-3)', () => {
  it('mu_1 per Table 5.2 (from memory): 0.8 to 30 degrees, 0.4 at 45, 0 from 60', () => {
    expect(roofShapeCoefficient(0)).toBe(0.8);
    expect(roofShapeCoefficient((30 * Math.PI) / 180)).toBeCloseTo(0.8, 12);
    expect(roofShapeCoefficient((45 * Math.PI) / 180)).toBeCloseTo(0.4, 12);
    expect(roofShapeCoefficient((60 * Math.PI) / 180)).toBe(0);
  });
});
