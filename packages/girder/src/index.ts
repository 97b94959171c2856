export { packageName } from './package-name.js';
export type {
  Combination,
  Dof,
  ElementLineLoad,
  GirderElement,
  GirderModel,
  GirderNode,
  LoadCase,
  NodalLoad,
  PointSpring,
  SpringBehaviour,
  SectionStiffness,
  Support,
  Vec3,
} from './model.js';
export { DOFS, DOFS_PER_NODE, STANDARD_GRAVITY } from './model.js';
export type { GirderErrorCode } from './errors.js';
export { GirderError } from './errors.js';
export type { AnalysisResult, BearingGroupContact, ContactSummary, LiftOffZone, NodeDisplacement, SpringForce, Station, SupportReaction } from './results.js';
export type { StationResultants } from './element.js';
export type { AnalysisOptions, ReactionResultant } from './analyse.js';
export { analyse, analyseAll, sumReactions } from './analyse.js';
export type { EnvelopeExtreme, EnvelopeResultant, StationEnvelope } from './envelope.js';
export { ENVELOPE_RESULTANTS, envelope } from './envelope.js';
export type { LoadResultant } from './loads.js';
export { sumLoads } from './loads.js';
export { validateCombination, validateModel } from './validate.js';
export type { LdltFactorisation } from './banded.js';
export type { SystemFactorisation } from './solve.js';
export type { CheckedSolution } from './solve.js';
export { BACKWARD_ERROR_TOLERANCE, backwardError, factorSystem, relativeResidual, solveChecked } from './solve.js';
export type { SymmetricSparse } from './sparse.js';
export { addSymmetric, createSymmetricSparse } from './sparse.js';
