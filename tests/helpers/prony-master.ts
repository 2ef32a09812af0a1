/**
 * An exact master curve of a Prony series for the indicator tests: G′ and G″ at `n` log-spaced
 * reduced frequencies over [lo, hi], one isotherm, no outliers (Ferry 1980, ch. 3 forms).
 */
import type { AnalysisMasterCurve } from '../../core/pipeline/types';
import { pronyLoss, pronyStorage, type PronySeries } from '../../core/spectrum/prony-model';

export function pronyMasterCurve(
  p: PronySeries,
  lo = 1e-3,
  hi = 1e3,
  n = 61,
  temperatureK = 400,
): AnalysisMasterCurve {
  const x = Array.from({ length: n }, (_, i) => lo * (hi / lo) ** (i / (n - 1)));
  return {
    reducedX: x,
    quantities: {
      storageModulus: x.map((w) => pronyStorage(p, w)),
      lossModulus: x.map((w) => pronyLoss(p, w)),
    },
    isothermId: x.map(() => 'T01'),
    temperatureK: x.map(() => temperatureK),
    outlier: x.map(() => false),
  };
}
