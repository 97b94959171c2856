import { describe, expect, it } from 'vitest';
import { circularBinLoads, PERMANENT_CASE, SOLID_FILLING_CASE, STANDARD_GRAVITY } from './circular.js';
import type { CircularBinLoadInput } from './circular.js';
import { squatProfile } from './squat.js';

function input(overrides: Partial<CircularBinLoadInput['bin']> = {}): CircularBinLoadInput {
  return {
    bin: {
      diameter: 6,
      cylinderHeight: 12,
      fillHeight: 12,
      wallThickness: 0.006,
      hopper: { apexHalfAngle: Math.PI / 6, outletDiameter: 0.4, thickness: 0.008 },
      steelDensity: 7850,
      ...overrides,
    },
    // EN 1991-4:2006 Table E.1, wheat.
    solid: { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: (34 * Math.PI) / 180, internalFrictionAngle: (30 * Math.PI) / 180, internalFrictionFactor: 1.12, patchLoadFactor: 0.5 },
    partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
  };
}

describe('circular bin loads on the support line', () => {
  it('closes: vertical support-line load equals solid plus plate weight (statics)', () => {
    for (const fillHeight of [12, 9, 5, 3]) {
      const loads = circularBinLoads(input({ fillHeight }));
      const vertical = loads.cases.filter((c) => c.name === PERMANENT_CASE || c.name === SOLID_FILLING_CASE).reduce((sum, c) => sum + c.verticalLineLoad * 2 * Math.PI * c.lineRadius, 0);
      expect(vertical / (loads.totals.solidWeight + loads.totals.structureWeight)).toBeCloseTo(1, 12);
    }
  });

  it('computes the solid weight from the cylinder and frustum volumes (geometry, closed form)', () => {
    const loads = circularBinLoads(input());
    const R = 3;
    const r = 0.2;
    const hh = (R - r) / Math.tan(Math.PI / 6);
    const volume = Math.PI * R * R * 12 + ((Math.PI * hh) / 3) * (R * R + R * r + r * r);
    expect(loads.totals.solidWeight).toBeCloseTo(9000 * volume, 6);
    const plates = 7850 * STANDARD_GRAVITY * (0.006 * 2 * Math.PI * 3.003 * 12 + 0.008 * Math.PI * (R + r) * ((R - r) / Math.sin(Math.PI / 6)));
    expect(loads.totals.structureWeight).toBeCloseTo(plates, 6);
  });

  it("pulls the support line inward by the hopper's vertical load times tan(beta) (cone statics)", () => {
    const loads = circularBinLoads(input());
    const solid = loads.cases.find((c) => c.name === SOLID_FILLING_CASE);
    const plates = loads.cases.find((c) => c.name === PERMANENT_CASE);
    const Fh = loads.derivation.find((step) => step.symbol === 'F_h')?.value ?? Number.NaN;
    expect(solid?.radialLineLoad).toBeCloseTo((Fh * Math.tan(Math.PI / 6)) / (2 * Math.PI * 3.003), 6);
    expect(plates?.radialLineLoad).toBeGreaterThan(0);
  });

  it('uses the squat form below h_c/d_c = 2 and keeps the pressures positive and rising', () => {
    const loads = circularBinLoads(input({ fillHeight: 9 }));
    expect(loads.derivation[0]?.description).toMatch(/intermediate/);
    const wall = loads.profiles[0];
    expect(wall?.ph[0]).toBe(0);
    wall?.ph.slice(1).forEach((ph, i) => expect(ph).toBeGreaterThan(wall.ph[i] ?? Infinity));
  });

  it('rejects a retaining silo with the input path and the limit', () => {
    expect(() => circularBinLoads(input({ fillHeight: 2 }))).toThrowError(/bin.fillHeight \/ bin.diameter = 0.333: retaining silos/);
  });
});

describe('squat and intermediate filling (EN 1991-4 5.3.1.1)', () => {
  it('reproduces the expressions evaluated by hand for a level surface (h_o = 0)', () => {
    const gamma = 9000;
    const K = 0.5;
    const mu = 0.4;
    const AoverU = 1.5;
    const phiR = (34 * Math.PI) / 180;
    const profile = squatProfile({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, hydraulicRadius: AoverU, angleOfRepose: phiR, h0: 0 });
    const z0 = AoverU / (K * mu);
    const n = -(1 + Math.tan(phiR));
    const z = 4;
    // (5.71)-(5.80) with h_o = 0: Y_R = 1 - (z/z_o + 1)^n; z_V = -(1/(n+1)) (z_o - (z + z_o)^(n+1) / z_o^n)
    const YR = 1 - Math.pow(z / z0 + 1, n);
    const zV = -(1 / (n + 1)) * (z0 - Math.pow(z + z0, n + 1) / Math.pow(z0, n));
    const state = profile.at(z);
    expect(state.ph).toBeCloseTo(gamma * K * z0 * YR, 8);
    expect(state.pv).toBeCloseTo(gamma * zV, 8);
    // The wall friction and the vertical stress together carry the column: U n_zSk + A p_vf = gamma A z.
    expect((4 * state.nzSk + 4 * AoverU * state.pv) / (gamma * 4 * AoverU * z)).toBeCloseTo(1, 12);
  });
});
