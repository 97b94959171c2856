// The options file of an option comparison: a base spec plus named options (overrides by input
// path) and sweeps (lists or ranges over inputs, combined as a grid; a sweep at constant capacity).
// This module reads and validates the file and expands it into the list of options, each a plain
// spec document in input units; the design of each option is done elsewhere. Paths and values are
// checked here against the spec's own inputs, so a typo names the option, the path and the inputs.
import { readFile, stat } from 'node:fs/promises';
import { dirname, extname, resolve } from 'node:path';
import { z } from 'zod';
import { SpecError, type SpecIssue } from './errors.js';
import { parseSpecText, readDocumentFile, MAX_SPEC_BYTES } from './read.js';
import { specSheetFields, type SpecSheetField } from './sheet-fields.js';
import { asText, inputValue, loadWorkbook, plainValue } from './workbook.js';
import { setInputPath } from './paths.js';

export { setInputPath };

function clone<T>(value: T): T {
  return structuredClone(value);
}

/** Most options one file may expand to (a sweep grid grows fast; a larger study is split into files). */
export const MAX_OPTIONS = 2000;
/** Most values one range may give. */
const MAX_RANGE_VALUES = 500;
/** Name of the option that is the base spec itself (always the first row). */
export const BASE_OPTION_NAME = 'base';
/** Sheet of an options workbook. */
export const OPTIONS_SHEET = 'Options';

const inputPathPattern = /^[A-Za-z][A-Za-z0-9]*(\[\d+\])?(\.[A-Za-z][A-Za-z0-9]*(\[\d+\])?)*$/;

const json: z.ZodType<unknown> = z.lazy(() => z.union([z.string().max(200), z.number(), z.boolean(), z.null(), z.array(json).max(100), z.record(z.string().max(60), json)]));

const range = z.strictObject(
  {
    from: z.number({ error: 'must be a number (the first value of the range, in the input unit)' }),
    to: z.number({ error: 'must be a number (the last value of the range, in the input unit)' }),
    step: z.number({ error: 'must be a positive number (the step of the range, in the input unit)' }).gt(0, { error: 'must be a positive number (the step of the range, in the input unit)' }),
  },
  { error: 'must be a list of values or a range { from, to, step }' },
);
const sweepValues = z.union([z.array(json).min(1, { error: 'must list at least one value' }).max(MAX_RANGE_VALUES), range], {
  error: 'must be a list of values or a range { from, to, step }',
});

const optionName = z.string({ error: 'must be text' }).trim().min(1, { error: 'must not be empty' }).max(80, { error: 'must be at most 80 characters' });

export const optionsFileInput = z.strictObject(
  {
    schemaVersion: z.literal(1, { error: 'must be 1 (the only options format so far)' }).default(1),
    title: z.string({ error: 'must be text' }).max(200, { error: 'must be at most 200 characters' }).default('Option comparison'),
    base: z.union([z.string().min(1).max(500), z.record(z.string(), json)], { error: 'must be the path of the base spec file (relative to the options file) or the spec itself' }),
    options: z
      .array(
        z.strictObject({ name: optionName, set: z.record(z.string(), json, { error: 'must be a table of input path: value' }) }, { error: 'must be a table with name and set' }),
        { error: 'must be a list of options' },
      )
      .default([]),
    sweeps: z
      .array(
        z.strictObject(
          {
            name: optionName,
            grid: z.record(z.string(), sweepValues, { error: 'must be a table of input path: list or range' }).default({}),
            constantCapacity: z
              .strictObject(
                {
                  capacity: z.number({ error: 'must be a number between 1 and 100000 m3' }).gte(1, { error: 'must be a number between 1 and 100000 m3' }).lte(100000, { error: 'must be a number between 1 and 100000 m3' }),
                  diameter: sweepValues,
                },
                { error: 'must be a table with capacity (m3) and diameter (a list or range, m)' },
              )
              .optional(),
          },
          { error: 'must be a table with name, grid and/or constantCapacity' },
        ),
        { error: 'must be a list of sweeps' },
      )
      .default([]),
  },
  { error: 'an options file must be a table with base, options and/or sweeps' },
);
export type OptionsFileInput = z.infer<typeof optionsFileInput>;

