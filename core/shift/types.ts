/**
 * Shared types of the shift engine: options, result and the internal fit problem.
 * Conventions (docs/conventions.md §2): ω_r = aT·ω, t_r = t/aT, aT(Tref) = 1, log10 aT < 0 above Tref;
 * reduced modulus = bT × measured, reduced compliance = measured / bT,
 * reduced |η*| = |η*|·bT/aT; tan δ and δ carry no vertical shift.
 */
import type { QuantityId } from '../data/types';

/**
 * How the vertical shift factor bT is obtained: 'auto' decides from the data (docs/shifting.md,
 * "Vertical shift bT"); the others force one way.
 */
export type VerticalMode = 'auto' | 'none' | 'density' | 'data';

/** The vertical-shift mode actually applied, and why. */
export interface VerticalChoice {
  requested: VerticalMode;
  chosen: 'none' | 'density' | 'data';
  /** One sentence for the user: what was applied and the evidence. */
  reason: string;
  /** αV of the entropic law (given, or fitted to the moduli), 1/K; null when none. */
  expansionPerK: number | null;
  /** Standard error of a fitted αV, 1/K; null when given or not fitted. */
  expansionStdErr: number | null;
  /** Largest |log10 bT| over the measured temperatures that the data (or density) imply, decades. */
  effectDecades: number | null;
  /** How many standard errors the data's bT lies from bT ≡ 1; null when not estimated. */
  z: number | null;
  /**
   * How much the weighted squares of the shifted curves drop with the data's bT, in residual
   * variances (the evidence 'auto' weighs); absent when not estimated.
   */
  chi2Drop?: number;
}

/** Why an isotherm is not part of the master curve (a stable code and a sentence). */
export interface LeftOut {
  code:
    | 'excluded'
    | 'no-overlap'
    | 'disconnected-group'
    | 'too-few-isotherms'
    | 'no-data'
    | 'no-vertical-shift';
  message: string;
}

/** Density of the sample, for the entropic bT = Tref·ρref / (T·ρ(T)) (Ferry 1980). */
export type DensityInput =
  | {
      kind: 'expansion';
      /**
       * Density at the reference temperature, kg/m³, for the record only: bT depends on αV
       * alone (ρref cancels). @default undefined
       */
      referenceDensityKgPerM3?: number;
      /** Volumetric thermal expansion coefficient αV, 1/K: ρ(T) = ρref / (1 + αV (T − Tref)). */
      volumetricExpansionPerK: number;
    }
  | {
      kind: 'table';
      /** Measured densities; linearly interpolated in T (extrapolated with a warning). */
      points: { temperatureK: number; densityKgPerM3: number }[];
    };

/** Robust loss applied to every pair residual (in decades). */
export type RobustLoss = 'none' | 'huber' | 'cauchy';

/** A shift the user fixed by hand: kept as given while the others are re-fitted around it. */
export interface LockedShift {
  /** Isotherm id. */
  id: string;
  /** log10 aT relative to the reference temperature, decades. */
  log10aT: number;
}

