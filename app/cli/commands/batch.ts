/**
 * `thermoshift batch SAMPLE…`: many samples in one run. Each file, or each folder of per-isotherm
 * files, is one sample (`--samples-in DIR` takes every file and sub-folder of DIR as one sample).
 * Writes one output folder per sample and index.csv; progress on stderr; a failing sample is
 * reported and the batch goes on, exiting with EXIT.batchPartialFailure at the end.
 */
import { Command } from 'commander';
import { readdirSync, statSync } from 'node:fs';
import { basename, join } from 'node:path';
import { batchIndexCsv, type BatchIndexRow } from '@core/report';
import { THERMOSHIFT_VERSION } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import type { Settings } from '@core/pipeline';
import { addSampleOptions, resolveSettings, type SampleOptionValues } from '../sample-options.ts';
import { DATA_FILE_PATTERN, readInputs } from '../io/read-inputs.ts';
import { analyseSample } from '../run-sample.ts';
import { writeOutputs } from '../outputs.ts';
import { assertWritable, writeFileAtomic } from '../io/atomic-write.ts';
import { oneLine, toCliError } from '../error-map.ts';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { checkDate } from './build.ts';

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

/** Each path is one sample; a folder from --samples-in contributes each of its entries. */
export function listSamples(paths: string[], samplesIn: string[]): BatchSample[] {
  const entries: string[] = [...paths];
  for (const dir of samplesIn) {
    let names: string[];
    try {
      names = readdirSync(dir).sort((a, b) => a.localeCompare(b, 'en', { numeric: true }));
    } catch {
      throw new CliError(`${dir}: no such folder`, EXIT.usage);
    }
    for (const n of names) {
      const p = join(dir, n);
      if (n.startsWith('.')) continue;
      const st = statSync(p);
      if (st.isDirectory() || DATA_FILE_PATTERN.test(n)) entries.push(p);
    }
  }
  const used = new Map<string, number>();
  return entries.map((p) => {
    const stem = basename(p.replace(/[\\/]+$/, '')).replace(/\.[^.]+$/, '') || 'sample';
    const safe = stem.replace(/[^\p{L}\p{N}._-]+/gu, '_');
    const n = (used.get(safe) ?? 0) + 1;
    used.set(safe, n);
    return { name: n === 1 ? safe : `${safe}-${n}`, paths: [p] };
  });
}

export interface BatchRunOptions {
  settings: Settings;
  settingsSource: string;
  out: string;
  force: boolean;
  date: string;
  /** Progress lines (stderr in the CLI). */
  log: (line: string) => void;
}

/** Runs the batch; returns the index rows (one per sample). Shared with bench/batch.bench.ts. */
export function runBatch(samples: BatchSample[], o: BatchRunOptions): BatchIndexRow[] {
  const rows: BatchIndexRow[] = [];
  samples.forEach((s, k) => {
    const prefix = `[${k + 1}/${samples.length}] ${s.name}`;
    try {
      const analysis = analyseSample(readInputs(s.paths), o.settings, o.settingsSource);
      writeOutputs(analysis, join(o.out, s.name), {
        force: o.force,
        modulusUnit: o.settings.modulusUnit ?? 'Pa',
        date: o.date,
      });
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
      samples = listSamples(paths, o.samplesIn ?? []);
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
    assertWritable([indexPath], !!o.force); // fail before hours of work, not after
    const rows = runBatch(samples, {
      settings,
      settingsSource: o.settings ?? 'command line',
      out: o.out,
      force: !!o.force,
      date,
      log: (line) => process.stderr.write(`${line}\n`),
    });
    writeFileAtomic(indexPath, batchIndexCsv(rows, THERMOSHIFT_VERSION), { force: !!o.force });
    const failed = rows.filter((r) => !r.result.ok).length;
    process.stderr.write(
      `batch: ${rows.length - failed} of ${rows.length} samples done, ${failed} failed; index: ${indexPath}\n`,
    );
    if (failed > 0) process.exitCode = EXIT.batchPartialFailure;
  });
}
