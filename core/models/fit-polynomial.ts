import { shiftFitStatistics } from './fit-statistics';
import { POLYNOMIAL_LAW } from './shift-laws';
import { glsLinearFit } from './gls-linear-fit';
import { resolveShiftFitOptions } from './shift-fit-options';
import { preparePoints } from './prepare-points';
import { weightingOfPoints } from './shift-weighting';
import type { PolynomialFit, ShiftFitOptions, ShiftPoint } from './types';

/**
 * Quadratic polynomial, log10 aT = a1 (T − Tr) + a2 (T − Tr)², through the origin (aT(Tr) = 1),
 * by closed-form (generalised) least squares. The form used with dynamic-modulus master curves
 * of asphalt mixtures (common practice).
 */
export function fitPolynomial(
  points: readonly ShiftPoint[],
  options: ShiftFitOptions,
): PolynomialFit {
  const o = resolveShiftFitOptions(options);
  const pts = preparePoints(points, o.referenceK);
  if (pts.temperatureK.length < 2) {
    throw new RangeError(
      'fitPolynomial needs at least two measured shift factors away from the reference temperature',
    );
  }
  const weighting = weightingOfPoints(pts, o.covariance, o.diagonalReason);
  const design = pts.temperatureK.map((T) => {
    const d = T - o.referenceK;
    return [d, d * d];
  });
  const coefficients = glsLinearFit(design, pts.log10aT, weighting);
  const ok = coefficients.every(Number.isFinite);
  const stats = shiftFitStatistics(
    POLYNOMIAL_LAW,
    coefficients,
    o.referenceK,
    pts,
    weighting,
    o.errorScaling,
    {
      converged: ok,
      iterations: 1,
      reason: ok
        ? 'Closed-form least squares.'
        : 'The temperatures do not determine both coefficients (need two distinct temperatures besides the reference).',
    },
    o.glassTransitionK,
  );
  return {
    ...stats,
    kind: 'polynomial',
    a1PerK: coefficients[0],
    a2PerK2: coefficients[1],
  };
}
