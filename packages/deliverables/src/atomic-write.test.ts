import { mkdir, mkdtemp, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { DesignResult } from '@binsupport/design';
import { atomicWrite, outputPath, tempPathFor } from './atomic-write.js';
import { writeDesignPdf } from './pdf-report.js';
import { writeDesignXlsx } from './xlsx-report.js';
import { demoDesignResult } from './test-support/demo-result.js';

let folder: string;

beforeEach(async () => {
  folder = await mkdtemp(join(tmpdir(), 'binsupport-atomic-'));
});

afterEach(async () => {
  await rm(folder, { recursive: true, force: true });
});

/** A result that fails half-way through rendering (the member list is gone). */
function brokenResult(): DesignResult {
  const result: Record<string, unknown> = { ...demoDesignResult() };
  delete result.members;
  return result as unknown as DesignResult;
}

describe('atomicWrite', () => {
  it('names the temp file beside the target with pid and a random part', () => {
    const a = tempPathFor('/out/design.pdf');
    const b = tempPathFor('/out/design.pdf');
    expect(a).toMatch(new RegExp(`^/out/design\\.pdf\\.tmp-${process.pid}-[0-9a-f]{12}$`));
    expect(a).not.toBe(b);
  });

  it('writes a new file and replaces an existing one, leaving no temp file', async () => {
    const target = join(folder, 'design.json');
    await atomicWrite(target, '{"schemaVersion":"1.0.0"}\n');
    expect(await readFile(target, 'utf8')).toBe('{"schemaVersion":"1.0.0"}\n');
    await atomicWrite(target, new Uint8Array([1, 2, 3]));
    expect([...(await readFile(target))]).toEqual([1, 2, 3]);
    expect(await readdir(folder)).toEqual(['design.json']);
  });

  it('removes its temp file and rethrows when the rename fails', async () => {
    // A non-empty folder where the file should go: the data is written, the rename is refused.
    const target = join(folder, 'design.pdf');
    await mkdir(target);
    await writeFile(join(target, 'keep.txt'), 'kept');
    await expect(atomicWrite(target, 'new bytes')).rejects.toThrow();
    expect(await readdir(folder)).toEqual(['design.pdf']);
    expect(await readFile(join(target, 'keep.txt'), 'utf8')).toBe('kept');
  });

  it('fails without creating anything when the folder does not exist', async () => {
    await expect(atomicWrite(join(folder, 'missing', 'design.json'), 'x')).rejects.toThrow(/ENOENT/);
    expect(await readdir(folder)).toEqual([]);
  });
});

describe('writing the deliverables', () => {
  it('a failing PDF render leaves the existing report untouched', async () => {
    const target = join(folder, 'design.pdf');
    await writeFile(target, 'previous report');
    await expect(writeDesignPdf(brokenResult(), target)).rejects.toThrow();
    expect(await readFile(target, 'utf8')).toBe('previous report');
    expect(await readdir(folder)).toEqual(['design.pdf']);
  });

  it('a failing workbook render leaves the existing workbook untouched', async () => {
    const target = join(folder, 'design.xlsx');
    await writeFile(target, 'previous workbook');
    await expect(writeDesignXlsx(brokenResult(), target)).rejects.toThrow();
    expect(await readFile(target, 'utf8')).toBe('previous workbook');
    expect(await readdir(folder)).toEqual(['design.xlsx']);
  });

  it('a successful write replaces the file whole', async () => {
    const target = join(folder, 'design.pdf');
    await writeFile(target, 'previous report');
    await writeDesignPdf(demoDesignResult(), target);
    const bytes = await readFile(target);
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(bytes.subarray(-6).toString('latin1')).toMatch(/%%EOF\s*$/);
    expect(await readdir(folder)).toEqual(['design.pdf']);
  });
});

describe('outputPath', () => {
  it('places a plain file name in the output folder', () => {
    expect(outputPath('/out/run', 'design.json')).toBe('/out/run/design.json');
    expect(outputPath('/', 'compare.json')).toBe('/compare.json');
  });

  it('refuses a name that would leave the folder, hide itself or carry control characters', () => {
    for (const name of ['../design.json', '/etc/passwd', 'sub/design.json', '..', '.hidden', '', 'a\\b.json', 'line\nbreak.json']) {
      expect(() => outputPath('/out/run', name), JSON.stringify(name)).toThrow(/refusing the output file name/);
    }
  });
});
