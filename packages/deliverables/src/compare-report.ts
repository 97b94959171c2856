// The deliverables of an option comparison: compare.xlsx (one row an option, live totals) and
// compare.pdf (the ranked options, a tonnage chart and a cost chart, the cheapest feasible option in
// words). Both are built from the CompareResult alone; nothing reads the clock, so the same result
// gives the same bytes.
import ExcelJS from 'exceljs';
import type { CellValue, Workbook } from 'exceljs';
import type { TopLevelSpec } from 'vega-lite';
import type { CompareResult, CompareRow } from '@binsupport/design';
import { atomicWrite } from './atomic-write.js';
import { renderChartSvg, SERIES_COLOURS } from './charts.js';
import { renderPdfDefinition, svgNode } from './pdf-engine.js';
import type { PdfContent, PdfDocumentDefinition, PdfNode } from './pdf-engine.js';
import { caption, colours, headerCell, heading, keyValueTable, numberCell, paragraph, REPORT_STYLES, table, utilisationCell } from './pdf-report.js';
import { PLACEHOLDER_DATE } from './report-data.js';
import { DEFAULT_STEEL_PRICE_PER_TONNE } from './xlsx-report.js';
import { addTableSheet, colourUtilisations, columnLetter, fills, fonts, formats, label, solidFill } from './xlsx-report.js';
import { formatUtilisation, toTonnes } from './units.js';

export const COMPARE_SHEET = 'Options';
export const COMPARE_SUMMARY_SHEET = 'Summary';

export interface CompareWorkbookOptions {
  /** Unit price of supplied and erected steel written into the estimator's input cell, EUR/t. */
  steelPricePerTonne?: number;
}

/** The inputs an option changes, as one line ("support.columns = 6; support.grade = S275"). */
export function changesText(row: CompareRow): string {
  if (row.overrides.length === 0) return 'the base spec';
  return row.overrides.map((override) => `${override.path} = ${typeof override.value === 'string' ? override.value : JSON.stringify(override.value)}`).join('; ');
}

function statusText(row: CompareRow): string {
  switch (row.status) {
    case 'verified':
      return 'verified';
    case 'infeasible':
      return 'infeasible (best attempt)';
    case 'invalid':
      return 'invalid input';
    case 'failed':
      return 'failed (refused)';
  }
}

function columnsText(row: CompareRow): string {
  if (row.support?.type === 'slab') return 'on slab';
  return row.columns ? `${row.columns.count} x ${row.columns.section} ${row.columns.grade}` : '';
}

const compareColumns = [
  { header: '#', width: 5, numFmt: formats.integer },
  { header: 'Option', width: 42 },
  { header: 'Sweep', width: 22 },
  { header: 'Status', width: 20 },
  { header: 'Steel [t]', width: 10, numFmt: formats.three },
  { header: 'Cost [price units]', width: 12, numFmt: formats.one },
  { header: 'Steel cost [EUR]', width: 13, numFmt: formats.money },
  { header: 'Rank (verified, by cost)', width: 10, numFmt: formats.integer },
  { header: 'Girder section', width: 14 },
  { header: 'Girder grade', width: 8 },
  { header: 'Girder [t]', width: 9, numFmt: formats.three },
  { header: 'Columns', width: 22 },
  { header: 'Columns [t]', width: 9, numFmt: formats.three },
  { header: 'Max utilisation [-]', width: 11, numFmt: formats.utilisation },
  { header: 'Governing member', width: 9 },
  { header: 'Governing check', width: 26 },
  { header: 'Clause', width: 24 },
  { header: 'Combination', width: 12 },
  { header: 'Scenario', width: 20 },
  { header: 'Position', width: 28 },
  { header: 'Diameter [m]', width: 9, numFmt: formats.two },
  { header: 'Cylinder height [m]', width: 9, numFmt: formats.two },
  { header: 'Capacity [m3]', width: 10, numFmt: formats.one },
  { header: 'Changes from the base', width: 48 },
  { header: 'Message', width: 60 },
];
const STEEL_COLUMN = 5;
const STATUS_COLUMN = 4;
const COST_COLUMN = 6;
const STEEL_COST_COLUMN = 7;
const UTILISATION_COLUMN = 14;
/** Cell of the estimator's unit price on the Summary sheet. */
const PRICE_CELL = 'B6';

