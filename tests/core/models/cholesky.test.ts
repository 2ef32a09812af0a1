import { describe, expect, it } from 'vitest';
import { backSolve, choleskyFactor, forwardSolve } from '../../../core/models/cholesky';
import { expectAbsClose } from '../../helpers/assert-close';

describe('choleskyFactor()', () => {
  it('choleskyFactor() of [[4, 2], [2, 3]] is [[2, 0], [1, √2]] (worked by hand: l11 = √4, l21 = 2/2, l22 = √(3 − 1))', () => {
    const l = choleskyFactor([4, 2, 2, 3], 2)!;
    expect(Array.from(l)).toEqual([2, 0, 1, Math.SQRT2]);
  });

  it('forwardSolve() and backSolve() invert L and Lᵀ', () => {
    const a = [4, 2, 0.4, 2, 3, 0.5, 0.4, 0.5, 2];
    const l = choleskyFactor(a, 3)!;
    const x = backSolve(l, 3, forwardSolve(l, 3, [1, 2, 3]));
    // A·x = b
    [1, 2, 3].forEach((b, i) =>
      expectAbsClose(a[3 * i] * x[0] + a[3 * i + 1] * x[1] + a[3 * i + 2] * x[2], b, 1e-12),
    );
  });

  it('choleskyFactor() returns null for a matrix that is not positive definite, and checks the size', () => {
    expect(choleskyFactor([1, 2, 2, 1], 2)).toBeNull();
    expect(choleskyFactor([1, 0, 0, 0], 2)).toBeNull();
    expect(choleskyFactor([1, NaN, NaN, 1], 2)).toBeNull();
    expect(() => choleskyFactor([1, 2, 3], 2)).toThrow(/2×2/);
  });
});
