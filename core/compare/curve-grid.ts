/**
 * Smooths a moved master curve on a log grid shared by all curves: bins of `binDecades` centred
 * on multiples of it; in each bin with at least three points a straight line in log–log, read at
 * the bin centre. The scatter σ is pooled over all bins of the quantity (one σ per curve and
 * quantity, steadier than a σ per bin of three points); the node's s.e. is σ·√(1/n + (u_c − ū)²/Sxx)
 * (ordinary least squares), with the shift s.e. of its isotherms and of the re-referencing added
 * through the slope. The slope at a node is the central difference of its neighbours where they
 * exist (less noisy than the bin's own line), else the bin's line. See docs/compare.md.
 */
import type { QuantityId } from '../data/types';
import type { GridNode } from './types';

export interface GridInput {
  log10x: number[];
  log10y: number[];
  isothermId: string[];
  /** s.e. of log10 aT and log10 bT of each isotherm (0 or absent when unknown or fixed). */
  shiftStdErr: Map<string, { aT: number; bT: number }>;
  /** s.e. of the curve's move to the common temperature, decades. */
  rereferenceStdErr: number;
}

export interface GridResult {
  nodes: GridNode[];
  scatterDecades: number;
}

interface Bin {
  k: number;
  n: number;
  mean: number;
  sxx: number;
  a: number;
  b: number;
  rss: number;
  share: Map<string, number>;
}

export const MIN_POINTS_PER_BIN = 3;

export function smoothOnGrid(input: GridInput, binDecades: number): GridResult {
  const groups = new Map<number, number[]>();
  input.log10x.forEach((u, i) => {
    if (!Number.isFinite(u) || !Number.isFinite(input.log10y[i])) return;
    const k = Math.round(u / binDecades);
    const g = groups.get(k);
    if (g) g.push(i);
    else groups.set(k, [i]);
  });
  const bins: Bin[] = [];
  let rssSum = 0;
  let dof = 0;
  for (const [k, idx] of [...groups.entries()].sort((p, q) => p[0] - q[0])) {
    const n = idx.length;
    if (n < MIN_POINTS_PER_BIN) continue;
    let mu = 0;
    let my = 0;
    for (const i of idx) {
      mu += input.log10x[i];
      my += input.log10y[i];
    }
    mu /= n;
    my /= n;
    let sxx = 0;
    let sxy = 0;
    for (const i of idx) {
      const du = input.log10x[i] - mu;
      sxx += du * du;
      sxy += du * (input.log10y[i] - my);
    }
    if (!(sxx > 1e-12)) continue;
    const b = sxy / sxx;
    let rss = 0;
    for (const i of idx) {
      const r = input.log10y[i] - my - b * (input.log10x[i] - mu);
      rss += r * r;
    }
    rssSum += rss;
    dof += n - 2;
    const share = new Map<string, number>();
    for (const i of idx)
      share.set(input.isothermId[i], (share.get(input.isothermId[i]) ?? 0) + 1 / n);
    bins.push({ k, n, mean: mu, sxx, a: my, b, rss, share });
  }
  const sigma = dof > 0 ? Math.sqrt(rssSum / dof) : NaN;
  const values = bins.map((bin) => bin.a + bin.b * (bin.k * binDecades - bin.mean));
  const nodes: GridNode[] = bins.map((bin, j) => {
    const uc = bin.k * binDecades;
    const prev = j > 0 && bins[j - 1].k === bin.k - 1 ? values[j - 1] : null;
    const next = j + 1 < bins.length && bins[j + 1].k === bin.k + 1 ? values[j + 1] : null;
    const slope =
      prev !== null && next !== null
        ? (next - prev) / (2 * binDecades)
        : prev !== null
          ? (values[j] - prev) / binDecades
          : next !== null
            ? (next - values[j]) / binDecades
            : bin.b;
    const scatter = sigma * Math.sqrt(1 / bin.n + (uc - bin.mean) ** 2 / bin.sxx);
    let shiftVar = input.rereferenceStdErr ** 2 * slope * slope;
    for (const [iso, f] of bin.share) {
      const s = input.shiftStdErr.get(iso);
      if (!s) continue;
      shiftVar += f * f * (slope * slope * s.aT * s.aT + s.bT * s.bT);
    }
    return {
      log10x: uc,
      log10y: values[j],
      slope,
      stdErr: Math.sqrt(scatter * scatter + shiftVar),
      scatterStdErr: scatter,
      count: bin.n,
    };
  });
  return { nodes, scatterDecades: sigma };
}

/**
 * Cubic Hermite interpolation of the nodes at `u` (values and slopes); null outside them or
 * across a gap of more than one bin. Returns value, slope and the scatter s.e. of the nearer node.
 */
export function interpolateNodes(
  nodes: GridNode[],
  u: number,
  binDecades: number,
): { y: number; slope: number; scatterStdErr: number; stdErr: number } | null {
  if (nodes.length === 0) return null;
  const first = nodes[0].log10x;
  const j = Math.floor((u - first) / binDecades + 1e-9);
  // nodes are sorted and on the grid; locate the pair around u by a short search
  let lo = Math.min(Math.max(0, j), nodes.length - 1);
  while (lo > 0 && nodes[lo].log10x > u + 1e-12) lo--;
  while (lo + 1 < nodes.length && nodes[lo + 1].log10x <= u + 1e-12) lo++;
  const a = nodes[lo];
  if (Math.abs(u - a.log10x) < 1e-9)
    return { y: a.log10y, slope: a.slope, scatterStdErr: a.scatterStdErr, stdErr: a.stdErr };
  const b = nodes[lo + 1];
  if (!b || u < a.log10x || b.log10x - a.log10x > binDecades * 1.5) return null;
  const h = b.log10x - a.log10x;
  const t = (u - a.log10x) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  const y =
    (2 * t3 - 3 * t2 + 1) * a.log10y +
    (t3 - 2 * t2 + t) * h * a.slope +
    (-2 * t3 + 3 * t2) * b.log10y +
    (t3 - t2) * h * b.slope;
  const dy =
    ((6 * t2 - 6 * t) * a.log10y +
      (3 * t2 - 4 * t + 1) * h * a.slope +
      (-6 * t2 + 6 * t) * b.log10y +
      (3 * t2 - 2 * t) * h * b.slope) /
    h;
  const near = t < 0.5 ? a : b;
  return { y, slope: dy, scatterStdErr: near.scatterStdErr, stdErr: near.stdErr };
}

/** Quantities compared, in the order they are reported. */
export const COMPARED_QUANTITIES: readonly QuantityId[] = [
  'storageModulus',
  'lossModulus',
  'tanDelta',
  'complexViscosity',
  'relaxationModulus',
];

/** Quantities the time shift and modulus offset are fitted to (moduli only: tan δ has no vertical offset). */
export const MAPPED_QUANTITIES: readonly QuantityId[] = [
  'storageModulus',
  'lossModulus',
  'relaxationModulus',
];
