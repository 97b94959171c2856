// Quantities that both the workbook and the report derive from a DesignResult, computed once here so
// that the two deliverables cannot disagree.
import type { AnalysisSummary, DesignResult, ScenarioSummary } from '@binsupport/design';

export interface ReportOptions {
  /** Overrides the issue date recorded in the result (`project.date`), e.g. for a re-issue. */
  date?: string;
}

export interface IssueDate {
  /** As printed: the date exactly as given in the spec, or undefined when none was given. */
  text: string | undefined;
  /** For file metadata: the issue date at 00:00 UTC if it reads as ISO 8601, else the fixed placeholder. */
  metadata: Date;
}

/**
 * The fixed metadata date used when the issue date is missing or not ISO 8601 (1 January 2000,
 * 00:00 UTC): never the clock, so the same result always gives the same bytes.
 */
export const PLACEHOLDER_DATE = new Date(Date.UTC(2000, 0, 1));

const isoDate = /^(\d{4})-(\d{2})-(\d{2})$/;

function metadataDate(text: string): Date {
  const match = isoDate.exec(text.trim());
  if (match === null) {
    return PLACEHOLDER_DATE;
  }
  const [, year, month, day] = match;
  const date = new Date(Date.UTC(Number(year), Number(month) - 1, Number(day)));
  // Reject dates that roll over (2025-02-30 becomes 2 March).
  if (Number.isNaN(date.getTime()) || date.getUTCDate() !== Number(day) || date.getUTCMonth() !== Number(month) - 1) {
    return PLACEHOLDER_DATE;
  }
  return date;
}

/** The issue date: the explicit option, else `project.date` as the spec gave it. */
export function issueDate(result: DesignResult, options: ReportOptions = {}): IssueDate {
  const text = (options.date ?? result.project.date).trim();
  if (text === '') {
    return { text: undefined, metadata: PLACEHOLDER_DATE };
  }
  return { text, metadata: metadataDate(text) };
}

export function scenarioById(result: DesignResult, id: string): ScenarioSummary | undefined {
  return result.scenarios.find((scenario) => scenario.id === id);
}

export function scenarioTitle(result: DesignResult, id: string): string {
  return scenarioById(result, id)?.title ?? id;
}

export function combinationExpression(result: DesignResult, name: string): string | undefined {
  return result.loads.combinations.find((combination) => combination.name === name)?.expression;
}

export interface SectionTonnage {
  section: string;
  grade: string;
  members: string[];
  /** m */
  length: number;
  /** kg */
  mass: number;
}

/** Steel mass by (section, grade), in the order the sections first appear among the members. */
export function tonnageBySection(result: DesignResult): SectionTonnage[] {
  const groups = new Map<string, SectionTonnage>();
  for (const member of result.members) {
    const key = `${member.section}\u0000${member.grade}`;
    const group = groups.get(key) ?? { section: member.section, grade: member.grade, members: [], length: 0, mass: 0 };
    group.members.push(member.id);
    group.length += member.length;
    group.mass += member.mass;
    groups.set(key, group);
  }
  return [...groups.values()];
}

export interface Equilibrium {
  /** Sum of applied loads plus sum of reactions, N: zero for a body in equilibrium. */
  imbalance: [number, number, number];
  /** |imbalance| / |applied| (0 when nothing is applied). */
  relative: number;
}

function norm(vector: readonly [number, number, number]): number {
  return Math.hypot(vector[0], vector[1], vector[2]);
}

/**
 * Equilibrium of one analysis. The reactions are the forces the supports exert on the girder, so
 * for a body in equilibrium the applied loads and the reactions sum to zero.
 */
export function equilibrium(analysis: AnalysisSummary): Equilibrium {
  const [ax, ay, az] = analysis.appliedSum;
  const [rx, ry, rz] = analysis.reactionSum;
  const imbalance: [number, number, number] = [ax + rx, ay + ry, az + rz];
  const applied = norm(analysis.appliedSum);
  return { imbalance, relative: applied === 0 ? norm(imbalance) : norm(imbalance) / applied };
}

export type Peaks = AnalysisSummary['peaks'];

export interface ScenarioEnvelope {
  scenario: ScenarioSummary;
  /** Largest absolute internal forces over all ULS analyses of the scenario. */
  peaks: Peaks;
  analyses: number;
  allConverged: boolean;
}

