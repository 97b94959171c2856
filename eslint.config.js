// Lint rules for every project, and the package boundaries of DESIGN.md as import restrictions.
// The table is package-boundaries.json; tests/src/boundaries.test.ts checks the same rules by reading
// the sources, so a rule disabled here still fails the tests.
import { readFileSync } from 'node:fs';
import tseslint from 'typescript-eslint';

const boundaries = JSON.parse(readFileSync(new URL('./package-boundaries.json', import.meta.url), 'utf8'));
/** Which internal packages each project may import (DESIGN.md, "Allowed imports"). */
const allowed = boundaries.allowed;
const internal = Object.keys(allowed).map((dir) => dir.split('/')[1]);
const numerical = boundaries.numerical;
const ioLibraries = boundaries.documentLibraries.flatMap((name) => [name, `${name}/*`]);

function boundaryRule(dir) {
  const forbidden = internal.filter((name) => !allowed[dir].includes(name)).map((name) => `@binsupport/${name}`);
  const patterns = [
    { group: ['@binsupport/*/*'], message: 'Import a package through its src/index.ts only.' },
    { group: ['../../*', '../../../*'], message: 'Do not reach into another package by relative path.' },
  ];
  if (forbidden.length > 0) {
    patterns.push({ group: forbidden, message: `DESIGN.md does not allow ${dir} to import this package.` });
  }
  if (numerical.includes(dir)) {
    patterns.push({ group: ioLibraries, message: 'Numerical packages do no file or document I/O.' });
  }
  for (const name of boundaries.typeOnly[dir] ?? []) {
    patterns.push({ group: [`@binsupport/${name}`], allowTypeImports: true, message: `${dir} imports @binsupport/${name} for types only.` });
  }
  return {
    files: [`${dir}/src/**/*.ts`],
    ignores: [`${dir}/src/**/*.test.ts`],
    rules: { '@typescript-eslint/no-restricted-imports': ['error', { patterns }] },
  };
}

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', 'out/**', '.nx/**'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/consistent-type-imports': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      'no-restricted-syntax': ['error', { selector: 'ExportDefaultDeclaration', message: 'No default exports.' }],
    },
  },
  { files: ['**/vitest.config.ts', 'eslint.config.js'], rules: { 'no-restricted-syntax': 'off' } },
  ...Object.keys(allowed).map(boundaryRule),
);
