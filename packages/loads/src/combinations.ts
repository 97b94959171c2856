import type { LoadCombination } from './types.js';

export interface PartialFactors {
  /** gamma_G for unfavourable permanent actions (EN 1990 Table A1.2(B): 1.35). */
  permanentFactor: number;
  /** gamma_F for stored-solid actions (EN 1990 Annex A4 / EN 1991-4: recommended 1.5). */
  solidFactor: number;
}

function expression(factors: Record<string, number>): string {
  return Object.entries(factors)
    .map(([name, factor]) => `${factor.toFixed(2)} ${name}`)
    .join(' + ');
}

/**
 * Gravity combinations of the permanent case G and the stored solid Q_s,f: ULS STR by EN 1990 6.4.3.2
 * expression (6.10) and SLS characteristic by 6.5.3 expression (6.14b).
 */
export function gravityCombinations(factors: PartialFactors): LoadCombination[] {
  const uls = { G: factors.permanentFactor, 'Q_s,f': factors.solidFactor };
  const sls = { G: 1, 'Q_s,f': 1 };
  return [
    { name: 'ULS-1', limitState: 'ULS', expression: expression(uls), factors: uls, clause: 'EN 1990 6.4.3.2 (6.10); Table A1.2(B)' },
    { name: 'SLS-1', limitState: 'SLS', expression: expression(sls), factors: sls, clause: 'EN 1990 6.5.3 (6.14b)' },
  ];
}
