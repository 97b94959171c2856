import { SpecError, type SpecIssue } from './errors.js';
import { zodIssues } from './issues.js';
import { binSpecInput, type BinSpecParsed, type supportScenarios } from './schema.js';
import { resolveStoredSolid, type StoredSolid } from './solids.js';
import { degToRad, KN, KPA, knPerM3ToNPerM3, mmToM } from './units.js';

export const STEEL_DENSITY = 7850; // kg/m3, EN 1991-1-1 Table A.4 (steel)

export interface CircularBinSpec {
  shape: 'circular';
  /** Internal diameter of the cylinder d_c, m. */
  diameter: number;
  /** Height of the vertical wall from the transition to its top, m. */
  cylinderHeight: number;
  /** Height of the level solid surface above the transition, m. */
  fillHeight: number;
  wallThickness: number;
  topSurface: 'level' | 'pile';
  fillingEccentricity: number;
  outletEccentricity: number;
  /** Patch loads (EN 1991-4 5.2.1.2, 5.2.2.2) or, in action assessment class 2 only, the substitute uniform increase (5.2.3). */
  patchLoadMethod: 'patch' | 'uniform-increase';
  /** Action assessment class set by the engineer (EN 1991-4 2.5): may raise, never lower, the class of Table 2.1. */
  actionAssessmentClass?: 1 | 2 | 3;
  /** Direction of the eccentricities from +X, rad. */
  eccentricityAngle: number;
  hopper: { apexHalfAngle: number; outletDiameter: number; thickness: number };
  steelDensity: number;
}

/** A rectangular bin (box and pyramidal or wedge hopper) in SI base units; X and Y the plan axes. */
export interface RectangularBinSpec {
  shape: 'rectangular';
  /** Internal plan lengths of the box along X and Y, m. */
  lengthX: number;
  lengthY: number;
  /** Height of the vertical walls from the transition to their top, m. */
  cylinderHeight: number;
  /** Height of the level solid surface above the transition, m. */
  fillHeight: number;
  wallThickness: number;
  topSurface: 'level' | 'pile';
  /** 'pyramid': four sloping faces; 'wedge': two faces sloping toward a slot along X, vertical end walls. */
  hopper: { kind: 'pyramid' | 'wedge'; height: number; outletLengthX: number; outletLengthY: number; thickness: number };
  /** Action assessment class set by the engineer (EN 1991-4 2.5): may raise, never lower, the class of Table 2.1. */
  actionAssessmentClass?: 1 | 2 | 3;
  steelDensity: number;
}

