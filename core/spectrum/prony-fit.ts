/**
 * Prony series (generalised Maxwell model) fitted to a master curve by non-negative least squares
 * on relative residuals (docs/conventions.md §5; Baumgaertel & Winter, Rheol. Acta 28, 1989, for the fixed
 * log grid of relaxation times). The curve is first log-binned (log-bins.ts): each bin mean is a
 * row, weighted by its standard error, so every decade counts by the points and the agreement it
 * holds, and 10⁶ points cost no more than 10³. The τ grid covers only the densest stretch of the
 * data: points more than a decade from the rest are left out with a warning.
 * Unknowns: g_i ≥ 0 on the τ grid and the equilibrium modulus Ge ≥ 0 — or Ge = 0 when asked, or
 * ('auto', the default) when the data reach the terminal zone of a liquid (terminal-zone.ts).
 * NNLS by ml-fcnnls (fast combinatorial active set, Van Benthem & Keenan, J. Chemometrics 18, 2004).
 */
import { fcnnlsVector } from 'ml-fcnnls';
import type { FitStatus } from '../models/types';
import { densestRun, logBins } from './log-bins';
import { normaliseProny } from './prony-forms';
import type { PronySeries } from './prony-model';
import { pronyLoss, pronyRelaxation, pronyStorage } from './prony-model';
import { relaxationTimeGrid } from './tau-grid';
import { terminalZone, type TerminalZone } from './terminal-zone';
import type { NormalisedProny, ReducedCurve, ReducedWindow, SpectrumWarning } from './types';

/** How the equilibrium modulus Ge is set. */
export type EquilibriumMode = 'auto' | 'fit' | 'zero';

export interface PronyFitOptions {
  /** Relaxation times per decade of the grid (1 or 2 is usual; 1 leaves ripples of a few per cent in G''). @default 2 */
  modesPerDecade?: number;
  /** Widen the τ grid beyond the data window by this many decades at each end. @default 0 */
  extendDecades?: number;
  /**
   * Further decades of short relaxation times below the window (above its highest frequency or
   * below its shortest time). Modes faster than the window still shape the top of it through
   * their tails (G′ ≈ g ω²τ², G″ ≈ g ωτ); without them the fastest mode of the grid takes that
   * weight, and a liquid measured in its terminal zone got η0 = Σ g_i τ_i up to 50 % low
   * (measured; ±0.5 % with one decade). Non-negative least squares leaves unneeded ones at 0.
   * @default 1
   */
  extendFastDecades?: number;
  /**
   * 'fit': Ge ≥ 0 is fitted; 'zero': Ge = 0 (a liquid); 'auto': Ge = 0 when the data reach the
   * terminal zone (slopes near 2 and 1, see terminal-zone.ts), else fitted. @default 'auto'
   */
  equilibrium?: EquilibriumMode;
  /** Bins per decade of the master curve before the fit. @default 20 */
  binsPerDecade?: number;
  /** Points further than this from the rest of the curve are left out, decades. @default 1 */
  maxGapDecades?: number;
  /** Iteration cap of the active-set solver. @default 20 × number of unknowns */
  maxIterations?: number;
}

export interface PronyFitError {
  /** RMS of G'model/G'measured − 1 over the points used (dimensionless, 0.02 = 2 %); NaN when not fitted. */
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
  /** Measured points the series rests on (inside the densest stretch). */
  pointCount: number;
  /** Bins the fit used (rows of the least-squares problem, per quantity together). */
  binCount: number;
  /** How Ge was set, and why. */
  equilibrium: { mode: 'fitted' | 'zero'; reason: string };
  /** The terminal-zone judgement of the data (slopes over the lowest decade). */
  terminal: TerminalZone;
  warnings: SpectrumWarning[];
}

