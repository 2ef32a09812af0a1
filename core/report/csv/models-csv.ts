/**
 * Model constants as CSV: one row per constant with standard error, 95 % interval and fit figures,
 * named by each model's registry descriptor.
 */
import type { Analysis, ModelFitStats } from '../../pipeline/types';
import { conventionCommentLines } from '../../pipeline/conventions';
import { toCelsius } from '../../pipeline/temperature';
import { csvDocument, csvNumber } from './csv-format';
import { fittedShiftModels, modelConstant } from '../../pipeline/model-results';
import { shiftModels } from '../../models';
import { validityClauses } from '../tables';

export const MODEL_COLUMNS = [
  'model',
  'constant',
  'value',
  'std_error',
  'ci95_low',
  'ci95_high',
  'unit',
  'reference_temperature_C',
  'r2',
  'rms_residual_decades',
  'fitted_from_C',
  'fitted_to_C',
] as const;

function row(
  model: string,
  constant: string,
  value: number,
  se: number | null,
  ci: [number, number] | null,
  unit: string,
  trK: number,
  m: ModelFitStats,
): string[] {
  return [
    model,
    constant,
    csvNumber(value),
    csvNumber(se),
    csvNumber(ci?.[0]),
    csvNumber(ci?.[1]),
    unit,
    csvNumber(toCelsius(trK)),
    csvNumber(m.r2),
    csvNumber(m.rmsResidualDecades),
    csvNumber(toCelsius(m.fittedRangeK[0])),
    csvNumber(toCelsius(m.fittedRangeK[1])),
  ];
}

export function modelsCsv(a: Analysis): string {
  const rows: string[][] = [];
  for (const f of fittedShiftModels(a.models)) {
    const { descriptor: d, result: m } = f;
    d.parameters.forEach((p, i) => {
      const c = modelConstant(f, i);
      rows.push(
        row(
          d.kind,
          d.law.parameters[i].name,
          c.value,
          c.stdErr,
          p.interval ? c.ci95 : null,
          p.csvUnit ?? p.unit,
          m.referenceK,
          m,
        ),
      );
    });
  }
  return csvDocument(
    [
      `Thermoshift ${a.version} shift-factor models — sample: ${a.sample.name}`,
      shiftModels()
        .map((d) => `${d.kind}: ${d.formula.ascii}`)
        .join('; '),
      `do not use a model outside fitted_from_C .. fitted_to_C${validityClauses()}`,
      ...conventionCommentLines(),
    ],
    [...MODEL_COLUMNS],
    rows,
  );
}
