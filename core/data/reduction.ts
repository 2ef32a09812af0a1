/**
 * The reduction rules of time–temperature superposition, kept in one place as functions
 * (docs/conventions.md §2; their wording in outputs: core/data/conventions.ts).
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

/**
 * The reduction rules in log form: log10(reduced / measured) = aT · log10 aT + bT · log10 bT for
 * a quantity (moduli: bT 1; compliance: bT −1; |η*|: aT −1, bT 1; tan δ and δ: 0). The shift fit
 * works in decades and reads its coefficients here.
 */
export function reductionExponents(q: QuantityId): { aT: number; bT: number } {
  switch (q) {
    case 'tanDelta':
    case 'phaseAngle':
      return { aT: 0, bT: 0 };
    case 'creepCompliance':
      return { aT: 0, bT: -1 };
    case 'complexViscosity':
      return { aT: -1, bT: 1 };
    default:
      return { aT: 0, bT: 1 };
  }
}

/**
 * Sign of log10 aT in the reduced log abscissa: log10 ω_r = log10 ω + log10 aT (frequency, +1),
 * log10 t_r = log10 t − log10 aT (time, −1).
 */
export function abscissaShiftSign(kind: AbscissaKind): 1 | -1 {
  return kind === 'angularFrequency' ? 1 : -1;
}

/**
 * The reduction inverted: the value measured at the temperature with these aT and bT, from the
 * reduced value (a prediction or a generated measurement): moduli / bT, compliance × bT,
 * |η*| × aT/bT; tan δ and δ unchanged.
 */
export function measuredFromReduced(
  q: QuantityId,
  reduced: number,
  aT: number,
  bT: number,
): number {
  switch (q) {
    case 'tanDelta':
    case 'phaseAngle':
      return reduced;
    case 'creepCompliance':
      return reduced * bT;
    case 'complexViscosity':
      return (reduced * aT) / bT;
    default:
      return reduced / bT;
  }
}

/**
 * Entropic vertical shift bT = (Tref·ρref)/(T·ρ(T)); reduced modulus = bT × measured modulus.
 * Ferry (1980). Densities in any consistent unit.
 */
export function entropicBT(
  temperatureK: number,
  referenceK: number,
  density: number,
  referenceDensity: number,
): number {
  return (referenceK * referenceDensity) / (temperatureK * density);
}

/**
 * log10 bT of the entropic law with the linearised density of `densityFromExpansion`:
 * bT = Tref(1 + αV(T − Tref))/T (ρref cancels).
 */
export function entropicLog10bT(T: number, referenceK: number, alpha: number): number {
  return Math.log10((referenceK * (1 + alpha * (T - referenceK))) / T);
}

/** ∂log10 bT/∂αV of the entropic law, K. */
export function entropicLog10bTSlope(T: number, referenceK: number, alpha: number): number {
  return (T - referenceK) / (Math.LN10 * (1 + alpha * (T - referenceK)));
}

/**
 * Density from a volumetric thermal expansion coefficient αV (1/K), linearised about Tref:
 * ρ(T) = ρref / (1 + αV (T − Tref)).
 */
export function densityFromExpansion(
  temperatureK: number,
  referenceK: number,
  referenceDensity: number,
  volumetricExpansionPerK: number,
): number {
  return referenceDensity / (1 + volumetricExpansionPerK * (temperatureK - referenceK));
}
