import { analyseAll, GirderError, type AnalysisResult, type GirderModel, type SectionStiffness, type Station } from '@binsupport/girder';
import { circularBinGeometry, circularBinLoads, LoadsError, PERMANENT_CASE, SOLID_FILLING_CASE, STANDARD_GRAVITY, type LoadSet } from '@binsupport/loads';
import { solveSelection, tieTolerance, type SelectionCandidate, type SelectionGroup, type SelectionProblem } from '@binsupport/optimiser';
import type { BinSpec, CircularBinSpec } from '@binsupport/spec';
import { checkFlexuralBuckling, generateWeldedBoxes, generateWeldedSections, loadRolledSections, rolledSection, SteelError, steelGrade, type SteelGrade, type SteelSection } from '@binsupport/steel';
import { DesignError } from './errors.js';
import { envelopeChecks, governingEnvelope, maxStationUtilisation, maxUtilisation, type CheckEnvelope, type StationSet } from './evaluate.js';
import { buildRingModel, columnId, nodeAngle, type RingLayout } from './ring.js';
import { columnChecks, columnDemands, type ColumnDemand } from './columns.js';
import { bearingPoints, bearingStiffenerMass, bearingStiffenerOf, DEFAULT_SERVICEABILITY, displacementChecks, forceChecks, settlementOf, type AnalysedCase, type ServiceabilityLimits } from './girder-checks.js';
import { DESIGN_SCHEMA_VERSION, type AnalysisSummary, type GuardReport, type DesignResult, type ForceDiagram, type MemberResult, type OptimisationStep, type Position, type UtilisationRow } from './result.js';
import { SCENARIOS, scenarioSummary, type ScenarioDefinition } from './scenarios.js';
import { girderModelDocument, type GirderModelDocument } from './model-file.js';
import { TOOL_NAME, TOOL_VERSION } from './version.js';
import { contactGuard, meshGuard, reanalysisGuard } from './guards.js';

export const CAUTIONS = [
  'This is a first-pass design produced by software. It must be checked and verified by a qualified structural engineer before it is used for construction.',
  'Local building codes, national annexes and licensed engineering practice govern over every value and assumption in this document.',
  'The analysis covers only the actions, support scenarios and checks listed in this report; connections, column bases, foundations and the shell itself are outside its scope, and the columns are checked as members only (pinned at the base, held at the top by bracing).',
];

export interface DesignOptions {
  progress?: (line: string) => void;
  /** Largest number of analyse-and-select rounds before the loop stops. */
  maxIterations?: number;
  /** Stations per element at which internal forces are checked (ends included). */
  stationsPerElement?: number;
  /** Deflection limit of the girder between columns as span / ratio (default 500, common practice). */
  deflectionLimitRatio?: number;
  /** Twist limit of the girder, rad (default 0.01, common practice). */
  twistLimit?: number;
  /** Steel grades the optimiser may choose from, one for all member groups (default [support.grade]). */
  grades?: string[];
  /** Price per kg of each grade (default DEFAULT_PRICE_PER_KG, relative to S235; a grade not listed costs 1). */
  pricePerKg?: Record<string, number>;
  /** Cost added for each distinct (section, grade) pair used, in the units of the price (default 0). */
  costPerDistinctSection?: number;
  /**
   * Whole designs in the column-stiffness iteration (default 4, the most; 1: a single design with
   * support.columnSection in the girder model, as the brute-force tests compare against).
   */
  columnStiffnessRounds?: number;
  /** Analyse and report the support scenarios outside the design envelope beside it (default true; the option comparison sets false). */
  comparisonScenarios?: boolean;
  /** At most this many distinct (section, grade) pairs over the girder and the columns (default: no cap). */
  maxDistinctSections?: number;
  /** Rolled series of the column candidates of a ring on columns (default ['HE B']). */
  columnSeries?: SteelSection['series'][];
}

/** A candidate of a member group: a section in a grade, and its utilisation under the forces used. */
interface CandidateOption {
  section: SteelSection;
  grade: SteelGrade;
  utilisation: number;
}

/** The best choice found under one girder's own forces. */
interface Choice {
  girder: SteelSection;
  grade: SteelGrade;
  column?: SteelSection;
  objective: number;
}

/**
 * The candidates, the cost model and the memoised checks of the integer program: girder candidates
 * (section x grade) under an analysed girder's forces, column candidates (section x grade) under the
 * column forces of that analysis, one grade for all groups, a distinct-section cap and cost.
 */