export interface ShiftOptions {
  /** Reference temperature Tref, K. Any temperature, measured or not. */
  referenceK: number;
  /**
   * Quantities that drive the horizontal shift. @default chosen from the data: relaxation →
   * ['relaxationModulus'], creep → ['creepCompliance']; oscillatory with vertical 'data' →
   * ['tanDelta'] (free of bT); oscillatory otherwise → ['storageModulus', 'lossModulus'] when both
   * are present, else the first present of tanDelta, complexModulus, phaseAngle.
   */
  drivers?: QuantityId[];
  /**
   * Vertical shift: decided from the data ('auto'), none, entropic from density, or estimated from
   * the data. With 'auto' and a density given, the density is used. @default 'auto'
   */
  vertical?: VerticalMode;
  /** Density (αV) for vertical 'density'. Required in that mode; used by 'auto' when given. @default undefined */
  density?: DensityInput;
  /** Isotherm ids left out of the fit (reported with included = false). @default [] */
  excluded?: string[];
  /** Shifts fixed by hand, relative to Tref. @default [] */
  locked?: LockedShift[];
  /**
   * Warm start: log10 aT per isotherm id (relative to Tref). Ids present skip the initial scan
   * (all active isotherms must be given for the scan to be skipped). @default undefined
   */
  initialLog10aT?: Record<string, number>;
  /**
   * With vertical 'auto' or 'data': take bT from the entropic law with this αV (1/K, and its
   * standard error) instead of fitting αV again, or keep bT = 1 when expansionPerK is null — for
   * live re-fits while a curve is dragged, which keep the last full fit's choice. Ignored with
   * 'none', 'density' or a given density. @default undefined
   */
  heldExpansion?: HeldExpansion;
  /** Robust loss on pair residuals. @default 'huber' */
  robustLoss?: RobustLoss;
  /**
   * Scale of the robust loss, decades. @default undefined = 1.345 × the robust (MAD) spread of the
   * residuals at the start of each pass (Huber's 95 %-efficiency constant), at least 0.005 decades.
   */
  robustScaleDecades?: number;
  /** Flag points whose residual exceeds this many robust standard deviations. @default 4 */
  outlierThreshold?: number;
  /** Flag outliers and re-fit without them. @default true */
  flagOutliers?: boolean;
  /** A pair carries information only with at least this many points in the overlap. @default 4 */
  minOverlapPoints?: number;
  /**
   * Curves denser than this (points per decade of x) are averaged into bins of 1/this decade
   * before fitting (each bin weighted by its point count). @default 40
   */
  maxPointsPerDecade?: number;
  /**
   * The scan assumes aT falls with temperature (common practice for polymers) and searches the
   * opposite direction only this far, decades. @default 0.5
   */
  reverseAllowanceDecades?: number;
  /** Scan step for the starting values, decades. @default 0.05 */
  scanStepDecades?: number;
  /** Iteration limit of the joint refinement. @default 60 */
  maxIterations?: number;
  /**
   * The refinement stops when no shift moves by more than this, decades. The default (0.2 % in
   * aT) is about a tenth of typical standard errors; lower it for noise-free data. @default 0.001
   */
  toleranceDecades?: number;
  /** Run the superposition checks (van Gurp–Palmen, per-quantity disagreement). @default true */
  checks?: boolean;
}

export type ResolvedShiftOptions = Required<
  Omit<
    ShiftOptions,
    'density' | 'initialLog10aT' | 'heldExpansion' | 'robustScaleDecades' | 'drivers'
  >
> & {
  drivers: QuantityId[];
  density: DensityInput | null;
  initialLog10aT: Record<string, number> | null;
  heldExpansion: HeldExpansion | null;
  robustScaleDecades: number | null;
};

/** The vertical shift of the last full fit, kept during a live re-fit (ShiftOptions.heldExpansion). */
export interface HeldExpansion {
  /** αV of the entropic bT, 1/K; null: the last full fit applied no bT (bT = 1). */
  expansionPerK: number | null;
  expansionStdErr: number | null;
}

/** Stable warning codes; see docs/shifting.md. */
export type ShiftWarningCode =
  | 'no-data'
  | 'too-few-isotherms'
  | 'no-overlap'
  | 'disconnected-group'
  | 'reference-extrapolated'
  | 'locks-conflict-reference'
  | 'free-vertical-shift'
  | 'density-extrapolated'
  | 'poor-superposition'
  | 'fair-superposition'
  | 'quantities-disagree'
  | 'outliers-flagged'
  | 'not-converged'
  | 'bad-values'
  | 'large-uncertainty'
  | 'vertical-shift-ignored'
  | 'no-shift-information';

export interface ShiftWarning {
  code: ShiftWarningCode;
  message: string;
}

