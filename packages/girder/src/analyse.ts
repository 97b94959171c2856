/**
 * Static analysis of load combinations: validate, number, assemble, solve the contact problem
 * (contact.ts; a single linear solve when every spring is bilateral), check, recover.
 * A pure function of (model, combinations, options): the contact state belongs to each result.
 */
import type { PreparedElement, PreparedSpring } from './assemble.js';
import { assembleLoads, prepareElements, prepareSprings, springElongation } from './assemble.js';
import type { ContactOptions, ContactSystem } from './contact.js';
import { AT_CAPACITY, ELASTIC, OPEN, prepareContactSystem, solveContact, stateMatrix } from './contact.js';
import { resultantsAlong } from './element.js';
import { GirderError } from './errors.js';
import { combineLoads, resultantOfLoads } from './loads.js';
import type { Combination, GirderModel, Vec3 } from './model.js';
import { DOFS, DOFS_PER_NODE } from './model.js';
import type { EquationNumbering } from './numbering.js';
import { numberEquations } from './numbering.js';
import type { AnalysisResult, BearingGroupContact, ContactSummary, NodeDisplacement, SpringForce, Station, SupportReaction } from './results.js';
import { solveChecked } from './solve.js';
import { add, cross } from './vector.js';
import { validateCombination, validateModel } from './validate.js';

export interface AnalysisOptions {
  /** Stations per element including both ends, at equal spacing; integer ≥ 2, default 5. */
  stationsPerElement?: number;
  /** Cap on linear solves of the contact iteration per combination, default 100. */
  maxContactIterations?: number;
  /** Unilateral springs that start in contact (default: all); see ContactOptions. */
  initialActiveSprings?: readonly string[];
  /** Fall back to the globalised Newton method on a cycle or singular state (default true). */
  contactFallback?: boolean;
  /** Relative elongation tolerance of the contact state, default 1e-9 (ContactOptions.tolerance). */
  contactTolerance?: number;
}

/** The assembled loads of one load case with factor 1 (loads are linear in the factors). */
interface CaseLoads {
  /** Total load per global slot. */
  F: Float64Array;
  /** Local uniform force q and moment m per element, 3 components each, and consistent loads fe, 14 each. */
  q: Float64Array;
  m: Float64Array;
  fe: Float64Array;
  /** Resultant force of the case, N, global. */
  force: Vec3;
}

interface PreparedAnalysis {
  numbering: EquationNumbering;
  /** Assembled loads per load case, filled on first use and shared by the combinations. */
  caseLoads: Map<string, CaseLoads>;
  elements: PreparedElement[];
  /** ke and T of each element as row-major 14×14 arrays (recovery runs per element per combination). */
  keFlat: Float64Array[];
  TFlat: Float64Array[];
  springs: PreparedSpring[];
  system: ContactSystem;
}

function describer(model: GirderModel, numbering: EquationNumbering): (equation: number) => { text: string; path: string } {
  const privateOwner = new Map<number, string>();
  numbering.elementWarpingSlot.forEach((slot, k) => {
    if (slot >= numbering.nodeCount * DOFS_PER_NODE) {
      const e = k >> 1;
      privateOwner.set(slot, `element ${model.elements[e]?.id ?? e} end ${k % 2 === 0 ? 'I' : 'J'} dof w (warping released)`);
    }
  });
  return (equation) => {
    const slot = numbering.equationSlot[equation] as number;
    const owner = privateOwner.get(slot);
    if (owner !== undefined) return { text: owner, path: 'elements' };
    const n = Math.floor(slot / DOFS_PER_NODE);
    const node = model.nodes[n];
    return { text: `node ${node?.id ?? n} dof ${DOFS[slot % DOFS_PER_NODE]}`, path: `nodes[${n}]` };
  };
}

function prepare(model: GirderModel): PreparedAnalysis {
  validateModel(model);
  const numbering = numberEquations(model);
  const elements = prepareElements(model, numbering);
  const springs = prepareSprings(model, numbering);
  const system = prepareContactSystem(model, numbering, elements, springs, describer(model, numbering));
  return {
    numbering,
    caseLoads: new Map(),
    elements,
    keFlat: elements.map((element) => element.ke),
    TFlat: elements.map((element) => element.T),
    springs,
    system,
  };
}

