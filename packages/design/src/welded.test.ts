import { describe, expect, it } from 'vitest';
import { normaliseSpec, readDocumentFile } from '@binsupport/spec';
import { weldedISection } from '@binsupport/steel';
import { designFromSpec } from './design.js';
import { DesignError } from './errors.js';

const demoPath = new URL('../../../demo-data/kestrel-grain-bin.yaml', import.meta.url).pathname;
// Welded girders 400-600 mm deep, 200-250 mm wide, flanges 20 or 25 mm, webs 8 or 10 mm: 40 candidates.
const limits = { minDepth: 400, maxDepth: 600, depthStep: 50, minFlangeWidth: 200, maxFlangeWidth: 250, flangeThicknesses: [20, 25], webThicknesses: [8, 10] };

async function demo(patch: (document: Record<string, Record<string, unknown>>) => void) {
  const document = (await readDocumentFile(demoPath)) as Record<string, Record<string, unknown>>;
  patch(document);
  // One design at the model's column stiffness: more candidates can only help at a fixed model
  // (the column iteration may reach another fixed point).
  return (await designFromSpec(normaliseSpec(document), { columnStiffnessRounds: 1 })).result;
}

describe('welded plate girders as girder candidates', () => {
  it('never make the optimum dearer (more candidates), and here a stocky welded girder wins', async () => {
    const rolled = await demo(() => undefined);
    const welded = await demo((document) => {
      (document['support'] as Record<string, unknown>)['weldedGirders'] = limits;
    });
    expect(welded.status).toBe('verified');
    expect(welded.optimisation.objectiveValue ?? Infinity).toBeLessThanOrEqual((rolled.optimisation.objectiveValue ?? 0) + 1e-6);
    const girder = welded.members.find((member) => member.id === 'RG');
    const plates = /^WI (\d+)x(\d+)x(\d+)x(\d+)$/.exec(girder?.section ?? '');
    expect(plates, girder?.section).not.toBeNull();
    const [h, b, tw, tf] = (plates as RegExpExecArray).slice(1).map((value) => Number(value) / 1000) as [number, number, number, number];
    // its mass is that of its plates (steel package; 7850 kg/m3, EN 1993-1-1 3.2.6)
    expect(girder?.massPerLength).toBeCloseTo(weldedISection({ depth: h, flangeWidth: b, webThickness: tw, flangeThickness: tf }).properties.massPerMetre, 9);
    expect(girder?.massPerLength).toBeCloseTo((2 * b * tf + (h - 2 * tf) * tw) * 7850, 6);
    expect(girder?.utilisation).toBeLessThanOrEqual(1);
  });

  it('cost their fabrication: at three times the price per kg the rolled design is the cheaper again', async () => {
    const rolled = await demo(() => undefined);
    const dear = await demo((document) => {
      (document['support'] as Record<string, unknown>)['weldedGirders'] = limits;
      document['optimisation'] = { weldedPriceFactor: 3 };
    });
    expect(dear.members.find((member) => member.id === 'RG')?.section).toBe(rolled.members.find((member) => member.id === 'RG')?.section);
    expect(dear.optimisation.objectiveValue).toBeCloseTo(rolled.optimisation.objectiveValue ?? 0, 6);
  });

  it('refuses limits that give more candidates than the design will consider, naming the input', async () => {
    const document = (await readDocumentFile(demoPath)) as Record<string, Record<string, unknown>>;
    (document['support'] as Record<string, unknown>)['weldedGirders'] = { minDepth: 300, maxDepth: 900, minFlangeWidth: 150, maxFlangeWidth: 400, flangeThicknesses: [10, 12, 15, 20, 25], webThicknesses: [6, 8, 10] };
    const error = await designFromSpec(normaliseSpec(document)).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(DesignError);
    expect((error as DesignError).path).toBe('support.weldedGirders');
    expect((error as DesignError).message).toMatch(/gives 1170 welded girders; at most 800/);
  });
});
