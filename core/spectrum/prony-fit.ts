/**
 * Prony series (generalised Maxwell model) fitted to a master curve by non-negative least squares
 * on relative residuals (DOMAIN.md §5; Baumgaertel & Winter, Rheol. Acta 28, 1989, for the fixed
 * log grid of relaxation times). Each row is divided by its measured value, so every point
 * weighs the same whatever its modulus: the fit minimises Σ (model/measured − 1)².
 * Unknowns: g_i ≥ 0 on the τ grid and, optionally, the equilibrium modulus Ge ≥ 0.
 * NNLS by ml-fcnnls (fast combinatorial active set, Van Benthem & Keenan, J. Chemometrics 18, 2004).
 */
import { fcnnlsVector } from 'ml-fcnnls';
import type { FitStatus } from '../models/types';
import { normaliseProny } from './prony-forms';
import type { PronySeries } from './prony-model';
import { pronyLoss, pronyRelaxation, pronyStorage } from './prony-model';
import { relaxationTimeGrid } from './tau-grid';
import type { NormalisedProny, ReducedCurve, ReducedWindow, SpectrumWarning } from './types';

export interface PronyFitOptions {
  /** Relaxation times per decade of the grid (1 or 2 is usual; 1 leaves ripples of a few per cent in G''). @default 2 */
  modesPerDecade?: number;
  /** Widen the τ grid beyond the data window by this many decades at each end. @default 0 */
  extendDecades?: number;
  /** Fit the equilibrium modulus Ge ≥ 0 (false: Ge = 0, a melt). @default true */
  fitEquilibrium?: boolean;
  /** Iteration cap of the active-set solver. @default 20 × number of unknowns */
  maxIterations?: number;
}

export interface PronyFitError {
  /** RMS of G'model/G'measured − 1 (dimensionless, 0.02 = 2 %); NaN when not fitted. */
  storageRms: number;
  lossRms: number;
  relaxationRms: number;
}

export interface PronyFitResult extends FitStatus {
  series: PronySeries;
  normalised: NormalisedProny;
  fitError: PronyFitError;
  window: ReducedWindow;
  /** Modes with g_i > 0 (NNLS sets the others to exactly zero). */
  activeModes: number;
  pointCount: number;
  warnings: SpectrumWarning[];
}

/** PronyFitOptions with every default applied and checked. */
export function resolvePronyFitOptions(
  o: PronyFitOptions = {},
): Required<Omit<PronyFitOptions, 'maxIterations'>> & { maxIterations?: number } {
  const r = {
    modesPerDecade: o.modesPerDecade ?? 2,
    extendDecades: o.extendDecades ?? 0,
    fitEquilibrium: o.fitEquilibrium ?? true,
    maxIterations: o.maxIterations,
  };
  if (!(r.modesPerDecade > 0 && r.modesPerDecade <= 10)) {
    throw new RangeError('The modesPerDecade option must be a number in (0, 10]');
  }
  if (!(r.extendDecades >= 0 && r.extendDecades <= 3))
    throw new RangeError('The extendDecades option must be in [0, 3]');
  if (r.maxIterations !== undefined && !(r.maxIterations >= 1))
    throw new RangeError('The maxIterations option must be ≥ 1');
  return r;
}

type Kind = 'storage' | 'loss' | 'relaxation';
const LABEL: Record<Kind, string> = {
  storage: 'storage modulus',
  loss: 'loss modulus',
  relaxation: 'relaxation modulus',
};

/** Basis value of unknown j (0 = Ge, then the modes) for one row. */
function basis(kind: Kind, x: number, tau: number[], j: number): number {
  if (j === 0) return kind === 'loss' ? 0 : 1;
  const t = tau[j - 1];
  if (kind === 'relaxation') return Math.exp(-x / t);
  const wt = x * t;
  return kind === 'storage' ? (wt * wt) / (1 + wt * wt) : wt / (1 + wt * wt);
}