/** The loads of one case with factor 1, assembled once per analysis set. */
function caseLoadsOf(model: GirderModel, prepared: PreparedAnalysis, name: string): CaseLoads {
  let loads = prepared.caseLoads.get(name);
  if (!loads) {
    const combined = combineLoads(model, { name, factors: { [name]: 1 } });
    const assembled = assembleLoads(prepared.elements, combined.elements, combined.nodal, prepared.numbering);
    const count = prepared.elements.length;
    loads = { F: assembled.F, q: new Float64Array(3 * count), m: new Float64Array(3 * count), fe: new Float64Array(14 * count), force: resultantOfLoads(model, combined).force };
    for (let i = 0; i < count; i++) {
      const local = assembled.local[i] as { q: Vec3; m: Vec3; fe: Float64Array };
      for (let k = 0; k < 3; k++) {
        loads.q[3 * i + k] = local.q[k] as number;
        loads.m[3 * i + k] = local.m[k] as number;
      }
      loads.fe.set(local.fe, 14 * i);
    }
    prepared.caseLoads.set(name, loads);
  }
  return loads;
}

/**
 * The loads of a combination as the factored sum of the assembled loads of its cases (in the order
 * of the model's load cases). Assembly is linear in the loads, so this equals assembling the
 * combined loads, to rounding; each case is assembled once for all the combinations of a call.
 */
function combinationLoads(model: GirderModel, prepared: PreparedAnalysis, combination: Combination): CaseLoads & { f: Float64Array } {
  const { numbering } = prepared;
  const count = prepared.elements.length;
  const sum: CaseLoads = { F: new Float64Array(numbering.slotCount), q: new Float64Array(3 * count), m: new Float64Array(3 * count), fe: new Float64Array(14 * count), force: [0, 0, 0] };
  for (const loadCase of model.loadCases) {
    const factor = combination.factors[loadCase.name] ?? 0;
    if (factor === 0) continue;
    const part = caseLoadsOf(model, prepared, loadCase.name);
    for (let k = 0; k < sum.F.length; k++) sum.F[k] = (sum.F[k] as number) + factor * (part.F[k] as number);
    for (let k = 0; k < sum.q.length; k++) {
      sum.q[k] = (sum.q[k] as number) + factor * (part.q[k] as number);
      sum.m[k] = (sum.m[k] as number) + factor * (part.m[k] as number);
    }
    for (let k = 0; k < sum.fe.length; k++) sum.fe[k] = (sum.fe[k] as number) + factor * (part.fe[k] as number);
    for (let k = 0; k < 3; k++) sum.force[k] = (sum.force[k] as number) + factor * (part.force[k] as number);
  }
  const f = Float64Array.from(numbering.equationSlot, (slot) => sum.F[slot] as number);
  return { ...sum, f };
}

function checkOptions(options: AnalysisOptions): number {
  const stationCount = options.stationsPerElement ?? 5;
  if (!Number.isInteger(stationCount) || stationCount < 2) {
    throw new GirderError('BAD_MODEL', `options.stationsPerElement must be an integer of at least 2; got ${stationCount}`, 'options.stationsPerElement');
  }
  return stationCount;
}

/** One combination; see analyseAll. */
export function analyse(model: GirderModel, combination: Combination, options: AnalysisOptions = {}): AnalysisResult {
  return analyseAll(model, [combination], options)[0] as AnalysisResult;
}

/**
 * Every combination on its own (contact is nonlinear: no superposition), sharing the numbering,
 * the element matrices and the cache of factorisations by contact state.
 */
export function analyseAll(model: GirderModel, combinations: readonly Combination[], options: AnalysisOptions = {}): AnalysisResult[] {
  const stationCount = checkOptions(options);
  const prepared = prepare(model);
  return combinations.map((combination) => analyseOne(model, prepared, combination, stationCount, options));
}

const STATE_NAMES = { [OPEN]: 'open', [ELASTIC]: 'elastic', [AT_CAPACITY]: 'at-capacity' } as const;

