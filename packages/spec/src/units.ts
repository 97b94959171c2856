// Conversions from the documented input units to SI base units. Only the spec package converts;
// see docs/input-reference.md for the unit of every input.

export const MM = 1e-3;
export const KN = 1e3;
export const KPA = 1e3;
export const DEG = Math.PI / 180;

export function mmToM(valueMm: number): number {
  return valueMm * MM;
}

export function degToRad(valueDeg: number): number {
  return valueDeg * DEG;
}

/** kN/m3 to N/m3. */
export function knPerM3ToNPerM3(valueKnM3: number): number {
  return valueKnM3 * KN;
}
