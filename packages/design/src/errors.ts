export type DesignErrorCode = 'BAD_INPUT' | 'GUARD_FAILED' | 'ANALYSIS_FAILED';

/** A design that the pipeline refuses to give: a guard failed, or an input the models cannot treat. */
export class DesignError extends Error {
  readonly code: DesignErrorCode;
  readonly path: string;

  constructor(code: DesignErrorCode, message: string, path = '') {
    super(message);
    this.name = 'DesignError';
    this.code = code;
    this.path = path;
  }
}
