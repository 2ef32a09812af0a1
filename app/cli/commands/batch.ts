/**
 * `thermoshift batch SAMPLE…`: many samples in one run. Each file, or each folder of per-isotherm
 * files, is one sample (`--samples-in DIR` takes every file and sub-folder of DIR as one sample).
 * Writes one output folder per sample and index.csv; progress on stderr; a failing sample is
 * reported and the batch goes on, exiting with EXIT.batchPartialFailure at the end.
 */
import { Command } from 'commander';
import { readdirSync, realpathSync, statSync } from 'node:fs';
import { basename, join } from 'node:path';
import { batchIndexCsv, type BatchIndexRow } from '../../../core/report/csv/batch-index-csv.ts';
import { THERMOSHIFT_VERSION } from '../../../core/pipeline/version.ts';
import { toCelsius } from '../../../core/pipeline/temperature.ts';
import type { Settings } from '../../../core/pipeline/settings.ts';
import { addSampleOptions, resolveSettings, type SampleOptionValues } from '../sample-options.ts';
import { readInputs } from '../io/read-inputs.ts';
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

interface BatchOptions extends SampleOptionValues {
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
}

/**
 * Runs the batch and writes its whole output set (one folder per sample and index.csv, swapped in
 * as a whole: ../io/output-set.ts); returns the index rows (one per sample). Shared with
 * bench/batch.bench.ts.
 */
export function runBatch(samples: BatchSample[], o: BatchRunOptions): BatchIndexRow[] {
  const rows: BatchIndexRow[] = [];
  const entries: OutputEntry[] = [];
  samples.forEach((s, k) => {
    const prefix = `[${k + 1}/${samples.length}] ${s.name}`;
    try {
      const inputs = readInputs(s.paths);
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
  });
  entries.push({ name: 'index.csv', content: batchIndexCsv(rows, THERMOSHIFT_VERSION) });
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
    .option('--date <YYYY-MM-DD>', 'date printed in the reports (default: today)');
  addSampleOptions(cmd);
  cmd.action((paths: string[], o: BatchOptions) => {
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
    const indexPath = join(o.out, 'index.csv');
    assertOutputSetWritable(o.out, !!o.force); // fail before hours of work, not after
    const rows = runBatch(samples, {
      settings,
      settingsSource: o.settings ?? 'command line',
      fileTemperatures: o.fileTemperature ?? [],
      out: o.out,
      force: !!o.force,
      date,
      log: (line) => process.stderr.write(`${line}\n`),
    });
    const failed = rows.filter((r) => !r.result.ok).length;
    process.stderr.write(
      `batch: ${rows.length - failed} of ${rows.length} samples done, ${failed} failed; index: ${indexPath}\n`,
    );
    if (failed > 0) process.exitCode = EXIT.batchPartialFailure;
  });
}
