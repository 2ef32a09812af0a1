/**
 * Shared types of the shift-factor models (DOMAIN.md §3). Temperatures in kelvin inside;
 * log10 aT follows the convention ω_r = aT·ω, log10 aT < 0 above the reference temperature.
 */

/** One shift factor from the shift engine: per-temperature log10 aT with its standard error. */
export interface ShiftPoint {
  /** Isotherm temperature, K. */
  temperatureK: number;
  /** Horizontal shift factor, decades (log10 aT). */
  log10aT: number;
  /** Standard error of log10 aT, decades. Zero, NaN or missing values are guarded (see warnings). */
  stdErr?: number;
}

/** A problem with one input point that was handled, not fatal. `pointIndex` is 0-based. */
export interface FitWarning {
  /** Index of the point in the array passed in, or −1 when the warning concerns the whole fit. */
  pointIndex: number;
  message: string;
}

/** One fitted parameter with its uncertainty. */
export interface ParameterEstimate {
  name: string;
  unit: string;
  value: number;
  /** Standard error, same unit as `value`. */
  stdErr: number;
  /** Two-sided 95 % confidence interval (t-distribution with the fit's degrees of freedom). */
  ci95: [number, number];
}

/** Residual of one point: measured minus model, decades. */
export interface ShiftResidual {
  temperatureK: number;
  log10aT: number;
  model: number;
  residual: number;
  /** residual / stdErr used in the fit (dimensionless). */
  normalised: number;
}

/** Which law, and its parameter vector in a fixed order (the order of the covariance matrix). */
export type ShiftModelKind = 'wlf' | 'arrhenius' | 'polynomial';

/**
 * A shift model that can be evaluated: `values` are
 * - wlf: [C1, C2 (K)]
 * - arrhenius: [Ea (kJ/mol)]
 * - polynomial: [a1 (1/K), a2 (1/K²)]   (log10 aT = a1 (T−Tr) + a2 (T−Tr)²)
 * `covariance` (same order) is optional: without it no band can be drawn.
 */
export interface ShiftModelSpec {
  kind: ShiftModelKind;
  referenceK: number;
  values: number[];
  covariance?: number[][];
  /** Two-sided 95 % quantile to use for the band; 1.96 when absent. */
  tQuantile95?: number;
  /** Temperature range the constants were fitted over, K; used for extrapolation flags. */
  fittedRangeK?: [number, number];
  /** Glass transition temperature, K, when the user gave one (WLF must not be used below it). */
  glassTransitionK?: number;
}

/** Status of an iterative or closed-form fit (STYLE.md). */
export interface FitStatus {
  converged: boolean;
  iterations: number;
  /** Why the fit stopped, in words a lab user can read. */
  reason: string;
}

/** Everything a shift-model fit reports besides its own named constants. */
export interface ShiftFitCommon extends FitStatus {
  kind: ShiftModelKind;
  referenceK: number;
  values: number[];
  covariance: number[][];
  tQuantile95: number;
  fittedRangeK: [number, number];
  glassTransitionK?: number;
  parameters: ParameterEstimate[];
  residuals: ShiftResidual[];
  /** Number of points used (the point at the reference temperature, exact by definition, is not counted). */
  pointCount: number;
  degreesOfFreedom: number;
  /** Weighted sum of squared residuals Σ (r/σ)². */
  chiSquare: number;
  /** chiSquare / degreesOfFreedom: ≈ 1 when the scatter matches the standard errors. */
  reducedChiSquare: number;
  /** Weighted coefficient of determination about the weighted mean. */
  rSquared: number;
  /** Root mean square of the unweighted residuals, decades. */
  rmsResidual: number;
  /** Small-sample Akaike information criterion (from the weighted χ²); lower is better. */
  aicc: number;
  warnings: FitWarning[];
}

export interface WlfFit extends ShiftFitCommon {
  kind: 'wlf';
  c1: number;
  c2K: number;
}

export interface ArrheniusFit extends ShiftFitCommon {
  kind: 'arrhenius';
  activationEnergyKJPerMol: number;
}

export interface PolynomialFit extends ShiftFitCommon {
  kind: 'polynomial';
  a1PerK: number;
  a2PerK2: number;
}

export type ShiftModelFit = WlfFit | ArrheniusFit | PolynomialFit;

/** How parameter uncertainties are scaled. */
export type ErrorScaling = 'residual' | 'reported';

/** Options shared by the three shift-model fits. */
export interface ShiftFitOptions {
  /** Reference temperature, K. Required. */
  referenceK: number;
  /** Glass transition temperature, K, if known; stored on the result for range checks. @default undefined */
  glassTransitionK?: number;
  /**
   * 'residual': covariance scaled by the reduced χ², intervals from Student's t with the fit's
   * degrees of freedom (use when the shift errors are only relative). 'reported': the standard
   * errors are taken as true σ, no scaling, normal quantile 1.96.
   * @default 'residual'
   */
  errorScaling?: ErrorScaling;
}
