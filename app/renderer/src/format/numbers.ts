/**
 * Numbers as the app shows them, one way everywhere: significant digits (moduli span decades),
 * the ×10ⁿ form outside 10⁻³ … 10⁶ (never "5.88e+10" on screen), and — where a standard error
 * is known — as many digits as the error supports: the error to two significant digits and the
 * value to the same decimal place (JCGM 100:2008, Guide to the expression of uncertainty in
 * measurement, §7.2.6: "it usually suffices to quote the uncertainty to at most two significant
 * digits"). Plain e-notation (spreadsheet-readable) only in copied and exported text.
 */
import { superscript } from '@core/report';

export const MISSING = '–';

const finite = (v: number | null | undefined): v is number =>
  v !== null && v !== undefined && Number.isFinite(v);

/** The decade of |v| (floor of log10), 0 for 0. */
const decade = (v: number): number => (v === 0 ? 0 : Math.floor(Math.log10(Math.abs(v)) + 1e-12));

/** Mantissa text with `digits` significant digits and the ×10ⁿ exponent (n from `exponent`). */
function scientific(value: number, digits: number, trim: boolean): string {
  const [m, e] = value.toExponential(Math.max(0, digits - 1)).split('e');
  const mant = trim && m.includes('.') ? m.replace(/\.?0+$/, '') : m;
  return Number(e) === 0 ? mant : `${mant}×10${superscript(Number(e))}`;
}

/**
 * `digits` significant digits; ×10ⁿ below 10⁻³ and from 10⁶ on. `keepZeros` keeps trailing
 * zeros that are significant (10.50 ± 0.23), otherwise they are dropped (4 digits of 1.5 = "1.5").
 */
export function formatSig(value: number | null | undefined, digits = 4, keepZeros = false): string {
  if (!finite(value)) return MISSING;
  if (value === 0) return '0';
  const d = Math.min(15, Math.max(1, Math.round(digits)));
  const abs = Math.abs(value);
  // toPrecision rounds first: 999 950 at 4 digits is 1.000×10⁶, so decide on the rounded value
  const rounded = Number(value.toPrecision(d));
  if (abs < 1e-3 || Math.abs(rounded) >= 1e6) return scientific(value, d, !keepZeros);
  const text = value.toPrecision(d);
  // toPrecision writes 273 312.7 at 4 digits as "2.733e+5": plain digits are wanted here
  if (text.includes('e')) return String(Number(text));
  return keepZeros || !text.includes('.') ? text : text.replace(/\.?0+$/, '');
}

/** Significant digits of `value` that a standard error `stdErr` supports (1 … 12). */
export function digitsForError(value: number, stdErr: number | null | undefined): number {
  if (!finite(stdErr) || !(stdErr > 0) || !Number.isFinite(value) || value === 0) return 4;
  return Math.min(12, Math.max(2, decade(value) - decade(stdErr) + 2));
}

/** Decimal places that show `stdErr` with two significant digits (may be negative). */
export function decimalsForError(stdErr: number): number {
  return 1 - decade(stdErr);
}

/** A value with its standard error: "10.49 ± 0.23", "(5.88 ± 0.12)×10¹⁰". */
export function formatWithError(value: number | null | undefined, stdErr?: number | null): string {
  if (!finite(value)) return MISSING;
  if (!finite(stdErr) || !(stdErr > 0)) return formatSig(value, 4);
  const abs = Math.abs(value);
  if (abs < 1e-3 || abs >= 1e6) {
    const e = decade(value);
    const scale = 10 ** e;
    const body = formatWithError(value / scale, stdErr / scale);
    return e === 0 ? body : `(${body})×10${superscript(e)}`;
  }
  const dec = decimalsForError(stdErr);
  if (dec >= 0) return `${value.toFixed(dec)} ± ${stdErr.toFixed(dec)}`;
  const q = 10 ** -dec;
  return `${Math.round(value / q) * q} ± ${Math.round(stdErr / q) * q}`;
}

/**
 * A value and its range, with as many digits as it takes for the two ends to differ (the width
 * to two significant digits), never fewer than `minDigits`: "13 360; 95 % range 13 352 … 13 368"
 * instead of "13 400 … 13 400".
 */
export function formatRange(
  value: number,
  lo: number,
  hi: number,
  minDigits = 3,
): { value: string; lo: string; hi: string } {
  const width = Math.abs(hi - lo);
  const big = Math.max(Math.abs(value), Math.abs(lo), Math.abs(hi));
  const digits =
    width > 0 && big > 0 ? Math.max(minDigits, decade(big) - decade(width) + 2) : minDigits;
  const d = Math.min(12, digits);
  return {
    value: formatSig(value, d, true),
    lo: formatSig(lo, d, true),
    hi: formatSig(hi, d, true),
  };
}

/** A shift in decades with its sign: "+1.234", "−0.050". */
export function signedDecades(decades: number, decimals = 3): string {
  const t = Math.abs(decades).toFixed(decimals);
  return `${decades < 0 && Number(t) !== 0 ? '−' : '+'}${t}`;
}

/** Plain spreadsheet text with `digits` significant digits ("5.88e+10", "0.0123", "10.50"). */
export function plainNumber(value: number, digits: number): string {
  if (!Number.isFinite(value)) return '';
  if (value === 0) return '0';
  return value.toPrecision(Math.min(15, Math.max(1, Math.round(digits))));
}

/**
 * Rewrites numbers in e-notation inside a message (from the core, e.g. "5.88e+10 s") into the
 * app's ×10ⁿ form, so one exponent style is on screen.
 */
export function unifyExponents(text: string): string {
  return text.replace(
    /(?<![\w.])(-?\d+(?:\.\d+)?)e([+-]?\d+)(?![\w.])/g,
    (_m, mant: string, exp: string) => `${mant}×10${superscript(Number(exp))}`,
  );
}