/** One value of an input in an option; `null` removes the input from the base (its default applies). */
export interface InputOverride {
  path: string;
  value: unknown;
}

/** A bin of given capacity: the diameter varies and the cylinder height follows from the volume. */
export interface CapacityTarget {
  /** Required volume of the full bin (cylinder to the top of its wall, plus the hopper), m3. */
  capacity: number;
  diameter: number;
}

/** One option of the comparison, before its design: the base with its overrides applied. */
export interface OptionCase {
  /** Position in the expanded list, from 0 (the base). */
  index: number;
  name: string;
  /** The sweep it comes from, or '' for the base and the named options. */
  sweep: string;
  overrides: InputOverride[];
  /** Set for a constant-capacity sweep: the height is found when the option is designed. */
  capacity?: CapacityTarget;
  /** The spec document of the option in input units (not yet validated: that is the design's first step). */
  document: Record<string, unknown>;
}

export interface OptionsFile {
  title: string;
  /** Where the base came from: the base spec file as the options file names it, or 'inline'. */
  baseSource: string;
  base: Record<string, unknown>;
  cases: OptionCase[];
}

function invalid(issues: SpecIssue[]): never {
  throw new SpecError('INVALID_INPUT', issues);
}

/** Input paths of the spec and the tables that hold them (for checking an override's path). */
let known: { fields: Map<string, SpecSheetField>; tables: Set<string> } | undefined;

/** Built once: the schema does not change while the program runs. */
function knownPaths(): { fields: Map<string, SpecSheetField>; tables: Set<string> } {
  if (known) return known;
  const fields = new Map(specSheetFields().map((field) => [field.path, field]));
  const tables = new Set<string>();
  for (const path of fields.keys()) {
    const parts = path.split('.');
    for (let i = 1; i < parts.length; i++) tables.add(parts.slice(0, i).join('.'));
  }
  tables.add('equipment');
  known = { fields, tables };
  return known;
}

/** The schema path of an input path: `equipment[2].force` -> `equipment[].force`. */
function schemaPathOf(path: string): string {
  return path.replace(/\[\d+\]/g, '[]');
}

function checkPath(path: string, where: string): void {
  const { fields, tables } = knownPaths();
  if (!inputPathPattern.test(path)) {
    invalid([{ path: where, message: `${where}: '${path}' is not an input path (dotted names as in the spec, e.g. support.columns or equipment[0].force)` }]);
  }
  const schemaPath = schemaPathOf(path);
  if (fields.has(schemaPath) || tables.has(schemaPath) || /^equipment\[\d+\]$/.test(path)) return;
  const head = path.split('.')[0] ?? '';
  const near = [...fields.keys()].filter((candidate) => candidate.startsWith(`${head.replace(/\[\d+\]$/, '[]')}.`)).slice(0, 12);
  invalid([{ path: where, message: `${where}: '${path}' is not an input of the spec${near.length > 0 ? ` (inputs under ${head}: ${near.join(', ')})` : ''}; see docs/input-reference.md` }]);
}

/** Round a range value to 10 significant figures, so that 0.1 steps give 5.3 rather than 5.300000000000001. */
function tidy(value: number): number {
  return Number(value.toPrecision(10));
}

function valuesOf(values: z.infer<typeof sweepValues>, where: string): unknown[] {
  if (Array.isArray(values)) return values;
  const { from, to, step } = values;
  if (!(to >= from)) invalid([{ path: where, message: `${where}: a range must have to >= from; got from ${from}, to ${to}` }]);
  const count = Math.floor((to - from) / step + 1e-9) + 1;
  if (count > MAX_RANGE_VALUES) invalid([{ path: where, message: `${where}: a range may give at most ${MAX_RANGE_VALUES} values; from ${from} to ${to} by ${step} gives ${count}` }]);
  return Array.from({ length: count }, (_, i) => tidy(from + i * step));
}

function labelOf(value: unknown): string {
  if (typeof value === 'string') return value;
  return JSON.stringify(value);
}

/** Short names of the swept inputs: the last part of the path, or the whole path where two would clash. */
function shortNames(paths: string[]): Map<string, string> {
  const last = (path: string): string => path.split('.').pop() ?? path;
  const counts = new Map<string, number>();
  for (const path of paths) counts.set(last(path), (counts.get(last(path)) ?? 0) + 1);
  return new Map(paths.map((path) => [path, (counts.get(last(path)) ?? 0) > 1 ? path : last(path)]));
}

