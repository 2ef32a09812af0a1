/**
 * Reduced data for plots, reports and the Prony fit (docs/conventions.md §2): ω_r = aT·ω or t_r = t/aT;
 * moduli × bT, compliance / bT, |η*| × bT/aT; tan δ and δ unchanged. Only isotherms included in the
 * shift result appear; points keep their dataset mask and the engine's outlier flag.
 */
import type { Dataset, QuantityId } from '../data/types';
import { reducedAbscissa, reductionFactor } from '../data/reduction';
import type { MasterCurvePoint, ShiftResult } from './types';

export function masterCurve(dataset: Dataset, result: ShiftResult): MasterCurvePoint[] {
  const out: MasterCurvePoint[] = [];
  for (const c of result.curves) {
    if (!c.included || c.log10aT === null) continue;
    const iso = dataset.isotherms.find((i) => i.id === c.id);
    if (!iso) continue;
    const aT = 10 ** c.log10aT;
    const bT = 10 ** (c.log10bT ?? 0);
    const outliers = new Set(c.outlierPoints);
    iso.x.forEach((x, i) => {
      const values: Partial<Record<QuantityId, number>> = {};
      for (const [q, arr] of Object.entries(iso.quantities) as [QuantityId, number[]][])
        if (arr && i < arr.length) values[q] = arr[i] * reductionFactor(q, aT, bT);
      out.push({
        isothermId: iso.id,
        temperatureK: iso.temperatureK,
        pointIndex: i,
        reducedX: reducedAbscissa(dataset.abscissa, x, aT),
        values,
        used: iso.mask[i] !== false,
        outlier: outliers.has(i),
      });
    });
  }
  return out.sort((a, b) => a.reducedX - b.reducedX);
}
