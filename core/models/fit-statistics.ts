import { invert } from './linear-algebra';
import type { PreparedPoints } from './prepare-points';
import type { ShiftWeighting } from './shift-weighting';
import { studentTQuantile } from '../numeric/student-t';
import type { ErrorScaling, FitStatus, ShiftFitCommon, ShiftLaw } from './types';

/** The model's log10 aT at the points, in the weighting's convention (see ShiftWeighting.adjust). */
export function adjustedModel(
  law: ShiftLaw,
  values: readonly number[],
  referenceK: number,
  temperaturesK: readonly number[],
  weighting: ShiftWeighting,
): Float64Array {
  return weighting.adjust(temperaturesK.map((T) => law.log10aT(values, referenceK, T)));
}

/** Whitened Jacobian columns L⁻¹·P·∂g/∂θ_k of the adjusted model, one Float64Array per parameter. */
export function whitenedJacobian(
  law: ShiftLaw,
  values: readonly number[],
  referenceK: number,
  temperaturesK: readonly number[],
  weighting: ShiftWeighting,
): Float64Array[] {
  const rows = temperaturesK.map((T) => law.gradient(values, referenceK, T));
  return values.map((_, k) => weighting.whiten(weighting.adjust(rows.map((r) => r[k]))));
}

const dot = (a: ArrayLike<number>, b: ArrayLike<number>): number => {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
};

/**
 * Uncertainties and goodness of fit for a shift model at its fitted parameters, by generalised
 * least squares (Seber & Lee, Linear Regression Analysis, 2nd ed., 2003, §3.10): with whitened
 * residuals r̃ = L⁻¹P r and Jacobian J̃, the covariance is (J̃ᵀJ̃)⁻¹, scaled by χ²/(n_ind − p) under
 * 'residual' scaling (then Student's t with n_ind − p degrees of freedom, n_ind the independent
 * data), else taken as is with the normal quantile. With diagonal weights this is weighted least
 * squares. R² compares χ² with that of the best constant. AICc = χ² + 2p + 2p(p+1)/(n − p − 1)
 * (Burnham & Anderson, Model Selection and Multimodel Inference, 2nd ed., 2002, eq. 2.14, with χ²
 * in place of −2 ln L up to a constant).
 */
export function shiftFitStatistics(
  law: ShiftLaw,
  values: number[],
  referenceK: number,
  pts: PreparedPoints,
  weighting: ShiftWeighting,
  scaling: ErrorScaling,
  status: FitStatus,
  glassTransitionK?: number,
): ShiftFitCommon {
  const n = pts.temperatureK.length;
  const nInd = weighting.independent;
  const p = values.length;
  const model = adjustedModel(law, values, referenceK, pts.temperatureK, weighting);
  const res = pts.log10aT.map((y, i) => y - model[i]);
  const wr = weighting.whiten(res);
  const chiSquare = dot(wr, wr);
  const jac = whitenedJacobian(law, values, referenceK, pts.temperatureK, weighting);
  const dof = nInd - p;
  const reducedChiSquare = dof > 0 ? chiSquare / dof : NaN;
  const base = invert(jac.map((a) => jac.map((b) => dot(a, b))));
  const factor = scaling === 'residual' ? reducedChiSquare : 1;
  const covariance = base.map((row) => row.map((c) => c * factor));
  const tQuantile95 =
    scaling === 'residual' ? (dof > 0 ? studentTQuantile(0.975, dof) : NaN) : 1.959963984540054;
  // the best constant in the whitened metric (zero when the offset is fixed by the convention)
  const wy = weighting.whiten(pts.log10aT);
  const wOne = weighting.whiten(weighting.adjust(new Array<number>(n).fill(1)));
  const oneNorm = dot(wOne, wOne);
  const mean = oneNorm > 1e-12 * n ? dot(wOne, wy) / oneNorm : 0;
  const total = wy.reduce((s, v, i) => s + (v - mean * wOne[i]) ** 2, 0);
  const aicc = nInd - p - 1 > 0 ? chiSquare + 2 * p + (2 * p * (p + 1)) / (nInd - p - 1) : NaN;
  const warnings = [...pts.warnings];
  if (dof <= 0) {
    warnings.push({
      pointIndex: -1,
      message: `${nInd} independent shift factor(s) for ${p} constant(s): no degrees of freedom left, so no uncertainty can be given.`,
    });
  }
  return {
    ...status,
    kind: law.kind,
    referenceK,
    values,
    covariance,
    tQuantile95,
    fittedRangeK: pts.rangeK,
    glassTransitionK,
    parameters: values.map((v, k) => {
      const se = Math.sqrt(covariance[k][k]);
      return {
        name: law.parameters[k].name,
        unit: law.parameters[k].unit,
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
      normalised: res[i] / weighting.sigma[i],
    })),
    pointCount: n,
    degreesOfFreedom: dof,
    chiSquare,
    reducedChiSquare,
    rSquared: total > 0 ? 1 - chiSquare / total : NaN,
    rmsResidual: Math.sqrt(res.reduce((s, r) => s + r * r, 0) / n),
    aicc,
    weighting: { kind: weighting.kind, note: weighting.note, leftOut: [...pts.leftOut] },
    warnings,
  };
}
