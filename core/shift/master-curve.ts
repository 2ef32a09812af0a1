/**
 * Reduced data for plots, reports and the Prony fit (DOMAIN.md §2): ω_r = aT·ω or t_r = t/aT;
 * moduli × bT, compliance / bT, |η*| × bT/aT; tan δ and δ unchanged. Only isotherms included in the
 * shift result appear; points keep their dataset mask and the engine's outlier flag.
 */
import type { Dataset, QuantityId } from '../data/types';
import type { MasterCurvePoint, ShiftResult } from './types';

function reduce(q: QuantityId, v: number, log10aT: number, log10bT: number): number {
  switch (q) {
    case 'tanDelta':
    case 'phaseAngle':
      return v;
    case 'creepCompliance':
      return v / 10 ** log10bT;
    case 'complexViscosity':
      return v * 10 ** (log10bT - log10aT);
    default:
      return v * 10 ** log10bT;
  }
}

export function masterCurve(dataset: Dataset, result: ShiftResult): MasterCurvePoint[] {
  const out: MasterCurvePoint[] = [];
  const time = dataset.abscissa === 'time';
  for (const c of result.curves) {
    if (!c.included || c.log10aT === null) continue;
    const iso = dataset.isotherms.find((i) => i.id === c.id);
    if (!iso) continue;
    const aT = 10 ** c.log10aT;
    const bT = c.log10bT ?? 0;
    const outliers = new Set(c.outlierPoints);
    iso.x.forEach((x, i) => {
      const values: Partial<Record<QuantityId, number>> = {};
      for (const [q, arr] of Object.entries(iso.quantities) as [QuantityId, number[]][])
        if (arr && i < arr.length) values[q] = reduce(q, arr[i], c.log10aT!, bT);
      out.push({
        isothermId: iso.id,
        temperatureK: iso.temperatureK,
        pointIndex: i,
        reducedX: time ? x / aT : x * aT,
        values,
        used: iso.mask[i] !== false,
        outlier: outliers.has(i),
      });
    });
  }
  return out.sort((a, b) => a.reducedX - b.reducedX);
}
