import { describe, expect, it } from 'vitest';
import { bearingBars, bearingChartSpec, forceDiagramSpec, pressureChartSpec, renderChartSvg, utilisationBars, utilisationChartSpec } from './charts.js';
import { bearingPanels } from './report-data.js';
import { formatUtilisation } from './units.js';
import { demoDesignResult } from './test-support/demo-result.js';

interface Row {
  [key: string]: unknown;
}

function inlineValues(spec: object): Row[] {
  if ('data' in spec && typeof spec.data === 'object' && spec.data !== null && 'values' in spec.data && Array.isArray(spec.data.values)) {
    return spec.data.values as Row[];
  }
  throw new Error('spec has no inline data');
}

describe('pressure chart', () => {
  it('plots every station of every profile in kPa', async () => {
    const result = demoDesignResult();
    const spec = pressureChartSpec(result.loads.profiles);
    const values = inlineValues(spec);
    const stations = result.loads.profiles.reduce((n, p) => n + p.z.length, 0);
    expect(values).toHaveLength(3 * stations);
    const [wall] = result.loads.profiles;
    if (wall === undefined) throw new Error('fixture has no profiles');
    const last = wall.z.length - 1;
    const bottom = values.find((v) => v.loadCase === wall.case && v.part === wall.part && v.z === wall.z[last] && String(v.quantity).startsWith('p_h'));
    expect(bottom?.pressure).toBeCloseTo((wall.ph[last] ?? Number.NaN) / 1000, 9);
    const svg = await renderChartSvg(spec);
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('Pressure [kPa]');
  });
});

describe('force diagram', () => {
  it('draws My, T and B in kNm and kNm² against the angle in degrees for each scenario', async () => {
    const result = demoDesignResult();
    const analyses = result.analyses.filter((a) => a.combination === 'ULS-1');
    const values = inlineValues(forceDiagramSpec(result, 'ULS-1'));
    const stations = analyses.reduce((n, a) => n + (a.diagram?.angle.length ?? 0), 0);
    expect(values).toHaveLength(3 * stations);
    expect(Math.max(...values.map((v) => Number(v.angle)))).toBeCloseTo(360, 9);
    const contact = analyses.find((a) => a.scenario === 'contact');
    if (contact === undefined) throw new Error('fixture lacks ULS-1 / contact');
    const peakMy = Math.max(...values.filter((v) => v.scenario === 'contact' && v.quantity === 'My [kNm]').map((v) => Math.abs(Number(v.value))));
    expect(peakMy).toBeCloseTo(contact.peaks.My / 1000, 9);
    const svg = await renderChartSvg(forceDiagramSpec(result, 'ULS-1'));
    expect(svg).toContain('B [kNm²]');
  });
});

describe('utilisation bars', () => {
  it('keeps the largest utilisation of each member and check', () => {
    const result = demoDesignResult();
    const bars = utilisationBars(result.utilisations, formatUtilisation);
    const keys = new Set(result.utilisations.map((r) => `${r.member}/${r.check}`));
    expect(bars).toHaveLength(keys.size);
    for (const member of result.members) {
      const top = Math.max(...bars.filter((b) => b.label.startsWith(`${member.id} `)).map((b) => b.utilisation));
      expect(top).toBe(member.utilisation);
    }
    const spec = utilisationChartSpec(bars);
    expect(JSON.stringify(spec)).toContain('"datum":1');
  });

  it('keeps a check that recorded no number as "not evaluated", but lets a number win', () => {
    const [first, second] = demoDesignResult().utilisations;
    if (first === undefined || second === undefined) throw new Error('fixture has too few rows');
    const outOfScope = { ...first, check: 'class-4-check', utilisation: null, note: 'class 4 section' };
    const partly = { ...first, utilisation: null };
    const bars = utilisationBars([outOfScope, partly, first, second], formatUtilisation);
    expect(bars.find((b) => b.label.endsWith('class-4-check'))).toMatchObject({ utilisation: 0, band: 'not evaluated', text: 'n/a' });
    expect(second.check).toBe(first.check); // the same check under another combination
    expect(bars.find((b) => b.label.endsWith(`: ${first.check}`))?.utilisation).toBe(Math.max(first.utilisation ?? 0, second.utilisation ?? 0));
  });
});

describe('column positions on the force diagram', () => {
  it('draws a rule at every column angle and names the columns on the position axis', () => {
    const result = demoDesignResult();
    const spec = forceDiagramSpec(result, 'ULS-1') as { spec: { layer: Array<{ mark: { type: string }; encoding: { x?: { datum?: number; axis?: { values?: number[] } } } }> } };
    const rules = spec.spec.layer.filter((layer) => layer.mark.type === 'rule' && layer.encoding.x?.datum !== undefined).map((layer) => layer.encoding.x?.datum);
    expect(rules).toEqual(Array.from({ length: result.girder.columns }, (_, j) => (360 * j) / result.girder.columns));
    const line = spec.spec.layer.find((layer) => layer.mark.type === 'line');
    expect(line?.encoding.x?.axis?.values).toEqual([0, 45, 90, 135, 180, 225, 270, 315, 360]);
  });

  it('labels the axis C1 0° ... C1 360° in the rendered chart', async () => {
    const svg = await renderChartSvg(forceDiagramSpec(demoDesignResult(), 'ULS-1'));
    for (const label of ['C1 0°', 'C2 45°', 'C5 180°', 'C8 315°', 'C1 360°']) {
      expect(svg).toContain(`>${label}</text>`);
    }
  });
});

describe('bearing chart', () => {
  it('shows each bearing point of the most loaded column in kN, lift-off as zero and tension below zero', async () => {
    const result = demoDesignResult();
    const panels = bearingPanels(result);
    expect(panels.map((p) => `${p.scenario.id}/${p.combination}/${p.role}`)).toEqual(['contact/ULS-2/governing', 'bonded/ULS-2/governing']);
    const bars = bearingBars(panels);
    panels.forEach((panel, p) => {
      const own = bars.filter((bar) => bar.panel === bars[p * panel.bearings.mostLoadedColumn.forces.length]?.panel);
      expect(own.map((bar) => bar.force)).toEqual(panel.bearings.mostLoadedColumn.forces.map((f) => f / 1000));
      expect(own[0]?.position).toBe('1 inside');
      expect(own[own.length - 1]?.position).toMatch(/ outside$/);
    });
    const contact = bars.filter((bar) => bar.panel.startsWith('contact'));
    expect(contact.filter((bar) => bar.state === 'lift-off').every((bar) => bar.force === 0 && bar.text === 'lift-off')).toBe(true);
    expect(contact.some((bar) => bar.state === 'lift-off')).toBe(true);
    const bonded = bars.filter((bar) => bar.panel.startsWith('bonded'));
    expect(bonded.filter((bar) => bar.state === 'tension').every((bar) => bar.force < 0)).toBe(true);
    expect(bonded.some((bar) => bar.state === 'tension')).toBe(true);
    const svg = await renderChartSvg(bearingChartSpec(panels));
    expect(svg).toContain('lift-off');
    expect(svg).toContain('Bearing point across the flange, inside to outside');
  });
});
