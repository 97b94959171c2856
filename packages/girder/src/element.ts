/**
 * Straight 3D beam element with 7 freedoms per node, local order
 *   [ux uy uz rx ry rz w]_I, [ux uy uz rx ry rz w]_J   (indices 0..6, 7..13).
 *
 * - axial: EA/L;
 * - bending in the local x-y plane (v, θz = v'), E Iz; in the local x-z plane (w, θy = −w'), E Iy:
 *   Euler–Bernoulli cubic Hermite element, exact for end loads;
 * - torsion with warping (φ = rx, w = φ'): the exact Vlasov element of torsion.ts.
 *
 * Local axes: x from I to J; z the part of `up` normal to x; y = z × x. The transformation
 * T = diag(R, R, 1, R, R, 1) maps global freedoms to local ones (d = T D, rows of R are the local
 * axes in global components); the warping freedom passes through unchanged because φ' keeps its
 * sign when the element is reversed. Ke = Tᵀ ke T, Fe = Tᵀ fe.
 */
import { Matrix } from 'ml-matrix';
import { GirderError } from './errors.js';
import type { SectionStiffness, Vec3 } from './model.js';
import { bimomentAt, clampedEndBimoment, torsionLambda, warpingTorsionStiffness } from './torsion.js';
import { cross, dot, norm, scale, subtract } from './vector.js';

export const ELEMENT_DOFS = 14;

/** Rows are local x, y, z in global components; R v maps a global vector to local components. */
export type DirectionCosines = [Vec3, Vec3, Vec3];

export interface ElementAxes {
  length: number;
  R: DirectionCosines;
}

/** Relative size below which the part of `up` normal to the axis counts as zero (parallel). */
const PARALLEL_TOLERANCE = 1e-6;

/**
 * Local axes of an element from its end points. Throws BAD_MODEL (at `path`) if the ends coincide
 * or if `up` is parallel to the element axis.
 */
export function elementAxes(start: Vec3, end: Vec3, up: Vec3 = [0, 0, 1], path = ''): ElementAxes {
  const chord = subtract(end, start);
  const length = norm(chord);
  if (!(length > 0)) {
    throw new GirderError('BAD_MODEL', `${path || 'element'} has zero length: its two nodes are at the same point`, path);
  }
  const ex = scale(chord, 1 / length);
  const upLength = norm(up);
  const normal = subtract(up, scale(ex, dot(up, ex)));
  const normalLength = norm(normal);
  if (!(upLength > 0) || normalLength <= PARALLEL_TOLERANCE * upLength) {
    const upPath = path ? `${path}.up` : 'up';
    throw new GirderError(
      'BAD_MODEL',
      `${upPath} [${up.join(', ')}] is parallel to the element axis, so it cannot fix the local z axis; give an up vector across the element`,
      upPath,
    );
  }
  const ez = scale(normal, 1 / normalLength);
  const ey = cross(ez, ex);
  return { length, R: [ex, ey, ez] };
}

/** Global → local components of a vector. */
export function toLocal(R: DirectionCosines, v: Vec3): Vec3 {
  return [dot(R[0], v), dot(R[1], v), dot(R[2], v)];
}

/** Local → global components of a vector. */
export function toGlobal(R: DirectionCosines, v: Vec3): Vec3 {
  return [
    R[0][0] * v[0] + R[1][0] * v[1] + R[2][0] * v[2],
    R[0][1] * v[0] + R[1][1] * v[1] + R[2][1] * v[2],
    R[0][2] * v[0] + R[1][2] * v[1] + R[2][2] * v[2],
  ];
}

/** Local stiffness ke (14x14) on the local freedoms listed at the top of this file. */
export function localStiffness(section: SectionStiffness, L: number): Matrix {
  const ke = localStiffnessFlat(section, L);
  return new Matrix(Array.from({ length: ELEMENT_DOFS }, (_, a) => Array.from(ke.subarray(ELEMENT_DOFS * a, ELEMENT_DOFS * (a + 1)))));
}