function analyseOne(model: GirderModel, prepared: PreparedAnalysis, combination: Combination, stationCount: number, options: AnalysisOptions): AnalysisResult {
  validateCombination(model, combination);
  const { numbering, elements, springs, system } = prepared;
  const loads = combinationLoads(model, prepared, combination);

  const contactOptions: ContactOptions = {};
  if (options.maxContactIterations !== undefined) contactOptions.maxIterations = options.maxContactIterations;
  if (options.initialActiveSprings !== undefined) contactOptions.initialActiveSprings = options.initialActiveSprings;
  if (options.contactFallback !== undefined) contactOptions.robustFallback = options.contactFallback;
  if (options.contactTolerance !== undefined) contactOptions.tolerance = options.contactTolerance;
  const contact = solveContact(system, loads.f, contactOptions);
  const { u, residual, backwardError } = solveChecked(stateMatrix(system, contact.state), contact.factorisation, contact.rhs);

  // Displacements of every slot (0 where fixed or not an unknown).
  const U = new Float64Array(numbering.slotCount);
  numbering.equationSlot.forEach((slot, equation) => {
    U[slot] = u[equation] as number;
  });

  // Nodal out-of-balance K U − F per slot; at fixed slots it is the support reaction.
  const imbalance = new Float64Array(U.length);
  for (let s = 0; s < loads.F.length; s++) imbalance[s] = -(loads.F[s] as number);
  const stations: Station[] = [];
  const xsOf = (L: number): number[] => Array.from({ length: stationCount }, (_, i) => (i === stationCount - 1 ? L : (L * i) / (stationCount - 1)));
  const D = new Float64Array(14);
  const d = new Float64Array(14);
  const p = new Float64Array(14);
  elements.forEach((element, i) => {
    const local = {
      q: [loads.q[3 * i] as number, loads.q[3 * i + 1] as number, loads.q[3 * i + 2] as number] as Vec3,
      m: [loads.m[3 * i] as number, loads.m[3 * i + 1] as number, loads.m[3 * i + 2] as number] as Vec3,
      fe: loads.fe.subarray(14 * i, 14 * i + 14),
    };
    const T = prepared.TFlat[i] as Float64Array;
    const ke = prepared.keFlat[i] as Float64Array;
    for (let a = 0; a < 14; a++) D[a] = U[element.slots[a] as number] as number;
    for (let a = 0; a < 14; a++) {
      let s = 0;
      for (let b = 0; b < 14; b++) s += (T[14 * a + b] as number) * (D[b] as number);
      d[a] = s;
    }
    // p = ke d − fe: the local forces the nodes apply to the element (fe already sits in F).
    for (let a = 0; a < 14; a++) {
      let s = 0;
      for (let b = 0; b < 14; b++) s += (ke[14 * a + b] as number) * (d[b] as number);
      p[a] = s - (local.fe[a] as number);
    }
    for (let a = 0; a < 14; a++) {
      let s = 0;
      for (let b = 0; b < 14; b++) s += (T[14 * b + a] as number) * ((p[b] as number) + (local.fe[b] as number));
      const slot = element.slots[a] as number;
      imbalance[slot] = (imbalance[slot] as number) + s;
    }
    for (const station of resultantsAlong(element.section, element.length, p, local.q, local.m, xsOf(element.length), element.id)) stations.push(station as Station);
  });

  const springForces: SpringForce[] = [];
  let reactionSum: Vec3 = [0, 0, 0];
  springs.forEach((spring, i) => {
    const elongation = springElongation(spring, U);
    const state = contact.state[i] as number;
    const force = state === ELASTIC ? -spring.stiffness * elongation : state === AT_CAPACITY ? -(system.capacity[i] as number) : 0;
    for (let a = 0; a < 6; a++) {
      const slot = spring.slots[a] as number;
      imbalance[slot] = (imbalance[slot] as number) - force * (spring.g[a] as number);
    }
    springForces.push({ id: spring.id, force, elongation, state: STATE_NAMES[state as 0 | 1 | 2] });
    reactionSum = add(reactionSum, [force * spring.direction[0], force * spring.direction[1], force * spring.direction[2]]);
  });

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

  // Statics of the whole: the reactions must balance the applied loads. A nearly singular contact
  // state (a girder left on part of its bearings) can pass the backward-error test of the solve with
  // enormous displacements and still be out of balance; such a solution is refused here.
  const appliedForce = loads.force;
  const forceScale = Math.max(Math.abs(appliedForce[0]), Math.abs(appliedForce[1]), Math.abs(appliedForce[2]), 1);
  for (let k = 0; k < 3; k++) {
    const imbalance = Math.abs((reactionSum[k] as number) + (appliedForce[k] as number));
    if (imbalance > STATICS_TOLERANCE * forceScale) {
      throw new GirderError(
        'RESIDUAL',
        `combination '${combination.name}': the solution is out of equilibrium along ${'XYZ'[k]} (reactions and loads differ by ${imbalance.toExponential(3)} N of ${forceScale.toExponential(3)} N): the stiffness of the contact state is nearly singular (a near-mechanism), typically a girder lifting off its bearings`,
        `combinations.${combination.name}`,
      );
    }
  }

  const displacements: NodeDisplacement[] = model.nodes.map((node, n) => {
    const base = n * DOFS_PER_NODE;
    const at = (k: number): number => U[base + k] as number;
    return { node: node.id, ux: at(0), uy: at(1), uz: at(2), rx: at(3), ry: at(4), rz: at(5), w: at(6) };
  });

  const result: AnalysisResult = {
    combination: combination.name,
    converged: true,
    iterations: contact.iterations,
    residual,
    backwardError,
    displacements,
    reactions,
    springForces,
    appliedSum: loads.force,
    reactionSum,
    stations,
  };
  if (model.springs.length > 0) result.contact = summariseContact(model, springForces, contact.iterations, contact.globalised);
  return result;
}

