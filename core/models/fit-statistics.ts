import { modelGradient, modelLog10aT } from './shift-model-eval';
import { invert, normalEquations } from './linear-algebra';
import type { PreparedPoints } from './prepare-points';
import { studentTQuantile } from './student-t';
import type { ErrorScaling, FitStatus, ShiftFitCommon, ShiftModelKind } from './types';

const NAMES: Record<ShiftModelKind, [string, string][]> = {
  wlf: [
    ['C1', '1'],
    ['C2', 'K'],
  ],
  arrhenius: [['Ea', 'kJ/mol']],
  polynomial: [
    ['a1', '1/K'],
    ['a2', '1/K²'],
  ],
};

/**
 * Uncertainties and goodness of fit for a shift model at its fitted parameters: covariance from
 * the Jacobian, (JᵀWJ)⁻¹, scaled by the reduced χ² under 'residual' scaling (then Student's t with
 * n − p degrees of freedom), else taken as is with the normal quantile. R² is weighted, about the
 * weighted mean. AICc = χ² + 2p + 2p(p+1)/(n−p−1) (Burnham & Anderson, Model Selection and
 * Multimodel Inference, 2nd ed., 2002, eq. 2.14, with χ² in place of −2 ln L up to a constant).
 */
export function shiftFitStatistics(
  kind: ShiftModelKind,
  values: number[],
  referenceK: number,
  pts: PreparedPoints,
  scaling: ErrorScaling,
  status: FitStatus,
  glassTransitionK?: number,
): ShiftFitCommon {
  const n = pts.temperatureK.length;
  const p = values.length;
  const w = pts.sigma.map((s) => 1 / (s * s));
  const model = pts.temperatureK.map((T) => modelLog10aT(kind, values, referenceK, T));
  const res = pts.log10aT.map((y, i) => y - model[i]);
  const jac = pts.temperatureK.map((T) => modelGradient(kind, values, referenceK, T));
  const chiSquare = res.reduce((s, r, i) => s + w[i] * r * r, 0);
  const dof = n - p;
  const reducedChiSquare = dof > 0 ? chiSquare / dof : NaN;
  const base = invert(normalEquations(jac, w, res).matrix);
  const factor = scaling === 'residual' ? reducedChiSquare : 1;
  const covariance = base.map((row) => row.map((c) => c * factor));
  const tQuantile95 =
    scaling === 'residual' ? (dof > 0 ? studentTQuantile(0.975, dof) : NaN) : 1.959963984540054;
  const wSum = w.reduce((a, b) => a + b, 0);
  const yMean = pts.log10aT.reduce((s, y, i) => s + w[i] * y, 0) / wSum;
  const total = pts.log10aT.reduce((s, y, i) => s + w[i] * (y - yMean) ** 2, 0);
  const aicc = dof > 1 ? chiSquare + 2 * p + (2 * p * (p + 1)) / (n - p - 1) : NaN;
  const warnings = [...pts.warnings];
  if (dof <= 0) {
    warnings.push({
      pointIndex: -1,
      message: `${n} shift factors for ${p} constants: no degrees of freedom left, so no uncertainty can be given.`,
    });
  }
  return {
    ...status,
    kind,
    referenceK,
    values,
    covariance,
    tQuantile95,
    fittedRangeK: pts.rangeK,
    glassTransitionK,
    parameters: values.map((v, k) => {
      const se = Math.sqrt(covariance[k][k]);
      return {
        name: NAMES[kind][k][0],
        unit: NAMES[kind][k][1],
        value: v,
        stdErr: se,
        ci95: [v - tQuantile95 * se, v + tQuantile95 * se],
      };
    }),
    residuals: pts.temperatureK.map((T, i) => ({
      temperatureK: T,
      log10aT: pts.log10aT[i],
      model: model[i],
      residual: res[i],
      normalised: res[i] / pts.sigma[i],
    })),
    pointCount: n,
    degreesOfFreedom: dof,
    chiSquare,
    reducedChiSquare,
    rSquared: total > 0 ? 1 - chiSquare / total : NaN,
    rmsResidual: Math.sqrt(res.reduce((s, r) => s + r * r, 0) / n),
    aicc,
    warnings,
  };
}
