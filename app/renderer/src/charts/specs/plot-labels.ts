/** Labels and read-out text shared by the plot specs. Units are SI, as stored. */
import { quantitySymbol, quantityUnit } from '../../../../../core/data/quantities';
import type { AbscissaKind, DeformationMode, QuantityId } from '../../../../../core/data/types';
import { formatValue as formatNumber } from '../../tables/format-value';
import { toCelsius } from '../../../../../core/pipeline/temperature';

export function celsiusText(temperatureK: number): string {
  return `${toCelsius(temperatureK).toFixed(1)} °C`;
}

export function xSymbol(kind: AbscissaKind, reduced: boolean): string {
  if (kind === 'angularFrequency') return reduced ? 'aT·ω' : 'ω';
  return reduced ? 't/aT' : 't';
}

export function xAxisLabel(kind: AbscissaKind, reduced: boolean): string {
  const unit = kind === 'angularFrequency' ? 'rad/s' : 's';
  const name = kind === 'angularFrequency' ? 'frequency' : 'time';
  return `${reduced ? `reduced ${name} ` : `${name} `}${xSymbol(kind, reduced)} (${unit})`;
}

export function yAxisLabel(qs: QuantityId[], mode: DeformationMode, reduced: boolean): string {
  const sym = qs.map((q) => quantitySymbol(q, mode)).join(', ');
  const unit = qs.length ? quantityUnit(qs[0]) : '';
  return `${reduced ? 'reduced ' : ''}${sym}${unit ? ` (${unit})` : ''}`;
}

export function valueText(q: QuantityId, mode: DeformationMode, v: number): string {
  const u = quantityUnit(q);
  return `${quantitySymbol(q, mode)} = ${formatNumber(v, 4)}${u ? ` ${u}` : ''}`;
}

export function xText(kind: AbscissaKind, reduced: boolean, x: number): string {
  return `${xSymbol(kind, reduced)} = ${formatNumber(x, 4)} ${kind === 'angularFrequency' ? 'rad/s' : 's'}`;
}
