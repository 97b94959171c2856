import { describe, expect, it } from 'vitest';
import { rectangularBinLoads, tributaryDepth, type PyramidHopper, type RectangularBinLoadInput } from './rectangular.js';
import { rectangularSectionForceCoefficient } from './rectangular-wind.js';

const DEG = Math.PI / 180;
const pyramid: PyramidHopper = { kind: 'pyramid', height: 3, outletLengthX: 0.6, outletLengthY: 0.4, thickness: 0.008 };
const base: RectangularBinLoadInput = {
  bin: { lengthX: 6, lengthY: 4, cylinderHeight: 10, fillHeight: 9, wallThickness: 0.006, hopper: pyramid, steelDensity: 7850 },
  // EN 1991-4:2006 Table E.1, wheat (read in the standard).
  solid: { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: 34 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.12, patchLoadFactor: 0.5 },
  partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
  stationsPerEdge: 201,
};

/** Trapezoidal rule over the stations of an edge. */
function integrate(s: number[], q: number[]): number {
  let sum = 0;
  for (let i = 1; i < s.length; i++) sum += (((q[i] ?? 0) + (q[i - 1] ?? 0)) / 2) * ((s[i] ?? 0) - (s[i - 1] ?? 0));
  return sum;
}

describe('rectangular bin on its support line', () => {
  it('the tributary of a face is the trapezoid w (L + L_o)/2 (geometry)', () => {
    const n = 10000;
    let area = 0;
    for (let i = 0; i < n; i++) area += tributaryDepth(((i + 0.5) * 6) / n, 6, 0.6, 1.8) * (6 / n);
    expect(area).toBeCloseTo((1.8 * (6 + 0.6)) / 2, 6);
  });

  it('closes: the edge loads of G + Q_s,f and of G + Q_s,e add up to solid plus plates (statics, 0.1 %)', () => {
    const loads = rectangularBinLoads(base);
    const weight = loads.totals.solidWeight + loads.totals.structureWeight;
    for (const solid of ['Q_s,f', 'Q_s,e']) {
      const total = loads.edges.filter((e) => e.case === 'G' || e.case === solid).reduce((sum, e) => sum + integrate(e.s, e.vertical), 0);
      expect(Math.abs(total / weight - 1)).toBeLessThan(1e-3);
    }
    // Solid weight: box plus the prismatoid (h/6)(A1 + 4 Am + A2) (geometry).
    const Am = 3.3 * 2.2;
    expect(loads.totals.solidWeight).toBeCloseTo(9000 * (6 * 4 * 9 + (3 / 6) * (24 + 4 * Am + 0.24)), 4);
  });

  it('each face pulls its edge inward by its vertical hopper load times tan(slope) (statics of the face)', () => {
    const loads = rectangularBinLoads(base);
    const south = loads.edges.find((e) => e.case === 'Q_s,f' && e.edge === 'south');
    const wall = loads.edges.find((e) => e.case === 'Q_s,f' && e.edge === 'south')?.vertical[0] ?? Number.NaN; // corner: wall friction only
    const mid = 100;
    const hopperPart = (south?.vertical[mid] ?? Number.NaN) - wall;
    expect(south?.inward[mid]).toBeCloseTo(hopperPart * (1.8 / 3), 8);
    expect(south?.inward[0]).toBeCloseTo(0, 12);
  });

  it('rejects an outlet wider than the bin with the field, range and unit', () => {
    expect(() => rectangularBinLoads({ ...base, bin: { ...base.bin, hopper: { ...pyramid, outletLengthY: 5 } } })).toThrowError('bin.hopper.outletLengthY must be at least 0 and less than 4 m (below bin.lengthY); got 5');
  });
});

/** Simpson's rule over the stations of an edge (odd count, evenly spaced). */
function simpson(s: number[], q: number[]): number {
  const n = s.length - 1;
  const h = ((s[n] ?? 0) - (s[0] ?? 0)) / n;
  let sum = (q[0] ?? 0) + (q[n] ?? 0);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * (q[i] ?? 0);
  return (sum * h) / 3;
}

