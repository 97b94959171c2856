import type { z } from 'zod';
import type { SpecIssue } from './errors.js';

function issuePath(path: ReadonlyArray<PropertyKey>): string {
  return path.map((part) => (typeof part === 'number' ? `[${part}]` : String(part))).join('.').replace(/\.\[/g, '[');
}

function describeInput(input: unknown): string {
  if (input === undefined) return 'nothing';
  if (typeof input === 'string') return `'${input.length > 40 ? `${input.slice(0, 40)}…` : input}'`;
  if (typeof input === 'number') return String(input);
  if (Array.isArray(input)) return 'a list';
  if (input === null) return 'null';
  return typeof input === 'object' ? 'a table' : String(input);
}

/** Zod issues as engineer-readable messages that start with the input path. */
export function zodIssues(error: z.ZodError, reference = 'docs/input-reference.md'): SpecIssue[] {
  return error.issues.map((issue) => {
    if (issue.code === 'unrecognized_keys') {
      const where = issuePath(issue.path);
      const keys = issue.keys.map((key) => (where ? `${where}.${key}` : key));
      return { path: keys[0] ?? where, message: `${keys.join(', ')} ${keys.length > 1 ? 'are not inputs' : 'is not an input'} here (check the spelling against ${reference})` };
    }
    const path = issuePath(issue.path) || '(spec)';
    const got = 'input' in issue && issue.input !== undefined ? `; got ${describeInput(issue.input)}` : '';
    return { path, message: `${path} ${issue.message}${got}` };
  });
}