/** The validated bin specification in SI base units: what every later stage reads. */
export interface BinSpec {
  schemaVersion: 1;
  project: { name: string; client: string; site: string; reference: string; designer: string; date: string };
  bin: CircularBinSpec | RectangularBinSpec;
  solid: StoredSolid;
  support: {
    type: 'ring-on-columns' | 'ring-on-slab';
    /** Number of columns (ring on columns); 1 for a ring on a slab. */
    columns: number;
    /** Bearing modulus of the slab bearing, N/m3 (ring on a slab). */
    bearingModulus: number;
    /** Holding-down capacity of the anchors per metre of girder, N/m (0: no anchors). */
    anchorCapacity: number;
    /** Diameter of the girder's centroid line, m (default: the centre line of the cylinder wall). */
    girderDiameter: number;
    segmentsPerSpan: number;
    grade: 'S235' | 'S275' | 'S355' | 'S460';
    sectionFamilies: Array<'IPE' | 'HEA' | 'HEB' | 'HEM'>;
    /** Rolled section of the columns (EN 10365 designation), for the cap bearing stiffness. */
    columnSection: string;
    columnHeight: number;
    /** Length of the column cap plate along the girder, m. */
    capPlateLength: number;
    /** Bearing stiffeners over the columns, m: plate thickness, width from the web (undefined: from the flange), chamfer; undefined when there are none. */
    bearingStiffeners?: { thickness: number; width?: number; chamfer: number };
    /** 'shell': the top flange held along its length by the shell; 'columns': held only at the columns (LTB checked between them). */
    girderRestraint: 'shell' | 'columns';
    /** Welded plate girders as girder candidates, m (the steel package's WeldedGirderLimits); undefined: rolled only. */
    weldedGirders?: { minDepth: number; maxDepth: number; depthStep: number; minFlangeWidth: number; maxFlangeWidth: number; flangeWidthStep: number; flangeThicknesses?: number[]; webThicknesses?: number[] };
    /** Welded box girders as girder candidates, m: the welded-girder limits plus the flange outstand beyond each web; undefined: none. */
    weldedBoxes?: { minDepth: number; maxDepth: number; depthStep: number; minFlangeWidth: number; maxFlangeWidth: number; flangeWidthStep: number; flangeThicknesses?: number[]; webThicknesses?: number[]; flangeOutstand: number };
    /** Bolts holding the girder's bottom flange down on each column cap: count per cap (half each side of the web), size, class, gauge from the web centre line m (undefined: middle of the flange outstand). */
    capBolts?: { perCap: number; size: 'M12' | 'M16' | 'M20' | 'M22' | 'M24' | 'M27' | 'M30' | 'M36'; boltClass: '4.6' | '5.6' | '8.8' | '10.9'; gauge?: number };
    bearingPoints: number;
    flangeFlexibility: boolean;
    credibleScenarios: Array<(typeof supportScenarios)[number]>;
  };
  actions: { permanentFactor: number; solidFactor: number; variableFactor: number; combinationMethod: '6.10' | '6.10a/b' };
  /** Section choice: grades to choose from (one for all members), prices per kg, cost per distinct section, cap. */
  optimisation: {
    grades?: Array<'S235' | 'S275' | 'S355' | 'S460'>;
    pricePerKg?: Partial<Record<'S235' | 'S275' | 'S355' | 'S460', number>>;
    costPerDistinctSection: number;
    maxDistinctSections?: number;
    columnSeries: Array<'HEA' | 'HEB' | 'HEM'>;
    /** Price per kg of a welded girder relative to a rolled section of the same grade. */
    weldedPriceFactor: number;
  };
  /** Serviceability limits: deflection span / ratio, twist rad. */
  serviceability: { deflectionLimitRatio: number; twistLimit: number };
  /** Roof loads on plan, Pa; pitch rad. */
  roof?: { deadLoad: number; imposedLoad: number; pitch: number };
  /** Characteristic ground snow load, Pa (EN 1991-1-3). */
  snow?: { groundLoad: number; exposureCoefficient: number; thermalCoefficient: number };
  /** Wind (EN 1991-1-4): basic velocity m/s, height of the support level above ground m, directions rad. */
  wind?: { basicVelocity: number; terrainCategory: '0' | 'I' | 'II' | 'III' | 'IV'; supportLevelHeight: number; directions?: number[] };
  seismic?: { horizontalCoefficient: number; effectiveSolidMassFraction: number; directions?: number[] };
  /** Equipment loads: angle rad, radius m, force N. */
  equipment: Array<{ name: string; angle: number; radius: number; force: number; kind: 'permanent' | 'variable' }>;
}

/** Largest number of straight segments of the ring girder model (columns x segments per span, or the slab's segments). */
export const MAX_GIRDER_SEGMENTS = 2880;

