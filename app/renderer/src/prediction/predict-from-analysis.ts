/**
 * A design query against an analysis: core/spectrum's predictQuantity with the analysis' Prony
 * series and one of its fitted shift models. The Analysis carries each model's 95 % band on a
 * temperature grid but not its covariance, so the band at the service temperature is read from
 * that grid (linear interpolation) and the value is evaluated at both band edges by predicting
 * with a model pinned to the edge value (a polynomial a1·(T − Tr) with Tr = T − 1 K is exactly
 * a1 at T). Outside the grid no range is given; the answer is flagged as extrapolated anyway.
 */
import type { Analysis, ShiftModelKind } from '../../../../core/pipeline/types';
import type { ShiftModelSpec } from '../../../../core/models/types';
import { densityFromExpansion, entropicBT } from '../../../../core/models/shift-laws';
import {
  predictQuantity,
  type PredictedQuantity,
  type Prediction,
} from '../../../../core/spectrum/predict';

export interface AnalysisQuery {
  quantity: PredictedQuantity;
  model: ShiftModelKind;
  temperatureK: number;
  /** Time (s) for relaxation/creep, angular frequency (rad/s) otherwise. */
  x: number;
}

export interface AnalysisPrediction extends Prediction {
  /** 95 % band of log10 aT at the service temperature, when the model's grid covers it. */
  log10aTRange?: [number, number];
  /** How bT at the service temperature was obtained. */
  verticalNote: string;
}

export function modelSpec(a: Analysis, kind: ShiftModelKind): ShiftModelSpec | null {
  const m = a.models[kind];
  if (!m) return null;
  const values =
    kind === 'wlf'
      ? [a.models.wlf!.c1, a.models.wlf!.c2K]
      : kind === 'arrhenius'
        ? [a.models.arrhenius!.activationEnergyKJPerMol]
        : [a.models.polynomial!.a1PerK, a.models.polynomial!.a2PerK2];
  return {
    kind,
    referenceK: m.referenceK,
    values,
    fittedRangeK: m.fittedRangeK,
    glassTransitionK: a.settings.glassTransitionK ?? undefined,
  };
}

function interpolate(xs: number[], ys: number[], x: number): number | null {
  for (let i = 1; i < xs.length; i++) {
    if (x >= xs[i - 1] && x <= xs[i]) {
      const f = xs[i] === xs[i - 1] ? 0 : (x - xs[i - 1]) / (xs[i] - xs[i - 1]);
      return ys[i - 1] + f * (ys[i] - ys[i - 1]);
    }
  }
  return null;
}

/** log10 bT at T: 0 without vertical shift, the entropic formula with density, else interpolated. */
export function log10bTAt(a: Analysis, temperatureK: number): { log10bT: number; note: string } {
  const s = a.settings;
  if (s.verticalShift === 'none') return { log10bT: 0, note: 'no vertical shift (bT = 1)' };
  if (s.verticalShift === 'density' && s.density) {
    const rho = densityFromExpansion(
      temperatureK,
      s.referenceTemperatureK,
      s.density.referenceDensityKgPerM3,
      s.density.volumetricExpansionPerK,
    );
    const bT = entropicBT(
      temperatureK,
      s.referenceTemperatureK,
      rho,
      s.density.referenceDensityKgPerM3,
    );
    return { log10bT: Math.log10(bT), note: 'bT from density, Tref·ρref/(T·ρ)' };
  }
  const pts = a.curves
    .filter((c) => c.included && c.log10bT !== null)
    .sort((p, q) => p.temperatureK - q.temperatureK);
  const v = interpolate(
    pts.map((c) => c.temperatureK),
    pts.map((c) => c.log10bT!),
    temperatureK,
  );
  if (v !== null) return { log10bT: v, note: 'bT interpolated between the measured isotherms' };
  const nearest = pts.length
    ? pts.reduce((b, c) =>
        Math.abs(c.temperatureK - temperatureK) < Math.abs(b.temperatureK - temperatureK) ? c : b,
      )
    : null;
  return {
    log10bT: nearest?.log10bT ?? 0,
    note: 'bT outside the measured temperatures: the nearest isotherm’s value is used (extrapolation)',
  };
}

export function predictFromAnalysis(a: Analysis, q: AnalysisQuery): AnalysisPrediction {
  const spec = modelSpec(a, q.model);
  if (!spec) throw new Error(`The ${q.model} model was not fitted for this analysis.`);
  if (!a.prony)
    throw new Error('No Prony series was fitted (set Prony modes per decade to 1 or 2).');
  const timeLike = q.quantity === 'relaxation' || q.quantity === 'creep';
  const query = {
    quantity: q.quantity,
    temperatureK: q.temperatureK,
    ...(timeLike ? { timeS: q.x } : { omegaRadPerS: q.x }),
  };
  const { log10bT, note } = log10bTAt(a, q.temperatureK);
  const ctx = {
    series: a.prony,
    window: {
      abscissa: a.sample.abscissa,
      min: a.prony.reducedWindow[0],
      max: a.prony.reducedWindow[1],
    },
    log10bT,
  };
  const p = predictQuantity(query, { ...ctx, shiftModel: spec });
  const band = a.models[q.model]!.band;
  const lo = interpolate(band.temperatureK, band.lower95, q.temperatureK);
  const hi = interpolate(band.temperatureK, band.upper95, q.temperatureK);
  if (lo === null || hi === null) return { ...p, verticalNote: note };
  const pinned = (log10aT: number): number =>
    predictQuantity(query, {
      ...ctx,
      shiftModel: { kind: 'polynomial', referenceK: q.temperatureK - 1, values: [log10aT, 0] },
    }).value;
  const edges = [pinned(lo), pinned(hi)];
  return {
    ...p,
    log10aTRange: [lo, hi],
    valueRange: [Math.min(p.value, ...edges), Math.max(p.value, ...edges)],
    verticalNote: note,
  };
}
