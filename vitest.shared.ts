// One vitest configuration for every project: sibling packages are read from source through the
// custom export condition, so tests need no build step.
import { defineConfig } from 'vitest/config';

export const sourceCondition = '@binsupport/source';

export function projectTestConfig(options: { include?: string[]; testTimeout?: number; maxWorkers?: number } = {}) {
  return defineConfig({
    resolve: { conditions: [sourceCondition, 'module', 'node', 'default'] },
    ssr: { resolve: { conditions: [sourceCondition, 'node', 'default'], externalConditions: [sourceCondition] } },
    test: {
      include: options.include ?? ['src/**/*.test.ts'],
      environment: 'node',
      testTimeout: options.testTimeout ?? 60_000,
      hookTimeout: options.testTimeout ?? 60_000,
      pool: 'forks',
      ...(options.maxWorkers !== undefined ? { maxWorkers: options.maxWorkers } : {}),
      reporters: ['default'],
    },
  });
}
