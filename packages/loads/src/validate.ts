import { LoadsError } from './errors.js';

const DEG = 180 / Math.PI;

/** Require lower <= value <= upper (or strict where asked); the message names the field, range and unit. */
export function requireRange(path: string, value: number, lower: number, upper: number, unit: string, options: { strictLower?: boolean; strictUpper?: boolean } = {}): void {
  const belowOk = options.strictLower ? value > lower : value >= lower;
  const aboveOk = options.strictUpper ? value < upper : value <= upper;
  if (!Number.isFinite(value) || !belowOk || !aboveOk) {
    const range = options.strictLower || options.strictUpper
      ? `${options.strictLower ? 'greater than' : 'at least'} ${lower} and ${options.strictUpper ? 'less than' : 'at most'} ${upper}`
      : `between ${lower} and ${upper}`;
    throw new LoadsError('BAD_INPUT', path, `${path} must be ${range} ${unit}; got ${value}`);
  }
}

/** The same for an angle held in radians but stated to people in degrees. */
export function requireAngle(path: string, value: number, lowerDeg: number, upperDeg: number, options: { strictLower?: boolean; strictUpper?: boolean } = {}): void {
  const deg = value * DEG;
  const belowOk = options.strictLower ? deg > lowerDeg : deg >= lowerDeg - 1e-9;
  const aboveOk = options.strictUpper ? deg < upperDeg : deg <= upperDeg + 1e-9;
  if (!Number.isFinite(value) || !belowOk || !aboveOk) {
    throw new LoadsError('BAD_INPUT', path, `${path} must be between ${lowerDeg} and ${upperDeg} degrees; got ${Number(deg.toFixed(4))}`);
  }
}
