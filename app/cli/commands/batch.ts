/**
 * `thermoshift batch SAMPLE…`: many samples in one run. Each file, or each folder of per-isotherm
 * files, is one sample (`--samples-in DIR` takes every file and sub-folder of DIR as one sample).
 * Writes one output folder per sample and index.csv; progress on stderr; a failing sample is
 * reported and the batch goes on, exiting with EXIT.batchPartialFailure at the end.
 */
import { Command } from 'commander';
import { readdirSync, realpathSync, statSync } from 'node:fs';
import { basename, join } from 'node:path';
import { batchIndexCsv, type BatchIndexRow } from '@core/report';
import { THERMOSHIFT_VERSION } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import type { Settings } from '@core/pipeline';
import { addSampleOptions, resolveSettings, type SampleOptionValues } from '../sample-options.ts';
import { readWorkbookInputs } from '../io/read-inputs.ts';
import {
  DATA_FILE_PATTERN,
  skippedLines,
  writtenByThermoshift,
  type SkippedFile,
} from '../io/input-files.ts';
import { analyseSample, assertSomethingShifted } from '../run-sample.ts';
import { outputEntries } from '../outputs.ts';
import {
  assertOutputSetWritable,
  isOutputSet,
  writeOutputSet,
  type OutputEntry,
} from '../io/output-set.ts';
import { oneLine, toCliError } from '../error-map.ts';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { checkDate } from './build.ts';
import { fileTemperatures } from './inspect.ts';
import { loadAnalysis, readSpecFile } from './compare.ts';
import { compareAnalyses } from '@core/compare';
import type { Specification } from '@core/compare';

/**
 * With --spec: the overall verdict of each sample against the reference (pass, fail,
 * inconclusive; "failed" for a sample that could not be analysed, "error: …" when it could not be
 * compared). Failed criteria are named after the verdict.
 */
export function batchVerdicts(
  rows: BatchIndexRow[],
  referencePath: string,
  spec: Specification,
  settings: Settings,
  o: { settings?: string },
): string[] {
  const source = o.settings ?? 'command line';
  const s = { ...settings };
  if (s.referenceTemperature === undefined && spec.referenceTemperature !== undefined)
    s.referenceTemperature = spec.referenceTemperature;
  let reference;
  try {
    reference = loadAnalysis(referencePath, s, source);
  } catch (e) {
    throw toCliError(e);
  }
  return rows.map((r) => {
    if (!r.result.ok) return 'failed';
    try {
      const c = compareAnalyses(reference, [r.result.analysis], { spec }).comparisons[0];
      const failed = c.verdicts.filter((v) => v.verdict === 'fail').map((v) => v.criterion);
      return failed.length ? `${c.overall} (${failed.join('; ')})` : c.overall;
    } catch (e) {
      return `error: ${oneLine(toCliError(e))}`;
    }
  });
}

