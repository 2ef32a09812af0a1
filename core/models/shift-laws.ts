/**
 * Closed-form temperature-shift laws (docs/conventions.md §2–§3). Temperatures in kelvin.
 * Sign convention: reduced frequency ω_r = aT·ω; above Tref aT < 1, log10 aT < 0. The vertical
 * factor bT (entropic, from density) is a reduction rule: core/data/reduction.ts.
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

export const GAS_CONSTANT_J_PER_MOL_K = R_J_PER_MOL_K;