/** PronyFitOptions with every default applied and checked. */
export function resolvePronyFitOptions(
  o: PronyFitOptions = {},
): Required<Omit<PronyFitOptions, 'maxIterations'>> & { maxIterations?: number } {
  const r = {
    modesPerDecade: o.modesPerDecade ?? 2,
    extendDecades: o.extendDecades ?? 0,
    extendFastDecades: o.extendFastDecades ?? 1,
    equilibrium: o.equilibrium ?? 'auto',
    binsPerDecade: o.binsPerDecade ?? 20,
    maxGapDecades: o.maxGapDecades ?? 1,
    maxIterations: o.maxIterations,
  };
  if (!(r.modesPerDecade > 0 && r.modesPerDecade <= 10)) {
    throw new RangeError('The modesPerDecade option must be a number in (0, 10]');
  }
  if (!(r.extendDecades >= 0 && r.extendDecades <= 3))
    throw new RangeError('The extendDecades option must be in [0, 3]');
  if (!(r.extendFastDecades >= 0 && r.extendFastDecades <= 3))
    throw new RangeError('The extendFastDecades option must be in [0, 3]');
  if (!['auto', 'fit', 'zero'].includes(r.equilibrium))
    throw new RangeError("The equilibrium option must be 'auto', 'fit' or 'zero'");
  if (!(r.binsPerDecade >= 2 && r.binsPerDecade <= 1000))
    throw new RangeError('The binsPerDecade option must be in [2, 1000]');
  if (!(r.maxGapDecades > 0)) throw new RangeError('The maxGapDecades option must be positive');
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

const MAX_POINT_WARNINGS = 20;

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
  const kinds: Kind[] = timeDomain ? ['relaxation'] : ['storage', 'loss'];
  const present = kinds.map((k) => curve[k] !== undefined);
  kinds.forEach((k, i) => {
    if (present[i] && curve[k]!.length !== n)
      throw new RangeError(`curve.${k} (${curve[k]!.length}) must match curve.x (${n})`);
  });
  const warnings: SpectrumWarning[] = [];
  let skipped = 0;
  const note = (i: number, message: string) => {
    if (++skipped <= MAX_POINT_WARNINGS) warnings.push({ pointIndex: i, message });
  };
  // plain loops (no closure per point): this pass visits every point of the master curve
  const given = kinds.map((k, q) => (present[q] ? curve[k]! : null));
  for (let i = 0; i < n; i++) {
    const x = curve.x[i];
    if (!(x > 0) || !Number.isFinite(x)) {
      note(
        i,
        `Point ${i + 1}: reduced ${timeDomain ? 'time' : 'frequency'} ${x} is not positive; skipped.`,
      );
      continue;
    }
    for (let q = 0; q < given.length; q++) {
      const ys = given[q];
      if (!ys) continue;
      const y = ys[i];
      if (!(y > 0) || !Number.isFinite(y))
        note(
          i,
          `Point ${i + 1}: ${LABEL[kinds[q]]} ${y} is not a positive number; left out of the fit.`,
        );
    }
  }
  if (skipped > MAX_POINT_WARNINGS)
    warnings.push({
      pointIndex: -1,
      message: `${skipped - MAX_POINT_WARNINGS} more values that are not positive numbers were left out of the Prony fit.`,
    });
  const ys = kinds.map((k, q) => (present[q] ? curve[k]! : new Float64Array(n).fill(NaN)));
  const bins = logBins(curve.x, ys, o.binsPerDecade);
  const run = densestRun(bins, o.maxGapDecades);
  if (run.last < run.first || bins.count.length === 0)
    throw new RangeError('fitProny needs at least two usable points');
  // the window: extreme x of the points inside the densest run (second pass over the data)
  const loIdx = bins.index[run.first];
  const hiIdx = bins.index[run.last];
  let min = Infinity;
  let max = -Infinity;
  let used = 0;
  // when the densest run holds every bin, every usable point is inside it: no log10 needed
  const everyBin = run.first === 0 && run.last === bins.index.length - 1;
  for (let i = 0; i < n; i++) {
    const x = curve.x[i];
    if (!(x > 0) || !Number.isFinite(x)) continue;
    if (!everyBin) {
      const b = Math.floor(Math.log10(x) * o.binsPerDecade);
      if (b < loIdx || b > hiIdx) continue;
    }
    let any = false;
    for (let q = 0; q < given.length && !any; q++) {
      const y = ys[q][i];
      any = given[q] !== null && y > 0 && Number.isFinite(y);
    }
    if (!any) continue;
    used++;
    if (x < min) min = x;
    if (x > max) max = x;
  }
  if (used < 2 || !(max > min)) throw new RangeError('fitProny needs at least two usable points');
  if (run.outside > 0)
    warnings.push({
      pointIndex: -1,
      message: `${run.outside} point(s) lie more than ${o.maxGapDecades} decade(s) from the rest of the master curve and were left out of the Prony fit (the series covers ${min.toPrecision(3)} … ${max.toPrecision(3)} ${timeDomain ? 's' : 'rad/s'}).`,
    });
  const window: ReducedWindow = {
    abscissa: timeDomain ? 'time' : 'angularFrequency',
    min,
    max,
  };
  const terminal = terminalZone(bins, run.first, run.last, window.abscissa);
  const canFitGe = kinds.some((k, q) => present[q] && k !== 'loss');
  let equilibrium: PronyFitResult['equilibrium'];
  if (o.equilibrium === 'zero')
    equilibrium = { mode: 'zero', reason: 'Ge set to 0 as asked (a liquid).' };
  else if (!canFitGe)
    equilibrium = {
      mode: 'zero',
      reason: 'Loss modulus alone does not determine the equilibrium modulus: Ge set to 0.',
    };
  else if (o.equilibrium === 'auto' && terminal.reached)
    equilibrium = {
      mode: 'zero',
      reason: `Ge set to 0: the data reach the terminal zone of a liquid (${terminal.reason}).`,
    };
  else
    equilibrium = {
      mode: 'fitted',
      reason:
        o.equilibrium === 'fit'
          ? 'Ge fitted (≥ 0) as asked.'
          : `Ge fitted (≥ 0): the data do not show a terminal zone (${terminal.reason}).`,
    };
  if (!canFitGe && o.equilibrium !== 'zero')
    warnings.push({ pointIndex: -1, message: equilibrium.reason });
  const withGe = equilibrium.mode === 'fitted';

  // rows: one per bin and quantity, relative residual (model/mean − 1) weighted by 1/se
  const rowKind: Kind[] = [];
  const rowX: number[] = [];
  const rowY: number[] = [];
  const rowW: number[] = [];
  for (let j = run.first; j <= run.last; j++) {
    kinds.forEach((k, q) => {
      const b = bins.quantities[q];
      if (!(b.count[j] > 0)) return;
      rowKind.push(k);
      rowX.push(10 ** bins.log10x[j]);
      rowY.push(10 ** b.log10y[j]);
      rowW.push(1 / (Math.LN10 * b.stdErr[j]));
    });
  }
  const tau = relaxationTimeGrid(window, o.modesPerDecade, o.extendDecades, o.extendFastDecades);
  const cols = tau.length + 1;
  // Relative rows: basis/measured, target 1, each scaled by √weight. Columns scaled to unit norm.
  const X = rowKind.map((kind, r) =>
    Array.from({ length: cols }, (_, j) =>
      j === 0 && !withGe ? 0 : (basis(kind, rowX[r], tau, j) / rowY[r]) * rowW[r],
    ),
  );
  const norms = Array.from({ length: cols }, (_, j) =>
    Math.sqrt(X.reduce((s, row) => s + row[j] * row[j], 0)),
  );
  const colIdx = norms.map((_, j) => j).filter((j) => norms[j] > 0);
  const Xs = X.map((row) => colIdx.map((j) => row[j] / norms[j]));
  const y = rowW.slice();
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
  const scaleY = Math.sqrt(y.reduce((s, v) => s + v * v, 0));
  const gTol = 1e-6 * Math.max(1, scaleY);
  const kkt = colIdx.every((j, c) => (coef[j] > 0 ? Math.abs(grad[c]) <= gTol : grad[c] <= gTol));
  const fitError = errors(curve, kinds, present, series, min, max);
  return {
    series,
    normalised: normaliseProny(series),
    fitError,
    window,
    activeModes: series.modulusPa.filter((g) => g > 0).length,
    pointCount: used,
    binCount: rowKind.length,
    equilibrium,
    terminal,
    warnings,
    converged: kkt,
    iterations: sol.info.iterations,
    reason: kkt
      ? 'Non-negative least squares solved: no mode can lower the residual further.'
      : 'The non-negative solver stopped before its optimality check was met; try fewer modes per decade.',
  };
}

