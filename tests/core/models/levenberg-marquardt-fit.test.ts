import { describe, expect, it } from 'vitest';
import { levenbergMarquardtFit } from '../../../core/models/levenberg-marquardt-fit';
import { weightedLinearFit } from '../../../core/models/weighted-linear-fit';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

/** Closed-form weighted straight line (any statistics text, e.g. Bevington & Robinson 2003, §6.3). */
function closedFormLine(x: number[], y: number[], w: number[]): [number, number] {
  let s = 0, sx = 0, sy = 0, sxx = 0, sxy = 0; // prettier-ignore
  x.forEach((xi, i) => {
    s += w[i];
    sx += w[i] * xi;
    sy += w[i] * y[i];
    sxx += w[i] * xi * xi;
    sxy += w[i] * xi * y[i];
  });
  const d = s * sxx - sx * sx;
  return [(sxx * sy - sx * sxy) / d, (s * sxy - sx * sy) / d];
}

/** Six points on a rough line whose last point weighs ten times the others (invented). */
const HEAVY_LAST = {
  x: [0, 1, 2, 3, 4, 5],
  y: [0.1, 1.2, 1.9, 3.2, 3.9, 6.0],
  w: [1, 1, 1, 1, 1, 10],
};

/** Straight line p + q·t fitted by levenbergMarquardtFit from (0, 0). */
function fitLine({ x, y, w }: { x: number[]; y: number[]; w: number[] }) {
  return levenbergMarquardtFit({
    x,
    y,
    weights: w,
    model:
      ([p, q]) =>
      (t) =>
        p + q * t,
    initial: [0, 0],
  });
}

describe('levenbergMarquardtFit()', () => {
  it('levenbergMarquardtFit() matches the closed-form weighted line with weights [1,1,1,1,1,10] (guards the ml-levenberg-marquardt 5.0.1 pin)', () => {
    const { x, y, w } = HEAVY_LAST;
    const [a, b] = closedFormLine(x, y, w);
    const fit = fitLine(HEAVY_LAST);
    expect(fit.converged).toBe(true);
    // the heavy last point must pull the line: unweighted and weighted answers differ by > 0.05
    const [a1, b1] = closedFormLine(x, y, [1, 1, 1, 1, 1, 1]);
    expect(Math.abs(b - b1)).toBeGreaterThan(0.05);
    expectAbsClose(fit.params[0], a, 1e-8, 'intercept'); // iterative vs closed form, rounding only
    expectAbsClose(fit.params[1], b, 1e-8, 'slope');
    expect(Math.abs(fit.params[0] - a1)).toBeGreaterThan(1e-3);
  });

  it('levenbergMarquardtFit() covariance equals the closed-form (XᵀWX)⁻¹·s² of a weighted line', () => {
    const { x, y, w } = HEAVY_LAST;
    const fit = fitLine(HEAVY_LAST);
    const lin = weightedLinearFit(
      x.map((t) => [1, t]),
      y,
      w,
    );
    const s2 = lin.weightedSumSquares / (x.length - 2);
    for (let a = 0; a < 2; a++) {
      for (let b = 0; b < 2; b++)
        expectRelClose(fit.covariance[a][b], lin.unscaledCovariance[a][b] * s2, 1e-6); // finite-difference Jacobian
    }
  });

  it('levenbergMarquardtFit() recovers an exponential decay from exact data', () => {
    const x = Array.from({ length: 20 }, (_, i) => i * 0.5);
    const y = x.map((t) => 3 * Math.exp(-0.7 * t) + 0.5);
    const fit = levenbergMarquardtFit({
      x,
      y,
      model:
        ([a, k, c]) =>
        (t) =>
          a * Math.exp(-k * t) + c,
      initial: [1, 0.2, 0],
    });
    expect(fit.converged).toBe(true);
    expectRelClose(fit.params[0], 3, 1e-6, 'amplitude'); // exact data: solver precision
    expectRelClose(fit.params[1], 0.7, 1e-6, 'rate');
    expectRelClose(fit.params[2], 0.5, 1e-6, 'offset');
  });

  it('levenbergMarquardtFit() reports converged=false when the iteration budget is too small', () => {
    const x = Array.from({ length: 20 }, (_, i) => i * 0.5);
    const y = x.map((t) => 3 * Math.exp(-0.7 * t));
    const fit = levenbergMarquardtFit(
      {
        x,
        y,
        model:
          ([a, k]) =>
          (t) =>
            a * Math.exp(-k * t),
        initial: [0.1, 5],
      },
      { maxIterations: 1, roundIterations: 1 },
    );
    expect(fit.converged).toBe(false);
    expect(fit.reason).toMatch(/without meeting its tolerance/);
  });

  /** A noisy exponential decay (seeded): a fit with a real, non-zero residual. */
  const noisyDecay = () => {
    let u = 7;
    const x = Array.from({ length: 30 }, (_, i) => i * 0.3);
    const y = x.map((t) => {
      u = (u * 16807) % 2147483647; // Park & Miller minimal standard generator
      return 3 * Math.exp(-0.7 * t) + 0.02 * (u / 2147483647 - 0.5);
    });
    return {
      x,
      y,
      model:
        ([a, k]: number[]) =>
        (t: number) =>
          a * Math.exp(-k * t),
      initial: [1, 0.2],
    };
  };

  it('levenbergMarquardtFit() says converged only with the Bates–Watts relative offset under its tolerance (Bates & Watts, Technometrics 23, 1981)', () => {
    const fit = levenbergMarquardtFit(noisyDecay());
    expect(fit.converged).toBe(true);
    expect(fit.relativeOffset).toBeLessThanOrEqual(1e-3);
    expect(fit.reason).toMatch(/^Converged/);
  });

  it('levenbergMarquardtFit() reports a stall that misses its tolerance as converged=false with the reason', () => {
    // 1e-14 is below what the finite-difference Jacobian can resolve: the rounds stop improving
    const fit = levenbergMarquardtFit(noisyDecay(), { offsetTolerance: 1e-14 });
    expect(fit.converged).toBe(false);
    expect(fit.reason).toMatch(/stalled|used its/);
    expect(fit.reason).toMatch(/without meeting its tolerance/);
  });

  it('levenbergMarquardtFit() rejects bad calls, naming the parameter', () => {
    const model =
      ([a]: number[]) =>
      (t: number) =>
        a * t;
    expect(() => levenbergMarquardtFit({ x: [1, 2], y: [1], model, initial: [1] })).toThrow(
      /same length/,
    );
    expect(() => levenbergMarquardtFit({ x: [1], y: [1], model, initial: [1] })).toThrow(
      /at least 2/,
    );
    expect(() =>
      levenbergMarquardtFit({ x: [1, 2], y: [1, 2], weights: [1, 0], model, initial: [1] }),
    ).toThrow(/weights\[1\]/);
    expect(() => levenbergMarquardtFit({ x: [1, 2], y: [1, 2], model, initial: [NaN] })).toThrow(
      /initial/,
    );
    expect(() =>
      levenbergMarquardtFit({ x: [1, 2], y: [1, 2], model, initial: [1] }, { maxIterations: 0 }),
    ).toThrow(/maxIterations/);
  });
});
