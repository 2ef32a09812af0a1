/** The shift table as CSV: one row per isotherm, conventions in the header comment. */
import type { Analysis } from '../../pipeline/types';
import { conventionCommentLines } from '../../pipeline/conventions';
import { toCelsius, toKelvinText } from '../../pipeline/temperature';
import { csvDocument, csvNumber } from './csv-format';
import { appliedVertical } from '../../pipeline/vertical-at';

export const SHIFT_TABLE_COLUMNS = [
  'isotherm',
  'temperature_C',
  'temperature_K',
  'log10_aT',
  'log10_aT_stderr',
  'log10_bT',
  'log10_bT_stderr',
  'rms_residual_decades',
  'included',
  'left_out_code',
  'left_out_reason',
  'note',
] as const;

export function shiftTableCsv(a: Analysis): string {
  return csvDocument(
    [
      `Thermoshift ${a.version} shift table — sample: ${a.sample.name}`,
      `reference temperature: ${toCelsius(a.referenceTemperatureK)} °C (${toKelvinText(a.referenceTemperatureK)} K)`,
      `shift driven by: ${a.shiftQuantities.join(', ')}; vertical shift: ${appliedVertical(a)}${a.vertical ? ` (${a.vertical.reason})` : ''}`,
      ...conventionCommentLines(),
      'rms_residual_decades: RMS residual of the isotherm against the master curve (quality; smaller is better)',
    ],
    [...SHIFT_TABLE_COLUMNS],
    a.curves.map((c) => [
      c.isothermId,
      csvNumber(toCelsius(c.temperatureK)),
      csvNumber(c.temperatureK),
      csvNumber(c.log10aT),
      csvNumber(c.log10aTStdErr),
      csvNumber(c.log10bT),
      csvNumber(c.log10bTStdErr),
      csvNumber(c.qualityRmsDecades),
      c.included ? 'yes' : 'no',
      c.leftOut?.code ?? '',
      c.leftOut?.message ?? '',
      c.note ?? '',
    ]),
  );
}
