/**
 * Evaluates a registered shift model by kind (the band, shift-model-band.ts, takes the gradient
 * from the same law). The laws themselves (WLF, Williams, Landel & Ferry, JACS 77, 3701, 1955;
 * Arrhenius; the quadratic polynomial) are in shift-laws.ts, each model's descriptor in registry/.
 */
import { shiftModel } from './registry';
import type { ShiftModelKind, ShiftModelSpec } from './types';

/** log10 aT of a model with parameter vector `values` (order: its law's parameters). */
export function modelLog10aT(
  kind: ShiftModelKind,
  values: readonly number[],
  referenceK: number,
  temperatureK: number,
): number {
  return shiftModel(kind).law.log10aT(values, referenceK, temperatureK);
}

/** log10 aT of a model spec at one temperature, K. */
export function shiftModelLog10aT(model: ShiftModelSpec, temperatureK: number): number {
  return modelLog10aT(model.kind, model.values, model.referenceK, temperatureK);
}
