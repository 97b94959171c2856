import { describe, expect, it } from 'vitest';
import { rectangularBinLoads, type PyramidHopper, type RectangularBinLoadInput, type RectangularLoadSet } from './rectangular.js';
import { levelOfLargestBandMoment, patchWalls, rectangularPatchCaseName } from './rectangular-patch.js';

const DEG = Math.PI / 180;
const pyramid: PyramidHopper = { kind: 'pyramid', height: 3, outletLengthX: 0.6, outletLengthY: 0.4, thickness: 0.008 };
// A slender box: a = 6 m, b = 4 m (d_c = 4 m), h_c = 9 m, h_c/d_c = 2.25; about 230 t of wheat: AAC 2.
const base: RectangularBinLoadInput = {
  bin: { lengthX: 6, lengthY: 4, cylinderHeight: 10, fillHeight: 9, wallThickness: 0.006, hopper: pyramid, steelDensity: 7850 },
  // EN 1991-4:2006 Table E.1, wheat (read in the standard): C_op = 0.5.
  solid: { name: 'wheat', unitWeight: 9000, lateralPressureRatio: 0.54, lateralPressureRatioFactor: 1.11, wallFrictionCoefficient: 0.38, wallFrictionFactor: 1.16, angleOfRepose: 34 * DEG, internalFrictionAngle: 30 * DEG, internalFrictionFactor: 1.12, patchLoadFactor: 0.5 },
  partialFactors: { permanentFactor: 1.35, solidFactor: 1.5 },
  stationsPerEdge: 201,
};
const FILLING = ['Q_s,pf,N', 'Q_s,pf,E', 'Q_s,pf,S', 'Q_s,pf,W'];
const DISCHARGE = ['Q_s,pe,N', 'Q_s,pe,E', 'Q_s,pe,S', 'Q_s,pe,W'];
const patchNames = (loads: RectangularLoadSet) => loads.cases.filter((c) => /^Q_s,p[fe],[NESW]$/.test(c.name)).map((c) => c.name);

/** Simpson's rule over evenly spaced stations (odd count): independent general-purpose quadrature. */
function simpson(s: number[], q: number[]): number {
  const n = s.length - 1;
  const h = ((s[n] ?? 0) - (s[0] ?? 0)) / n;
  let sum = (q[0] ?? 0) + (q[n] ?? 0);
  for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * (q[i] ?? 0);
  return (sum * h) / 3;
}

/** Resultants of a case's edge loads: vertical, first moments about the centroid, horizontal (N, N m). */
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

