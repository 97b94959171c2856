import { LuDecomposition, Matrix, solve as denseSolve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { assembleLoads, assembleStiffness, prepareElements } from './assemble.js';
import { bandIndex, createBanded, factorLdlt } from './banded.js';
import { GirderError } from './errors.js';
import { combineLoads } from './loads.js';
import type { GirderModel } from './model.js';
import { numberEquations } from './numbering.js';
import { adjacencyOf, bandwidth, reverseCuthillMcKee } from './rcm.js';
import { factorSystem, relativeResidual, solveChecked } from './solve.js';
import { addSymmetric, createSymmetricSparse, toDense } from './sparse.js';

/** Deterministic pseudo-random numbers in [0, 1) (mulberry32). */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** SPD band matrix A = B Bᵀ + shift I, B lower triangular with `b1` sub-diagonals (so A has half-bandwidth b1). */
function randomSpd(n: number, b1: number, shift: number, rand: () => number): number[][] {
  const B = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (j <= i && i - j <= b1 ? rand() * 2 - 1 : 0)));
  const A = new Matrix(B).mmul(new Matrix(B).transpose()).to2DArray();
  for (let i = 0; i < n; i++) (A[i] as number[])[i] = ((A[i] as number[])[i] as number) + shift;
  return A;
}

function bandOf(A: number[][], b: number) {
  const band = createBanded(A.length, b);
  A.forEach((row, i) => row.forEach((v, j) => {
    if (j <= i && i - j <= b) band.band[bandIndex(band, i, j)] = v;
  }));
  return band;
}

function maxRelativeDifference(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let scale = 0;
  let diff = 0;
  for (let i = 0; i < a.length; i++) {
    scale = Math.max(scale, Math.abs(b[i] as number));
    diff = Math.max(diff, Math.abs((a[i] as number) - (b[i] as number)));
  }
  return diff / scale;
}

describe('banded LDLT against a dense solve (ml-matrix, an independent general library)', () => {
  it('random SPD band matrices, several right-hand sides with one factorisation', () => {
    const rand = random(20240611);
    for (const [n, b1, shift] of [
      [12, 1, 0.1],
      [40, 3, 1e-3],
      [90, 6, 0.5],
    ] as const) {
      const A = randomSpd(n, b1, shift, rand);
      const factor = factorLdlt(bandOf(A, b1));
      for (let rhs = 0; rhs < 3; rhs++) {
        const f = Float64Array.from({ length: n }, () => rand() * 2 - 1);
        const x = factor.solve(f);
        const reference = denseSolve(new Matrix(A), Matrix.columnVector(Array.from(f))).getColumn(0);
        expect(maxRelativeDifference(x, reference)).toBeLessThan(1e-9);
      }
      // D of LDLT: det A = prod D (ml-matrix LU determinant as the independent value).
      const logDet = Array.from(factor.pivots).reduce((s, d) => s + Math.log(d), 0);
      expect(logDet).toBeCloseTo(Math.log(new LuDecomposition(new Matrix(A)).determinant), 8);
    }
  });

  it('a zero pivot raises MECHANISM with the row it found', () => {
    // [[1, 1], [1, 1]] is singular: the second pivot is 0.
    const A = bandOf([[1, 1], [1, 1]], 1);
    expect(() => factorLdlt(A)).toThrowError(GirderError);
    expect(() => factorLdlt(A, { describeRow: (row) => ({ text: `row ${row}`, path: `rows[${row}]` }) })).toThrowError(/^mechanism: row 1 is unrestrained/);
  });

  it('an indefinite matrix (negative pivot) is a mechanism too', () => {
    const A = bandOf([[1, 2], [2, 1]], 1);
    try {
      factorLdlt(A);
      expect.unreachable();
    } catch (error) {
      expect((error as GirderError).code).toBe('MECHANISM');
    }
  });
});

/** A closed ring of `count` straight segments on three vertical supports (plus in-plane restraints). */
function smallRing(count: number): GirderModel {
  const R = 3;
  return {
    nodes: Array.from({ length: count }, (_, k) => ({ id: `R${k}`, x: R * Math.cos((2 * Math.PI * k) / count), y: R * Math.sin((2 * Math.PI * k) / count), z: 0 })),
    elements: Array.from({ length: count }, (_, k) => ({ id: `S${k}`, nodeI: `R${k}`, nodeJ: `R${(k + 1) % count}`, section: 'I' })),
    sections: { I: { A: 84.46e-4, Iy: 23130e-8, Iz: 1318e-8, It: 51.08e-8, Iw: 490e-9, E: 210e9, G: 81e9, density: 7850 } },
    supports: [
      { node: 'R0', fix: ['ux', 'uy', 'uz'] },
      { node: `R${count / 3}`, fix: ['uz', 'uy'] },
      { node: `R${(2 * count) / 3}`, fix: ['uz'] },
    ],
    springs: [],
    loadCases: [
      {
        name: 'Q',
        lineLoads: Array.from({ length: count }, (_, k) => ({ element: `S${k}`, q: [1e3 * Math.cos(k), 2e3, -30e3] as [number, number, number], offset: [0, 0.1, 0.05] as [number, number, number] })),
        nodalLoads: [{ node: 'R1', force: [1e3, -2e3, -5e3], moment: [300, 0, -200] }],
      },
    ],
  };
}

