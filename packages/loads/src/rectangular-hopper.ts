import { hopperPressures, type HopperParameters, type HopperPressures } from './hopper.js';
import type { HopperFace, RectangularHopperGeometry } from './rectangular-geometry.js';

/**
 * Hopper pressures of a rectangular bin, EN 1991-4:2006 6.1-6.3 (REFERENCES.md §1, from memory; the
 * steep/shallow test (6.1) seen). The standard's expressions carry a shape coefficient S: 2 for a
 * cone or a pyramid, 1 for a wedge (plane flow). A pyramid uses hopperPressures (S = 2) of the
 * circular bin, once per pair of opposite faces with that pair's slope beta from the vertical (a
 * rectangular pyramid has two); a wedge uses the same expressions with S = 1, for its two
 * sloping faces. In both, x is measured up from the apex of the full hopper: for a face pair whose
 * side across is B at the transition and B_o at the outlet, h_h = (B/2)/tan(beta) and x_o = (B_o/2)/tan(beta).
 */

/** The pressures of one pair of opposite sloping faces, and the faces they belong to. */
export interface FacePairPressures {
  faces: HopperFace[];
  /** Slope of the faces from the vertical beta, rad. */
  slope: number;
  shapeFactor: 1 | 2;
  pressures: HopperPressures;
}

/** Solid properties and transition stress for the hopper (maximum hopper load set, EN 1991-4 Table 3.1). */
export interface HopperSolid {
  unitWeight: number;
  lateralPressureRatio: number;
  wallFrictionCoefficient: number;
  internalFrictionAngle: number;
  transitionStress: number;
}

/**
 * Pressures per pair of sloping faces: pyramid, both pairs with S = 2 (hopperPressures); wedge, its
 * sloping pair with S = 1. The half-sides across a pair play the part of the cone's radii.
 */
export function rectangularHopperPressures(geometry: RectangularHopperGeometry, kind: 'pyramid' | 'wedge', solid: HopperSolid): FacePairPressures[] {
  const pairs: Array<{ faces: HopperFace[]; across: number; outletAcross: number }> = [];
  const alongX = geometry.faces.filter((f) => (f.edge === 'south' || f.edge === 'north') && f.sloping);
  const alongY = geometry.faces.filter((f) => (f.edge === 'east' || f.edge === 'west') && f.sloping);
  if (alongX.length > 0) pairs.push({ faces: alongX, across: geometry.lengthY, outletAcross: geometry.outletLengthY });
  if (alongY.length > 0) pairs.push({ faces: alongY, across: geometry.lengthX, outletAcross: geometry.outletLengthX });
  return pairs.map(({ faces, across, outletAcross }) => {
    const slope = Math.atan(faces[0]?.tanSlope ?? Number.NaN);
    const params: HopperParameters = { ...solid, apexHalfAngle: slope, radius: across / 2, outletRadius: outletAcross / 2 };
    const shapeFactor = kind === 'wedge' ? 1 : 2;
    return { faces, slope, shapeFactor, pressures: hopperPressures(params, kind === 'wedge' ? 1 : 2) };
  });
}

/**
 * Vertical resultant of the wall tractions of all sloping faces between the outlet and the transition,
 * N, for one state: per unit height a face of horizontal length L(z) = L - (L - L_o) z/h_h carries
 * L(z) (p_n tan(beta) + p_t) (statics of the face); Simpson's rule. The vertical end walls of a wedge
 * carry nothing in the plane-flow model. Add p_v(x_o) a_o b_o for a closed outlet.
 */
export function hopperWallVerticalForce(pairs: FacePairPressures[], state: 'filling' | 'discharge', hopperHeight: number, intervals = 400): number {
  const m = intervals % 2 === 0 ? intervals : intervals + 1;
  const dz = hopperHeight / m;
  let total = 0;
  for (const pair of pairs) {
    const set = pair.pressures[state];
    const tanB = Math.tan(pair.slope);
    for (const face of pair.faces) {
      const f = (z: number) => {
        const s = set.at(Math.max(pair.pressures.coneHeight - z, 1e-6 * pair.pressures.coneHeight));
        const length = face.length - ((face.length - face.outletLength) * z) / hopperHeight;
        return length * (s.pn * tanB + s.pt);
      };
      let sum = f(0) + f(hopperHeight);
      for (let i = 1; i < m; i++) sum += (i % 2 === 1 ? 4 : 2) * f(i * dz);
      total += (sum * dz) / 3;
    }
  }
  return total;
}
