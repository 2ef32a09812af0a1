/**
 * Reading an analysis's shift-model results by kind, for the layers that loop over the
 * registered models (core/models registry) rather than naming them. `AnalysisModels` types the
 * built-in results; a model added through the registry sits under its own kind in the same object.
 */
import { shiftModels, type AnyShiftModelDescriptor } from '../models';
import type { ShiftModelKind } from '../models/types';
import type { AnalysisModels, ModelFitStats } from './types';

/** What every shift-model result holds: the fit statistics, band and spec, and its Tr. */
export interface ShiftModelResult extends ModelFitStats {
  /** Tr of the constants, K. */
  referenceK: number;
}

/** A registered model with its result in an analysis. */
export interface FittedShiftModel {
  descriptor: AnyShiftModelDescriptor;
  result: ShiftModelResult;
}

// `models` is plain JSON keyed by model kind (besides `hint`); the cast is the one place that
// reads it by a kind known only at run time.
const byKind = (models: AnalysisModels): Record<string, ShiftModelResult | undefined> =>
  models as unknown as Record<string, ShiftModelResult | undefined>;

/** The result of model `kind`, or undefined when it was not fitted. */
export function modelResult(
  models: AnalysisModels,
  kind: ShiftModelKind,
): ShiftModelResult | undefined {
  return kind === 'hint' ? undefined : byKind(models)[kind];
}

/** Stores the result of model `kind` (the pipeline's model fits). */
export function setModelResult(
  models: AnalysisModels,
  kind: ShiftModelKind,
  result: ShiftModelResult,
): void {
  byKind(models)[kind] = result;
}

/** The registered models that were fitted in this analysis, in registry order. */
export function fittedShiftModels(models: AnalysisModels): FittedShiftModel[] {
  return shiftModels().flatMap((descriptor) => {
    const result = modelResult(models, descriptor.kind);
    return result ? [{ descriptor, result }] : [];
  });
}

/** The value, standard error and 95 % interval of constant `index` of a fitted model. */
export function modelConstant(
  { descriptor, result }: FittedShiftModel,
  index: number,
): { value: number; stdErr: number | null; ci95: [number, number] | null } {
  const key = descriptor.parameters[index].analysisKey;
  const fields = result as unknown as Record<string, unknown>;
  return {
    value: fields[key] as number,
    stdErr: (fields[`${key}StdErr`] as number | null | undefined) ?? null,
    ci95: (fields[`${key}Ci95`] as [number, number] | null | undefined) ?? null,
  };
}
