import { quadraticForm } from './linear-algebra';
import { shiftModel } from './registry';
import type { ShiftModelSpec } from './types';

/** The predicted log10 aT with its pointwise 95 % confidence band, decades. */
export interface BandPoint {
  temperatureK: number;
  log10aT: number;
  /** Standard error of the predicted log10 aT (delta method, full covariance), decades. */
  stdErr: number;
  lower95: number;
  upper95: number;
}

/**
 * Pointwise confidence band of the fitted curve by the delta method with the full parameter
 * covariance: var = gᵀ C g with g = ∂ log10 aT/∂ params. For WLF, C1 and C2 are strongly
 * correlated; their separate intervals overstate the uncertainty of the curve, this band does not.
 * Without a covariance the band collapses to the curve (stdErr NaN).
 */
export function shiftModelBand(
  model: ShiftModelSpec,
  temperaturesK: ArrayLike<number>,
): BandPoint[] {
  const t = model.tQuantile95 ?? 1.959963984540054;
  const { law } = shiftModel(model.kind);
  return Array.from(temperaturesK, (T) => {
    const y = law.log10aT(model.values, model.referenceK, T);
    const se = model.covariance
      ? Math.sqrt(
          Math.max(
            0,
            quadraticForm(model.covariance, law.gradient(model.values, model.referenceK, T)),
          ),
        )
      : NaN;
    const half = Number.isNaN(se) ? 0 : t * se;
    return { temperatureK: T, log10aT: y, stdErr: se, lower95: y - half, upper95: y + half };
  });
}
