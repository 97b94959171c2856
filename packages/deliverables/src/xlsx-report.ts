// The workbook (design.xlsx): the numbers of the DesignResult in display units, one table per sheet,
// for the estimator (tonnage and cost with live formulas) and the checker (every utilisation, load,
// analysis and the input echo). Every table has its units in the header, a frozen header row and an
// autofilter; utilisations are coloured by a conditional-formatting rule, so the colour follows an
// edited value. exceljs never computes formulas, so every formula is written with its result cached.
import ExcelJS from 'exceljs';
import type { Cell, CellValue, Workbook, Worksheet } from 'exceljs';
import type { DesignResult } from '@binsupport/design';
import { atomicWrite } from './atomic-write.js';
import { flattenJson } from './flatten.js';
import {
  equilibrium,
  issueDate,
  tonnageBySection,
  UTILISATION_AMBER,
  UTILISATION_RED,
} from './report-data.js';
import type { ReportOptions } from './report-data.js';
import {
  toDegrees,
  toDisplay,
  toKilonewtonMetres,
  toKilonewtonSquareMetres,
  toKilonewtons,
  toKilonewtonsPerMetre,
  toKilopascals,
  toTonnes,
} from './units.js';

/** Default unit price of supplied and erected steel, EUR/t: a placeholder for the estimator to edit. */
export const DEFAULT_STEEL_PRICE_PER_TONNE = 2500;

export interface WorkbookOptions extends ReportOptions {
  /** Unit price written into the estimator's input cell, EUR/t. */
  steelPricePerTonne?: number;
}

// Our own colours (ARGB).
export const fills = {
  header: 'FFDCE4EC',
  input: 'FFFFF4CC',
  exceeded: 'FFF2B8B0',
  nearLimit: 'FFFBE3A6',
  caution: 'FFFDF1E7',
};
export const fonts = { exceeded: 'FF7A1C12', nearLimit: 'FF6B4E00', heading: 'FF1B4F72', caution: 'FF8A4B08' };

export const formats = {
  integer: '0',
  mass: '#,##0',
  one: '0.0',
  two: '0.00',
  three: '0.000',
  four: '0.0000',
  utilisation: '0.000',
  scientific: '0.00E+00',
  money: '#,##0',
};

export interface Column {
  header: string;
  width: number;
  numFmt?: string;
}

