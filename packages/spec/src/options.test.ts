import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { SpecError } from './errors.js';
import { expandOptionsDocument, MAX_OPTIONS, readOptionsFile, setInputPath } from './options.js';

const base = {
  project: { name: 'Options test bin (invented)' },
  bin: { diameter: 6, cylinderHeight: 12, wallThickness: 6, hopper: { apexHalfAngle: 30, outletDiameter: 0.4, thickness: 8 } },
  solid: { name: 'wheat' },
  support: { type: 'ring-on-columns', columns: 8 },
};

function specError(run: () => unknown): SpecError {
  try {
    run();
  } catch (error) {
    if (error instanceof SpecError) return error;
    throw error;
  }
  throw new Error('expected a SpecError');
}

describe('options file: expansion of options and sweeps', () => {
  it('puts the base first, then the named options, then each sweep as a grid (first input slowest)', () => {
    const file = expandOptionsDocument(
      {
        base: 'base.yaml',
        options: [{ name: 'six columns', set: { 'support.columns': 6 } }],
        sweeps: [{ name: 'grid', grid: { 'support.columns': [6, 8], 'support.grade': ['S275', 'S355', 'S460'] } }],
      },
      base,
      'base.yaml',
    );
    expect(file.cases.map((option) => option.name)).toEqual([
      'base',
      'six columns',
      'grid: columns=6, grade=S275',
      'grid: columns=6, grade=S355',
      'grid: columns=6, grade=S460',
      'grid: columns=8, grade=S275',
      'grid: columns=8, grade=S355',
      'grid: columns=8, grade=S460',
    ]);
    expect(file.cases.map((option) => option.index)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    const last = file.cases[7];
    expect(last?.document['support']).toEqual({ type: 'ring-on-columns', columns: 8, grade: 'S460' });
    // the base itself is untouched by the overrides of the options
    expect(file.cases[0]?.document).toEqual(base);
    expect((file.cases[1]?.document['support'] as Record<string, unknown>)['columns']).toBe(6);
  });

  it('expands a range { from, to, step } to tidy values (5, 5.5, ..., 8) and counts both ends', () => {
    const file = expandOptionsDocument({ base: 'b', sweeps: [{ name: 'd', grid: { 'bin.diameter': { from: 5, to: 8, step: 0.5 } } }] }, base, 'b');
    expect(file.cases.slice(1).map((option) => option.overrides[0]?.value)).toEqual([5, 5.5, 6, 6.5, 7, 7.5, 8]);
    const tenths = expandOptionsDocument({ base: 'b', sweeps: [{ name: 'h', grid: { 'bin.cylinderHeight': { from: 10, to: 10.3, step: 0.1 } } }] }, base, 'b');
    expect(tenths.cases.slice(1).map((option) => option.overrides[0]?.value)).toEqual([10, 10.1, 10.2, 10.3]);
  });

  it('removes an input given as null (its default applies), and creates tables that the base lacks', () => {
    const document = structuredClone(base) as Record<string, unknown>;
    setInputPath(document, 'support.columns', null);
    setInputPath(document, 'snow.groundLoad', 0.8);
    setInputPath(document, 'roof.deadLoad', null);
    expect(document['support']).toEqual({ type: 'ring-on-columns' });
    expect(document['snow']).toEqual({ groundLoad: 0.8 });
    expect(document['roof']).toBeUndefined();
  });

  it('keeps the constant-capacity sweep: the diameter varies first, the capacity travels with each option', () => {
    const file = expandOptionsDocument({ base: 'b', sweeps: [{ name: 'cap', constantCapacity: { capacity: 390, diameter: [5, 6] }, grid: { 'support.columns': [6, 8] } }] }, base, 'b');
    expect(file.cases.slice(1).map((option) => option.name)).toEqual(['cap: diameter=5, columns=6', 'cap: diameter=5, columns=8', 'cap: diameter=6, columns=6', 'cap: diameter=6, columns=8']);
    expect(file.cases[1]?.capacity).toEqual({ capacity: 390, diameter: 5 });
  });

  it('names the option and the inputs when a path is not an input of the spec', () => {
    const error = specError(() => expandOptionsDocument({ base: 'b', options: [{ name: 'typo', set: { 'support.colums': 6 } }] }, base, 'b', 'study.yaml'));
    expect(error.path).toBe('options[0].set.support.colums');
    expect(error.message).toMatch(/options\[0\]\.set\.support\.colums: 'support\.colums' is not an input of the spec \(inputs under support: .*support\.columns/);
  });

  it('refuses repeated option names, an empty override, a reversed range and a capacity sweep that also sets the height', () => {
    expect(specError(() => expandOptionsDocument({ base: 'b', options: [{ name: 'a', set: { 'support.columns': 6 } }, { name: 'a', set: { 'support.columns': 10 } }] }, base, 'b')).message).toMatch(
      /gives the option name 'a' again \(also options\[0\]\)/,
    );
    expect(specError(() => expandOptionsDocument({ base: 'b', options: [{ name: 'a', set: {} }] }, base, 'b')).message).toMatch(/must change at least one input/);
    expect(specError(() => expandOptionsDocument({ base: 'b', sweeps: [{ name: 's', grid: { 'bin.diameter': { from: 8, to: 5, step: 0.5 } } }] }, base, 'b')).message).toMatch(/a range must have to >= from; got from 8, to 5/);
    expect(
      specError(() => expandOptionsDocument({ base: 'b', sweeps: [{ name: 's', constantCapacity: { capacity: 390, diameter: [5] }, grid: { 'bin.cylinderHeight': [10] } }] }, base, 'b')).message,
    ).toMatch(/keeps the capacity constant, so its grid must not set bin\.diameter, bin\.cylinderHeight or bin\.fillHeight/);
    expect(specError(() => expandOptionsDocument({ base: 'b', sweeps: [{ name: 's', constantCapacity: { capacity: 0.5, diameter: [5] } }] }, base, 'b')).message).toMatch(
      /sweeps\[0\]\.constantCapacity\.capacity must be a number between 1 and 100000 m3/,
    );
    expect(specError(() => expandOptionsDocument({ base: 'b', sweeps: [{ name: 's', grid: { 'bin.diameter': { from: 1, to: 2, step: 0 } } }] }, base, 'b')).message).toMatch(/step must be a positive number/);
  });

  it(`refuses a study that expands to more than ${MAX_OPTIONS} options, naming the limit`, () => {
    const grid = { 'support.columns': { from: 3, to: 36, step: 1 }, 'bin.diameter': { from: 1, to: 60, step: 0.5 } };
    expect(specError(() => expandOptionsDocument({ base: 'b', sweeps: [{ name: 'huge', grid }] }, base, 'b')).message).toMatch(new RegExp(`more than ${MAX_OPTIONS} options`));
  });
});

describe('options file: reading YAML and XLSX', () => {
  it('reads a YAML options file whose base is a spec file beside it', async () => {
    const folder = await mkdtemp(join(tmpdir(), 'binsupport-options-'));
    await writeFile(join(folder, 'bin.json'), JSON.stringify(base));
    await writeFile(join(folder, 'study.yaml'), 'base: bin.json\ntitle: Study\nsweeps:\n  - name: grade\n    grid:\n      support.grade: [S275, S355]\n');
    const file = await readOptionsFile(join(folder, 'study.yaml'));
    expect(file.title).toBe('Study');
    expect(file.baseSource).toBe('bin.json');
    expect(file.cases.map((option) => option.name)).toEqual(['base', 'grade: grade=S275', 'grade: grade=S355']);
  });

  it('reads the same study from an options workbook (Kind, Name, Input, Value) as from YAML', async () => {
    const folder = await mkdtemp(join(tmpdir(), 'binsupport-options-'));
    await writeFile(join(folder, 'bin.json'), JSON.stringify(base));
    await writeFile(
      join(folder, 'study.yaml'),
      [
        'base: bin.json',
        'title: Workbook study',
        'options:',
        '  - name: IPE only',
        '    set: { support.sectionFamilies: [IPE], support.columns: 6 }',
        'sweeps:',
        '  - name: cols',
        '    grid: { support.columns: [6, 8, 10] }',
        '  - name: cap',
        '    constantCapacity: { capacity: 390, diameter: { from: 5, to: 6, step: 0.5 } }',
      ].join('\n'),
    );
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet('Options');
    sheet.addRow(['Kind', 'Name', 'Input', 'Value']);
    sheet.addRow(['title', '', '', 'Workbook study']);
    sheet.addRow(['base', '', '', 'bin.json']);
    sheet.addRow(['option', 'IPE only', 'support.sectionFamilies', 'IPE']);
    sheet.addRow(['option', 'IPE only', 'support.columns', 6]);
    sheet.addRow(['sweep', 'cols', 'support.columns', '6; 8; 10']);
    sheet.addRow(['capacity', 'cap', '', 390]);
    sheet.addRow(['diameter', 'cap', '', '5 to 6 step 0.5']);
    await writeFile(join(folder, 'study.xlsx'), Buffer.from(await workbook.xlsx.writeBuffer()));
    const fromYaml = await readOptionsFile(join(folder, 'study.yaml'));
    const fromWorkbook = await readOptionsFile(join(folder, 'study.xlsx'));
    expect(fromWorkbook).toEqual(fromYaml);
    expect(fromWorkbook.cases).toHaveLength(1 + 1 + 3 + 3);
  });

  it('names the sheet and the row of a workbook entry it cannot read', async () => {
    const folder = await mkdtemp(join(tmpdir(), 'binsupport-options-'));
    const workbook = new ExcelJS.Workbook();
    const sheet = workbook.addWorksheet('Options');
    sheet.addRow(['Kind', 'Name', 'Input', 'Value']);
    sheet.addRow(['base', '', '', 'bin.json']);
    sheet.addRow(['swep', 'cols', 'support.columns', '6; 8']);
    await writeFile(join(folder, 'study.xlsx'), Buffer.from(await workbook.xlsx.writeBuffer()));
    await expect(readOptionsFile(join(folder, 'study.xlsx'))).rejects.toThrow(/study\.xlsx, sheet Options, row 3: Kind must be one of title, base, option, sweep, capacity, diameter; got 'swep'/);
  });

  it('refuses a file that is not an options file, naming it', async () => {
    const folder = await mkdtemp(join(tmpdir(), 'binsupport-options-'));
    await writeFile(join(folder, 'study.txt'), 'base: bin.json');
    await expect(readOptionsFile(join(folder, 'study.txt'))).rejects.toThrow(/study\.txt: an options file must be \.yaml, \.yml, \.json or \.xlsx/);
    await writeFile(join(folder, 'broken.xlsx'), 'this is not a zip archive');
    await expect(readOptionsFile(join(folder, 'broken.xlsx'))).rejects.toThrow(/broken\.xlsx is not a readable \.xlsx workbook/);
    await writeFile(join(folder, 'nobase.yaml'), 'title: no base\n');
    await expect(readOptionsFile(join(folder, 'nobase.yaml'))).rejects.toThrow(/base must be the path of the base spec file/);
    await expect(readOptionsFile(join(folder, 'missing.yaml'))).rejects.toThrow(/missing\.yaml: the options file cannot be read/);
  });
});