const peakKeys = ['N', 'Vz', 'T', 'My', 'Mz', 'B'] as const;

/** The scenarios side by side: peak internal forces over their ULS analyses. */
export function scenarioEnvelopes(result: DesignResult): ScenarioEnvelope[] {
  const ultimate = new Set(result.loads.combinations.filter((c) => c.limitState === 'ULS').map((c) => c.name));
  return result.scenarios.map((scenario) => {
    const own = result.analyses.filter((a) => a.scenario === scenario.id && ultimate.has(a.combination));
    const peaks: Peaks = { N: 0, Vz: 0, T: 0, My: 0, Mz: 0, B: 0 };
    for (const analysis of own) {
      for (const key of peakKeys) {
        peaks[key] = Math.max(peaks[key], Math.abs(analysis.peaks[key]));
      }
    }
    return { scenario, peaks, analyses: own.length, allConverged: own.every((a) => a.converged) };
  });
}

/** Utilisation bands for colouring, the same in the workbook and the report. */
export const UTILISATION_AMBER = 0.9;
export const UTILISATION_RED = 1.0;

export type UtilisationBand = 'adequate' | 'near limit' | 'exceeded' | 'not evaluated';

/** `null` (no number recorded: outside a check's scope, or no resistance left) is its own band. */
export function utilisationBand(utilisation: number | null): UtilisationBand {
  if (utilisation === null) {
    return 'not evaluated';
  }
  if (utilisation > UTILISATION_RED) {
    return 'exceeded';
  }
  if (utilisation > UTILISATION_AMBER) {
    return 'near limit';
  }
  return 'adequate';
}

/** The bearing state of one analysis, picked to show how a scenario bears on the column caps. */
export interface BearingPanel {
  scenario: ScenarioSummary;
  /** 'governing': the combination that governs the scenario; 'least contact': the one with the fewest points in contact. */
  role: 'governing' | 'least contact';
  combination: string;
  bearings: NonNullable<AnalysisSummary['bearings']>;
}

/**
 * The combination that governs a scenario: the one of its highest utilisation among the checks of
 * the design envelope; for a scenario outside the envelope (no checks recorded for it), the
 * combination that governs the design, which every scenario is analysed and kept under.
 */
export function governingCombinationOf(result: DesignResult, scenarioId: string): string | undefined {
  let best: { combination: string; utilisation: number } | undefined;
  for (const row of result.utilisations) {
    if (row.scenario !== scenarioId || row.utilisation === null) continue;
    if (best === undefined || row.utilisation > best.utilisation) best = { combination: row.combination, utilisation: row.utilisation };
  }
  if (best !== undefined) return best.combination;
  let governing: { combination: string; utilisation: number } | undefined;
  for (const member of result.members) {
    const utilisation = member.utilisation ?? Number.POSITIVE_INFINITY;
    if (governing === undefined || utilisation > governing.utilisation) governing = { combination: member.governing.combination, utilisation };
  }
  return governing?.combination;
}

/**
 * For each scenario with bearing points: the bearing state under its governing combination, and,
 * when another combination leaves fewer points in contact, that one too (where lift-off shows).
 */
export function bearingPanels(result: DesignResult): BearingPanel[] {
  const panels: BearingPanel[] = [];
  for (const scenario of result.scenarios) {
    const own = result.analyses.filter((a) => a.scenario === scenario.id && a.bearings !== undefined);
    const combination = governingCombinationOf(result, scenario.id);
    const shown = own.find((a) => a.combination === combination);
    if (shown?.bearings === undefined) continue;
    panels.push({ scenario, role: 'governing', combination: shown.combination, bearings: shown.bearings });
    let least: AnalysisSummary | undefined;
    for (const analysis of own) {
      if ((analysis.bearings?.contactFraction ?? 1) < (least?.bearings?.contactFraction ?? shown.bearings.contactFraction)) least = analysis;
    }
    if (least?.bearings !== undefined) panels.push({ scenario, role: 'least contact', combination: least.combination, bearings: least.bearings });
  }
  return panels;
}

/** Column C(j+1) stands at 2 pi j / columns from +X (C1 at +X, counter-clockwise seen from above). */
export function columnAngles(columns: number): number[] {
  return Array.from({ length: columns }, (_, j) => (2 * Math.PI * j) / columns);
}
