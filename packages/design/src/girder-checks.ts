// Checks of the ring girder that are not cross-section checks at a station: the web over each column
// cap (patch loading), the bottom flange under the bearing points, the ring under the hopper's pull
// (in-plane buckling, transition-junction compression), anchors on a slab, and serviceability
// (deflection and twist from the girder displacements). Each returns envelopes in the same shape as
// the station checks, so that they become rows of the design's utilisations with clause, inputs,
// intermediate values, combination, scenario and position.
import type { AnalysisResult, GirderModel, Station } from '@binsupport/girder';
import { lineLoadAt, type LoadSet } from '@binsupport/loads';
import type { BinSpec } from '@binsupport/spec';
import {
  checkAnchorTension,
  checkBoltedFlangeTension,
  strengthsForThickness,
  checkDeflection,
  checkBearingStiffeners,
  checkFlangeLocalBending,
  flangeLocalBendingUtilisation,
  checkJunctionRingCompression,
  checkLateralTorsionalBuckling,
  checkPatchLoading,
  checkRingInPlaneBuckling,
  checkTwist,
  type CheckResult,
  type SteelGrade,
  type SteelSection,
  type BearingStiffenerPair,
} from '@binsupport/steel';
import type { CheckEnvelope } from './evaluate.js';
import { capGroupId, type RingLayout } from './ring.js';
import { capBoltLayout } from './scenarios.js';

/** One analysed combination of one scenario, with the model it was analysed on. */
export interface AnalysedCase {
  scenario: string;
  model: GirderModel;
  analysis: AnalysisResult;
}

/** Serviceability limits (user inputs with documented defaults). */
export interface ServiceabilityLimits {
  /** Deflection limit as span / ratio (default 500; common practice, EN 1993-1-1 7.2 leaves it to the project). */
  deflectionLimitRatio: number;
  /** Twist limit, rad (default 0.01; common practice). */
  twistLimit: number;
}

export const DEFAULT_SERVICEABILITY: ServiceabilityLimits = { deflectionLimitRatio: 500, twistLimit: 0.01 };

const nodeStations = new WeakMap<AnalysisResult, Map<string, Station>>();

/** The station at the start of the element that leaves a node (x = 0): the place of a node check. */
function stationAtNode(model: GirderModel, analysis: AnalysisResult, node: string): Station | undefined {
  let byNode = nodeStations.get(analysis);
  if (!byNode) {
    const elementOfNode = new Map(model.elements.map((element) => [element.id, element.nodeI]));
    byNode = new Map();
    for (const station of analysis.stations) {
      const start = elementOfNode.get(station.element);
      if (station.x === 0 && start !== undefined && !byNode.has(start)) byNode.set(start, station);
    }
    nodeStations.set(analysis, byNode);
  }
  return byNode.get(node);
}

function nodeAngleOf(model: GirderModel, node: string): number {
  const found = model.nodes.find((candidate) => candidate.id === node);
  if (!found) return 0;
  const angle = Math.atan2(found.y, found.x);
  return angle < 0 ? angle + 2 * Math.PI : angle;
}

/** Keep the worst result per check id of one (combination, scenario). */
function keepWorst(worst: Map<string, CheckEnvelope>, check: CheckResult, combination: string, scenario: string, station: Station | undefined): void {
  if (!station) return;
  const current = worst.get(check.id);
  if (!current || check.utilisation > current.check.utilisation) worst.set(check.id, { check, combination, scenario, station });
}

/** A bearing spring with its place across the flange (signed, outward positive) and its force. */
interface BearingPoint {
  id: string;
  node: string;
  group: string;
  across: number;
  tributaryLength: number;
  /** N, compression positive */
  force: number;
  tensionCapacity?: number;
}

const bearingPointCache = new WeakMap<AnalysisResult, BearingPoint[]>();

/** The bearing points (cap or slab springs) of an analysis, with their offsets across the flange. */
export function bearingPoints(model: GirderModel, analysis: AnalysisResult): BearingPoint[] {
  const cached = bearingPointCache.get(analysis);
  if (cached) return cached;
  const points = collectBearingPoints(model, analysis);
  bearingPointCache.set(analysis, points);
  return points;
}

