/**
 * Kelvin ↔ degrees Celsius and temperature text, in one place (docs/conventions.md §1: SI inside,
 * kelvin; °C only on import and display). No other file writes the offset 273.15.
 */

/** 0 °C in kelvin (exact, SI Brochure, BIPM 2019). */
export const ZERO_CELSIUS_K = 273.15;

export const celsiusToKelvin = (c: number): number => c + ZERO_CELSIUS_K;
export const kelvinToCelsius = (k: number): number => k - ZERO_CELSIUS_K;

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

/** A temperature in kelvin as °C text for messages and labels: 463.15 → "190.0 °C". */
export function formatCelsius(temperatureK: number, decimals = 1): string {
  return `${kelvinToCelsius(temperatureK).toFixed(decimals)} °C`;
}