/** localStiffness as a row-major Float64Array. */
export function localStiffnessFlat(section: SectionStiffness, L: number): Float64Array {
  const { A, Iy, Iz, It, Iw, E, G } = section;
  const n = ELEMENT_DOFS;
  const ke = new Float64Array(n * n);
  const put = (i: number, j: number, v: number): void => {
    ke[n * i + j] = v;
    ke[n * j + i] = v;
  };
  const L2 = L * L;
  const L3 = L2 * L;

  const ka = (E * A) / L;
  put(0, 0, ka);
  put(7, 7, ka);
  put(0, 7, -ka);

  // Bending in x-y (about local z), v = uy, θz = dv/dx: the standard Hermite beam element
  // (e.g. Przemieniecki, Theory of Matrix Structural Analysis, 1968, ch. 5).
  const kz = E * Iz;
  put(1, 1, (12 * kz) / L3);
  put(1, 5, (6 * kz) / L2);
  put(1, 8, (-12 * kz) / L3);
  put(1, 12, (6 * kz) / L2);
  put(5, 5, (4 * kz) / L);
  put(5, 8, (-6 * kz) / L2);
  put(5, 12, (2 * kz) / L);
  put(8, 8, (12 * kz) / L3);
  put(8, 12, (-6 * kz) / L2);
  put(12, 12, (4 * kz) / L);

  // Bending in x-z (about local y), w = uz, θy = −dw/dx: the same matrix with the w–θ terms negated.
  const ky = E * Iy;
  put(2, 2, (12 * ky) / L3);
  put(2, 4, (-6 * ky) / L2);
  put(2, 9, (-12 * ky) / L3);
  put(2, 11, (-6 * ky) / L2);
  put(4, 4, (4 * ky) / L);
  put(4, 9, (6 * ky) / L2);
  put(4, 11, (2 * ky) / L);
  put(9, 9, (12 * ky) / L3);
  put(9, 11, (6 * ky) / L2);
  put(11, 11, (4 * ky) / L);

  const kt = warpingTorsionStiffness({ GIt: G * It, EIw: E * Iw, L });
  const torsionDofs = [3, 6, 10, 13];
  for (let a = 0; a < 4; a++) {
    for (let b = 0; b < 4; b++) {
      ke[n * (torsionDofs[a] as number) + (torsionDofs[b] as number)] = (kt[a] as number[])[b] as number;
    }
  }
  return ke;
}

/** T (14x14): d_local = T d_global. */
export function transformation(R: DirectionCosines): Matrix {
  const T = transformationFlat(R);
  return new Matrix(Array.from({ length: ELEMENT_DOFS }, (_, a) => Array.from(T.subarray(ELEMENT_DOFS * a, ELEMENT_DOFS * (a + 1)))));
}

/** transformation as a row-major Float64Array. */
export function transformationFlat(R: DirectionCosines): Float64Array {
  const n = ELEMENT_DOFS;
  const T = new Float64Array(n * n);
  for (const offset of [0, 3, 7, 10]) {
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) T[n * (offset + i) + offset + j] = (R[i] as Vec3)[j] as number;
    }
  }
  T[n * 6 + 6] = 1;
  T[n * 13 + 13] = 1;
  return T;
}

/** Ke = Tᵀ ke T. */
export function globalStiffness(ke: Matrix, T: Matrix): Matrix {
  const Ke = globalStiffnessFlat(Float64Array.from(ke.to1DArray()), Float64Array.from(T.to1DArray()));
  return new Matrix(Array.from({ length: ELEMENT_DOFS }, (_, a) => Array.from(Ke.subarray(ELEMENT_DOFS * a, ELEMENT_DOFS * (a + 1)))));
}

/** Ke = Tᵀ ke T on row-major 14×14 arrays (plain loops: this runs for every element of every analysis). */
export function globalStiffnessFlat(ke: Float64Array, T: Float64Array): Float64Array {
  const n = ELEMENT_DOFS;
  const kT = new Float64Array(n * n);
  for (let a = 0; a < n; a++) {
    for (let c = 0; c < n; c++) {
      const v = ke[a * n + c] as number;
      if (v === 0) continue;
      for (let b = 0; b < n; b++) kT[a * n + b] = (kT[a * n + b] as number) + v * (T[c * n + b] as number);
    }
  }
  const Ke = new Float64Array(n * n);
  for (let c = 0; c < n; c++) {
    for (let a = 0; a < n; a++) {
      const v = T[c * n + a] as number;
      if (v === 0) continue;
      for (let b = 0; b < n; b++) Ke[a * n + b] = (Ke[a * n + b] as number) + v * (kT[c * n + b] as number);
    }
  }
  // Exactly symmetric (the products round differently in the two triangles).
  for (let a = 0; a < n; a++) {
    for (let b = 0; b < a; b++) {
      const v = 0.5 * ((Ke[a * n + b] as number) + (Ke[b * n + a] as number));
      Ke[a * n + b] = v;
      Ke[b * n + a] = v;
    }
  }
  return Ke;
}

