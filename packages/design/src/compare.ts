// Option comparison: design one option of an options file into a row of the comparison, rank the
// rows, and split / merge the list for runs spread over processes or machines. Parallel execution,
// progress and files are the command line's business; everything here is a pure function of the
// options, so any split of the list gives the same rows.
import { createHash } from 'node:crypto';
import { circularBinGeometry } from '@binsupport/loads';
import { normaliseSpec, setInputPath, SpecError, type BinSpec, type CircularBinSpec, type InputOverride, type OptionCase, type OptionsFile } from '@binsupport/spec';
import { CAUTIONS, circularBinOf, COLUMN_MEMBER_ID, designFromSpec, MEMBER_ID } from './design.js';
import { DesignError } from './errors.js';
import { stableJson } from './json.js';
import { TOOL_NAME, TOOL_VERSION } from './version.js';

export const COMPARE_SCHEMA_VERSION = '1.0.0';

/**
 * Cylinder heights found at constant capacity are rounded up to this step, m, so that the bin holds
 * at least the capacity asked for and the height is one a drawing would give (common practice: 10 mm).
 */
export const CAPACITY_HEIGHT_STEP = 0.01;

/** The result of one option, as a row of the comparison (SI units: kg, m, m3). */
export interface CompareRow {
  index: number;
  name: string;
  sweep: string;
  /** The inputs this option changes (input units, as in the options file); at constant capacity the derived bin.cylinderHeight is added last. */
  overrides: InputOverride[];
  /** verified: a design that passes; infeasible: no candidate passes (best attempt reported); invalid: the option's inputs are refused; failed: the design stopped (an analysis or a guard refused). */
  status: 'verified' | 'infeasible' | 'invalid' | 'failed';
  /** For a design: what the optimiser concluded; otherwise the error, naming the input. */
  message: string;
  /** Input path of the error of an invalid option. */
  errorPath?: string;
  /** Stable code of the error of an invalid or failed option. */
  errorCode?: string;
  bin?: { diameter: number; cylinderHeight: number; capacity: number; solid: string };
  support?: { type: 'columns' | 'slab'; columns: number };
  /** Total steel mass (girder and columns), kg; null without a design. */
  steelMass: number | null;
  /** The optimiser's objective: mass times the price per kg of the grade, plus the cost per distinct section (units of the prices). */
  cost: number | null;
  girder?: { section: string; grade: string; mass: number; utilisation: number | null };
  columns?: { section: string; grade: string; count: number; mass: number; utilisation: number | null };
  /** The check that governs the option: member, check, clause, combination, scenario, where. */
  governing?: { member: string; check: string; clause: string; combination: string; scenario: string; position: string; utilisation: number | null };
  /** Largest utilisation over the members (null: a check outside its scope). */
  maxUtilisation: number | null;
}

export interface CompareResult {
  schemaVersion: string;
  tool: { name: string; version: string };
  title: string;
  cautions: string[];
  /** SHA-256 of the expanded options (names and spec documents): shards of one study share it. */
  digest: string;
  base: string;
  rows: CompareRow[];
  /** Indices of the verified rows, cheapest first (cost, then mass, then position). */
  ranking: number[];
  /** Index of the cheapest verified option, or null when none is verified. */
  cheapest: number | null;
  counts: { options: number; verified: number; infeasible: number; invalid: number; failed: number };
}

export interface CompareShard {
  schemaVersion: string;
  kind: 'compare-shard';
  title: string;
  digest: string;
  base: string;
  /** Options in the whole study. */
  optionCount: number;
  shard: { index: number; count: number };
  rows: CompareRow[];
}

/** A copy with the keys of every table in sorted order (lists keep their order). */
function sortedKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(sortedKeys);
  if (typeof value === 'object' && value !== null) {
    return Object.fromEntries(Object.keys(value).sort().map((key) => [key, sortedKeys((value as Record<string, unknown>)[key])]));
  }
  return value;
}

/**
 * SHA-256 over the title and the names, capacities and spec documents of the expanded options, in
 * order, with the keys of each table sorted: the same study written with its inputs in another order
 * has the same digest.
 */
export function optionsDigest(file: OptionsFile): string {
  const canonical = file.cases.map((option) => ({ name: option.name, capacity: option.capacity ?? null, document: option.document }));
  return createHash('sha256').update(stableJson(sortedKeys({ title: file.title, cases: canonical }))).digest('hex');
}

/** The options a shard runs: every count-th option from index - 1 (1-based index), so each shard gets a share of every sweep. */
export function shardCases<T extends { index: number }>(cases: readonly T[], index: number, count: number): T[] {
  if (!(Number.isInteger(count) && count >= 1 && Number.isInteger(index) && index >= 1 && index <= count)) {
    throw new DesignError('BAD_INPUT', `--shard must be i/n with whole numbers 1 <= i <= n; got ${index}/${count}`, 'shard');
  }
  return cases.filter((option) => option.index % count === index - 1);
}

