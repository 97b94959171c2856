import fc from 'fast-check';
import { expect } from 'vitest';
import { designFromSpec, DesignError, stableJson } from '@binsupport/design';
import { normaliseSpec, SpecError } from '@binsupport/spec';

// The whole pipeline on generated bins (the property of pipeline-*.fuzz.test.ts): every valid spec
// gives a design that is verified, or reported infeasible, or a refusal that names its reason (a
// guard, an analysis, an input beyond a standard's scope); never a crash, never a non-finite number
// in design.json, never a verified design with a member over its limit. Coarse meshes keep a case
// near 0.25 s (the mesh guard then checks each answer against twice the segments). Property-based
// testing with fast-check; the two test files run halves of the cases with their own fixed seeds.
// The checks are invariants, not published values (common practice for property-based tests):
// utilisation <= 1 is the definition of a passing check (EN 1993-1-1 6.1), the guards' limits are
// their own documented tolerances (mesh 2 %, re-analysis 1e-9).
/** Cases per test file: 500 each in CI (1000 in all); PIPELINE_FUZZ_RUNS or the soak's FUZZ_RUNS raise it. */
export const pipelineRuns = Number(process.env['PIPELINE_FUZZ_RUNS'] ?? (process.env['FUZZ_RUNS'] ? 1500 : 500));
const solids = ['wheat', 'maize', 'barley', 'sugar', 'soya-beans', 'cement-clinker', 'sand', 'coal', 'fly-ash', 'flour', 'limestone-powder'];

const round = (value: number, digits: number): number => Number(value.toFixed(digits));

export const specDocument = fc
  .record({
    diameter: fc.double({ min: 3, max: 12, noNaN: true }),
    slenderness: fc.double({ min: 0.6, max: 3.5, noNaN: true }),
    wallThickness: fc.integer({ min: 4, max: 12 }),
    apexHalfAngle: fc.integer({ min: 20, max: 45 }),
    outletDiameter: fc.double({ min: 0.2, max: 0.8, noNaN: true }),
    hopperThickness: fc.integer({ min: 5, max: 14 }),
    solid: fc.constantFrom(...solids),
    wallSurface: fc.constantFrom('D1', 'D2', 'D3'),
    onSlab: fc.boolean(),
    columns: fc.integer({ min: 4, max: 12 }),
    segmentsPerSpan: fc.integer({ min: 6, max: 8 }),
    slabSegments: fc.constantFrom(96, 128),
    columnHeight: fc.double({ min: 3, max: 8, noNaN: true }),
    grade: fc.constantFrom('S275', 'S355', 'S460'),
    roof: fc.option(fc.record({ deadLoad: fc.double({ min: 0.2, max: 1, noNaN: true }), imposedLoad: fc.double({ min: 0.3, max: 1.5, noNaN: true }), pitch: fc.integer({ min: 5, max: 30 }) }), { nil: undefined }),
    snow: fc.option(fc.double({ min: 0.3, max: 2.5, noNaN: true }), { nil: undefined }),
    wind: fc.option(fc.record({ basicVelocity: fc.integer({ min: 20, max: 32 }), terrainCategory: fc.constantFrom('I', 'II', 'III', 'IV'), supportLevelHeight: fc.integer({ min: 2, max: 10 }) }), { nil: undefined }),
    equipment: fc.option(fc.record({ angle: fc.integer({ min: 0, max: 359 }), radiusFraction: fc.double({ min: 0, max: 0.9, noNaN: true }), force: fc.double({ min: 1, max: 40, noNaN: true }) }), { nil: undefined }),
  })
  .map((draw) => {
    const diameter = round(draw.diameter, 2);
    const document: Record<string, unknown> = {
      project: { name: 'Generated bin (invented, fuzz test)' },
      bin: {
        diameter,
        cylinderHeight: round(diameter * draw.slenderness, 2),
        wallThickness: draw.wallThickness,
        hopper: { apexHalfAngle: draw.apexHalfAngle, outletDiameter: round(draw.outletDiameter, 2), thickness: draw.hopperThickness },
      },
      solid: { name: draw.solid, wallSurface: draw.wallSurface },
      support: draw.onSlab
        ? { type: 'ring-on-slab', segments: draw.slabSegments, grade: draw.grade }
        : { type: 'ring-on-columns', columns: draw.columns, segmentsPerSpan: draw.segmentsPerSpan, columnHeight: round(draw.columnHeight, 2), grade: draw.grade },
    };
    if (draw.roof) document['roof'] = { deadLoad: round(draw.roof.deadLoad, 2), imposedLoad: round(draw.roof.imposedLoad, 2), pitch: draw.roof.pitch };
    if (draw.snow !== undefined) document['snow'] = { groundLoad: round(draw.snow, 2) };
    if (draw.wind) document['wind'] = { ...draw.wind, directions: [0] };
    if (draw.equipment) document['equipment'] = [{ name: 'generated unit', angle: draw.equipment.angle, radius: round((draw.equipment.radiusFraction * diameter) / 2, 2), force: round(draw.equipment.force, 1) }];
    return document;
  });

