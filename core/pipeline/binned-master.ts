/**
 * The master curve log-binned for the indicators (core/spectrum/log-bins.ts), so crossovers are
 * confirmed by the data and |η*| is read as bin means, at any number of points. Outliers are left
 * out. |η*| is the measured complex viscosity where given, else √(G′² + G″²)/ω_r.
 */
import { complexModulusOf } from '../data/derived';
import { densestRun, logBins, type LogBins } from '../spectrum/log-bins';
import type { AnalysisMasterCurve } from './types';

export const INDICATOR_BINS_PER_DECADE = 20;

export interface BinnedMaster {
  /** Bins of [storage, loss, |η*|], restricted to the densest stretch. */
  bins: LogBins;
  first: number;
  last: number;
}

export function binnedMaster(mc: AnalysisMasterCurve): BinnedMaster {
  const n = mc.reducedX.length;
  const s = mc.quantities.storageModulus;
  const l = mc.quantities.lossModulus;
  const v = mc.quantities.complexViscosity;
  const x = new Float64Array(n);
  const gs = new Float64Array(n).fill(NaN);
  const gl = new Float64Array(n).fill(NaN);
  const eta = new Float64Array(n).fill(NaN);
  for (let i = 0; i < n; i++) {
    x[i] = mc.outlier[i] ? NaN : mc.reducedX[i];
    const a = s?.[i];
    const b = l?.[i];
    if (a != null) gs[i] = a;
    if (b != null) gl[i] = b;
    const e = v?.[i];
    eta[i] = e != null ? e : a != null && b != null ? complexModulusOf(a, b) / mc.reducedX[i] : NaN;
  }
  const bins = logBins(x, [gs, gl, eta], INDICATOR_BINS_PER_DECADE);
  const run = densestRun(bins);
  return { bins, first: run.first, last: run.last };
}
