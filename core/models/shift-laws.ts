/**
 * Closed-form temperature-shift laws (docs/conventions.md §2–§3). Temperatures in kelvin.
 * Sign convention: reduced frequency ω_r = aT·ω; above Tref aT < 1, log10 aT < 0. The vertical
 * factor bT (entropic, from density) is a reduction rule: core/data/reduction.ts.
 */

import type { ShiftLaw } from './types';

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

/** log10 aT per kJ/mol of activation energy: 1000/(R ln 10)·(1/T − 1/Tr). */
export function arrheniusSlope(temperatureK: number, referenceK: number): number {
  return (1000 / (GAS_CONSTANT_J_PER_MOL_K * Math.LN10)) * (1 / temperatureK - 1 / referenceK);
}

/** WLF with parameters [C1, C2 (K)]: log10 aT = −C1 (T − Tr)/(C2 + T − Tr). */
export const WLF_LAW: ShiftLaw = {
  kind: 'wlf',
  parameters: [
    { name: 'C1', unit: '1' },
    { name: 'C2', unit: 'K' },
  ],
  log10aT(values, referenceK, temperatureK) {
    const dT = temperatureK - referenceK;
    return (-values[0] * dT) / (values[1] + dT);
  },
  gradient(values, referenceK, temperatureK) {
    const dT = temperatureK - referenceK;
    const d = values[1] + dT;
    return [-dT / d, (values[0] * dT) / (d * d)];
  },
};

/** Arrhenius with parameter [Ea (kJ/mol)]: log10 aT = Ea·1000/(R ln 10)·(1/T − 1/Tr). */
export const ARRHENIUS_LAW: ShiftLaw = {
  kind: 'arrhenius',
  parameters: [{ name: 'Ea', unit: 'kJ/mol' }],
  log10aT(values, referenceK, temperatureK) {
    return values[0] * arrheniusSlope(temperatureK, referenceK);
  },
  gradient(_values, referenceK, temperatureK) {
    return [arrheniusSlope(temperatureK, referenceK)];
  },
};

/** Quadratic polynomial with parameters [a1 (1/K), a2 (1/K²)]: log10 aT = a1 (T − Tr) + a2 (T − Tr)². */
export const POLYNOMIAL_LAW: ShiftLaw = {
  kind: 'polynomial',
  parameters: [
    { name: 'a1', unit: '1/K' },
    { name: 'a2', unit: '1/K²' },
  ],
  log10aT(values, referenceK, temperatureK) {
    const dT = temperatureK - referenceK;
    return values[0] * dT + values[1] * dT * dT;
  },
  gradient(_values, referenceK, temperatureK) {
    const dT = temperatureK - referenceK;
    return [dT, dT * dT];
  },
};
