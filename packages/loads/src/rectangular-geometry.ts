import type { EdgeName, RectangularBin } from './rectangular-types.js';

/**
 * Geometry of a rectangular bin's hopper and support line (plan axes of rectangular-types.ts).
 * Both hopper kinds are four plane plates between the box's bottom rectangle a x b and the outlet
 * rectangle a_o x b_o, centred: a pyramid has a_o < a and b_o < b; a wedge with its slot along X has
 * a_o = a, so its east and west plates are vertical (the end walls), and likewise along Y.
 */
export interface HopperFace {
  edge: EdgeName;
  start: { x: number; y: number };
  end: { x: number; y: number };
  /** Length of the top edge L and of the outlet edge L_o of the face, m. */
  length: number;
  outletLength: number;
  /** Plan width of the face, normal to its edge: (side across - outlet across)/2, m (0 for an end wall). */
  width: number;
  /** tan of the face's slope from the vertical, width / h_h (0 for an end wall). */
  tanSlope: number;
  sloping: boolean;
  /** Plate area, m2: ((L + L_o)/2) sqrt(h_h^2 + w^2). */
  plateArea: number;
  /** Depth of the plate's centroid below the transition, m: h_h (2 L_o + L) / (3 (L + L_o)). */
  plateCentroidDepth: number;
  /** Plan area of the face's tributary (trapezoid between the hip lines), m2: w (L + L_o)/2. */
  tributaryArea: number;
}

export interface RectangularHopperGeometry {
  lengthX: number;
  lengthY: number;
  outletLengthX: number;
  outletLengthY: number;
  height: number;
  faces: HopperFace[];
  /** Volume of the hopper (prismatoid rule), m3. */
  volume: number;
  /** Depth of the hopper volume's centroid below the transition, m. */
  volumeCentroidDepth: number;
  planArea: number;
  perimeter: number;
}

/**
 * Depth of a hopper face's plan tributary at station s along an edge of length L whose outlet edge
 * (length L_o, centred) lies w inward: the hip lines run from the corners to the outlet corners, so
 * the depth rises linearly over c = (L - L_o)/2 at each end and is w in between. Its integral is the
 * trapezoid w (L + L_o)/2. The same shape, with w the hopper height, is the depth of a vertical end
 * wall of a wedge below its top edge.
 */
export function tributaryDepth(s: number, length: number, outletLength: number, width: number): number {
  const c = (length - outletLength) / 2;
  if (c <= 0) return width;
  if (s < c) return (width * s) / c;
  if (s > length - c) return (width * (length - s)) / c;
  return width;
}

/** tributaryDepth normalised to a unit integral along the edge (1/m): the shape of a face's load along its edge. */
export function faceLoadShape(s: number, length: number, outletLength: number): number {
  return tributaryDepth(s, length, outletLength, 1) / ((length + outletLength) / 2);
}

/** Outlet lengths along X and Y of either hopper kind. */
export function outletLengths(bin: RectangularBin): { x: number; y: number } {
  const h = bin.hopper;
  if (h.kind === 'pyramid') return { x: h.outletLengthX, y: h.outletLengthY };
  return h.slotAlong === 'x' ? { x: bin.lengthX, y: h.outletWidth } : { x: h.outletWidth, y: bin.lengthY };
}

export function rectangularHopperGeometry(bin: RectangularBin): RectangularHopperGeometry {
  const a = bin.lengthX;
  const b = bin.lengthY;
  const { x: ao, y: bo } = outletLengths(bin);
  const hh = bin.hopper.height;
  const wY = (b - bo) / 2;
  const wX = (a - ao) / 2;
  const face = (edge: EdgeName, start: { x: number; y: number }, end: { x: number; y: number }, length: number, outletLength: number, width: number): HopperFace => ({
    edge,
    start,
    end,
    length,
    outletLength,
    width,
    tanSlope: width / hh,
    sloping: width > 0,
    plateArea: ((length + outletLength) / 2) * Math.hypot(hh, width),
    // Centroid of a trapezoid of height h_h with parallel sides L (top) and L_o (bottom).
    plateCentroidDepth: length + outletLength > 0 ? (hh * (2 * outletLength + length)) / (3 * (length + outletLength)) : 0,
    tributaryArea: (width * (length + outletLength)) / 2,
  });
  // South and north run along X (they slope toward Y), east and west along Y (they slope toward X).
  const faces = [
    face('south', { x: 0, y: 0 }, { x: a, y: 0 }, a, ao, wY),
    face('east', { x: a, y: 0 }, { x: a, y: b }, b, bo, wX),
    face('north', { x: a, y: b }, { x: 0, y: b }, a, ao, wY),
    face('west', { x: 0, y: b }, { x: 0, y: 0 }, b, bo, wX),
  ];
  // Cross-section at height u above the outlet: A(u) = (a_o + (a - a_o) u/h)(b_o + (b - b_o) u/h), a
  // quadratic in u. The prismatoid rule (h/6)(A_1 + 4 A_m + A_2) is exact for it (frustum of a pyramid
  // with similar ends and the wedge alike), and Simpson's rule is exact for the cubic A(u) (h - u).
  const area = (u: number) => (ao + ((a - ao) * u) / hh) * (bo + ((b - bo) * u) / hh);
  const volume = (hh / 6) * (area(0) + 4 * area(hh / 2) + area(hh));
  const firstMoment = (hh / 6) * (area(0) * hh + 4 * area(hh / 2) * (hh / 2) + area(hh) * 0);
  return {
    lengthX: a,
    lengthY: b,
    outletLengthX: ao,
    outletLengthY: bo,
    height: hh,
    faces,
    volume,
    volumeCentroidDepth: volume > 0 ? firstMoment / volume : 0,
    planArea: a * b,
    perimeter: 2 * (a + b),
  };
}
