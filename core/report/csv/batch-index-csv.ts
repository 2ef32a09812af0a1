/** The index table of a batch: one row per sample, whether it succeeded or not. */
import type { Analysis } from '../../pipeline/types';
import { conventionCommentLines } from '../../pipeline/conventions';
import { toCelsius } from '../../pipeline/temperature';
import { csvDocument, csvNumber } from './csv-format';

export interface BatchIndexRow {
  sample: string;
  /** Output folder of the sample, relative to the batch output folder. */
  folder: string;
  /** The analysis, or the one-line error that stopped the sample. */
  result: { ok: true; analysis: Analysis } | { ok: false; error: string };
}

export const BATCH_INDEX_COLUMNS = [
  'sample',
  'status',
  'reference_temperature_C',
  'isotherms_included',
  'isotherms_total',
  'wlf_C1',
  'wlf_C1_stderr',
  'wlf_C2_K',
  'wlf_C2_K_stderr',
  'arrhenius_Ea_kJ_per_mol',
  'arrhenius_Ea_stderr',
  'overall_rms_decades',
  'warnings_count',
  'warnings',
  'error',
  'folder',
] as const;

export function batchIndexCsv(rows: BatchIndexRow[], version: string): string {
  return csvDocument(
    [
      `Thermoshift ${version} batch index`,
      "WLF constants refer to each sample's reference temperature; warnings lists the warning codes",
      ...conventionCommentLines(),
    ],
    [...BATCH_INDEX_COLUMNS],
    rows.map((r) => {
      // a failed sample: name, status, blank figures, the error and the folder
      if (!r.result.ok)
        return [
          r.sample,
          'failed',
          ...Array<string>(BATCH_INDEX_COLUMNS.length - 4).fill(''),
          r.result.error,
          r.folder,
        ];
      const a = r.result.analysis;
      const { wlf, arrhenius } = a.models;
      return [
        r.sample,
        'ok',
        csvNumber(toCelsius(a.referenceTemperatureK)),
        String(a.curves.filter((c) => c.included).length),
        String(a.curves.length),
        csvNumber(wlf?.c1),
        csvNumber(wlf?.c1StdErr),
        csvNumber(wlf?.c2K),
        csvNumber(wlf?.c2KStdErr),
        csvNumber(arrhenius?.activationEnergyKJPerMol),
        csvNumber(arrhenius?.activationEnergyKJPerMolStdErr),
        csvNumber(a.overallQualityRmsDecades),
        String(a.warnings.length),
        [...new Set(a.warnings.map((w) => w.code))].join(';'),
        '',
        r.folder,
      ];
    }),
  );
}
