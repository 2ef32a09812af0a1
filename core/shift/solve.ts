/**
 * Joint refinement of all offsets: Levenberg–Marquardt on the IRLS normal equations (Marquardt,
 * J. SIAM 11, 1963), with fixed (locked) parameters removed and linear equality constraints
 * (the reference: aT(Tref) = 1, bT(Tref) = 1) kept exactly through the KKT system (kkt.ts). The
 * covariance of the offsets is s²·M B M, M the top-left block of the inverse KKT matrix without
 * damping (the curvature of the objective at the optimum), B the propagated point noise
 * (sandwich.ts) and s² the weighted residual variance; errors are relative to the constraints,
 * i.e. to the reference temperature.
 */
import type { FitProblem } from './problem';
import { parameterCount } from './problem';
import type { ResidualBuffer } from './residual-buffer';
import { offsetCovariance } from './covariance';
import type { LinearConstraint } from './kkt';
import { addPrior, kktStep, projectOntoConstraints } from './kkt';
import type { NormalSink } from './normal-equations';
import { normalAt } from './normal-walk';
import type { RobustLoss } from './types';

export type { LinearConstraint } from './kkt';

export interface SolveSettings {
  loss: RobustLoss;
  scale: number;
  maxIterations: number;
  /** 1 = parameter kept at its starting value. */
  fixed: Uint8Array;
  constraints: LinearConstraint[];
  /** Stop when no parameter moves by more than this, decades. */
  toleranceDecades: number;
  /**
   * Optional Gaussian prior per parameter: 1/σ² (decades⁻²), 0 for none. Enters as
   * ½·scale²·θ²/σ², on the same footing as the standardised residuals.
   */
  prior?: Float64Array;
  /** Reused residual storage (optional). */
  buffer?: ResidualBuffer;
  /**
   * Compute the covariance at the optimum (the costly part: a sandwich over every residual).
   * Off for a pass that is followed by another one. @default true
   */
  covariance?: boolean;
}

export interface SolveOutcome {
  theta: Float64Array;
  converged: boolean;
  iterations: number;
  reason: string;
  /**
   * Covariance over the full parameter vector (zeros for fixed ones); null if singular or not
   * asked for (see offsetCovariance()).
   */
  covariance: Float64Array | null;
  /** Weighted residual variance, decades². */
  residualVariance: number;
  residualCount: number;
  objective: number;
}

/** Largest change of any offset in one iteration, decades. */
const MAX_STEP_DECADES = 0.5;
/** Relative decrease of the objective below which the fit has converged. */
const REL_TOL = 1e-7;
/** Rejected steps in a row after which no further decrease is possible. */
const MAX_REJECTIONS = 4;

export function solveOffsets(
  p: FitProblem,
  theta0: ArrayLike<number>,
  s: SolveSettings,
): SolveOutcome {
  const size = parameterCount(p);
  const theta = Float64Array.from(theta0);
  const free: number[] = [];
  for (let i = 0; i < size; i++) if (!s.fixed[i]) free.push(i);
  const m = free.length;
  const cons = s.constraints.filter((c) => free.some((i) => c.coef[i] !== 0));
  const nc = cons.length;
  projectOntoConstraints(theta, free, cons);
  const evaluate = (t: Float64Array, matrix: boolean): NormalSink => {
    return addPrior(normalAt(p, t, s.loss, s.scale, matrix), t, s.prior, s.scale);
  };
  let cur = evaluate(theta, true);
  // A point that leaves the overlaps keeps costing the mean loss per point at the start, so the
  // score (normalised by the N0 points at the start) cannot improve merely because fewer points
  // are compared.
  const n0 = cur.count;
  const lostLoss = n0 > 0 ? cur.lossSum / n0 : 0;
  const score = (k: NormalSink): number =>
    n0 > 0 ? (k.lossSum + lostLoss * Math.max(0, n0 - k.count)) / n0 : k.objective();
  let lambda = 1e-6;
  let iterations = 0;
  let converged = m === 0;
  let reason = m === 0 ? 'nothing to fit' : 'iteration limit';
  while (!converged && iterations < s.maxIterations) {
    iterations++;
    let accepted = false;
    let rejections = 0;
    while (!accepted && rejections < MAX_REJECTIONS) {
      const step = kktStep(cur, free, cons, theta, lambda);
      if (!step) {
        lambda *= 10;
        rejections++;
        continue;
      }
      const trial = Float64Array.from(theta);
      let maxStep = 0;
      for (let k = 0; k < m; k++) maxStep = Math.max(maxStep, Math.abs(step[k]));
      // Trust region: no shift moves by more than MAX_STEP_DECADES in one iteration.
      const shrink = maxStep > MAX_STEP_DECADES ? MAX_STEP_DECADES / maxStep : 1;
      for (let k = 0; k < m; k++) trial[free[k]] += shrink * step[k];
      maxStep *= shrink;
      if (maxStep < s.toleranceDecades) {
        converged = true;
        reason = 'step below tolerance';
        break;
      }
      const next = evaluate(trial, true);
      const before = score(cur);
      const after = score(next);
      if (after <= before) {
        theta.set(trial);
        cur = next;
        lambda = Math.max(lambda / 10, 1e-12);
        accepted = true;
        if (maxStep < s.toleranceDecades) {
          converged = true;
          reason = 'step below tolerance';
        } else if (before - after <= REL_TOL * before) {
          converged = true;
          reason = 'objective change below tolerance';
        }
      } else {
        lambda *= 4;
        rejections++;
        if (maxStep < 3 * s.toleranceDecades) {
          converged = true;
          reason = 'rejected step below 3× tolerance';
          break;
        }
      }
    }
    if (!accepted && !converged) {
      converged = true;
      reason = 'no further decrease';
    }
  }
  const dof = Math.max(1, cur.count - m + nc);
  const residualVariance = cur.weightedSquares / dof;
  return {
    theta,
    converged,
    iterations,
    reason,
    covariance: s.covariance === false ? null : offsetCovariance(p, theta, s, residualVariance),
    residualVariance,
    residualCount: cur.count,
    objective: cur.objective(),
  };
}
