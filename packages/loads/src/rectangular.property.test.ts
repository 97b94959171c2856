import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rectangularBinLoads, type RectangularBinLoadInput, type RectangularLoadSet } from './rectangular.js';

const DEG = Math.PI / 180;
const SEED = 20261202;
const RUNS = 200;

const binArbitrary = fc.record({
  lengthX: fc.double({ min: 2, max: 20, noNaN: true }),
  ratioYX: fc.double({ min: 0.4, max: 2.5, noNaN: true }),
  aspect: fc.double({ min: 0.6, max: 4, noNaN: true }),
  wedge: fc.boolean(),
  slotAlongX: fc.boolean(),
  slopeDeg: fc.double({ min: 15, max: 70, noNaN: true }),
  outletRatioX: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
  outletRatioY: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
  thicknessMm: fc.double({ min: 3, max: 30, noNaN: true }),
  pile: fc.boolean(),
  equipmentX: fc.double({ min: 0, max: 1, noNaN: true }),
  equipmentY: fc.double({ min: 0, max: 1, noNaN: true }),
  windDirections: fc.subarray([0, 90, 180, 270], { minLength: 1 }),
  seismicDirection: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
  dynamic: fc.boolean(),
});

type BinParameters = typeof binArbitrary extends fc.Arbitrary<infer T> ? T : never;

function build(p: BinParameters): RectangularBinLoadInput {
  const a = p.lengthX;
  const b = Math.min(p.ratioYX * a, 50);
  const dc = Math.min(a, b);
  const fillHeight = p.aspect * dc;
  const t = p.thicknessMm / 1000;
  const ao = p.outletRatioX * a;
  const bo = p.outletRatioY * b;
  // The hopper height sets the slope of the south and north faces (the sloping pair of a wedge along X).
  const across = p.wedge && !p.slotAlongX ? (a - ao) / 2 : (b - bo) / 2;
  const height = across / Math.tan(p.slopeDeg * DEG);
  return {
    bin: {
      lengthX: a,
      lengthY: b,
      cylinderHeight: fillHeight * 1.1,
      fillHeight,
      wallThickness: t,
      hopper: p.wedge ? { kind: 'wedge', slotAlong: p.slotAlongX ? 'x' : 'y', height, outletWidth: p.slotAlongX ? bo : ao, thickness: t + 0.002 } : { kind: 'pyramid', height, outletLengthX: ao, outletLengthY: bo, thickness: t + 0.002 },
      steelDensity: 7850,
      topSurface: p.pile ? 'pile' : 'level',
    },
    // EN 1991-4:2006 Table E.1, wheat (read in the standard).
    solid: { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: 34 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.12, patchLoadFactor: 0.5, proneToDynamicBehaviour: p.dynamic },
    partialFactors: { permanentFactor: 1.35, solidFactor: 1.5, method: p.dynamic ? '6.10a/b' : '6.10' },
    roof: { deadLoad: 500, imposedLoad: 600, pitch: 20 * DEG },
    equipment: [
      { name: 'filter', x: p.equipmentX * a, y: p.equipmentY * b, force: 20e3 },
      { name: 'conveyor head', x: (1 - p.equipmentX) * a, y: p.equipmentY * b, force: 8e3, kind: 'variable' },
    ],
    snow: { groundLoad: 1200 },
    wind: { basicVelocity: 26, terrainCategory: 'II', supportLevelHeight: 6, directions: p.windDirections.map((d) => d * DEG) },
    seismic: { horizontalCoefficient: 0.15, directions: [p.seismicDirection] },
    stationsPerEdge: 201,
  };
}

function valid(p: BinParameters): RectangularBinLoadInput | undefined {
  try {
    const input = build(p);
    rectangularBinLoads(input);
    return input;
  } catch {
    return undefined;
  }
}

/** Simpson's rule over evenly spaced stations (odd count): independent general-purpose quadrature. */
function simpson(s: number[], q: number[]): number {
  const n = s.length - 1;
  const h = ((s[n] ?? 0) - (s[0] ?? 0)) / n;
  let sum = (q[0] ?? 0) + (q[n] ?? 0);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * (q[i] ?? 0);
  return (sum * h) / 3;
}

