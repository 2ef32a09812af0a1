import { shiftFitStatistics } from './fit-statistics';
import { resolveShiftFitOptions } from './shift-fit-options';
import { preparePoints } from './prepare-points';
import type { PolynomialFit, ShiftFitOptions, ShiftPoint } from './types';
import { weightedLinearFit } from './weighted-linear-fit';

/**
 * Quadratic polynomial, log10 aT = a1 (T − Tr) + a2 (T − Tr)², through the origin (aT(Tr) = 1),
 * by closed-form weighted least squares. The form used with dynamic-modulus master curves of
 * asphalt mixtures (common practice).
 */
export function fitPolynomial(
  points: readonly ShiftPoint[],
  options: ShiftFitOptions,
): PolynomialFit {
  const pts = preparePoints(points, options.referenceK);
  if (pts.temperatureK.length < 2) {
    throw new RangeError(
      'fitPolynomial needs at least two shift factors away from the reference temperature',
    );
  }
  const design = pts.temperatureK.map((T) => {
    const d = T - options.referenceK;
    return [d, d * d];
  });
  const lin = weightedLinearFit(
    design,
    pts.log10aT,
    pts.sigma.map((s) => 1 / (s * s)),
  );
  const ok = lin.coefficients.every(Number.isFinite);
  const stats = shiftFitStatistics(
    'polynomial',
    lin.coefficients,
    options.referenceK,
    pts,
    resolveShiftFitOptions(options).errorScaling,
    {
      converged: ok,
      iterations: 1,
      reason: ok
        ? 'Closed-form weighted least squares.'
        : 'The temperatures do not determine both coefficients (need two distinct temperatures besides the reference).',
    },
    options.glassTransitionK,
  );
  return {
    ...stats,
    kind: 'polynomial',
    a1PerK: lin.coefficients[0],
    a2PerK2: lin.coefficients[1],
  };
}
