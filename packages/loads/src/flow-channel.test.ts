import { describe, expect, it } from 'vitest';
import { circularBinLoads, flowChannelCaseName, PERMANENT_CASE, type CircularBinLoadInput } from './circular.js';
import { LoadsError } from './errors.js';
import { cosineSeriesZoneErrors, evenCosineSeries, FLOW_CHANNEL_RADIUS_RATIOS, flowChannelGeometry, flowChannelZones } from './flow-channel.js';
import { lineLoadAt } from './harmonics.js';
import type { LoadSet, SupportLineCase } from './types.js';

const DEG = Math.PI / 180;
// EN 1991-4:2006 Table E.1, wheat (read in the standard); wall type D2.
const wheat = { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: 34 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.12, patchLoadFactor: 0.5 };

// 8 m x 22 m wheat bin on a 30 degree hopper: about 1 120 t with e_o = 0.3 d_c, so AAC 3 by
// EN 1991-4 Table 2.1 (above 1 000 t with e_o > 0.25 d_c; from memory), slender (h_c/d_c = 2.75).
function input(bin: Partial<CircularBinLoadInput['bin']> = {}, solid: Partial<CircularBinLoadInput['solid']> = {}): CircularBinLoadInput {
  return {
    bin: { diameter: 8, cylinderHeight: 24, fillHeight: 22, wallThickness: 0.01, hopper: { apexHalfAngle: 30 * DEG, outletDiameter: 0.4, thickness: 0.012 }, steelDensity: 7850, outletEccentricity: 2.4, eccentricityAngle: 0.5, ...bin },
    solid: { ...wheat, ...solid },
    partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
  };
}

const step = (loads: LoadSet, symbol: string) => {
  const found = loads.derivation.find((d) => d.symbol === symbol);
  if (!found) throw new Error(`no derivation step ${symbol}`);
  return found.value;
};
const findCase = (loads: LoadSet, name: string): SupportLineCase => {
  const found = loads.cases.find((c) => c.name === name);
  if (!found) throw new Error(`no case ${name}`);
  return found;
};
const errorOf = (build: () => unknown): LoadsError => {
  try {
    build();
  } catch (error) {
    if (error instanceof LoadsError) return error;
    throw error;
  }
  throw new Error('expected a LoadsError');
};

/** Midpoint quadrature of f over [a, b] (independent general-purpose maths). */
function integrate(f: (x: number) => number, a: number, b: number, n = 20000): number {
  const h = (b - a) / n;
  let sum = 0;
  for (let i = 0; i < n; i++) sum += f(a + (i + 0.5) * h);
  return sum * h;
}

describe('flow channel geometry (EN 1991-4 5.2.4.3.1; circle geometry checked independently)', () => {
  // Independent computation: the channel circle (radius rc, centre at (ec, 0)) and the silo circle
  // (radius r, centre at the origin) intersected by bisection along the wall; the lens area by a
  // midpoint rule over a Cartesian grid; the arcs by sampling each circle and counting the points
  // inside the other circle.
  const r = 4;
  for (const eta of [0.6, 0.873]) {
    for (const G of FLOW_CHANNEL_RADIUS_RATIOS) {
      it(`eta = ${eta}, G = ${G}: theta_c, A_c, U_wc and U_sc`, () => {
        const geo = flowChannelGeometry(r, G, eta);
        expect(geo).toBeDefined();
        if (!geo) return;
        const rc = G * r;
        const ec = geo.eccentricity;
        // e_c = r (eta (1 - G) + (1 - sqrt G)) (EN 1991-4 5.2.4.3.1, from memory), evaluated by hand.
        expect(ec).toBeCloseTo(r * (eta * (1 - G) + 1 - Math.sqrt(G)), 12);
        const distance = (t: number) => Math.hypot(r * Math.cos(t) - ec, r * Math.sin(t)) - rc;
        let lo = 0;
        let hi = Math.PI;
        for (let i = 0; i < 100; i++) {
          const mid = (lo + hi) / 2;
          if (distance(mid) < 0) lo = mid;
          else hi = mid;
        }
        expect(geo.wallContactHalfAngle).toBeCloseTo(lo, 10);
        const n = 1200;
        const x0 = ec - rc;
        const x1 = r;
        const y1 = rc;
        const hx = (x1 - x0) / n;
        const hy = (2 * y1) / n;
        let inside = 0;
        for (let i = 0; i < n; i++) {
          const x = x0 + (i + 0.5) * hx;
          for (let j = 0; j < n; j++) {
            const y = -y1 + (j + 0.5) * hy;
            if (x * x + y * y < r * r && (x - ec) * (x - ec) + y * y < rc * rc) inside++;
          }
        }
        expect(geo.area / (inside * hx * hy)).toBeCloseTo(1, 2);
        const m = 200000;
        let wall = 0;
        let interfaceCount = 0;
        for (let i = 0; i < m; i++) {
          const t = ((i + 0.5) * 2 * Math.PI) / m;
          if (Math.hypot(r * Math.cos(t) - ec, r * Math.sin(t)) < rc) wall++;
          if (Math.hypot(ec + rc * Math.cos(t), rc * Math.sin(t)) < r) interfaceCount++;
        }
        expect(geo.wallContactArc / ((wall / m) * 2 * Math.PI * r)).toBeCloseTo(1, 3);
        expect(geo.interfaceArc / ((interfaceCount / m) * 2 * Math.PI * rc)).toBeCloseTo(1, 3);
      });
    }
  }

  it('has no wall contact outside sqrt(G)/(1 + sqrt(G)) < eta < (G + sqrt(G))/(1 - G) (from the e_c expression)', () => {
    // G = 0.25: 1/3 < eta < 1
    expect(flowChannelGeometry(4, 0.25, 0.33)).toBeUndefined();
    expect(flowChannelGeometry(4, 0.25, 0.34)).toBeDefined();
    expect(flowChannelGeometry(4, 0.25, 0.99)).toBeDefined();
    expect(flowChannelGeometry(4, 0.25, 1.01)).toBeUndefined();
  });
});

