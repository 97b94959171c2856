import { mkdir } from 'node:fs/promises';
import { resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { analyseModelFile, designFromSpec, DesignError, stableJson, type ModelFileResult } from '@binsupport/design';
import { atomicWrite, outputPath, writeDesignPdf, writeDesignXlsx } from '@binsupport/deliverables';
import { readGirderModelFile, readSpecFile, SpecError, writeSpecTemplate } from '@binsupport/spec';
import { runLoads, runMaterials, runSections } from './catalogue-commands.js';
import { runCompare } from './compare-command.js';
import { version } from './version.js';

export interface CliStreams {
  stdout: { write(chunk: string): unknown };
  stderr: { write(chunk: string): unknown };
}

/** Exit codes: 0 success, 1 a design that cannot be satisfied or a stage that refused, 2 bad input. */
export const EXIT_OK = 0;
export const EXIT_NOT_SATISFIED = 1;
export const EXIT_BAD_INPUT = 2;

const mainHelp = `binsupport ${version}: design of the support girders of steel storage bins

Usage:
  binsupport design <spec> --out <folder>       design a bin's support girder (spec: .yaml, .json, .xlsx)
  binsupport compare <options> --out <folder>   design and compare many options (tonnage, cost)
  binsupport template --xlsx <spec.xlsx>        write a blank spec-sheet workbook to fill in
  binsupport analyse <model> [--json]           re-run one girder model (as written by design)
  binsupport loads <spec> [--json]              the load derivation of a spec, without the girder
  binsupport materials [--json]                 the built-in stored solids
  binsupport sections <family> [--json]         a section family with its properties
  binsupport --help | --version

Run 'binsupport design --help' for the inputs and outputs of a design.

This is a first-pass design tool. Every result must be verified by a qualified engineer;
local codes and licensed practice govern.
`;

const designHelp = `Usage: binsupport design <spec> --out <folder> [--quiet]

Reads a bin specification (YAML, JSON or a filled spec-sheet workbook; see docs/input-reference.md for every input, its unit and
range), derives the stored-solid loads (EN 1991-4), analyses the ring girder under every combination
and support scenario, picks the lightest adequate section and writes to <folder>:
  design.json            the full result (SI units; docs/output-schema.md)
  design.xlsx            workbook: summary, members, utilisations, loads, scenarios, inputs
  design.pdf             calculation report
  model-<scenario>.json  the girder model of each support scenario, for re-analysis by a checker

Options:
  --out <folder>   output folder (created if missing); existing files are replaced whole
  --quiet          no progress lines
  --help           this text

Exit codes: 0 designed and verified; 1 no adequate design (the best attempt is still written and
reported) or an analysis that refused to give an answer; 2 bad input (the message names the input).
`;

const analyseHelp = `Usage: binsupport analyse <model> [--json] [--combination NAME]

Re-runs the analysis of a girder-model file (docs/girder-model.md) such as the model-<scenario>.json
that 'design' writes, for every combination in it or only the one named.

Options:
  --json                 print the full results (stations, reactions, springs, contact state) as JSON
  --combination NAME     analyse only this combination
  --help                 this text

Without --json a summary per combination is printed. Units: SI (N, m, rad).
Exit codes: 0 analysed; 1 the analysis refused (mechanism, no convergence); 2 bad input.
`;

function fail(streams: CliStreams, code: number, message: string): number {
  streams.stderr.write(`binsupport: ${message}\n`);
  return code;
}

async function runDesign(args: string[], streams: CliStreams): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({ args, allowPositionals: true, options: { out: { type: 'string' }, quiet: { type: 'boolean' }, help: { type: 'boolean' } } });
  } catch (error) {
    return fail(streams, EXIT_BAD_INPUT, `${(error as Error).message}\n\n${designHelp}`);
  }
  if (parsed.values.help) {
    streams.stdout.write(designHelp);
    return EXIT_OK;
  }
  const [specPath, ...extra] = parsed.positionals;
  if (!specPath || extra.length > 0) return fail(streams, EXIT_BAD_INPUT, `design takes exactly one spec file\n\n${designHelp}`);
  if (!parsed.values.out) return fail(streams, EXIT_BAD_INPUT, `design needs --out <folder>\n\n${designHelp}`);
  const outDir = resolve(parsed.values.out);
  const progress = (line: string) => {
    if (!parsed.values.quiet) streams.stderr.write(`${line}\n`);
  };

  try {
    progress(`reading ${specPath}`);
    const spec = await readSpecFile(specPath);
    const outcome = await designFromSpec(spec, { progress });
    await mkdir(outDir, { recursive: true });
    for (const { scenario, model } of outcome.models) {
      await atomicWrite(outputPath(outDir, `model-${scenario}.json`), stableJson(model));
    }
    await atomicWrite(outputPath(outDir, 'design.json'), stableJson(outcome.result));
    await writeDesignXlsx(outcome.result, outputPath(outDir, 'design.xlsx'));
    await writeDesignPdf(outcome.result, outputPath(outDir, 'design.pdf'));
    progress(`wrote design.json, design.xlsx, design.pdf to ${outDir}`);
    for (const member of outcome.result.members) {
      streams.stdout.write(
        `${member.id}: ${member.section} ${member.grade}, ${(member.mass / 1000).toFixed(2)} t, utilisation ${member.utilisation === null ? "beyond resistance" : member.utilisation.toFixed(3)} (${member.governing.check}, ${member.governing.clause}, ${member.governing.combination}, ${member.governing.scenario})\n`,
      );
    }
    if (outcome.result.status !== 'verified') {
      return fail(streams, EXIT_NOT_SATISFIED, `no adequate design: ${outcome.result.optimisation.message}`);
    }
    return EXIT_OK;
  } catch (error) {
    if (error instanceof SpecError) return fail(streams, EXIT_BAD_INPUT, error.message);
    if (error instanceof DesignError) return fail(streams, error.code === 'BAD_INPUT' ? EXIT_BAD_INPUT : EXIT_NOT_SATISFIED, `${error.message}${error.path ? ` (input: ${error.path})` : ''}`);
    throw error;
  }
}