function selectionSetup(context: DesignContext, options: DesignOptions, girderLength: number) {
  const { spec, layout } = context;
  const gradeNames = options.grades ?? [spec.support.grade];
  if (gradeNames.length === 0) throw new DesignError('BAD_INPUT', 'options.grades must name at least one steel grade', 'options.grades');
  const grades = [...new Set(gradeNames)].map((name, i) => {
    try {
      return steelGrade(name);
    } catch (error) {
      if (error instanceof SteelError) throw new DesignError('BAD_INPUT', `options.grades[${i}]: ${error.message}`, `options.grades[${i}]`);
      throw error;
    }
  });
  const maxDistinctSections = options.maxDistinctSections;
  if (maxDistinctSections !== undefined && !(Number.isInteger(maxDistinctSections) && maxDistinctSections >= 1)) {
    throw new DesignError('BAD_INPUT', `options.maxDistinctSections must be a whole number of at least 1; got ${maxDistinctSections}`, 'options.maxDistinctSections');
  }
  const costPerDistinctSection = options.costPerDistinctSection ?? 0;
  if (!(Number.isFinite(costPerDistinctSection) && costPerDistinctSection >= 0)) {
    throw new DesignError('BAD_INPUT', `options.costPerDistinctSection must be zero or a positive number; got ${costPerDistinctSection}`, 'options.costPerDistinctSection');
  }
  const pricePerKg = Object.fromEntries(grades.map((grade) => [grade.name, options.pricePerKg?.[grade.name] ?? DEFAULT_PRICE_PER_KG[grade.name] ?? 1]));
  for (const [name, price] of Object.entries(pricePerKg)) {
    if (!(Number.isFinite(price) && price > 0)) throw new DesignError('BAD_INPUT', `options.pricePerKg.${name} must be a positive number; got ${price}`, `options.pricePerKg.${name}`);
  }
  const price = (grade: SteelGrade): number => pricePerKg[grade.name] ?? 1;
  const hasColumns = layout.kind !== 'slab';
  const columnSeries = new Set(options.columnSeries ?? DEFAULT_COLUMN_SERIES);
  const columnCandidates = hasColumns
    ? loadRolledSections()
        .filter((section) => columnSeries.has(section.series))
        .sort((a, b) => a.properties.massPerMetre - b.properties.massPerMetre || a.designation.localeCompare(b.designation))
    : [];
  if (hasColumns && columnCandidates.length === 0) throw new DesignError('BAD_INPUT', 'no column candidates in the chosen series', 'options.columnSeries');
  const columnLength = layout.columns * spec.support.columnHeight;
  const keysMatter = maxDistinctSections !== undefined || costPerDistinctSection > 0;
  const costObjective = keysMatter || grades.some((grade) => price(grade) !== 1) || ((spec.support.weldedGirders !== undefined || spec.support.weldedBoxes !== undefined) && spec.optimisation.weldedPriceFactor !== 1);
  const keyOf = (section: SteelSection, grade: SteelGrade): string => `${section.designation} ${grade.name}`;
  const gradeAttribute = (grade: SteelGrade): number => Math.round((grade.strengths[0]?.yieldStrength ?? 0) / 1e6);
  // The girder's steel includes its bearing stiffeners, when the spec asks for them (their size follows the section).
  // A welded girder's steel costs optimisation.weldedPriceFactor times a rolled section's (fabrication).
  const fabricationFactor = (section: SteelSection): number => (section.fabrication === 'welded' ? spec.optimisation.weldedPriceFactor : 1);
  const girderCost = (section: SteelSection, grade: SteelGrade): number =>
    (section.properties.massPerMetre * girderLength * fabricationFactor(section) + bearingStiffenerMass(section, spec, layout)) * price(grade);
  const columnCost = (section: SteelSection, grade: SteelGrade): number => section.properties.massPerMetre * columnLength * price(grade);

  const girderMemo = new Map<string, CheckEnvelope[]>();
  const girderEnvelopes = (entry: SectionAnalysis, grade: SteelGrade): CheckEnvelope[] => {
    if (grade.name === context.grade.name) return entry.envelopes;
    const key = `${entry.section.designation}|${entry.scenarios.map((s) => s.analyses.length).join(',')}|${grade.name}`;
    let envelopes = girderMemo.get(key);
    if (!envelopes) {
      envelopes = sectionEnvelopes(context, entry.section, grade, entry.scenarios);
      girderMemo.set(key, envelopes);
    }
    return envelopes;
  };
  const demandMemo = new Map<SectionAnalysis, ColumnDemand[]>();
  const demandsOf = (entry: SectionAnalysis): ColumnDemand[] => {
    let demands = demandMemo.get(entry);
    if (!demands) {
      demands = governingDemands(columnDemands(context.loads, layout, casesOf(entry.scenarios, sizingCombinations(context.loads))));
      demandMemo.set(entry, demands);
    }
    return demands;
  };
  const columnMemo = new Map<string, CheckEnvelope[]>();
  const columnEnvelopes = (entry: SectionAnalysis, column: SteelSection, grade: SteelGrade): CheckEnvelope[] => {
    const key = `${entry.section.designation}|${column.designation}|${grade.name}`;
    let envelopes = columnMemo.get(key);
    if (!envelopes) {
      envelopes = columnChecks(column, grade, spec.support.columnHeight, demandsOf(entry));
      columnMemo.set(key, envelopes);
    }
    return envelopes;
  };
  const columnUtilisation = (entry: SectionAnalysis, column: SteelSection, grade: SteelGrade): number => maxUtilisation(columnEnvelopes(entry, column, grade));
  const girderUtilisation = (entry: SectionAnalysis, grade: SteelGrade): number => maxUtilisation(girderEnvelopes(entry, grade));

  /** Column candidates under an analysis: lightest first per grade, the heavier ones dominated unless keys matter. */
  const columnOptions = (entry: SectionAnalysis): CandidateOption[] => {
    const list: CandidateOption[] = [];
    for (const grade of grades) {
      for (const section of columnCandidates) {
        const utilisation = columnUtilisation(entry, section, grade);
        list.push({ section, grade, utilisation });
        if (utilisation <= 1 && !keysMatter) break;
      }
    }
    return list;
  };
  const byId = new Map<string, CandidateOption>();
  const toCandidates = (list: CandidateOption[], cost: (section: SteelSection, grade: SteelGrade) => number): SelectionCandidate[] =>
    [...list]
      .sort((a, b) => cost(a.section, a.grade) - cost(b.section, b.grade) || a.section.designation.localeCompare(b.section.designation) || a.grade.name.localeCompare(b.grade.name))
      .map((option) => {
        const id = keyOf(option.section, option.grade);
        byId.set(id, option);
        return { id, key: id, cost: cost(option.section, option.grade), feasible: option.utilisation <= 1, attributes: { grade: gradeAttribute(option.grade) } };
      });
  const problem = (girderOptions: CandidateOption[], columnOptionList: CandidateOption[]): SelectionProblem => {
    const groups: SelectionGroup[] = [{ id: MEMBER_ID, candidates: toCandidates(girderOptions, girderCost) }];
    if (hasColumns) groups.push({ id: COLUMN_MEMBER_ID, candidates: toCandidates(columnOptionList, columnCost) });
    return {
      groups,
      ...(maxDistinctSections !== undefined ? { maxDistinctKeys: maxDistinctSections } : {}),
      ...(costPerDistinctSection > 0 ? { distinctKeyCost: costPerDistinctSection } : {}),
      ...(hasColumns && grades.length > 1 ? { sameAttributeGroups: [{ groups: [MEMBER_ID, COLUMN_MEMBER_ID], attribute: 'grade' }] } : {}),
    };
  };
  /** The least-cost choice with each girder judged by its own forces (one integer program per girder). */
  const bestOver = async (entries: SectionAnalysis[]): Promise<Choice | undefined> => {
    let best: Choice | undefined;
    for (const entry of entries) {
      const girderOptions = grades.map((grade) => ({ section: entry.section, grade, utilisation: girderUtilisation(entry, grade) }));
      if (!girderOptions.some((option) => option.utilisation <= 1)) continue;
      const solved = await solveSelection(problem(girderOptions, hasColumns ? columnOptions(entry) : []));
      if (solved.status === 'infeasible') continue;
      const girder = byId.get(solved.choice[MEMBER_ID] ?? '');
      const column = hasColumns ? byId.get(solved.choice[COLUMN_MEMBER_ID] ?? '') : undefined;
      if (!girder) continue;
      const better = !best || solved.objective < best.objective - tieTolerance(best.objective) || (Math.abs(solved.objective - best.objective) <= tieTolerance(best.objective) && entry.section.properties.massPerMetre < best.girder.properties.massPerMetre);
      if (better) best = { girder: entry.section, grade: girder.grade, ...(column ? { column: column.section } : {}), objective: solved.objective };
    }
    return best;
  };
  const minPrice = Math.min(...grades.map(price));
  // A lower bound on the columns of any choice: the columns' reactions add up to at least the
  // factored vertical load of the support line (the girder's own weight adds to it), so in the worst
  // sizing combination some column carries at least the mean, sum / n. A column that fails flexural
  // buckling (EN 1993-1-1 6.3.1, the column's own check) under that compression alone, in the
  // strongest grade offered, is never chosen: the lightest that passes bounds the column cost.
  const sizing = sizingCombinations(context.loads);
  const meanCompression = hasColumns
    ? Math.max(0, ...context.loads.combinations.filter((combination) => sizing.has(combination.name)).map((combination) => context.loads.cases.reduce((sum, loadCase) => sum + (combination.factors[loadCase.name] ?? 0) * loadCase.verticalResultant, 0))) / layout.columns
    : 0;
  const strongestGrade = [...grades].sort((a, b) => (b.strengths[0]?.yieldStrength ?? 0) - (a.strengths[0]?.yieldStrength ?? 0))[0];
  const lightestColumn = strongestGrade ? (columnCandidates.find((column) => checkFlexuralBuckling(column, strongestGrade, -meanCompression, { length: spec.support.columnHeight, ends: 'pinned-pinned' }).utilisation <= 1) ?? columnCandidates[0]) : columnCandidates[0];
  return {
    grades,
    columnCandidates,
    hasColumns,
    keysMatter,
    costObjective,
    costSummary: { pricePerKg, costPerDistinctSection, maxDistinctSections: maxDistinctSections ?? null, grades: grades.map((grade) => grade.name) },
    girderUtilisation,
    girderEnvelopes,
    columnUtilisation,
    columnEnvelopes,
    columnOptions,
    problem,
    option: (id: string | undefined): CandidateOption | undefined => byId.get(id ?? ''),
    bestOver,
    /**
     * A lower bound on the objective of any choice with this girder, from a screened analysis (a few
     * combinations): for each grade in which the girder passes there, its cost plus the cheapest
     * column that passes under the screened column demands, plus one distinct section. More
     * combinations only add demands, so the full analysis can pass no girder grade and no column
     * that fails here: the bound holds. Infinity when no column passes. The column memo is not used
     * (it is keyed by the girder section, whose full analysis may follow).
     */
    screenedLowerBound: (screened: SectionAnalysis, passingGrades: SteelGrade[]): number => {
      const demands = hasColumns ? governingDemands(columnDemands(context.loads, layout, casesOf(screened.scenarios, sizingCombinations(context.loads)))) : [];
      let bound = Infinity;
      for (const grade of passingGrades) {
        let columns = 0;
        if (hasColumns) {
          const passing = columnCandidates.find((column) => maxUtilisation(columnChecks(column, grade, spec.support.columnHeight, demands)) <= 1);
          if (!passing) continue;
          columns = columnCost(passing, grade);
        }
        bound = Math.min(bound, girderCost(screened.section, grade) + columns + costPerDistinctSection);
      }
      return bound;
    },
    /** The least objective any choice with this girder can have. */
    lowerBound: (section: SteelSection): number =>
      (section.properties.massPerMetre * girderLength * fabricationFactor(section) + bearingStiffenerMass(section, spec, layout)) * minPrice + (lightestColumn ? lightestColumn.properties.massPerMetre * columnLength * minPrice : 0) + costPerDistinctSection,
    bestAttemptColumn: (entry: SectionAnalysis, grade: SteelGrade): SteelSection | undefined => {
      if (!hasColumns) return undefined;
      const ranked = columnCandidates.map((section) => ({ section, utilisation: columnUtilisation(entry, section, grade) }));
      return (ranked.find((option) => option.utilisation <= 1) ?? [...ranked].sort((a, b) => a.utilisation - b.utilisation)[0])?.section;
    },
    /** Sum of mass x price over the members, plus the cost per distinct section of those that are rolled sections (keyed). */
    objectiveOf: (members: Array<{ mass: number; key: string | undefined; factor?: number }>, grade: SteelGrade): number =>
      members.reduce((sum, member) => sum + member.mass * (member.factor ?? 1) * price(grade), 0) + costPerDistinctSection * new Set(members.flatMap((member) => (member.key === undefined ? [] : [member.key]))).size,
  };
}

/**
 * The column demands that can govern: per (combination, scenario), those not dominated by another
 * with at least the compression and at least the moment (every column check grows with both).
 */
function governingDemands(demands: ColumnDemand[]): ColumnDemand[] {
  const groups = new Map<string, ColumnDemand[]>();
  for (const demand of demands) {
    const key = `${demand.combination}|${demand.scenario}`;
    groups.set(key, [...(groups.get(key) ?? []), demand]);
  }
  const kept: ColumnDemand[] = [];
  for (const list of groups.values()) {
    kept.push(
      ...list.filter(
        (demand, i) =>
          !list.some((other, j) => j !== i && other.compression >= demand.compression && Math.abs(other.moment) >= Math.abs(demand.moment) && (other.compression > demand.compression || Math.abs(other.moment) > Math.abs(demand.moment) || j < i)),
      ),
    );
  }
  return kept;
}

export interface DesignOutcome {
  result: DesignResult;
  /** The girder-model file of each support scenario, with the final sections (for `analyse`). */
  models: Array<{ scenario: string; model: GirderModelDocument }>;
}

export const familyToSeries: Record<BinSpec['support']['sectionFamilies'][number], SteelSection['series']> = { IPE: 'IPE', HEA: 'HE A', HEB: 'HE B', HEM: 'HE M' };

/** Member ids of the result (docs/output-schema.md): the ring girder and the columns. */
export const MEMBER_ID = 'RG';
export const COLUMN_MEMBER_ID = 'C';
/** The bearing stiffeners over the columns (a member of the result when the spec asks for them). */
const STIFFENER_MEMBER_ID = 'ST';

/**
 * Default price per kg of steel by grade, relative to S235 (the objective is then in kg of S235
 * equivalent). The order of the grade extras is common practice; the values are not a market quote:
 * give DesignOptions.pricePerKg for a real comparison.
 */
export const DEFAULT_PRICE_PER_KG: Readonly<Record<string, number>> = Object.freeze({ S235: 1.0, S275: 1.03, S355: 1.06, S460: 1.15 });

/** Default rolled series of the column candidates. */
export const DEFAULT_COLUMN_SERIES: readonly SteelSection['series'][] = ['HE B'];
const RELATIVE_EQUILIBRIUM_TOLERANCE = 1e-6;

function stiffnessOf(section: SteelSection, grade: SteelGrade, density: number): SectionStiffness {
  const p = section.properties;
  return { A: p.area, Iy: p.secondMomentOfAreaY, Iz: p.secondMomentOfAreaZ, It: p.torsionConstant, Iw: p.warpingConstant, E: grade.youngsModulus, G: grade.shearModulus, density };
}

/** One scenario's model and its analyses (one per combination) for one section. */
export interface ScenarioAnalysis {
  scenario: ScenarioDefinition;
  model: GirderModel;
  analyses: AnalysisResult[];
}

export interface SectionAnalysis {
  section: SteelSection;
  /** The credible scenarios (the design envelope), and later the comparison ones. */
  scenarios: ScenarioAnalysis[];
  uls: StationSet[];
  envelopes: CheckEnvelope[];
  utilisation: number;
}

/** What the analyses share across sections: the spec, loads, layout, grade, column stiffness. */
export interface DesignContext {
  spec: BinSpec;
  loads: LoadSet;
  layout: RingLayout;
  grade: SteelGrade;
  column: { section: SteelSection; axialStiffness: number };
  stationsPerElement: number;
  serviceability: ServiceabilityLimits;
}

/**
 * The circular bin of a spec, for the girder design: the ring girder is built for a circular bin
 * only. A rectangular bin (a polygon frame on corner columns) is refused with its path; its loads
 * are derived by `loadsReport` (the `loads` command).
 */
