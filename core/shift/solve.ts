/**
 * Joint refinement of all offsets: Levenberg–Marquardt on the reweighted normal equations
 * (Marquardt, J. SIAM 11, 1963), with fixed (locked) parameters held and linear equality
 * constraints (the reference: aT(Tref) = 1, bT(Tref) = 1) kept exactly through the KKT system
 * (kkt.ts), in rounds of frozen compared points (normal-walk.ts). It reports converged only when
 * its tolerance was met; an iteration limit or a stall is converged: false with the reason. The
 * covariance of the offsets is s²·M B M, M the top-left block of the inverse KKT matrix without
 * damping (the curvature of the objective at the optimum), B the propagated point noise
 * (sandwich.ts) and s² the weighted residual variance over the residuals compared (bins, on
 * dense curves); errors are relative to the constraints, i.e. to the reference temperature.
 */
import type { FitProblem } from './problem';
import { parameterCount } from './problem';
import type { OffsetUncertainty } from './covariance';
import { offsetUncertainty, support } from './covariance';
import type { LinearConstraint } from './kkt';
import { addPrior, kktStep, projectOntoConstraints } from './kkt';
import { parameterLayout } from './layout';
import type { NormalSink } from './normal-equations';
import { comparedSets, normalAt } from './normal-walk';

export type { LinearConstraint } from './kkt';
// The settings live in their own file so that covariance.ts can read them without importing the solver.
export type { SolveSettings } from './solve-settings';
import type { SolveSettings } from './solve-settings';

export interface SolveOutcome {
  theta: Float64Array;
  converged: boolean;
  iterations: number;
  reason: string;
  /** Standard errors and covariance at θ; null if singular or not asked for (covariance.ts). */
  uncertainty: OffsetUncertainty | null;
  /** Weighted residual variance, decades². */
  residualVariance: number;
  /** Residuals (compared entries) at θ. */
  residualCount: number;
  /** Σ w r² at θ (the numerator of residualVariance), decades². */
  weightedSquares: number;
  objective: number;
}

/** Largest change of any offset in one iteration, decades. */
const MAX_STEP_DECADES = 0.5;
/** Marquardt damping at the start, and its bounds (relative to the diagonal of the curvature). */
const LAMBDA_START = 1e-4;
const LAMBDA_MIN = 1e-12;
/**
 * Damping beyond which no step is possible any more: the steps are then gradient steps a
 * millionth of a Gauss–Newton step long, so rejecting them means the fit has stalled.
 */
const LAMBDA_MAX = 1e6;
/**
 * Up to this damping a step is still essentially the Gauss–Newton step (at most half as long), so
 * a step below the tolerance there means the optimum is reached.
 */
const LAMBDA_TRUSTED = 1;

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
  const layout = parameterLayout(p, cons.map(support));
  const evaluate = (t: Float64Array, sets: Int32Array): NormalSink =>
    addPrior(normalAt(p, t, s.loss, s.scale, true, layout, sets), t, s.prior, s.scale);
  // Rounds: the points compared are frozen within one (normal-walk.ts) and worked out afresh at
  // its optimum; the fit ends when a round starts and ends with the same points compared.
  let sets = comparedSets(p, theta);
  let iterations = 0;
  let outcome: RoundOutcome = {
    converged: m === 0,
    reason: m === 0 ? 'nothing to fit' : `iteration limit (${s.maxIterations})`,
    iterations: 0,
    cur: evaluate(theta, sets),
  };
  for (let round = 1; m > 0; round++) {
    const before = Float64Array.from(theta);
    outcome = refineRound(theta, s, free, cons, s.maxIterations - iterations, outcome.cur, (t) =>
      evaluate(t, sets),
    );
    iterations += outcome.iterations;
    if (!outcome.converged) break;
    const next = comparedSets(p, theta);
    if (sameSets(next, sets)) break;
    let moved = 0;
    for (const i of free) moved = Math.max(moved, Math.abs(theta[i] - before[i]));
    // A later round that moved no shift by the tolerance has found the optimum of points compared
    // that differ from the last ones only at the ends of the overlaps (a point that crosses the
    // other curve's end and back): another round would move the shifts by as little again. The
    // normal equations at θ are those of this round's points.
    if (round >= 2 && moved < s.toleranceDecades) break;
    // Out of iterations: the fit stops here, and re-evaluating with the new points would be lost.
    if (iterations >= s.maxIterations) {
      outcome.converged = false;
      outcome.reason = `iteration limit (${s.maxIterations})`;
      break;
    }
    sets = next;
    outcome.cur = evaluate(theta, sets);
    if (round >= MAX_ROUNDS) {
      if (moved >= s.toleranceDecades) {
        outcome.converged = false;
        outcome.reason = `the points compared still changed after ${MAX_ROUNDS} rounds (last round moved ${moved.toPrecision(2)} decades)`;
      }
      break;
    }
  }
  const { converged, reason, cur } = outcome;
  const dof = Math.max(1, cur.residuals - m + nc);
  const residualVariance = cur.weightedSquares / dof;
  return {
    theta,
    converged,
    iterations,
    reason,
    uncertainty: s.covariance === false ? null : offsetUncertainty(p, theta, s, residualVariance),
    residualVariance,
    residualCount: cur.residuals,
    weightedSquares: cur.weightedSquares,
    objective: cur.objective(),
  };
}

