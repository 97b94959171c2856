import { parseArgs } from 'node:util';
import { DesignError, listedSectionFamilies, loadsReport, sectionCatalogue, stableJson } from '@binsupport/design';
import { readSpecFile, SpecError, storedSolidTable } from '@binsupport/spec';
import type { CliStreams } from './cli.js';

// The listing commands: `loads`, `materials`, `sections`. They print; they write no files.

export const loadsHelp = `Usage: binsupport loads <spec> [--json]

Derives the loads of a spec (EN 1991-4 stored solid, EN 1990 combinations and the other actions)
without analysing the girder. --json prints { schemaVersion, cases[], combinations[], profiles[],
totals, derivation[], notes[] } in SI units (N, m, Pa; profiles: depth z in m, pressures in Pa).
`;

export const materialsHelp = `Usage: binsupport materials [--json]

Lists the built-in stored solids (EN 1991-4 Annex E, Table E.1) with their source.
`;

export const sectionsHelp = `Usage: binsupport sections <family> [--json]

Lists a section family with its key properties. Families: ${listedSectionFamilies().join(', ')}.
`;

function failWith(streams: CliStreams, code: number, message: string): number {
  streams.stderr.write(`binsupport: ${message}\n`);
  return code;
}

function options(args: string[], help: string, streams: CliStreams): { json: boolean; positionals: string[] } | number {
  try {
    const parsed = parseArgs({ args, allowPositionals: true, options: { json: { type: 'boolean' }, help: { type: 'boolean' } } });
    if (parsed.values.help) {
      streams.stdout.write(help);
      return 0;
    }
    return { json: parsed.values.json === true, positionals: parsed.positionals };
  } catch (error) {
    return failWith(streams, 2, `${(error as Error).message}\n\n${help}`);
  }
}

function fixed(value: number, digits: number): string {
  return value.toFixed(digits);
}

export async function runLoads(args: string[], streams: CliStreams): Promise<number> {
  const parsed = options(args, loadsHelp, streams);
  if (typeof parsed === 'number') return parsed;
  const [specPath, ...extra] = parsed.positionals;
  if (!specPath || extra.length > 0) return failWith(streams, 2, `loads takes exactly one spec file\n\n${loadsHelp}`);
  try {
    const report = loadsReport(await readSpecFile(specPath));
    if (parsed.json) {
      streams.stdout.write(stableJson(report));
      return 0;
    }
    streams.stdout.write(`solid ${fixed(report.totals.solidWeight / 1e3, 1)} kN, structure ${fixed(report.totals.structureWeight / 1e3, 1)} kN\n`);
    if (report.shape === 'rectangular') {
      for (const loadCase of report.cases) {
        streams.stdout.write(`${loadCase.name.padEnd(10)} vertical ${fixed(loadCase.verticalResultant / 1e3, 1).padStart(9)} kN on the support line  ${loadCase.description}\n`);
      }
    } else {
      for (const loadCase of report.cases) {
        streams.stdout.write(`${loadCase.name.padEnd(10)} vertical ${fixed(loadCase.verticalLineLoad / 1e3, 2).padStart(9)} kN/m  radial ${fixed(loadCase.radialLineLoad / 1e3, 2).padStart(8)} kN/m  ${loadCase.description}\n`);
      }
    }
    for (const combination of report.combinations) streams.stdout.write(`${combination.name.padEnd(8)} ${combination.expression}  (${combination.clause})\n`);
    for (const note of report.notes) streams.stdout.write(`note: ${note}\n`);
    return 0;
  } catch (error) {
    if (error instanceof SpecError) return failWith(streams, 2, error.message);
    if (error instanceof DesignError) return failWith(streams, error.code === 'BAD_INPUT' ? 2 : 1, `${error.message}${error.path ? ` (input: ${error.path})` : ''}`);
    throw error;
  }
}

export function runMaterials(args: string[], streams: CliStreams): number {
  const parsed = options(args, materialsHelp, streams);
  if (typeof parsed === 'number') return parsed;
  const table = storedSolidTable();
  if (parsed.json) {
    streams.stdout.write(stableJson(table));
    return 0;
  }
  streams.stdout.write('id                  gamma_l/gamma_u [kN/m3]  phi_r [deg]  phi_im [deg]  K_m   mu_m D1/D2/D3   C_op  source\n');
  for (const row of table) {
    streams.stdout.write(
      `${row.id.padEnd(20)}${`${row.unitWeightLowerKnM3}/${row.unitWeightUpperKnM3}`.padEnd(25)}${String(row.angleOfReposeDeg).padEnd(13)}${String(row.internalFrictionAngleDeg).padEnd(14)}${String(row.lateralPressureRatio).padEnd(6)}${`${row.wallFriction.D1}/${row.wallFriction.D2}/${row.wallFriction.D3}`.padEnd(16)}${String(row.patchLoadFactor).padEnd(6)}${row.source}\n`,
    );
  }
  return 0;
}

export function runSections(args: string[], streams: CliStreams): number {
  const parsed = options(args, sectionsHelp, streams);
  if (typeof parsed === 'number') return parsed;
  const family = parsed.positionals.join(' ');
  if (!family) return failWith(streams, 2, `sections needs a family\n\n${sectionsHelp}`);
  try {
    const rows = sectionCatalogue(family);
    if (parsed.json) {
      streams.stdout.write(stableJson(rows));
      return 0;
    }
    streams.stdout.write('designation   h [mm]  b [mm]  t_w [mm]  t_f [mm]  mass [kg/m]  A [cm2]   I_y [cm4]   W_pl,y [cm3]  I_t [cm4]  I_w [cm6]\n');
    for (const row of rows) {
      const d = row.dimensions;
      streams.stdout.write(
        `${row.designation.padEnd(14)}${fixed(d.depth * 1e3, 0).padStart(6)}${fixed(d.flangeWidth * 1e3, 0).padStart(8)}${fixed(d.webThickness * 1e3, 1).padStart(10)}${fixed(d.flangeThickness * 1e3, 1).padStart(10)}${fixed(row.massPerMetre, 1).padStart(13)}${fixed(row.area * 1e4, 1).padStart(9)}${fixed(row.secondMomentOfAreaY * 1e8, 0).padStart(12)}${fixed(row.plasticModulusY * 1e6, 1).padStart(14)}${fixed(row.torsionConstant * 1e8, 2).padStart(11)}${fixed(row.warpingConstant * 1e12, 0).padStart(11)}\n`,
      );
    }
    return 0;
  } catch (error) {
    if (error instanceof DesignError) return failWith(streams, 2, error.message);
    throw error;
  }
}
