/**
 * The report's tables: shift factors, model constants, Prony terms, indicators and settings.
 * Every table that holds shift factors states the sign and bT conventions under it.
 */
import type { Analysis } from '../pipeline/types';
import { fittedShiftModels, modelConstant } from '../pipeline/model-results';
import { shiftModels } from '../models';
import { CONVENTIONS } from '../pipeline/conventions';
import { toCelsius, toKelvinText } from '../pipeline/temperature';
import { formatFixed, formatNumber } from './format';
import { quantitySymbol } from '../data/quantities';
import type { TableSpec } from './html-table';
import {
  modulusFactor,
  toOutputFrequency,
  type FrequencyUnit,
  type ModulusUnit,
} from '../units/output-units';
import { pronySymbols } from '../spectrum/prony-symbols';

const CONVENTION_NOTE = `Conventions: ${CONVENTIONS.horizontal}. ${CONVENTIONS.vertical}.`;

export function shiftTable(a: Analysis): TableSpec {
  return {
    id: 'table-shift',
    caption: `Shift factors (Tref = ${toCelsius(a.referenceTemperatureK)} °C)`,
    head: [
      'isotherm',
      'T (°C)',
      'log10 aT',
      '± s.e.',
      'log10 bT',
      '± s.e.',
      'RMS residual (dec.)',
      'included',
      'note',
    ],
    numeric: [1, 2, 3, 4, 5, 6],
    rows: a.curves.map((c) => [
      c.isothermId,
      formatFixed(toCelsius(c.temperatureK), 2),
      formatFixed(c.log10aT, 3),
      formatFixed(c.log10aTStdErr, 3),
      formatFixed(c.log10bT, 4),
      formatFixed(c.log10bTStdErr, 4),
      formatFixed(c.qualityRmsDecades, 3),
      c.included ? 'yes' : 'no',
      c.note ?? '',
    ]),
    rowClass: a.curves.map((c) => (c.included ? undefined : 'excluded')),
    note: `${CONVENTION_NOTE} Overall RMS residual against the master curve: ${formatFixed(a.overallQualityRmsDecades, 3)} decades.`,
  };
}

/** Each registered law in words, then how to read the constants (the model table's note). */
function modelNotes(): string {
  const models = shiftModels();
  return [
    ...models.map(
      (d) => `${d.title}: ${d.formula.text}${d.formula.source ? ` (${d.formula.source})` : ''}.`,
    ),
    ...models.flatMap((d) => (d.readingNote ? [d.readingNote] : [])),
  ].join(' ');
}

/** "; WLF constants fitted above Tg do not hold below Tg" for each law that has such a clause. */
export function validityClauses(): string {
  return shiftModels()
    .flatMap((d) => (d.validityNote ? [`; ${d.validityNote}`] : []))
    .join('');
}

const ci = (v: [number, number] | null | undefined, d = 4): string =>
  v ? `${formatNumber(v[0], d)} … ${formatNumber(v[1], d)}` : '–';

export function modelTable(a: Analysis): TableSpec | null {
  const rows: string[][] = [];
  const fit = (m: {
    r2: number | null;
    rmsResidualDecades: number | null;
    fittedRangeK: [number, number];
  }): string[] => [
    formatFixed(m.r2, 4),
    formatFixed(m.rmsResidualDecades, 3),
    `${formatFixed(toCelsius(m.fittedRangeK[0]), 1)} … ${formatFixed(toCelsius(m.fittedRangeK[1]), 1)}`,
  ];
  for (const f of fittedShiftModels(a.models)) {
    const { descriptor: d, result: m } = f;
    // the first constant's row carries the reference and the fit figures
    d.parameters.forEach((p, i) => {
      const c = modelConstant(f, i);
      rows.push([
        d.name,
        d.law.parameters[i].name,
        formatNumber(c.value),
        formatNumber(c.stdErr, 2),
        p.interval ? ci(c.ci95) : '',
        p.unit,
        ...(i === 0
          ? [`Tr = ${formatFixed(toCelsius(m.referenceK), 2)} °C`, ...fit(m)]
          : ['', '', '', '']),
      ]);
    });
    for (const r of d.derived?.rows(m) ?? [])
      rows.push([
        r.model,
        r.constant,
        r.values.map((v) => formatNumber(v)).join(' / '),
        '',
        '',
        r.unit,
        r.reference
          ? `${r.reference.symbol} = ${formatFixed(toCelsius(r.reference.temperatureK), 2)} °C`
          : '',
        '',
        '',
        '',
      ]);
  }
  if (rows.length === 0) return null;
  const hint = a.models.hint
    ? ` Suggested model: ${a.models.hint.model} (${a.models.hint.reason}).`
    : '';
  return {
    id: 'table-models',
    caption: 'Shift-factor models (log10 aT against temperature)',
    head: [
      'model',
      'constant',
      'value',
      'std. error',
      '95 % interval',
      'unit',
      'reference',
      'R²',
      'RMS (dec.)',
      'fitted range (°C)',
    ],
    numeric: [2, 3, 7, 8],
    rows,
    note: `${modelNotes()} Do not use a model outside its fitted range${validityClauses()}.${hint} ${CONVENTION_NOTE}`,
  };
}

