import { describe, expect, it } from 'vitest';
import { EXIT_BAD_INPUT, EXIT_OK, runCli } from './cli.js';

function capture() {
  const out: string[] = [];
  const err: string[] = [];
  return { streams: { stdout: { write: (chunk: string) => out.push(chunk) }, stderr: { write: (chunk: string) => err.push(chunk) } }, out, err };
}

describe('binsupport command line', () => {
  it('prints the usage with the cautions for --help', async () => {
    const { streams, out } = capture();
    expect(await runCli(['--help'], streams)).toBe(EXIT_OK);
    expect(out.join('')).toMatch(/binsupport design <spec> --out <folder>/);
    expect(out.join('')).toMatch(/verified by a qualified engineer/);
  });

  it('rejects an unknown command with exit code 2 and the usage', async () => {
    const { streams, err } = capture();
    expect(await runCli(['desing'], streams)).toBe(EXIT_BAD_INPUT);
    expect(err.join('')).toMatch(/unknown command 'desing'/);
  });

  it('asks for --out and for exactly one spec', async () => {
    const first = capture();
    expect(await runCli(['design', 'a.yaml'], first.streams)).toBe(EXIT_BAD_INPUT);
    expect(first.err.join('')).toMatch(/design needs --out <folder>/);
    const second = capture();
    expect(await runCli(['design', '--out', 'x'], second.streams)).toBe(EXIT_BAD_INPUT);
    expect(second.err.join('')).toMatch(/exactly one spec file/);
  });

  it('names the file when the spec has the wrong extension or does not exist', async () => {
    const wrong = capture();
    expect(await runCli(['design', 'spec.txt', '--out', '/tmp/never-written'], wrong.streams)).toBe(EXIT_BAD_INPUT);
    expect(wrong.err.join('')).toMatch(/spec.txt: an input file must be .yaml, .yml, .json/);
    const missing = capture();
    expect(await runCli(['design', 'no-such-spec.yaml', '--out', '/tmp/never-written'], missing.streams)).toBe(EXIT_BAD_INPUT);
    expect(missing.err.join('')).toMatch(/no-such-spec.yaml: the spec file cannot be read/);
  });
});

describe('listing commands', () => {
  it('materials lists the built-in solids with their source', async () => {
    const { streams, out } = capture();
    expect(await runCli(['materials'], streams)).toBe(EXIT_OK);
    expect(out.join('')).toMatch(/^wheat\s+7.5\/9\s.*Table E.1, row 'wheat'/m);
  });

  it('sections lists a family; IPE 300 weighs 42.2 kg/m (EN 10365 table value)', async () => {
    const { streams, out } = capture();
    expect(await runCli(['sections', 'IPE'], streams)).toBe(EXIT_OK);
    expect(out.join('')).toMatch(/^IPE 300\s+300\s+150\s+7.1\s+10.7\s+42.2\s/m);
    const bad = capture();
    expect(await runCli(['sections', 'W'], bad.streams)).toBe(EXIT_BAD_INPUT);
    expect(bad.err.join('')).toMatch(/section family 'W' is not known/);
  });

  it('loads --json closes: G + Q_s,f carry the solid and the plates (statics)', async () => {
    const { streams, out } = capture();
    expect(await runCli(['loads', '../../demo-data/kestrel-grain-bin.yaml', '--json'], streams)).toBe(EXIT_OK);
    const report = JSON.parse(out.join('')) as { schemaVersion: string; cases: Array<{ name: string; verticalResultant: number }>; totals: { solidWeight: number; structureWeight: number }; profiles: unknown[] };
    expect(report.schemaVersion).toBe('1.0.0');
    const gravity = report.cases.filter((c) => c.name === 'G' || c.name === 'Q_s,f').reduce((sum, c) => sum + c.verticalResultant, 0);
    expect(gravity / (report.totals.solidWeight + report.totals.structureWeight)).toBeCloseTo(1, 9);
    expect(report.profiles.length).toBeGreaterThan(0);
  });

  it('loads --json of a rectangular bin: the edge line loads of G + Q_s,f integrate to the solid and the plates (statics); design refuses the shape', async () => {
    const { streams, out } = capture();
    expect(await runCli(['loads', '../../demo-data/kestrel-sand-bunker.yaml', '--json'], streams)).toBe(EXIT_OK);
    const report = JSON.parse(out.join('')) as { shape: string; edges: Array<{ case: string; s: number[]; vertical: number[] }>; totals: { solidWeight: number; structureWeight: number }; profiles: Array<{ part: string }> };
    expect(report.shape).toBe('rectangular');
    // trapezoidal rule along each edge's stations
    const integral = (s: number[], q: number[]) => s.slice(1).reduce((sum, _, i) => sum + (((q[i + 1] ?? 0) + (q[i] ?? 0)) / 2) * ((s[i + 1] ?? 0) - (s[i] ?? 0)), 0);
    const gravity = report.edges.filter((edge) => edge.case === 'G' || edge.case === 'Q_s,f').reduce((sum, edge) => sum + integral(edge.s, edge.vertical), 0);
    expect(Math.abs(gravity / (report.totals.solidWeight + report.totals.structureWeight) - 1)).toBeLessThan(1e-3);
    expect(new Set(report.profiles.map((profile) => profile.part))).toEqual(new Set(['wall', 'hopper']));
    const refused = capture();
    expect(await runCli(['design', '../../demo-data/kestrel-sand-bunker.yaml', '--out', 'out/never'], refused.streams)).toBe(EXIT_BAD_INPUT);
    expect(refused.err.join('')).toContain('(input: bin.shape)');
  });
});
