import { analyseAll, GirderError, type AnalysisResult, type GirderModel, type SectionStiffness, type Station } from '@binsupport/girder';
import { circularBinGeometry, circularBinLoads, LoadsError, PERMANENT_CASE, SOLID_FILLING_CASE, STANDARD_GRAVITY, type LoadSet } from '@binsupport/loads';
import { solveSelection } from '@binsupport/optimiser';
import type { BinSpec } from '@binsupport/spec';
import { loadRolledSections, rolledSection, SteelError, steelGrade, type SteelGrade, type SteelSection } from '@binsupport/steel';
import { DesignError } from './errors.js';
import { envelopeChecks, exceedsAnywhere, governingEnvelope, maxUtilisation, type CheckEnvelope, type StationSet } from './evaluate.js';
import { buildRingModel, columnId, nodeAngle, type RingLayout } from './ring.js';
import { DESIGN_SCHEMA_VERSION, type AnalysisSummary, type DesignResult, type ForceDiagram, type MemberResult, type OptimisationStep, type Position, type UtilisationRow } from './result.js';
import { SCENARIOS, scenarioSummary, type ScenarioDefinition } from './scenarios.js';
import { girderModelDocument, type GirderModelDocument } from './model-file.js';
import { TOOL_NAME, TOOL_VERSION } from './version.js';

export const CAUTIONS = [
  'This is a first-pass design produced by software. It must be checked and verified by a qualified structural engineer before it is used for construction.',
  'Local building codes, national annexes and licensed engineering practice govern over every value and assumption in this document.',
  'The analysis covers only the actions, support scenarios and checks listed in this report; connections, columns, foundations and the shell itself are outside its scope.',
];

export interface DesignOptions {
  progress?: (line: string) => void;
  /** Largest number of analyse-and-select rounds before the loop stops. */
  maxIterations?: number;
  /** Stations per element at which internal forces are checked (ends included). */
  stationsPerElement?: number;
}

export interface DesignOutcome {
  result: DesignResult;
  /** The girder-model file of each support scenario, with the final sections (for `analyse`). */
  models: Array<{ scenario: string; model: GirderModelDocument }>;
}

export const familyToSeries: Record<BinSpec['support']['sectionFamilies'][number], SteelSection['series']> = { IPE: 'IPE', HEB: 'HE B' };

const MEMBER_ID = 'RG';
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
}

export function loadsFor(spec: BinSpec): LoadSet {
  try {
    return circularBinLoads({
      bin: spec.bin,
      solid: spec.solid,
      partialFactors: { permanentFactor: spec.actions.permanentFactor, solidFactor: spec.actions.solidFactor, variableFactor: spec.actions.variableFactor, method: spec.actions.combinationMethod },
      ...(spec.roof ? { roof: spec.roof } : {}),
      ...(spec.snow ? { snow: spec.snow } : {}),
      ...(spec.wind ? { wind: spec.wind } : {}),
      ...(spec.seismic ? { seismic: spec.seismic } : {}),
      ...(spec.equipment.length > 0 ? { equipment: spec.equipment } : {}),
    });
  } catch (error) {
    if (error instanceof LoadsError) throw new DesignError('BAD_INPUT', error.message, error.path);
    throw error;
  }
}

/** Check the equilibrium of one analysis: reactions balance the applied loads (guard). */
function guardEquilibrium(analysis: AnalysisResult, scenario: string): void {
  const scale = Math.max(...analysis.appliedSum.map(Math.abs), 1);
  for (let i = 0; i < 3; i++) {
    const imbalance = Math.abs((analysis.reactionSum[i] ?? 0) + (analysis.appliedSum[i] ?? 0));
    if (imbalance > RELATIVE_EQUILIBRIUM_TOLERANCE * scale) {
      throw new DesignError('GUARD_FAILED', `equilibrium guard: in ${analysis.combination} / ${scenario} the reactions do not balance the loads along ${'XYZ'[i]} (imbalance ${imbalance.toExponential(3)} N of ${scale.toExponential(3)} N)`);
    }
  }
}

/**
 * The combinations that size members: ultimate limit states of resistance (STR, and seismic where
 * given). EQU combinations (EN 1990 6.4.3.1, static equilibrium) are analysed and reported, for uplift
 * and anchors, but do not size the girder's cross-section.
 */
