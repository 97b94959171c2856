import { describe, expect, it } from 'vitest';
import { normaliseSpec, readDocumentFile } from '@binsupport/spec';
import { checkBoltedFlangeTension, rolledSection, steelGrade, strengthsForThickness } from '@binsupport/steel';
import { designFromSpec } from './design.js';
import { DesignError } from './errors.js';
import { capPointOffsets } from './ring.js';

const demoPath = new URL('../../../demo-data/kestrel-grain-bin.yaml', import.meta.url).pathname;

/** The demo bin with a 15 m cylinder: empty and in wind it lifts off its column caps (EQU). */
async function tallBin(bolts?: Record<string, unknown>) {
  const document = (await readDocumentFile(demoPath)) as { bin: Record<string, unknown>; support: Record<string, unknown> };
  document.bin['cylinderHeight'] = 15;
  document.support['segmentsPerSpan'] = 12;
  if (bolts) document.support['capBolts'] = bolts;
  return normaliseSpec(document);
}

describe('cap bolts: the girder held down on its column caps', () => {
  it('puts the bolt lines among the cap points (merged with a point within 1 mm)', () => {
    // 5 points over b = 0.3 m stand at 0, +-75, +-150 mm; bolts at +-75 mm take those two points.
    expect(capPointOffsets(5, 0.3, 0.075).map((point) => [point.across, point.bolted])).toEqual([
      [-0.15, false],
      [-0.075, true],
      [0, false],
      [0.075, true],
      [0.15, false],
    ]);
    expect(capPointOffsets(5, 0.3, 0.1).filter((point) => point.bolted).map((point) => point.across)).toEqual([-0.1, 0.1]);
    expect(capPointOffsets(5, 0.3, 0.1)).toHaveLength(7);
  });

  it('a bin that lifts off its plain caps is refused, naming support.capBolts; with bolts it is designed and the bolts are checked under EQU', async () => {
    const plain = await tallBin();
    const refusal = await designFromSpec(plain).then(
      () => undefined,
      (error: unknown) => error,
    );
    expect(refusal).toBeInstanceOf(DesignError);
    expect((refusal as DesignError).message).toContain('support.capBolts');

    const spec = await tallBin({ perCap: 4, size: 'M20', boltClass: '8.8' });
    expect(spec.support.credibleScenarios).toEqual(['column-cap-bolted']);
    const { result } = await designFromSpec(spec);
    expect(result.status).toBe('verified');
    const rows = result.utilisations.filter((row) => row.check === 'cap-bolts');
    expect(rows.length).toBeGreaterThan(0);
    // Uplift is an equilibrium question: the bolts' worst case is an EQU combination of the empty
    // bin in wind (EN 1990 6.4.1(1)a), and some bolt line is in tension.
    const worst = rows.reduce((a, b) => ((b.utilisation ?? 0) > (a.utilisation ?? 0) ? b : a));
    expect(worst.combination.startsWith('EQU')).toBe(true);
    expect(worst.inputs?.['tension']).toBeGreaterThan(0);
    expect(worst.utilisation).toBeLessThanOrEqual(1);
    // Trace: the row's inputs give its utilisation again through the steel check alone.
    const girder = result.members.find((member) => member.id === 'RG');
    if (!girder) throw new Error('no girder member');
    const section = rolledSection(girder.section);
    const grade = steelGrade(girder.grade);
    const strengths = strengthsForThickness(grade, section.dimensions.flangeThickness);
    const again = checkBoltedFlangeTension({
      bolt: { size: 'M20', boltClass: '8.8' },
      bolts: 2,
      tension: worst.inputs?.['tension'] as number,
      gauge: worst.inputs?.['gauge'] as number,
      capLength: spec.support.capPlateLength,
      flangeWidth: section.dimensions.flangeWidth,
      flangeThickness: section.dimensions.flangeThickness,
      webThickness: section.dimensions.webThickness,
      rootRadius: section.dimensions.rootRadius,
      flangeYieldStrength: strengths.yieldStrength,
      flangeUltimateStrength: strengths.ultimateStrength,
    });
    expect(again.utilisation).toBeCloseTo(worst.utilisation ?? Number.NaN, 12);
    // Default gauge: the middle of the flat outstand, (t_w/2 + r + b/2) / 2.
    expect(worst.inputs?.['gauge']).toBeCloseTo((section.dimensions.webThickness / 2 + section.dimensions.rootRadius + section.dimensions.flangeWidth / 2) / 2, 12);
    // The unbolted bearing is not the detail designed, so it is not among the reported scenarios.
    expect(result.scenarios.map((scenario) => scenario.id)).not.toContain('column-cap-contact');
  }, 120_000);

  it('refuses the bolted scenario without bolts, an odd bolt count and bolts on a slab, naming the input', async () => {
    const document = (await readDocumentFile(demoPath)) as { support: Record<string, unknown> };
    const errorOf = (support: Record<string, unknown>) => {
      try {
        normaliseSpec({ ...document, support: { ...document.support, ...support } });
      } catch (error) {
        return error as { path: string; message: string };
      }
      throw new Error('accepted');
    };
    expect(errorOf({ credibleScenarios: ['column-cap-bolted'] }).path).toBe('support.capBolts');
    expect(errorOf({ capBolts: { perCap: 3 } }).message).toBe('support.capBolts.perCap must be an even number of bolts (half each side of the web) between 2 and 16; got 3');
    expect(errorOf({ type: 'ring-on-slab', columns: undefined, segmentsPerSpan: undefined, capBolts: { perCap: 4 } }).path).toBe('support.capBolts');
  });
});