/** The comparison workbook: a Summary (counts and the lightest and cheapest options, live) and one row per option. */
export function compareWorkbook(result: CompareResult, options: CompareWorkbookOptions = {}): Workbook {
  const workbook = new ExcelJS.Workbook();
  workbook.creator = `${result.tool.name} ${result.tool.version}`;
  workbook.created = PLACEHOLDER_DATE;
  workbook.modified = PLACEHOLDER_DATE;
  const summary = workbook.addWorksheet(COMPARE_SUMMARY_SHEET);
  const price = options.steelPricePerTonne ?? DEFAULT_STEEL_PRICE_PER_TONNE;
  const rank = new Map(result.ranking.map((index, position) => [index, position + 1]));
  const rows: CellValue[][] = result.rows.map((row) => [
    row.index,
    row.name,
    row.sweep,
    statusText(row),
    row.steelMass === null ? null : toTonnes(row.steelMass),
    row.cost,
    null,
    rank.get(row.index) ?? null,
    row.girder?.section ?? '',
    row.girder?.grade ?? '',
    row.girder ? toTonnes(row.girder.mass) : null,
    columnsText(row),
    row.columns ? toTonnes(row.columns.mass) : null,
    row.maxUtilisation,
    row.governing?.member ?? '',
    row.governing?.check ?? '',
    row.governing?.clause ?? '',
    row.governing?.combination ?? '',
    row.governing?.scenario ?? '',
    row.governing?.position ?? '',
    row.bin?.diameter ?? null,
    row.bin?.cylinderHeight ?? null,
    row.bin?.capacity ?? null,
    changesText(row),
    row.message,
  ]);
  const sheet = addTableSheet(workbook, COMPARE_SHEET, compareColumns, rows);
  const steel = columnLetter(STEEL_COLUMN);
  result.rows.forEach((row, i) => {
    const excelRow = i + 2;
    // Steel cost = tonnage x the unit price on the Summary sheet (live; the cached result is written too).
    sheet.getCell(excelRow, STEEL_COST_COLUMN).value =
      row.steelMass === null ? null : { formula: `IF(ISNUMBER(${steel}${excelRow}),${steel}${excelRow}*${COMPARE_SUMMARY_SHEET}!$B$6,"")`, result: toTonnes(row.steelMass) * price };
    if (result.cheapest === row.index) {
      sheet.getRow(excelRow).eachCell((cell) => {
        cell.font = { bold: true };
      });
    }
    if (row.status !== 'verified') sheet.getCell(excelRow, STATUS_COLUMN).font = { bold: true, color: { argb: fonts.exceeded } };
  });
  colourUtilisations(sheet, UTILISATION_COLUMN, result.rows.length);

  summary.columns = [{ width: 44 }, { width: 60 }];
  summary.getCell('A1').value = `Option comparison: ${result.title}`;
  summary.getCell('A1').font = { bold: true, size: 14, color: { argb: fonts.heading } };
  const facts: Array<[string, string]> = [
    ['Base spec', result.base],
    ['Prepared with', `${result.tool.name} ${result.tool.version} (comparison schema ${result.schemaVersion})`],
    ['Options digest (SHA-256)', result.digest],
  ];
  facts.forEach(([name, value], i) => {
    label(summary.getCell(`A${i + 2}`), name);
    summary.getCell(`B${i + 2}`).value = value;
  });
  label(summary.getCell('A6'), 'Steel price, supplied and erected [EUR/t] (edit)');
  summary.getCell(PRICE_CELL).value = price;
  summary.getCell(PRICE_CELL).fill = solidFill(fills.input);
  summary.getCell(PRICE_CELL).numFmt = formats.money;

  const last = Math.max(2, result.rows.length + 1);
  const range = (column: number): string => `${COMPARE_SHEET}!$${columnLetter(column)}$2:$${columnLetter(column)}$${last}`;
  const verifiedRows = result.rows.filter((row) => row.status === 'verified');
  const lightest = verifiedRows.reduce<number | null>((min, row) => (row.steelMass === null ? min : min === null ? toTonnes(row.steelMass) : Math.min(min, toTonnes(row.steelMass))), null);
  const cheapestCost = verifiedRows.reduce<number | null>((min, row) => (row.cost === null ? min : min === null ? row.cost : Math.min(min, row.cost)), null);
  const cheapestRow = result.cheapest === null ? undefined : result.rows.find((row) => row.index === result.cheapest);
  const totals: Array<[string, CellValue]> = [
    ['Options', { formula: `COUNT(${range(1)})`, result: result.counts.options }],
    ['Verified', { formula: `COUNTIF(${range(STATUS_COLUMN)},"verified")`, result: result.counts.verified }],
    ['Infeasible (best attempt only)', { formula: `COUNTIF(${range(STATUS_COLUMN)},"infeasible*")`, result: result.counts.infeasible }],
    ['Invalid input', { formula: `COUNTIF(${range(STATUS_COLUMN)},"invalid*")`, result: result.counts.invalid }],
    ['Failed (an analysis or a guard refused)', { formula: `COUNTIF(${range(STATUS_COLUMN)},"failed*")`, result: result.counts.failed }],
    ['Lightest verified option, steel [t]', lightest === null ? 'none verified' : { formula: `MINIFS(${range(STEEL_COLUMN)},${range(STATUS_COLUMN)},"verified")`, result: lightest }],
    ['Cheapest verified option, cost [price units]', cheapestCost === null ? 'none verified' : { formula: `MINIFS(${range(COST_COLUMN)},${range(STATUS_COLUMN)},"verified")`, result: cheapestCost }],
    ['Cheapest verified option', cheapestRow ? `#${cheapestRow.index} ${cheapestRow.name}` : 'none verified'],
  ];
  totals.forEach(([name, value], i) => {
    const row = 8 + i;
    label(summary.getCell(`A${row}`), name);
    summary.getCell(`B${row}`).value = value;
    summary.getCell(`B${row}`).alignment = { horizontal: 'left' };
  });
  summary.getCell('B13').numFmt = formats.three;
  summary.getCell('B14').numFmt = formats.one;
  let row = 17;
  summary.getCell(`A${row}`).value = 'Cautions';
  summary.getCell(`A${row}`).font = { bold: true, color: { argb: fonts.caution } };
  for (const text of result.cautions) {
    row += 1;
    summary.mergeCells(`A${row}:B${row}`);
    const cell = summary.getCell(`A${row}`);
    cell.value = text;
    cell.fill = solidFill(fills.caution);
    cell.font = { color: { argb: fonts.caution } };
    cell.alignment = { wrapText: true, vertical: 'top' };
    summary.getRow(row).height = 15 * Math.max(1, Math.ceil(text.length / 95));
  }
  return workbook;
}

