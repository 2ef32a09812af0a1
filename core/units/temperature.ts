import { parseUnit, toStoredUnit } from './parse-unit';

/** A temperature read from text, in kelvin, with the unit that was written or assumed. */
export interface TemperatureReading {
  temperatureK: number;
  /** The unit as Thermoshift writes it ("°C", "K", "°F"). */
  unit: string;
  /** True when no unit was written and °C was assumed. */
  assumed: boolean;
}

const NUMBER = String.raw`([-+−]?\d+(?:[.,]\d+)?(?:[eE][-+]?\d+)?)`;
const VALUE_AND_UNIT = new RegExp(`^\\s*${NUMBER}\\s*(.*?)\\s*$`);

/**
 * Reads "40 °C", "313.15 K", "-20C", "104 °F", "40,5 °C" or a bare "40" (then `defaultUnit`,
 * "°C" unless given, and `assumed` is true). Returns undefined when the text is not a temperature
 * or lies below absolute zero.
 */
export function parseTemperatureText(
  text: string,
  defaultUnit?: string,
): TemperatureReading | undefined {
  if (text.length > 60) return undefined;
  const m = VALUE_AND_UNIT.exec(text);
  if (!m) return undefined;
  const value = Number(m[1].replace('−', '-').replace(',', '.'));
  const written = m[2].replace(/^[([]\s*|\s*[)\]]$/g, '');
  const unitText = written === '' ? (defaultUnit ?? '°C') : written;
  const parsed = parseUnit(unitText, 'temperature');
  if (!parsed.ok || !Number.isFinite(value)) return undefined;
  const temperatureK = toStoredUnit(value, parsed.conversion);
  if (!(temperatureK > 0)) return undefined;
  return { temperatureK, unit: parsed.conversion.unit, assumed: written === '' && !defaultUnit };
}
