/**
 * The order of `xs` ascending, ties kept in index order (a stable sort of 0…n−1 by xs[i]), as
 * `order.sort((a, b) => xs[a] - xs[b] || a - b)` gives it, in O(n log r) for r monotone runs.
 * A master curve is the concatenation of isotherms, each a sweep already in order (ascending or
 * descending), so it has about as many runs as isotherms: finding the runs and merging them
 * pairwise costs a fraction of a general comparison sort at 10⁵–10⁶ points. Strictly descending
 * runs are reversed (no ties inside them, so reversing keeps the order stable); the merge takes
 * the left run on ties, and every run holds a contiguous index range below the next one's. With
 * any NaN the comparison is no order at all: the general sort is used, as before.
 */
export function stableOrder(xs: ArrayLike<number>): Uint32Array {
  const n = xs.length;
  let order = new Uint32Array(n);
  for (let i = 0; i < n; i++) {
    if (xs[i] !== xs[i]) {
      for (let j = 0; j < n; j++) order[j] = j;
      return order.sort((a, b) => xs[a] - xs[b] || a - b);
    }
  }
  if (n < 2) {
    if (n === 1) order[0] = 0;
    return order;
  }
  // runs: [start of run r, start of run r + 1, …, n]
  const starts: number[] = [];
  let i = 0;
  while (i < n) {
    starts.push(i);
    let j = i + 1;
    if (j < n && xs[j] < xs[i]) {
      while (j < n && xs[j] < xs[j - 1]) j++;
      for (let k = i; k < j; k++) order[k] = i + j - 1 - k;
    } else {
      while (j < n && xs[j] >= xs[j - 1]) j++;
      for (let k = i; k < j; k++) order[k] = k;
    }
    i = j;
  }
  starts.push(n);
  let other = new Uint32Array(n);
  let bounds = starts;
  while (bounds.length > 2) {
    const next: number[] = [];
    for (let r = 0; r + 1 < bounds.length; r += 2) {
      const lo = bounds[r];
      const mid = bounds[r + 1];
      const hi = r + 2 < bounds.length ? bounds[r + 2] : mid;
      next.push(lo);
      let a = lo;
      let b = mid;
      let k = lo;
      while (a < mid && b < hi) {
        const ia = order[a];
        const ib = order[b];
        if (xs[ib] < xs[ia]) {
          other[k++] = ib;
          b++;
        } else {
          other[k++] = ia;
          a++;
        }
      }
      while (a < mid) other[k++] = order[a++];
      while (b < hi) other[k++] = order[b++];
    }
    next.push(n);
    const t = order;
    order = other;
    other = t;
    bounds = next;
  }
  return order;
}
