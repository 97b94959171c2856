/**
 * Typed errors of the optimiser. `code` is stable for callers and tests; `path` points into the
 * SelectionProblem where the input was at fault. A class so that `instanceof` works and stacks survive.
 */
export type OptimiserErrorCode = 'INVALID_PROBLEM' | 'PROBLEM_TOO_LARGE' | 'NO_SOLUTION_WITHIN_TIME_LIMIT' | 'SOLVER_FAILED';

export class OptimiserError extends Error {
  readonly code: OptimiserErrorCode;
  readonly path: string | undefined;

  constructor(code: OptimiserErrorCode, message: string, path?: string) {
    super(message);
    this.name = 'OptimiserError';
    this.code = code;
    this.path = path;
  }
}
