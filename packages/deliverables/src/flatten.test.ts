import { describe, expect, it } from 'vitest';
import { flattenJson } from './flatten.js';

describe('flattenJson', () => {
  it('lists leaves with dotted paths and array indices, in document order', () => {
    const input = { bin: { diameter: 6, hopper: { apexHalfAngle: 0.61 } }, columns: [{ angle: 0 }, { angle: 0.785 }], name: 'TB-1', anchored: false, note: null };
    expect(flattenJson(input)).toEqual([
      { path: 'bin.diameter', value: 6 },
      { path: 'bin.hopper.apexHalfAngle', value: 0.61 },
      { path: 'columns[0].angle', value: 0 },
      { path: 'columns[1].angle', value: 0.785 },
      { path: 'name', value: 'TB-1' },
      { path: 'anchored', value: false },
      { path: 'note', value: null },
    ]);
  });

  it('keeps empty containers and drops what JSON cannot carry', () => {
    expect(flattenJson({ grades: [], options: {}, skipped: undefined })).toEqual([
      { path: 'grades', value: '[]' },
      { path: 'options', value: '{}' },
    ]);
    expect(flattenJson(undefined)).toEqual([]);
  });
});