function crossFieldIssues(parsed: BinSpecParsed): SpecIssue[] {
  const issues: SpecIssue[] = [];
  const { bin } = parsed;
  if (bin.fillHeight !== undefined && bin.fillHeight > bin.cylinderHeight) {
    issues.push({ path: 'bin.fillHeight', message: `bin.fillHeight must be between 0.1 m and bin.cylinderHeight (${bin.cylinderHeight} m); got ${bin.fillHeight}` });
  }
  const shapeIssues = binShapeIssues(bin);
  if (shapeIssues.length > 0) return [...issues, ...shapeIssues];
  if (bin.shape === 'rectangular') issues.push(...rectangularIssues(parsed));
  else issues.push(...circularIssues(parsed));
  const support = parsed.support;
  if (support.type === 'ring-on-columns' && support.columns === undefined) {
    issues.push({ path: 'support.columns', message: 'support.columns is required for a ring on columns (a whole number of columns between 3 and 36)' });
  }
  // The girder model's size: a ring of more than MAX_GIRDER_SEGMENTS straight segments is refused
  // (the mesh guard shows 24 per span converging; far finer meshes only cost time and memory).
  if (support.type === 'ring-on-columns' && support.columns !== undefined && support.columns * support.segmentsPerSpan > MAX_GIRDER_SEGMENTS) {
    issues.push({
      path: 'support.segmentsPerSpan',
      message: `support.segmentsPerSpan gives ${support.columns} x ${support.segmentsPerSpan} = ${support.columns * support.segmentsPerSpan} girder segments; at most ${MAX_GIRDER_SEGMENTS} (a whole number of segments per span between 2 and ${Math.floor(MAX_GIRDER_SEGMENTS / support.columns)} for ${support.columns} columns)`,
    });
  }
  if (support.type === 'ring-on-slab' && support.bearingStiffenerThickness !== undefined) {
    issues.push({ path: 'support.bearingStiffenerThickness', message: 'support.bearingStiffenerThickness applies to a ring on columns (stiffeners over the column caps); a ring on a slab bears along its length' });
  }
  if (support.bearingStiffenerThickness === undefined && support.bearingStiffenerWidth !== undefined) {
    issues.push({ path: 'support.bearingStiffenerWidth', message: 'support.bearingStiffenerWidth needs support.bearingStiffenerThickness (a thickness between 6 and 50 mm) to give bearing stiffeners' });
  }
  if (support.capBolts && support.type === 'ring-on-slab') {
    issues.push({ path: 'support.capBolts', message: 'support.capBolts applies to a ring on columns (support.type ring-on-columns); a girder on a slab is held down by support.anchorCapacity' });
  }
  if (support.capBolts && support.capBolts.perCap % 2 !== 0) {
    issues.push({ path: 'support.capBolts.perCap', message: `support.capBolts.perCap must be an even number of bolts (half each side of the web) between 2 and 16; got ${support.capBolts.perCap}` });
  }
  const boxes = support.weldedBoxes;
  if (boxes && boxes.maxDepth < boxes.minDepth) {
    issues.push({ path: 'support.weldedBoxes.maxDepth', message: `support.weldedBoxes.maxDepth must be at least minDepth (${boxes.minDepth} mm); got ${boxes.maxDepth}` });
  }
  if (boxes && boxes.maxFlangeWidth < boxes.minFlangeWidth) {
    issues.push({ path: 'support.weldedBoxes.maxFlangeWidth', message: `support.weldedBoxes.maxFlangeWidth must be at least minFlangeWidth (${boxes.minFlangeWidth} mm); got ${boxes.maxFlangeWidth}` });
  }
  const welded = support.weldedGirders;
  if (welded && welded.maxDepth < welded.minDepth) {
    issues.push({ path: 'support.weldedGirders.maxDepth', message: `support.weldedGirders.maxDepth must be at least minDepth (${welded.minDepth} mm); got ${welded.maxDepth}` });
  }
  if (welded && welded.maxFlangeWidth < welded.minFlangeWidth) {
    issues.push({ path: 'support.weldedGirders.maxFlangeWidth', message: `support.weldedGirders.maxFlangeWidth must be at least minFlangeWidth (${welded.minFlangeWidth} mm); got ${welded.maxFlangeWidth}` });
  }
  const ownPrefix = support.type === 'ring-on-slab' ? 'slab-' : 'column';
  for (const [index, scenario] of (support.credibleScenarios ?? []).entries()) {
    if (!scenario.startsWith(ownPrefix)) {
      issues.push({ path: `support.credibleScenarios[${index}]`, message: `support.credibleScenarios[${index}] '${scenario}' does not apply to support.type ${support.type}` });
    }
    if (scenario === 'column-cap-bolted' && support.capBolts === undefined) {
      issues.push({ path: 'support.capBolts', message: "support.capBolts must describe the cap bolts (perCap, size, boltClass) for the scenario 'column-cap-bolted'" });
    }
    if (scenario === 'slab-anchored' && support.anchorCapacity === 0) {
      issues.push({ path: 'support.anchorCapacity', message: "support.anchorCapacity must be greater than 0 kN/m for the scenario 'slab-anchored'" });
    }
  }
  return issues;
}