export async function renderCompareXlsx(result: CompareResult, options: CompareWorkbookOptions = {}): Promise<Buffer> {
  return Buffer.from(await compareWorkbook(result, options).xlsx.writeBuffer());
}

export async function writeCompareXlsx(result: CompareResult, path: string, options: CompareWorkbookOptions = {}): Promise<void> {
  await atomicWrite(path, await renderCompareXlsx(result, options));
}

// ----------------------------------------------------------------------------------------------

/** Bar label of an option: its number and name, shortened for the chart axis. */
function barLabel(row: CompareRow): string {
  const text = `#${row.index} ${row.name}`;
  return text.length > 60 ? `${text.slice(0, 59)}…` : text;
}

/** A horizontal bar per verified option, in ranked order; the cheapest in its own colour. */
export function compareChartSpec(result: CompareResult, quantity: 'tonnage' | 'cost'): TopLevelSpec {
  const ranked = result.ranking.map((index) => result.rows.find((row) => row.index === index) as CompareRow);
  const values = ranked.map((row) => ({
    label: barLabel(row),
    value: quantity === 'tonnage' ? toTonnes(row.steelMass ?? 0) : (row.cost ?? 0),
    kind: row.index === result.cheapest ? 'cheapest feasible' : 'other feasible',
  }));
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    config: { font: 'Roboto', background: 'white', view: { stroke: '#9aa5b1' }, axis: { labelFontSize: 8, titleFontSize: 9, titleFontWeight: 'normal', gridColor: '#e3e7eb' }, legend: { labelFontSize: 8, titleFontSize: 8, orient: 'bottom', direction: 'horizontal' } },
    width: 300,
    height: { step: 11 },
    data: { values },
    mark: { type: 'bar', height: 8 },
    encoding: {
      y: { field: 'label', type: 'nominal', title: null, sort: values.map((value) => value.label), axis: { labelLimit: 330 } },
      x: { field: 'value', type: 'quantitative', title: quantity === 'tonnage' ? 'Steel [t]' : 'Cost [price units: kg x relative price per grade + cost per distinct section]' },
      color: { field: 'kind', type: 'nominal', title: null, scale: { domain: ['cheapest feasible', 'other feasible'], range: [SERIES_COLOURS[2] as string, SERIES_COLOURS[0] as string] } },
    },
  };
}

