import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { circularBinLoads, isGravityCase, type CircularBinLoadInput } from './circular.js';
import { lineLoadAt } from './harmonics.js';
import type { SupportLineCase } from './types.js';

const DEG = Math.PI / 180;
const SEED = 20261202;
const RUNS = 200;

const binArbitrary = fc.record({
  diameter: fc.double({ min: 2, max: 20, noNaN: true }),
  aspect: fc.double({ min: 0.6, max: 4, noNaN: true }),
  betaDeg: fc.double({ min: 15, max: 75, noNaN: true }),
  thicknessMm: fc.double({ min: 3, max: 30, noNaN: true }),
  pile: fc.boolean(),
  efRatio: fc.double({ min: 0, max: 0.3, noNaN: true }),
  eoRatio: fc.double({ min: 0, max: 0.25, noNaN: true }),
  angle: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
  windDir: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
});

function build(p: { diameter: number; aspect: number; betaDeg: number; thicknessMm: number; pile: boolean; efRatio: number; eoRatio: number; angle: number; windDir: number }): CircularBinLoadInput {
  const fillHeight = p.aspect * p.diameter;
  return {
    bin: {
      diameter: p.diameter,
      cylinderHeight: fillHeight * 1.1,
      fillHeight,
      wallThickness: p.thicknessMm / 1000,
      hopper: { apexHalfAngle: p.betaDeg * DEG, outletDiameter: 0.1 * p.diameter, thickness: (p.thicknessMm + 2) / 1000 },
      steelDensity: 7850,
      topSurface: p.pile ? 'pile' : 'level',
      fillingEccentricity: p.efRatio * p.diameter,
      outletEccentricity: p.eoRatio * p.diameter,
      eccentricityAngle: p.angle,
    },
    // EN 1991-4:2006 Table E.1, wheat (read in the standard).
    solid: { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: 34 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.12, patchLoadFactor: 0.5 },
    partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
    roof: { deadLoad: 500, imposedLoad: 600, pitch: 20 * DEG },
    equipment: [{ name: 'filter', angle: p.angle + 1, radius: 0.3 * p.diameter, force: 20e3 }],
    snow: { groundLoad: 1200 },
    wind: { basicVelocity: 26, terrainCategory: 'II', supportLevelHeight: 6, directions: [p.windDir] },
    seismic: { horizontalCoefficient: 0.15, directions: [p.windDir + 0.5] },
  };
}

/** Resultants of a case around the support line by quadrature of lineLoadAt (independent of the harmonic algebra). */
function resultants(c: SupportLineCase, n = 720) {
  let vertical = 0;
  let mx = 0;
  let my = 0;
  let hx = 0;
  let hy = 0;
  const R = c.lineRadius;
  const dTheta = (2 * Math.PI) / n;
  for (let i = 0; i < n; i++) {
    const theta = (i + 0.5) * dTheta;
    const q = lineLoadAt(c, theta);
    vertical += q.vertical * R * dTheta;
    // Downward load at (R cos, R sin): its moment (right-hand rule) about X is -(-q) y... kept as the
    // first moments sum q R cos, sum q R sin (the moment that presses the side theta down).
    mx += q.vertical * R * Math.cos(theta) * R * dTheta;
    my += q.vertical * R * Math.sin(theta) * R * dTheta;
    // Tangential unit vector (-sin, cos); radial (inward) unit vector (-cos, -sin).
    hx += (-q.tangential * Math.sin(theta) - q.radial * Math.cos(theta)) * R * dTheta;
    hy += (q.tangential * Math.cos(theta) - q.radial * Math.sin(theta)) * R * dTheta;
  }
  return { vertical, mx, my, hx, hy };
}

function valid(p: Parameters<typeof build>[0]): CircularBinLoadInput | undefined {
  try {
    const input = build(p);
    circularBinLoads(input);
    return input;
  } catch {
    return undefined;
  }
}

