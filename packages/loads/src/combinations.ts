import type { LoadCombination, Verification } from './types.js';

export interface PsiFactors {
  psi0: number;
  psi1: number;
  psi2: number;
}

export type VariableAction = 'solid' | 'roofImposed' | 'snow' | 'wind' | 'equipment';

/**
 * Partial and combination factors. The two required fields are those of the spec; the rest default
 * to the recommended values of EN 1990:2002 Annex A1 and EN 1991-4 Annex A (REFERENCES.md §1):
 * - gamma_G,sup 1.35, gamma_G,inf 1.00, gamma_Q 1.50, xi 0.85 (STR, Table A1.2(B));
 * - gamma_G,sup 1.10, gamma_G,inf 0.90, gamma_Q 1.50 (EQU, Table A1.2(A));
 * - psi (Table A1.1): roof imposed (category H) 0/0/0; snow (sites at or below 1000 m) 0.5/0.2/0;
 *   wind 0.6/0.2/0; equipment as storage (category E) 1.0/0.9/0.8;
 * - stored solid gamma_F 1.5 and psi 1.0/0.9/0.8 (EN 1991-4 Annex A, from memory).
 */
export interface PartialFactors {
  /** gamma_G,sup for unfavourable permanent actions, STR (EN 1990 Table A1.2(B): 1.35). */
  permanentFactor: number;
  /** gamma_F for stored-solid actions (EN 1991-4 Annex A: recommended 1.5). */
  solidFactor: number;
  /** gamma_G,inf for favourable permanent actions, STR (1.00). */
  permanentFavourableFactor?: number;
  /** gamma_Q for the other variable actions (1.50). */
  variableFactor?: number;
  /** xi of expression (6.10b) (0.85). */
  reductionFactor?: number;
  /** EQU factors (Table A1.2(A)): gamma_G,sup 1.10, gamma_G,inf 0.90, gamma_Q 1.50. */
  equPermanentUnfavourableFactor?: number;
  equPermanentFavourableFactor?: number;
  equVariableFactor?: number;
  /** STR format: expression (6.10), or the less favourable of (6.10a) and (6.10b). */
  method?: '6.10' | '6.10a/b';
  psi?: Partial<Record<VariableAction, PsiFactors>>;
}

export const DEFAULT_PSI: Record<VariableAction, PsiFactors> = {
  solid: { psi0: 1.0, psi1: 0.9, psi2: 0.8 }, // EN 1991-4 Annex A (from memory)
  roofImposed: { psi0: 0, psi1: 0, psi2: 0 }, // EN 1990 Table A1.1, category H
  snow: { psi0: 0.5, psi1: 0.2, psi2: 0 }, // EN 1990 Table A1.1, sites at or below 1000 m
  wind: { psi0: 0.6, psi1: 0.2, psi2: 0 }, // EN 1990 Table A1.1
  equipment: { psi0: 1.0, psi1: 0.9, psi2: 0.8 }, // EN 1990 Table A1.1, category E (storage)
};

/** A variable action and its mutually exclusive alternatives, each a set of case names taken together. */
export interface VariableGroup {
  action: VariableAction;
  /** Symbol for the expression, e.g. 'Q_s'. */
  symbol: string;
  alternatives: Array<{ label: string; cases: string[] }>;
}

export interface CombinationInput {
  /** Permanent cases always present (plates, roof, permanent equipment). */
  permanent: string[];
  /** The solid's alternatives (filling, discharge); the bin may also be empty. */
  groups: VariableGroup[];
  /** Seismic cases (one per direction), if any. */
  seismic: string[];
  /** The cases whose characteristic sum closes on the weights (plates and solid at filling). */
  closure: string[];
}

function formatExpression(factors: Record<string, number>): string {
  return Object.entries(factors)
    .map(([name, factor]) => `${factor.toFixed(2)} ${name}`)
    .join(' + ');
}

