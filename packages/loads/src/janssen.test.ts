import { describe, expect, it } from 'vitest';
import { janssenProfile } from './janssen.js';

// Symbols of EN 1991-4:2006 5.2.1.1 for a 6 m bin of wheat, K and mu at their lower characteristic
// values (Table E.1: K_m = 0.54, a_K = 1.11, mu_m(D2) = 0.38, a_mu = 1.16; gamma_u = 9.0 kN/m3).
const gamma = 9000;
const dc = 6;
const K = 0.54 / 1.11;
const mu = 0.38 / 1.16;
const AoverU = dc / 4;

describe('Janssen filling pressures (EN 1991-4 5.2.1.1)', () => {
  const profile = janssenProfile({ unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, hydraulicRadius: AoverU });

  it('matches the closed form p_hf = gamma A/(mu U) (1 - exp(-z/z_o)) at several depths', () => {
    // EN 1991-4:2006 expressions (5.1), (5.3)-(5.6); Janssen (1895).
    const z0 = AoverU / (K * mu);
    expect(profile.z0).toBeCloseTo(z0, 12);
    for (const z of [0.5, 2, 6, 12, 30]) {
      const state = profile.at(z);
      const phf = ((gamma * AoverU) / mu) * (1 - Math.exp(-z / z0));
      expect(state.ph).toBeCloseTo(phf, 6);
      expect(state.pw).toBeCloseTo(mu * phf, 6);
      expect(state.pv).toBeCloseTo(phf / K, 6);
      // (5.7): n_zSk = mu p_ho (z - z_o Y_J)
      expect(state.nzSk).toBeCloseTo(mu * gamma * K * z0 * (z - z0 * (1 - Math.exp(-z / z0))), 4);
    }
  });

  it('solves the slice-equilibrium equation dp_v/dz = gamma - (mu K U/A) p_v (independent RK4 integration)', () => {
    // Janssen's differential equation of a horizontal slice, integrated numerically from p_v(0) = 0.
    const rate = (pv: number) => gamma - ((mu * K) / AoverU) * pv;
    let pv = 0;
    const h = 0.001;
    for (let step = 1; step <= 12_000; step++) {
      const k1 = rate(pv);
      const k2 = rate(pv + (h / 2) * k1);
      const k3 = rate(pv + (h / 2) * k2);
      const k4 = rate(pv + h * k3);
      pv += (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4);
      if (step % 3000 === 0) {
        expect(profile.at(step * h).pv / pv).toBeCloseTo(1, 9);
      }
    }
  });

  it('carries the whole weight of a column of solid by wall friction and vertical stress', () => {
    // Vertical equilibrium of the solid above depth z: U n_zSk(z) + A p_vf(z) = gamma A z.
    for (const z of [1, 7, 20]) {
      const state = profile.at(z);
      const perimeter = Math.PI * dc;
      const area = (Math.PI * dc * dc) / 4;
      expect((perimeter * state.nzSk + area * state.pv) / (gamma * area * z)).toBeCloseTo(1, 12);
    }
  });

  it('tends to the asymptotic pressure p_ho = gamma K z_o deep in the bin', () => {
    expect(profile.at(50 * profile.z0).ph / profile.ph0).toBeCloseTo(1, 12);
    expect(profile.at(0).ph).toBe(0);
  });
});
