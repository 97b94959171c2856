import type { ElementLineLoad, GirderModel, LoadCase, NodalLoad, PointSpring, SectionStiffness, Support, Vec3 } from '@binsupport/girder';
import { lineLoadAt, type SupportLineCase } from '@binsupport/loads';

/** A ring girder on equally spaced columns: the plan data the model builder needs (SI). */
export interface RingLayout {
  /** 'columns': on equally spaced columns; 'slab': bearing all round on a slab or ring beam (columns is then 1). */
  kind?: 'columns' | 'slab';
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

/** The bearing group of the cap springs of column `index` (checks find the cap's points by it). */
export function capGroupId(index: number): string {
  return `${columnId(index)} cap`;
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
 * flange. `boltGauge`: the flange is bolted down on each side of the web at this distance from the
 * web centre line; two more points stand at +-gauge (the column's stiffness then shared among all
 * the points), bilateral, since a bolt pulls through the flange outstand as the bearing pushes. The
 * bolt's own elongation is neglected beside the outstand's bending (common practice).
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
      /** distance between the web centre lines of a box girder, m; 0 or absent for an I */
      webCentreDistance?: number;
      /** distance of each bolt line from the web centre line, m; absent: no cap bolts */
      boltGauge?: number;
    };

/** Offsets across the flange of a cap's points: `points` spread evenly, plus the bolt lines at +-gauge (merged with a point within 1 mm). */
export function capPointOffsets(points: number, flangeWidth: number, boltGauge?: number): Array<{ across: number; bolted: boolean }> {
  const offsets = Array.from({ length: points }, (_, i) => ({ across: -flangeWidth / 2 + (flangeWidth * i) / (points - 1), bolted: false }));
  if (boltGauge === undefined) return offsets;
  for (const across of [-boltGauge, boltGauge]) {
    const near = offsets.find((point) => Math.abs(point.across - across) < 1e-3);
    if (near) {
      near.across = across;
      near.bolted = true;
    } else {
      offsets.push({ across, bolted: true });
    }
  }
  return offsets.sort((a, b) => a.across - b.across);
}

/**
 * How the girder bears on a slab or ring beam all round. At every node, bearing points stand for the
 * node's tributary length of bearing: `points` across the flange width (contact: compression-only;
 * bonded: bilateral; anchored: compression-only in bearing and holding down up to a tension
 * capacity), each the bearing modulus times its tributary area, in series (optionally) with the
 * flange outstand's bending; or a single bilateral line under the web or at the inner flange edge.
 */
export type SlabBearing = {
  kind: 'slab';
  layout: 'across-flange' | 'web-line' | 'inner-edge-line';
  behaviour: 'compression-only' | 'bilateral' | 'anchored';
  points: number;
  /** Bearing modulus, N/m3 (pressure per unit settlement). */
  bearingModulus: number;
  /** Holding-down capacity per metre of girder, N/m (anchored only). */
  anchorCapacityPerLength: number;
  flangeWidth: number;
  flangeThickness: number;
  webThickness: number;
  youngsModulus: number;
  flangeFlexibility: boolean;
  /** distance between the web centre lines of a box girder, m; 0 or absent for an I */
  webCentreDistance?: number;
};

/**
 * Lever of the flange's bending under a bearing point at `across` from the girder centre line, m: the
 * cantilever length beyond the face of the web (k = 3 E I / c^3). Between the two webs of a box the
 * flange is a strip fixed at both web faces; a point at a and b from them deflects as a cantilever of
 * c = a b / L (fixed-fixed beam under a point load, delta = P a^3 b^3 / (3 E I L^3); Roark, beams,
 * fixed ends, concentrated load).
 */
export function flangeLever(across: number, webThickness: number, webCentreDistance = 0): number {
  const d = Math.abs(across);
  const face = webCentreDistance / 2 + webThickness / 2;
  if (d >= face) return d - face;
  const inner = webCentreDistance / 2 - webThickness / 2;
  if (inner <= 0 || d >= inner) return 0;
  const a = inner + across;
  const b = inner - across;
  return (a * b) / (a + b);
}

/** Bearing points of one node on a slab (see SlabBearing): offsets across the flange, stiffnesses. */
export function slabSprings(bearing: SlabBearing, tributaryLength: number): Array<{ across: number; stiffness: number; tensionCapacity?: number }> {
  const { flangeWidth: b, flangeThickness: tf, webThickness: tw, bearingModulus, youngsModulus } = bearing;
  if (bearing.layout === 'web-line') return [{ across: 0, stiffness: bearingModulus * b * tributaryLength }];
  if (bearing.layout === 'inner-edge-line') return [{ across: -b / 2, stiffness: bearingModulus * b * tributaryLength }];
  const n = bearing.points;
  return Array.from({ length: n }, (_, i) => {
    const across = -b / 2 + (b * i) / (n - 1);
    // Tributary width of the point across the flange: half a spacing at the tips, a spacing inside.
    const width = (i === 0 || i === n - 1 ? 0.5 : 1) * (b / (n - 1));
    const bearingStiffness = bearingModulus * width * tributaryLength;
    const lever = flangeLever(across, tw, bearing.webCentreDistance);
    const flange = lever > 0 && bearing.flangeFlexibility ? (3 * youngsModulus * (tributaryLength * tf ** 3) / 12) / lever ** 3 : Infinity;
    const stiffness = Number.isFinite(flange) ? 1 / (1 / bearingStiffness + 1 / flange) : bearingStiffness;
    return { across, stiffness, ...(bearing.behaviour === 'anchored' ? { tensionCapacity: bearing.anchorCapacityPerLength * tributaryLength * (width / b) } : {}) };
  });
}

/** Springs of one column cap: their offsets across the flange and stiffnesses (see ColumnSupport). */
export function capSprings(support: Extract<ColumnSupport, { kind: 'cap-plate' }>, sectionDepth: number): Array<{ across: number; down: number; stiffness: number; behaviour: 'compression-only' | 'bilateral' }> {
  const { points, flangeWidth, flangeThickness, webThickness, capLength, columnAxialStiffness, youngsModulus } = support;
  const offsets = capPointOffsets(points, flangeWidth, support.boltGauge);
  const share = columnAxialStiffness / offsets.length;
  return offsets.map(({ across, bolted }) => {
    const lever = flangeLever(across, webThickness, support.webCentreDistance);
    const flange = lever > 0 && support.flangeFlexibility ? (3 * youngsModulus * (capLength * flangeThickness ** 3) / 12) / lever ** 3 : Infinity;
    const stiffness = Number.isFinite(flange) ? 1 / (1 / share + 1 / flange) : share;
    return { across, down: sectionDepth / 2, stiffness, behaviour: bolted ? 'bilateral' : support.behaviour };
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
  /** For a girder on a slab (layout.kind 'slab'): how it bears all round. */
  slabBearing?: SlabBearing;
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
  if (layout.kind === 'slab') {
    const bearing = input.slabBearing;
    if (!bearing) throw new Error('a girder on a slab needs its bearing (slabBearing)');
    const arc = (2 * Math.PI * R) / N;
    nodes.forEach((node, k) => {
      const angle = nodeAngle(layout, k);
      const outward: Vec3 = [Math.cos(angle), Math.sin(angle), 0];
      slabSprings(bearing, arc).forEach((point, i) => {
        springs.push({
          id: `${node.id}-bearing-${i + 1}`,
          node: node.id,
          direction: [0, 0, 1],
          stiffness: point.stiffness,
          offset: [point.across * outward[0], point.across * outward[1], -sectionDepth / 2],
          behaviour: point.tensionCapacity !== undefined ? { kind: 'anchored', tensionCapacity: point.tensionCapacity } : bearing.behaviour === 'anchored' ? 'compression-only' : bearing.behaviour,
          group: `bearing ${node.id}`,
          tributaryLength: arc,
        });
      });
      // Grout friction or shear keys: a tangential spring at every node removes the ring's rigid-body
      // motions in plan (a modelling choice; it carries the horizontal actions into the slab).
      springs.push({ id: `${node.id}-shear`, node: node.id, direction: [-Math.sin(angle), Math.cos(angle), 0], stiffness: bearing.bearingModulus * bearing.flangeWidth * arc });
    });
  }
  for (let j = 0; layout.kind !== 'slab' && j < layout.columns; j++) {
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
          behaviour: point.behaviour,
          group: capGroupId(j),
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
