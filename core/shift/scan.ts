/**
 * Robust scan of one pair's offset, for starting values: a grid over every offset at which the two
 * curves overlap enough, scored by the mean absolute mismatch (an L1 score, so a few low-torque
 * outliers cannot steer it), then a finer grid around the best. With a joint vertical fit the best
 * vertical offset for each horizontal one is the median mismatch (the L1 optimum).
 */
import type { FitProblem } from './problem';
import { median } from './robust';

export interface ScanSettings {
  step: number;
  /** When set, the sign prior: h_v − h_u ≤ allowance if T_v > T_u (and mirrored). */
  directionAllowance: number | null;
  /** Largest |h_v − h_u| considered, decades. */
  maxOffset: number;
}

export interface ScanResult {
  dh: number;
  dv: number;
  score: number;
  count: number;
}

const MAX_SCAN_ENTRIES = 64;

interface Light {
  lx: Float64Array;
  y: Float64Array;
}

function decimate(lx: Float64Array, y: Float64Array): Light {
  if (lx.length <= MAX_SCAN_ENTRIES) return { lx, y };
  const stride = lx.length / MAX_SCAN_ENTRIES;
  const n = MAX_SCAN_ENTRIES;
  const ox = new Float64Array(n);
  const oy = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const k = Math.min(lx.length - 1, Math.round(i * stride));
    ox[i] = lx[k];
    oy[i] = y[k];
  }
  ox[n - 1] = lx[lx.length - 1];
  oy[n - 1] = y[y.length - 1];
  return { lx: ox, y: oy };
}

/** Push (sign × (a − interpolated b)) for points of a inside b's range shifted by `shift`. */
function pushMismatch(
  a: Light,
  b: Light,
  shift: number,
  yOff: number,
  sign: number,
  out: number[],
): void {
  const bx = b.lx;
  const last = bx.length - 1;
  let k = 0;
  for (let e = 0; e < a.lx.length; e++) {
    const q = a.lx[e] + shift;
    if (q < bx[0]) continue;
    if (q > bx[last]) break;
    while (k < last - 1 && bx[k + 1] < q) k++;
    const yb = b.y[k] + ((b.y[k + 1] - b.y[k]) * (q - bx[k])) / (bx[k + 1] - bx[k]);
    out.push(sign * (a.y[e] + yOff - yb));
  }
}

/** Σ|a − interpolated b| and count over points of a inside b's range shifted by `shift`. */
function sumAbsMismatch(
  a: Light,
  b: Light,
  shift: number,
  yOff: number,
): { sum: number; count: number } {
  const bx = b.lx;
  const by = b.y;
  const last = bx.length - 1;
  const lo = bx[0];
  const hi = bx[last];
  let k = 0;
  let sum = 0;
  let count = 0;
  const ax = a.lx;
  const ay = a.y;
  for (let e = 0; e < ax.length; e++) {
    const q = ax[e] + shift;
    if (q < lo) continue;
    if (q > hi) break;
    while (k < last - 1 && bx[k + 1] < q) k++;
    const yb = by[k] + ((by[k + 1] - by[k]) * (q - bx[k])) / (bx[k + 1] - bx[k]);
    sum += Math.abs(ay[e] + yOff - yb);
    count++;
  }
  return { sum, count };
}

/**
 * Best offset of curve v relative to curve u (dh = h_v − h_u, dv = v_v − v_u), or null when the
 * two never overlap by `minOverlapPoints`.
 */
