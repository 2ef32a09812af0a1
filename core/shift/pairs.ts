/**
 * Candidate pairs: two isotherms can inform each other's shift only if, for every driving
 * quantity both carry, their value ranges overlap with at least `minOverlapPoints` values of the
 * two curves inside the common band. A horizontal shift cannot make curves with disjoint value
 * ranges meet, so such a pair carries no information (docs/conventions.md §2).
 *
 * Only isotherms at most NEIGHBOUR_POSITIONS apart in order of temperature are paired (all pairs
 * up to eleven isotherms): isotherms far apart in temperature overlap little or not at all, and
 * comparing every pair would make the work grow as the square of their number. An isotherm that
 * overlaps none of those neighbours is paired with the nearest one further out that it overlaps,
 * on each side, up to EXTENDED_POSITIONS away (so a set in which nothing overlaps is recognised in
 * time proportional to its size).
 */
import { temperatureOrder } from './layout';
import type { FitProblem } from './problem';
import { countInRange } from './series';

export const NEIGHBOUR_POSITIONS = 10;
export const EXTENDED_POSITIONS = 50;

function canOverlap(p: FitProblem, i: number, j: number): boolean {
  let shared = 0;
  for (let d = 0; d < p.alpha.length; d++) {
    const a = p.curves[i][d].ySorted;
    const b = p.curves[j][d].ySorted;
    if (a.length < 2 || b.length < 2) continue;
    shared++;
    const lo = Math.max(a[0], b[0]);
    const hi = Math.min(a[a.length - 1], b[b.length - 1]);
    if (hi < lo || countInRange(a, lo, hi) + countInRange(b, lo, hi) < p.minOverlapPoints)
      return false;
  }
  return shared > 0;
}

export function candidatePairs(p: FitProblem, positions = NEIGHBOUR_POSITIONS): Int32Array {
  const n = p.curves.length;
  const order = temperatureOrder(p);
  // Pairs as keys min·n + max in a growing typed array, sorted (and made unique) at the end.
  let keys = new Float64Array(Math.max(16, n * Math.min(positions, n)));
  let count = 0;
  const partnered = new Uint8Array(n);
  const add = (a: number, b: number) => {
    if (count === keys.length) {
      const grown = new Float64Array(2 * keys.length);
      grown.set(keys);
      keys = grown;
    }
    keys[count++] = Math.min(a, b) * n + Math.max(a, b);
    partnered[a] = 1;
    partnered[b] = 1;
  };
  for (let r = 0; r < n; r++)
    for (let t = r + 1; t <= Math.min(n - 1, r + positions); t++)
      if (canOverlap(p, order[r], order[t])) add(order[r], order[t]);
  for (let r = 0; r < n; r++) {
    const i = order[r];
    if (partnered[i]) continue;
    for (let t = r + positions + 1; t < Math.min(n, r + EXTENDED_POSITIONS + 1); t++)
      if (canOverlap(p, i, order[t])) {
        add(i, order[t]);
        break;
      }
    for (let t = r - positions - 1; t >= Math.max(0, r - EXTENDED_POSITIONS); t--)
      if (canOverlap(p, i, order[t])) {
        add(i, order[t]);
        break;
      }
  }
  const sorted = keys.subarray(0, count).sort();
  const out: number[] = [];
  for (let q = 0; q < count; q++) {
    if (q > 0 && sorted[q] === sorted[q - 1]) continue;
    out.push(Math.floor(sorted[q] / n), sorted[q] % n);
  }
  return Int32Array.from(out);
}

/** Connected groups of curves over the candidate pairs (union–find), as a group label per curve. */
export function overlapGroups(n: number, pairs: Int32Array): Int32Array {
  const parent = Int32Array.from({ length: n }, (_, i) => i);
  const find = (x: number): number => {
    while (parent[x] !== x) {
      parent[x] = parent[parent[x]];
      x = parent[x];
    }
    return x;
  };
  for (let q = 0; q < pairs.length; q += 2) {
    const a = find(pairs[q]);
    const b = find(pairs[q + 1]);
    if (a !== b) parent[a] = b;
  }
  return Int32Array.from({ length: n }, (_, i) => find(i));
}
