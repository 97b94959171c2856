// Test configuration only: it holds no check values (each verification test names its source).
import { projectTestConfig } from '../vitest.shared.js';

export default projectTestConfig({ testTimeout: 180_000 });
