import { describe, expect, it } from 'vitest';
import { parseSpecText } from './read.js';
import { normaliseSpec } from './spec.js';
import { SpecError } from './errors.js';

const minimal = {
  project: { name: 'Test bin (invented)' },
  bin: { diameter: 6, cylinderHeight: 12, wallThickness: 6, hopper: { apexHalfAngle: 30, outletDiameter: 0.4, thickness: 8 } },
  solid: { name: 'wheat' },
  support: { columns: 8 },
};

function errorOf(document: unknown): SpecError {
  try {
    normaliseSpec(document);
  } catch (error) {
    if (error instanceof SpecError) return error;
    throw error;
  }
  throw new Error('expected a SpecError');
}

function withBin(patch: Record<string, unknown>) {
  return { ...minimal, bin: { ...minimal.bin, ...patch } };
}

describe('normaliseSpec', () => {
  it('converts input units to SI and fills defaults', () => {
    const spec = normaliseSpec(minimal);
    if (spec.bin.shape !== 'circular') throw new Error('a circular bin was expected');
    expect(spec.bin.wallThickness).toBeCloseTo(0.006, 12);
    expect(spec.bin.hopper.apexHalfAngle).toBeCloseTo(Math.PI / 6, 12);
    expect(spec.bin.fillHeight).toBe(12);
    expect(spec.support.girderDiameter).toBeCloseTo(6.006, 12);
    expect(spec.support.grade).toBe('S355');
    expect(spec.support.segmentsPerSpan).toBe(24);
    expect(spec.actions).toEqual({ permanentFactor: 1.35, solidFactor: 1.5, variableFactor: 1.5, combinationMethod: '6.10' });
    expect(spec.equipment).toEqual([]);
    expect(spec.wind).toBeUndefined();
    expect(spec.bin.shape === 'circular' && spec.bin.patchLoadMethod).toBe('patch');
    expect(spec.support.capBolts).toBeUndefined();
  });

  it('takes a rectangular bin with a pyramid or a wedge hopper, and says which inputs each shape needs', () => {
    const rectangular = { ...minimal, bin: { shape: 'rectangular', lengthX: 6, lengthY: 4, cylinderHeight: 10, wallThickness: 6, hopper: { kind: 'pyramid', height: 3, outletLengthX: 0.6, outletLengthY: 0.4, thickness: 8 } } };
    const spec = normaliseSpec(rectangular);
    expect(spec.bin).toMatchObject({ shape: 'rectangular', lengthX: 6, lengthY: 4, fillHeight: 10, hopper: { kind: 'pyramid', height: 3, outletLengthX: 0.6, outletLengthY: 0.4 } });
    expect(spec.bin.wallThickness).toBeCloseTo(0.006, 12);
    // a wedge's slot runs along X over the whole box
    const wedge = normaliseSpec({ ...rectangular, bin: { ...rectangular.bin, hopper: { kind: 'wedge', height: 3, outletLengthY: 0.4, thickness: 8 } } });
    expect(wedge.bin.shape === 'rectangular' && wedge.bin.hopper.outletLengthX).toBe(6);
    expect(errorOf({ ...rectangular, bin: { ...rectangular.bin, diameter: 6 } }).message).toBe('bin.diameter does not apply to a rectangular bin; remove it');
    expect(errorOf({ ...rectangular, bin: { ...rectangular.bin, lengthY: undefined } }).message).toBe('bin.lengthY is required for a rectangular bin (a number between 1 and 60 m)');
    expect(errorOf({ ...minimal, bin: { ...minimal.bin, diameter: undefined } }).message).toBe('bin.diameter is required for a circular bin (a number between 1 and 60 m)');
    expect(errorOf({ ...rectangular, bin: { ...rectangular.bin, hopper: { ...rectangular.bin.hopper, outletLengthY: 3.8 } } }).message).toBe('bin.hopper.outletLengthY must be less than 0.9 times bin.lengthY (3.600 m); got 3.8');
  });

  it('converts the cap bolts and the welded-box limits to SI, and makes the bolted scenario credible', () => {
    const spec = normaliseSpec({ ...minimal, support: { columns: 8, capBolts: { perCap: 4, gauge: 90 }, weldedBoxes: { minDepth: 400, maxDepth: 600, minFlangeWidth: 300, maxFlangeWidth: 400 } } });
    expect(spec.support.capBolts).toEqual({ perCap: 4, size: 'M20', boltClass: '8.8', gauge: 0.09 });
    expect(spec.support.credibleScenarios).toEqual(['column-cap-bolted']);
    expect(spec.support.weldedBoxes?.flangeOutstand).toBeCloseTo(0.02, 12);
    expect(spec.support.weldedBoxes?.maxFlangeWidth).toBeCloseTo(0.4, 12);
    expect(() => normaliseSpec({ ...minimal, bin: { ...minimal.bin, patchLoadMethod: 'even' } })).toThrowError('bin.patchLoadMethod must be one of patch, uniform-increase');
  });

  it('takes wheat from EN 1991-4 Table E.1 (upper unit weight 9.0 kN/m3, K_m 0.54, mu_m D2 0.38)', () => {
    // EN 1991-4:2006 Annex E, Table E.1, row 'wheat'.
    const { solid } = normaliseSpec(minimal);
    expect(solid.unitWeight).toBeCloseTo(9000, 9);
    expect(solid.unitWeightLower).toBeCloseTo(7500, 9);
    expect(solid.lateralPressureRatio).toBe(0.54);
    expect(solid.lateralPressureRatioFactor).toBe(1.11);
    expect(solid.wallFrictionCoefficient).toBe(0.38);
    expect(solid.wallFrictionFactor).toBe(1.16);
    expect(solid.sources.unitWeight).toContain('Table E.1');
  });

  it('applies user overrides and records them as user input', () => {
    const spec = normaliseSpec({ ...minimal, solid: { name: 'wheat', wallSurface: 'D3', unitWeight: 8.5, lateralPressureRatio: 0.6 } });
    expect(spec.solid.unitWeight).toBeCloseTo(8500, 9);
    expect(spec.solid.lateralPressureRatio).toBe(0.6);
    expect(spec.solid.wallFrictionCoefficient).toBe(0.57);
    expect(spec.solid.sources.unitWeight).toMatch(/user input/);
  });

  it('names the field, the range and the unit of an out-of-range input', () => {
    const error = errorOf(withBin({ hopper: { apexHalfAngle: 75, outletDiameter: 0.4, thickness: 8 } }));
    expect(error.code).toBe('INVALID_INPUT');
    expect(error.path).toBe('bin.hopper.apexHalfAngle');
    expect(error.message).toBe('bin.hopper.apexHalfAngle must be a number between 5 and 60 degrees; got 75');
  });

  it('rejects text where a number belongs, NaN, and missing required fields', () => {
    expect(errorOf(withBin({ diameter: '6 m' })).message).toBe("bin.diameter must be a number between 1 and 60 m; got '6 m'");
    expect(errorOf(withBin({ diameter: Number.NaN })).path).toBe('bin.diameter');
    const missing = errorOf({ ...minimal, bin: { ...minimal.bin, cylinderHeight: undefined } });
    expect(missing.message).toBe('bin.cylinderHeight is required (a number between 0.5 and 100 m)');
  });

  it('rejects unknown keys by name, so a misspelt input is never ignored', () => {
    const error = errorOf(withBin({ diamter: 6 }));
    expect(error.path).toBe('bin.diamter');
    expect(error.message).toMatch(/bin.diamter is not an input/);
  });

  it('checks fields against each other', () => {
    expect(errorOf(withBin({ fillHeight: 13 })).path).toBe('bin.fillHeight');
    expect(errorOf(withBin({ hopper: { apexHalfAngle: 30, outletDiameter: 5.8, thickness: 8 } })).path).toBe('bin.hopper.outletDiameter');
    // EN 1991-4 1.1.2(3) scope: h_b / d_c < 10 (from memory).
    expect(errorOf(withBin({ diameter: 2, cylinderHeight: 40 })).message).toMatch(/h_b\/d_c below 10/);
  });

  it('rejects an unknown solid, naming the built-in ones', () => {
    const error = errorOf({ ...minimal, solid: { name: 'gravel' } });
    expect(error.code).toBe('UNKNOWN_SOLID');
    expect(error.message).toMatch(/solid.name must be one of the built-in solids \(wheat, maize/);
  });
});

describe('parseSpecText', () => {
  it('reads YAML and JSON to the same document', () => {
    const yaml = 'project:\n  name: Test\nsupport:\n  columns: 8\n';
    expect(parseSpecText(yaml, 'yaml')).toEqual(parseSpecText(JSON.stringify({ project: { name: 'Test' }, support: { columns: 8 } }), 'json'));
  });

  it('reports malformed YAML and JSON with the source name', () => {
    expect(() => parseSpecText('project: [unclosed', 'yaml', 'a.yaml')).toThrowError(/a.yaml is not valid YAML/);
    expect(() => parseSpecText('{"project": ', 'json', 'a.json')).toThrowError(/a.json is not valid JSON/);
    expect(() => parseSpecText('a: 1\na: 2\n', 'yaml', 'dup.yaml')).toThrowError(/dup.yaml is not valid YAML/);
  });
});

describe('other actions', () => {
  it('converts roof, snow, wind, seismic and equipment inputs to SI', () => {
    const spec = normaliseSpec({
      ...minimal,
      roof: { deadLoad: 0.5, imposedLoad: 0.6, pitch: 15 },
      snow: { groundLoad: 1.2 },
      wind: { basicVelocity: 26, terrainCategory: 'II', supportLevelHeight: 6, directions: [0, 90] },
      seismic: { horizontalCoefficient: 0.1 },
      equipment: [{ name: 'filter', angle: 45, radius: 2, force: 20 }],
    });
    expect(spec.roof).toEqual({ deadLoad: 500, imposedLoad: 600, pitch: (15 * Math.PI) / 180 });
    expect(spec.snow).toEqual({ groundLoad: 1200, exposureCoefficient: 1, thermalCoefficient: 1 });
    expect(spec.wind?.directions).toEqual([0, Math.PI / 2]);
    expect(spec.seismic).toEqual({ horizontalCoefficient: 0.1, effectiveSolidMassFraction: 0.8 });
    expect(spec.equipment).toEqual([{ name: 'filter', angle: Math.PI / 4, radius: 2, force: 20000, kind: 'permanent' }]);
  });

  it('names the field, range and unit of a bad action input', () => {
    expect(errorOf({ ...minimal, wind: { basicVelocity: 90, terrainCategory: 'II', supportLevelHeight: 6 } }).message).toBe('wind.basicVelocity must be a number between 10 and 60 m/s; got 90');
    expect(errorOf({ ...minimal, equipment: [{ name: 'x', angle: 0, radius: 2, force: -3 }] }).message).toBe('equipment[0].force must be a number between 0 and 10000 kN; got -3');
  });
});

describe('support types', () => {
  it('a ring on a slab needs no columns and defaults to the slab contact scenario', () => {
    const spec = normaliseSpec({ ...minimal, support: { type: 'ring-on-slab', bearingModulus: 150 } });
    expect(spec.support.columns).toBe(1);
    expect(spec.support.segmentsPerSpan).toBe(192);
    expect(spec.support.bearingModulus).toBe(150e6);
    expect(spec.support.credibleScenarios).toEqual(['slab-contact']);
    expect(normaliseSpec(minimal).support.credibleScenarios).toEqual(['column-cap-contact']);
  });

  it('names what does not fit the support type', () => {
    expect(errorOf({ ...minimal, support: { type: 'ring-on-columns' } }).path).toBe('support.columns');
    expect(errorOf({ ...minimal, support: { columns: 8, credibleScenarios: ['slab-contact'] } }).message).toBe("support.credibleScenarios[0] 'slab-contact' does not apply to support.type ring-on-columns");
    expect(errorOf({ ...minimal, support: { type: 'ring-on-slab', credibleScenarios: ['slab-anchored'] } }).path).toBe('support.anchorCapacity');
  });

  it('limits the girder model to 2880 segments, naming the input and the largest count per span', () => {
    expect(normaliseSpec({ ...minimal, support: { columns: 24, segmentsPerSpan: 120 } }).support.segmentsPerSpan).toBe(120);
    const error = errorOf({ ...minimal, support: { columns: 36, segmentsPerSpan: 120 } });
    expect(error.path).toBe('support.segmentsPerSpan');
    expect(error.message).toBe('support.segmentsPerSpan gives 36 x 120 = 4320 girder segments; at most 2880 (a whole number of segments per span between 2 and 80 for 36 columns)');
  });
});

describe('YAML that is not plain data', () => {
  it('refuses custom tags instead of warning and going on', () => {
    expect(() => parseSpecText('project: !custom {name: x}\n', 'yaml', 'tag.yaml')).toThrowError(/tag.yaml is not valid YAML/);
  });

  it('refuses an alias bomb (billion laughs) by its alias count', () => {
    const bomb = ['a: &a [x, x, x, x, x, x, x, x, x, x]', ...Array.from({ length: 8 }, (_, i) => `${String.fromCharCode(98 + i)}: &${String.fromCharCode(98 + i)} [${Array(10).fill(`*${String.fromCharCode(97 + i)}`).join(', ')}]`)].join('\n');
    expect(() => parseSpecText(bomb, 'yaml', 'bomb.yaml')).toThrowError(/bomb.yaml is not valid YAML/);
  });
});
