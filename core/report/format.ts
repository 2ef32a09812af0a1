/**
 * Number formatting for tables and axis labels. Significant digits, not fixed decimals, because
 * moduli span decades; `–` for a value that could not be determined.
 */
export const MISSING = '–';

/** `digits` significant digits; exponent notation below 1e-3 or from 1e6 on. */
export function formatNumber(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  if (value === 0) return '0';
  const abs = Math.abs(value);
  if (abs < 1e-3 || abs >= 1e6) {
    const [m, e] = value.toExponential(digits - 1).split('e');
    return `${trimZeros(m)}×10${superscript(Number(e))}`;
  }
  return trimZeros(value.toPrecision(digits));
}

/** Fixed decimals (for log10 quantities in decades and temperatures). */
export function formatFixed(value: number | null | undefined, decimals: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const s = value.toFixed(decimals);
  return s === `-${(0).toFixed(decimals)}` ? (0).toFixed(decimals) : s;
}

function trimZeros(s: string): string {
  return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}

const SUP: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

/** An integer as Unicode superscript digits (for 10ⁿ labels that survive copy and print). */
export function superscript(n: number): string {
  return String(Math.round(n))
    .split('')
    .map((c) => SUP[c] ?? c)
    .join('');
}
