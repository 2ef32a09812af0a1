/**
 * The analysis tables as header + rows of plain values (full precision, SI or stated units), used
 * both for copying to spreadsheets and for the on-screen tables.
 */
import type { Analysis } from '../../../../core/pipeline/types';
import { toCelsius } from '../../../../core/pipeline/temperature';
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

export function modelTable(a: Analysis): PlainTable {
  const rows: Cell[][] = [];
  const { wlf, arrhenius, polynomial } = a.models;
  const fit = (m: {
    r2: number | null;
    rmsResidualDecades: number | null;
    fittedRangeK: [number, number];
  }): Cell[] => [
    m.r2,
    m.rmsResidualDecades,
    `${toCelsius(m.fittedRangeK[0]).toFixed(1)} … ${toCelsius(m.fittedRangeK[1]).toFixed(1)}`,
  ];
  if (wlf) {
    rows.push([
      'WLF',
      'C1',
      wlf.c1,
      wlf.c1StdErr,
      wlf.c1Ci95?.[0],
      wlf.c1Ci95?.[1],
      '',
      toCelsius(wlf.referenceK),
      ...fit(wlf),
    ]);
    rows.push([
      'WLF',
      'C2',
      wlf.c2K,
      wlf.c2KStdErr,
      wlf.c2KCi95?.[0],
      wlf.c2KCi95?.[1],
      'K',
      toCelsius(wlf.referenceK),
      ...fit(wlf),
    ]);
  }
  if (arrhenius)
    rows.push([
      'Arrhenius',
      'Ea',
      arrhenius.activationEnergyKJPerMol,
      arrhenius.activationEnergyKJPerMolStdErr,
      arrhenius.activationEnergyKJPerMolCi95?.[0],
      arrhenius.activationEnergyKJPerMolCi95?.[1],
      'kJ/mol',
      toCelsius(arrhenius.referenceK),
      ...fit(arrhenius),
    ]);
  if (polynomial) {
    rows.push([
      'polynomial',
      'a1',
      polynomial.a1PerK,
      polynomial.a1PerKStdErr,
      null,
      null,
      '1/K',
      toCelsius(polynomial.referenceK),
      ...fit(polynomial),
    ]);
    rows.push([
      'polynomial',
      'a2',
      polynomial.a2PerK2,
      polynomial.a2PerK2StdErr,
      null,
      null,
      '1/K²',
      toCelsius(polynomial.referenceK),
      ...fit(polynomial),
    ]);
  }
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
    ],
    rows,
  };
}

export function pronyTable(a: Analysis): PlainTable {
  const p = a.prony;
  if (!p) return { header: [], rows: [] };
  const g0 = p.instantaneousModulusPa;
  return {
    header: ['mode', 'τ_i (s)', 'g_i (Pa)', 'g_i / G0'],
    rows: [
      ['equilibrium', null, p.equilibriumModulusPa, g0 > 0 ? p.equilibriumModulusPa / g0 : null],
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
