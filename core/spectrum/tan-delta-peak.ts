import type { ShiftModelSpec } from '../models/types';
import { shiftModelLog10aT } from '../models/shift-model-eval';
import { checkShiftModelRange } from '../models/range-check';
import { extremeIndex, parabolicVertex } from './extremum';
import { logSpace } from './log-grid';
import type { PronySeries } from './prony-model';
import { pronyLoss, pronyStorage } from './prony-model';
import type { ReducedWindow } from './types';

export interface TanDeltaPeak {
  /** Reduced angular frequency of the tan δ maximum, rad/s. */
  omegaRadPerS: number;
  tanDelta: number;
  /** The maximum sits at an edge of the window: the true peak lies outside it. */
  atEdge: boolean;
}

const tanDelta = (s: PronySeries, w: number): number => pronyLoss(s, w) / pronyStorage(s, w);

/** Frequency window of a reduced window (time data: ω ≈ 1/t, an approximation). */
export function frequencyWindow(w: ReducedWindow): [number, number] {
  return w.abscissa === 'time' ? [1 / w.max, 1 / w.min] : [w.min, w.max];
}

/**
 * Position of the tan δ maximum of a Prony series inside the reduced window: a 50-per-decade scan
 * refined by a parabola in (log ω, log tan δ). For solids this is the glass transition's
 * signature on the master curve.
 */
export function tanDeltaPeak(series: PronySeries, window: ReducedWindow): TanDeltaPeak {
  const [lo, hi] = frequencyWindow(window);
  const w = logSpace(lo, hi, 50);
  const lx = w.map(Math.log10);
  const ly = w.map((v) => Math.log10(tanDelta(series, v)));
  const i = extremeIndex(ly, 1);
  if (i < 0) throw new RangeError('tan δ cannot be evaluated in this window (no storage modulus)');
  const v = parabolicVertex(lx, ly, i);
  return { omegaRadPerS: 10 ** v.x, tanDelta: 10 ** v.y, atEdge: i === 0 || i === w.length - 1 };
}

export interface TanDeltaPeakTemperature {
  /** Temperature of the tan δ maximum at the test frequency, K. */
  temperatureK: number;
  tanDelta: number;
  /** Reduced frequency aT(T)·2πf at the peak, rad/s. */
  reducedOmegaRadPerS: number;
  /** The maximum sits at an end of the scanned range: the true peak lies outside it. */
  atEdge: boolean;
  /** The reduced frequency at the peak lies outside the measured window: extrapolated. */
  outsideReducedWindow: boolean;
  /** Range flags of the shift model at the peak temperature. */
  messages: string[];
}

/**
 * Temperature at which tan δ peaks when tested at `frequencyHz` (1 Hz by default): for each T,
 * ω_r = aT(T)·2πf; scan T in 0.1 K steps over `rangeK` (default: the model's fitted range) and
 * refine by a parabola.
 */
export function tanDeltaPeakTemperature(
  series: PronySeries,
  shiftModel: ShiftModelSpec,
  window: ReducedWindow,
  options: { frequencyHz?: number; rangeK?: [number, number] } = {},
): TanDeltaPeakTemperature {
  const f = options.frequencyHz ?? 1;
  if (!(f > 0)) throw new RangeError('frequencyHz must be positive');
  const range = options.rangeK ?? shiftModel.fittedRangeK;
  if (!range || !(range[1] > range[0]))
    throw new RangeError(
      'rangeK (or the model fittedRangeK) must be an increasing pair of temperatures in K',
    );
  const n = Math.max(3, Math.ceil((range[1] - range[0]) / 0.1) + 1);
  const T = Array.from({ length: n }, (_, i) => range[0] + ((range[1] - range[0]) * i) / (n - 1));
  const omega = (t: number): number => 10 ** shiftModelLog10aT(shiftModel, t) * 2 * Math.PI * f;
  const ly = T.map((t) => Math.log10(tanDelta(series, omega(t))));
  const i = extremeIndex(ly, 1);
  if (i < 0) throw new RangeError('tan δ cannot be evaluated over this temperature range');
  const v = parabolicVertex(T, ly, i);
  const wr = omega(v.x);
  const [lo, hi] = frequencyWindow(window);
  return {
    temperatureK: v.x,
    tanDelta: 10 ** v.y,
    reducedOmegaRadPerS: wr,
    atEdge: i === 0 || i === n - 1,
    outsideReducedWindow: wr < lo || wr > hi,
    messages: checkShiftModelRange(shiftModel, v.x).messages,
  };
}
