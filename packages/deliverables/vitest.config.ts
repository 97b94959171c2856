import { projectTestConfig } from '../../vitest.shared.js';

export default projectTestConfig();
