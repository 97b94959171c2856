import { describe, expect, it } from 'vitest';
import { normaliseSpec, readSpecFile, type BinSpecInput } from '@binsupport/spec';
import { rolledSection, steelGrade } from '@binsupport/steel';
import { analyseSection, designContext, designFromSpec, serviceabilityCombinations, sizingCombinations } from './design.js';
import { columnReactions, forceChecks } from './girder-checks.js';
import { SCENARIOS } from './scenarios.js';

// An invented bin (test data only) with no wind, roof, snow or equipment: every combination is
// symmetric about the bin axis.
const symmetric: BinSpecInput = {
  project: { name: 'Symmetric test bin (invented)', date: '2026-12-01' },
  bin: { diameter: 6, cylinderHeight: 12, wallThickness: 6, hopper: { apexHalfAngle: 30, outletDiameter: 0.4, thickness: 8 } },
  solid: { name: 'wheat' },
  support: { columns: 8, segmentsPerSpan: 12 },
};

const demoPath = new URL('../../../demo-data/kestrel-grain-bin.yaml', import.meta.url).pathname;

describe('web over the column caps (EN 1993-1-5 6, F_Ed from the column reaction)', () => {
  it('each column carries 1/n of a symmetric load (symmetry), the reactions sum to the applied load (statics), and F_Ed is the column reaction', () => {
    const spec = normaliseSpec(symmetric);
    const context = designContext(spec, 3);
    const section = rolledSection('IPE 400');
    const n = spec.support.columns;
    const cap = SCENARIOS.filter((s) => s.id === 'column-cap-contact');
    // SLS-1 = G + Q_s,f is symmetric about the bin axis; ULS-1 adds the discharge patch load.
    const state = analyseSection(context, section, cap, new Set(['SLS-1', 'ULS-1']));
    const scenario = state.scenarios[0];
    if (!scenario) throw new Error('no scenario');
    for (const analysis of scenario.analyses) {
      const applied = -analysis.appliedSum[2];
      const reactions = columnReactions(scenario.model, analysis, context.layout);
      expect(reactions.reduce((sum, r) => sum + r.force, 0) / applied).toBeCloseTo(1, 6);
      const patch = forceChecks(context, section, context.grade, [{ scenario: scenario.scenario.id, model: scenario.model, analysis }]).find((e) => e.check.id === 'patch-loading');
      expect(patch?.check.inputs['F_Ed']).toBeCloseTo(Math.max(...reactions.map((r) => r.force)), 6);
      expect(patch?.check.inputs['s_s']).toBe(spec.support.capPlateLength);
      if (analysis.combination === 'SLS-1') {
        for (const r of reactions) expect(r.force / (applied / n)).toBeCloseTo(1, 6);
      } else {
        expect(patch?.check.inputs['F_Ed'] ?? 0).toBeGreaterThan(applied / n);
      }
    }
  });

  it('a cap reaction is the sum of its bearing-point forces and the point support reaction is the fixed reaction (statics)', () => {
    const spec = normaliseSpec(symmetric);
    const context = designContext(spec, 3);
    const section = rolledSection('IPE 400');
    const scenarios = SCENARIOS.filter((s) => s.id === 'column-cap-contact' || s.id === 'columns-under-web');
    const state = analyseSection(context, section, scenarios, new Set(['ULS-1']));
    for (const { model, analyses } of state.scenarios) {
      const analysis = analyses[0];
      if (!analysis) throw new Error('no analysis');
      const reactions = columnReactions(model, analysis, context.layout);
      expect(reactions).toHaveLength(spec.support.columns);
      const total = reactions.reduce((sum, r) => sum + r.force, 0);
      expect(total / -analysis.appliedSum[2]).toBeCloseTo(1, 6);
      for (const r of reactions) {
        if (r.points.length > 0) expect(r.force).toBeCloseTo(r.points.reduce((sum, f) => sum + f, 0), 6);
      }
    }
  });
});

describe('ring under the hopper pull', () => {
  it('in-plane buckling uses q_cr = 3 E I_z / R^3 and the junction N_Ed = q r (Roark ring under external pressure; EN 1993-4-1 junction)', async () => {
    const spec = normaliseSpec(symmetric);
    const { result } = await designFromSpec(spec);
    const section = rolledSection(result.members[0]?.section ?? '');
    const grade = steelGrade(spec.support.grade);
    const R = result.girder.radius;
    const loads = result.loads;
    for (const row of result.utilisations.filter((r) => r.check === 'ring-in-plane-buckling')) {
      const factors = loads.combinations.find((c) => c.name === row.combination)?.factors ?? {};
      // Symmetric bin: the radial line load is uniform, q = sum of factor x radialLineLoad.
      const q = loads.cases.reduce((sum, c) => sum + (factors[c.name] ?? 0) * c.radialLineLoad, 0);
      const qcr = (3 * grade.youngsModulus * section.properties.secondMomentOfAreaZ) / R ** 3;
      expect(row.inputs?.['q']).toBeCloseTo(q, 6);
      expect(row.utilisation ?? Infinity).toBeCloseTo(q / (qcr / grade.gammaM1), 9);
    }
    if (spec.bin.shape !== 'circular') throw new Error('the demo bin is circular');
    const r = spec.bin.diameter / 2 + spec.bin.wallThickness / 2;
    const junction = result.utilisations.filter((row) => row.check === 'junction-ring-compression');
    expect(junction.length).toBeGreaterThan(0);
    for (const row of junction) expect(row.intermediate?.['N_Ed']).toBeCloseTo((row.inputs?.['q_r'] ?? 0) * r, 6);
  });
});

