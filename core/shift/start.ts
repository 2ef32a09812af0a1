/**
 * Starting values: grow a tree over the candidate pairs from the curves whose offsets are known
 * (locked ones, or else one anchor at 0), always taking the unplaced curve nearest in temperature
 * to a placed one, and scan that pair's offset. The joint fit then refines all offsets at once
 * against every overlapping pair, so errors do not accumulate along this chain.
 */
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
  const edges: { u: number; v: number; dT: number }[] = [];
  for (let q = 0; q < p.pairs.length; q += 2) {
    const u = p.pairs[q];
    const v = p.pairs[q + 1];
    edges.push({ u, v, dT: Math.abs(temperaturesK[u] - temperaturesK[v]) });
  }
  edges.sort((a, b) => a.dT - b.dT);
  const failed = new Set<number>();
  let grew = true;
  while (grew) {
    grew = false;
    for (let e = 0; e < edges.length; e++) {
      if (failed.has(e)) continue;
      const { u, v } = edges[e];
      if (placed[u] === placed[v]) continue;
      const [from, to] = placed[u] ? [u, v] : [v, u];
      const order = Math.sign(temperaturesK[to] - temperaturesK[from]);
      const r = scanPair(p, from, to, order, s);
      if (!r) {
        failed.add(e);
        continue;
      }
      theta[to] = theta[from] + r.dh;
      if (p.joint && !knownVertical.has(to)) theta[n + to] = theta[n + from] + r.dv;
      placed[to] = 1;
      grew = true;
      break;
    }
  }
  return { theta, placed };
}
