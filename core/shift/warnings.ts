/** Wording of the warnings, in terms a lab technician can act on. */
import { formatCelsius, kelvinToCelsius } from '../data/temperature';
import type { Isotherm } from '../data/types';
import type { ShiftWarning, ShiftWarningCode } from './types';

export function describeIsotherm(iso: Isotherm): string {
  const file = iso.source[0]?.file;
  return `${iso.id} (${kelvinToCelsius(iso.temperatureK).toFixed(1)} °C${file ? `, ${file}` : ''})`;
}

export function warn(list: ShiftWarning[], code: ShiftWarningCode, message: string): void {
  list.push({ code, message });
}

export const formatC = (k: number): string => formatCelsius(k);
