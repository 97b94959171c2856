import { describe, expect, it } from 'vitest';
import { designGeneratedBins, pipelineRuns } from './pipeline-property.js';

// Half of the whole-pipeline fuzz cases (see pipeline-property.ts: invariants, common practice for
// property-based tests, no published values), seed 20261202.
describe('whole pipeline on generated bins (a)', () => {
  it(`designs ${pipelineRuns} generated specs: verified, reported infeasible, or refused with a reason; never a crash`, async () => {
    const summary = await designGeneratedBins(pipelineRuns, 20261202);
    console.log(summary);
    expect(summary).toMatch(/generated bins/);
  }, 900_000);
});
