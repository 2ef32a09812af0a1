/**
 * Log-binning of a master curve before the Prony and viscosity fits (docs/conventions.md §7): dense curves
 * (10⁵–10⁶ points) become one point per 1/binsPerDecade of log x, so the fits cost the same at
 * any size. Each bin gives, per quantity, the mean of log10 y at the mean of log10 x (the value
 * of the bin's own straight-line fit there, so the curve's slope across the bin does not bias it)
 * and the standard error of that mean: the scatter about the bin's line, pooled with the other
 * bins' scatter when the bin has few points, divided by √n. Fitting bin means with weights
 * 1/se² gives, to second order, the same answer as fitting every point with equal weights, and a
 * bin whose points disagree (noise, isotherms that do not superpose) counts for less.
 */

export interface BinnedQuantity {
  /** Mean log10 y of the bin's points (NaN where the bin holds none of this quantity). */
  log10y: Float64Array;
  /** Standard error of that mean, decades (NaN where empty). */
  stdErr: Float64Array;
  /** Points of this quantity in the bin. */
  count: Int32Array;
}

export interface LogBins {
  /** Mean log10 x of the points in each bin, ascending. */
  log10x: Float64Array;
  /** Bin index floor(log10 x · binsPerDecade): neighbours differ by 1. */
  index: Int32Array;
  /** Points in each bin (any quantity). */
  count: Int32Array;
  quantities: BinnedQuantity[];
  /** Pooled scatter of one point about its bin's line, decades, per quantity (NaN when unknown). */
  pointScatter: number[];
  binsPerDecade: number;
}

/** Smallest scatter of one point assumed, decades: keeps weights finite on noise-free data. */
export const SCATTER_FLOOR = 1e-5;

/** Per-bin sums of one quantity (n, Σlx, Σlx², Σly, Σly², Σlx·ly). */
const SUMS = 6;

/**
 * Bins points (x > 0 and every y > 0 finite, else that value is skipped) by log10 x.
 * `ys` are parallel arrays of the quantities (e.g. G′ and G″), each the length of `x`.
 */
