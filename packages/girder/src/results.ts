/**
 * Result of the analysis of one combination: plain, JSON-serialisable data in SI base units.
 * Displacements, reactions and sums are in global axes; stations in element local axes.
 */
import type { StationResultants } from './element.js';
import type { Vec3 } from './model.js';

/**
 * Node displacements (m) and rotations (rad), global; w = dφ/dx (rad/m) along the elements (0 at a
 * node where no element has warping stiffness: there w is not an unknown, see numbering.ts).
 */
export interface NodeDisplacement {
  node: string;
  ux: number;
  uy: number;
  uz: number;
  rx: number;
  ry: number;
  rz: number;
  w: number;
}

/**
 * Reaction of the fixed freedoms of a supported node: the force (N) and moment (N·m) the support
 * applies to the girder, global, and the bimoment (N·m²), the generalised force conjugate to w.
 * Components of freedoms that are not fixed are 0.
 */
export interface SupportReaction {
  node: string;
  force: Vec3;
  moment: Vec3;
  bimoment: number;
}

/**
 * Spring force, N: positive in compression (the spring pushes the girder along +direction), see
 * PointSpring. `elongation` (m) is the displacement of the point of action along +direction.
 */
export interface SpringForce {
  id: string;
  force: number;
  elongation: number;
  /** 'open': lifted off (no force); 'elastic'; 'at-capacity': an anchor at its tension capacity. */
  state: 'open' | 'elastic' | 'at-capacity';
}

/** A run of consecutive springs of a group (model order) that are not in contact. */
export interface LiftOffZone {
  from: string;
  to: string;
}

/** Contact along one bearing line (springs sharing PointSpring.group), in model order. */
export interface BearingGroupContact {
  group: string;
  /** Springs in the group. */
  springs: number;
  /** Springs carrying compression (F > 0). */
  inContact: number;
  /** inContact / springs. */
  contactFraction: number;
  /** Σ tributaryLength of the springs in contact, m (springs without one count 0). */
  contactLength: number;
  /** Largest F / tributaryLength, N/m (0 when no spring of the group has a tributary length). */
  maxPressure: number;
  /**
   * Runs of springs not in contact. A run that wraps past the last spring of a closed bearing line
   * is reported as two runs (one at each end of the list).
   */
  liftOffZones: LiftOffZone[];
}

export interface ContactSummary {
  /** Ids of springs that carry force in the solution (not open), model order. */
  activeSprings: string[];
  /** Linear solves of the contact iteration. */
  iterations: number;
  /** True when the plain active-set iteration cycled or met a mechanism and the globalised method finished. */
  globalised: boolean;
  groups: BearingGroupContact[];
  /**
   * Bilateral springs in tension: force a real bearing plate cannot give (it would lift off);
   * flags a bonded or line-support scenario whose result relies on tension.
   */
  tensionInBilateral: { id: string; force: number }[];
  /** Anchored springs at their tension capacity. */
  anchorsAtCapacity: string[];
}

/** Internal resultants at a station of an element; sign convention at StationResultants. */
export interface Station extends StationResultants {
  element: string;
}

export interface AnalysisResult {
  combination: string;
  converged: boolean;
  /** Linear solves performed: 1 for a linear model, the contact iterations otherwise. */
  iterations: number;
  /** |K u − f| / |f| of the final solve (information: it grows with the condition number). */
  residual: number;
  /** Normwise backward error ‖K u − f‖ / (‖K‖ ‖u‖ + ‖f‖) of the final solve (solve.ts), the accepted measure. */
  backwardError: number;
  displacements: NodeDisplacement[];
  reactions: SupportReaction[];
  springForces: SpringForce[];
  /** Sum of applied forces, N, global. */
  appliedSum: Vec3;
  /**
   * Sum of the forces that fixed supports and springs apply to the girder, N, global. Equilibrium:
   * reactionSum = −appliedSum.
   */
  reactionSum: Vec3;
  stations: Station[];
  /** Contact state and bearing summary; present when the model has springs. */
  contact?: ContactSummary;
}
