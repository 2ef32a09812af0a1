import type { UnitConversion, UnitDimension } from './types';
import { UNIT_TABLE, unitsOf } from './unit-table';

/** Result of reading a unit: the conversion, or why it failed in words a lab technician reads. */
export type UnitParse =
  | { ok: true; conversion: UnitConversion }
  | { ok: false; reason: 'unknown' | 'wrongDimension' | 'ambiguous'; message: string };

const DIMENSION_WORDS: Record<UnitDimension, string> = {
  temperature: 'a temperature',
  frequency: 'a frequency',
  time: 'a time',
  modulus: 'a modulus (stress)',
  viscosity: 'a viscosity',
  compliance: 'a compliance',
  angle: 'an angle',
  dimensionless: 'a dimensionless number',
};

function unitWords(d: UnitDimension): string {
  return d === 'dimensionless' ? 'no unit (a plain number)' : `${DIMENSION_WORDS[d]} unit`;
}

export function describeDimension(dimension: UnitDimension): string {
  return DIMENSION_WORDS[dimension];
}

/**
 * Normalised spelling used as the lookup key: brackets and quotes stripped, special characters
 * unified (℃, superscripts, ^), products written with "·", lower case.
 */
export function normaliseUnitText(text: string): string {
  let s = text.trim();
  for (let i = 0; i < 3; i++) s = s.replace(/^[([{<"']\s*(.*?)\s*[)\]}>"']$/, '$1');
  return s
    .replace(/℃/g, '°C')
    .replace(/℉/g, '°F')
    .replace(/[º˚]/g, '°')
    .replace(/²/g, '2')
    .replace(/³/g, '3')
    .replace(/¹/g, '1')
    .replace(/[⁻−]/g, '-')
    .replace(/\^/g, '')
    .replace(/\s*\/\s*/g, '/')
    .replace(/(?<=[A-Za-z°])[\s.*⋅•·]+(?=[A-Za-z°])/g, '·')
    .replace(/\s+/g, '')
    .toLowerCase();
}

function candidates(text: string): readonly UnitConversion[] {
  const key = normaliseUnitText(text);
  return UNIT_TABLE.get(key) ?? UNIT_TABLE.get(key.replace(/·/g, '')) ?? [];
}

/**
 * Reads a unit as written in a file header or units row ("°C", "deg C", "rad/s", "s^-1", "MPa",
 * "dyn/cm²", "mPa·s", "1/MPa" …). With `expected`, only units of that dimension are accepted.
 * Case matters only where it changes the meaning: "mPa" is read as millipascal, which is
 * rejected for a modulus as almost certainly a typing slip for MPa.
 */
export function parseUnit(text: string, expected?: UnitDimension): UnitParse {
  if (text.length > 40) {
    return { ok: false, reason: 'unknown', message: `"${text.slice(0, 40)}…" is not a unit` };
  }
  const found = candidates(text);
  if (found.length === 0) {
    const list = expected
      ? ` Known units for ${DIMENSION_WORDS[expected]}: ${unitsOf(expected).join(', ')}.`
      : '';
    return { ok: false, reason: 'unknown', message: `unit "${text}" is not known.${list}` };
  }
  const pick = expected ? found.filter((c) => c.dimension === expected) : found;
  if (pick.length === 0) {
    return {
      ok: false,
      reason: 'wrongDimension',
      message: `unit "${text}" is ${unitWords(found[0].dimension)} where ${unitWords(expected!)} is needed`,
    };
  }
  const conversion = pick[0];
  const compact = text.replace(/\s+/g, '');
  if (conversion.unit === 'MPa' && /(^|[^A-Za-z])mPa/.test(compact)) {
    return {
      ok: false,
      reason: 'ambiguous',
      message: `unit "${text}" means millipascal; write MPa for megapascal`,
    };
  }
  if (conversion.unit === 'mPa·s' && /(^|[^A-Za-z])MPa/.test(compact)) {
    return { ok: true, conversion: { ...conversion, unit: 'MPa·s', factor: 1e6 } };
  }
  return { ok: true, conversion };
}

/** Converts one value: `value × factor + offset`. */
export function toStoredUnit(value: number, conversion: UnitConversion): number {
  return value * conversion.factor + conversion.offset;
}

/** "× 2π", "+ 273.15", "× 1e6", "none": how values are converted, for import reports. */
export function describeConversion(c: UnitConversion): string {
  if (c.factor === 1 && c.offset === 0) return 'none';
  const f =
    Math.abs(c.factor - 2 * Math.PI) < 1e-12
      ? '× 2π'
      : c.factor === 1
        ? ''
        : `× ${formatFactor(c.factor)}`;
  const o = c.offset === 0 ? '' : ` + ${Number(c.offset.toPrecision(10))}`;
  return `${f}${o}`.trim() + ` (${c.unit || '–'} → ${c.siUnit || '–'})`;
}

function formatFactor(f: number): string {
  const exp = Math.log10(f);
  if (Math.abs(exp - Math.round(exp)) < 1e-12 && Math.abs(exp) >= 3) return `1e${Math.round(exp)}`;
  return String(Number(f.toPrecision(10)));
}
