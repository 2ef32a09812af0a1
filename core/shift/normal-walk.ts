/**
 * The normal equations straight from the merge walk, without storing residuals: the inner loop of
 * every Levenberg–Marquardt iteration. Same residuals, weights and derivatives as residuals.ts
 * (see there for the formulas); kept separate because this loop dominates the run time.
 */
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

function walkInto(
  p: FitProblem,
  owner: number,
  other: number,
  d: number,
  theta: ArrayLike<number>,
  sink: NormalSink,
): void {
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
  const bInvH = b.invH;
  const last = bx.length - 1;
  const ax = a.lx;
  const ay = a.y;
  const aw = a.w;
  const aInvW = a.invW;
  const first = lowerBound(ax, bx[0] - shift);
  const end = upperBound(ax, bx[last] - shift);
  if (end <= first) return;
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
    // ψ(z)/z weights the gradient; ρ''(z) the curvature (Newton on the robust loss converges
    // faster than plain reweighting when many residuals sit beyond the Huber corner).
    let psi: number;
    let curv: number;
    if (huber) {
      const inside = az <= c;
      lossSum += inside ? 0.5 * z * z : c * az - 0.5 * c * c;
      psi = inside ? 1 : c / az;
      // ρ'' is 0 beyond the corner; keep a quarter of the reweighting curvature there so a curve
      // whose residuals all lie beyond it still has a well-posed step.
      curv = inside ? 1 : 0.25 * psi;
    } else {
      lossSum += sink.rho(z);
      psi = sink.weight(z);
      curv = sink.curvature(z);
    }
    count += aw[e];
    const wt = w * psi;
    const wc = w * curv;
    wsq += wt * r * r;
    const g = alpha - sigma * slope;
    gr += wt * g * r;
    aa += wc * g * g;
    if (joint) {
      gv += wt * beta * r;
      av += wc * beta * beta;
      ahv += wc * g * beta;
    }
  }
  sink.lossSum += lossSum;
  sink.count += count;
  sink.weightedSquares += wsq;
  if (!sink.withMatrix) return;
  const s = sink.size;
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

/** Normal equations (or only the objective) at θ over all candidate pairs and drivers. */
export function normalAt(
  p: FitProblem,
  theta: ArrayLike<number>,
  loss: RobustLoss,
  scale: number,
  withMatrix: boolean,
): NormalSink {
  const sink = new NormalSink(p, loss, scale, withMatrix);
  const nd = p.alpha.length;
  for (let q = 0; q < p.pairs.length; q += 2) {
    const i = p.pairs[q];
    const j = p.pairs[q + 1];
    for (let d = 0; d < nd; d++) {
      if (pairOverlap(p, i, j, d, theta) < p.minOverlapPoints) continue;
      walkInto(p, i, j, d, theta, sink);
      walkInto(p, j, i, d, theta, sink);
    }
  }
  return sink;
}
