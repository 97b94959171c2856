// Worker-thread entry of `binsupport compare` when the workspace runs from TypeScript source: Node
// does not carry the tsx loader of the launcher into worker threads, so register it here, then load
// the worker module itself (src/compare-worker.ts). A built install loads dist/compare-worker.js
// directly and does not use this file.
import { register } from 'tsx/esm/api';

register();
const worker = await import('../src/compare-worker.ts');
export const designOptionTask = worker.designOptionTask;
