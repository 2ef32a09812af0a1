/**
 * Which of the candidate pairs (pairs.ts) the fit compares. When isotherms are closely spaced in
 * temperature, each overlaps its neighbours almost completely, and ten neighbours on each side
 * supply far more partner points than an isotherm has itself. A partner's noise enters an offset
 * through the interpolant the isotherm is compared with: with partners that together offer R times
 * the isotherm's own points on one side, that share is about 1/R of its own noise, so further
 * partners add little information but all of the work (the refinement, its standard errors and
 * the checks walk every pair).
 *
 * So each isotherm keeps, on each side in order of temperature, its nearest candidate partner and
 * then its candidates from the farthest inwards until their overlap adds up to
 * PARTNER_POINTS_RATIO times its own points; a pair is kept when either of its two isotherms keeps
 * it. Farthest first because the offsets between isotherms far apart are what the long-range
 * course of aT (and so Ea or the WLF constants) is read from: with the five nearest instead, the
 * standard error of Ea on the 500 × 100 set below grew from 0.013 to 0.023 kJ/mol, with the
 * farthest it stays 0.013. Only pairs within CLOSE_PAIR_K of each other are ever
 * left out. The overlap of a partner is the share of the isotherm's
 * points that lie inside the pair's common range of values, counted with the partner's points in
 * that range when fewer (the smaller of the two, over all drivers), so partial overlaps count
 * partly and sparse or widely spaced isotherms keep all their candidates. Partners beyond the
 * candidate window (the isolated isotherms' extended partners) are always kept, and when thinning
 * would split the overlap groups the candidates are kept unchanged.
 *
 * Measured on bench/vs-generator.ts's sets (2 % noise; every candidate → this selection): the
 * largest error of log10 aT 0.0028 → 0.0028 at 500 × 100 (2505 of 4945 pairs), 0.0007 → 0.0008
 * at 200 × 2000 (1005 of 1945), 0.0011 → 0.0012 at 100 × 500 (505 of 945); standard errors within
 * 1 %, Ea and its standard error unchanged to 0.005 kJ/mol. With only the three nearest
 * neighbours the error rose to 0.008 at 500 × 100: raw, unbinned curves interpolate between noisy
 * neighbours, and short pairs alone let that noise add up along the temperatures.
 */
import { NEIGHBOUR_POSITIONS, overlapGroups } from './pairs';
import { temperatureOrder } from './layout';
import type { FitProblem } from './problem';
import { countInRange } from './series';

/** Overlap, in multiples of an isotherm's own points, its partners on one side must offer. */
export const PARTNER_POINTS_RATIO = 4.5;

/** Share of curve i's points that pair (i, j) compares (see above); 0 when nothing is shared. */
function overlapShare(p: FitProblem, i: number, j: number): number {
  let share = Infinity;
  for (let d = 0; d < p.alpha.length; d++) {
    const a = p.curves[i][d].ySorted;
    const b = p.curves[j][d].ySorted;
    if (a.length < 2 || b.length < 2) continue;
    const lo = Math.max(a[0], b[0]);
    const hi = Math.min(a[a.length - 1], b[b.length - 1]);
    const inside = Math.min(countInRange(a, lo, hi), countInRange(b, lo, hi));
    share = Math.min(share, inside / a.length);
  }
  return Number.isFinite(share) ? share : 0;
}

/**
 * Pairs at most this far apart in temperature can be left out (K). Ordinary sweeps step 5–10 K
 * (common practice) and keep every candidate; a superposition failure shows in the mismatch of
 * isotherms farther apart, which are never left out, so the checks keep their power.
 */
export const CLOSE_PAIR_K = 5;

/**
 * The candidate pairs the fit compares (see above). `temperaturesK[c]` is curve c's temperature.
 */
export function informativePairs(
  p: FitProblem,
  pairs: Int32Array,
  temperaturesK: ArrayLike<number>,
): Int32Array {
  const n = p.curves.length;
  const count = pairs.length / 2;
  if (count === 0) return pairs;
  const order = temperatureOrder(p);
  const rank = new Int32Array(n);
  order.forEach((c, r) => (rank[c] = r));
  // Per curve and side, its candidate pairs by distance in rank: slot (c·2 + side)·W + distance − 1.
  const W = NEIGHBOUR_POSITIONS;
  const slot = new Int32Array(n * 2 * W).fill(-1);
  const keep = new Uint8Array(count);
  for (let q = 0; q < count; q++) {
    const i = pairs[2 * q];
    const j = pairs[2 * q + 1];
    const dist = Math.abs(rank[i] - rank[j]);
    if (dist > W || dist === 0) {
      keep[q] = 1;
      continue;
    }
    if (Math.abs(temperaturesK[i] - temperaturesK[j]) > CLOSE_PAIR_K) keep[q] = 1;
    const lowFirst = rank[i] < rank[j];
    // Side 1: the partner is warmer (higher rank); side 0: colder.
    slot[(i * 2 + (lowFirst ? 1 : 0)) * W + dist - 1] = q;
    slot[(j * 2 + (lowFirst ? 0 : 1)) * W + dist - 1] = q;
  }
  const share = (c: number, q: number): number =>
    overlapShare(p, c, pairs[2 * q] === c ? pairs[2 * q + 1] : pairs[2 * q]);
  for (let c = 0; c < n; c++)
    for (let side = 0; side < 2; side++) {
      const at = (c * 2 + side) * W;
      // Pairs farther apart than CLOSE_PAIR_K are kept anyway: they count first.
      let offered = 0;
      let nearest = -1;
      for (let k = 0; k < W; k++) {
        const q = slot[at + k];
        if (q < 0) continue;
        if (nearest < 0) nearest = k;
        if (keep[q]) offered += share(c, q);
      }
      if (nearest < 0) continue;
      const q0 = slot[at + nearest];
      if (!keep[q0]) {
        keep[q0] = 1;
        offered += share(c, q0);
      }
      // The nearest partner (the most overlap, the start's chain), then the farthest first: the
      // offsets between isotherms far apart are what the long-range course of aT (and so Ea or
      // the WLF constants) is read from, and a pair d positions apart constrains it d² times as
      // much as a pair of neighbours does.
      for (let k = W - 1; k > nearest && offered < PARTNER_POINTS_RATIO; k--) {
        const q = slot[at + k];
        if (q >= 0 && !keep[q]) {
          keep[q] = 1;
          offered += share(c, q);
        }
      }
    }
  let kept = 0;
  for (let q = 0; q < count; q++) kept += keep[q];
  if (kept === count) return pairs;
  const out = new Int32Array(2 * kept);
  let at = 0;
  for (let q = 0; q < count; q++)
    if (keep[q]) {
      out[at++] = pairs[2 * q];
      out[at++] = pairs[2 * q + 1];
    }
  return sameGroups(overlapGroups(n, pairs), overlapGroups(n, out)) ? out : pairs;
}

/** Whether two group labellings (union–find roots) split the curves alike. */
function sameGroups(a: Int32Array, b: Int32Array): boolean {
  const map = new Map<number, number>();
  const back = new Map<number, number>();
  for (let c = 0; c < a.length; c++) {
    const x = map.get(a[c]);
    const y = back.get(b[c]);
    if (x === undefined && y === undefined) {
      map.set(a[c], b[c]);
      back.set(b[c], a[c]);
    } else if (x !== b[c] || y !== a[c]) return false;
  }
  return true;
}
