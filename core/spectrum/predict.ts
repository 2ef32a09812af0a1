/**
 * Design queries: a modelled quantity at a chosen temperature and time or frequency, through the
 * shift model and the Prony series (docs/conventions.md §5): ω_r = aT(T)·ω, t_r = t/aT(T); measured
 * modulus = reduced modulus / bT, measured compliance = reduced compliance × bT,
 * |η*|(T, ω) = |G*_r(ω_r)| / (bT·ω). Every answer carries its extrapolation flags and cautions.
 */
import { complexModulusOf } from '../data/derived';
import { extent } from '../data/extent';
import { measuredFromReduced, reducedAbscissa } from '../data/reduction';
import { checkShiftModelRange } from '../models/range-check';
import { shiftModelBand } from '../models/shift-model-band';
import type { ShiftModelSpec } from '../models/types';
import { creepCompliance, creepFromProny } from './creep-from-prony';
import type { PronySeries } from './prony-model';
import { pronyLoss, pronyRelaxation, pronyStorage } from './prony-model';
import { frequencyWindow } from './tan-delta-peak';
import type { ReducedWindow } from './types';

export type PredictedQuantity =
  'storage' | 'loss' | 'tanDelta' | 'complexViscosity' | 'relaxation' | 'creep';

export interface PredictionQuery {
  quantity: PredictedQuantity;
  /** Service temperature, K. */
  temperatureK: number;
  /** Time for relaxation/creep, s. */
  timeS?: number;
  /** Angular frequency for dynamic quantities, rad/s (or give frequencyHz). */
  omegaRadPerS?: number;
  /** Frequency for dynamic quantities, Hz (ω = 2πf). */
  frequencyHz?: number;
}

export interface PredictionContext {
  series: PronySeries;
  shiftModel: ShiftModelSpec;
  /** Reduced window of the data the series was fitted to. */
  window: ReducedWindow;
  /** log10 bT at the service temperature (vertical shift, reduced = bT × measured). @default 0 */
  log10bT?: number;
}

export interface PredictionFlags {
  /** The reduced time or frequency lies outside the measured reduced window. */
  outsideReducedWindow: boolean;
  outsideFittedRange: boolean;
  belowGlassTransition: boolean;
  beyondPole: boolean;
}

export interface Prediction {
  quantity: PredictedQuantity;
  value: number;
  /** 'Pa', '1/Pa', 'Pa·s' or '1'. */
  unit: string;
  log10aT: number;
  /** Reduced frequency (rad/s) or reduced time (s) at which the series was read. */
  reducedX: number;
  /**
   * The value at both ends of the 95 % band of log10 aT (only the shift-model uncertainty; the
   * Prony series' own error and the material's scatter come on top). Absent without a covariance.
   */
  valueRange?: [number, number];
  flags: PredictionFlags;
  /** Flag messages first, then the standing cautions. */
  cautions: string[];
}

const UNIT: Record<PredictedQuantity, string> = {
  storage: 'Pa',
  loss: 'Pa',
  tanDelta: '1',
  complexViscosity: 'Pa·s',
  relaxation: 'Pa',
  creep: '1/Pa',
};

/** Cautions every prediction carries (docs/conventions.md §6). */
export const STANDING_CAUTIONS: readonly string[] = [
  'Predictions outside the measured reduced window or temperature range are extrapolations.',
  'Time–temperature superposition does not hold for every material; check its validity (e.g. van Gurp–Palmen plot).',
  'Master curves describe linear viscoelastic behaviour only (small strains).',
  'Confirm design values by testing and follow the applicable codes and licensed engineering practice.',
];

function abscissa(q: PredictionQuery): { kind: 'time' | 'frequency'; x: number } {
  const timeLike = q.quantity === 'relaxation' || q.quantity === 'creep';
  if (timeLike) {
    if (!(q.timeS !== undefined && q.timeS >= 0))
      throw new RangeError(`timeS must be given (≥ 0 s) for ${q.quantity}`);
    return { kind: 'time', x: q.timeS };
  }
  const w =
    q.omegaRadPerS ?? (q.frequencyHz !== undefined ? 2 * Math.PI * q.frequencyHz : undefined);
  if (!(w !== undefined && w > 0))
    throw new RangeError(`omegaRadPerS or frequencyHz must be given (> 0) for ${q.quantity}`);
  return { kind: 'frequency', x: w };
}

