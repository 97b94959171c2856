import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import { mkdtemp, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { delimiter, join } from 'node:path';
import { promisify } from 'node:util';
import { extractText, getMeta } from 'unpdf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DesignResult } from '@binsupport/design';
import { renderDesignPdf, REPORT_STANDING } from './pdf-report.js';
import { formatForce, formatKilo, formatNumber, formatUtilisation } from './units.js';
import { bearingPanels } from './report-data.js';
import { demoDesignResult } from './test-support/demo-result.js';

const run = promisify(execFile);

function findExecutable(name: string): string | undefined {
  for (const folder of (process.env.PATH ?? '').split(delimiter)) {
    const candidate = join(folder, name);
    if (folder !== '' && existsSync(candidate)) return candidate;
  }
  return undefined;
}

/** Collapse the line breaks and runs of spaces that table cells introduce. */
function normalise(text: string): string {
  return text.replace(/\s+/g, ' ');
}

async function pagesOf(pdf: Buffer): Promise<{ totalPages: number; pages: string[] }> {
  const { totalPages, text } = await extractText(new Uint8Array(pdf));
  return { totalPages, pages: text.map(normalise) };
}

let result: DesignResult;
let pdf: Buffer;
let pages: string[];
let totalPages: number;
let folder: string;

beforeAll(async () => {
  result = demoDesignResult();
  pdf = await renderDesignPdf(result);
  ({ pages, totalPages } = await pagesOf(pdf));
  folder = await mkdtemp(join(tmpdir(), 'binsupport-pdf-'));
});

afterAll(async () => {
  await rm(folder, { recursive: true, force: true });
});

describe('design.pdf', () => {
  it('shows each member with its section, utilisation as printed and governing clause', () => {
    const all = pages.join(' ');
    for (const member of result.members) {
      const utilisation = formatUtilisation(member.utilisation);
      // Members table of section 6: section, grade, length, mass and utilisation in one row.
      const row = `${member.section} ${member.grade} ${formatNumber(member.length)} ${member.mass.toFixed(0)} ${utilisation}`;
      expect(all).toContain(row);
      // Trace of section 7: the member, its governing utilisation, check and clause together.
      const trace = all.slice(all.indexOf(`Member ${member.id}: ${member.section}, ${member.grade}`));
      expect(trace).toMatch(new RegExp(`^Member ${member.id}: .*?Governing utilisation ${utilisation.replace('.', '\\.')} Check ${member.governing.title.replace(/[()+]/g, '\\$&')}`));
      expect(trace.slice(0, 600)).toContain(`Clause ${member.governing.clause}`);
    }
  });

  it('states the lesson of every scenario beside its utilisation and tension flag', () => {
    const all = pages.join(' ');
    for (const scenario of result.scenarios) {
      expect(all).toContain(scenario.lesson);
    }
    const bonded = result.scenarios.find((s) => s.id === 'bonded');
    expect(bonded?.needsTension).toBe(true);
    expect(all).toContain(`needs ${formatKilo((bonded?.maxBearingTension ?? 0) / 1000)} kN of tension a plain bearing cannot give`);
  });

  it('draws the plan of the layout with each member at its governing position', () => {
    const all = pages.join(' ');
    expect(all).toContain('Figure 2.1. Plan of the support layout seen from above');
    expect(all).toContain(`columns C1 to C${result.girder.columns} at 45.0° spacing from +X, counter-clockwise`);
    for (const label of ['C1', 'C3', 'C8']) expect(all).toMatch(new RegExp(`\\b${label}\\b`));
    for (const member of result.members) {
      expect(all).toContain(`${member.id} ${formatUtilisation(member.utilisation)}`);
    }
  });

  it('reports the bearing contact of each scenario with bearings, flagging tension', () => {
    const all = pages.join(' ');
    expect(all).toContain('Bearing contact at the most loaded column');
    const panels = bearingPanels(result);
    expect(panels).toHaveLength(2);
    for (const panel of panels) {
      const percent = `${Math.round(panel.bearings.contactFraction * 100)} %`;
      expect(all).toContain(`(${panel.scenario.id}), governing combination ${panel.combination}: ${percent} of the bearing points are in contact`);
      expect(all).toContain(`is ${formatForce(panel.bearings.maxCompression)}.`);
    }
    const contact = panels.find((p) => p.scenario.id === 'contact');
    const lifted = contact?.bearings.mostLoadedColumn.forces.filter((f) => f === 0).length ?? 0;
    expect(lifted).toBeGreaterThan(0);
    expect(all).toContain(`lift${lifted === 1 ? 's' : ''} off (zero bars)`);
    const bonded = panels.find((p) => p.scenario.id === 'bonded');
    expect(all).toContain(`TENSION of up to ${formatForce(bonded?.bearings.maxTension ?? 0)} in one point: not available from a real bearing`);
  });

  it('carries the title block and the cautions on page 1', () => {
    const first = pages[0] ?? '';
    for (const value of Object.values(result.project)) {
      expect(first).toContain(value);
    }
    for (const caution of result.cautions) {
      expect(first).toContain(caution);
    }
    expect(first).toContain('VERIFIED');
  });

  it('numbers every page "page i of n"', () => {
    expect(totalPages).toBeGreaterThanOrEqual(5);
    pages.forEach((text, i) => expect(text).toContain(`page ${i + 1} of ${totalPages}`));
  });

  it('has the seven sections in order', () => {
    const all = pages.join(' ');
    const headings = ['1 Scope and cautions', '2 Inputs', '3 Loads', '4 Support model and scenarios', '5 Analysis', '6 Section choice', '7 Trace of the governing cases'];
    const positions = headings.map((h) => all.indexOf(h));
    expect(positions.every((p) => p >= 0)).toBe(true);
    expect([...positions].sort((a, b) => a - b)).toEqual(positions);
  });

  it('shows the load derivation in display units with its clauses', () => {
    const all = pages.join(' ');
    const pho = result.loads.derivation.find((step) => step.symbol === 'p_ho');
    expect(pho).toBeDefined();
    expect(all).toContain(`${((pho?.value ?? 0) / 1000).toFixed(2)} kPa`);
    expect(all).toContain('EN 1991-4 5.2.1.1');
    for (const combination of result.loads.combinations) {
      expect(all).toContain(combination.expression);
    }
  });

  it('is reproducible: the date comes from the result, the bytes do not depend on the clock', async () => {
    const again = await renderDesignPdf(demoDesignResult());
    expect(again.equals(pdf)).toBe(true);
    const { info } = await getMeta(new Uint8Array(pdf));
    expect(String(info.CreationDate)).toMatch(/^D:20250314/);
  });

  it('says so on page 1 when the design is infeasible, and falls back to its own cautions', async () => {
    const infeasible = demoDesignResult();
    infeasible.status = 'infeasible';
    infeasible.cautions = [];
    const { pages: text } = await pagesOf(await renderDesignPdf(infeasible));
    expect(text[0]).toContain('INFEASIBLE');
    for (const line of REPORT_STANDING) {
      expect(text[0]).toContain(line);
    }
  });

  it('renders a check that recorded no number as n/a with its note', async () => {
    const partial = demoDesignResult();
    const [row] = partial.utilisations;
    const [member] = partial.members;
    if (row === undefined || member === undefined) throw new Error('fixture too small');
    partial.utilisations.push({ ...row, check: 'out-of-scope-check', utilisation: null, note: 'outside the scope of this check for a class 4 section' });
    member.utilisation = null;
    const { pages: text } = await pagesOf(await renderDesignPdf(partial));
    const all = text.join(' ');
    expect(all).toContain('Governing utilisation n/a');
    expect(all).toContain('outside the scope of this check for a class 4 section');
  });

  const pdftoppm = findExecutable('pdftoppm');
  it.skipIf(pdftoppm === undefined)(
    `renders every page to PNG with pdftoppm${pdftoppm === undefined ? ' (SKIPPED: pdftoppm not found on PATH; install poppler-utils)' : ''}`,
    async () => {
      const file = join(folder, 'design.pdf');
      await writeFile(file, pdf);
      // execFile rejects on a non-zero exit status, so reaching the assertions means exit 0.
      await run(pdftoppm ?? 'pdftoppm', ['-r', '30', '-png', file, join(folder, 'page')]);
      const images = (await readdir(folder)).filter((name) => name.endsWith('.png'));
      expect(images).toHaveLength(totalPages);
    },
  );
});
