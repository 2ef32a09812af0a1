/**
 * Agreement of the shifts found from each driving quantity alone (e.g. G' alone against G''
 * alone), a check of superposition (docs/conventions.md §4): for a thermorheologically simple material both
 * give the same aT within their noise.
 *
 * Each single-quantity fit starts at the joint optimum and takes at most two Levenberg–Marquardt
 * iterations with the same reference, locks, prior and robust scale: the shifts differ by a few
 * hundredths of a decade, inside the quadratic region, and have settled to the refinement's
 * tolerance by then. Only the largest difference is reported, so only the two standard errors
 * behind it are computed (covariance.ts, offsetStdErrors: the same sandwich as the main fit, for
 * one shift instead of the whole matrix), and only when the difference is large enough to matter.
 */
import type { Dataset, QuantityId } from '../data/types';
import { buildProblem } from './build-problem';
import { DISAGREE_DECADES } from './checks';
import type { OffsetFit } from './fit-offsets';
import { candidatePairs } from './pairs';
import { informativePairs } from './informative-pairs';
import type { FitProblem } from './problem';
import { offsetStdErrors } from './covariance';
import type { SolveSettings } from './solve';
import { solveOffsets } from './solve';
import type { ResolvedShiftOptions } from './types';
import type { VerticalOutcome } from './vertical';

/**
 * Differences up to this many decades never affect the grade (checks.ts: fair needs more than
 * DISAGREE_DECADES / 2), so their standard errors are not computed.
 */
export const MATERIAL_DECADES = DISAGREE_DECADES / 2;

/** Iterations from the joint optimum: the shifts have settled to within 0.001 decades or so. */
const ITERATIONS = 2;

export interface Disagreement {
  /** Largest |log10 aT(a) − log10 aT(b)| over included, unlocked isotherms, decades. */
  decades: number;
  /**
   * That difference in standard errors of the difference (Infinity when the error is 0; NaN when
   * not computed because the difference is at most MATERIAL_DECADES).
   */
  z: number;
}

/**
 * The problem for one quantity alone: reuses the main fit's series when that quantity drove it
 * (no rebuilding), otherwise builds it with the main fit's outliers left out. Only pairs of
 * included isotherms take part.
 */
function singleDriver(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  fit: OffsetFit,
  active: number[],
  vertical: VerticalOutcome,
  q: QuantityId,
): FitProblem {
  const d = s.drivers.indexOf(q);
  let p: FitProblem;
  if (d >= 0) {
    p = {
      ...fit.problem,
      curves: fit.problem.curves.map((c) => [c[d]]),
      alpha: fit.problem.alpha.subarray(d, d + 1),
      beta: fit.problem.beta.subarray(d, d + 1),
    };
    p.pairs = informativePairs(
      p,
      candidatePairs(p),
      active.map((k) => dataset.isotherms[k].temperatureK),
    );
  } else
    p = buildProblem(dataset, {
      active,
      drivers: [q],
      fixedLog10bT: vertical.joint ? null : vertical.log10bT,
      joint: vertical.joint,
      minOverlapPoints: s.minOverlapPoints,
      maxPointsPerDecade: s.maxPointsPerDecade,
      dropped: fit.outliers,
    });
  const keep: number[] = [];
  for (let k = 0; k < p.pairs.length; k += 2)
    if (fit.included[p.pairs[k]] && fit.included[p.pairs[k + 1]])
      keep.push(p.pairs[k], p.pairs[k + 1]);
  return { ...p, pairs: Int32Array.from(keep), segmentCurvature: true };
}

/** One quantity's fit from the joint optimum, with what its standard errors need. */
interface SingleQuantity {
  problem: FitProblem;
  settings: SolveSettings;
  theta: Float64Array;
  residualVariance: number;
}

/** At most two Levenberg–Marquardt iterations from the joint optimum, without a covariance. */
function singleQuantityShift(
  problem: FitProblem,
  fit: OffsetFit,
  s: ResolvedShiftOptions,
): SingleQuantity {
  const settings: SolveSettings = {
    loss: s.robustLoss,
    scale: fit.scale,
    maxIterations: ITERATIONS,
    fixed: fit.fixed,
    constraints: fit.constraints,
    prior: fit.prior,
    buffer: fit.buffer,
    toleranceDecades: s.toleranceDecades,
    covariance: false,
  };
  const out = solveOffsets(problem, fit.theta, settings);
  return { problem, settings, theta: out.theta, residualVariance: out.residualVariance };
}

/** Standard error of one quantity's shift of curve c (the same sandwich as the main fit). */
function stdErrOf(q: SingleQuantity, c: number): number {
  return offsetStdErrors(q.problem, q.theta, q.settings, q.residualVariance, [c])[0];
}

export function quantityDisagreement(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  fit: OffsetFit,
  active: number[],
  vertical: VerticalOutcome,
  quantities: QuantityId[],
): Disagreement | null {
  const n = active.length;
  const lockedIds = new Set(s.locked.map((l) => l.id));
  const locked = new Set<number>();
  active.forEach((k, c) => {
    if (lockedIds.has(dataset.isotherms[k].id)) locked.add(c);
  });
  const fits = quantities.map((q) =>
    singleQuantityShift(singleDriver(dataset, s, fit, active, vertical, q), fit, s),
  );
  let best: { decades: number; a: number; b: number; c: number } | null = null;
  for (let a = 0; a < fits.length; a++)
    for (let b = a + 1; b < fits.length; b++)
      for (let c = 0; c < n; c++) {
        if (!fit.included[c] || locked.has(c)) continue;
        const d = Math.abs(fits[a].theta[c] - fits[b].theta[c]);
        if (Number.isFinite(d) && (!best || d > best.decades)) best = { decades: d, a, b, c };
      }
  if (!best) return null;
  // A difference this small cannot change the grade whatever its standard error: skip them.
  if (best.decades <= MATERIAL_DECADES) return { decades: best.decades, z: NaN };
  // Only the largest difference is reported, so only its two standard errors are needed.
  const se = Math.hypot(stdErrOf(fits[best.a], best.c), stdErrOf(fits[best.b], best.c));
  return { decades: best.decades, z: se > 0 ? best.decades / se : Infinity };
}