function collectBearingPoints(model: GirderModel, analysis: AnalysisResult): BearingPoint[] {
  const nodes = new Map(model.nodes.map((node) => [node.id, node]));
  const forces = new Map(analysis.springForces.map((spring) => [spring.id, spring.force]));
  const points: BearingPoint[] = [];
  for (const spring of model.springs ?? []) {
    if (!spring.group || spring.tributaryLength === undefined) continue;
    const node = nodes.get(spring.node);
    if (!node) continue;
    const r = Math.hypot(node.x, node.y);
    const offset = spring.offset ?? [0, 0, 0];
    const across = r > 0 ? (offset[0] * node.x + offset[1] * node.y) / r : 0;
    const behaviour = spring.behaviour;
    points.push({
      id: spring.id,
      node: spring.node,
      group: spring.group,
      across,
      tributaryLength: spring.tributaryLength,
      force: forces.get(spring.id) ?? 0,
      ...(typeof behaviour === 'object' && behaviour.kind === 'anchored' ? { tensionCapacity: behaviour.tensionCapacity } : {}),
    });
  }
  return points;
}

/** Column reactions of a ring on columns: per column node, the vertical reaction and its moment about the column axis. */
export interface ColumnReaction {
  /** column index j (0-based) */
  index: number;
  node: string;
  /** Vertical reaction on the girder, N, upward positive (the column's compression). */
  force: number;
  /**
   * Moment of the reaction about the column's centre line, N m: sum F_i x offset_i across the flange
   * (outward positive), i.e. about the tangential axis at the column top.
   */
  moment: number;
  /** The forces of the cap's bearing points (inside to outside), N; empty for a point support. */
  points: number[];
}

/** Reactions at the columns (cap springs or the point support under the web). */
export function columnReactions(model: GirderModel, analysis: AnalysisResult, layout: RingLayout): ColumnReaction[] {
  const points = bearingPoints(model, analysis);
  const result: ColumnReaction[] = [];
  for (let j = 0; j < layout.columns; j++) {
    const node = model.nodes[j * layout.segmentsPerSpan]?.id ?? '';
    const cap = points.filter((point) => point.node === node && point.group === capGroupId(j));
    if (cap.length > 0) {
      result.push({ index: j, node, force: cap.reduce((sum, point) => sum + point.force, 0), moment: cap.reduce((sum, point) => sum + point.force * point.across, 0), points: cap.map((point) => point.force) });
      continue;
    }
    const reaction = analysis.reactions.find((candidate) => candidate.node === node);
    if (reaction) result.push({ index: j, node, force: reaction.force[2], moment: 0, points: [] });
  }
  return result;
}

/**
 * Web over each column cap, EN 1993-1-5 section 6 (type a: the force enters through the bottom flange
 * and is resisted by web shear on both sides): F_Ed = the column's reaction (the sum of its cap's
 * bearing-point forces, or the point support's reaction), s_s = the cap plate length.
 */
function patchLoadingChecks(section: SteelSection, grade: SteelGrade, spec: BinSpec, layout: RingLayout, item: AnalysedCase, worst: Map<string, CheckEnvelope>): void {
  if (layout.kind === 'slab') return;
  // A box's two webs share the reaction equally (the flange between them spreads it; symmetric
  // section), each with half the flange width for m1 (EN 1993-1-5 6.5): one web's check.
  const webs = section.box ? 2 : 1;
  const perWeb: SteelSection = section.box ? { designation: section.designation, series: section.series, dimensions: { ...section.dimensions, flangeWidth: section.dimensions.flangeWidth / 2 }, properties: section.properties, source: section.source } : section;
  for (const column of columnReactions(item.model, item.analysis, layout)) {
    const check = checkPatchLoading(perWeb, grade, { force: Math.max(0, column.force) / webs, stiffBearingLength: spec.support.capPlateLength, type: 'a' });
    keepWorst(worst, { ...check, ...(webs === 2 ? { title: `${check.title}, each of the two webs` } : {}), inputs: { ...check.inputs, column: column.index + 1, webs } }, item.analysis.combination, item.scenario, stationAtNode(item.model, item.analysis, column.node));
  }
}

/**
 * Lateral-torsional buckling between the columns of a girder held only there (support.girderRestraint
 * 'columns'): EN 1993-1-1 6.3.2.3 (rolled sections), fork supports at the columns, the span taken as
 * straight over its arc length 2 pi R / n, C1 = 1 (uniform moment: conservative for the hogging and
 * sagging of a continuous ring, common practice). M_b,Rd is the same along the span, so the station
 * with the largest |My| governs. With the default 'shell' the top flange is held along its length
 * and no LTB check is made.
 */
