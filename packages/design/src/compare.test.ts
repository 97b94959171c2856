import { describe, expect, it } from 'vitest';
import { expandOptionsDocument, normaliseSpec, type OptionCase } from '@binsupport/spec';
import { CAPACITY_HEIGHT_STEP, compareReport, compareShard, designOption, mergeShards, optionsDigest, prepareOption, shardCases, type CompareRow } from './compare.js';
import { designFromSpec } from './design.js';

// An invented bin (the demo's proportions) on a coarse mesh, so that a design takes a fraction of a second.
const base = {
  project: { name: 'Comparison test bin (invented)' },
  bin: { diameter: 6, cylinderHeight: 12, wallThickness: 6, hopper: { apexHalfAngle: 30, outletDiameter: 0.4, thickness: 8 } },
  solid: { name: 'wheat', wallSurface: 'D2' },
  support: { type: 'ring-on-columns', columns: 8, segmentsPerSpan: 8, grade: 'S355' },
};

function option(name: string, overrides: Record<string, unknown>, capacity?: { capacity: number; diameter: number }): OptionCase {
  const file = expandOptionsDocument({ base: 'inline', options: [{ name, set: overrides }] }, base, 'inline');
  const found = file.cases[1] as OptionCase;
  return capacity ? { ...found, capacity } : found;
}

function row(index: number, status: CompareRow['status'], cost: number | null, steelMass: number | null): CompareRow {
  return { index, name: `option ${index}`, sweep: '', overrides: [], status, message: '', steelMass, cost, maxUtilisation: status === 'verified' ? 0.9 : null };
}

describe('constant capacity: the cylinder height follows from the volume', () => {
  // Closed form (solid geometry): the full bin is a cylinder pi d^2/4 h_c on a frustum of a cone of
  // height h_h = (d - d_o) / (2 tan beta), volume (pi h_h / 12)(d^2 + d d_o + d_o^2).
  const capacity = 390;
  const beta = (30 * Math.PI) / 180;
  const outlet = 0.4;
  const volume = (d: number, h: number): number => {
    const hopperHeight = (d - outlet) / (2 * Math.tan(beta));
    return (Math.PI * d * d * h) / 4 + ((Math.PI * hopperHeight) / 12) * (d * d + d * outlet + outlet * outlet);
  };
  for (const diameter of [5, 6.5, 8]) {
    it(`at d = ${diameter} m the bin holds at least ${capacity} m3, and one height step less would not`, () => {
      const prepared = prepareOption(option(`d${diameter}`, { 'bin.diameter': diameter }, { capacity, diameter }));
      const height = prepared.spec.bin.cylinderHeight;
      expect(volume(diameter, height)).toBeGreaterThanOrEqual(capacity);
      expect(volume(diameter, height - CAPACITY_HEIGHT_STEP)).toBeLessThan(capacity);
      expect(prepared.overrides.at(-1)).toEqual({ path: 'bin.cylinderHeight', value: height });
    });
  }

  it('refuses a diameter whose hopper alone holds the capacity, naming bin.diameter', async () => {
    const result = await designOption(option('too wide', { 'bin.diameter': 20 }, { capacity: 100, diameter: 20 }));
    expect(result.status).toBe('invalid');
    expect(result.errorPath).toBe('bin.diameter');
    expect(result.message).toMatch(/bin\.diameter 20 m cannot hold 100 m3 with a cylinder of at least 0\.5 m: the hopper alone holds/);
  });
});

describe('designOption: every outcome is a row', () => {
  it('an input out of range gives an invalid row naming the input, the range and the unit', async () => {
    const result = await designOption(option('two columns', { 'support.columns': 2 }));
    expect(result).toMatchObject({ status: 'invalid', errorCode: 'INVALID_INPUT', errorPath: 'support.columns', steelMass: null, cost: null });
    expect(result.message).toMatch(/support\.columns must be a whole number of columns between 3 and 36/);
  });

  it('a verified row carries the numbers of a separate design of the same spec', async () => {
    const six = option('six columns', { 'support.columns': 6 });
    const result = await designOption(six);
    const separate = (await designFromSpec(normaliseSpec(six.document))).result;
    const girder = separate.members.find((member) => member.id === 'RG');
    const columns = separate.members.find((member) => member.id === 'C');
    expect(result.status).toBe(separate.status);
    expect(result.steelMass).toBe(separate.totals.steelMass);
    expect(result.cost).toBe(separate.optimisation.objectiveValue);
    expect(result.girder).toEqual({ section: girder?.section, grade: girder?.grade, mass: girder?.mass, utilisation: girder?.utilisation });
    expect(result.columns).toEqual({ section: columns?.section, grade: columns?.grade, count: 6, mass: columns?.mass, utilisation: columns?.utilisation });
    expect(result.support).toEqual({ type: 'columns', columns: 6 });
  });
});

