/**
 * Evaluates a shift model and its gradient with respect to its parameters (for the delta-method
 * band). Formulas: docs/conventions.md §3 — WLF (Williams, Landel & Ferry, JACS 77, 3701, 1955),
 * Arrhenius, and the quadratic polynomial.
 */
import { GAS_CONSTANT_J_PER_MOL_K } from './shift-laws';
import type { ShiftModelKind, ShiftModelSpec } from './types';

/** log10 aT per kJ/mol of activation energy: 1000/(R ln 10)·(1/T − 1/Tr). */
export function arrheniusSlope(temperatureK: number, referenceK: number): number {
  return (1000 / (GAS_CONSTANT_J_PER_MOL_K * Math.LN10)) * (1 / temperatureK - 1 / referenceK);
}

/** log10 aT of a model with parameter vector `values` (order: see ShiftModelSpec). */
export function modelLog10aT(
  kind: ShiftModelKind,
  values: readonly number[],
  referenceK: number,
  temperatureK: number,
): number {
  const dT = temperatureK - referenceK;
  switch (kind) {
    case 'wlf':
      return (-values[0] * dT) / (values[1] + dT);
    case 'arrhenius':
      return values[0] * arrheniusSlope(temperatureK, referenceK);
    case 'polynomial':
      return values[0] * dT + values[1] * dT * dT;
  }
}

/** ∂ log10 aT / ∂ values at one temperature. */
export function modelGradient(
  kind: ShiftModelKind,
  values: readonly number[],
  referenceK: number,
  temperatureK: number,
): number[] {
  const dT = temperatureK - referenceK;
  switch (kind) {
    case 'wlf': {
      const d = values[1] + dT;
      return [-dT / d, (values[0] * dT) / (d * d)];
    }
    case 'arrhenius':
      return [arrheniusSlope(temperatureK, referenceK)];
    case 'polynomial':
      return [dT, dT * dT];
  }
}

/** log10 aT of a model spec at one temperature, K. */
export function shiftModelLog10aT(model: ShiftModelSpec, temperatureK: number): number {
  return modelLog10aT(model.kind, model.values, model.referenceK, temperatureK);
}
