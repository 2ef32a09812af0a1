/** Model constants as CSV: one row per constant with standard error, 95 % interval and fit figures. */
import type { Analysis, ModelFitStats } from '../../pipeline/types';
import { conventionCommentLines } from '../../pipeline/conventions';
import { toCelsius } from '../../pipeline/temperature';
import { csvDocument, csvNumber } from './csv-format';

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
  const { wlf, arrhenius, polynomial } = a.models;
  const rows: string[][] = [];
  if (wlf) {
    rows.push(row('wlf', 'C1', wlf.c1, wlf.c1StdErr, wlf.c1Ci95, '', wlf.referenceK, wlf));
    rows.push(row('wlf', 'C2', wlf.c2K, wlf.c2KStdErr, wlf.c2KCi95, 'K', wlf.referenceK, wlf));
  }
  if (arrhenius)
    rows.push(
      row(
        'arrhenius',
        'Ea',
        arrhenius.activationEnergyKJPerMol,
        arrhenius.activationEnergyKJPerMolStdErr,
        arrhenius.activationEnergyKJPerMolCi95,
        'kJ/mol',
        arrhenius.referenceK,
        arrhenius,
      ),
    );
  if (polynomial) {
    rows.push(
      row(
        'polynomial',
        'a1',
        polynomial.a1PerK,
        polynomial.a1PerKStdErr,
        null,
        '1/K',
        polynomial.referenceK,
        polynomial,
      ),
    );
    rows.push(
      row(
        'polynomial',
        'a2',
        polynomial.a2PerK2,
        polynomial.a2PerK2StdErr,
        null,
        '1/K^2',
        polynomial.referenceK,
        polynomial,
      ),
    );
  }
  return csvDocument(
    [
      `Thermoshift ${a.version} shift-factor models — sample: ${a.sample.name}`,
      'wlf: log10 aT = -C1 (T - Tr)/(C2 + T - Tr); arrhenius: ln aT = (Ea/R)(1/T - 1/Tr), T in K; polynomial: log10 aT = a1 (T - Tr) + a2 (T - Tr)^2',
      'do not use a model outside fitted_from_C .. fitted_to_C; WLF constants fitted above Tg do not hold below Tg',
      ...conventionCommentLines(),
    ],
    [...MODEL_COLUMNS],
    rows,
  );
}
