/**
 * Has the master curve reached the terminal (flow) zone? For a liquid, every Prony series with
 * Ge = 0 gives G′ = Σ g_i ω²τ_i²/(1+ω²τ_i²) → ω²·Σ g_i τ_i² and G″ → ω·Σ g_i τ_i as ω → 0:
 * log–log slopes 2 and 1 (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980, ch. 3).
 * Relaxation data of a liquid fall faster than any power of t at long times. Judged on the binned
 * curve over its lowest decade of frequency (highest decade of time).
 */
import { weightedLinearFit } from '../models/weighted-linear-fit';
import type { LogBins } from './log-bins';

export interface TerminalZone {
  reached: boolean;
  /** Local slopes d log y / d log x over the judged decade (NaN when not measured). */
  storageSlope: number;
  lossSlope: number;
  relaxationSlope: number;
  /** One sentence for the user. */
  reason: string;
}

/**
 * Thresholds (common practice, set here): the terminal zone is "reached" when over the lowest
 * decade G′ rises at least as ω^1.5 and G″ as ω^0.8 … ω^1.2, with G″ > G′ there; for relaxation
 * data when G(t) falls at least as t^−1 over the last decade.
 */
export const TERMINAL_STORAGE_SLOPE = 1.5;
export const TERMINAL_LOSS_SLOPE: [number, number] = [0.8, 1.2];
export const TERMINAL_RELAXATION_SLOPE = -1;

/** Weighted straight-line slope of (x, y) with weights w; NaN with fewer than 3 points. */
function slope(x: number[], y: number[], w: number[]): number {
  if (x.length < 3) return NaN;
  return weightedLinearFit(
    x.map((v) => [1, v]),
    y,
    w,
  ).coefficients[1];
}

/** Slope of binned quantity k over bins [from, to] (inclusive positions). */
function binSlope(bins: LogBins, k: number, from: number, to: number): number {
  const x: number[] = [];
  const y: number[] = [];
  const w: number[] = [];
  const q = bins.quantities[k];
  for (let j = from; j <= to; j++) {
    if (!(q.count[j] > 0)) continue;
    x.push(bins.log10x[j]);
    y.push(q.log10y[j]);
    w.push(1 / (q.stdErr[j] * q.stdErr[j]));
  }
  return slope(x, y, w);
}

/**
 * Judges the terminal zone on bins [first, last] of a binned master curve. Dynamic data: bins
 * hold [G′, G″] as quantities 0 and 1 (either may be empty); relaxation data: [G(t)].
 */
export function terminalZone(
  bins: LogBins,
  first: number,
  last: number,
  abscissa: 'angularFrequency' | 'time',
): TerminalZone {
  const perDecade = bins.binsPerDecade;
  const none = { storageSlope: NaN, lossSlope: NaN, relaxationSlope: NaN };
  if (last < first) return { reached: false, ...none, reason: 'no data to judge' };
  if (abscissa === 'time') {
    const top = bins.index[last];
    let from = last;
    while (from > first && bins.index[from - 1] > top - perDecade) from--;
    const r = binSlope(bins, 0, from, last);
    const reached = r <= TERMINAL_RELAXATION_SLOPE;
    return {
      reached,
      ...none,
      relaxationSlope: r,
      reason: Number.isFinite(r)
        ? `over the last decade of reduced time G(t) falls as t^${r.toFixed(2)}${reached ? ' (terminal flow zone: a liquid)' : ''}`
        : 'too few points in the last decade of reduced time to judge the terminal zone',
    };
  }
  const bottom = bins.index[first];
  let to = first;
  while (to < last && bins.index[to + 1] < bottom + perDecade) to++;
  const s = bins.quantities.length > 0 ? binSlope(bins, 0, first, to) : NaN;
  const l = bins.quantities.length > 1 ? binSlope(bins, 1, first, to) : NaN;
  let lossAbove = false;
  if (bins.quantities.length > 1) {
    let d = 0;
    let n = 0;
    for (let j = first; j <= to; j++) {
      const a = bins.quantities[0];
      const b = bins.quantities[1];
      if (a.count[j] > 0 && b.count[j] > 0) {
        d += b.log10y[j] - a.log10y[j];
        n++;
      }
    }
    lossAbove = n > 0 && d / n > 0;
  }
  const reached =
    s >= TERMINAL_STORAGE_SLOPE &&
    l >= TERMINAL_LOSS_SLOPE[0] &&
    l <= TERMINAL_LOSS_SLOPE[1] &&
    lossAbove;
  const measured = Number.isFinite(s) && Number.isFinite(l);
  return {
    reached,
    storageSlope: s,
    lossSlope: l,
    relaxationSlope: NaN,
    reason: measured
      ? `over the lowest decade of reduced frequency the storage modulus rises as ω^${s.toFixed(2)} and the loss modulus as ω^${l.toFixed(2)}${reached ? ' (terminal zone: slopes near 2 and 1, a liquid)' : ''}`
      : 'too few storage and loss values in the lowest decade of reduced frequency to judge the terminal zone',
  };
}
