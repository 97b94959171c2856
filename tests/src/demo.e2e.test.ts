import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import ExcelJS from 'exceljs';
import { extractText, getDocumentProxy } from 'unpdf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseSpecText } from '@binsupport/spec';

// End to end: the `binsupport design` command on the invented demo bin, as a user runs it, and the
// three deliverables read back as a user (or an outside script) would read them.
const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const launcher = join(root, 'apps', 'cli', 'bin', 'binsupport.mjs');
const demoSpec = join(root, 'demo-data', 'kestrel-grain-bin.yaml');

interface Design {
  schemaVersion: string;
  status: string;
  totals: { steelMass: number };
  members: Array<{ id: string; section: string; grade: string; mass: number; utilisation: number; governing: { check: string; clause: string; combination: string; scenario: string; position: { angle: number; description: string } } }>;
  loads: { totals: { solidWeight: number; structureWeight: number } };
  analyses: Array<{ combination: string; scenario: string; converged: boolean; iterations: number; reactionSum: number[]; appliedSum: number[] }>;
}

let out: string;
let design: Design;
let run: ReturnType<typeof spawnSync>;

beforeAll(() => {
  out = mkdtempSync(join(tmpdir(), 'binsupport-e2e-'));
  run = spawnSync(process.execPath, [launcher, 'design', demoSpec, '--out', out], { encoding: 'utf8', timeout: 170_000 });
  if (run.status === 0) design = JSON.parse(readFileSync(join(out, 'design.json'), 'utf8')) as Design;
});

afterAll(() => {
  rmSync(out, { recursive: true, force: true });
});

