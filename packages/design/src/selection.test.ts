import { describe, expect, it } from 'vitest';
import { normaliseSpec, readSpecFile, type BinSpecInput } from '@binsupport/spec';
import { loadRolledSections } from '@binsupport/steel';
import { designFromSpec, type DesignOptions } from './design.js';
import { bruteForceDesign } from './test-support/brute-force.js';

// An invented bin (test data only).
const base: BinSpecInput = {
  project: { name: 'Test bin (invented)', date: '2026-12-01' },
  bin: { diameter: 6, cylinderHeight: 12, wallThickness: 6, hopper: { apexHalfAngle: 30, outletDiameter: 0.4, thickness: 8 } },
  solid: { name: 'wheat' },
  support: { columns: 8, segmentsPerSpan: 12 },
};

const demoPath = new URL('../../../demo-data/kestrel-grain-bin.yaml', import.meta.url).pathname;

describe('integer program over girder and column groups (brute-force enumeration)', () => {
  const cases: Array<[string, DesignOptions]> = [
    ['one distinct section (girder and columns share a section)', { maxDistinctSections: 1 }],
    ['grades S235 or S355, one for both groups', { grades: ['S235', 'S355'] }],
    ['a cost per distinct section', { costPerDistinctSection: 1500 }],
  ];
  for (const [name, options] of cases) {
    it(`equals the exhaustive search: ${name}`, async () => {
      // One design with support.columnSection in the girder model, as the exhaustive search has.
      const { result } = await designFromSpec(normaliseSpec(base), { ...options, columnStiffnessRounds: 1 });
      const brute = bruteForceDesign(base, options);
      expect(result.status).toBe('verified');
      expect(result.optimisation.objectiveValue ?? Infinity).toBeCloseTo(brute?.objective ?? 0, 6);
      expect(result.members.map((member) => member.section)).toEqual([brute?.girder, brute?.column]);
      expect(new Set(result.members.map((member) => member.grade))).toEqual(new Set([brute?.grade]));
      if (options.maxDistinctSections === 1) expect(result.members[0]?.section).toBe(result.members[1]?.section);
    });
  }
});

describe('option errors', () => {
  it('names the option path of an unknown grade and of a bad distinct-section cap (typed DesignError)', async () => {
    const spec = normaliseSpec(base);
    await expect(designFromSpec(spec, { grades: ['S235', 'S999'] })).rejects.toMatchObject({ name: 'DesignError', code: 'BAD_INPUT', path: 'options.grades[1]' });
    await expect(designFromSpec(spec, { maxDistinctSections: 0 })).rejects.toMatchObject({ name: 'DesignError', code: 'BAD_INPUT', path: 'options.maxDistinctSections' });
  });
});

describe('demo bin (demo-data/kestrel-grain-bin.yaml): the options can only help', () => {
  it('members[] holds the girder and the columns; totals.steelMass sums both (columns x height x kg/m)', async () => {
    const spec = await readSpecFile(demoPath);
    const { result } = await designFromSpec(spec);
    const [girder, columns] = result.members;
    expect(result.members.map((member) => member.id)).toEqual(['RG', 'C']);
    const columnMass = spec.support.columns * spec.support.columnHeight * (loadRolledSections().find((s) => s.designation === columns?.section)?.properties.massPerMetre ?? 0);
    expect(columns?.mass).toBeCloseTo(columnMass, 9);
    expect(result.totals.steelMass).toBeCloseTo((girder?.mass ?? 0) + columnMass, 9);
    for (const row of result.utilisations.filter((r) => r.member === 'C')) expect(row.utilisation ?? Infinity).toBeLessThanOrEqual(1);
    // The girder model's columns start as support.columnSection; when another column is chosen the
    // design is repeated with it in the model, and the result is a fixed point: its column is its
    // model's, so no stiffness re-check remains (columnStiffness absent).
    const rounds = result.optimisation.columnRounds;
    if (rounds) {
      expect(rounds[0]?.modelColumn).toBe(spec.support.columnSection);
      expect(rounds.some((round) => round.modelColumn === columns?.section && round.chosenColumn === columns?.section)).toBe(true);
      expect(result.optimisation.columnStiffness).toBeUndefined();
    } else {
      expect(result.optimisation.columnStiffness?.kept ?? columns?.section).toBe(columns?.section);
    }
  });

  it('lowering the distinct-section cap from 2 to 1 never lowers the mass; allowing S355 beside S235 never raises the cost', async () => {
    // A cap shrinks the feasible set, a second grade widens it: the optimum of a smaller set cannot
    // be better (exact search), so these hold whatever the numbers are.
    const spec = await readSpecFile(demoPath);
    const capTwo = (await designFromSpec(spec, { maxDistinctSections: 2 })).result;
    const capOne = (await designFromSpec(spec, { maxDistinctSections: 1 })).result;
    expect(capTwo.status).toBe('verified');
    if (capOne.status === 'verified') {
      expect(capOne.totals.steelMass).toBeGreaterThanOrEqual(capTwo.totals.steelMass * (1 - 1e-9));
      expect(capOne.members[0]?.section).toBe(capOne.members[1]?.section);
    }
    const single = (await designFromSpec(spec, { grades: ['S235'] })).result;
    const both = (await designFromSpec(spec, { grades: ['S235', 'S355'] })).result;
    expect(both.status).toBe('verified');
    if (single.status === 'verified') expect(both.optimisation.objectiveValue ?? Infinity).toBeLessThanOrEqual((single.optimisation.objectiveValue ?? 0) * (1 + 1e-9));
    expect(new Set(both.members.map((member) => member.grade)).size).toBe(1);
  });
});
