// Test configuration only: it holds no check values (each verification test names its source).
import { projectTestConfig } from '../vitest.shared.js';

// Two forks: the two halves of the whole-pipeline fuzz (src/fuzz/pipeline-*.fuzz.test.ts) run side by side.
export default projectTestConfig({ testTimeout: 180_000, maxWorkers: 2 });
