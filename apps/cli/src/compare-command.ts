// `binsupport compare`: design every option of an options file on a pool of worker threads, with a
// progress bar on a terminal and plain lines otherwise, and write compare.json, compare.xlsx and
// compare.pdf; or run one shard of the list (--shard i/n), or join shards (--merge). The pool is
// piscina (a maintained worker-thread pool); the rows come back in any order and are put in option
// order, so the files do not depend on the number of workers or on the split into shards.
import { mkdir, readFile } from 'node:fs/promises';
import { availableParallelism } from 'node:os';
import { extname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { parseArgs } from 'node:util';
import cliProgress from 'cli-progress';
import { Piscina } from 'piscina';
import { compareReport, compareShard, DesignError, mergeShards, optionsDigest, shardCases, stableJson, type CompareResult, type CompareRow } from '@binsupport/design';
import { atomicWrite, cheapestSentence, outputPath, writeComparePdf, writeCompareXlsx } from '@binsupport/deliverables';
import { readOptionsFile, SpecError, type OptionCase } from '@binsupport/spec';
import type { CliStreams } from './cli.js';

const EXIT_OK = 0;
const EXIT_NOT_SATISFIED = 1;
const EXIT_BAD_INPUT = 2;
/** Largest worker count accepted (each worker holds one design in memory, about 100 MB at most). */
const MAX_WORKERS = 64;
/** Largest shard file read by --merge, bytes. */
const MAX_SHARD_BYTES = 50_000_000;

export const compareHelp = `Usage: binsupport compare <options> --out <folder> [--workers N] [--shard i/n] [--quiet]
       binsupport compare --merge <shard.json>... --out <folder>

Designs every option of an options file (YAML, JSON or XLSX; docs/options-file.md): the base spec,
the named options (inputs changed by path) and the sweeps (lists or ranges over inputs, combined as a
grid, and sweeps at constant capacity). Each option is a full design; one that is infeasible, has an
invalid input or is refused is reported in its row and never stops the others. Writes to <folder>:
  compare.json   every row (SI units; docs/output-schema.md, "Option comparison")
  compare.xlsx   one row an option, with live totals and a steel price to edit
  compare.pdf    the ranked options, tonnage and cost charts, the cheapest feasible option
With --shard i/n only the i-th of n slices is designed and compare-shard-i-of-n.json is written;
'compare --merge' joins the shard files of one study into the three files above (byte for byte
the files of an unsharded run).

Options:
  --out <folder>   output folder (created if missing); existing files are replaced whole
  --workers N      worker threads (default: the number of cores, at most the number of options)
  --shard i/n      design only every n-th option from the i-th (1 <= i <= n)
  --merge          join the shard files given as arguments
  --quiet          no progress
  --help           this text

Exit codes: 0 compared (at least one option verified); 1 no option verified; 2 bad input.
First-pass designs: every result must be verified by a qualified engineer.
`;

function fail(streams: CliStreams, code: number, message: string): number {
  streams.stderr.write(`binsupport: ${message}\n`);
  return code;
}

function parseShard(text: string): { index: number; count: number } {
  const match = /^(\d+)\/(\d+)$/.exec(text.trim());
  if (!match) throw new DesignError('BAD_INPUT', `--shard must be i/n with whole numbers 1 <= i <= n, e.g. 2/4; got '${text}'`, 'shard');
  return { index: Number(match[1]), count: Number(match[2]) };
}

function parseWorkers(text: string | undefined, optionCount: number): number {
  if (text === undefined) return Math.max(1, Math.min(availableParallelism(), optionCount));
  const workers = Number(text);
  if (!(Number.isInteger(workers) && workers >= 1 && workers <= MAX_WORKERS)) {
    throw new DesignError('BAD_INPUT', `--workers must be a whole number between 1 and ${MAX_WORKERS}; got '${text}'`, 'workers');
  }
  return workers;
}

/**
 * The worker module: beside this one when built (JavaScript); from TypeScript source, the launcher's
 * worker entry, which registers the TypeScript loader in the thread first (bin/compare-worker.mjs).
 */
function workerFile(): string {
  const here = fileURLToPath(import.meta.url);
  return extname(here) === '.ts' ? join(here, '..', '..', 'bin', 'compare-worker.mjs') : join(here, '..', 'compare-worker.js');
}

interface Progress {
  done(row: CompareRow, seconds: number): void;
  stop(): void;
}

function progressReporter(streams: CliStreams, total: number, quiet: boolean): Progress {
  const started = performance.now();
  let finished = 0;
  if (quiet) return { done: () => undefined, stop: () => undefined };
  const stream = streams.stderr as CliStreams['stderr'] & Partial<NodeJS.WriteStream>;
  if (stream.isTTY === true) {
    const bar = new cliProgress.SingleBar(
      { stream: stream as NodeJS.WriteStream, format: 'compare [{bar}] {value}/{total} options | {rate} options/s | last: {last}', hideCursor: true, clearOnComplete: false },
      cliProgress.Presets.shades_classic,
    );
    bar.start(total, 0, { rate: '0.00', last: '' });
    return {
      done(row) {
        finished += 1;
        bar.update(finished, { rate: (finished / ((performance.now() - started) / 1000)).toFixed(2), last: `${row.name.slice(0, 40)} ${row.status}` });
      },
      stop: () => bar.stop(),
    };
  }
  return {
    done(row, seconds) {
      finished += 1;
      const tonnes = row.steelMass === null ? '' : ` ${(row.steelMass / 1000).toFixed(2)} t`;
      streams.stderr.write(`compare: ${finished}/${total} #${row.index} ${row.name}: ${row.status}${tonnes} (${seconds.toFixed(1)} s)\n`);
    },
    stop: () => undefined,
  };
}

/** Design the options on a pool of `workers` threads; the rows in option order. */
export async function designOnPool(cases: readonly OptionCase[], workers: number, onRow: (row: CompareRow, seconds: number) => void = () => undefined): Promise<CompareRow[]> {
  const pool = new Piscina({ filename: workerFile(), name: 'designOptionTask', minThreads: workers, maxThreads: workers, idleTimeout: 1000, concurrentTasksPerWorker: 1 });
  try {
    const rows = await Promise.all(
      cases.map(async (option) => {
        const { row, seconds } = (await pool.run(option)) as { row: CompareRow; seconds: number };
        onRow(row, seconds);
        return row;
      }),
    );
    return rows.sort((a, b) => a.index - b.index);
  } finally {
    await pool.destroy();
  }
}

async function writeComparison(result: CompareResult, outDir: string): Promise<void> {
  await mkdir(outDir, { recursive: true });
  // Rendered and written one by one, each atomically: a failure leaves earlier files of a previous run whole.
  await atomicWrite(outputPath(outDir, 'compare.json'), stableJson(result));
  await writeCompareXlsx(result, outputPath(outDir, 'compare.xlsx'));
  await writeComparePdf(result, outputPath(outDir, 'compare.pdf'));
}

function report(streams: CliStreams, result: CompareResult, outDir: string): number {
  const { counts } = result;
  streams.stdout.write(`${counts.options} options: ${counts.verified} verified, ${counts.infeasible} infeasible, ${counts.invalid} invalid, ${counts.failed} refused; wrote compare.json, compare.xlsx, compare.pdf to ${outDir}\n`);
  // The same sentence as compare.pdf.
  if (result.cheapest === null) return fail(streams, EXIT_NOT_SATISFIED, cheapestSentence(result));
  streams.stdout.write(`${cheapestSentence(result)}\n`);
  return EXIT_OK;
}

async function runMerge(files: string[], outDir: string, streams: CliStreams): Promise<number> {
  const parts = [];
  for (const file of files) {
    let text: string;
    try {
      text = await readFile(file, 'utf8');
    } catch {
      return fail(streams, EXIT_BAD_INPUT, `${file}: the shard file cannot be read (does it exist?)`);
    }
    if (text.length > MAX_SHARD_BYTES) return fail(streams, EXIT_BAD_INPUT, `${file}: a shard file must be at most ${MAX_SHARD_BYTES} bytes`);
    let content: unknown;
    try {
      content = JSON.parse(text) as unknown;
    } catch (error) {
      return fail(streams, EXIT_BAD_INPUT, `${file} is not valid JSON: ${(error as Error).message}`);
    }
    parts.push({ source: file, content });
  }
  const result = mergeShards(parts);
  await writeComparison(result, outDir);
  return report(streams, result, outDir);
}

export async function runCompare(args: string[], streams: CliStreams): Promise<number> {
  let parsed;
  try {
    parsed = parseArgs({
      args,
      allowPositionals: true,
      options: { out: { type: 'string' }, workers: { type: 'string' }, shard: { type: 'string' }, merge: { type: 'boolean' }, quiet: { type: 'boolean' }, help: { type: 'boolean' } },
    });
  } catch (error) {
    return fail(streams, EXIT_BAD_INPUT, `${(error as Error).message}\n\n${compareHelp}`);
  }
  const { values, positionals } = parsed;
  if (values.help) {
    streams.stdout.write(compareHelp);
    return EXIT_OK;
  }
  if (!values.out) return fail(streams, EXIT_BAD_INPUT, `compare needs --out <folder>\n\n${compareHelp}`);
  const outDir = resolve(values.out);
  try {
    if (values.merge) {
      if (values.shard !== undefined || values.workers !== undefined) return fail(streams, EXIT_BAD_INPUT, 'compare --merge joins shard files; --shard and --workers do not apply');
      if (positionals.length === 0) return fail(streams, EXIT_BAD_INPUT, `compare --merge needs the shard files to join\n\n${compareHelp}`);
      return await runMerge(positionals, outDir, streams);
    }
    const [optionsPath, ...extra] = positionals;
    if (!optionsPath || extra.length > 0) return fail(streams, EXIT_BAD_INPUT, `compare takes exactly one options file\n\n${compareHelp}`);
    const file = await readOptionsFile(optionsPath);
    const shard = values.shard === undefined ? undefined : parseShard(values.shard);
    const cases = shard ? shardCases(file.cases, shard.index, shard.count) : file.cases;
    const workers = parseWorkers(values.workers, Math.max(1, cases.length));
    const meta = { title: file.title, digest: optionsDigest(file), base: file.baseSource, optionCount: file.cases.length };
    if (!values.quiet) streams.stderr.write(`compare: ${cases.length} of ${file.cases.length} options on ${workers} worker thread(s)${shard ? `, shard ${shard.index}/${shard.count}` : ''}\n`);
    const progress = progressReporter(streams, cases.length, values.quiet === true);
    const started = performance.now();
    let rows: CompareRow[];
    try {
      rows = await designOnPool(cases, workers, (row, seconds) => progress.done(row, seconds));
    } finally {
      progress.stop();
    }
    const seconds = (performance.now() - started) / 1000;
    if (!values.quiet) streams.stderr.write(`compare: ${cases.length} options in ${seconds.toFixed(1)} s (${(cases.length / seconds).toFixed(2)} options/s)\n`);
    if (shard) {
      await mkdir(outDir, { recursive: true });
      const name = `compare-shard-${shard.index}-of-${shard.count}.json`;
      await atomicWrite(outputPath(outDir, name), stableJson(compareShard(meta, shard, rows)));
      streams.stdout.write(`shard ${shard.index}/${shard.count}: ${rows.length} options; wrote ${name} to ${outDir}; join the shards with 'binsupport compare --merge'\n`);
      return EXIT_OK;
    }
    const result = compareReport(meta, rows);
    await writeComparison(result, outDir);
    return report(streams, result, outDir);
  } catch (error) {
    if (error instanceof SpecError) return fail(streams, EXIT_BAD_INPUT, error.message);
    if (error instanceof DesignError) return fail(streams, error.code === 'BAD_INPUT' ? EXIT_BAD_INPUT : EXIT_NOT_SATISFIED, `${error.message}${error.path ? ` (input: ${error.path})` : ''}`);
    throw error;
  }
}
