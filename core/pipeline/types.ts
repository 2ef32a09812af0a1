/**
 * The result of one analysis: everything the CLI, the desktop app and the report show, as plain
 * JSON-serialisable data (numbers that could not be determined are `null`, never NaN).
 * Units are SI and carried in the names; temperatures in kelvin.
 *
 * Conventions (docs/conventions.md §2): reduced frequency ω_r = aT·ω, reduced time t_r = t/aT,
 * aT(Tref) = 1, log10 aT < 0 above Tref; reduced modulus = bT × measured modulus,
 * bT = Tref·ρref/(T·ρ(T)), bT(Tref) = 1.
 */
import type { AbscissaKind, Dataset, DeformationMode, QuantityId, TestKind } from '../data/types';
import type { ShiftModelKind, ShiftModelSpec } from '../models/types';
import type { WlfDerived } from '../models';
import type { CurveShift, LeftOut, VerticalChoice } from '../shift/types';
import type { ResolvedAnalysisOptions } from './options';

/** A problem found while analysing, shown to users; file/row/column when it concerns lab data. */
export interface AnalysisWarning {
  /** Stable machine-readable code, e.g. `superposition-poor`, `import`. */
  code: string;
  /** A sentence a lab technician understands. */
  message: string;
  file?: string;
  /** 1-based row in `file`. */
  row?: number;
  /** 1-based column in `file`. */
  column?: number;
  /** The isotherm the warning concerns. */
  isothermId?: string;
  /** The model the warning concerns (e.g. `wlf`, `prony`, `carreau-yasuda`). */
  model?: string;
}

/**
 * The shift of one isotherm: the shift engine's figures (core/shift `CurveShift`: temperature,
 * log10 aT and log10 bT with standard errors, null when undetermined, and whether the isotherm
 * is part of the master curve) under the isotherm's id, with its quality and a note.
 */
export interface AnalysisCurve extends Pick<
  CurveShift,
  'temperatureK' | 'log10aT' | 'log10aTStdErr' | 'log10bT' | 'log10bTStdErr' | 'included'
> {
  isothermId: string;
  /** RMS residual of the isotherm against the master curve, decades. */
  qualityRmsDecades: number | null;
  /** Why the isotherm is not included, or how its shift was set. */
  note?: string;
  /** Why the isotherm is not part of the master curve (stable code and sentence); absent when included. */
  leftOut?: LeftOut;
}

/** The reduced master curve at the reference temperature, one entry per point, sorted by reducedX. */
export interface AnalysisMasterCurve {
  /** Reduced frequency aT·ω (rad/s) or reduced time t/aT (s). */
  reducedX: number[];
  /** Reduced quantities at Tref, SI units; null where the point has no value for that quantity. */
  quantities: Partial<Record<QuantityId, (number | null)[]>>;
  /** Isotherm each point came from. */
  isothermId: string[];
  /** Temperature each point was measured at, K. */
  temperatureK: number[];
  /** True where the shift engine flagged the point as an outlier (left out of the shift and Prony fits). */
  outlier: boolean[];
}

/** A model's predicted log10 aT with its 95 % confidence band on a temperature grid. */
export interface ModelBand {
  temperatureK: number[];
  log10aT: number[];
  lower95: number[];
  upper95: number[];
}

/** Goodness of fit common to all shift-factor models. */
export interface ModelFitStats {
  /** Coefficient of determination. */
  r2: number | null;
  /** RMS residual of log10 aT, decades. */
  rmsResidualDecades: number | null;
  /** Residual of each fitted isotherm (log10 aT measured − model), decades, by isotherm id. */
  residuals: { isothermId: string; temperatureK: number; residualDecades: number }[];
  /** Temperature range the model was fitted over, K. */
  fittedRangeK: [number, number];
  converged: boolean;
  /** Why the fit stopped, in words (converged or not). */
  convergence: string;
  /** χ²/(degrees of freedom): ≈ 1 when the shifts scatter as their covariance says. */
  reducedChiSquare: number | null;
  /**
   * How the shifts were weighted: generalised least squares with the engine's covariance
   * ('full-covariance'), or each shift by its own standard error ('diagonal', with the reason),
   * and which shifts were left out (fixed by hand) with the reason.
   */
  weighting: {
    kind: 'full-covariance' | 'diagonal';
    note: string;
    leftOut: { isothermId: string; temperatureK: number; reason: string }[];
  };
  band: ModelBand;
  /**
   * The model as core/models evaluates it (`shiftModelBand`, core/spectrum `predictQuantity`):
   * parameter vector, covariance (omitted when it could not be determined), t quantile, fitted
   * range and Tg. What `predictFromAnalysis` reads, so answers carry the 95 % range at any
   * temperature without re-fitting.
   */
  spec: ShiftModelSpec;
}