describe('flow-channel pressures and friction resultants, evaluated by hand (EN 1991-4 5.2.4.3.2, from memory)', () => {
  const loads = circularBinLoads(input());
  // Maximum wall friction (Table 3.1, from memory): K upper, mu upper, phi_i lower.
  const gamma = 9000;
  const K = 0.54 * 1.11;
  const mu = 0.38 * 1.16;
  const phi = (30 * DEG) / 1.12;
  const r = 4;
  const hc = 22;
  const eta = mu / Math.tan(phi);
  const z0 = r / 2 / (K * mu); // (5.5), A/U = r/2
  const phf = gamma * K * z0 * (1 - Math.exp(-hc / z0)); // (5.1)
  const nzf = mu * gamma * K * z0 * (hc - z0 * (1 - Math.exp(-hc / z0))); // (5.7)

  it('classifies the bin: slender, AAC 3', () => {
    expect(loads.classification).toMatchObject({ slenderness: 'slender', actionAssessmentClass: 3 });
    expect(step(loads, 'eta')).toBeCloseTo(eta, 12);
  });

  it('r_c = 0.4 r: e_c, theta_c, psi, U_wc, U_sc, A_c, z_oc, p_hco, p_hce, p_hae, n_z,ce, n_z,ae', () => {
    const G = 0.4;
    const name = 'Q_s,c40';
    const rc = G * r;
    const ec = r * (eta * (1 - G) + (1 - Math.sqrt(G)));
    const thetaC = Math.acos((r * r + ec * ec - rc * rc) / (2 * r * ec));
    const psi = Math.acos((r * r - ec * ec - rc * rc) / (2 * ec * rc));
    const Uwc = 2 * thetaC * r;
    const Usc = 2 * (Math.PI - psi) * rc;
    const Ac = (Math.PI - psi) * rc * rc + thetaC * r * r - r * rc * Math.sin(psi - thetaC);
    const z0c = Ac / (K * (Uwc * mu + Usc * Math.tan(phi)));
    const phco = gamma * K * z0c;
    const phce = phco * (1 - Math.exp(-hc / z0c));
    const nzce = mu * phco * (hc - z0c * (1 - Math.exp(-hc / z0c)));
    expect(step(loads, `r_c (${name})`)).toBeCloseTo(1.6, 12);
    expect(step(loads, `e_c (${name})`)).toBeCloseTo(ec, 10);
    expect(step(loads, `theta_c (${name})`)).toBeCloseTo(thetaC, 10);
    expect(step(loads, `psi (${name})`)).toBeCloseTo(psi, 10);
    expect(step(loads, `U_wc (${name})`)).toBeCloseTo(Uwc, 10);
    expect(step(loads, `U_sc (${name})`)).toBeCloseTo(Usc, 10);
    expect(step(loads, `A_c (${name})`)).toBeCloseTo(Ac, 10);
    expect(step(loads, `z_oc (${name})`)).toBeCloseTo(z0c, 10);
    expect(step(loads, `p_hco (${name})`)).toBeCloseTo(phco, 6);
    expect(step(loads, `p_hce(h_c) (${name})`)).toBeCloseTo(phce, 6);
    expect(step(loads, `p_hae(h_c) (${name})`)).toBeCloseTo(2 * phf - phce, 6);
    expect(step(loads, `n_z,ce(h_c) (${name})`)).toBeCloseTo(nzce, 4);
    expect(step(loads, `n_z,ae(h_c) (${name})`)).toBeCloseTo(2 * nzf - nzce, 4);
    expect(step(loads, 'n_z,f(h_c) (flow channel)')).toBeCloseTo(nzf, 4);
    // The channel sheds friction, the adjacent zones take it: lower / higher than the filling value.
    expect(nzce).toBeLessThan(nzf);
    expect(2 * nzf - nzce).toBeGreaterThan(nzf);
    // Statics: the wall carries r (2 theta_c n_ce + 2 theta_c n_ae + (2 pi - 4 theta_c) n_f) = pi d_c n_f.
    const Fw = r * (2 * thetaC * nzce + 2 * thetaC * (2 * nzf - nzce) + (2 * Math.PI - 4 * thetaC) * nzf);
    expect(step(loads, `F_w,c (${name})`) / Fw).toBeCloseTo(1, 12);
    expect(Fw / (Math.PI * 8 * nzf)).toBeCloseTo(1, 12);
    expect(step(loads, `F_h,c (${name})`)).toBeCloseTo(loads.totals.solidWeight - Fw, 3);
    // Inward pull of the hopper: F_h,c tan(beta) / (2 pi r_s) (cone statics).
    const rs = 4.005;
    expect(findCase(loads, name).radialLineLoad).toBeCloseTo(((loads.totals.solidWeight - Fw) * Math.tan(30 * DEG)) / (2 * Math.PI * rs), 6);
  });

  it('writes wall profiles of the channel and adjacent zones that follow the same expressions', () => {
    const channel = loads.profiles.find((p) => p.case === 'Q_s,c60 channel zone');
    const adjacent = loads.profiles.find((p) => p.case === 'Q_s,c60 adjacent zones');
    const z0c = step(loads, 'z_oc (Q_s,c60)');
    const phco = step(loads, 'p_hco (Q_s,c60)');
    const i = 20;
    const z = channel?.z[i] ?? Number.NaN;
    expect(channel?.ph[i]).toBeCloseTo(phco * (1 - Math.exp(-z / z0c)), 6);
    expect(adjacent?.ph[i]).toBeCloseTo(2 * gamma * K * z0 * (1 - Math.exp(-z / z0)) - phco * (1 - Math.exp(-z / z0c)), 6);
    expect((adjacent?.pw[i] ?? Number.NaN) / (adjacent?.ph[i] ?? Number.NaN)).toBeCloseTo(mu, 12);
  });
});

