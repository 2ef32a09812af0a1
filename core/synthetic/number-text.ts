/**
 * Number formatting for the invented sample files, as instruments and spreadsheets write them.
 * Built on toFixed/toExponential, whose rounding ECMAScript specifies exactly, so the files are
 * the same on every machine.
 */

/** How a number is written: plain decimals (12345.6) or instrument exponent style (1.2346E+04). */
export type NumberStyle = 'plain' | 'exp';

/** `value` with `digits` significant digits; decimal comma when `decimalComma` is true. */
export function formatSignificant(
  value: number,
  digits: number,
  style: NumberStyle = 'plain',
  decimalComma = false,
): string {
  if (!Number.isInteger(digits) || digits < 1 || digits > 15) {
    throw new RangeError(`digits must be an integer from 1 to 15, got ${digits}`);
  }
  if (!Number.isFinite(value)) throw new RangeError(`value must be finite, got ${value}`);
  let text: string;
  if (style === 'exp') {
    const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
    const e = Number(exponent);
    text = `${mantissa}E${e < 0 ? '-' : '+'}${String(Math.abs(e)).padStart(2, '0')}`;
  } else {
    const magnitude = value === 0 ? 0 : Math.floor(Math.log10(Math.abs(value)));
    text = value.toFixed(Math.min(20, Math.max(0, digits - 1 - magnitude)));
  }
  return decimalComma ? text.replace('.', ',') : text;
}

/** A temperature in °C with two decimals (measured) or none (set point). */
export function formatCelsius(value: number, decimals: number, decimalComma = false): string {
  const text = value.toFixed(decimals);
  return decimalComma ? text.replace('.', ',') : text;
}
