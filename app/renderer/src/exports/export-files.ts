/**
 * Every file the command line writes for one analysis (`thermoshift build --out`), with the same
 * names and the same core builders, so the app and the CLI export identical files.
 * (The CLI's list lives in app/cli/outputs.ts, which imports Node; this mirrors it for the page.)
 */
import type { Analysis } from '../../../../core/pipeline/types';
import { analysisSummary } from '../../../../core/pipeline/summary';
import { CONVENTIONS } from '../../../../core/pipeline/conventions';
import { masterCurveCsv, modelsCsv, pronyCsv, shiftTableCsv } from '../../../../core/report/csv';
import { reportHtml } from '../../../../core/report/report-html';

export interface ExportFile {
  name: string;
  label: string;
  make(): string | null;
}

/** Same names as the CLI's OUTPUT_FILES (docs/cli.md). */
export const EXPORT_NAMES = {
  shiftTable: 'shift-factors.csv',
  masterCurve: 'master-curve.csv',
  modelsCsv: 'shift-models.csv',
  modelsJson: 'shift-models.json',
  prony: 'prony-terms.csv',
  summary: 'summary.json',
  report: 'report.html',
} as const;

export function exportFiles(a: Analysis, date: string): ExportFile[] {
  return [
    {
      name: EXPORT_NAMES.report,
      label: 'Datasheet report (HTML, prints to PDF)',
      make: () => reportHtml(a, { date }),
    },
    { name: EXPORT_NAMES.shiftTable, label: 'Shift factors (CSV)', make: () => shiftTableCsv(a) },
    {
      name: EXPORT_NAMES.masterCurve,
      label: 'Master curve (CSV)',
      make: () => masterCurveCsv(a, 'Pa'),
    },
    { name: EXPORT_NAMES.modelsCsv, label: 'Shift-factor models (CSV)', make: () => modelsCsv(a) },
    {
      name: EXPORT_NAMES.modelsJson,
      label: 'Shift-factor models (JSON)',
      make: () => {
        const s = analysisSummary(a);
        return `${JSON.stringify(
          {
            version: a.version,
            sample: a.sample.name,
            conventions: CONVENTIONS,
            referenceTemperature: s.referenceTemperature,
            models: s.models,
          },
          null,
          2,
        )}\n`;
      },
    },
    { name: EXPORT_NAMES.prony, label: 'Prony series (CSV)', make: () => pronyCsv(a, 'Pa') },
    {
      name: EXPORT_NAMES.summary,
      label: 'Summary (JSON)',
      make: () => `${JSON.stringify(analysisSummary(a), null, 2)}\n`,
    },
  ];
}

/** "HX-310 melt" → "hx-310-melt": a file-name stem for exports. */
export function fileStem(sampleName: string): string {
  return (
    sampleName
      .toLowerCase()
      .replace(/\(invented\)/g, '')
      .replace(/[^\p{L}\p{N}]+/gu, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'thermoshift'
  );
}
