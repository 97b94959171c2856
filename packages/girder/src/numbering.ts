/**
 * The numbering step: user ids → node indices → equation numbers. Node freedoms are addressed by
 * a "slot" nodeIndex * 7 + dofIndex (DOFS order); each slot has an equation number, or −1 when it
 * is not an unknown:
 * - fixed by a support (its reaction is recovered after the solve), or
 * - a warping freedom w at a node where no element has warping stiffness (every element there has
 *   Iw = 0, St Venant torsion): it would be a zero row of K; it is left out and reported as 0.
 * An element end with a warping release uses a private warping slot after the node slots instead
 * of the node's w (numbering follows model order, so the layout is deterministic).
 * Equations are numbered in node order here; the solver reorders them (rcm.ts).
 */
import type { Dof, GirderModel } from './model.js';
import { DOFS, DOFS_PER_NODE } from './model.js';

export interface EquationNumbering {
  nodeCount: number;
  nodeIndex: ReadonlyMap<string, number>;
  /** Slots: nodeCount * 7 node slots, then one private warping slot per released element end. */
  slotCount: number;
  /** Per element, the slots of its warping freedom at end I and end J (2 entries per element). */
  elementWarpingSlot: Int32Array;
  /** Equation of each slot, or −1. */
  equation: Int32Array;
  /** 1 where a support fixes the slot. */
  fixed: Uint8Array;
  equationCount: number;
  /** Slot of each equation. */
  equationSlot: Int32Array;
}

const WARPING = DOFS.indexOf('w');

export function dofIndex(dof: Dof): number {
  return DOFS.indexOf(dof);
}

export function numberEquations(model: GirderModel): EquationNumbering {
  const nodeIndex = new Map<string, number>();
  model.nodes.forEach((node, i) => nodeIndex.set(node.id, i));
  const nodeCount = model.nodes.length;

  // Warping slot of each element end: the node's own, or a private one where warping is released.
  const elementWarpingSlot = new Int32Array(2 * model.elements.length);
  const privateStiffened: boolean[] = [];
  let slotCount = nodeCount * DOFS_PER_NODE;
  const warpingStiffened = new Uint8Array(nodeCount);
  model.elements.forEach((element, e) => {
    const section = model.sections[element.section];
    const stiff = section !== undefined && section.Iw > 0;
    (['I', 'J'] as const).forEach((end, k) => {
      const n = nodeIndex.get(end === 'I' ? element.nodeI : element.nodeJ) as number;
      const released = model.nodes[n]?.warpingRelease === true || element.warpingRelease?.[end] === true;
      if (released) {
        elementWarpingSlot[2 * e + k] = slotCount++;
        privateStiffened.push(stiff);
      } else {
        elementWarpingSlot[2 * e + k] = n * DOFS_PER_NODE + WARPING;
        if (stiff) warpingStiffened[n] = 1;
      }
    });
  });

  const fixed = new Uint8Array(slotCount);
  for (const support of model.supports) {
    const n = nodeIndex.get(support.node) as number;
    for (const dof of support.fix) fixed[n * DOFS_PER_NODE + dofIndex(dof)] = 1;
  }

  const equation = new Int32Array(slotCount).fill(-1);
  const equationSlot: number[] = [];
  for (let n = 0; n < nodeCount; n++) {
    for (let k = 0; k < DOFS_PER_NODE; k++) {
      const slot = n * DOFS_PER_NODE + k;
      if (fixed[slot] === 1) continue;
      if (k === WARPING && warpingStiffened[n] === 0) continue;
      equation[slot] = equationSlot.length;
      equationSlot.push(slot);
    }
  }
  privateStiffened.forEach((stiff, i) => {
    if (!stiff) return;
    const slot = nodeCount * DOFS_PER_NODE + i;
    equation[slot] = equationSlot.length;
    equationSlot.push(slot);
  });
  return { nodeCount, nodeIndex, slotCount, elementWarpingSlot, equation, fixed, equationCount: equationSlot.length, equationSlot: Int32Array.from(equationSlot) };
}
