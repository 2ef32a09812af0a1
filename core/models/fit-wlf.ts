import { adjustedModel, shiftFitStatistics } from './fit-statistics';
import { WLF_LAW } from './shift-laws';
import { resolveShiftFitOptions } from './shift-fit-options';
import { levenbergMarquardtFit } from './levenberg-marquardt-fit';
import type { PreparedPoints } from './prepare-points';
import { preparePoints } from './prepare-points';
import { weightingOfPoints } from './shift-weighting';
import type { ShiftFitOptions, ShiftPoint, WlfFit } from './types';
import { weightedLinearFit } from './weighted-linear-fit';

export interface WlfFitOptions extends ShiftFitOptions {
  /** Starting values [C1, C2 (K)]; by default from the linearised WLF form. @default undefined */
  initial?: [number, number];
  /** Iteration budget of the Levenberg–Marquardt fit. @default 1000 */
  maxIterations?: number;
}

/** Above this C2 the WLF curve is practically a straight line in T: report a runaway. */
export const WLF_C2_RUNAWAY_K = 1e4;

/**
 * Starting values from the linearised WLF form (Ferry 1980, ch. 11):
 * (T − Tr)/log10 aT = −C2/C1 − (T − Tr)/C1, a straight line in (T − Tr).
 */
function startingValues(pts: PreparedPoints, referenceK: number, minC2: number): [number, number] {
  const rows: number[][] = [];
  const y: number[] = [];
  const w: number[] = [];
  pts.temperatureK.forEach((T, i) => {
    const a = pts.log10aT[i];
    if (Math.abs(a) < 1e-6) return;
    const d = T - referenceK;
    rows.push([1, d]);
    y.push(d / a);
    const s = (Math.abs(d) / (a * a)) * pts.sigma[i];
    w.push(1 / (s * s));
  });
  if (rows.length >= 2) {
    const [alpha, beta] = weightedLinearFit(rows, y, w).coefficients;
    const c1 = -1 / beta;
    const c2 = -alpha * c1;
    if (Number.isFinite(c1) && c1 > 0 && c2 > minC2 && c2 < WLF_C2_RUNAWAY_K) return [c1, c2];
  }
  return [10, Math.max(100, minC2 + 50)];
}

/**
 * WLF fit, log10 aT = −C1 (T − Tr)/(C2 + T − Tr) (Williams, Landel & Ferry, JACS 77, 3701, 1955),
 * by Levenberg–Marquardt on scaled parameters, minimising the generalised sum of squares with the
 * shift covariance when given (whitened residuals, see shift-weighting.ts), else Σ (r/σ)². C2 is
 * kept above Tr − Tmin so the curve's pole stays below the coldest isotherm, and below
 * WLF_C2_RUNAWAY_K.
 */
export function fitWlf(points: readonly ShiftPoint[], options: WlfFitOptions): WlfFit {
  const o = resolveShiftFitOptions(options);
  const referenceK = o.referenceK;
  const pts = preparePoints(points, referenceK);
  if (pts.temperatureK.length < 2) {
    throw new RangeError(
      'fitWlf needs at least two measured shift factors away from the reference temperature',
    );
  }
  const weighting = weightingOfPoints(pts, o.covariance, o.diagonalReason);
  // the pole Tr − C2 must lie below the reference and below the coldest isotherm
  let coldest = Infinity;
  for (const T of pts.temperatureK) if (T < coldest) coldest = T;
  const minC2 = Math.max(referenceK - coldest, 0) + 1e-3;
  const init = options.initial ?? startingValues(pts, referenceK, minC2);
  if (!(init[1] > minC2)) {
    throw new RangeError(
      `initial C2 must exceed ${minC2.toFixed(2)} K (the WLF pole Tr − C2 must lie below Tr and the coldest isotherm)`,
    );
  }
  const scale = [Math.abs(init[0]) || 1, init[1]];
  const m = pts.temperatureK.length;
  const target = weighting.whiten(pts.log10aT);
  let cacheKey = '';
  let cache: Float64Array = new Float64Array(m);
  const whitenedModel = (u: number[]): Float64Array => {
    const key = `${u[0]}|${u[1]}`;
    if (key !== cacheKey) {
      const values = [u[0] * scale[0], u[1] * scale[1]];
      cache = weighting.whiten(
        adjustedModel(WLF_LAW, values, referenceK, pts.temperatureK, weighting),
      );
      cacheKey = key;
    }
    return cache;
  };
  const lm = levenbergMarquardtFit(
    {
      x: Array.from({ length: m }, (_, i) => i),
      y: target,
      model: (u) => {
        const v = whitenedModel(u);
        return (i) => v[i];
      },
      initial: [init[0] / scale[0], 1],
      min: [-1e6, minC2 / scale[1]],
      max: [1e6, WLF_C2_RUNAWAY_K / scale[1]],
    },
    { maxIterations: options.maxIterations ?? 1000 },
  );
  const c1 = lm.params[0] * scale[0];
  const c2K = lm.params[1] * scale[1];
  let { converged, reason } = lm;
  if (c2K >= WLF_C2_RUNAWAY_K * 0.999) {
    converged = false;
    reason = `C2 ran away to ${WLF_C2_RUNAWAY_K} K: the data are straight in 1/T or T; an Arrhenius fit suits them better.`;
  } else if (c2K <= minC2 * 1.001 + 1e-3) {
    converged = false;
    reason =
      'C2 sits at its lower bound (the WLF pole touches the coldest isotherm): WLF does not describe these data.';
  }
  const stats = shiftFitStatistics(
    WLF_LAW,
    [c1, c2K],
    referenceK,
    pts,
    weighting,
    o.errorScaling,
    { converged, iterations: lm.iterations, reason },
    o.glassTransitionK,
  );
  return { ...stats, kind: 'wlf', c1, c2K };
}
