/** One step of a derivation, kept for the calculation report (value in SI units). */
export interface DerivationStep {
  symbol: string;
  description: string;
  expression: string;
  value: number;
  unit: string;
  clause: string;
}

/**
 * A load case expressed on the support line: line loads per unit length of a circle of radius
 * `lineRadius` (the line of action), at the level of the transition.
 * Vertical: downward positive. Radial: toward the bin axis positive (puts a ring in compression).
 */
export interface SupportLineCase {
  name: string;
  description: string;
  kind: 'permanent' | 'variable';
  lineRadius: number;
  verticalLineLoad: number;
  radialLineLoad: number;
  /** Resultant vertical force, N (verticalLineLoad x 2 pi lineRadius). */
  verticalResultant: number;
}

export interface PressureProfile {
  case: string;
  part: 'wall' | 'hopper';
  z: number[];
  ph: number[];
  pw: number[];
  pv: number[];
}

export interface LoadCombination {
  name: string;
  limitState: 'ULS' | 'SLS';
  expression: string;
  factors: Record<string, number>;
  clause: string;
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
  };
  derivation: DerivationStep[];
}
