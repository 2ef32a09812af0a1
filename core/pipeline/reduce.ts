/**
 * The reduced master curve from shift factors (docs/conventions.md §2): x_r = aT·ω or t/aT; moduli × bT,
 * compliance / bT, |η*| × bT/aT, tan δ and δ unchanged. Only included isotherms and unmasked
 * points; sorted by reduced abscissa. The one master-curve builder: it works from the analysis's
 * curves, so it also serves curves edited after the fit.
 */
import type { AbscissaKind, Dataset } from '../data/types';
import { QUANTITY_IDS } from '../data/types';
import { reductionFactor } from '../data/reduction';
import type { MasterColumns } from './master-columns';
import type { AnalysisCurve, AnalysisMasterCurve } from './types';
import { stableOrder } from './stable-order';

export function reduceToMasterCurve(
  dataset: Dataset,
  curves: readonly AnalysisCurve[],
  /** Point indices flagged as outliers, by isotherm id (kept, with outlier = true). */
  outlierPoints: Readonly<Record<string, readonly number[]>> = {},
  abscissa: AbscissaKind = dataset.abscissa,
): AnalysisMasterCurve {
  return reduceMasterCurve(dataset, curves, outlierPoints, abscissa).masterCurve;
}

/** The master curve (as reduceToMasterCurve) and the same columns typed, in sorted order. */
export function reduceMasterCurve(
  dataset: Dataset,
  curves: readonly AnalysisCurve[],
  outlierPoints: Readonly<Record<string, readonly number[]>> = {},
  abscissa: AbscissaKind = dataset.abscissa,
): { masterCurve: AnalysisMasterCurve; columns: MasterColumns } {
  const byId = new Map(curves.map((c) => [c.isothermId, c]));
  const present = QUANTITY_IDS.filter((q) => dataset.isotherms.some((i) => i.quantities[q]));
  // columns first (typed arrays), then one sort of the point order by reduced abscissa: no
  // per-point objects, so 10⁶ points reduce in well under a second
  const used: { iso: Dataset['isotherms'][number]; aT: number; bT: number; start: number }[] = [];
  let total = 0;
  for (const iso of dataset.isotherms) {
    const c = byId.get(iso.id);
    if (!c || !c.included || c.log10aT === null) continue;
    used.push({ iso, aT: 10 ** c.log10aT, bT: 10 ** (c.log10bT ?? 0), start: total });
    for (let i = 0; i < iso.x.length; i++) if (iso.mask[i]) total++;
  }
  const frequency = abscissa === 'angularFrequency';
  const xs = new Float64Array(total);
  const source = new Int32Array(total); // index into `used`
  const outlier = new Uint8Array(total);
  for (let u = 0; u < used.length; u++) {
    const { iso, aT, start } = used[u];
    const { x, mask } = iso;
    const flagged = outlierPoints[iso.id];
    const mark = flagged?.length ? new Uint8Array(x.length) : null;
    if (mark) for (const i of flagged!) if (i >= 0 && i < x.length) mark[i] = 1;
    let k = start;
    for (let i = 0; i < x.length; i++) {
      if (!mask[i]) continue;
      // reducedAbscissa (core/data/reduction.ts), inlined for this pass over every point
      xs[k] = frequency ? x[i] * aT : x[i] / aT;
      source[k] = u;
      if (mark) outlier[k] = mark[i];
      k++;
    }
  }
  // stable order by x (ties keep the isotherm order, as the former sort of rows did)
  const order = stableOrder(xs);
  const reducedX = new Array<number>(total);
  for (let i = 0; i < total; i++) reducedX[i] = xs[order[i]];
  const columns: MasterColumns = { x: reducedX, outlier: new Uint8Array(total), quantities: {} };
  const quantities: AnalysisMasterCurve['quantities'] = {};
  const values = new Float64Array(total);
  for (const q of present) {
    // this quantity, reduced, in isotherm order, then gathered into sorted order
    for (const { iso, aT, bT, start } of used) {
      const arr = iso.quantities[q];
      const { mask } = iso;
      const f = reductionFactor(q, aT, bT);
      let k = start;
      for (let i = 0; i < mask.length; i++) {
        if (!mask[i]) continue;
        values[k++] = arr ? arr[i] * f : NaN;
      }
    }
    const out = new Array<number | null>(total);
    let missing = false;
    for (let i = 0; i < total; i++) {
      const v = values[order[i]];
      if (Number.isFinite(v)) out[i] = v;
      else {
        out[i] = null;
        missing = true;
      }
    }
    quantities[q] = out;
    // a column without null is its own typed column (no copy); else NaN stands for null
    if (!missing) columns.quantities[q] = out as number[];
    else {
      const typed = new Float64Array(total);
      for (let i = 0; i < total; i++) typed[i] = out[i] ?? NaN;
      columns.quantities[q] = typed;
    }
  }
  const isothermId = new Array<string>(total);
  const temperatureK = new Array<number>(total);
  const flags = new Array<boolean>(total);
  for (let i = 0; i < total; i++) {
    const o = order[i];
    const iso = used[source[o]].iso;
    isothermId[i] = iso.id;
    temperatureK[i] = iso.temperatureK;
    const f = outlier[o];
    columns.outlier[i] = f;
    flags[i] = f === 1;
  }
  return {
    masterCurve: { reducedX, quantities, isothermId, temperatureK, outlier: flags },
    columns,
  };
}
