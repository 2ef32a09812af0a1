/**
 * The master curve log-binned for the indicators (core/spectrum/log-bins.ts), so crossovers are
 * confirmed by the data and |η*| is read as bin means, at any number of points. Outliers are left
 * out. |η*| is the measured complex viscosity where given, else √(G′² + G″²)/ω_r.
 */
import { complexModulusOf } from '../data/derived';
import { densestRun, logBins, type LogBins } from '../spectrum/log-bins';
import { masterColumns, type MasterColumns } from './master-columns';
import type { AnalysisMasterCurve } from './types';

export const INDICATOR_BINS_PER_DECADE = 20;

export interface BinnedMaster {
  /** Bins of [storage, loss, |η*|], restricted to the densest stretch. */
  bins: LogBins;
  first: number;
  last: number;
  /** The |η*| points binned (outliers NaN), for the viscosity fit (zero-shear.ts). */
  viscosity: { w: Float64Array; eta: Float64Array };
}

export function binnedMaster(
  mc: AnalysisMasterCurve,
  columns: MasterColumns = masterColumns(mc),
): BinnedMaster {
  const n = columns.x.length;
  const nan = (): Float64Array => new Float64Array(n).fill(NaN);
  const gs = columns.quantities.storageModulus ?? nan();
  const gl = columns.quantities.lossModulus ?? nan();
  const v = columns.quantities.complexViscosity;
  const x = new Float64Array(n);
  const eta = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const xi = columns.x[i];
    x[i] = columns.outlier[i] ? NaN : xi;
    const e = v ? v[i] : NaN;
    const a = gs[i];
    const b = gl[i];
    // NaN in the columns is null in the master curve: a missing value
    eta[i] = e === e ? e : a === a && b === b ? complexModulusOf(a, b) / xi : NaN;
  }
  const bins = logBins(x, [gs, gl, eta], INDICATOR_BINS_PER_DECADE);
  const run = densestRun(bins);
  return { bins, first: run.first, last: run.last, viscosity: { w: x, eta } };
}
