import type { ElementLineLoad, GirderModel, LoadCase, NodalLoad, PointSpring, SectionStiffness, Support, Vec3 } from '@binsupport/girder';
import { lineLoadAt, type SupportLineCase } from '@binsupport/loads';

/** A ring girder on equally spaced columns: the plan data the model builder needs (SI). */
export interface RingLayout {
  /** Radius of the girder's centroid line, m. */
  radius: number;
  columns: number;
  segmentsPerSpan: number;
}

export const RING_SECTION = 'ring';

/**
 * Tangential bracing at each column top, N/m. The columns of a ring are braced in the tangential
 * plane; under the symmetric gravity cases the bracing carries no force (a modelling choice, common
 * practice), but it removes the ring's rigid-body motions in plan.
 */
export const TANGENTIAL_BRACING_STIFFNESS = 1e8;

export function nodeId(index: number): string {
  return `N${index + 1}`;
}

export function elementId(index: number): string {
  return `RG${index + 1}`;
}

export function columnId(index: number): string {
  return `C${index + 1}`;
}

/** Angle of ring node k, rad: column j stands at 2 pi j / n, nodes are spaced evenly between. */
export function nodeAngle(layout: RingLayout, index: number): number {
  return (2 * Math.PI * index) / (layout.columns * layout.segmentsPerSpan);
}

/**
 * How the girder bears on each column. `point-under-web`: a vertical support at the centroid line,
 * free to twist. `cap-plate`: the bottom flange rests on the column's cap plate, modelled as `points`
 * vertical springs spread evenly across the flange width at the underside of the flange; each is the
 * column's axial stiffness shared equally, in series (optionally) with the bending stiffness of the
 * flange outstand between the web and the point (a cantilever of the cap length's strip,
 * k = 3 E I / c^3, I = l_cap t_f^3 / 12; common practice). Compression-only springs let the girder
 * roll onto the plate edge as it twists; bilateral ones stand for a bonded (welded or bolted tight)
 * flange.
 */
export type ColumnSupport =
  | { kind: 'point-under-web' }
  | {
      kind: 'cap-plate';
      behaviour: 'compression-only' | 'bilateral';
      points: number;
      capLength: number;
      columnAxialStiffness: number;
      flangeWidth: number;
      flangeThickness: number;
      webThickness: number;
      youngsModulus: number;
      flangeFlexibility: boolean;
    };

/** Springs of one column cap: their offsets across the flange and stiffnesses (see ColumnSupport). */
export function capSprings(support: Extract<ColumnSupport, { kind: 'cap-plate' }>, sectionDepth: number): Array<{ across: number; down: number; stiffness: number }> {
  const { points, flangeWidth, flangeThickness, webThickness, capLength, columnAxialStiffness, youngsModulus } = support;
  const share = columnAxialStiffness / points;
  return Array.from({ length: points }, (_, i) => {
    const across = -flangeWidth / 2 + (flangeWidth * i) / (points - 1);
    const lever = Math.max(Math.abs(across) - webThickness / 2, 0);
    const flange = lever > 0 && support.flangeFlexibility ? (3 * youngsModulus * (capLength * flangeThickness ** 3) / 12) / lever ** 3 : Infinity;
    const stiffness = Number.isFinite(flange) ? 1 / (1 / share + 1 / flange) : share;
    return { across, down: sectionDepth / 2, stiffness };
  });
}

/** What to build: a ring of straight segments at the centroid radius on equally spaced columns. */
export interface RingModelInput {
  layout: RingLayout;
  section: SectionStiffness;
  /** Depth of the girder section, m: the transition sits on the top flange, h/2 above the centroid. */
  sectionDepth: number;
  cases: SupportLineCase[];
  /** Name of the case that carries the girder's self weight. */
  selfWeightCase: string;
  columnSupport?: ColumnSupport;
}

/**
 * Build the girder model of a ring on columns under the web (the support scenario
 * 'columns-under-web'). Support-line loads are per unit length of the circle of radius
 * `lineRadius`; on the girder they keep their resultant per segment:
 * - the vertical line load acts along each straight segment (so the segment bends under it);
 * - the hopper's radial pull, and the moments of both loads about the centroid (the pull arrives at
 *   the top flange, h/2 above the centroid; the line of action may sit off the centroid radius), are
 *   lumped at the nodes along the node's own radial and tangential directions. A uniform moment
 *   about a curved axis is carried by a closed ring in bending alone; spread along straight
 *   segments it would add a spurious torque of +-m L/2 in every segment, which lumping avoids.
 */