/** Resultants of one case over all its edges: vertical, first moments about the centroid, horizontal (N, N m). */
function resultants(loads: RectangularLoadSet, name: string, a: number, b: number) {
  const r = { vertical: 0, mx: 0, my: 0, hx: 0, hy: 0 };
  for (const e of loads.edges.filter((x) => x.case === name)) {
    const L = e.s.at(-1) ?? 1;
    const dx = (e.end.x - e.start.x) / L;
    const dy = (e.end.y - e.start.y) / L;
    r.vertical += simpson(e.s, e.vertical);
    r.mx += simpson(e.s, e.vertical.map((v, i) => v * (e.start.x + dx * (e.s[i] ?? 0) - a / 2)));
    r.my += simpson(e.s, e.vertical.map((v, i) => v * (e.start.y + dy * (e.s[i] ?? 0) - b / 2)));
    // Inward normal of a counter-clockwise edge: its direction turned +90 degrees, (-dy, dx).
    r.hx += simpson(e.s, e.along.map((t, i) => t * dx - (e.inward[i] ?? 0) * dy));
    r.hy += simpson(e.s, e.along.map((t, i) => t * dy + (e.inward[i] ?? 0) * dx));
  }
  return r;
}

/**
 * The weight each case should put on the support line, from the inputs and the totals, not from the
 * edge tables: plates, solid, roof and snow on the outer plan, equipment forces; 0 for wind and seismic.
 */
function expectedWeights(input: RectangularBinLoadInput, loads: RectangularLoadSet): Record<string, number> {
  const t = input.bin.wallThickness;
  const area = (input.bin.lengthX + 2 * t) * (input.bin.lengthY + 2 * t);
  const step = (symbol: string) => loads.derivation.find((d) => d.symbol === symbol)?.value ?? Number.NaN;
  const weights: Record<string, number> = {
    G: loads.totals.structureWeight,
    'Q_s,f': loads.totals.solidWeight,
    'Q_s,e': loads.totals.solidWeight,
    G_roof: (input.roof?.deadLoad ?? 0) * area,
    Q_roof: (input.roof?.imposedLoad ?? 0) * area,
    G_eq: (input.equipment ?? []).filter((e) => (e.kind ?? 'permanent') === 'permanent').reduce((s, e) => s + e.force, 0),
    Q_eq: (input.equipment ?? []).filter((e) => e.kind === 'variable').reduce((s, e) => s + e.force, 0),
    // EN 1991-1-3 5.2 (5.1), mu_1 = 0.8 for a 20 degree pitch (Table 5.2, from memory), C_e = C_t = 1.
    S: 0.8 * (input.snow?.groundLoad ?? 0) * area,
    // EN 1991-4 6.1.2: the bottom magnifier adds (C_b - 1) p_vf(h_c) A above the solid's weight.
    'Q_s,b': (step('C_b') - 1) * step('p_vf(h_c)') * input.bin.lengthX * input.bin.lengthY,
  };
  for (const c of loads.cases) if (c.action === 'wind' || c.action === 'seismic') weights[c.name] = 0;
  // The patch band on one wall (EN 1991-4 5.2.1.4, 5.2.2.4, from memory) only overturns: no weight.
  for (const c of loads.cases) if (/^Q_s,p[fe],[NESW]$/.test(c.name)) weights[c.name] = 0;
  return weights;
}