/** Fits a Prony series to reduced master-curve data. */
export function fitProny(curve: ReducedCurve, options: PronyFitOptions = {}): PronyFitResult {
  const o = resolvePronyFitOptions(options);
  const n = curve.x?.length ?? 0;
  const timeDomain = curve.relaxation !== undefined;
  if (timeDomain && (curve.storage || curve.loss)) {
    throw new RangeError('curve: give either relaxation data or storage/loss data, not both');
  }
  if (!timeDomain && !curve.storage && !curve.loss) {
    throw new RangeError('curve must hold storage, loss or relaxation values');
  }
  const kinds: Kind[] = timeDomain
    ? ['relaxation']
    : (['storage', 'loss'] as Kind[]).filter((k) => curve[k]);
  for (const k of kinds) {
    if (curve[k]!.length !== n)
      throw new RangeError(`curve.${k} (${curve[k]!.length}) must match curve.x (${n})`);
  }
  const warnings: SpectrumWarning[] = [];
  const rows: { kind: Kind; x: number; y: number }[] = [];
  const usedX: number[] = [];
  for (let i = 0; i < n; i++) {
    const x = curve.x[i];
    if (!(x > 0) || !Number.isFinite(x)) {
      warnings.push({
        pointIndex: i,
        message: `Point ${i + 1}: reduced ${timeDomain ? 'time' : 'frequency'} ${x} is not positive; skipped.`,
      });
      continue;
    }
    let any = false;
    for (const k of kinds) {
      const y = curve[k]![i];
      if (y > 0 && Number.isFinite(y)) {
        rows.push({ kind: k, x, y });
        any = true;
      } else {
        warnings.push({
          pointIndex: i,
          message: `Point ${i + 1}: ${LABEL[k]} ${y} is not a positive number; left out of the fit.`,
        });
      }
    }
    if (any) usedX.push(x);
  }
  if (usedX.length < 2) throw new RangeError('fitProny needs at least two usable points');
  const window: ReducedWindow = {
    abscissa: timeDomain ? 'time' : 'angularFrequency',
    min: Math.min(...usedX),
    max: Math.max(...usedX),
  };
  const tau = relaxationTimeGrid(window, o.modesPerDecade, o.extendDecades);
  const withGe = o.fitEquilibrium && kinds.some((k) => k !== 'loss');
  if (o.fitEquilibrium && !withGe) {
    warnings.push({
      pointIndex: -1,
      message: 'Loss modulus alone does not determine the equilibrium modulus: Ge set to 0.',
    });
  }
  const cols = tau.length + 1;
  // Relative rows: basis/measured, target 1. Columns scaled to unit norm for conditioning.
  const X = rows.map((r) =>
    Array.from({ length: cols }, (_, j) =>
      j === 0 && !withGe ? 0 : basis(r.kind, r.x, tau, j) / r.y,
    ),
  );
  const norms = Array.from({ length: cols }, (_, j) =>
    Math.sqrt(X.reduce((s, row) => s + row[j] * row[j], 0)),
  );
  const active = norms.map((v) => v > 0);
  const colIdx = norms.map((_, j) => j).filter((j) => active[j]);
  const Xs = X.map((row) => colIdx.map((j) => row[j] / norms[j]));
  const y = rows.map(() => 1);
  const maxIterations = o.maxIterations ?? 20 * colIdx.length;
  const sol = fcnnlsVector(Xs, y, { maxIterations, info: true });
  const coef = new Array<number>(cols).fill(0);
  const k = sol.K.to1DArray();
  colIdx.forEach((j, c) => (coef[j] = Math.max(0, k[c]) / norms[j]));
  // strengths below 1e-12 of G0 are rounding noise of the solver: set them to exactly 0
  const total = coef.reduce((a, b) => a + b, 0);
  const clean = coef.map((c) => (c < 1e-12 * total ? 0 : c));
  const series: PronySeries = {
    equilibriumModulusPa: clean[0],
    tauS: tau,
    modulusPa: clean.slice(1),
  };
  // Optimality (Karush–Kuhn–Tucker) check on the scaled problem: gradient ≤ 0 at zeros, ≈ 0 elsewhere.
  const res = y.map(
    (yi, i) => yi - colIdx.reduce((s, j, c) => s + Xs[i][c] * coef[j] * norms[j], 0),
  );
  const grad = colIdx.map((_, c) => Xs.reduce((s, row, i) => s + row[c] * res[i], 0));
  const gTol = 1e-6 * Math.sqrt(rows.length);
  const kkt = colIdx.every((j, c) => (coef[j] > 0 ? Math.abs(grad[c]) <= gTol : grad[c] <= gTol));
  const fitError = errors(rows, series);
  return {
    series,
    normalised: normaliseProny(series),
    fitError,
    window,
    activeModes: series.modulusPa.filter((g) => g > 0).length,
    pointCount: usedX.length,
    warnings,
    converged: kkt,
    iterations: sol.info.iterations,
    reason: kkt
      ? 'Non-negative least squares solved: no mode can lower the residual further.'
      : 'The non-negative solver stopped before its optimality check was met; try fewer modes per decade.',
  };
}

function errors(rows: { kind: Kind; x: number; y: number }[], s: PronySeries): PronyFitError {
  const acc: Record<Kind, [number, number]> = { storage: [0, 0], loss: [0, 0], relaxation: [0, 0] };
  for (const r of rows) {
    const m =
      r.kind === 'storage'
        ? pronyStorage(s, r.x)
        : r.kind === 'loss'
          ? pronyLoss(s, r.x)
          : pronyRelaxation(s, r.x);
    const e = m / r.y - 1;
    acc[r.kind][0] += e * e;
    acc[r.kind][1]++;
  }
  const rms = (k: Kind): number => (acc[k][1] ? Math.sqrt(acc[k][0] / acc[k][1]) : NaN);
  return { storageRms: rms('storage'), lossRms: rms('loss'), relaxationRms: rms('relaxation') };
}
