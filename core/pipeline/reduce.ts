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
  const order = new Int32Array(total);
  for (let k = 0; k < total; k++) order[k] = k;
  order.sort((a, b) => x[a] - x[b] || a - b);
  const outliers = used.map(({ iso }) => new Set(outlierPoints[iso.id] ?? []));
  // Plain loops into preallocated arrays (Array.from with a mapping function is several times
  // slower on 10⁵–10⁶ entries).
  const column = <T>(value: (k: number) => T): T[] => {
    const out = new Array<T>(total);
    for (let m = 0; m < total; m++) out[m] = value(order[m]);
    return out;
  };
  const quantities: AnalysisMasterCurve['quantities'] = {};
  for (const q of present) {
    const factors = used.map(({ aT, bT }) => reductionFactor(q, aT, bT));
    const arrays = used.map(({ iso }) => iso.quantities[q]);
    quantities[q] = column((k) => {
      const arr = arrays[owner[k]];
      const v = arr ? arr[point[k]] * factors[owner[k]] : NaN;
      return Number.isFinite(v) ? v : null;
    });
  }
  return {
    reducedX: column((k) => x[k]),
    quantities,
    isothermId: column((k) => used[owner[k]].iso.id),
    temperatureK: column((k) => used[owner[k]].iso.temperatureK),
    outlier: column((k) => outliers[owner[k]].has(point[k])),
  };
}