export function circularBinOf(spec: BinSpec): CircularBinSpec {
  if (spec.bin.shape !== 'circular') {
    throw new DesignError('BAD_INPUT', 'bin.shape rectangular: the girder design covers circular bins on a ring girder only; the support frame of a rectangular bin is not designed yet (binsupport loads derives its loads)', 'bin.shape');
  }
  return spec.bin;
}

/** The actions of a spec that both bin shapes take alike: the solid, the partial factors, roof, snow, wind and seismic. */
export function commonActions(spec: BinSpec) {
  return {
    solid: spec.solid,
    partialFactors: { permanentFactor: spec.actions.permanentFactor, solidFactor: spec.actions.solidFactor, variableFactor: spec.actions.variableFactor, method: spec.actions.combinationMethod },
    ...(spec.roof ? { roof: spec.roof } : {}),
    ...(spec.snow ? { snow: spec.snow } : {}),
    ...(spec.wind ? { wind: spec.wind } : {}),
    ...(spec.seismic ? { seismic: spec.seismic } : {}),
  };
}

export function loadsFor(spec: BinSpec): LoadSet {
  const bin = circularBinOf(spec);
  try {
    return circularBinLoads({
      bin,
      ...commonActions(spec),
      ...(spec.equipment.length > 0 ? { equipment: spec.equipment } : {}),
    });
  } catch (error) {
    if (error instanceof LoadsError) throw new DesignError('BAD_INPUT', error.message, error.path);
    throw error;
  }
}

/** The largest out-of-balance of reactions against applied loads, relative to the applied load, and its axis. */
function relativeImbalance(analysis: AnalysisResult): { relative: number; axis: number; imbalance: number; scale: number } {
  const scale = Math.max(...analysis.appliedSum.map(Math.abs), 1);
  let worst = { relative: 0, axis: 0, imbalance: 0, scale };
  for (let i = 0; i < 3; i++) {
    const imbalance = Math.abs((analysis.reactionSum[i] ?? 0) + (analysis.appliedSum[i] ?? 0));
    if (imbalance / scale > worst.relative) worst = { relative: imbalance / scale, axis: i, imbalance, scale };
  }
  return worst;
}

/** Check the equilibrium of one analysis: reactions balance the applied loads (guard, after every analysis). */
function guardEquilibrium(analysis: AnalysisResult, scenario: string): void {
  const { relative, axis, imbalance, scale } = relativeImbalance(analysis);
  if (relative <= RELATIVE_EQUILIBRIUM_TOLERANCE) return;
  // Out of balance with a small backward error: the stiffness of the contact state is nearly
  // singular (a near-mechanism), typically a girder left on part of its bearings.
  const springs = analysis.springForces.length;
  const pressing = analysis.contact?.activeSprings.length ?? springs;
  const largest = Math.max(0, ...analysis.displacements.map((node) => Math.max(Math.abs(node.ux), Math.abs(node.uy), Math.abs(node.uz))));
  const contact = springs > 0 ? `, with ${pressing} of ${springs} bearing points pressing` : '';
  throw new DesignError(
    'GUARD_FAILED',
    `equilibrium guard: in ${analysis.combination} / ${scenario} the reactions do not balance the loads along ${'XYZ'[axis]} (imbalance ${imbalance.toExponential(3)} N of ${scale.toExponential(3)} N; largest displacement ${largest.toExponential(2)} m${contact}): the contact state is a near-mechanism and its solution cannot be trusted; if the bin lifts off under this combination it must be held down (anchors) or be heavier`,
  );
}

export function sizingCombinations(loads: LoadSet): Set<string> {
  return new Set(loads.combinations.filter((combination) => combination.limitState === 'ULS' && combination.verification !== 'EQU').map((combination) => combination.name));
}

/** The serviceability combinations checked for deflection and twist: the characteristic ones (EN 1990 6.5.3 a). */
export function serviceabilityCombinations(loads: LoadSet): Set<string> {
  return new Set(loads.combinations.filter((combination) => combination.limitState === 'SLS' && combination.verification === 'SLS-characteristic').map((combination) => combination.name));
}

/**
 * The EQU combinations, when the girder is held down (cap bolts, or anchors on a slab): the
 * holding-down members take part in the static equilibrium, so they are checked under EQU as well
 * as STR (EN 1990 6.4.1(1)a, A1.3.1(2)); the other checks stay with STR. Empty otherwise.
 */
export function holdingDownCombinations(loads: LoadSet, spec: BinSpec): Set<string> {
  const heldDown = spec.support.capBolts !== undefined || spec.support.anchorCapacity > 0;
  if (!heldDown) return new Set();
  return new Set(loads.combinations.filter((combination) => combination.limitState === 'ULS' && combination.verification === 'EQU').map((combination) => combination.name));
}

/** The combinations of the force checks: the sizing ULS ones and, for a girder held down, EQU. */
export function forceCheckCombinations(loads: LoadSet, spec: BinSpec): Set<string> {
  return new Set([...sizingCombinations(loads), ...holdingDownCombinations(loads, spec)]);
}

/** The combinations a section is checked under: the sizing ULS ones (with EQU for a girder held down) and the SLS characteristic ones. */
export function designCombinations(loads: LoadSet, spec: BinSpec): Set<string> {
  return new Set([...forceCheckCombinations(loads, spec), ...serviceabilityCombinations(loads)]);
}

/** Every analysed combination of the scenarios, with its model, restricted to the names given. */
function casesOf(scenarios: ScenarioAnalysis[], names: Set<string>): AnalysedCase[] {
  return scenarios.flatMap(({ scenario, model, analyses }) => analyses.filter((analysis) => names.has(analysis.combination)).map((analysis) => ({ scenario: scenario.id, model, analysis })));
}

/**
 * The checks that hold for any candidate under the forces of analysed scenarios (the section need not
 * be the one analysed): cross-section checks at every station, the web over the columns, the flange
 * under the bearing, the ring under the hopper's pull, anchors. ULS sizing combinations only.
 */
export function forceEnvelopes(context: DesignContext, section: SteelSection, grade: SteelGrade, scenarios: ScenarioAnalysis[]): CheckEnvelope[] {
  return [...envelopeChecks(section, grade, ulsStations(context, scenarios)), ...forceChecks(context, section, grade, casesOf(scenarios, forceCheckCombinations(context.loads, context.spec)))];
}

/** All checks of the analysed section: the force checks and serviceability from its own displacements. */
export function sectionEnvelopes(context: DesignContext, section: SteelSection, grade: SteelGrade, scenarios: ScenarioAnalysis[]): CheckEnvelope[] {
  return [...forceEnvelopes(context, section, grade, scenarios), ...displacementChecks(context, casesOf(scenarios, serviceabilityCombinations(context.loads)))];
}

/**
 * The largest utilisation of a candidate under the forces of an analysed section, cheapest checks
 * first: the local and ring checks (a few per combination), then a station scan that stops at the
 * first excess. A candidate rejected early gets the utilisation of the check that rejected it (or Infinity from the scan).
 */
function screenUnderForces(context: DesignContext, section: SteelSection, grade: SteelGrade, state: SectionAnalysis): number {
  const local = maxUtilisation(forceChecks(context, section, grade, casesOf(state.scenarios, forceCheckCombinations(context.loads, context.spec))));
  if (!(local <= 1)) return local;
  return Math.max(local, maxStationUtilisation(section, grade, state.uls));
}

/**
 * Whether a section can pass under its own forces, judged from a few combinations: the least over the
 * grades of its largest utilisation there (the fast scan: Infinity at the first excess). Used to skip
 * a full analysis of a section that fails anyway.
 */
function screenSection(context: DesignContext, section: SteelSection, scenarios: ScenarioDefinition[], only: Set<string>, grades: SteelGrade[]): { utilisation: number; state: SectionAnalysis; passingGrades: SteelGrade[] } {
  const analysed = scenarios.map((scenario) => analyseScenario(context, section, scenario, only));
  const state: SectionAnalysis = { section, scenarios: analysed, uls: ulsStations(context, analysed), envelopes: [], utilisation: 0 };
  const displacement = maxUtilisation(displacementChecks(context, casesOf(analysed, serviceabilityCombinations(context.loads))));
  if (!(displacement <= 1)) return { utilisation: displacement, state, passingGrades: [] };
  const byGrade = grades.map((grade) => ({ grade, utilisation: screenUnderForces(context, section, grade, state) }));
  return {
    utilisation: Math.max(displacement, Math.min(...byGrade.map((entry) => entry.utilisation))),
    state,
    passingGrades: byGrade.filter((entry) => entry.utilisation <= 1).map((entry) => entry.grade),
  };
}

/** Analyse one scenario under the combinations named in `only` (default: all of them). */
export function analyseScenario(context: DesignContext, section: SteelSection, scenario: ScenarioDefinition, only?: Set<string>): ScenarioAnalysis {
  const { spec, loads, layout, grade } = context;
  const model = buildRingModel({
    layout,
    section: stiffnessOf(section, grade, spec.bin.steelDensity),
    sectionDepth: section.dimensions.depth,
    cases: loads.cases,
    selfWeightCase: PERMANENT_CASE,
    ...(scenario.columnSupport ? { columnSupport: scenario.columnSupport(section, context.column, spec, grade) } : {}),
    ...(scenario.slabBearing ? { slabBearing: scenario.slabBearing(section, spec, grade) } : {}),
  });
  const combinations = loads.combinations.filter((combination) => only === undefined || only.has(combination.name));
  let analyses: AnalysisResult[];
  try {
    // One call for all combinations: each is solved on its own (contact forbids superposition), but
    // the set-up and the factorisations of repeated contact states are shared.
    analyses = analyseAll(model, combinations.map((combination) => ({ name: combination.name, factors: combination.factors })), { stationsPerElement: context.stationsPerElement });
  } catch (error) {
    if (error instanceof GirderError) throw analysisRefusal(model, combinations, scenario, section, error, context.stationsPerElement);
    throw error;
  }
  for (const analysis of analyses) guardEquilibrium(analysis, scenario.id);
  return { scenario, model, analyses };
}

/**
 * The refusal of an analysis, naming the combination that failed (found by analysing the
 * combinations one by one, on this failure path only) and, for a lift-off under an EQU combination,
 * what the bin needs: the empty bin overturns or lifts off its bearings.
 */
