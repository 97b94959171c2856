import { combineActions, type PartialFactors } from './combinations.js';
import { LoadsError } from './errors.js';
import { janssenProfile } from './janssen.js';
import { characteristicSet } from './properties.js';
import { slendernessClass } from './slenderness.js';
import { squatProfile } from './squat.js';
import type { DerivationStep, LoadCombination } from './types.js';
import { requireAngle, requireRange } from './validate.js';
import { dischargeFactors } from './wall.js';
import { actionAssessmentClass } from './classification.js';
import type { StoredSolidInput } from './circular.js';

const STANDARD_GRAVITY = 9.80665;

/**
 * A rectangular bin: a box of internal plan lengthX x lengthY on a pyramidal hopper whose
 * rectangular outlet is centred (SI units).
 */
export interface RectangularBin {
  lengthX: number;
  lengthY: number;
  /** Height of the vertical walls above the transition, m. */
  cylinderHeight: number;
  /** Height of the equivalent (level) solid surface above the transition, m. */
  fillHeight: number;
  wallThickness: number;
  hopper: {
    kind: 'pyramid';
    /** Vertical height of the hopper from the outlet to the transition, m. */
    height: number;
    outletLengthX: number;
    outletLengthY: number;
    thickness: number;
  };
  steelDensity: number;
  /** 'level' (default) or a ridge 'pile' across the shorter side: h_o = (d_c/4) tan(phi_r). */
  topSurface?: 'level' | 'pile';
}

export interface RectangularBinLoadInput {
  bin: RectangularBin;
  solid: StoredSolidInput;
  partialFactors: PartialFactors;
  /** Stations per edge for the line-load tables (default 41). */
  stationsPerEdge?: number;
}

/**
 * Line loads along one edge of the support line of a rectangular bin, at stations s from the edge's
 * start corner; vertical downward positive, inward (horizontal, toward the bin, normal to the edge)
 * positive; N/m.
 */
export interface EdgeLoad {
  case: string;
  edge: 'south' | 'east' | 'north' | 'west';
  /** Start and end corners of the edge on plan, m (counter-clockwise round the bin). */
  start: { x: number; y: number };
  end: { x: number; y: number };
  s: number[];
  vertical: number[];
  inward: number[];
  /** Resultant vertical force on the edge, N. */
  verticalResultant: number;
}

export interface RectangularLoadSet {
  edges: EdgeLoad[];
  combinations: LoadCombination[];
  totals: { solidWeight: number; structureWeight: number };
  derivation: DerivationStep[];
  notes: string[];
}

/**
 * Depth of a hopper face's plan tributary at station s along an edge of length L whose outlet edge
 * (length L_o, centred) lies w inward: the hip lines run from the corners to the outlet corners, so
 * the depth rises linearly over c = (L - L_o)/2 at each end and is w in between. Its integral is the
 * trapezoid w (L + L_o)/2.
 */
export function tributaryDepth(s: number, length: number, outletLength: number, width: number): number {
  const c = (length - outletLength) / 2;
  if (c <= 0) return width;
  if (s < c) return (width * s) / c;
  if (s > length - c) return (width * (length - s)) / c;
  return width;
}

/**
 * Loads of a rectangular bin on its support line, gravity cases G, Q_s,f and Q_s,e. Wall friction
 * follows EN 1991-4 5.2-5.3 with A/U = ab / (2 (a + b)) and d_c the shorter side, taken uniform along
 * the perimeter (the standard's mean). The hopper's load (statics: p_vf A + gamma V_hop, outlet
 * closed) is shared among the four faces in proportion to their plan tributaries (trapezoids bounded
 * by the hip lines) and spread along each top edge as the tributary depth (load follows the fall line
 * of the face: common practice); each face pulls its edge inward by its vertical load times the tangent
 * of its slope from the vertical. Patch loads, eccentric actions and the other actions are not yet
 * covered for rectangular bins.
 */
