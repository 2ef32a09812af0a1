/** Index of the largest (sign = 1) or smallest (sign = −1) finite value, −1 if none. */
export function extremeIndex(values: ArrayLike<number>, sign: 1 | -1): number {
  let best = -1;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (Number.isFinite(v) && (best < 0 || sign * v > sign * values[best])) best = i;
  }
  return best;
}

/**
 * Vertex of the parabola through three neighbouring points (x, y) around index i, clamped to the
 * outer two x; the x of point i itself when the points are not curved. Used to refine a peak or
 * a minimum found on a grid.
 */
export function parabolicVertex(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  i: number,
): { x: number; y: number } {
  if (i <= 0 || i >= x.length - 1) return { x: x[i], y: y[i] };
  const [x0, x1, x2] = [x[i - 1], x[i], x[i + 1]];
  const [y0, y1, y2] = [y[i - 1], y[i], y[i + 1]];
  const d = (x0 - x1) * (x0 - x2) * (x1 - x2);
  const a = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / d;
  const b = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / d;
  if (!(Math.abs(a) > 0)) return { x: x1, y: y1 };
  const xv = Math.min(Math.max(-b / (2 * a), x0), x2);
  const c = y1 - a * x1 * x1 - b * x1;
  return { x: xv, y: a * xv * xv + b * xv + c };
}
