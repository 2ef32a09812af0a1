/**
 * The analysis tables as header + rows of plain values (full precision, SI or stated units), used
 * both for copying to spreadsheets and for the on-screen tables.
 */
import type { Analysis, ModelFitStats } from '../../../../core/pipeline/types';
import { toCelsius } from '../../../../core/pipeline/temperature';
import { pronySymbols } from '../../../../core/spectrum/prony-symbols';
import type { Cell } from './tsv';

export interface PlainTable {
  header: string[];
  rows: Cell[][];
}

export function shiftTable(a: Analysis): PlainTable {
  return {
    header: [
      'isotherm',
      'T (°C)',
      'log10 aT',
      'log10 aT s.e.',
      'log10 bT',
      'log10 bT s.e.',
      'RMS residual (decades)',
      'included',
      'note',
    ],
    rows: a.curves.map((c) => [
      c.isothermId,
      toCelsius(c.temperatureK),
      c.log10aT,
      c.log10aTStdErr,
      c.log10bT,
      c.log10bTStdErr,
      c.qualityRmsDecades,
      c.included ? 'yes' : 'no',
      c.note ?? '',
    ]),
  };
}

/** One constant of a model: name, value, s.e., 95 % interval (or null) and unit. */
type Constant = [string, number, number | null, [number, number] | null, string];

export function modelTable(a: Analysis): PlainTable {
  const { wlf, arrhenius, polynomial } = a.models;
  const models: [string, ModelFitStats & { referenceK: number }, Constant[]][] = [];
  if (wlf)
    models.push([
      'WLF',
      wlf,
      [
        ['C1', wlf.c1, wlf.c1StdErr, wlf.c1Ci95, ''],
        ['C2', wlf.c2K, wlf.c2KStdErr, wlf.c2KCi95, 'K'],
      ],
    ]);
  if (arrhenius)
    models.push([
      'Arrhenius',
      arrhenius,
      [
        [
          'Ea',
          arrhenius.activationEnergyKJPerMol,
          arrhenius.activationEnergyKJPerMolStdErr,
          arrhenius.activationEnergyKJPerMolCi95,
          'kJ/mol',
        ],
      ],
    ]);
  if (polynomial)
    models.push([
      'polynomial',
      polynomial,
      [
        ['a1', polynomial.a1PerK, polynomial.a1PerKStdErr, null, '1/K'],
        ['a2', polynomial.a2PerK2, polynomial.a2PerK2StdErr, null, '1/K²'],
      ],
    ]);
  const rows: Cell[][] = models.flatMap(([name, m, constants]) =>
    constants.map(([constant, value, se, ci, unit]): Cell[] => [
      name,
      constant,
      value,
      se,
      ci?.[0] ?? null,
      ci?.[1] ?? null,
      unit,
      toCelsius(m.referenceK),
      m.r2,
      m.rmsResidualDecades,
      `${toCelsius(m.fittedRangeK[0]).toFixed(1)} … ${toCelsius(m.fittedRangeK[1]).toFixed(1)}`,
      m.weighting.kind === 'full-covariance' ? 'shift covariance (GLS)' : 'own s.e. only',
      m.converged ? 'yes' : 'no',
    ]),
  );
  return {
    header: [
      'model',
      'constant',
      'value',
      's.e.',
      '95 % low',
      '95 % high',
      'unit',
      'Tr (°C)',
      'R²',
      'RMS residual (decades)',
      'fitted range (°C)',
      'weighting',
      'converged',
    ],
    rows,
  };
}

export function pronyTable(a: Analysis): PlainTable {
  const p = a.prony;
  if (!p) return { header: [], rows: [] };
  const g0 = p.instantaneousModulusPa;
  const y = pronySymbols(p.deformation);
  return {
    header: [
      'mode',
      'τ_i (s)',
      `${y.term} (Pa, ${p.deformation})`,
      `${y.term} / ${y.instantaneous}`,
    ],
    rows: [
      [
        `${y.equilibrium} (equilibrium)`,
        null,
        p.equilibriumModulusPa,
        g0 > 0 ? p.equilibriumModulusPa / g0 : null,
      ],
      ...p.tauS.map((t, i): Cell[] => [
        i + 1,
        t,
        p.modulusPa[i],
        g0 > 0 ? p.modulusPa[i] / g0 : null,
      ]),
    ],
  };
}

export function indicatorTable(a: Analysis): PlainTable {
  return {
    header: ['indicator', 'value', 'unit', 'note'],
    rows: a.indicators.map((i) => [i.label, i.value, i.unit, i.note ?? '']),
  };
}