/** The inputs each shape needs and the ones it does not take (the schema leaves them optional). */
function binShapeIssues(bin: BinSpecParsed['bin']): SpecIssue[] {
  const issues: SpecIssue[] = [];
  const circular = bin.shape === 'circular';
  const needed: Array<[string, unknown, string]> = circular
    ? [['bin.diameter', bin.diameter, 'a number between 1 and 60 m'], ['bin.hopper.apexHalfAngle', bin.hopper.apexHalfAngle, 'a number between 5 and 60 degrees'], ['bin.hopper.outletDiameter', bin.hopper.outletDiameter, 'a number between 0.05 and 20 m']]
    : [['bin.lengthX', bin.lengthX, 'a number between 1 and 60 m'], ['bin.lengthY', bin.lengthY, 'a number between 1 and 60 m'], ['bin.hopper.height', bin.hopper.height, 'a number between 0.1 and 60 m'], ['bin.hopper.outletLengthY', bin.hopper.outletLengthY, 'a number between 0.05 and 60 m']];
  if (!circular && bin.hopper.kind !== 'wedge') needed.push(['bin.hopper.outletLengthX', bin.hopper.outletLengthX, 'a number between 0.05 and 60 m']);
  for (const [path, value, what] of needed) {
    if (value === undefined) issues.push({ path, message: `${path} is required for a ${bin.shape} bin (${what})` });
  }
  const foreign: Array<[string, unknown]> = circular
    ? [['bin.lengthX', bin.lengthX], ['bin.lengthY', bin.lengthY], ['bin.hopper.height', bin.hopper.height], ['bin.hopper.outletLengthX', bin.hopper.outletLengthX], ['bin.hopper.outletLengthY', bin.hopper.outletLengthY]]
    : [['bin.diameter', bin.diameter], ['bin.hopper.apexHalfAngle', bin.hopper.apexHalfAngle], ['bin.hopper.outletDiameter', bin.hopper.outletDiameter]];
  if (!circular && bin.hopper.kind === 'wedge') foreign.push(['bin.hopper.outletLengthX', bin.hopper.outletLengthX]);
  for (const [path, value] of foreign) {
    if (value !== undefined) issues.push({ path, message: `${path} does not apply to a ${bin.shape}${bin.hopper.kind === 'wedge' ? ' wedge-hopper' : ''} bin; remove it` });
  }
  const kinds = circular ? ['cone'] : ['pyramid', 'wedge'];
  if (bin.hopper.kind !== undefined && !kinds.includes(bin.hopper.kind)) {
    issues.push({ path: 'bin.hopper.kind', message: `bin.hopper.kind must be ${kinds.join(' or ')} for a ${bin.shape} bin; got ${bin.hopper.kind}` });
  }
  if (!circular && (bin.fillingEccentricity !== 0 || bin.outletEccentricity !== 0)) {
    issues.push({ path: bin.fillingEccentricity !== 0 ? 'bin.fillingEccentricity' : 'bin.outletEccentricity', message: 'eccentric filling and discharge are not covered for a rectangular bin: give 0 m' });
  }
  return issues;
}

