import { analyse, GirderError, type AnalysisResult, type Combination, type GirderModel, type SectionStiffness } from '@binsupport/girder';
import type { GirderModelFile } from '@binsupport/spec';
import { rolledSection, SteelError, steelGrade } from '@binsupport/steel';
import { DesignError } from './errors.js';

export const GIRDER_MODEL_SCHEMA_VERSION = 1;

/** The girder-model file that `design` writes for each scenario (docs/girder-model.md). */
export interface GirderModelDocument extends GirderModel {
  schemaVersion: 1;
  kind: 'girder-model';
  scenario: string;
  description: string;
  combinations: Combination[];
}

export function girderModelDocument(model: GirderModel, scenario: string, description: string, combinations: Combination[]): GirderModelDocument {
  return { schemaVersion: 1, kind: 'girder-model', scenario, description, ...model, combinations };
}

/** Re-run results of a girder-model file: one analysis per combination. */
export interface ModelFileResult {
  schemaVersion: string;
  scenario: string;
  analyses: AnalysisResult[];
}

function resolveSection(name: string, section: GirderModelFile['sections'][string]): SectionStiffness {
  if (!('table' in section)) return section;
  try {
    const rolled = rolledSection(section.table);
    const grade = steelGrade(section.grade);
    const p = rolled.properties;
    return { A: p.area, Iy: p.secondMomentOfAreaY, Iz: p.secondMomentOfAreaZ, It: p.torsionConstant, Iw: p.warpingConstant, E: grade.youngsModulus, G: grade.shearModulus, density: section.density };
  } catch (error) {
    if (error instanceof SteelError) throw new DesignError('BAD_INPUT', `sections.${name}.table: ${error.message}`, `sections.${name}.table`);
    throw error;
  }
}

/** Analyse every combination of a girder-model file (or only the one named). */
export function analyseModelFile(file: GirderModelFile, only?: string): ModelFileResult {
  const sections = Object.fromEntries(Object.entries(file.sections).map(([name, section]) => [name, resolveSection(name, section)]));
  const model: GirderModel = { nodes: file.nodes, elements: file.elements, sections, supports: file.supports, springs: file.springs, loadCases: file.loadCases };
  const combinations = only === undefined ? file.combinations : file.combinations.filter((combination) => combination.name === only);
  if (combinations.length === 0) {
    throw new DesignError('BAD_INPUT', `--combination '${only}' is not in the model file (it holds ${file.combinations.map((c) => c.name).join(', ')})`, 'combinations');
  }
  try {
    return { schemaVersion: '1.0.0', scenario: file.scenario, analyses: combinations.map((combination) => analyse(model, combination)) };
  } catch (error) {
    if (error instanceof GirderError) {
      throw new DesignError(error.code === 'BAD_MODEL' ? 'BAD_INPUT' : 'ANALYSIS_FAILED', error.message, error.path);
    }
    throw error;
  }
}