/** Validate an options document (already parsed from YAML, JSON or a workbook) and expand it. */
export function expandOptionsDocument(document: unknown, base: Record<string, unknown>, baseSource: string, source = 'options'): OptionsFile {
  const parsed = optionsFileInput.safeParse(document);
  if (!parsed.success) {
    invalid(
      parsed.error.issues.map((issue) => {
        const path = issue.path.map((part) => (typeof part === 'number' ? `[${part}]` : `.${String(part)}`)).join('').replace(/^\./, '');
        return { path: path || source, message: `${source}: ${path || 'the file'} ${issue.message}` };
      }),
    );
  }
  const input = parsed.data;
  const cases: OptionCase[] = [{ index: 0, name: BASE_OPTION_NAME, sweep: '', overrides: [], document: clone(base) }];
  const names = new Map<string, string>([[BASE_OPTION_NAME, 'the base']]);
  const add = (name: string, sweep: string, overrides: InputOverride[], where: string, capacity?: CapacityTarget): void => {
    const earlier = names.get(name);
    if (earlier !== undefined) invalid([{ path: where, message: `${source}: ${where} gives the option name '${name}' again (also ${earlier}); option names must be unique` }]);
    if (cases.length >= MAX_OPTIONS) invalid([{ path: where, message: `${source}: the file expands to more than ${MAX_OPTIONS} options; split the study into several files` }]);
    names.set(name, where);
    const optionDocument = clone(base);
    for (const override of overrides) setInputPath(optionDocument, override.path, override.value);
    cases.push({ index: cases.length, name, sweep, overrides, ...(capacity ? { capacity } : {}), document: optionDocument });
  };

  input.options.forEach((option, i) => {
    const overrides = Object.entries(option.set).map(([path, value]) => {
      checkPath(path, `options[${i}].set.${path}`);
      return { path, value };
    });
    if (overrides.length === 0) invalid([{ path: `options[${i}].set`, message: `${source}: options[${i}].set must change at least one input (the base is always compared)` }]);
    add(option.name, '', overrides, `options[${i}]`);
  });

  input.sweeps.forEach((sweep, i) => {
    const axes: Array<{ path: string; values: unknown[] }> = Object.entries(sweep.grid).map(([path, values]) => {
      checkPath(path, `sweeps[${i}].grid.${path}`);
      return { path, values: valuesOf(values, `sweeps[${i}].grid.${path}`) };
    });
    const capacity = sweep.constantCapacity;
    if (capacity) {
      if (axes.some((axis) => axis.path === 'bin.diameter' || axis.path === 'bin.cylinderHeight' || axis.path === 'bin.fillHeight')) {
        invalid([{ path: `sweeps[${i}].grid`, message: `${source}: sweeps[${i}] keeps the capacity constant, so its grid must not set bin.diameter, bin.cylinderHeight or bin.fillHeight` }]);
      }
      axes.unshift({ path: 'bin.diameter', values: valuesOf(capacity.diameter, `sweeps[${i}].constantCapacity.diameter`) });
    }
    if (axes.length === 0) invalid([{ path: `sweeps[${i}]`, message: `${source}: sweeps[${i}] must sweep at least one input (grid) or the diameter at constant capacity` }]);
    const labels = shortNames(axes.map((axis) => axis.path));
    // The grid in order: the first input varies slowest.
    let combinations: InputOverride[][] = [[]];
    for (const axis of axes) combinations = combinations.flatMap((prefix) => axis.values.map((value) => [...prefix, { path: axis.path, value }]));
    for (const overrides of combinations) {
      const name = `${sweep.name}: ${overrides.map((override) => `${labels.get(override.path)}=${labelOf(override.value)}`).join(', ')}`;
      if (capacity) {
        const diameter = overrides[0]?.value;
        if (typeof diameter !== 'number') invalid([{ path: `sweeps[${i}].constantCapacity.diameter`, message: `${source}: sweeps[${i}].constantCapacity.diameter must list numbers (m); got ${labelOf(diameter)}` }]);
        add(name, sweep.name, overrides, `sweeps[${i}]`, { capacity: capacity.capacity, diameter });
      } else {
        add(name, sweep.name, overrides, `sweeps[${i}]`);
      }
    }
  });
  return { title: input.title, baseSource, base, cases };
}

