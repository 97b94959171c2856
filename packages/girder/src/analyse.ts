/**
 * Linear static analysis of one combination: validate, number, assemble, factor, solve, recover.
 * A pure function of (model, combination, options).
 */
import { addSpringStiffness, assembleLoads, assembleStiffness, prepareElements, prepareSprings, springElongation } from './assemble.js';
import { resultantsAlong } from './element.js';
import { GirderError } from './errors.js';
import { combineLoads, sumLoads } from './loads.js';
import type { Combination, GirderModel, Vec3 } from './model.js';
import { DOFS, DOFS_PER_NODE } from './model.js';
import { numberEquations } from './numbering.js';
import type { AnalysisResult, NodeDisplacement, SpringForce, Station, SupportReaction } from './results.js';
import { factorSystem, solveChecked } from './solve.js';
import { add, cross } from './vector.js';
import { validateCombination, validateModel } from './validate.js';

export interface AnalysisOptions {
  /** Stations per element including both ends, at equal spacing; integer ≥ 2, default 5. */
  stationsPerElement?: number;
}

export function analyse(model: GirderModel, combination: Combination, options: AnalysisOptions = {}): AnalysisResult {
  validateModel(model);
  validateCombination(model, combination);
  const stationCount = options.stationsPerElement ?? 5;
  if (!Number.isInteger(stationCount) || stationCount < 2) {
    throw new GirderError('BAD_MODEL', `options.stationsPerElement must be an integer of at least 2; got ${stationCount}`, 'options.stationsPerElement');
  }

  const numbering = numberEquations(model);
  const elements = prepareElements(model, numbering);
  const springs = prepareSprings(model, numbering);
  const K = assembleStiffness(elements, numbering);
  for (const spring of springs) addSpringStiffness(K, numbering, spring);

  const combined = combineLoads(model, combination);
  const loads = assembleLoads(elements, combined.elements, combined.nodal, numbering);

  const factorisation = factorSystem(K, {
    describeEquation: (equation) => {
      const slot = numbering.equationSlot[equation] as number;
      const n = Math.floor(slot / DOFS_PER_NODE);
      const node = model.nodes[n];
      return { text: `node ${node?.id ?? n} dof ${DOFS[slot % DOFS_PER_NODE]}`, path: `nodes[${n}]` };
    },
  });
  const { u, residual } = solveChecked(K, factorisation, loads.f);

  // Displacements of every slot (0 where fixed or not an unknown).
  const U = new Float64Array(numbering.nodeCount * DOFS_PER_NODE);
  numbering.equationSlot.forEach((slot, equation) => {
    U[slot] = u[equation] as number;
  });

  // Nodal out-of-balance K U − F per slot; at fixed slots it is the support reaction.
  const imbalance = new Float64Array(U.length);
  for (let s = 0; s < U.length; s++) imbalance[s] = -(loads.F[s] as number);
  const stations: Station[] = [];
  const xsOf = (L: number): number[] => Array.from({ length: stationCount }, (_, i) => (i === stationCount - 1 ? L : (L * i) / (stationCount - 1)));
  elements.forEach((element, i) => {
    const local = loads.local[i] as { q: Vec3; m: Vec3; fe: Float64Array };
    const D = Float64Array.from(element.slots, (slot) => U[slot] as number);
    const d = new Float64Array(14);
    for (let a = 0; a < 14; a++) {
      let s = 0;
      for (let b = 0; b < 14; b++) s += element.T.get(a, b) * (D[b] as number);
      d[a] = s;
    }
    // p = ke d − fe: the local forces the nodes apply to the element (fe already sits in F).
    const p = new Float64Array(14);
    for (let a = 0; a < 14; a++) {
      let s = 0;
      for (let b = 0; b < 14; b++) s += element.ke.get(a, b) * (d[b] as number);
      p[a] = s - (local.fe[a] as number);
    }
    for (let a = 0; a < 14; a++) {
      let s = 0;
      for (let b = 0; b < 14; b++) s += element.T.get(b, a) * ((p[b] as number) + (local.fe[b] as number));
      const slot = element.slots[a] as number;
      imbalance[slot] = (imbalance[slot] as number) + s;
    }
    for (const r of resultantsAlong(element.section, element.length, p, local.q, local.m, xsOf(element.length))) {
      stations.push({ element: element.id, ...r });
    }
  });

  const springForces: SpringForce[] = [];
  let reactionSum: Vec3 = [0, 0, 0];
  for (const spring of springs) {
    const elongation = springElongation(spring, U);
    const force = -spring.stiffness * elongation;
    for (let a = 0; a < 6; a++) {
      const slot = spring.slots[a] as number;
      imbalance[slot] = (imbalance[slot] as number) - force * (spring.g[a] as number);
    }
    springForces.push({ id: spring.id, force, elongation });
    reactionSum = add(reactionSum, [force * spring.direction[0], force * spring.direction[1], force * spring.direction[2]]);
  }

  const supported = new Set(model.supports.map((s) => s.node));
  const reactions: SupportReaction[] = [];
  model.nodes.forEach((node, n) => {
    if (!supported.has(node.id)) return;
    const base = n * DOFS_PER_NODE;
    const value = (k: number): number => (numbering.fixed[base + k] === 1 ? (imbalance[base + k] as number) : 0);
    const reaction: SupportReaction = {
      node: node.id,
      force: [value(0), value(1), value(2)],
      moment: [value(3), value(4), value(5)],
      bimoment: value(6),
    };
    reactions.push(reaction);
    reactionSum = add(reactionSum, reaction.force);
  });

  const displacements: NodeDisplacement[] = model.nodes.map((node, n) => {
    const base = n * DOFS_PER_NODE;
    const at = (k: number): number => U[base + k] as number;
    return { node: node.id, ux: at(0), uy: at(1), uz: at(2), rx: at(3), ry: at(4), rz: at(5), w: at(6) };
  });

  return {
    combination: combination.name,
    converged: true,
    iterations: 1,
    residual,
    displacements,
    reactions,
    springForces,
    appliedSum: sumLoads(model, combination).force,
    reactionSum,
    stations,
  };
}

