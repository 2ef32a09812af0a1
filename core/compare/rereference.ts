/**
 * Brings one analysis to the common reference temperature T* through its own shift model.
 *
 * With aT referred to the analysis's own Tref, the master curve at T* is the same curve moved by
 * log10 aT(T*): ω* = ω_r / aT(T*), t* = t_r · aT(T*) (docs/conventions.md §2: ω_r = aT·ω,
 * t_r = t/aT). Moduli are divided by bT(T*) (bT = Tref·ρref/(T·ρ) re-referenced), compliance
 * multiplied by it, |η*| multiplied by aT(T*)/bT(T*), tan δ and δ unchanged: the reduction rule
 * inverted, core/data/reduction.ts. The standard error of log10 aT(T*) comes
 * from the model's band (delta method, full covariance; core/models shiftModelBand).
 */
import { abscissaShiftSign, reductionExponents } from '../data/reduction';
import { kelvinToCelsius } from '../data/temperature';
import type { QuantityId } from '../data/types';
import type { ShiftModelKind } from '../models/types';
import { fittedShiftModels, modelResult } from '../pipeline/model-results';
import { shiftModelBand } from '../models/shift-model-band';
import { log10bTAt } from '../pipeline/vertical-at';
import type { Analysis } from '../pipeline/types';
import type { Estimate } from './types';

export interface MovedCurve {
  /** log10 reduced x at T* for every master-curve point (outliers removed). */
  log10x: number[];
  /** log10 values per quantity at T* (NaN where missing). */
  log10y: Partial<Record<QuantityId, number[]>>;
  /** Isotherm of each point. */
  isothermId: string[];
  log10aT: Estimate;
  log10bT: number;
  model: ShiftModelKind | null;
  extrapolated: boolean;
  notes: string[];
}

/** The shift model to move an analysis with: the requested one, its hint, or the first fitted. */
export function pickModel(a: Analysis, requested: ShiftModelKind | null): ShiftModelKind | null {
  if (requested && modelResult(a.models, requested)) return requested;
  if (a.models.hint && modelResult(a.models, a.models.hint.model)) return a.models.hint.model;
  return fittedShiftModels(a.models)[0]?.descriptor.kind ?? null;
}

export function moveToTemperature(
  a: Analysis,
  targetK: number,
  requested: ShiftModelKind | null,
  quantities: QuantityId[],
): MovedCurve {
  const notes: string[] = [];
  let log10aT: Estimate = { value: 0, stdErr: 0 };
  let model: ShiftModelKind | null = null;
  let extrapolated = false;
  let log10bT = 0;
  if (Math.abs(targetK - a.referenceTemperatureK) > 1e-6) {
    model = pickModel(a, requested);
    const fit = model ? modelResult(a.models, model) : undefined;
    if (!model || !fit)
      throw new RangeError(
        `${a.sample.name}: no shift model was fitted, so it cannot be moved from ${kelvinToCelsius(a.referenceTemperatureK).toFixed(1)} °C to ${kelvinToCelsius(targetK).toFixed(1)} °C`,
      );
    const [band] = shiftModelBand(fit.spec, [targetK]);
    log10aT = { value: band.log10aT, stdErr: Number.isFinite(band.stdErr) ? band.stdErr : null };
    const [lo, hi] = fit.fittedRangeK;
    extrapolated = targetK < lo - 1e-6 || targetK > hi + 1e-6;
    if (extrapolated)
      notes.push(
        `${a.sample.name}: moved to ${kelvinToCelsius(targetK).toFixed(1)} °C by its ${model.toUpperCase()} fit outside the temperatures it was fitted over (${kelvinToCelsius(lo).toFixed(1)}–${kelvinToCelsius(hi).toFixed(1)} °C): extrapolated`,
      );
    const v = log10bTAt(a, targetK);
    log10bT = v.log10bT;
    if (v.extrapolated) notes.push(`${a.sample.name}: ${v.note}`);
  }
  const mc = a.masterCurve;
  const keep = mc.reducedX.map((x, i) => x > 0 && !mc.outlier[i]);
  // The reduction rule inverted in log form (core/data/reduction.ts): x* = x_r moved back by aT(T*),
  // log10 y* = log10 y_r − (its aT and bT exponents) · (log10 aT(T*), log10 bT(T*)).
  const dx = -abscissaShiftSign(a.sample.abscissa) * log10aT.value;
  const log10x: number[] = [];
  const isothermId: string[] = [];
  const log10y: Partial<Record<QuantityId, number[]>> = {};
  for (const q of quantities) log10y[q] = [];
  mc.reducedX.forEach((x, i) => {
    if (!keep[i]) return;
    log10x.push(Math.log10(x) + dx);
    isothermId.push(mc.isothermId[i]);
    for (const q of quantities) {
      const v = mc.quantities[q]?.[i];
      const y = v !== null && v !== undefined && v > 0 ? Math.log10(v) : NaN;
      const e = reductionExponents(q);
      (log10y[q] as number[]).push(y - (e.aT * log10aT.value + e.bT * log10bT));
    }
  });
  return { log10x, log10y, isothermId, log10aT, log10bT, model, extrapolated, notes };
}
