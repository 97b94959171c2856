export { OptimiserError } from './errors.js';
export type { OptimiserErrorCode } from './errors.js';
export { tieTolerance } from './problem.js';
export type { AttributeLimit, SameAttributeGroups, SelectionCandidate, SelectionGroup, SelectionProblem, SelectionResult, SelectionStatus } from './problem.js';
export { bruteForceSelection } from './brute-force.js';
export { relaxationBound, solveSelection } from './solve.js';
export type { SolveOptions } from './solve.js';
