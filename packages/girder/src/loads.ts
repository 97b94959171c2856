/**
 * Loads of a combination, and their resultant. Everything is linear in the factors, so the loads
 * of the load cases are combined before the solve (the solution of a combination is then exact
 * for this linear model; a contact model solves each combination on its own in the same way).
 */
import type { Combination, GirderModel, Vec3 } from './model.js';
import { DOFS_PER_NODE, STANDARD_GRAVITY } from './model.js';
import { validateCombination, validateModel } from './validate.js';
import { add, cross, norm, scale, subtract } from './vector.js';

/** Uniform loads on one element, global components: force q (N/m) and moment m (N·m/m). */
export interface UniformElementLoad {
  q: Vec3;
  m: Vec3;
}

export interface CombinedLoads {
  /** Per element, in model order. */
  elements: UniformElementLoad[];
  /** Nodal forces and moments per slot (node index * 7 + dof index); warping entries stay 0. */
  nodal: Float64Array;
}

function nodePoint(model: GirderModel, index: Map<string, number>, id: string): Vec3 {
  const node = model.nodes[index.get(id) as number];
  if (node === undefined) throw new Error(`node '${id}' missing after validation`);
  return [node.x, node.y, node.z];
}

function nodeIndexOf(model: GirderModel): Map<string, number> {
  return new Map(model.nodes.map((node, i) => [node.id, i]));
}

/** Combined loads of a (validated) model and combination. */
export function combineLoads(model: GirderModel, combination: Combination): CombinedLoads {
  const index = nodeIndexOf(model);
  const elementIndex = new Map(model.elements.map((element, i) => [element.id, i]));
  const elements: UniformElementLoad[] = model.elements.map(() => ({ q: [0, 0, 0], m: [0, 0, 0] }));
  const nodal = new Float64Array(model.nodes.length * DOFS_PER_NODE);
  for (const loadCase of model.loadCases) {
    const factor = combination.factors[loadCase.name] ?? 0;
    if (factor === 0) continue;
    const selfWeight = (loadCase.selfWeightFactor ?? 0) * factor;
    if (selfWeight !== 0) {
      model.elements.forEach((element, i) => {
        const section = model.sections[element.section];
        const load = elements[i];
        if (section === undefined || load === undefined) return;
        // q = −ρ A g Ẑ on the centroid axis.
        load.q = add(load.q, [0, 0, -selfWeight * section.density * section.A * STANDARD_GRAVITY]);
      });
    }
    for (const lineLoad of loadCase.lineLoads) {
      const load = elements[elementIndex.get(lineLoad.element) as number] as UniformElementLoad;
      const q = scale(lineLoad.q, factor);
      load.q = add(load.q, q);
      if (lineLoad.offset !== undefined) load.m = add(load.m, cross(lineLoad.offset, q));
    }
    for (const nodalLoad of loadCase.nodalLoads) {
      const base = (index.get(nodalLoad.node) as number) * DOFS_PER_NODE;
      const moment = nodalLoad.moment ?? [0, 0, 0];
      for (let k = 0; k < 3; k++) {
        nodal[base + k] = (nodal[base + k] as number) + factor * (nodalLoad.force[k] as number);
        nodal[base + 3 + k] = (nodal[base + 3 + k] as number) + factor * (moment[k] as number);
      }
    }
  }
  return { elements, nodal };
}

export interface LoadResultant {
  /** Sum of applied forces, N, global. */
  force: Vec3;
  /** Sum of applied moments about the global origin, N·m. */
  momentAboutOrigin: Vec3;
}

/**
 * Resultant of the applied loads of a combination (line loads, self weight, nodal loads). A uniform
 * line load q over an element of length L is the force q L at the element's mid-point plus the
 * couple m L (its line of action is offset by e, and (c + e) × q L = c × q L + m L).
 */
export function sumLoads(model: GirderModel, combination: Combination): LoadResultant {
  validateModel(model);
  validateCombination(model, combination);
  return resultantOfLoads(model, combineLoads(model, combination));
}

/** The resultant of already combined loads of a validated model (see sumLoads). */
export function resultantOfLoads(model: GirderModel, loads: CombinedLoads): LoadResultant {
  const index = nodeIndexOf(model);
  let force: Vec3 = [0, 0, 0];
  let moment: Vec3 = [0, 0, 0];
  model.elements.forEach((element, i) => {
    const load = loads.elements[i] as UniformElementLoad;
    const start = nodePoint(model, index, element.nodeI);
    const end = nodePoint(model, index, element.nodeJ);
    const L = norm(subtract(end, start));
    const middle = scale(add(start, end), 0.5);
    const resultant = scale(load.q, L);
    force = add(force, resultant);
    moment = add(moment, add(cross(middle, resultant), scale(load.m, L)));
  });
  model.nodes.forEach((node, n) => {
    const base = n * DOFS_PER_NODE;
    const f: Vec3 = [loads.nodal[base] as number, loads.nodal[base + 1] as number, loads.nodal[base + 2] as number];
    const c: Vec3 = [loads.nodal[base + 3] as number, loads.nodal[base + 4] as number, loads.nodal[base + 5] as number];
    force = add(force, f);
    moment = add(moment, add(cross([node.x, node.y, node.z], f), c));
  });
  return { force, momentAboutOrigin: moment };
}
