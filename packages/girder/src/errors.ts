/**
 * Typed errors of the girder package. `code` is stable and is what callers and tests match on;
 * `path` names the input that caused the error (e.g. `elements[3].nodeJ`), or is empty when no
 * single input is to blame. A class (not a plain object) so that callers can use `instanceof` and
 * keep the stack trace.
 *
 * - BAD_MODEL: the model, the combination or the analysis options are inconsistent or out of range.
 * - MECHANISM: the stiffness matrix is singular at a degree of freedom (an unrestrained motion).
 * - RESIDUAL: a solve did not reproduce its right-hand side to the required accuracy.
 * - CONTACT_NOT_CONVERGED: the contact iteration (compression-only or anchored springs) did not
 *   settle on a contact state within its iteration cap; the message lists the springs that kept
 *   changing state.
 */
export type GirderErrorCode = 'BAD_MODEL' | 'MECHANISM' | 'RESIDUAL' | 'CONTACT_NOT_CONVERGED';

export class GirderError extends Error {
  readonly code: GirderErrorCode;
  readonly path: string;
  /** For MECHANISM from a factorisation: the freedom found unrestrained, e.g. "node N12 dof uz". */
  readonly freedom: string | undefined;

  constructor(code: GirderErrorCode, message: string, path = '', freedom?: string) {
    super(message);
    this.name = 'GirderError';
    this.code = code;
    this.path = path;
    this.freedom = freedom;
  }
}
