import type { EdgeName } from './rectangular-types.js';

/**
 * Load transfer to the support line of a rectangular bin by beam theory of the walls: the four walls
 * of uniform thickness t form a thin-walled rectangular tube (the support line, a x b, is its
 * centre-line rectangle; a along X, b along Y). Plane sections remain plane (Navier) and the shear
 * flow follows from equilibrium of a wall element, dq/ds = -(V/I) t r(s) (Timoshenko and Gere,
 * Mechanics of Materials, shear stresses in thin-walled sections; Megson, Aircraft Structures,
 * closed sections). Both hold for a tube that is long against its width; in a squat box shear lag
 * makes the corners carry more (not modelled).
 *
 * Per unit wall thickness (the line loads are stress times t, so t cancels):
 * - I_y = integral of x_r^2 ds = a^3/6 + b a^2/2, about the centroidal axis parallel to Y (bending
 *   under wind along X): the two walls along X (length a, parallel to that wind) give 2 a^3/12, the
 *   two along Y (length b, at x_r = +-a/2) give 2 b a^2/4. With d the side along the wind and w the
 *   side across it, I = t (d^3/6 + w d^2/2).
 * - I_x = b^3/6 + a b^2/2 likewise.
 */
export interface TubeProperties {
  lengthX: number;
  lengthY: number;
  perimeter: number;
  /** Second moments of the wall line per unit thickness, m3. */
  Iy: number;
  Ix: number;
}

export function tubeProperties(lengthX: number, lengthY: number): TubeProperties {
  const a = lengthX;
  const b = lengthY;
  return { lengthX: a, lengthY: b, perimeter: 2 * (a + b), Iy: (a * a * a) / 6 + (b * a * a) / 2, Ix: (b * b * b) / 6 + (a * b * b) / 2 };
}

/** Plan position of station s along an edge (edges counter-clockwise from the south-west corner). */
export function edgePoint(edge: EdgeName, s: number, lengthX: number, lengthY: number): { x: number; y: number } {
  switch (edge) {
    case 'south':
      return { x: s, y: 0 };
    case 'east':
      return { x: lengthX, y: s };
    case 'north':
      return { x: lengthX - s, y: lengthY };
    case 'west':
      return { x: 0, y: lengthY - s };
  }
}

/** Unit vector of an edge's direction (counter-clockwise). */
export function edgeDirection(edge: EdgeName): { x: number; y: number } {
  switch (edge) {
    case 'south':
      return { x: 1, y: 0 };
    case 'east':
      return { x: 0, y: 1 };
    case 'north':
      return { x: -1, y: 0 };
    case 'west':
      return { x: 0, y: -1 };
  }
}

export function edgeLength(edge: EdgeName, lengthX: number, lengthY: number): number {
  return edge === 'south' || edge === 'north' ? lengthX : lengthY;
}

/**
 * Vertical line load (downward positive, N/m) at plan point (x, y) of the support line from an
 * overturning moment given by its first moments about the centroid: Mx' = integral n x_r ds presses
 * the +X side down, My' = integral n y_r ds the +Y side (a moment M pressing down toward theta has
 * Mx' = M cos theta, My' = M sin theta). Navier: n = Mx' x_r / I_y + My' y_r / I_x. Its integral round
 * the perimeter is zero and its first moments are Mx' and My' (the section is doubly symmetric, so
 * the product moment is zero).
 */
export function bendingLineLoad(tube: TubeProperties, momentX: number, momentY: number, x: number, y: number): number {
  const xr = x - tube.lengthX / 2;
  const yr = y - tube.lengthY / 2;
  return (momentX * xr) / tube.Iy + (momentY * yr) / tube.Ix;
}

/**
 * Tangential line load along an edge (N/m, positive in the edge's counter-clockwise direction) that
 * carries a base shear (Hx, Hy) from the walls into the support line: the shear flow of the closed,
 * doubly symmetric tube, zero where the axis of symmetry parallel to the shear cuts the walls.
 * Shear Hx along X, with q_c = Hx a b / (4 I_y) at the corners:
 * - south: q_c + (Hx / I_y)(a^2/8 - x_r^2/2); north: the negative (its direction is -X), so both carry Hx/2 toward +X;
 * - east and west: -2 q_c y_r / b (linear, zero at mid-wall, no resultant).
 * Shear Hy along Y likewise with the roles of the walls exchanged. The shear passes through the
 * centroid (the shear centre, by symmetry): no torque.
 */
export function shearFlowLineLoad(tube: TubeProperties, shearX: number, shearY: number, edge: EdgeName, x: number, y: number): number {
  const a = tube.lengthX;
  const b = tube.lengthY;
  const xr = x - a / 2;
  const yr = y - b / 2;
  const qcX = (shearX * a * b) / (4 * tube.Iy);
  const qcY = (shearY * a * b) / (4 * tube.Ix);
  const webX = qcX + (shearX / tube.Iy) * ((a * a) / 8 - (xr * xr) / 2);
  const webY = qcY + (shearY / tube.Ix) * ((b * b) / 8 - (yr * yr) / 2);
  switch (edge) {
    case 'south':
      return webX + (2 * qcY * xr) / a;
    case 'north':
      return -webX + (2 * qcY * xr) / a;
    case 'east':
      return webY - (2 * qcX * yr) / b;
    case 'west':
      return -webY - (2 * qcX * yr) / b;
  }
}