function errorRow(option: OptionCase, overrides: InputOverride[], status: 'invalid' | 'failed', error: unknown): CompareRow {
  const base = { index: option.index, name: option.name, sweep: option.sweep, overrides, status, steelMass: null, cost: null, maxUtilisation: null };
  if (error instanceof SpecError) return { ...base, message: error.issues.map((issue) => issue.message).join('; '), errorPath: error.path, errorCode: error.code };
  if (error instanceof DesignError) return { ...base, message: error.message, ...(error.path ? { errorPath: error.path } : {}), errorCode: error.code };
  return { ...base, message: error instanceof Error ? error.message : String(error), errorCode: 'UNEXPECTED' };
}

/** Volume of the full bin, m3: the cylinder to the top of its wall and the conical hopper (frustum). */
export function binVolume(bin: CircularBinSpec): number {
  const geometry = circularBinGeometry(bin);
  return geometry.planArea * bin.cylinderHeight + geometry.hopperVolume;
}

/**
 * The cylinder height that makes the full bin hold `capacity` at the option's diameter: the hopper
 * (fixed by diameter, outlet and apex angle) takes its share, the cylinder the rest, rounded up to
 * CAPACITY_HEIGHT_STEP. A fill height of the base is dropped (the bin is full to the top of its wall).
 */
function withCapacity(option: OptionCase): { document: Record<string, unknown>; overrides: InputOverride[] } {
  const document = structuredClone(option.document);
  if (!option.capacity) return { document, overrides: option.overrides };
  const bin = document['bin'];
  if (typeof bin === 'object' && bin !== null) delete (bin as Record<string, unknown>)['fillHeight'];
  const probe = circularBinOf(normaliseSpec(document));
  const geometry = circularBinGeometry(probe);
  const cylinder = (option.capacity.capacity - geometry.hopperVolume) / geometry.planArea;
  const height = Math.ceil(cylinder / CAPACITY_HEIGHT_STEP - 1e-9) * CAPACITY_HEIGHT_STEP;
  const cylinderHeight = Number(height.toFixed(2));
  if (!(cylinderHeight >= 0.5)) {
    throw new SpecError('INVALID_INPUT', [
      {
        path: 'bin.diameter',
        message: `bin.diameter ${option.capacity.diameter} m cannot hold ${option.capacity.capacity} m3 with a cylinder of at least 0.5 m: the hopper alone holds ${geometry.hopperVolume.toFixed(1)} m3 and the cylinder would be ${cylinder.toFixed(2)} m high`,
      },
    ]);
  }
  setInputPath(document, 'bin.cylinderHeight', cylinderHeight);
  return { document, overrides: [...option.overrides, { path: 'bin.cylinderHeight', value: cylinderHeight }] };
}

/**
 * The validated spec of an option (SI) and the inputs it changes: at constant capacity with the
 * cylinder height found for its diameter. Throws SpecError for an input that cannot be designed.
 */
export function prepareOption(option: OptionCase): { spec: BinSpec; overrides: InputOverride[] } {
  const prepared = withCapacity(option);
  return { spec: normaliseSpec(prepared.document), overrides: prepared.overrides };
}

/** Design one option into its row; every failure becomes the row's status and message, never an exception. */
export async function designOption(option: OptionCase): Promise<CompareRow> {
  let prepared: { spec: BinSpec; overrides: InputOverride[] };
  try {
    prepared = prepareOption(option);
  } catch (error) {
    return errorRow(option, option.overrides, error instanceof SpecError || error instanceof DesignError ? 'invalid' : 'failed', error);
  }
  const spec = prepared.spec;
  let result;
  try {
    // The row shows the chosen design; the scenarios outside the envelope do not change it.
    result = (await designFromSpec(spec, { comparisonScenarios: false })).result;
  } catch (error) {
    return errorRow(option, prepared.overrides, error instanceof DesignError && error.code === 'BAD_INPUT' ? 'invalid' : 'failed', error);
  }
  const girder = result.members.find((member) => member.id === MEMBER_ID);
  const columns = result.members.find((member) => member.id === COLUMN_MEMBER_ID);
  const governingMember = [...result.members].sort((a, b) => (b.utilisation ?? Infinity) - (a.utilisation ?? Infinity))[0];
  const maxUtilisation = result.members.some((member) => member.utilisation === null) ? null : Math.max(...result.members.map((member) => member.utilisation ?? 0));
  return {
    index: option.index,
    name: option.name,
    sweep: option.sweep,
    overrides: prepared.overrides,
    status: result.status,
    message: result.optimisation.message,
    bin: { diameter: circularBinOf(spec).diameter, cylinderHeight: spec.bin.cylinderHeight, capacity: binVolume(circularBinOf(spec)), solid: spec.solid.name },
    support: { type: result.girder.support, columns: result.girder.support === 'slab' ? 0 : result.girder.columns },
    steelMass: result.totals.steelMass,
    cost: result.optimisation.objectiveValue ?? null,
    ...(girder ? { girder: { section: girder.section, grade: girder.grade, mass: girder.mass, utilisation: girder.utilisation } } : {}),
    ...(columns ? { columns: { section: columns.section, grade: columns.grade, count: result.girder.columns, mass: columns.mass, utilisation: columns.utilisation } } : {}),
    ...(governingMember
      ? {
          governing: {
            member: governingMember.id,
            check: governingMember.governing.check,
            clause: governingMember.governing.clause,
            combination: governingMember.governing.combination,
            scenario: governingMember.governing.scenario,
            position: governingMember.governing.position.description,
            utilisation: governingMember.utilisation,
          },
        }
      : {}),
    maxUtilisation,
  };
}

