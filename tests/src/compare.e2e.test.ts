import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import ExcelJS from 'exceljs';
import { extractText, getDocumentProxy } from 'unpdf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { designFromSpec, type CompareResult } from '@binsupport/design';
import { normaliseSpec, readOptionsFile } from '@binsupport/spec';

// End to end: `binsupport compare` as an estimator runs it, on a small invented study (the demo
// bin's proportions on a coarse mesh, so that each design takes a fraction of a second): every row
// against a separate design of its option, worker counts and shards against each other byte for
// byte, the workbook and the report read back, and Ctrl-C mid-run. No published value is checked
// here: the reference of each row is a separate design of its option (the program's own, already
// verified against its sources elsewhere); a consistency test, common practice for end-to-end runs.
const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const launcher = join(root, 'apps', 'cli', 'bin', 'binsupport.mjs');

const base = {
  project: { name: 'Comparison e2e bin (invented)', client: 'Invented Grain Co-op' },
  bin: { diameter: 6, cylinderHeight: 12, wallThickness: 6, hopper: { apexHalfAngle: 30, outletDiameter: 0.4, thickness: 8 } },
  solid: { name: 'wheat', wallSurface: 'D2' },
  support: { type: 'ring-on-columns', columns: 8, segmentsPerSpan: 8, grade: 'S355' },
};
const study = [
  'title: E2E study (invented)',
  'base: bin.json',
  'options:',
  '  - name: six columns',
  '    set: { support.columns: 6 }',
  '  - name: two columns',
  '    set: { support.columns: 2 }',
  '  - name: on the slab',
  '    set: { support.type: ring-on-slab, support.columns: null }',
  'sweeps:',
  '  - name: grade',
  '    grid: { support.grade: [S275, S460] }',
  '  - name: at 300 m3',
  '    constantCapacity: { capacity: 300, diameter: [5.5, 6.5] }',
].join('\n');

let folder: string;
const run = (args: string[]) => spawnSync(process.execPath, [launcher, 'compare', ...args], { encoding: 'utf8', timeout: 170_000 });
let twoWorkers: ReturnType<typeof run>;

beforeAll(() => {
  folder = mkdtempSync(join(tmpdir(), 'binsupport-compare-'));
  writeFileSync(join(folder, 'bin.json'), JSON.stringify(base));
  writeFileSync(join(folder, 'study.yaml'), study);
  twoWorkers = run([join(folder, 'study.yaml'), '--out', join(folder, 'w2'), '--workers', '2']);
});

afterAll(() => {
  rmSync(folder, { recursive: true, force: true });
});

const comparison = (name: string): CompareResult => JSON.parse(readFileSync(join(folder, name, 'compare.json'), 'utf8')) as CompareResult;

