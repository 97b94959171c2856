/**
 * Typed errors of the steel package. Each carries a stable `code` that callers and tests match on,
 * and the input path that caused it where there is one. A class is used (not a plain object) so that
 * callers can tell these errors apart with `instanceof` and still get a stack trace.
 */
export type SteelErrorCode =
  | 'INVALID_SECTION_TABLE'
  | 'INVALID_GRADE_TABLE'
  | 'UNKNOWN_SECTION'
  | 'UNKNOWN_GRADE'
  | 'INVALID_DIMENSIONS'
  | 'THICKNESS_OUT_OF_RANGE'
  | 'INVALID_FORCES'
  | 'INVALID_OPTIONS';

export class SteelError extends Error {
  readonly code: SteelErrorCode;
  readonly path: string | undefined;

  constructor(code: SteelErrorCode, message: string, path?: string) {
    super(message);
    this.name = 'SteelError';
    this.code = code;
    this.path = path;
  }
}
