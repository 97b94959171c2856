// The columns of a ring on columns as a member group: their forces from the girder's bearing
// reactions, and the member checks of a candidate column section under those forces.
//
// Assumptions (stated in the report through the checks' inputs):
// - each column carries the vertical reaction of its cap (the sum of the cap's bearing-point forces,
//   or the point support's reaction) as axial compression N, plus its own weight down to the base;
// - the eccentric reaction bends the column in the bin's radial plane, M = sum F_i a_i (a_i the
//   bearing point's offset from the column axis, outward positive); the column's web lies in that
//   plane, so M acts about its strong axis;
// - the column is pinned at its base and held at its top (buckling length = its height about both
//   axes; common practice for a braced ring of columns); the cap moment enters at the top and
//   falls linearly to zero at the pinned base (end moment ratio psi = 0, C_my = C_mLT = 0.6,
//   EN 1993-1-1 Table B.3);
// - the tangential bracing of the column tops carries the horizontal actions in its own plane (the
//   columns take no shear or bending from it).
import { PERMANENT_CASE, STANDARD_GRAVITY, type LoadSet } from '@binsupport/loads';
import { checkBendingAndAxialCompression, checkFlexuralBuckling, checkSection, equivalentUniformMomentFactor, type CheckResult, type SteelGrade, type SteelSection } from '@binsupport/steel';
import type { Station } from '@binsupport/girder';
import type { CheckEnvelope } from './evaluate.js';
import { columnReactions, type AnalysedCase } from './girder-checks.js';
import type { RingLayout } from './ring.js';

/** The forces at the top of one column in one analysed combination. */
export interface ColumnDemand {
  combination: string;
  scenario: string;
  /** 0-based column index */
  column: number;
  /** Compression at the column top, N (positive in compression). */
  compression: number;
  /** Moment at the column top from the eccentric reaction, N m. */
  moment: number;
  /** Partial factor of the permanent case in the combination (for the column's own weight). */
  permanentFactor: number;
  /** Where the column stands (the girder station over it), for the report. */
  station: Station;
}

/** Column forces of every analysed ULS case: one demand per column per (combination, scenario). */
export function columnDemands(loads: LoadSet, layout: RingLayout, cases: AnalysedCase[]): ColumnDemand[] {
  if (layout.kind === 'slab') return [];
  const demands: ColumnDemand[] = [];
  for (const item of cases) {
    const factors = loads.combinations.find((combination) => combination.name === item.analysis.combination)?.factors ?? {};
    for (const reaction of columnReactions(item.model, item.analysis, layout)) {
      const element = item.model.elements.find((candidate) => candidate.nodeI === reaction.node);
      const station = item.analysis.stations.find((candidate) => candidate.element === element?.id && candidate.x === 0);
      if (!station) continue;
      demands.push({ combination: item.analysis.combination, scenario: item.scenario, column: reaction.index, compression: reaction.force, moment: reaction.moment, permanentFactor: factors[PERMANENT_CASE] ?? 0, station });
    }
  }
  return demands;
}

/** End moment ratio of the column: moment at the top, none at the pinned base (EN 1993-1-1 Table B.3). */
export const COLUMN_END_MOMENT_RATIO = 0;

/**
 * Checks of a candidate column under the demands: flexural buckling (EN 1993-1-1 6.3.1) under the
 * compression at the base (top force plus the factored own weight), the bending and axial interaction
 * (6.3.3, Annex B) with the cap moment, and the cross-section at the top (6.2) under N, M and the shear
 * M / H that the linear moment implies. The worst of each check per (combination, scenario).
 */
export function columnChecks(section: SteelSection, grade: SteelGrade, height: number, demands: ColumnDemand[]): CheckEnvelope[] {
  const worst = new Map<string, CheckEnvelope>();
  const Cm = equivalentUniformMomentFactor(COLUMN_END_MOMENT_RATIO);
  const ownWeight = section.properties.massPerMetre * height * STANDARD_GRAVITY;
  const keep = (check: CheckResult, demand: ColumnDemand): void => {
    const key = `${check.id}|${demand.combination}|${demand.scenario}`;
    const current = worst.get(key);
    if (!current || check.utilisation > current.check.utilisation) worst.set(key, { check, combination: demand.combination, scenario: demand.scenario, station: demand.station });
  };
  for (const demand of demands) {
    const N = -(Math.max(0, demand.compression) + demand.permanentFactor * ownWeight);
    const traced = (check: CheckResult): CheckResult => ({
      ...check,
      inputs: { ...check.inputs, column: demand.column + 1, H: height, 'N_top (compression)': demand.compression, 'M_top': demand.moment, 'gamma_G G_column': demand.permanentFactor * ownWeight },
    });
    keep(traced(checkFlexuralBuckling(section, grade, N, { length: height, ends: 'pinned-pinned' })), demand);
    keep(
      traced(
        checkBendingAndAxialCompression(section, grade, { N, My: demand.moment, Mz: 0 }, { length: height, ends: 'pinned-pinned', lateralTorsional: { length: height, momentShape: 'uniform' }, Cmy: Cm, CmLT: Cm }),
      ),
      demand,
    );
    const top = checkSection(section, grade, { N: -Math.max(0, demand.compression), Vy: 0, Vz: demand.moment / height, Tsv: 0, Tw: 0, My: demand.moment, Mz: 0, B: 0 });
    for (const check of top) keep(traced({ ...check, id: `column-top-${check.id}`, title: `Column top: ${check.title}` }), demand);
  }
  return [...worst.values()];
}
