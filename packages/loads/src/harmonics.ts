import type { Harmonic, SupportLineCase } from './types.js';

function sumHarmonics(harmonics: Harmonic[] | undefined, theta: number): number {
  let value = 0;
  for (const h of harmonics ?? []) value += h.cos * Math.cos(h.order * theta) + h.sin * Math.sin(h.order * theta);
  return value;
}

/** Line loads of a case at angle theta (rad, from +X counter-clockwise seen from above), N/m. */
export function lineLoadAt(loadCase: SupportLineCase, theta: number): { vertical: number; radial: number; tangential: number } {
  return {
    vertical: loadCase.verticalLineLoad + sumHarmonics(loadCase.verticalHarmonics, theta),
    radial: loadCase.radialLineLoad + sumHarmonics(loadCase.radialHarmonics, theta),
    tangential: sumHarmonics(loadCase.tangentialHarmonics, theta),
  };
}

/**
 * The support-line image of a horizontal force H (N) acting toward angle `direction` with an
 * overturning moment M (N m) about the support level that presses the line down on that side, by the
 * membrane (beam) theory of a cylindrical shell: the axial stress resultant varies as cos(theta - direction),
 * the membrane shear as sin(theta - direction) (e.g. Timoshenko and Gere, cylinder as a thin-walled
 * tube; the usual global-bending load of a silo shell on its support). On a circle of radius R:
 * - vertical  q(theta) = (M / (pi R^2)) cos(theta - direction): zero resultant, moment M;
 * - tangential t(theta) = -(H / (pi R)) sin(theta - direction): resultant H toward `direction`.
 */
export function globalBending(
  force: number,
  moment: number,
  direction: number,
  lineRadius: number,
): Pick<SupportLineCase, 'verticalHarmonics' | 'tangentialHarmonics' | 'horizontalResultant' | 'overturningMoment'> {
  const qv = moment / (Math.PI * lineRadius * lineRadius);
  const qt = force / (Math.PI * lineRadius);
  const c = Math.cos(direction);
  const s = Math.sin(direction);
  return {
    // cos(theta - d) = cos d cos theta + sin d sin theta; -sin(theta - d) = sin d cos theta - cos d sin theta
    verticalHarmonics: [{ order: 1, cos: qv * c, sin: qv * s }],
    tangentialHarmonics: [{ order: 1, cos: qt * s, sin: -qt * c }],
    horizontalResultant: { x: force * c, y: force * s },
    overturningMoment: { x: moment * s, y: -moment * c },
  };
}
