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

const DEGREE = Math.PI / 180;

/**
 * The stored solid's properties within physical bounds (unit weight, ratios and factors, angles), and
 * the upper characteristic values physical too: K_u = a_K K_m < 1 (a lateral pressure ratio of 1 or
 * more is a fluid or worse), phi_i,u = a_phi phi_im < 90 degrees (EN 1991-4 3.3).
 */
export function validateStoredSolid(solid: { unitWeight: number; lateralPressureRatio: number; lateralPressureRatioFactor: number; wallFrictionCoefficient: number; wallFrictionFactor: number; angleOfRepose: number; internalFrictionAngle: number; internalFrictionFactor: number; patchLoadFactor: number }): void {
  requireRange('solid.unitWeight', solid.unitWeight, 1000, 30000, 'N/m3');
  requireRange('solid.lateralPressureRatio', solid.lateralPressureRatio, 0, 1, '(dimensionless)', { strictLower: true, strictUpper: true });
  requireRange('solid.lateralPressureRatioFactor', solid.lateralPressureRatioFactor, 1, 2, '(dimensionless)');
  requireRange('solid.wallFrictionCoefficient', solid.wallFrictionCoefficient, 0, 1.5, '(dimensionless)', { strictLower: true, strictUpper: true });
  requireRange('solid.wallFrictionFactor', solid.wallFrictionFactor, 1, 2, '(dimensionless)');
  requireAngle('solid.angleOfRepose', solid.angleOfRepose, 0, 90, { strictLower: true, strictUpper: true });
  requireAngle('solid.internalFrictionAngle', solid.internalFrictionAngle, 0, 90, { strictLower: true, strictUpper: true });
  requireRange('solid.internalFrictionFactor', solid.internalFrictionFactor, 1, 2, '(dimensionless)');
  requireRange('solid.patchLoadFactor', solid.patchLoadFactor, 0, 2, '(dimensionless)');
  const Ku = solid.lateralPressureRatio * solid.lateralPressureRatioFactor;
  if (!(Ku < 1)) {
    throw new LoadsError('BAD_INPUT', 'solid.lateralPressureRatioFactor', `solid.lateralPressureRatio x solid.lateralPressureRatioFactor (the upper characteristic K_u = a_K K_m, EN 1991-4 3.3) must be less than 1 (dimensionless); got ${Number(Ku.toFixed(4))}`);
  }
  const phiU = (solid.internalFrictionAngle * solid.internalFrictionFactor) / DEGREE;
  if (!(phiU < 90)) {
    throw new LoadsError('BAD_INPUT', 'solid.internalFrictionFactor', `solid.internalFrictionAngle x solid.internalFrictionFactor (the upper characteristic phi_i,u = a_phi phi_im, EN 1991-4 3.3) must be less than 90 degrees; got ${Number(phiU.toFixed(4))}`);
  }

}
