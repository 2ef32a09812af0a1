/**
 * Candidate pairs: two isotherms can inform each other's shift only if, for every driving
 * quantity both carry, their value ranges overlap with at least `minOverlapPoints` values of the
 * two curves inside the common band. A horizontal shift cannot make curves with disjoint value
 * ranges meet, so such a pair carries no information (DOMAIN.md §2).
 */
import type { FitProblem } from './problem';
import { countInRange } from './series';

export function candidatePairs(p: FitProblem): Int32Array {
  const out: number[] = [];
  const n = p.curves.length;
  const nd = p.alpha.length;
  for (let i = 0; i < n; i++)
    for (let j = i + 1; j < n; j++) {
      let shared = 0;
      let ok = true;
      for (let d = 0; d < nd && ok; d++) {
        const a = p.curves[i][d].ySorted;
        const b = p.curves[j][d].ySorted;
        if (a.length < 2 || b.length < 2) continue;
        shared++;
        const lo = Math.max(a[0], b[0]);
        const hi = Math.min(a[a.length - 1], b[b.length - 1]);
        ok = countInRange(a, lo, hi) + countInRange(b, lo, hi) >= p.minOverlapPoints;
      }
      if (ok && shared > 0) out.push(i, j);
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