async function readBounded(path: string): Promise<Buffer> {
  let size: number;
  try {
    size = (await stat(path)).size;
  } catch {
    throw new SpecError('UNREADABLE_FILE', [{ path, message: `${path}: the options file cannot be read (does it exist?)` }]);
  }
  if (size > MAX_SPEC_BYTES) throw new SpecError('UNREADABLE_FILE', [{ path, message: `${path}: an options file must be at most ${MAX_SPEC_BYTES} bytes; got ${size}` }]);
  return readFile(path);
}

/** A workbook cell of the options sheet as the value the YAML reader would give for that input. */
function cellInput(path: string, value: string | number | boolean | Date): unknown {
  const field = knownPaths().fields.get(schemaPathOf(path));
  if (typeof value === 'string' && value.trim().toLowerCase() === 'null') return null;
  return field ? inputValue(field, value) : typeof value === 'string' ? value.trim() : value;
}

const rangeText = /^\s*(-?[\d.]+(?:e-?\d+)?)\s+to\s+(-?[\d.]+(?:e-?\d+)?)\s+step\s+([\d.]+(?:e-?\d+)?)\s*$/i;

/**
 * Read an options workbook: sheet "Options" with the headers Kind, Name, Input and Value; one row
 * per entry:
 *  - title | - | - | the title; base | - | - | path of the base spec file;
 *  - option | option name | input path | value (rows of one name form one option);
 *  - sweep | sweep name | input path | values separated by ';' or a range "5 to 8 step 0.5";
 *  - capacity | sweep name | - | m3; diameter | sweep name | - | values or a range (m).
 */