/** Evaluates the reduced quantity at log10 aT, then applies the vertical shift. */
function valueAt(
  q: PredictedQuantity,
  ctx: PredictionContext,
  x: number,
  log10aT: number,
  bT: number,
  creepOf: () => ReturnType<typeof creepFromProny>,
): number {
  const aT = 10 ** log10aT;
  // The reduction rules inverted (core/data/reduction.ts): read the series at the reduced
  // abscissa, then turn the reduced value into the one measured at this temperature.
  const xr = reducedAbscissa(
    q === 'relaxation' || q === 'creep' ? 'time' : 'angularFrequency',
    x,
    aT,
  );
  switch (q) {
    case 'storage':
      return measuredFromReduced('storageModulus', pronyStorage(ctx.series, xr), aT, bT);
    case 'loss':
      return measuredFromReduced('lossModulus', pronyLoss(ctx.series, xr), aT, bT);
    case 'tanDelta':
      return measuredFromReduced(
        'tanDelta',
        pronyLoss(ctx.series, xr) / pronyStorage(ctx.series, xr),
        aT,
        bT,
      );
    case 'complexViscosity': {
      // reduced |η*| = |G*_r(ω_r)| / ω_r
      const g = complexModulusOf(pronyStorage(ctx.series, xr), pronyLoss(ctx.series, xr));
      return measuredFromReduced('complexViscosity', g / xr, aT, bT);
    }
    case 'relaxation':
      return measuredFromReduced('relaxationModulus', pronyRelaxation(ctx.series, xr), aT, bT);
    case 'creep':
      return measuredFromReduced('creepCompliance', creepCompliance(creepOf(), xr), aT, bT);
  }
}

/** Predicts one quantity at a service temperature and time/frequency, with flags and cautions. */
export function predictQuantity(query: PredictionQuery, ctx: PredictionContext): Prediction {
  if (!(query.temperatureK > 0))
    throw new RangeError('temperatureK must be a positive temperature in K');
  if (!(query.quantity in UNIT))
    throw new RangeError(`quantity must be one of ${Object.keys(UNIT).join(', ')}`);
  const { kind, x } = abscissa(query);
  const bT = 10 ** (ctx.log10bT ?? 0);
  let creep: ReturnType<typeof creepFromProny> | undefined;
  const creepOf = () => (creep ??= creepFromProny(ctx.series));
  const [band] = shiftModelBand(ctx.shiftModel, [query.temperatureK]);
  const value = valueAt(query.quantity, ctx, x, band.log10aT, bT, creepOf);
  const aT = 10 ** band.log10aT;
  const reducedX = reducedAbscissa(kind === 'time' ? 'time' : 'angularFrequency', x, aT);
  // compare in the window's own abscissa (time windows: t_r; frequency windows: ω_r; across kinds ω ≈ 1/t)
  const [flo, fhi] = frequencyWindow(ctx.window);
  const asFrequency = kind === 'time' ? 1 / reducedX : reducedX;
  const outsideReducedWindow =
    ctx.window.abscissa === 'time' && kind === 'time'
      ? reducedX < ctx.window.min || reducedX > ctx.window.max
      : !(asFrequency >= flo && asFrequency <= fhi);
  const range = checkShiftModelRange(ctx.shiftModel, query.temperatureK);
  const cautions: string[] = [];
  if (outsideReducedWindow) {
    cautions.push(
      `The reduced ${kind === 'time' ? 'time' : 'frequency'} ${reducedX.toPrecision(3)} ${kind === 'time' ? 's' : 'rad/s'} lies outside the measured master curve: the value is extrapolated from the Prony series.`,
    );
  }
  for (const m of [...range.messages, ...STANDING_CAUTIONS]) cautions.push(m);
  let valueRange: [number, number] | undefined;
  if (Number.isFinite(band.stdErr) && band.stdErr > 0) {
    const vs = [band.lower95, band.upper95].map((l) =>
      valueAt(query.quantity, ctx, x, l, bT, creepOf),
    );
    valueRange = extent([value, ...vs]);
  }
  return {
    quantity: query.quantity,
    value,
    unit: UNIT[query.quantity],
    log10aT: band.log10aT,
    reducedX,
    valueRange,
    flags: {
      outsideReducedWindow,
      outsideFittedRange: range.outsideFittedRange,
      belowGlassTransition: range.belowGlassTransition,
      beyondPole: range.beyondPole,
    },
    cautions,
  };
}
