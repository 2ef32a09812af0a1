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