function analysisRefusal(model: GirderModel, combinations: LoadSet['combinations'], scenario: ScenarioDefinition, section: SteelSection, error: GirderError, stationsPerElement: number): DesignError {
  let failing: LoadSet['combinations'][number] | undefined;
  for (const combination of combinations) {
    try {
      analyseAll(model, [{ name: combination.name, factors: combination.factors }], { stationsPerElement });
    } catch (caught) {
      if (caught instanceof GirderError) {
        failing = combination;
        break;
      }
      throw caught;
    }
  }
  const where = failing ? ` in ${failing.name} (${failing.expression})` : '';
  const liftOff = /lifted off|lifts the girder|lifting off its bearings/.test(error.message);
  const equilibrium = failing?.verification === 'EQU' ? ' (static equilibrium, EN 1990 6.4.1 EQU)' : '';
  const advice = !liftOff
    ? ''
    : scenario.supportType === 'ring-on-slab'
      ? `: under this combination the bin lifts off its bearing${equilibrium}; it must be held down (support.anchorCapacity with the slab-anchored scenario) or be heavier`
      : `: under this combination the bin lifts off its column caps${equilibrium}; the caps need holding-down bolts (support.capBolts, the scenario column-cap-bolted) or the bin must be heavier`;
  return new DesignError('ANALYSIS_FAILED', `analysis under ${scenario.id} with ${section.designation}${where} refused: ${error.message}${advice}`);
}

function ulsStations(context: DesignContext, scenarios: ScenarioAnalysis[]): StationSet[] {
  const uls = sizingCombinations(context.loads);
  return scenarios.flatMap(({ scenario, analyses }) =>
    analyses.filter((analysis) => uls.has(analysis.combination)).map((analysis) => ({ combination: analysis.combination, scenario: scenario.id, stations: analysis.stations })),
  );
}

/** Analyse a section under the given scenarios and the design combinations, ULS and SLS (or only those named). */
export function analyseSection(context: DesignContext, section: SteelSection, scenarios: ScenarioDefinition[], only: Set<string> = designCombinations(context.loads, context.spec)): SectionAnalysis {
  const analysed = scenarios.map((scenario) => analyseScenario(context, section, scenario, only));
  const uls = ulsStations(context, analysed);
  const envelopes = sectionEnvelopes(context, section, context.grade, analysed);
  return { section, scenarios: analysed, uls, envelopes, utilisation: maxUtilisation(envelopes) };
}

/** The design context of a spec: loads, layout, grade and the column's axial stiffness. */
export function designContext(spec: BinSpec, stationsPerElement = 5, serviceability: Partial<ServiceabilityLimits> = {}): DesignContext {
  const grade = steelGrade(spec.support.grade);
  let columnSection: SteelSection;
  try {
    columnSection = rolledSection(spec.support.columnSection);
  } catch (error) {
    if (error instanceof SteelError) throw new DesignError('BAD_INPUT', `support.columnSection: ${error.message}`, 'support.columnSection');
    throw error;
  }
  return {
    spec,
    loads: loadsFor(spec),
    layout: { kind: spec.support.type === 'ring-on-slab' ? 'slab' : 'columns', radius: spec.support.girderDiameter / 2, columns: spec.support.columns, segmentsPerSpan: spec.support.segmentsPerSpan },
    grade,
    // Axial stiffness of the column, E A / H (the cap's bearing springs share it).
    column: { section: columnSection, axialStiffness: (grade.youngsModulus * columnSection.properties.area) / spec.support.columnHeight },
    stationsPerElement,
    serviceability: { ...DEFAULT_SERVICEABILITY, ...serviceability },
  };
}

/** Where a station lies around the ring, in words a site engineer recognises. */
const modelIndexCache = new WeakMap<GirderModel, { elements: Map<string, GirderModel['elements'][number]>; nodes: Map<string, GirderModel['nodes'][number]> }>();

/** Elements and nodes by id, built once per model (positions are asked for every station). */
function modelIndex(model: GirderModel) {
  let index = modelIndexCache.get(model);
  if (!index) {
    index = { elements: new Map(model.elements.map((element) => [element.id, element])), nodes: new Map(model.nodes.map((node) => [node.id, node])) };
    modelIndexCache.set(model, index);
  }
  return index;
}

function positionOf(model: GirderModel, layout: RingLayout, station: Station): Position {
  const index = modelIndex(model);
  const element = index.elements.get(station.element);
  const nodeI = element ? index.nodes.get(element.nodeI) : undefined;
  const nodeJ = element ? index.nodes.get(element.nodeJ) : undefined;
  if (!element || !nodeI || !nodeJ) return { element: station.element, x: station.x, angle: 0, description: station.element };
  const L = Math.hypot(nodeJ.x - nodeI.x, nodeJ.y - nodeI.y, nodeJ.z - nodeI.z);
  const t = L > 0 ? station.x / L : 0;
  const x = nodeI.x + t * (nodeJ.x - nodeI.x);
  const y = nodeI.y + t * (nodeJ.y - nodeI.y);
  let angle = Math.atan2(y, x);
  if (angle < 0) angle += 2 * Math.PI;
  if (layout.kind === 'slab') {
    return { element: station.element, x: station.x, angle, description: `at ${((angle * 180) / Math.PI).toFixed(1)} deg around the ring (from +X)` };
  }
  const span = (2 * Math.PI) / layout.columns;
  const spanIndex = Math.floor(angle / span + 1e-9) % layout.columns;
  const fromColumn = angle - spanIndex * span;
  const degrees = (fromColumn * 180) / Math.PI;
  const spanDegrees = (span * 180) / Math.PI;
  let description: string;
  if (degrees < 1e-6 || spanDegrees - degrees < 1e-6) {
    const at = degrees < 1e-6 ? spanIndex : (spanIndex + 1) % layout.columns;
    description = `over column ${columnId(at)}`;
  } else if (Math.abs(degrees - spanDegrees / 2) < 1e-6) {
    description = `mid-span between ${columnId(spanIndex)} and ${columnId((spanIndex + 1) % layout.columns)}`;
  } else {
    description = `${degrees.toFixed(1)} deg from ${columnId(spanIndex)} toward ${columnId((spanIndex + 1) % layout.columns)}`;
  }
  return { element: station.element, x: station.x, angle, description };
}

function diagramOf(model: GirderModel, layout: RingLayout, stations: Station[]): ForceDiagram {
  const rows = stations.map((station) => ({ station, angle: positionOf(model, layout, station).angle }));
  rows.sort((a, b) => a.angle - b.angle);
  return {
    angle: rows.map((row) => row.angle),
    N: rows.map((row) => row.station.N),
    Vz: rows.map((row) => row.station.Vz),
    T: rows.map((row) => row.station.T),
    My: rows.map((row) => row.station.My),
    Mz: rows.map((row) => row.station.Mz),
    B: rows.map((row) => row.station.B),
  };
}

type Peaks = AnalysisSummary['peaks'];

/** Largest absolute internal forces over all stations of an analysis, in one pass. */
function peaksOf(stations: Station[]): Peaks {
  const peaks: Peaks = { N: 0, Vz: 0, T: 0, My: 0, Mz: 0, B: 0 };
  for (const station of stations) {
    for (const key of Object.keys(peaks) as Array<keyof Peaks>) peaks[key] = Math.max(peaks[key], Math.abs(station[key]));
  }
  return peaks;
}

/** The whole pipeline for one spec: loads, analysis, checks, selection, verification, result. */
/** The design options a spec sets (optimisation and serviceability inputs); explicit options win. */
/** Most welded girders a design considers (each may need its own analysis in the descent). */
export const MAX_WELDED_CANDIDATES = 800;

/** The welded plate girders within support.weldedGirders and the welded boxes within support.weldedBoxes (none when not given). */
function weldedCandidates(spec: BinSpec): SteelSection[] {
  const generated = (path: 'support.weldedGirders' | 'support.weldedBoxes', generate: () => SteelSection[], what: string, empty: string): SteelSection[] => {
    let sections: SteelSection[];
    try {
      sections = generate();
    } catch (error) {
      if (error instanceof SteelError) throw new DesignError('BAD_INPUT', `${path}: ${error.message}`, path);
      throw error;
    }
    if (sections.length === 0) throw new DesignError('BAD_INPUT', `${path} gives no ${what} (${empty})`, path);
    if (sections.length > MAX_WELDED_CANDIDATES) {
      throw new DesignError('BAD_INPUT', `${path} gives ${sections.length} ${what}s; at most ${MAX_WELDED_CANDIDATES} (narrow the depth or width range, take larger steps, or list fewer plate thicknesses)`, path);
    }
    return sections;
  };
  const girders = spec.support.weldedGirders;
  const boxes = spec.support.weldedBoxes;
  return [
    ...(girders ? generated('support.weldedGirders', () => generateWeldedSections(girders), 'welded girder', 'every depth leaves no web between the flanges, or no web is as thin as a flange') : []),
    ...(boxes ? generated('support.weldedBoxes', () => generateWeldedBoxes(boxes), 'welded box', 'every depth leaves no web between the flanges, no two webs fit a flange width, or no web is as thin as a flange') : []),
  ];
}

export function optionsFromSpec(spec: BinSpec): DesignOptions {
  const series: Record<BinSpec['optimisation']['columnSeries'][number], SteelSection['series']> = { HEA: 'HE A', HEB: 'HE B', HEM: 'HE M' };
  const prices = Object.fromEntries(Object.entries(spec.optimisation.pricePerKg ?? {}).filter(([, price]) => price !== undefined)) as Record<string, number>;
  return {
    ...(spec.optimisation.grades ? { grades: spec.optimisation.grades } : {}),
    ...(Object.keys(prices).length > 0 ? { pricePerKg: prices } : {}),
    costPerDistinctSection: spec.optimisation.costPerDistinctSection,
    ...(spec.optimisation.maxDistinctSections !== undefined ? { maxDistinctSections: spec.optimisation.maxDistinctSections } : {}),
    columnSeries: spec.optimisation.columnSeries.map((family) => series[family]),
    deflectionLimitRatio: spec.serviceability.deflectionLimitRatio,
    twistLimit: spec.serviceability.twistLimit,
  };
}

/** At most this many designs in the column-stiffness iteration (each a whole design). */
const MAX_COLUMN_ROUNDS = 4;

/**
 * Design a bin's support, with the column stiffness iterated: the girder model's columns have the
 * axial stiffness of a column section (first support.columnSection); when the design chooses another
 * column, the whole design is repeated with the chosen column in the model, until the chosen column
 * is the model's (a fixed point: every member verified with the stiffness it has) or a column
 * repeats (a cycle). The result is the least-cost consistent round; without one, the least-cost
 * round whose chosen pair passed its re-analysis with its own column; else the last round.
 * `optimisation.columnRounds` lists the rounds when there was more than one.
 */