export function buildRingModel(input: RingModelInput): GirderModel {
  const { layout, section, sectionDepth } = input;
  const R = layout.radius;
  const N = layout.columns * layout.segmentsPerSpan;
  const nodes = Array.from({ length: N }, (_, k) => {
    const angle = nodeAngle(layout, k);
    return { id: nodeId(k), x: R * Math.cos(angle), y: R * Math.sin(angle), z: 0 };
  });
  const elements = Array.from({ length: N }, (_, k) => ({ id: elementId(k), nodeI: nodeId(k), nodeJ: nodeId((k + 1) % N), section: RING_SECTION, up: [0, 0, 1] as Vec3 }));

  const supports: Support[] = [];
  const springs: PointSpring[] = [];
  for (let j = 0; j < layout.columns; j++) {
    const k = j * layout.segmentsPerSpan;
    const angle = nodeAngle(layout, k);
    const column = input.columnSupport ?? { kind: 'point-under-web' };
    if (column.kind === 'point-under-web') {
      supports.push({ node: nodeId(k), fix: ['uz'] });
    } else {
      const outward: Vec3 = [Math.cos(angle), Math.sin(angle), 0];
      capSprings(column, sectionDepth).forEach((point, i) => {
        springs.push({
          id: `${columnId(j)}-cap-${i + 1}`,
          node: nodeId(k),
          direction: [0, 0, 1],
          stiffness: point.stiffness,
          offset: [point.across * outward[0], point.across * outward[1], -point.down],
          behaviour: column.behaviour,
          group: `${columnId(j)} cap`,
          tributaryLength: column.capLength,
        });
      });
    }
    springs.push({ id: `${columnId(j)}-bracing`, node: nodeId(k), direction: [-Math.sin(angle), Math.cos(angle), 0], stiffness: TANGENTIAL_BRACING_STIFFNESS });
  }

  const segmentAngle = (2 * Math.PI) / N;
  const chord = 2 * R * Math.sin(segmentAngle / 2);
  const loadCases: LoadCase[] = input.cases.map((loadCase) => {
    // Resultants of the case on one segment's (or one node's) arc of the support line. The line
    // loads vary around the line (harmonics: patch loads, wind, seismic); the vertical load is taken
    // at each segment's mid-angle, the radial and tangential loads at each node's angle.
    const arcOfLine = loadCase.lineRadius * segmentAngle;
    const radialOffset = loadCase.lineRadius - R;
    const lineLoads: ElementLineLoad[] = elements.map((element, k) => ({ element: element.id, q: [0, 0, -(lineLoadAt(loadCase, (k + 0.5) * segmentAngle).vertical * arcOfLine) / chord] }));
    const nodalLoads: NodalLoad[] = nodes.map((node, k) => {
      const angle = nodeAngle(layout, k);
      const at = lineLoadAt(loadCase, angle);
      const outward: Vec3 = [Math.cos(angle), Math.sin(angle), 0];
      const tangent: Vec3 = [-Math.sin(angle), Math.cos(angle), 0];
      const radialPerNode = at.radial * arcOfLine;
      const tangentialPerNode = at.tangential * arcOfLine;
      const force: Vec3 = [-radialPerNode * outward[0] + tangentialPerNode * tangent[0], -radialPerNode * outward[1] + tangentialPerNode * tangent[1], 0];
      // Moment about the centroid of the loads at their line of action, offset e from the centroid:
      // e x (pull, shear and vertical load), e = (lineRadius - R) r + (h/2) z (the top flange).
      const offset: Vec3 = [radialOffset * outward[0], radialOffset * outward[1], sectionDepth / 2];
      const total: Vec3 = [force[0], force[1], -at.vertical * arcOfLine];
      const moment: Vec3 = [offset[1] * total[2] - offset[2] * total[1], offset[2] * total[0] - offset[0] * total[2], offset[0] * total[1] - offset[1] * total[0]];
      return { node: node.id, force, moment };
    });
    // Self weight on the chords, scaled so that the ring weighs what the curved girder (arc) weighs.
    return { name: loadCase.name, lineLoads, nodalLoads, selfWeightFactor: loadCase.name === input.selfWeightCase ? (R * segmentAngle) / chord : 0 };
  });

  return { nodes, elements, sections: { [RING_SECTION]: section }, supports, springs, loadCases };
}
