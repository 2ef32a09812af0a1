/**
 * Types of a comparison of master curves: one reference analysis against one or more samples,
 * all brought to one reference temperature. Plain JSON (numbers that could not be determined are
 * null). Units SI and carried in the names; log quantities in decades (log10).
 * How each figure and its standard error are computed: docs/compare.md.
 */
import type { AbscissaKind, QuantityId } from '../data/types';
import type { ShiftModelKind } from '../models/types';
import type { SpecVerdict } from './spec-types';

/** A value with its standard error (null: could not be determined). */
export interface Estimate {
  value: number;
  stdErr: number | null;
}

/** One node of a curve smoothed on the shared log grid. */
export interface GridNode {
  /** log10 of the reduced abscissa (rad/s or s) at the common reference temperature. */
  log10x: number;
  /** Local straight-line fit of log10 value at `log10x`. */
  log10y: number;
  /** d log10 y / d log10 x of the local fit. */
  slope: number;
  /**
   * Pointwise standard error, decades: the curve's scatter, its isotherms' shift s.e. (times the
   * slope, by their share of the bin) and the re-referencing s.e. (times the slope).
   */
  stdErr: number;
  /** The part of `stdErr` from the scatter of the points alone, decades. */
  scatterStdErr: number;
  /** Points in the node's bin. */
  count: number;
}

/** One analysis brought to the common reference temperature. */
export interface RereferencedCurve {
  name: string;
  /** Its own reference temperature, K. */
  ownReferenceK: number;
  /** log10 aT(T*) of its own shift model (0 when T* is its own reference). */
  log10aTAtCommon: Estimate;
  /** log10 bT(T*) (0 without a vertical shift). */
  log10bTAtCommon: number;
  /** Model used to move it, or null when no move was needed. */
  model: ShiftModelKind | null;
  /** True when T* lies outside the temperatures its shift model was fitted over. */
  extrapolated: boolean;
  /** Smoothed nodes per quantity. */
  nodes: Partial<Record<QuantityId, GridNode[]>>;
  /** Pooled scatter of the points about the local fits, decades, per quantity. */
  scatterDecades: Partial<Record<QuantityId, number>>;
  /**
   * Standard error of the curve's placement as a whole: horizontal (its isotherms' shift s.e.,
   * weighted by their share of the points, and the re-referencing s.e.) and vertical (bT s.e.).
   */
  placementStdErr: { horizontalDecades: number; verticalDecades: number };
}

/** The difference of one quantity, sample − reference, in log10, node by node. */
export interface QuantityDifference {
  quantity: QuantityId;
  /** Nodes where both curves have a value (the common reduced window). */
  log10x: number[];
  /** log10(sample) − log10(reference). */
  log10Difference: number[];
  /** Standard error of each difference (both curves' scatter, shifts and placement). */
  stdErr: number[];
  /** The largest |difference| and where it occurs (null when no common node). */
  largest: { log10Difference: number; stdErr: number; reducedX: number } | null;
  /** Common reduced window [min, max] (rad/s or s), null when the curves do not overlap. */
  window: [number, number] | null;
}

/** Constants of the shift models compared. */
export interface ModelDifference {
  /** Ea(sample) − Ea(reference) of the Arrhenius fits, kJ/mol. */
  activationEnergyKJPerMol: Estimate | null;
  reference: { activationEnergyKJPerMol: Estimate | null };
  sample: { activationEnergyKJPerMol: Estimate | null };
  /** log10 aT at chosen temperatures, both referred to T*: sample − reference. */
  shiftAt: {
    temperatureK: number;
    reference: Estimate | null;
    sample: Estimate | null;
    difference: Estimate | null;
    /** Either model is used outside its fitted range here. */
    extrapolated: boolean;
  }[];
}

/** One material indicator compared (both at T*). */
export interface IndicatorDifference {
  key: string;
  label: string;
  unit: string;
  reference: number;
  sample: number;
  /** log10(sample/reference) with an approximate s.e. from the curves' placement (docs/compare.md). */
  log10Ratio: Estimate;
  /** (sample/reference − 1) × 100. */
  percent: number;
}

/** One sample against the reference. */
export interface SampleComparison {
  name: string;
  differences: QuantityDifference[];
  /**
   * The horizontal offset that best maps the reference onto the sample, as a change of the
   * relaxation times: +0.1 means the sample's relaxation times are 10^0.1 times longer.
   */
  timeShiftDecades: Estimate | null;
  /** The vertical offset fitted with it: log10(sample modulus / reference modulus). */
  modulusOffsetDecades: Estimate | null;
  /** Reduced χ² of that two-parameter mapping (≈ 1 when the shapes agree within noise). */
  mappingReducedChiSquare: number | null;
  models: ModelDifference;
  indicators: IndicatorDifference[];
  /**
   * True when the time shift or the modulus offset differs from zero beyond noise (two-sided
   * tests at 5 % overall, Bonferroni for the two).
   */
  differsBeyondNoise: boolean;
  verdicts: SpecVerdict[];
  /** Overall verdict: fail if any criterion fails, else inconclusive if any is, else pass. */
  overall: 'pass' | 'fail' | 'inconclusive' | 'no-spec';
  warnings: string[];
}

export interface Comparison {
  format: 'thermoshift-comparison';
  formatVersion: 1;
  /** Common reference temperature, K. */
  referenceTemperatureK: number;
  abscissa: AbscissaKind;
  quantities: QuantityId[];
  reference: RereferencedCurve;
  samples: RereferencedCurve[];
  comparisons: SampleComparison[];
  /** Name of the specification used, null without one. */
  specName: string | null;
  /** Width of the grid's bins, decades. */
  binDecades: number;
  cautions: string[];
}
