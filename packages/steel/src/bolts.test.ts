import { describe, expect, it } from 'vitest';
import { boltGeometry, checkBoltedFlangeTension, type BoltedFlangeInput } from './bolts.js';

describe('cap bolts in tension and the bolted flange as a T-stub (EN 1993-1-8)', () => {
  it('F_t,Rd = k2 f_ub A_s / gamma_M2 gives the tabulated bolt tension resistances', () => {
    // k2 = 0.9, gamma_M2 = 1.25 (EN 1993-1-8 Table 3.4, Table 2.1); A_s from ISO 898-1. Design
    // tables for 8.8 bolts list 141 kN for M20 and 203 kN for M24 (from memory: the common UK
    // connection design tables for EN 1993-1-8).
    const ft = (size: 'M20' | 'M24') => {
      const g = boltGeometry({ size, boltClass: '8.8' });
      return (0.9 * g.fub * g.tensileStressArea) / 1.25;
    };
    expect(ft('M20') / 1e3).toBeCloseTo(141.1, 1);
    expect(ft('M24') / 1e3).toBeCloseTo(203.3, 1);
  });

  // Bottom flange of an HE 300 B (b = 300, t_f = 19, t_w = 11, r = 27 mm), S355 (f_y 345 MPa for
  // 16 < t <= 40 mm, f_u 470 MPa: EN 10025-2 Table 7), two M20 8.8 bolts each side at a gauge of
  // 100 mm from the web centre line along a 300 mm cap.
  const input: BoltedFlangeInput = {
    bolt: { size: 'M20', boltClass: '8.8' },
    bolts: 2,
    tension: 150e3,
    gauge: 0.1,
    capLength: 0.3,
    flangeWidth: 0.3,
    flangeThickness: 0.019,
    webThickness: 0.011,
    rootRadius: 0.027,
    flangeYieldStrength: 345e6,
    flangeUltimateStrength: 470e6,
  };

  it('works the T-stub modes of Table 6.2 by hand', () => {
    const result = checkBoltedFlangeTension(input);
    // Figure 6.2: m = g - t_w/2 - 0.8 r = 100 - 5.5 - 21.6 = 72.9 mm; e = 150 - 100 = 50 mm;
    // n = min(e, 1.25 m) = 50 mm; pitch p = 300 / 2 = 150 mm.
    const m = 0.0729;
    const e = 0.05;
    const n = 0.05;
    const p = 0.15;
    expect(result.intermediate.m).toBeCloseTo(m, 12);
    // Effective lengths (Table 6.4): individual 2 x min(2 pi m, 4 m + 1.25 e) = 2 x min(458.0, 354.1);
    // group min(2 pi m + 2 p, 4 m + 1.25 e + p) = min(758.0, 504.1) mm.
    const leff1 = Math.min(2 * 2 * Math.PI * m, 2 * (4 * m + 1.25 * e), 2 * Math.PI * m + 2 * p, 4 * m + 1.25 * e + p);
    expect(leff1).toBeCloseTo(0.5041, 4);
    expect(result.intermediate.leff1).toBeCloseTo(leff1, 12);
    // M_pl = 0.25 l_eff t_f^2 f_y / gamma_M0 = 0.25 x 0.5041 x 0.019^2 x 345e6 = 15.70 kNm.
    const Mpl = 0.25 * leff1 * 0.019 ** 2 * 345e6;
    expect(Mpl / 1e3).toBeCloseTo(15.695, 2);
    // Per bolt: F_t,Rd = 141.1 kN; B_p,Rd = 0.6 pi d_m t_f f_u / gamma_M2 with d_m = (30 + 34.64)/2
    // = 32.32 mm: 0.6 pi 0.03232 0.019 470e6 / 1.25 = 435.2 kN, so the bolt governs.
    const Bt = (0.9 * 800e6 * 245e-6) / 1.25;
    expect((result.intermediate.BpRd ?? Number.NaN) / 1e3).toBeCloseTo((0.6 * Math.PI * 0.032321 * 0.019 * 470e6) / 1.25 / 1e3, 0);
    const mode1 = (4 * Mpl) / m;
    const mode2 = (2 * Mpl + n * 2 * Bt) / (m + n);
    const mode3 = 2 * Bt;
    expect(result.intermediate.FT1Rd).toBeCloseTo(mode1, 6);
    expect(result.intermediate.FT2Rd).toBeCloseTo(mode2, 6);
    expect(result.intermediate.FT3Rd).toBeCloseTo(mode3, 6);
    // mode 1 = 4 x 15.695 / 0.0729 = 861 kN; mode 2 = (31.39 + 14.11) / 0.1229 = 370 kN; mode 3 =
    // 2 x 141.1 = 282.2 kN: the thick HE B flange leaves the bolts to govern.
    expect((result.intermediate.FT2Rd ?? Number.NaN) / 1e3).toBeCloseTo(370.2, 0);
    expect(result.intermediate.governingMode).toBe(3);
    expect(result.utilisation).toBeCloseTo(150e3 / Math.min(mode1, mode2, mode3), 10);
  });

  it('a thinner flange fails by flange yielding first (mode 1), and more tension raises the utilisation in proportion', () => {
    const thin = checkBoltedFlangeTension({ ...input, flangeThickness: 0.008 });
    expect(thin.intermediate.governingMode).toBe(1);
    const doubled = checkBoltedFlangeTension({ ...input, tension: 300e3 });
    expect(doubled.utilisation).toBeCloseTo(2 * checkBoltedFlangeTension(input).utilisation, 12);
  });

  it('bolts that do not fit the flange are out of scope, with the reason', () => {
    const tooClose = checkBoltedFlangeTension({ ...input, gauge: 0.04 });
    expect(tooClose.utilisation).toBe(Number.POSITIVE_INFINITY);
    expect(tooClose.outOfScope).toContain('less than the bolt diameter 20 mm');
    const edge = checkBoltedFlangeTension({ ...input, gauge: 0.13 });
    // e = 20 mm < 1.2 d_0 = 1.2 x 22 = 26.4 mm (EN 1993-1-8 Table 3.3).
    expect(edge.outOfScope).toContain('below 1.2 d_0 = 26.4 mm');
    // a box has two webs off its centre line: the T-stub with the web as its stem does not apply
    expect(checkBoltedFlangeTension({ ...input, webCentreDistance: 0.2 }).outOfScope).toContain('cap bolts on a box are not covered');
  });
});