export async function designFromSpec(spec: BinSpec, explicit: DesignOptions = {}): Promise<DesignOutcome> {
  circularBinOf(spec);
  const progress = explicit.progress ?? (() => undefined);
  const maxRounds = explicit.columnStiffnessRounds ?? MAX_COLUMN_ROUNDS;
  if (!Number.isInteger(maxRounds) || maxRounds < 1 || maxRounds > MAX_COLUMN_ROUNDS) {
    throw new DesignError('BAD_INPUT', `options.columnStiffnessRounds must be a whole number between 1 and ${MAX_COLUMN_ROUNDS}; got ${maxRounds}`, 'options.columnStiffnessRounds');
  }
  const columnOf = (outcome: DesignOutcome) => outcome.result.members.find((member) => member.id === COLUMN_MEMBER_ID)?.section;
  // The integer program's column (the one-design fallback may have kept the model's instead).
  const chosenOf = (outcome: DesignOutcome) => outcome.result.optimisation.columnStiffness?.chosenColumn ?? columnOf(outcome);
  const withModelColumn = (modelColumn: string): BinSpec => (modelColumn === spec.support.columnSection ? spec : { ...spec, support: { ...spec.support, columnSection: modelColumn } });
  type Round = { modelColumn: string; outcome: DesignOutcome } | { modelColumn: string; provisional: ProvisionalRound['provisional'] } | { modelColumn: string; failed: string };
  const rounds: Round[] = [];
  let modelColumn = spec.support.columnSection;
  let startGirder: string | undefined;
  let settled: DesignOutcome | undefined;
  for (let round = 1; round <= maxRounds; round++) {
    // Rounds are provisional while another may follow: a round that keeps its model's column is finished in full.
    const provisional = round < maxRounds;
    let result: DesignOutcome | ProvisionalRound;
    try {
      result = await designWithModelColumn(withModelColumn(modelColumn), explicit, { provisional, ...(startGirder !== undefined ? { startGirder } : {}) });
    } catch (error) {
      // A later round that cannot be designed (a guard, a lift-off) leaves the earlier rounds standing.
      if (round === 1 || !(error instanceof DesignError)) throw error;
      progress(`column stiffness: with ${modelColumn} in the girder model the design stops (${error.message}); keeping the earlier rounds`);
      rounds.push({ modelColumn, failed: error.message });
      break;
    }
    if ('provisional' in result) {
      rounds.push({ modelColumn, provisional: result.provisional });
      const chosen = result.provisional.chosenColumn;
      if (rounds.some((entry) => entry.modelColumn === chosen)) {
        progress(`column stiffness: the chosen ${chosen} columns were already the model's in an earlier round (cycle)`);
        break;
      }
      progress(`column stiffness: the design chose ${chosen} columns, not the model's ${modelColumn}; designing again with ${chosen} in the girder model`);
      modelColumn = chosen;
      startGirder = result.provisional.girder;
      continue;
    }
    // A finished round ends the iteration: it kept its model's column (settled), or it was the last allowed.
    rounds.push({ modelColumn, outcome: result });
    const chosen = chosenOf(result);
    if (chosen === undefined || chosen === modelColumn) settled = result;
    break;
  }
  if (rounds.length === 1 && rounds[0] && 'outcome' in rounds[0]) return rounds[0].outcome;
  // Without a settled round (a cycle, the round limit, a failure), every provisional round is
  // finished in full and the old rule picks: the least-cost round verified with the stiffness it has.
  const finished: Array<{ modelColumn: string; outcome: DesignOutcome }> = [];
  for (const entry of rounds) {
    if ('outcome' in entry) finished.push(entry);
    else if ('provisional' in entry && !settled) {
      const outcome = await designWithModelColumn(withModelColumn(entry.modelColumn), explicit);
      if (!('provisional' in outcome)) finished.push({ modelColumn: entry.modelColumn, outcome });
    }
  }
  const verified = finished.filter((entry) => entry.outcome.result.status === 'verified');
  // A fixed point: the integer program chose the model's own column.
  const consistent = verified.filter((entry) => chosenOf(entry.outcome) === entry.modelColumn);
  // Verified with the stiffness it has: the model's column kept, or the chosen pair passed its re-analysis.
  const confirmed = verified.filter((entry) => {
    const stiffness = entry.outcome.result.optimisation.columnStiffness;
    return stiffness === undefined || stiffness.kept === stiffness.modelColumn || ((stiffness.girderUtilisation ?? Infinity) <= 1 && (stiffness.columnUtilisation ?? Infinity) <= 1);
  });
  const cheapest = (list: typeof finished) => [...list].sort((a, b) => (a.outcome.result.optimisation.objectiveValue ?? Infinity) - (b.outcome.result.optimisation.objectiveValue ?? Infinity))[0];
  const pick = cheapest(consistent) ?? cheapest(confirmed) ?? finished[finished.length - 1];
  if (!pick) throw new DesignError('ANALYSIS_FAILED', 'the column-stiffness iteration finished no round');
  const columnRounds: NonNullable<DesignResult['optimisation']['columnRounds']> = rounds.map((entry) => {
    if ('failed' in entry) return { modelColumn: entry.modelColumn, chosenColumn: null, column: null, status: 'failed' as const, objectiveValue: null, steelMass: null, message: entry.failed };
    const outcome = 'outcome' in entry ? entry.outcome : finished.find((candidate) => candidate.modelColumn === entry.modelColumn)?.outcome;
    if (outcome) {
      return { modelColumn: entry.modelColumn, chosenColumn: chosenOf(outcome) ?? null, column: columnOf(outcome) ?? null, status: outcome.result.status, objectiveValue: outcome.result.optimisation.objectiveValue ?? null, steelMass: outcome.result.totals.steelMass };
    }
    const provisional = (entry as { provisional: ProvisionalRound['provisional'] }).provisional;
    return { modelColumn: entry.modelColumn, chosenColumn: provisional.chosenColumn, column: provisional.chosenColumn, status: 'superseded' as const, objectiveValue: provisional.objectiveValue, steelMass: provisional.steelMass };
  });
  const { result } = pick.outcome;
  const note = `; the column stiffness was iterated over ${columnRounds.length} designs (${columnRounds.map((entry) => (entry.status === 'failed' ? `${entry.modelColumn} in the model: not designed` : `${entry.modelColumn} in the model, ${entry.chosenColumn ?? 'none'} chosen`)).join('; ')}); this design has ${pick.modelColumn} in the girder model`;
  return {
    ...pick.outcome,
    result: { ...result, input: spec, optimisation: { ...result.optimisation, message: `${result.optimisation.message}${note}`, columnRounds } },
  };
}

/** A round of the column iteration that chose another column than its model's: what the next round needs and the report lists. */
interface ProvisionalRound {
  provisional: { girder: string; chosenColumn: string; objectiveValue: number; steelMass: number };
}

interface RoundOptions {
  /** Skip the finishing work when the chosen column is not the model's (the round will be superseded). */
  provisional?: boolean;
  /** The girder designation the sizing loop starts from (default: the heaviest candidate). */
  startGirder?: string;
}

