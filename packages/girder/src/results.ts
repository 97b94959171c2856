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
}

/** Internal resultants at a station of an element; sign convention at StationResultants. */
export interface Station extends StationResultants {
  element: string;
}

export interface AnalysisResult {
  combination: string;
  converged: boolean;
  /** Solves performed: 1 for the linear model. */
  iterations: number;
  /** |K u − f| / |f| of the final solve. */
  residual: number;
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
}
