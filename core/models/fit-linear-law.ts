import { shiftFitStatistics } from './fit-statistics';
import { glsLinearFit } from './gls-linear-fit';
import { preparePoints } from './prepare-points';
import { resolveShiftFitOptions } from './shift-fit-options';
import { weightingOfPoints } from './shift-weighting';
import type { ShiftFitCommon, ShiftFitOptions, ShiftLaw, ShiftPoint } from './types';

/** A law's own wording for the two ways its fit can fail (defaults are generic). */
export interface LinearLawMessages {
  tooFewPoints?: string;
  undetermined?: string;
}

/**
 * The fit of any law linear in its constants (log10 aT = Σ_k b_k·x_k(T), x_k(Tr) = 0), for a new
 * model's descriptor: the law's gradient is its design row, and the constants come from the same
 * closed-form generalised least squares with the shift engine's covariance as the Arrhenius and
 * polynomial fits (glsLinearFit), with the same statistics (shiftFitStatistics).
 */
export function fitLinearShiftLaw(
  law: ShiftLaw,
  points: readonly ShiftPoint[],
  options: ShiftFitOptions,
  messages: LinearLawMessages = {},
): ShiftFitCommon {
  const o = resolveShiftFitOptions(options);
  const pts = preparePoints(points, o.referenceK);
  const p = law.parameters.length;
  if (pts.temperatureK.length < p) {
    throw new RangeError(
      messages.tooFewPoints ??
        `the ${law.kind} fit needs at least ${p} measured shift factor(s) away from the reference temperature`,
    );
  }
  const weighting = weightingOfPoints(pts, o.covariance, o.diagonalReason);
  const zeros = new Array<number>(p).fill(0);
  const design = pts.temperatureK.map((T) => law.gradient(zeros, o.referenceK, T));
  const coefficients = glsLinearFit(design, pts.log10aT, weighting);
  const ok = coefficients.every(Number.isFinite);
  return shiftFitStatistics(
    law,
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
        : (messages.undetermined ?? 'The temperatures do not determine the constants.'),
    },
    o.glassTransitionK,
  );
}
