import type { ErrorScaling, ShiftFitOptions } from './types';

/** ShiftFitOptions with every default applied. */
export interface ResolvedShiftFitOptions {
  referenceK: number;
  glassTransitionK: number | undefined;
  errorScaling: ErrorScaling;
  covariance: readonly (readonly number[])[] | null;
  diagonalReason: string | undefined;
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
  if (o.covariance != null && !Array.isArray(o.covariance))
    throw new TypeError('The covariance option must be a square array of arrays (decades²)');
  return {
    referenceK: o.referenceK,
    glassTransitionK: o.glassTransitionK,
    errorScaling,
    covariance: o.covariance ?? null,
    diagonalReason: o.diagonalReason,
  };
}