describe('ranking, shards and merge', () => {
  const meta = { title: 'Study', digest: 'abc', base: 'bin.yaml', optionCount: 5 };
  const rows = [row(0, 'verified', 500, 480), row(1, 'infeasible', 300, 290), row(2, 'verified', 400, 390), row(3, 'invalid', null, null), row(4, 'verified', 400, 380)];

  it('ranks verified options by cost, then mass, then position; the cheapest is the first', () => {
    const report = compareReport(meta, [...rows].reverse());
    expect(report.rows.map((entry) => entry.index)).toEqual([0, 1, 2, 3, 4]);
    expect(report.ranking).toEqual([4, 2, 0]);
    expect(report.cheapest).toBe(4);
    expect(report.counts).toEqual({ options: 5, verified: 3, infeasible: 1, invalid: 1, failed: 0 });
    expect(compareReport(meta, rows.map((entry) => ({ ...entry, status: 'failed' as const }))).cheapest).toBeNull();
  });

  it('refuses a report with a row missing or given twice', () => {
    expect(() => compareReport(meta, rows.slice(1))).toThrow(/needs one row for each of the 5 options; got 4 rows/);
    expect(() => compareReport(meta, [...rows.slice(0, 4), rows[0] as CompareRow])).toThrow(/needs one row for each of the 5 options/);
  });

  it('shards partition the options: every option in exactly one shard, each shard a share of the list', () => {
    const cases = Array.from({ length: 49 }, (_, index) => ({ index }));
    for (const count of [1, 2, 3, 7, 49, 60]) {
      const shards = Array.from({ length: count }, (_, i) => shardCases(cases, i + 1, count).map((entry) => entry.index));
      expect(shards.flat().sort((a, b) => a - b)).toEqual(cases.map((entry) => entry.index));
      expect(Math.max(...shards.map((shard) => shard.length)) - Math.min(...shards.map((shard) => shard.length))).toBeLessThanOrEqual(1);
    }
    expect(() => shardCases(cases, 0, 2)).toThrow(/--shard must be i\/n with whole numbers 1 <= i <= n; got 0\/2/);
    expect(() => shardCases(cases, 3, 2)).toThrow(/got 3\/2/);
  });

  it('merged shards give the report of the whole list; foreign, repeated and missing shards are refused', () => {
    const shards = [1, 2].map((index) => compareShard(meta, { index, count: 2 }, shardCases(rows, index, 2)));
    expect(mergeShards(shards.map((content, i) => ({ source: `s${i + 1}.json`, content })))).toEqual(compareReport(meta, rows));
    expect(() => mergeShards([{ source: 's1.json', content: shards[0] }])).toThrow(/missing shard 2\/2/);
    expect(() => mergeShards([{ source: 's1.json', content: shards[0] }, { source: 'again.json', content: shards[0] }])).toThrow(/again\.json repeats shard 1\/2 \(also s1\.json\)/);
    expect(() => mergeShards([{ source: 's1.json', content: shards[0] }, { source: 'other.json', content: { ...shards[1], digest: 'other' } }])).toThrow(/other\.json belongs to another study/);
    expect(() => mergeShards([{ source: 'design.json', content: { schemaVersion: '1.0.0' } }])).toThrow(/design\.json is not a comparison shard/);
  });

  it('the digest changes with any input of any option, and not with the order of keys in a table', () => {
    const study = (grades: string[], reorder = false) =>
      expandOptionsDocument({ base: 'b', sweeps: [{ name: 'g', grid: { 'support.grade': grades } }] }, reorder ? { support: base.support, solid: base.solid, bin: base.bin, project: base.project } : base, 'b');
    expect(optionsDigest(study(['S275', 'S355']))).toBe(optionsDigest(study(['S275', 'S355'])));
    expect(optionsDigest(study(['S275', 'S460']))).not.toBe(optionsDigest(study(['S275', 'S355'])));
    expect(optionsDigest(study(['S275', 'S355'], true))).toBe(optionsDigest(study(['S275', 'S355'])));
  });
});
