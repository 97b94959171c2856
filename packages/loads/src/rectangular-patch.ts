import type { EdgeName } from './rectangular-types.js';

/**
 * Patch loads of a rectangular (non-circular) bin, EN 1991-4:2006 5.2.1.4 (filling) and 5.2.2.4
 * (discharge) as we recall them (from memory, not confirmed against the text): the patch is a band
 * of outward pressure p_nc = 0.36 p_p, p_p the patch pressure of the circular rule (C_pf p_hf at
 * filling, C_pe p_he at discharge), over a horizontal band of height s = pi d_c / 16 across the full
 * width of one wall, at any level; d_c is the shorter side. The rule does not distinguish thin- and
 * thick-walled bins (as far as we know).
 */
export const NON_CIRCULAR_PATCH_RATIO = 0.36;

/** One wall that can carry the band: its edge, the letter used in case names, width and outward normal. */
export interface PatchWall {
  edge: EdgeName;
  letter: 'N' | 'E' | 'S' | 'W';
  /** Internal width of the wall, B (m): lengthX for the south and north walls, lengthY for east and west. */
  width: number;
  /** Outward unit normal on plan (the direction the band pushes the bin). */
  outward: { x: number; y: number };
}

/** The four walls of a lengthX x lengthY box (plan axes of rectangular-types.ts). */
export function patchWalls(lengthX: number, lengthY: number): PatchWall[] {
  return [
    { edge: 'north', letter: 'N', width: lengthX, outward: { x: 0, y: 1 } },
    { edge: 'east', letter: 'E', width: lengthY, outward: { x: 1, y: 0 } },
    { edge: 'south', letter: 'S', width: lengthX, outward: { x: 0, y: -1 } },
    { edge: 'west', letter: 'W', width: lengthY, outward: { x: -1, y: 0 } },
  ];
}

/** Name of the filling ('Q_s,pf,N') or discharge ('Q_s,pe,N') patch case on one wall. */
export function rectangularPatchCaseName(state: 'filling' | 'discharge', wall: PatchWall): string {
  return `${state === 'filling' ? 'Q_s,pf' : 'Q_s,pe'},${wall.letter}`;
}

/**
 * Net horizontal force of the band on one wall (N): F = p_nc s B. Nothing on the opposite wall
 * balances it, so it reaches the support as base shear.
 */
export function bandForce(bandPressure: number, bandHeight: number, wallWidth: number): number {
  return bandPressure * bandHeight * wallWidth;
}

/**
 * Depth z_p (m, below the equivalent surface) of the band centre that gives the largest overturning
 * moment about the transition, F(z) (h_c - z) with F proportional to the patch pressure p(z), for the
 * band "at any level": z_p maximises p(z) (h_c - z) over [from, to]. A grid of 400 intervals finds
 * the best interval, and golden-section search refines it (the product of a rising pressure and a
 * falling arm has one maximum for the Janssen and squat profiles; the grid guards against others).
 */
export function levelOfLargestBandMoment(pressure: (depth: number) => number, fillHeight: number, from: number, to: number): number {
  const moment = (z: number) => pressure(z) * (fillHeight - z);
  if (!(to > from)) return Math.max(0, Math.min(fillHeight, (from + to) / 2));
  const n = 400;
  const step = (to - from) / n;
  let best = 0;
  let bestMoment = -Infinity;
  for (let i = 0; i <= n; i++) {
    const m = moment(from + i * step);
    if (m > bestMoment) {
      bestMoment = m;
      best = i;
    }
  }
  let lo = from + Math.max(0, best - 1) * step;
  let hi = from + Math.min(n, best + 1) * step;
  const ratio = (Math.sqrt(5) - 1) / 2;
  let x1 = hi - ratio * (hi - lo);
  let x2 = lo + ratio * (hi - lo);
  let m1 = moment(x1);
  let m2 = moment(x2);
  for (let k = 0; k < 80 && hi - lo > 1e-9 * Math.max(1, fillHeight); k++) {
    if (m1 >= m2) {
      hi = x2;
      x2 = x1;
      m2 = m1;
      x1 = hi - ratio * (hi - lo);
      m1 = moment(x1);
    } else {
      lo = x1;
      x1 = x2;
      m1 = m2;
      x2 = lo + ratio * (hi - lo);
      m2 = moment(x2);
    }
  }
  const refined = (lo + hi) / 2;
  const gridBest = from + best * step;
  return moment(refined) >= moment(gridBest) ? refined : gridBest;
}
