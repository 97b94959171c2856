/**
 * Model checks made before any numbering or assembly, so that every later step may assume a
 * consistent model. Each failure is a GirderError BAD_MODEL with the path of the offending input.
 */
import { elementAxes } from './element.js';
import { GirderError } from './errors.js';
import type { Combination, GirderModel, SectionStiffness, Vec3 } from './model.js';
import { DOFS } from './model.js';
import { isFiniteVec3, norm } from './vector.js';

/** Springs must be given with a unit direction to this accuracy. */
const UNIT_TOLERANCE = 1e-6;

function bad(path: string, message: string): never {
  throw new GirderError('BAD_MODEL', `${path} ${message}`, path);
}

function requireId(id: unknown, path: string): string {
  if (typeof id !== 'string' || id.length === 0) bad(path, 'must be a non-empty string');
  return id;
}

function requireUnique(ids: Map<string, string>, id: string, path: string): void {
  const previous = ids.get(id);
  if (previous !== undefined) bad(path, `'${id}' is already used by ${previous}`);
  ids.set(id, path.replace(/\.(id|name)$/, ''));
}

function requireVec3(v: unknown, path: string): Vec3 {
  if (!isFiniteVec3(v)) bad(path, 'must be three finite numbers');
  return v;
}

function requireReference(ids: Map<string, string>, id: unknown, path: string, what: string): void {
  if (typeof id !== 'string' || !ids.has(id)) bad(path, `refers to ${what} '${String(id)}', which is not defined`);
}

const POSITIVE_CONSTANTS = ['A', 'Iy', 'Iz', 'It', 'E', 'G'] as const;
const NON_NEGATIVE_CONSTANTS = ['Iw', 'density'] as const;

function checkSection(key: string, section: SectionStiffness): void {
  for (const name of POSITIVE_CONSTANTS) {
    const v = section[name];
    if (typeof v !== 'number' || !Number.isFinite(v) || v <= 0) bad(`sections.${key}.${name}`, `must be positive; got ${String(v)}`);
  }
  for (const name of NON_NEGATIVE_CONSTANTS) {
    const v = section[name];
    if (typeof v !== 'number' || !Number.isFinite(v) || v < 0) bad(`sections.${key}.${name}`, `must be zero or positive; got ${String(v)}`);
  }
}