async function designWithModelColumn(spec: BinSpec, explicit: DesignOptions, internal: RoundOptions = {}): Promise<DesignOutcome | ProvisionalRound> {
  const options: DesignOptions = { ...optionsFromSpec(spec), ...explicit };
  const progress = options.progress ?? (() => undefined);
  const maxIterations = options.maxIterations ?? 8;
  const stationsPerElement = options.stationsPerElement ?? 3;
  const context = designContext(spec, stationsPerElement, {
    ...(options.deflectionLimitRatio !== undefined ? { deflectionLimitRatio: options.deflectionLimitRatio } : {}),
    ...(options.twistLimit !== undefined ? { twistLimit: options.twistLimit } : {}),
  });
  const { loads, layout } = context;
  const series = new Set(spec.support.sectionFamilies.map((family) => familyToSeries[family]));
  const candidates = [...loadRolledSections().filter((section) => series.has(section.series)), ...weldedCandidates(spec)].sort(
    (a, b) => a.properties.massPerMetre - b.properties.massPerMetre || a.designation.localeCompare(b.designation),
  );
  if (candidates.length === 0) throw new DesignError('BAD_INPUT', 'no candidate sections in the chosen families', 'support.sectionFamilies');

  const credible = SCENARIOS.filter((scenario) => spec.support.credibleScenarios.includes(scenario.id));
  // The scenarios outside the envelope are analysed for the report only; an option comparison,
  // which shows the chosen design, can leave them out (the choice does not depend on them).
  const comparison = options.comparisonScenarios === false ? [] : SCENARIOS.filter(
    (scenario) =>
      scenario.supportType === spec.support.type &&
      !spec.support.credibleScenarios.includes(scenario.id) &&
      !(scenario.id === 'slab-anchored' && spec.support.anchorCapacity === 0) &&
      !(scenario.id === 'column-cap-bolted' && spec.support.capBolts === undefined) &&
      // With cap bolts the plain bearing is not the detail being designed; it may lift off (a mechanism).
      !(scenario.id === 'column-cap-contact' && spec.support.capBolts !== undefined),
  );
  progress(`loads: solid ${(loads.totals.solidWeight / 1e3).toFixed(1)} kN, plates ${(loads.totals.structureWeight / 1e3).toFixed(1)} kN, ${loads.combinations.length} combinations`);
  const girderLength = 2 * Math.PI * layout.radius;

  // Start from the heaviest candidate: its self weight bounds the others', so the first forces are on
  // the safe side; each round re-analyses the chosen girder section until the choice repeats.
  const selection = selectionSetup(context, options, girderLength);
  const { grades, columnCandidates, hasColumns } = selection;
  const analysed = new Map<string, SectionAnalysis>();
  const analyseCached = (section: SteelSection) => {
    let entry = analysed.get(section.designation);
    if (!entry) {
      entry = analyseSection(context, section, credible);
      analysed.set(section.designation, entry);
    }
    return entry;
  };
  // A later round of the column iteration starts from the girder the previous round chose (the
  // descent below makes the answer independent of where the loop starts).
  let current = (internal.startGirder !== undefined ? candidates.find((section) => section.designation === internal.startGirder) : undefined) ?? (candidates[candidates.length - 1] as SteelSection);
  const steps: OptimisationStep[] = [];
  let converged = false;
  let selectionStatus: 'optimal' | 'feasible' | 'infeasible' = 'infeasible';
  let feasibleCount = 0;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const state = analyseCached(current);
    // Girder candidates are checked lightest first, per grade, under the current forces (a
    // candidate already analysed is judged by its own forces and displacements). Heavier ones are
    // dominated by the first that passes and stay unevaluated, except those that could share their
    // section with the columns (under a distinct-section cap), checked until one passes as both.
    const girderOptions: CandidateOption[] = [];
    for (const grade of grades) {
      let passing: SteelSection | undefined;
      for (const section of candidates) {
        const shareable = hasColumns && columnCandidates.some((column) => column.designation === section.designation);
        if (passing && !shareable) continue;
        const own = analysed.get(section.designation);
        const utilisation = own ? selection.girderUtilisation(own, grade) : screenUnderForces(context, section, grade, state);
        girderOptions.push({ section, grade, utilisation });
        if (!(utilisation <= 1)) continue;
        passing ??= section;
        if (!selection.keysMatter) break;
        if (shareable && selection.columnUtilisation(state, section, grade) <= 1) break;
      }
    }
    const columnOptions = selection.columnOptions(state);
    feasibleCount = girderOptions.filter((entry) => entry.utilisation <= 1).length;
    const solved = await solveSelection(selection.problem(girderOptions, columnOptions));
    selectionStatus = solved.status;
    steps.push({ iteration, choice: { [MEMBER_ID]: current.designation }, mass: current.properties.massPerMetre * girderLength, maxUtilisation: finiteOrNull(selection.girderUtilisation(state, grades[0] as SteelGrade)) });
    const chosenGirder = solved.status === 'infeasible' ? undefined : selection.option(solved.choice[MEMBER_ID]);
    progress(
      `round ${iteration}: analysed ${current.designation}; under its forces the integer program chooses ${chosenGirder ? `${chosenGirder.section.designation} ${chosenGirder.grade.name}` : 'nothing (no feasible choice)'}${hasColumns && solved.choice[COLUMN_MEMBER_ID] ? ` with columns ${solved.choice[COLUMN_MEMBER_ID]}` : ''} (${girderOptions.length} girder candidates checked)`,
    );
    if (!chosenGirder) break;
    const chosen = chosenGirder.section;
    if (chosen.designation === current.designation) {
      converged = true;
      break;
    }
    if (analysed.has(chosen.designation)) {
      progress(`round ${iteration}: the choice ${chosen.designation} repeats an earlier round (cycle); keeping the best verified design`);
      break;
    }
    current = chosen;
  }

  // Forces depend on the girder section (its self weight, and the depth that is the lever arm of the
  // hopper's pull), so a lighter section can pass under its own forces although it failed under the
  // forces of a heavier one. Before accepting the loop's answer, every girder candidate whose least
  // possible cost (its own at the cheapest grade, the lightest column, one distinct section) is below
  // the best verified design is analysed with its own section, lightest first.
  let best = await selection.bestOver([...analysed.values()]);
  // A provisional round whose loop already chose another column than its model's is superseded
  // before the descent: the next round, with that column in the model, makes the exact search.
  const superseded = (): ProvisionalRound | undefined => {
    if (!internal.provisional || !best?.column || best.column.designation === context.column.section.designation) return undefined;
    const columnLength = layout.columns * spec.support.columnHeight;
    return {
      provisional: {
        girder: best.girder.designation,
        chosenColumn: best.column.designation,
        objectiveValue: best.objective,
        steelMass: best.girder.properties.massPerMetre * girderLength + bearingStiffenerMass(best.girder, spec, layout) + best.column.properties.massPerMetre * columnLength,
      },
    };
  };
  const early = superseded();
  if (early) return early;
  const loopBest = best ? analysed.get(best.girder.designation) : undefined;
  if (best && loopBest) {
    // A section that fails under a few combinations fails under all of them, so each is first
    // analysed under the combinations that govern the loop's answer, and fully only if it passes.
    const governingCombinations = new Set([...loopBest.envelopes].sort((a, b) => b.check.utilisation - a.check.utilisation).map((envelope) => envelope.combination).slice(0, 3));
    let round = steps.length;
    // In the order of their lower bounds (a welded girder's price factor breaks the order by mass),
    // so that the first bound at or above the best ends the search.
    const byBound = candidates.map((section) => ({ section, bound: selection.lowerBound(section) })).sort((a, b) => a.bound - b.bound || a.section.properties.massPerMetre - b.section.properties.massPerMetre || a.section.designation.localeCompare(b.section.designation));
    for (const { section, bound } of byBound) {
      if (bound >= best.objective - tieTolerance(best.objective)) break;
      if (analysed.has(section.designation)) continue;
      const screened = screenSection(context, section, credible, governingCombinations, grades);
      round += 1;
      if (screened.utilisation > 1) {
        steps.push({ iteration: round, choice: { [MEMBER_ID]: section.designation }, mass: section.properties.massPerMetre * girderLength, maxUtilisation: finiteOrNull(screened.utilisation) });
        continue;
      }
      if (selection.screenedLowerBound(screened.state, screened.passingGrades) >= best.objective - tieTolerance(best.objective)) {
        steps.push({
          iteration: round,
          choice: { [MEMBER_ID]: section.designation },
          mass: section.properties.massPerMetre * girderLength,
          maxUtilisation: finiteOrNull(screened.utilisation),
          note: 'passes under the governing combinations, but with the columns those need it cannot be cheaper than the best verified design: not analysed further',
        });
        continue;
      }
      const state = analyseCached(section);
      const utilisation = Math.min(...grades.map((grade) => selection.girderUtilisation(state, grade)));
      steps.push({ iteration: round, choice: { [MEMBER_ID]: section.designation }, mass: section.properties.massPerMetre * girderLength, maxUtilisation: finiteOrNull(utilisation) });
      const candidateBest = await selection.bestOver([state]);
      if (candidateBest && candidateBest.objective < best.objective - tieTolerance(best.objective)) {
        progress(`descent: the lighter ${section.designation} passes under its own forces (utilisation ${utilisation.toFixed(3)})`);
        best = candidateBest;
      }
    }
  }

  // The final design is always one that was analysed with its own sections: the least-cost verified
  // one, or, when none passes, the girder with the lowest utilisation (reported as not satisfied).
  const bestAttempt = [...analysed.values()].sort((a, b) => a.utilisation - b.utilisation || b.section.properties.massPerMetre - a.section.properties.massPerMetre)[0] as SectionAnalysis;
  const final = best ? (analysed.get(best.girder.designation) as SectionAnalysis) : bestAttempt;
  const finalGrade = best ? best.grade : context.grade;
  // After the descent, the same: a round whose chosen column is not the model's is superseded by the
  // next round; its finishing work (re-checks, reported scenarios, guards, the result) is skipped.
  const late = superseded();
  if (late) return late;
  const finalEnvelopes = selection.girderEnvelopes(final, finalGrade);
  let finalColumn = best ? best.column : selection.bestAttemptColumn(final, finalGrade);
  let finalColumnEnvelopes = finalColumn ? selection.columnEnvelopes(final, finalColumn, finalGrade) : [];
  // The girder model's columns have the axial stiffness of support.columnSection. When the chosen
  // column differs, the chosen pair is analysed again with the chosen column's own stiffness (the
  // cap's bearing forces, and so the flange and the twist, depend on it). If that pair fails, the
  // design keeps the model's column where it passes (then every member was verified with the
  // stiffness it has), and reports the rejected lighter column.
  let columnStiffness: NonNullable<DesignResult['optimisation']['columnStiffness']> | undefined;
  if (finalColumn && finalColumn.designation !== context.column.section.designation) {
    const own: DesignContext = { ...context, column: { section: finalColumn, axialStiffness: (context.grade.youngsModulus * finalColumn.properties.area) / spec.support.columnHeight } };
    const recheck = analyseSection(own, final.section, credible);
    const girderUtilisation = maxUtilisation(finalGrade.name === context.grade.name ? recheck.envelopes : sectionEnvelopes(own, final.section, finalGrade, recheck.scenarios));
    const demands = columnDemands(loads, layout, casesOf(recheck.scenarios, sizingCombinations(loads)));
    const columnUtilisation = maxUtilisation(columnChecks(finalColumn, finalGrade, spec.support.columnHeight, demands));
    const modelColumn = context.column.section;
    const consistent = girderUtilisation <= 1 && columnUtilisation <= 1;
    const withinCap = selection.costSummary.maxDistinctSections === null || (modelColumn.designation === final.section.designation ? 1 : 2) <= selection.costSummary.maxDistinctSections;
    const fallback = best !== undefined && !consistent && withinCap && selection.columnUtilisation(final, modelColumn, finalGrade) <= 1;
    columnStiffness = {
      modelColumn: modelColumn.designation,
      chosenColumn: finalColumn.designation,
      girderUtilisation: finiteOrNull(girderUtilisation),
      columnUtilisation: finiteOrNull(columnUtilisation),
      kept: fallback ? modelColumn.designation : finalColumn.designation,
    };
    if (fallback) {
      finalColumn = modelColumn;
      finalColumnEnvelopes = selection.columnEnvelopes(final, modelColumn, finalGrade);
    }
  }
  // Serviceability information: the largest settlement of the girder on its bearing (for a slab the
  // only deflection measure; no limit is set) over the SLS characteristic analyses.
  const slsNames = serviceabilityCombinations(loads);
  let settlement: { value: number; combination: string; scenario: string } | null = null;
  for (const { scenario, analyses: results } of final.scenarios) {
    for (const analysis of results.filter((candidate) => slsNames.has(candidate.combination))) {
      const value = settlementOf(analysis);
      if (!settlement || value > settlement.value) settlement = { value, combination: analysis.combination, scenario: scenario.id };
    }
  }
  const status: DesignResult['status'] = best ? 'verified' : 'infeasible';
  const grade = finalGrade;


  const governing = governingEnvelope(finalEnvelopes);
  const finalUtilisation = maxUtilisation(finalEnvelopes);
  if (!governing) throw new DesignError('ANALYSIS_FAILED', 'no check was evaluated for the girder');

  const firstModel = final.scenarios[0]?.model; // same geometry in every scenario
  if (!firstModel) throw new DesignError('ANALYSIS_FAILED', 'no credible support scenario was analysed');
  const positionFor = (station: Station) => positionOf(firstModel, layout, station);
  // The scenarios not in the envelope are analysed with the chosen section and reported beside it.
  // Reported analyses: every ULS combination (STR and EQU) and the characteristic gravity
  // combination G + Q_s,f (the load-total guard) in every scenario; in the credible scenarios also
  // every SLS characteristic combination (deflection and twist).
  const reported = new Set(loads.combinations.filter((combination) => combination.limitState === 'ULS' || isGravityCheck(combination)).map((combination) => combination.name));
  const reportedCredible = new Set([...reported, ...serviceabilityCombinations(loads)]);
  // The credible scenarios keep the final section's own analyses (already checked) and add the
  // reported combinations not yet analysed; the comparison scenarios are analysed here.
  const order = new Map(loads.combinations.map((combination, i) => [combination.name, i]));
  const allScenarios = [...credible, ...comparison].map((scenario): ScenarioAnalysis => {
    const own = final.scenarios.find((entry) => entry.scenario.id === scenario.id);
    if (!own) return analyseScenario(context, final.section, scenario, reported);
    const done = new Set(own.analyses.map((analysis) => analysis.combination));
    const missing = new Set([...reportedCredible].filter((name) => !done.has(name)));
    const extra = missing.size > 0 ? analyseScenario(context, final.section, scenario, missing).analyses : [];
    const analyses = [...own.analyses, ...extra].sort((a, b) => (order.get(a.combination) ?? 0) - (order.get(b.combination) ?? 0));
    return { scenario, model: own.model, analyses };
  });
  // The envelope of each scenario alone: the final's own envelopes for the credible ones.
  const envelopeOfScenario = new Map(
    allScenarios.map(({ scenario, model: scenarioModel, analyses: results }) => [
      scenario.id,
      credible.includes(scenario) ? finalEnvelopes.filter((envelope) => envelope.scenario === scenario.id) : sectionEnvelopes(context, final.section, grade, [{ scenario, model: scenarioModel, analyses: results }]),
    ]),
  );
  for (const scenario of allScenarios) guardLoadTotals(final.section, scenario, loads, girderLength);
  const guards = designGuards(context, { section: final.section, grade, column: finalColumn, credible, allScenarios, governing, finalUtilisation, columnUtilisation: finalColumn ? maxUtilisation(finalColumnEnvelopes) : null });
  progress(
    `guards: equilibrium and contact hold in ${guards.contact.analyses} analyses; a fresh re-analysis agrees (difference ${guards.reanalysis.relativeDifference.toExponential(1)}); with ${guards.meshConvergence.refinedSegmentsPerSpan} segments per span the governing ${guards.meshConvergence.check} changes by ${(100 * guards.meshConvergence.relativeChange).toFixed(2)} %`,
  );
  // The girder member reports its own checks; those of the bearing stiffeners go to their member.
  const girderOnly = finalEnvelopes.filter((envelope) => !envelope.check.id.startsWith('stiffener-'));
  const girderGoverning = governingEnvelope(girderOnly) ?? governing;
  const member: MemberResult = {
    id: MEMBER_ID,
    description: layout.kind === 'slab' ? `ring girder bearing on a slab, centroid radius ${layout.radius.toFixed(3)} m` : `ring girder on ${layout.columns} columns, centroid radius ${layout.radius.toFixed(3)} m`,
    section: final.section.designation,
    grade: grade.name,
    length: girderLength,
    mass: final.section.properties.massPerMetre * girderLength,
    massPerLength: final.section.properties.massPerMetre,
    utilisation: finiteOrNull(maxUtilisation(girderOnly)),
    governing: {
      check: girderGoverning.check.id,
      title: girderGoverning.check.title,
      clause: girderGoverning.check.clause,
      combination: girderGoverning.combination,
      scenario: girderGoverning.scenario,
      position: positionFor(girderGoverning.station),
      inputs: girderGoverning.check.inputs,
      intermediate: girderGoverning.check.intermediate,
    },
  };
  const rowOf = (memberId: string, section: SteelSection) => (envelope: CheckEnvelope): UtilisationRow => ({
    member: memberId,
    section: section.designation,
    check: envelope.check.id,
    clause: envelope.check.clause,
    combination: envelope.combination,
    scenario: envelope.scenario,
    position: positionFor(envelope.station),
    utilisation: finiteOrNull(envelope.check.utilisation),
    title: envelope.check.title,
    inputs: envelope.check.inputs,
    intermediate: envelope.check.intermediate,
    ...(envelope.check.outOfScope || envelope.check.notes ? { note: [envelope.check.outOfScope, ...(envelope.check.notes ?? [])].filter((text) => text !== undefined).join('; ') } : {}),
  });
  const members: MemberResult[] = [member];
  const isStiffenerCheck = (envelope: CheckEnvelope): boolean => envelope.check.id.startsWith('stiffener-');
  const utilisations: UtilisationRow[] = finalEnvelopes.filter((envelope) => !isStiffenerCheck(envelope)).map(rowOf(MEMBER_ID, final.section));
  const stiffenerPair = bearingStiffenerOf(final.section, spec, layout);
  if (stiffenerPair !== undefined) {
    const stiffenerEnvelopes = finalEnvelopes.filter(isStiffenerCheck);
    const stiffenerGoverning = governingEnvelope(stiffenerEnvelopes);
    if (!stiffenerGoverning) throw new DesignError('ANALYSIS_FAILED', 'no check was evaluated for the bearing stiffeners');
    const pair = stiffenerEnvelopes.some((envelope) => envelope.check.outOfScope !== undefined) ? undefined : stiffenerPair;
    const webDepth = final.section.dimensions.depth - 2 * final.section.dimensions.flangeThickness;
    const stiffenerLength = layout.columns * 2 * webDepth;
    const stiffenerMass = bearingStiffenerMass(final.section, spec, layout);
    const plate = pair ? `FL ${(pair.thickness * 1000).toFixed(0)} x ${(pair.width * 1000).toFixed(0)}` : 'none fits';
    members.push({
      id: STIFFENER_MEMBER_ID,
      description: `bearing stiffeners over the columns: a pair of plates ${plate} mm each side of the girder web at each of the ${layout.columns} columns, full web depth ${(webDepth * 1000).toFixed(0)} mm, chamfer ${((spec.support.bearingStiffeners?.chamfer ?? 0) * 1000).toFixed(0)} mm`,
      section: plate,
      grade: grade.name,
      length: stiffenerLength,
      mass: stiffenerMass,
      massPerLength: stiffenerLength > 0 ? stiffenerMass / stiffenerLength : 0,
      utilisation: finiteOrNull(maxUtilisation(stiffenerEnvelopes)),
      governing: {
        check: stiffenerGoverning.check.id,
        title: stiffenerGoverning.check.title,
        clause: stiffenerGoverning.check.clause,
        combination: stiffenerGoverning.combination,
        scenario: stiffenerGoverning.scenario,
        position: { ...positionFor(stiffenerGoverning.station), description: `over column C${stiffenerGoverning.check.inputs['column'] ?? ''}` },
        inputs: stiffenerGoverning.check.inputs,
        intermediate: stiffenerGoverning.check.intermediate,
      },
    });
    utilisations.push(...stiffenerEnvelopes.map((envelope) => ({ ...rowOf(STIFFENER_MEMBER_ID, final.section)(envelope), section: plate, position: { ...positionFor(envelope.station), description: `over column C${envelope.check.inputs['column'] ?? ''}` } })));
  }
  if (finalColumn) {
    const columnGoverning = governingEnvelope(finalColumnEnvelopes);
    if (!columnGoverning) throw new DesignError('ANALYSIS_FAILED', 'no check was evaluated for the columns');
    const columnLength = layout.columns * spec.support.columnHeight;
    members.push({
      id: COLUMN_MEMBER_ID,
      description: `${layout.columns} columns, height ${spec.support.columnHeight.toFixed(3)} m each, pinned at the base and held at the top (web in the radial plane); axial stiffness in the girder model from ${context.column.section.designation} (support.columnSection)`,
      section: finalColumn.designation,
      grade: grade.name,
      length: columnLength,
      mass: finalColumn.properties.massPerMetre * columnLength,
      massPerLength: finalColumn.properties.massPerMetre,
      utilisation: finiteOrNull(maxUtilisation(finalColumnEnvelopes)),
      governing: {
        check: columnGoverning.check.id,
        title: columnGoverning.check.title,
        clause: columnGoverning.check.clause,
        combination: columnGoverning.combination,
        scenario: columnGoverning.scenario,
        position: { ...positionFor(columnGoverning.station), description: `column C${columnGoverning.check.inputs['column'] ?? ''}` },
        inputs: columnGoverning.check.inputs,
        intermediate: columnGoverning.check.intermediate,
      },
    });
    utilisations.push(...finalColumnEnvelopes.map((envelope) => ({ ...rowOf(COLUMN_MEMBER_ID, finalColumn)(envelope), position: { ...positionFor(envelope.station), description: `column C${envelope.check.inputs['column'] ?? ''}` } })));
  }
  const steelMass = members.reduce((sum, entry) => sum + entry.mass, 0);
  const objectiveValue = selection.objectiveOf(
    members.map((entry) => ({
      mass: entry.mass,
      key: entry.id === STIFFENER_MEMBER_ID ? undefined : `${entry.section} ${entry.grade}`,
      ...(entry.id === MEMBER_ID && final.section.fabrication === 'welded' ? { factor: spec.optimisation.weldedPriceFactor } : {}),
    })),
    grade,
  );
  // Force diagrams are kept for the governing combination of each scenario and the one with the
  // largest torsion (the others are summarised by their peaks; every one can be re-run with `analyse`).
  // Peaks and bearing state, once per reported analysis.
  const peaksByAnalysis = new Map(allScenarios.flatMap(({ analyses: results }) => results.map((analysis) => [analysis, peaksOf(analysis.stations)] as const)));
  const bearingsByAnalysis = new Map(allScenarios.flatMap(({ model, analyses: results }) => results.map((analysis) => [analysis, bearingSummary(model, analysis)] as const)));
  const peakT = (analysis: AnalysisResult) => peaksByAnalysis.get(analysis)?.T ?? 0;
  const diagramKeys = new Set<string>();
  for (const { scenario, analyses: results } of allScenarios) {
    const scenarioEnvelope = envelopeOfScenario.get(scenario.id) ?? [];
    const worst = governingEnvelope(scenarioEnvelope);
    if (worst) diagramKeys.add(`${scenario.id}|${worst.combination}`);
    const twisting = [...results].sort((a, b) => peakT(b) - peakT(a))[0];
    if (twisting) diagramKeys.add(`${scenario.id}|${twisting.combination}`);
  }
  diagramKeys.add(`${governing.scenario}|${governing.combination}`);
  for (const { scenario } of allScenarios) diagramKeys.add(`${scenario.id}|${governing.combination}`);
  const analyses: AnalysisSummary[] = allScenarios.flatMap(({ scenario, model, analyses: results }) =>
    results.map((analysis) => ({
      combination: analysis.combination,
      scenario: scenario.id,
      converged: analysis.converged,
      iterations: analysis.iterations,
      residual: analysis.residual,
      reactionSum: analysis.reactionSum,
      appliedSum: analysis.appliedSum,
      peaks: peaksByAnalysis.get(analysis) ?? peaksOf(analysis.stations),
      ...(diagramKeys.has(`${scenario.id}|${analysis.combination}`) ? { diagram: diagramOf(model, layout, analysis.stations) } : {}),
      ...bearingsByAnalysis.get(analysis),
    })),
  );
  const scenarioSummaries = allScenarios.map(({ scenario, analyses: results }) => {
    const isCredible = credible.includes(scenario);
    const envelope = envelopeOfScenario.get(scenario.id) ?? [];
    const bearings = results.map((analysis) => bearingsByAnalysis.get(analysis)?.bearings);
    const maxTension = Math.max(0, ...bearings.map((state) => state?.maxTension ?? 0));
    // A tension below a thousandth of the largest bearing compression is round-off in practice.
    const maxCompression = Math.max(0, ...bearings.map((state) => state?.maxCompression ?? 0));
    return { ...scenarioSummary(scenario, isCredible), utilisation: finiteOrNull(maxUtilisation(envelope)), needsTension: maxTension > 1e-3 * maxCompression, maxBearingTension: maxTension };
  });
  const bin = circularBinOf(spec);
  const geometry = circularBinGeometry(bin);
  const girderWeight = final.section.properties.massPerMetre * girderLength * STANDARD_GRAVITY;
  const message =
    status === 'verified'
      ? `${final.section.designation} ${grade.name}${finalColumn ? ` on ${finalColumn.designation} columns` : ''} is the least-cost choice that passes every check under its own re-analysed forces${converged ? '' : ' (the selection loop stopped before the choice repeated)'}`
      : `no candidate section passes; the best attempt ${final.section.designation} reaches utilisation ${Number.isFinite(finalUtilisation) ? finalUtilisation.toFixed(3) : 'beyond its resistance'} in ${governing.check.id} (${governing.check.clause})`;
  const stiffnessFails = columnStiffness !== undefined && !((columnStiffness.girderUtilisation ?? Infinity) <= 1 && (columnStiffness.columnUtilisation ?? Infinity) <= 1);
  const stiffnessNote = !columnStiffness || !stiffnessFails
    ? ''
    : columnStiffness.kept === columnStiffness.modelColumn
      ? `; the lighter ${columnStiffness.chosenColumn} columns were rejected: with their own axial stiffness the utilisations become ${columnStiffness.girderUtilisation?.toFixed(3) ?? 'n/a'} (girder) and ${columnStiffness.columnUtilisation?.toFixed(3) ?? 'n/a'} (columns), so the columns of the girder model (support.columnSection = ${columnStiffness.modelColumn}) are kept`
      : `; with the axial stiffness of the chosen ${columnStiffness.chosenColumn} columns instead of ${columnStiffness.modelColumn} (support.columnSection) the utilisations become ${columnStiffness.girderUtilisation?.toFixed(3) ?? 'n/a'} (girder) and ${columnStiffness.columnUtilisation?.toFixed(3) ?? 'n/a'} (columns): re-run with support.columnSection = ${columnStiffness.chosenColumn}`;
  const result: DesignResult = {
    schemaVersion: DESIGN_SCHEMA_VERSION,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    project: { name: spec.project.name, client: spec.project.client, site: spec.project.site, reference: spec.project.reference, designer: spec.project.designer, date: spec.project.date },
    status,
    cautions: CAUTIONS,
    input: spec,
    bin: { diameter: bin.diameter, cylinderHeight: bin.cylinderHeight, hopperHeight: geometry.hopperHeight, apexHalfAngle: bin.hopper.apexHalfAngle, solid: spec.solid.name },
    girder: { kind: 'ring', support: layout.kind === 'slab' ? 'slab' : 'columns', radius: layout.radius, columns: layout.columns, segments: layout.columns * layout.segmentsPerSpan, spanAngle: (2 * Math.PI) / layout.columns },
    loads: {
      cases: loads.cases.map((loadCase) => ({ name: loadCase.name, description: loadCase.description, kind: loadCase.kind, verticalLineLoad: loadCase.verticalLineLoad, radialLineLoad: loadCase.radialLineLoad, verticalResultant: loadCase.verticalResultant })),
      combinations: loads.combinations,
      profiles: loads.profiles,
      totals: { solidWeight: loads.totals.solidWeight, structureWeight: loads.totals.structureWeight + girderWeight },
      derivation: loads.derivation,
    },
    scenarios: scenarioSummaries,
    analyses,
    members,
    utilisations,
    optimisation: {
      status: selectionStatus,
      objective: selection.costObjective ? 'cost' : 'mass',
      objectiveValue,
      cost: selection.costSummary,
      candidates: candidates.length * grades.length + columnCandidates.length * grades.length,
      feasibleCandidates: feasibleCount,
      iterations: steps,
      converged,
      message: `${message}${stiffnessNote}`,
      ...(columnStiffness ? { columnStiffness } : {}),
    },
    totals: { steelMass },
    guards,
    serviceability: { combinations: [...slsNames], deflectionLimitRatio: context.serviceability.deflectionLimitRatio, twistLimit: context.serviceability.twistLimit, maxSettlement: settlement },
  };
  progress(`${message}${stiffnessNote}`);
  const combinations = loads.combinations.map((combination) => ({ name: combination.name, factors: combination.factors }));
  return {
    result,
    models: allScenarios.map(({ scenario, model }) => ({ scenario: scenario.id, model: girderModelDocument(model, scenario.id, `${member.description}; section ${member.section} ${member.grade}; ${scenario.title}`, combinations) })),
  };
}

