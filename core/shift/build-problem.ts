/**
 * Turn a dataset into the internal FitProblem: one FitSeries per active isotherm and driver, in
 * log space, masked points left out, fixed vertical offsets (bT from density or from a previous
 * step) added to the ordinate.
 */
import { abscissaShiftSign } from '../data/reduction';
import type { Dataset, QuantityId } from '../data/types';
import { alphaOf, betaOf, logOrdinate, quantityValues } from './drivers';
import type { FitProblem, FitSeries } from './problem';
import { buildSeries } from './series';
import { candidatePairs } from './pairs';
import { informativePairs } from './informative-pairs';

export interface ProblemSpec {
  /** Dataset indices of the isotherms in the fit. */
  active: number[];
  drivers: QuantityId[];
  /** Fixed log10 bT per dataset index (added as β·log10 bT), or null. */
  fixedLog10bT: number[] | null;
  joint: boolean;
  minOverlapPoints: number;
  maxPointsPerDecade: number;
  /** Per curve (position in `active`): point indices to leave out (flagged outliers). */
  dropped?: Set<number>[];
  /** Abscissa per dataset index instead of iso.x (e.g. |G*| for the van Gurp–Palmen shift). */
  abscissa?: (k: number) => ArrayLike<number>;
  /** Ordinate per quantity and value instead of logOrdinate (e.g. δ in degrees). */
  ordinate?: (q: QuantityId, value: number) => number;
  /** Direction of the offset on the abscissa. @default from dataset.abscissa */
  sigma?: 1 | -1;
}

export function buildProblem(dataset: Dataset, spec: ProblemSpec): FitProblem {
  const curves: FitSeries[][] = spec.active.map((k, c) => {
    const iso = dataset.isotherms[k];
    const raw = spec.abscissa ? spec.abscissa(k) : iso.x;
    const n = iso.x.length;
    const lx = new Float64Array(n);
    for (let i = 0; i < n; i++) lx[i] = raw[i] > 0 ? Math.log10(raw[i]) : NaN;
    const ordinate = spec.ordinate ?? logOrdinate;
    const drop = spec.dropped?.[c];
    return spec.drivers.map((q) => {
      const values = quantityValues(q, iso.quantities) ?? [];
      const offset = spec.fixedLog10bT ? betaOf(q) * spec.fixedLog10bT[k] : 0;
      const xs = new Float64Array(n);
      const ys = new Float64Array(n);
      const idx = new Int32Array(n);
      let m = 0;
      for (let i = 0; i < n; i++) {
        if (!iso.mask[i] || i >= values.length || (drop !== undefined && drop.has(i))) continue;
        xs[m] = lx[i];
        ys[m] = ordinate(q, values[i]) + offset;
        idx[m] = i;
        m++;
      }
      return buildSeries(
        xs.subarray(0, m),
        ys.subarray(0, m),
        idx.subarray(0, m),
        spec.maxPointsPerDecade,
      );
    });
  });
  const temps = spec.active.map((k) => dataset.isotherms[k].temperatureK);
  const order = Int32Array.from(spec.active.keys()).sort((a, b) => temps[a] - temps[b] || a - b);
  const problem: FitProblem = {
    sigma: spec.sigma ?? abscissaShiftSign(dataset.abscissa),
    alpha: Float64Array.from(spec.drivers, alphaOf),
    beta: Float64Array.from(spec.drivers, betaOf),
    joint: spec.joint,
    curves,
    pairs: new Int32Array(0),
    order,
    minOverlapPoints: spec.minOverlapPoints,
  };
  problem.pairs = informativePairs(problem, candidatePairs(problem), temps);
  return problem;
}
