/**
 * The files `build --out DIR` (and each sample of `batch`) writes, all from one Analysis through
 * the core's pure builders, each written atomically. Nothing is written when any target exists and
 * --force is off.
 */
import { join } from 'node:path';
import type { Analysis } from '../../core/pipeline/types.ts';
import { analysisSummary } from '../../core/pipeline/summary.ts';
import { CONVENTIONS } from '../../core/pipeline/conventions.ts';
import { masterCurveCsv, modelsCsv, pronyCsv, shiftTableCsv } from '../../core/report/csv/index.ts';
import { reportHtml } from '../../core/report/report-html.ts';
import type { ModulusUnit } from '../../core/report/output-units.ts';
import { assertWritable, writeFileAtomic } from './io/atomic-write.ts';

/** Output file names (documented in docs/cli.md). */
export const OUTPUT_FILES = {
  shiftTable: 'shift-factors.csv',
  masterCurve: 'master-curve.csv',
  modelsCsv: 'shift-models.csv',
  modelsJson: 'shift-models.json',
  prony: 'prony-terms.csv',
  summary: 'summary.json',
  report: 'report.html',
} as const;

export interface OutputOptions {
  force: boolean;
  modulusUnit: ModulusUnit;
  /** Date printed in the report, YYYY-MM-DD. */
  date: string;
}

/** Builds every output's content (pure) so they can be checked before anything is written. */
export function outputContents(a: Analysis, o: OutputOptions): [string, string][] {
  const summary = analysisSummary(a);
  const files: [string, string][] = [
    [OUTPUT_FILES.shiftTable, shiftTableCsv(a)],
    [OUTPUT_FILES.masterCurve, masterCurveCsv(a, o.modulusUnit)],
    [OUTPUT_FILES.modelsCsv, modelsCsv(a)],
    [
      OUTPUT_FILES.modelsJson,
      `${JSON.stringify({ version: a.version, sample: a.sample.name, conventions: CONVENTIONS, referenceTemperature: summary.referenceTemperature, models: summary.models }, null, 2)}\n`,
    ],
  ];
  const prony = pronyCsv(a, o.modulusUnit);
  if (prony) files.push([OUTPUT_FILES.prony, prony]);
  files.push([OUTPUT_FILES.summary, `${JSON.stringify(summary, null, 2)}\n`]);
  files.push([OUTPUT_FILES.report, reportHtml(a, { date: o.date, modulusUnit: o.modulusUnit })]);
  return files;
}

/** Writes every output into `dir`; returns the paths written. */
export function writeOutputs(a: Analysis, dir: string, o: OutputOptions): string[] {
  const files = outputContents(a, o).map(([name, text]) => [join(dir, name), text] as const);
  assertWritable(
    files.map(([p]) => p),
    o.force,
  );
  for (const [p, text] of files) writeFileAtomic(p, text, { force: o.force });
  return files.map(([p]) => p);
}

/** Today's date as YYYY-MM-DD (UTC), the report's default date. */
export function today(): string {
  return new Date().toISOString().slice(0, 10);
}
