/**
 * One complete offset fit: overlap groups, starting values (scan or warm start), joint robust
 * refinement under the reference constraint and the locks, outlier flagging with one re-fit,
 * uncertainties and residual statistics. Used for log10 aT (and log10 bT in a joint fit) and,
 * with log|G*| as abscissa, for bT from the van Gurp–Palmen curves.
 */
import type { FitProblem } from './problem';
import { overlapGroups } from './pairs';
import { forEachPair } from './residuals';
import { ResidualBuffer } from './residual-buffer';
import type { ReferenceWeights } from './reference';
import { referenceWeights } from './reference';
import { HUBER_K, MAD_TO_SIGMA, medianAbs } from './robust';
import type { LinearConstraint, SolveSettings } from './solve';
import type { OffsetUncertainty } from './covariance';
import { offsetUncertainty } from './covariance';
import { solveOffsets } from './solve';
import { startingOffsets } from './start';
import { StatsSink } from './stats-sink';
import { studentTQuantile } from '../numeric/student-t';
import type { FitInfo, ResolvedShiftOptions, RobustLoss } from './types';

/** Cauchy tuning constant for 95 % efficiency under normal errors (Holland & Welsch 1977). */
const CAUCHY_K = 2.385;
const MIN_SCALE_DECADES = 0.005;
/** Prior standard deviation of log10 bT in a joint fit, decades (a factor 1.26). */
export const JOINT_BT_PRIOR_DECADES = 0.1;
/** Smallest robust spread assumed for outlier flagging, decades (about 1 %). */
const OUTLIER_FLOOR_DECADES = 0.005;

export interface OffsetFitInput {
  /** Builds the problem; `dropped` = per curve, entries' point indices to leave out. */
  build: (dropped: Set<number>[] | undefined) => FitProblem;
  temperaturesK: number[];
  referenceK: number;
  /** Curve index → fixed horizontal offset. */
  locked: Map<number, number>;
  /**
   * Locked curves take part in the comparisons (the others move towards them). @default false:
   * they stand aside (see locksStandAside).
   */
  locksInform?: boolean;
  /** Work out standard errors and the covariance (costly). @default true */
  uncertainty?: boolean;
  /** Warm start per curve (NaN = unknown), or null. */
  initial: Float64Array | null;
  loss: RobustLoss;
  scale: number | null;
  flagOutliers: boolean;
  outlierThreshold: number;
  maxIterations: number;
  toleranceDecades: number;
  scanStep: number;
  directionAllowance: number | null;
  maxOffset: number;
}

/**
 * The robust-loss, outlier and stopping fields of an OffsetFitInput, as the user's resolved shift
 * options set them (the same for the horizontal fit and the van Gurp–Palmen vertical fit).
 */
export function robustFitSettings(
  s: ResolvedShiftOptions,
): Pick<
  OffsetFitInput,
  'loss' | 'scale' | 'flagOutliers' | 'outlierThreshold' | 'maxIterations' | 'toleranceDecades'
> {
  return {
    loss: s.robustLoss,
    scale: s.robustScaleDecades,
    flagOutliers: s.flagOutliers,
    outlierThreshold: s.outlierThreshold,
    maxIterations: s.maxIterations,
    toleranceDecades: s.toleranceDecades,
  };
}

export interface OffsetFit {
  problem: FitProblem;
  theta: Float64Array;
  /** Standard error of each parameter (NaN when unknown). */
  stdErr: Float64Array;
  /** Standard errors and covariance of the last pass; null when undetermined. */
  uncertainty: OffsetUncertainty | null;
  included: Uint8Array;
  overlapsNothing: Uint8Array;
  disconnected: Uint8Array;
  reference: ReferenceWeights | null;
  /** Value of Σ c_k h_k implied by the locks when the reference cannot be honoured, else null. */
  lockConflict: number | null;
  curveRms: Float64Array;
  rms: number;
  /** Robust (MAD) spread of the final residuals, decades. */
  robustSigma: number;
  /** Weighted residual variance of the last pass (the s² of the standard errors), decades². */
  residualVariance: number;
  /** Σ w r² of the last pass and the number of residuals in it. */
  weightedSquares: number;
  residualCount: number;
  /** Per curve, point indices flagged as outliers. */
  outliers: Set<number>[];
  info: FitInfo;
  /** Residual storage, reusable by follow-up fits on problems of the same size. */
  buffer: ResidualBuffer;
  /** The solver set-up of the last pass, for linearised follow-up fits (checks). */
  prior: Float64Array | undefined;
  fixed: Uint8Array;
  constraints: LinearConstraint[];
  scale: number;
}

