import {
  EQUIPMENT_PERMANENT_CASE,
  EQUIPMENT_VARIABLE_CASE,
  HOPPER_MAGNIFIER_CASE,
  PERMANENT_CASE,
  ROOF_DEAD_CASE,
  ROOF_IMPOSED_CASE,
  SNOW_CASE,
  SOLID_DISCHARGE_CASE,
  SOLID_FILLING_CASE,
  STANDARD_GRAVITY,
  seismicCaseName,
  windCaseName,
} from './circular.js';
import { actionAssessmentClass, type ActionAssessmentClass } from './classification.js';
import { endEffectFactor, peakVelocityPressure, roofShapeCoefficient } from './climate.js';
import { combineActions, DEFAULT_PSI, type VariableAction, type VariableGroup } from './combinations.js';
import { LoadsError } from './errors.js';
import { janssenProfile } from './janssen.js';
import { characteristicSet, type LoadEffect } from './properties.js';
import { faceLoadShape, rectangularHopperGeometry, tributaryDepth } from './rectangular-geometry.js';
import { hopperWallVerticalForce, rectangularHopperPressures, type FacePairPressures } from './rectangular-hopper.js';
import { bendingLineLoad, edgeLength, edgePoint, shearFlowLineLoad, tubeProperties } from './rectangular-transfer.js';
import type { EdgeLoad, RectangularBinLoadInput, RectangularLoadCase, RectangularLoadSet, RectangularPressureProfile } from './rectangular-types.js';
import { validateRectangularInput } from './rectangular-validate.js';
import { bandForce, levelOfLargestBandMoment, NON_CIRCULAR_PATCH_RATIO, patchWalls, rectangularPatchCaseName, type PatchWall } from './rectangular-patch.js';
import { rectangularEffectiveSlenderness, rectangularSectionForceCoefficient } from './rectangular-wind.js';
import { slendernessClass } from './slenderness.js';
import { squatProfile } from './squat.js';
import type { DerivationStep, LoadCombination } from './types.js';
import { dischargeFactors, patchFactors, patchHeight } from './wall.js';

export { tributaryDepth };
export type { EdgeLoad, EdgeName, PlanEquipmentLoad, PyramidHopper, RectangularBin, RectangularBinLoadInput, RectangularHopper, RectangularLoadCase, RectangularLoadSet, RectangularPressureProfile, WedgeHopper, HopperFaceClass } from './rectangular-types.js';

/** Name of the seismic case of the empty bin toward `direction` (rad). */
export function emptySeismicCaseName(direction: number): string {
  return `${seismicCaseName(direction)},empty`;
}

/**
 * What one case puts on the support line, by component (N, N/m, N m):
 * - uniform: the same vertical line load on every edge (wall plates, wall friction, roof);
 * - faces: the vertical force each hopper face hangs on its edge (index as geometry.faces), spread as
 *   faceLoadShape and pulling the edge inward by the force times tan(slope of the face);
 * - moment: first moments (Mx', My') of an overturning moment (see bendingLineLoad);
 * - shear: base shear (Hx, Hy) carried by the wall shear flow (see shearFlowLineLoad).
 */
interface CaseLoad {
  uniform?: number;
  faces?: number[];
  moment?: { x: number; y: number };
  shear?: { x: number; y: number };
}

const DEG = Math.PI / 180;

/** -0 becomes 0, so that the output is the same after a JSON round trip. */
function plain(value: number): number {
  return value === 0 ? 0 : value;
}

function plainVector(v: { x: number; y: number } | undefined): { x: number; y: number } | undefined {
  return v ? { x: plain(v.x), y: plain(v.y) } : undefined;
}

/**
 * Loads of a rectangular bin on its support line (the rectangle of the internal plan beneath the
 * walls, at the transition; plan axes and edge names in rectangular-types.ts): self weight, stored
 * solid at filling and discharge with the non-circular patch band (EN 1991-4 5, 6; the band from
 * memory, rectangular-patch.ts), roof, equipment, snow, wind (EN 1991-1-4 7.6) and
 * an equivalent static seismic action, with their EN 1990 combinations.
 *
 * Stored solid: wall friction follows EN 1991-4 5.2-5.3 with A/U = ab / (2 (a + b)) and d_c the
 * shorter side, taken uniform along the perimeter (the standard's mean). The hopper's load (statics:
 * p_vf A + gamma V_hop, outlet closed) is shared among the sloping faces in proportion to their plan
 * tributaries (trapezoids bounded by the hip lines) and spread along each top edge as the tributary
 * depth (the load follows the fall line of the face: common practice); each face hangs from its edge
 * as a membrane, so it pulls the edge inward by its vertical load times the tangent of its slope from
 * the vertical. The vertical end walls of a wedge carry their own weight only (plane flow). Both
 * symmetric solid cases carry exactly the weight of the solid.
 *
 * Overturning (wind, seismic, eccentric roof loads, the patch band) reaches the support line by beam theory of the
 * walls as a thin-walled rectangular tube: vertical n = Mx' x_r / I_y + My' y_r / I_x, and base shear
 * as the tube's shear flow tangential to the edges (rectangular-transfer.ts).
 */