describe('binsupport compare on a small study', () => {
  it('exits 0, writes compare.json, compare.xlsx and compare.pdf, and reports each option', () => {
    expect(twoWorkers.stderr).not.toMatch(/Error:/);
    expect(twoWorkers.status).toBe(0);
    for (const name of ['compare.json', 'compare.xlsx', 'compare.pdf']) expect(existsSync(join(folder, 'w2', name)), name).toBe(true);
    expect(readdirSync(join(folder, 'w2')).filter((name) => name.includes('.tmp-'))).toEqual([]);
    expect(twoWorkers.stderr).toMatch(/compare: 8 of 8 options on 2 worker thread\(s\)/);
    expect(twoWorkers.stdout).toMatch(/8 options: \d verified/);
  });

  it('gives each row the result of a separate design of its option; the invalid one names its input', async () => {
    const result = comparison('w2');
    const file = await readOptionsFile(join(folder, 'study.yaml'));
    expect(result.rows.map((row) => row.name)).toEqual(file.cases.map((option) => option.name));
    for (const row of result.rows) {
      if (row.name === 'two columns') {
        expect(row).toMatchObject({ status: 'invalid', errorPath: 'support.columns', steelMass: null });
        continue;
      }
      const option = file.cases[row.index];
      if (!option) throw new Error(`no option ${row.index}`);
      const document = structuredClone(option.document) as { bin: Record<string, unknown> };
      // at constant capacity the row names the height it found: the separate design uses it too
      const height = row.overrides.find((override) => override.path === 'bin.cylinderHeight' && option.capacity);
      if (height) document.bin['cylinderHeight'] = height.value;
      const separate = (await designFromSpec(normaliseSpec(document))).result;
      const girder = separate.members.find((member) => member.id === 'RG');
      const columns = separate.members.find((member) => member.id === 'C');
      expect(row.status, row.name).toBe(separate.status);
      expect(row.steelMass, row.name).toBe(separate.totals.steelMass);
      expect(row.cost, row.name).toBe(separate.optimisation.objectiveValue);
      expect(row.girder?.section, row.name).toBe(girder?.section);
      expect(row.girder?.grade, row.name).toBe(girder?.grade);
      expect(row.columns?.section, row.name).toBe(columns?.section);
      const governing = [...separate.members].sort((a, b) => (b.utilisation ?? Infinity) - (a.utilisation ?? Infinity))[0];
      expect(row.governing?.check, row.name).toBe(governing?.governing.check);
      expect(row.governing?.combination, row.name).toBe(governing?.governing.combination);
      expect(row.governing?.scenario, row.name).toBe(governing?.governing.scenario);
    }
  });

  it('writes the same compare.json, byte for byte, with one worker and with two', () => {
    const one = run([join(folder, 'study.yaml'), '--out', join(folder, 'w1'), '--workers', '1', '--quiet']);
    expect(one.status).toBe(0);
    expect(readFileSync(join(folder, 'w1', 'compare.json'), 'utf8')).toBe(readFileSync(join(folder, 'w2', 'compare.json'), 'utf8'));
  });

  it('joins shards into the compare.json of an unsharded run, byte for byte', () => {
    for (const shard of ['1/3', '2/3', '3/3']) {
      const part = run([join(folder, 'study.yaml'), '--out', join(folder, 'shards'), '--shard', shard, '--workers', '1', '--quiet']);
      expect(part.status, part.stderr).toBe(0);
    }
    const shardFiles = readdirSync(join(folder, 'shards')).filter((name) => name.startsWith('compare-shard-')).sort();
    expect(shardFiles).toEqual(['compare-shard-1-of-3.json', 'compare-shard-2-of-3.json', 'compare-shard-3-of-3.json']);
    const merged = run(['--merge', ...shardFiles.map((name) => join(folder, 'shards', name)), '--out', join(folder, 'merged')]);
    expect(merged.status, merged.stderr).toBe(0);
    expect(readFileSync(join(folder, 'merged', 'compare.json'), 'utf8')).toBe(readFileSync(join(folder, 'w2', 'compare.json'), 'utf8'));
    const missing = run(['--merge', join(folder, 'shards', shardFiles[0] as string), '--out', join(folder, 'never')]);
    expect(missing.status).toBe(2);
    expect(missing.stderr).toMatch(/compare --merge is missing shard 2\/3, 3\/3/);
    expect(existsSync(join(folder, 'never', 'compare.json'))).toBe(false);
  });

  it('writes a workbook with one row an option, the cheapest in bold and live totals with their results', async () => {
    const result = comparison('w2');
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(join(folder, 'w2', 'compare.xlsx'));
    const sheet = workbook.getWorksheet('Options');
    const summary = workbook.getWorksheet('Summary');
    if (!sheet || !summary) throw new Error('sheets missing');
    expect(sheet.rowCount).toBe(result.rows.length + 1);
    const cheapest = result.rows.find((row) => row.index === result.cheapest);
    const cheapestRow = sheet.getRow((result.cheapest ?? 0) + 2);
    expect(cheapestRow.getCell(2).value).toBe(cheapest?.name);
    expect(cheapestRow.getCell(2).font?.bold).toBe(true);
    const steelCost = cheapestRow.getCell(7).value as { formula: string; result: number };
    expect(steelCost.formula).toMatch(/E\d+\*Summary!\$B\$6/);
    expect(steelCost.result).toBeCloseTo(((cheapest?.steelMass ?? 0) / 1000) * (summary.getCell('B6').value as number), 6);
    const verified = summary.getCell('B9').value as { formula: string; result: number };
    expect(verified.formula).toMatch(/COUNTIF\(Options!\$D\$2:\$D\$9,"verified"\)/);
    expect(verified.result).toBe(result.counts.verified);
  });

  it('writes a report that names the cheapest feasible option in words', async () => {
    const result = comparison('w2');
    const pdf = await getDocumentProxy(new Uint8Array(readFileSync(join(folder, 'w2', 'compare.pdf'))));
    const { text } = await extractText(pdf, { mergePages: true });
    const cheapest = result.rows.find((row) => row.index === result.cheapest);
    expect(text).toContain(`The cheapest feasible option is #${cheapest?.index}`);
    expect(text).toMatch(/verified by a qualified/);
    expect(text).toContain('Options without a verified design');
    const hasPdftoppm = spawnSync('pdftoppm', ['-v']).error === undefined;
    if (hasPdftoppm) {
      const png = spawnSync('pdftoppm', ['-r', '30', '-png', '-f', '1', '-l', '1', join(folder, 'w2', 'compare.pdf'), join(folder, 'page')]);
      expect(png.status).toBe(0);
    }
  });

  it('stops on Ctrl-C mid-run with exit code 130 and leaves no comparison file, whole or partial', async () => {
    const out = join(folder, 'interrupted');
    const child = spawn(process.execPath, [launcher, 'compare', join(folder, 'study.yaml'), '--out', out, '--workers', '1'], { stdio: ['ignore', 'pipe', 'pipe'] });
    let stderr = '';
    const code = await new Promise<number | null>((resolve) => {
      child.stderr.on('data', (chunk: Buffer) => {
        stderr += chunk.toString();
        if (/compare: 1\/8/.test(stderr)) child.kill('SIGINT');
      });
      child.on('exit', (exitCode) => resolve(exitCode));
    });
    expect(code).toBe(130);
    expect(stderr).toMatch(/stopped by SIGINT; no output file was left half written/);
    expect(existsSync(out) ? readdirSync(out) : []).toEqual([]);
  });

  it('refuses bad arguments with exit code 2, naming them', () => {
    expect(run([join(folder, 'study.yaml'), '--out', join(folder, 'x'), '--workers', '0']).stderr).toMatch(/--workers must be a whole number between 1 and 64; got '0'/);
    expect(run([join(folder, 'study.yaml'), '--out', join(folder, 'x'), '--shard', '3/2']).stderr).toMatch(/--shard must be i\/n with whole numbers 1 <= i <= n; got 3\/2/);
    expect(run([join(folder, 'study.yaml'), '--out', join(folder, 'x'), '--shard', 'half']).status).toBe(2);
    expect(run([join(folder, 'nothing.yaml'), '--out', join(folder, 'x')]).stderr).toMatch(/nothing\.yaml: the options file cannot be read/);
  });
});
