/**
 * The reduced master curve from shift factors (docs/conventions.md §2): x_r = aT·ω or t/aT; moduli × bT,
 * compliance / bT, |η*| × bT/aT, tan δ and δ unchanged. Only included isotherms and unmasked
 * points; sorted by reduced abscissa. The one master-curve builder: it works from the analysis's
 * curves, so it also serves curves edited after the fit.
 */
import type { AbscissaKind, Dataset } from '../data/types';
import { QUANTITY_IDS } from '../data/types';
import { reducedAbscissa, reductionFactor } from '../data/reduction';
import type { AnalysisCurve, AnalysisMasterCurve } from './types';
import { stableOrder } from './stable-order';

export function reduceToMasterCurve(
  dataset: Dataset,
  curves: readonly AnalysisCurve[],
  /** Point indices flagged as outliers, by isotherm id (kept, with outlier = true). */
  outlierPoints: Readonly<Record<string, readonly number[]>> = {},
  abscissa: AbscissaKind = dataset.abscissa,
): AnalysisMasterCurve {
  const byId = new Map(curves.map((c) => [c.isothermId, c]));
  const present = QUANTITY_IDS.filter((q) => dataset.isotherms.some((i) => i.quantities[q]));
  // columns first (typed arrays), then one sort of the point order by reduced abscissa: no
  // per-point objects, so 10⁶ points reduce in well under a second
  const used: { iso: Dataset['isotherms'][number]; aT: number; bT: number }[] = [];
  let total = 0;
  for (const iso of dataset.isotherms) {
    const c = byId.get(iso.id);
    if (!c || !c.included || c.log10aT === null) continue;
    used.push({ iso, aT: 10 ** c.log10aT, bT: 10 ** (c.log10bT ?? 0) });
    for (let i = 0; i < iso.x.length; i++) if (iso.mask[i]) total++;
  }
  const xs = new Float64Array(total);
  const source = new Int32Array(total); // index into `used`
  const values = present.map(() => new Float64Array(total));
  const outlier = new Uint8Array(total);
  let k = 0;
  used.forEach(({ iso, aT, bT }, u) => {
    const outliers = new Set(outlierPoints[iso.id] ?? []);
    const factors = present.map((q) => reductionFactor(q, aT, bT));
    const arrays = present.map((q) => iso.quantities[q]);
    for (let i = 0; i < iso.x.length; i++) {
      if (!iso.mask[i]) continue;
      xs[k] = reducedAbscissa(abscissa, iso.x[i], aT);
      source[k] = u;
      outlier[k] = outliers.has(i) ? 1 : 0;
      for (let q = 0; q < present.length; q++) {
        const arr = arrays[q];
        values[q][k] = arr ? arr[i] * factors[q] : NaN;
      }
      k++;
    }
  });
  // stable order by x (ties keep the isotherm order, as the former sort of rows did)
  const order = stableOrder(xs);
  const quantities: AnalysisMasterCurve['quantities'] = {};
  present.forEach((q, j) => {
    const v = values[j];
    const out = new Array<number | null>(total);
    for (let i = 0; i < total; i++) {
      const x = v[order[i]];
      out[i] = Number.isFinite(x) ? x : null;
    }
    quantities[q] = out;
  });
  const reducedX = new Array<number>(total);
  const isothermId = new Array<string>(total);
  const temperatureK = new Array<number>(total);
  const flags = new Array<boolean>(total);
  for (let i = 0; i < total; i++) {
    const o = order[i];
    reducedX[i] = xs[o];
    const iso = used[source[o]].iso;
    isothermId[i] = iso.id;
    temperatureK[i] = iso.temperatureK;
    flags[i] = outlier[o] === 1;
  }
  return { reducedX, quantities, isothermId, temperatureK, outlier: flags };
}
