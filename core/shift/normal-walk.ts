/**
 * The normal equations straight from the merge walk, without storing residuals: the inner loop of
 * every Levenberg–Marquardt iteration. Same residuals, weights and derivatives as residuals.ts
 * (see there for the formulas); kept separate because this loop dominates the run time.
 *
 * During one round of the refinement the points compared are frozen (comparedSets): a point that
 * would move just past the end of the other curve is compared with that curve's end segment
 * extended, instead of dropping out. Otherwise the mismatch would jump whenever a point enters or
 * leaves an overlap — with every isotherm on the same frequency grid and small shifts between
 * neighbours, the end points sit right at that edge — and the refinement would stall there.
 */
import type { ParameterLayout } from './layout';
import type { FitProblem } from './problem';
import { pairOffset as pairOffsetImport, pairOverlap as pairOverlapImport } from './residuals';
import { NormalSink } from './normal-equations';
import { lowerBound as lowerBoundImport, upperBound as upperBoundImport } from './series';
import type { RobustLoss } from './types';
import { addPairCross as crossImport, addPairOuter as outerImport } from './pair-scatter';

// Local bindings (see residuals.ts).
const lowerBound = lowerBoundImport;
const upperBound = upperBoundImport;
const pairOverlap = pairOverlapImport;
const pairOffset = pairOffsetImport;
const addPairOuter = outerImport;
const addPairCross = crossImport;
/**
 * Share of the reweighting weight ψ/z kept as curvature beyond Huber's corner: Newton's ρ'' = 0
 * there is exact only while no residual crosses the corner, and the full ψ/z (the reweighting
 * majoriser) always gives a descent step but converges slowly. Half of it converged in 3–4
 * iterations on dense sets and 4–6 on sparse ones (against 4 and 8 with ψ/z). A step that
 * raises the mismatch is rejected and damped, so this sets the speed, not the optimum.
 */
const HUBER_OUTSIDE_CURVATURE = 0.5;

function walkInto(
  p: FitProblem,
  owner: number,
  other: number,
  d: number,
  theta: ArrayLike<number>,
  sink: NormalSink,
  first: number,
  end: number,
): void {
  if (end <= first) return;
  const a = p.curves[owner][d];
  const b = p.curves[other][d];
  const n = p.curves.length;
  const shift = p.sigma * (theta[owner] - theta[other]);
  const alpha = p.alpha[d];
  const beta = p.beta[d];
  const joint = p.joint && beta !== 0;
  const yOff = pairOffset(p, owner, other, d, theta);
  const bx = b.lx;
  const by = b.y;
  const bInvW = b.invW;
  const bSlope = b.segSlope;
  const bSmooth = p.segmentCurvature ? null : b.slope;
  const bInvH = b.invH;
  const last = bx.length - 1;
  const ax = a.lx;
  const ay = a.y;
  const aw = a.w;
  const aInvW = a.invW;
  const sigma = p.sigma;
  const huber = sink.isHuber;
  const c = sink.scale;
  let lossSum = 0;
  let count = 0;
  let wsq = 0;
  let gr = 0;
  let aa = 0;
  let gv = 0;
  let av = 0;
  let ahv = 0;
  let k = 0;
  for (let e = first; e < end; e++) {
    const q = ax[e] + shift;
    while (k < last - 1 && bx[k + 1] < q) k++;
    const slope = bSlope[k];
    const dq = q - bx[k];
    const lam = dq * bInvH[k];
    const lam1 = 1 - lam;
    const w = 1 / (aInvW[e] + lam1 * lam1 * bInvW[k] + lam * lam * bInvW[k + 1]);
    const r = ay[e] + yOff - (by[k] + slope * dq);
    const z = r * Math.sqrt(w);
    const az = Math.abs(z);
    // Gradient weight ψ(z)/z; curvature the same inside Huber's corner and for Cauchy (the
    // iteratively reweighted least-squares step, which never increases either loss: both are
    // majorised by the reweighted quadratic, Huber 1981, Robust Statistics, §7.8), and
    // HUBER_OUTSIDE_CURVATURE·ψ/z beyond the corner.
    let psi: number;
    let rho: number;
    let curv: number;
    if (huber) {
      const inside = az <= c;
      rho = inside ? 0.5 * z * z : c * az - 0.5 * c * c;
      psi = inside ? 1 : c / az;
      curv = inside ? 1 : HUBER_OUTSIDE_CURVATURE * psi;
    } else {
      rho = sink.rho(z);
      psi = sink.weight(z);
      curv = psi;
    }
    lossSum += rho;
    count += aw[e];
    const wt = w * psi;
    const wc = w * curv;
    wsq += wt * r * r;
    const g = alpha - sigma * slope;
    // The weight depends on the offset too (through λ): ∂w/∂h_owner = −w²·∂f/∂λ·σ/h with
    // f = 1/c₀ + (1−λ)²/c₁ + λ²/c₂, which adds −½·ψ/z·w²·r²·∂f/∂λ·σ/h. Without it the computed
    // gradient vanishes a little away from the optimum and the refinement stalls short of it.
    const dfdLam = 2 * (lam * bInvW[k + 1] - lam1 * bInvW[k]);
    gr += wt * g * r - 0.5 * wt * w * r * r * dfdLam * sigma * bInvH[k];
    // The curvature takes the noise-damped slope: the squared slope of a noisy segment overstates
    // it (by the slope's noise variance), which would shorten every step and slow the
    // convergence to a crawl on dense data; the gradient keeps the exact slope, so the optimum is
    // that of the objective.
    const gs = bSmooth ? alpha - sigma * (lam1 * bSmooth[k] + lam * bSmooth[k + 1]) : g;
    aa += wc * gs * gs;
    if (joint) {
      gv += wt * beta * r;
      av += wc * beta * beta;
      ahv += wc * gs * beta;
    }
  }
  sink.lossSum += lossSum;
  sink.count += count;
  sink.residuals += end - first;
  sink.weightedSquares += wsq;
  if (!sink.withMatrix) return;
  const s = sink.layout!;
  const A = sink.a;
  const G = sink.g;
  const i = owner;
  const j = other;
  G[i] += gr;
  G[j] -= gr;
  addPairOuter(A, s, i, j, aa);
  if (joint) {
    const vi = n + i;
    const vj = n + j;
    G[vi] += gv;
    G[vj] -= gv;
    addPairOuter(A, s, vi, vj, av);
    addPairCross(A, s, i, j, vi, vj, ahv);
  }
}

