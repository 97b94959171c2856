// The spec sheet as an Excel workbook: a template with one input per row (path, value, unit, allowed
// range, default, note), drop-down lists and number limits on the value cells, and a reader that turns
// a filled sheet back into the same plain document the YAML reader gives. Errors name the sheet, the
// row and the input, so a client can correct the sheet itself.
import ExcelJS from 'exceljs';
import type { Cell, CellValue, Workbook, Worksheet } from 'exceljs';
import { SpecError, type SpecIssue } from './errors.js';
import { allowedText, specSheetFields, type SpecSheetField } from './sheet-fields.js';
import { normaliseSpec, type BinSpec } from './spec.js';
import { setInputPath } from './paths.js';

export const SPEC_SHEET = 'Spec';
export const README_SHEET = 'Read me';

/** Equipment items offered by the template; more are added as rows `equipment[4].name`, ... */
export const TEMPLATE_EQUIPMENT_ROWS = 4;

/** Most rows read from a spec sheet: far more than the inputs, so a runaway sheet is refused. */
const MAX_SHEET_ROWS = 2000;

const headers = ['Path', 'Value', 'Unit', 'Allowed', 'Default', 'Note'] as const;
const column = { path: 1, value: 2, unit: 3, allowed: 4, defaultText: 5, note: 6 } as const;

// Our own colours (ARGB).
const fills = { header: 'FFDCE4EC', input: 'FFFFF4CC', required: 'FFFCE3C8' };

function solidFill(argb: string): ExcelJS.Fill {
  return { type: 'pattern', pattern: 'solid', fgColor: { argb }, bgColor: { argb } };
}

/** The sheet path of a field for equipment item `index` (`equipment[].name` -> `equipment[2].name`). */
function sheetPath(field: SpecSheetField, index: number): string {
  return field.path.replace('[]', `[${index}]`);
}

function isEquipmentField(field: SpecSheetField): boolean {
  return field.path.includes('[]');
}

/** The template's rows: every input once, the equipment fields once per offered item. */
function templateRows(): Array<{ path: string; field: SpecSheetField }> {
  const fields = specSheetFields();
  const rows: Array<{ path: string; field: SpecSheetField }> = [];
  for (const field of fields.filter((f) => !isEquipmentField(f))) rows.push({ path: field.path, field });
  for (let index = 0; index < TEMPLATE_EQUIPMENT_ROWS; index++) {
    for (const field of fields.filter(isEquipmentField)) rows.push({ path: sheetPath(field, index), field });
  }
  return rows;
}

function validationOf(field: SpecSheetField): ExcelJS.DataValidation | undefined {
  const common = { allowBlank: true, showErrorMessage: true, errorStyle: 'stop', errorTitle: field.path };
  switch (field.kind) {
    case 'number':
      return { ...common, type: 'decimal', operator: 'between', formulae: [field.min, field.max], error: `A number ${allowedText(field)}.` };
    case 'whole number':
      return { ...common, type: 'whole', operator: 'between', formulae: [field.min, field.max], error: `A ${allowedText(field)}.` };
    case 'choice':
    case 'true/false': {
      const list = (field.choices ?? []).join(',');
      // Excel limits an inline list to 255 characters.
      if (list.length > 255) throw new Error(`spec sheet: the choices of ${field.path} are too long for a drop-down list`);
      return { ...common, type: 'list', formulae: [`"${list}"`], error: `One of ${(field.choices ?? []).join(', ')}.` };
    }
    case 'text':
      return field.maxLength === undefined ? undefined : { ...common, type: 'textLength', operator: 'lessThanOrEqual', formulae: [field.maxLength], error: `At most ${field.maxLength} characters.` };
    case 'list of choices':
    case 'list of numbers':
      return undefined;
  }
}