/** Circular bin: outlet within the cylinder, the standard's scope, the girder under the shell. */
function circularIssues(parsed: BinSpecParsed): SpecIssue[] {
  const { bin } = parsed;
  const issues: SpecIssue[] = [];
  const diameter = bin.diameter as number;
  const outletDiameter = bin.hopper.outletDiameter as number;
  const apexHalfAngle = bin.hopper.apexHalfAngle as number;
  if (outletDiameter >= 0.9 * diameter) {
    issues.push({ path: 'bin.hopper.outletDiameter', message: `bin.hopper.outletDiameter must be less than 0.9 times bin.diameter (${(0.9 * diameter).toFixed(3)} m); got ${outletDiameter}` });
  }
  const hopperHeight = (diameter - outletDiameter) / 2 / Math.tan(degToRad(apexHalfAngle));
  const totalHeight = bin.cylinderHeight + hopperHeight;
  // EN 1991-4:2006 1.1.2(3): h_b / d_c < 10 and h_b < 100 m (scope of the standard; from memory).
  if (totalHeight / diameter >= 10) {
    issues.push({ path: 'bin.cylinderHeight', message: `bin.cylinderHeight gives an overall height h_b = ${totalHeight.toFixed(2)} m, h_b/d_c = ${(totalHeight / diameter).toFixed(2)}; EN 1991-4 covers h_b/d_c below 10` });
  }
  if (totalHeight >= 100) {
    issues.push({ path: 'bin.cylinderHeight', message: `bin.cylinderHeight gives an overall height h_b = ${totalHeight.toFixed(2)} m; EN 1991-4 covers h_b below 100 m` });
  }
  const wallCentreDiameter = diameter + bin.wallThickness / 1000;
  const girderDiameter = parsed.support.girderDiameter ?? wallCentreDiameter;
  if (Math.abs(girderDiameter - wallCentreDiameter) > 0.5) {
    issues.push({ path: 'support.girderDiameter', message: `support.girderDiameter must be within 0.5 m of the wall centre line (${wallCentreDiameter.toFixed(3)} m) for a girder under the shell; got ${girderDiameter}` });
  }
  return issues;
}

/** Rectangular bin: the outlet inside the plan, the standard's scope h_b / d_c < 10 with d_c the shorter side. */
function rectangularIssues(parsed: BinSpecParsed): SpecIssue[] {
  const { bin } = parsed;
  const issues: SpecIssue[] = [];
  const lengthX = bin.lengthX as number;
  const lengthY = bin.lengthY as number;
  const outletX = bin.hopper.kind === 'wedge' ? lengthX : (bin.hopper.outletLengthX as number);
  const outletY = bin.hopper.outletLengthY as number;
  if (bin.hopper.kind !== 'wedge' && outletX >= 0.9 * lengthX) {
    issues.push({ path: 'bin.hopper.outletLengthX', message: `bin.hopper.outletLengthX must be less than 0.9 times bin.lengthX (${(0.9 * lengthX).toFixed(3)} m); got ${outletX}` });
  }
  if (outletY >= 0.9 * lengthY) {
    issues.push({ path: 'bin.hopper.outletLengthY', message: `bin.hopper.outletLengthY must be less than 0.9 times bin.lengthY (${(0.9 * lengthY).toFixed(3)} m); got ${outletY}` });
  }
  const totalHeight = bin.cylinderHeight + (bin.hopper.height as number);
  const shorter = Math.min(lengthX, lengthY);
  // EN 1991-4:2006 1.1.2(3): h_b / d_c < 10 and h_b < 100 m, d_c the shorter side (from memory).
  if (totalHeight / shorter >= 10) {
    issues.push({ path: 'bin.cylinderHeight', message: `bin.cylinderHeight gives an overall height h_b = ${totalHeight.toFixed(2)} m, h_b/d_c = ${(totalHeight / shorter).toFixed(2)} with d_c the shorter side; EN 1991-4 covers h_b/d_c below 10` });
  }
  if (parsed.support.girderDiameter !== undefined) {
    issues.push({ path: 'support.girderDiameter', message: 'support.girderDiameter applies to a circular bin; remove it' });
  }
  return issues;
}

