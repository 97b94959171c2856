// Every output file is written whole or not at all (DESIGN.md, "Errors"): the bytes go to a temp file
// in the target's own folder (a rename is only atomic within one file system), are flushed to disk,
// and the temp file is then renamed over the target. On any failure the temp file is removed and an
// existing target is left as it was.
import { randomBytes } from 'node:crypto';
import { rmSync } from 'node:fs';
import { open, rename, rm } from 'node:fs/promises';
import { basename, dirname, join, resolve } from 'node:path';

/**
 * The path of an output file `name` inside `folder`. A name is one plain file name: no folder part,
 * no '..', not hidden, no control characters, so that no output can land outside the folder chosen
 * by the user (whatever a name is built from).
 */
export function outputPath(folder: string, name: string): string {
  // eslint-disable-next-line no-control-regex
  if (name === '' || name !== basename(name) || name.includes('/') || name.includes('\\') || name.startsWith('.') || /[\u0000-\u001f]/.test(name)) {
    throw new Error(`refusing the output file name '${name}': an output is a plain file name inside the output folder`);
  }
  const path = join(resolve(folder), name);
  if (dirname(path) !== resolve(folder)) throw new Error(`refusing the output file name '${name}': it leaves the output folder`);
  return path;
}

/** The temp-file name used for `path`: `<name>.tmp-<pid>-<random>` beside it. */
export function tempPathFor(path: string): string {
  const suffix = `${process.pid}-${randomBytes(6).toString('hex')}`;
  return join(dirname(path), `${basename(path)}.tmp-${suffix}`);
}

/** Temp files of the writes in progress (for abandonPendingWrites). */
const pending = new Set<string>();
let abandoned = false;

/** Thrown by a write that was in progress when abandonPendingWrites was called. */
export class WriteAbandonedError extends Error {
  constructor(path: string) {
    super(`the write of ${path} was abandoned (the program is stopping)`);
    this.name = 'WriteAbandonedError';
  }
}

/**
 * Remove the temp files of every write in progress, synchronously (for a signal handler: Ctrl-C or
 * SIGTERM mid-run leaves no partial file), and refuse any later rename. Returns the removed paths.
 */
export function abandonPendingWrites(): string[] {
  abandoned = true;
  const removed = [...pending];
  for (const tempPath of removed) rmSync(tempPath, { force: true });
  pending.clear();
  return removed;
}

export async function atomicWrite(path: string, bytes: Uint8Array | string): Promise<void> {
  if (abandoned) throw new WriteAbandonedError(path);
  const tempPath = tempPathFor(path);
  pending.add(tempPath);
  try {
    // 'wx': never reuse a file that happens to exist under the temp name.
    const handle = await open(tempPath, 'wx', 0o644);
    try {
      await handle.writeFile(bytes);
      await handle.sync();
    } finally {
      await handle.close();
    }
    if (abandoned) throw new WriteAbandonedError(path);
    await rename(tempPath, path);
  } catch (error) {
    await rm(tempPath, { force: true });
    throw error;
  } finally {
    pending.delete(tempPath);
  }
  await syncFolder(dirname(path));
}

// Make the rename itself durable. Some platforms and file systems cannot open or fsync a folder;
// the file is already complete and in place by then, so that is not an error.
async function syncFolder(folder: string): Promise<void> {
  try {
    const handle = await open(folder, 'r');
    try {
      await handle.sync();
    } finally {
      await handle.close();
    }
  } catch {
    // best effort only
  }
}