/** Design `runs` generated specs with a fixed seed and check the property of each; returns the summary line. */
export async function designGeneratedBins(runs: number, seed: number): Promise<string> {
    const outcomes = { verified: 0, infeasible: 0, refused: 0, outOfScope: 0 };
    const reasons = new Map<string, number>();
    await fc.assert(
      fc.asyncProperty(specDocument, async (document) => {
        let spec;
        try {
          spec = normaliseSpec(document);
        } catch (error) {
          // A generated bin outside the standard's scope (h_b/d_c, outlet size): refused by name.
          expect(error).toBeInstanceOf(SpecError);
          expect((error as SpecError).path).not.toBe('');
          outcomes.outOfScope += 1;
          return;
        }
        try {
          const { result } = await designFromSpec(spec);
          // design.json is writable: no NaN or infinite number anywhere (stableJson refuses them).
          expect(() => stableJson(result)).not.toThrow();
          expect(['verified', 'infeasible']).toContain(result.status);
          expect(result.guards?.meshConvergence.relativeChange).toBeLessThanOrEqual(0.02);
          expect(result.guards?.reanalysis.relativeDifference).toBeLessThanOrEqual(1e-9);
          if (result.status === 'verified') {
            for (const member of result.members) expect(member.utilisation ?? Infinity, `${member.id} ${member.section}`).toBeLessThanOrEqual(1);
            outcomes.verified += 1;
          } else {
            expect(result.optimisation.message).toMatch(/no candidate section passes/);
            outcomes.infeasible += 1;
          }
        } catch (error) {
          if (!(error instanceof DesignError)) throw error;
          expect(['GUARD_FAILED', 'ANALYSIS_FAILED', 'BAD_INPUT']).toContain(error.code);
          expect(error.message.length).toBeGreaterThan(20);
          outcomes.refused += 1;
          const reason = /mesh-convergence guard/.test(error.message) ? 'mesh not converged' : /lifts off/.test(error.message) ? 'the bin lifts off its supports' : error.message.slice(0, 80);
          reasons.set(reason, (reasons.get(reason) ?? 0) + 1);
        }
      }),
      { numRuns: runs, seed, endOnFailure: true },
    );
    const refusals = [...reasons].sort((a, b) => b[1] - a[1]).map(([reason, count]) => `${count} ${reason}`).join('; ');
    // The generator is meant to make designable bins: most must be designed, not refused.
    expect(outcomes.verified + outcomes.infeasible).toBeGreaterThan(runs / 2);
    return `pipeline fuzz (seed ${seed}): ${runs} generated bins: ${outcomes.verified} verified, ${outcomes.infeasible} infeasible, ${outcomes.refused} refused with a reason (${refusals || 'none'}), ${outcomes.outOfScope} outside the standard's scope`;
}