function resolved(factors: PartialFactors) {
  return {
    gGsup: factors.permanentFactor,
    gGinf: factors.permanentFavourableFactor ?? 1.0,
    gQ: factors.variableFactor ?? 1.5,
    gS: factors.solidFactor,
    xi: factors.reductionFactor ?? 0.85,
    eGsup: factors.equPermanentUnfavourableFactor ?? 1.1,
    eGinf: factors.equPermanentFavourableFactor ?? 0.9,
    eQ: factors.equVariableFactor ?? 1.5,
    method: factors.method ?? '6.10',
    psi: (action: VariableAction): PsiFactors => factors.psi?.[action] ?? DEFAULT_PSI[action],
  };
}

interface Chosen {
  group: VariableGroup;
  alternative: { label: string; cases: string[] };
}

/** Every choice of one alternative per group (groups may be absent: 'none' is not offered here). */
function choices(groups: VariableGroup[]): Chosen[][] {
  let result: Chosen[][] = [[]];
  for (const group of groups) {
    const next: Chosen[][] = [];
    for (const partial of result) for (const alternative of group.alternatives) next.push([...partial, { group, alternative }]);
    result = next;
  }
  return result;
}

/**
 * EN 1991-1-1 3.3.2(1): imposed loads on roofs are not combined with snow or wind. With roof imposed
 * load leading, snow and wind are left out; otherwise the roof imposed load is left out when snow or
 * wind is present.
 */
function compatible(groups: VariableGroup[], leading: VariableAction): VariableGroup[] {
  const climatic = groups.some((g) => g.action === 'snow' || g.action === 'wind');
  if (leading === 'roofImposed') return groups.filter((g) => g.action !== 'snow' && g.action !== 'wind');
  if (climatic) return groups.filter((g) => g.action !== 'roofImposed');
  return groups;
}

/**
 * Combinations of the support-line cases per EN 1990:2002: ULS STR by (6.10) or by both (6.10a) and
 * (6.10b) (6.4.3.2, Table A1.2(B)), each variable action leading in turn with the others at psi_0;
 * EQU for uplift and overturning of the empty bin under wind (Table A1.2(A)); the seismic design
 * situation (6.12b) with psi_2; SLS characteristic (6.14b). The first combination of the list is the
 * characteristic sum of the closure cases (plates and solid at filling), whose vertical total is the
 * weight of plates and solid.
 */
