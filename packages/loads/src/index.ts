export { janssenProfile, type JanssenParameters, type JanssenProfile, type JanssenState } from './janssen.js';
export { squatProfile, type SquatParameters, type SquatProfile } from './squat.js';
export { characteristicSet, type CharacteristicSet, type LoadEffect, type SolidProperties } from './properties.js';
export { slendernessClass, type SlendernessClass } from './slenderness.js';
export { circularBinGeometry, type CircularBin, type CircularBinGeometry } from './geometry.js';
export { circularBinLoads, PERMANENT_CASE, SOLID_FILLING_CASE, STANDARD_GRAVITY, type CircularBinLoadInput } from './circular.js';
export { gravityCombinations, type PartialFactors } from './combinations.js';
export { LoadsError, type LoadsErrorCode } from './errors.js';
export type { DerivationStep, LoadCombination, LoadSet, PressureProfile, SupportLineCase } from './types.js';
