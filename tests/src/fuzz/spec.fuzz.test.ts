import { readFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { loadsReport } from '@binsupport/design';
import { normaliseSpec, parseSpecText, SpecError } from '@binsupport/spec';

// Hostile inputs: generated specs never crash the parser and the load derivation; an invalid spec
// always gives a SpecError whose message names an input path. Fixed seeds; `runs` is raised by the
// soak run (FUZZ_RUNS). Property-based testing with fast-check (an independent generator of inputs).
const runs = Number(process.env['FUZZ_RUNS'] ?? 1000);
const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..', '..');
const demo = parseSpecText(readFileSync(join(root, 'demo-data', 'kestrel-grain-bin.yaml'), 'utf8'), 'yaml') as Record<string, unknown>;

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

function leafPaths(value: unknown, prefix: string[] = []): string[][] {
  if (value !== null && typeof value === 'object') {
    return Object.entries(value as Record<string, unknown>).flatMap(([key, item]) => leafPaths(item, [...prefix, key]));
  }
  return [prefix];
}

function withLeaf(document: unknown, path: string[], replacement: unknown): unknown {
  const copy = structuredClone(document) as Record<string, unknown>;
  let node = copy as Record<string, unknown>;
  path.slice(0, -1).forEach((key) => {
    node = node[key] as Record<string, unknown>;
  });
  node[path[path.length - 1] as string] = replacement;
  return copy;
}

const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.double(),
  fc.constantFrom(Number.NaN, Infinity, -Infinity, -1, 0, 1e308, -1e308, 1e-320),
  fc.string(),
  fc.constantFrom('6 m', '30 deg', 'NaN', '', 'true', '1e400'),
  fc.constant(null),
  fc.boolean(),
  fc.array(fc.integer(), { maxLength: 3 }),
  fc.dictionary(fc.string({ maxLength: 5 }), fc.integer(), { maxKeys: 2 }),
);

describe('fuzz: spec parser and load derivation', () => {
  const leaves = leafPaths(demo);

  it(`one hostile leaf: either a valid spec or a SpecError naming an input path (${runs} cases)`, () => {
    let refused = 0;
    fc.assert(
      fc.property(fc.constantFrom(...leaves), hostileValue, (path, value) => {
        const document = withLeaf(demo, path, value);
        try {
          const spec = normaliseSpec(document);
          expect(spec.bin.shape === 'circular' ? spec.bin.diameter : spec.bin.lengthX).toBeGreaterThan(0);
        } catch (error) {
          expect(error).toBeInstanceOf(SpecError);
          refused += 1;
          const specError = error as SpecError;
          expect(specError.path.length).toBeGreaterThan(0);
          expect(specError.message).toContain(specError.issues[0]?.path ?? '');
        }
      }),
      { numRuns: runs, seed: 20261201 },
    );
    // The generator must really produce bad inputs: most hostile values are refused.
    expect(refused).toBeGreaterThan(runs / 2);
  });

  it(`random documents: never anything but a SpecError (${runs} cases)`, () => {
    const jsonValue = fc.jsonValue({ maxDepth: 4 }) as fc.Arbitrary<Json>;
    fc.assert(
      fc.property(jsonValue, (document) => {
        try {
          normaliseSpec(document);
        } catch (error) {
          expect(error).toBeInstanceOf(SpecError);
        }
      }),
      { numRuns: runs, seed: 7 },
    );
  });

  it(`random text as YAML and JSON: a parse error or a document, never a crash (${runs} cases)`, () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 200 }), fc.constantFrom('yaml' as const, 'json' as const), (text, format) => {
        try {
          normaliseSpec(parseSpecText(text, format, 'fuzz'));
        } catch (error) {
          expect(error).toBeInstanceOf(SpecError);
        }
      }),
      { numRuns: runs, seed: 11 },
    );
  });

  it(`random valid bins: the loads derive and close (statics, ${runs} cases)`, () => {
    let derived = 0;
    const bin = fc.record({
      diameter: fc.double({ min: 2, max: 30, noNaN: true }),
      slenderness: fc.double({ min: 0.5, max: 5, noNaN: true }),
      apexHalfAngle: fc.double({ min: 10, max: 60, noNaN: true }),
      outletFraction: fc.double({ min: 0.05, max: 0.3, noNaN: true }),
      wall: fc.double({ min: 3, max: 20, noNaN: true }),
      solid: fc.constantFrom('wheat', 'maize', 'barley', 'sand', 'coal', 'sugar', 'fly-ash', 'cement-clinker'),
    });
    fc.assert(
      fc.property(bin, (b) => {
        const cylinderHeight = Math.min(b.diameter * b.slenderness, 60);
        let spec;
        try {
          spec = normaliseSpec({
            project: { name: 'fuzz bin (generated)' },
            bin: { diameter: b.diameter, cylinderHeight, wallThickness: b.wall, hopper: { apexHalfAngle: b.apexHalfAngle, outletDiameter: b.outletFraction * b.diameter, thickness: b.wall } },
            solid: { name: b.solid },
            support: { columns: 8 },
          });
        } catch (error) {
          // Only the scope limits of EN 1991-4 (overall slenderness) may refuse a generated bin.
          expect(error).toBeInstanceOf(SpecError);
          expect((error as SpecError).message).toMatch(/h_b/);
          return;
        }
        const report = loadsReport(spec);
        const gravity = report.cases.filter((c) => c.name === 'G' || c.name === 'Q_s,f').reduce((sum, c) => sum + c.verticalResultant, 0);
        expect(Math.abs(gravity / (report.totals.solidWeight + report.totals.structureWeight) - 1)).toBeLessThan(1e-9);
        for (const profile of report.profiles) for (const ph of profile.ph) expect(ph).toBeGreaterThanOrEqual(0);
        derived += 1;
      }),
      { numRuns: runs, seed: 3 },
    );
    expect(derived).toBeGreaterThan(runs / 2);
  });
});
