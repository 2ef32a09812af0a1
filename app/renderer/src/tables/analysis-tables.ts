/**
 * The analysis tables as header + rows, used both for copying to spreadsheets and for the
 * on-screen tables. Numbers carry the digits they are known to: a value with a standard error
 * to the digits the error supports (format/numbers.ts), the error itself to two significant
 * digits, other figures to four. Moduli are in the display unit, stated in the header.
 */
import type { Analysis, ModelFitStats } from '@core/pipeline';
import { fittedShiftModels, modelConstant, toCelsius } from '@core/pipeline';
import { SI_DISPLAY, toDisplay, type DisplayUnits } from '../format/display-units';
import { digitsForError } from '../format/numbers';
import type { Cell, Rounded } from './tsv';

/** A value to the digits its standard error supports. */
const withError = (value: number | null, se: number | null | undefined): Rounded => ({
  value,
  digits: value === null ? 4 : digitsForError(value, se),
});
/** A standard error to two significant digits. */
const stdErr = (se: number | null | undefined): Rounded => ({ value: se ?? null, digits: 2 });
const sig = (value: number | null | undefined, digits = 4): Rounded => ({
  value: value ?? null,
  digits,
});
/** A temperature in °C to 0.01 K. */
const celsius = (k: number): Rounded => {
  const c = toCelsius(k);
  return { value: c, digits: Math.max(1, Math.floor(Math.log10(Math.abs(c) || 1)) + 3) };
};
import { pronySymbols } from '@core/spectrum';

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
      celsius(c.temperatureK),
      withError(c.log10aT, c.log10aTStdErr),
      stdErr(c.log10aTStdErr),
      withError(c.log10bT, c.log10bTStdErr),
      stdErr(c.log10bTStdErr),
      sig(c.qualityRmsDecades, 2),
      c.included ? 'yes' : 'no',
      c.note ?? '',
    ]),
  };
}

/** One constant of a model: name, value, s.e., 95 % interval (or null) and unit. */
type Constant = [string, number, number | null, [number, number] | null, string];

export function modelTable(a: Analysis): PlainTable {
  const models: [string, ModelFitStats & { referenceK: number }, Constant[]][] = fittedShiftModels(
    a.models,
  ).map((f) => [
    f.descriptor.name,
    f.result,
    f.descriptor.parameters.map((p, i): Constant => {
      const c = modelConstant(f, i);
      return [
        f.descriptor.law.parameters[i].name,
        c.value,
        c.stdErr,
        p.interval ? c.ci95 : null,
        p.unit,
      ];
    }),
  ]);
  const rows: Cell[][] = models.flatMap(([name, m, constants]) =>
    constants.map(([constant, value, se, ci, unit]): Cell[] => [
      name,
      constant,
      withError(value, se),
      stdErr(se),
      ci ? withError(ci[0], se) : null,
      ci ? withError(ci[1], se) : null,
      unit,
      celsius(m.referenceK),
      sig(m.r2, 4),
      sig(m.rmsResidualDecades, 2),
      `${toCelsius(m.fittedRangeK[0]).toFixed(1)} … ${toCelsius(m.fittedRangeK[1]).toFixed(1)}`,
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
    ],
    rows,
  };
}

export function pronyTable(a: Analysis, units: DisplayUnits = SI_DISPLAY): PlainTable {
  const p = a.prony;
  if (!p) return { header: [], rows: [] };
  const g0 = p.instantaneousModulusPa;
  const g = (pa: number): Rounded => sig(toDisplay(pa, 'Pa', units).value);
  const y = pronySymbols(p.deformation);
  return {
    header: [
      'mode',
      'τ_i (s)',
      `${y.term} (${units.modulus}, ${p.deformation})`,
      `${y.term} / ${y.instantaneous}`,
    ],
    rows: [
      [
        `${y.equilibrium} (equilibrium)`,
        null,
        g(p.equilibriumModulusPa),
        sig(g0 > 0 ? p.equilibriumModulusPa / g0 : null),
      ],
      ...p.tauS.map((t, i): Cell[] => [
        String(i + 1),
        sig(t),
        g(p.modulusPa[i]),
        sig(g0 > 0 ? p.modulusPa[i] / g0 : null),
      ]),
    ],
  };
}

export function indicatorTable(a: Analysis, units: DisplayUnits = SI_DISPLAY): PlainTable {
  return {
    header: ['indicator', 'value', 'unit', 'note'],
    rows: a.indicators.map((i) => {
      const d = toDisplay(i.value, i.unit, units);
      return [i.label, sig(d.value), d.unit, i.note ?? ''];
    }),
  };
}
