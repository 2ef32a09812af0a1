/**
 * The reduction rules of time–temperature superposition, kept in one place (docs/conventions.md §2):
 * reduced frequency ω_r = aT·ω, reduced time t_r = t/aT; reduced modulus = bT × measured,
 * reduced compliance = measured / bT, reduced |η*| = |η*|·bT/aT; tan δ and δ are not shifted.
 */
import type { AbscissaKind, QuantityId } from './types';

/** Reduced abscissa: aT·ω for frequency, t/aT for time. */
export function reducedAbscissa(kind: AbscissaKind, x: number, aT: number): number {
  return kind === 'angularFrequency' ? x * aT : x / aT;
}

/** Factor that turns a measured value of `q` into its reduced value, given aT and bT. */
export function reductionFactor(q: QuantityId, aT: number, bT: number): number {
  switch (q) {
    case 'tanDelta':
    case 'phaseAngle':
      return 1;
    case 'creepCompliance':
      return 1 / bT;
    case 'complexViscosity':
      return bT / aT;
    default:
      return bT;
  }
}
