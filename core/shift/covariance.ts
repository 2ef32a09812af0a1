/**
 * Uncertainty of the offsets at the optimum θ of solveOffsets (same settings): the sandwich
 * Cov = s²·M B M (Huber 1967), M the constrained inverse of the curvature (kkt.ts), B the point
 * noise propagated through every comparison (sandwich.ts), s² the weighted residual variance, all
 * with noise-damped slopes (see FitProblem.smoothSlopes). Errors are relative to the constraints,
 * i.e. to the reference temperature.
 */
import type { FitProblem } from './problem';
import { parameterCount } from './problem';
import { residualsAt } from './residuals';
import { ResidualBuffer } from './residual-buffer';
import type { LinearConstraint } from './kkt';
import { addPrior, covarianceOf, kktMatrix } from './kkt';
import { luFactor, luSolve } from './linear-solve';
import { NormalSink } from './normal-equations';
import { SandwichSink } from './sandwich';
import type { SolveSettings } from './solve';

interface SandwichParts {
  bread: NormalSink;
  sandwich: SandwichSink;
  free: number[];
  cons: LinearConstraint[];
}

function sandwichParts(p: FitProblem, theta: Float64Array, s: SolveSettings): SandwichParts {
  const size = parameterCount(p);
  const free: number[] = [];
  for (let i = 0; i < size; i++) if (!s.fixed[i]) free.push(i);
  const cons = s.constraints.filter((c) => free.some((i) => c.coef[i] !== 0));
  const buf = s.buffer ?? new ResidualBuffer();
  const smooth: FitProblem = { ...p, smoothSlopes: true };
  residualsAt(smooth, theta, buf);
  const bread = addPrior(
    new NormalSink(smooth, s.loss, s.scale, true).consume(buf),
    theta,
    s.prior,
    s.scale,
  );
  const sandwich = new SandwichSink(smooth, s.loss, s.scale).consume(buf);
  return { bread, sandwich, free, cons };
}

/** Full covariance over the parameter vector (zeros for fixed ones); null if singular. */
export function offsetCovariance(
  p: FitProblem,
  theta: Float64Array,
  s: SolveSettings,
  residualVariance: number,
): Float64Array | null {
  const { bread, sandwich, free, cons } = sandwichParts(p, theta, s);
  return covarianceOf(bread, free, cons, residualVariance, sandwich.meat());
}

/**
 * Standard errors of a few parameters only, equal to the square roots of offsetCovariance's
 * diagonal: for parameter u, var = s²·m_uᵀ B m_u with m_u = M e_u one solve with the factorised
 * KKT matrix, and the quadratic form in B summed point by point, so neither B nor the inverse is
 * formed. NaN for a fixed parameter or a singular system.
 */
export function offsetStdErrors(
  p: FitProblem,
  theta: Float64Array,
  s: SolveSettings,
  residualVariance: number,
  parameters: number[],
): Float64Array {
  const out = new Float64Array(parameters.length).fill(NaN);
  const { bread, sandwich, free, cons } = sandwichParts(p, theta, s);
  const m = free.length;
  if (m === 0) return out;
  const f = luFactor(kktMatrix(bread, free, cons, 0), m + cons.length);
  if (f.singular) return out;
  const v = new Float64Array(bread.size);
  parameters.forEach((param, k) => {
    const u = free.indexOf(param);
    if (u < 0) return;
    const e = new Float64Array(m + cons.length);
    e[u] = 1;
    const x = luSolve(f, e);
    v.fill(0);
    for (let w = 0; w < m; w++) v[free[w]] = x[w];
    out[k] = Math.sqrt(Math.max(0, residualVariance * sandwich.quadraticForm(v)));
  });
  return out;
}