describe('rectangular bins on their support line: invariants (fast-check, fixed seed)', () => {
  it('closes: plates plus solid at filling, and plates plus solid at discharge, weigh what they weigh (statics, 0.1 %)', () => {
    let wedges = 0;
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const input = valid(p);
        fc.pre(input !== undefined);
        if (!input) return;
        if (input.bin.hopper.kind === 'wedge') wedges++;
        const loads = rectangularBinLoads(input);
        const weight = loads.totals.solidWeight + loads.totals.structureWeight;
        for (const solidCase of ['Q_s,f', 'Q_s,e']) {
          const sum = resultants(loads, 'G', input.bin.lengthX, input.bin.lengthY).vertical + resultants(loads, solidCase, input.bin.lengthX, input.bin.lengthY).vertical;
          expect(Math.abs(sum / weight - 1)).toBeLessThan(1e-3);
        }
        // The closure combination leads the list (EN 1990 6.14b, characteristic G + Q_s,f).
        expect(loads.combinations[0]?.factors).toEqual({ G: 1, 'Q_s,f': 1 });
      }),
      { seed: SEED, numRuns: RUNS },
    );
    expect(wedges).toBeGreaterThan(RUNS / 5);
  });

  it('every combination puts on the support line the factored sum of the weights its cases stand for; symmetric gravity ones close to 0.1 % (statics)', () => {
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const input = valid(p);
        fc.pre(input !== undefined);
        if (!input) return;
        const loads = rectangularBinLoads(input);
        const weights = expectedWeights(input, loads);
        const vertical = Object.fromEntries(loads.cases.map((c) => [c.name, resultants(loads, c.name, input.bin.lengthX, input.bin.lengthY).vertical]));
        for (const combination of loads.combinations) {
          let total = 0;
          let expected = 0;
          let scale = 0;
          for (const [name, factor] of Object.entries(combination.factors)) {
            const w = weights[name];
            expect(w).toBeDefined();
            total += factor * (vertical[name] ?? Number.NaN);
            expected += factor * (w ?? Number.NaN);
            scale += Math.abs(factor * (w ?? 0));
          }
          expect(Math.abs(total - expected)).toBeLessThan(1e-3 * scale + 1e-6);
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it('overturning cases (wind, seismic) and EQU combinations: zero net vertical from the overturning, the stated moment and base shear (statics)', () => {
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const input = valid(p);
        fc.pre(input !== undefined);
        if (!input) return;
        const loads = rectangularBinLoads(input);
        const a = input.bin.lengthX;
        const b = input.bin.lengthY;
        const overturning = loads.cases.filter((c) => c.action === 'wind' || c.action === 'seismic');
        expect(overturning.length).toBe(p.windDirections.length + 2);
        for (const c of overturning) {
          const r = resultants(loads, c.name, a, b);
          const M = c.overturningMoment ?? { x: Number.NaN, y: Number.NaN };
          const H = c.horizontalResultant ?? { x: Number.NaN, y: Number.NaN };
          const scale = Math.hypot(M.x, M.y);
          expect(Math.abs(r.vertical) * Math.max(a, b)).toBeLessThan(1e-9 * scale + 1e-6);
          // SupportLineCase convention: M = (My', -Mx').
          expect(Math.hypot(r.my - M.x, -r.mx - M.y)).toBeLessThan(1e-6 * scale);
          expect(Math.hypot(r.hx - H.x, r.hy - H.y)).toBeLessThan(1e-4 * Math.hypot(H.x, H.y));
        }
        const weights = expectedWeights(input, loads);
        const equ = loads.combinations.filter((c) => c.verification === 'EQU');
        expect(equ.length).toBe(p.windDirections.length);
        for (const combination of equ) {
          let fromOverturning = 0;
          let total = 0;
          let permanent = 0;
          for (const [name, factor] of Object.entries(combination.factors)) {
            const v = factor * resultants(loads, name, a, b).vertical;
            total += v;
            if (name.startsWith('W_')) fromOverturning += v;
            else permanent += factor * (weights[name] ?? Number.NaN);
            // Bin empty, gravity variables left out (EN 1990 Table A1.2(A), uplift).
            expect(name.startsWith('G') || name.startsWith('W_')).toBe(true);
          }
          expect(Math.abs(fromOverturning)).toBeLessThan(1e-6 * permanent);
          expect(Math.abs(total / permanent - 1)).toBeLessThan(1e-3);
        }
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });

  it('patch band cases (EN 1991-4 5.2.1.4, 5.2.2.4, from memory): four per state exactly when AAC >= 2 and h_c/d_c > 1; each has zero net vertical load, the stated moment and base shear (statics)', () => {
    let withPatches = 0;
    let without = 0;
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const input = valid(p);
        fc.pre(input !== undefined);
        if (!input) return;
        const loads = rectangularBinLoads(input);
        const a = input.bin.lengthX;
        const b = input.bin.lengthY;
        const patches = loads.cases.filter((c) => /^Q_s,p[fe],[NESW]$/.test(c.name));
        const expected = loads.classification.actionAssessmentClass >= 2 && input.bin.fillHeight / Math.min(a, b) > 1;
        expect(patches.length).toBe(expected ? 8 : 0);
        if (expected) withPatches++;
        else without++;
        for (const c of patches) {
          const r = resultants(loads, c.name, a, b);
          const M = c.overturningMoment ?? { x: Number.NaN, y: Number.NaN };
          const H = c.horizontalResultant ?? { x: Number.NaN, y: Number.NaN };
          const scale = Math.hypot(M.x, M.y);
          expect(scale).toBeGreaterThan(0);
          expect(c.verticalResultant).toBe(0);
          expect(Math.abs(r.vertical) * Math.max(a, b)).toBeLessThan(1e-9 * scale + 1e-6);
          expect(Math.hypot(r.my - M.x, -r.mx - M.y)).toBeLessThan(1e-6 * scale);
          expect(Math.hypot(r.hx - H.x, r.hy - H.y)).toBeLessThan(1e-4 * Math.hypot(H.x, H.y));
          expect(loads.edges.filter((e) => e.case === c.name).reduce((s, e) => s + e.verticalResultant, 0)).toBeCloseTo(0, 6);
        }
        for (const combination of loads.combinations) expect(Object.keys(combination.factors).filter((k) => /^Q_s,p[fe],/.test(k)).length).toBeLessThanOrEqual(1);
      }),
      { seed: SEED, numRuns: RUNS },
    );
    expect(withPatches).toBeGreaterThan(RUNS / 10);
    expect(without).toBeGreaterThan(RUNS / 20);
  });

  it('every pressure is finite and not negative; wall pressures start at the highest wall contact, hopper pressures are positive (EN 1991-4 5.2-5.3, 6.3)', () => {
    fc.assert(
      fc.property(binArbitrary, (p) => {
        const input = valid(p);
        fc.pre(input !== undefined);
        if (!input) return;
        const loads = rectangularBinLoads({ ...input, profilePoints: 60 });
        const h0 = loads.classification.slenderness === 'slender' ? 0 : (loads.derivation.find((d) => d.symbol === 'h_o')?.value ?? Number.NaN);
        expect(loads.profiles.filter((x) => x.part === 'hopper').length).toBe(input.bin.hopper.kind === 'wedge' ? 2 : 4);
        const bad: string[] = [];
        for (const profile of loads.profiles) {
          const all = [...profile.ph, ...profile.pw, ...profile.pv];
          if (!all.every((v) => Number.isFinite(v) && v >= 0)) bad.push(`${profile.part} ${profile.case}: not finite or negative`);
          if (profile.part === 'wall' && !profile.z.every((z, i) => z <= h0 || (profile.ph[i] ?? 0) > 0)) bad.push(`wall ${profile.case}: zero below h_o`);
          if (profile.part === 'hopper' && !all.every((v) => v > 0)) bad.push(`hopper ${profile.case}: not positive`);
        }
        if (!loads.edges.every((e) => [...e.vertical, ...e.inward, ...e.along].every(Number.isFinite))) bad.push('edge loads not finite');
        expect(bad).toEqual([]);
      }),
      { seed: SEED, numRuns: RUNS },
    );
  });
});