function lateralTorsionalBucklingChecks(section: SteelSection, grade: SteelGrade, spec: BinSpec, layout: RingLayout, item: AnalysedCase, worst: Map<string, CheckEnvelope>): void {
  if (layout.kind === 'slab' || spec.support.girderRestraint !== 'columns') return;
  let governing: Station | undefined;
  for (const station of item.analysis.stations) if (!governing || Math.abs(station.My) > Math.abs(governing.My)) governing = station;
  if (!governing) return;
  const span = (2 * Math.PI * layout.radius) / layout.columns;
  const check = checkLateralTorsionalBuckling(section, grade, governing.My, { length: span, momentShape: 'uniform', method: 'rolled' });
  keepWorst(worst, check, item.analysis.combination, item.scenario, governing);
}

/** Setback of a default bearing stiffener from the flange tip, m (common practice: 10 mm). */
export const STIFFENER_TIP_SETBACK = 0.01;

/**
 * The bearing stiffener pair of a section over the column caps, from support.bearingStiffeners: the
 * given width, or the flange outstand (b - t_w)/2 less STIFFENER_TIP_SETBACK. Undefined without
 * stiffeners (or on a slab). A pair that does not fit the flange is refused by its checks (steel).
 */
export function bearingStiffenerOf(section: SteelSection, spec: BinSpec, layout: RingLayout): BearingStiffenerPair | undefined {
  const stiffeners = spec.support.bearingStiffeners;
  // The pair of plates is for an I girder's web; a box's webs are checked for patch loading.
  if (!stiffeners || layout.kind === 'slab' || section.box) return undefined;
  const outstand = (section.dimensions.flangeWidth - section.dimensions.webThickness) / 2;
  return { width: stiffeners.width ?? outstand - STIFFENER_TIP_SETBACK, thickness: stiffeners.thickness, chamfer: stiffeners.chamfer };
}

/** Steel of the bearing stiffeners of one girder: a pair over each column, full web depth, kg. */
export function bearingStiffenerMass(section: SteelSection, spec: BinSpec, layout: RingLayout): number {
  const pair = bearingStiffenerOf(section, spec, layout);
  if (!pair) return 0;
  const webDepth = section.dimensions.depth - 2 * section.dimensions.flangeThickness;
  return layout.columns * 2 * Math.max(0, pair.width) * pair.thickness * webDepth * spec.bin.steelDensity;
}

/**
 * Bearing stiffeners over each column (EN 1993-1-5 9.1, 9.4): the cap's bearing points inside the
 * web line load one stiffener, those outside the other, a point on the web line both equally; a point
 * support under the web loads both equally.
 */
function stiffenerChecks(section: SteelSection, grade: SteelGrade, pair: BearingStiffenerPair, layout: RingLayout, item: AnalysedCase, worst: Map<string, CheckEnvelope>): void {
  const points = bearingPoints(item.model, item.analysis);
  for (const column of columnReactions(item.model, item.analysis, layout)) {
    const station = stationAtNode(item.model, item.analysis, column.node);
    const cap = points.filter((point) => point.node === column.node && point.group === capGroupId(column.index));
    let inside = 0;
    let outside = 0;
    if (cap.length === 0) {
      inside = Math.max(0, column.force) / 2;
      outside = inside;
    }
    for (const point of cap) {
      const force = Math.max(0, point.force);
      if (point.across < 0) inside += force;
      else if (point.across > 0) outside += force;
      else {
        inside += force / 2;
        outside += force / 2;
      }
    }
    for (const check of checkBearingStiffeners(section, grade, pair, { sideA: inside, sideB: outside })) {
      keepWorst(worst, { ...check, inputs: { ...check.inputs, column: column.index + 1 } }, item.analysis.combination, item.scenario, station);
    }
  }
}

/**
 * Bottom flange under the bearing: each bearing point's force as a line load over its tributary
 * length, q = F / l_trib, at its distance from the web centre (common practice, cantilever outstand).
 */
