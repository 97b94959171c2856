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


/**
 * Compressed sparse rows, both triangles, columns sorted: the fast form of a fixed pattern, used
 * where the same pattern is refilled many times (contact iterations) and for residuals.
 */
export interface CsrMatrix {
  size: number;
  rowStart: Int32Array;
  column: Int32Array;
  value: Float64Array;
}

export function csrFromSparse(K: SymmetricSparse): CsrMatrix {
  const rowStart = new Int32Array(K.size + 1);
  K.rows.forEach((row, i) => {
    rowStart[i + 1] = (rowStart[i] as number) + row.size;
  });
  const nnz = rowStart[K.size] as number;
  const column = new Int32Array(nnz);
  const value = new Float64Array(nnz);
  K.rows.forEach((row, i) => {
    let at = rowStart[i] as number;
    for (const j of [...row.keys()].sort((a, b) => a - b)) {
      column[at] = j;
      value[at] = row.get(j) as number;
      at++;
    }
  });
  return { size: K.size, rowStart, column, value };
}

/**
 * CSR from coordinate triplets (i, j, v), duplicates summed; the caller gives both triangles.
 * Entries with v = 0 are kept, so a triplet can reserve a place in the pattern.
 */
export function csrFromTriplets(size: number, rows: Int32Array, columns: Int32Array, values: Float64Array, count: number): CsrMatrix {
  // Counting sort by row, then each row sorted by column and merged.
  const rowCount = new Int32Array(size + 1);
  for (let t = 0; t < count; t++) rowCount[(rows[t] as number) + 1] = (rowCount[(rows[t] as number) + 1] as number) + 1;
  for (let i = 0; i < size; i++) rowCount[i + 1] = (rowCount[i + 1] as number) + (rowCount[i] as number);
  const fill = Int32Array.from(rowCount.subarray(0, size));
  const byRow = new Int32Array(count);
  for (let t = 0; t < count; t++) {
    const i = rows[t] as number;
    byRow[fill[i] as number] = t;
    fill[i] = (fill[i] as number) + 1;
  }
  const rowStart = new Int32Array(size + 1);
  const column = new Int32Array(count);
  const value = new Float64Array(count);
  let nnz = 0;
  for (let i = 0; i < size; i++) {
    rowStart[i] = nnz;
    const lo = rowCount[i] as number;
    const hi = rowCount[i + 1] as number;
    // Insertion sort of the row's triplets by column (rows hold a few dozen entries).
    for (let x = lo + 1; x < hi; x++) {
      const t = byRow[x] as number;
      const key = columns[t] as number;
      let y = x - 1;
      while (y >= lo && (columns[byRow[y] as number] as number) > key) {
        byRow[y + 1] = byRow[y] as number;
        y--;
      }
      byRow[y + 1] = t;
    }
    let last = -1;
    for (let x = lo; x < hi; x++) {
      const t = byRow[x] as number;
      const j = columns[t] as number;
      if (j === last) value[nnz - 1] = (value[nnz - 1] as number) + (values[t] as number);
      else {
        column[nnz] = j;
        value[nnz] = values[t] as number;
        nnz++;
        last = j;
      }
    }
  }
  rowStart[size] = nnz;
  return { size, rowStart, column: column.slice(0, nnz), value: value.slice(0, nnz) };
}

/** Graph of the off-diagonal entries of a CSR pattern (rows sorted), for the RCM ordering. */
export function adjacencyOfCsr(A: CsrMatrix): number[][] {
  const adjacency: number[][] = [];
  for (let i = 0; i < A.size; i++) {
    const neighbours: number[] = [];
    for (let k = A.rowStart[i] as number; k < (A.rowStart[i + 1] as number); k++) if (A.column[k] !== i) neighbours.push(A.column[k] as number);
    adjacency.push(neighbours);
  }
  return adjacency;
}

/** Position of (i, j) in a CSR pattern, or −1. */
export function csrIndex(A: CsrMatrix, i: number, j: number): number {
  let lo = A.rowStart[i] as number;
  let hi = (A.rowStart[i + 1] as number) - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    const c = A.column[mid] as number;
    if (c === j) return mid;
    if (c < j) lo = mid + 1;
    else hi = mid - 1;
  }
  return -1;
}

/** r = f − A u, each row summed with Dot2 (as `residual`). */
export function residualCsr(A: CsrMatrix, u: Float64Array, f: Float64Array): Float64Array {
  const r = new Float64Array(A.size);
  for (let i = 0; i < A.size; i++) {
    let p = f[i] as number;
    let s = 0;
    const end = A.rowStart[i + 1] as number;
    for (let k = A.rowStart[i] as number; k < end; k++) {
      const [h, e] = twoProduct(-(A.value[k] as number), u[A.column[k] as number] as number);
      const x = p + h;
      const z = x - p;
      s += p - (x - z) + (h - z) + e;
      p = x;
    }
    r[i] = p + s;
  }
  return r;
}

/** y = A x in plain double precision. */
export function multiplyCsr(A: CsrMatrix, x: Float64Array): Float64Array {
  const y = new Float64Array(A.size);
  for (let i = 0; i < A.size; i++) {
    let s = 0;
    const end = A.rowStart[i + 1] as number;
    for (let k = A.rowStart[i] as number; k < end; k++) s += (A.value[k] as number) * (x[A.column[k] as number] as number);
    y[i] = s;
  }
  return y;
}

/** ‖A‖∞, the largest absolute row sum. */
export function infinityNorm(A: CsrMatrix): number {
  let norm = 0;
  for (let i = 0; i < A.size; i++) {
    let s = 0;
    const end = A.rowStart[i + 1] as number;
    for (let k = A.rowStart[i] as number; k < end; k++) s += Math.abs(A.value[k] as number);
    norm = Math.max(norm, s);
  }
  return norm;
}

/** The dense matrix, for tests and small cross-checks. */
export function toDense(K: SymmetricSparse): number[][] {
  const dense = Array.from({ length: K.size }, () => new Array<number>(K.size).fill(0));
  K.rows.forEach((row, i) => {
    for (const [j, v] of row) (dense[i] as number[])[j] = v;
  });
  return dense;
}
