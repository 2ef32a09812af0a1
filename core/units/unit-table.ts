import type { UnitConversion, UnitDimension } from './types';
import { ZERO_CELSIUS_K } from '../data/temperature';

/**
 * Every unit Thermoshift understands, keyed by its normalised spelling (see normaliseUnitText).
 * Sources: SI Brochure (BIPM, 9th ed., 2019) for SI prefixes, 0 °C = 273.15 K, ω = 2πf,
 * 1 dyn/cm² = 0.1 Pa and 1 P = 0.1 Pa·s; NIST SP 811 (2008), appendix B, for °F and psi.
 */
const TWO_PI = 2 * Math.PI;
/** 1 psi = 6.894757 kPa (NIST SP 811, 2008, B.8: 1 lbf/in² = 6.894 757 E+03 Pa). */
const PSI_PA = 6894.757;
/** t/°F → T/K: T = (t + 459.67)·5/9 (NIST SP 811, 2008, B.9). */
const F_FACTOR = 5 / 9;
const F_OFFSET = (459.67 * 5) / 9;

type Entry = [spellings: string[], unit: string, factor: number, offset?: number];

const TABLE: Record<UnitDimension, { siUnit: string; entries: Entry[] }> = {
  temperature: {
    siUnit: 'K',
    entries: [
      [
        ['°c', 'degc', 'c', 'celsius', 'degreescelsius', 'degreecelsius', 'oc'],
        '°C',
        1,
        ZERO_CELSIUS_K,
      ],
      [['k', 'kelvin', '°k'], 'K', 1, 0],
      [['°f', 'degf', 'f', 'fahrenheit', 'degreesfahrenheit', 'of'], '°F', F_FACTOR, F_OFFSET],
    ],
  },
  frequency: {
    siUnit: 'rad/s',
    entries: [
      [['hz', 'hertz', 'cycles/s'], 'Hz', TWO_PI],
      [['khz'], 'kHz', 1e3 * TWO_PI],
      [['mhz'], 'mHz', 1e-3 * TWO_PI],
      [['rad/s', 'rad·s-1', 'rads-1', 'rad/sec', '1/s', 's-1', '1/sec', 'rad/second'], 'rad/s', 1],
      [['rad/min', '1/min', 'min-1'], 'rad/min', 1 / 60],
    ],
  },
  time: {
    siUnit: 's',
    entries: [
      [['s', 'sec', 'secs', 'second', 'seconds'], 's', 1],
      [['ms', 'msec', 'millisecond', 'milliseconds'], 'ms', 1e-3],
      [['min', 'mins', 'minute', 'minutes'], 'min', 60],
      [['h', 'hr', 'hrs', 'hour', 'hours'], 'h', 3600],
      [['d', 'day', 'days'], 'd', 86400],
    ],
  },
  modulus: {
    siUnit: 'Pa',
    entries: [
      [['pa', 'n/m2', 'pascal'], 'Pa', 1],
      [['kpa'], 'kPa', 1e3],
      [['mpa', 'n/mm2'], 'MPa', 1e6],
      [['gpa', 'kn/mm2'], 'GPa', 1e9],
      [['dyn/cm2', 'dyne/cm2', 'dyn·cm-2', 'dyncm-2'], 'dyn/cm²', 0.1],
      [['psi', 'lbf/in2'], 'psi', PSI_PA],
      [['ksi'], 'ksi', 1e3 * PSI_PA],
    ],
  },
  viscosity: {
    siUnit: 'Pa·s',
    entries: [
      [['pa·s', 'pas', 'n·s/m2'], 'Pa·s', 1],
      [['mpa·s', 'mpas'], 'mPa·s', 1e-3],
      [['kpa·s', 'kpas'], 'kPa·s', 1e3],
      [['p', 'poise'], 'P', 0.1],
      [['cp', 'centipoise'], 'cP', 1e-3],
    ],
  },
  compliance: {
    siUnit: '1/Pa',
    entries: [
      [['1/pa', 'pa-1', 'm2/n'], '1/Pa', 1],
      [['1/kpa', 'kpa-1'], '1/kPa', 1e-3],
      [['1/mpa', 'mpa-1', 'mm2/n'], '1/MPa', 1e-6],
      [['1/gpa', 'gpa-1'], '1/GPa', 1e-9],
      [['cm2/dyn', 'cm2/dyne', '1/(dyn/cm2)'], 'cm²/dyn', 10],
      [['1/psi', 'psi-1'], '1/psi', 1 / PSI_PA],
    ],
  },
  angle: {
    siUnit: '°',
    entries: [
      [['°', 'deg', 'degree', 'degrees', 'º'], '°', 1],
      [['rad', 'radian', 'radians'], 'rad', 180 / Math.PI],
      [['mrad'], 'mrad', 0.18 / Math.PI],
    ],
  },
  dimensionless: {
    siUnit: '',
    entries: [[['', '-', '1', '—', '–', 'none', '/'], '', 1]],
  },
};

function build(): Map<string, UnitConversion[]> {
  const map = new Map<string, UnitConversion[]>();
  for (const dimension of Object.keys(TABLE) as UnitDimension[]) {
    const { siUnit, entries } = TABLE[dimension];
    for (const [spellings, unit, factor, offset = 0] of entries) {
      for (const s of spellings) {
        const list = map.get(s) ?? [];
        list.push({ unit, dimension, siUnit, factor, offset });
        map.set(s, list);
      }
    }
  }
  return map;
}

/** Normalised spelling → every unit it can mean (several only for "mpa" vs "MPa", "P"…). */
export const UNIT_TABLE: ReadonlyMap<string, readonly UnitConversion[]> = build();

/** SI (storage) unit of each dimension. */
export function siUnitOf(dimension: UnitDimension): string {
  return TABLE[dimension].siUnit;
}

/** The units accepted for a dimension, for error messages ("Pa, kPa, MPa …"). */
export function unitsOf(dimension: UnitDimension): string[] {
  return TABLE[dimension].entries.map((e) => e[1]).filter((u) => u !== '');
}
