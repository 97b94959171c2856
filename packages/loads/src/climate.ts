/**
 * Snow and wind on a circular bin (EN 1991-1-3, EN 1991-1-4), reduced to the quantities the support
 * line needs: a uniform roof load, and the horizontal force on the shell with its lever arm.
 */

export type TerrainCategory = '0' | 'I' | 'II' | 'III' | 'IV';

/** EN 1991-1-4:2005 Table 4.1: roughness length z_0 and minimum height z_min, m (from memory). */
export const TERRAIN: Record<TerrainCategory, { z0: number; zMin: number }> = {
  '0': { z0: 0.003, zMin: 1 },
  I: { z0: 0.01, zMin: 1 },
  II: { z0: 0.05, zMin: 2 },
  III: { z0: 0.3, zMin: 5 },
  IV: { z0: 1.0, zMin: 10 },
};

/** Kinematic viscosity of air nu, m2/s (EN 1991-1-4 7.9.1 (7.15)), and air density rho, kg/m3 (4.5 NOTE 2). */
export const AIR_VISCOSITY = 15e-6;
export const AIR_DENSITY = 1.25;

export interface PeakVelocityPressure {
  kr: number;
  cr: number;
  vm: number;
  Iv: number;
  qp: number;
}

/**
 * Peak velocity pressure, EN 1991-1-4:2005 4.3-4.5 (from memory):
 * k_r = 0.19 (z_0/z_0,II)^0.07 (4.5); c_r = k_r ln(max(z, z_min)/z_0) (4.4); v_m = c_r c_o v_b (4.3);
 * I_v = k_I / (c_o ln(max(z, z_min)/z_0)), k_I = 1 (4.7); q_p = (1 + 7 I_v) (1/2) rho v_m^2 (4.8).
 */
export function peakVelocityPressure(basicVelocity: number, terrain: TerrainCategory, height: number, orographyFactor = 1): PeakVelocityPressure {
  const { z0, zMin } = TERRAIN[terrain];
  const z = Math.max(height, zMin);
  const kr = 0.19 * Math.pow(z0 / 0.05, 0.07);
  const cr = kr * Math.log(z / z0);
  const vm = cr * orographyFactor * basicVelocity;
  const Iv = 1 / (orographyFactor * Math.log(z / z0));
  const qp = (1 + 7 * Iv) * 0.5 * AIR_DENSITY * vm * vm;
  return { kr, cr, vm, Iv, qp };
}

/**
 * Force coefficient of a circular cylinder without free-end flow, EN 1991-1-4:2005 7.9.2 (7.19) and
 * Figure 7.28 (from memory): c_f,0 = 1.2 + 0.18 log10(10 k/b) / (1 + 0.4 log10(Re/1e6)) above
 * Re = 4e5; below, the subcritical value 1.2.
 */
export function cylinderForceCoefficient(reynolds: number, roughness: number, diameter: number): number {
  if (reynolds < 4e5) return 1.2;
  return 1.2 + (0.18 * Math.log10((10 * roughness) / diameter)) / (1 + 0.4 * Math.log10(reynolds / 1e6));
}

/**
 * Effective slenderness of a circular cylinder, EN 1991-1-4:2005 Table 7.16 (from memory):
 * l <= 15 m: lambda = min(2 l/b, 70); l >= 50 m: lambda = min(0.7 l/b, 70); linear in l between.
 */
export function effectiveSlenderness(length: number, diameter: number): number {
  const short = Math.min((2 * length) / diameter, 70);
  const long = Math.min((0.7 * length) / diameter, 70);
  if (length <= 15) return short;
  if (length >= 50) return long;
  return short + ((long - short) * (length - 15)) / 35;
}

/**
 * End-effect factor psi_lambda for solidity ratio 1, EN 1991-1-4:2005 7.13 Figure 7.36, read off as
 * (lambda, psi) = (1, 0.60), (10, 0.70), (100, 0.92) (REFERENCES.md §1, from memory) and interpolated
 * linearly in log10(lambda), the figure's abscissa; constant outside 1..100.
 */
export function endEffectFactor(lambda: number): number {
  const points: Array<[number, number]> = [[1, 0.6], [10, 0.7], [100, 0.92]];
  if (lambda <= 1) return 0.6;
  if (lambda >= 100) return 0.92;
  const t = Math.log10(lambda);
  const [lo, hi] = t < 1 ? [points[0], points[1]] : [points[1], points[2]];
  if (!lo || !hi) return Number.NaN;
  const t0 = Math.log10(lo[0]);
  const t1 = Math.log10(hi[0]);
  return lo[1] + ((hi[1] - lo[1]) * (t - t0)) / (t1 - t0);
}

/**
 * Roof snow load shape coefficient mu_1, EN 1991-1-3:2003 Table 5.2 (from memory): 0.8 for pitch
 * 0..30 degrees, 0.8 (60 - alpha)/30 for 30..60, 0 above. A conical roof is treated with the pitch
 * of its slope (common practice for the undrifted case).
 */
export function roofShapeCoefficient(pitch: number): number {
  const alphaDeg = (pitch * 180) / Math.PI;
  // The tolerance keeps 30 and 60 degrees, converted from degrees to radians and back, on the table's rows.
  if (alphaDeg <= 30 + 1e-9) return 0.8;
  if (alphaDeg < 60 - 1e-9) return (0.8 * (60 - alphaDeg)) / 30;
  return 0;
}