describe('serviceability (SLS characteristic combinations)', () => {
  it('analyses every SLS characteristic combination of the credible scenarios and checks deflection against span/500 and twist against 0.01 rad', async () => {
    const spec = normaliseSpec(symmetric);
    const { result } = await designFromSpec(spec);
    const context = designContext(spec);
    const sls = serviceabilityCombinations(context.loads);
    for (const name of sls) expect(result.analyses.some((a) => a.combination === name && a.scenario === 'column-cap-contact')).toBe(true);
    const deflection = result.utilisations.filter((row) => row.check === 'deflection');
    const twist = result.utilisations.filter((row) => row.check === 'twist');
    expect(deflection.length).toBe(sls.size);
    expect(twist.length).toBe(sls.size);
    // Span: the arc between columns, 2 pi R / n; the deflection is relative to the line between the columns.
    for (const row of deflection) {
      expect(row.inputs?.['L']).toBeCloseTo((2 * Math.PI * result.girder.radius) / spec.support.columns, 9);
      expect(row.inputs?.['delta']).toBeCloseTo((row.inputs?.['u_z'] ?? 0) - (row.inputs?.['u_z_supports'] ?? 0), 12);
      expect(row.utilisation ?? Infinity).toBeCloseTo(Math.abs(row.inputs?.['delta'] ?? 0) / ((row.inputs?.['L'] ?? 0) / 500), 9);
    }
    for (const row of twist) expect(row.inputs?.['phi_max']).toBe(0.01);
  });

  it('a tighter twist limit is honoured by the chosen section (the SLS checks size the girder)', async () => {
    const spec = normaliseSpec(symmetric);
    const loose = await designFromSpec(spec);
    const twistRow = loose.result.utilisations.filter((row) => row.check === 'twist').sort((a, b) => (b.utilisation ?? 0) - (a.utilisation ?? 0))[0];
    const phi = Math.abs(twistRow?.inputs?.['phi'] ?? 0);
    // A limit just below the twist of the loose design cannot be met by that section.
    const tight = await designFromSpec(spec, { twistLimit: 0.9 * phi });
    const tightTwist = Math.max(...tight.result.utilisations.filter((row) => row.check === 'twist').map((row) => row.utilisation ?? Infinity));
    expect(tight.result.members[0]?.section).not.toBe(loose.result.members[0]?.section);
    if (tight.result.status === 'verified') expect(tightTwist).toBeLessThanOrEqual(1);
  });
});

describe('anchors on a slab', () => {
  it('the anchored tension per metre is checked against support.anchorCapacity (anchors yield at capacity, so utilisation <= 1)', async () => {
    const onSlab: BinSpecInput = { ...symmetric, support: { type: 'ring-on-slab', girderDiameter: 5.95, segments: 96, bearingModulus: 200, anchorCapacity: 20, credibleScenarios: ['slab-anchored'] } };
    const spec = normaliseSpec(onSlab);
    const { result } = await designFromSpec(spec);
    const rows = result.utilisations.filter((row) => row.check === 'anchor-tension');
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows) {
      expect(row.inputs?.['N_Rd']).toBe(spec.support.anchorCapacity);
      expect(row.inputs?.['N_Ed']).toBeCloseTo((row.inputs?.['sum tension'] ?? 0) / (row.inputs?.['l_trib'] ?? 1), 9);
      expect(row.utilisation ?? Infinity).toBeLessThanOrEqual(1 + 1e-9);
    }
    // No patch loading on a slab (the bearing is continuous) and no deflection limit (settlement only).
    expect(result.utilisations.some((row) => row.check === 'patch-loading' || row.check === 'deflection')).toBe(false);
  });
});

describe('demo bin (demo-data/kestrel-grain-bin.yaml)', () => {
  it('the chosen design passes a fresh re-analysis: every utilisation <= 1', async () => {
    const spec = await readSpecFile(demoPath);
    const { result } = await designFromSpec(spec);
    expect(result.status).toBe('verified');
    for (const row of result.utilisations) expect(row.utilisation ?? Infinity).toBeLessThanOrEqual(1);
    // From scratch: a new context and a new analysis of the chosen section, ULS and SLS, with the
    // chosen columns in the girder model (the column-stiffness iteration ends at a fixed point).
    const column = result.members.find((member) => member.id === 'C')?.section ?? spec.support.columnSection;
    const context = designContext({ ...spec, support: { ...spec.support, columnSection: column } }, 3);
    const credible = SCENARIOS.filter((s) => spec.support.credibleScenarios.includes(s.id));
    const fresh = analyseSection(context, rolledSection(result.members[0]?.section ?? ''), credible);
    expect(fresh.utilisation).toBeLessThanOrEqual(1);
    expect(fresh.utilisation).toBeCloseTo(result.members[0]?.utilisation ?? Infinity, 9);
    expect(new Set(fresh.envelopes.map((e) => e.combination))).toEqual(new Set([...sizingCombinations(context.loads), ...serviceabilityCombinations(context.loads)]));
  });
});