function flangeBendingChecks(section: SteelSection, grade: SteelGrade, item: AnalysedCase, worst: Map<string, CheckEnvelope>): void {
  const halfWidth = section.dimensions.flangeWidth / 2;
  const inputOf = (point: BearingPoint) => ({ lineLoad: point.force / point.tributaryLength, distanceFromWebCentre: Math.min(Math.abs(point.across), halfWidth) });
  // Scan the points by utilisation alone; report only the worst (the first of equals, as keepWorst keeps).
  let governing: BearingPoint | undefined;
  let largest = -1;
  for (const point of bearingPoints(item.model, item.analysis)) {
    if (point.force === 0 || point.tributaryLength <= 0) continue;
    const utilisation = flangeLocalBendingUtilisation(section, grade, inputOf(point));
    if (utilisation > largest) {
      largest = utilisation;
      governing = point;
    }
  }
  if (!governing) return;
  const check = checkFlangeLocalBending(section, grade, inputOf(governing));
  keepWorst(worst, { ...check, inputs: { ...check.inputs, F: governing.force, l_trib: governing.tributaryLength } }, item.analysis.combination, item.scenario, stationAtNode(item.model, item.analysis, governing.node));
}

/**
 * The factored radial (inward) line load of a combination at the support line: the largest over the
 * ring's nodes (the uniform part plus any harmonics), N/m, and the node where it occurs.
 */
const radialPullCache = new WeakMap<LoadSet, Map<string, { q: number; node: string }>>();

export function radialPull(loads: LoadSet, factors: Record<string, number>, model: GirderModel): { q: number; node: string } {
  // The pull depends on the loads and the node angles only (the same for every section of a layout).
  const key = `${model.nodes.length}|${model.nodes[1]?.x ?? 0}|${model.nodes[1]?.y ?? 0}|${JSON.stringify(factors)}`;
  let byKey = radialPullCache.get(loads);
  if (!byKey) {
    byKey = new Map();
    radialPullCache.set(loads, byKey);
  }
  const cached = byKey.get(key);
  if (cached) return cached;
  const pull = computeRadialPull(loads, factors, model);
  byKey.set(key, pull);
  return pull;
}

function computeRadialPull(loads: LoadSet, factors: Record<string, number>, model: GirderModel): { q: number; node: string } {
  let best = { q: -Infinity, node: model.nodes[0]?.id ?? '' };
  for (const node of model.nodes) {
    const angle = nodeAngleOf(model, node.id);
    let q = 0;
    for (const loadCase of loads.cases) q += (factors[loadCase.name] ?? 0) * lineLoadAt(loadCase, angle).radial;
    if (q > best.q) best = { q, node: node.id };
  }
  return { q: Math.max(0, best.q), node: best.node };
}

/**
 * The ring under the hopper's radial pull: in-plane buckling (q_cr = 3 E I / R^3 with I about the
 * ring's vertical axis, the weak axis I_z of a vertical-web girder; R the girder radius) and the
 * compression of the transition junction (EN 1993-4-1 effective section: the girder plus the
 * effective lengths of the cylinder wall and the hopper; no skirt).
 */
function ringChecks(section: SteelSection, grade: SteelGrade, spec: BinSpec, loads: LoadSet, layout: RingLayout, item: AnalysedCase, worst: Map<string, CheckEnvelope>): void {
  const factors = loads.combinations.find((combination) => combination.name === item.analysis.combination)?.factors ?? {};
  const pull = radialPull(loads, factors, item.model);
  const station = stationAtNode(item.model, item.analysis, pull.node);
  const circularBin = spec.bin;
  if (circularBin.shape !== 'circular') return; // the ring checks belong to a circular bin
  keepWorst(worst, checkRingInPlaneBuckling({ radialLineLoad: pull.q, radius: layout.radius, secondMomentOfArea: section.properties.secondMomentOfAreaZ }, grade), item.analysis.combination, item.scenario, station);
  const junction = {
    radius: circularBin.diameter / 2 + circularBin.wallThickness / 2,
    cylinderThickness: circularBin.wallThickness,
    hopperThickness: circularBin.hopper.thickness,
    hopperHalfAngle: circularBin.hopper.apexHalfAngle,
    ringArea: section.properties.area,
    ringThickness: Math.max(section.dimensions.flangeThickness, section.dimensions.webThickness),
  };
  keepWorst(worst, checkJunctionRingCompression(junction, grade, pull.q), item.analysis.combination, item.scenario, station);
}

/**
 * Anchors on a slab: at each node, the anchored bearing points' tension per metre of girder,
 * sum max(0, -F_i) / l_trib, against the anchor capacity per metre (support.anchorCapacity, a design
 * resistance supplied by the user, EN 1992-4). The model yields an anchor at its capacity, so a
 * utilisation of 1 means the anchors there are at capacity.
 */