/**
 * The points compared at θ, frozen for one round of the refinement: per candidate pair, driver
 * and direction (owner i, then owner j) the range [first, end) of the owner's entries inside the
 * other curve's range, or an empty range for both directions when the pair's overlap holds fewer
 * than minOverlapPoints entries. Layout: ((pair·drivers + d)·2 + direction)·2.
 */
export function comparedSets(p: FitProblem, theta: ArrayLike<number>): Int32Array {
  const nd = p.alpha.length;
  const out = new Int32Array(p.pairs.length * nd * 2);
  for (let q = 0; q < p.pairs.length; q += 2) {
    const i = p.pairs[q];
    const j = p.pairs[q + 1];
    for (let d = 0; d < nd; d++) {
      if (pairOverlap(p, i, j, d, theta) < p.minOverlapPoints) continue;
      const at = ((q / 2) * nd + d) * 4;
      const shift = p.sigma * (theta[i] - theta[j]);
      const a = p.curves[i][d].lx;
      const b = p.curves[j][d].lx;
      out[at] = lowerBound(a, b[0] - shift);
      out[at + 1] = upperBound(a, b[b.length - 1] - shift);
      out[at + 2] = lowerBound(b, a[0] + shift);
      out[at + 3] = upperBound(b, a[a.length - 1] + shift);
    }
  }
  return out;
}

/**
 * Normal equations (or only the objective) at θ over all candidate pairs and drivers, comparing
 * the points of `sets` (comparedSets at the start of the round).
 */
export function normalAt(
  p: FitProblem,
  theta: ArrayLike<number>,
  loss: RobustLoss,
  scale: number,
  withMatrix: boolean,
  layout: ParameterLayout | null,
  sets: Int32Array,
): NormalSink {
  const sink = new NormalSink(p, loss, scale, withMatrix, layout);
  const nd = p.alpha.length;
  for (let q = 0; q < p.pairs.length; q += 2) {
    const i = p.pairs[q];
    const j = p.pairs[q + 1];
    for (let d = 0; d < nd; d++) {
      const at = ((q / 2) * nd + d) * 4;
      walkInto(p, i, j, d, theta, sink, sets[at], sets[at + 1]);
      walkInto(p, j, i, d, theta, sink, sets[at + 2], sets[at + 3]);
    }
  }
  return sink;
}
