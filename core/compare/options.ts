/** Options of `compareAnalyses`, with their defaults applied in one place. */
import { celsiusToKelvin } from '../data/temperature';
import type { ShiftModelKind } from '../models/types';
import type { Specification } from './spec-schema';

export interface CompareOptions {
  /** Common reference temperature, K. @default the spec's, else the reference analysis's own */
  referenceTemperatureK?: number;
  /** Width of the bins of the shared log grid, decades. @default 0.25 */
  binDecades?: number;
  /** Shift model used to move a curve to the common temperature. @default each analysis's hint, else wlf, arrhenius, polynomial */
  model?: ShiftModelKind;
  /** Temperatures (K) at which the shift models are compared. @default the common reference ± 20 K */
  shiftTemperaturesK?: number[];
  /** Criteria each sample is judged by. @default none (no verdicts) */
  spec?: Specification;
  /** Largest |time shift| searched, decades. @default 1.5 */
  maxTimeShiftDecades?: number;
}

export interface ResolvedCompareOptions {
  referenceTemperatureK: number;
  binDecades: number;
  model: ShiftModelKind | null;
  shiftTemperaturesK: number[];
  spec: Specification | null;
  maxTimeShiftDecades: number;
}

/** A wrong call to compareAnalyses: names the parameter. */
export class CompareError extends Error {
  constructor(
    message: string,
    readonly parameter: string,
  ) {
    super(message);
    this.name = 'CompareError';
  }
}

export function resolveCompareOptions(
  o: CompareOptions,
  ownReferenceK: number,
): ResolvedCompareOptions {
  const specK =
    o.spec?.referenceTemperature !== undefined
      ? celsiusToKelvin(o.spec.referenceTemperature)
      : undefined;
  const T = o.referenceTemperatureK ?? specK ?? ownReferenceK;
  if (!(T > 0) || !Number.isFinite(T))
    throw new CompareError(
      `referenceTemperatureK must be a positive number of kelvin, got ${T}`,
      'referenceTemperatureK',
    );
  const bin = o.binDecades ?? 0.25;
  if (!(bin >= 0.05 && bin <= 2))
    throw new CompareError(`binDecades must lie between 0.05 and 2, got ${bin}`, 'binDecades');
  const maxShift = o.maxTimeShiftDecades ?? 1.5;
  if (!(maxShift > 0 && maxShift <= 5))
    throw new CompareError(
      `maxTimeShiftDecades must lie in (0, 5], got ${maxShift}`,
      'maxTimeShiftDecades',
    );
  return {
    referenceTemperatureK: T,
    binDecades: bin,
    model: o.model ?? null,
    shiftTemperaturesK: o.shiftTemperaturesK ?? [T - 20, T + 20],
    spec: o.spec ?? null,
    maxTimeShiftDecades: maxShift,
  };
}
