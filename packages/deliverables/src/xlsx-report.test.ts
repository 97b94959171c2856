import ExcelJS from 'exceljs';
import type { CellFormulaValue, CellValue, Worksheet } from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import type { DesignResult } from '@binsupport/design';
import { DEFAULT_STEEL_PRICE_PER_TONNE, renderDesignXlsx } from './xlsx-report.js';
import { flattenJson } from './flatten.js';
import { demoDesignResult } from './test-support/demo-result.js';

let result: DesignResult;
let workbook: ExcelJS.Workbook;

function sheet(name: string): Worksheet {
  const found = workbook.getWorksheet(name);
  if (found === undefined) throw new Error(`sheet ${name} missing`);
  return found;
}

function headers(ws: Worksheet): string[] {
  const values: string[] = [];
  ws.getRow(1).eachCell((cell) => values.push(String(cell.value)));
  return values;
}

/** exceljs reads conditional formatting back but does not declare the property in its types. */
interface ConditionalFormattingRead {
  ref: string;
  rules: Array<{ type: string; operator?: string; formulae?: unknown[] }>;
}

function conditionalFormattings(ws: Worksheet): ConditionalFormattingRead[] {
  const value: unknown = Reflect.get(ws, 'conditionalFormattings');
  if (!Array.isArray(value)) throw new Error(`${ws.name}: no conditional formatting read back`);
  return value as ConditionalFormattingRead[];
}

function isFormula(value: CellValue): value is CellFormulaValue {
  return typeof value === 'object' && value !== null && 'formula' in value;
}

/** Every formula cell of a sheet, by address. */
function formulas(ws: Worksheet): Map<string, CellFormulaValue> {
  const found = new Map<string, CellFormulaValue>();
  ws.eachRow((row) => row.eachCell((cell) => {
    if (isFormula(cell.value)) found.set(cell.address, cell.value);
  }));
  return found;
}

