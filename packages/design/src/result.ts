// The DesignResult: plain, JSON-serialisable data and the single source of every deliverable.
// docs/output-schema.md is the contract for outside scripts; change both together and bump
// DESIGN_SCHEMA_VERSION when a stable field changes meaning.
//
// Units: SI base units throughout (N, m, Pa, kg, rad). Angles around the bin are measured from +X,
// counter-clockwise seen from above. Internal forces follow the girder package's convention: resultants
// on the face whose outward normal is the member's local +x, as right-handed vectors (N > 0 tension;
// My > 0 puts the top fibre, local +z, in tension, so a sagging girder has My < 0).

export const DESIGN_SCHEMA_VERSION = '1.0.0';

export interface ProjectInfo {
  name: string;
  client: string;
  site: string;
  reference: string;
  designer: string;
  /** Date of issue as given in the spec (kept as text so that outputs are reproducible). */
  date: string;
}

/** One step of a derivation, kept so that the report can show the formula with its numbers. */
export interface DerivationStep {
  symbol: string;
  description: string;
  expression: string;
  value: number;
  /** SI unit of `value` (e.g. 'm', 'Pa', 'N/m', '-'). */
  unit: string;
  clause: string;
}

export interface LoadCaseSummary {
  name: string;
  description: string;
  kind: 'permanent' | 'variable';
  /** Vertical line load on the support line, N/m, downward positive. */
  verticalLineLoad: number;
  /** Radial line load on the support line, N/m, positive toward the bin axis (puts a ring in compression). */
  radialLineLoad: number;
  /** Resultant vertical force of the case, N, downward positive. */
  verticalResultant: number;
}

export interface CombinationSummary {
  name: string;
  limitState: 'ULS' | 'SLS';
  /** Human-readable expression, e.g. "1.35 G + 1.50 Q_s". */
  expression: string;
  factors: Record<string, number>;
  clause: string;
}

/**
 * Pressures against depth. Deliberately declared here rather than re-exported from the loads package:
 * this file is the output contract (docs/output-schema.md), kept stable when the loads package changes.
 */
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
  /** Hopper only: height above the apex of the cone, m (EN 1991-4 6.3). */
  x?: number[];
}

export interface LoadsResult {
  cases: LoadCaseSummary[];
  combinations: CombinationSummary[];
  profiles: PressureProfile[];
  totals: {
    /** Weight of the stored solid, N. */
    solidWeight: number;
    /** Weight of the structure carried by the support line (plates and girder), N. */
    structureWeight: number;
  };
  derivation: DerivationStep[];
}

export interface ScenarioSummary {
  id: string;
  title: string;
  description: string;
  /** One sentence on what this assumption does to the answer. */
  lesson: string;
  /** Whether the design envelope includes this scenario. */
  credible: boolean;
  /** Largest utilisation of the chosen sections if this scenario alone were used (null: outside a check's scope). */
  utilisation?: number | null;
  /** True when the scenario needs tension from a bearing that a real bearing cannot give. */
  needsTension?: boolean;
  /** Largest tension in a bearing that can pull, N (0 when none pulls). */
  maxBearingTension?: number;
}

/** Internal forces around the girder for one analysis, sampled at stations. */
export interface ForceDiagram {
  /** Position of each station around the bin, rad. */
  angle: number[];
  N: number[];
  Vz: number[];
  T: number[];
  My: number[];
  Mz: number[];
  B: number[];
}

