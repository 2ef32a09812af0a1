/**
 * The master curve as columns of plain numbers (NaN where a value is missing), for the passes of
 * the Prony fit and the indicators over every point: reading these costs no boxing and no null
 * checks.
 * reduceMasterCurve (reduce.ts) gives them with the master curve; `masterColumns` converts a
 * master curve that came without them (a loaded or edited analysis).
 */
import type { QuantityId } from '../data/types';
import type { AnalysisMasterCurve } from './types';

export interface MasterColumns {
  /** Reduced abscissa, as AnalysisMasterCurve.reducedX (may be that very array). */
  x: ArrayLike<number>;
  /** 1 where the point is an outlier. */
  outlier: Uint8Array;
  /**
   * Reduced quantities, NaN where the master curve has null; a quantity without null may be
   * the master curve's own array (read only).
   */
  quantities: Partial<Record<QuantityId, ArrayLike<number>>>;
}

/** The typed columns of a master curve. */
export function masterColumns(mc: AnalysisMasterCurve): MasterColumns {
  const n = mc.reducedX.length;
  const x = mc.reducedX;
  const outlier = new Uint8Array(n);
  for (let i = 0; i < n; i++) outlier[i] = mc.outlier[i] ? 1 : 0;
  const quantities: MasterColumns['quantities'] = {};
  for (const [q, v] of Object.entries(mc.quantities) as [QuantityId, (number | null)[]][]) {
    if (!v.includes(null)) {
      quantities[q] = v as number[];
      continue;
    }
    const c = new Float64Array(n);
    for (let i = 0; i < n; i++) c[i] = v[i] ?? NaN;
    quantities[q] = c;
  }
  return { x, outlier, quantities };
}