describe('binsupport design on the demo bin', () => {
  it('exits 0 and writes design.json, design.xlsx, design.pdf and the model file', () => {
    expect(run.stderr).not.toMatch(/Error:/);
    expect(run.status).toBe(0);
    for (const name of ['design.json', 'design.xlsx', 'design.pdf', 'model-column-cap-contact.json', 'model-column-cap-bonded.json', 'model-columns-under-web.json']) {
      expect(existsSync(join(out, name)), name).toBe(true);
    }
    expect(readdirSync(out).filter((name) => name.includes('.tmp-'))).toEqual([]);
  });

  it('carries the stable output fields of docs/output-schema.md', () => {
    expect(design.schemaVersion).toBe('1.0.0');
    expect(design.status).toBe('verified');
    const member = design.members[0];
    expect(member?.section).toMatch(/^(IPE \d+|HE \d+ B)$/);
    expect(member?.grade).toBe('S355');
    expect(member?.utilisation).toBeGreaterThan(0);
    expect(member?.utilisation).toBeLessThanOrEqual(1);
    expect(member?.governing.clause).toMatch(/^(EN 199[23]-1-[15]|common practice)/);
    expect(member?.governing.scenario).toBe('column-cap-contact');
    expect(design.totals.steelMass).toBeCloseTo(design.members.reduce((sum, m) => sum + m.mass, 0), 6);
    for (const analysis of design.analyses) {
      expect(analysis.converged).toBe(true);
      expect(analysis.iterations).toBeGreaterThanOrEqual(1);
    }
  });

  it('balances reactions and loads to 1e-6 relative, and applies the weight of solid plus structure (statics)', () => {
    for (const analysis of design.analyses) {
      const scale = Math.hypot(...analysis.appliedSum);
      for (let i = 0; i < 3; i++) {
        expect(Math.abs((analysis.reactionSum[i] ?? 0) + (analysis.appliedSum[i] ?? 0)) / scale).toBeLessThan(1e-6);
      }
    }
    // The characteristic combination (all factors 1) applies exactly the weight of solid and structure.
    const characteristic = design.analyses.find((analysis) => analysis.combination === 'SLS-1' && analysis.scenario === 'column-cap-contact');
    const weight = design.loads.totals.solidWeight + design.loads.totals.structureWeight;
    expect(Math.abs(-(characteristic?.appliedSum[2] ?? 0) - weight) / weight).toBeLessThan(1e-6);
    // Wheat, 6 m x 12 m cylinder on a 30 deg hopper to a 0.4 m outlet: gamma_u = 9.0 kN/m3 (EN 1991-4
    // Table E.1) times the cylinder and frustum volumes (geometry).
    const R = 3;
    const r = 0.2;
    const hh = (R - r) / Math.tan(Math.PI / 6);
    expect(design.loads.totals.solidWeight / (9000 * (Math.PI * R * R * 12 + ((Math.PI * hh) / 3) * (R * R + R * r + r * r)))).toBeCloseTo(1, 9);
  });

  it('design.xlsx reads back with exceljs and names the section and its governing check', async () => {
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(join(out, 'design.xlsx'));
    const text: string[] = [];
    workbook.eachSheet((sheet) => sheet.eachRow((row) => row.eachCell((cell) => text.push(String(cell.text)))));
    const member = design.members[0];
    expect(text).toContain(member?.section);
    expect(text.join('\n')).toContain(member?.governing.clause ?? 'missing');
  });

  it('design.pdf holds the section name and renders to PNG with pdftoppm', async () => {
    const pdf = await getDocumentProxy(new Uint8Array(readFileSync(join(out, 'design.pdf'))));
    const { text } = await extractText(pdf, { mergePages: true });
    expect(text).toContain(design.members[0]?.section);
    expect(text).toMatch(/qualified/);
    const hasPdftoppm = spawnSync('pdftoppm', ['-v']).error === undefined;
    if (!hasPdftoppm) {
      console.warn('pdftoppm (poppler-utils) is not installed: PDF rendering not checked');
      return;
    }
    execFileSync('pdftoppm', ['-r', '40', '-png', join(out, 'design.pdf'), join(out, 'page')]);
    expect(readdirSync(out).filter((name) => name.startsWith('page') && name.endsWith('.png')).length).toBe(pdf.numPages);
  });

  it('the girder model file holds the analysed model, and `analyse` reproduces the design analysis', () => {
    const modelPath = join(out, 'model-column-cap-contact.json');
    const model = JSON.parse(readFileSync(modelPath, 'utf8')) as { kind: string; nodes: unknown[]; elements: unknown[]; supports: unknown[] };
    expect(model.kind).toBe('girder-model');
    expect(model.elements.length).toBe(8 * 24);
    expect(model.supports.length).toBe(0);
    const rerun = spawnSync(process.execPath, [launcher, 'analyse', modelPath, '--json'], { encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
    expect(rerun.status).toBe(0);
    const analyses = (JSON.parse(rerun.stdout) as { analyses: Array<{ combination: string; reactionSum: number[]; stations: Array<{ My: number; T: number }> }> }).analyses;
    for (const analysis of design.analyses.filter((candidate) => candidate.scenario === 'column-cap-contact')) {
      const again = analyses.find((candidate) => candidate.combination === analysis.combination);
      expect(again?.reactionSum).toEqual(analysis.reactionSum);
      const peakMy = Math.max(...(again?.stations ?? []).map((station) => Math.abs(station.My)));
      expect(peakMy).toBe((design as unknown as { analyses: Array<{ peaks: { My: number } }> }).analyses[design.analyses.indexOf(analysis)]?.peaks.My);
    }
  });
});

describe('spec-sheet workbook round trip', () => {
  it('template -> workbook filled with the demo values -> design gives the same design.json as the YAML spec', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'binsupport-sheet-'));
    const template = join(dir, 'spec.xlsx');
    expect(spawnSync(process.execPath, [launcher, 'template', '--xlsx', template], { encoding: 'utf8' }).status).toBe(0);
    // Fill the Value column from the YAML spec, as a user would type it (lists comma-separated).
    const yaml = parseSpecText(readFileSync(demoSpec, 'utf8'), 'yaml') as Record<string, unknown>;
    const valueAt = (path: string): unknown =>
      path.split('.').reduce<unknown>((node, part) => {
        if (node === undefined || node === null) return undefined;
        const indexed = /^(.+)\[(\d+)\]$/.exec(part);
        if (indexed) return ((node as Record<string, unknown[]>)[indexed[1] ?? ''] ?? [])[Number(indexed[2])];
        return (node as Record<string, unknown>)[part];
      }, yaml);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(template);
    const sheet = workbook.getWorksheet('Spec');
    expect(sheet).toBeDefined();
    const header = Array.from(sheet?.getRow(1).values as unknown[], (cell) => String(cell ?? '').toLowerCase());
    const pathColumn = header.findIndex((cell) => cell.startsWith('path') || cell.startsWith('input'));
    const valueColumn = header.findIndex((cell) => cell.startsWith('value'));
    sheet?.eachRow((row, index) => {
      if (index === 1) return;
      const value = valueAt(String(row.getCell(pathColumn).value ?? ''));
      if (value === undefined) return;
      row.getCell(valueColumn).value = Array.isArray(value) ? value.join(', ') : (value as ExcelJS.CellValue);
    });
    const filled = join(dir, 'filled.xlsx');
    await workbook.xlsx.writeFile(filled);
    const fromSheet = spawnSync(process.execPath, [launcher, 'design', filled, '--out', join(dir, 'out'), '--quiet'], { encoding: 'utf8', timeout: 170_000 });
    expect(fromSheet.stderr).toBe('');
    expect(fromSheet.status).toBe(0);
    expect(readFileSync(join(dir, 'out', 'design.json'), 'utf8')).toBe(readFileSync(join(out, 'design.json'), 'utf8'));
    rmSync(dir, { recursive: true, force: true });
  });
});

describe('binsupport command line', () => {
  it('prints help and exits 0', () => {
    const help = spawnSync(process.execPath, [launcher, '--help'], { encoding: 'utf8' });
    expect(help.status).toBe(0);
    expect(help.stdout).toMatch(/binsupport design <spec> --out <folder>/);
    expect(help.stdout).toMatch(/qualified engineer/);
  });

  it('exits 2 with the input path, range and unit for a bad spec, and writes nothing', () => {
    const dir = mkdtempSync(join(tmpdir(), 'binsupport-bad-'));
    const spec = join(dir, 'bad.yaml');
    const text = readFileSync(demoSpec, 'utf8').replace('apexHalfAngle: 30', 'apexHalfAngle: 75');
    writeFileSync(spec, text);
    const result = spawnSync(process.execPath, [launcher, 'design', spec, '--out', join(dir, 'out')], { encoding: 'utf8' });
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('bin.hopper.apexHalfAngle must be a number between 5 and 60 degrees; got 75');
    expect(existsSync(join(dir, 'out'))).toBe(false);
    rmSync(dir, { recursive: true, force: true });
  });
});
