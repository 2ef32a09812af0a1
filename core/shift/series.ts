/**
 * Build a FitSeries from raw (x, y) values: drop non-finite entries, sort, merge duplicate
 * abscissae and, for curves denser than `maxPerDecade`, average into bins of 1/maxPerDecade decade.
 * Averaging in log space keeps each bin an unbiased estimate under multiplicative noise; each bin is
 * weighted by its point count so the fit still counts every measured point once.
 */
import type { FitSeries } from './problem';

export function buildSeries(
  lx: ArrayLike<number>,
  y: ArrayLike<number>,
  pointIndex: ArrayLike<number>,
  maxPerDecade: number,
): FitSeries {
  const order: number[] = [];
  for (let i = 0; i < lx.length; i++)
    if (Number.isFinite(lx[i]) && Number.isFinite(y[i])) order.push(i);
  order.sort((a, b) => lx[a] - lx[b]);
  const span = order.length > 1 ? lx[order[order.length - 1]] - lx[order[0]] : 0;
  // Bin only when the curve as a whole is denser than allowed; otherwise merge exact duplicates.
  const binWidth =
    maxPerDecade > 0 && span > 0 && order.length / span > maxPerDecade ? 1 / maxPerDecade : 0;
  const x0 = order.length > 0 ? lx[order[0]] : 0;
  const key = (i: number): number => (binWidth > 0 ? Math.floor((lx[i] - x0) / binWidth) : lx[i]);
  const outX: number[] = [];
  const outY: number[] = [];
  const outW: number[] = [];
  const starts: number[] = [];
  const idx: number[] = [];
  let k = 0;
  while (k < order.length) {
    const k0 = key(order[k]);
    let m = k;
    let sx = 0;
    let sy = 0;
    while (m < order.length && key(order[m]) === k0) {
      sx += lx[order[m]];
      sy += y[order[m]];
      idx.push(pointIndex[order[m]]);
      m++;
    }
    const cnt = m - k;
    starts.push(idx.length - cnt);
    outX.push(sx / cnt);
    outY.push(sy / cnt);
    outW.push(cnt);
    k = m;
  }
  starts.push(idx.length);
  const yArr = Float64Array.from(outY);
  return {
    lx: Float64Array.from(outX),
    y: yArr,
    w: Float64Array.from(outW),
    pointIndex: Int32Array.from(idx),
    binStart: Int32Array.from(starts),
    ySorted: Float64Array.from(yArr).sort(),
  };
}

/** Number of entries of a sorted array within [lo, hi]. */
export function countInRange(sorted: Float64Array, lo: number, hi: number): number {
  if (hi < lo) return 0;
  return upperBound(sorted, hi) - lowerBound(sorted, lo);
}

export function lowerBound(a: Float64Array, v: number): number {
  let lo = 0;
  let hi = a.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (a[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

export function upperBound(a: Float64Array, v: number): number {
  let lo = 0;
  let hi = a.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (a[mid] <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
