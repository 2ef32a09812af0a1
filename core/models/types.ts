/**
 * Shared types of the shift-factor models (docs/conventions.md §3). Temperatures in kelvin inside;
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
  /** True when the shift was fixed by hand: not a measurement, so the fit leaves it out. */
  locked?: boolean;
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

/** How the shift points were weighted, and which were left out (exact or set by hand). */
export interface ShiftFitWeighting {
  /** 'full-covariance': generalised least squares with the engine's covariance; 'diagonal': each point by its own standard error. */
  kind: 'full-covariance' | 'diagonal';
  /** One sentence on the weighting (why diagonal, when it is). */
  note: string;
  /** Points left out on purpose (shifts fixed by hand), by temperature, with the reason. */
  leftOut: { temperatureK: number; reason: string }[];
}

/**
 * The kind of a shift model: the key it is registered under in the shift-model registry
 * (core/models/registry: `shiftModelKinds()` lists them in the order the app, the summary and the
 * exports show them). Built in: 'wlf', 'arrhenius', 'polynomial'; a new model adds its own.
 */
export type ShiftModelKind = string;

/** One constant of a shift law, in the order of the parameter vector. */
export interface ShiftLawParameter {
  /** Symbol as printed (C1, Ea, a1). */
  name: string;
  /** Unit of the value as fitted ('1' when dimensionless). */
  unit: string;
}

/**
 * A shift law: log10 aT(T) and its gradient with respect to the parameter vector (for the fits
 * and the delta-method band). Pure functions; temperatures in kelvin, aT(Tr) = 1.
 */
export interface ShiftLaw {
  kind: ShiftModelKind;
  parameters: readonly ShiftLawParameter[];
  /** log10 aT at `temperatureK` of the law with parameter vector `values`. */
  log10aT(values: readonly number[], referenceK: number, temperatureK: number): number;
  /** ∂ log10 aT / ∂ values at `temperatureK`, one entry per parameter. */
  gradient(values: readonly number[], referenceK: number, temperatureK: number): number[];
}

/**
 * A shift model that can be evaluated: `values` in the order of its law's parameters, e.g.
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
  /** Generalised sum of squared residuals rᵀΣ⁻¹r (Σ (r/σ)² with diagonal weights). */
  chiSquare: number;
  /** chiSquare / degreesOfFreedom: ≈ 1 when the scatter matches the standard errors. */
  reducedChiSquare: number;
  /** Weighted coefficient of determination about the weighted mean. */
  rSquared: number;
  /** Root mean square of the unweighted residuals, decades. */
  rmsResidual: number;
  /** Small-sample Akaike information criterion (from the weighted χ²); lower is better. */
  aicc: number;
  weighting: ShiftFitWeighting;
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

/** Options shared by the shift-model fits. */
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
  /**
   * Covariance of log10 aT between the points, decades², in the order of `points` (the shift
   * engine's estimate). With it the fit is generalised least squares; rows of locked and reference
   * points are not used. @default undefined (each point weighted by its own stdErr)
   */
  covariance?: readonly (readonly number[])[] | null;
  /** Why no covariance is given, stated in the result's weighting note. @default a generic sentence */
  diagonalReason?: string;
}