/** Resultants of a case's edge loads by quadrature: vertical, first moments about the centroid, horizontal. */
function resultants(loads: ReturnType<typeof rectangularBinLoads>, name: string, a: number, b: number) {
  let vertical = 0;
  let mx = 0;
  let my = 0;
  let hx = 0;
  let hy = 0;
  for (const e of loads.edges.filter((x) => x.case === name)) {
    const dx = (e.end.x - e.start.x) / (e.s.at(-1) ?? 1);
    const dy = (e.end.y - e.start.y) / (e.s.at(-1) ?? 1);
    const xs = e.s.map((s) => e.start.x + dx * s - a / 2);
    const ys = e.s.map((s) => e.start.y + dy * s - b / 2);
    vertical += simpson(e.s, e.vertical);
    mx += simpson(e.s, e.vertical.map((v, i) => v * (xs[i] ?? 0)));
    my += simpson(e.s, e.vertical.map((v, i) => v * (ys[i] ?? 0)));
    // Inward normal of a counter-clockwise edge is the edge direction turned +90 degrees: (-dy, dx).
    hx += simpson(e.s, e.along.map((t, i) => t * dx - (e.inward[i] ?? 0) * dy));
    hy += simpson(e.s, e.along.map((t, i) => t * dy + (e.inward[i] ?? 0) * dx));
  }
  return { vertical, mx, my, hx, hy };
}