/** Landscape A4 with the margins below: the room a chart may take, pt. */
const CHART_BOX = { width: 740, height: 440 };

/** The width at which an SVG fits the chart box whole (its own aspect ratio kept). */
export function fittedWidth(svg: string, box: { width: number; height: number } = CHART_BOX): number {
  const width = Number(/<svg[^>]*\swidth="([\d.]+)"/.exec(svg)?.[1]);
  const height = Number(/<svg[^>]*\sheight="([\d.]+)"/.exec(svg)?.[1]);
  if (!(width > 0 && height > 0)) return box.width;
  return Math.min(box.width, (box.height * width) / height);
}

async function chartPage(title: string, spec: TopLevelSpec, note: string): Promise<PdfContent[]> {
  const svg = await renderChartSvg(spec);
  return [{ ...heading(title), pageBreak: 'before' }, svgNode(svg, fittedWidth(svg)), caption(note)];
}

function fixed(value: number | null | undefined, digits: number): string {
  return value === null || value === undefined ? '' : value.toFixed(digits);
}

/** The sentence that names the cheapest feasible option, or says that none is feasible. */
export function cheapestSentence(result: CompareResult): string {
  const row = result.cheapest === null ? undefined : result.rows.find((candidate) => candidate.index === result.cheapest);
  if (!row) return `None of the ${result.counts.options} options has a verified design: every one is infeasible, invalid or refused (see the table of options without a design).`;
  const columns = row.support?.type === 'slab' ? 'bearing on the slab' : row.columns ? `on ${row.columns.count} columns ${row.columns.section} ${row.columns.grade}` : '';
  return `The cheapest feasible option is #${row.index} "${row.name}": ${fixed(toTonnes(row.steelMass ?? 0), 2)} t of steel (cost ${fixed(row.cost, 0)} in price units), girder ${row.girder?.section ?? ''} ${row.girder?.grade ?? ''} ${columns}, governed by ${row.governing?.check ?? ''} (${row.governing?.clause ?? ''}) in ${row.governing?.combination ?? ''}, scenario ${row.governing?.scenario ?? ''}, utilisation ${formatUtilisation(row.maxUtilisation)}.`;
}

