import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

// The allowed imports of DESIGN.md ("Allowed imports", table in package-boundaries.json), checked by
// reading every source file, so that the rule holds even if the lint rule is changed (source: DESIGN.md).
const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
interface Boundaries {
  allowed: Record<string, string[]>;
  typeOnly: Record<string, string[]>;
  numerical: string[];
  documentLibraries: string[];
}
const { allowed, typeOnly, numerical, documentLibraries } = JSON.parse(readFileSync(join(root, 'package-boundaries.json'), 'utf8')) as Boundaries;

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sourceFiles(path);
    return path.endsWith('.ts') && !path.endsWith('.test.ts') && !path.includes('test-support') ? [path] : [];
  });
}

interface ImportStatement {
  specifier: string;
  typeOnly: boolean;
}

function importsOf(text: string): ImportStatement[] {
  const found: ImportStatement[] = [];
  const pattern = /^\s*(import|export)\s+(type\s+)?[^'";]*?from\s+['"]([^'"]+)['"]/gms;
  for (const match of text.matchAll(pattern)) {
    found.push({ specifier: match[3] ?? '', typeOnly: Boolean(match[2]) });
  }
  for (const match of text.matchAll(/import\(\s*['"]([^'"]+)['"]\s*\)/g)) {
    found.push({ specifier: match[1] ?? '', typeOnly: false });
  }
  return found;
}

describe('package boundaries (DESIGN.md)', () => {
  for (const [project, may] of Object.entries(allowed)) {
    it(`${project} imports only what it may`, () => {
      const violations: string[] = [];
      const files = sourceFiles(join(root, project, 'src'));
      expect(files.length).toBeGreaterThan(0);
      for (const file of files) {
        const where = relative(root, file);
        for (const { specifier, typeOnly: isTypeImport } of importsOf(readFileSync(file, 'utf8'))) {
          const internal = /^@binsupport\/([^/]+)(\/.*)?$/.exec(specifier);
          if (internal) {
            const target = internal[1] ?? '';
            if (internal[2]) violations.push(`${where}: imports the internals of @binsupport/${target}`);
            else if (!may.includes(target)) violations.push(`${where}: may not import @binsupport/${target}`);
            else if ((typeOnly[project] ?? []).includes(target) && !isTypeImport) violations.push(`${where}: imports @binsupport/${target} for more than types`);
          }
          if (specifier.startsWith('../../')) violations.push(`${where}: reaches outside its package (${specifier})`);
          if (numerical.includes(project) && documentLibraries.some((name) => specifier === name || specifier.startsWith(`${name}/`))) {
            violations.push(`${where}: a numerical package imports ${specifier}`);
          }
        }
      }
      expect(violations).toEqual([]);
    });
  }

  it('each index.ts only re-exports', () => {
    for (const project of Object.keys(allowed)) {
      const index = readFileSync(join(root, project, 'src', 'index.ts'), 'utf8');
      const statements = index.split(';').map((part) => part.replace(/\/\/.*$/gm, '').trim()).filter((part) => part.length > 0);
      for (const statement of statements) {
        expect(statement, `${project}/src/index.ts`).toMatch(/^export\s/);
        expect(statement, `${project}/src/index.ts`).toMatch(/from\s+['"]/);
      }
    }
  });
});
