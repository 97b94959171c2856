/**
 * Typed errors of the girder package. `code` is stable and is what callers and tests match on;
 * `path` names the input that caused the error (e.g. `elements[3].nodeJ`), or is empty when no
 * single input is to blame. A class (not a plain object) so that callers can use `instanceof` and
 * keep the stack trace.
 *
 * - BAD_MODEL: the model, the combination or the analysis options are inconsistent or out of range.
 * - MECHANISM: the stiffness matrix is singular at a degree of freedom (an unrestrained motion).
 * - RESIDUAL: a solve did not reproduce its right-hand side to the required accuracy.
 */
export type GirderErrorCode = 'BAD_MODEL' | 'MECHANISM' | 'RESIDUAL';

export class GirderError extends Error {
  readonly code: GirderErrorCode;
  readonly path: string;

  constructor(code: GirderErrorCode, message: string, path = '') {
    super(message);
    this.name = 'GirderError';
    this.code = code;
    this.path = path;
  }
}
