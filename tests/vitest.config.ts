import { projectTestConfig } from '../vitest.shared.js';

export default projectTestConfig({ testTimeout: 180_000 });