describe('flow-channel cases on the support line', () => {
  const loads = circularBinLoads(input());
  const plates = findCase(loads, PERMANENT_CASE);
  const theta0 = 0.5;
  const r = 4;

  for (const G of FLOW_CHANNEL_RADIUS_RATIOS) {
    const name = flowChannelCaseName(G);
    it(`${name}: the vertical total equals the solid weight plus the plates (statics, 0.1 %)`, () => {
      const c = findCase(loads, name);
      const rs = c.lineRadius;
      // Quadrature of the line loads round the support line, independent of the harmonic algebra.
      const total = integrate((t) => (lineLoadAt(plates, t).vertical + lineLoadAt(c, t).vertical) * rs, 0, 2 * Math.PI, 36000);
      expect(total / (loads.totals.solidWeight + loads.totals.structureWeight)).toBeCloseTo(1, 3);
      expect(Math.abs(total / (loads.totals.solidWeight + loads.totals.structureWeight) - 1)).toBeLessThan(1e-3);
      expect(c.verticalResultant).toBeCloseTo(loads.totals.solidWeight, 3);
      // Overturning moment vector: M (sin theta_e, -cos theta_e) with M the first moment about theta_e.
      const M = integrate((t) => lineLoadAt(c, t).vertical * Math.cos(t - theta0) * rs * rs, 0, 2 * Math.PI, 36000);
      expect(c.overturningMoment?.x ?? Number.NaN).toBeCloseTo(M * Math.sin(theta0), 0);
      expect(c.overturningMoment?.y ?? Number.NaN).toBeCloseTo(-M * Math.cos(theta0), 0);
      // The variation unloads the outlet side: the channel sheds more than the adjacent zones' lever arm returns.
      expect(M).toBeLessThan(0);
    });

    it(`${name}: the harmonics give each zone's resultant and first moment within 2 % of the piecewise distribution`, () => {
      const c = findCase(loads, name);
      const rs = c.lineRadius;
      const thetaC = step(loads, `theta_c (${name})`);
      const nf = step(loads, 'n_z,f(h_c) (flow channel)') * (r / rs);
      const nce = step(loads, `n_z,ce(h_c) (${name})`) * (r / rs);
      const nae = step(loads, `n_z,ae(h_c) (${name})`) * (r / rs);
      const hopperMean = step(loads, `F_h,c (${name})`) / (2 * Math.PI * rs);
      // The wall part of the series: the case minus the uniform hopper share, by quadrature.
      const wall = (t: number) => lineLoadAt(c, t).vertical - hopperMean;
      const piecewise = (t: number) => {
        const phi = Math.abs(Math.atan2(Math.sin(t - theta0), Math.cos(t - theta0)));
        return phi < thetaC ? nce : phi < 2 * thetaC ? nae : nf;
      };
      // Whole circle: resultant and first moment (exact for any number of harmonics).
      const R = integrate(piecewise, 0, 2 * Math.PI, 72000);
      expect(integrate(wall, 0, 2 * Math.PI, 72000) / R).toBeCloseTo(1, 3);
      const Mpw = integrate((t) => piecewise(t) * Math.cos(t - theta0), 0, 2 * Math.PI, 72000);
      expect(integrate((t) => wall(t) * Math.cos(t - theta0), 0, 2 * Math.PI, 72000) / Mpw).toBeCloseTo(1, 2);
      // Zone by zone (both sides of the axis together): resultant within 2 % of the zone's, first
      // moment within 2 % of the zone's integral of |q cos|; a zone that carries less than the mean
      // is judged against the mean load over its width.
      const mean = R / (2 * Math.PI);
      const zones: Array<[number, number, number]> = [
        [0, thetaC, nce],
        [thetaC, 2 * thetaC, nae],
        [2 * thetaC, Math.PI, nf],
      ];
      for (const [a, b, v] of zones) {
        const size = Math.max(v, mean);
        const both = (f: (t: number) => number) => integrate(f, theta0 + a, theta0 + b, 8000) + integrate(f, theta0 - b, theta0 - a, 8000);
        const seriesR = both(wall);
        expect(Math.abs(seriesR - 2 * v * (b - a)) / (2 * size * (b - a))).toBeLessThan(0.02);
        const seriesM = both((t) => wall(t) * Math.cos(t - theta0));
        const exactM = 2 * v * (Math.sin(b) - Math.sin(a));
        const absM = both((t) => size * Math.abs(Math.cos(t - theta0)));
        expect(Math.abs(seriesM - exactM) / absM).toBeLessThan(0.02);
      }
    });
  }

  it('needs the higher harmonics: ten harmonics miss the narrow channel zone of r_c = 0.25 r by more than 2 %', () => {
    const thetaC = step(loads, 'theta_c (Q_s,c25)');
    const zones = flowChannelZones(thetaC, step(loads, 'n_z,ce(h_c) (Q_s,c25)'), step(loads, 'n_z,ae(h_c) (Q_s,c25)'), step(loads, 'n_z,f(h_c) (flow channel)'));
    expect(cosineSeriesZoneErrors(zones, evenCosineSeries(zones, 10)).resultantError).toBeGreaterThan(0.02);
    const used = step(loads, 'N_h (Q_s,c25)');
    expect(cosineSeriesZoneErrors(zones, evenCosineSeries(zones, used)).resultantError).toBeLessThanOrEqual(0.02);
  });

  it('adds one alternative of the solid action per channel radius, without the patch loads', () => {
    for (const G of FLOW_CHANNEL_RADIUS_RATIOS) {
      const name = flowChannelCaseName(G);
      const withCase = loads.combinations.filter((k) => k.factors[name] !== undefined);
      expect(withCase.some((k) => k.verification === 'STR' && k.factors[name] === 1.5)).toBe(true);
      for (const k of withCase) {
        expect(k.factors['Q_s,pe']).toBeUndefined();
        expect(k.factors['Q_s,f']).toBeUndefined();
      }
    }
  });
});