function robustScale(loss: RobustLoss, residuals: ArrayLike<number>): number {
  const sigma = MAD_TO_SIGMA * medianAbs(residuals);
  const k = loss === 'cauchy' ? CAUCHY_K : HUBER_K;
  return Math.max(MIN_SCALE_DECADES, Number.isFinite(sigma) ? k * sigma : MIN_SCALE_DECADES);
}

/**
 * Chance that noise alone makes any entry of a data set look like an outlier (normal errors):
 * the threshold grows with the number of entries compared, as a Bonferroni bound (Miller,
 * Simultaneous Statistical Inference, 2nd ed., 1981, §1.3), so 10⁵ good entries are not left with
 * a handful of false flags (at 4 standard deviations about six would be).
 */
const FALSE_FLAG_CHANCE = 0.01;

/** The threshold in robust standard deviations: at least `threshold`, more for many entries. */
function outlierThresholdFor(threshold: number, stats: StatsSink): number {
  let entries = 0;
  for (const byDriver of stats.entryCount)
    for (const c of byDriver) for (const v of c) if (v > 0) entries++;
  if (entries === 0) return threshold;
  return Math.max(threshold, studentTQuantile(1 - FALSE_FLAG_CHANCE / (2 * entries), Infinity));
}

/** Residual statistics of `problem` at θ, walked pair by pair. */
function statsAt(problem: FitProblem, theta: Float64Array, buf: ResidualBuffer): StatsSink {
  const stats = new StatsSink(problem);
  forEachPair(problem, theta, (b) => stats.consume(b), buf);
  return stats;
}

function chooseMainGroup(
  groups: Int32Array,
  temps: number[],
  referenceK: number,
  locked: Map<number, number>,
): number {
  const size = new Map<number, number>();
  groups.forEach((g) => size.set(g, (size.get(g) ?? 0) + 1));
  const lockedIn = new Map<number, number>();
  for (const c of locked.keys()) lockedIn.set(groups[c], (lockedIn.get(groups[c]) ?? 0) + 1);
  let best = -1;
  let bestKey: [number, number, number] = [-1, -1, Infinity];
  groups.forEach((g, k) => {
    const lockedHere = lockedIn.get(g) ?? 0;
    const key: [number, number, number] = [
      lockedHere,
      size.get(g) ?? 0,
      Math.abs(temps[k] - referenceK),
    ];
    const better =
      key[0] > bestKey[0] ||
      (key[0] === bestKey[0] &&
        (key[1] > bestKey[1] || (key[1] === bestKey[1] && key[2] < bestKey[2])));
    if (better) {
      best = g;
      bestKey = key;
    }
  });
  return best;
}

/** Isotherms within this of Tref are measured at Tref (as in reference.ts), K. */
const AT_REFERENCE_K = 0.01;

/**
 * Whether the locked curves stay out of the comparisons: a shift fixed by hand is a hard
 * constraint on that curve only, and the others are fitted (and their outliers judged) as if it
 * were not there, so a hand-placed curve can neither drag them nor make their good points look
 * like outliers. Not possible when a locked curve is the one measured at Tref (the lock then
 * defines the reference) or fewer than two curves are left free.
 */
function locksStandAside(input: OffsetFitInput, n: number): boolean {
  if (input.locked.size === 0 || input.locksInform) return false;
  for (const k of input.locked.keys())
    if (Math.abs(input.temperaturesK[k] - input.referenceK) <= AT_REFERENCE_K) return false;
  return n - input.locked.size >= 2;
}

