/**
 * A comparison as CSV text: one table of verdicts (one row per sample and criterion) and one of
 * differences (one row per sample, quantity and grid node). Numbers with six significant digits;
 * text quoted when it holds a comma, quote or line break (RFC 4180).
 */
import { kelvinToCelsius } from '../data/temperature';
import type { Comparison } from './types';

const cell = (v: string | number | null | boolean): string => {
  if (v === null) return '';
  if (typeof v === 'number') return Number.isFinite(v) ? String(Number(v.toPrecision(6))) : '';
  const s = String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};
const row = (cells: (string | number | null | boolean)[]): string => cells.map(cell).join(',');

/** Verdicts: sample, criterion, verdict, value, s.e., limits, unit, P(outside), reason. */
export function verdictsCsv(c: Comparison): string {
  const lines = [
    row([
      'sample',
      'overall',
      'criterion',
      'kind',
      'verdict',
      'value',
      'std_err',
      'lower_limit',
      'upper_limit',
      'unit',
      'probability_outside',
      'reason',
    ]),
  ];
  for (const s of c.comparisons) {
    if (s.verdicts.length === 0)
      lines.push(row([s.name, s.overall, '', '', '', null, null, null, null, '', null, '']));
    for (const v of s.verdicts)
      lines.push(
        row([
          s.name,
          s.overall,
          v.criterion,
          v.kind,
          v.verdict,
          v.value,
          v.stdErr,
          v.limits[0],
          v.limits[1],
          v.unit,
          v.probabilityOutside,
          v.reason,
        ]),
      );
  }
  return `${lines.join('\n')}\n`;
}

/** Differences: sample, quantity, reduced x, log10 difference and its s.e., at the common Tref. */
export function comparisonCsv(c: Comparison): string {
  const xName = c.abscissa === 'time' ? 'reduced_time_s' : 'reduced_frequency_rad_per_s';
  const lines = [
    `# Thermoshift comparison at ${kelvinToCelsius(c.referenceTemperatureK).toFixed(2)} °C; reference: ${c.reference.name}`,
    row(['sample', 'quantity', xName, 'log10_difference', 'std_err_decades', 'difference_percent']),
  ];
  for (const s of c.comparisons)
    for (const d of s.differences)
      d.log10x.forEach((u, i) =>
        lines.push(
          row([
            s.name,
            d.quantity,
            10 ** u,
            d.log10Difference[i],
            d.stdErr[i],
            (10 ** d.log10Difference[i] - 1) * 100,
          ]),
        ),
      );
  return `${lines.join('\n')}\n`;
}
