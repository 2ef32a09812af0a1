import { fitLinearShiftLaw } from './fit-linear-law';
import { POLYNOMIAL_LAW } from './shift-laws';
import type { PolynomialFit, ShiftFitOptions, ShiftPoint } from './types';

/**
 * Quadratic polynomial, log10 aT = a1 (T − Tr) + a2 (T − Tr)², through the origin (aT(Tr) = 1),
 * by closed-form (generalised) least squares. The form used with dynamic-modulus master curves
 * of asphalt mixtures (common practice). The law is linear in its constants, so the fit is the
 * linear-law fit with the polynomial's own wording.
 */
export function fitPolynomial(
  points: readonly ShiftPoint[],
  options: ShiftFitOptions,
): PolynomialFit {
  const stats = fitLinearShiftLaw(POLYNOMIAL_LAW, points, options, {
    tooFewPoints:
      'fitPolynomial needs at least two measured shift factors away from the reference temperature',
    undetermined:
      'The temperatures do not determine both coefficients (need two distinct temperatures besides the reference).',
  });
  return {
    ...stats,
    kind: 'polynomial',
    a1PerK: stats.values[0],
    a2PerK2: stats.values[1],
  };
}