describe('solve of an assembled girder model', () => {
  it('RCM-ordered banded LDLT equals the dense ml-matrix solve, and the residual is at rounding level', () => {
    const model = smallRing(12);
    const numbering = numberEquations(model);
    const elements = prepareElements(model, numbering);
    const K = assembleStiffness(elements, numbering);
    const combined = combineLoads(model, { name: 'Q', factors: { Q: 1 } });
    const { f } = assembleLoads(elements, combined.elements, combined.nodal, numbering);
    const factorisation = factorSystem(K);
    const { u, residual } = solveChecked(K, factorisation, f);
    const reference = denseSolve(new Matrix(toDense(K)), Matrix.columnVector(Array.from(f))).getColumn(0);
    expect(maxRelativeDifference(u, reference)).toBeLessThan(1e-8);
    expect(residual).toBeLessThan(1e-12);
    // The same factorisation reused for a second load vector.
    const f2 = Float64Array.from(f, (v, i) => v * (i % 2 === 0 ? -1 : 0.5));
    const u2 = factorisation.solve(f2);
    const reference2 = denseSolve(new Matrix(toDense(K)), Matrix.columnVector(Array.from(f2))).getColumn(0);
    expect(maxRelativeDifference(u2, reference2)).toBeLessThan(1e-8);
    expect(relativeResidual(K, u2, f2)).toBeLessThan(1e-12);
    // Natural (node-by-node) numbering of a ring couples the first and last nodes: RCM narrows the band.
    const natural = factorSystem(K, { order: Int32Array.from({ length: K.size }, (_, i) => i) });
    expect(factorisation.halfBandwidth).toBeLessThan(natural.halfBandwidth / 2);
    expect(maxRelativeDifference(natural.solve(f), reference)).toBeLessThan(1e-8);
  });

  it('a residual above the tolerance raises RESIDUAL', () => {
    const model = smallRing(6);
    const numbering = numberEquations(model);
    const elements = prepareElements(model, numbering);
    const K = assembleStiffness(elements, numbering);
    const combined = combineLoads(model, { name: 'Q', factors: { Q: 1 } });
    const { f } = assembleLoads(elements, combined.elements, combined.nodal, numbering);
    try {
      // No double-precision solution meets 1e-30.
      solveChecked(K, factorSystem(K), f, 1e-30);
      expect.unreachable();
    } catch (error) {
      expect((error as GirderError).code).toBe('RESIDUAL');
      expect((error as GirderError).message).toMatch(/^the solution does not satisfy K u = f: normwise backward error \d\.\d\de-\d+ exceeds 1e-30 \(relative residual \d\.\d\de-\d+\);/);
    }
  });
});

describe('reverse Cuthill-McKee ordering', () => {
  it('reduces the bandwidth of a shuffled ring numbering to 2 (the optimum for a cycle)', () => {
    const n = 60;
    const rand = random(7);
    const labels = Array.from({ length: n }, (_, i) => i);
    for (let i = n - 1; i > 0; i--) {
      const j = Math.floor(rand() * (i + 1));
      [labels[i], labels[j]] = [labels[j] as number, labels[i] as number];
    }
    const K = createSymmetricSparse(n);
    for (let k = 0; k < n; k++) {
      addSymmetric(K, labels[k] as number, labels[k] as number, 2);
      addSymmetric(K, labels[k] as number, labels[(k + 1) % n] as number, -1);
    }
    const adjacency = adjacencyOf(K);
    const shuffled = bandwidth(adjacency);
    const order = reverseCuthillMcKee(adjacency);
    // A permutation of all vertices.
    expect([...order].sort((a, b) => a - b)).toEqual(labels.slice().sort((a, b) => a - b));
    expect(shuffled).toBeGreaterThan(20);
    // Closed form: a cycle cannot be numbered with bandwidth 1; level sets from one vertex give 2.
    expect(bandwidth(adjacency, order)).toBe(2);
  });

  it('orders disconnected parts one after the other', () => {
    const adjacency = [[1], [0], [3], [2], []];
    const order = reverseCuthillMcKee(adjacency);
    expect([...order].sort()).toEqual([0, 1, 2, 3, 4]);
    expect(bandwidth(adjacency, order)).toBe(1);
  });
});