const readMeLines: Array<[string, string]> = [
  ['Spec sheet of a steel storage bin', 'heading'],
  ['This workbook is an input to binsupport: fill sheet Spec, save it as .xlsx and run  binsupport design spec.xlsx --out <folder>.', ''],
  ['How to fill it', 'heading'],
  ['One input per row. Type only in column Value (shaded); columns Path, Unit, Allowed, Default and Note describe the input.', ''],
  ['An empty Value means "not given": the default of column Default is used, or the input is reported as required.', ''],
  ['Use the units of column Unit: lengths of the bin in m, plate thicknesses and the cap plate in mm, angles in degrees, loads in kN, kN/m2 and kN/m3.', ''],
  ['Choices (grade, solid, wall surface, terrain category, true/false, ...) have a drop-down list in the Value cell.', ''],
  ['Lists (support.sectionFamilies, support.credibleScenarios, wind.directions, seismic.directions) go in one cell, separated by commas, e.g.  IPE, HEB  or  0, 22.5.', ''],
  ['Roof, snow, wind and seismic are optional: leave all rows of a group empty to leave that action out; fill its required rows to include it.', ''],
  [`Equipment loads: rows equipment[0].name ... equipment[0].kind describe the first item, equipment[1].* the second, and so on (${TEMPLATE_EQUIPMENT_ROWS} items offered). For more, add rows with the next index, e.g. equipment[4].name; an item whose rows are all empty is left out.`, ''],
  ['Do not rename sheet Spec or change column Path; rows may be reordered. A path that is not an input, or a path given twice, is an error.', ''],
  ['Every value is checked before anything is computed; an error names the sheet, the row and the input, e.g. "spec.xlsx, sheet Spec, row 12 (bin.hopper.apexHalfAngle) must be a number between 5 and 60 degrees; got 75".', ''],
  ['Cautions', 'heading'],
  ['The output is a first-pass design produced by software from these inputs; it is not a construction document.', ''],
  ['It must be verified by a qualified structural engineer before it is relied upon.', ''],
  ['Local codes, national annexes and licensed engineering practice govern over anything the program produces.', ''],
  ['The stored-solid properties are those of the built-in table (EN 1991-4 Annex E); check them against test data for the actual solid.', ''],
];

function specSheet(workbook: Workbook): void {
  const sheet = workbook.addWorksheet(SPEC_SHEET, { views: [{ state: 'frozen', xSplit: 1, ySplit: 1, topLeftCell: 'B2', activeCell: 'B2' }] });
  sheet.columns = [
    { header: headers[0], width: 34 },
    { header: headers[1], width: 22 },
    { header: headers[2], width: 9 },
    { header: headers[3], width: 40 },
    { header: headers[4], width: 24 },
    { header: headers[5], width: 90 },
  ];
  const header = sheet.getRow(1);
  header.font = { bold: true };
  header.eachCell((cell) => {
    cell.fill = solidFill(fills.header);
    cell.border = { bottom: { style: 'thin' } };
  });
  for (const { path, field } of templateRows()) {
    const row = sheet.addRow([path, null, field.unit, allowedText(field), field.defaultText === '' ? (field.required ? 'required' : '') : field.defaultText, field.note]);
    const value = row.getCell(column.value);
    value.fill = solidFill(field.required ? fills.required : fills.input);
    // Text, choices and lists are kept as typed (so 2026-12-01 stays a date text and II stays II).
    if (field.kind !== 'number' && field.kind !== 'whole number') value.numFmt = '@';
    const validation = validationOf(field);
    if (validation !== undefined) value.dataValidation = validation;
    row.getCell(column.path).font = { name: 'Consolas' };
  }
  sheet.autoFilter = `A1:F${sheet.rowCount}`;
}

function readMeSheet(workbook: Workbook): void {
  const sheet = workbook.addWorksheet(README_SHEET);
  sheet.getColumn(1).width = 130;
  for (const [text, style] of readMeLines) {
    const row = sheet.addRow([text]);
    const cell = row.getCell(1);
    cell.alignment = { wrapText: true, vertical: 'top' };
    if (style === 'heading') cell.font = { bold: true, size: 12, color: { argb: 'FF1B4F72' } };
  }
}

/** An empty spec sheet: sheet Spec (one input per row) and sheet Read me (how to fill it, cautions). */
export async function writeSpecTemplate(): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = 'binsupport';
  // A fixed date keeps the template's bytes independent of the clock.
  workbook.created = new Date(Date.UTC(2000, 0, 1));
  workbook.modified = workbook.created;
  specSheet(workbook);
  readMeSheet(workbook);
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

// ----------------------------------------------------------------------------------------------
// Reading a filled sheet

/** Where each input of the document came from: document path -> sheet row. */
export interface SpecSheetDocument {
  document: unknown;
  rows: Map<string, number>;
}

function location(source: string, row: number, path: string): string {
  return `${source}, sheet ${SPEC_SHEET}, row ${row} (${path})`;
}

function fail(code: 'PARSE_ERROR' | 'INVALID_INPUT', path: string, message: string): never {
  throw new SpecError(code, [{ path, message }]);
}

