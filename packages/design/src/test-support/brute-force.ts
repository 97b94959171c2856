// Exhaustive reference search for the design tests (not part of the library build).
import { normaliseSpec, type BinSpecInput } from '@binsupport/spec';
import { loadRolledSections, rolledSection, steelGrade } from '@binsupport/steel';
import { columnChecks, columnDemands } from '../columns.js';
import { analyseSection, DEFAULT_PRICE_PER_KG, designContext, familyToSeries, sectionEnvelopes, sizingCombinations, type DesignContext, type DesignOptions, type SectionAnalysis } from '../design.js';
import { maxUtilisation } from '../evaluate.js';
import { SCENARIOS } from '../scenarios.js';

export interface BruteForceChoice {
  girder: string;
  column?: string;
  grade: string;
  objective: number;
}

/**
 * Brute force: analyse every girder candidate with its own section; for every grade allowed, check it
 * under its own forces, check every column candidate (HE B) of the same grade under that analysis'
 * column forces, and take the least cost (mass x price per kg + cost per distinct section) within the
 * distinct-section cap, ties to the lighter girder: an exhaustive enumeration over the same tables,
 * independent of the analyse-select loop and of the integer program. Then the design's stated
 * post-rule: a column other than support.columnSection is re-analysed with its own axial stiffness,
 * and if that fails the model's column is kept where it passes (and the cap allows).
 */
export function bruteForceDesign(input: BinSpecInput, options: DesignOptions = {}): BruteForceChoice | undefined {
  const spec = normaliseSpec(input);
  const context = designContext(spec, 3);
  const credible = SCENARIOS.filter((scenario) => spec.support.credibleScenarios.includes(scenario.id));
  const series = new Set(spec.support.sectionFamilies.map((family) => familyToSeries[family]));
  const grades = (options.grades ?? [spec.support.grade]).map((name) => steelGrade(name));
  const price = (name: string) => options.pricePerKg?.[name] ?? DEFAULT_PRICE_PER_KG[name] ?? 1;
  const onColumns = spec.support.type === 'ring-on-columns';
  const columns = onColumns ? loadRolledSections().filter((section) => section.series === 'HE B') : [];
  const girderLength = 2 * Math.PI * context.layout.radius;
  const columnLength = spec.support.columns * spec.support.columnHeight;
  const uls = sizingCombinations(context.loads);
  const demandsOf = (ctx: DesignContext, state: SectionAnalysis) =>
    columnDemands(ctx.loads, ctx.layout, state.scenarios.flatMap(({ scenario, model, analyses }) => analyses.filter((a) => uls.has(a.combination)).map((analysis) => ({ scenario: scenario.id, model, analysis }))));
  const distinctOf = (girder: string, column: string | undefined) => (column === undefined || column === girder ? 1 : 2);
  // Mass times price; the cost per distinct section is added where the pair is known.
  const objectiveOf = (girderMass: number, column: string | undefined, grade: string) => (girderMass + (column ? rolledSection(column).properties.massPerMetre * columnLength : 0)) * price(grade);
  let best: (BruteForceChoice & { mass: number; state: SectionAnalysis }) | undefined;
  for (const section of loadRolledSections().filter((candidate) => series.has(candidate.series))) {
    const state = analyseSection(context, section, credible);
    const demands = demandsOf(context, state);
    for (const grade of grades) {
      if (!(maxUtilisation(sectionEnvelopes(context, section, grade, state.scenarios)) <= 1)) continue;
      const girderMass = section.properties.massPerMetre * girderLength;
      const columnChoices = onColumns ? columns.filter((column) => maxUtilisation(columnChecks(column, grade, spec.support.columnHeight, demands)) <= 1) : [undefined];
      for (const column of columnChoices) {
        const distinct = distinctOf(section.designation, column?.designation);
        if (options.maxDistinctSections !== undefined && distinct > options.maxDistinctSections) continue;
        const objective = objectiveOf(girderMass, column?.designation, grade.name) + (options.costPerDistinctSection ?? 0) * distinct;
        if (!best || objective < best.objective - 1e-6 * objective || (Math.abs(objective - best.objective) <= 1e-6 * objective && girderMass < best.mass)) {
          best = { girder: section.designation, grade: grade.name, objective, mass: girderMass, state, ...(column ? { column: column.designation } : {}) };
        }
      }
    }
  }
  if (!best) return undefined;
  const modelColumn = context.column.section;
  if (best.column !== undefined && best.column !== modelColumn.designation) {
    const column = rolledSection(best.column);
    const grade = steelGrade(best.grade);
    const own: DesignContext = { ...context, column: { section: column, axialStiffness: (context.grade.youngsModulus * column.properties.area) / spec.support.columnHeight } };
    const recheck = analyseSection(own, rolledSection(best.girder), credible);
    const consistent = maxUtilisation(sectionEnvelopes(own, recheck.section, grade, recheck.scenarios)) <= 1 && maxUtilisation(columnChecks(column, grade, spec.support.columnHeight, demandsOf(own, recheck))) <= 1;
    const distinct = distinctOf(best.girder, modelColumn.designation);
    const withinCap = options.maxDistinctSections === undefined || distinct <= options.maxDistinctSections;
    if (!consistent && withinCap && maxUtilisation(columnChecks(modelColumn, grade, spec.support.columnHeight, demandsOf(context, best.state))) <= 1) {
      const objective = objectiveOf(best.mass, modelColumn.designation, best.grade) + (options.costPerDistinctSection ?? 0) * distinct;
      return { girder: best.girder, column: modelColumn.designation, grade: best.grade, objective };
    }
  }
  return { girder: best.girder, grade: best.grade, objective: best.objective, ...(best.column ? { column: best.column } : {}) };
}