export function scanPair(
  p: FitProblem,
  u: number,
  v: number,
  tempOrder: number,
  s: ScanSettings,
): ScanResult | null {
  const nd = p.alpha.length;
  const cu: Light[] = [];
  const cv: Light[] = [];
  let lo = Infinity;
  let hi = -Infinity;
  for (let d = 0; d < nd; d++) {
    cu.push(decimate(p.curves[u][d].lx, p.curves[u][d].y));
    cv.push(decimate(p.curves[v][d].lx, p.curves[v][d].y));
    const a = cu[d].lx;
    const b = cv[d].lx;
    if (a.length < 2 || b.length < 2) continue;
    // shiftX = σ·dh must lie in [min_u − max_v, max_u − min_v] for any overlap.
    lo = Math.min(lo, a[0] - b[b.length - 1]);
    hi = Math.max(hi, a[a.length - 1] - b[0]);
  }
  if (!(hi >= lo)) return null;
  // Convert the shiftX interval to a dh interval.
  let dhLo = p.sigma > 0 ? lo : -hi;
  let dhHi = p.sigma > 0 ? hi : -lo;
  dhLo = Math.max(dhLo, -s.maxOffset);
  dhHi = Math.min(dhHi, s.maxOffset);
  if (s.directionAllowance !== null && tempOrder !== 0) {
    if (tempOrder > 0) dhHi = Math.min(dhHi, s.directionAllowance);
    else dhLo = Math.max(dhLo, -s.directionAllowance);
  }
  if (!(dhHi >= dhLo)) return null;
  const buf: number[] = [];
  const betas: number[] = [];
  const vb: number[] = [];
  const score = (dh: number): ScanResult | null => {
    const shift = p.sigma * dh;
    if (!p.joint) {
      // Fast path: mean absolute mismatch without storing residuals.
      let sum = 0;
      let count = 0;
      let enough = false;
      for (let d = 0; d < nd; d++) {
        if (cu[d].lx.length < 2 || cv[d].lx.length < 2) continue;
        const yOff = p.alpha[d] * dh;
        const a = sumAbsMismatch(cv[d], cu[d], shift, yOff);
        const b = sumAbsMismatch(cu[d], cv[d], -shift, -yOff);
        if (a.count + b.count >= p.minOverlapPoints) {
          enough = true;
          sum += a.sum + b.sum;
          count += a.count + b.count;
        }
      }
      return enough ? { dh, dv: 0, score: sum / count, count } : null;
    }
    buf.length = 0;
    betas.length = 0;
    vb.length = 0;
    let enough = false;
    for (let d = 0; d < nd; d++) {
      if (cu[d].lx.length < 2 || cv[d].lx.length < 2) continue;
      const start = buf.length;
      const yOff = p.alpha[d] * dh;
      pushMismatch(cv[d], cu[d], shift, yOff, 1, buf);
      pushMismatch(cu[d], cv[d], -shift, -yOff, -1, buf);
      if (buf.length - start >= p.minOverlapPoints) enough = true;
      else buf.length = start;
      for (let q = start; q < buf.length; q++) betas.push(p.beta[d]);
    }
    if (!enough) return null;
    let dv = 0;
    for (let q = 0; q < buf.length; q++) if (betas[q] !== 0) vb.push(-betas[q] * buf[q]);
    if (vb.length > 0) dv = median(vb);
    // Mismatch "v minus u" at equal reduced abscissa; a vertical offset enters as +β·dv.
    let sum = 0;
    for (let q = 0; q < buf.length; q++) sum += Math.abs(buf[q] + betas[q] * dv);
    return { dh, dv, score: sum / buf.length, count: buf.length };
  };
  let best: ScanResult | null = null;
  const consider = (dh: number): void => {
    if (dh < dhLo - 1e-12 || dh > dhHi + 1e-12) return;
    const r = score(dh);
    if (r && (!best || r.score < best.score)) best = r;
  };
  // Coarse grid at twice the step, then the step, then a tenth of it around the best.
  const coarseStep = 2 * s.step;
  const n = Math.max(1, Math.ceil((dhHi - dhLo) / coarseStep));
  for (let i = 0; i <= n; i++) consider(dhLo + ((dhHi - dhLo) * i) / n);
  if (!best) return null;
  const c1: ScanResult = best;
  for (let i = -2; i <= 2; i++) consider(c1.dh + s.step * i);
  const c2: ScanResult = best;
  for (let i = -5; i <= 5; i++) consider(c2.dh + (s.step * i) / 10);
  // Below the finest grid step: the vertex of the parabola through the best point and its two
  // neighbours (a chain of hundreds of closely spaced isotherms would otherwise add up the grid's
  // rounding along the chain).
  const c3: ScanResult = best;
  const h = s.step / 10;
  const left = c3.dh - h >= dhLo - 1e-12 ? score(c3.dh - h) : null;
  const right = c3.dh + h <= dhHi + 1e-12 ? score(c3.dh + h) : null;
  if (left && right) {
    const curvature = left.score + right.score - 2 * c3.score;
    if (curvature > 0) {
      const dh = c3.dh + (0.5 * h * (left.score - right.score)) / curvature;
      const r = Math.abs(dh - c3.dh) <= h ? score(dh) : null;
      if (r && r.score <= c3.score + 0.25 * curvature) return r;
    }
  }
  return best;
}
