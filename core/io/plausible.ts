/**
 * Limits beyond which a cell is not a measurement but an instrument's placeholder or a slip:
 * such cells are left out with a warning naming file, row and column (docs/import.md, "Values no
 * instrument measures"). The bounds are generous on purpose — they catch sentinels and overflow
 * values, never a real reading:
 *  - frequency ω and time t: 1e-12 … 1e12 (rad/s or s); rheometers and DMA cover roughly 1e-7 …
 *    1e5 rad/s and 1e-3 … 1e8 s (common practice), so twelve decades either side is never data;
 *  - moduli (G′, G″, |G*|, G(t)): > 0 and ≤ 1e13 Pa; the stiffest solids (diamond, about 1.2e12 Pa,
 *    from memory) stay below, glassy polymers are about 1e9 Pa (common practice);
 *  - any value of magnitude ≥ 1e30 in its stored unit: instrument sentinels such as 9.9e37 (the
 *    IEEE-488 / SCPI "not a number" placeholder, common practice) or ±9.99e99 (the largest number
 *    many instruments print).
 */
import type { QuantityId } from '../data/types';

export const X_MIN = 1e-12;
export const X_MAX = 1e12;
export const MODULUS_MAX_PA = 1e13;
export const SENTINEL_MAGNITUDE = 1e30;

const MODULI: ReadonlySet<QuantityId> = new Set([
  'storageModulus',
  'lossModulus',
  'complexModulus',
  'relaxationModulus',
]);

/** Why an abscissa value (ω in rad/s or t in s) is not a measurement, or undefined. */
export function implausibleX(x: number, unit: string): string | undefined {
  if (x >= X_MIN && x <= X_MAX) return undefined;
  return `is outside 1e-12…1e12 ${unit}, not a value an instrument measures`;
}

/** Why a stored quantity value is not a measurement (too large, sentinel), or undefined. */
export function implausibleValue(q: QuantityId, v: number): string | undefined {
  if (Math.abs(v) >= SENTINEL_MAGNITUDE)
    return 'an instrument placeholder (overflow or no reading)';
  if (MODULI.has(q) && v > MODULUS_MAX_PA) return 'above 1e13 Pa, stiffer than any solid';
  return undefined;
}
