/**
 * Uncertainty of the offsets at the optimum θ of solveOffsets (same settings): the sandwich
 * Cov = s²·M B M (Huber 1967), M the constrained inverse of the curvature (kkt.ts), B the point
 * noise propagated through every comparison (sandwich.ts), s² the weighted residual variance, all
 * with noise-damped slopes (see FitProblem.smoothSlopes). Errors are relative to the constraints,
 * i.e. to the reference temperature.
 *
 * The standard errors (the diagonal) come from a selected inversion of the banded system
 * (envelope.ts) in O(n·w²); the full matrix, which costs O(n²·w) time and O(n²) memory, is worked
 * out only for the parameters asked for.
 */
import type { Sandwich } from './kkt';
import { addPrior, sandwichOf } from './kkt';
import { parameterLayout } from './layout';
import type { FitProblem } from './problem';
import { parameterCount } from './problem';
import { forEachPair } from './residuals';
import { ResidualBuffer } from './residual-buffer';
import { NormalSink } from './normal-equations';
import { SandwichSink } from './sandwich';
import type { SolveSettings } from './solve-settings';

export interface OffsetUncertainty {
  /** Standard error of every parameter, decades (0 for fixed ones). */
  stdErr: Float64Array;
  /** Covariance between `params` (parameter indices), row-major, decades². */
  covariance(params: number[]): Float64Array;
}

/** The uncertainty of the offsets at θ, or null when the curvature is singular. */
export function offsetUncertainty(
  p: FitProblem,
  theta: Float64Array,
  s: SolveSettings,
  residualVariance: number,
): OffsetUncertainty | null {
  const sandwich = sandwichAt(p, theta, s);
  if (!sandwich) return null;
  const stdErr = Float64Array.from(sandwich.diagonal, (v) =>
    Math.sqrt(Math.max(0, residualVariance * v)),
  );
  return {
    stdErr,
    covariance: (params) => {
      const b = sandwich.block(params);
      for (let k = 0; k < b.length; k++) b[k] *= residualVariance;
      return b;
    },
  };
}

function sandwichAt(p: FitProblem, theta: Float64Array, s: SolveSettings): Sandwich | null {
  const size = parameterCount(p);
  const cons = s.constraints.filter((c) => {
    for (let i = 0; i < size; i++) if (!s.fixed[i] && c.coef[i] !== 0) return true;
    return false;
  });
  const layout = parameterLayout(p, cons.map(support));
  const smooth: FitProblem = { ...p, smoothSlopes: true };
  const bread = new NormalSink(smooth, s.loss, s.scale, true, layout);
  const noise = new SandwichSink(smooth, s.loss, s.scale);
  forEachPair(
    smooth,
    theta,
    (buf) => {
      bread.consume(buf);
      noise.consume(buf);
    },
    s.buffer ?? new ResidualBuffer(),
  );
  addPrior(bread, theta, s.prior, s.scale);
  return sandwichOf(bread, s.fixed, cons, noise.meat(layout));
}

/** Parameter indices with a non-zero coefficient. */
export function support(c: { coef: Float64Array }): Int32Array {
  const out: number[] = [];
  for (let i = 0; i < c.coef.length; i++) if (c.coef[i] !== 0) out.push(i);
  return Int32Array.from(out);
}

/**
 * Full covariance over the parameter vector (size × size, row-major; zeros for fixed ones); null
 * if singular. Costs O(size²) memory: for small problems and tests (offsetUncertainty otherwise).
 */
export function offsetCovariance(
  p: FitProblem,
  theta: Float64Array,
  s: SolveSettings,
  residualVariance: number,
): Float64Array | null {
  const u = offsetUncertainty(p, theta, s, residualVariance);
  if (!u) return null;
  return u.covariance(Array.from({ length: parameterCount(p) }, (_, i) => i));
}

/**
 * Standard errors of a few parameters: the square roots of offsetCovariance's diagonal. NaN for a
 * fixed parameter or a singular system.
 */
export function offsetStdErrors(
  p: FitProblem,
  theta: Float64Array,
  s: SolveSettings,
  residualVariance: number,
  parameters: number[],
): Float64Array {
  const out = new Float64Array(parameters.length).fill(NaN);
  const u = offsetUncertainty(p, theta, s, residualVariance);
  if (!u) return out;
  parameters.forEach((param, k) => {
    if (!s.fixed[param]) out[k] = u.stdErr[param];
  });
  return out;
}
