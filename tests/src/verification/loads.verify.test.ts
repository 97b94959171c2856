import { describe, it } from 'vitest';
import { circularBinLoads, janssenProfile } from '@binsupport/loads';
import { verificationSuite } from './registry.js';

const check = verificationSuite('loads');
const DEG = Math.PI / 180;

describe('verification: stored-solid loads (EN 1991-4)', () => {
  it('Janssen filling pressure on the wall of a slender bin', () => {
    // EN 1991-4:2006 5.2.1.1 (5.1)-(5.6): p_hf = gamma K z_o (1 - exp(-z/z_o)), z_o = A/(U K mu).
    // Wheat, lower K and mu (Table E.1: K_m 0.54 / a_K 1.11, mu_m 0.38 / a_mu 1.16), d_c = 6 m, z = 12 m.
    const gamma = 9000;
    const K = 0.54 / 1.11;
    const mu = 0.38 / 1.16;
    const z0 = 1.5 / (K * mu);
    const expected = gamma * K * z0 * (1 - Math.exp(-12 / z0));
    const computed = janssenProfile({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, hydraulicRadius: 1.5 }).at(12).ph;
    check({ id: 'L-1', title: 'Janssen horizontal pressure p_hf at z = 12 m, d_c = 6 m wheat bin', source: 'EN 1991-4:2006 5.2.1.1, expressions (5.1)-(5.6)', kind: 'closed form', expected, computed, tolerance: 1e-9, unit: 'Pa' });
  });

  it('published worked example: intermediate cement silo, d_c = 5 m', () => {
    // A published EN 1991-4 worked example (knowledge-base article no. 001450, 13 June 2017, "Loads on
    // Silo Hopper According to EN 1991-4"): z_o = 6.07 m, p_vf(h_c) = 69.27 kN/m2. Cement properties
    // from EN 1991-4 Table E.1 (from memory; they reproduce the printed 0.450 and 0.458).
    const loads = circularBinLoads({
      bin: { diameter: 5, cylinderHeight: 9, fillHeight: 8, wallThickness: 0.008, hopper: { apexHalfAngle: 39.8 * DEG, outletDiameter: 0.5, thickness: 0.008 }, steelDensity: 7850, topSurface: 'pile' },
      solid: { name: 'cement', unitWeight: 16000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.2, wallFrictionCoefficient: 0.49, wallFrictionFactor: 1.07, angleOfRepose: 36 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.22, patchLoadFactor: 0.5 },
      partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
    });
    const step = (symbol: string) => loads.derivation.find((d) => d.symbol === symbol)?.value ?? Number.NaN;
    check({ id: 'L-2', title: 'characteristic depth z_o of the cement silo example', source: 'published EN 1991-4 worked example (knowledge-base article 001450, 2017)', kind: 'published', expected: 6.07, computed: step('z_o'), tolerance: 0.005 / 6.07, unit: 'm' });
    check({ id: 'L-3', title: 'vertical stress at the transition p_vf(h_c) of the cement silo example', source: 'published EN 1991-4 worked example (knowledge-base article 001450, 2017)', kind: 'published', expected: 69_270, computed: step('p_vf(h_c)'), tolerance: 1e-3, unit: 'Pa' });
  });

  it('the support line carries the weight of solid and plates', () => {
    // Statics: every gravity load reaches the support line (outlet closed).
    const loads = circularBinLoads({
      bin: { diameter: 6, cylinderHeight: 12, fillHeight: 12, wallThickness: 0.006, hopper: { apexHalfAngle: 30 * DEG, outletDiameter: 0.4, thickness: 0.008 }, steelDensity: 7850 },
      solid: { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: 34 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.12, patchLoadFactor: 0.5 },
      partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
    });
    const gravity = loads.cases.filter((c) => c.name === 'G' || c.name === 'Q_s,f').reduce((sum, c) => sum + c.verticalResultant, 0);
    check({ id: 'L-4', title: 'vertical support-line load of G + Q_s,f equals solid plus plate weight', source: 'statics (vertical equilibrium of the bin)', kind: 'closed form', expected: loads.totals.solidWeight + loads.totals.structureWeight, computed: gravity, tolerance: 1e-9, unit: 'N' });
  });
});
