/**
 * The linear algebra of one constrained step: the KKT system of the normal equations with the
 * reference condition (and bT(Tref) = 1) as linear equality constraints
 *   [A + λ·diag(A)  Cᵀ] [δ]   [−g       ]
 *   [C              0 ] [μ] = [rhs − Cθ ]
 * (Nocedal & Wright, Numerical Optimization, 2nd ed. 2006, §16.1), the projection of a start onto
 * the constraints, the Gaussian prior on log10 bT, and the sandwich covariance.
 *
 * A alone is singular (shifting every curve by the same amount changes nothing), so the system is
 * solved through H = A + ρ·CCᵀ, which is positive definite and equals A on the directions the
 * constraints allow; the KKT solution is unchanged by the added term (Nocedal & Wright §17.1,
 * augmented Lagrangian), and with nc ≤ 2 constraints the multipliers follow from an nc × nc Schur
 * complement. H is banded (layout.ts), so a step costs O(n·w²) for n parameters and width w.
 * Fixed (locked) parameters become identity rows, so their step is 0.
 */
import type { EnvelopeFactor } from './envelope';
import { diagonalSlot, inverseDiagonals, ldlFactor, ldlSolve, multiply } from './envelope';
import type { ParameterLayout } from './layout';
import { luFactor, luSolve } from './linear-solve';
import type { LuFactors } from './linear-solve';
import type { NormalSink } from './normal-equations';

export interface LinearConstraint {
  /** Coefficients over the full parameter vector. */
  coef: Float64Array;
  rhs: number;
}

/** Adds ½·scale²·θ²/σ² per parameter with a prior (1/σ² in `prior`, 0 for none). */
export function addPrior(
  sink: NormalSink,
  theta: ArrayLike<number>,
  prior: Float64Array | undefined,
  scale: number,
): NormalSink {
  if (!prior) return sink;
  const c2 = scale * scale;
  for (let i = 0; i < prior.length; i++) {
    if (prior[i] === 0) continue;
    const k = c2 * prior[i];
    sink.lossSum += 0.5 * k * theta[i] * theta[i];
    if (sink.withMatrix) {
      sink.a[diagonalSlot(sink.layout!.env, sink.layout!.pos[i])] += k;
      sink.g[i] += k * theta[i];
    }
  }
  return sink;
}

/** Smallest change of the free parameters that satisfies the constraints. */
export function projectOntoConstraints(
  theta: Float64Array,
  free: number[],
  cons: LinearConstraint[],
): void {
  const nc = cons.length;
  if (nc === 0) return;
  const cct = new Float64Array(nc * nc);
  const viol = new Float64Array(nc);
  for (let a = 0; a < nc; a++) {
    let v = cons[a].rhs;
    for (let i = 0; i < theta.length; i++) v -= cons[a].coef[i] * theta[i];
    viol[a] = v;
    for (let b = 0; b < nc; b++) {
      let sum = 0;
      for (const i of free) sum += cons[a].coef[i] * cons[b].coef[i];
      cct[a * nc + b] = sum;
    }
  }
  const f = luFactor(cct, nc);
  if (f.singular) return;
  const mu = luSolve(f, viol);
  for (const i of free) {
    let d = 0;
    for (let a = 0; a < nc; a++) d += cons[a].coef[i] * mu[a];
    theta[i] += d;
  }
}

/** H = A(free) with damping and ρ·CCᵀ, its factor, and what the constraints need. */
export interface ConstrainedSystem {
  layout: ParameterLayout;
  /** 1 at the envelope positions of fixed parameters. */
  fixedAt: Uint8Array;
  /** The matrix H that was factored (envelope storage); null unless asked to keep it. */
  h: Float64Array | null;
  factor: EnvelopeFactor;
  /** Constraint vectors over the free parameters, in envelope positions. */
  c: Float64Array[];
  /** H⁻¹c per constraint (positions). */
  y: Float64Array[];
  /** S = CᵀH⁻¹C, factored (null without constraints). */
  s: LuFactors | null;
  rho: number;
}

/**
 * Factors H = A + λ·diag(A) + ρ·CCᵀ over the free parameters (A from `sink`). A parameter
 * without any residual keeps a tiny diagonal so the system stays solvable. Null when singular.
 */
