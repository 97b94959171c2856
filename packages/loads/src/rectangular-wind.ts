/**
 * Wind on a rectangular box, EN 1991-1-4:2005 7.6: c_f = c_f,0 psi_r psi_lambda (7.9), with the
 * reference area A_ref = l b (7.10), b the breadth normal to the wind and d the depth along it.
 */

/**
 * Force coefficient of a rectangular section with sharp corners without free-end flow, against d/b,
 * EN 1991-1-4:2005 Figure 7.23, read off as the points (d/b, c_f,0) below (from memory; the same
 * points appear in an independent open-source digitisation of the figure), joined by straight lines on
 * the figure's logarithmic d/b axis and constant outside 0.1..50. Not confirmed against the text.
 */
const FIGURE_7_23: ReadonlyArray<readonly [number, number]> = [
  [0.1, 2.0],
  [0.2, 2.0],
  [0.7, 2.4],
  [1, 2.1],
  [2, 1.65],
  [5, 1.0],
  [10, 0.9],
  [50, 0.9],
];

export function rectangularSectionForceCoefficient(depthOverBreadth: number): number {
  const first = FIGURE_7_23[0];
  const last = FIGURE_7_23[FIGURE_7_23.length - 1];
  if (!first || !last) return Number.NaN;
  if (depthOverBreadth <= first[0]) return first[1];
  if (depthOverBreadth >= last[0]) return last[1];
  for (let i = 1; i < FIGURE_7_23.length; i++) {
    const lo = FIGURE_7_23[i - 1];
    const hi = FIGURE_7_23[i];
    if (!lo || !hi || depthOverBreadth > hi[0]) continue;
    const t = Math.log10(depthOverBreadth / lo[0]) / Math.log10(hi[0] / lo[0]);
    return lo[1] + (hi[1] - lo[1]) * t;
  }
  return last[1];
}

/**
 * Effective slenderness of a rectangular section, EN 1991-1-4:2005 7.13 Table 7.16 (rectangular and
 * polygonal sections; from memory): l < 15 m: min(2 l/b, 70); l >= 50 m: min(1.4 l/b, 70); linear in
 * l between.
 */
export function rectangularEffectiveSlenderness(length: number, breadth: number): number {
  const short = Math.min((2 * length) / breadth, 70);
  const long = Math.min((1.4 * length) / breadth, 70);
  if (length <= 15) return short;
  if (length >= 50) return long;
  return short + ((long - short) * (length - 15)) / 35;
}

/** Whether a wind direction (rad) is normal to a pair of walls: a multiple of 90 degrees (to 1e-6 rad). */
export function isNormalToWalls(direction: number): boolean {
  const quarter = Math.round(direction / (Math.PI / 2));
  return Math.abs(direction - quarter * (Math.PI / 2)) < 1e-6;
}
