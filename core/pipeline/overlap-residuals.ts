/**
 * Residuals of every point against the other isotherms it overlaps on the master curve: at the
 * point's reduced abscissa, each other used isotherm whose reduced range covers it is
 * interpolated linearly in log–log space, and the residual is log10(point) − the mean of those,
 * in decades — the mismatch the overlap fit minimises (docs/conventions.md §2). A trend with temperature
 * says superposition fails; a point far off says check it. Points no other isotherm overlaps
 * get no residual. Left-out isotherms are compared with the used ones too (at the shift they
 * are drawn at), to show why they do not fit.
 */
import type { QuantityId } from '../data/types';
import type { IsothermUse } from './isotherm-states';
import { reducedIsotherms, type ReducedIsotherm } from './reduced-isotherms';
import type { Analysis } from './types';

export interface IsothermResiduals {
  isothermId: string;
  temperatureK: number;
  use: IsothermUse;
  /** Reduced abscissa of each point with a residual. */
  x: number[];
  residualDecades: number[];
  /** RMS of the residuals, decades (null without any). */
  rmsDecades: number | null;
}

/** log10 y of a reduced isotherm at log10 x by linear interpolation; null outside its range. */
function interpolateLog(r: { lx: number[]; ly: number[] }, lx: number): number | null {
  const n = r.lx.length;
  if (n === 0 || lx < r.lx[0] || lx > r.lx[n - 1]) return null;
  let k = 1;
  while (k < n - 1 && r.lx[k] < lx) k++;
  if (n === 1) return r.ly[0];
  const [x0, x1, y0, y1] = [r.lx[k - 1], r.lx[k], r.ly[k - 1], r.ly[k]];
  return x1 === x0 ? (y0 + y1) / 2 : y0 + ((lx - x0) / (x1 - x0)) * (y1 - y0);
}

function logForm(r: ReducedIsotherm): { lx: number[]; ly: number[] } {
  const idx = r.x
    .map((_, i) => i)
    .filter((i) => r.y[i] > 0 && !r.outlier[i])
    .sort((p, q) => r.x[p] - r.x[q]);
  return { lx: idx.map((i) => Math.log10(r.x[i])), ly: idx.map((i) => Math.log10(r.y[i])) };
}

export function overlapResiduals(a: Analysis, q: QuantityId): IsothermResiduals[] {
  const all = reducedIsotherms(a, q);
  const used = all.filter((r) => r.use === 'used').map((r) => ({ r, log: logForm(r) }));
  return all.map((r) => {
    const x: number[] = [];
    const res: number[] = [];
    r.x.forEach((xv, i) => {
      if (!(r.y[i] > 0)) return;
      const lx = Math.log10(xv);
      const others = used
        .filter((u) => u.r.isothermId !== r.isothermId)
        .map((u) => interpolateLog(u.log, lx))
        .filter((v): v is number => v !== null);
      if (others.length === 0) return;
      x.push(xv);
      res.push(Math.log10(r.y[i]) - others.reduce((s, v) => s + v, 0) / others.length);
    });
    return {
      isothermId: r.isothermId,
      temperatureK: r.temperatureK,
      use: r.use,
      x,
      residualDecades: res,
      rmsDecades: res.length ? Math.sqrt(res.reduce((s, v) => s + v * v, 0) / res.length) : null,
    };
  });
}