describe('rectangular bin out-of-range inputs (fast-check, fixed seed)', () => {
  const base = build({ lengthX: 6, ratioYX: 0.7, aspect: 2, wedge: false, slotAlongX: true, slopeDeg: 30, outletRatioX: 0.1, outletRatioY: 0.1, thicknessMm: 6, pile: false, equipmentX: 0.5, equipmentY: 0.5, windDirections: [0], seismicDirection: 0, dynamic: false });
  type Mutation = { path: string; unit: RegExp; apply: (input: RectangularBinLoadInput, value: number) => RectangularBinLoadInput };
  const mutations: Array<[Mutation, fc.Arbitrary<number>]> = [
    [{ path: 'bin.lengthY', unit: / m;/, apply: (i, v) => ({ ...i, bin: { ...i.bin, lengthY: v } }) }, fc.oneof(fc.double({ min: -100, max: 0, noNaN: true }), fc.double({ min: 60, max: 1e4, noNaN: true }))],
    [{ path: 'bin.hopper.outletLengthX', unit: / m \(below bin.lengthX\)/, apply: (i, v) => ({ ...i, bin: { ...i.bin, hopper: { kind: 'pyramid', height: 3, outletLengthX: v, outletLengthY: 0.4, thickness: 0.008 } } }) }, fc.oneof(fc.double({ min: -10, max: -1e-6, noNaN: true }), fc.double({ min: 6, max: 100, noNaN: true }))],
    [{ path: 'solid.unitWeight', unit: /N\/m3/, apply: (i, v) => ({ ...i, solid: { ...i.solid, unitWeight: v } }) }, fc.oneof(fc.double({ min: -1e4, max: 999, noNaN: true }), fc.double({ min: 30001, max: 1e6, noNaN: true }))],
    [{ path: 'wind.basicVelocity', unit: /m\/s/, apply: (i, v) => ({ ...i, wind: { basicVelocity: v, terrainCategory: 'II', supportLevelHeight: 5 } }) }, fc.oneof(fc.double({ min: -50, max: 0, noNaN: true }), fc.double({ min: 70.01, max: 500, noNaN: true }))],
    [{ path: 'equipment[1].y', unit: / m \(on the roof/, apply: (i, v) => ({ ...i, equipment: [{ name: 'a', x: 1, y: 1, force: 1 }, { name: 'b', x: 1, y: v, force: 1 }] }) }, fc.oneof(fc.double({ min: -100, max: -0.01, noNaN: true }), fc.double({ min: 4.3, max: 100, noNaN: true }))],
  ];
  it('throw a LoadsError with the code, the path, the range and the unit', () => {
    fc.assert(
      fc.property(fc.oneof(...mutations.map(([m, values]) => values.map((v) => ({ m, v })))), ({ m, v }) => {
        let error: unknown;
        try {
          rectangularBinLoads(m.apply(base, v));
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