export function columnLetter(index: number): string {
  // 1 -> A, 27 -> AA
  let n = index;
  let letters = '';
  while (n > 0) {
    const remainder = (n - 1) % 26;
    letters = String.fromCharCode(65 + remainder) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}

export function solidFill(argb: string): ExcelJS.Fill {
  return { type: 'pattern', pattern: 'solid', fgColor: { argb }, bgColor: { argb } };
}

/** A sheet holding one table: header row 1 (frozen, filtered), data from row 2. */
export function addTableSheet(workbook: Workbook, name: string, columns: Column[], rows: CellValue[][]): Worksheet {
  const sheet = workbook.addWorksheet(name, { views: [{ state: 'frozen', xSplit: 0, ySplit: 1, topLeftCell: 'A2', activeCell: 'A2' }] });
  sheet.columns = columns.map((column) => ({ header: column.header, width: column.width, style: column.numFmt === undefined ? {} : { numFmt: column.numFmt } }));
  const header = sheet.getRow(1);
  header.font = { bold: true };
  header.alignment = { vertical: 'middle', wrapText: true };
  header.height = 30;
  header.eachCell((cell) => {
    cell.fill = solidFill(fills.header);
    cell.border = { bottom: { style: 'thin' } };
  });
  for (const row of rows) {
    sheet.addRow(row);
  }
  const lastColumn = columnLetter(columns.length);
  sheet.autoFilter = `A1:${lastColumn}${Math.max(1, rows.length + 1)}`;
  return sheet;
}

/** Colour a utilisation column: above 1.0 red, above 0.9 amber (the rule order decides). */
export function colourUtilisations(sheet: Worksheet, columnIndex: number, rowCount: number): void {
  if (rowCount === 0) {
    return;
  }
  const letter = columnLetter(columnIndex);
  sheet.addConditionalFormatting({
    ref: `${letter}2:${letter}${rowCount + 1}`,
    rules: [
      {
        type: 'cellIs',
        operator: 'greaterThan',
        formulae: [String(UTILISATION_RED)],
        priority: 1,
        style: { fill: solidFill(fills.exceeded), font: { bold: true, color: { argb: fonts.exceeded } } },
      },
      {
        type: 'cellIs',
        operator: 'greaterThan',
        formulae: [String(UTILISATION_AMBER)],
        priority: 2,
        style: { fill: solidFill(fills.nearLimit), font: { color: { argb: fonts.nearLimit } } },
      },
    ],
  });
}

// ----------------------------------------------------------------------------------------------

/** Members sheet layout: the Summary formulas refer to these columns. */
export const MEMBERS_SHEET = 'Members';
const membersColumns = {
  section: 3,
  grade: 4,
  length: 5,
  mass: 6,
};

function membersSheet(workbook: Workbook, result: DesignResult): Worksheet {
  const rows: CellValue[][] = result.members.map((member) => [
    member.id,
    member.description,
    member.section,
    member.grade,
    member.length,
    member.mass,
    member.massPerLength,
    member.utilisation,
    member.governing.check,
    member.governing.clause,
    member.governing.combination,
    member.governing.scenario,
    toDegrees(member.governing.position.angle),
    member.governing.position.description,
    member.governing.title,
  ]);
  const sheet = addTableSheet(
    workbook,
    MEMBERS_SHEET,
    [
      { header: 'Member', width: 10 },
      { header: 'Description', width: 34 },
      { header: 'Section', width: 14 },
      { header: 'Grade', width: 8 },
      { header: 'Length [m]', width: 11, numFmt: formats.three },
      { header: 'Mass [kg]', width: 11, numFmt: formats.mass },
      { header: 'Mass per length [kg/m]', width: 13, numFmt: formats.one },
      { header: 'Max utilisation [-]', width: 12, numFmt: formats.utilisation },
      { header: 'Governing check', width: 24 },
      { header: 'Clause', width: 24 },
      { header: 'Combination', width: 13 },
      { header: 'Scenario', width: 14 },
      { header: 'Position angle [°]', width: 12, numFmt: formats.one },
      { header: 'Position', width: 34 },
      { header: 'Check description', width: 44 },
    ],
    rows,
  );
  colourUtilisations(sheet, 8, rows.length);
  return sheet;
}

function utilisationsSheet(workbook: Workbook, result: DesignResult): void {
  const rows: CellValue[][] = result.utilisations.map((row) => [
    row.member,
    row.section,
    row.check,
    row.clause,
    row.combination,
    row.scenario,
    row.position.element,
    row.position.x,
    toDegrees(row.position.angle),
    row.position.description,
    row.utilisation,
    row.note ?? '',
  ]);
  const sheet = addTableSheet(
    workbook,
    'Utilisations',
    [
      { header: 'Member', width: 10 },
      { header: 'Section', width: 14 },
      { header: 'Check', width: 24 },
      { header: 'Clause', width: 24 },
      { header: 'Combination', width: 13 },
      { header: 'Scenario', width: 14 },
      { header: 'Element', width: 10 },
      { header: 'x along element [m]', width: 12, numFmt: formats.three },
      { header: 'Angle [°]', width: 10, numFmt: formats.one },
      { header: 'Position', width: 34 },
      { header: 'Utilisation [-]', width: 12, numFmt: formats.utilisation },
      { header: 'Note (an empty utilisation: not evaluated)', width: 40 },
    ],
    rows,
  );
  colourUtilisations(sheet, 11, rows.length);
}

function combinationsSheet(workbook: Workbook, result: DesignResult): void {
  addTableSheet(
    workbook,
    'Combinations',
    [
      { header: 'Combination', width: 13 },
      { header: 'Limit state', width: 10 },
      { header: 'Expression', width: 34 },
      { header: 'Partial factors', width: 34 },
      { header: 'Clause', width: 26 },
    ],
    result.loads.combinations.map((c) => [
      c.name,
      c.limitState,
      c.expression,
      Object.entries(c.factors)
        .map(([name, factor]) => `${name} = ${factor}`)
        .join('; '),
      c.clause,
    ]),
  );
}

function loadsSheets(workbook: Workbook, result: DesignResult): void {
  const perimeter = 2 * Math.PI * result.girder.radius;
  addTableSheet(
    workbook,
    'Loads',
    [
      { header: 'Case', width: 10 },
      { header: 'Description', width: 40 },
      { header: 'Kind', width: 11 },
      { header: 'Vertical line load, down [kN/m]', width: 15, numFmt: formats.two },
      { header: 'Radial line load, inward [kN/m]', width: 15, numFmt: formats.two },
      { header: 'Vertical resultant, down [kN]', width: 15, numFmt: formats.one },
      { header: 'Line load × 2πR [kN]', width: 15, numFmt: formats.one },
    ],
    [
      ...result.loads.cases.map((c): CellValue[] => [
        c.name,
        c.description,
        c.kind,
        toKilonewtonsPerMetre(c.verticalLineLoad),
        toKilonewtonsPerMetre(c.radialLineLoad),
        toKilonewtons(c.verticalResultant),
        toKilonewtons(c.verticalLineLoad * perimeter),
      ]),
    ],
  );
  addTableSheet(
    workbook,
    'Derivation',
    [
      { header: 'Symbol', width: 10 },
      { header: 'Description', width: 44 },
      { header: 'Expression', width: 34 },
      { header: 'Value [display unit]', width: 14, numFmt: '0.0000' },
      { header: 'Display unit', width: 10 },
      { header: 'Value [SI]', width: 14, numFmt: 'General' },
      { header: 'SI unit', width: 8 },
      { header: 'Clause', width: 26 },
    ],
    result.loads.derivation.map((step) => {
      const shown = toDisplay(step.value, step.unit);
      return [step.symbol, step.description, step.expression, shown.value, shown.unit, step.value, step.unit, step.clause];
    }),
  );
  const pressureRows: CellValue[][] = [];
  for (const profile of result.loads.profiles) {
    profile.z.forEach((z, i) => {
      pressureRows.push([
        profile.case,
        profile.part,
        z,
        toKilopascals(profile.ph[i] ?? Number.NaN),
        toKilopascals(profile.pw[i] ?? Number.NaN),
        toKilopascals(profile.pv[i] ?? Number.NaN),
      ]);
    });
  }
  addTableSheet(
    workbook,
    'Pressures',
    [
      { header: 'Case', width: 10 },
      { header: 'Part', width: 9 },
      { header: 'Depth below equivalent surface z [m]', width: 16, numFmt: formats.three },
      { header: 'Horizontal p_h [kPa]', width: 13, numFmt: formats.two },
      { header: 'Wall friction p_w [kPa]', width: 13, numFmt: formats.two },
      { header: 'Vertical p_v [kPa]', width: 13, numFmt: formats.two },
    ],
    pressureRows,
  );
  const totals = result.loads.totals;
  const totalsSheet = workbook.getWorksheet('Loads');
  if (totalsSheet !== undefined) {
    const start = result.loads.cases.length + 3;
    totalsSheet.getCell(`A${start}`).value = 'Totals on the support line';
    totalsSheet.getCell(`A${start}`).font = { bold: true };
    const lines: Array<[string, number]> = [
      ['Weight of the stored solid [kN]', toKilonewtons(totals.solidWeight)],
      ['Weight of the structure [kN]', toKilonewtons(totals.structureWeight)],
    ];
    lines.forEach(([label, value], i) => {
      totalsSheet.getCell(`B${start + 1 + i}`).value = label;
      const cell = totalsSheet.getCell(`F${start + 1 + i}`);
      cell.value = value;
      cell.numFmt = formats.one;
    });
  }
}

function scenariosSheet(workbook: Workbook, result: DesignResult): void {
  addTableSheet(
    workbook,
    'Scenarios',
    [
      { header: 'Scenario', width: 14 },
      { header: 'Title', width: 40 },
      { header: 'Description', width: 70 },
      { header: 'In design envelope', width: 12 },
    ],
    result.scenarios.map((s) => [s.id, s.title, s.description, s.credible ? 'yes' : 'no']),
  );
}

function analysesSheet(workbook: Workbook, result: DesignResult): void {
  const kN = (value: number): number => toKilonewtons(value);
  const sheet = addTableSheet(
    workbook,
    'Analyses',
    [
      { header: 'Combination', width: 13 },
      { header: 'Scenario', width: 14 },
      { header: 'Converged', width: 10 },
      { header: 'Iterations [-]', width: 10, numFmt: formats.integer },
      { header: 'Relative residual [-]', width: 12, numFmt: formats.scientific },
      { header: 'Applied ΣFx [kN]', width: 11, numFmt: formats.one },
      { header: 'Applied ΣFy [kN]', width: 11, numFmt: formats.one },
      { header: 'Applied ΣFz [kN]', width: 11, numFmt: formats.one },
      { header: 'Reactions ΣFx [kN]', width: 11, numFmt: formats.one },
      { header: 'Reactions ΣFy [kN]', width: 11, numFmt: formats.one },
      { header: 'Reactions ΣFz [kN]', width: 11, numFmt: formats.one },
      { header: 'Imbalance / applied [-]', width: 12, numFmt: formats.scientific },
      { header: 'Peak |N| [kN]', width: 11, numFmt: formats.one },
      { header: 'Peak |Vz| [kN]', width: 11, numFmt: formats.one },
      { header: 'Peak |T| [kNm]', width: 11, numFmt: formats.two },
      { header: 'Peak |My| [kNm]', width: 11, numFmt: formats.one },
      { header: 'Peak |Mz| [kNm]', width: 11, numFmt: formats.one },
      { header: 'Peak |B| [kNm²]', width: 11, numFmt: formats.two },
    ],
    result.analyses.map((a) => [
      a.combination,
      a.scenario,
      a.converged ? 'yes' : 'NO',
      a.iterations,
      a.residual,
      kN(a.appliedSum[0]),
      kN(a.appliedSum[1]),
      kN(a.appliedSum[2]),
      kN(a.reactionSum[0]),
      kN(a.reactionSum[1]),
      kN(a.reactionSum[2]),
      equilibrium(a).relative,
      kN(a.peaks.N),
      kN(a.peaks.Vz),
      toKilonewtonMetres(a.peaks.T),
      toKilonewtonMetres(a.peaks.My),
      toKilonewtonMetres(a.peaks.Mz),
      toKilonewtonSquareMetres(a.peaks.B),
    ]),
  );
  result.analyses.forEach((a, i) => {
    if (!a.converged) {
      const cell = sheet.getCell(`C${i + 2}`);
      cell.fill = solidFill(fills.exceeded);
      cell.font = { bold: true, color: { argb: fonts.exceeded } };
    }
  });
}

function diagramsSheet(workbook: Workbook, result: DesignResult): void {
  const rows: CellValue[][] = [];
  for (const a of result.analyses) {
    const d = a.diagram;
    if (!d) continue;
    d.angle.forEach((angle, i) => {
      rows.push([
        a.combination,
        a.scenario,
        toDegrees(angle),
        toKilonewtons(d.N[i] ?? Number.NaN),
        toKilonewtons(d.Vz[i] ?? Number.NaN),
        toKilonewtonMetres(d.T[i] ?? Number.NaN),
        toKilonewtonMetres(d.My[i] ?? Number.NaN),
        toKilonewtonMetres(d.Mz[i] ?? Number.NaN),
        toKilonewtonSquareMetres(d.B[i] ?? Number.NaN),
      ]);
    });
  }
  addTableSheet(
    workbook,
    'Diagrams',
    [
      { header: 'Combination', width: 13 },
      { header: 'Scenario', width: 14 },
      { header: 'Angle [°]', width: 10, numFmt: formats.one },
      { header: 'N, tension + [kN]', width: 12, numFmt: formats.two },
      { header: 'Vz [kN]', width: 11, numFmt: formats.two },
      { header: 'T [kNm]', width: 11, numFmt: formats.three },
      { header: 'My, top fibre in tension + [kNm]', width: 14, numFmt: formats.two },
      { header: 'Mz [kNm]', width: 11, numFmt: formats.two },
      { header: 'B [kNm²]', width: 11, numFmt: formats.three },
    ],
    rows,
  );
}

function inputsSheet(workbook: Workbook, result: DesignResult): void {
  addTableSheet(
    workbook,
    'Inputs',
    [
      { header: 'Input path', width: 44 },
      { header: 'Value [SI base units]', width: 40 },
    ],
    flattenJson(result.input).map((entry) => [entry.path, entry.value]),
  );
}

// ----------------------------------------------------------------------------------------------
// Summary

export function label(cell: Cell, text: string): void {
  cell.value = text;
  cell.font = { color: { argb: 'FF4D5A66' } };
}

function summarySheet(workbook: Workbook, result: DesignResult, options: WorkbookOptions): void {
  const sheet = workbook.getWorksheet('Summary');
  if (sheet === undefined) {
    throw new Error('Summary sheet missing');
  }
  sheet.columns = [{ width: 34 }, { width: 40 }, { width: 22 }, { width: 14 }, { width: 14 }];
  const date = issueDate(result, options);

  sheet.getCell('A1').value = 'Support girder design: summary';
  sheet.getCell('A1').font = { bold: true, size: 14, color: { argb: fonts.heading } };

  const project: Array<[string, string]> = [
    ['Project', result.project.name],
    ['Client', result.project.client],
    ['Site', result.project.site],
    ['Reference', result.project.reference],
    ['Designer', result.project.designer],
    ['Date', date.text ?? 'not given in the specification'],
    ['Prepared with', `${result.tool.name} ${result.tool.version} (result schema ${result.schemaVersion})`],
    ['Design status', result.status === 'verified' ? 'verified' : 'INFEASIBLE: best attempt reported'],
  ];
  let row = 3;
  for (const [name, value] of project) {
    label(sheet.getCell(`A${row}`), name);
    sheet.getCell(`B${row}`).value = value;
    row += 1;
  }
  if (result.status !== 'verified') {
    sheet.getCell(`B${row - 1}`).font = { bold: true, color: { argb: fonts.exceeded } };
  }

  row += 1;
  sheet.getCell(`A${row}`).value = 'Cautions';
  sheet.getCell(`A${row}`).font = { bold: true, color: { argb: fonts.caution } };
  row += 1;
  for (const caution of result.cautions) {
    sheet.mergeCells(`A${row}:E${row}`);
    const cell = sheet.getCell(`A${row}`);
    cell.value = caution;
    cell.fill = solidFill(fills.caution);
    cell.font = { color: { argb: fonts.caution } };
    cell.alignment = { wrapText: true, vertical: 'top' };
    // Merged cells do not grow with wrapped text: about 110 characters fit a line across A:E.
    sheet.getRow(row).height = 15 * Math.max(1, Math.ceil(caution.length / 110));
    row += 1;
  }

  // Tonnage by section, live over the Members sheet.
  row += 1;
  sheet.getCell(`A${row}`).value = 'Steel tonnage';
  sheet.getCell(`A${row}`).font = { bold: true, color: { argb: fonts.heading } };
  row += 1;
  ['Section', 'Grade', 'Members', 'Length [m]', 'Mass [t]'].forEach((text, i) => {
    const cell = sheet.getCell(row, i + 1);
    cell.value = text;
    cell.font = { bold: true };
    cell.fill = solidFill(fills.header);
  });
  row += 1;
  const memberCount = result.members.length;
  const lastMemberRow = Math.max(2, memberCount + 1);
  const range = (column: number): string => `${MEMBERS_SHEET}!$${columnLetter(column)}$2:$${columnLetter(column)}$${lastMemberRow}`;
  for (const group of tonnageBySection(result)) {
    sheet.getCell(`A${row}`).value = group.section;
    sheet.getCell(`B${row}`).value = group.grade;
    sheet.getCell(`C${row}`).value = group.members.join(', ');
    const criteria = `${range(membersColumns.section)},A${row},${range(membersColumns.grade)},B${row}`;
    const lengthCell = sheet.getCell(`D${row}`);
    lengthCell.value = { formula: `SUMIFS(${range(membersColumns.length)},${criteria})`, result: group.length };
    lengthCell.numFmt = formats.three;
    const massCell = sheet.getCell(`E${row}`);
    massCell.value = { formula: `SUMIFS(${range(membersColumns.mass)},${criteria})/1000`, result: toTonnes(group.mass) };
    massCell.numFmt = formats.three;
    row += 1;
  }
  const totalMass = result.members.reduce((sum, member) => sum + member.mass, 0);
  const massColumn = columnLetter(membersColumns.mass);
  label(sheet.getCell(`A${row}`), 'Total steel [t]');
  sheet.getCell(`A${row}`).font = { bold: true };
  const totalCell = sheet.getCell(`E${row}`);
  totalCell.value = { formula: `SUM(${MEMBERS_SHEET}!${massColumn}2:${massColumn}${lastMemberRow})/1000`, result: toTonnes(totalMass) };
  totalCell.numFmt = formats.three;
  totalCell.font = { bold: true };
  totalCell.border = { top: { style: 'thin' } };
  const totalAddress = `E${row}`;
  row += 1;
  label(sheet.getCell(`A${row}`), 'Steel mass reported by the design [t]');
  const reported = sheet.getCell(`E${row}`);
  reported.value = toTonnes(result.totals.steelMass);
  reported.numFmt = formats.three;
  row += 2;

  // Estimator input and cost.
  sheet.getCell(`A${row}`).value = 'Cost estimate';
  sheet.getCell(`A${row}`).font = { bold: true, color: { argb: fonts.heading } };
  row += 1;
  const price = options.steelPricePerTonne ?? DEFAULT_STEEL_PRICE_PER_TONNE;
  label(sheet.getCell(`A${row}`), 'Unit price of steel [EUR/t]');
  sheet.getCell(`B${row}`).value = 'estimator input: edit the yellow cell';
  sheet.getCell(`B${row}`).font = { italic: true, color: { argb: 'FF4D5A66' } };
  const priceCell = sheet.getCell(`E${row}`);
  priceCell.value = price;
  priceCell.numFmt = formats.money;
  priceCell.fill = solidFill(fills.input);
  priceCell.border = { top: { style: 'thin' }, bottom: { style: 'thin' }, left: { style: 'thin' }, right: { style: 'thin' } };
  priceCell.note = 'Estimator input: unit price of supplied and erected steel, EUR per tonne. The cost below recalculates.';
  const priceAddress = `E${row}`;
  row += 1;
  label(sheet.getCell(`A${row}`), 'Steel cost [EUR]');
  const costCell = sheet.getCell(`E${row}`);
  costCell.value = { formula: `${totalAddress}*${priceAddress}`, result: toTonnes(totalMass) * price };
  costCell.numFmt = formats.money;
  costCell.font = { bold: true };

  sheet.views = [{ state: 'normal', showGridLines: false }];
}

/** Build the workbook in memory. */
export function designWorkbook(result: DesignResult, options: WorkbookOptions = {}): Workbook {
  const workbook = new ExcelJS.Workbook();
  const date = issueDate(result, options);
  workbook.creator = `${result.tool.name} ${result.tool.version}`;
  workbook.lastModifiedBy = `${result.tool.name} ${result.tool.version}`;
  workbook.created = date.metadata;
  workbook.modified = date.metadata;
  workbook.title = `Design summary: ${result.project.name}`;
  workbook.subject = result.project.reference;
  // Excel recomputes every formula on opening, so an edited input always shows consistent results.
  workbook.calcProperties = { fullCalcOnLoad: true };

  workbook.addWorksheet('Summary');
  membersSheet(workbook, result);
  utilisationsSheet(workbook, result);
  combinationsSheet(workbook, result);
  loadsSheets(workbook, result);
  scenariosSheet(workbook, result);
  analysesSheet(workbook, result);
  diagramsSheet(workbook, result);
  inputsSheet(workbook, result);
  summarySheet(workbook, result, options);
  return workbook;
}

export async function renderDesignXlsx(result: DesignResult, options: WorkbookOptions = {}): Promise<Buffer> {
  const bytes = await designWorkbook(result, options).xlsx.writeBuffer();
  return Buffer.from(bytes);
}

/** Render the workbook, then write it atomically: a failed render leaves any existing file untouched. */
export async function writeDesignXlsx(result: DesignResult, path: string, options: WorkbookOptions = {}): Promise<void> {
  const bytes = await renderDesignXlsx(result, options);
  await atomicWrite(path, bytes);
}
