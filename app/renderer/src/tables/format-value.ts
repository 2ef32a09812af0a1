/**
 * Numbers for reading on screen: the app's one format (format/numbers.ts) — significant digits
 * without exponent notation between 10⁻³ and 10⁶ (273300, not 2.733e+5), ×10ⁿ outside.
 */
import { formatSig } from '../format/numbers';

export function formatValue(value: number | null | undefined, digits = 4): string {
  return formatSig(value, digits);
}
