import { describe, expect, it } from 'vitest';
import type { EdgeName } from './rectangular-types.js';
import { bendingLineLoad, edgeDirection, edgeLength, edgePoint, shearFlowLineLoad, tubeProperties } from './rectangular-transfer.js';

const EDGES: EdgeName[] = ['south', 'east', 'north', 'west'];

/** Composite Simpson's rule of f(x, y, edge) round the rectangle a x b (independent general-purpose quadrature). */
function roundTheEdges(a: number, b: number, f: (x: number, y: number, edge: EdgeName) => number, intervals = 400): number {
  let total = 0;
  for (const edge of EDGES) {
    const L = edgeLength(edge, a, b);
    const h = L / intervals;
    const at = (s: number) => {
      const p = edgePoint(edge, s, a, b);
      return f(p.x, p.y, edge);
    };
    let sum = at(0) + at(L);
    for (let i = 1; i < intervals; i++) sum += (i % 2 === 1 ? 4 : 2) * at(i * h);
    total += (sum * h) / 3;
  }
  return total;
}

describe('beam theory of the walls as a thin-walled rectangular tube', () => {
  // Symbols: a along X, b along Y (centre-line rectangle), d the side along the wind, w across it.
  const a = 6;
  const b = 4;
  const tube = tubeProperties(a, b);

  it('I_y = d^3/6 + w d^2/2 with d = a along the wind (X): the walls parallel to the wind give 2 d^3/12 (integral of x_r^2 ds, Simpson)', () => {
    const Iy = roundTheEdges(a, b, (x) => (x - a / 2) ** 2);
    const Ix = roundTheEdges(a, b, (_x, y) => (y - b / 2) ** 2);
    expect(tube.Iy).toBeCloseTo(Iy, 9);
    expect(tube.Ix).toBeCloseTo(Ix, 9);
    // Orientation: wind along X, d = a = 6, w = b = 4: 36 + 72 = 108 (not b^3/6 + a b^2/2 = 58.67).
    expect(tube.Iy).toBeCloseTo(a ** 3 / 6 + (b * a * a) / 2, 12);
    expect(tube.Iy).toBeCloseTo(108, 12);
  });

  it('the overturning line load integrates to zero vertical force and to its moment, for any direction (statics)', () => {
    const M = 2.5e6;
    for (const theta of [0, Math.PI / 2, Math.PI, 0.7, 4]) {
      const Mx = M * Math.cos(theta);
      const My = M * Math.sin(theta);
      const n = (x: number, y: number) => bendingLineLoad(tube, Mx, My, x, y);
      expect(Math.abs(roundTheEdges(a, b, n))).toBeLessThan(1e-9 * M);
      // First moments about the centroid: the moment that presses the side toward theta down.
      expect(roundTheEdges(a, b, (x, y) => n(x, y) * (x - a / 2))).toBeCloseTo(Mx, 4);
      expect(roundTheEdges(a, b, (x, y) => n(x, y) * (y - b / 2))).toBeCloseTo(My, 4);
    }
    // Navier on the leeward wall of wind along X: n = M (a/2) / I_y.
    expect(bendingLineLoad(tube, M, 0, a, 1.3)).toBeCloseTo((M * (a / 2)) / (a ** 3 / 6 + (b * a * a) / 2), 6);
  });

  it('the shear flow carries the base shear: resultant (Hx, Hy), no torque about the centroid (statics)', () => {
    for (const [Hx, Hy] of [[1e5, 0], [0, 1e5], [-3e4, 7e4]] as const) {
      const tau = (x: number, y: number, edge: EdgeName) => shearFlowLineLoad(tube, Hx, Hy, edge, x, y);
      expect(roundTheEdges(a, b, (x, y, e) => tau(x, y, e) * edgeDirection(e).x)).toBeCloseTo(Hx, 4);
      expect(roundTheEdges(a, b, (x, y, e) => tau(x, y, e) * edgeDirection(e).y)).toBeCloseTo(Hy, 4);
      const torque = roundTheEdges(a, b, (x, y, e) => tau(x, y, e) * ((x - a / 2) * edgeDirection(e).y - (y - b / 2) * edgeDirection(e).x));
      expect(Math.abs(torque)).toBeLessThan(1e-6 * Math.hypot(Hx, Hy));
    }
  });

  it('the shear flow obeys dq/ds = -(V/I) x_r in every wall and vanishes where the axis of symmetry cuts the walls (Megson, closed sections)', () => {
    const V = 1e5;
    const h = 1e-4;
    for (const edge of EDGES) {
      const L = edgeLength(edge, a, b);
      for (const s of [0.1 * L, 0.37 * L, 0.8 * L]) {
        const p0 = edgePoint(edge, s - h, a, b);
        const p1 = edgePoint(edge, s + h, a, b);
        const p = edgePoint(edge, s, a, b);
        const dq = (shearFlowLineLoad(tube, V, 0, edge, p1.x, p1.y) - shearFlowLineLoad(tube, V, 0, edge, p0.x, p0.y)) / (2 * h);
        expect(dq).toBeCloseTo((-V / tube.Iy) * (p.x - a / 2), 4);
      }
    }
    expect(shearFlowLineLoad(tube, V, 0, 'east', a, b / 2)).toBeCloseTo(0, 9);
    expect(shearFlowLineLoad(tube, V, 0, 'west', 0, b / 2)).toBeCloseTo(0, 9);
    // Corner value q_c = V a b / (4 I_y), continuous round the corner.
    expect(shearFlowLineLoad(tube, V, 0, 'south', a, 0)).toBeCloseTo((V * a * b) / (4 * tube.Iy), 6);
    expect(shearFlowLineLoad(tube, V, 0, 'east', a, 0)).toBeCloseTo((V * a * b) / (4 * tube.Iy), 6);
  });
});