/** RMS relative error of the series against every measured point inside the window. */
function errors(
  curve: ReducedCurve,
  kinds: Kind[],
  present: boolean[],
  s: PronySeries,
  min: number,
  max: number,
): PronyFitError {
  const acc: Record<Kind, [number, number]> = { storage: [0, 0], loss: [0, 0], relaxation: [0, 0] };
  // plain loops (no closure per point): this pass visits every point of the master curve
  for (let q = 0; q < kinds.length; q++) {
    if (!present[q]) continue;
    const k = kinds[q];
    const ys = curve[k]!;
    const a = acc[k];
    for (let i = 0; i < curve.x.length; i++) {
      const x = curve.x[i];
      if (!(x >= min && x <= max)) continue;
      const yv = ys[i];
      if (!(yv > 0) || !Number.isFinite(yv)) continue;
      const m =
        k === 'storage'
          ? pronyStorage(s, x)
          : k === 'loss'
            ? pronyLoss(s, x)
            : pronyRelaxation(s, x);
      const e = m / yv - 1;
      a[0] += e * e;
      a[1]++;
    }
  }
  const rms = (k: Kind): number => (acc[k][1] ? Math.sqrt(acc[k][0] / acc[k][1]) : NaN);
  return { storageRms: rms('storage'), lossRms: rms('loss'), relaxationRms: rms('relaxation') };
}
