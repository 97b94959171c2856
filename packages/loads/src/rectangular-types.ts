import type { StoredSolidInput, RoofInput, SnowInput, WindInput, SeismicInput } from './circular.js';
import type { ActionAssessmentClass } from './classification.js';
import type { PartialFactors } from './combinations.js';
import type { ActionKind, DerivationStep, LoadCombination, PressureProfile } from './types.js';

/**
 * Plan axes of a rectangular bin: origin at the inner south-west corner, X along lengthX, Y along
 * lengthY, Z up (DESIGN.md). The four walls, and the four edges of the support line beneath them,
 * are named by the side of the plan they lie on: south (y = 0), east (x = lengthX), north
 * (y = lengthY), west (x = 0).
 */
export type EdgeName = 'south' | 'east' | 'north' | 'west';

/** A pyramidal hopper: four plane sloping faces, a rectangular outlet centred under the box. */
export interface PyramidHopper {
  kind: 'pyramid';
  /** Vertical height of the hopper from the outlet to the transition, m. */
  height: number;
  /** Outlet lengths along X and Y, m (below bin.lengthX and bin.lengthY). */
  outletLengthX: number;
  outletLengthY: number;
  thickness: number;
  /** Hopper bottom load magnifier C_b (EN 1991-4 6.1.2); default 1.3 in AAC 1 or for a solid prone to dynamic behaviour, else 1.0. */
  bottomLoadMagnifier?: number;
}

/**
 * A wedge (plane-flow) hopper: two plane sloping faces and two vertical end walls, the outlet a slot
 * that runs the full length of the box. `slotAlong` sets the direction:
 * - 'x': the slot runs along X (length bin.lengthX, width outletWidth across it, centred in Y); the
 *   sloping faces hang from the south and north edges, the vertical end walls from the east and west edges;
 * - 'y': the slot runs along Y; the sloping faces hang from the east and west edges, the end walls
 *   from the south and north edges.
 */
export interface WedgeHopper {
  kind: 'wedge';
  slotAlong: 'x' | 'y';
  /** Vertical height of the hopper from the slot to the transition, m. */
  height: number;
  /** Width of the slot across its length, m (below the side of the box across the slot). */
  outletWidth: number;
  thickness: number;
  /** Hopper bottom load magnifier C_b (EN 1991-4 6.1.2); default as for the pyramid. */
  bottomLoadMagnifier?: number;
}

export type RectangularHopper = PyramidHopper | WedgeHopper;

/** A rectangular bin: a box of internal plan lengthX x lengthY on a pyramidal or wedge hopper (SI units). */
export interface RectangularBin {
  lengthX: number;
  lengthY: number;
  /** Height of the vertical walls above the transition, m. */
  cylinderHeight: number;
  /** Height of the equivalent (level) solid surface above the transition, m. */
  fillHeight: number;
  wallThickness: number;
  hopper: RectangularHopper;
  steelDensity: number;
  /** 'level' (default) or a ridge 'pile' across the shorter side: h_o = (d_c/4) tan(phi_r). */
  topSurface?: 'level' | 'pile';
  /** Action assessment class chosen by the engineer; may raise, never lower, the class of Table 2.1. */
  actionAssessmentClass?: ActionAssessmentClass;
}

/** A load on the roof at a plan position (the plan axes above), N downward. */
export interface PlanEquipmentLoad {
  name: string;
  x: number;
  y: number;
  force: number;
  /** 'permanent' (default) or 'variable' (EN 1990 category E, psi 1.0/0.9/0.8). */
  kind?: 'permanent' | 'variable';
}

export interface RectangularBinLoadInput {
  bin: RectangularBin;
  solid: StoredSolidInput;
  partialFactors: PartialFactors;
  /** Roof dead and imposed load on plan, Pa, over the outer plan (lengthX + 2 t) x (lengthY + 2 t); pitch of the roof slopes. */
  roof?: RoofInput;
  equipment?: PlanEquipmentLoad[];
  snow?: SnowInput;
  /**
   * Wind on the box (EN 1991-1-4 7.6). `directions` are the directions toward which the wind blows,
   * normal to a pair of walls: 0, 90, 180 or 270 degrees (in rad) from +X; default all four.
   */
  wind?: WindInput;
  /** Equivalent static seismic action; any directions (rad from +X), default 0, 90, 180, 270 degrees. */
  seismic?: SeismicInput;
  /** Stations per edge for the line-load tables (default 41). */
  stationsPerEdge?: number;
  /** Points in each pressure profile (default 41). */
  profilePoints?: number;
}

