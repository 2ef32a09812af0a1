/**
 * The one list of files an analysis exports — written by `thermoshift build --out` and `batch`,
 * offered by the app's export menu — with their contents from the pure builders of this folder.
 * Callers only write them (the CLI atomically, the app through a save dialog).
 */
import { analysisSummary } from '../pipeline/summary';
import { CONVENTIONS } from '../pipeline/conventions';
import type { Analysis } from '../pipeline/types';
import { masterCurveCsv, modelsCsv, pronyCsv, shiftTableCsv } from './csv';
import type { FrequencyUnit, ModulusUnit } from '../units/output-units';
import { reportHtml } from './report-html';

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

export interface OutputFileOptions {
  /** Date printed in the report, YYYY-MM-DD. */
  date: string;
  /** Unit of moduli in the tables and the report. @default 'Pa' */
  modulusUnit?: ModulusUnit;
  /**
   * Unit of frequencies in the master-curve table and the report: ω in rad/s, or f = ω/2π in Hz.
   * @default 'rad/s'
   */
  frequencyUnit?: FrequencyUnit;
}

/** One export: its file name, a label for menus, and how its content is built. */
export interface OutputFileSpec {
  name: string;
  label: string;
  /** The file's text; null when the analysis has nothing for it (no Prony series). */
  build(a: Analysis, o: OutputFileOptions): string | null;
}

export interface OutputFile {
  name: string;
  label: string;
  content: string;
}

const json = (v: unknown): string => `${JSON.stringify(v, null, 2)}\n`;

/** Every export, in the order they are written and listed. */
export const OUTPUT_FILE_SPECS: readonly OutputFileSpec[] = [
  {
    name: OUTPUT_FILES.shiftTable,
    label: 'Shift factors (CSV)',
    build: (a) => shiftTableCsv(a),
  },
  {
    name: OUTPUT_FILES.masterCurve,
    label: 'Master curve (CSV)',
    build: (a, o) => masterCurveCsv(a, o.modulusUnit ?? 'Pa', o.frequencyUnit ?? 'rad/s'),
  },
  { name: OUTPUT_FILES.modelsCsv, label: 'Shift-factor models (CSV)', build: (a) => modelsCsv(a) },
  {
    name: OUTPUT_FILES.modelsJson,
    label: 'Shift-factor models (JSON)',
    build: (a) => {
      const s = analysisSummary(a);
      return json({
        version: a.version,
        sample: a.sample.name,
        conventions: CONVENTIONS,
        referenceTemperature: s.referenceTemperature,
        models: s.models,
      });
    },
  },
  {
    name: OUTPUT_FILES.prony,
    label: 'Prony series (CSV)',
    build: (a, o) => pronyCsv(a, o.modulusUnit ?? 'Pa'),
  },
  { name: OUTPUT_FILES.summary, label: 'Summary (JSON)', build: (a) => json(analysisSummary(a)) },
  {
    name: OUTPUT_FILES.report,
    label: 'Datasheet report (HTML, prints to PDF)',
    build: (a, o) =>
      reportHtml(a, {
        date: o.date,
        modulusUnit: o.modulusUnit ?? 'Pa',
        frequencyUnit: o.frequencyUnit ?? 'rad/s',
      }),
  },
];

/** Every export's content; files the analysis has nothing for (no Prony series) are left out. */
export function outputFiles(a: Analysis, o: OutputFileOptions): OutputFile[] {
  const out: OutputFile[] = [];
  for (const spec of OUTPUT_FILE_SPECS) {
    const content = spec.build(a, o);
    if (content !== null) out.push({ name: spec.name, label: spec.label, content });
  }
  return out;
}
