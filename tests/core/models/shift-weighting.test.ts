import { describe, expect, it } from 'vitest';
import { shiftWeighting, weightingOfPoints } from '../../../core/models/shift-weighting';
import { invert } from '../../../core/models/linear-algebra';
import { expectAbsClose } from '../../helpers/assert-close';
import { pairShifts } from '../../helpers/pair-shifts';

const K = 273.15;
const T = [150, 160, 170, 180, 190, 200].map((c) => c + K);
const norm2 = (v: ArrayLike<number>): number => Array.from(v).reduce((s, x) => s + x * x, 0);

describe('shiftWeighting()', () => {
  it('shiftWeighting() without a covariance weights each point by 1/σ and says why', () => {
    const w = shiftWeighting([0.01, 0.02], null, 'none given');
    expect(w.kind).toBe('diagonal');
    expect(w.note).toBe('none given');
    expect(Array.from(w.whiten([0.01, 0.04]))).toEqual([1, 2]);
  });

  it('shiftWeighting() whitens so that ‖L⁻¹r‖² = rᵀΣ⁻¹r for a positive definite covariance', () => {
    const f = pairShifts({ temperaturesK: T, referenceK: 180 + K, pairNoiseDecades: 0.01 });
    // drop the reference row/column (zero variance): the rest is positive definite
    const keep = [0, 1, 2, 4, 5];
    const cov = keep.map((i) => keep.map((j) => f.covariance[i][j]));
    const w = shiftWeighting(
      keep.map((i) => Math.sqrt(f.covariance[i][i])),
      cov,
    );
    expect(w.kind).toBe('full-covariance');
    expect(w.constraint).toBeNull();
    const r = [0.01, -0.02, 0.005, 0.03, -0.01];
    const inv = invert(cov);
    const quad = r.reduce((s, a, i) => s + r.reduce((t, b, j) => t + a * inv[i][j] * b, 0), 0);
    expectAbsClose(norm2(w.whiten(r)) / quad, 1, 1e-9, 'rounding only');
  });

  it('shiftWeighting() finds the interpolated reference condition as the null vector of a singular covariance', () => {
    const f = pairShifts({ temperaturesK: T, referenceK: 185 + K, pairNoiseDecades: 0.01 });
    const w = shiftWeighting(
      T.map((_, i) => Math.sqrt(f.covariance[i][i])),
      f.covariance,
    );
    expect(w.kind).toBe('full-covariance');
    expect(w.independent).toBe(T.length - 1);
    const c = f.constraint;
    const cn = Math.hypot(...c);
    const dot = Array.from(w.constraint!).reduce((s, v, i) => s + (v * c[i]) / cn, 0);
    expectAbsClose(Math.abs(dot), 1, 1e-6, 'parallel to the Lagrange weights');
    // a model vector in the engine's convention obeys the condition
    const adjusted = w.adjust(T.map((t) => -0.01 * (t - 185 - K)));
    expectAbsClose(
      adjusted.reduce((s, v, i) => s + v * c[i], 0),
      0,
      1e-12,
    );
  });

  it('shiftWeighting() falls back to the diagonal, naming the reason, for a covariance it cannot use', () => {
    const sigma = [0.01, 0.01, 0.01];
    expect(shiftWeighting(sigma, [[1e-4, 0], [0, 1e-4]]).note).toMatch(/does not match/); // prettier-ignore
    const nan = [
      [1e-4, NaN, 0],
      [NaN, 1e-4, 0],
      [0, 0, 1e-4],
    ];
    expect(shiftWeighting(sigma, nan).note).toMatch(/undetermined/);
    const rankOne = [
      [1e-4, 1e-4, 1e-4],
      [1e-4, 1e-4, 1e-4],
      [1e-4, 1e-4, 1e-4],
    ];
    const w = shiftWeighting(sigma, rankOne);
    expect(w.kind).toBe('diagonal');
    expect(w.note).toMatch(/more than one exact condition/);
  });

  it('weightingOfPoints() picks the rows and columns of the kept points', () => {
    const cov = [
      [1, 0, 0],
      [0, 4e-4, 1e-4],
      [0, 1e-4, 4e-4],
    ];
    const w = weightingOfPoints({ index: [1, 2], sigma: [0.02, 0.02] }, cov);
    expect(w.kind).toBe('full-covariance');
    expect(w.sigma).toEqual([0.02, 0.02]);
  });
});
