/**
 * The one place the pipeline reads the shift engine's covariance of log10 aT, for the
 * generalised least-squares model fits (core/models/shift-weighting.ts). When the engine gives
 * none, the fits fall back to each shift's own standard error and say so.
 */
import type { ShiftResult } from '../shift/types';

/** Covariance of the shifts of the given isotherms (decades², in their order), or why there is none. */
export interface ShiftCovarianceFor {
  matrix: number[][] | null;
  /** Why `matrix` is null (stated in each fit's weighting note). */
  reason: string;
}

export function shiftCovarianceFor(
  result: Pick<ShiftResult, 'covariance'> | null | undefined,
  isothermIds: readonly string[],
): ShiftCovarianceFor {
  const cov = result?.covariance;
  if (!cov)
    return {
      matrix: null,
      reason:
        'the shift engine gave no covariance of the shifts (it is not computed for very many isotherms or when the fit cannot determine it)',
    };
  const at = new Map(cov.ids.map((id, k) => [id, k]));
  const rows = isothermIds.map((id) => at.get(id));
  if (rows.some((k) => k === undefined))
    return {
      matrix: null,
      reason: 'the shift engine gave no covariance for some of the fitted isotherms',
    };
  return {
    matrix: rows.map((a) => rows.map((b) => cov.log10aT[a as number][b as number])),
    reason: '',
  };
}
