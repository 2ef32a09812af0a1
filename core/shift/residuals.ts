/**
 * Pair residuals, the hot loop of the engine. For curves i and j of one driver and offsets θ, each
 * point of i whose reduced abscissa falls inside j's range is compared with j linearly
 * interpolated there (merge walk, O(n_i + n_j)), and vice versa:
 *   r = [y_i + α h_i + β v_i] − [Y_j(lx_i + σ(h_i − h_j)) + α h_j + β v_j]      (decades)
 *   ∂r/∂h_i = α − σ·Y'_j,  ∂r/∂h_j = −∂r/∂h_i,  ∂r/∂v_i = β,  ∂r/∂v_j = −β.
 * A pair whose overlap holds fewer than `minOverlapPoints` entries carries no information and
 * yields no residuals (docs/conventions.md §2: never invent a shift).
 */
import type { FitProblem, FitSeries } from './problem';
import { ResidualBuffer } from './residual-buffer';
import { lowerBound as lowerBoundImport, upperBound as upperBoundImport } from './series';

// Local bindings: module-namespace imports can compile to getters under CommonJS transpilers (tsx),
// which costs a property lookup per call in this hot loop.
const lowerBound = lowerBoundImport;
const upperBound = upperBoundImport;

/**
 * Each residual r (decades) carries the weight w = σ²/var(r), σ the noise of one measured point:
 * r compares an entry (mean of c₀ points) with an interpolation at fraction λ between two entries
 * (c₁, c₂ points), so var(r) = σ²(1/c₀ + (1−λ)²/c₁ + λ²/c₂). Without this weight the noise of the
 * interpolant varies with λ, and the mismatch acquires a ripple that favours offsets placing
 * points midway between the other curve's points (generalised least squares removes it).
 * g = ∂r/∂h_owner; the interpolant is (1 − λ)·y_other[k] + λ·y_other[k + 1].
 */
/** Entries of `a` whose abscissa shifted by `shift` falls within b's range. */
function overlapCount(a: FitSeries, b: FitSeries, shift: number): number {
  const lo = b.lx[0] - shift;
  const hi = b.lx[b.lx.length - 1] - shift;
  return upperBound(a.lx, hi) - lowerBound(a.lx, lo);
}

/** Number of overlapping entries of the pair (both directions, one driver). */
export function pairOverlap(
  p: FitProblem,
  i: number,
  j: number,
  d: number,
  theta: ArrayLike<number>,
): number {
  const a = p.curves[i][d];
  const b = p.curves[j][d];
  if (a.lx.length < 2 || b.lx.length < 2) return 0;
  const shift = p.sigma * (theta[i] - theta[j]);
  return overlapCount(a, b, shift) + overlapCount(b, a, -shift);
}

/**
 * The constant part of the pair's residual, α(h_owner − h_other) + β(v_owner − v_other) in
 * decades (β terms only in a joint fit); shared with the streaming walk (normal-walk.ts).
 */
export function pairOffset(
  p: FitProblem,
  owner: number,
  other: number,
  d: number,
  theta: ArrayLike<number>,
): number {
  const n = p.curves.length;
  const dh = theta[owner] - theta[other];
  return p.alpha[d] * dh + (p.joint ? p.beta[d] * (theta[n + owner] - theta[n + other]) : 0);
}

function walk(
  p: FitProblem,
  owner: number,
  other: number,
  d: number,
  theta: ArrayLike<number>,
  buf: ResidualBuffer,
): void {
  const a = p.curves[owner][d];
  const b = p.curves[other][d];
  const shift = p.sigma * (theta[owner] - theta[other]);
  const alpha = p.alpha[d];
  const yOff = pairOffset(p, owner, other, d, theta);
  const bx = b.lx;
  const by = b.y;
  const bw = b.w;
  const bs = b.slope;
  const smooth = p.smoothSlopes === true;
  const last = bx.length - 1;
  const lo = bx[0];
  const hi = bx[last];
  const sigma = p.sigma;
  const ax = a.lx;
  const first = lowerBound(ax, lo - shift);
  const end = upperBound(ax, hi - shift);
  if (end <= first) return;
  buf.reserve(end - first);
  let m = buf.size;
  const {
    r: R,
    w: W,
    g: G,
    bin: BIN,
    lam: LAM,
    owner: OW,
    other: OT,
    driver: DR,
    entry: EN,
    knot: KN,
  } = buf;
  let k = 0;
  for (let e = first; e < end; e++) {
    const q = ax[e] + shift;
    while (k < last - 1 && bx[k + 1] < q) k++;
    const h = bx[k + 1] - bx[k];
    const slope = (by[k + 1] - by[k]) / h;
    const lam = (q - bx[k]) / h;
    const f = 1 / a.w[e] + ((1 - lam) * (1 - lam)) / bw[k] + (lam * lam) / bw[k + 1];
    const gs = smooth ? (1 - lam) * bs[k] + lam * bs[k + 1] : slope;
    R[m] = a.y[e] + yOff - (by[k] + slope * (q - bx[k]));
    W[m] = 1 / f;
    G[m] = alpha - sigma * gs;
    BIN[m] = a.w[e];
    LAM[m] = lam;
    OW[m] = owner;
    OT[m] = other;
    DR[m] = d;
    EN[m] = e;
    KN[m] = k;
    m++;
  }
  buf.size = m;
}

/** Append every residual of the pair (i, j) for driver d, if the overlap suffices. */
export function pairResiduals(
  p: FitProblem,
  i: number,
  j: number,
  d: number,
  theta: ArrayLike<number>,
  buf: ResidualBuffer,
): boolean {
  if (pairOverlap(p, i, j, d, theta) < p.minOverlapPoints) return false;
  walk(p, i, j, d, theta, buf);
  walk(p, j, i, d, theta, buf);
  return true;
}

/** Fill the buffer with all residuals of all candidate pairs and drivers; returns pairs used. */
export function allResiduals(p: FitProblem, theta: ArrayLike<number>, buf: ResidualBuffer): number {
  buf.reset();
  let used = 0;
  const nd = p.alpha.length;
  for (let q = 0; q < p.pairs.length; q += 2) {
    let any = false;
    for (let d = 0; d < nd; d++)
      if (pairResiduals(p, p.pairs[q], p.pairs[q + 1], d, theta, buf)) any = true;
    if (any) used++;
  }
  return used;
}

/**
 * Calls `consume(buf)` once per candidate pair with that pair's residuals (all drivers), in one
 * reused buffer of the size of a pair: the sinks (normal equations, sandwich, statistics) add up
 * over residuals, so nothing in proportion to all residuals is stored.
 */
export function forEachPair(
  p: FitProblem,
  theta: ArrayLike<number>,
  consume: (buf: ResidualBuffer) => void,
  buf: ResidualBuffer = new ResidualBuffer(),
): void {
  const nd = p.alpha.length;
  for (let q = 0; q < p.pairs.length; q += 2) {
    buf.reset();
    for (let d = 0; d < nd; d++) pairResiduals(p, p.pairs[q], p.pairs[q + 1], d, theta, buf);
    if (buf.size > 0) consume(buf);
  }
}

/** All residuals at θ in a (new or reused) buffer. */
export function residualsAt(
  p: FitProblem,
  theta: ArrayLike<number>,
  buf: ResidualBuffer = new ResidualBuffer(),
): ResidualBuffer {
  allResiduals(p, theta, buf);
  return buf;
}