function anchorChecks(spec: BinSpec, item: AnalysedCase, worst: Map<string, CheckEnvelope>): void {
  if (spec.support.anchorCapacity <= 0) return;
  const byNode = new Map<string, { tension: number; length: number; atCapacity: number }>();
  const states = new Map(item.analysis.springForces.map((spring) => [spring.id, spring.state]));
  for (const point of bearingPoints(item.model, item.analysis)) {
    if (point.tensionCapacity === undefined) continue;
    const entry = byNode.get(point.node) ?? { tension: 0, length: point.tributaryLength, atCapacity: 0 };
    entry.tension += Math.max(0, -point.force);
    if (states.get(point.id) === 'at-capacity') entry.atCapacity += 1;
    byNode.set(point.node, entry);
  }
  for (const [node, entry] of byNode) {
    const check = checkAnchorTension({ tensionPerAnchor: entry.tension / entry.length, resistancePerAnchor: spec.support.anchorCapacity });
    const stated: CheckResult = {
      ...check,
      title: 'Anchors in tension (per metre of girder)',
      clause: 'resistance per EN 1992-4, supplied by the user as a capacity per metre (support.anchorCapacity)',
      inputs: { ...check.inputs, 'sum tension': entry.tension, l_trib: entry.length },
      intermediate: { ...check.intermediate, anchorsAtCapacity: entry.atCapacity },
      ...(entry.atCapacity > 0 ? { notes: ['anchors at capacity (yielding)'] } : {}),
    };
    keepWorst(worst, stated, item.analysis.combination, item.scenario, stationAtNode(item.model, item.analysis, node));
  }
}

/** The scenario whose caps carry the cap bolts (scenarios.ts). */
const BOLTED_SCENARIO = 'column-cap-bolted';

/**
 * Cap bolts (scenario column-cap-bolted): at each column, the tension of the bolt line on each side
 * of the web, max(0, -F) of the cap point at -+gauge, taken by that side's bolts and the flange
 * outstand as a T-stub (steel checkBoltedFlangeTension, EN 1993-1-8 6.2.4). The flange's f_y and f_u
 * are those of its thickness (EN 10025-2). The bolts are modelled elastically (no yield), so a
 * utilisation above 1 is a real excess.
 */
function capBoltChecks(section: SteelSection, grade: SteelGrade, spec: BinSpec, layout: RingLayout, item: AnalysedCase, worst: Map<string, CheckEnvelope>): void {
  if (item.scenario !== BOLTED_SCENARIO) return;
  const bolts = spec.support.capBolts;
  const boltLayout = capBoltLayout(section, spec);
  if (!bolts || !boltLayout) return;
  const strengths = strengthsForThickness(grade, section.dimensions.flangeThickness);
  const points = bearingPoints(item.model, item.analysis);
  for (let j = 0; j < layout.columns; j++) {
    const group = capGroupId(j);
    for (const side of [-1, 1]) {
      const point = points.find((candidate) => candidate.group === group && Math.abs(candidate.across - side * boltLayout.gauge) < 1e-9);
      if (!point) continue;
      const check = checkBoltedFlangeTension({
        bolt: { size: bolts.size, boltClass: bolts.boltClass },
        bolts: boltLayout.perSide,
        tension: Math.max(0, -point.force),
        gauge: boltLayout.gauge,
        capLength: spec.support.capPlateLength,
        flangeWidth: section.dimensions.flangeWidth,
        flangeThickness: section.dimensions.flangeThickness,
        webThickness: section.dimensions.webThickness,
        rootRadius: section.dimensions.rootRadius,
        ...(section.box ? { webCentreDistance: section.box.webCentreDistance } : {}),
        flangeYieldStrength: strengths.yieldStrength,
        flangeUltimateStrength: strengths.ultimateStrength,
        gammaM0: grade.gammaM0,
      });
      const stated: CheckResult = { ...check, title: `${check.title}, ${side < 0 ? 'inner' : 'outer'} bolt line`, inputs: { ...check.inputs, column: j + 1, side } };
      keepWorst(worst, stated, item.analysis.combination, item.scenario, stationAtNode(item.model, item.analysis, point.node));
    }
  }
}

/**
 * Serviceability of a ring on columns: the deflection of each node relative to the straight line
 * between the two columns of its span (so the column shortening and the cap's bearing settlement do
 * not count), against span / ratio with the span the arc between columns, 2 pi R / n; and the twist
 * of each node, the rotation about the girder axis phi = r . t (t the tangent, the elements' local x),
 * against the twist limit. On a slab the deflection is the bearing settlement (information only, see
 * `settlementOf`); the twist is checked.
 */
