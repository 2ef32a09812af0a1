/**
 * Zoom and pan of one axis. Log axes zoom and pan in log10 space, so a wheel step zooms by the
 * same number of decades wherever the cursor is.
 */
export type AxisKind = 'log' | 'linear';

const fwd = (k: AxisKind, v: number): number => (k === 'log' ? Math.log10(v) : v);
const back = (k: AxisKind, t: number): number => (k === 'log' ? 10 ** t : t);

/** Zooms [min, max] about `anchor` by `factor` (< 1 zooms in). */
export function zoomAxis(
  kind: AxisKind,
  min: number,
  max: number,
  anchor: number,
  factor: number,
): [number, number] {
  const a = fwd(kind, anchor);
  return [
    back(kind, a + (fwd(kind, min) - a) * factor),
    back(kind, a + (fwd(kind, max) - a) * factor),
  ];
}

/** Moves [min, max] so the data under pixel `fromPx` ends up under pixel `toPx`. */
export function panAxis(
  kind: AxisKind,
  min: number,
  max: number,
  fromPx: number,
  toPx: number,
  minPx: number,
  maxPx: number,
): [number, number] {
  const lo = fwd(kind, min);
  const hi = fwd(kind, max);
  const perPx = (hi - lo) / (maxPx - minPx);
  const d = -(toPx - fromPx) * perPx;
  return [back(kind, lo + d), back(kind, hi + d)];
}

/** Decades (log axis) or units (linear) between two values. */
export function axisDistance(kind: AxisKind, from: number, to: number): number {
  return fwd(kind, to) - fwd(kind, from);
}

/**
 * Decades (log axis) or units (linear) per pixel of an axis drawn from `min` to `max` over
 * `fromPx`…`toPx`: the conversion a drag uses, taken once when the pointer goes down so the
 * axis re-fitting during the drag cannot change it.
 */
export function unitsPerPixel(
  kind: AxisKind,
  min: number,
  max: number,
  fromPx: number,
  toPx: number,
): number {
  return (fwd(kind, max) - fwd(kind, min)) / (toPx - fromPx);
}

/**
 * A window around the data with a margin on each side, so markers at the extremes are drawn
 * whole instead of half-cut by the plot frame: 4 % of the span (log axes: of the decades), at
 * least 0.05 decades or, for a single value, ±10 %. null when there is nothing to show.
 */
export function paddedRange(kind: AxisKind, values: Iterable<number>): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (!Number.isFinite(v) || (kind === 'log' && !(v > 0))) continue;
    const t = fwd(kind, v);
    if (t < lo) lo = t;
    if (t > hi) hi = t;
  }
  if (!(hi >= lo)) return null;
  const span = hi - lo;
  const pad =
    kind === 'log' ? Math.max(0.04 * span, 0.05) : span > 0 ? 0.04 * span : Math.abs(lo) * 0.1 || 1;
  return [back(kind, lo - pad), back(kind, hi + pad)];
}
