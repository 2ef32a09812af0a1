/**
 * Smallest and largest finite value of an array, by one loop: `Math.min(...values)` passes every
 * element as a function argument and overflows the call stack at a few 10⁵ elements (docs/conventions.md §7),
 * so the codebase uses these instead (an ESLint rule forbids spreading into Math.min/max).
 * NaN and ±Infinity are skipped; an array with no finite value gives [Infinity, −Infinity], as
 * Math.min() and Math.max() of nothing do.
 */
export function extent(values: ArrayLike<number>): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

/** Largest finite value (−Infinity when none). */
export function maxOf(values: ArrayLike<number>): number {
  return extent(values)[1];
}

/** Smallest finite value (Infinity when none). */
export function minOf(values: ArrayLike<number>): number {
  return extent(values)[0];
}
