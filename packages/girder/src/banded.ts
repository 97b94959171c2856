/**
 * Banded symmetric LDLᵀ factorisation on Float64Array, written here because npm has no maintained
 * sparse Cholesky/LDLᵀ for JavaScript; after RCM ordering the girder stiffness is narrow-banded, so
 * a band solver is both simple and fast enough (work n b², storage n (b + 1)).
 *
 * Storage: the lower band, row by row; entry (i, j), i − b ≤ j ≤ i, at band[i (b + 1) + j − i + b].
 * No pivoting: the stiffness of a stable structure is positive definite. A pivot that is not above
 * `pivotTolerance` times its original diagonal (or is negative) means the leading block is singular
 * or indefinite there: the structure is a mechanism at that freedom.
 */
import { GirderError } from './errors.js';

export interface BandedSymmetric {
  size: number;
  halfBandwidth: number;
  band: Float64Array;
}

export interface LdltFactorisation {
  size: number;
  halfBandwidth: number;
  /** D of LDLᵀ, in factor order. */
  pivots: Float64Array;
  /** Smallest pivot / original diagonal: a conditioning indicator (1 for a diagonal matrix). */
  minPivotRatio: number;
  /** x with A x = rhs; the factorisation can be reused for any number of right-hand sides. */
  solve(rhs: Float64Array): Float64Array;
}

export interface LdltOptions {
  /** Default 1e-10. */
  pivotTolerance?: number;
  /** Names the freedom of a row for the MECHANISM message, e.g. "node N12 dof rx", and its path. */
  describeRow?: (row: number) => { text: string; path: string };
}

export function createBanded(size: number, halfBandwidth: number): BandedSymmetric {
  return { size, halfBandwidth, band: new Float64Array(size * (halfBandwidth + 1)) };
}

/** Index of (i, j), j ≤ i, in the band. */
export function bandIndex(A: BandedSymmetric, i: number, j: number): number {
  return i * (A.halfBandwidth + 1) + j - i + A.halfBandwidth;
}

export function factorLdlt(A: BandedSymmetric, options: LdltOptions = {}): LdltFactorisation {
  const n = A.size;
  const b = A.halfBandwidth;
  const w = b + 1;
  const tolerance = options.pivotTolerance ?? 1e-10;
  const a = Float64Array.from(A.band);
  const D = new Float64Array(n);
  let minPivotRatio = Number.POSITIVE_INFINITY;

  for (let i = 0; i < n; i++) {
    const lo = Math.max(0, i - b);
    const rowI = i * w - i + b;
    // Row i holds t_ij = L_ij D_j while it is being computed (Crout form), L_ij afterwards.
    for (let j = lo; j < i; j++) {
      const rowJ = j * w - j + b;
      let s = a[rowI + j] as number;
      for (let k = Math.max(lo, j - b); k < j; k++) s -= (a[rowI + k] as number) * (a[rowJ + k] as number);
      a[rowI + j] = s;
    }
    let d = a[rowI + i] as number;
    for (let j = lo; j < i; j++) {
      const t = a[rowI + j] as number;
      const l = t / (D[j] as number);
      a[rowI + j] = l;
      d -= t * l;
    }
    const original = A.band[rowI + i] as number;
    const ratio = d / original;
    if (!(original > 0) || !(ratio > tolerance)) {
      const where = options.describeRow?.(i) ?? { text: `equation ${i}`, path: '' };
      throw new GirderError(
        'MECHANISM',
        `mechanism: ${where.text} is unrestrained (pivot ${d.toPrecision(3)} against diagonal ${original.toPrecision(3)}); add a support, a spring or a connecting element`,
        where.path,
        where.text,
      );
    }
    minPivotRatio = Math.min(minPivotRatio, ratio);
    D[i] = d;
    a[rowI + i] = d;
  }

  const solve = (rhs: Float64Array): Float64Array => {
    if (rhs.length !== n) throw new GirderError('BAD_MODEL', `right-hand side has ${rhs.length} entries; the matrix has ${n} rows`);
    const x = Float64Array.from(rhs);
    for (let i = 0; i < n; i++) {
      const rowI = i * w - i + b;
      let s = x[i] as number;
      for (let k = Math.max(0, i - b); k < i; k++) s -= (a[rowI + k] as number) * (x[k] as number);
      x[i] = s;
    }
    for (let i = 0; i < n; i++) x[i] = (x[i] as number) / (D[i] as number);
    for (let i = n - 1; i >= 0; i--) {
      let s = x[i] as number;
      const hi = Math.min(n - 1, i + b);
      for (let k = i + 1; k <= hi; k++) s -= (a[k * w - k + b + i] as number) * (x[k] as number);
      x[i] = s;
    }
    return x;
  };

  return { size: n, halfBandwidth: b, pivots: D, minPivotRatio: n === 0 ? 1 : minPivotRatio, solve };
}