export function rectangularBinLoads(input: RectangularBinLoadInput): RectangularLoadSet {
  const { bin, solid } = input;
  const a = bin.lengthX;
  const b = bin.lengthY;
  requireRange('bin.lengthX', a, 0, 60, 'm', { strictLower: true, strictUpper: true });
  requireRange('bin.lengthY', b, 0, 60, 'm', { strictLower: true, strictUpper: true });
  requireRange('bin.cylinderHeight', bin.cylinderHeight, 0, 100, 'm', { strictLower: true, strictUpper: true });
  requireRange('bin.fillHeight', bin.fillHeight, 0, bin.cylinderHeight, 'm (up to bin.cylinderHeight)', { strictLower: true });
  requireRange('bin.wallThickness', bin.wallThickness, 0, Math.min(a, b) / 20, 'm', { strictLower: true });
  requireRange('bin.hopper.height', bin.hopper.height, 0, 100, 'm', { strictLower: true });
  requireRange('bin.hopper.outletLengthX', bin.hopper.outletLengthX, 0, a, 'm (below bin.lengthX)', { strictUpper: true });
  requireRange('bin.hopper.outletLengthY', bin.hopper.outletLengthY, 0, b, 'm (below bin.lengthY)', { strictUpper: true });
  requireRange('bin.hopper.thickness', bin.hopper.thickness, 0, Math.min(a, b) / 20, 'm', { strictLower: true });
  requireRange('bin.steelDensity', bin.steelDensity, 1000, 20000, 'kg/m3');
  requireRange('solid.unitWeight', solid.unitWeight, 1000, 30000, 'N/m3');
  requireAngle('solid.angleOfRepose', solid.angleOfRepose, 0, 90, { strictLower: true, strictUpper: true });

  const g = STANDARD_GRAVITY;
  const dc = Math.min(a, b);
  const hc = bin.fillHeight;
  const aspect = hc / dc;
  const slenderness = slendernessClass(aspect);
  if (slenderness === 'retaining') {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.fillHeight', `bin.fillHeight / min(bin.lengthX, bin.lengthY) = ${aspect.toFixed(3)}: retaining silos (h_c/d_c <= 0.4, EN 1991-4 5.4) are not covered`);
  }
  const A = a * b;
  const U = 2 * (a + b);
  const AoverU = A / U;
  const h0 = bin.topSurface === 'pile' ? (dc / 4) * Math.tan(solid.angleOfRepose) : 0;
  const ao = bin.hopper.outletLengthX;
  const bo = bin.hopper.outletLengthY;
  const hh = bin.hopper.height;
  // Frustum of a pyramid: (h/3)(A1 + A2 + sqrt(A1 A2)) holds for similar rectangles only; the
  // prismatoid rule (h/6)(A1 + 4 Am + A2) holds for any two parallel rectangles joined by planes.
  const Am = ((a + ao) / 2) * ((b + bo) / 2);
  const hopperVolume = (hh / 6) * (A + 4 * Am + ao * bo);
  const gamma = solid.unitWeight;
  const solidWeightBox = gamma * A * hc;
  const solidWeightHopper = gamma * hopperVolume;
  const solidWeight = solidWeightBox + solidWeightHopper;

  const profileFor = (effect: 'maxHopperLoad' | 'maxWallFriction') => {
    const set = characteristicSet(solid, effect);
    const params = { unitWeight: set.unitWeight, lateralPressureRatio: set.lateralPressureRatio, wallFrictionCoefficient: set.wallFrictionCoefficient, hydraulicRadius: AoverU };
    return slenderness === 'slender' ? janssenProfile(params) : squatProfile({ ...params, angleOfRepose: solid.angleOfRepose, h0 });
  };
  const atH = profileFor('maxHopperLoad').at(hc);
  const atW = profileFor('maxWallFriction').at(hc);
  const aac = actionAssessmentClass({ capacity: solidWeight / g, slenderness, diameter: dc, outletEccentricity: 0, topSurfaceEccentricity: 0 }).aac;
  const discharge = dischargeFactors(slenderness, aac, aspect, 0, solid.patchLoadFactor);

  // Faces: south and north run along X (slope toward Y), east and west along Y (slope toward X).
  const wY = (b - bo) / 2;
  const wX = (a - ao) / 2;
  const tanSouth = wY / hh;
  const tanEast = wX / hh;
  const faces = [
    { edge: 'south' as const, start: { x: 0, y: 0 }, end: { x: a, y: 0 }, length: a, outlet: ao, width: wY, tan: tanSouth },
    { edge: 'east' as const, start: { x: a, y: 0 }, end: { x: a, y: b }, length: b, outlet: bo, width: wX, tan: tanEast },
    { edge: 'north' as const, start: { x: a, y: b }, end: { x: 0, y: b }, length: a, outlet: ao, width: wY, tan: tanSouth },
    { edge: 'west' as const, start: { x: 0, y: b }, end: { x: 0, y: 0 }, length: b, outlet: bo, width: wX, tan: tanEast },
  ];
  const tributaries = faces.map((f) => (f.width * (f.length + f.outlet)) / 2);
  const tributaryTotal = tributaries.reduce((s, t) => s + t, 0);
  const slantAreas = faces.map((f) => ((f.length + f.outlet) / 2) * Math.hypot(hh, f.width));
  const hopperPlateWeight = bin.steelDensity * g * bin.hopper.thickness * slantAreas.reduce((s, x) => s + x, 0);
  const wallPlateWeight = bin.steelDensity * g * bin.wallThickness * U * bin.cylinderHeight;
  const structureWeight = wallPlateWeight + hopperPlateWeight;

  const points = Math.max(input.stationsPerEdge ?? 41, 3);
  const edges: EdgeLoad[] = [];
  const caseLoads: Array<{ name: string; wallPerLength: number; hopperTotal: number; hopperByFace?: number[] }> = [
    { name: 'G', wallPerLength: wallPlateWeight / U, hopperTotal: hopperPlateWeight, hopperByFace: slantAreas.map((x) => bin.steelDensity * g * bin.hopper.thickness * x) },
    { name: 'Q_s,f', wallPerLength: atH.nzSk, hopperTotal: atH.pv * A + solidWeightHopper },
    // Discharge: friction C_w n_zSk (max wall friction set), at most the weight in the box; the hopper carries the rest.
    { name: 'Q_s,e', wallPerLength: Math.min(discharge.Cw * atW.nzSk, solidWeightBox / U), hopperTotal: solidWeight - Math.min(discharge.Cw * atW.nzSk * U, solidWeightBox) },
  ];
  for (const load of caseLoads) {
    faces.forEach((face, i) => {
      const faceTotal = load.hopperByFace?.[i] ?? (load.hopperTotal * (tributaries[i] ?? 0)) / tributaryTotal;
      const tributary = tributaries[i] ?? 1;
      const s: number[] = [];
      const vertical: number[] = [];
      const inward: number[] = [];
      for (let k = 0; k < points; k++) {
        const station = (face.length * k) / (points - 1);
        const hopperLine = (faceTotal * tributaryDepth(station, face.length, face.outlet, face.width)) / tributary;
        s.push(station);
        vertical.push(load.wallPerLength + hopperLine);
        inward.push(hopperLine * face.tan);
      }
      edges.push({ case: load.name, edge: face.edge, start: face.start, end: face.end, s, vertical, inward, verticalResultant: load.wallPerLength * face.length + faceTotal });
    });
  }

  const derivation: DerivationStep[] = [
    { symbol: 'h_c/d_c', description: `aspect ratio (d_c the shorter side): ${slenderness}`, expression: 'h_c / min(a, b)', value: aspect, unit: '-', clause: 'EN 1991-4 1.5, 5.1' },
    { symbol: 'A/U', description: 'plan area over perimeter of the rectangle', expression: 'a b / (2 (a + b))', value: AoverU, unit: 'm', clause: 'EN 1991-4 5.2.1.1' },
    { symbol: 'h_o', description: bin.topSurface === 'pile' ? 'ridge pile across the shorter side' : 'level top surface', expression: bin.topSurface === 'pile' ? '(d_c/4) tan(phi_r)' : '0', value: h0, unit: 'm', clause: 'EN 1991-4 5.3.1.1 (from memory)' },
    { symbol: 'n_zSk(h_c)', description: 'wall friction per unit perimeter at the transition (max hopper load properties), uniform along the perimeter', expression: 'as for the circular bin with A/U', value: atH.nzSk, unit: 'N/m', clause: slenderness === 'slender' ? 'EN 1991-4 5.2.1.1' : 'EN 1991-4 5.3.1.1' },
    { symbol: 'V_hop', description: 'volume of the pyramidal hopper (prismatoid rule)', expression: '(h/6)(A_1 + 4 A_m + A_2)', value: hopperVolume, unit: 'm3', clause: 'geometry' },
    { symbol: 'W_s', description: 'weight of the stored solid', expression: 'gamma (a b h_c + V_hop)', value: solidWeight, unit: 'N', clause: 'statics' },
    { symbol: 'G_plates', description: 'self weight of walls and hopper plates', expression: 'rho g (t_w U h + t_h A_faces)', value: structureWeight, unit: 'N', clause: 'EN 1991-1-1 Table A.4' },
  ];
  const combinations = combineActions({ permanent: ['G'], groups: [{ action: 'solid', symbol: 'Q_s', alternatives: [{ label: 'filling', cases: ['Q_s,f'] }, { label: 'discharge', cases: ['Q_s,e'] }] }], seismic: [], closure: ['G', 'Q_s,f'] }, input.partialFactors);
  const notes = [
    'Rectangular bin: gravity cases only; patch loads, eccentric filling and discharge, hopper pressure profiles and the other actions are not yet covered.',
    'Wall friction is taken uniform along the perimeter (the standard\'s mean); the hopper load follows the fall line of each face (plan tributary bounded by the hip lines).',
  ];
  return { edges, combinations, totals: { solidWeight, structureWeight }, derivation, notes };
}
