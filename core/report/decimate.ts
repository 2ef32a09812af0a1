/**
 * What a plot draws of a very large point set: one point per cell of a fine grid over the data's
 * range (log or linear per axis), the first one met in each cell. Markers a few pixels wide that
 * fall in one cell overlap anyway, so the picture keeps its shape, spread and outliers while
 * 10⁶ points become at most columns × rows. Used by the app's plot specs; the report's SVG
 * thins markers by pixel (render-chart.ts).
 */
import { extent } from '../data/extent';

export interface DecimateOptions {
  xKind: 'log' | 'linear';
  yKind: 'log' | 'linear';
  /** Grid cells across and up. @default 800 × 500 */
  columns?: number;
  rows?: number;
  /** Range of the grid; by default the points' own range. */
  xDomain?: [number, number];
  yDomain?: [number, number];
}

const coord = (kind: 'log' | 'linear', v: number): number => (kind === 'log' ? Math.log10(v) : v);

/** The grid's range over (transformed) values, or null when empty. */
function range(
  kind: 'log' | 'linear',
  values: ArrayLike<number>,
  given?: [number, number],
): [number, number] | null {
  const [lo, hi] = given ?? extent(kind === 'log' ? positive(values) : values);
  if (!(hi >= lo)) return null;
  const a = coord(kind, lo);
  const b = coord(kind, hi);
  return b > a ? [a, b] : [a - 0.5, a + 0.5];
}

function positive(values: ArrayLike<number>): Float64Array {
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = values[i] > 0 ? values[i] : NaN;
  return out;
}

/** Indices of the points to draw, in their original order. */
export function decimatedIndices(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  o: DecimateOptions,
): number[] {
  const columns = o.columns ?? 800;
  const rows = o.rows ?? 500;
  const rx = range(o.xKind, x, o.xDomain);
  const ry = range(o.yKind, y, o.yDomain);
  if (!rx || !ry) return [];
  const seen = new Set<number>();
  const keep: number[] = [];
  const sx = columns / (rx[1] - rx[0]);
  const sy = rows / (ry[1] - ry[0]);
  for (let i = 0; i < x.length; i++) {
    const cx = Math.floor((coord(o.xKind, x[i]) - rx[0]) * sx);
    const cy = Math.floor((coord(o.yKind, y[i]) - ry[0]) * sy);
    if (!Number.isFinite(cx) || !Number.isFinite(cy)) continue;
    const key = Math.min(columns, Math.max(0, cx)) * (rows + 1) + Math.min(rows, Math.max(0, cy));
    if (seen.has(key)) continue;
    seen.add(key);
    keep.push(i);
  }
  return keep;
}