export function rectangularBinLoads(input: RectangularBinLoadInput): RectangularLoadSet {
  validateRectangularInput(input);
  const { bin, solid } = input;
  const g = STANDARD_GRAVITY;
  const a = bin.lengthX;
  const b = bin.lengthY;
  const geometry = rectangularHopperGeometry(bin);
  const hopperKind = bin.hopper.kind;
  const hh = geometry.height;
  const dc = Math.min(a, b);
  const hc = bin.fillHeight;
  const aspect = hc / dc;
  const slenderness = slendernessClass(aspect);
  const notes: string[] = [];
  if (slenderness === 'retaining') {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.fillHeight', `bin.fillHeight / min(bin.lengthX, bin.lengthY) = ${aspect.toFixed(3)}: retaining silos (h_c/d_c <= 0.4, EN 1991-4 5.4) are not covered; use a fill height above ${(0.4 * dc).toFixed(2)} m`);
  }
  const totalHeight = bin.cylinderHeight + hh;
  if (totalHeight / dc >= 10) {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.cylinderHeight', `bin.cylinderHeight plus bin.hopper.height over min(bin.lengthX, bin.lengthY) must be below 10 (EN 1991-4 1.1.2: h_b/d_c < 10); got ${(totalHeight / dc).toFixed(2)}`);
  }
  const A = geometry.planArea;
  const U = geometry.perimeter;
  const AoverU = A / U;
  const h0 = bin.topSurface === 'pile' ? (dc / 4) * Math.tan(solid.angleOfRepose) : 0;
  if (bin.topSurface === 'pile' && hc + h0 > bin.cylinderHeight) {
    notes.push(`The ridge of the top pile is ${(hc + h0 - bin.cylinderHeight).toFixed(2)} m above the top of the wall: it must fit under the roof.`);
  }
  const gamma = solid.unitWeight;
  const solidWeightBox = gamma * A * hc;
  const solidWeightHopper = gamma * geometry.volume;
  const solidWeight = solidWeightBox + solidWeightHopper;

  // Characteristic property sets per effect (EN 1991-4 Table 3.1) and the wall profiles.
  const profileFor = (effect: LoadEffect) => {
    const set = characteristicSet(solid, effect);
    const params = { unitWeight: set.unitWeight, lateralPressureRatio: set.lateralPressureRatio, wallFrictionCoefficient: set.wallFrictionCoefficient, hydraulicRadius: AoverU };
    return { set, profile: slenderness === 'slender' ? janssenProfile(params) : squatProfile({ ...params, angleOfRepose: solid.angleOfRepose, h0 }) };
  };
  const N = profileFor('maxNormalPressure');
  const W = profileFor('maxWallFriction');
  const H = profileFor('maxHopperLoad');
  if (slenderness !== 'slender' && h0 >= Math.min(N.profile.z0, W.profile.z0, H.profile.z0)) {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.topSurface', `bin.topSurface 'pile' gives h_o = ${h0.toFixed(3)} m, which must be below z_o = ${Math.min(N.profile.z0, W.profile.z0, H.profile.z0).toFixed(3)} m for the squat expressions (EN 1991-4 5.3.1.1)`);
  }
  const pressureClause = slenderness === 'slender' ? 'EN 1991-4 5.2.1.1' : 'EN 1991-4 5.3.1.1';
  const atH = H.profile.at(hc);
  const atW = W.profile.at(hc);

  const classified = actionAssessmentClass({ capacity: solidWeight / g, slenderness, diameter: dc, outletEccentricity: 0, topSurfaceEccentricity: 0 });
  let aac: ActionAssessmentClass = classified.aac;
  if (bin.actionAssessmentClass !== undefined) {
    if (bin.actionAssessmentClass < classified.aac) {
      throw new LoadsError('BAD_INPUT', 'bin.actionAssessmentClass', `bin.actionAssessmentClass must be at least ${classified.aac} (EN 1991-4 Table 2.1: ${classified.reason}); got ${bin.actionAssessmentClass}`);
    }
    aac = bin.actionAssessmentClass;
  }
  const discharge = dischargeFactors(slenderness, aac, aspect, 0, solid.patchLoadFactor);
  const Cb = bin.hopper.bottomLoadMagnifier ?? (aac === 1 || solid.proneToDynamicBehaviour ? 1.3 : 1.0);
  const thinWalled = dc / bin.wallThickness > 200;

  // Plates.
  const faces = geometry.faces;
  const tributaries = faces.map((f) => f.tributaryArea);
  const tributaryTotal = tributaries.reduce((s, t) => s + t, 0);
  const share = (i: number) => (tributaries[i] ?? 0) / tributaryTotal;
  const plateWeight = (area: number, thickness: number) => bin.steelDensity * g * thickness * area;
  const hopperPlateWeights = faces.map((f) => plateWeight(f.plateArea, bin.hopper.thickness));
  const hopperPlateWeight = hopperPlateWeights.reduce((s, x) => s + x, 0);
  const wallPlateWeight = plateWeight(U * bin.cylinderHeight, bin.wallThickness);
  const structureWeight = wallPlateWeight + hopperPlateWeight;

  // Edge loads of each case.
  const tube = tubeProperties(a, b);
  const points = Math.max(input.stationsPerEdge ?? 41, 3);
  const edges: EdgeLoad[] = [];
  const cases: RectangularLoadCase[] = [];
  const addCase = (meta: RectangularLoadCase, load: CaseLoad) => {
    const horizontalResultant = plainVector(meta.horizontalResultant);
    const overturningMoment = plainVector(meta.overturningMoment);
    cases.push({ ...meta, verticalResultant: plain(meta.verticalResultant), ...(horizontalResultant ? { horizontalResultant } : {}), ...(overturningMoment ? { overturningMoment } : {}) });
    faces.forEach((face, i) => {
      const L = edgeLength(face.edge, a, b);
      const faceForce = load.faces?.[i] ?? 0;
      const s: number[] = [];
      const vertical: number[] = [];
      const inward: number[] = [];
      const along: number[] = [];
      for (let k = 0; k < points; k++) {
        const station = (L * k) / (points - 1);
        const p = edgePoint(face.edge, station, a, b);
        const hopperLine = faceForce * faceLoadShape(station, face.length, face.outletLength);
        const bending = load.moment ? bendingLineLoad(tube, load.moment.x, load.moment.y, p.x, p.y) : 0;
        s.push(station);
        vertical.push(plain((load.uniform ?? 0) + hopperLine + bending));
        inward.push(plain(hopperLine * face.tanSlope));
        along.push(load.shear ? plain(shearFlowLineLoad(tube, load.shear.x, load.shear.y, face.edge, p.x, p.y)) : 0);
      }
      // The bending line load is linear along an edge: its integral is L times its value at mid-edge.
      const mid = edgePoint(face.edge, L / 2, a, b);
      const bendingResultant = load.moment ? L * bendingLineLoad(tube, load.moment.x, load.moment.y, mid.x, mid.y) : 0;
      edges.push({ case: meta.name, edge: face.edge, start: { ...face.start }, end: { ...face.end }, s, vertical, inward, along, verticalResultant: plain((load.uniform ?? 0) * L + faceForce + bendingResultant) });
    });
  };
  const byShare = (total: number) => faces.map((_, i) => total * share(i));
  const hopperDistribution = 'wall part uniform along the perimeter; hopper part per face in proportion to its plan tributary (hip lines), along the edge as the tributary depth; inward pull = face load x tan(face slope) (membrane statics of the face)';
  const tubeDistribution = 'beam theory of the walls as a thin-walled rectangular tube: vertical Mx\' x_r / I_y + My\' y_r / I_x (I_y = a^3/6 + b a^2/2, I_x = b^3/6 + a b^2/2 per unit thickness), base shear as the shear flow tangential to the edges; zero net vertical force';

  const dischargeWallLine = Math.min(discharge.Cw * atW.nzSk, solidWeightBox / U);
  const fillingOnHopper = atH.pv * A + solidWeightHopper;
  const dischargeOnHopper = solidWeight - dischargeWallLine * U;
  addCase({ name: PERMANENT_CASE, description: 'self weight of the walls and the hopper plates', kind: 'permanent', action: 'self-weight', verticalResultant: structureWeight, distribution: 'wall plates uniform along the perimeter; each hopper plate on its own edge, along the edge as its depth below it' }, { uniform: wallPlateWeight / U, faces: hopperPlateWeights });
  addCase({ name: SOLID_FILLING_CASE, description: `stored solid (${solid.name}) at filling, bin full; wall friction and hopper load with the maximum hopper load properties`, kind: 'variable', action: 'solid', verticalResultant: solidWeight, distribution: hopperDistribution }, { uniform: atH.nzSk, faces: byShare(fillingOnHopper) });
  addCase({ name: SOLID_DISCHARGE_CASE, description: `stored solid (${solid.name}) at discharge: wall friction C_w n_zSk with the maximum wall friction properties (at most the weight in the box), the hopper carries the rest of the weight`, kind: 'variable', action: 'solid', verticalResultant: solidWeight, distribution: hopperDistribution }, { uniform: dischargeWallLine, faces: byShare(dischargeOnHopper) });
  const magnifierForce = (Cb - 1) * atH.pv * A;
  if (Cb > 1) {
    addCase({ name: HOPPER_MAGNIFIER_CASE, description: `hopper bottom overpressure (C_b - 1) p_vf A, C_b = ${Cb}: a local magnifier of the hopper load, hung from the sloping faces; it comes with Q_s,f and Q_s,e in every combination`, kind: 'variable', action: 'solid', verticalResultant: magnifierForce, distribution: 'as the hopper part of Q_s,f' }, { faces: byShare(magnifierForce) });
  }

  // Hopper pressures per pair of sloping faces (EN 1991-4 6), maximum hopper load properties.
  const pvft = Cb * atH.pv;
  const pairs = rectangularHopperPressures(geometry, hopperKind, { unitWeight: gamma, lateralPressureRatio: H.set.lateralPressureRatio, wallFrictionCoefficient: H.set.wallFrictionCoefficient, internalFrictionAngle: H.set.internalFrictionAngle, transitionStress: pvft });
  const outletArea = geometry.outletLengthX * geometry.outletLengthY;
  const outletStress = (pair: FacePairPressures) => pair.pressures.filling.at(Math.max(pair.pressures.outletHeight, 1e-6 * pair.pressures.coneHeight)).pv;
  const meanOutletStress = pairs.reduce((s, p) => s + outletStress(p), 0) / pairs.length;
  const hopperWallVertical = hopperWallVerticalForce(pairs, 'filling', hh);
  const hopperLoad = pvft * A + solidWeightHopper;
  const hopperMismatch = (hopperWallVertical + meanOutletStress * outletArea) / hopperLoad - 1;

  const derivation: DerivationStep[] = [
    { symbol: 'h_c/d_c', description: `aspect ratio (d_c the shorter side): ${slenderness}`, expression: 'h_c / min(a, b)', value: aspect, unit: '-', clause: 'EN 1991-4 1.5, 5.1' },
    { symbol: 'm_s', description: `mass of stored solid (capacity): action assessment class ${aac} (${classified.reason}${aac !== classified.aac ? '; raised by the engineer' : ''})`, expression: 'gamma_u (a b h_c + V_hop) / g', value: solidWeight / g, unit: 'kg', clause: 'EN 1991-4 2.5, Table 2.1' },
    { symbol: 'A/U', description: 'plan area over perimeter of the rectangle', expression: 'a b / (2 (a + b))', value: AoverU, unit: 'm', clause: 'EN 1991-4 5.2.1.1' },
    { symbol: 'h_o', description: bin.topSurface === 'pile' ? 'ridge pile across the shorter side' : 'level top surface', expression: bin.topSurface === 'pile' ? '(d_c/4) tan(phi_r)' : '0', value: h0, unit: 'm', clause: 'EN 1991-4 5.3.1.1 (from memory)' },
    { symbol: 'K (max p_h)', description: N.set.description, expression: 'a_K K_m', value: N.set.lateralPressureRatio, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'mu (max p_w)', description: W.set.description, expression: 'a_mu mu_m', value: W.set.wallFrictionCoefficient, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'K', description: 'lateral pressure ratio, lower characteristic value (max hopper load)', expression: 'K_m / a_K', value: H.set.lateralPressureRatio, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'mu', description: 'wall friction coefficient, lower characteristic value (max hopper load)', expression: 'mu_m / a_mu', value: H.set.wallFrictionCoefficient, unit: '-', clause: 'EN 1991-4 Table 3.1' },
    { symbol: 'z_o', description: 'Janssen characteristic depth (max hopper load properties)', expression: '(1 / (K mu)) (A/U)', value: H.profile.z0, unit: 'm', clause: pressureClause },
    { symbol: 'p_hf(h_c)', description: 'horizontal pressure at the transition (max normal pressure properties), the same on all four walls', expression: slenderness === 'slender' ? 'p_ho (1 - exp(-z/z_o))' : 'p_ho (1 - ((z - h_o)/(z_o - h_o) + 1)^n)', value: N.profile.at(hc).ph, unit: 'Pa', clause: pressureClause },
    { symbol: 'p_vf(h_c)', description: 'mean vertical stress at the transition (max hopper load properties)', expression: slenderness === 'slender' ? 'p_hf / K' : 'gamma z_V', value: atH.pv, unit: 'Pa', clause: pressureClause },
    { symbol: 'n_zSk(h_c)', description: 'wall friction per unit perimeter at the transition (max hopper load properties), uniform along the perimeter', expression: slenderness === 'slender' ? 'mu p_ho (z - z_o Y_J)' : 'mu p_ho (z - z_V)', value: atH.nzSk, unit: 'N/m', clause: pressureClause },
    { symbol: 'C_h', description: 'discharge factor for the normal pressure', expression: discharge.expression, value: discharge.Ch, unit: '-', clause: discharge.clause },
    { symbol: 'C_w', description: 'discharge factor for the wall friction', expression: discharge.expression, value: discharge.Cw, unit: '-', clause: discharge.clause },
    { symbol: 'V_hop', description: `volume of the ${hopperKind} hopper (prismatoid rule)`, expression: '(h/6)(A_1 + 4 A_m + A_2)', value: geometry.volume, unit: 'm3', clause: 'geometry' },
    { symbol: 'W_s', description: 'weight of the stored solid', expression: 'gamma (a b h_c + V_hop)', value: solidWeight, unit: 'N', clause: 'statics' },
    { symbol: 'F_h', description: 'solid weight carried by the hopper at filling (outlet closed)', expression: 'p_vf(h_c) a b + gamma V_hop', value: fillingOnHopper, unit: 'N', clause: 'statics' },
    { symbol: 'n_w,e', description: 'wall friction per unit perimeter at discharge (max wall friction properties), at most the weight in the box', expression: 'min(C_w n_zSk(h_c), gamma a b h_c / U)', value: dischargeWallLine, unit: 'N/m', clause: `${discharge.clause}; statics` },
    { symbol: 'F_h,e', description: 'solid weight carried by the hopper at discharge', expression: 'W_s - U n_w,e', value: dischargeOnHopper, unit: 'N', clause: 'statics' },
    { symbol: 'G_plates', description: 'self weight of walls and hopper plates', expression: 'rho g (t_w U h + t_h A_faces)', value: structureWeight, unit: 'N', clause: 'EN 1991-1-1 Table A.4' },
    { symbol: 'C_b', description: 'hopper bottom load magnifier', expression: bin.hopper.bottomLoadMagnifier !== undefined ? 'given' : aac === 1 || solid.proneToDynamicBehaviour ? '1.3 (AAC 1 or solid prone to dynamic behaviour)' : '1.0', value: Cb, unit: '-', clause: 'EN 1991-4 6.1.2 (6.3) (from memory)' },
    { symbol: 'p_vft', description: 'vertical stress on the hopper at the transition', expression: 'C_b p_vf(h_c)', value: pvft, unit: 'Pa', clause: 'EN 1991-4 6.1.2 (6.2)' },
  ];
  for (const pair of pairs) {
    const label = pair.faces.map((f) => f.edge).join(', ');
    const p = pair.pressures;
    const steep = p.kind === 'steep';
    derivation.push(
      { symbol: `beta (${label})`, description: `slope of the ${label} faces from the vertical`, expression: 'atan(w / h_h)', value: pair.slope, unit: 'rad', clause: 'geometry' },
      { symbol: `(1-K)/(2 mu_h) (${label})`, description: `${label} faces are ${p.kind}: tan(beta) = ${Math.tan(pair.slope).toFixed(4)}`, expression: 'steep if tan(beta) < (1 - K)/(2 mu_h)', value: p.steepLimit, unit: '-', clause: 'EN 1991-4 6.1(2) (6.1)' },
      { symbol: `S (${label})`, description: hopperKind === 'wedge' ? 'shape coefficient, wedge (plane flow)' : 'shape coefficient, pyramid', expression: hopperKind === 'wedge' ? '1' : '2', value: pair.shapeFactor, unit: '-', clause: 'EN 1991-4 6.3.2 (from memory)' },
      { symbol: `F_f (${label})`, description: 'hopper pressure ratio at filling', expression: steep ? '1 - b / (1 + tan(beta)/mu_h), b = 0.2' : '1 - b / (1 + tan(beta)/mu_heff)', value: p.filling.F, unit: '-', clause: steep ? 'EN 1991-4 6.3.2 (from memory)' : 'EN 1991-4 6.3.3 (from memory)' },
      { symbol: `n_f (${label})`, description: 'exponent of the hopper vertical stress at filling', expression: steep ? 'S (F_f mu_h cot(beta) + F_f) - 2' : 'S (1 - b) mu_heff cot(beta)', value: p.filling.n, unit: '-', clause: steep ? 'EN 1991-4 6.3.2 (from memory)' : 'EN 1991-4 6.3.3 (from memory)' },
      { symbol: `F_e (${label})`, description: p.dischargeExpression === 'mass-flow' ? 'hopper pressure ratio at discharge' : 'hopper pressure ratio at discharge (= filling)', expression: p.dischargeExpression === 'mass-flow' ? '(1 + sin(phi_i) cos(eps)) / (1 - sin(phi_i) cos(2 beta + eps))' : 'F_f', value: p.discharge.F, unit: '-', clause: 'EN 1991-4 6.3.2, 6.3.3 (from memory)' },
      { symbol: `h_h (${label})`, description: 'height of the full hopper from its apex to the transition (x is measured up from the apex)', expression: '(B/2) / tan(beta), B the side across the faces', value: p.coneHeight, unit: 'm', clause: 'EN 1991-4 6.3 (6.6)' },
    );
    if (p.dischargeExpression === 'filling' && steep) {
      notes.push(`Hopper discharge (${label} faces): the hopper wall friction angle is not below the angle of internal friction, so the mass-flow discharge expression does not apply; the filling pressures are used (EN 1991-4 6.3.2).`);
    }
  }
  derivation.push(
    { symbol: 'V_hop,wall', description: 'vertical resultant of the sloping faces\' pressures at filling, outlet to transition', expression: 'sum over faces of integral L(z) (p_n tan(beta) + p_t) dz', value: hopperWallVertical, unit: 'N', clause: 'statics of EN 1991-4 (6.6)' },
    { symbol: 'delta_hop', description: 'closure of the hopper pressures: (V_hop,wall + p_v(x_o) a_o b_o) / (p_vft a b + gamma V_hop) - 1 (the pairs\' outlet stresses averaged)', expression: 'zero (slice equilibrium) for a pyramid whose outlet is similar to the box, steep or shallow; not zero for other pyramids (the pairs\' apexes differ) or for a steep wedge with the standard\'s n', value: hopperMismatch, unit: '-', clause: 'statics' },
  );
  if (Math.abs(hopperMismatch) > 0.01) {
    notes.push(`Hopper pressures: the standard's expressions (EN 1991-4 6.3, as we have them) give a vertical resultant on the hopper plus the outlet that differs from the hopper load (statics of the solid) by ${(100 * hopperMismatch).toFixed(1)} %${hopperKind === 'wedge' ? ': for a wedge, n = S (F mu_h cot(beta) + F) - 2 with S = 1 does not satisfy slice equilibrium, which would need - S (derived); confirm the expression against the text' : ''}. The support line uses the statics of the solid (F_h), not this resultant; the profiles are the standard's, for the hopper plates.`);
  }
  if (Cb > 1) derivation.push({ symbol: 'dF_b', description: 'vertical force of the hopper bottom overpressure, above the weight of the solid by design', expression: '(C_b - 1) p_vf(h_c) a b', value: magnifierForce, unit: 'N', clause: 'EN 1991-4 6.1.2' });

  // Patch loads of a non-circular bin (EN 1991-4 5.2.1.4, 5.2.2.4; from memory): a band of outward
  // pressure 0.36 p_p of height s across the full width of one wall, at any level (rectangular-patch.ts).
  const patchFilling: Array<{ name: string; wall: PatchWall }> = [];
  const patchDischarge: Array<{ name: string; wall: PatchWall }> = [];
  if (aac === 1) {
    notes.push('AAC 1: patch loads are not applied; the enlarged discharge factors C_h and C_w stand for them (EN 1991-4 5.2.2.1).');
  } else {
    const patch = patchFactors(aspect, solid.patchLoadFactor, 0, 0);
    const s = patchHeight(dc);
    derivation.push(
      { symbol: 'C_pf', description: 'filling patch load factor (outlet centred, filling centred: E = 0)', expression: '0.21 C_op (1 + 2 E^2)(1 - exp(-1.5 (h_c/d_c - 1))), E = 0; 0 for h_c/d_c <= 1', value: patch.Cpf, unit: '-', clause: 'EN 1991-4 5.2.1.2 (from memory)' },
      { symbol: 'C_pe', description: 'discharge patch load factor (E = 0)', expression: '0.42 C_op (1 + 2 E^2)(1 - exp(-1.5 (h_c/d_c - 1))), E = 0; 0 for h_c/d_c <= 1', value: patch.Cpe, unit: '-', clause: 'EN 1991-4 5.2.2.2 (from memory)' },
      { symbol: 's', description: 'height of the patch band (d_c the shorter side)', expression: 'pi d_c / 16', value: s, unit: 'm', clause: 'EN 1991-4 5.2.1.2, 5.2.1.4 (from memory)' },
    );
    if (patch.Cpf <= 0 && patch.Cpe <= 0) {
      notes.push(`No patch loads: C_pf = C_pe = 0 (h_c/d_c = ${aspect.toFixed(3)}${aspect <= 1 ? ' <= 1' : ', C_op = 0'}; EN 1991-4 5.2.1.2, 5.2.2.2, from memory).`);
    } else {
      // The band lies on the wall below its highest contact: its centre between h_o + s/2 and h_c - s/2.
      const pressureAt = (z: number) => N.profile.at(z).ph;
      const zp = levelOfLargestBandMoment(pressureAt, hc, h0 + s / 2, hc - s / 2);
      const arm = hc - zp;
      const phAtBand = pressureAt(zp);
      derivation.push(
        { symbol: 'z_p', description: 'depth of the band centre below the equivalent surface: the level of the largest overturning moment about the support level (the transition), the same for filling and discharge since both band pressures are proportional to p_hf(z)', expression: 'z maximising p_hf(z) (h_c - z), h_o + s/2 <= z <= h_c - s/2', value: zp, unit: 'm', clause: 'EN 1991-4 5.2.1.4 (band at any level; from memory)' },
        { symbol: 'p_hf(z_p)', description: 'horizontal filling pressure at the band centre (max normal pressure properties)', expression: slenderness === 'slender' ? 'p_ho (1 - exp(-z_p/z_o))' : 'p_ho (1 - ((z_p - h_o)/(z_o - h_o) + 1)^n)', value: phAtBand, unit: 'Pa', clause: pressureClause },
      );
      const states = [
        { state: 'filling' as const, factor: patch.Cpf, ch: 1, sub: 'pf', solidCase: SOLID_FILLING_CASE, clause: 'EN 1991-4 5.2.1.4 (from memory)', patchExpression: 'C_pf p_hf(z_p)', patchClause: 'EN 1991-4 5.2.1.2 (from memory)', list: patchFilling },
        { state: 'discharge' as const, factor: patch.Cpe, ch: discharge.Ch, sub: 'pe', solidCase: SOLID_DISCHARGE_CASE, clause: 'EN 1991-4 5.2.2.4 (from memory)', patchExpression: 'C_pe p_he(z_p) = C_pe C_h p_hf(z_p)', patchClause: 'EN 1991-4 5.2.2.2 (from memory)', list: patchDischarge },
      ];
      const walls = patchWalls(a, b);
      for (const st of states) {
        if (st.factor <= 0) continue;
        const patchPressure = st.factor * st.ch * phAtBand;
        const bandPressure = NON_CIRCULAR_PATCH_RATIO * patchPressure;
        derivation.push(
          { symbol: `p_${st.sub}`, description: `${st.state} patch pressure of the circular rule at the band centre`, expression: st.patchExpression, value: patchPressure, unit: 'Pa', clause: st.patchClause },
          { symbol: `p_${st.sub},nc`, description: `${st.state} band pressure of a non-circular bin, outward on one wall over the band height s`, expression: `0.36 p_${st.sub}`, value: bandPressure, unit: 'Pa', clause: st.clause },
        );
        for (const [label, width] of [['north, south walls, B = a', a], ['east, west walls, B = b', b]] as const) {
          const F = bandForce(bandPressure, s, width);
          derivation.push(
            { symbol: `F_${st.sub} (${label})`, description: `net horizontal force of the ${st.state} band on one wall (${label}), not balanced by the opposite wall: base shear at the support level`, expression: `p_${st.sub},nc s B`, value: F, unit: 'N', clause: `statics of the band of ${st.clause}` },
            { symbol: `M_${st.sub} (${label})`, description: `overturning moment of the ${st.state} band (${label}) about the support level (the transition, as for wind and seismic)`, expression: `F_${st.sub} (h_c - z_p)`, value: F * arm, unit: 'N m', clause: `statics of the band of ${st.clause}` },
          );
        }
        for (const wall of walls) {
          const name = rectangularPatchCaseName(st.state, wall);
          const F = bandForce(bandPressure, s, wall.width);
          const M = F * arm;
          const { x: ox, y: oy } = wall.outward;
          addCase(
            {
              name,
              description: `${st.state} patch band on the ${wall.edge} wall (from memory): p_${st.sub},nc = 0.36 p_${st.sub} = ${(bandPressure / 1000).toFixed(3)} kPa outward over the full width B = ${wall.width.toFixed(3)} m and height s = ${s.toFixed(3)} m, centred ${zp.toFixed(3)} m below the equivalent surface (${arm.toFixed(3)} m above the support level); unbalanced: base shear and overturning moment toward the ${wall.edge}; it comes with ${st.solidCase}`,
              kind: 'variable',
              action: 'solid',
              verticalResultant: 0,
              horizontalResultant: { x: F * ox, y: F * oy },
              overturningMoment: { x: M * oy, y: -M * ox },
              distribution: `${st.clause} band on one wall, F = p_nc s B at z_p, M = F (h_c - z_p); ${tubeDistribution}`,
            },
            { moment: { x: M * ox, y: M * oy }, shear: { x: F * ox, y: F * oy } },
          );
          st.list.push({ name, wall });
        }
      }
      const longer = Math.max(a, b);
      const largerState = Math.max(patch.Cpf, patch.Cpe * discharge.Ch);
      const deepest = bandForce(NON_CIRCULAR_PATCH_RATIO * largerState * pressureAt(hc - s / 2), s, longer);
      const deepestAtZp = bandForce(NON_CIRCULAR_PATCH_RATIO * largerState * phAtBand, s, longer);
      notes.push(
        `Patch loads of the rectangular bin (EN 1991-4 5.2.1.4 and 5.2.2.4 for non-circular silos, from memory, not confirmed against the text): an outward band pressure p_pf,nc = 0.36 p_pf at filling and p_pe,nc = 0.36 p_pe at discharge over a horizontal band of height s = pi d_c/16 (d_c the shorter side) across the full width of one wall, at any level. For the support the band is taken on one wall, not balanced by the opposite one, at the level of the largest overturning moment (z_p = ${zp.toFixed(3)} m, the same for filling and discharge, in every action assessment class): base shear F = p_nc s B and overturning moment F (h_c - z_p) about the support level (the transition, as for wind and seismic), carried to the edges by the tube rules of the wind cases. One case per wall and state (${[...patchFilling, ...patchDischarge].map((p) => p.name).join(', ')}); each is an alternative of the solid action with its own state (Q_s,pf,* with Q_s,f, Q_s,pe,* with Q_s,e), so a combination takes at most one patch case. The solid at filling without a patch is kept as the first alternative, which the seismic design situation takes.`,
        `Patch band (from memory): thin- and thick-walled rectangular bins take the same band (the non-circular rule makes no distinction, as far as we know; unlike the thick-walled circular bin, whose two opposite patches balance). A band lower on the wall gives more base shear with less moment (on the ${longer.toFixed(2)} m wall, with its centre at h_c - s/2, up to ${(deepest / 1000).toFixed(1)} kN in the larger of the two states, against ${(deepestAtZp / 1000).toFixed(1)} kN at z_p): not a separate case. The walls must also be designed for the band as plates; that is not done here.`,
      );
    }
  }

  // Roof, equipment, snow.
  const t = bin.wallThickness;
  const roofArea = (a + 2 * t) * (b + 2 * t);
  const roofDead = input.roof ? input.roof.deadLoad * roofArea : 0;
  const permanentNames = [PERMANENT_CASE];
  const uniformRoof = 'the walls carry the roof load down as a tube: uniform along the perimeter (its resultant at the centroid)';
  if (input.roof) {
    addCase({ name: ROOF_DEAD_CASE, description: 'roof dead load on the outer plan', kind: 'permanent', action: 'roof', verticalResultant: roofDead, distribution: uniformRoof }, { uniform: roofDead / U });
    permanentNames.push(ROOF_DEAD_CASE);
    derivation.push({ symbol: 'G_roof', description: 'roof dead load', expression: 'g_roof (a + 2 t)(b + 2 t)', value: roofDead, unit: 'N', clause: 'EN 1991-1-1' });
  }
  const groups: VariableGroup[] = [];
  const magnifier = Cb > 1 ? [HOPPER_MAGNIFIER_CASE] : [];
  // The solid's states: filling (first: the seismic design situation takes it), each filling patch
  // with Q_s,f, and discharge, which with patch cases is one alternative per patch with Q_s,e (the
  // mirror walls give both signs, so the discharge without a patch does not govern a linear effect).
  const fillingAlternatives = [{ label: 'filling', cases: [SOLID_FILLING_CASE, ...magnifier] }, ...patchFilling.map((p) => ({ label: `filling, patch on the ${p.wall.edge} wall`, cases: [SOLID_FILLING_CASE, p.name, ...magnifier] }))];
  const dischargeAlternatives = patchDischarge.length > 0 ? patchDischarge.map((p) => ({ label: `discharge, patch on the ${p.wall.edge} wall`, cases: [SOLID_DISCHARGE_CASE, p.name, ...magnifier] })) : [{ label: 'discharge', cases: [SOLID_DISCHARGE_CASE, ...magnifier] }];
  groups.push({ action: 'solid', symbol: 'Q_s', alternatives: [...fillingAlternatives, ...dischargeAlternatives] });
  const roofImposed = (input.roof?.imposedLoad ?? 0) * roofArea;
  if (roofImposed > 0) {
    addCase({ name: ROOF_IMPOSED_CASE, description: 'roof imposed load on the outer plan (category H)', kind: 'variable', action: 'roof', verticalResultant: roofImposed, distribution: uniformRoof }, { uniform: roofImposed / U });
    groups.push({ action: 'roofImposed', symbol: ROOF_IMPOSED_CASE, alternatives: [{ label: 'roof imposed', cases: [ROOF_IMPOSED_CASE] }] });
  }
  let permanentEquipment = 0;
  for (const kind of ['permanent', 'variable'] as const) {
    const items = (input.equipment ?? []).filter((item) => (item.kind ?? 'permanent') === kind);
    if (items.length === 0) continue;
    const total = items.reduce((sum, item) => sum + item.force, 0);
    const mx = items.reduce((sum, item) => sum + item.force * (item.x - a / 2), 0);
    const my = items.reduce((sum, item) => sum + item.force * (item.y - b / 2), 0);
    const name = kind === 'permanent' ? EQUIPMENT_PERMANENT_CASE : EQUIPMENT_VARIABLE_CASE;
    addCase(
      {
        name,
        description: `${kind} equipment: ${items.map((item) => `${item.name} at (${item.x}, ${item.y}) m`).join(', ')}`,
        kind,
        action: 'equipment',
        verticalResultant: total,
        overturningMoment: { x: my, y: -mx },
        distribution: 'point loads on the roof carried by the walls as a thin-walled tube: uniform sum F / U plus the first moments Mx\' = sum F (x_i - a/2), My\' = sum F (y_i - b/2) as Mx\' x_r / I_y + My\' y_r / I_x (resultant and moments exact; the local concentration under each load is not modelled)',
      },
      { uniform: total / U, moment: { x: mx, y: my } },
    );
    if (kind === 'permanent') {
      permanentEquipment = total;
      permanentNames.push(name);
    } else {
      groups.push({ action: 'equipment', symbol: name, alternatives: [{ label: 'equipment', cases: [name] }] });
    }
  }
  if (input.snow) {
    const mu1 = roofShapeCoefficient(input.roof?.pitch ?? 0);
    const sRoof = mu1 * (input.snow.exposureCoefficient ?? 1) * (input.snow.thermalCoefficient ?? 1) * input.snow.groundLoad;
    addCase({ name: SNOW_CASE, description: 'snow on the roof, undrifted', kind: 'variable', action: 'snow', verticalResultant: sRoof * roofArea, distribution: uniformRoof }, { uniform: (sRoof * roofArea) / U });
    groups.push({ action: 'snow', symbol: SNOW_CASE, alternatives: [{ label: 'snow', cases: [SNOW_CASE] }] });
    derivation.push(
      { symbol: 'mu_1', description: 'roof snow load shape coefficient (pitch of the roof slopes)', expression: '0.8 (0-30 deg); 0.8 (60 - alpha)/30 (30-60 deg); 0 above', value: mu1, unit: '-', clause: 'EN 1991-1-3 5.3.2, Table 5.2 (from memory)' },
      { symbol: 's', description: 'snow load on the roof', expression: 'mu_1 C_e C_t s_k', value: sRoof, unit: 'Pa', clause: 'EN 1991-1-3 5.2 (5.1)' },
    );
  }

  // Wind on the box (EN 1991-1-4 7.6): base shear and overturning moment at the support level.
  const wallHeight = bin.cylinderHeight;
  if (input.wind) {
    const w = input.wind;
    const ze = w.supportLevelHeight + wallHeight;
    const qp = peakVelocityPressure(w.basicVelocity, w.terrainCategory, ze, w.orographyFactor ?? 1);
    const cscd = w.structuralFactor ?? 1;
    derivation.push({ symbol: 'q_p(z_e)', description: `peak velocity pressure at the top of the wall, z_e = ${ze.toFixed(2)} m, terrain ${w.terrainCategory}`, expression: '(1 + 7 I_v) (1/2) rho (c_r c_o v_b)^2', value: qp.qp, unit: 'Pa', clause: 'EN 1991-1-4 4.5 (4.8)' });
    const directions = w.directions ?? [0, Math.PI / 2, Math.PI, (3 * Math.PI) / 2];
    const alongAxis = (axis: 'X' | 'Y') => {
      const depth = axis === 'X' ? a + 2 * t : b + 2 * t;
      const breadth = axis === 'X' ? b + 2 * t : a + 2 * t;
      const cf0 = rectangularSectionForceCoefficient(depth / breadth);
      const lambda = rectangularEffectiveSlenderness(wallHeight, breadth);
      const psiLambda = endEffectFactor(lambda);
      const psiR = 1;
      const force = cscd * cf0 * psiR * psiLambda * qp.qp * breadth * wallHeight;
      return { depth, breadth, cf0, lambda, psiLambda, psiR, force, moment: (force * wallHeight) / 2 };
    };
    const byAxis = { X: alongAxis('X'), Y: alongAxis('Y') };
    const used = new Set(directions.map((theta) => (Math.abs(Math.cos(theta)) > 0.5 ? 'X' : 'Y')));
    for (const axis of ['X', 'Y'] as const) {
      if (!used.has(axis)) continue;
      const r = byAxis[axis];
      derivation.push(
        { symbol: `d/b (${axis})`, description: `wind along ${axis}: depth along the wind over breadth across it (outer dimensions)`, expression: axis === 'X' ? '(a + 2 t)/(b + 2 t)' : '(b + 2 t)/(a + 2 t)', value: r.depth / r.breadth, unit: '-', clause: 'EN 1991-1-4 7.6, Figure 7.23' },
        { symbol: `c_f,0 (${axis})`, description: 'force coefficient of a rectangular section with sharp corners, without free-end flow', expression: 'Figure 7.23 against d/b, log-linear between read-off points', value: r.cf0, unit: '-', clause: 'EN 1991-1-4 7.6 Figure 7.23 (read off, from memory)' },
        { symbol: `psi_r (${axis})`, description: 'reduction factor for rounded corners: sharp corners', expression: '1 (r = 0)', value: r.psiR, unit: '-', clause: 'EN 1991-1-4 7.6 Figure 7.24' },
        { symbol: `lambda (${axis})`, description: 'effective slenderness of the box', expression: 'Table 7.16: 2 l/b (l <= 15 m) .. 1.4 l/b (l >= 50 m), at most 70', value: r.lambda, unit: '-', clause: 'EN 1991-1-4 7.13, Table 7.16 (from memory)' },
        { symbol: `psi_lambda (${axis})`, description: 'end-effect factor, solidity 1', expression: 'Figure 7.36', value: r.psiLambda, unit: '-', clause: 'EN 1991-1-4 7.13, Figure 7.36 (read off, from memory)' },
        { symbol: `F_w (${axis})`, description: `wind force on the walls, wind along ${axis} (roof and hopper not included)`, expression: 'c_s c_d c_f,0 psi_r psi_lambda q_p(z_e) b h', value: r.force, unit: 'N', clause: 'EN 1991-1-4 5.3 (5.3), 7.6 (7.9)' },
        { symbol: `M_w (${axis})`, description: `overturning moment of the wind along ${axis} about the support level`, expression: 'F_w h / 2', value: r.moment, unit: 'N m', clause: 'statics' },
      );
    }
    const alternatives = directions.map((theta) => {
      const name = windCaseName(theta);
      const r = Math.abs(Math.cos(theta)) > 0.5 ? byAxis.X : byAxis.Y;
      const c = Math.round(Math.cos(theta));
      const s = Math.round(Math.sin(theta));
      addCase(
        { name, description: `wind toward ${name.slice(2)} degrees from +X, normal to the ${c !== 0 ? 'east and west' : 'south and north'} walls: base shear and overturning moment of the walls`, kind: 'variable', action: 'wind', verticalResultant: 0, horizontalResultant: { x: r.force * c, y: r.force * s }, overturningMoment: { x: r.moment * s, y: -r.moment * c }, distribution: tubeDistribution },
        { moment: { x: r.moment * c, y: r.moment * s }, shear: { x: r.force * c, y: r.force * s } },
      );
      return { label: `wind ${name.slice(2)} deg`, cases: [name] };
    });
    groups.push({ action: 'wind', symbol: 'W', alternatives });
    notes.push('Wind: EN 1991-1-4 7.6 for wind normal to a pair of walls, one reference height (top of the wall) over the whole height (conservative), sharp corners (psi_r = 1); wind on the roof (uplift), on the hopper below the support line and on the support structure is not included; skewed wind is not considered.');
  }

  // Seismic action as an equivalent static horizontal force (coefficient given by the engineer).
  const seismicNames: string[] = [];
  const emptySeismic: Array<{ name: string }> = [];
  if (input.seismic) {
    const ah = input.seismic.horizontalCoefficient;
    const fraction = input.seismic.effectiveSolidMassFraction ?? 0.8;
    const wallPart: Array<[number, number]> = [[wallPlateWeight, wallHeight / 2], [roofDead + permanentEquipment, wallHeight]];
    faces.forEach((face, i) => wallPart.push([hopperPlateWeights[i] ?? 0, -face.plateCentroidDepth]));
    const solidPart: Array<[number, number]> = [[fraction * solidWeightBox, hc / 2], [fraction * solidWeightHopper, -geometry.volumeCentroidDepth]];
    const resultant = (parts: Array<[number, number]>) => ({ force: ah * parts.reduce((s, [wt]) => s + wt, 0), moment: ah * parts.reduce((s, [wt, z]) => s + wt * z, 0) });
    const full = resultant([...wallPart, ...solidPart]);
    const empty = resultant(wallPart);
    derivation.push(
      { symbol: 'F_E', description: `equivalent static horizontal seismic force, bin full (effective solid mass fraction ${fraction})`, expression: 'a_h (G_plates + G_roof + G_eq + f_s W_s)', value: full.force, unit: 'N', clause: 'EN 1998-4 (equivalent static; coefficient given by the engineer; mass fraction from memory)' },
      { symbol: 'M_E', description: 'overturning moment of the seismic force about the support level, bin full (hopper masses below the support line count negative)', expression: 'a_h sum W_i z_i', value: full.moment, unit: 'N m', clause: 'statics' },
      { symbol: 'F_E,0', description: 'equivalent static horizontal seismic force, bin empty', expression: 'a_h (G_plates + G_roof + G_eq)', value: empty.force, unit: 'N', clause: 'EN 1998-4 (equivalent static)' },
      { symbol: 'M_E,0', description: 'overturning moment of the seismic force about the support level, bin empty', expression: 'a_h sum W_i z_i', value: empty.moment, unit: 'N m', clause: 'statics' },
    );
    for (const theta of input.seismic.directions ?? [0, Math.PI / 2, Math.PI, (3 * Math.PI) / 2]) {
      const c = Math.cos(theta);
      const s = Math.sin(theta);
      for (const [r, name, label] of [[full, seismicCaseName(theta), 'bin full'], [empty, emptySeismicCaseName(theta), 'bin empty']] as const) {
        addCase(
          { name, description: `seismic action toward ${Number((theta / DEG).toFixed(2))} degrees from +X, ${label} (equivalent static)`, kind: 'accidental', action: 'seismic', verticalResultant: 0, horizontalResultant: { x: r.force * c, y: r.force * s }, overturningMoment: { x: r.moment * s, y: -r.moment * c }, distribution: tubeDistribution },
          { moment: { x: r.moment * c, y: r.moment * s }, shear: { x: r.force * c, y: r.force * s } },
        );
      }
      seismicNames.push(seismicCaseName(theta));
      emptySeismic.push({ name: emptySeismicCaseName(theta) });
    }
  }

  // Pressure profiles: wall per effect (p_h max normal pressure set, p_w max wall friction set,
  // p_v max hopper load set), hopper per pair of faces and state.
  const profilePoints = Math.max(input.profilePoints ?? 41, 2);
  const wallProfile = (name: string, ch: number, cw: number): RectangularPressureProfile => {
    const profile: RectangularPressureProfile = { case: name, part: 'wall', z: [], ph: [], pw: [], pv: [] };
    for (let i = 0; i < profilePoints; i++) {
      const z = (hc * i) / (profilePoints - 1);
      profile.z.push(z);
      profile.ph.push(ch * N.profile.at(z).ph);
      profile.pw.push(cw * W.profile.at(z).pw);
      profile.pv.push(H.profile.at(z).pv);
    }
    return profile;
  };
  const hopperProfile = (name: string, pair: FacePairPressures, state: 'filling' | 'discharge'): RectangularPressureProfile => {
    const p = pair.pressures;
    const profile: RectangularPressureProfile = { case: name, part: 'hopper', faces: pair.faces.map((f) => f.edge), z: [], ph: [], pw: [], pv: [], x: [] };
    const x0 = Math.max(p.outletHeight, 1e-6 * p.coneHeight);
    for (let i = 0; i < profilePoints; i++) {
      const x = p.coneHeight - ((p.coneHeight - x0) * i) / (profilePoints - 1);
      const at = p[state].at(x);
      profile.x?.push(x);
      profile.z.push(p.coneHeight - x);
      profile.ph.push(at.pn);
      profile.pw.push(at.pt);
      profile.pv.push(at.pv);
    }
    return profile;
  };
  const profiles: RectangularPressureProfile[] = [
    wallProfile(SOLID_FILLING_CASE, 1, 1),
    wallProfile(SOLID_DISCHARGE_CASE, discharge.Ch, discharge.Cw),
    ...pairs.flatMap((pair) => [hopperProfile(SOLID_FILLING_CASE, pair, 'filling'), hopperProfile(SOLID_DISCHARGE_CASE, pair, 'discharge')]),
  ];

  const combinations = withEmptySeismic(
    combineActions({ permanent: permanentNames, groups, seismic: seismicNames, closure: [PERMANENT_CASE, SOLID_FILLING_CASE] }, input.partialFactors),
    emptySeismic.map((e) => e.name),
    permanentNames,
    groups,
    input.partialFactors.psi,
  );

  notes.push(
    'Wall friction is taken uniform along the perimeter (the standard\'s mean); the hopper load follows the fall line of each face (plan tributary bounded by the hip lines), and each face hangs from its edge as a membrane (inward pull = vertical load x tan(slope)). Plate bending of the faces, which returns part of the normal pressure to the edge as a reaction normal to the face, and the outward reaction of the walls spanning vertically onto the transition under p_h, both depending on the stiffening, are not included.',
    'Overturning and base shear reach the support line by beam theory of the walls as a thin-walled tube (plane sections, shear flow); in a squat box shear lag concentrates the vertical load toward the corners, which this does not show.',
    'The outlet is centred; eccentric filling and discharge of rectangular bins are not covered.',
  );
  if (hopperKind === 'wedge') {
    notes.push('Wedge hopper: plane flow (S = 1) between the two sloping faces; the vertical end walls carry their own weight, and the pressure of the solid on them (not given by the plane-flow expressions) is not included: their outward reaction on the end edges of the support line depends on how they are stiffened.');
  } else if (a !== b || geometry.outletLengthX !== geometry.outletLengthY) {
    notes.push('Rectangular pyramid: the hopper pressures use S = 2 for each pair of faces with its own slope; for an elongated plan the flow tends toward plane flow (S = 1), for which the pressures are higher; check with a wedge of the same slope.');
  }
  if (input.seismic) {
    notes.push('Seismic: one case per direction for the bin full (with the solid at psi_2 in the seismic combinations) and one for the bin empty (G + A_E,0), for uplift; the equivalent static coefficient is the engineer\'s.');
  }

  const [firstPair] = pairs;
  return {
    cases,
    edges,
    combinations,
    profiles,
    totals: { solidWeight, structureWeight, roofDeadLoad: roofDead, permanentEquipment },
    derivation,
    classification: {
      slenderness,
      actionAssessmentClass: aac,
      hopperKind,
      hopper: pairs.some((p) => p.pressures.kind === 'shallow') || !firstPair ? 'shallow' : 'steep',
      hopperFaces: pairs.map((p) => ({ faces: p.faces.map((f) => f.edge), slope: p.slope, kind: p.pressures.kind })),
      thinWalled,
    },
    notes,
  };
}

