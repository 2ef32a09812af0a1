/**
 * Labels and read-out text shared by the plot specs, in the display units (moduli in Pa … GPa,
 * frequency in rad/s or Hz); numbers in the app's one format (format/numbers.ts).
 */
import { quantitySymbol, quantityUnit } from '@core/data';
import type { AbscissaKind, DeformationMode, QuantityId } from '@core/data';
import { toCelsius } from '@core/pipeline';
import { toDisplay, type DisplayUnits } from '../../format/display-units';
import { formatSig } from '../../format/numbers';

export function celsiusText(temperatureK: number): string {
  return `${toCelsius(temperatureK).toFixed(1)} °C`;
}

export function xSymbol(kind: AbscissaKind, reduced: boolean, u: DisplayUnits): string {
  if (kind === 'angularFrequency') {
    const s = u.frequency === 'Hz' ? 'f' : 'ω';
    return reduced ? `aT·${s}` : s;
  }
  return reduced ? 't/aT' : 't';
}

export function xUnit(kind: AbscissaKind, u: DisplayUnits): string {
  return kind === 'angularFrequency' ? u.frequency : 's';
}

export function xAxisLabel(kind: AbscissaKind, reduced: boolean, u: DisplayUnits): string {
  const name = kind === 'angularFrequency' ? 'frequency' : 'time';
  return `${reduced ? `reduced ${name} ` : `${name} `}${xSymbol(kind, reduced, u)} (${xUnit(kind, u)})`;
}

/** The display unit of a quantity ('' for tan δ). */
export function unitOf(q: QuantityId, u: DisplayUnits): string {
  return toDisplay(1, quantityUnit(q), u).unit;
}

/** A quantity's value in display units, from SI. */
export function inDisplay(q: QuantityId, valueSi: number, u: DisplayUnits): number {
  return toDisplay(valueSi, quantityUnit(q), u).value;
}

export function yAxisLabel(
  qs: QuantityId[],
  mode: DeformationMode,
  reduced: boolean,
  u: DisplayUnits,
): string {
  const sym = qs.map((q) => quantitySymbol(q, mode)).join(', ');
  const unit = qs.length ? unitOf(qs[0], u) : '';
  const shifted = reduced && qs.some((q) => q !== 'tanDelta' && q !== 'phaseAngle');
  return `${shifted ? 'reduced ' : ''}${sym}${unit ? ` (${unit})` : ''}`;
}

/** "G′ = 1.234×10⁶ MPa" from a value already in display units. */
export function valueText(
  q: QuantityId,
  mode: DeformationMode,
  displayed: number,
  u: DisplayUnits,
): string {
  const unit = unitOf(q, u);
  return `${quantitySymbol(q, mode)} = ${formatSig(displayed, 4)}${unit ? ` ${unit}` : ''}`;
}

export function xText(
  kind: AbscissaKind,
  reduced: boolean,
  displayed: number,
  u: DisplayUnits,
): string {
  return `${xSymbol(kind, reduced, u)} = ${formatSig(displayed, 4)} ${xUnit(kind, u)}`;
}
