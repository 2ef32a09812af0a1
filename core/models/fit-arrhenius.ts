import { shiftFitStatistics } from './fit-statistics';
import { resolveShiftFitOptions } from './shift-fit-options';
import { preparePoints } from './prepare-points';
import { arrheniusSlope } from './shift-model-eval';
import type { ArrheniusFit, ShiftFitOptions, ShiftPoint } from './types';
import { weightedLinearFit } from './weighted-linear-fit';

/**
 * Arrhenius fit, ln aT = (Ea/R)(1/T − 1/Tr): log10 aT is linear in Ea through the origin
 * (aT(Tr) = 1), so the weighted least-squares answer is closed form:
 * Ea = Σ w x y / Σ w x², x = 1000/(R ln10)·(1/T − 1/Tr), Ea in kJ/mol.
 */
export function fitArrhenius(
  points: readonly ShiftPoint[],
  options: ShiftFitOptions,
): ArrheniusFit {
  const pts = preparePoints(points, options.referenceK);
  if (pts.temperatureK.length < 1) {
    throw new RangeError(
      'fitArrhenius needs at least one shift factor away from the reference temperature',
    );
  }
  const x = pts.temperatureK.map((T) => [arrheniusSlope(T, options.referenceK)]);
  const lin = weightedLinearFit(
    x,
    pts.log10aT,
    pts.sigma.map((s) => 1 / (s * s)),
  );
  const ea = lin.coefficients[0];
  const stats = shiftFitStatistics(
    'arrhenius',
    [ea],
    options.referenceK,
    pts,
    resolveShiftFitOptions(options).errorScaling,
    {
      converged: Number.isFinite(ea),
      iterations: 1,
      reason: Number.isFinite(ea)
        ? 'Closed-form weighted least squares.'
        : 'The temperatures do not determine Ea.',
    },
    options.glassTransitionK,
  );
  return { ...stats, kind: 'arrhenius', activationEnergyKJPerMol: ea };
}