export async function parseOptionsWorkbook(bytes: Uint8Array, source: string): Promise<unknown> {
  const workbook = await loadWorkbook(bytes, source);
  const sheet = workbook.getWorksheet(OPTIONS_SHEET);
  if (sheet === undefined) invalid([{ path: source, message: `${source} has no sheet '${OPTIONS_SHEET}' (sheets: ${workbook.worksheets.map((ws) => ws.name).join(', ') || 'none'})` }]);
  if (sheet.rowCount > 5000) invalid([{ path: source, message: `${source}, sheet ${OPTIONS_SHEET} has ${sheet.rowCount} rows; an options sheet has at most 5000` }]);
  const header = new Map<string, number>();
  sheet.getRow(1).eachCell((cell, index) => {
    const text = plainValue(cell.value);
    if (text !== null) header.set(asText(text).toLowerCase(), index);
  });
  const column = (name: string): number => {
    const index = header.get(name);
    if (index === undefined) invalid([{ path: source, message: `${source}, sheet ${OPTIONS_SHEET}, row 1 must hold the headers Kind, Name, Input and Value` }]);
    return index;
  };
  const columns = { kind: column('kind'), name: column('name'), input: column('input'), value: column('value') };
  const document: { title?: string; base?: string; options: Array<{ name: string; set: Record<string, unknown> }>; sweeps: Array<{ name: string; grid: Record<string, unknown>; constantCapacity?: Record<string, unknown> }> } = { options: [], sweeps: [] };
  const optionByName = new Map<string, { name: string; set: Record<string, unknown> }>();
  const sweepByName = new Map<string, { name: string; grid: Record<string, unknown>; constantCapacity?: Record<string, unknown> }>();
  const listOrRange = (path: string, value: string | number | boolean | Date): unknown => {
    if (typeof value === 'string') {
      const match = rangeText.exec(value);
      if (match) return { from: Number(match[1]), to: Number(match[2]), step: Number(match[3]) };
      return value.split(';').map((entry) => entry.trim()).filter((entry) => entry !== '').map((entry) => cellInput(path, entry));
    }
    return [cellInput(path, value)];
  };
  for (let rowNumber = 2; rowNumber <= sheet.rowCount; rowNumber++) {
    const row = sheet.getRow(rowNumber);
    const text = (index: number): string => {
      const value = plainValue(row.getCell(index).value);
      return value === null ? '' : asText(value);
    };
    const kind = text(columns.kind).toLowerCase();
    const name = text(columns.name);
    const path = text(columns.input);
    const raw = plainValue(row.getCell(columns.value).value);
    const where = `${source}, sheet ${OPTIONS_SHEET}, row ${rowNumber}`;
    if (kind === '') {
      if (name !== '' || path !== '' || raw !== null) invalid([{ path: `row ${rowNumber}`, message: `${where} has entries but no Kind (title, base, option, sweep, capacity or diameter)` }]);
      continue;
    }
    if (raw === null) invalid([{ path: `row ${rowNumber}`, message: `${where} has no Value` }]);
    const needName = (): void => {
      if (name === '') invalid([{ path: `row ${rowNumber}`, message: `${where}: a ${kind} row needs a Name` }]);
    };
    const sweepOf = (): { name: string; grid: Record<string, unknown>; constantCapacity?: Record<string, unknown> } => {
      needName();
      let sweep = sweepByName.get(name);
      if (!sweep) {
        sweep = { name, grid: {} };
        sweepByName.set(name, sweep);
        document.sweeps.push(sweep);
      }
      return sweep;
    };
    switch (kind) {
      case 'title':
        document.title = asText(raw);
        break;
      case 'base':
        document.base = asText(raw);
        break;
      case 'option': {
        needName();
        if (path === '') invalid([{ path: `row ${rowNumber}`, message: `${where}: an option row needs an Input path` }]);
        let option = optionByName.get(name);
        if (!option) {
          option = { name, set: {} };
          optionByName.set(name, option);
          document.options.push(option);
        }
        option.set[path] = cellInput(path, raw);
        break;
      }
      case 'sweep':
        if (path === '') invalid([{ path: `row ${rowNumber}`, message: `${where}: a sweep row needs an Input path` }]);
        sweepOf().grid[path] = listOrRange(path, raw);
        break;
      case 'capacity': {
        const sweep = sweepOf();
        sweep.constantCapacity = { ...sweep.constantCapacity, capacity: typeof raw === 'number' ? raw : Number(asText(raw)) };
        break;
      }
      case 'diameter': {
        const sweep = sweepOf();
        sweep.constantCapacity = { ...sweep.constantCapacity, diameter: listOrRange('bin.diameter', raw) };
        break;
      }
      default:
        invalid([{ path: `row ${rowNumber}`, message: `${where}: Kind must be one of title, base, option, sweep, capacity, diameter; got '${kind}'` }]);
    }
  }
  return document;
}

/** Read, validate and expand an options file (.yaml, .yml, .json or .xlsx); the base spec is read relative to it. */
export async function readOptionsFile(path: string): Promise<OptionsFile> {
  const extension = extname(path).toLowerCase();
  let document: unknown;
  if (extension === '.xlsx') document = await parseOptionsWorkbook(await readBounded(path), path);
  else if (extension === '.yaml' || extension === '.yml' || extension === '.json') document = parseSpecText((await readBounded(path)).toString('utf8'), extension === '.json' ? 'json' : 'yaml', path);
  else throw new SpecError('UNSUPPORTED_FORMAT', [{ path, message: `${path}: an options file must be .yaml, .yml, .json or .xlsx; got '${extension || 'no extension'}'` }]);
  const baseInput = typeof document === 'object' && document !== null ? (document as Record<string, unknown>)['base'] : undefined;
  let base: Record<string, unknown>;
  let baseSource = 'inline';
  if (typeof baseInput === 'string') {
    baseSource = baseInput;
    const read = await readDocumentFile(resolve(dirname(path), baseInput));
    if (typeof read !== 'object' || read === null || Array.isArray(read)) invalid([{ path: 'base', message: `${path}: base ${baseInput} is not a spec (a table of inputs)` }]);
    base = read as Record<string, unknown>;
  } else if (typeof baseInput === 'object' && baseInput !== null && !Array.isArray(baseInput)) {
    base = baseInput as Record<string, unknown>;
  } else {
    invalid([{ path: 'base', message: `${path}: base must be the path of the base spec file (relative to the options file) or the spec itself` }]);
  }
  return expandOptionsDocument(document, base, baseSource, path);
}