/** A cell's value as typed: formulas give their cached result, rich text its plain text. */
export function plainValue(value: CellValue): string | number | boolean | Date | null {
  if (value === null || value === undefined) return null;
  if (typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean' || value instanceof Date) return value;
  if ('richText' in value) return value.richText.map((part) => part.text).join('');
  if ('formula' in value || 'sharedFormula' in value) {
    const result = value.result;
    if (result === undefined || result === null) return null;
    if (typeof result === 'object' && !(result instanceof Date)) return null;
    return result;
  }
  if ('text' in value && typeof value.text === 'string') return value.text;
  if ('error' in value) return `#${String(value.error).replace(/^#/, '')}`;
  return null;
}

function isoDate(date: Date): string {
  return date.toISOString().slice(0, 10);
}

export function asText(value: string | number | boolean | Date): string {
  if (value instanceof Date) return isoDate(value);
  return String(value).trim();
}

/** A number typed as a number, or as text that reads wholly as one. */
function asNumber(value: string | number | boolean | Date): number | string {
  if (typeof value === 'number') return value;
  const text = asText(value);
  const number = Number(text);
  return text !== '' && Number.isFinite(number) ? number : text;
}

function splitList(value: string | number | boolean | Date): string[] {
  return asText(value)
    .split(/[,;]/)
    .map((entry) => entry.trim())
    .filter((entry) => entry !== '');
}

/** Convert a filled cell to the value the YAML reader would give for that input. */
export function inputValue(field: SpecSheetField, value: string | number | boolean | Date): unknown {
  switch (field.kind) {
    case 'number':
    case 'whole number':
      return asNumber(value);
    case 'text':
    case 'choice':
      return asText(value);
    case 'true/false': {
      if (typeof value === 'boolean') return value;
      const text = asText(value).toLowerCase();
      return text === 'true' ? true : text === 'false' ? false : asText(value);
    }
    case 'list of choices':
      return splitList(value);
    case 'list of numbers':
      return splitList(value).map(asNumber);
  }
}

export async function loadWorkbook(bytes: Uint8Array, source: string): Promise<Workbook> {
  const workbook = new ExcelJS.Workbook();
  try {
    const copy = new Uint8Array(bytes.byteLength);
    copy.set(bytes);
    await workbook.xlsx.load(copy.buffer);
  } catch {
    // The reader's own message names its zip library and a web page; the engineer needs only this.
    fail('PARSE_ERROR', source, `${source} is not a readable .xlsx workbook (an .xlsx file is a zip archive of the sheets; this one is not, or is damaged); save the spec sheet from Excel or LibreOffice as .xlsx`);
  }
  return workbook;
}

function headerColumns(sheet: Worksheet, source: string): { path: number; value: number } {
  const found = new Map<string, number>();
  sheet.getRow(1).eachCell((cell: Cell, index: number) => {
    const text = plainValue(cell.value);
    if (text !== null) found.set(asText(text).toLowerCase(), index);
  });
  const path = found.get('path');
  const value = found.get('value');
  if (path === undefined || value === undefined) {
    fail('PARSE_ERROR', source, `${source}, sheet ${SPEC_SHEET}, row 1 must hold the column headers Path and Value (as in the template)`);
  }
  return { path, value };
}

const equipmentPath = /^equipment\[(\d+)\]\.([A-Za-z]+)$/;

/**
 * Read a filled spec sheet into the plain document the YAML reader gives (an empty value: not given),
 * with the row of each input. Does not validate the values; see normaliseSpecWorkbook.
 */
export async function readSpecWorkbook(bytes: Uint8Array, source = 'spec.xlsx'): Promise<SpecSheetDocument> {
  const workbook = await loadWorkbook(bytes, source);
  const sheet = workbook.getWorksheet(SPEC_SHEET);
  if (sheet === undefined) {
    fail('PARSE_ERROR', source, `${source} has no sheet '${SPEC_SHEET}' (sheets: ${workbook.worksheets.map((ws) => ws.name).join(', ') || 'none'}); start from the spec-sheet template`);
  }
  if (sheet.rowCount > MAX_SHEET_ROWS) {
    fail('PARSE_ERROR', source, `${source}, sheet ${SPEC_SHEET} has ${sheet.rowCount} rows; a spec sheet has at most ${MAX_SHEET_ROWS}`);
  }
  const columns = headerColumns(sheet, source);
  const fields = new Map(specSheetFields().map((field) => [field.path, field]));
  const document: Record<string, unknown> = {};
  const rows = new Map<string, number>();
  const seen = new Map<string, number>();
  const equipment = new Map<number, { fields: Record<string, unknown>; rows: Map<string, number> }>();
  for (let rowNumber = 2; rowNumber <= sheet.rowCount; rowNumber++) {
    const row = sheet.getRow(rowNumber);
    const pathValue = plainValue(row.getCell(columns.path).value);
    const path = pathValue === null ? '' : asText(pathValue);
    const raw = plainValue(row.getCell(columns.value).value);
    const value = raw === null || (typeof raw === 'string' && raw.trim() === '') ? null : raw;
    if (path === '') {
      if (value !== null) fail('INVALID_INPUT', `row ${rowNumber}`, `${source}, sheet ${SPEC_SHEET}, row ${rowNumber} has a value but no path in column Path`);
      continue;
    }
    const earlier = seen.get(path);
    if (earlier !== undefined) fail('INVALID_INPUT', path, `${location(source, rowNumber, path)} is given twice (also row ${earlier})`);
    seen.set(path, rowNumber);
    const item = equipmentPath.exec(path);
    const field = fields.get(item === null ? path : `equipment[].${item[2] ?? ''}`);
    if (field === undefined || (item === null && path.includes('['))) {
      fail('INVALID_INPUT', path, `${location(source, rowNumber, path)} is not an input (check column Path against the template)`);
    }
    if (value === null) continue;
    const converted = inputValue(field, value);
    if (item !== null) {
      const index = Number(item[1]);
      const entry = equipment.get(index) ?? { fields: {}, rows: new Map<string, number>() };
      entry.fields[item[2] ?? ''] = converted;
      entry.rows.set(item[2] ?? '', rowNumber);
      equipment.set(index, entry);
    } else {
      setInputPath(document, path, converted);
      rows.set(path, rowNumber);
    }
  }
  // Equipment items in the order of their index; an item with no value at all is left out.
  const items = [...equipment.entries()].sort(([a], [b]) => a - b);
  if (items.length > 0) {
    document.equipment = items.map(([, entry], position) => {
      for (const [key, rowNumber] of entry.rows) rows.set(`equipment[${position}].${key}`, rowNumber);
      rows.set(`equipment[${position}]`, Math.min(...entry.rows.values()));
      return entry.fields;
    });
  }
  return { document, rows };
}

/** Read a filled spec sheet into the plain document the YAML reader gives (no validation yet). */
export async function parseSpecWorkbook(bytes: Uint8Array, source = 'spec.xlsx'): Promise<unknown> {
  return (await readSpecWorkbook(bytes, source)).document;
}

/** The row of an input path, or of the nearest enclosing input that has one. */
function rowOf(rows: Map<string, number>, path: string): { row: number; path: string } | undefined {
  let current = path;
  for (;;) {
    const row = rows.get(current);
    if (row !== undefined) return { row, path: current };
    const shorter = current.replace(/(\[\d+\]|\.[^.[\]]+)$/, '');
    if (shorter === current || shorter === '') return undefined;
    current = shorter;
  }
}

/** An issue of the document restated at its row of the sheet; the path and the wording are kept. */
function issueAtRow(issue: SpecIssue, rows: Map<string, number>, source: string): SpecIssue {
  const found = rowOf(rows, issue.path);
  const rest = issue.message.startsWith(issue.path) ? issue.message.slice(issue.path.length) : `: ${issue.message}`;
  if (found === undefined) {
    // Not given in the sheet (e.g. a required input whose row is missing or empty).
    return { path: issue.path, message: `${source}, sheet ${SPEC_SHEET} (${issue.path})${rest}` };
  }
  return { path: issue.path, message: `${location(source, found.row, issue.path)}${rest}` };
}

/** Read, validate and convert a filled spec sheet: the BinSpec, with errors located by sheet and row. */
export async function normaliseSpecWorkbook(bytes: Uint8Array, source = 'spec.xlsx'): Promise<BinSpec> {
  const { document, rows } = await readSpecWorkbook(bytes, source);
  try {
    return normaliseSpec(document);
  } catch (error) {
    if (error instanceof SpecError) {
      throw new SpecError(error.code, error.issues.map((issue) => issueAtRow(issue, rows, source)));
    }
    throw error;
  }
}