export function fitOffsets(input: OffsetFitInput): OffsetFit {
  let problem = input.build(undefined);
  const n = problem.curves.length;
  const size = problem.joint ? 2 * n : n;
  const temps = input.temperaturesK;
  const aside = locksStandAside(input, n);
  const informing = aside ? new Map<number, number>() : input.locked;
  const withoutLocked = (pairs: Int32Array): Int32Array => {
    if (!aside) return pairs;
    const keep: number[] = [];
    for (let q = 0; q < pairs.length; q += 2)
      if (!input.locked.has(pairs[q]) && !input.locked.has(pairs[q + 1]))
        keep.push(pairs[q], pairs[q + 1]);
    return Int32Array.from(keep);
  };
  problem = { ...problem, pairs: withoutLocked(problem.pairs) };
  const groups = overlapGroups(n, problem.pairs);
  const partners = new Uint8Array(n);
  for (let q = 0; q < problem.pairs.length; q++) partners[problem.pairs[q]] = 1;
  const main = n > 0 ? chooseMainGroup(groups, temps, input.referenceK, informing) : -1;
  const included = new Uint8Array(n);
  const overlapsNothing = new Uint8Array(n);
  const disconnected = new Uint8Array(n);
  for (let k = 0; k < n; k++) {
    const inMain = groups[k] === main && (partners[k] || n === 1);
    if (inMain || input.locked.has(k)) included[k] = 1;
    if (input.locked.has(k) && aside) continue;
    if (!partners[k]) overlapsNothing[k] = 1;
    else if (!inMain) disconnected[k] = 1;
  }
  const restrict = (p: FitProblem): FitProblem => {
    const keep: number[] = [];
    const pairs = withoutLocked(p.pairs);
    for (let q = 0; q < pairs.length; q += 2)
      if (included[pairs[q]] && included[pairs[q + 1]]) keep.push(pairs[q], pairs[q + 1]);
    return { ...p, pairs: Int32Array.from(keep) };
  };
  problem = restrict(problem);

  // Starting values.
  const inc = [...Array(n).keys()].filter((k) => included[k]);
  const warm =
    input.initial !== null &&
    inc.every((k) => input.locked.has(k) || Number.isFinite(input.initial![k]));
  let theta: Float64Array = new Float64Array(size);
  const known = new Map(informing);
  if (warm) {
    inc.forEach((k) => (theta[k] = input.locked.get(k) ?? input.initial![k]));
  } else if (inc.length > 0) {
    if (known.size === 0) {
      const free = aside ? inc.filter((k) => !input.locked.has(k)) : inc;
      const anchor = free.reduce((a, b) =>
        Math.abs(temps[a] - input.referenceK) <= Math.abs(temps[b] - input.referenceK) ? a : b,
      );
      known.set(anchor, 0);
    }
    const start = startingOffsets(problem, temps, known, new Map(), {
      step: input.scanStep,
      directionAllowance: input.directionAllowance,
      maxOffset: input.maxOffset,
    });
    theta = start.theta;
    for (const [k, v] of input.locked) theta[k] = v;
    for (const k of inc)
      if (!start.placed[k] && !(aside && input.locked.has(k))) {
        included[k] = 0;
        disconnected[k] = 1;
      }
    problem = restrict(problem);
  }
  const incFinal = [...Array(n).keys()].filter((k) => included[k]);
  const refCurves = aside ? incFinal.filter((k) => !input.locked.has(k)) : incFinal;
  const reference =
    refCurves.length > 0 ? referenceWeights(refCurves, temps, input.referenceK) : null;
  const constraints: LinearConstraint[] = [];
  const fixed = new Uint8Array(size);
  let lockConflict: number | null = null;
  if (reference) {
    const ch = new Float64Array(size);
    reference.coef.forEach((c, k) => (ch[k] = c));
    const allLocked = [...reference.coef.keys()].every((k) => input.locked.has(k));
    // An isotherm measured at Tref defines aT = 1 itself: its offset is held at 0 (exactly, so
    // its standard error is exactly 0), otherwise a linear constraint interpolates Tref.
    const [own] = reference.coef.size === 1 ? [...reference.coef.keys()] : [-1];
    if (allLocked) {
      let v = 0;
      reference.coef.forEach((c, k) => (v += c * (input.locked.get(k) ?? 0)));
      if (Math.abs(v) > 1e-9) lockConflict = v;
    } else if (own < 0) constraints.push({ coef: ch, rhs: 0 });
    if (informing.size === 0) {
      // Move all curves together so the reference holds without distorting the start.
      let v = 0;
      reference.coef.forEach((c, k) => (v += c * theta[k]));
      for (const k of refCurves) theta[k] -= v;
    }
    if (own >= 0 && !allLocked) {
      theta[own] = 0;
      fixed[own] = 1;
      if (problem.joint) {
        theta[n + own] = 0;
        fixed[n + own] = 1;
      }
    } else if (problem.joint) {
      const cv = new Float64Array(size);
      reference.coef.forEach((c, k) => (cv[n + k] = c));
      constraints.push({ coef: cv, rhs: 0 });
    }
  }
  for (let k = 0; k < n; k++) {
    if (!included[k] || input.locked.has(k)) fixed[k] = 1;
    if (problem.joint && !included[k]) fixed[n + k] = 1;
  }

  const buffer = new ResidualBuffer();
  let finalStats: StatsSink | null = null;
  let finalSigma = NaN;
  const outliers: Set<number>[] = Array.from({ length: n }, () => new Set<number>());
  // A joint fit gets a weak prior on log10 bT: bT stays within a few per cent of 1 for a simple
  // material (Ferry 1980), and without it a featureless (power-law) curve could trade bT against
  // aT without bound.
  const prior = problem.joint ? new Float64Array(size) : undefined;
  if (prior)
    for (let k = 0; k < n; k++)
      prior[n + k] = 1 / (JOINT_BT_PRIOR_DECADES * JOINT_BT_PRIOR_DECADES);
  let settings: SolveSettings | null = null;
  const runPass = (t: Float64Array, covariance: boolean) => {
    const scale = input.scale ?? robustScale(input.loss, statsAt(problem, t, buffer).residuals);
    settings = {
      prior,
      loss: input.loss,
      scale,
      maxIterations: input.maxIterations,
      fixed,
      constraints,
      toleranceDecades: input.toleranceDecades,
      buffer,
      covariance,
    };
    return solveOffsets(problem, t, settings);
  };
  // A first pass that outlier flagging may follow leaves the (costly) covariance for later.
  const mayRefit = input.flagOutliers && incFinal.length > 1;
  const wantUncertainty = input.uncertainty !== false;
  let outcome = runPass(theta, !mayRefit && wantUncertainty);
  let iterations = outcome.iterations;
  let passes = 1;
  if (mayRefit) {
    const stats = statsAt(problem, outcome.theta, buffer);
    const sigma = MAD_TO_SIGMA * medianAbs(stats.residuals);
    // Points within OUTLIER_FLOOR_DECADES·threshold of the others are never flagged: on very clean
    // data the robust spread is tiny and interpolation alone would otherwise flag good points.
    const limit =
      outlierThresholdFor(input.outlierThreshold, stats) * Math.max(sigma, OUTLIER_FLOOR_DECADES);
    let flagged = 0;
    problem.curves.forEach((curve, k) =>
      curve.forEach((s, d) => {
        for (let e = 0; e < s.lx.length; e++) {
          const c = stats.entryCount[k][d][e];
          if (c > 0 && Math.abs(stats.entrySum[k][d][e] / c) > limit) {
            for (let q = s.binStart[e]; q < s.binStart[e + 1]; q++)
              outliers[k].add(s.pointIndex[q]);
            flagged++;
          }
        }
      }),
    );
    if (flagged === 0) {
      finalStats = stats;
      finalSigma = sigma;
      outcome.uncertainty = wantUncertainty
        ? offsetUncertainty(problem, outcome.theta, settings!, outcome.residualVariance)
        : null;
    } else {
      problem = restrict(input.build(outliers));
      outcome = runPass(outcome.theta, wantUncertainty);
      iterations += outcome.iterations;
      passes = 2;
    }
  }
  theta = outcome.theta;
  // Reuse the outlier pass's statistics when nothing was flagged (same θ, same problem).
  const stats = finalStats ?? statsAt(problem, theta, buffer);
  const robustSigma = finalStats ? finalSigma : MAD_TO_SIGMA * medianAbs(stats.residuals);
  const curveRms = new Float64Array(n);
  for (let k = 0; k < n; k++) curveRms[k] = stats.curveRms(k);
  for (const k of incFinal)
    if (!input.locked.has(k) && !(stats.curveW[k] > 0) && incFinal.length > 1) {
      included[k] = 0;
      overlapsNothing[k] = 1;
    }
  const stdErr = outcome.uncertainty
    ? Float64Array.from(outcome.uncertainty.stdErr)
    : new Float64Array(size).fill(NaN);
  return {
    problem,
    theta,
    stdErr,
    uncertainty: outcome.uncertainty,
    included,
    overlapsNothing,
    disconnected,
    reference,
    lockConflict,
    curveRms,
    rms: stats.rms(),
    robustSigma,
    residualVariance: outcome.residualVariance,
    weightedSquares: outcome.weightedSquares,
    residualCount: outcome.residualCount,
    outliers,
    buffer,
    prior,
    fixed,
    constraints,
    scale: settings!.scale,
    info: {
      converged: outcome.converged,
      iterations,
      reason: outcome.reason,
      passes,
      warmStart: warm,
    },
  };
}
