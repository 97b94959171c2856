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

  it('rejects a solid whose upper characteristic K_u = a_K K_m is not below 1 (physical bound, EN 1991-4 3.3), naming the field', () => {
    const base = input();
    expect(() => circularBinLoads({ ...base, solid: { ...base.solid, lateralPressureRatio: 0.95 } })).toThrowError('solid.lateralPressureRatio x solid.lateralPressureRatioFactor (the upper characteristic K_u = a_K K_m, EN 1991-4 3.3) must be less than 1 (dimensionless); got 1.0545');
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

describe('substitute uniform pressure increase in place of the patch loads (AAC 2; EN 1991-4 5.2.3, from memory)', () => {
  // 6 m x 12 m wheat bin with a 20 mm wall: about 330 t (AAC 2, Table 2.1), d_c/t = 300 (thin-walled).
  const t = 0.02;
  const DEG = Math.PI / 180;
  const increased = (overrides: Partial<CircularBinLoadInput['bin']> = {}) => input({ wallThickness: t, patchLoadMethod: 'uniform-increase', ...overrides });
  const step = (loads: ReturnType<typeof circularBinLoads>, symbol: string) => loads.derivation.find((d) => d.symbol === symbol)?.value ?? Number.NaN;

  it('evaluates zeta = 0.5 + 0.01 d_c/t, 1 + zeta C_pf, 1 + zeta C_pe and the wall friction n_z,u by hand', () => {
    const loads = circularBinLoads(increased());
    expect(loads.classification).toMatchObject({ actionAssessmentClass: 2, thinWalled: true });
    const zeta = 0.5 + 0.01 * (6 / t); // 3.5 (not below 1.0)
    const growth = 1 - Math.exp(-1.5 * (12 / 6 - 1));
    const Cpf = 0.21 * 0.5 * growth; // (5.9) with E = 0, C_op = 0.5 (wheat)
    const Cpe = 0.42 * 0.5 * growth;
    expect(step(loads, 'zeta')).toBeCloseTo(3.5, 12);
    expect(step(loads, 'f_u (Q_s,f,u)')).toBeCloseTo(1 + zeta * Cpf, 12);
    expect(step(loads, 'f_u (Q_s,e,u)')).toBeCloseTo(1 + zeta * Cpe, 12);
    // Janssen (5.7) with the maximum-wall-friction set (Table 3.1: K upper, mu upper), A/U = 1.5 m.
    const K = 0.54 * 1.11;
    const mu = 0.38 * 1.16;
    const z0 = 1.5 / (K * mu);
    const nzSk = mu * 9000 * K * z0 * (12 - z0 * (1 - Math.exp(-12 / z0)));
    const Wcyl = 9000 * Math.PI * 9 * 12;
    // Filling: the increased friction (about 2.3 MN) stays below the weight in the cylinder (3.05 MN).
    const Fwf = Math.PI * 6 * (1 + zeta * Cpf) * nzSk;
    expect(Fwf).toBeLessThan(Wcyl);
    expect(step(loads, 'n_z,u(h_c) (Q_s,f,u)')).toBeCloseTo((1 + zeta * Cpf) * nzSk, 6);
    expect(step(loads, 'F_w,u (Q_s,f,u)')).toBeCloseTo(Fwf, 4);
    // Discharge: (1 + zeta C_pe) C_w pi d_c n_zSk exceeds the weight in the cylinder, so the wall takes
    // all of it (statics: the vertical stress at the transition cannot be negative).
    expect(Math.PI * 6 * (1 + zeta * Cpe) * 1.1 * nzSk).toBeGreaterThan(Wcyl);
    expect(step(loads, 'F_w,u (Q_s,e,u)')).toBeCloseTo(Wcyl, 4);
    // The hopper carries the rest of the weight along its meridian: inward pull F_h,u tan(beta) / (2 pi r_s).
    const W = loads.totals.solidWeight;
    const rs = 3 + t / 2;
    const fu = loads.cases.find((c) => c.name === 'Q_s,f,u');
    expect(fu?.verticalResultant).toBeCloseTo(W, 4);
    expect(fu?.radialLineLoad).toBeCloseTo(((W - Fwf) * Math.tan(30 * DEG)) / (2 * Math.PI * rs), 6);
  });

  it('replaces the patch cases: no Q_s,pf or Q_s,pe, no overturning moment, and the solid alternatives include the increased states', () => {
    const patch = circularBinLoads(input({ wallThickness: t }));
    expect(patch.cases.map((c) => c.name)).toEqual(expect.arrayContaining(['Q_s,pf', 'Q_s,pe']));
    const loads = circularBinLoads(increased());
    const names = loads.cases.map((c) => c.name);
    expect(names).not.toContain('Q_s,pf');
    expect(names).not.toContain('Q_s,pe');
    for (const name of ['Q_s,f,u', 'Q_s,e,u']) {
      const c = loads.cases.find((x) => x.name === name);
      // Axisymmetric: no harmonics, no moment, no base shear (level top surface, central filling).
      expect(c?.verticalHarmonics).toBeUndefined();
      expect(c?.overturningMoment).toBeUndefined();
      expect(c?.horizontalResultant).toBeUndefined();
      expect(loads.combinations.some((k) => k.factors[name] !== undefined)).toBe(true);
    }
    // Wall profiles of the increased states are the filling and discharge profiles times the multipliers.
    const f = loads.profiles.find((p) => p.case === 'Q_s,f' && p.part === 'wall');
    const fu = loads.profiles.find((p) => p.case === 'Q_s,f,u' && p.part === 'wall');
    const factor = step(loads, 'f_u (Q_s,f,u)');
    expect((fu?.ph[20] ?? Number.NaN) / (f?.ph[20] ?? Number.NaN)).toBeCloseTo(factor, 12);
    expect((fu?.pw[20] ?? Number.NaN) / (f?.pw[20] ?? Number.NaN)).toBeCloseTo(factor, 12);
  });

  it('is refused outside AAC 2 with the input path and the allowed class', () => {
    const attempt = (overrides: Partial<CircularBinLoadInput['bin']>) => {
      try {
        circularBinLoads(increased(overrides));
      } catch (error) {
        return error;
      }
      return undefined;
    };
    const aac3 = attempt({ actionAssessmentClass: 3 });
    expect(aac3).toMatchObject({ name: 'LoadsError', code: 'BAD_INPUT', path: 'bin.patchLoadMethod' });
    expect((aac3 as Error).message).toBe("bin.patchLoadMethod 'uniform-increase' is allowed in action assessment class 2 only (EN 1991-4 5.2.3); the bin is in class 3: use 'patch'");
    // 2 m x 4 m bin: about 12 t, AAC 1 (Table 2.1: below 100 t).
    const aac1 = attempt({ diameter: 2, cylinderHeight: 4, fillHeight: 4, hopper: { apexHalfAngle: 30 * DEG, outletDiameter: 0.2, thickness: 0.004 }, wallThickness: 0.004 });
    expect(aac1).toMatchObject({ name: 'LoadsError', code: 'BAD_INPUT', path: 'bin.patchLoadMethod' });
    expect((aac1 as Error).message).toBe("bin.patchLoadMethod 'uniform-increase' is allowed in action assessment class 2 only (EN 1991-4 5.2.3); the bin is in class 1: use 'patch'");
    const unknown = attempt({ patchLoadMethod: 'smeared' as unknown as 'patch' });
    expect((unknown as Error).message).toBe("bin.patchLoadMethod must be 'patch' or 'uniform-increase'; got 'smeared'");
  });
});