/** The bin in SI, by shape (the cross-field checks have made sure each shape has its inputs). */
function normaliseBin(bin: BinSpecParsed['bin']): CircularBinSpec | RectangularBinSpec {
  const wallThickness = mmToM(bin.wallThickness);
  const common = { cylinderHeight: bin.cylinderHeight, fillHeight: bin.fillHeight ?? bin.cylinderHeight, topSurface: bin.topSurface, wallThickness, steelDensity: STEEL_DENSITY };
  if (bin.shape === 'rectangular') {
    const lengthX = bin.lengthX as number;
    const kind = bin.hopper.kind === 'wedge' ? 'wedge' : 'pyramid';
    return {
      shape: 'rectangular',
      lengthX,
      lengthY: bin.lengthY as number,
      ...common,
      ...(bin.actionAssessmentClass !== undefined ? { actionAssessmentClass: bin.actionAssessmentClass as 1 | 2 | 3 } : {}),
      hopper: { kind, height: bin.hopper.height as number, outletLengthX: kind === 'wedge' ? lengthX : (bin.hopper.outletLengthX as number), outletLengthY: bin.hopper.outletLengthY as number, thickness: mmToM(bin.hopper.thickness) },
    };
  }
  return {
    shape: 'circular',
    diameter: bin.diameter as number,
    ...common,
    fillingEccentricity: bin.fillingEccentricity,
    outletEccentricity: bin.outletEccentricity,
    patchLoadMethod: bin.patchLoadMethod,
    ...(bin.actionAssessmentClass !== undefined ? { actionAssessmentClass: bin.actionAssessmentClass as 1 | 2 | 3 } : {}),
    eccentricityAngle: degToRad(bin.eccentricityAngle),
    hopper: { apexHalfAngle: degToRad(bin.hopper.apexHalfAngle as number), outletDiameter: bin.hopper.outletDiameter as number, thickness: mmToM(bin.hopper.thickness) },
  };
}