export function sizingCombinations(loads: LoadSet): Set<string> {
  return new Set(loads.combinations.filter((combination) => combination.limitState === 'ULS' && combination.verification !== 'EQU').map((combination) => combination.name));
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
    if (error instanceof GirderError) {
      throw new DesignError('ANALYSIS_FAILED', `analysis under ${scenario.id} with ${section.designation} refused: ${error.message}`);
    }
    throw error;
  }
  for (const analysis of analyses) guardEquilibrium(analysis, scenario.id);
  return { scenario, model, analyses };
}

function ulsStations(context: DesignContext, scenarios: ScenarioAnalysis[]): StationSet[] {
  const uls = sizingCombinations(context.loads);
  return scenarios.flatMap(({ scenario, analyses }) =>
    analyses.filter((analysis) => uls.has(analysis.combination)).map((analysis) => ({ combination: analysis.combination, scenario: scenario.id, stations: analysis.stations })),
  );
}

/** Analyse a section under the given scenarios and the sizing combinations (or only those named). */
export function analyseSection(context: DesignContext, section: SteelSection, scenarios: ScenarioDefinition[], only: Set<string> = sizingCombinations(context.loads)): SectionAnalysis {
  const analysed = scenarios.map((scenario) => analyseScenario(context, section, scenario, only));
  const uls = ulsStations(context, analysed);
  const envelopes = envelopeChecks(section, context.grade, uls);
  return { section, scenarios: analysed, uls, envelopes, utilisation: maxUtilisation(envelopes) };
}

/** The design context of a spec: loads, layout, grade and the column's axial stiffness. */
export function designContext(spec: BinSpec, stationsPerElement = 5): DesignContext {
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
  };
}