describe('other actions on the rectangular bin', () => {
  const full: RectangularBinLoadInput = {
    ...base,
    roof: { deadLoad: 500, imposedLoad: 600, pitch: 10 * DEG },
    equipment: [{ name: 'filter', x: 1, y: 3, force: 20e3 }, { name: 'conveyor head', x: 5.5, y: 0.5, force: 8e3, kind: 'variable' }],
    snow: { groundLoad: 1200 },
    wind: { basicVelocity: 26, terrainCategory: 'II', supportLevelHeight: 6 },
    seismic: { horizontalCoefficient: 0.15, directions: [0, 0.6] },
  };
  const loads = rectangularBinLoads(full);
  const step = (symbol: string) => loads.derivation.find((d) => d.symbol === symbol)?.value ?? Number.NaN;

  it('roof and snow on the outer plan (a + 2t)(b + 2t), snow s = mu_1 C_e C_t s_k with mu_1 = 0.8 below 30 degrees (EN 1991-1-3 5.2, Table 5.2, from memory)', () => {
    const area = 6.012 * 4.012;
    expect(loads.cases.find((c) => c.name === 'G_roof')?.verticalResultant).toBeCloseTo(500 * area, 6);
    expect(resultants(loads, 'S', 6, 4).vertical).toBeCloseTo(0.8 * 1200 * area, 4);
  });

  it('equipment reaches the edges with its resultant and its moments about the centroid (statics, Simpson over the stations)', () => {
    const r = resultants(loads, 'G_eq', 6, 4);
    expect(r.vertical).toBeCloseTo(20e3, 3);
    expect(r.mx).toBeCloseTo(20e3 * (1 - 3), 3);
    expect(r.my).toBeCloseTo(20e3 * (3 - 2), 3);
    const c = loads.cases.find((x) => x.name === 'G_eq');
    // Convention of SupportLineCase: (My', -Mx').
    expect(c?.overturningMoment?.x).toBeCloseTo(20e3, 6);
    expect(c?.overturningMoment?.y).toBeCloseTo(40e3, 6);
  });

  it('wind along X and Y: F = c_f,0 psi_lambda q_p b h by hand (EN 1991-1-4 7.6 (7.9), 5.3), M = F h/2; the edges carry zero net vertical, the moment and the base shear (statics)', () => {
    const qp = step('q_p(z_e)');
    const H = 10;
    for (const [name, breadth, depth, axis] of [['W_0', 4.012, 6.012, 'X'], ['W_90', 6.012, 4.012, 'Y'], ['W_180', 4.012, 6.012, 'X']] as const) {
      expect(step(`c_f,0 (${axis})`)).toBeCloseTo(rectangularSectionForceCoefficient(depth / breadth), 12);
      const F = step(`c_f,0 (${axis})`) * step(`psi_lambda (${axis})`) * qp * breadth * H;
      const c = loads.cases.find((x) => x.name === name);
      expect(Math.hypot(c?.horizontalResultant?.x ?? 0, c?.horizontalResultant?.y ?? 0)).toBeCloseTo(F, 4);
      const r = resultants(loads, name, 6, 4);
      expect(Math.abs(r.vertical)).toBeLessThan(1e-6 * F);
      const theta = name === 'W_0' ? 0 : name === 'W_90' ? Math.PI / 2 : Math.PI;
      expect(r.mx).toBeCloseTo(((F * H) / 2) * Math.cos(theta), 2);
      expect(r.my).toBeCloseTo(((F * H) / 2) * Math.sin(theta), 2);
      expect(r.hx).toBeCloseTo(F * Math.cos(theta), 2);
      expect(r.hy).toBeCloseTo(F * Math.sin(theta), 2);
    }
    // d/b = 6.012/4.012 along X: c_f,0 between 2.1 (d/b = 1) and 1.65 (d/b = 2) (Figure 7.23, from memory).
    expect(step('c_f,0 (X)')).toBeLessThan(2.1);
    expect(step('c_f,0 (X)')).toBeGreaterThan(1.65);
  });

  it('seismic: F_E = a_h sum W_i by hand; skewed directions are superposed (beam theory), zero net vertical', () => {
    const fs = 0.8;
    const Ws = loads.totals.solidWeight;
    const expected = 0.15 * (loads.totals.structureWeight + loads.totals.roofDeadLoad + loads.totals.permanentEquipment + fs * Ws);
    expect(step('F_E')).toBeCloseTo(expected, 4);
    const r = resultants(loads, 'E_34', 6, 4);
    expect(Math.abs(r.vertical)).toBeLessThan(1e-6 * step('F_E'));
    expect(r.mx).toBeCloseTo(step('M_E') * Math.cos(0.6), 1);
    expect(r.my).toBeCloseTo(step('M_E') * Math.sin(0.6), 1);
    expect(r.hx).toBeCloseTo(step('F_E') * Math.cos(0.6), 1);
  });

  it('EQU: empty bin, permanent favourable 0.90 and wind 1.50 (EN 1990 Table A1.2(A)); the seismic design situation also with the bin empty', () => {
    const equ = loads.combinations.filter((c) => c.verification === 'EQU');
    expect(equ.map((c) => c.leading)).toEqual(['W', 'W', 'W', 'W']);
    for (const c of equ) {
      expect(c.factors.G).toBe(0.9);
      expect(c.factors.G_roof).toBe(0.9);
      expect(Object.keys(c.factors).some((k) => k.startsWith('Q_s'))).toBe(false);
      expect(Object.entries(c.factors).filter(([k]) => k.startsWith('W_')).map(([, f]) => f)).toEqual([1.5]);
    }
    const empty = loads.combinations.filter((c) => c.verification === 'seismic' && c.clause.includes('bin empty'));
    expect(empty.map((c) => c.leading)).toEqual(['E_0,empty', 'E_34,empty']);
    expect(empty[0]?.factors).toEqual({ G: 1, G_roof: 1, G_eq: 1, 'E_0,empty': 1, Q_eq: 0.8 });
  });

  it('every case and combination is plain data (JSON round trip)', () => {
    expect(JSON.parse(JSON.stringify(loads))).toEqual(loads);
  });
});

