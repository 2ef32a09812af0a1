/**
 * The reduced master curve from shift factors (DOMAIN.md §2): x_r = aT·ω or t/aT; moduli × bT,
 * compliance / bT, |η*| × bT/aT, tan δ and δ unchanged. Only included isotherms and unmasked
 * points; sorted by reduced abscissa. (core/shift's `masterCurve` does the same from a ShiftResult;
 * this one works from the analysis's curves, so it also serves curves edited after the fit.)
 */
import type { AbscissaKind, Dataset } from '../data/types';
import { QUANTITY_IDS } from '../data/types';
import { reducedAbscissa, reductionFactor } from '../data/reduction';
import type { AnalysisCurve, AnalysisMasterCurve } from './types';

export function reduceToMasterCurve(
  dataset: Dataset,
  curves: readonly AnalysisCurve[],
  /** Point indices flagged as outliers, by isotherm id (kept, with outlier = true). */
  outlierPoints: Readonly<Record<string, readonly number[]>> = {},
  abscissa: AbscissaKind = dataset.abscissa,
): AnalysisMasterCurve {
  const byId = new Map(curves.map((c) => [c.isothermId, c]));
  const present = QUANTITY_IDS.filter((q) => dataset.isotherms.some((i) => i.quantities[q]));
  const rows: { x: number; id: string; T: number; v: number[]; outlier: boolean }[] = [];
  for (const iso of dataset.isotherms) {
    const c = byId.get(iso.id);
    if (!c || !c.included || c.log10aT === null) continue;
    const aT = 10 ** c.log10aT;
    const bT = 10 ** (c.log10bT ?? 0);
    const outliers = new Set(outlierPoints[iso.id] ?? []);
    iso.x.forEach((x, i) => {
      if (!iso.mask[i]) return;
      rows.push({
        x: reducedAbscissa(abscissa, x, aT),
        id: iso.id,
        T: iso.temperatureK,
        outlier: outliers.has(i),
        v: present.map((q) => {
          const arr = iso.quantities[q];
          return arr ? arr[i] * reductionFactor(q, aT, bT) : NaN;
        }),
      });
    });
  }
  rows.sort((a, b) => a.x - b.x);
  const quantities: AnalysisMasterCurve['quantities'] = {};
  present.forEach((q, k) => {
    quantities[q] = rows.map((r) => (Number.isFinite(r.v[k]) ? r.v[k] : null));
  });
  return {
    reducedX: rows.map((r) => r.x),
    quantities,
    isothermId: rows.map((r) => r.id),
    temperatureK: rows.map((r) => r.T),
    outlier: rows.map((r) => r.outlier),
  };
}