export function pronyTable(a: Analysis, unit: ModulusUnit): TableSpec | null {
  const p = a.prony;
  if (!p) return null;
  const f = modulusFactor(unit);
  const y = pronySymbols(p.deformation);
  const rows = p.tauS.map((tau, i) => [
    String(i + 1),
    formatNumber(tau, 4),
    formatNumber(p.modulusPa[i] / f, 4),
    formatNumber(p.modulusPa[i] / p.instantaneousModulusPa, 4),
  ]);
  rows.push([
    `${y.equilibrium} (equilibrium)`,
    '–',
    formatNumber(p.equilibriumModulusPa / f, 4),
    formatNumber(p.equilibriumModulusPa / p.instantaneousModulusPa, 4),
  ]);
  return {
    id: 'table-prony',
    caption: `Prony series, ${y.modeLabel}, at Tref = ${toCelsius(a.referenceTemperatureK)} °C (${y.instantaneous} = ${formatNumber(p.instantaneousModulusPa / f)} ${unit})`,
    head: ['i', 'τ_i (s)', `${y.term} (${unit})`, `${y.term} / ${y.instantaneous}`],
    numeric: [1, 2, 3],
    rows,
    note:
      `Generalised Maxwell model in ${p.deformation}: ${y.formula}, ${y.instantaneous} = ${y.equilibrium} + Σ ${y.term}${p.deformation === 'tension' ? ' (tensile moduli: do not enter them as shear moduli; E = 2(1 + ν)G)' : ''}; ` +
      `${y.equilibrium} ${p.equilibrium.mode === 'zero' ? 'set to 0' : 'fitted'} (${p.equilibrium.reason}); fitted to ${p.fittedTo.map((q) => quantitySymbol(q, p.deformation)).join(' and ')} with non-negative ${y.term}, ` +
      `${p.modesPerDecade} mode(s) per decade, RMS relative error ${p.rmsRelativeError === null ? '–' : `${formatFixed(p.rmsRelativeError * 100, 2)} %`}, ` +
      `reduced window ${formatNumber(p.reducedWindow[0], 3)} … ${formatNumber(p.reducedWindow[1], 3)}. ` +
      `Valid at Tref; at another temperature T use t/aT(T) with the shift model. ${CONVENTION_NOTE}`,
  };
}

/** Frequencies (rad/s) are written in `frequencyUnit`: f = ω/2π in Hz. */
export function indicatorTable(
  a: Analysis,
  frequencyUnit: FrequencyUnit = 'rad/s',
): TableSpec | null {
  if (a.indicators.length === 0) return null;
  const hz = (u: string): boolean => u === 'rad/s' && frequencyUnit === 'Hz';
  return {
    id: 'table-indicators',
    caption: 'Indicators',
    head: ['indicator', 'value', 'unit', 'note'],
    numeric: [1],
    rows: a.indicators.map((i) => [
      i.label,
      formatNumber(hz(i.unit) ? toOutputFrequency(i.value, 'Hz') : i.value, 4),
      hz(i.unit) ? 'Hz' : i.unit,
      i.note ?? '',
    ]),
  };
}

function settingValue(v: unknown): string {
  if (v === null || v === undefined) return '–';
  if (Array.isArray(v))
    return v.length === 0
      ? '(none)'
      : v.map((x) => (typeof x === 'object' ? JSON.stringify(x) : String(x))).join(', ');
  if (typeof v === 'object') return Object.keys(v).length === 0 ? '(none)' : JSON.stringify(v);
  return String(v);
}

/** Every resolved setting, so the analysis can be repeated exactly. */
export function settingsTable(a: Analysis): TableSpec {
  const rows = Object.entries(a.settings).map(([k, v]) => [k, settingValue(v)]);
  rows.push(['shift quantities used', a.shiftQuantities.join(', ')]);
  return {
    id: 'table-settings',
    caption: 'Settings used',
    head: ['setting', 'value'],
    rows,
    note: `Reference temperature ${toCelsius(a.settings.referenceTemperatureK)} °C (${toKelvinText(a.settings.referenceTemperatureK)} K)${a.settings.referenceTemperatureAuto ? ', chosen automatically' : ''}. Temperatures in the settings are in kelvin.`,
  };
}
