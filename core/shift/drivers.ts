/**
 * Which quantities drive the horizontal shift, and how each enters the fit in log space.
 * Default rule (documented in docs/shifting.md):
 *   relaxation → G(t)/E(t); creep → J(t)/D(t);
 *   oscillatory (whatever the vertical mode: bT from the data is one global constant, see
 *   vertical.ts) → G' and G'' together when both are present, else the first present of
 *   tan δ, |G*|, G', G'', δ, |η*| (one quantity is enough).
 */
import { reductionExponents } from '../data/reduction';
import type { Dataset, QuantityId } from '../data/types';
import type { VerticalMode } from './types';

export function hasQuantity(dataset: Dataset, q: QuantityId): boolean {
  return dataset.isotherms.some((iso) => (iso.quantities[q]?.length ?? 0) > 0);
}

export function defaultDrivers(dataset: Dataset, _vertical: VerticalMode): QuantityId[] {
  if (dataset.testKind === 'relaxation') return ['relaxationModulus'];
  if (dataset.testKind === 'creep') return ['creepCompliance'];
  const has = (q: QuantityId): boolean => hasQuantity(dataset, q);
  if (has('storageModulus') && has('lossModulus')) return ['storageModulus', 'lossModulus'];
  // One quantity is enough: a file with only G' (or only G''/E'') shifts on it.
  const order: QuantityId[] = [
    'tanDelta',
    'complexModulus',
    'storageModulus',
    'lossModulus',
    'phaseAngle',
    'complexViscosity',
  ];
  const first = order.find(has);
  return first ? [first] : [];
}

/** Coefficient of log10 aT in the reduced log ordinate (the reduction rule, core/data/reduction.ts). */
export function alphaOf(q: QuantityId): number {
  return reductionExponents(q).aT;
}

/** Coefficient of log10 bT in the reduced log ordinate (the reduction rule, core/data/reduction.ts). */
export function betaOf(q: QuantityId): number {
  return reductionExponents(q).bT;
}

/** True when logOrdinate(q, value) is finite, without computing the logarithm. */
export function usableValue(q: QuantityId, value: number): boolean {
  if (q === 'phaseAngle') return value > 0 && value < 90;
  return value > 0 && value < Infinity;
}

/**
 * The ordinate a quantity is fitted in: log10 of the value; δ enters as log10 tan δ so that all
 * drivers are in decades. Non-positive values (and δ outside 0–90°) give NaN.
 */
export function logOrdinate(q: QuantityId, value: number): number {
  if (q === 'phaseAngle') {
    if (!(value > 0 && value < 90)) return NaN;
    return Math.log10(Math.tan((value * Math.PI) / 180));
  }
  return value > 0 ? Math.log10(value) : NaN;
}

// Values of a quantity, derived from G' and G'' when not stored: one rule in core/data/derived.ts.
export { quantityValues } from '../data/derived';
