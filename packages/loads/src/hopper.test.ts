import { describe, expect, it } from 'vitest';
import { hopperPressures, hopperWallVerticalResultant } from './hopper.js';

// A conical hopper of wheat: EN 1991-4:2006 Table E.1 (wheat, read in the standard): K_m 0.54, a_K 1.11,
// mu_m(D2) 0.38, a_mu 1.16, phi_im 30 deg, a_phi 1.12, gamma_u 9.0 kN/m3. Lower K and mu, upper phi_i
// (EN 1991-4 Table 3.1, maximum hopper load; from memory).
const gamma = 9000;
const K = 0.54 / 1.11;
const mu = 0.38 / 1.16;
const phiI = (30 * 1.12 * Math.PI) / 180;
const R = 3;
const r = 0.2;
const pvft = 40_000;

describe('hopper pressures (EN 1991-4 6.3)', () => {
  it('classifies steep and shallow by tan(beta) < (1 - K)/(2 mu_h) (EN 1991-4 6.1(2), seen)', () => {
    const limit = Math.atan((1 - K) / (2 * mu));
    const steep = hopperPressures({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: limit - 0.01, radius: R, outletRadius: r, transitionStress: pvft });
    const shallow = hopperPressures({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: limit + 0.01, radius: R, outletRadius: r, transitionStress: pvft });
    expect(steep.kind).toBe('steep');
    expect(shallow.kind).toBe('shallow');
  });

  it('steep filling and discharge follow (6.6), (6.19)-(6.25) evaluated by hand (from memory)', () => {
    const beta = (30 * Math.PI) / 180;
    const h = hopperPressures({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: beta, radius: R, outletRadius: r, transitionStress: pvft });
    expect(h.kind).toBe('steep');
    const hh = R / Math.tan(beta);
    const b = 0.2;
    const Ff = 1 - b / (1 + Math.tan(beta) / mu);
    const nf = 2 * (Ff * mu / Math.tan(beta) + Ff) - 2;
    const phiWh = Math.atan(mu);
    const eps = phiWh + Math.asin(Math.sin(phiWh) / Math.sin(phiI));
    const Fe = (1 + Math.sin(phiI) * Math.cos(eps)) / (1 - Math.sin(phiI) * Math.cos(2 * beta + eps));
    const ne = 2 * (Fe * mu / Math.tan(beta) + Fe) - 2;
    expect(h.filling.F).toBeCloseTo(Ff, 12);
    expect(h.filling.n).toBeCloseTo(nf, 12);
    expect(h.discharge.F).toBeCloseTo(Fe, 12);
    expect(h.discharge.n).toBeCloseTo(ne, 12);
    for (const x of [0.5, 2, 4, hh]) {
      // (6.6): p_v = (gamma h_h/(n-1)) ((x/h_h) - (x/h_h)^n) + p_vft (x/h_h)^n
      const pv = ((gamma * hh) / (nf - 1)) * (x / hh - Math.pow(x / hh, nf)) + pvft * Math.pow(x / hh, nf);
      const state = h.filling.at(x);
      expect(state.pv).toBeCloseTo(pv, 6);
      expect(state.pn).toBeCloseTo(Ff * pv, 6); // (6.19) p_nf = F_f p_v
      expect(state.pt).toBeCloseTo(mu * Ff * pv, 6); // (6.20) p_tf = mu_h F_f p_v
      const pve = ((gamma * hh) / (ne - 1)) * (x / hh - Math.pow(x / hh, ne)) + pvft * Math.pow(x / hh, ne);
      expect(h.discharge.at(x).pn).toBeCloseTo(Fe * pve, 6); // (6.22) p_ne = F_e p_v
    }
    expect(h.filling.at(hh).pv).toBeCloseTo(pvft, 6);
  });

  it('solves the slice equilibrium dp_v/dx = -gamma + n p_v/x (independent RK4 from the transition down)', () => {
    // Vertical equilibrium of a horizontal slice of a cone (statics; Walker-type slice theory).
    const beta = (25 * Math.PI) / 180;
    const h = hopperPressures({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: beta, radius: R, outletRadius: r, transitionStress: pvft });
    const n = h.filling.n;
    const rate = (x: number, pv: number) => -gamma + (n * pv) / x;
    let x = h.coneHeight;
    let pv = pvft;
    const step = -0.0005;
    while (x + step > 1.0) {
      const k1 = rate(x, pv);
      const k2 = rate(x + step / 2, pv + (step / 2) * k1);
      const k3 = rate(x + step / 2, pv + (step / 2) * k2);
      const k4 = rate(x + step, pv + step * k3);
      pv += (step / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
      x += step;
    }
    expect(h.filling.at(x).pv / pv).toBeCloseTo(1, 8);
  });

  it('steep hopper: wall pressures plus the outlet force carry p_vft A + gamma V_hop (statics, C_b = 1)', () => {
    for (const betaDeg of [15, 25, 35]) {
      const beta = (betaDeg * Math.PI) / 180;
      const h = hopperPressures({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: beta, radius: R, outletRadius: r, transitionStress: pvft });
      expect(h.kind).toBe('steep');
      const hopperHeight = (R - r) / Math.tan(beta);
      const volume = ((Math.PI * hopperHeight) / 3) * (R * R + R * r + r * r);
      const load = pvft * Math.PI * R * R + gamma * volume;
      for (const set of [h.filling, h.discharge]) {
        const wall = hopperWallVerticalResultant(set, beta, h.outletHeight, h.coneHeight);
        const outlet = set.at(h.outletHeight).pv * Math.PI * r * r;
        expect((wall + outlet) / load).toBeCloseTo(1, 7);
      }
    }
  });

  it('keeps the hopper pressures positive from the outlet to the transition', () => {
    const beta = (40 * Math.PI) / 180;
    const h = hopperPressures({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: beta, radius: R, outletRadius: r, transitionStress: pvft });
    for (let i = 0; i <= 50; i++) {
      const x = h.outletHeight + ((h.coneHeight - h.outletHeight) * i) / 50;
      expect(h.filling.at(x).pn).toBeGreaterThan(0);
      expect(h.discharge.at(x).pn).toBeGreaterThan(0);
    }
  });

  it('shallow hopper: mu_heff = (1 - K)/(2 tan beta), n = S (1 - b) mu_heff cot(beta) (EN 1991-4 6.3.3, from memory)', () => {
    const beta = (70 * Math.PI) / 180;
    const h = hopperPressures({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phiI, apexHalfAngle: beta, radius: R, outletRadius: r, transitionStress: pvft });
    const muEff = (1 - K) / (2 * Math.tan(beta));
    expect(h.kind).toBe('shallow');
    expect(h.filling.mu).toBeCloseTo(muEff, 12);
    expect(h.filling.n).toBeCloseTo(2 * 0.8 * muEff / Math.tan(beta), 12);
    expect(h.filling.F).toBeCloseTo(1 - 0.2 / (1 + Math.tan(beta) / muEff), 12);
    expect(h.discharge).toBe(h.filling);
  });
});