export interface AnalysisSummary {
  combination: string;
  scenario: string;
  converged: boolean;
  iterations: number;
  /** Relative residual |K u - f| / |f| of the final solve. */
  residual: number;
  /** Sum of reactions [Fx, Fy, Fz], N. */
  reactionSum: [number, number, number];
  /** Sum of applied loads [Fx, Fy, Fz], N. */
  appliedSum: [number, number, number];
  /** Largest absolute internal forces over the girder. */
  peaks: { N: number; Vz: number; T: number; My: number; Mz: number; B: number };
  /**
   * Internal forces around the girder, kept for the analyses a reader needs to see: in each scenario
   * the combination that governs the chosen section and the one with the largest torsion.
   */
  diagram?: ForceDiagram;
  /** Bearing state, where the scenario has bearing points. */
  bearings?: {
    /** Fraction of the bearing points in contact (pressing). */
    contactFraction: number;
    /** Largest compression in one bearing point, N. */
    maxCompression: number;
    /** Largest tension in one bearing point, N (bonded bearings only; 0 if none). */
    maxTension: number;
    /** Forces of the bearing points of the most loaded column (or bearing node on a slab), N, in order across the flange from inside to outside. */
    mostLoadedColumn: { group: string; forces: number[] };
  };
}

export interface Position {
  element: string;
  /** Distance from the element's first node, m. */
  x: number;
  /** Angle around the bin, rad. */
  angle: number;
  description: string;
}

export interface GoverningCase {
  check: string;
  title: string;
  clause: string;
  combination: string;
  scenario: string;
  position: Position;
  inputs: Record<string, number>;
  intermediate: Record<string, number>;
}

export interface MemberResult {
  id: string;
  description: string;
  section: string;
  grade: string;
  /** Total length of the member group, m. */
  length: number;
  /** Mass, kg. */
  mass: number;
  /** Mass per metre, kg/m. */
  massPerLength: number;
  /** Largest utilisation; null only in an infeasible design whose best attempt has no resistance left (or lies outside a check's scope). */
  utilisation: number | null;
  governing: GoverningCase;
}

export interface UtilisationRow {
  member: string;
  section: string;
  check: string;
  clause: string;
  combination: string;
  scenario: string;
  position: Position;
  /** null when the check is outside its scope for this section (see `note`). */
  utilisation: number | null;
  /** What the check is, in words. */
  title?: string;
  /** The check's inputs (SI), as named in its clause. */
  inputs?: Record<string, number>;
  /** The check's intermediate values (SI), as named in its clause. */
  intermediate?: Record<string, number>;
  /** Out-of-scope reason, or advice that follows from the result (e.g. "web stiffener needed"). */
  note?: string;
}

export interface OptimisationStep {
  iteration: number;
  choice: Record<string, string>;
  mass: number;
  /** Largest utilisation under the section's own forces; null when a check is outside its scope (e.g. a class 4 section). */
  maxUtilisation: number | null;
  /** Why a step was not taken further (e.g. a candidate that passes under a few combinations but cannot be cheaper). */
  note?: string;
}

export interface OptimisationSummary {
  status: 'optimal' | 'feasible' | 'infeasible';
  /** 'mass' when every price factor is 1 and a distinct section costs nothing; 'cost' otherwise. */
  objective: 'mass' | 'cost';
  /**
   * Value of the objective for the chosen design: sum of mass x price per kg of its grade, plus the
   * cost per distinct section times the number of distinct (section, grade) pairs (see `cost`).
   */
  objectiveValue?: number;
  /** The cost model of the integer program (DesignOptions, with their defaults). */
  cost?: {
    /** Price per kg of each grade allowed (relative units unless the user gives money). */
    pricePerKg: Record<string, number>;
    costPerDistinctSection: number;
    /** At most this many distinct (section, grade) pairs over the member groups; null: no cap. */
    maxDistinctSections: number | null;
    grades: string[];
  };
  /** Candidates offered to the integer program: (girder sections + column sections) x grades. */
  candidates: number;
  /** Girder candidates (section x grade) that passed under the forces of the last round (checked lightest first per grade; heavier ones are dominated and left unchecked). */
  feasibleCandidates: number;
  iterations: OptimisationStep[];
  converged: boolean;
  message: string;
  /**
   * Present when the chosen column differs from support.columnSection, whose axial stiffness the
   * girder model uses: the chosen pair analysed again with the chosen column's own stiffness. When
   * that pair fails and the model's column passes, the design keeps the model's column (`kept`).
   */
  columnStiffness?: { modelColumn: string; chosenColumn: string; girderUtilisation: number | null; columnUtilisation: number | null; kept: string };
  /**
   * Present when the column stiffness was iterated (the first design chose a column other than
   * support.columnSection): one entry per whole design, with the column in its girder model, the
   * column the integer program chose and the column the design kept (`column`); a round that could
   * not be designed is `failed` with its `message`, and the earlier rounds stand; a round that chose
   * another column is `superseded` (its sizing only: objective and steel of its choice). The result
   * is the round whose chosen column is its model's, or, without one, the least-cost round verified
   * with the stiffness it has.
   */
  columnRounds?: Array<{ modelColumn: string; chosenColumn: string | null; column: string | null; status: 'verified' | 'infeasible' | 'failed' | 'superseded'; objectiveValue: number | null; steelMass: number | null; message?: string }>;
}

