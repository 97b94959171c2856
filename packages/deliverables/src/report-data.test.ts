import { describe, expect, it } from 'vitest';
import { bearingPanels, columnAngles, equilibrium, governingCombinationOf, issueDate, PLACEHOLDER_DATE, scenarioEnvelopes, tonnageBySection, utilisationBand } from './report-data.js';
import { demoDesignResult } from './test-support/demo-result.js';

describe('issueDate', () => {
  it('takes the date from the result, never from the clock', () => {
    const result = demoDesignResult();
    const date = issueDate(result);
    expect(date.text).toBe('2025-03-14');
    expect(date.metadata.toISOString()).toBe('2025-03-14T00:00:00.000Z');
  });

  it('prints a non-ISO date as given but keeps the metadata fixed', () => {
    const result = demoDesignResult();
    result.project.date = '14 March 2025';
    expect(issueDate(result)).toEqual({ text: '14 March 2025', metadata: PLACEHOLDER_DATE });
    result.project.date = '2025-02-30';
    expect(issueDate(result).metadata).toEqual(PLACEHOLDER_DATE);
    result.project.date = '';
    expect(issueDate(result)).toEqual({ text: undefined, metadata: PLACEHOLDER_DATE });
  });

  it('lets the caller override the date for a re-issue', () => {
    expect(issueDate(demoDesignResult(), { date: '2025-04-01' }).metadata.toISOString()).toBe('2025-04-01T00:00:00.000Z');
  });
});

describe('equilibrium', () => {
  it('sums applied loads and reactions, relative to the applied load', () => {
    const [analysis] = demoDesignResult().analyses;
    expect(analysis).toBeDefined();
    if (analysis === undefined) return;
    analysis.appliedSum = [0, 0, -1000];
    analysis.reactionSum = [1, 0, 999];
    const balance = equilibrium(analysis);
    expect(balance.imbalance).toEqual([1, 0, -1]);
    expect(balance.relative).toBeCloseTo(Math.SQRT2 / 1000, 15);
  });
});

describe('tonnageBySection', () => {
  it('groups member masses by section and grade', () => {
    const result = demoDesignResult();
    const [first] = result.members;
    if (first === undefined) throw new Error('fixture has no members');
    result.members.push({ ...first, id: 'RG2', mass: 100, length: 1 });
    const groups = tonnageBySection(result);
    const ring = groups.find((g) => g.section === first.section);
    expect(ring?.members).toEqual([first.id, 'RG2']);
    expect(ring?.mass).toBeCloseTo(first.mass + 100, 9);
    expect(groups.reduce((sum, g) => sum + g.mass, 0)).toBeCloseTo(result.members.reduce((sum, m) => sum + m.mass, 0), 9);
  });
});

describe('scenarioEnvelopes', () => {
  it('takes the largest absolute peak over the ULS analyses of each scenario only', () => {
    const result = demoDesignResult();
    const sls = result.analyses.find((a) => a.combination === 'SLS-1' && a.scenario === 'contact');
    if (sls === undefined) throw new Error('fixture lacks SLS-1 / contact');
    sls.peaks.My = 1e12; // an SLS analysis must not enter the ULS envelope
    const contact = scenarioEnvelopes(result).find((e) => e.scenario.id === 'contact');
    const expected = Math.max(
      ...result.analyses.filter((a) => a.scenario === 'contact' && a.combination.startsWith('ULS')).map((a) => a.peaks.My),
    );
    expect(contact?.peaks.My).toBe(expected);
    expect(contact?.analyses).toBe(2);
  });
});

describe('utilisationBand', () => {
  it('puts 0.90 and 1.00 in the lower band, as the workbook rule does', () => {
    expect(utilisationBand(0.9)).toBe('adequate');
    expect(utilisationBand(0.9001)).toBe('near limit');
    expect(utilisationBand(1.0)).toBe('near limit');
    expect(utilisationBand(1.0001)).toBe('exceeded');
  });
});

describe('bearing panels', () => {
  it('take the combination of the highest utilisation of a scenario in the envelope', () => {
    const result = demoDesignResult();
    const rows = result.utilisations.filter((row) => row.scenario === 'contact' && row.utilisation !== null);
    const top = rows.reduce((a, b) => ((b.utilisation ?? 0) > (a.utilisation ?? 0) ? b : a));
    expect(governingCombinationOf(result, 'contact')).toBe(top.combination);
  });

  it('take the combination that governs the design for a scenario outside the envelope', () => {
    const result = demoDesignResult();
    const governing = result.members.reduce((a, b) => ((b.utilisation ?? 0) > (a.utilisation ?? 0) ? b : a));
    expect(governingCombinationOf(result, 'bonded')).toBe(governing.governing.combination);
  });

  it('skip scenarios without bearing points and add the combination with the least contact', () => {
    const result = demoDesignResult();
    expect(bearingPanels(result).map((p) => p.scenario.id)).toEqual(['contact', 'bonded']);
    const sls = result.analyses.find((a) => a.scenario === 'contact' && a.combination === 'SLS-1');
    if (sls?.bearings === undefined) throw new Error('fixture has no bearings');
    sls.bearings.contactFraction = 0.2;
    const panels = bearingPanels(result).filter((p) => p.scenario.id === 'contact');
    expect(panels.map((p) => [p.role, p.combination])).toEqual([['governing', 'ULS-2'], ['least contact', 'SLS-1']]);
  });

  it('place column C(j+1) at 2 pi j / n', () => {
    expect(columnAngles(4)).toEqual([0, Math.PI / 2, Math.PI, (3 * Math.PI) / 2]);
  });
});
