/**
 * Every isotherm's points at the reference temperature for one quantity: the measured values,
 * or the ones derived from them (core/data/derived.ts: |G*| = √(G′² + G″²), tan δ = G″/G′,
 * δ = atan2(G″, G′), |η*| = |G*|/ω; docs/conventions.md §1), reduced with the isotherm's shift (core/data/reduction: aT·ω or
 * t/aT; moduli × bT, |η*| × bT/aT, tan δ and δ unchanged). Used isotherms come at their fitted
 * shift with the engine's outlier flags; the others at the shift `isothermStates` places them
 * at, so plots can draw them faded. Masked points are left out.
 */
import { quantityValues } from '../data/derived';
import type { Isotherm, QuantityId } from '../data/types';
import { reducedAbscissa, reductionFactor } from '../data/reduction';
import { isothermStates, type IsothermUse } from './isotherm-states';
import type { Analysis } from './types';

export interface ReducedIsotherm {
  isothermId: string;
  temperatureK: number;
  use: IsothermUse;
  /** Reduced abscissa (aT·ω in rad/s or t/aT in s), in the isotherm's point order. */
  x: number[];
  /** Reduced values, SI. */
  y: number[];
  /** Index of each point within the isotherm. */
  index: number[];
  /** True where the shift engine flagged the point as an outlier. */
  outlier: boolean[];
}

/** The values of `q` at every point of an isotherm, measured or derived (core/data/derived.ts); null when neither. */
export function isothermValues(iso: Isotherm, q: QuantityId): number[] | null {
  return quantityValues(q, iso.quantities, iso.x) ?? null;
}

/** True when the data hold `q` for at least one isotherm (measured or derivable). */
export function hasQuantity(a: Analysis, q: QuantityId): boolean {
  if (q === 'complexViscosity' && a.sample.abscissa !== 'angularFrequency') return false;
  return a.dataset.isotherms.some((iso) => isothermValues(iso, q) !== null);
}

export function reducedIsotherms(a: Analysis, q: QuantityId): ReducedIsotherm[] {
  const states = new Map(isothermStates(a).map((s) => [s.isothermId, s]));
  const mc = a.masterCurve;
  const flagged = new Map<string, number[]>();
  mc.isothermId.forEach((id, i) => {
    if (!mc.outlier[i]) return;
    const list = flagged.get(id);
    if (list) list.push(mc.reducedX[i]);
    else flagged.set(id, [mc.reducedX[i]]);
  });
  const out: ReducedIsotherm[] = [];
  for (const iso of a.dataset.isotherms) {
    const s = states.get(iso.id);
    const values = isothermValues(iso, q);
    if (!s || !values || s.drawLog10aT === null) continue;
    const aT = 10 ** s.drawLog10aT;
    const bT = 10 ** s.drawLog10bT;
    const f = reductionFactor(q, aT, bT);
    const bad = flagged.get(iso.id) ?? [];
    const r: ReducedIsotherm = {
      isothermId: iso.id,
      temperatureK: iso.temperatureK,
      use: s.use,
      x: [],
      y: [],
      index: [],
      outlier: [],
    };
    iso.x.forEach((x, i) => {
      const y = values[i] * f;
      if (!iso.mask[i] || !Number.isFinite(y) || !(x > 0)) return;
      const xr = reducedAbscissa(a.sample.abscissa, x, aT);
      r.x.push(xr);
      r.y.push(y);
      r.index.push(i);
      r.outlier.push(bad.some((b) => Math.abs(b - xr) <= 1e-9 * Math.abs(xr)));
    });
    if (r.x.length) out.push(r);
  }
  return out;
}