/** Serviceability settings and information (the checks themselves are rows of `utilisations`). */
export interface ServiceabilitySummary {
  /** The SLS characteristic combinations analysed in the credible scenarios. */
  combinations: string[];
  /** Deflection limit between columns: span / this ratio. */
  deflectionLimitRatio: number;
  /** Twist limit, rad. */
  twistLimit: number;
  /** Largest settlement of the girder on its bearing, m (information only; for a slab the only deflection measure). */
  maxSettlement: { value: number; combination: string; scenario: string } | null;
}

export interface DesignResult {
  schemaVersion: string;
  tool: { name: string; version: string };
  project: ProjectInfo;
  status: 'verified' | 'infeasible';
  cautions: string[];
  /** The validated specification in SI units, as used by the design. */
  input: unknown;
  bin: {
    diameter: number;
    cylinderHeight: number;
    hopperHeight: number;
    apexHalfAngle: number;
    solid: string;
  };
  girder: {
    kind: 'ring';
    /** 'columns' or 'slab' (then `columns` is 1 and `spanAngle` the full circle). */
    support: 'columns' | 'slab';
    radius: number;
    columns: number;
    segments: number;
    spanAngle: number;
  };
  loads: LoadsResult;
  scenarios: ScenarioSummary[];
  analyses: AnalysisSummary[];
  members: MemberResult[];
  utilisations: UtilisationRow[];
  optimisation: OptimisationSummary;
  /** Total steel mass of all member groups (girder and columns), kg. */
  totals: { steelMass: number };
  serviceability?: ServiceabilitySummary;
  /** What the guards measured; a guard that fails stops the design instead (no result is written). */
  guards?: GuardReport;
}

/** The guards of the design (guards.ts) and what each measured. */
export interface GuardReport {
  /** Reactions against applied loads in every analysis, relative to the applied load. */
  equilibrium: { analyses: number; largestImbalance: number; tolerance: number };
  /** Compression-only bearings: tension or stretching in contact, and pressing while lifted off, relative to the analysis's largest force / elongation. */
  contact: { analyses: number; compressionOnlySprings: number; largestTension: number; largestPenetration: number; tolerance: number };
  /** The chosen design analysed afresh (nothing cached) against the utilisations reported. */
  /** Utilisations are null when beyond a resistance or outside a check's scope (as elsewhere in design.json). */
  reanalysis: { girderUtilisation: number | null; freshGirderUtilisation: number | null; columnUtilisation: number | null; freshColumnUtilisation: number | null; relativeDifference: number; tolerance: number };
  /** The governing check of the girder with twice the segments per span. */
  meshConvergence: {
    check: string;
    combination: string;
    scenario: string;
    segmentsPerSpan: number;
    refinedSegmentsPerSpan: number;
    utilisation: number | null;
    refinedUtilisation: number | null;
    relativeChange: number;
    tolerance: number;
  };
}
