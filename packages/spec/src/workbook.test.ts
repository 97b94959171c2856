import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import type { Worksheet } from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SpecError } from './errors.js';
import { readDocumentFile, readSpecFile, specFormatOf } from './read.js';
import { fieldNotes, schemaLeafPaths, specSheetFields } from './sheet-fields.js';
import { storedSolidTable } from './solids.js';
import { normaliseSpecWorkbook, parseSpecWorkbook, README_SHEET, SPEC_SHEET, writeSpecTemplate } from './workbook.js';

const demoYaml = new URL('../../../demo-data/kestrel-grain-bin.yaml', import.meta.url).pathname;

/**
 * The values of demo-data/kestrel-grain-bin.yaml (an invented scenario) as a client would type them
 * into the sheet: numbers as numbers, lists as comma-separated text, the date as text (the value
 * cells of text inputs are formatted as text).
 */
const kestrelSheetValues: Record<string, ExcelJS.CellValue> = {
  schemaVersion: 1,
  'project.name': 'Bin W3, 390 m3 wheat storage',
  'project.client': 'Kestrel Vale Grain Cooperative (invented)',
  'project.site': 'Amberfield intake yard (invented)',
  'project.reference': 'KV-2026-031',
  'project.designer': 'binsupport demo',
  'project.date': '2026-12-01',
  'bin.shape': 'circular',
  'bin.diameter': 6.0,
  'bin.cylinderHeight': 12.0,
  'bin.wallThickness': 6,
  'bin.hopper.apexHalfAngle': 30,
  'bin.hopper.outletDiameter': 0.4,
  'bin.hopper.thickness': 8,
  'roof.deadLoad': 0.4,
  'roof.imposedLoad': 0.6,
  'roof.pitch': 15,
  'snow.groundLoad': 0.8,
  'wind.basicVelocity': 25,
  'wind.terrainCategory': 'II',
  'wind.supportLevelHeight': 6,
  'wind.directions': '0, 22.5',
  'equipment[0].name': 'level radar and filter unit',
  'equipment[0].angle': 90,
  'equipment[0].radius': 2.0,
  'equipment[0].force': 6,
  'solid.name': 'wheat',
  'solid.wallSurface': 'D2',
  'support.type': 'ring-on-columns',
  'support.columns': 8,
  'support.segmentsPerSpan': 24,
  'support.grade': 'S355',
  'support.sectionFamilies': 'IPE, HEB',
  'support.columnSection': 'HE 180 B',
};

let template: Buffer;
let folder: string;

async function load(bytes: Uint8Array): Promise<ExcelJS.Workbook> {
  const workbook = new ExcelJS.Workbook();
  const copy = new Uint8Array(bytes.byteLength);
  copy.set(bytes);
  await workbook.xlsx.load(copy.buffer);
  return workbook;
}

function specSheetOf(workbook: ExcelJS.Workbook): Worksheet {
  const sheet = workbook.getWorksheet(SPEC_SHEET);
  if (sheet === undefined) throw new Error('no Spec sheet');
  return sheet;
}

/** Row number of each path in column A. */
function rowsByPath(sheet: Worksheet): Map<string, number> {
  const rows = new Map<string, number>();
  sheet.eachRow((row, number) => {
    if (number > 1) rows.set(String(row.getCell(1).value), number);
  });
  return rows;
}

