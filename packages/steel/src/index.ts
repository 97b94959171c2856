export { SteelError } from './errors.js';
export type { SteelErrorCode } from './errors.js';
export { sectionProperties, shearAreaParallelToWeb, steelDensity } from './properties.js';
export type { ISectionDimensions, SectionProperties } from './properties.js';
export { loadRolledSections, parseRolledSectionTable, rolledSection } from './sections.js';
export type { SectionSeries, SteelSection } from './sections.js';
export { steelGrade, steelGradeNames, strengthsForThickness } from './grades.js';
export type { SteelGrade, SteelGradeOptions, StrengthBand } from './grades.js';
export { classifySection, sectionYieldStrength } from './classification.js';
export type { ClassifiableSection, CombinedClassification, Fabrication, ElementClassification, SectionClass, SectionClassification } from './classification.js';
export { checkSection, governingCheck, sectionUtilisations, SECTION_CHECK_IDS } from './checks.js';
export type { CheckableSection, CheckOptions, CheckResult, InternalForces } from './checks.js';
export {
  bucklingReductionFactor,
  checkBendingAndAxialCompression,
  checkFlexuralBuckling,
  checkLateralTorsionalBuckling,
  correctionFactorKc,
  criticalMomentForkSupports,
  effectiveLengthFactor,
  equivalentMomentFactorC1,
  equivalentUniformMomentFactor,
  flexuralBucklingCurve,
  flexuralBucklingFactors,
  imperfectionFactor,
  lateralTorsionalBucklingCurve,
  lateralTorsionalBucklingFactors,
} from './buckling.js';
export type {
  BeamColumnOptions,
  BucklingCurve,
  ColumnBucklingOptions,
  ColumnEnds,
  FlexuralBucklingAxis,
  FlexuralBucklingFactors,
  LateralTorsionalBucklingFactors,
  LateralTorsionalBucklingOptions,
  MemberSection,
  MomentShape,
} from './buckling.js';
export { checkAnchorTension, checkBearingStiffeners, bearingStiffenerSection, checkConcreteBearing, checkDeflection, checkFlangeLocalBending, flangeLocalBendingUtilisation, checkPatchLoading, checkTwist, type BearingStiffenerPair, type BearingStiffenerForces } from './local.js';
export type { ConcreteBearingInput, FlangeContactInput, PatchLoadingInput, PatchLoadType } from './local.js';
export { checkJunctionRingCompression, checkRingInPlaneBuckling, junctionEffectiveSection } from './junction.js';
export type { JunctionEffectiveSection, TransitionJunction } from './junction.js';
export { generateWeldedSections, standardFlangeThicknesses, standardWebThicknesses, weldedISection } from './welded.js';
export type { WeldedGirderLimits, WeldedPlates, WeldedSection } from './welded.js';
export { boxThinWalled, defaultBoxFlangeOutstand, generateWeldedBoxes, weldedBoxProperties, weldedBoxSection } from './box.js';
export type { BoxGeometry, BoxThinWalled, WeldedBoxLimits, WeldedBoxPlates, WeldedBoxSection } from './box.js';
export { listSections, sectionFamilies } from './catalogue.js';
export type { SectionFamily, SectionListing } from './catalogue.js';
export { channelProperties, channelSection, checkChannelSecondaryMember, loadChannels } from './channels.js';
export type { ChannelDimensions, ChannelProperties, ChannelSection } from './channels.js';
export { boltGeometry, checkBoltedFlangeTension } from './bolts.js';
export type { Bolt, BoltClass, BoltedFlangeInput, BoltSize } from './bolts.js';