/** Validate a parsed document (from YAML, JSON or a workbook) and convert it to SI: the BinSpec. */
export function normaliseSpec(document: unknown): BinSpec {
  const parsed = binSpecInput.safeParse(document, { reportInput: true });
  if (!parsed.success) {
    throw new SpecError('INVALID_INPUT', zodIssues(parsed.error));
  }
  const input = parsed.data;
  const cross = crossFieldIssues(input);
  if (cross.length > 0) {
    throw new SpecError('INVALID_INPUT', cross);
  }
  const solid = resolveStoredSolid(input.solid.name, input.solid.wallSurface, {
    unitWeight: input.solid.unitWeight === undefined ? undefined : knPerM3ToNPerM3(input.solid.unitWeight),
    wallFrictionCoefficient: input.solid.wallFrictionCoefficient,
    lateralPressureRatio: input.solid.lateralPressureRatio,
  });
  const wallThickness = mmToM(input.bin.wallThickness);
  return {
    schemaVersion: 1,
    project: input.project,
    bin: normaliseBin(input.bin),
    solid,
    support: {
      type: input.support.type,
      columns: input.support.type === 'ring-on-slab' ? 1 : (input.support.columns ?? 0),
      bearingModulus: input.support.bearingModulus * 1e6,
      anchorCapacity: input.support.anchorCapacity * KN,
      girderDiameter: input.support.girderDiameter ?? (input.bin.diameter ?? 0) + wallThickness,
      segmentsPerSpan: input.support.type === 'ring-on-slab' ? input.support.segments : input.support.segmentsPerSpan,
      grade: input.support.grade,
      sectionFamilies: [...new Set(input.support.sectionFamilies)],
      columnSection: input.support.columnSection,
      columnHeight: input.support.columnHeight,
      capPlateLength: mmToM(input.support.capPlateLength),
      girderRestraint: input.support.girderRestraint,
      ...(input.support.weldedGirders
        ? {
            weldedGirders: {
              minDepth: mmToM(input.support.weldedGirders.minDepth),
              maxDepth: mmToM(input.support.weldedGirders.maxDepth),
              depthStep: mmToM(input.support.weldedGirders.depthStep),
              minFlangeWidth: mmToM(input.support.weldedGirders.minFlangeWidth),
              maxFlangeWidth: mmToM(input.support.weldedGirders.maxFlangeWidth),
              flangeWidthStep: mmToM(input.support.weldedGirders.flangeWidthStep),
              ...(input.support.weldedGirders.flangeThicknesses ? { flangeThicknesses: input.support.weldedGirders.flangeThicknesses.map(mmToM) } : {}),
              ...(input.support.weldedGirders.webThicknesses ? { webThicknesses: input.support.weldedGirders.webThicknesses.map(mmToM) } : {}),
            },
          }
        : {}),
      ...(input.support.weldedBoxes
        ? {
            weldedBoxes: {
              minDepth: mmToM(input.support.weldedBoxes.minDepth),
              maxDepth: mmToM(input.support.weldedBoxes.maxDepth),
              depthStep: mmToM(input.support.weldedBoxes.depthStep),
              minFlangeWidth: mmToM(input.support.weldedBoxes.minFlangeWidth),
              maxFlangeWidth: mmToM(input.support.weldedBoxes.maxFlangeWidth),
              flangeWidthStep: mmToM(input.support.weldedBoxes.flangeWidthStep),
              ...(input.support.weldedBoxes.flangeThicknesses ? { flangeThicknesses: input.support.weldedBoxes.flangeThicknesses.map(mmToM) } : {}),
              ...(input.support.weldedBoxes.webThicknesses ? { webThicknesses: input.support.weldedBoxes.webThicknesses.map(mmToM) } : {}),
              flangeOutstand: mmToM(input.support.weldedBoxes.flangeOutstand),
            },
          }
        : {}),
      ...(input.support.capBolts
        ? {
            capBolts: {
              perCap: input.support.capBolts.perCap,
              size: input.support.capBolts.size,
              boltClass: input.support.capBolts.boltClass,
              ...(input.support.capBolts.gauge !== undefined ? { gauge: mmToM(input.support.capBolts.gauge) } : {}),
            },
          }
        : {}),
      ...(input.support.bearingStiffenerThickness !== undefined
        ? {
            bearingStiffeners: {
              thickness: mmToM(input.support.bearingStiffenerThickness),
              ...(input.support.bearingStiffenerWidth !== undefined ? { width: mmToM(input.support.bearingStiffenerWidth) } : {}),
              chamfer: mmToM(input.support.bearingStiffenerChamfer),
            },
          }
        : {}),
      bearingPoints: input.support.bearingPoints,
      flangeFlexibility: input.support.flangeFlexibility,
      credibleScenarios: [
        ...new Set(input.support.credibleScenarios ?? (input.support.type === 'ring-on-slab' ? (['slab-contact'] as const) : input.support.capBolts ? (['column-cap-bolted'] as const) : (['column-cap-contact'] as const))),
      ],
    },
    actions: input.actions,
    optimisation: input.optimisation,
    serviceability: { deflectionLimitRatio: input.serviceability.deflectionLimitRatio, twistLimit: input.serviceability.twistLimit },
    ...(input.roof ? { roof: { deadLoad: input.roof.deadLoad * KPA, imposedLoad: input.roof.imposedLoad * KPA, pitch: degToRad(input.roof.pitch) } } : {}),
    ...(input.snow ? { snow: { groundLoad: input.snow.groundLoad * KPA, exposureCoefficient: input.snow.exposureCoefficient, thermalCoefficient: input.snow.thermalCoefficient } } : {}),
    ...(input.wind
      ? { wind: { basicVelocity: input.wind.basicVelocity, terrainCategory: input.wind.terrainCategory, supportLevelHeight: input.wind.supportLevelHeight, ...(input.wind.directions ? { directions: input.wind.directions.map(degToRad) } : {}) } }
      : {}),
    ...(input.seismic
      ? { seismic: { horizontalCoefficient: input.seismic.horizontalCoefficient, effectiveSolidMassFraction: input.seismic.effectiveSolidMassFraction, ...(input.seismic.directions ? { directions: input.seismic.directions.map(degToRad) } : {}) } }
      : {}),
    equipment: input.equipment.map((item) => ({ name: item.name, angle: degToRad(item.angle), radius: item.radius, force: item.force * KN, kind: item.kind })),
  };
}
