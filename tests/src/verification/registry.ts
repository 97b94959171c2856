import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, expect } from 'vitest';

// The verification manual's registry: each verification check states what it checks, its source and
// the expected value, and is asserted here; docs/verification.md is generated from the records
// (npm run verify) and compared with the committed copy in CI, so the manual cannot drift.

export type SourceKind = 'published' | 'closed form' | 'independent library' | 'common practice' | 'from memory';

export interface VerificationCheck {
  id: string;
  /** What is checked, in a few words. */
  title: string;
  /** The outside source: standard and clause, book and table or case, or the library. */
  source: string;
  kind: SourceKind;
  expected: number;
  computed: number;
  /** Relative tolerance (|computed - expected| <= tolerance |expected|). */
  tolerance: number;
  unit: string;
}

export interface VerificationRecord extends VerificationCheck {
  suite: string;
  passed: boolean;
}

export const RECORD_DIR = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '.verification');

export function verificationSuite(suite: string): (check: VerificationCheck) => void {
  const records: VerificationRecord[] = [];
  afterAll(() => {
    mkdirSync(RECORD_DIR, { recursive: true });
    writeFileSync(join(RECORD_DIR, `${suite}.json`), `${JSON.stringify(records, null, 2)}\n`);
  });
  return (check: VerificationCheck) => {
    const error = Math.abs(check.computed - check.expected);
    const passed = error <= check.tolerance * Math.abs(check.expected) || (check.expected === 0 && error <= check.tolerance);
    records.push({ ...check, suite, passed });
    expect(passed, `${check.id}: computed ${check.computed} ${check.unit}, expected ${check.expected} ${check.unit} within ${check.tolerance} (${check.source})`).toBe(true);
  };
}
