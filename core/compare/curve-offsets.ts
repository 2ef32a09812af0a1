/**
 * The horizontal and vertical offsets that best map the reference curve onto a sample:
 * minimise Σ w (y_s(u) − y_r(u + δ) − v)² over the sample's nodes (all moduli jointly), with
 * y_r the reference nodes' cubic Hermite interpolant and w = 1/(scatter s.e. of both)². δ is
 * scanned on a fine grid (v is a weighted mean for each δ), then refined by a parabola through
 * the best three. Standard errors: the Gauss–Newton covariance (JᵀWJ)⁻¹ scaled by the reduced χ²
 * when it exceeds 1, plus each curve's placement variance (its isotherms' shift s.e. weighted by
 * their share of the points, and its re-referencing s.e.), which no number of nodes averages away.
 *
 * δ is the offset in log10 x; as a change of relaxation times D (sample's τ = 10^D × reference's):
 * D = δ for frequency curves (G_s(ω) = G_r(10^D ω)) and D = −δ for time curves (G_s(t) = G_r(t/10^D)).
 */
import type { AbscissaKind, QuantityId } from '../data/types';
import { interpolateNodes } from './curve-grid';
import type { Estimate, GridNode } from './types';

export interface OffsetFit {
  timeShiftDecades: Estimate;
  modulusOffsetDecades: Estimate;
  reducedChiSquare: number;
  nodes: number;
}

interface Score {
  delta: number;
  v: number;
  chi2: number;
  n: number;
}

type NodePairs = { quantity: QuantityId; reference: GridNode[]; sample: GridNode[] }[];

function score(pairs: NodePairs, delta: number, bin: number): Score | null {
  let sw = 0;
  let swr = 0;
  const rs: number[] = [];
  const ws: number[] = [];
  for (const p of pairs) {
    for (const s of p.sample) {
      const r = interpolateNodes(p.reference, s.log10x + delta, bin);
      if (!r) continue;
      const w = 1 / (s.scatterStdErr ** 2 + r.scatterStdErr ** 2);
      const res = s.log10y - r.y;
      rs.push(res);
      ws.push(w);
      sw += w;
      swr += w * res;
    }
  }
  if (rs.length < 4) return null;
  const v = swr / sw;
  let chi2 = 0;
  rs.forEach((r, i) => (chi2 += ws[i] * (r - v) ** 2));
  return { delta, v, chi2, n: rs.length };
}

export function fitOffsets(
  pairs: NodePairs,
  abscissa: AbscissaKind,
  bin: number,
  maxShift: number,
  placement: { horizontal: number; vertical: number },
): OffsetFit | null {
  const step = bin / 20;
  const scores: Score[] = [];
  for (let d = -maxShift; d <= maxShift + 1e-9; d += step) {
    const s = score(pairs, d, bin);
    if (s) scores.push(s);
  }
  if (scores.length === 0) return null;
  const mean = (s: Score): number => s.chi2 / Math.max(1, s.n - 2);
  let best = 0;
  scores.forEach((s, i) => {
    if (mean(s) < mean(scores[best])) best = i;
  });
  let delta = scores[best].delta;
  const l = scores[best - 1];
  const r = scores[best + 1];
  if (
    l &&
    r &&
    Math.abs(l.delta - delta - -step) < 1e-9 &&
    Math.abs(r.delta - delta - step) < 1e-9
  ) {
    const [a, b, c] = [mean(l), mean(scores[best]), mean(r)];
    const den = a - 2 * b + c;
    if (den > 0) delta += (step * (a - c)) / (2 * den);
  }
  const at = score(pairs, delta, bin);
  if (!at) return null;
  // Gauss–Newton normal matrix for (δ, v): J = [−slope_r, −1] per node.
  let a11 = 0;
  let a12 = 0;
  let a22 = 0;
  for (const p of pairs) {
    for (const s of p.sample) {
      const ref = interpolateNodes(p.reference, s.log10x + delta, bin);
      if (!ref) continue;
      const w = 1 / (s.scatterStdErr ** 2 + ref.scatterStdErr ** 2);
      a11 += w * ref.slope * ref.slope;
      a12 += w * ref.slope;
      a22 += w;
    }
  }
  const det = a11 * a22 - a12 * a12;
  const chiRed = at.chi2 / Math.max(1, at.n - 2);
  const scale = Math.max(1, chiRed);
  const varDelta = det > 0 ? (a22 / det) * scale : NaN;
  const varV = det > 0 ? (a11 / det) * scale : NaN;
  const seD = Math.sqrt(varDelta + placement.horizontal ** 2);
  const seV = Math.sqrt(varV + placement.vertical ** 2);
  const sign = abscissa === 'time' ? -1 : 1;
  return {
    timeShiftDecades: { value: sign * delta, stdErr: Number.isFinite(seD) ? seD : null },
    modulusOffsetDecades: { value: at.v, stdErr: Number.isFinite(seV) ? seV : null },
    reducedChiSquare: chiRed,
    nodes: at.n,
  };
}
