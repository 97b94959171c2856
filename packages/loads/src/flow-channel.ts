/**
 * Large-eccentricity discharge from a slender circular silo: the flow-channel model of
 * EN 1991-4:2006 5.2.4 (5.2.4.1 general, 5.2.4.3.1 flow channel geometry, 5.2.4.3.2 wall pressures;
 * the AAC 3 procedure). Clause numbers and every expression below are as we recall them: none was
 * confirmed against the text of the standard (from memory), except where a line says "geometry",
 * which is plane geometry of two intersecting circles and is checked numerically in the tests.
 *
 * The solid flows in a channel whose cross-section is the part of a circle of radius r_c (centre at
 * e_c from the silo axis, toward the outlet) that lies inside the silo of radius r. The channel
 * touches the wall over the arc 2 theta_c r; its interface with the static solid is the arc of the
 * channel circle inside the silo.
 *
 * - r_c = G r with G = 0.25, 0.4 and 0.6, each a load case (5.2.4.3.1(3), from memory);
 * - e_c = r (eta (1 - G) + (1 - sqrt G)), eta = mu / tan(phi_i) (5.2.4.3.1, from memory);
 * - cos theta_c = (r^2 + e_c^2 - r_c^2) / (2 r e_c) (geometry);
 * - cos psi = (r^2 - e_c^2 - r_c^2) / (2 e_c r_c): psi is the angle at the channel centre between the
 *   direction away from the silo axis and the intersection point (geometry), so the interface arc is
 *   U_sc = 2 (pi - psi) r_c (geometry; written 2 psi r_c in some recollections, which is the arc
 *   outside the silo);
 * - U_wc = 2 theta_c r (geometry);
 * - A_c = (pi - psi) r_c^2 + theta_c r^2 - r r_c sin(psi - theta_c) (geometry: two sectors less the
 *   two triangles O-C-P);
 * - in the channel zone (|theta - theta_e| < theta_c) a Janssen state with its own characteristic
 *   depth: z_oc = (1/K) A_c / (U_wc mu + U_sc tan(phi_i)), p_hco = gamma K z_oc,
 *   p_hce = p_hco (1 - exp(-z / z_oc)), p_wce = mu p_hce (5.2.4.3.2, from memory);
 * - in the two adjacent zones (theta_c <= |theta - theta_e| < 2 theta_c, width theta_c each side, from
 *   memory) p_hae = 2 p_hf - p_hce, p_wae = mu p_hae (5.2.4.3.2, from memory);
 * - elsewhere the filling pressures p_hf, p_wf.
 *
 * The width theta_c of each adjacent zone is what makes p_hae = 2 p_hf - p_hce consistent: the
 * reduction over the channel zone (2 theta_c) is then exactly the increase over the adjacent zones
 * (2 x theta_c), so the mean pressure round the wall at every level is the filling pressure [derived].
 */
import { LoadsError } from './errors.js';

/** Ratios G = r_c / r of the three flow channels to be checked (EN 1991-4 5.2.4.3.1(3), from memory). */
export const FLOW_CHANNEL_RADIUS_RATIOS = [0.25, 0.4, 0.6] as const;

export interface FlowChannelGeometry {
  /** Silo radius r, m. */
  radius: number;
  /** G = r_c / r. */
  radiusRatio: number;
  /** Flow channel radius r_c, m. */
  channelRadius: number;
  /** eta = mu / tan(phi_i). */
  eta: number;
  /** Distance of the channel centre from the silo axis e_c, m. */
  eccentricity: number;
  /** Half-angle of the wall contact theta_c, rad (at the silo axis). */
  wallContactHalfAngle: number;
  /** psi, rad: angle at the channel centre from the outward direction to the intersection point. */
  psi: number;
  /** Wall contact arc U_wc = 2 theta_c r, m. */
  wallContactArc: number;
  /** Interface with the static solid U_sc = 2 (pi - psi) r_c, m. */
  interfaceArc: number;
  /** Plan area of the channel (inside the silo) A_c, m2. */
  area: number;
}

/**
 * Range of eta for which the channel circle of ratio G cuts the wall: r - r_c < e_c < r + r_c gives
 * sqrt(G) / (1 + sqrt(G)) < eta < (G + sqrt(G)) / (1 - G) [derived from the e_c expression above].
 */
export function flowChannelEtaRange(radiusRatio: number): { lower: number; upper: number } {
  const s = Math.sqrt(radiusRatio);
  return { lower: s / (1 + s), upper: (radiusRatio + s) / (1 - radiusRatio) };
}

/** e_c = r (eta (1 - G) + (1 - sqrt G)) (EN 1991-4 5.2.4.3.1, from memory). */
export function flowChannelEccentricity(radius: number, radiusRatio: number, eta: number): number {
  return radius * (eta * (1 - radiusRatio) + (1 - Math.sqrt(radiusRatio)));
}

