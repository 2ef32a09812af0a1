/**
 * Design queries against a finished analysis ("the relaxed modulus after ten years at 60 °C"):
 * core/spectrum `predictQuantity` with the analysis' Prony series, one of its fitted shift models
 * (with the covariance, so the 95 % range comes from the delta-method band of log10 aT) and bT at
 * the service temperature. The app and `thermoshift build --predict` both call this.
 */
import { shiftModelBand } from '../models/shift-model-band';
import {
  predictQuantity,
  STANDING_CAUTIONS,
  type PredictedQuantity,
  type Prediction,
  type PredictionQuery,
} from '../spectrum/predict';
import type { Analysis, ShiftModelKind } from './types';
import { log10bTAt } from './vertical-at';
import { fittedShiftModels, modelResult } from './model-results';

export interface AnalysisQuery {
  quantity: PredictedQuantity;
  /**
   * Shift model that carries the temperature.
   * @default the model the analysis suggests (`models.hint`), else the first fitted one
   */
  model?: ShiftModelKind;
  /** Service temperature, K. */
  temperatureK: number;
  /** Time, s (relaxation and creep). */
  timeS?: number;
  /** Angular frequency, rad/s (dynamic quantities; or give frequencyHz). */
  omegaRadPerS?: number;
  /** Frequency, Hz (ω = 2πf). */
  frequencyHz?: number;
}

export interface AnalysisPrediction extends Prediction {
  /** The shift model that was used. */
  model: ShiftModelKind;
  /**
   * 95 % band of log10 aT at the service temperature. Like `valueRange`, given only inside the
   * model's fitted temperature range: outside it the choice of law, not its constants, dominates
   * the error, and a narrow band would mislead.
   */
  log10aTRange?: [number, number];
  /** log10 bT used at the service temperature (reduced = bT × measured). */
  log10bT: number;
  /** How bT at the service temperature was obtained. */
  verticalNote: string;
}

/** Thrown when the analysis cannot answer the query (no Prony series, model not fitted). */
export class PredictionError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'PredictionError';
  }
}

/** The model a query without `model` uses: the suggested one, else the first fitted. */
export function defaultPredictionModel(a: Analysis): ShiftModelKind | null {
  const hint = a.models.hint?.model;
  if (hint && modelResult(a.models, hint)) return hint;
  return fittedShiftModels(a.models)[0]?.descriptor.kind ?? null;
}

const NO_RANGE_OUTSIDE =
  'No 95 % range is given outside the fitted temperature range: there the choice of shift law, not its constants, dominates the uncertainty.';

/**
 * Predicts one quantity at a service temperature and time or frequency from an analysis.
 * @throws PredictionError when no Prony series or no (or not the asked) shift model was fitted;
 *   RangeError (from predictQuantity) for a missing or non-positive time/frequency/temperature
 */
export function predictFromAnalysis(a: Analysis, q: AnalysisQuery): AnalysisPrediction {
  const kind = q.model ?? defaultPredictionModel(a);
  if (!kind) throw new PredictionError('No shift-factor model was fitted for this analysis.');
  const model = modelResult(a.models, kind);
  if (!model) throw new PredictionError(`The ${kind} model was not fitted for this analysis.`);
  const prony = a.prony;
  if (!prony)
    throw new PredictionError(
      'No Prony series was fitted (set Prony modes per decade to 1 or 2), so there is nothing to evaluate.',
    );
  const vertical = log10bTAt(a, q.temperatureK);
  const query: PredictionQuery = {
    quantity: q.quantity,
    temperatureK: q.temperatureK,
    ...(q.timeS !== undefined && { timeS: q.timeS }),
    ...(q.omegaRadPerS !== undefined && { omegaRadPerS: q.omegaRadPerS }),
    ...(q.frequencyHz !== undefined && { frequencyHz: q.frequencyHz }),
  };
  const p = predictQuantity(query, {
    series: prony,
    shiftModel: model.spec,
    window: {
      abscissa: a.sample.abscissa,
      min: prony.reducedWindow[0],
      max: prony.reducedWindow[1],
    },
    log10bT: vertical.log10bT,
  });
  const { valueRange, ...rest } = p;
  // flag messages stay before the standing cautions (the app highlights them)
  const cautions = [...p.cautions];
  if (vertical.extrapolated) cautions.unshift(`${vertical.note}.`);
  const base = { ...rest, model: kind, log10bT: vertical.log10bT, verticalNote: vertical.note };
  if (p.flags.outsideFittedRange || !valueRange) {
    if (p.flags.outsideFittedRange)
      cautions.splice(cautions.length - STANDING_CAUTIONS.length, 0, NO_RANGE_OUTSIDE);
    return { ...base, cautions };
  }
  const [band] = shiftModelBand(model.spec, [q.temperatureK]);
  return {
    ...base,
    cautions,
    valueRange,
    log10aTRange: [band.lower95, band.upper95],
  };
}
