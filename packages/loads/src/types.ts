/** One step of a derivation, kept for the calculation report (value in SI units). */
export interface DerivationStep {
  symbol: string;
  description: string;
  expression: string;
  value: number;
  unit: string;
  clause: string;
}

/** One Fourier term of a line load around the support line: cos * cos(order theta) + sin * sin(order theta), N/m. */
export interface Harmonic {
  order: number;
  cos: number;
  sin: number;
}

/** What a case represents, for reports and for the choice of partial and psi factors. */
export type ActionKind = 'self-weight' | 'roof' | 'equipment' | 'solid' | 'snow' | 'wind' | 'seismic';

/**
 * A load case expressed on the support line: line loads per unit length of a circle of radius
 * `lineRadius` (the line of action), at the level of the transition.
 * Vertical: downward positive. Radial: toward the bin axis positive (puts a ring in compression).
 * Tangential: counter-clockwise seen from above positive.
 *
 * `verticalLineLoad` and `radialLineLoad` are the mean (uniform) parts; the full value at angle theta
 * (from +X, counter-clockwise seen from above) is mean + sum over the harmonics (see `lineLoadAt`).
 */
export interface SupportLineCase {
  name: string;
  description: string;
  kind: 'permanent' | 'variable';
  lineRadius: number;
  verticalLineLoad: number;
  radialLineLoad: number;
  /** Resultant vertical force, N (verticalLineLoad x 2 pi lineRadius; the harmonics add nothing to it). */
  verticalResultant: number;
  /** The action the case belongs to (self weight, solid, wind, ...). */
  action?: ActionKind;
  verticalHarmonics?: Harmonic[];
  radialHarmonics?: Harmonic[];
  /** Tangential (membrane shear) line load of the shell on the support line, N/m. */
  tangentialHarmonics?: Harmonic[];
  /** Horizontal resultant the case puts on the support line (base shear), N, global X and Y. */
  horizontalResultant?: { x: number; y: number };
  /**
   * Overturning moment of the case about the support level, N m, as a vector in plan (right-hand
   * rule): a moment that presses the support line down at theta_c is M (sin theta_c, -cos theta_c).
   */
  overturningMoment?: { x: number; y: number };
  /** Clause or derivation of the distribution around the perimeter. */
  distribution?: string;
}

export interface PressureProfile {
  case: string;
  part: 'wall' | 'hopper';
  /** Depth below the equivalent surface (wall) or below the transition (hopper), m. */
  z: number[];
  /** Wall: horizontal pressure p_h. Hopper: pressure normal to the hopper wall p_n. Pa. */
  ph: number[];
  /** Wall: frictional traction p_w. Hopper: frictional traction p_t. Pa. */
  pw: number[];
  /** Mean vertical stress in the solid, Pa. */
  pv: number[];
  /** Hopper only: height above the apex of the (full) cone x, m (EN 1991-4 6.3). */
  x?: number[];
}

/** EN 1990 verification the combination serves. */
export type Verification = 'STR' | 'EQU' | 'SLS-characteristic' | 'seismic';

export interface LoadCombination {
  name: string;
  /** EQU and seismic combinations are ultimate limit states ('ULS'); see `verification`. */
  limitState: 'ULS' | 'SLS';
  expression: string;
  factors: Record<string, number>;
  clause: string;
  verification?: Verification;
  /** Name of the leading variable action, if any. */
  leading?: string;
}

export interface LoadSet {
  cases: SupportLineCase[];
  combinations: LoadCombination[];
  profiles: PressureProfile[];
  totals: {
    /** Weight of the stored solid, N. */
    solidWeight: number;
    /** Weight of the bin's plates, N. */
    structureWeight: number;
    /** Roof dead load carried by the support line, N (0 if no roof is given). */
    roofDeadLoad?: number;
    /** Permanent equipment on the bin, N. */
    permanentEquipment?: number;
  };
  derivation: DerivationStep[];
  /** Classification of the bin (EN 1991-4 1.5, 2.5, 6.1). */
  classification?: {
    slenderness: string;
    actionAssessmentClass: 1 | 2 | 3;
    hopper: 'steep' | 'shallow';
    thinWalled: boolean;
  };
  /** Statements the report must show: assumptions and what is not covered. */
  notes?: string[];
}