/**
 * Consistent nodal loads fe (local) of uniform loads over the whole element: force q (N/m) and
 * distributed moment m (N·m/m), local components. These are the work-equivalent loads of the
 * element's own (exact, for these loads) shape functions, i.e. minus the fixed-end forces:
 *   q: (qL/2, ±qL²/12) per end;  m_y, m_z: a couple of end forces ±m (no end moments);
 *   m_x: torques mL/2 and bimoments (+Bc, −Bc) from torsion.ts.
 */
export function consistentLoads(section: SectionStiffness, L: number, q: Vec3, m: Vec3): Float64Array {
  const fe = new Float64Array(ELEMENT_DOFS);
  const [qx, qy, qz] = q;
  const [mx, my, mz] = m;
  const L2 = L * L;
  fe[0] = (qx * L) / 2;
  fe[7] = (qx * L) / 2;
  fe[1] = (qy * L) / 2 - mz;
  fe[5] = (qy * L2) / 12;
  fe[8] = (qy * L) / 2 + mz;
  fe[12] = (-qy * L2) / 12;
  fe[2] = (qz * L) / 2 + my;
  fe[4] = (-qz * L2) / 12;
  fe[9] = (qz * L) / 2 - my;
  fe[11] = (qz * L2) / 12;
  const Bc = clampedEndBimoment(mx, { GIt: section.G * section.It, EIw: section.E * section.Iw, L });
  fe[3] = (mx * L) / 2;
  fe[10] = (mx * L) / 2;
  fe[6] = Bc;
  fe[13] = -Bc;
  return fe;
}

/**
 * Internal resultants at a station, local axes. Sign convention: resultants acting on the face
 * whose outward normal is +x local (the part beyond the station acting on the part before it),
 * as right-handed vectors:
 *   N > 0 tension; Vy, Vz shear forces along +y, +z;
 *   My = ∫σ z dA, Mz = −∫σ y dA, so σ = N/A + My z/Iy − Mz y/Iz (My > 0: tension on the +z side);
 *   T = Tsv + Tw total torque about +x; Tsv = G It φ' (St Venant); Tw = −E Iw φ''' (warping);
 *   B = E Iw φ'' bimoment.
 */
export interface StationResultants {
  /** Distance from node I, m. */
  x: number;
  N: number;
  Vy: number;
  Vz: number;
  T: number;
  Tsv: number;
  Tw: number;
  My: number;
  Mz: number;
  B: number;
}

/**
 * Resultants along an element from its local end forces p = ke d − fe (the forces the nodes apply
 * to the element) and its uniform local loads q, m. At x = 0 the internal resultants are −p_I; the
 * rest follows from equilibrium of the part [0, x]:
 *   N' = −qx, Vy' = −qy, Vz' = −qz, T' = −mx, My' = Vz − my, Mz' = −Vy − mz,
 * and the bimoment from the exact solution B'' − λ² B = mx between the end bimoments −p_I,w and
 * p_J,w, which also splits T into Tw = −B' and Tsv = T − Tw.
 */
export function resultantsAlong(
  section: SectionStiffness,
  L: number,
  p: Float64Array,
  q: Vec3,
  m: Vec3,
  xs: readonly number[],
  /** When given, each station also names its element (first, as a Station of the results). */
  element?: string,
): StationResultants[] {
  const N0 = -(p[0] as number);
  const Vy0 = -(p[1] as number);
  const Vz0 = -(p[2] as number);
  const T0 = -(p[3] as number);
  const My0 = -(p[4] as number);
  const Mz0 = -(p[5] as number);
  const B0 = -(p[6] as number);
  const BL = p[13] as number;
  const [qx, qy, qz] = q;
  const [mx, my, mz] = m;
  const lambda = torsionLambda({ GIt: section.G * section.It, EIw: section.E * section.Iw, L });
  return xs.map((x) => {
    const T = T0 - mx * x;
    const warping = bimomentAt(x, L, lambda, B0, BL, mx);
    const Tw = -warping.dB;
    const N = N0 - qx * x;
    const Vy = Vy0 - qy * x;
    const Vz = Vz0 - qz * x;
    const My = My0 + Vz0 * x - (qz * x * x) / 2 - my * x;
    const Mz = Mz0 - Vy0 * x + (qy * x * x) / 2 - mz * x;
    // One object literal per shape (with or without the element's id first), built whole.
    return element === undefined
      ? { x, N, Vy, Vz, T, Tsv: T - Tw, Tw, My, Mz, B: warping.B }
      : { element, x, N, Vy, Vz, T, Tsv: T - Tw, Tw, My, Mz, B: warping.B };
  });
}
