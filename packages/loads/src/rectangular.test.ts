import { describe, expect, it } from 'vitest';
import { rectangularBinLoads, tributaryDepth, type RectangularBinLoadInput } from './rectangular.js';

const DEG = Math.PI / 180;
const base: RectangularBinLoadInput = {
  bin: { lengthX: 6, lengthY: 4, cylinderHeight: 10, fillHeight: 9, wallThickness: 0.006, hopper: { kind: 'pyramid', height: 3, outletLengthX: 0.6, outletLengthY: 0.4, thickness: 0.008 }, steelDensity: 7850 },
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
    expect(() => rectangularBinLoads({ ...base, bin: { ...base.bin, hopper: { ...base.bin.hopper, outletLengthY: 5 } } })).toThrowError('bin.hopper.outletLengthY must be at least 0 and less than 4 m (below bin.lengthY); got 5');
  });
});
