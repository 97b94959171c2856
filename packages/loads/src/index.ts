export { janssenProfile, type JanssenParameters, type JanssenProfile, type JanssenState } from './janssen.js';
export { squatProfile, type SquatParameters, type SquatProfile } from './squat.js';
export { characteristicSet, type CharacteristicSet, type LoadEffect, type SolidProperties } from './properties.js';
export { slendernessClass, type SlendernessClass } from './slenderness.js';
export { actionAssessmentClass, type ActionAssessmentClass, type ClassInput } from './classification.js';
export { topSurface, type TopSurface } from './surface.js';
export { dischargeFactors, patchFactors, patchHeight, thinWalledPatchForce, uniformIncreaseFactor, uniformIncreaseZeta, type DischargeFactors } from './wall.js';
export { hopperPressures, hopperWallVerticalResultant, type HopperParameters, type HopperPressures, type HopperPressureSet, type HopperState } from './hopper.js';
export { cylinderForceCoefficient, effectiveSlenderness, endEffectFactor, peakVelocityPressure, roofShapeCoefficient, TERRAIN, type PeakVelocityPressure, type TerrainCategory } from './climate.js';
export { circularBinGeometry, type CircularBin, type CircularBinGeometry, type PatchLoadMethod } from './geometry.js';
export {
  circularBinLoads,
  isGravityCase,
  seismicCaseName,
  windCaseName,
  DISCHARGE_PATCH_CASE,
  DISCHARGE_UNIFORM_INCREASE_CASE,
  EQUIPMENT_PERMANENT_CASE,
  EQUIPMENT_VARIABLE_CASE,
  FILLING_PATCH_CASE,
  FILLING_UNIFORM_INCREASE_CASE,
  HOPPER_MAGNIFIER_CASE,
  PERMANENT_CASE,
  ROOF_DEAD_CASE,
  ROOF_IMPOSED_CASE,
  SNOW_CASE,
  SOLID_DISCHARGE_CASE,
  SOLID_FILLING_CASE,
  STANDARD_GRAVITY,
  type CircularBinLoadInput,
  type EquipmentLoad,
  type RoofInput,
  type SeismicInput,
  type SnowInput,
  type StoredSolidInput,
  type WindInput,
} from './circular.js';
export { rectangularBinLoads, tributaryDepth, type EdgeLoad, type RectangularBin, type RectangularBinLoadInput, type RectangularLoadSet } from './rectangular.js';
export { combineActions, DEFAULT_PSI, type CombinationInput, type PartialFactors, type PsiFactors, type VariableAction, type VariableGroup } from './combinations.js';
export { globalBending, lineLoadAt } from './harmonics.js';
export { LoadsError, type LoadsErrorCode } from './errors.js';
export type { ActionKind, DerivationStep, Harmonic, LoadCombination, LoadSet, PressureProfile, SupportLineCase, Verification } from './types.js';
export { emptySeismicCaseName } from './rectangular.js';
export type { EdgeName, HopperFaceClass, PlanEquipmentLoad, PyramidHopper, RectangularHopper, RectangularLoadCase, RectangularPressureProfile, WedgeHopper } from './rectangular-types.js';
export { faceLoadShape, outletLengths, rectangularHopperGeometry, type HopperFace, type RectangularHopperGeometry } from './rectangular-geometry.js';
export { hopperWallVerticalForce, rectangularHopperPressures, type FacePairPressures, type HopperSolid } from './rectangular-hopper.js';
export { bendingLineLoad, edgeDirection, edgeLength, edgePoint, shearFlowLineLoad, tubeProperties, type TubeProperties } from './rectangular-transfer.js';
export { isNormalToWalls, rectangularEffectiveSlenderness, rectangularSectionForceCoefficient } from './rectangular-wind.js';
export { cosineSeriesZoneErrors, evenCosineSeries, fitCosineSeries, flowChannelEccentricity, flowChannelEtaRange, flowChannelGeometry, flowChannelPressures, flowChannelZones, seriesFirstMoment, seriesIntegral, FLOW_CHANNEL_RADIUS_RATIOS, type FlowChannelGeometry, type FlowChannelPressureParameters, type FlowChannelPressures, type FlowChannelState, type SeriesFit, type WallZone, type WallZoneName } from './flow-channel.js';
export { flowChannelCaseName } from './circular.js';
export { bandForce, levelOfLargestBandMoment, NON_CIRCULAR_PATCH_RATIO, patchWalls, rectangularPatchCaseName, type PatchWall } from './rectangular-patch.js';
