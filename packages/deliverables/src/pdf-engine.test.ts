import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isInsideFolder, renderPdfDefinition, robotoFolder, svgNode } from './pdf-engine.js';

// A 1 x 1 pixel PNG.
const pngBase64 = 'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==';
const pngDataUrl = `data:image/png;base64,${pngBase64}`;

let folder: string;
let localPng: string;

beforeAll(async () => {
  folder = await mkdtemp(join(tmpdir(), 'binsupport-pdf-policy-'));
  localPng = join(folder, 'pixel.png');
  await writeFile(localPng, Buffer.from(pngBase64, 'base64'));
});

afterAll(async () => {
  await rm(folder, { recursive: true, force: true });
});

describe('local file policy', () => {
  it('admits only files inside the Roboto folder', () => {
    const fonts = robotoFolder();
    expect(isInsideFolder(join(fonts, 'Roboto-Regular.ttf'), fonts)).toBe(true);
    expect(isInsideFolder(fonts, fonts)).toBe(false);
    expect(isInsideFolder(join(fonts, '..', '..', 'package.json'), fonts)).toBe(false);
    expect(isInsideFolder(`${fonts}-other/Roboto-Regular.ttf`, fonts)).toBe(false);
    expect(isInsideFolder('/etc/hostname', fonts)).toBe(false);
  });

  it('renders an inline image (the control case)', async () => {
    const pdf = await renderPdfDefinition({ content: ['Image follows', { image: pngDataUrl, width: 20 }] });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  });

  it('refuses a document that refers to another local file', async () => {
    await expect(renderPdfDefinition({ content: [{ image: localPng, width: 20 }] })).rejects.toThrow(
      /Access to local file denied by resource access policy/,
    );
    await expect(
      renderPdfDefinition({ content: [{ image: 'pixel', width: 20 }], images: { pixel: localPng } }),
    ).rejects.toThrow(/Access to local file denied/);
  });

  it('refuses an SVG whose image refers to a local file', async () => {
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="20" height="20"><image href="${localPng}" x="0" y="0" width="20" height="20"/></svg>`;
    await expect(renderPdfDefinition({ content: [svgNode(svg, 20)] })).rejects.toThrow(/Access denied: an SVG image/);
  });
});

describe('URL policy', () => {
  it('refuses every URL before any request is made', async () => {
    await expect(
      renderPdfDefinition({ content: [{ image: 'remote', width: 20 }], images: { remote: 'https://example.invalid/logo.png' } }),
    ).rejects.toThrow(/Access to URL denied by resource access policy: https:\/\/example\.invalid\/logo\.png/);
  });
});
