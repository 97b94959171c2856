import { describe, expect, it } from 'vitest';
import { normaliseSpec, readDocumentFile, SpecError } from '@binsupport/spec';
import { rolledSection } from '@binsupport/steel';
import { designFromSpec } from './design.js';

const demoPath = new URL('../../../demo-data/kestrel-grain-bin.yaml', import.meta.url).pathname;

describe('bearing stiffeners over the columns', () => {
  it('replace patch loading and the flange cantilever at the caps by their own checks, and their steel is counted', async () => {
    const document = (await readDocumentFile(demoPath)) as { support: Record<string, unknown> };
    const plain = (await designFromSpec(normaliseSpec(document))).result;
    document.support['bearingStiffenerThickness'] = 15;
    const spec = normaliseSpec(document);
    const { result } = await designFromSpec(spec);
    expect(result.status).toBe('verified');
    const girder = result.members.find((member) => member.id === 'RG');
    const stiffeners = result.members.find((member) => member.id === 'ST');
    if (!girder || !stiffeners) throw new Error('members missing');
    // Mass of the pairs: n columns x 2 plates x b_s t_s h_w x rho, b_s = (b - t_w)/2 - 10 mm (input reference).
    const dims = result.utilisations.find((row) => row.member === 'ST' && row.check === 'stiffener-buckling')?.inputs ?? {};
    const bs = dims['b_s'] as number;
    const ts = dims['t_s'] as number;
    const hw = dims['h_w'] as number;
    expect(ts).toBeCloseTo(0.015, 12);
    const dimensions = rolledSection(girder.section).dimensions;
    expect(bs).toBeCloseTo((dimensions.flangeWidth - dimensions.webThickness) / 2 - 0.01, 12);
    expect(hw).toBeCloseTo(dimensions.depth - 2 * dimensions.flangeThickness, 12);
    expect(stiffeners.mass).toBeCloseTo(8 * 2 * bs * ts * hw * spec.bin.steelDensity, 9);
    expect(stiffeners.section).toBe(`FL 15 x ${(bs * 1000).toFixed(0)}`);
    expect(result.totals.steelMass).toBeCloseTo(result.members.reduce((sum, member) => sum + member.mass, 0), 6);
    // the cap checks of an unstiffened web are gone; the stiffener checks are there for every combination
    expect(result.utilisations.filter((row) => row.member === 'RG' && (row.check === 'patch-loading' || row.check === 'flange-local-bending'))).toEqual([]);
    expect(new Set(result.utilisations.filter((row) => row.member === 'ST').map((row) => row.check))).toEqual(new Set(['stiffener-bearing', 'stiffener-buckling']));
    expect(stiffeners.utilisation).toBeLessThanOrEqual(1);
    // on the demo the unstiffened girder is governed by the flange under the cap: stiffeners make it lighter
    expect(plain.members.find((member) => member.id === 'RG')?.governing.check).toBe('flange-local-bending');
    expect(result.totals.steelMass).toBeLessThan(plain.totals.steelMass);
  });

  it('are refused on a slab, and a width without a thickness is refused, naming the input', () => {
    const base = { project: { name: 'x (invented)' }, bin: { diameter: 6, cylinderHeight: 12, wallThickness: 6, hopper: { apexHalfAngle: 30, outletDiameter: 0.4, thickness: 8 } }, solid: { name: 'wheat' } };
    expect(() => normaliseSpec({ ...base, support: { type: 'ring-on-slab', bearingStiffenerThickness: 12 } })).toThrow(SpecError);
    expect(() => normaliseSpec({ ...base, support: { type: 'ring-on-slab', bearingStiffenerThickness: 12 } })).toThrow(/support\.bearingStiffenerThickness applies to a ring on columns/);
    expect(() => normaliseSpec({ ...base, support: { columns: 8, bearingStiffenerWidth: 100 } })).toThrow(/support\.bearingStiffenerWidth needs support\.bearingStiffenerThickness/);
    expect(() => normaliseSpec({ ...base, support: { columns: 8, bearingStiffenerThickness: 4 } })).toThrow(/support\.bearingStiffenerThickness must be a number between 6 and 50 mm/);
  });
});
