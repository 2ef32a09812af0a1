/**
 * Plots of very large data sets draw a thinned copy (core/report/decimate.ts): above DRAW_LIMIT
 * marker points in a plot, each marker series keeps one point per cell of a 500 × 300 grid over
 * the whole plot's range, so 10⁶ points draw as a few ten thousand with the same look. Point
 * objects are made for the kept points only. Lines (model curves) are never thinned; the plot's
 * title says how many points are shown.
 */
import { decimatedIndices } from '@core/report';

/** Marker points a plot draws in full; above this it draws a thinned copy. */
export const DRAW_LIMIT = 20000;

type Kind = 'log' | 'linear';

export interface Thinner {
  /** Indices of one series' points to draw (drawable ones only), in order. */
  keep(x: ArrayLike<number>, y: ArrayLike<number>): number[];
  /** " — showing 21 940 of 2 000 012 points" after thinning, else "". */
  note(): string;
}

const drawable = (kind: Kind, v: number): boolean =>
  Number.isFinite(v) && (kind === 'linear' || v > 0);

/**
 * A thinner for the marker series of one plot, given all of them up front (x and y arrays) so
 * the grid covers the whole plot and overlapping series thin alike.
 */
export function plotThinner(
  series: readonly { x: ArrayLike<number>; y: ArrayLike<number> }[],
  xKind: Kind,
  yKind: Kind,
): Thinner {
  let total = 0;
  for (const s of series)
    for (let i = 0; i < s.x.length; i++)
      if (drawable(xKind, s.x[i]) && drawable(yKind, s.y[i])) total++;
  const thin = total > DRAW_LIMIT;
  const xDomain = rawRange(series, xKind, 'x');
  const yDomain = rawRange(series, yKind, 'y');
  let shown = 0;
  return {
    keep(x, y) {
      let idx: number[];
      if (thin)
        idx = decimatedIndices(x, y, { xKind, yKind, xDomain, yDomain, columns: 500, rows: 300 });
      else {
        idx = [];
        for (let i = 0; i < x.length; i++)
          if (drawable(xKind, x[i]) && drawable(yKind, y[i])) idx.push(i);
      }
      shown += idx.length;
      return idx;
    },
    note() {
      if (!thin) return '';
      const n = (v: number): string => v.toLocaleString('en-GB').replace(/,/g, ' ');
      return ` — showing ${n(shown)} of ${n(total)} points`;
    },
  };
}

/** Smallest and largest drawable value of one coordinate over all series. */
function rawRange(
  series: readonly { x: ArrayLike<number>; y: ArrayLike<number> }[],
  kind: Kind,
  key: 'x' | 'y',
): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series) {
    const v = s[key];
    for (let i = 0; i < v.length; i++)
      if (drawable(kind, v[i])) {
        if (v[i] < lo) lo = v[i];
        if (v[i] > hi) hi = v[i];
      }
  }
  return [lo, hi];
}