/** Bearing forces of an analysis with bearing points (springs with a group). */
/** Bearing state of an analysis, from the bearing points of its model (springs with a group). */
function bearingSummary(model: GirderModel, analysis: AnalysisResult): Pick<AnalysisSummary, 'bearings'> {
  const points = bearingPoints(model, analysis);
  if (points.length === 0) return {};
  const byGroup = new Map<string, number[]>();
  for (const point of points) byGroup.set(point.group, [...(byGroup.get(point.group) ?? []), point.force]);
  const total = (forces: number[]) => forces.reduce((sum, force) => sum + force, 0);
  let mostLoaded = { group: '', forces: [] as number[] };
  for (const [group, forces] of byGroup) {
    if (mostLoaded.forces.length === 0 || total(forces) > total(mostLoaded.forces)) mostLoaded = { group, forces };
  }
  // A bearing point counts as in contact when it carries more than a trace of the largest force.
  const maxCompression = Math.max(0, ...points.map((point) => point.force));
  const threshold = 1e-9 * Math.max(maxCompression, 1);
  return {
    bearings: {
      contactFraction: points.filter((point) => point.force > threshold).length / points.length,
      maxCompression,
      maxTension: Math.max(0, ...points.map((point) => -point.force)),
      mostLoadedColumn: mostLoaded,
    },
  };
}

