import { readFile, stat } from 'node:fs/promises';
import { extname } from 'node:path';
import { parseDocument, YAMLError } from 'yaml';
import { SpecError } from './errors.js';
import { normaliseSpec, type BinSpec } from './spec.js';
import { parseGirderModelFile, type GirderModelFile } from './girder-model.js';
import { normaliseSpecWorkbook, parseSpecWorkbook } from './workbook.js';

/** Largest spec file read, bytes: a spec sheet is a few kB; anything larger is not a spec. */
export const MAX_SPEC_BYTES = 1_000_000;

export type SpecFormat = 'yaml' | 'json' | 'xlsx';

export function specFormatOf(path: string): SpecFormat {
  const extension = extname(path).toLowerCase();
  if (extension === '.yaml' || extension === '.yml') return 'yaml';
  if (extension === '.json') return 'json';
  if (extension === '.xlsx') return 'xlsx';
  throw new SpecError('UNSUPPORTED_FORMAT', [{ path, message: `${path}: an input file must be .yaml, .yml, .json or .xlsx; got '${extension || 'no extension'}'` }]);
}

/** Parse spec text of a known format into a plain document (no validation yet). */
export function parseSpecText(textContent: string, format: Exclude<SpecFormat, 'xlsx'>, source = 'spec'): unknown {
  if (format === 'json') {
    try {
      return JSON.parse(textContent) as unknown;
    } catch (error) {
      throw new SpecError('PARSE_ERROR', [{ path: source, message: `${source} is not valid JSON: ${(error as Error).message}` }]);
    }
  }
  // Plain YAML 1.2 core schema: no custom tags, no merge keys, a bounded alias count. A warning
  // (an unknown tag, for instance) is refused like an error, rather than printed and ignored.
  const document = parseDocument(textContent, { schema: 'core', merge: false, uniqueKeys: true, prettyErrors: false });
  const problem = document.errors[0] ?? document.warnings[0];
  if (problem) {
    throw new SpecError('PARSE_ERROR', [{ path: source, message: `${source} is not valid YAML: ${problem.message.split('\n')[0]}` }]);
  }
  try {
    return document.toJS({ maxAliasCount: 100 }) as unknown;
  } catch (error) {
    const detail = error instanceof YAMLError ? error.message.split('\n')[0] : (error as Error).message;
    throw new SpecError('PARSE_ERROR', [{ path: source, message: `${source} is not valid YAML: ${detail}` }]);
  }
}

/** The bytes of an input file of at most MAX_SPEC_BYTES. */
async function readInputBytes(path: string): Promise<Buffer> {
  let size: number;
  try {
    size = (await stat(path)).size;
  } catch {
    throw new SpecError('UNREADABLE_FILE', [{ path, message: `${path}: the spec file cannot be read (does it exist?)` }]);
  }
  if (size > MAX_SPEC_BYTES) {
    throw new SpecError('UNREADABLE_FILE', [{ path, message: `${path}: a spec file must be at most ${MAX_SPEC_BYTES} bytes; got ${size}` }]);
  }
  return readFile(path);
}

/** Read and parse a YAML, JSON or XLSX (spec sheet) input file of at most MAX_SPEC_BYTES (no validation yet). */
export async function readDocumentFile(path: string): Promise<unknown> {
  const format = specFormatOf(path);
  const bytes = await readInputBytes(path);
  if (format === 'xlsx') return parseSpecWorkbook(bytes, path);
  return parseSpecText(bytes.toString('utf8'), format, path);
}

/** Read, parse, validate and convert a spec file; a spec sheet's errors name its sheet and row. */
export async function readSpecFile(path: string): Promise<BinSpec> {
  if (specFormatOf(path) === 'xlsx') return normaliseSpecWorkbook(await readInputBytes(path), path);
  return normaliseSpec(await readDocumentFile(path));
}

/** Read and validate a girder-model file (for re-running one analysis). */
export async function readGirderModelFile(path: string): Promise<GirderModelFile> {
  return parseGirderModelFile(await readDocumentFile(path), path);
}
