import { describe, expect, it } from 'vitest';
import { offsetCovariance, offsetStdErrors } from '../../../core/shift/covariance';
import { referenceWeights } from '../../../core/shift/reference';
import type { SolveSettings } from '../../../core/shift/solve';
import { solveOffsets } from '../../../core/shift/solve';
import { expectRelClose } from '../../helpers/assert-close';
import { horizontalProblem, make, MELT_ARRHENIUS } from './fixtures';

describe('offsetStdErrors()', () => {
  const { dataset, truth } = make(MELT_ARRHENIUS, 0.02, 3);
  const n = dataset.isotherms.length;
  const p = horizontalProblem(dataset);
  const temps = dataset.isotherms.map((i) => i.temperatureK);
  const ref = referenceWeights([...Array(n).keys()], temps, MELT_ARRHENIUS.options.referenceK);
  const coef = new Float64Array(n);
  ref.coef.forEach((c, k) => (coef[k] = c));
  const settings: SolveSettings = {
    loss: 'huber',
    scale: 0.012,
    maxIterations: 30,
    fixed: new Uint8Array(n),
    constraints: [{ coef, rhs: 0 }],
    toleranceDecades: 1e-4,
    covariance: false,
  };
  const out = solveOffsets(p, truth.log10aT, settings);

  it('offsetStdErrors() equals the square root of the full covariance diagonal', () => {
    expect(out.uncertainty).toBeNull(); // not asked for
    const cov = offsetCovariance(p, out.theta, settings, out.residualVariance)!;
    const some = [0, 3, 9];
    const se = offsetStdErrors(p, out.theta, settings, out.residualVariance, some);
    some.forEach((c, i) => {
      expect(se[i]).toBeGreaterThan(0);
      // Same algebra in another order: equal to rounding.
      expectRelClose(se[i], Math.sqrt(cov[c * n + c]), 1e-9, `curve ${c}`);
    });
  });

  it('offsetStdErrors() gives NaN for a fixed parameter', () => {
    const fixed = new Uint8Array(n);
    fixed[2] = 1;
    const se = offsetStdErrors(p, out.theta, { ...settings, fixed }, out.residualVariance, [2]);
    expect(se[0]).toBeNaN();
  });
});
