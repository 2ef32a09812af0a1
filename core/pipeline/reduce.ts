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
  // Columns in typed arrays and one index sort: a master curve of 10⁶ points is built without an
  // object per point.
  let total = 0;
  const used: { iso: Dataset['isotherms'][number]; aT: number; bT: number }[] = [];
  for (const iso of dataset.isotherms) {
    const c = byId.get(iso.id);
    if (!c || !c.included || c.log10aT === null) continue;
    used.push({ iso, aT: 10 ** c.log10aT, bT: 10 ** (c.log10bT ?? 0) });
    for (let i = 0; i < iso.x.length; i++) if (iso.mask[i]) total++;
  }
  const x = new Float64Array(total);
  const owner = new Int32Array(total);
  const point = new Int32Array(total);
  let m = 0;
  used.forEach(({ iso, aT }, u) => {
    for (let i = 0; i < iso.x.length; i++) {
      if (!iso.mask[i]) continue;
      x[m] = reducedAbscissa(abscissa, iso.x[i], aT);
      owner[m] = u;
      point[m++] = i;
    }
  });
  // Stable: equal abscissae keep isotherm and point order, as the sort of the rows did.
  const order = Int32Array.from({ length: total }, (_, k) => k).sort(
    (a, b) => x[a] - x[b] || a - b,
  );
  const outliers = used.map(({ iso }) => new Set(outlierPoints[iso.id] ?? []));
  const quantities: AnalysisMasterCurve['quantities'] = {};
  for (const q of present) {
    const factors = used.map(({ aT, bT }) => reductionFactor(q, aT, bT));
    quantities[q] = Array.from(order, (k) => {
      const arr = used[owner[k]].iso.quantities[q];
      const v = arr ? arr[point[k]] * factors[owner[k]] : NaN;
      return Number.isFinite(v) ? v : null;
    });
  }
  return {
    reducedX: Array.from(order, (k) => x[k]),
    quantities,
    isothermId: Array.from(order, (k) => used[owner[k]].iso.id),
    temperatureK: Array.from(order, (k) => used[owner[k]].iso.temperatureK),
    outlier: Array.from(order, (k) => outliers[owner[k]].has(point[k])),
  };
}
