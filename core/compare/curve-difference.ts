/**
 * The difference of one quantity between a sample and the reference, node by node on the shared
 * grid: Δ = log10 y_sample − log10 y_ref with s.e. √(s_sample² + s_ref²) (the two curves are
 * measured independently), and the largest |Δ| with where it occurs.
 */
import type { QuantityId } from '../data/types';
import type { GridNode, QuantityDifference } from './types';

export function quantityDifference(
  quantity: QuantityId,
  reference: GridNode[],
  sample: GridNode[],
): QuantityDifference {
  const byU = new Map<number, GridNode>();
  for (const n of reference) byU.set(Math.round(n.log10x * 1e6), n);
  const log10x: number[] = [];
  const d: number[] = [];
  const se: number[] = [];
  for (const s of sample) {
    const r = byU.get(Math.round(s.log10x * 1e6));
    if (!r) continue;
    log10x.push(s.log10x);
    d.push(s.log10y - r.log10y);
    se.push(Math.hypot(s.stdErr, r.stdErr));
  }
  let largest: QuantityDifference['largest'] = null;
  d.forEach((v, i) => {
    if (!largest || Math.abs(v) > Math.abs(largest.log10Difference))
      largest = { log10Difference: v, stdErr: se[i], reducedX: 10 ** log10x[i] };
  });
  return {
    quantity,
    log10x,
    log10Difference: d,
    stdErr: se,
    largest,
    window: log10x.length ? [10 ** log10x[0], 10 ** log10x[log10x.length - 1]] : null,
  };
}