const templateHelp = `Usage: binsupport template --xlsx <spec.xlsx>

Writes a blank spec-sheet workbook: one input per row with its unit, allowed range, default and note,
drop-down lists for choices. Fill in the Value column and run 'binsupport design spec.xlsx --out dir'.
An existing file is replaced whole.
`;

async function runTemplate(args: string[], streams: CliStreams): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({ args, options: { xlsx: { type: 'string' }, help: { type: 'boolean' } } });
  } catch (error) {
    return fail(streams, EXIT_BAD_INPUT, `${(error as Error).message}\n\n${templateHelp}`);
  }
  if (parsed.values.help) {
    streams.stdout.write(templateHelp);
    return EXIT_OK;
  }
  const target = parsed.values.xlsx;
  if (!target || !target.toLowerCase().endsWith('.xlsx')) return fail(streams, EXIT_BAD_INPUT, `template needs --xlsx <file.xlsx>\n\n${templateHelp}`);
  await atomicWrite(resolve(target), await writeSpecTemplate());
  streams.stderr.write(`wrote the spec-sheet template ${target}\n`);
  return EXIT_OK;
}

function summaryLine(analysis: ModelFileResult['analyses'][number]): string {
  const peak = (key: 'N' | 'Vz' | 'T' | 'My' | 'B') => Math.max(...analysis.stations.map((station) => Math.abs(station[key])));
  const sums = analysis.reactionSum.map((value) => value.toExponential(4)).join(', ');
  return `${analysis.combination}: converged ${analysis.converged ? 'yes' : 'no'} in ${analysis.iterations} iteration(s), residual ${analysis.residual.toExponential(2)}, reactions [${sums}] N; peaks |N| ${peak('N').toExponential(4)} N, |Vz| ${peak('Vz').toExponential(4)} N, |T| ${peak('T').toExponential(4)} N m, |My| ${peak('My').toExponential(4)} N m, |B| ${peak('B').toExponential(4)} N m2\n`;
}

async function runAnalyse(args: string[], streams: CliStreams): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({ args, allowPositionals: true, options: { json: { type: 'boolean' }, combination: { type: 'string' }, help: { type: 'boolean' } } });
  } catch (error) {
    return fail(streams, EXIT_BAD_INPUT, `${(error as Error).message}\n\n${analyseHelp}`);
  }
  if (parsed.values.help) {
    streams.stdout.write(analyseHelp);
    return EXIT_OK;
  }
  const [modelPath, ...extra] = parsed.positionals;
  if (!modelPath || extra.length > 0) return fail(streams, EXIT_BAD_INPUT, `analyse takes exactly one model file\n\n${analyseHelp}`);
  try {
    const file = await readGirderModelFile(modelPath);
    const result = analyseModelFile(file, parsed.values.combination);
    if (parsed.values.json) streams.stdout.write(stableJson(result));
    else for (const analysis of result.analyses) streams.stdout.write(summaryLine(analysis));
    return EXIT_OK;
  } catch (error) {
    if (error instanceof SpecError) return fail(streams, EXIT_BAD_INPUT, error.message);
    if (error instanceof DesignError) return fail(streams, error.code === 'BAD_INPUT' ? EXIT_BAD_INPUT : EXIT_NOT_SATISFIED, `${error.message}${error.path ? ` (at ${error.path})` : ''}`);
    throw error;
  }
}

export async function runCli(argv: string[], streams: CliStreams): Promise<number> {
  const [command, ...rest] = argv;
  if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
    streams.stdout.write(mainHelp);
    return command === undefined ? EXIT_BAD_INPUT : EXIT_OK;
  }
  if (command === '--version') {
    streams.stdout.write(`${version}\n`);
    return EXIT_OK;
  }
  if (command === 'design') return runDesign(rest, streams);
  if (command === 'analyse') return runAnalyse(rest, streams);
  if (command === 'compare') return runCompare(rest, streams);
  if (command === 'loads') return runLoads(rest, streams);
  if (command === 'template') return runTemplate(rest, streams);
  if (command === 'materials') return runMaterials(rest, streams);
  if (command === 'sections') return runSections(rest, streams);
  return fail(streams, EXIT_BAD_INPUT, `unknown command '${command}'\n\n${mainHelp}`);
}
