import type { BinSpec } from '@binsupport/spec';
import type { SteelGrade, SteelSection } from '@binsupport/steel';
import type { ColumnSupport, SlabBearing } from './ring.js';
import type { ScenarioSummary } from './result.js';

export type ScenarioId = BinSpec['support']['credibleScenarios'][number];

/** A support scenario: how the girder bears on its columns, and what that assumption means. */
export interface ScenarioDefinition {
  id: ScenarioId;
  title: string;
  description: string;
  /** One sentence: what this assumption tends to do to the answer (shown beside its results). */
  lesson: string;
  /** The support type the scenario belongs to. */
  supportType: BinSpec['support']['type'];
  columnSupport?(girder: SteelSection, column: { axialStiffness: number }, spec: BinSpec, grade: SteelGrade): ColumnSupport;
  slabBearing?(girder: SteelSection, spec: BinSpec, grade: SteelGrade): SlabBearing;
}

function slab(layout: SlabBearing['layout'], behaviour: SlabBearing['behaviour']) {
  return (girder: SteelSection, spec: BinSpec, grade: SteelGrade): SlabBearing => ({
    kind: 'slab',
    layout,
    behaviour,
    points: spec.support.bearingPoints,
    bearingModulus: spec.support.bearingModulus,
    anchorCapacityPerLength: spec.support.anchorCapacity,
    flangeWidth: girder.dimensions.flangeWidth,
    flangeThickness: girder.dimensions.flangeThickness,
    webThickness: girder.dimensions.webThickness,
    youngsModulus: grade.youngsModulus,
    flangeFlexibility: spec.support.flangeFlexibility,
    ...(girder.box ? { webCentreDistance: girder.box.webCentreDistance } : {}),
  });
}

/**
 * The bolt lines of the cap bolts on a girder: the gauge from the web centre line, m (the spec's, or
 * the middle of the flat outstand between the web root and the flange tip), and the bolts each
 * side; undefined without cap bolts.
 */
export function capBoltLayout(girder: SteelSection, spec: BinSpec): { gauge: number; perSide: number } | undefined {
  const bolts = spec.support.capBolts;
  if (!bolts) return undefined;
  const { flangeWidth: b, webThickness: tw, rootRadius: r } = girder.dimensions;
  return { gauge: bolts.gauge ?? (tw / 2 + r + b / 2) / 2, perSide: bolts.perCap / 2 };
}

function capPlate(behaviour: 'compression-only' | 'bilateral', bolted = false) {
  return (girder: SteelSection, column: { axialStiffness: number }, spec: BinSpec, grade: SteelGrade): ColumnSupport => {
    const bolts = bolted ? capBoltLayout(girder, spec) : undefined;
    return {
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
      ...(girder.box ? { webCentreDistance: girder.box.webCentreDistance } : {}),
      ...(bolts ? { boltGauge: bolts.gauge } : {}),
    };
  };
}

export const SCENARIOS: ScenarioDefinition[] = [
  {
    id: 'column-cap-contact',
    title: 'Contact on the column caps',
    description:
      'The bottom flange rests on each column cap plate: compression-only bearing points across the flange width, each the column axial stiffness shared, in series with the flange outstand bending. The flange lifts off where it would pull, so the reaction moves toward a plate edge as the girder rolls.',
    lesson: 'The realistic assumption: the cap can only push, so the girder rolls about the loaded edge and the column takes the eccentric reaction.',
    supportType: 'ring-on-columns',
    columnSupport: capPlate('compression-only'),
  },
  {
    id: 'column-cap-bolted',
    title: 'Bolted down on the column caps',
    description:
      'The contact bearing points on each cap plate, plus the cap bolts (support.capBolts) each side of the web: the bearing points can only push, the bolt lines push and pull through the flange outstand. The girder can roll only as far as the bolts and the flange let it.',
    lesson: 'Bolts give the cap a lever against the roll that a plain bearing lacks; the bolts, the flange that they pull and the column below take the tension.',
    supportType: 'ring-on-columns',
    columnSupport: capPlate('compression-only', true),
  },
  {
    id: 'column-cap-bonded',
    title: 'Bonded to the column caps',
    description: 'The same bearing points as the contact scenario, but able to pull as well as push (a flange fully fixed to the cap).',
    lesson: 'A bonded cap stops the roll with tension a plain bearing cannot give, so it understates the girder torsion: unsafe unless the flange is really held down.',
    supportType: 'ring-on-columns',
    columnSupport: capPlate('bilateral'),
  },
  {
    id: 'columns-under-web',
    title: 'Point support under the web',
    description: 'A vertical support at the centre line of each column, free to twist: the textbook ring on simple supports.',
    lesson: 'A point under the web gives the cap no lever against the roll, so all the twist goes into the girder: it overstates torsion and wastes steel.',
    supportType: 'ring-on-columns',
    columnSupport: () => ({ kind: 'point-under-web' }),
  },
  {
    id: 'slab-contact',
    title: 'Contact on the slab',
    description:
      'The bottom flange rests on the slab all round: compression-only bearing points across the flange width at every node, each the bearing modulus times its tributary area, in series with the flange outstand bending. The flange lifts off wherever it would pull.',
    lesson: 'The realistic assumption: the flange lifts off where it would pull, so the girder rolls about a flange edge and the centre of rotation sits off the web.',
    supportType: 'ring-on-slab',
    slabBearing: slab('across-flange', 'compression-only'),
  },
  {
    id: 'slab-bonded',
    title: 'Bonded to the slab',
    description: 'The same bearing points as the contact scenario, able to pull as well as push.',
    lesson: 'Tension that cannot exist stops the twist, so the girder looks nearly unloaded in torsion: unsafe unless the flange is really held down.',
    supportType: 'ring-on-slab',
    slabBearing: slab('across-flange', 'bilateral'),
  },
  {
    id: 'slab-web-line',
    title: 'Line support under the web',
    description: 'A single bilateral line of bearing under the web: the girder may twist about its own bottom centre line.',
    lesson: 'The load acts at its full eccentricity about the web line, so torsion is overstated and steel wasted.',
    supportType: 'ring-on-slab',
    slabBearing: slab('web-line', 'bilateral'),
  },
  {
    id: 'slab-inner-edge-line',
    title: 'Line support at the inner flange edge',
    description: 'A single bilateral line of bearing at the inner edge of the bottom flange, the usual hand assumption for a girder rolling inward.',
    lesson: 'Looks reasonable, but it ignores the flange bending that moves the centre of rotation outward and can pull down where a real bearing cannot.',
    supportType: 'ring-on-slab',
    slabBearing: slab('inner-edge-line', 'bilateral'),
  },
  {
    id: 'slab-anchored',
    title: 'Anchored to the slab',
    description: 'The contact bearing points, held down by anchors that take tension up to their capacity and then yield.',
    lesson: 'Anchors give the bonded answer only up to their capacity; beyond it the girder rolls as on plain contact.',
    supportType: 'ring-on-slab',
    slabBearing: slab('across-flange', 'anchored'),
  },
];

export function scenarioSummary(definition: ScenarioDefinition, credible: boolean): ScenarioSummary {
  return { id: definition.id, title: definition.title, description: definition.description, lesson: definition.lesson, credible };
}