/**
 * The seismic design situation of the empty bin (EN 1990 6.4.3.4 (6.12b)): G + A_E,0 + psi_2 Q for
 * the variable actions other than the solid and wind, one per direction, numbered after the
 * seismic combinations of combineActions and placed after the last ultimate one.
 */
function withEmptySeismic(combinations: LoadCombination[], emptyCases: string[], permanent: string[], groups: VariableGroup[], psi: Partial<Record<VariableAction, { psi0: number; psi1: number; psi2: number }>> | undefined): LoadCombination[] {
  if (emptyCases.length === 0) return combinations;
  let count = combinations.filter((c) => c.verification === 'seismic').length;
  const extra: LoadCombination[] = emptyCases.map((name) => {
    const factors: Record<string, number> = {};
    for (const p of permanent) factors[p] = 1;
    factors[name] = 1;
    for (const group of groups) {
      if (group.action === 'solid' || group.action === 'wind') continue;
      const psi2 = psi?.[group.action]?.psi2 ?? DEFAULT_PSI[group.action].psi2;
      if (psi2 === 0) continue;
      for (const c of group.alternatives[0]?.cases ?? []) factors[c] = psi2;
    }
    count += 1;
    return {
      name: `SEIS-${count}`,
      limitState: 'ULS',
      expression: Object.entries(factors).map(([n, f]) => `${f.toFixed(2)} ${n}`).join(' + '),
      factors,
      clause: `EN 1990 6.4.3.4 (6.12b): seismic action ${name}, bin empty (uplift)`,
      verification: 'seismic',
      leading: name,
    };
  });
  let lastUls = -1;
  combinations.forEach((c, i) => {
    if (c.limitState === 'ULS') lastUls = i;
  });
  const at = lastUls + 1;
  return [...combinations.slice(0, at), ...extra, ...combinations.slice(at)];
}
