import { describe, expect, it } from 'vitest';
import { luFactor, luInverse, luSolve } from '../../../core/shift/linear-solve';
import { expectAbsClose } from '../../helpers/assert-close';

describe('luFactor()', () => {
  it('luInverse() reproduces the exact inverse of the 3×3 Hilbert matrix', () => {
    // H_ij = 1/(i + j − 1); H⁻¹ = [[9, −36, 30], [−36, 192, −180], [30, −180, 180]] (closed form,
    // Hilbert 1894; the integer inverse is a standard worked example in numerical analysis texts).
    const h = Float64Array.from([1, 1 / 2, 1 / 3, 1 / 2, 1 / 3, 1 / 4, 1 / 3, 1 / 4, 1 / 5]);
    const inv = luInverse(luFactor(h, 3));
    const exact = [9, -36, 30, -36, 192, -180, 30, -180, 180];
    exact.forEach((v, i) => expectAbsClose(inv[i], v, 1e-9, `H⁻¹[${i}]`));
  });

  it('luSolve() solves a system that needs pivoting (zero leading entry, KKT-like)', () => {
    // [[0, 1], [1, 0]] x = [2, 3] → x = [3, 2] (analytic).
    const f = luFactor(Float64Array.from([0, 1, 1, 0]), 2);
    expect(f.singular).toBe(false);
    expect(Array.from(luSolve(f, [2, 3]))).toEqual([3, 2]);
  });

  it('luFactor() reports a singular matrix', () => {
    expect(luFactor(Float64Array.from([1, 2, 2, 4]), 2).singular).toBe(true);
    expect(luFactor(new Float64Array(0), 0).singular).toBe(false);
  });
});
