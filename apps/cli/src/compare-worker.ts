// A worker thread of `binsupport compare`: designs one option per task and returns its row (plain
// data, so it crosses the thread boundary by structured clone) with the time the design took (for
// the progress lines only: time never enters the comparison files). The pool calls the named export.
import { designOption, type CompareRow } from '@binsupport/design';
import type { OptionCase } from '@binsupport/spec';

export async function designOptionTask(option: OptionCase): Promise<{ row: CompareRow; seconds: number }> {
  const start = performance.now();
  const row = await designOption(option);
  return { row, seconds: (performance.now() - start) / 1000 };
}