/** Where a station lies around the ring, in words a site engineer recognises. */
function positionOf(model: GirderModel, layout: RingLayout, station: Station): Position {
  const element = model.elements.find((candidate) => candidate.id === station.element);
  const nodeI = model.nodes.find((node) => node.id === element?.nodeI);
  const nodeJ = model.nodes.find((node) => node.id === element?.nodeJ);
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

function peakOf(stations: Station[], key: 'N' | 'Vz' | 'T' | 'My' | 'Mz' | 'B'): number {
  return stations.reduce((max, station) => Math.max(max, Math.abs(station[key])), 0);
}

/** The whole pipeline for one spec: loads, analysis, checks, selection, verification, result. */
export async function designFromSpec(spec: BinSpec, options: DesignOptions = {}): Promise<DesignOutcome> {
  const progress = options.progress ?? (() => undefined);
  const maxIterations = options.maxIterations ?? 8;
  const stationsPerElement = options.stationsPerElement ?? 3;
  const context = designContext(spec, stationsPerElement);
  const { grade, loads, layout } = context;
  const series = new Set(spec.support.sectionFamilies.map((family) => familyToSeries[family]));
  const candidates = loadRolledSections()
    .filter((section) => series.has(section.series))
    .sort((a, b) => a.properties.massPerMetre - b.properties.massPerMetre || a.designation.localeCompare(b.designation));
  if (candidates.length === 0) throw new DesignError('BAD_INPUT', 'no candidate sections in the chosen families', 'support.sectionFamilies');

  const credible = SCENARIOS.filter((scenario) => spec.support.credibleScenarios.includes(scenario.id));
  const comparison = SCENARIOS.filter(
    (scenario) => scenario.supportType === spec.support.type && !spec.support.credibleScenarios.includes(scenario.id) && !(scenario.id === 'slab-anchored' && spec.support.anchorCapacity === 0),
  );
  progress(`loads: solid ${(loads.totals.solidWeight / 1e3).toFixed(1)} kN, plates ${(loads.totals.structureWeight / 1e3).toFixed(1)} kN, ${loads.combinations.length} combinations`);
  const girderLength = 2 * Math.PI * layout.radius;

  // Start from the heaviest candidate: its self weight bounds the others', so the first forces are on
  // the safe side; each round re-analyses the chosen section until the choice repeats.
  const analysed = new Map<string, SectionAnalysis>();
  const analyseCached = (section: SteelSection) => {
    let entry = analysed.get(section.designation);
    if (!entry) {
      entry = analyseSection(context, section, credible);
      analysed.set(section.designation, entry);
    }
    return entry;
  };
  let current = candidates[candidates.length - 1] as SteelSection;
  const steps: OptimisationStep[] = [];
  let converged = false;
  let selectionStatus: 'optimal' | 'feasible' | 'infeasible' = 'infeasible';
  let feasibleCount = 0;
  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const state = analyseCached(current);
    // Candidates are checked lightest first under the current forces. With one member group and
    // mass as the objective, a heavier candidate can never be chosen once a lighter one passes, so
    // the heavier ones are pruned as dominated before the integer program (they stay unevaluated).
    const evaluated: Array<{ section: SteelSection; utilisation: number }> = [];
    for (const section of candidates) {
      if (exceedsAnywhere(section, grade, state.uls)) {
        evaluated.push({ section, utilisation: Infinity });
        continue;
      }
      evaluated.push({ section, utilisation: maxUtilisation(envelopeChecks(section, grade, state.uls)) });
      break;
    }
    feasibleCount = evaluated.filter((entry) => entry.utilisation <= 1).length;
    const selection = await solveSelection({
      groups: [{ id: MEMBER_ID, candidates: evaluated.map((entry) => ({ id: entry.section.designation, key: entry.section.designation, cost: entry.section.properties.massPerMetre * girderLength, feasible: entry.utilisation <= 1 })) }],
    });
    selectionStatus = selection.status;
    steps.push({ iteration, choice: { [MEMBER_ID]: current.designation }, mass: current.properties.massPerMetre * girderLength, maxUtilisation: finiteOrNull(state.utilisation) });
    progress(`round ${iteration}: analysed ${current.designation} (utilisation ${state.utilisation.toFixed(3)}); the lightest candidate that passes under its forces is ${evaluated.length <= candidates.length && feasibleCount > 0 ? evaluated[evaluated.length - 1]?.section.designation : 'none'} (${evaluated.length} of ${candidates.length} checked)`);
    if (selection.status === 'infeasible') break;
    const chosenId = selection.choice[MEMBER_ID];
    const chosen = candidates.find((section) => section.designation === chosenId);
    if (!chosen) throw new DesignError('ANALYSIS_FAILED', `the optimiser chose '${chosenId}', which is not a candidate`);
    if (chosen.designation === current.designation) {
      converged = true;
      break;
    }
    if (analysed.has(chosen.designation)) {
      progress(`round ${iteration}: the choice ${chosen.designation} repeats an earlier round (cycle); keeping the lightest verified design`);
      break;
    }
    current = chosen;
  }

  // Forces depend on the section (its self weight, and the depth that is the lever arm of the
  // hopper's pull), so a lighter section can pass under its own forces although it failed under the
  // forces of a heavier one. Before accepting the loop's answer, re-analyse each lighter candidate
  // with its own section, lightest first, and take the first that passes.
  const loopBest = [...analysed.values()].filter((entry) => entry.utilisation <= 1).sort((a, b) => a.section.properties.massPerMetre - b.section.properties.massPerMetre)[0];
  if (loopBest) {
    // A lighter section that fails under a few combinations fails under all of them, so each is
    // first analysed under the combinations that govern the loop's answer, and fully only if it passes.
    const governingCombinations = new Set([...loopBest.envelopes].sort((a, b) => b.check.utilisation - a.check.utilisation).map((envelope) => envelope.combination).slice(0, 3));
    let round = steps.length;
    for (const section of candidates) {
      if (section.properties.massPerMetre >= loopBest.section.properties.massPerMetre) break;
      if (analysed.has(section.designation)) continue;
      const screen = analyseSection(context, section, credible, governingCombinations);
      round += 1;
      if (screen.utilisation > 1) {
        steps.push({ iteration: round, choice: { [MEMBER_ID]: section.designation }, mass: section.properties.massPerMetre * girderLength, maxUtilisation: finiteOrNull(screen.utilisation) });
        continue;
      }
      const state = analyseCached(section);
      steps.push({ iteration: round, choice: { [MEMBER_ID]: section.designation }, mass: section.properties.massPerMetre * girderLength, maxUtilisation: finiteOrNull(state.utilisation) });
      if (state.utilisation <= 1) {
        progress(`descent: the lighter ${section.designation} passes under its own forces (utilisation ${state.utilisation.toFixed(3)})`);
        break;
      }
    }
  }

  // The final design is always one that was analysed with its own sections: the lightest verified
  // one, or, when none passes, the one with the lowest utilisation (reported as not satisfied).
  const verified = [...analysed.values()].filter((entry) => entry.utilisation <= 1);
  verified.sort((a, b) => a.section.properties.massPerMetre - b.section.properties.massPerMetre);
  const bestAttempt = [...analysed.values()].sort((a, b) => a.utilisation - b.utilisation || b.section.properties.massPerMetre - a.section.properties.massPerMetre)[0] as SectionAnalysis;
  const final = verified[0] ?? bestAttempt;
  const status: DesignResult['status'] = verified.length > 0 ? 'verified' : 'infeasible';


  const governing = governingEnvelope(final.envelopes);
  if (!governing) throw new DesignError('ANALYSIS_FAILED', 'no check was evaluated for the girder');

  const firstModel = final.scenarios[0]?.model; // same geometry in every scenario
  if (!firstModel) throw new DesignError('ANALYSIS_FAILED', 'no credible support scenario was analysed');
  const positionFor = (station: Station) => positionOf(firstModel, layout, station);
  // The scenarios not in the envelope are analysed with the chosen section and reported beside it.
  // Reported analyses: every ULS combination (STR and EQU) and the characteristic gravity
  // combination G + Q_s,f (the load-total guard). The other SLS combinations are listed but not yet
  // analysed, since no serviceability check is made in this version.
  const reported = new Set(loads.combinations.filter((combination) => combination.limitState === 'ULS' || isGravityCheck(combination)).map((combination) => combination.name));
  const allScenarios = [...credible, ...comparison].map((scenario) => analyseScenario(context, final.section, scenario, reported));
  for (const scenario of allScenarios) guardLoadTotals(final.section, scenario, loads, girderLength);
  const member: MemberResult = {
    id: MEMBER_ID,
    description: layout.kind === 'slab' ? `ring girder bearing on a slab, centroid radius ${layout.radius.toFixed(3)} m` : `ring girder on ${layout.columns} columns, centroid radius ${layout.radius.toFixed(3)} m`,
    section: final.section.designation,
    grade: grade.name,
    length: girderLength,
    mass: final.section.properties.massPerMetre * girderLength,
    massPerLength: final.section.properties.massPerMetre,
    utilisation: finiteOrNull(final.utilisation),
    governing: {
      check: governing.check.id,
      title: governing.check.title,
      clause: governing.check.clause,
      combination: governing.combination,
      scenario: governing.scenario,
      position: positionFor(governing.station),
      inputs: governing.check.inputs,
      intermediate: governing.check.intermediate,
    },
  };
  const utilisations: UtilisationRow[] = final.envelopes.map((envelope) => ({
    member: MEMBER_ID,
    section: final.section.designation,
    check: envelope.check.id,
    clause: envelope.check.clause,
    combination: envelope.combination,
    scenario: envelope.scenario,
    position: positionFor(envelope.station),
    utilisation: finiteOrNull(envelope.check.utilisation),
    ...(envelope.check.outOfScope ? { note: envelope.check.outOfScope } : {}),
  }));
  // Force diagrams are kept for the governing combination of each scenario and the one with the
  // largest torsion (the others are summarised by their peaks; every one can be re-run with `analyse`).
  const diagramKeys = new Set<string>();
  for (const { scenario, analyses: results } of allScenarios) {
    const scenarioEnvelope = envelopeChecks(final.section, grade, ulsStations(context, [{ scenario, model: firstModel, analyses: results }]));
    const worst = governingEnvelope(scenarioEnvelope);
    if (worst) diagramKeys.add(`${scenario.id}|${worst.combination}`);
    const twisting = [...results].sort((a, b) => peakOf(b.stations, 'T') - peakOf(a.stations, 'T'))[0];
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
      peaks: { N: peakOf(analysis.stations, 'N'), Vz: peakOf(analysis.stations, 'Vz'), T: peakOf(analysis.stations, 'T'), My: peakOf(analysis.stations, 'My'), Mz: peakOf(analysis.stations, 'Mz'), B: peakOf(analysis.stations, 'B') },
      ...(diagramKeys.has(`${scenario.id}|${analysis.combination}`) ? { diagram: diagramOf(model, layout, analysis.stations) } : {}),
      ...bearingSummary(analysis),
    })),
  );
  const scenarioSummaries = allScenarios.map(({ scenario, analyses: results }) => {
    const isCredible = credible.includes(scenario);
    const envelope = envelopeChecks(final.section, grade, ulsStations(context, [{ scenario, model: firstModel, analyses: results }]));
    const maxTension = Math.max(0, ...results.map((analysis) => bearingSummary(analysis).bearings?.maxTension ?? 0));
    // A tension below a thousandth of the largest bearing compression is round-off in practice.
    const maxCompression = Math.max(0, ...results.map((analysis) => bearingSummary(analysis).bearings?.maxCompression ?? 0));
    return { ...scenarioSummary(scenario, isCredible), utilisation: finiteOrNull(maxUtilisation(envelope)), needsTension: maxTension > 1e-3 * maxCompression, maxBearingTension: maxTension };
  });
  const geometry = circularBinGeometry(spec.bin);
  const girderWeight = final.section.properties.massPerMetre * girderLength * STANDARD_GRAVITY;
  const message =
    status === 'verified'
      ? `${final.section.designation} is the lightest candidate that passes every check under its own re-analysed forces${converged ? '' : ' (the selection loop stopped before the choice repeated)'}`
      : `no candidate section passes; the best attempt ${final.section.designation} reaches utilisation ${Number.isFinite(final.utilisation) ? final.utilisation.toFixed(3) : 'beyond its resistance'} in ${governing.check.id} (${governing.check.clause})`;
  const result: DesignResult = {
    schemaVersion: DESIGN_SCHEMA_VERSION,
    tool: { name: TOOL_NAME, version: TOOL_VERSION },
    project: { name: spec.project.name, client: spec.project.client, site: spec.project.site, reference: spec.project.reference, designer: spec.project.designer, date: spec.project.date },
    status,
    cautions: CAUTIONS,
    input: spec,
    bin: { diameter: spec.bin.diameter, cylinderHeight: spec.bin.cylinderHeight, hopperHeight: geometry.hopperHeight, apexHalfAngle: spec.bin.hopper.apexHalfAngle, solid: spec.solid.name },
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
    members: [member],
    utilisations,
    optimisation: { status: selectionStatus, objective: 'mass', candidates: candidates.length, feasibleCandidates: feasibleCount, iterations: steps, converged, message },
    totals: { steelMass: member.mass },
  };
  progress(message);
  const combinations = loads.combinations.map((combination) => ({ name: combination.name, factors: combination.factors }));
  return {
    result,
    models: allScenarios.map(({ scenario, model }) => ({ scenario: scenario.id, model: girderModelDocument(model, scenario.id, `${member.description}; section ${member.section} ${member.grade}; ${scenario.title}`, combinations) })),
  };
}

