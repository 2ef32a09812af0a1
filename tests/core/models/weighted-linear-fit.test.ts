import { describe, expect, it } from 'vitest';
import { weightedLinearFit } from '../../../core/models/weighted-linear-fit';
import { expectAbsClose } from '../../helpers/assert-close';

describe('weightedLinearFit()', () => {
  it('weightedLinearFit() gives the hand-computed slope through the origin Σwxy/Σwx²', () => {
    // by hand: Σwxy = 1·1·2 + 2·2·3.9 + 1·3·6.3 = 36.5 ; Σwx² = 1 + 8 + 9 = 18 → 2.02777…
    const f = weightedLinearFit([[1], [2], [3]], [2, 3.9, 6.3], [1, 2, 1]);
    expectAbsClose(f.coefficients[0], 36.5 / 18, 1e-12);
    expectAbsClose(f.unscaledCovariance[0][0], 1 / 18, 1e-12);
    expectAbsClose(f.residuals[1], 3.9 - (2 * 36.5) / 18, 1e-12);
  });

  it('weightedLinearFit() returns NaN coefficients for a singular design (two equal columns)', () => {
    const f = weightedLinearFit([[1, 1], [2, 2], [3, 3]], [1, 2, 3], [1, 1, 1]); // prettier-ignore
    expect(f.coefficients.every(Number.isNaN)).toBe(true);
  });

  it('weightedLinearFit() rejects mismatched lengths', () => {
    expect(() => weightedLinearFit([[1], [2]], [1], [1, 1])).toThrow(/same length/);
  });
});