export function constrainedSystem(
  sink: NormalSink,
  fixed: Uint8Array,
  cons: LinearConstraint[],
  lambda: number,
  keepMatrix = false,
): ConstrainedSystem | null {
  const layout = sink.layout!;
  const { env, pos } = layout;
  const size = sink.size;
  const n = env.n;
  const fixedAt = new Uint8Array(n);
  for (let i = 0; i < size; i++) if (fixed[i]) fixedAt[pos[i]] = 1;
  const h = Float64Array.from(sink.a);
  let meanDiag = 0;
  let m = 0;
  for (let r = 0; r < n; r++)
    if (!fixedAt[r]) {
      meanDiag += h[diagonalSlot(env, r)];
      m++;
    }
  meanDiag = m > 0 ? meanDiag / m : 1;
  const floor = 1e-9 * meanDiag + 1e-12;
  for (let r = 0; r < n; r++) {
    const f = env.first[r];
    const s0 = env.start[r] - f;
    for (let c = f; c < r; c++) if (fixedAt[r] || fixedAt[c]) h[s0 + c] = 0;
    const d = s0 + r;
    h[d] = fixedAt[r] ? 1 : Math.max(h[d], floor) * (1 + lambda);
  }
  // ρ of the order of the curvature keeps H as well conditioned as A on the allowed directions.
  const rho = meanDiag > 0 ? meanDiag : 1;
  const c = cons.map((k) => {
    const v = new Float64Array(n);
    for (let i = 0; i < size; i++) if (!fixed[i] && k.coef[i] !== 0) v[pos[i]] = k.coef[i];
    return v;
  });
  for (const v of c)
    for (let r = 0; r < n; r++) {
      if (v[r] === 0) continue;
      const f = env.first[r];
      const s0 = env.start[r] - f;
      for (let col = f; col <= r; col++) if (v[col] !== 0) h[s0 + col] += rho * v[r] * v[col];
    }
  const factor = ldlFactor(env, h, 1e-13, !keepMatrix);
  if (factor.singular) return null;
  const y = c.map((v) => ldlSolve(factor, v));
  let s: LuFactors | null = null;
  const nc = c.length;
  if (nc > 0) {
    const sm = new Float64Array(nc * nc);
    for (let a = 0; a < nc; a++) for (let b = 0; b < nc; b++) sm[a * nc + b] = dot(c[a], y[b]);
    s = luFactor(sm, nc);
    if (s.singular) return null;
  }
  return { layout, fixedAt, h: keepMatrix ? h : null, factor, c, y, s, rho };
}