/** Root of f on [lo, hi] by bisection (f(lo), f(hi) of opposite signs): general-purpose numerics. */
function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  for (let i = 0; i < 200; i++) {
    const m = (a + b) / 2;
    if (Math.sign(f(m)) === Math.sign(f(a))) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

describe('level of the largest band moment', () => {
  it('p(z) = z: z (h - z) is largest at h/2 (calculus); a range that excludes h/2 gives its nearer end', () => {
    expect(levelOfLargestBandMoment((z) => z, 10, 0, 10)).toBeCloseTo(5, 7);
    expect(levelOfLargestBandMoment((z) => z, 10, 6, 10)).toBeCloseTo(6, 7);
    expect(levelOfLargestBandMoment((z) => z, 10, 0, 3)).toBeCloseTo(3, 7);
  });
});

describe('patch band of the rectangular bin (EN 1991-4 5.2.1.4, 5.2.2.4, from memory)', () => {
  const loads = rectangularBinLoads(base);
  const step = (symbol: string) => loads.derivation.find((d) => d.symbol === symbol)?.value ?? Number.NaN;
  const caseOf = (name: string) => loads.cases.find((c) => c.name === name);
  // By hand. Table 3.1 (REFERENCES.md §1, from memory) for the largest normal pressure: K upper, mu lower.
  const dc = 4;
  const hc = 9;
  const K = 0.54 * 1.11;
  const mu = 0.38 / 1.16;
  const AoverU = (6 * 4) / (2 * (6 + 4));
  const z0 = AoverU / (K * mu); // EN 1991-4 5.2.1.1 (Janssen)
  const pho = 9000 * K * z0;
  // C_pf = 0.21 C_op (1 + 2 E^2)(1 - exp(-1.5 (h_c/d_c - 1))), E = 0; C_pe = 2 C_pf (REFERENCES.md §1, EN 1991-4 5.2.1.2, 5.2.2.2, from memory).
  const Cpf = 0.21 * 0.5 * (1 - Math.exp(-1.5 * (hc / dc - 1)));
  const Cpe = 0.42 * 0.5 * (1 - Math.exp(-1.5 * (hc / dc - 1)));
  const s = (Math.PI * dc) / 16; // EN 1991-4 5.2.1.2 (from memory)
  // The band at any level: largest F (h_c - z) with F proportional to p_hf(z) = p_ho (1 - exp(-z/z_o)).
  // d/dz = 0 gives (h_c - z)/z_o = exp(z/z_o) - 1 (calculus), solved here by bisection.
  const zp = bisect((z) => (hc - z) / z0 - (Math.exp(z / z0) - 1), 0, hc);
  const phf = pho * (1 - Math.exp(-zp / z0));

  it('C_pf by hand: 0.105 (1 - exp(-1.875)) = 0.0889 for h_c/d_c = 2.25, C_op = 0.5; C_pe = 2 C_pf; s = pi d_c/16', () => {
    expect(Cpf).toBeCloseTo(0.0888977, 6);
    expect(step('C_pf')).toBeCloseTo(Cpf, 12);
    expect(step('C_pe')).toBeCloseTo(Cpe, 12);
    expect(step('s')).toBeCloseTo(0.785398, 6);
    expect(step('z_p')).toBeCloseTo(zp, 6);
    expect(zp).toBeCloseTo(3.7757, 3);
    for (const symbol of ['C_pf', 'C_pe', 's', 'z_p', 'p_pf,nc', 'p_pe,nc', 'F_pf (north, south walls, B = a)', 'M_pe (east, west walls, B = b)']) {
      expect(loads.derivation.find((d) => d.symbol === symbol)?.clause).toMatch(/from memory/);
    }
  });

  it('F = 0.36 C_p p_h(z_p) s B and M = F (h_c - z_p) by hand, for each wall and state, as the case states them', () => {
    // Discharge: p_pe = C_pe C_h p_hf with C_h = 1.15 (slender, AAC 2; EN 1991-4 5.2.2.1, from memory).
    for (const [names, factor] of [[FILLING, Cpf], [DISCHARGE, Cpe * 1.15]] as const) {
      for (const name of names) {
        const wall = name.slice(-1);
        const B = wall === 'N' || wall === 'S' ? 6 : 4;
        const F = 0.36 * factor * phf * s * B;
        const M = F * (hc - zp);
        const c = caseOf(name);
        expect(Math.hypot(c?.horizontalResultant?.x ?? 0, c?.horizontalResultant?.y ?? 0) / F).toBeCloseTo(1, 6);
        expect(Math.hypot(c?.overturningMoment?.x ?? 0, c?.overturningMoment?.y ?? 0) / M).toBeCloseTo(1, 6);
        expect(c?.verticalResultant).toBe(0);
      }
    }
    expect(step('F_pf (north, south walls, B = a)')).toBeCloseTo(0.36 * Cpf * phf * s * 6, 4);
    expect(step('M_pe (east, west walls, B = b)')).toBeCloseTo(0.36 * Cpe * 1.15 * phf * s * 4 * (hc - zp), 3);
    // Outward: the band on the north wall pushes the bin toward +Y, the east one toward +X.
    expect(caseOf('Q_s,pf,N')?.horizontalResultant?.y).toBeGreaterThan(0);
    expect(caseOf('Q_s,pf,E')?.horizontalResultant?.x).toBeGreaterThan(0);
    expect(caseOf('Q_s,pe,S')?.horizontalResultant?.y).toBeLessThan(0);
    expect(caseOf('Q_s,pe,W')?.horizontalResultant?.x).toBeLessThan(0);
  });

  it('each patch case: the edge loads integrate to zero vertical force, the stated moment and the stated base shear (statics, Simpson)', () => {
    expect(patchNames(loads)).toEqual([...FILLING, ...DISCHARGE]);
    for (const name of [...FILLING, ...DISCHARGE]) {
      const c = caseOf(name);
      const r = resultants(loads, name, 6, 4);
      const M = c?.overturningMoment ?? { x: Number.NaN, y: Number.NaN };
      const H = c?.horizontalResultant ?? { x: Number.NaN, y: Number.NaN };
      const scale = Math.hypot(M.x, M.y);
      expect(Math.abs(r.vertical) * 6).toBeLessThan(1e-9 * scale);
      // Convention of the load case: M = (My', -Mx').
      expect(Math.hypot(r.my - M.x, -r.mx - M.y)).toBeLessThan(1e-6 * scale);
      expect(Math.hypot(r.hx - H.x, r.hy - H.y)).toBeLessThan(1e-4 * Math.hypot(H.x, H.y));
      // The moment presses the support line down on the side of the loaded wall.
      const wall = patchWalls(6, 4).find((w) => rectangularPatchCaseName('filling', w) === name || rectangularPatchCaseName('discharge', w) === name);
      expect(r.mx * (wall?.outward.x ?? 0) + r.my * (wall?.outward.y ?? 0)).toBeGreaterThan(0);
    }
  });

  it('the band on the south wall is the mirror of the one on the north wall: every edge load the same with the sign flipped (symmetry)', () => {
    for (const [north, south] of [['Q_s,pf,N', 'Q_s,pf,S'], ['Q_s,pe,E', 'Q_s,pe,W']] as const) {
      for (const e of loads.edges.filter((x) => x.case === north)) {
        const m = loads.edges.find((x) => x.case === south && x.edge === e.edge);
        e.vertical.forEach((v, i) => expect(v + (m?.vertical[i] ?? Number.NaN)).toBeCloseTo(0, 9));
        e.along.forEach((v, i) => expect(v + (m?.along[i] ?? Number.NaN)).toBeCloseTo(0, 9));
      }
    }
  });

  it('combinations take at most one patch case, filling patches with Q_s,f and discharge patches with Q_s,e; every patch case is used; the seismic design situation takes the solid without a patch', () => {
    const withSeismic = rectangularBinLoads({ ...base, seismic: { horizontalCoefficient: 0.1, directions: [0] } });
    const used = new Set<string>();
    for (const c of withSeismic.combinations) {
      const patches = Object.keys(c.factors).filter((k) => /^Q_s,p[fe],/.test(k));
      expect(patches.length).toBeLessThanOrEqual(1);
      for (const p of patches) {
        used.add(p);
        expect(c.factors[p.startsWith('Q_s,pf') ? 'Q_s,f' : 'Q_s,e']).toBe(c.factors[p]);
        expect(c.factors[p.startsWith('Q_s,pf') ? 'Q_s,e' : 'Q_s,f']).toBeUndefined();
      }
      if (c.verification === 'seismic') expect(patches).toEqual([]);
    }
    expect([...used].sort()).toEqual([...FILLING, ...DISCHARGE].sort());
  });

  it('removes the old note; thin- and thick-walled bins take the same band (the non-circular rule makes no distinction, from memory)', () => {
    expect(loads.notes.some((n) => n.includes('not applied to the support line'))).toBe(false);
    expect(loads.notes.some((n) => n.startsWith('Patch loads of the rectangular bin') && n.includes('from memory'))).toBe(true);
    expect(loads.classification.thinWalled).toBe(true);
    const thick = rectangularBinLoads({ ...base, bin: { ...base.bin, wallThickness: 0.025 } });
    expect(thick.classification.thinWalled).toBe(false);
    for (const name of [...FILLING, ...DISCHARGE]) {
      expect(thick.cases.find((c) => c.name === name)?.horizontalResultant).toEqual(caseOf(name)?.horizontalResultant);
    }
  });

  it('AAC 3 takes the same band at the same level (the band may act at any level in every class)', () => {
    const aac3 = rectangularBinLoads({ ...base, bin: { ...base.bin, actionAssessmentClass: 3 } });
    expect(aac3.derivation.find((d) => d.symbol === 'z_p')?.value).toBeCloseTo(zp, 6);
    expect(patchNames(aac3)).toEqual([...FILLING, ...DISCHARGE]);
  });
});

describe('no patch cases', () => {
  it('in AAC 1 (enlarged discharge factors instead, EN 1991-4 5.2.2.1, from memory)', () => {
    // 2 m x 1.5 m, h_c = 3 m (h_c/d_c = 2): about 10 t of wheat, under 100 t: AAC 1 (Table 2.1, from memory).
    const small = rectangularBinLoads({ ...base, bin: { ...base.bin, lengthX: 2, lengthY: 1.5, cylinderHeight: 3.3, fillHeight: 3, hopper: { ...pyramid, height: 1, outletLengthX: 0.3, outletLengthY: 0.3 } } });
    expect(small.classification.actionAssessmentClass).toBe(1);
    expect(patchNames(small)).toEqual([]);
    expect(small.combinations.some((c) => Object.keys(c.factors).some((k) => k.startsWith('Q_s,p')))).toBe(false);
    expect(small.notes.some((n) => n.startsWith('AAC 1: patch loads are not applied'))).toBe(true);
  });

  it('for h_c/d_c <= 1: C_pf = C_pe = 0 (EN 1991-4 5.2.1.2, 5.2.2.2, from memory)', () => {
    for (const fillHeight of [4, 3.6]) {
      const squat = rectangularBinLoads({ ...base, bin: { ...base.bin, fillHeight, actionAssessmentClass: 2 } });
      expect(squat.derivation.find((d) => d.symbol === 'C_pf')?.value).toBe(0);
      expect(squat.derivation.find((d) => d.symbol === 'C_pe')?.value).toBe(0);
      expect(patchNames(squat)).toEqual([]);
      expect(squat.notes.some((n) => n.startsWith('No patch loads: C_pf = C_pe = 0'))).toBe(true);
    }
  });
});
