import type { BinSpec } from '@binsupport/spec';
import type { SteelGrade, SteelSection } from '@binsupport/steel';
import type { ColumnSupport } from './ring.js';
import type { ScenarioSummary } from './result.js';

export type ScenarioId = BinSpec['support']['credibleScenarios'][number];

/** A support scenario: how the girder bears on its columns, and what that assumption means. */
export interface ScenarioDefinition {
  id: ScenarioId;
  title: string;
  description: string;
  /** One sentence: what this assumption tends to do to the answer (shown beside its results). */
  lesson: string;
  columnSupport(girder: SteelSection, column: { axialStiffness: number }, spec: BinSpec, grade: SteelGrade): ColumnSupport;
}

function capPlate(behaviour: 'compression-only' | 'bilateral') {
  return (girder: SteelSection, column: { axialStiffness: number }, spec: BinSpec, grade: SteelGrade): ColumnSupport => ({
    kind: 'cap-plate',
    behaviour,
    points: spec.support.bearingPoints,
    capLength: spec.support.capPlateLength,
    columnAxialStiffness: column.axialStiffness,
    flangeWidth: girder.dimensions.flangeWidth,
    flangeThickness: girder.dimensions.flangeThickness,
    webThickness: girder.dimensions.webThickness,
    youngsModulus: grade.youngsModulus,
    flangeFlexibility: spec.support.flangeFlexibility,
  });
}

export const SCENARIOS: ScenarioDefinition[] = [
  {
    id: 'column-cap-contact',
    title: 'Contact on the column caps',
    description:
      'The bottom flange rests on each column cap plate: compression-only bearing points across the flange width, each the column axial stiffness shared, in series with the flange outstand bending. The flange lifts off where it would pull, so the reaction moves toward a plate edge as the girder rolls.',
    lesson: 'The realistic assumption: the cap can only push, so the girder rolls about the loaded edge and the column takes the eccentric reaction.',
    columnSupport: capPlate('compression-only'),
  },
  {
    id: 'column-cap-bonded',
    title: 'Bonded to the column caps',
    description: 'The same bearing points as the contact scenario, but able to pull as well as push (a flange fully fixed to the cap).',
    lesson: 'A bonded cap stops the roll with tension a plain bearing cannot give, so it understates the girder torsion: unsafe unless the flange is really held down.',
    columnSupport: capPlate('bilateral'),
  },
  {
    id: 'columns-under-web',
    title: 'Point support under the web',
    description: 'A vertical support at the centre line of each column, free to twist: the textbook ring on simple supports.',
    lesson: 'A point under the web gives the cap no lever against the roll, so all the twist goes into the girder: it overstates torsion and wastes steel.',
    columnSupport: () => ({ kind: 'point-under-web' }),
  },
];

export function scenarioSummary(definition: ScenarioDefinition, credible: boolean): ScenarioSummary {
  return { id: definition.id, title: definition.title, description: definition.description, lesson: definition.lesson, credible };
}