describe('rectangular bin input checks (LoadsError with path, range and unit)', () => {
  const wedge: RectangularBinLoadInput = { ...base, bin: { ...base.bin, hopper: { kind: 'wedge', slotAlong: 'x', height: 3, outletWidth: 0.4, thickness: 0.008 } } };
  const errorOf = (input: RectangularBinLoadInput) => {
    try {
      rectangularBinLoads(input);
    } catch (error) {
      return error as { code: string; path: string; message: string };
    }
    return undefined;
  };

  it('negative sizes', () => {
    expect(errorOf({ ...base, bin: { ...base.bin, lengthX: -2 } })).toMatchObject({ code: 'BAD_INPUT', path: 'bin.lengthX', message: 'bin.lengthX must be greater than 0 and less than 60 m; got -2' });
    expect(errorOf({ ...base, bin: { ...base.bin, hopper: { ...pyramid, height: -1 } } })).toMatchObject({ path: 'bin.hopper.height', message: 'bin.hopper.height must be greater than 0 and at most 100 m; got -1' });
  });

  it('a slot wider than the box across it', () => {
    expect(errorOf({ ...wedge, bin: { ...wedge.bin, hopper: { kind: 'wedge', slotAlong: 'x', height: 3, outletWidth: 4.5, thickness: 0.008 } } })).toMatchObject({ path: 'bin.hopper.outletWidth', message: 'bin.hopper.outletWidth must be at least 0 and less than 4 m (below bin.lengthY, the side across the slot); got 4.5' });
  });

  it('a face slope outside 5..85 degrees from the vertical (EN 1991-4 6.1)', () => {
    const flat = errorOf({ ...base, bin: { ...base.bin, hopper: { ...pyramid, height: 0.1 } } });
    expect(flat).toMatchObject({ code: 'BAD_INPUT', path: 'bin.hopper.height' });
    expect(flat?.message).toBe('bin.hopper.height = 0.1 m gives the south and north faces a slope of 86.82 degrees from the vertical; it must be between 5 and 85 degrees (EN 1991-4 6.1: flatter is a flat bottom; steeper is a vertical wall, for which use a wedge hopper): use a height between 0.157 and 20.574 m or change the outlet');
    const steep = errorOf({ ...base, bin: { ...base.bin, hopper: { ...pyramid, outletLengthX: 5.9 } } });
    expect(steep?.message).toMatch(/^bin.hopper.height = 3 m gives the east and west faces a slope of 0.95 degrees from the vertical; it must be between 5 and 85 degrees/);
  });

  it('aspect ratios outside EN 1991-4 (retaining; h_b/d_c >= 10)', () => {
    expect(errorOf({ ...base, bin: { ...base.bin, fillHeight: 1.5 } })).toMatchObject({ code: 'OUT_OF_SCOPE', path: 'bin.fillHeight' });
    expect(errorOf({ ...base, bin: { ...base.bin, lengthX: 3.5, lengthY: 3.5, cylinderHeight: 33, fillHeight: 30, hopper: { ...pyramid, outletLengthY: 0.6 } } })).toMatchObject({ code: 'OUT_OF_SCOPE', path: 'bin.cylinderHeight', message: 'bin.cylinderHeight plus bin.hopper.height over min(bin.lengthX, bin.lengthY) must be below 10 (EN 1991-4 1.1.2: h_b/d_c < 10); got 10.29' });
  });

  it('solid properties outside physical bounds', () => {
    expect(errorOf({ ...base, solid: { ...base.solid, lateralPressureRatio: 1.2 } })).toMatchObject({ path: 'solid.lateralPressureRatio', message: 'solid.lateralPressureRatio must be greater than 0 and less than 1 (dimensionless); got 1.2' });
    expect(errorOf({ ...base, solid: { ...base.solid, lateralPressureRatio: 0.95, lateralPressureRatioFactor: 1.1 } })?.message).toBe('solid.lateralPressureRatio x solid.lateralPressureRatioFactor (the upper characteristic K_u = a_K K_m, EN 1991-4 3.3) must be less than 1 (dimensionless); got 1.045');
    expect(errorOf({ ...base, solid: { ...base.solid, wallFrictionCoefficient: -0.1 } })).toMatchObject({ path: 'solid.wallFrictionCoefficient' });
  });

  it('wind not normal to a pair of walls, equipment off the roof', () => {
    expect(errorOf({ ...base, wind: { basicVelocity: 25, terrainCategory: 'II', supportLevelHeight: 5, directions: [0, Math.PI / 4] } })).toMatchObject({ path: 'wind.directions[1]', message: 'wind.directions[1] must be 0, 90, 180 or 270 degrees (a multiple of 90 degrees: EN 1991-1-4 7.6 gives the force coefficient for wind normal to a face); got 45' });
    expect(errorOf({ ...base, equipment: [{ name: 'fan', x: 7, y: 1, force: 1000 }] })).toMatchObject({ path: 'equipment[0].x', message: 'equipment[0].x must be between -0.006 and 6.006 m (on the roof: within the outer plan, from -t to bin.lengthX + t); got 7' });
  });
});