export async function comparePdfDefinition(result: CompareResult): Promise<PdfDocumentDefinition> {
  const ranked = result.ranking.map((index) => result.rows.find((row) => row.index === index) as CompareRow);
  const others = result.rows.filter((row) => row.status !== 'verified');
  const rankedTable = table(
    [
      headerCell('Rank'),
      headerCell('#'),
      headerCell('Option'),
      headerCell('Steel [t]', 'right'),
      headerCell('Cost [units]', 'right'),
      headerCell('Girder'),
      headerCell('Columns'),
      headerCell('Max util. [-]', 'right'),
      headerCell('Governing check, combination, scenario'),
    ],
    ranked.map((row, position): PdfContent[] => {
      const cells: PdfNode[] = [
        numberCell(String(position + 1)),
        numberCell(String(row.index)),
        { text: row.name },
        numberCell(fixed(toTonnes(row.steelMass ?? 0), 3)),
        numberCell(fixed(row.cost, 0)),
        { text: `${row.girder?.section ?? ''} ${row.girder?.grade ?? ''}` },
        { text: columnsText(row) },
        utilisationCell(row.maxUtilisation),
        { text: row.governing ? `${row.governing.check}, ${row.governing.combination}, ${row.governing.scenario}` : '' },
      ];
      if (row.index === result.cheapest) for (const cell of cells) cell.bold = true;
      return cells;
    }),
    [22, 18, '*', 38, 40, 78, 92, 34, 150],
  );
  const content: PdfContent[] = [
    { text: 'OPTION COMPARISON', style: 'kicker' },
    { text: 'Support girders of a steel storage bin: steel across options', style: 'title' },
    { text: result.title, style: 'subtitle' },
    keyValueTable(
      [
        ['Base spec', result.base],
        ['Options', `${result.counts.options}: ${result.counts.verified} verified, ${result.counts.infeasible} infeasible, ${result.counts.invalid} invalid, ${result.counts.failed} refused`],
        ['Prepared with', `${result.tool.name} ${result.tool.version} (comparison schema ${result.schemaVersion})`],
        ['Options digest', result.digest],
      ],
      1,
    ),
    {
      table: { widths: ['*'], body: [[{ stack: [{ text: 'CAUTIONS', bold: true, color: colours.cautionBorder, margin: [0, 0, 0, 3] }, { ul: result.cautions.map((text) => ({ text, style: 'caution' })) }], fillColor: colours.cautionFill }]] },
      margin: [0, 8, 0, 8],
    },
    heading('Result'),
    { text: cheapestSentence(result), style: 'body', bold: true },
    paragraph(
      'Every option is a complete first-pass design by the same rules: loads, contact analysis of the girder under every combination and credible support scenario, and the least-cost sections by the integer program. Cost is in price units: mass times the relative price per kg of the grade plus the cost per distinct section, as set in each option; the steel cost in EUR is in compare.xlsx, from a unit price the estimator edits.',
    ),
    heading('Verified options, cheapest first'),
    ranked.length > 0 ? rankedTable : paragraph('No option has a verified design.'),
  ];
  if (ranked.length > 0) {
    content.push(...(await chartPage('Steel tonnage of the verified options', compareChartSpec(result, 'tonnage'), 'Ranked by cost, cheapest first; the cheapest feasible option is drawn in its own colour.')));
    content.push(...(await chartPage('Cost of the verified options', compareChartSpec(result, 'cost'), 'Price units: kg of steel times the relative price per kg of its grade, plus the cost per distinct section.')));
  }
  if (others.length > 0) {
    content.push(
      heading('Options without a verified design'),
      table(
        [headerCell('#'), headerCell('Option'), headerCell('Status'), headerCell('Why (the input or the check named)')],
        others.map((row): PdfContent[] => [numberCell(String(row.index)), { text: row.name }, { text: statusText(row), bold: true, color: colours.infeasible }, { text: row.message }]),
        [18, 170, 70, '*'],
      ),
    );
  }
  content.push(
    heading('What each option changes'),
    table(
      [headerCell('#'), headerCell('Option'), headerCell('Inputs changed from the base (input units)')],
      result.rows.map((row): PdfContent[] => [numberCell(String(row.index)), { text: row.name }, { text: changesText(row), style: 'mono' }]),
      [18, 200, '*'],
    ),
  );
  const pageMargins: [number, number, number, number] = [40, 50, 40, 46];
  return {
    content,
    pageSize: 'A4',
    pageOrientation: 'landscape',
    pageMargins,
    info: {
      title: `Option comparison: ${result.title}`,
      creator: `${result.tool.name} ${result.tool.version}`,
      producer: `${result.tool.name} ${result.tool.version}`,
      creationDate: PLACEHOLDER_DATE,
      modDate: PLACEHOLDER_DATE,
    },
    footer: (currentPage: number, pageCount: number) => ({
      columns: [
        { text: `${result.tool.name} ${result.tool.version}: first-pass designs, to be verified by a qualified engineer`, style: 'pageFooter' },
        { text: `page ${currentPage} of ${pageCount}`, style: 'pageFooter', alignment: 'right' },
      ],
      margin: [pageMargins[0], 16, pageMargins[2], 0],
    }),
    pageBreakBefore: (node, helpers) => node.headlineLevel !== undefined && helpers.getFollowingNodesOnPage().every((next) => next.headlineLevel !== undefined),
    defaultStyle: { font: 'Roboto', fontSize: 8, lineHeight: 1.15 },
    styles: REPORT_STYLES,
  };
}

export async function renderComparePdf(result: CompareResult): Promise<Buffer> {
  return renderPdfDefinition(await comparePdfDefinition(result));
}

export async function writeComparePdf(result: CompareResult, path: string): Promise<void> {
  await atomicWrite(path, await renderComparePdf(result));
}
