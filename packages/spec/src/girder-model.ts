import { z } from 'zod';
import { SpecError } from './errors.js';
import { zodIssues } from './issues.js';

// The girder-model file (DESIGN.md, "The girder-model file"): one analysis a checker can re-run
// without a bin. Everything in SI base units (m, N, Pa, kg/m3, rad); see docs/girder-model.md.

const finite = (what: string) => z.number({ error: `must be a finite number (${what})` });
const positive = (what: string) => finite(what).gt(0, { error: `must be greater than 0 (${what})` });
const vec3 = z.tuple([finite('m or N'), finite('m or N'), finite('m or N')], { error: 'must be a list of three numbers [x, y, z]' });
const id = z.string({ error: 'must be a text id' }).min(1, { error: 'must not be empty' }).max(80, { error: 'must be at most 80 characters' });
const dof = z.enum(['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'], { error: 'must be one of ux, uy, uz, rx, ry, rz, w' });

const explicitSection = z.strictObject({
  A: positive('m2'),
  Iy: positive('m4'),
  Iz: positive('m4'),
  It: positive('m4'),
  Iw: finite('m6').gte(0, { error: 'must be 0 or more (m6)' }),
  E: positive('Pa'),
  G: positive('Pa'),
  density: finite('kg/m3').gte(0, { error: 'must be 0 or more (kg/m3)' }),
});
const tableSection = z.strictObject({
  table: z.string({ error: 'must name a rolled section, e.g. "HE 300 B"' }).min(1),
  grade: z.enum(['S235', 'S275', 'S355', 'S460'], { error: 'must be one of S235, S275, S355, S460' }).default('S355'),
  density: finite('kg/m3').gte(0).default(7850),
});

const behaviour = z.union(
  [z.enum(['bilateral', 'compression-only']), z.strictObject({ kind: z.literal('anchored'), tensionCapacity: positive('N') })],
  { error: "must be 'bilateral', 'compression-only' or { kind: anchored, tensionCapacity }" },
);

export const girderModelFile = z.strictObject(
  {
    schemaVersion: z.literal(1, { error: 'must be 1' }),
    kind: z.literal('girder-model', { error: "must be 'girder-model'" }),
    scenario: z.string().max(80).default(''),
    description: z.string().max(2000).default(''),
    nodes: z.array(z.strictObject({ id, x: finite('m'), y: finite('m'), z: finite('m') }), { error: 'must be a list of nodes' }).min(2, { error: 'must hold at least 2 nodes' }).max(100_000, { error: 'must hold at most 100000 nodes' }),
    elements: z
      .array(z.strictObject({ id, nodeI: id, nodeJ: id, section: id, up: vec3.optional() }), { error: 'must be a list of elements' })
      .min(1, { error: 'must hold at least 1 element' })
      .max(100_000, { error: 'must hold at most 100000 elements' }),
    sections: z.record(id, z.union([explicitSection, tableSection], { error: 'must give A, Iy, Iz, It, Iw, E, G, density or { table, grade }' })),
    supports: z.array(z.strictObject({ node: id, fix: z.array(dof) })).default([]),
    springs: z
      .array(
        z.strictObject({
          id,
          node: id,
          direction: vec3,
          stiffness: positive('N/m'),
          offset: vec3.optional(),
          behaviour: behaviour.optional(),
          group: z.string().max(80).optional(),
          tributaryLength: positive('m').optional(),
        }),
      )
      .max(1_000_000)
      .default([]),
    loadCases: z.array(
      z.strictObject({
        name: id,
        lineLoads: z.array(z.strictObject({ element: id, q: vec3, offset: vec3.optional() })).default([]),
        nodalLoads: z.array(z.strictObject({ node: id, force: vec3, moment: vec3.optional() })).default([]),
        selfWeightFactor: finite('-').optional(),
      }),
      { error: 'is required: a list of load cases' },
    ),
    combinations: z.array(z.strictObject({ name: id, factors: z.record(id, finite('-')) }), { error: 'is required: a list of combinations { name, factors }' }).min(1, { error: 'must hold at least 1 combination' }),
  },
  { error: 'must be a girder-model file (schemaVersion, kind, nodes, elements, sections, supports, springs, loadCases, combinations)' },
);

export type GirderModelFile = z.output<typeof girderModelFile>;
export type GirderModelFileSection = GirderModelFile['sections'][string];

/** Validate a parsed girder-model document; errors name the path inside the file. */
export function parseGirderModelFile(document: unknown, source = 'model'): GirderModelFile {
  const parsed = girderModelFile.safeParse(document, { reportInput: true });
  if (!parsed.success) {
    throw new SpecError('INVALID_INPUT', zodIssues(parsed.error, 'docs/girder-model.md').map((issue) => ({ path: issue.path, message: `${source}: ${issue.message}` })));
  }
  return parsed.data;
}
