/**
 * Starting values: grow a tree over the candidate pairs from the curves whose offsets are known
 * (locked ones, or else one anchor at 0), always taking the unplaced curve nearest in temperature
 * to a placed one, and scan that pair's offset. The joint fit then refines all offsets at once
 * against every overlapping pair, so errors do not accumulate along this chain.
 */
import { partnerLists } from './layout';
import type { FitProblem } from './problem';
import type { ScanSettings } from './scan';
import { scanPair } from './scan';

export interface StartOutcome {
  theta: Float64Array;
  /** 1 for curves reached from the known ones. */
  placed: Uint8Array;
}

export function startingOffsets(
  p: FitProblem,
  temperaturesK: number[],
  known: Map<number, number>,
  knownVertical: Map<number, number>,
  s: ScanSettings,
): StartOutcome {
  const n = p.curves.length;
  const theta = new Float64Array(p.joint ? 2 * n : n);
  const placed = new Uint8Array(n);
  for (const [k, h] of known) {
    theta[k] = h;
    placed[k] = 1;
  }
  for (const [k, v] of knownVertical) if (p.joint) theta[n + k] = v;
  // Prim's algorithm over the pairs, by temperature difference (ties in pair order): a heap of
  // the pairs leaving the placed curves, so the cost grows as E log E for E pairs.
  const { ptr, list } = partnerLists(p);
  const heap = new EdgeHeap();
  const dT = (u: number, v: number) => Math.abs(temperaturesK[u] - temperaturesK[v]);
  const offer = (from: number) => {
    for (let q = ptr[from]; q < ptr[from + 1]; q++) {
      const to = list[q];
      if (!placed[to])
        heap.push(dT(from, to), Math.min(from, to) * n + Math.max(from, to), from, to);
    }
  };
  for (let k = 0; k < n; k++) if (placed[k]) offer(k);
  while (heap.size > 0) {
    const { from, to } = heap.pop();
    if (placed[to]) continue;
    const order = Math.sign(temperaturesK[to] - temperaturesK[from]);
    const r = scanPair(p, from, to, order, s);
    if (!r) continue;
    theta[to] = theta[from] + r.dh;
    if (p.joint && !knownVertical.has(to)) theta[n + to] = theta[n + from] + r.dv;
    placed[to] = 1;
    offer(to);
  }
  return { theta, placed };
}

/** Binary min-heap of pairs keyed by (temperature difference, pair key). */
class EdgeHeap {
  private key: number[] = [];
  private tie: number[] = [];
  private from: number[] = [];
  private to: number[] = [];
  size = 0;

  private less(a: number, b: number): boolean {
    return this.key[a] < this.key[b] || (this.key[a] === this.key[b] && this.tie[a] < this.tie[b]);
  }

  private swap(a: number, b: number): void {
    for (const arr of [this.key, this.tie, this.from, this.to]) {
      const t = arr[a];
      arr[a] = arr[b];
      arr[b] = t;
    }
  }

  push(key: number, tie: number, from: number, to: number): void {
    let i = this.size++;
    this.key[i] = key;
    this.tie[i] = tie;
    this.from[i] = from;
    this.to[i] = to;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (!this.less(i, parent)) break;
      this.swap(i, parent);
      i = parent;
    }
  }

  pop(): { from: number; to: number } {
    const out = { from: this.from[0], to: this.to[0] };
    this.size--;
    if (this.size > 0) {
      this.swap(0, this.size);
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < this.size && this.less(l, m)) m = l;
        if (r < this.size && this.less(r, m)) m = r;
        if (m === i) break;
        this.swap(i, m);
        i = m;
      }
    }
    return out;
  }
}
