import { invert, multiply, normalEquations } from './linear-algebra';

/** Result of a closed-form weighted linear least-squares fit. */
export interface WeightedLinearFit {
  coefficients: number[];
  /** (XᵀWX)⁻¹: the covariance when the weights are 1/σ² with true σ. */
  unscaledCovariance: number[][];
  residuals: number[];
  /** Σ w_i r_i². */
  weightedSumSquares: number;
}

/**
 * Minimises Σ w_i (y_i − Σ_k X_ik b_k)² in closed form (normal equations; fine for the two or
 * three columns the shift models need). Weights are statistical weights, w_i = 1/σ_i².
 */
export function weightedLinearFit(
  design: readonly number[][],
  y: readonly number[],
  weights: readonly number[],
): WeightedLinearFit {
  if (design.length !== y.length || y.length !== weights.length) {
    throw new RangeError(
      `design (${design.length} rows), y (${y.length}) and weights (${weights.length}) must have the same length`,
    );
  }
  const { matrix, vector } = normalEquations(design, weights, y);
  const unscaledCovariance = invert(matrix);
  const coefficients = multiply(unscaledCovariance, vector);
  const residuals = design.map(
    (row, i) => y[i] - row.reduce((s, x, k) => s + x * coefficients[k], 0),
  );
  const weightedSumSquares = residuals.reduce((s, r, i) => s + weights[i] * r * r, 0);
  return { coefficients, unscaledCovariance, residuals, weightedSumSquares };
}