beforeAll(async () => {
  result = demoDesignResult();
  workbook = new ExcelJS.Workbook();
  const bytes = await renderDesignXlsx(result);
  await workbook.xlsx.load(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
});

describe('design.xlsx', () => {
  it('has the sheets of the design summary', () => {
    expect(workbook.worksheets.map((ws) => ws.name)).toEqual([
      'Summary', 'Members', 'Utilisations', 'Combinations', 'Loads', 'Derivation', 'Pressures', 'Scenarios', 'Analyses', 'Diagrams', 'Inputs',
    ]);
  });

  it('lists every member with its governing check, clause, combination, scenario and position', () => {
    const ws = sheet('Members');
    expect(headers(ws).slice(0, 14)).toEqual([
      'Member', 'Description', 'Section', 'Grade', 'Length [m]', 'Mass [kg]', 'Mass per length [kg/m]', 'Max utilisation [-]',
      'Governing check', 'Clause', 'Combination', 'Scenario', 'Position angle [°]', 'Position',
    ]);
    expect(ws.rowCount).toBe(result.members.length + 1);
    result.members.forEach((member, i) => {
      const row = ws.getRow(i + 2);
      expect(row.getCell(1).value).toBe(member.id);
      expect(row.getCell(3).value).toBe(member.section);
      expect(row.getCell(4).value).toBe(member.grade);
      expect(row.getCell(6).value).toBe(member.mass);
      expect(row.getCell(8).value).toBe(member.utilisation);
      expect(row.getCell(9).value).toBe(member.governing.check);
      expect(row.getCell(10).value).toBe(member.governing.clause);
      expect(row.getCell(11).value).toBe(member.governing.combination);
      expect(row.getCell(12).value).toBe(member.governing.scenario);
      expect(row.getCell(13).value).toBeCloseTo((member.governing.position.angle * 180) / Math.PI, 9);
      expect(row.getCell(14).value).toBe(member.governing.position.description);
      expect(row.getCell(15).value).toBe(member.governing.title);
    });
  });

  it('totals the tonnage with a live formula over the Members mass column, its result cached', () => {
    const expectedTonnes = result.members.reduce((sum, m) => sum + m.mass, 0) / 1000;
    const all = formulas(sheet('Summary'));
    const total = [...all.values()].find((f) => f.formula === `SUM(Members!F2:F${result.members.length + 1})/1000`);
    expect(total).toBeDefined();
    expect(total?.result).toBeCloseTo(expectedTonnes, 12);
    // By section: SUMIFS over the same column, one row per section.
    const bySection = [...all.values()].filter((f) => f.formula.startsWith('SUMIFS(Members!$F$2'));
    expect(bySection).toHaveLength(new Set(result.members.map((m) => `${m.section}/${m.grade}`)).size);
    expect(bySection.reduce((sum, f) => sum + Number(f.result), 0)).toBeCloseTo(expectedTonnes, 12);
  });

  it('prices the tonnage from an editable estimator input cell', () => {
    const ws = sheet('Summary');
    const all = formulas(ws);
    const totalAddress = [...all.entries()].find(([, f]) => f.formula.startsWith('SUM(Members!'))?.[0];
    const cost = [...all.values()].find((f) => totalAddress !== undefined && f.formula.startsWith(`${totalAddress}*`));
    expect(cost).toBeDefined();
    const priceAddress = cost?.formula.split('*')[1] ?? '';
    const price = ws.getCell(priceAddress);
    expect(price.value).toBe(DEFAULT_STEEL_PRICE_PER_TONNE);
    expect(String(price.note)).toMatch(/Estimator input/);
    const tonnes = result.members.reduce((sum, m) => sum + m.mass, 0) / 1000;
    expect(cost?.result).toBeCloseTo(tonnes * DEFAULT_STEEL_PRICE_PER_TONNE, 6);
  });

  it('freezes and filters the header row of every table', () => {
    for (const ws of workbook.worksheets.filter((w) => w.name !== 'Summary')) {
      const [view] = ws.views;
      expect(view?.state, ws.name).toBe('frozen');
      expect(view && 'ySplit' in view ? view.ySplit : undefined, ws.name).toBe(1);
      expect(ws.autoFilter, ws.name).toBeTruthy();
    }
  });

  it('puts the unit in every numeric header', () => {
    for (const ws of workbook.worksheets.filter((w) => w.name !== 'Summary')) {
      const row2 = ws.getRow(2);
      headers(ws).forEach((header, i) => {
        if (typeof row2.getCell(i + 1).value === 'number' && ws.name !== 'Inputs') {
          expect(header, `${ws.name}: ${header}`).toMatch(/\[.+\]/);
        }
      });
    }
  });

  it('colours utilisations by conditional formatting: above 1.0 red, above 0.9 amber', () => {
    const ws = sheet('Members');
    const rules = conditionalFormattings(ws).flatMap((cf) => cf.rules.map((rule) => ({ ref: cf.ref, rule })));
    const thresholds = rules.map(({ rule }) => (rule.type === 'cellIs' && rule.operator === 'greaterThan' ? Number(rule.formulae?.[0]) : Number.NaN));
    expect(rules.every(({ ref }) => ref === `H2:H${result.members.length + 1}`)).toBe(true);
    expect(thresholds.sort()).toEqual([0.9, 1]);
    expect(conditionalFormattings(sheet('Utilisations'))).toHaveLength(1);
  });

  it('writes every utilisation row, analysis and the input echo', () => {
    const utilisations = sheet('Utilisations');
    expect(utilisations.rowCount).toBe(result.utilisations.length + 1);
    result.utilisations.forEach((row, i) => {
      expect(utilisations.getRow(i + 2).getCell(11).value).toBe(row.utilisation);
      expect(utilisations.getRow(i + 2).getCell(4).value).toBe(row.clause);
    });
    const analyses = sheet('Analyses');
    expect(analyses.rowCount).toBe(result.analyses.length + 1);
    const first = result.analyses[0];
    expect(analyses.getRow(2).getCell(8).value).toBeCloseTo((first?.appliedSum[2] ?? Number.NaN) / 1000, 9);
    const inputs = sheet('Inputs');
    const echo = flattenJson(result.input);
    expect(inputs.rowCount).toBe(echo.length + 1);
    expect(inputs.getRow(2).getCell(1).value).toBe(echo[0]?.path);
  });

  it('leaves a utilisation that recorded no number empty, with its note', async () => {
    const partial = demoDesignResult();
    const [row] = partial.utilisations;
    if (row === undefined) throw new Error('fixture has no utilisation rows');
    row.utilisation = null;
    row.note = 'outside the scope of this check';
    const bytes = await renderDesignXlsx(partial);
    const book = new ExcelJS.Workbook();
    await book.xlsx.load(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
    const ws = book.getWorksheet('Utilisations');
    expect(ws?.getRow(2).getCell(11).value ?? null).toBeNull();
    expect(ws?.getRow(2).getCell(12).value).toBe('outside the scope of this check');
  });

  it('shows pressures in kPa', () => {
    const pressures = sheet('Pressures');
    const [profile] = result.loads.profiles;
    if (profile === undefined) throw new Error('fixture has no profiles');
    const last = profile.z.length - 1;
    expect(pressures.getRow(last + 2).getCell(4).value).toBeCloseTo((profile.ph[last] ?? Number.NaN) / 1000, 9);
  });
});