export function validateModel(model: GirderModel): void {
  const nodeIds = new Map<string, string>();
  const coordinates = new Map<string, Vec3>();
  model.nodes.forEach((node, i) => {
    const path = `nodes[${i}]`;
    const id = requireId(node.id, `${path}.id`);
    requireUnique(nodeIds, id, `${path}.id`);
    for (const c of ['x', 'y', 'z'] as const) {
      if (typeof node[c] !== 'number' || !Number.isFinite(node[c])) bad(`${path}.${c}`, `must be a finite number; got ${String(node[c])}`);
    }
    coordinates.set(id, [node.x, node.y, node.z]);
  });

  const sectionIds = new Map<string, string>();
  for (const [key, section] of Object.entries(model.sections)) {
    checkSection(key, section);
    sectionIds.set(key, `sections.${key}`);
  }

  const elementIds = new Map<string, string>();
  model.elements.forEach((element, i) => {
    const path = `elements[${i}]`;
    const id = requireId(element.id, `${path}.id`);
    requireUnique(elementIds, id, `${path}.id`);
    requireReference(nodeIds, element.nodeI, `${path}.nodeI`, 'node');
    requireReference(nodeIds, element.nodeJ, `${path}.nodeJ`, 'node');
    requireReference(sectionIds, element.section, `${path}.section`, 'section');
    if (element.nodeI === element.nodeJ) bad(`${path}.nodeJ`, `is the same node as nodeI ('${element.nodeI}'); an element needs two distinct nodes`);
    const start = coordinates.get(element.nodeI) as Vec3;
    const end = coordinates.get(element.nodeJ) as Vec3;
    if (norm([end[0] - start[0], end[1] - start[1], end[2] - start[2]]) === 0) {
      bad(path, `'${id}' has zero length: nodes '${element.nodeI}' and '${element.nodeJ}' are at the same point`);
    }
    if (element.up !== undefined) requireVec3(element.up, `${path}.up`);
    elementAxes(start, end, element.up, path);
  });

  model.supports.forEach((support, i) => {
    const path = `supports[${i}]`;
    requireReference(nodeIds, support.node, `${path}.node`, 'node');
    support.fix.forEach((dof, j) => {
      if (!(DOFS as readonly string[]).includes(dof)) bad(`${path}.fix[${j}]`, `'${String(dof)}' is not a degree of freedom; use one of ${DOFS.join(', ')}`);
    });
  });

  // Springs are the most numerous input (several bearing points per node): paths are composed only
  // when a check fails.
  const springIndex = new Map<string, number>();
  model.springs.forEach((spring, i) => {
    const path = (field: string): string => `springs[${i}]${field}`;
    if (typeof spring.id !== 'string' || spring.id.length === 0) bad(path('.id'), 'must be a non-empty string');
    const previous = springIndex.get(spring.id);
    if (previous !== undefined) bad(path('.id'), `'${spring.id}' is already used by springs[${previous}]`);
    springIndex.set(spring.id, i);
    if (typeof spring.node !== 'string' || !nodeIds.has(spring.node)) bad(path('.node'), `refers to node '${String(spring.node)}', which is not defined`);
    const d = spring.direction;
    if (!isFiniteVec3(d)) bad(path('.direction'), 'must be three finite numbers');
    if (Math.abs(norm(d) - 1) > UNIT_TOLERANCE) bad(path('.direction'), `must be a unit vector; its length is ${norm(d)}`);
    if (typeof spring.stiffness !== 'number' || !Number.isFinite(spring.stiffness) || spring.stiffness <= 0) {
      bad(path('.stiffness'), `must be positive (N/m); got ${String(spring.stiffness)}`);
    }
    if (spring.offset !== undefined && !isFiniteVec3(spring.offset)) bad(path('.offset'), 'must be three finite numbers');
    const behaviour: unknown = spring.behaviour;
    if (behaviour !== undefined && behaviour !== 'bilateral' && behaviour !== 'compression-only') {
      if (typeof behaviour !== 'object' || behaviour === null || (behaviour as { kind?: unknown }).kind !== 'anchored') {
        bad(path('.behaviour'), `must be 'bilateral', 'compression-only' or { kind: 'anchored', tensionCapacity }; got ${JSON.stringify(behaviour)}`);
      }
      const capacity = (behaviour as { tensionCapacity?: unknown }).tensionCapacity;
      if (typeof capacity !== 'number' || !Number.isFinite(capacity) || capacity <= 0) {
        bad(path('.behaviour.tensionCapacity'), `must be a positive force (N); got ${String(capacity)}`);
      }
    }
    if (spring.group !== undefined && (typeof spring.group !== 'string' || spring.group.length === 0)) bad(path('.group'), 'must be a non-empty string');
    const tributary: unknown = spring.tributaryLength;
    if (tributary !== undefined && (typeof tributary !== 'number' || !Number.isFinite(tributary) || tributary <= 0)) {
      bad(path('.tributaryLength'), `must be a positive length (m); got ${String(tributary)}`);
    }
  });

  const caseNames = new Map<string, string>();
  model.loadCases.forEach((loadCase, i) => {
    const path = `loadCases[${i}]`;
    const name = requireId(loadCase.name, `${path}.name`);
    requireUnique(caseNames, name, `${path}.name`);
    if (loadCase.selfWeightFactor !== undefined && !Number.isFinite(loadCase.selfWeightFactor)) {
      bad(`${path}.selfWeightFactor`, `must be a finite number; got ${String(loadCase.selfWeightFactor)}`);
    }
    loadCase.lineLoads.forEach((load, j) => {
      const loadPath = `${path}.lineLoads[${j}]`;
      requireReference(elementIds, load.element, `${loadPath}.element`, 'element');
      requireVec3(load.q, `${loadPath}.q`);
      if (load.offset !== undefined) requireVec3(load.offset, `${loadPath}.offset`);
    });
    loadCase.nodalLoads.forEach((load, j) => {
      const loadPath = `${path}.nodalLoads[${j}]`;
      requireReference(nodeIds, load.node, `${loadPath}.node`, 'node');
      requireVec3(load.force, `${loadPath}.force`);
      if (load.moment !== undefined) requireVec3(load.moment, `${loadPath}.moment`);
    });
  });
}

/** A combination may only name load cases of the model, with finite factors. */
export function validateCombination(model: GirderModel, combination: Combination): void {
  const names = new Set(model.loadCases.map((c) => c.name));
  for (const [name, factor] of Object.entries(combination.factors)) {
    const path = `combination.factors.${name}`;
    if (!names.has(name)) bad(path, `refers to load case '${name}', which is not defined`);
    if (typeof factor !== 'number' || !Number.isFinite(factor)) bad(path, `must be a finite number; got ${String(factor)}`);
  }
}
