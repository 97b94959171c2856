import { describe, expect, it } from 'vitest';
import { actionAssessmentClass } from './classification.js';
import { topSurface } from './surface.js';
import { dischargeFactors, patchFactors, patchHeight, thinWalledPatchForce } from './wall.js';

describe('patch loads (EN 1991-4 5.2.1.2, 5.2.2.2; from memory)', () => {
  it('C_pf and C_pe evaluated by hand for wheat (C_op = 0.5, Table E.1 seen), h_c/d_c = 3, e_f = 0.5 m, e_o = 0.8 m, d_c = 6 m', () => {
    const Cop = 0.5;
    const growth = 1 - Math.exp(-1.5 * (3 - 1));
    const Ef = (2 * 0.5) / 6;
    const E = (2 * 0.8) / 6;
    const { Cpf, Cpe } = patchFactors(3, Cop, 0.5 / 6, 0.8 / 6);
    expect(Cpf).toBeCloseTo(0.21 * Cop * (1 + 2 * Ef * Ef) * growth, 12);
    expect(Cpe).toBeCloseTo(0.42 * Cop * (1 + 2 * E * E) * growth, 12);
  });

  it('vanishes for squat silos (h_c/d_c <= 1)', () => {
    expect(patchFactors(0.8, 0.5, 0, 0)).toEqual({ Cpf: 0, Cpe: 0 });
    expect(patchFactors(1, 0.5, 0.1, 0.1)).toEqual({ Cpf: 0, Cpe: 0 });
  });

  it('s = pi d_c / 16 and the cosine band has the resultant (pi/2) s d_c p_p (EN 1991-4 5.2.1.3, integrated numerically)', () => {
    const dc = 8;
    const p = 3000;
    const s = patchHeight(dc);
    expect(s).toBeCloseTo((Math.PI * 8) / 16, 12);
    // Net force along theta = 0 of p cos(theta) acting outward on a band of height s: sum p cos^2 theta r dtheta s.
    let force = 0;
    const n = 3600;
    for (let i = 0; i < n; i++) {
      const theta = ((i + 0.5) * 2 * Math.PI) / n;
      force += p * Math.cos(theta) * Math.cos(theta) * (dc / 2) * ((2 * Math.PI) / n) * s;
    }
    expect(thinWalledPatchForce(dc, p) / force).toBeCloseTo(1, 10);
  });
});

describe('discharge factors (EN 1991-4 5.2.2.1, 5.3.2; from memory)', () => {
  it('slender AAC 2: C_h = 1.15, C_w = 1.10; intermediate: 1 + 0.15 C_S and 1 + 0.10 C_S; squat 1.0', () => {
    expect(dischargeFactors('slender', 2, 3, 0, 0.5)).toMatchObject({ Ch: 1.15, Cw: 1.1 });
    const mid = dischargeFactors('intermediate', 2, 1.6, 0, 0.5);
    expect(mid.Ch).toBeCloseTo(1 + 0.15 * 0.6, 12);
    expect(mid.Cw).toBeCloseTo(1 + 0.1 * 0.6, 12);
    expect(dischargeFactors('squat', 3, 0.8, 0, 0.5)).toMatchObject({ Ch: 1, Cw: 1 });
  });

  it('AAC 1: C_h = 1.15 + 1.5 (1 + 0.4 e/d_c) C_op, C_w = 1.4 (1 + 0.4 e/d_c)', () => {
    const f = dischargeFactors('slender', 1, 3, 0.1, 0.5);
    expect(f.Ch).toBeCloseTo(1.15 + 1.5 * 1.04 * 0.5, 12);
    expect(f.Cw).toBeCloseTo(1.4 * 1.04, 12);
  });
});

describe('action assessment class (EN 1991-4 Table 2.1, from memory)', () => {
  const base = { slenderness: 'slender' as const, diameter: 6, outletEccentricity: 0, topSurfaceEccentricity: 0 };
  it('AAC 1 below 100 t, AAC 2 up to 10 000 t, AAC 3 above', () => {
    expect(actionAssessmentClass({ ...base, capacity: 99e3 }).aac).toBe(1);
    expect(actionAssessmentClass({ ...base, capacity: 101e3 }).aac).toBe(2);
    expect(actionAssessmentClass({ ...base, capacity: 9_999e3 }).aac).toBe(2);
    expect(actionAssessmentClass({ ...base, capacity: 10_001e3 }).aac).toBe(3);
  });
  it('AAC 3 above 1 000 t with e_o > 0.25 d_c, or squat with e_t > 0.25 d_c', () => {
    expect(actionAssessmentClass({ ...base, capacity: 1_500e3, outletEccentricity: 1.6 }).aac).toBe(3);
    expect(actionAssessmentClass({ ...base, capacity: 1_500e3, outletEccentricity: 1.4 }).aac).toBe(2);
    expect(actionAssessmentClass({ ...base, slenderness: 'squat', capacity: 1_500e3, topSurfaceEccentricity: 1.6 }).aac).toBe(3);
    expect(actionAssessmentClass({ ...base, capacity: 1_500e3, topSurfaceEccentricity: 1.6 }).aac).toBe(2);
  });
});

describe('equivalent surface of a conical top pile (EN 1991-4 1.5, 5.3.1.1)', () => {
  it('central filling: h_o = (d_c/6) tan(phi_r) and no moment about the axis (REFERENCES.md §1, from memory)', () => {
    const phi = (34 * Math.PI) / 180;
    const t = topSurface(3, phi, 0, 'pile');
    expect(t.h0 / ((6 / 6) * Math.tan(phi))).toBeCloseTo(1, 4);
    expect(t.apexHeight / ((2 / 3) * 3 * Math.tan(phi))).toBeCloseTo(1, 4); // cone volume = A h/3
    expect(Math.abs(t.volumeMoment)).toBeLessThan(1e-9);
  });

  it('eccentric filling: first moment of the pile about the axis by an independent Cartesian quadrature (statics)', () => {
    const phi = (30 * Math.PI) / 180;
    const R = 2;
    const e = 0.8;
    const t = topSurface(R, phi, e, 'pile');
    let moment = 0;
    const n = 800;
    const h = (2 * R) / n;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const x = -R + (i + 0.5) * h;
        const y = -R + (j + 0.5) * h;
        if (x * x + y * y > R * R) continue;
        moment += -Math.tan(phi) * Math.hypot(x - e, y) * x * h * h;
      }
    }
    expect(t.volumeMoment / moment).toBeCloseTo(1, 2);
    expect(t.volumeMoment).toBeGreaterThan(0);
    expect(t.lowestContactDepth).toBeGreaterThan(t.h0);
  });
});
