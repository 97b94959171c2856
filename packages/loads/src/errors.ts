export type LoadsErrorCode = 'OUT_OF_SCOPE' | 'BAD_INPUT';

/** A bin the load model cannot treat; `path` names the input (in the spec's terms) that caused it. */
export class LoadsError extends Error {
  readonly code: LoadsErrorCode;
  readonly path: string;

  constructor(code: LoadsErrorCode, path: string, message: string) {
    super(message);
    this.name = 'LoadsError';
    this.code = code;
    this.path = path;
  }
}
