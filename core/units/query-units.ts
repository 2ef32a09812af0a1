/**
 * The time and frequency units a user may ask a prediction at (the `--predict` query of the
 * command line, the prediction form of the app). Factors come from the import's unit table
 * (core/units/unit-table.ts); the year is added here: 1 y = 365.25 d, the Julian year (common
 * practice for service lives).
 */
import { UNIT_TABLE } from './unit-table';
import type { UnitDimension } from './types';

function factorOf(spelling: string, dimension: UnitDimension): number {
  const c = UNIT_TABLE.get(spelling)?.find((u) => u.dimension === dimension);
  if (!c) throw new RangeError(`"${spelling}" is not a ${dimension} unit of the unit table`);
  return c.factor;
}

const SECOND = factorOf('s', 'time');
const MINUTE = factorOf('min', 'time');
const HOUR = factorOf('h', 'time');
const DAY = factorOf('d', 'time');
/** The Julian year, s. */
export const YEAR_S = 365.25 * DAY;

/** Time units of a prediction query, lower-case spelling → seconds. */
export const QUERY_TIME_UNITS: Readonly<Record<string, number>> = {
  s: SECOND,
  min: MINUTE,
  h: HOUR,
  d: DAY,
  day: DAY,
  days: DAY,
  y: YEAR_S,
  yr: YEAR_S,
  year: YEAR_S,
  years: YEAR_S,
};

/**
 * Frequency units of a prediction query, spelling → rad/s. Case matters only for mHz
 * (millihertz) against MHz, which no rheometer reaches.
 */
export const QUERY_FREQUENCY_UNITS: Readonly<Record<string, number>> = {
  Hz: factorOf('hz', 'frequency'),
  hz: factorOf('hz', 'frequency'),
  kHz: factorOf('khz', 'frequency'),
  khz: factorOf('khz', 'frequency'),
  mHz: factorOf('mhz', 'frequency'),
  'rad/s': factorOf('rad/s', 'frequency'),
};

/** A unit offered in a form: its label and its factor to SI (s or rad/s). */
export interface QueryUnitChoice {
  id: string;
  factor: number;
}

/** The time units the app's prediction form offers. */
export const TIME_UNIT_CHOICES: readonly QueryUnitChoice[] = [
  { id: 's', factor: QUERY_TIME_UNITS.s },
  { id: 'h', factor: QUERY_TIME_UNITS.h },
  { id: 'days', factor: QUERY_TIME_UNITS.days },
  { id: 'years', factor: QUERY_TIME_UNITS.years },
];

/** The frequency units the app's prediction form offers. */
export const FREQUENCY_UNIT_CHOICES: readonly QueryUnitChoice[] = [
  { id: 'Hz', factor: QUERY_FREQUENCY_UNITS.Hz },
  { id: 'rad/s', factor: QUERY_FREQUENCY_UNITS['rad/s'] },
];