/**
 * Geometry of the flow channel of ratio G in a silo of radius r; undefined when the channel circle
 * does not cut the wall (then the model has no wall contact zone: the caller refuses the bin).
 */
export function flowChannelGeometry(radius: number, radiusRatio: number, eta: number): FlowChannelGeometry | undefined {
  const r = radius;
  const rc = radiusRatio * r;
  const ec = flowChannelEccentricity(r, radiusRatio, eta);
  if (!(ec > Math.abs(r - rc)) || !(ec < r + rc)) return undefined;
  const thetaC = Math.acos((r * r + ec * ec - rc * rc) / (2 * r * ec));
  const psi = Math.acos((r * r - ec * ec - rc * rc) / (2 * ec * rc));
  return {
    radius: r,
    radiusRatio,
    channelRadius: rc,
    eta,
    eccentricity: ec,
    wallContactHalfAngle: thetaC,
    psi,
    wallContactArc: 2 * thetaC * r,
    interfaceArc: 2 * (Math.PI - psi) * rc,
    area: (Math.PI - psi) * rc * rc + thetaC * r * r - r * rc * Math.sin(psi - thetaC),
  };
}

export interface FlowChannelPressureParameters {
  unitWeight: number;
  lateralPressureRatio: number;
  wallFrictionCoefficient: number;
  /** Angle of internal friction phi_i, rad. */
  internalFrictionAngle: number;
}

export interface FlowChannelState {
  z: number;
  /** Horizontal pressure on the wall in the channel zone p_hce, Pa. */
  ph: number;
  /** Wall friction in the channel zone p_wce = mu p_hce, Pa. */
  pw: number;
  /** Wall friction resultant per unit perimeter from the surface down to z, n_z,ce, N/m. */
  nz: number;
}

export interface FlowChannelPressures {
  /** Characteristic depth of the channel z_oc, m. */
  z0c: number;
  /** Asymptotic channel pressure p_hco = gamma K z_oc, Pa. */
  ph0c: number;
  at(z: number): FlowChannelState;
}

/**
 * Pressures on the wall in the channel zone (EN 1991-4 5.2.4.3.2, from memory): a Janssen state of
 * the channel with z_oc = (1/K) A_c / (U_wc mu + U_sc tan(phi_i)). The friction resultant is the
 * integral of p_wce down the wall: n_z,ce(z) = mu p_hco (z - z_oc (1 - exp(-z/z_oc))).
 */
export function flowChannelPressures(geometry: FlowChannelGeometry, params: FlowChannelPressureParameters): FlowChannelPressures {
  const { unitWeight: gamma, lateralPressureRatio: K, wallFrictionCoefficient: mu, internalFrictionAngle: phi } = params;
  const z0c = geometry.area / (K * (geometry.wallContactArc * mu + geometry.interfaceArc * Math.tan(phi)));
  const ph0c = gamma * K * z0c;
  return {
    z0c,
    ph0c,
    at(z: number): FlowChannelState {
      const Y = -Math.expm1(-z / z0c);
      const ph = ph0c * Y;
      return { z, ph, pw: mu * ph, nz: mu * ph0c * (z - z0c * Y) };
    },
  };
}

export type WallZoneName = 'channel' | 'adjacent' | 'static';

/** A zone of the wall on the half-circle 0 <= phi <= pi, phi = |theta - theta_e|, with a constant value. */
export interface WallZone {
  zone: WallZoneName;
  from: number;
  to: number;
  /** Value of the distributed quantity in the zone (e.g. wall friction resultant per unit perimeter, N/m). */
  value: number;
}

/**
 * The piecewise-constant distribution round the wall, symmetric about the channel axis: channel zone
 * |phi| < theta_c, adjacent zones theta_c <= |phi| < 2 theta_c, static solid elsewhere.
 */
export function flowChannelZones(wallContactHalfAngle: number, channel: number, adjacent: number, staticSolid: number): WallZone[] {
  const t = wallContactHalfAngle;
  if (!(t > 0) || !(2 * t < Math.PI)) {
    throw new LoadsError('OUT_OF_SCOPE', 'bin.outletEccentricity', `the flow channel's wall contact half-angle theta_c must be between 0 and 90 degrees; got ${((t * 180) / Math.PI).toFixed(2)}`);
  }
  return [
    { zone: 'channel', from: 0, to: t, value: channel },
    { zone: 'adjacent', from: t, to: 2 * t, value: adjacent },
    { zone: 'static', from: 2 * t, to: Math.PI, value: staticSolid },
  ];
}

