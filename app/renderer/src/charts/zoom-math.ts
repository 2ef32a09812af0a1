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
