/**
 * Build a FitSeries from raw (x, y) values: drop non-finite entries, sort, merge duplicate
 * abscissae and, for curves denser than `maxPerDecade`, average into bins of 1/maxPerDecade decade.
 * Averaging in log space keeps each bin an unbiased estimate under multiplicative noise; each bin is
 * weighted by its point count so the fit still counts every measured point once.
 */
import type { FitSeries } from './problem';
import {
  centredQuadraticSums,
  quadraticSums,
  S0,
  S1,
  S2,
  S3,
  S4,
  T0,
  T1,
  T2,
} from './local-quadratic';

export function buildSeries(
  lx: ArrayLike<number>,
  y: ArrayLike<number>,
  pointIndex: ArrayLike<number>,
  maxPerDecade: number,
): FitSeries {
  const n = lx.length;
  let order: Int32Array = new Int32Array(n);
  let count = 0;
  let sorted = true;
  for (let i = 0; i < n; i++)
    if (Number.isFinite(lx[i]) && Number.isFinite(y[i])) {
      if (count > 0 && lx[i] < lx[order[count - 1]]) sorted = false;
      order[count++] = i;
    }
  order = order.subarray(0, count);
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < count; i++) {
    const v = lx[order[i]];
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  const span = count > 1 ? hi - lo : 0;
  // Bin only when the curve as a whole is denser than allowed; otherwise merge exact duplicates.
  const binWidth =
    maxPerDecade > 0 && span > 0 && count / span > maxPerDecade ? 1 / maxPerDecade : 0;
  const x0 = count > 0 ? lo : 0;
  // Unsorted dense curves (e.g. noisy |G*| as abscissa) are grouped by bin in linear time; only the
  // bins matter, not the order inside them. Others are sorted by abscissa.
  if (!sorted)
    order =
      binWidth > 0
        ? byBin(order, lx, x0, binWidth)
        : Int32Array.from(order).sort((a, b) => lx[a] - lx[b]);
  const outX: number[] = [];
  const outY: number[] = [];
  const outW: number[] = [];
  const starts: number[] = [];
  const idx = new Int32Array(count);
  let k = 0;
  while (k < count) {
    const k0 = binWidth > 0 ? Math.floor((lx[order[k]] - x0) / binWidth) : lx[order[k]];
    let m = k;
    let sx = 0;
    let sy = 0;
    while (m < count) {
      const v = lx[order[m]];
      const key = binWidth > 0 ? Math.floor((v - x0) / binWidth) : v;
      if (key !== k0) break;
      sx += v;
      sy += y[order[m]];
      idx[m] = pointIndex[order[m]];
      m++;
    }
    const cnt = m - k;
    starts.push(k);
    outX.push(sx / cnt);
    outY.push(sy / cnt);
    outW.push(cnt);
    k = m;
  }
  starts.push(count);
  const yArr = Float64Array.from(outY);
  const xArr = Float64Array.from(outX);
  const segSlope = new Float64Array(Math.max(0, xArr.length - 1));
  const invH = new Float64Array(segSlope.length);
  for (let k = 0; k < segSlope.length; k++) {
    invH[k] = 1 / (xArr[k + 1] - xArr[k]);
    segSlope[k] = (yArr[k + 1] - yArr[k]) * invH[k];
  }
  return {
    invW: Float64Array.from(outW, (w) => 1 / w),
    segSlope,
    invH,
    lx: xArr,
    y: yArr,
    w: Float64Array.from(outW),
    pointIndex: idx,
    binStart: Int32Array.from(starts),
    ySorted: Float64Array.from(yArr).sort(),
    slope: localSlopes(xArr, yArr),
  };
}

/** Indices grouped by bin ⌊(lx − x0)/width⌋ in ascending bin order (counting sort, stable). */
function byBin(order: Int32Array, lx: ArrayLike<number>, x0: number, width: number): Int32Array {
  const n = order.length;
  const key = new Int32Array(n);
  let bins = 0;
  for (let i = 0; i < n; i++) {
    key[i] = Math.floor((lx[order[i]] - x0) / width);
    if (key[i] + 1 > bins) bins = key[i] + 1;
  }
  const start = new Int32Array(bins + 1);
  for (let i = 0; i < n; i++) start[key[i] + 1]++;
  for (let b = 0; b < bins; b++) start[b + 1] += start[b];
  const out = new Int32Array(n);
  for (let i = 0; i < n; i++) out[start[key[i]]++] = order[i];
  return out;
}

/**
 * Slope at each entry from a least-squares quadratic through the 5 nearest entries (3 or the
 * segment slope for short curves): the derivative of a local polynomial smoother
 * (Savitzky & Golay, Anal. Chem. 36, 1964, generalised to uneven spacing).
 */
export function localSlopes(lx: Float64Array, y: Float64Array): Float64Array {
  const n = lx.length;
  const out = new Float64Array(n);
  if (n < 2) return out;
  if (n < 5) {
    for (let i = 0; i < n; i++) {
      const a = Math.max(0, i - 1);
      const b = Math.min(n - 1, i + 1);
      out[i] = (y[b] - y[a]) / (lx[b] - lx[a]);
    }
    return out;
  }
  const m = quadraticSums();
  for (let c = 0; c < n; c++) {
    const lo = Math.max(0, Math.min(n - 5, c - 2));
    const det = centredQuadraticSums(lx, y, lo, lo + 4, c, m);
    // Coefficient b1 of the quadratic b0 + b1 x + b2 x² (Cramer's rule), the slope at x = 0.
    const d1 =
      m[S0] * (m[T1] * m[S4] - m[S3] * m[T2]) -
      m[T0] * (m[S1] * m[S4] - m[S3] * m[S2]) +
      m[S2] * (m[S1] * m[T2] - m[T1] * m[S2]);
    out[c] = det !== 0 ? d1 / det : 0;
  }
  return out;
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