/** Bearing forces of an analysis with bearing points (springs with a group). */
function bearingSummary(analysis: AnalysisResult): Pick<AnalysisSummary, 'bearings'> {
  const bearingForces = analysis.springForces.filter((spring) => spring.id.includes('-cap-') || spring.id.includes('-bearing-'));
  if (bearingForces.length === 0) return {};
  const byColumn = new Map<string, number[]>();
  for (const spring of bearingForces) {
    const group = spring.id.includes('-cap-') ? `${spring.id.split('-cap-')[0]} cap` : `bearing at ${spring.id.split('-bearing-')[0]}`;
    byColumn.set(group, [...(byColumn.get(group) ?? []), spring.force]);
  }
  let mostLoaded = { group: '', forces: [] as number[] };
  for (const [group, forces] of byColumn) {
    const total = forces.reduce((sum, force) => sum + force, 0);
    if (mostLoaded.forces.length === 0 || total > mostLoaded.forces.reduce((sum, force) => sum + force, 0)) mostLoaded = { group, forces };
  }
  // A bearing point counts as in contact when it carries more than a trace of the largest force.
  const maxCompression = Math.max(0, ...bearingForces.map((spring) => spring.force));
  const threshold = 1e-9 * Math.max(maxCompression, 1);
  return {
    bearings: {
      contactFraction: bearingForces.filter((spring) => spring.force > threshold).length / bearingForces.length,
      maxCompression,
      maxTension: Math.max(0, ...bearingForces.map((spring) => -spring.force)),
      mostLoadedColumn: mostLoaded,
    },
  };
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