/**
 * The guards of a finished design (guards.ts): equilibrium and contact consistency over every
 * reported analysis, a fresh re-analysis of the chosen sections from a new context (no cache shared),
 * and the governing check on a mesh with twice the segments. Each throws when it fails.
 */
function designGuards(
  context: DesignContext,
  final: { section: SteelSection; grade: SteelGrade; column: SteelSection | undefined; credible: ScenarioDefinition[]; allScenarios: ScenarioAnalysis[]; governing: CheckEnvelope; finalUtilisation: number; columnUtilisation: number | null },
): GuardReport {
  const { spec, layout } = context;
  const items = final.allScenarios.flatMap(({ scenario, model, analyses }) => analyses.map((analysis) => ({ scenario: scenario.id, model, analysis })));
  // Every analysis was guarded as it was made (analyseScenario); here only the largest imbalance is reported.
  const equilibrium = { analyses: items.length, largestImbalance: Math.max(0, ...items.map(({ analysis }) => relativeImbalance(analysis).relative)), tolerance: RELATIVE_EQUILIBRIUM_TOLERANCE };
  const contact = contactGuard(items);

  const fresh: DesignContext = { ...designContext(spec, context.stationsPerElement, context.serviceability), column: context.column };
  const again = analyseSection(fresh, final.section, final.credible);
  const girderAgain = maxUtilisation(final.grade.name === fresh.grade.name ? again.envelopes : sectionEnvelopes(fresh, final.section, final.grade, again.scenarios));
  const columnAgain = final.column
    ? maxUtilisation(columnChecks(final.column, final.grade, spec.support.columnHeight, governingDemands(columnDemands(fresh.loads, fresh.layout, casesOf(again.scenarios, sizingCombinations(fresh.loads))))))
    : null;
  const reanalysis = reanalysisGuard({ girder: final.finalUtilisation, column: final.columnUtilisation }, { girder: girderAgain, column: columnAgain });

  const scenario = final.credible.find((entry) => entry.id === final.governing.scenario);
  if (!scenario) throw new DesignError('GUARD_FAILED', `mesh-convergence guard: the governing scenario ${final.governing.scenario} is not a credible one`);
  const meshConvergence = meshGuard(
    final.governing,
    layout.segmentsPerSpan,
    (segmentsPerSpan) => {
      const refined: DesignContext = { ...context, layout: { ...layout, segmentsPerSpan } };
      const analysed = analyseScenario(refined, final.section, scenario, new Set([final.governing.combination]));
      return sectionEnvelopes(refined, final.section, final.grade, [analysed]);
    },
    { section: final.section, grade: final.grade },
  );
  return { equilibrium, contact, reanalysis, meshConvergence };
}

function finiteOrNull(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

/** The vertical load of the characteristic combination equals solid + plates + girder (guard). */
/** The gravity check combination G + Q_s,f with factors 1 (the loads package lists it first). */
function isGravityCheck(combination: LoadSet['combinations'][number]): boolean {
  return Object.keys(combination.factors).length === 2 && combination.factors[PERMANENT_CASE] === 1 && combination.factors[SOLID_FILLING_CASE] === 1;
}

function guardLoadTotals(section: SteelSection, scenario: ScenarioAnalysis, loads: LoadSet, girderLength: number): void {
  const check = loads.combinations.find(isGravityCheck);
  const analysis = scenario.analyses.find((candidate) => candidate.combination === check?.name);
  if (!analysis) throw new DesignError('GUARD_FAILED', 'load-total guard: no combination G + Q_s,f with factors 1 was analysed');
  const expected = loads.totals.solidWeight + loads.totals.structureWeight + section.properties.massPerMetre * girderLength * STANDARD_GRAVITY;
  const applied = -analysis.appliedSum[2];
  if (Math.abs(applied - expected) > RELATIVE_EQUILIBRIUM_TOLERANCE * expected) {
    throw new DesignError('GUARD_FAILED', `load-total guard: ${analysis.combination} applies ${applied.toExponential(6)} N downward, but solid, plates and girder weigh ${expected.toExponential(6)} N`);
  }
}

export { nodeAngle };
