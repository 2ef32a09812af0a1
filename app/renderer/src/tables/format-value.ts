/**
 * Numbers for reading on screen: significant digits without exponent notation between 10⁻³ and
 * 10⁶ (273300, not 2.733e+5), and core/report's ×10ⁿ form outside that range.
 */
import { formatNumber } from '../../../../core/report/format';

export function formatValue(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return formatNumber(value);
  const abs = Math.abs(value);
  if (abs >= 1e-3 && abs < 1e6) return String(Number(value.toPrecision(digits)));
  return formatNumber(value, digits);
}
