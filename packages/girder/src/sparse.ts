/**
 * Symmetric sparse matrix held as one map per row (column → value), both triangles stored. Maps
 * keep assembly simple (entries are summed where elements meet) and give the RCM graph for free;
 * the solver copies the entries into a band after reordering (banded.ts).
 */
export interface SymmetricSparse {
  size: number;
  rows: Map<number, number>[];
}

export function createSymmetricSparse(size: number): SymmetricSparse {
  return { size, rows: Array.from({ length: size }, () => new Map<number, number>()) };
}

/** Adds v to (i, j) and, off the diagonal, to (j, i). */
export function addSymmetric(K: SymmetricSparse, i: number, j: number, v: number): void {
  const rowI = K.rows[i] as Map<number, number>;
  rowI.set(j, (rowI.get(j) ?? 0) + v);
  if (i !== j) {
    const rowJ = K.rows[j] as Map<number, number>;
    rowJ.set(i, (rowJ.get(i) ?? 0) + v);
  }
}

/** A copy that can be modified (e.g. springs switched on) without touching the original. */
export function copySymmetricSparse(K: SymmetricSparse): SymmetricSparse {
  return { size: K.size, rows: K.rows.map((row) => new Map(row)) };
}

// Error-free transformations (Dekker 1971; Knuth, TAOCP vol. 2, 4.2.2) and the compensated dot
// product Dot2 of Ogita, Rump & Oishi (SIAM J. Sci. Comput. 26, 2005): as accurate as if computed
// in twice the working precision. Used for residuals, whose rounding in plain double precision
// (about 1e-16 times Σ|K_ij u_j|, far above |f| for short stiff elements) would hide the true error.
const SPLITTER = 134217729; // 2^27 + 1

function twoProduct(a: number, b: number): [number, number] {
  const x = a * b;
  let c = SPLITTER * a;
  const ah = c - (c - a);
  const al = a - ah;
  c = SPLITTER * b;
  const bh = c - (c - b);
  const bl = b - bh;
  return [x, al * bl - (((x - ah * bh) - al * bh) - ah * bl)];
}

/** r = f − K u, each row summed with Dot2. */
export function residual(K: SymmetricSparse, u: Float64Array, f: Float64Array): Float64Array {
  const r = new Float64Array(K.size);
  K.rows.forEach((row, i) => {
    let p = f[i] as number;
    let s = 0;
    for (const [j, v] of row) {
      const [h, e] = twoProduct(-v, u[j] as number);
      const x = p + h;
      const z = x - p;
      s += p - (x - z) + (h - z) + e;
      p = x;
    }
    r[i] = p + s;
  });
  return r;
}

/** The dense matrix, for tests and small cross-checks. */
export function toDense(K: SymmetricSparse): number[][] {
  const dense = Array.from({ length: K.size }, () => new Array<number>(K.size).fill(0));
  K.rows.forEach((row, i) => {
    for (const [j, v] of row) (dense[i] as number[])[j] = v;
  });
  return dense;
}
