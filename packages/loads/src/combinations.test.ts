import { describe, expect, it } from 'vitest';
import { combineActions, type CombinationInput } from './combinations.js';

const input: CombinationInput = {
  permanent: ['G', 'G_roof'],
  groups: [
    { action: 'solid', symbol: 'Q_s', alternatives: [{ label: 'filling', cases: ['Q_s,f', 'Q_s,pf'] }, { label: 'discharge', cases: ['Q_s,e', 'Q_s,pe'] }] },
    { action: 'roofImposed', symbol: 'Q_roof', alternatives: [{ label: 'roof', cases: ['Q_roof'] }] },
    { action: 'snow', symbol: 'S', alternatives: [{ label: 'snow', cases: ['S'] }] },
    { action: 'wind', symbol: 'W', alternatives: [{ label: 'w0', cases: ['W_0'] }, { label: 'w90', cases: ['W_90'] }] },
  ],
  seismic: ['E_0'],
  closure: ['G', 'Q_s,f'],
};

describe('EN 1990 combinations', () => {
  const all = combineActions(input, { permanentFactor: 1.35, solidFactor: 1.5 });
  const str = all.filter((c) => c.verification === 'STR');

  it('puts the characteristic closure combination G + Q_s,f first among the all-ones combinations', () => {
    expect(all[0]?.factors).toEqual({ G: 1, 'Q_s,f': 1 });
    const first = all.find((c) => Object.values(c.factors).every((f) => f === 1));
    expect(first?.factors).toEqual({ G: 1, 'Q_s,f': 1 });
    expect(first?.expression).toBe('1.00 G + 1.00 Q_s,f');
  });

  it('wind leading with the bin full at filling: 1.35 G + 1.50 W + 1.50 x 1.0 Q_s + 1.50 x 0.5 S (6.10; Table A1.2(B); psi_0 Table A1.1 and EN 1991-4 Annex A, from memory)', () => {
    const c = str.find((x) => x.leading === 'W' && x.factors['W_0'] === 1.5 && x.factors['Q_s,f'] !== undefined);
    expect(c?.factors).toEqual({ G: 1.35, G_roof: 1.35, W_0: 1.5, 'Q_s,f': 1.5, 'Q_s,pf': 1.5, S: 0.75 });
    expect(c?.expression).toBe('1.35 G + 1.35 G_roof + 1.50 W_0 + 1.50 Q_s,f + 1.50 Q_s,pf + 0.75 S');
  });

  it('solid leading: wind at 1.5 x 0.6 = 0.90, snow at 0.75, roof imposed left out (EN 1991-1-1 3.3.2(1))', () => {
    const c = str.find((x) => x.leading === 'Q_s' && x.factors['Q_s,e'] === 1.5 && x.factors['W_90'] !== undefined);
    expect(c?.factors).toEqual({ G: 1.35, G_roof: 1.35, 'Q_s,e': 1.5, 'Q_s,pe': 1.5, S: 0.75, W_90: 1.5 * 0.6 });
    expect(str.some((x) => x.factors['Q_roof'] !== undefined && (x.factors['S'] !== undefined || x.factors['W_0'] !== undefined))).toBe(false);
  });

  it('each variable action leads in turn, for each bin state', () => {
    for (const leading of ['Q_s', 'Q_roof', 'S', 'W']) expect(str.some((c) => c.leading === leading)).toBe(true);
    expect(str.some((c) => c.leading === 'S' && c.factors['Q_s,f'] === 1.5)).toBe(true);
    expect(str.some((c) => c.leading === 'S' && c.factors['Q_s,e'] === 1.5)).toBe(true);
  });

  it('EQU for the empty bin: 0.90 G + 1.50 W (EN 1990 Table A1.2(A), gamma_G,inf = 0.90)', () => {
    const equ = all.filter((c) => c.verification === 'EQU');
    expect(equ.map((c) => c.factors)).toEqual([
      { G: 0.9, G_roof: 0.9, W_0: 1.5 },
      { G: 0.9, G_roof: 0.9, W_90: 1.5 },
    ]);
    expect(equ.every((c) => c.limitState === 'ULS')).toBe(true);
    // STR uplift with the permanent actions favourable, gamma_G,inf = 1.00 (Table A1.2(B)).
    expect(str.some((c) => c.factors['G'] === 1 && c.factors['W_0'] === 1.5 && Object.keys(c.factors).length === 3)).toBe(true);
  });

  it('seismic design situation (6.12b): G + E + psi_2 Q_s with psi_2 = 0.8 for the solid (from memory)', () => {
    const e = all.find((c) => c.verification === 'seismic');
    expect(e?.factors).toEqual({ G: 1, G_roof: 1, E_0: 1, 'Q_s,f': 0.8, 'Q_s,pf': 0.8 });
  });

  it('6.10a/6.10b with xi = 0.85 (EN 1990 6.4.3.2, Table A1.2(B))', () => {
    const ab = combineActions(input, { permanentFactor: 1.35, solidFactor: 1.5, method: '6.10a/b' }).filter((c) => c.verification === 'STR');
    const a = ab.find((c) => c.clause.includes('(6.10a)') && c.factors['Q_s,f'] !== undefined && c.factors['W_0'] !== undefined);
    expect(a?.factors['G']).toBe(1.35);
    expect(a?.factors['Q_s,f']).toBe(1.5); // psi_0 = 1.0 for the solid
    expect(a?.factors['W_0']).toBeCloseTo(0.9, 12);
    const b = ab.find((c) => c.clause.includes('(6.10b)') && c.leading === 'W');
    expect(b?.factors['G']).toBeCloseTo(0.85 * 1.35, 12);
    expect(b?.factors['W_0'] ?? b?.factors['W_90']).toBe(1.5);
  });

  it('takes overridden factors (a national annex, say)', () => {
    const c = combineActions(input, { permanentFactor: 1.2, solidFactor: 1.35, psi: { wind: { psi0: 0.5, psi1: 0.2, psi2: 0 } } }).find((x) => x.leading === 'Q_s' && x.factors['W_0'] !== undefined);
    expect(c?.factors['G']).toBe(1.2);
    expect(c?.factors['Q_s,f'] ?? c?.factors['Q_s,e']).toBe(1.35);
    expect(c?.factors['W_0']).toBeCloseTo(0.75, 12);
  });
});