function compareRows(a: CompareRow, b: CompareRow): number {
  return (a.cost ?? Infinity) - (b.cost ?? Infinity) || (a.steelMass ?? Infinity) - (b.steelMass ?? Infinity) || a.index - b.index;
}

/** The comparison of all rows of a study (rows in any order; they are put in option order). */
export function compareReport(meta: { title: string; digest: string; base: string; optionCount: number }, rows: readonly CompareRow[]): CompareResult {
  const ordered = [...rows].sort((a, b) => a.index - b.index);
  const missing = ordered.length !== meta.optionCount || ordered.some((row, i) => row.index !== i);
  if (missing) throw new DesignError('BAD_INPUT', `the comparison needs one row for each of the ${meta.optionCount} options; got ${ordered.length} rows (indices ${ordered.map((row) => row.index).join(', ')})`, 'rows');
  const ranking = ordered.filter((row) => row.status === 'verified').sort(compareRows).map((row) => row.index);
  const count = (status: CompareRow['status']): number => ordered.filter((row) => row.status === status).length;
  return {
    schemaVersion: COMPARE_SCHEMA_VERSION,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    title: meta.title,
    cautions: [...CAUTIONS, 'Each option is designed on its own by the same rules; the comparison is as good as the least verified of its assumptions. Prices are relative unless real ones were given.'],
    digest: meta.digest,
    base: meta.base,
    rows: ordered,
    ranking,
    cheapest: ranking[0] ?? null,
    counts: { options: ordered.length, verified: count('verified'), infeasible: count('infeasible'), invalid: count('invalid'), failed: count('failed') },
  };
}

/** A shard file's content: the rows of one slice of the study. */
export function compareShard(meta: { title: string; digest: string; base: string; optionCount: number }, shard: { index: number; count: number }, rows: readonly CompareRow[]): CompareShard {
  return { schemaVersion: COMPARE_SCHEMA_VERSION, kind: 'compare-shard', title: meta.title, digest: meta.digest, base: meta.base, optionCount: meta.optionCount, shard, rows: [...rows].sort((a, b) => a.index - b.index) };
}

function isShard(value: unknown): value is CompareShard {
  if (typeof value !== 'object' || value === null) return false;
  const shard = value as Partial<CompareShard>;
  return shard.kind === 'compare-shard' && typeof shard.digest === 'string' && typeof shard.optionCount === 'number' && Array.isArray(shard.rows) && typeof shard.shard === 'object';
}

/**
 * Join the shards of one study into its comparison. Refused, naming the file: a file that is not a
 * shard, shards of different studies or versions, a shard given twice or missing, or rows that do
 * not cover every option exactly once.
 */
export function mergeShards(parts: ReadonlyArray<{ source: string; content: unknown }>): CompareResult {
  if (parts.length === 0) throw new DesignError('BAD_INPUT', 'compare --merge needs the shard files to join', 'merge');
  const shards = parts.map(({ source, content }) => {
    if (!isShard(content)) throw new DesignError('BAD_INPUT', `${source} is not a comparison shard (written by 'binsupport compare --shard i/n')`, source);
    if (content.schemaVersion !== COMPARE_SCHEMA_VERSION) throw new DesignError('BAD_INPUT', `${source} has schemaVersion ${content.schemaVersion}; this version merges ${COMPARE_SCHEMA_VERSION}`, source);
    return { source, shard: content };
  });
  const first = shards[0] as (typeof shards)[number];
  const count = first.shard.shard.count;
  const seen = new Map<number, string>();
  for (const { source, shard } of shards) {
    if (shard.digest !== first.shard.digest) throw new DesignError('BAD_INPUT', `${source} belongs to another study (or another version of its options) than ${first.source}`, source);
    if (shard.shard.count !== count) throw new DesignError('BAD_INPUT', `${source} is shard ${shard.shard.index}/${shard.shard.count}; ${first.source} is one of ${count}`, source);
    const earlier = seen.get(shard.shard.index);
    if (earlier !== undefined) throw new DesignError('BAD_INPUT', `${source} repeats shard ${shard.shard.index}/${count} (also ${earlier})`, source);
    seen.set(shard.shard.index, source);
  }
  const absent = Array.from({ length: count }, (_, i) => i + 1).filter((index) => !seen.has(index));
  if (absent.length > 0) throw new DesignError('BAD_INPUT', `compare --merge is missing shard ${absent.map((index) => `${index}/${count}`).join(', ')}`, 'merge');
  const rows = shards.flatMap(({ shard }) => shard.rows);
  return compareReport({ title: first.shard.title, digest: first.shard.digest, base: first.shard.base, optionCount: first.shard.optionCount }, rows);
}
