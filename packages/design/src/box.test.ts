import { describe, expect, it } from 'vitest';
import { normaliseSpec, readDocumentFile } from '@binsupport/spec';
import { weldedBoxSection } from '@binsupport/steel';
import { designFromSpec } from './design.js';

const demoPath = new URL('../../../demo-data/kestrel-grain-bin.yaml', import.meta.url).pathname;
// Welded boxes 300-450 mm deep, 250-350 mm wide, flanges 10/12/15 mm, webs 6/8 mm, 20 mm outstands.
const boxes = { minDepth: 300, maxDepth: 450, minFlangeWidth: 250, maxFlangeWidth: 350, flangeThicknesses: [10, 12, 15], webThicknesses: [6, 8] };

async function demo(patch: (support: Record<string, unknown>) => void) {
  const document = (await readDocumentFile(demoPath)) as { support: Record<string, unknown> };
  document.support['segmentsPerSpan'] = 12;
  patch(document.support);
  // One design at the model's column stiffness: more candidates can only help at a fixed model.
  return (await designFromSpec(normaliseSpec(document), { columnStiffnessRounds: 1 })).result;
}

describe('welded box girders as girder candidates', () => {
  it('never make the optimum dearer, and the box chosen weighs its plates and is checked per web over the columns', async () => {
    const rolled = await demo(() => undefined);
    const withBoxes = await demo((support) => {
      support['weldedBoxes'] = boxes;
    });
    expect(withBoxes.status).toBe('verified');
    expect(withBoxes.optimisation.objectiveValue ?? Infinity).toBeLessThanOrEqual((rolled.optimisation.objectiveValue ?? 0) + 1e-6);
    const girder = withBoxes.members.find((member) => member.id === 'RG');
    const plates = /^WB (\d+)x(\d+)x(\d+)x(\d+)$/.exec(girder?.section ?? '');
    // The demo girder works in torsion: a closed cell carries it far more cheaply than an open I.
    expect(plates, girder?.section).not.toBeNull();
    const [h, b, tw, tf] = (plates as RegExpExecArray).slice(1).map((value) => Number(value) / 1000) as [number, number, number, number];
    // mass of the plates: two flanges b t_f and two webs (h - 2 t_f) t_w at 7850 kg/m3 (EN 1993-1-1 3.2.6)
    expect(girder?.massPerLength).toBeCloseTo((2 * b * tf + 2 * (h - 2 * tf) * tw) * 7850, 6);
    expect(girder?.massPerLength).toBeCloseTo(weldedBoxSection({ depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf, flangeOutstand: 0.02 }).properties.massPerMetre, 9);
    for (const row of withBoxes.utilisations.filter((r) => r.member === 'RG')) expect(row.utilisation ?? Infinity).toBeLessThanOrEqual(1);
    // Over a column each web takes half the reaction (symmetric box): the patch check says so.
    const patch = withBoxes.utilisations.filter((row) => row.check === 'patch-loading');
    expect(patch.length).toBeGreaterThan(0);
    for (const row of patch) {
      expect(row.inputs?.['webs']).toBe(2);
      expect(row.inputs?.['b_f']).toBeCloseTo(b / 2, 12);
    }
  }, 180_000);
});