function dot(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

/**
 * Solves A δ + Cᵀμ = −g (g in positions), Cδ = r over the free parameters: δ = H⁻¹(−g + ρCr −
 * Cμ) with (CᵀH⁻¹C) μ = CᵀH⁻¹(−g + ρCr) − r. Returns δ in positions.
 */
function solveConstrained(
  sys: ConstrainedSystem,
  minusG: Float64Array,
  r: ArrayLike<number>,
): Float64Array {
  const nc = sys.c.length;
  const rhs = Float64Array.from(minusG);
  for (let a = 0; a < nc; a++) {
    const v = sys.c[a];
    for (let k = 0; k < rhs.length; k++) if (v[k] !== 0) rhs[k] += sys.rho * v[k] * r[a];
  }
  const x = ldlSolve(sys.factor, rhs);
  if (nc === 0) return x;
  const t = new Float64Array(nc);
  for (let a = 0; a < nc; a++) t[a] = dot(sys.c[a], x) - r[a];
  const mu = luSolve(sys.s!, t);
  for (let a = 0; a < nc; a++) {
    const y = sys.y[a];
    for (let k = 0; k < x.length; k++) x[k] -= mu[a] * y[k];
  }
  return x;
}

/** Step of all parameters (0 for fixed ones), or null when the system is singular. */
export function kktStep(
  sink: NormalSink,
  fixed: Uint8Array,
  cons: LinearConstraint[],
  theta: Float64Array,
  lambda: number,
): Float64Array | null {
  const sys = constrainedSystem(sink, fixed, cons, lambda);
  if (!sys) return null;
  const { pos } = sys.layout;
  const minusG = new Float64Array(sys.layout.env.n);
  for (let i = 0; i < sink.size; i++) if (!fixed[i]) minusG[pos[i]] = -sink.g[i];
  const r = cons.map((k) => {
    let v = k.rhs;
    for (let i = 0; i < theta.length; i++) v -= k.coef[i] * theta[i];
    return v;
  });
  const x = solveConstrained(sys, minusG, r);
  const out = new Float64Array(sink.size);
  for (let i = 0; i < sink.size; i++) {
    out[i] = fixed[i] ? 0 : x[pos[i]];
    if (!Number.isFinite(out[i])) return null;
  }
  return out;
}

/**
 * The sandwich M·B·M (Huber 1967), M the top-left block of the inverse KKT matrix without damping
 * (= H⁻¹ − Y S⁻¹Yᵀ with Y = H⁻¹C, S = CᵀY) and B the propagated point noise (`meat`, envelope
 * storage in positions, fixed rows ignored). Everything per parameter index.
 */
export interface Sandwich {
  /** diag(M B M) per parameter (0 for fixed ones). */
  diagonal: Float64Array;
  /** (M B M) restricted to `params`, row-major. */
  block(params: number[]): Float64Array;
}

export function sandwichOf(
  sink: NormalSink,
  fixed: Uint8Array,
  cons: LinearConstraint[],
  meat: Float64Array,
): Sandwich | null {
  const sys = constrainedSystem(sink, fixed, cons, 0, true);
  if (!sys) return null;
  const { env, pos } = sys.layout;
  const n = env.n;
  const fixedAt = sys.fixedAt;
  const b = Float64Array.from(meat);
  for (let r = 0; r < n; r++) {
    const f = env.first[r];
    const s0 = env.start[r] - f;
    for (let c = f; c <= r; c++) if (fixedAt[r] || fixedAt[c]) b[s0 + c] = 0;
  }
  const inv = inverseDiagonals(env, sys.h!, b);
  if (!inv) return null;
  const nc = sys.c.length;
  // T = H⁻¹ B Y, G = Yᵀ B Y, and the nc × nc products with S⁻¹.
  const by = sys.y.map((y) => multiply(env, b, y));
  const t = by.map((v) => ldlSolve(sys.factor, v));
  const sInv = new Float64Array(nc * nc);
  for (let a = 0; a < nc; a++) {
    const e = new Float64Array(nc);
    e[a] = 1;
    const col = luSolve(sys.s!, e);
    for (let k = 0; k < nc; k++) sInv[k * nc + a] = col[k];
  }
  const g = new Float64Array(nc * nc);
  for (let a = 0; a < nc; a++) for (let c = 0; c < nc; c++) g[a * nc + c] = dot(sys.y[a], by[c]);
  // K = S⁻¹ G S⁻¹.
  const k = new Float64Array(nc * nc);
  for (let a = 0; a < nc; a++)
    for (let c = 0; c < nc; c++) {
      let s = 0;
      for (let d = 0; d < nc; d++)
        for (let e = 0; e < nc; e++) s += sInv[a * nc + d] * g[d * nc + e] * sInv[e * nc + c];
      k[a * nc + c] = s;
    }
  const correction = (u: number, v: number): number => {
    // −(T S⁻¹ Yᵀ)_uv − (Y S⁻¹ Tᵀ)_uv + (Y K Yᵀ)_uv, u and v in positions.
    let s = 0;
    for (let a = 0; a < nc; a++)
      for (let c = 0; c < nc; c++) {
        const si = sInv[a * nc + c];
        s -= si * (t[a][u] * sys.y[c][v] + sys.y[a][u] * t[c][v]);
        s += k[a * nc + c] * sys.y[a][u] * sys.y[c][v];
      }
    return s;
  };
  const diagonal = new Float64Array(sink.size);
  for (let i = 0; i < sink.size; i++) {
    if (fixed[i]) continue;
    const u = pos[i];
    diagonal[i] = inv.sandwich[u] + correction(u, u);
  }
  const block = (params: number[]): Float64Array => {
    const m = params.length;
    const out = new Float64Array(m * m);
    for (let q = 0; q < m; q++) {
      const i = params[q];
      if (fixed[i]) continue;
      const e = new Float64Array(n);
      e[pos[i]] = 1;
      const col = ldlSolve(sys.factor, multiply(env, b, ldlSolve(sys.factor, e)));
      for (let w = 0; w < m; w++) {
        const j = params[w];
        if (fixed[j]) continue;
        out[w * m + q] = col[pos[j]] + correction(pos[j], pos[i]);
      }
    }
    // Symmetrise (the two triangles differ by rounding only).
    for (let q = 0; q < m; q++)
      for (let w = q + 1; w < m; w++) {
        const v = 0.5 * (out[q * m + w] + out[w * m + q]);
        out[q * m + w] = v;
        out[w * m + q] = v;
      }
    return out;
  };
  return { diagonal, block };
}
