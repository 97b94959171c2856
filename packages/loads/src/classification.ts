import type { SlendernessClass } from './slenderness.js';

export type ActionAssessmentClass = 1 | 2 | 3;

export interface ClassInput {
  /** Mass of stored solid the bin holds, kg. */
  capacity: number;
  slenderness: SlendernessClass;
  diameter: number;
  /** Outlet eccentricity e_o, m. */
  outletEccentricity: number;
  /** Eccentricity of the top surface e_t (the filling point), m. */
  topSurfaceEccentricity: number;
}

/**
 * Action assessment class, EN 1991-4:2006 2.5 and Table 2.1 (REFERENCES.md §1, from memory):
 * AAC 3 above 10 000 t, or above 1 000 t with an outlet eccentricity e_o > 0.25 d_c, or a squat
 * silo above 1 000 t with a top-surface eccentricity e_t > 0.25 d_c; AAC 1 below 100 t; AAC 2 otherwise.
 */
export function actionAssessmentClass(input: ClassInput): { aac: ActionAssessmentClass; reason: string } {
  const tonnes = input.capacity / 1000;
  const quarter = 0.25 * input.diameter;
  if (tonnes > 10_000) return { aac: 3, reason: `capacity ${tonnes.toFixed(0)} t > 10 000 t` };
  if (tonnes > 1000 && input.outletEccentricity > quarter) return { aac: 3, reason: `capacity ${tonnes.toFixed(0)} t > 1 000 t and e_o > 0.25 d_c` };
  if (tonnes > 1000 && input.slenderness === 'squat' && input.topSurfaceEccentricity > quarter) return { aac: 3, reason: `squat, capacity ${tonnes.toFixed(0)} t > 1 000 t and e_t > 0.25 d_c` };
  if (tonnes < 100) return { aac: 1, reason: `capacity ${tonnes.toFixed(1)} t < 100 t` };
  return { aac: 2, reason: `capacity ${tonnes.toFixed(0)} t between 100 t and 10 000 t, eccentricities within the AAC 2 limits` };
}