/**
 * Largest relative out-of-balance of the reactions against the applied loads accepted from a solve.
 * A well-posed but very stiff model (a footing of EI 2.1e12 N m2 on soft springs, contact.test.ts)
 * balances to about 5e-6; a near-mechanism found by the design fuzz was out by 4e-3. The design
 * applies its own, tighter guard (1e-6) to the models it builds.
 */
const STATICS_TOLERANCE = 1e-4;

/** Relative size below which a bilateral spring force counts as zero when flagging tension. */
const TENSION_FLAG = 1e-9;

function summariseContact(model: GirderModel, forces: readonly SpringForce[], iterations: number, globalised: boolean): ContactSummary {
  const largest = forces.reduce((m, s) => Math.max(m, Math.abs(s.force)), 0);
  const tensionInBilateral: { id: string; force: number }[] = [];
  const anchorsAtCapacity: string[] = [];
  const activeSprings: string[] = [];
  const byGroup = new Map<string, number[]>();
  model.springs.forEach((spring, i) => {
    const force = forces[i] as SpringForce;
    if (force.state !== 'open') activeSprings.push(spring.id);
    if (force.state === 'at-capacity') anchorsAtCapacity.push(spring.id);
    if ((spring.behaviour ?? 'bilateral') === 'bilateral' && force.force < -TENSION_FLAG * largest) tensionInBilateral.push({ id: spring.id, force: force.force });
    if (spring.group !== undefined) {
      const members = byGroup.get(spring.group) ?? [];
      members.push(i);
      byGroup.set(spring.group, members);
    }
  });
  const groups: BearingGroupContact[] = [...byGroup].map(([group, members]) => {
    let inContact = 0;
    let contactLength = 0;
    let maxPressure = 0;
    const liftOffZones: { from: string; to: string }[] = [];
    let zoneStart: string | undefined;
    let zoneEnd = '';
    for (const i of members) {
      const spring = model.springs[i];
      const force = (forces[i] as SpringForce).force;
      if (spring === undefined) continue;
      if (force > 0) {
        inContact++;
        contactLength += spring.tributaryLength ?? 0;
        if (spring.tributaryLength !== undefined) maxPressure = Math.max(maxPressure, force / spring.tributaryLength);
        if (zoneStart !== undefined) liftOffZones.push({ from: zoneStart, to: zoneEnd });
        zoneStart = undefined;
      } else {
        zoneStart ??= spring.id;
        zoneEnd = spring.id;
      }
    }
    if (zoneStart !== undefined) liftOffZones.push({ from: zoneStart, to: zoneEnd });
    return { group, springs: members.length, inContact, contactFraction: inContact / members.length, contactLength, maxPressure, liftOffZones };
  });
  return { activeSprings, iterations, globalised, groups, tensionInBilateral, anchorsAtCapacity };
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
