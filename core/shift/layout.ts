/**
 * Where each parameter of the fit sits in the envelope matrices (envelope.ts): curves in order of
 * temperature, and in a joint fit h_k and v_k side by side. Only isotherms a few positions apart in
 * temperature are compared (pairs.ts), so every curvature term couples parameters that are close
 * in this order and the matrices are banded. The envelope holds every entry the fit can touch:
 * the curvature of each pair, the propagated noise of each point (which couples all partners of
 * its curve, sandwich.ts) and each linear constraint (the reference, at most three isotherms).
 */
import type { Envelope } from './envelope';
import { envelope } from './envelope';
import type { FitProblem } from './problem';
import { parameterCount } from './problem';

export interface ParameterLayout {
  /** Envelope position of each parameter. */
  pos: Int32Array;
  env: Envelope;
}

/** Curve indices in order of temperature (identity when the problem does not say). */
export function temperatureOrder(p: FitProblem): Int32Array {
  const n = p.curves.length;
  if (p.order && p.order.length === n) return p.order;
  return Int32Array.from({ length: n }, (_, i) => i);
}

/** Partners of every curve over the candidate pairs, as compressed rows (ptr, list sorted). */
export function partnerLists(p: FitProblem): { ptr: Int32Array; list: Int32Array } {
  const n = p.curves.length;
  const ptr = new Int32Array(n + 1);
  for (let q = 0; q < p.pairs.length; q++) ptr[p.pairs[q] + 1]++;
  for (let i = 0; i < n; i++) ptr[i + 1] += ptr[i];
  const list = new Int32Array(p.pairs.length);
  const fill = ptr.slice(0, n);
  for (let q = 0; q < p.pairs.length; q += 2) {
    const i = p.pairs[q];
    const j = p.pairs[q + 1];
    list[fill[i]++] = j;
    list[fill[j]++] = i;
  }
  for (let i = 0; i < n; i++) list.subarray(ptr[i], ptr[i + 1]).sort();
  return { ptr, list };
}

/**
 * The layout for problem `p`; `coupled` lists further sets of parameters whose entries must be
 * stored (e.g. the parameters of each linear constraint).
 */
export function parameterLayout(p: FitProblem, coupled: ArrayLike<number>[] = []): ParameterLayout {
  const n = p.curves.length;
  const size = parameterCount(p);
  const order = temperatureOrder(p);
  const pos = new Int32Array(size);
  const per = p.joint ? 2 : 1;
  for (let r = 0; r < n; r++) {
    pos[order[r]] = per * r;
    if (p.joint) pos[n + order[r]] = 2 * r + 1;
  }
  const first = Int32Array.from({ length: size }, (_, r) => r);
  const join = (lo: number, at: number) => {
    if (lo < first[at]) first[at] = lo;
  };
  const { ptr, list } = partnerLists(p);
  for (let i = 0; i < n; i++) {
    let lo = pos[i];
    for (let q = ptr[i]; q < ptr[i + 1]; q++) lo = Math.min(lo, pos[list[q]]);
    join(lo, pos[i]);
    if (p.joint) join(lo, pos[n + i]);
    for (let q = ptr[i]; q < ptr[i + 1]; q++) {
      join(lo, pos[list[q]]);
      if (p.joint) join(lo, pos[n + list[q]]);
    }
  }
  for (const set of coupled) {
    let lo = Infinity;
    for (let k = 0; k < set.length; k++) lo = Math.min(lo, pos[set[k]]);
    for (let k = 0; k < set.length; k++) join(lo, pos[set[k]]);
  }
  return { pos, env: envelope(first) };
}

/** Storage index of parameters (u, v) in the layout (both must lie inside the envelope). */
export function slotIn(l: ParameterLayout, u: number, v: number): number {
  const a = l.pos[u];
  const b = l.pos[v];
  const r = a >= b ? a : b;
  const c = a >= b ? b : a;
  return l.env.start[r] + c - l.env.first[r];
}
