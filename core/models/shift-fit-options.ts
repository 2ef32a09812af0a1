import type { ErrorScaling, ShiftFitOptions } from './types';

/** ShiftFitOptions with every default applied. */
export interface ResolvedShiftFitOptions {
  referenceK: number;
  glassTransitionK: number | undefined;
  errorScaling: ErrorScaling;
}

/** Applies the documented defaults of ShiftFitOptions and checks them once (mljs checkOptions pattern). */
export function resolveShiftFitOptions(o: ShiftFitOptions): ResolvedShiftFitOptions {
  if (!o || !(o.referenceK > 0)) {
    throw new RangeError(
      `The referenceK option must be a positive temperature in K, got ${o?.referenceK}`,
    );
  }
  if (o.glassTransitionK !== undefined && !(o.glassTransitionK > 0)) {
    throw new RangeError(
      `The glassTransitionK option must be a positive temperature in K, got ${o.glassTransitionK}`,
    );
  }
  const errorScaling = o.errorScaling ?? 'residual';
  if (errorScaling !== 'residual' && errorScaling !== 'reported') {
    throw new RangeError(
      `The errorScaling option must be 'residual' or 'reported', got ${String(errorScaling)}`,
    );
  }
  return { referenceK: o.referenceK, glassTransitionK: o.glassTransitionK, errorScaling };
}