/** Rounds of frozen compared points before the fit stops (normally 1–2 suffice). */
const MAX_ROUNDS = 4;

function sameSets(a: Int32Array, b: Int32Array): boolean {
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return false;
  return true;
}

interface RoundOutcome {
  converged: boolean;
  reason: string;
  iterations: number;
  /** Normal equations at the final θ. */
  cur: NormalSink;
}

/** Levenberg–Marquardt iterations on one frozen set of compared points; updates θ in place. */
function refineRound(
  theta: Float64Array,
  s: SolveSettings,
  free: number[],
  cons: LinearConstraint[],
  maxIterations: number,
  /** The normal equations at θ with this round's compared points. */
  start: NormalSink,
  evaluate: (t: Float64Array) => NormalSink,
): RoundOutcome {
  let cur = start;
  const score = (k: NormalSink): number => k.lossSum;
  let lambda = LAMBDA_START;
  let iterations = 0;
  let converged = false;
  let stalled = false;
  let reason = `iteration limit (${s.maxIterations})`;
  let previousStep = Infinity;
  while (!converged && !stalled && iterations < maxIterations) {
    iterations++;
    let accepted = false;
    while (!accepted && !converged && !stalled) {
      const step = kktStep(cur, s.fixed, cons, theta, lambda);
      if (!step) {
        lambda *= 10;
        if (lambda > LAMBDA_MAX) {
          stalled = true;
          reason = 'stalled: the normal equations are singular';
        }
        continue;
      }
      let maxStep = 0;
      for (const i of free) maxStep = Math.max(maxStep, Math.abs(step[i]));
      // Trust region: no shift moves by more than MAX_STEP_DECADES in one iteration.
      const shrink = maxStep > MAX_STEP_DECADES ? MAX_STEP_DECADES / maxStep : 1;
      maxStep *= shrink;
      const trusted = lambda <= LAMBDA_TRUSTED;
      const trial = Float64Array.from(theta);
      for (const i of free) trial[i] += shrink * step[i];
      const next = evaluate(trial);
      if (score(next) <= score(cur)) {
        theta.set(trial);
        cur = next;
        accepted = true;
        // With linear convergence (steps shrinking by a factor q) the optimum is still about
        // step·q/(1 − q) away: the fit stops only when that, too, is below the tolerance.
        const q = maxStep / previousStep;
        const remaining = q < 1 ? (maxStep * q) / (1 - q) : 0;
        previousStep = trusted ? maxStep : Infinity;
        if (trusted && maxStep < s.toleranceDecades && remaining < s.toleranceDecades) {
          converged = true;
          reason = 'step below tolerance';
        }
        lambda = Math.max(lambda / 10, LAMBDA_MIN);
      } else {
        // Linear interpolation makes the mismatch piecewise smooth: within a few tolerances of
        // the optimum a Gauss–Newton step can fail to lower it, which is the optimum at the
        // resolution asked for.
        if (trusted && maxStep < 3 * s.toleranceDecades) {
          converged = true;
          reason = 'rejected step below 3× tolerance';
          break;
        }
        lambda *= 10;
        previousStep = Infinity;
        if (lambda > LAMBDA_MAX) {
          stalled = true;
          reason = `stalled: no step lowered the mismatch (last step ${maxStep.toPrecision(2)} decades)`;
        }
      }
    }
  }
  return { converged, reason, iterations, cur };
}
