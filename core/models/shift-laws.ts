/**
 * Closed-form temperature-shift laws (docs/conventions.md §2–§3). Temperatures in kelvin.
 * Sign convention: reduced frequency ω_r = aT·ω; above Tref aT < 1, log10 aT < 0.
 */

const R_J_PER_MOL_K = 8.314462618; // molar gas constant, CODATA 2018

/** WLF: log10 aT = −C1 (T − Tr) / (C2 + T − Tr). Williams, Landel & Ferry, JACS 77, 3701 (1955). */
export function wlfLog10aT(
  temperatureK: number,
  c1: number,
  c2K: number,
  referenceK: number,
): number {
  const dT = temperatureK - referenceK;
  return (-c1 * dT) / (c2K + dT);
}

/** Arrhenius: ln aT = (Ea/R)(1/T − 1/Tr), returned as log10 aT. Ea in J/mol. */
export function arrheniusLog10aT(
  temperatureK: number,
  activationEnergyJPerMol: number,
  referenceK: number,
): number {
  return (
    ((activationEnergyJPerMol / R_J_PER_MOL_K) * (1 / temperatureK - 1 / referenceK)) / Math.LN10
  );
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

export const GAS_CONSTANT_J_PER_MOL_K = R_J_PER_MOL_K;