describe('support-line invariants (fast-check, fixed seed)', () => {
  it('closes: plates plus solid at filling, and plates plus solid at discharge, weigh what they weigh (0.1 %)', () => {
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const input = valid(p);
        fc.pre(input !== undefined);
        if (!input) return;
        const loads = circularBinLoads(input);
        const weight = loads.totals.solidWeight + loads.totals.structureWeight;
        for (const solidCase of ['Q_s,f', 'Q_s,e']) {
          const sum = ['G', solidCase].map((name) => loads.cases.find((c) => c.name === name)).reduce((s, c) => s + (c ? resultants(c).vertical : Number.NaN), 0);
          expect(Math.abs(sum / weight - 1)).toBeLessThan(1e-3);
        }
        // Every gravity case's verticalResultant is its line load times the perimeter.
        for (const c of loads.cases.filter(isGravityCase)) expect(c.verticalResultant / (c.verticalLineLoad * 2 * Math.PI * c.lineRadius)).toBeCloseTo(1, 10);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it('AAC 2 with the uniform pressure increase (EN 1991-4 5.2.3, from memory): plates plus each increased solid state weigh what they weigh, the hopper pull is never above filling, no patch cases (0.1 %)', () => {
    let checked = 0;
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const base = valid(p);
        fc.pre(base !== undefined && circularBinLoads(base).classification?.actionAssessmentClass === 2);
        if (!base) return;
        const loads = circularBinLoads({ ...base, bin: { ...base.bin, patchLoadMethod: 'uniform-increase' } });
        const weight = loads.totals.solidWeight + loads.totals.structureWeight;
        const names = loads.cases.map((c) => c.name);
        expect(names).not.toContain('Q_s,pf');
        expect(names).not.toContain('Q_s,pe');
        const filling = loads.cases.find((c) => c.name === 'Q_s,f');
        for (const solidCase of ['Q_s,f,u', 'Q_s,e,u']) {
          const c = loads.cases.find((x) => x.name === solidCase);
          if (!c) continue; // C_p = 0 (h_c/d_c <= 1): nothing to increase
          checked++;
          expect(isGravityCase(c)).toBe(true);
          const sum = ['G', solidCase].map((name) => loads.cases.find((x) => x.name === name)).reduce((s, x) => s + (x ? resultants(x).vertical : Number.NaN), 0);
          expect(Math.abs(sum / weight - 1)).toBeLessThan(1e-3);
          // More wall friction leaves less on the hopper (statics of the solid column).
          expect(c.radialLineLoad).toBeLessThanOrEqual((filling?.radialLineLoad ?? Number.NaN) * (1 + 1e-12));
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
    expect(checked).toBeGreaterThan(RUNS / 2);
  });

  it('overturning cases (wind, seismic, patch) give zero net vertical, the moment they state and the base shear they state', () => {
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const input = valid(p);
        fc.pre(input !== undefined);
        if (!input) return;
        const loads = circularBinLoads(input);
        const overturning = loads.cases.filter((c) => c.action === 'wind' || c.action === 'seismic' || c.name === 'Q_s,pf' || c.name === 'Q_s,pe');
        expect(overturning.length).toBeGreaterThanOrEqual(2);
        for (const c of overturning) {
          const r = resultants(c);
          const M = c.overturningMoment ?? { x: Number.NaN, y: Number.NaN };
          const H = c.horizontalResultant ?? { x: Number.NaN, y: Number.NaN };
          const scale = Math.hypot(M.x, M.y);
          expect(Math.abs(r.vertical) * c.lineRadius).toBeLessThan(1e-9 * scale + 1e-6);
          // The moment vector M = (sum q R sin, -sum q R cos) in the right-hand convention of types.ts.
          expect(Math.hypot(r.my - M.x, -r.mx - M.y)).toBeLessThan(1e-6 * scale);
          expect(Math.hypot(r.hx - H.x, r.hy - H.y)).toBeLessThan(1e-6 * Math.hypot(H.x, H.y));
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it('wall pressures are positive, rise with depth, and start from zero (EN 1991-4 5.2.1.1; squat: at the wall contact h_o, 5.3.1.1); hopper pressures positive', () => {
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const input = valid(p);
        fc.pre(input !== undefined);
        if (!input) return;
        const loads = circularBinLoads({ ...input, profilePoints: 60 });
        // Slender bins: the Janssen expressions run from the equivalent surface (EN 1991-4 5.2.1.1);
        // squat and intermediate bins: no pressure above the highest wall contact h_o (5.3.1.1).
        const h0 = loads.classification?.slenderness === 'slender' ? 0 : (loads.derivation.find((d) => d.symbol === 'h_o')?.value ?? Number.NaN);
        for (const profile of loads.profiles.filter((x) => x.part === 'wall')) {
          profile.z.forEach((z, i) => {
            const ph = profile.ph[i] ?? Number.NaN;
            if (z <= h0) expect(ph).toBe(0);
            else expect(ph).toBeGreaterThan(0);
            if (i > 0) expect(ph).toBeGreaterThanOrEqual(profile.ph[i - 1] ?? Infinity);
          });
        }
        for (const profile of loads.profiles.filter((x) => x.part === 'hopper')) {
          for (const pn of profile.ph) expect(pn).toBeGreaterThan(0);
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });
});

describe('out-of-range inputs (fast-check, fixed seed)', () => {
  const base = build({ diameter: 6, aspect: 2, betaDeg: 30, thicknessMm: 6, pile: false, efRatio: 0, eoRatio: 0, angle: 0, windDir: 0 });
  type Mutation = { path: string; unit: RegExp; apply: (input: CircularBinLoadInput, value: number) => CircularBinLoadInput };
  const mutations: Array<[Mutation, fc.Arbitrary<number>]> = [
    [{ path: 'bin.diameter', unit: / m /, apply: (i, v) => ({ ...i, bin: { ...i.bin, diameter: v } }) }, fc.oneof(fc.double({ min: -100, max: 0, noNaN: true }), fc.double({ min: 60, max: 1e4, noNaN: true }))],
    [{ path: 'bin.hopper.apexHalfAngle', unit: /degrees/, apply: (i, v) => ({ ...i, bin: { ...i.bin, hopper: { ...i.bin.hopper, apexHalfAngle: v } } }) }, fc.oneof(fc.double({ min: -1, max: 4.9 * DEG, noNaN: true }), fc.double({ min: 85.1 * DEG, max: 3, noNaN: true }))],
    [{ path: 'solid.unitWeight', unit: /N\/m3/, apply: (i, v) => ({ ...i, solid: { ...i.solid, unitWeight: v } }) }, fc.oneof(fc.double({ min: -1e4, max: 999, noNaN: true }), fc.double({ min: 30001, max: 1e6, noNaN: true }))],
    [{ path: 'wind.basicVelocity', unit: /m\/s/, apply: (i, v) => ({ ...i, wind: { basicVelocity: v, terrainCategory: 'II', supportLevelHeight: 5 } }) }, fc.oneof(fc.double({ min: -50, max: 0, noNaN: true }), fc.double({ min: 70.01, max: 500, noNaN: true }))],
    [{ path: 'roof.deadLoad', unit: /Pa/, apply: (i, v) => ({ ...i, roof: { deadLoad: v } }) }, fc.oneof(fc.double({ min: -1e5, max: -1e-6, noNaN: true }), fc.double({ min: 50001, max: 1e7, noNaN: true }))],
  ];
  it('throw a LoadsError with the code, the path, the range and the unit', () => {
    fc.assert(
      fc.property(fc.oneof(...mutations.map(([m, values]) => values.map((v) => ({ m, v })))), ({ m, v }) => {
        let error: unknown;
        try {
          circularBinLoads(m.apply(base, v));
        } catch (caught) {
          error = caught;
        }
        expect(error).toMatchObject({ name: 'LoadsError', code: 'BAD_INPUT', path: m.path });
        const message = (error as Error).message;
        expect(message.startsWith(`${m.path} must be `)).toBe(true);
        expect(message).toMatch(/(between|at least|greater than) -?[\d.]+ and (at most|less than)? ?[\d.]+/);
        expect(message).toMatch(m.unit);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });
});