/**
 * WLF: log10 aT = −C1 (T − Tr)/(C2 + T − Tr) (Williams, Landel & Ferry 1955), with the quantities
 * its descriptor derives (`WlfDerived`: constants at Tg, apparent Ea at Tr, free volume).
 */
export interface WlfModel extends ModelFitStats, WlfDerived {
  c1: number;
  c1StdErr: number | null;
  c1Ci95: [number, number] | null;
  c2K: number;
  c2KStdErr: number | null;
  c2KCi95: [number, number] | null;
  /** Tr of the constants, K. */
  referenceK: number;
}

/** Arrhenius: ln aT = (Ea/R)(1/T − 1/Tr). */
export interface ArrheniusModel extends ModelFitStats {
  activationEnergyKJPerMol: number;
  activationEnergyKJPerMolStdErr: number | null;
  activationEnergyKJPerMolCi95: [number, number] | null;
  referenceK: number;
}

/** Polynomial: log10 aT = a1 (T − Tr) + a2 (T − Tr)². */
export interface PolynomialModel extends ModelFitStats {
  a1PerK: number;
  a1PerKStdErr: number | null;
  a2PerK2: number;
  a2PerK2StdErr: number | null;
  referenceK: number;
}

// The kinds of shift model are defined once, in core/models/types.ts.
export type { ShiftModelKind } from '../models/types';

/**
 * The fitted shift models under their registry kinds (core/models/registry), the built-in ones
 * typed here; a model added through the registry sits under its own kind (read it with
 * `modelResult()` / `fittedShiftModels()`, core/pipeline/model-results.ts).
 */
export interface AnalysisModels {
  wlf?: WlfModel;
  arrhenius?: ArrheniusModel;
  polynomial?: PolynomialModel;
  /** Which model suits the data range best, with the reason, when one can be said. */
  hint?: { model: ShiftModelKind; reason: string };
}

/** Prony series fitted to the master curve at Tref (generalised Maxwell model). */
export interface AnalysisProny {
  /** The quantities it was fitted to, e.g. storage and loss modulus, or relaxation modulus. */
  fittedTo: QuantityId[];
  /**
   * Shear (G(t) = Ge + Σ g_i e^(−t/τ_i)) or tension (E(t) = Ee + Σ E_i e^(−t/τ_i)): the terms are
   * moduli of that deformation and must be entered as such (E ≈ 3G for a rubber).
   */
  deformation: DeformationMode;
  /** Equilibrium modulus Ge (shear) or Ee (tension), Pa. */
  equilibriumModulusPa: number;
  /** How the equilibrium modulus was set ('fitted' ≥ 0 or 'zero'), and why. */
  equilibrium: { mode: 'fitted' | 'zero'; reason: string };
  /** Log–log slopes of the storage and loss modulus over the lowest decade (relaxation: over the last decade), null where not measured. */
  terminalSlopes: { storage: number | null; loss: number | null; relaxation: number | null };
  /** Measured points the series rests on and the log-bins (rows) it was fitted to. */
  pointCount: number;
  binCount: number;
  /** Instantaneous modulus G0 = Ge + Σ g_i (E0 in tension), Pa. */
  instantaneousModulusPa: number;
  tauS: number[];
  modulusPa: number[];
  modesPerDecade: number;
  /** RMS relative error of the fit over the fitted quantities (0.03 = 3 %). */
  rmsRelativeError: number | null;
  /** Reduced window the series was fitted over (rad/s or s). */
  reducedWindow: [number, number];
}

/** One material indicator (crossover, zero-shear viscosity, plateau modulus, tan δ peak …). */
export interface AnalysisIndicator {
  key: string;
  label: string;
  value: number;
  /** Unit as shown, e.g. `Pa`, `rad/s`, `Pa·s`, `K`. */
  unit: string;
  note?: string;
}

export interface AnalysisSample {
  name: string;
  testKind: TestKind;
  deformation: DeformationMode;
  abscissa: AbscissaKind;
  files: string[];
  metadata: Record<string, string>;
}

/** Everything one call of `buildMasterCurve` produces. */
export interface Analysis {
  /** Thermoshift version that produced it. */
  version: string;
  sample: AnalysisSample;
  /** The options after defaults were applied: pass them back to repeat the analysis. */
  settings: ResolvedAnalysisOptions;
  referenceTemperatureK: number;
  /** The measured data after masks and exclusions were applied (for plots). */
  dataset: Dataset;
  /** Quantities that drove the horizontal shift. */
  shiftQuantities: QuantityId[];
  /** The vertical shift applied ('auto' resolved) and why. Absent in analyses saved before it existed. */
  vertical?: VerticalChoice;
  curves: AnalysisCurve[];
  /** Overall RMS residual of all included isotherms against the master curve, decades. */
  overallQualityRmsDecades: number | null;
  masterCurve: AnalysisMasterCurve;
  models: AnalysisModels;
  prony: AnalysisProny | null;
  indicators: AnalysisIndicator[];
  warnings: AnalysisWarning[];
}