describe('large-eccentricity discharge outside the flow-channel model is refused', () => {
  it('refuses a squat bin with e_o > 0.25 d_c, naming the input, the range and the unit', () => {
    // 8 m x 7 m: h_c/d_c = 0.875, squat (EN 1991-4 1.5, from memory).
    const error = errorOf(() => circularBinLoads(input({ fillHeight: 7, cylinderHeight: 8 })));
    expect(error).toMatchObject({ code: 'OUT_OF_SCOPE', path: 'bin.outletEccentricity' });
    expect(error.message).toBe('bin.outletEccentricity must be at most 0.25 bin.diameter (2.000 m) for a squat bin (h_c/d_c = 0.875); got 2.4 m: large-eccentricity discharge is covered by the flow-channel model of EN 1991-4 5.2.4.3 for slender bins (h_c/d_c >= 2) only');
  });

  it('refuses an intermediate bin in the same way', () => {
    const error = errorOf(() => circularBinLoads(input({ fillHeight: 12, cylinderHeight: 14 })));
    expect(error.message).toBe('bin.outletEccentricity must be at most 0.25 bin.diameter (2.000 m) for an intermediate bin (h_c/d_c = 1.500); got 2.4 m: large-eccentricity discharge is covered by the flow-channel model of EN 1991-4 5.2.4.3 for slender bins (h_c/d_c >= 2) only');
  });

  it('refuses a class 2 bin unless the engineer raises it to AAC 3, and then applies the model', () => {
    // 6 m x 12 m wheat bin, about 370 t: AAC 2 (Table 2.1).
    const small = input({ diameter: 6, fillHeight: 12, cylinderHeight: 14, outletEccentricity: 1.6 });
    const error = errorOf(() => circularBinLoads(small));
    expect(error).toMatchObject({ code: 'OUT_OF_SCOPE', path: 'bin.outletEccentricity' });
    expect(error.message).toBe('bin.outletEccentricity must be at most 0.25 bin.diameter (1.500 m); got 1.6: large-eccentricity discharge is covered by the flow-channel model of EN 1991-4 5.2.4.3, the action assessment class 3 procedure, and the bin is in class 2: set bin.actionAssessmentClass to 3 to apply it');
    const raised = circularBinLoads({ ...small, bin: { ...small.bin, actionAssessmentClass: 3 } });
    expect(raised.cases.map((c) => c.name)).toEqual(expect.arrayContaining(['Q_s,c25', 'Q_s,c40', 'Q_s,c60']));
  });

  it('refuses an outlet that would not lie inside the bin, and keeps e_o < d_c/2', () => {
    const error = errorOf(() => circularBinLoads(input({ outletEccentricity: 3.9 })));
    expect(error.message).toBe('bin.outletEccentricity must be at most (bin.diameter - bin.hopper.outletDiameter) / 2 = 3.800 m so that the outlet lies inside the bin; got 3.9 m');
    const beyond = errorOf(() => circularBinLoads(input({ outletEccentricity: 4 })));
    expect(beyond).toMatchObject({ code: 'BAD_INPUT', path: 'bin.outletEccentricity' });
    expect(beyond.message).toBe('bin.outletEccentricity must be at least 0 and less than 4 m (inside the bin radius); got 4');
  });

  it('refuses a solid whose eta puts the r_c = 0.25 r channel outside the wall (e_c expression from memory)', () => {
    // Cement on a D2 wall (Table E.1 row from memory): mu_m 0.49, a_mu 1.07, phi_im 30 deg, a_phi 1.22:
    // eta = 0.524 / tan(24.6 deg) = 1.15, above (G + sqrt G)/(1 - G) = 1.0 for G = 0.25.
    const error = errorOf(() => circularBinLoads(input({}, { name: 'cement', unitWeight: 16000, wallFrictionCoefficient: 0.49, wallFrictionFactor: 1.07, internalFrictionFactor: 1.22 })));
    expect(error).toMatchObject({ code: 'OUT_OF_SCOPE', path: 'solid.wallFrictionCoefficient' });
    expect(error.message).toMatch(/must be between 0\.333 and 1\.000 \(dimensionless\) for the flow channel r_c = 0\.25 r to cut the wall .*got eta = 1\.146/);
  });
});