export function logBins(
  x: ArrayLike<number>,
  ys: readonly ArrayLike<number>[],
  binsPerDecade: number,
): LogBins {
  if (!(binsPerDecade > 0)) throw new RangeError('binsPerDecade must be a positive number');
  for (const y of ys)
    if (y.length !== x.length) throw new RangeError('every quantity must match x in length');
  const q = ys.length;
  // bin index → slot; slots grow as bins appear (no array over the whole index range)
  const slotOf = new Map<number, number>();
  let sums = new Float64Array(64 * (1 + q * SUMS));
  const stride = 1 + q * SUMS;
  let slots = 0;
  const idx: number[] = [];
  // a sorted curve stays in one bin for many points: look the slot up only when the bin changes
  let lastB = NaN;
  let lastS = -1;
  for (let i = 0; i < x.length; i++) {
    const xi = x[i];
    if (!(xi > 0) || !Number.isFinite(xi)) continue;
    const lx = Math.log10(xi);
    const b = Math.floor(lx * binsPerDecade);
    let s = b === lastB ? lastS : slotOf.get(b);
    if (s === undefined) {
      s = slots++;
      slotOf.set(b, s);
      idx.push(b);
      if (slots * stride > sums.length) {
        const bigger = new Float64Array(sums.length * 2);
        bigger.set(sums);
        sums = bigger;
      }
    }
    lastB = b;
    lastS = s;
    const base = s * stride;
    let any = false;
    for (let k = 0; k < q; k++) {
      const y = ys[k][i];
      if (!(y > 0) || !Number.isFinite(y)) continue;
      any = true;
      const ly = Math.log10(y);
      const o = base + 1 + k * SUMS;
      sums[o] += 1;
      sums[o + 1] += lx;
      sums[o + 2] += lx * lx;
      sums[o + 3] += ly;
      sums[o + 4] += ly * ly;
      sums[o + 5] += lx * ly;
    }
    if (any) sums[base] += 1;
  }
  const order = idx
    .map((b, s) => ({ b, s }))
    .filter(({ s }) => sums[s * stride] > 0)
    .sort((u, v) => u.b - v.b);
  const m = order.length;
  const log10x = new Float64Array(m);
  const count = new Int32Array(m);
  const index = new Int32Array(m);
  const quantities: BinnedQuantity[] = [];
  const pointScatter: number[] = [];
  // mean log10 x of a bin over the points of any quantity
  order.forEach(({ b, s }, j) => {
    index[j] = b;
    count[j] = sums[s * stride];
    let n = 0;
    let sx = 0;
    for (let k = 0; k < q; k++) {
      const o = s * stride + 1 + k * SUMS;
      n += sums[o];
      sx += sums[o + 1];
    }
    log10x[j] = sx / n;
  });
  for (let k = 0; k < q; k++) {
    const log10y = new Float64Array(m).fill(NaN);
    const stdErr = new Float64Array(m).fill(NaN);
    const cnt = new Int32Array(m);
    const residualSs = new Float64Array(m);
    const dof = new Float64Array(m);
    let pooledSs = 0;
    let pooledDof = 0;
    order.forEach(({ s }, j) => {
      const o = s * stride + 1 + k * SUMS;
      const n = sums[o];
      cnt[j] = n;
      if (n === 0) return;
      const mx = sums[o + 1] / n;
      const my = sums[o + 3] / n;
      const sxx = sums[o + 2] - n * mx * mx;
      const syy = sums[o + 4] - n * my * my;
      const sxy = sums[o + 5] - n * mx * my;
      // the bin's own line through (mean lx, mean ly); its value at log10x[j]
      const slope = sxx > 1e-24 * Math.max(1, n) ? sxy / sxx : 0;
      log10y[j] = my + slope * (log10x[j] - mx);
      const ss = Math.max(0, syy - (sxx > 1e-24 * Math.max(1, n) ? (sxy * sxy) / sxx : 0));
      const d = n - (sxx > 1e-24 * Math.max(1, n) ? 2 : 1);
      residualSs[j] = ss;
      dof[j] = Math.max(0, d);
      if (d > 0) {
        pooledSs += ss;
        pooledDof += d;
      }
    });
    // with no bin of 3 or more points, the scatter comes from the second differences of
    // neighbouring bin means (about √6 times one point's noise on a smooth curve)
    const raw = pooledDof > 0 ? pooledSs / pooledDof : secondDifferenceVariance(index, log10y);
    // floor: noise-free data would otherwise give infinite weights (1e-5 decades ≈ 0.002 %)
    const pooled = Number.isFinite(raw) ? Math.max(raw, SCATTER_FLOOR ** 2) : NaN;
    pointScatter.push(Math.sqrt(pooled));
    // shrink each bin's variance towards the pooled one with the weight of 2 points
    for (let j = 0; j < m; j++) {
      if (cnt[j] === 0) continue;
      const v = Number.isFinite(pooled)
        ? Math.max((residualSs[j] + 2 * pooled) / (dof[j] + 2), SCATTER_FLOOR ** 2)
        : 1; // no scatter known anywhere: equal weight per point
      stdErr[j] = Math.sqrt(v / cnt[j]);
    }
    quantities.push({ log10y, stdErr, count: cnt });
  }
  return { log10x, index, count, quantities, pointScatter, binsPerDecade };
}

/**
 * Variance of one bin mean from the second differences of neighbouring bins (consecutive
 * indices only): Var(y₁ − 2y₂ + y₃) = 6σ² for independent noise, estimated robustly as
 * (median |Δ²| / 0.6745)² / 6. NaN with fewer than three consecutive bins.
 */
function secondDifferenceVariance(index: Int32Array, y: Float64Array): number {
  const d: number[] = [];
  for (let j = 2; j < y.length; j++) {
    if (index[j] - index[j - 2] !== 2) continue;
    const v = y[j] - 2 * y[j - 1] + y[j - 2];
    if (Number.isFinite(v)) d.push(Math.abs(v));
  }
  if (d.length === 0) return NaN;
  d.sort((a, b) => a - b);
  const med = d[Math.floor(d.length / 2)];
  return (med / 0.6745) ** 2 / 6;
}

/**
 * The bins of the densest stretch of the curve: runs of occupied bins with gaps of at most
 * `maxGapDecades`, and of those the run holding most points. A point far from the rest (a typo,
 * an absurd cell at 1e-300 rad/s) then neither stretches the Prony grid nor enters the fits.
 * Returns [first, last] bin positions (inclusive) and the points left outside.
 */
export function densestRun(
  bins: LogBins,
  maxGapDecades = 1,
): { first: number; last: number; outside: number } {
  const m = bins.index.length;
  if (m === 0) return { first: 0, last: -1, outside: 0 };
  const gap = maxGapDecades * bins.binsPerDecade;
  let best = { first: 0, last: 0, points: -1 };
  let start = 0;
  let points = 0;
  let total = 0;
  for (let j = 0; j < m; j++) {
    total += bins.count[j];
    if (j > start && bins.index[j] - bins.index[j - 1] > gap) {
      if (points > best.points) best = { first: start, last: j - 1, points };
      start = j;
      points = 0;
    }
    points += bins.count[j];
  }
  if (points > best.points) best = { first: start, last: m - 1, points };
  return { first: best.first, last: best.last, outside: total - best.points };
}