/**
 * Line loads along one edge of the support line of a rectangular bin, at stations s from the edge's
 * start corner (the edges run counter-clockwise seen from above: south +X, east +Y, north -X, west -Y).
 * The support line is the rectangle of the internal plan, beneath the walls. N/m, what the bin puts
 * on the girder:
 * - vertical: downward positive;
 * - inward: horizontal, normal to the edge, toward the inside of the bin positive (the hoppers' pull);
 * - along: horizontal, tangential to the edge, positive in the edge's direction (counter-clockwise):
 *   the membrane shear of the walls that carries base shear down.
 */
export interface EdgeLoad {
  case: string;
  edge: EdgeName;
  /** Start and end corners of the edge on plan, m. */
  start: { x: number; y: number };
  end: { x: number; y: number };
  s: number[];
  vertical: number[];
  inward: number[];
  along: number[];
  /** Resultant vertical force on the edge, N (exact, from the statics of the case). */
  verticalResultant: number;
}

/** A load case of a rectangular bin, its metadata; the line loads are in `edges` under the same name. */
export interface RectangularLoadCase {
  name: string;
  description: string;
  /**
   * EN 1990 4.1.1 classification by variation in time: permanent G, variable Q, accidental A (the
   * seismic action A_E is here; its combinations are those of the seismic design situation, 6.4.3.4).
   */
  kind: 'permanent' | 'variable' | 'accidental';
  action: ActionKind;
  /** Resultant vertical force on the support line, N (0 for a case that only overturns). */
  verticalResultant: number;
  /** Horizontal resultant the case puts on the support line (base shear), N, global X and Y. */
  horizontalResultant?: { x: number; y: number };
  /**
   * Overturning moment about the support level, N m, as a vector in plan, in the convention of the
   * circular bin's SupportLineCase: a moment that presses the support line down toward direction theta
   * is M (sin theta, -cos theta), i.e. (My', -Mx') with Mx' = integral n x_r ds and My' = integral n y_r ds
   * the first moments of the vertical line load about the centroid. (By the right-hand rule the moment
   * of the wind about the base is the opposite vector: this is the moment of the support's reaction
   * on the bin.)
   */
  overturningMoment?: { x: number; y: number };
  /** Clause or rule of the distribution along the edges. */
  distribution: string;
}

/** A pressure profile; hopper profiles name the faces they belong to. */
export interface RectangularPressureProfile extends PressureProfile {
  faces?: EdgeName[];
}

export interface HopperFaceClass {
  faces: EdgeName[];
  /** Slope of the faces from the vertical beta, rad. */
  slope: number;
  kind: 'steep' | 'shallow';
}

export interface RectangularLoadSet {
  cases: RectangularLoadCase[];
  edges: EdgeLoad[];
  combinations: LoadCombination[];
  profiles: RectangularPressureProfile[];
  totals: {
    /** Weight of the stored solid, N. */
    solidWeight: number;
    /** Weight of the bin's plates, N. */
    structureWeight: number;
    /** Roof dead load carried by the support line, N (0 if no roof is given). */
    roofDeadLoad: number;
    /** Permanent equipment on the bin, N. */
    permanentEquipment: number;
  };
  derivation: DerivationStep[];
  /** Classification of the bin (EN 1991-4 1.5, 2.5, 6.1); `hopper` is shallow if any sloping face is. */
  classification: {
    slenderness: string;
    actionAssessmentClass: ActionAssessmentClass;
    hopperKind: 'pyramid' | 'wedge';
    hopper: 'steep' | 'shallow';
    hopperFaces: HopperFaceClass[];
    thinWalled: boolean;
  };
  notes: string[];
}