/**
 * Cosine series of an even, piecewise-constant function of phi on (-pi, pi] given on 0..pi:
 * f(phi) = c[0] + sum_k c[k] cos(k phi), c[0] = (1/pi) sum v (b - a), c[k] = (2/(pi k)) sum v (sin kb - sin ka).
 */
export function evenCosineSeries(zones: WallZone[], order: number): number[] {
  const c = [zones.reduce((sum, z) => sum + z.value * (z.to - z.from), 0) / Math.PI];
  for (let k = 1; k <= order; k++) {
    c.push((2 / (Math.PI * k)) * zones.reduce((sum, z) => sum + z.value * (Math.sin(k * z.to) - Math.sin(k * z.from)), 0));
  }
  return c;
}

/** Integral of the series over a <= phi <= b (per unit radius), exact for the truncated series. */
export function seriesIntegral(c: number[], a: number, b: number): number {
  let sum = (c[0] ?? 0) * (b - a);
  for (let k = 1; k < c.length; k++) sum += ((c[k] ?? 0) * (Math.sin(k * b) - Math.sin(k * a))) / k;
  return sum;
}

/** Integral of the series times cos(phi) over a <= phi <= b (the first moment, per unit radius squared). */
export function seriesFirstMoment(c: number[], a: number, b: number): number {
  let sum = (c[0] ?? 0) * (Math.sin(b) - Math.sin(a));
  for (let k = 1; k < c.length; k++) {
    const ck = c[k] ?? 0;
    // cos(k phi) cos(phi) = (cos((k-1) phi) + cos((k+1) phi)) / 2
    const lower = k === 1 ? b - a : (Math.sin((k - 1) * b) - Math.sin((k - 1) * a)) / (k - 1);
    const upper = (Math.sin((k + 1) * b) - Math.sin((k + 1) * a)) / (k + 1);
    sum += (ck * (lower + upper)) / 2;
  }
  return sum;
}

/** Integral of |cos(phi)| over a <= phi <= b, 0 <= a <= b <= pi. */
function absoluteCosineIntegral(a: number, b: number): number {
  const F = (x: number) => (x <= Math.PI / 2 ? Math.sin(x) : 2 - Math.sin(x));
  return F(b) - F(a);
}

export interface SeriesFit {
  /** Cosine coefficients c[0..N] (c[0] the mean). */
  coefficients: number[];
  order: number;
  /** Largest relative error over the zones of the resultant and of the first moment. */
  resultantError: number;
  momentError: number;
}

/**
 * How closely a truncated series represents the piecewise distribution, zone by zone: the error of
 * the zone's resultant relative to |v| (b - a), and of its first moment relative to
 * |v| integral |cos(phi)| (so that a zone whose moment is nearly zero is judged by its size), with
 * |v| not taken below the mean of the distribution (a zone that carries much less than the mean,
 * like the channel zone, is judged against the mean load over its width).
 */
export function cosineSeriesZoneErrors(zones: WallZone[], c: number[]): { resultantError: number; momentError: number } {
  const mean = Math.abs(zones.reduce((sum, z) => sum + z.value * (z.to - z.from), 0) / Math.PI);
  let resultantError = 0;
  let momentError = 0;
  for (const z of zones) {
    const exactR = z.value * (z.to - z.from);
    const exactM = z.value * (Math.sin(z.to) - Math.sin(z.from));
    const size = Math.max(Math.abs(z.value), mean);
    const scaleR = size * (z.to - z.from);
    const scaleM = size * absoluteCosineIntegral(z.from, z.to);
    if (scaleR > 0) resultantError = Math.max(resultantError, Math.abs(seriesIntegral(c, z.from, z.to) - exactR) / scaleR);
    if (scaleM > 0) momentError = Math.max(momentError, Math.abs(seriesFirstMoment(c, z.from, z.to) - exactM) / scaleM);
  }
  return { resultantError, momentError };
}

/**
 * The shortest cosine series whose resultant and first moment over every zone are within `tolerance`
 * of the piecewise distribution's (see `cosineSeriesZoneErrors`). Over the whole circle any order
 * gives the resultant (c[0]) and the first moment (c[1]) exactly; the zone test is what asks for the
 * higher harmonics.
 */
export function fitCosineSeries(zones: WallZone[], tolerance = 0.02, maxOrder = 2000): SeriesFit {
  const full = evenCosineSeries(zones, maxOrder);
  for (let order = 1; order <= maxOrder; order++) {
    const c = full.slice(0, order + 1);
    const { resultantError, momentError } = cosineSeriesZoneErrors(zones, c);
    if (resultantError <= tolerance && momentError <= tolerance) return { coefficients: c, order, resultantError, momentError };
  }
  throw new LoadsError('OUT_OF_SCOPE', 'bin.outletEccentricity', `the flow-channel distribution could not be represented within ${100 * tolerance} % by ${maxOrder} harmonics`);
}