function serviceabilityChecks(layout: RingLayout, limits: ServiceabilityLimits, item: AnalysedCase, worst: Map<string, CheckEnvelope>): void {
  const { model, analysis } = item;
  const displacement = new Map(analysis.displacements.map((d) => [d.node, d]));
  const N = model.nodes.length;
  const span = (2 * Math.PI * layout.radius) / layout.columns;
  model.nodes.forEach((node, k) => {
    const d = displacement.get(node.id);
    if (!d) return;
    const angle = nodeAngleOf(model, node.id);
    const twist = -d.rx * Math.sin(angle) + d.ry * Math.cos(angle);
    const station = stationAtNode(model, analysis, node.id);
    const twistCheck = checkTwist({ twist, limit: limits.twistLimit });
    keepWorst(worst, twistCheck, analysis.combination, item.scenario, station);
    if (layout.kind === 'slab') return;
    const s = layout.segmentsPerSpan;
    const first = Math.floor(k / s) * s;
    const t = (k - first) / s;
    const uzFirst = displacement.get(model.nodes[first % N]?.id ?? '')?.uz ?? 0;
    const uzNext = displacement.get(model.nodes[(first + s) % N]?.id ?? '')?.uz ?? 0;
    const reference = (1 - t) * uzFirst + t * uzNext;
    const check = checkDeflection({ deflection: d.uz - reference, span, limitRatio: limits.deflectionLimitRatio });
    keepWorst(worst, { ...check, inputs: { ...check.inputs, u_z: d.uz, u_z_supports: reference } }, analysis.combination, item.scenario, station);
  });
}

/** Largest downward settlement of the girder on its bearing (information for a slab), m. */
export function settlementOf(analysis: AnalysisResult): number {
  return Math.max(0, ...analysis.displacements.map((d) => -d.uz));
}

/** What the extra checks need besides the section: spec, loads, layout, limits. */
export interface GirderCheckContext {
  spec: BinSpec;
  loads: LoadSet;
  layout: RingLayout;
  serviceability: ServiceabilityLimits;
}

/**
 * The checks that follow from the forces of analysed cases and hold for any candidate section
 * (reactions, bearing forces and the radial pull do not depend on the candidate being checked):
 * patch loading, flange bending, ring buckling, junction compression, anchors and cap bolts. ULS
 * cases only; under EQU cases only the anchors and the cap bolts.
 */
export function forceChecks(context: GirderCheckContext, section: SteelSection, grade: SteelGrade, cases: AnalysedCase[]): CheckEnvelope[] {
  const envelopes: CheckEnvelope[] = [];
  const equilibrium = new Set(context.loads.combinations.filter((combination) => combination.verification === 'EQU').map((combination) => combination.name));
  for (const item of cases) {
    const worst = new Map<string, CheckEnvelope>();
    if (equilibrium.has(item.analysis.combination)) {
      // EQU: only the holding-down members (EN 1990 6.4.1(1)a); the members' strength is STR.
      anchorChecks(context.spec, item, worst);
      capBoltChecks(section, grade, context.spec, context.layout, item, worst);
      envelopes.push(...worst.values());
      continue;
    }
    const stiffener = bearingStiffenerOf(section, context.spec, context.layout);
    if (stiffener === undefined) {
      patchLoadingChecks(section, grade, context.spec, context.layout, item, worst);
      flangeBendingChecks(section, grade, item, worst);
    } else {
      // The reaction passes through the stiffeners, which also hold the flange outstand over the cap.
      stiffenerChecks(section, grade, stiffener, context.layout, item, worst);
    }
    ringChecks(section, grade, context.spec, context.loads, context.layout, item, worst);
    lateralTorsionalBucklingChecks(section, grade, context.spec, context.layout, item, worst);
    anchorChecks(context.spec, item, worst);
    capBoltChecks(section, grade, context.spec, context.layout, item, worst);
    envelopes.push(...worst.values());
  }
  return envelopes;
}

/** Serviceability checks of the section's own displacements (SLS cases only). */
export function displacementChecks(context: GirderCheckContext, cases: AnalysedCase[]): CheckEnvelope[] {
  const envelopes: CheckEnvelope[] = [];
  for (const item of cases) {
    const worst = new Map<string, CheckEnvelope>();
    serviceabilityChecks(context.layout, context.serviceability, item, worst);
    envelopes.push(...worst.values());
  }
  return envelopes;
}
