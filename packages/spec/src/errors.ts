/** Stable codes of input errors; the CLI maps every one of them to exit code 2. */
export type SpecErrorCode = 'INVALID_INPUT' | 'UNREADABLE_FILE' | 'UNSUPPORTED_FORMAT' | 'PARSE_ERROR' | 'UNKNOWN_SOLID';

export interface SpecIssue {
  /** Dotted input path, e.g. `bin.hopper.apexHalfAngle`. */
  path: string;
  message: string;
}

/** An input that cannot be designed as given: every message names the input path. */
export class SpecError extends Error {
  readonly code: SpecErrorCode;
  readonly path: string;
  readonly issues: SpecIssue[];

  constructor(code: SpecErrorCode, issues: SpecIssue[]) {
    super(issues.map((issue) => issue.message).join('\n'));
    this.name = 'SpecError';
    this.code = code;
    this.issues = issues;
    this.path = issues[0]?.path ?? '';
  }
}