export interface CurveShift {
  id: string;
  temperatureK: number;
  /** log10 aT relative to Tref, decades; null when the isotherm is not shifted. */
  log10aT: number | null;
  /** Standard error of log10aT relative to Tref, decades (0 for locked or the reference itself). */
  log10aTStdErr: number | null;
  /** log10 bT, decades (0 with vertical 'none'); null when the isotherm is not shifted. */
  log10bT: number | null;
  /** Standard error of log10bT, decades (0 when bT comes from a formula). */
  log10bTStdErr: number | null;
  /** True when the isotherm is part of the master curve. */
  included: boolean;
  /** True when excluded by the user. */
  excluded: boolean;
  /** True when no other isotherm overlaps it: it carries no shift information. */
  overlapsNothing: boolean;
  /** True when its shift was fixed by hand. */
  locked: boolean;
  /** RMS of its residuals against the overlapping isotherms after shifting, decades. */
  rmsResidualDecades: number | null;
  /** Indices (into the isotherm's points) flagged as outliers and left out of the fit. */
  outlierPoints: number[];
  /** Why it is not part of the master curve; null when it is included. */
  leftOut: LeftOut | null;
}

export type SuperpositionGrade = 'good' | 'fair' | 'poor' | 'unknown';

export interface ShiftChecks {
  /**
   * van Gurp–Palmen dispersion: RMS difference of δ between isotherms at equal |G*| (after bT),
   * degrees; null without oscillatory G' and G'' (or δ and |G*|).
   */
  vanGurpPalmenRmsDeg: number | null;
  /** The same divided by the value noise alone would give (≈ 1 when superposition holds). */
  vanGurpPalmenRatio: number | null;
  /** Largest |log10 aT from one quantity − from another| over included isotherms, decades. */
  quantityDisagreementDecades: number | null;
  /**
   * The same divided by the combined standard error of the two estimates; null when the
   * difference is at most 0.05 decades (it cannot affect the grade then, so it is not computed).
   */
  quantityDisagreementZ: number | null;
  /** Quantities compared, e.g. ['storageModulus', 'lossModulus']. */
  quantitiesCompared: QuantityId[];
  /** Overall RMS residual after shifting divided by the value noise alone would give. */
  mismatchRatio: number | null;
  /** Noise level estimated inside each curve (local quadratic fits), decades. */
  noiseDecades: number | null;
  grade: SuperpositionGrade;
  /** Superposition quality acceptable (grade good or fair). */
  superpositionOk: boolean;
}

export interface FitInfo {
  converged: boolean;
  iterations: number;
  reason: string;
  /** Passes of the fit (a second one after outlier flagging). */
  passes: number;
  /** True when the scan was skipped because all starting values were given. */
  warmStart: boolean;
}

/**
 * Covariance of the shifts of the included isotherms, for fits that weight them together (e.g.
 * generalised least squares of WLF or Arrhenius constants on log10 aT). Relative to Tref, like
 * the standard errors: rows and columns of locked isotherms and of an isotherm measured at Tref
 * are 0. Its diagonal is log10aTStdErr².
 */
export interface ShiftCovariance {
  /** Isotherm ids of the rows and columns: every included isotherm, in `curves` order. */
  ids: string[];
  /** Covariance of log10 aT, decades², ids.length × ids.length. */
  log10aT: number[][];
}

export interface ShiftResult {
  referenceK: number;
  /** Sign convention, repeated for every consumer of the JSON. */
  convention: string;
  /** 'frequency' (ω_r = aT·ω) or 'time' (t_r = t/aT). */
  abscissa: 'angularFrequency' | 'time';
  curves: CurveShift[];
  /** RMS of all residuals after shifting, decades. */
  rmsResidualDecades: number | null;
  checks: ShiftChecks;
  /**
   * Covariance of log10 aT between the included isotherms; null when it cannot be determined or
   * when more than COVARIANCE_MAX_ISOTHERMS (1000) are included (its size grows as their number
   * squared; the standard errors are given at any size).
   */
  covariance: ShiftCovariance | null;
  warnings: ShiftWarning[];
  settings: ResolvedShiftOptions;
  fit: FitInfo;
  /** The vertical-shift mode applied and why. */
  vertical: VerticalChoice;
}