/** index.csv with a last column "verdict": one value per data row, in row order. */
export function withVerdictColumn(csv: string, verdicts: string[]): string {
  const quote = (v: string): string => (/[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);
  const lines = csv.split('\n');
  let header = -1;
  let k = 0;
  const out = lines.map((line, i) => {
    if (line === '' || line.startsWith('#')) return line;
    if (header < 0) {
      header = i;
      return `${line},verdict`;
    }
    return `${line},${quote(verdicts[k++] ?? '')}`;
  });
  return out.join('\n');
}

interface BatchOptions extends SampleOptionValues {
  spec?: string;
  reference?: string;
  out: string;
  samplesIn?: string[];
  force?: boolean;
  date?: string;
}

export interface BatchSample {
  name: string;
  /** Paths making up the sample: one file, or one folder. */
  paths: string[];
}

/**
 * Each path is one sample; a folder from --samples-in contributes each of its entries (data files
 * and sub-folders; links followed once, each real path once). Entries that cannot be samples
 * (broken links, link loops, pipes, devices, files Thermoshift wrote) go to `skipped` with the
 * reason. Sample names are made safe for file names and never collide, also on file systems that
 * ignore case: "x y" and "x_y" become x_y and x_y-2, and a later "x_y-2" becomes x_y-2-2.
 */
export function listSamples(
  paths: string[],
  samplesIn: string[],
  skipped: SkippedFile[] = [],
): BatchSample[] {
  const entries: string[] = [...paths];
  const seen = new Set<string>();
  for (const dir of samplesIn) {
    let names: string[];
    try {
      if (!statSync(dir).isDirectory()) throw new Error('not a folder');
      names = readdirSync(dir).sort((a, b) => a.localeCompare(b, 'en', { numeric: true }));
    } catch {
      throw new CliError(`${dir}: no such folder`, EXIT.usage);
    }
    for (const n of names) {
      const p = join(dir, n);
      if (n.startsWith('.')) continue;
      let st;
      try {
        st = statSync(p);
      } catch (e) {
        const code = (e as NodeJS.ErrnoException).code;
        skipped.push({
          path: p,
          reason: code === 'ELOOP' ? 'a symbolic link loop' : 'a broken symbolic link',
        });
        continue;
      }
      let real = p;
      try {
        real = realpathSync(p);
      } catch {
        // keep the name
      }
      if (seen.has(real)) {
        skipped.push({ path: p, reason: `the same as an entry already taken (${real})` });
        continue;
      }
      if (st.isDirectory() && isOutputSet(p)) {
        skipped.push({ path: p, reason: 'a Thermoshift output folder' });
      } else if (st.isDirectory()) {
        seen.add(real);
        entries.push(p);
      } else if (DATA_FILE_PATTERN.test(n)) {
        if (!st.isFile()) skipped.push({ path: p, reason: 'not a regular file' });
        else if (writtenByThermoshift(p))
          skipped.push({ path: p, reason: 'written by Thermoshift' });
        else {
          seen.add(real);
          entries.push(p);
        }
      }
    }
  }
  const used = new Set<string>();
  return entries.map((p) => {
    const stem = basename(p.replace(/[\\/]+$/, '')).replace(/\.[^.]+$/, '') || 'sample';
    const safe = stem.replace(/[^\p{L}\p{N}._-]+/gu, '_');
    let name = safe;
    for (let n = 2; used.has(name.toLowerCase()) || name.toLowerCase() === 'index.csv'; n++)
      name = `${safe}-${n}`;
    used.add(name.toLowerCase());
    return { name, paths: [p] };
  });
}

export interface BatchRunOptions {
  settings: Settings;
  settingsSource: string;
  out: string;
  force: boolean;
  date: string;
  /** --file-temperature specs ("FILE=T"); each applies to the sample holding that file. */
  fileTemperatures?: string[];
  /** Progress lines (stderr in the CLI). */
  log: (line: string) => void;
  /** With --spec: one verdict per index row, added to index.csv as its last column. */
  verdicts?: (rows: BatchIndexRow[]) => string[];
}

/**
 * Runs the batch and writes its whole output set (one folder per sample and index.csv, swapped in
 * as a whole: ../io/output-set.ts); returns the index rows (one per sample). Shared with
 * bench/batch.bench.ts.
 */
export async function runBatch(
  samples: BatchSample[],
  o: BatchRunOptions,
): Promise<BatchIndexRow[]> {
  const rows: BatchIndexRow[] = [];
  const entries: OutputEntry[] = [];
  for (const [k, s] of samples.entries()) {
    const prefix = `[${k + 1}/${samples.length}] ${s.name}`;
    try {
      const inputs = await readWorkbookInputs(s.paths);
      const analysis = analyseSample(
        inputs,
        o.settings,
        o.settingsSource,
        fileTemperatures(o.fileTemperatures ?? [], inputs, false),
      );
      assertSomethingShifted(analysis);
      entries.push(
        ...outputEntries(
          analysis,
          { modulusUnit: o.settings.modulusUnit ?? 'Pa', date: o.date },
          s.name,
        ),
      );
      rows.push({ sample: s.name, folder: s.name, result: { ok: true, analysis } });
      const n = analysis.warnings.length;
      o.log(
        `${prefix}: ok, ${analysis.curves.filter((c) => c.included).length} isotherms, Tref ${toCelsius(analysis.referenceTemperatureK)} °C${n ? `, ${n} warning(s)` : ''}`,
      );
    } catch (e) {
      const err = toCliError(e);
      const message = oneLine(err);
      rows.push({ sample: s.name, folder: s.name, result: { ok: false, error: message } });
      o.log(`${prefix}: FAILED: ${message}`);
    }
  }
  let index = batchIndexCsv(rows, THERMOSHIFT_VERSION);
  const verdicts = o.verdicts?.(rows) ?? [];
  if (verdicts.length) index = withVerdictColumn(index, verdicts);
  entries.push({ name: 'index.csv', content: index });
  writeOutputSet(o.out, entries, { force: o.force });
  return rows;
}

export function registerBatch(program: Command): void {
  const cmd = program
    .command('batch')
    .description(
      'Build master curves for many samples: each FILE, or each FOLDER of per-isotherm files, is one sample',
    )
    .argument('[samples...]', 'sample files or folders')
    .requiredOption('--out <dir>', 'output folder: one sub-folder per sample plus index.csv')
    .option(
      '--samples-in <dir>',
      'every data file and sub-folder in DIR is one sample; repeatable',
      (v: string, prev: string[] = []) => [...prev, v],
    )
    .option('--force', 'overwrite existing output files')
    .option('--date <YYYY-MM-DD>', 'date printed in the reports (default: today)')
    .option(
      '--spec <file>',
      'specification bands: adds a verdict column to index.csv (needs --reference)',
    )
    .option('--reference <path>', 'the reference lot the samples are judged against with --spec');
  addSampleOptions(cmd);
  cmd.action(async (paths: string[], o: BatchOptions) => {
    let samples: BatchSample[];
    let settings: Settings;
    try {
      settings = resolveSettings(o);
      const skipped: SkippedFile[] = [];
      samples = listSamples(paths, o.samplesIn ?? [], skipped);
      process.stderr.write(skippedLines(skipped));
    } catch (e) {
      throw toCliError(e);
    }
    if (samples.length === 0)
      throw new CliError(
        'batch: no samples given (pass files or folders, or --samples-in DIR)',
        EXIT.usage,
      );
    const date = checkDate(o.date);
    const spec = o.spec ? readSpecFile(o.spec) : undefined;
    if (spec && !o.reference)
      throw new CliError(
        'batch: --spec needs --reference REF (the lot to compare with)',
        EXIT.usage,
      );
    let verdicts: string[] = [];
    const indexPath = join(o.out, 'index.csv');
    assertOutputSetWritable(o.out, !!o.force); // fail before hours of work, not after
    const rows = await runBatch(samples, {
      settings,
      settingsSource: o.settings ?? 'command line',
      fileTemperatures: o.fileTemperature ?? [],
      out: o.out,
      force: !!o.force,
      date,
      log: (line) => process.stderr.write(`${line}\n`),
      verdicts: (r) =>
        (verdicts = spec && o.reference ? batchVerdicts(r, o.reference, spec, settings, o) : []),
    });
    const failed = rows.filter((r) => !r.result.ok).length;
    process.stderr.write(
      `batch: ${rows.length - failed} of ${rows.length} samples done, ${failed} failed; index: ${indexPath}\n`,
    );
    if (failed > 0) process.exitCode = EXIT.batchPartialFailure;
    else if (verdicts.some((v) => v.startsWith('fail'))) process.exitCode = EXIT.specFailed;
    else if (verdicts.some((v) => v.startsWith('inconclusive')))
      process.exitCode = EXIT.specInconclusive;
  });
}