/** The template filled with `values` (by path) the way a user would, with exceljs. */
async function filled(values: Record<string, ExcelJS.CellValue>): Promise<Buffer> {
  const workbook = await load(template);
  const sheet = specSheetOf(workbook);
  const rows = rowsByPath(sheet);
  for (const [path, value] of Object.entries(values)) {
    const row = rows.get(path);
    if (row === undefined) throw new Error(`template has no row ${path}`);
    sheet.getRow(row).getCell(2).value = value;
  }
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

function specErrorOf(promise: Promise<unknown>): Promise<SpecError> {
  return promise.then(
    () => {
      throw new Error('expected a SpecError');
    },
    (error: unknown) => {
      if (error instanceof SpecError) return error;
      throw error;
    },
  );
}

beforeAll(async () => {
  template = await writeSpecTemplate();
  folder = await mkdtemp(join(tmpdir(), 'binsupport-spec-sheet-'));
});

afterAll(async () => {
  await rm(folder, { recursive: true, force: true });
});

describe('spec-sheet fields', () => {
  it('give a unit and a note for exactly the inputs of the schema', () => {
    expect(Object.keys(fieldNotes).sort()).toEqual(schemaLeafPaths().sort());
    expect(specSheetFields().map((field) => field.path)).toEqual(schemaLeafPaths());
  });

  it('take ranges, choices and defaults from the schema', () => {
    const byPath = new Map(specSheetFields().map((field) => [field.path, field]));
    expect(byPath.get('bin.hopper.thickness')).toMatchObject({ kind: 'number', min: 2, max: 60, unit: 'mm', required: true });
    // required for one shape only: optional in the schema, and the sheet says for which shape
    expect(byPath.get('bin.hopper.apexHalfAngle')).toMatchObject({ kind: 'number', min: 5, max: 60, unit: 'degrees', required: false, defaultText: 'required for a circular bin' });
    expect(byPath.get('support.columns')).toMatchObject({ kind: 'whole number', min: 3, max: 36 });
    expect(byPath.get('support.grade')).toMatchObject({ kind: 'choice', choices: ['S235', 'S275', 'S355', 'S460'], defaultText: 'S355', required: false });
    expect(byPath.get('support.credibleScenarios')).toMatchObject({ kind: 'list of choices', defaultText: 'the contact scenario of the support type' });
    expect(byPath.get('solid.name')?.choices).toEqual(storedSolidTable().map((row) => row.id));
    expect(byPath.get('roof.deadLoad')).toMatchObject({ unit: 'kN/m2', required: false, defaultText: 'required for roof' });
    expect(byPath.get('roof.imposedLoad')).toMatchObject({ required: false, defaultText: '0' });
    expect(byPath.get('equipment[].force')).toMatchObject({ unit: 'kN', defaultText: 'required for each item' });
  });
});

describe('spec-sheet template', () => {
  it('has sheet Spec with a frozen header and one row per input, and sheet Read me with the cautions', async () => {
    const workbook = await load(template);
    expect(workbook.worksheets.map((ws) => ws.name)).toEqual([SPEC_SHEET, README_SHEET]);
    const sheet = specSheetOf(workbook);
    expect(sheet.getRow(1).values).toEqual([undefined, 'Path', 'Value', 'Unit', 'Allowed', 'Default', 'Note']);
    const [view] = sheet.views;
    expect(view?.state).toBe('frozen');
    expect(view && 'ySplit' in view ? view.ySplit : undefined).toBe(1);
    const paths = [...rowsByPath(sheet).keys()];
    for (const field of specSheetFields()) {
      expect(paths, field.path).toContain(field.path.replace('[]', '[0]'));
    }
    const apex = sheet.getRow(rowsByPath(sheet).get('bin.hopper.apexHalfAngle') ?? 0);
    expect(apex.getCell(3).value).toBe('degrees');
    expect(apex.getCell(4).value).toBe('5 to 60 degrees');
    expect(apex.getCell(5).value).toBe('required for a circular bin');
    expect(sheet.getRow(rowsByPath(sheet).get('bin.cylinderHeight') ?? 0).getCell(5).value).toBe('required');
    const readMe = workbook.getWorksheet(README_SHEET);
    const text: string[] = [];
    readMe?.eachRow((row) => text.push(String(row.getCell(1).value)));
    const all = text.join('\n');
    expect(all).toMatch(/first-pass design/);
    expect(all).toMatch(/verified by a qualified structural engineer/);
    expect(all).toMatch(/Local codes.*govern/);
    expect(all).toMatch(/equipment\[0\]\.name/);
  });

  it('puts a drop-down list on every choice row and number limits on every number row', async () => {
    const sheet = specSheetOf(await load(template));
    const rows = rowsByPath(sheet);
    for (const field of specSheetFields()) {
      const cell = sheet.getRow(rows.get(field.path.replace('[]', '[0]')) ?? 0).getCell(2);
      const validation = cell.dataValidation as ExcelJS.DataValidation | undefined;
      if (field.kind === 'choice' || field.kind === 'true/false') {
        expect(validation?.type, field.path).toBe('list');
        expect(validation?.formulae, field.path).toEqual([`"${(field.choices ?? []).join(',')}"`]);
      } else if (field.kind === 'number' || field.kind === 'whole number') {
        expect(validation?.type, field.path).toBe(field.kind === 'number' ? 'decimal' : 'whole');
        expect(validation?.operator, field.path).toBe('between');
        expect(validation?.formulae.map(Number), field.path).toEqual([field.min, field.max]);
      }
    }
    const grade = sheet.getRow(rows.get('support.grade') ?? 0).getCell(2).dataValidation as ExcelJS.DataValidation | undefined;
    expect(grade?.formulae).toEqual(['"S235,S275,S355,S460"']);
    const terrain = sheet.getRow(rows.get('wind.terrainCategory') ?? 0).getCell(2).dataValidation as ExcelJS.DataValidation | undefined;
    expect(terrain?.formulae).toEqual(['"0,I,II,III,IV"']);
  });

  it('an empty template reads as an empty document', async () => {
    expect(await parseSpecWorkbook(template, 'template.xlsx')).toEqual({});
  });
});

describe('a filled spec sheet', () => {
  it('gives exactly the BinSpec of the same inputs written in YAML', async () => {
    const file = join(folder, 'kestrel.xlsx');
    await writeFile(file, await filled(kestrelSheetValues));
    expect(specFormatOf(file)).toBe('xlsx');
    const fromSheet = await readSpecFile(file);
    const fromYaml = await readSpecFile(demoYaml);
    expect(fromSheet).toEqual(fromYaml);
    // And the plain documents agree where the YAML reader and the sheet reader both give a value.
    const document = (await readDocumentFile(file)) as { wind: { directions: number[] }; project: { date: string } };
    expect(document.wind.directions).toEqual([0, 22.5]);
    expect(document.project.date).toBe('2026-12-01');
  });

  it('names the sheet, the row and the input of a value out of range', async () => {
    const bytes = await filled({ ...kestrelSheetValues, 'bin.hopper.apexHalfAngle': 75 });
    const row = rowsByPath(specSheetOf(await load(template))).get('bin.hopper.apexHalfAngle');
    const error = await specErrorOf(normaliseSpecWorkbook(bytes, 'spec.xlsx'));
    expect(error.code).toBe('INVALID_INPUT');
    expect(error.path).toBe('bin.hopper.apexHalfAngle');
    expect(error.message).toBe(`spec.xlsx, sheet Spec, row ${row} (bin.hopper.apexHalfAngle) must be a number between 5 and 60 degrees; got 75`);
  });

  it('locates cross-field, list-entry and equipment errors at their rows', async () => {
    const rows = rowsByPath(specSheetOf(await load(template)));
    const fill = await specErrorOf(normaliseSpecWorkbook(await filled({ ...kestrelSheetValues, 'bin.fillHeight': 13 })));
    expect(fill.message).toMatch(new RegExp(`^spec\\.xlsx, sheet Spec, row ${rows.get('bin.fillHeight')} \\(bin\\.fillHeight\\) must be between 0\\.1 m and bin\\.cylinderHeight`));
    const family = await specErrorOf(normaliseSpecWorkbook(await filled({ ...kestrelSheetValues, 'support.sectionFamilies': 'IPE, UPN' })));
    expect(family.path).toBe('support.sectionFamilies[1]');
    expect(family.message).toBe(`spec.xlsx, sheet Spec, row ${rows.get('support.sectionFamilies')} (support.sectionFamilies[1]) must be one of IPE, HEA, HEB, HEM; got 'UPN'`);
    const force = await specErrorOf(normaliseSpecWorkbook(await filled({ ...kestrelSheetValues, 'equipment[0].force': -3 })));
    expect(force.message).toBe(`spec.xlsx, sheet Spec, row ${rows.get('equipment[0].force')} (equipment[0].force) must be a number between 0 and 10000 kN; got -3`);
    const missing = await specErrorOf(normaliseSpecWorkbook(await filled({ ...kestrelSheetValues, 'support.columns': null })));
    expect(missing.message).toMatch(/^spec\.xlsx, sheet Spec \(support\.columns\) is required/);
  });

  it('reads true/false, numbers typed as text, rich text and a date cell as the YAML reader would', async () => {
    const workbook = await load(await filled({
      ...kestrelSheetValues,
      'support.flangeFlexibility': 'FALSE',
      'bin.diameter': '6',
      'support.credibleScenarios': { richText: [{ text: 'column-cap-contact, ' }, { text: 'columns-under-web' }] },
    }));
    // A user who reformats the date cell as a date gets a date cell; it reads back as ISO 8601 text.
    const sheet = specSheetOf(workbook);
    const dateCell = sheet.getRow(rowsByPath(sheet).get('project.date') ?? 0).getCell(2);
    dateCell.numFmt = 'yyyy-mm-dd';
    dateCell.value = new Date(Date.UTC(2026, 11, 1));
    const bytes = Buffer.from(await workbook.xlsx.writeBuffer());
    const document = (await parseSpecWorkbook(bytes)) as { project: { date: unknown }; bin: { diameter: unknown }; support: Record<string, unknown> };
    expect(document.project.date).toBe('2026-12-01');
    expect(document.bin.diameter).toBe(6);
    expect(document.support.flangeFlexibility).toBe(false);
    expect(document.support.credibleScenarios).toEqual(['column-cap-contact', 'columns-under-web']);
  });

  it('refuses a path that is not an input and a path given twice', async () => {
    const workbook = await load(await filled(kestrelSheetValues));
    const sheet = specSheetOf(workbook);
    sheet.addRow(['bin.hoper.apexHalfAngle', 30]);
    const typo = await specErrorOf(parseSpecWorkbook(Buffer.from(await workbook.xlsx.writeBuffer())));
    expect(typo.message).toBe(`spec.xlsx, sheet Spec, row ${sheet.rowCount} (bin.hoper.apexHalfAngle) is not an input (check column Path against the template)`);
    sheet.getRow(sheet.rowCount).getCell(1).value = 'bin.diameter';
    const twice = await specErrorOf(parseSpecWorkbook(Buffer.from(await workbook.xlsx.writeBuffer())));
    expect(twice.message).toMatch(new RegExp(`row ${sheet.rowCount} \\(bin\\.diameter\\) is given twice \\(also row \\d+\\)`));
  });

  it('gives PARSE_ERROR for a file that is not really a workbook', async () => {
    const file = join(folder, 'fake.xlsx');
    await writeFile(file, 'bin:\n  diameter: 6\n');
    const error = await specErrorOf(readSpecFile(file));
    expect(error.code).toBe('PARSE_ERROR');
    expect(error.message).toMatch(new RegExp(`^${file.replace(/[.\\/]/g, '\\$&')} is not a readable \\.xlsx workbook`));
    const noSheet = new ExcelJS.Workbook();
    noSheet.addWorksheet('Sheet1');
    const other = await specErrorOf(parseSpecWorkbook(Buffer.from(await noSheet.xlsx.writeBuffer()), 'book.xlsx'));
    expect(other.code).toBe('PARSE_ERROR');
    expect(other.message).toBe("book.xlsx has no sheet 'Spec' (sheets: Sheet1); start from the spec-sheet template");
  });
});
