import { shiftFitStatistics } from './fit-statistics';
import { glsLinearFit } from './gls-linear-fit';
import { resolveShiftFitOptions } from './shift-fit-options';
import { preparePoints } from './prepare-points';
import { ARRHENIUS_LAW, arrheniusSlope } from './shift-laws';
import { weightingOfPoints } from './shift-weighting';
import type { ArrheniusFit, ShiftFitOptions, ShiftPoint } from './types';

/**
 * Arrhenius fit, ln aT = (Ea/R)(1/T − 1/Tr): log10 aT is linear in Ea through the origin
 * (aT(Tr) = 1), so the (generalised) least-squares answer is closed form, with
 * x = 1000/(R ln10)·(1/T − 1/Tr) and Ea in kJ/mol. Weighted by the shift covariance when given.
 */
export function fitArrhenius(
  points: readonly ShiftPoint[],
  options: ShiftFitOptions,
): ArrheniusFit {
  const o = resolveShiftFitOptions(options);
  const pts = preparePoints(points, o.referenceK);
  if (pts.temperatureK.length < 1) {
    throw new RangeError(
      'fitArrhenius needs at least one measured shift factor away from the reference temperature',
    );
  }
  const weighting = weightingOfPoints(pts, o.covariance, o.diagonalReason);
  const x = pts.temperatureK.map((T) => [arrheniusSlope(T, o.referenceK)]);
  const [ea] = glsLinearFit(x, pts.log10aT, weighting);
  const stats = shiftFitStatistics(
    ARRHENIUS_LAW,
    [ea],
    o.referenceK,
    pts,
    weighting,
    o.errorScaling,
    {
      converged: Number.isFinite(ea),
      iterations: 1,
      reason: Number.isFinite(ea)
        ? 'Closed-form least squares.'
        : 'The temperatures do not determine Ea.',
    },
    o.glassTransitionK,
  );
  return { ...stats, kind: 'arrhenius', activationEnergyKJPerMol: ea };
}
