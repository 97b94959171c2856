/**
 * The girder model as plain, JSON-serialisable data. Every object is keyed by the user's string ids;
 * `numberEquations` (numbering.ts) maps those ids to equation numbers, so an id is never an index.
 *
 * Units: SI base units throughout (m, N, Pa, kg/m3, rad). Global axes: Z up, X and Y in plan.
 */

/** A 3-vector in global or element local axes, as the field that carries it says. */
export type Vec3 = [number, number, number];

/**
 * Degrees of freedom of a node, in the order used everywhere in this package: global translations,
 * global rotations (right-handed rotation vector components) and the warping freedom w = dφ/dx, the
 * rate of twist along the element axis. w is a scalar: reversing an element reverses both φ and x,
 * so dφ/dx does not change sign, and consecutive elements share it at their common node.
 * At a kink (a ring of straight segments, a polygon frame corner) sharing w assumes full warping
 * continuity between the segments: an approximation, exact for a straight line of elements. For a
 * ring of many segments the forces converge to the curved beam (ring.test.ts) and the bimoment
 * converges with the segment count; the latter is not yet checked against a curved-beam warping
 * solution. A warping release (GirderNode.warpingRelease, GirderElement.warpingRelease) gives an
 * element end its own warping freedom instead, so no bimoment passes through that joint.
 */
export const DOFS = ['ux', 'uy', 'uz', 'rx', 'ry', 'rz', 'w'] as const;
export type Dof = (typeof DOFS)[number];

/** Degrees of freedom per node (3 translations, 3 rotations, warping). */
export const DOFS_PER_NODE = 7;

/** Standard acceleration of gravity, m/s2 (3rd CGPM, 1901; ISO 80000-3). */
export const STANDARD_GRAVITY = 9.80665;

export interface GirderNode {
  id: string;
  x: number;
  y: number;
  z: number;
  /**
   * true: warping is not continuous through this node (e.g. a frame corner without warping
   * stiffeners): every element end here has its own warping freedom, free to warp (B = 0 there).
   * The node's own w is then reported as 0 and a support fixing w here has no effect.
   */
  warpingRelease?: boolean;
}

/**
 * Stiffness constants of a member section and its material.
 * Local axes: x along the member, z the strong-axis normal, y completes a right-handed set.
 */
export interface SectionStiffness {
  /** Area, m2. */
  A: number;
  /** Second moment of area about local y (strong axis; bending in the local x-z plane), m4. */
  Iy: number;
  /** Second moment of area about local z (weak axis; bending in the local x-y plane), m4. */
  Iz: number;
  /** St Venant torsion constant, m4. */
  It: number;
  /** Warping constant, m6. Zero gives St Venant torsion only (warping freedom left unused). */
  Iw: number;
  /** Young's modulus, Pa. */
  E: number;
  /** Shear modulus, Pa. */
  G: number;
  /** Mass density, kg/m3 (used for self weight). */
  density: number;
}

/**
 * A straight beam from node I to node J. Local x runs from I to J; local z is the part of `up`
 * (default global +Z) normal to x; y = z × x. An `up` parallel to x is rejected.
 */
export interface GirderElement {
  id: string;
  nodeI: string;
  nodeJ: string;
  /** Key into GirderModel.sections. */
  section: string;
  up?: Vec3;
  /** Release warping continuity at end I and/or J only (see GirderNode.warpingRelease). */
  warpingRelease?: { I?: boolean; J?: boolean };
}

/** Fixed (eliminated) degrees of freedom of one node. Several supports on one node are merged. */
export interface Support {
  node: string;
  fix: Dof[];
}

/**
 * Force–elongation law of a spring (F = −k δ is positive in compression, see PointSpring):
 * - 'bilateral': linear in tension and compression (a bonded bearing);
 * - 'compression-only': F = k max(−δ, 0), a tensionless bearing that lifts off;
 * - anchored: linear in compression and in tension up to the anchor's tension capacity (N, > 0),
 *   beyond which the tension stays at the capacity (elastic–perfectly plastic).
 * All three derive from convex energies ½kδ², ½k min(δ, 0)² and the plastic one, so the contact
 * problem is the minimum of a convex, piecewise quadratic energy.
 */
export type SpringBehaviour = 'bilateral' | 'compression-only' | { kind: 'anchored'; tensionCapacity: number };

/**
 * A translational spring acting at a point rigidly attached to a node.
 *
 * The point sits at node + offset. Its displacement along the unit vector d is
 *   δ = d · (u + θ × r) = gᵀ [u; θ],  g = [d; r × d],
 * and the spring adds k g gᵀ to the node's translations and rotations.
 *
 * Reported force F = −k δ: positive when the spring is compressed, i.e. when the point moves along
 * −d; the spring then pushes the girder along +d with the force F (at the point). A bearing under a
 * girder is a spring with d = +Z: F > 0 is bearing pressure, F < 0 would be tension (lift-off).
 */
export interface PointSpring {
  id: string;
  node: string;
  /** Unit vector, global axes. */
  direction: Vec3;
  /** N/m, positive. */
  stiffness: number;
  /** Global vector from the node to the point where the spring acts, m. Default: the node itself. */
  offset?: Vec3;
  /** Default 'bilateral'. */
  behaviour?: SpringBehaviour;
  /** Bearing line the spring belongs to (e.g. 'inner edge'); results summarise contact per group. */
  group?: string;
  /** Length of bearing line the spring stands for, m; contact pressure per length = F / tributaryLength. */
  tributaryLength?: number;
}

/**
 * A uniform line load over the whole length of an element, global components, N/m.
 * The line of action lies at `offset` (global vector, m) from the centroid axis; this adds the
 * uniform distributed moment m = offset × q (N·m/m), including the distributed torque about x.
 */
export interface ElementLineLoad {
  element: string;
  q: Vec3;
  offset?: Vec3;
}

/** Force (N) and moment (N·m) applied at a node, global components. */
export interface NodalLoad {
  node: string;
  force: Vec3;
  moment?: Vec3;
}

/**
 * A load case. Self weight q = −ρ A g Ẑ on every element is added with `selfWeightFactor`
 * (default 0: a case carries self weight only when it says so, e.g. 1 for the permanent case).
 */
export interface LoadCase {
  name: string;
  lineLoads: ElementLineLoad[];
  nodalLoads: NodalLoad[];
  selfWeightFactor?: number;
}

/** A linear combination of load cases: factor per load case name (missing cases count 0). */
export interface Combination {
  name: string;
  factors: Record<string, number>;
}

export interface GirderModel {
  nodes: GirderNode[];
  elements: GirderElement[];
  sections: Record<string, SectionStiffness>;
  supports: Support[];
  springs: PointSpring[];
  loadCases: LoadCase[];
}