export function combineActions(input: CombinationInput, partialFactors: PartialFactors): LoadCombination[] {
  const f = resolved(partialFactors);
  const uls: LoadCombination[] = [];
  const sls: LoadCombination[] = [];
  const seen = new Set<string>();
  const solidGroup = input.groups.find((g) => g.action === 'solid');
  const others = input.groups.filter((g) => g.action !== 'solid');

  const push = (list: LoadCombination[], limitState: 'ULS' | 'SLS', verification: Verification, factors: Record<string, number>, clause: string, leading?: string) => {
    const key = `${verification}|${JSON.stringify(Object.entries(factors).sort())}`;
    if (seen.has(key)) return;
    seen.add(key);
    const prefix = verification === 'STR' ? 'ULS' : verification === 'SLS-characteristic' ? 'SLS' : verification === 'EQU' ? 'EQU' : 'SEIS';
    const count = list.filter((c) => c.verification === verification).length + 1;
    list.push({ name: `${prefix}-${count}`, limitState, expression: formatExpression(factors), factors, clause, verification, ...(leading ? { leading } : {}) });
  };

  // Closure combination first among the SLS ones (see above).
  push(sls, 'SLS', 'SLS-characteristic', Object.fromEntries(input.closure.map((name) => [name, 1])), 'EN 1990 6.5.3 (6.14b): plates and stored solid at filling, characteristic (closure of the weights)');

  const gammaOf = (action: VariableAction) => (action === 'solid' ? f.gS : f.gQ);
  // Bin states: full with each alternative of the solid, and empty.
  const states: Array<Chosen | undefined> = [...(solidGroup ? solidGroup.alternatives.map((alternative) => ({ group: solidGroup, alternative })) : []), undefined];

  for (const state of states) {
    const groups = state ? [state.group, ...others] : others;
    for (const lead of groups) {
      const pool = compatible(groups, lead.action).filter((g) => g !== lead && g !== state?.group);
      const leadAlternatives = lead === state?.group ? [state.alternative] : lead.alternatives;
      for (const leadAlt of leadAlternatives) {
        const accompanying = choices(pool);
        for (const accompany of accompanying) {
          const solidAccompany: Chosen[] = state && lead !== state.group ? [state] : [];
          const variables: Array<Chosen & { leading: boolean }> = [{ group: lead, alternative: leadAlt, leading: true }, ...[...solidAccompany, ...accompany].map((c) => ({ ...c, leading: false }))];
          const empty = !state;
          // Uplift: with the bin empty and wind leading, permanent actions are favourable and the
          // gravity variables (snow, roof, equipment) are left out.
          const uplift = empty && lead.action === 'wind';
          const kept = uplift ? variables.filter((v) => v.leading) : variables;
          const label = `${lead.symbol} leading${state ? `, ${state.alternative.label}` : ', bin empty'}`;
          const build = (gG: number, leadFactor: (a: VariableAction) => number, accFactor: (a: VariableAction) => number) => {
            const factors: Record<string, number> = {};
            for (const name of input.permanent) factors[name] = gG;
            for (const v of kept) {
              const factor = v.leading ? leadFactor(v.group.action) : accFactor(v.group.action);
              if (factor === 0) continue;
              for (const name of v.alternative.cases) factors[name] = factor;
            }
            return factors;
          };
          const acc = (a: VariableAction) => gammaOf(a) * f.psi(a).psi0;
          if (uplift) {
            push(uls, 'ULS', 'STR', build(f.gGinf, gammaOf, acc), `EN 1990 6.4.3.2 (6.10), Table A1.2(B): ${label}, permanent favourable`, lead.symbol);
            push(uls, 'ULS', 'EQU', build(f.eGinf, () => f.eQ, () => 0), `EN 1990 6.4.3.1, Table A1.2(A): ${label}, uplift and overturning`, lead.symbol);
          } else if (f.method === '6.10') {
            push(uls, 'ULS', 'STR', build(f.gGsup, gammaOf, acc), `EN 1990 6.4.3.2 (6.10), Table A1.2(B): ${label}`, lead.symbol);
          } else {
            push(uls, 'ULS', 'STR', build(f.gGsup, acc, acc), `EN 1990 6.4.3.2 (6.10a), Table A1.2(B): ${state ? state.alternative.label : 'bin empty'}`);
            push(uls, 'ULS', 'STR', build(f.xi * f.gGsup, gammaOf, acc), `EN 1990 6.4.3.2 (6.10b), Table A1.2(B): ${label}`, lead.symbol);
          }
          push(sls, 'SLS', 'SLS-characteristic', build(1, () => 1, (a) => f.psi(a).psi0), `EN 1990 6.5.3 (6.14b): ${label}`, lead.symbol);
        }
      }
    }
  }

  // Seismic design situation (6.12b): G + A_Ed + psi_2 Q, with the bin full at filling.
  const filling = solidGroup?.alternatives[0];
  for (const seismicCase of input.seismic) {
    const factors: Record<string, number> = {};
    for (const name of input.permanent) factors[name] = 1;
    factors[seismicCase] = 1;
    for (const group of [...(solidGroup && filling ? [{ ...solidGroup, alternatives: [filling] }] : []), ...others]) {
      if (group.action === 'wind') continue;
      const psi2 = f.psi(group.action).psi2;
      if (psi2 === 0) continue;
      for (const name of group.alternatives[0]?.cases ?? []) factors[name] = psi2;
    }
    push(uls, 'ULS', 'seismic', factors, `EN 1990 6.4.3.4 (6.12b): seismic action ${seismicCase}, stored solid at psi_2`, seismicCase);
  }
  // The closure combination leads the list, so a consumer that looks for the first characteristic
  // (all factors 1) combination finds it even when overridden factors make another one all ones.
  const [closure, ...otherSls] = sls;
  return closure ? [closure, ...uls, ...otherSls] : uls;
}
