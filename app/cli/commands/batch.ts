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
import { DATA_FILE_PATTERN, readWorkbookInputs } from '../io/read-inputs.ts';
import { analyseSample } from '../run-sample.ts';
import { writeOutputs } from '../outputs.ts';
import { assertWritable, writeFileAtomic } from '../io/atomic-write.ts';
import { oneLine, toCliError } from '../error-map.ts';
import { CliError } from '../cli-error.ts';
import { EXIT } from '../exit-codes.ts';
import { checkDate } from './build.ts';
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
  out: string;
  samplesIn?: string[];
  force?: boolean;
  date?: string;
  spec?: string;
  reference?: string;
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
export async function runBatch(
  samples: BatchSample[],
  o: BatchRunOptions,
): Promise<BatchIndexRow[]> {
  const rows: BatchIndexRow[] = [];
  for (const [k, s] of samples.entries()) {
    const prefix = `[${k + 1}/${samples.length}] ${s.name}`;
    try {
      const analysis = analyseSample(
        await readWorkbookInputs(s.paths),
        o.settings,
        o.settingsSource,
      );
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
  }
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
    const spec = o.spec ? readSpecFile(o.spec) : undefined;
    if (spec && !o.reference)
      throw new CliError(
        'batch: --spec needs --reference REF (the lot to compare with)',
        EXIT.usage,
      );
    const indexPath = join(o.out, 'index.csv');
    assertWritable([indexPath], !!o.force); // fail before hours of work, not after
    const rows = await runBatch(samples, {
      settings,
      settingsSource: o.settings ?? 'command line',
      out: o.out,
      force: !!o.force,
      date,
      log: (line) => process.stderr.write(`${line}\n`),
    });
    let index = batchIndexCsv(rows, THERMOSHIFT_VERSION);
    const verdicts = spec && o.reference ? batchVerdicts(rows, o.reference, spec, settings, o) : [];
    if (verdicts.length) index = withVerdictColumn(index, verdicts);
    writeFileAtomic(indexPath, index, { force: !!o.force });
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
