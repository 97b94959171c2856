import { describe, expect, it } from 'vitest';
import { normaliseSpec, type BinSpecInput } from '@binsupport/spec';
import { STANDARD_GRAVITY } from '@binsupport/loads';
import { rolledSection, steelGrade } from '@binsupport/steel';
import { columnChecks, columnDemands } from './columns.js';
import { analyseSection, designContext } from './design.js';
import { SCENARIOS } from './scenarios.js';

// An invented bin (test data only), symmetric about its axis.
const input: BinSpecInput = {
  project: { name: 'Column test bin (invented)', date: '2026-12-01' },
  bin: { diameter: 6, cylinderHeight: 12, wallThickness: 6, hopper: { apexHalfAngle: 30, outletDiameter: 0.4, thickness: 8 } },
  solid: { name: 'wheat' },
  support: { columns: 8, segmentsPerSpan: 12, columnHeight: 4 },
};

describe('columns from the bearing reactions', () => {
  const spec = normaliseSpec(input);
  const context = designContext(spec, 3);
  const girder = rolledSection('IPE 400');
  const column = rolledSection('HE 200 B');
  const grade = steelGrade('S355');
  const H = spec.support.columnHeight;
  const scenarios = SCENARIOS.filter((s) => s.id === 'column-cap-contact' || s.id === 'columns-under-web');
  const state = analyseSection(context, girder, scenarios, new Set(['SLS-1', 'ULS-1']));
  const cases = state.scenarios.flatMap(({ scenario, model, analyses }) => analyses.map((analysis) => ({ scenario: scenario.id, model, analysis })));
  const demands = columnDemands(context.loads, context.layout, cases);

  it('N = the column reaction (statics: the reactions sum to the applied load; symmetry: 1/n each under G + Q_s,f)', () => {
    for (const item of cases) {
      const own = demands.filter((d) => d.combination === item.analysis.combination && d.scenario === item.scenario);
      expect(own).toHaveLength(spec.support.columns);
      const applied = -item.analysis.appliedSum[2];
      expect(own.reduce((sum, d) => sum + d.compression, 0) / applied).toBeCloseTo(1, 6);
      if (item.analysis.combination === 'SLS-1') for (const d of own) expect(d.compression / (applied / spec.support.columns)).toBeCloseTo(1, 6);
      // A point support under the web has no lever: no moment in the column.
      if (item.scenario === 'columns-under-web') for (const d of own) expect(d.moment).toBe(0);
    }
  });

  it('flexural buckling about z uses L_cr = H (pinned-pinned, Euler N_cr = pi^2 E I_z / H^2) and N at the base = reaction + gamma_G x own weight', () => {
    const uls = demands.filter((d) => d.combination === 'ULS-1');
    const envelopes = columnChecks(column, grade, H, uls);
    const buckling = envelopes.filter((e) => e.check.id === 'flexural-buckling');
    expect(buckling.length).toBeGreaterThan(0);
    for (const { check } of buckling) {
      expect(check.intermediate['L_cr_z']).toBe(H);
      expect(check.intermediate['N_cr_z']).toBeCloseTo((Math.PI ** 2 * grade.youngsModulus * column.properties.secondMomentOfAreaZ) / H ** 2, 3);
      const ownWeight = column.properties.massPerMetre * H * STANDARD_GRAVITY;
      expect(check.inputs['gamma_G G_column']).toBeCloseTo(1.35 * ownWeight, 9);
      expect(-(check.inputs['N'] ?? 0)).toBeCloseTo((check.inputs['N_top (compression)'] ?? 0) + 1.35 * ownWeight, 6);
      expect(check.utilisation).toBeCloseTo(-(check.inputs['N'] ?? 0) / Math.min(check.intermediate['N_b_y_Rd'] ?? 0, check.intermediate['N_b_z_Rd'] ?? 0), 9);
    }
    const interaction = envelopes.filter((e) => e.check.id === 'bending-axial-interaction');
    // The cap moment falls linearly to zero at the pinned base: psi = 0, C_my = 0.6 (EN 1993-1-1 Table B.3).
    for (const { check } of interaction) expect(check.inputs['C_my']).toBe(0.6);
  });
});
