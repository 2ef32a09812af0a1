import { kelvinToCelsius } from '../data/quantities';

/** Kelvin to °C rounded to 1e-6 K, so 463.15 K prints as 190 and not 190.00000000000003. */
export function toCelsius(temperatureK: number): number {
  return Math.round(kelvinToCelsius(temperatureK) * 1e6) / 1e6;
}

/** Kelvin as text with at most 10 significant digits (253.14999999999998 → "253.15"). */
export function toKelvinText(temperatureK: number): string {
  return String(Number(temperatureK.toPrecision(10)));
}

/** Kelvin rounded to 1e-6 K for JSON output (233.15000000000006 → 233.15). */
export function roundKelvin(temperatureK: number): number {
  return Math.round(temperatureK * 1e6) / 1e6;
}