export interface ReactionResultant {
  /** Sum of the forces of fixed supports and springs on the girder, N, global. */
  force: Vec3;
  /** Their moment about the global origin (support moments included), N·m. */
  momentAboutOrigin: Vec3;
}

/**
 * Resultant of the reactions of a result of `model`; with sumLoads it checks overall equilibrium:
 * force + applied force = 0 and moment + applied moment = 0.
 */
export function sumReactions(model: GirderModel, result: AnalysisResult): ReactionResultant {
  const nodes = new Map(model.nodes.map((node) => [node.id, node]));
  let force: Vec3 = [0, 0, 0];
  let moment: Vec3 = [0, 0, 0];
  for (const reaction of result.reactions) {
    const node = nodes.get(reaction.node);
    if (node === undefined) throw new GirderError('BAD_MODEL', `result reaction at node '${reaction.node}' is not a node of the model`, 'result.reactions');
    force = add(force, reaction.force);
    moment = add(moment, add(cross([node.x, node.y, node.z], reaction.force), reaction.moment));
  }
  const forces = new Map(result.springForces.map((s) => [s.id, s.force]));
  for (const spring of model.springs) {
    const node = nodes.get(spring.node);
    const F = forces.get(spring.id);
    if (node === undefined || F === undefined) throw new GirderError('BAD_MODEL', `spring '${spring.id}' has no force in the result`, 'result.springForces');
    const r = spring.offset ?? [0, 0, 0];
    const point: Vec3 = [node.x + r[0], node.y + r[1], node.z + r[2]];
    const f: Vec3 = [F * spring.direction[0], F * spring.direction[1], F * spring.direction[2]];
    force = add(force, f);
    moment = add(moment, cross(point, f));
  }
  return { force, momentAboutOrigin: moment };
}
