/**
 * Element preparation and assembly into the sparse global system. Elements and springs are added
 * by separate functions so that a contact solver can keep the element part and switch springs on
 * and off (addSpringStiffness with factor −1 removes one again).
 */
import type { DirectionCosines } from './element.js';
import { consistentLoads, elementAxes, globalStiffnessFlat, localStiffnessFlat, toLocal, transformationFlat } from './element.js';
import type { UniformElementLoad } from './loads.js';
import type { GirderModel, SectionStiffness, Vec3 } from './model.js';
import { DOFS_PER_NODE } from './model.js';
import type { EquationNumbering } from './numbering.js';
import type { SymmetricSparse } from './sparse.js';
import { addSymmetric, createSymmetricSparse } from './sparse.js';
import { cross } from './vector.js';

export interface PreparedElement {
  id: string;
  /** Node indices (numbering.nodeIndex). */
  nodeI: number;
  nodeJ: number;
  length: number;
  R: DirectionCosines;
  section: SectionStiffness;
  /** Local stiffness, transformation and global stiffness, row-major 14×14. */
  ke: Float64Array;
  T: Float64Array;
  Ke: Float64Array;
  /** The 14 global slots of the element freedoms (warping: see numbering.elementWarpingSlot). */
  slots: Int32Array;
}

function pointOf(model: GirderModel, n: number): Vec3 {
  const node = model.nodes[n];
  if (node === undefined) throw new Error(`node index ${n} out of range`);
  return [node.x, node.y, node.z];
}

export function prepareElements(model: GirderModel, numbering: EquationNumbering): PreparedElement[] {
  return model.elements.map((element, i) => {
    const nodeI = numbering.nodeIndex.get(element.nodeI) as number;
    const nodeJ = numbering.nodeIndex.get(element.nodeJ) as number;
    const section = model.sections[element.section] as SectionStiffness;
    const { length, R } = elementAxes(pointOf(model, nodeI), pointOf(model, nodeJ), element.up, `elements[${i}]`);
    const ke = localStiffnessFlat(section, length);
    const T = transformationFlat(R);
    const slots = new Int32Array(14);
    for (let k = 0; k < DOFS_PER_NODE; k++) {
      slots[k] = nodeI * DOFS_PER_NODE + k;
      slots[DOFS_PER_NODE + k] = nodeJ * DOFS_PER_NODE + k;
    }
    // Warping freedoms: the node's, or the end's own where warping is released (numbering.ts).
    slots[6] = numbering.elementWarpingSlot[2 * i] as number;
    slots[13] = numbering.elementWarpingSlot[2 * i + 1] as number;
    return { id: element.id, nodeI, nodeJ, length, R, section, ke, T, Ke: globalStiffnessFlat(ke, T), slots };
  });
}

/** Sparse K of the elements alone, over the free equations. */
export function assembleStiffness(elements: readonly PreparedElement[], numbering: EquationNumbering): SymmetricSparse {
  const K = createSymmetricSparse(numbering.equationCount);
  for (const element of elements) {
    const eq = Array.from(element.slots, (slot) => numbering.equation[slot] as number);
    for (let a = 0; a < 14; a++) {
      const p = eq[a] as number;
      if (p < 0) continue;
      for (let b = 0; b <= a; b++) {
        const q = eq[b] as number;
        if (q < 0) continue;
        const v = element.Ke[14 * a + b] as number;
        if (v !== 0) addSymmetric(K, p, q, v);
      }
    }
  }
  return K;
}

export interface PreparedSpring {
  id: string;
  node: number;
  stiffness: number;
  /** g = [d; r × d]: the point's displacement along d is gᵀ [u; θ] of the node (6 entries). */
  g: readonly number[];
  /** Global slots of the node's translations and rotations (6 entries). */
  slots: readonly number[];
  /** Point of action (node + offset), global. */
  point: Vec3;
  direction: Vec3;
}

export function prepareSprings(model: GirderModel, numbering: EquationNumbering): PreparedSpring[] {
  return model.springs.map((spring) => {
    const node = numbering.nodeIndex.get(spring.node) as number;
    const r = spring.offset ?? [0, 0, 0];
    const d = spring.direction;
    const rxd = cross(r, d);
    const base = pointOf(model, node);
    return {
      id: spring.id,
      node,
      stiffness: spring.stiffness,
      g: [d[0], d[1], d[2], rxd[0], rxd[1], rxd[2]],
      slots: [0, 1, 2, 3, 4, 5].map((k) => node * DOFS_PER_NODE + k),
      point: [base[0] + r[0], base[1] + r[1], base[2] + r[2]],
      direction: d,
    };
  });
}

/** Adds factor · k g gᵀ to K (factor −1 takes a spring out again). */
export function addSpringStiffness(K: SymmetricSparse, numbering: EquationNumbering, spring: PreparedSpring, factor = 1): void {
  const k = factor * spring.stiffness;
  for (let a = 0; a < 6; a++) {
    const p = numbering.equation[spring.slots[a] as number] as number;
    if (p < 0) continue;
    for (let b = 0; b <= a; b++) {
      const q = numbering.equation[spring.slots[b] as number] as number;
      if (q < 0) continue;
      const v = k * (spring.g[a] as number) * (spring.g[b] as number);
      if (v !== 0) addSymmetric(K, p, q, v);
    }
  }
}

/** Spring elongation δ = gᵀ [u; θ] from the global slot displacements. */
export function springElongation(spring: PreparedSpring, U: Float64Array): number {
  let delta = 0;
  for (let a = 0; a < 6; a++) delta += (spring.g[a] as number) * (U[spring.slots[a] as number] as number);
  return delta;
}

export interface AssembledLoads {
  /** Total load per global slot: nodal loads plus Σ Tᵀ fe. */
  F: Float64Array;
  /** F at the free equations. */
  f: Float64Array;
  /** Local uniform loads and consistent loads fe of each element (for its end forces). */
  local: { q: Vec3; m: Vec3; fe: Float64Array }[];
}

export function assembleLoads(
  elements: readonly PreparedElement[],
  elementLoads: readonly UniformElementLoad[],
  nodal: Float64Array,
  numbering: EquationNumbering,
): AssembledLoads {
  // Node slots first, then the private warping slots of released element ends (numbering.ts).
  const F = new Float64Array(numbering.slotCount);
  F.set(nodal);
  const local = elements.map((element, i) => {
    const load = elementLoads[i] as UniformElementLoad;
    const q = toLocal(element.R, load.q);
    const m = toLocal(element.R, load.m);
    const fe = consistentLoads(element.section, element.length, q, m);
    // Fe = Tᵀ fe.
    for (let a = 0; a < 14; a++) {
      let s = 0;
      for (let b = 0; b < 14; b++) s += (element.T[14 * b + a] as number) * (fe[b] as number);
      const slot = element.slots[a] as number;
      F[slot] = (F[slot] as number) + s;
    }
    return { q, m, fe };
  });
  const f = Float64Array.from(numbering.equationSlot, (slot) => F[slot] as number);
  return { F, f, local };
}
