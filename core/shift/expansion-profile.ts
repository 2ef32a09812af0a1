/**
 * The one constant αV of the entropic law bT = Tref(1 + αV(T − Tref))/T (Ferry, Viscoelastic
 * Properties of Polymers, 3rd ed., 1980; ρref cancels), estimated from the moduli by profiling the
 * horizontal fit: each trial αV fixes bT for every isotherm, aT is re-fitted, and αV minimises the
 * horizontal fit's own objective.
 *
 * How (docs/shifting.md, "How αV is estimated"):
 *  - The objective is the robust loss Σρ(z) that the horizontal fit minimises, with one robust
 *    scale for every trial (the scale of the first fit). Comparing the weighted squares Σ w·ψ·r²
 *    of the trials instead, each with its own scale, is not a criterion any αV minimises: beyond
 *    Huber's corner ψ·r² grows like |r|, so trials far from the optimum (bT ≡ 1, or a bT twice too
 *    large) look better than they are, and a parabola through them lands 1.3–2× too high.
 *  - The slope of the profile F(αV) = min_aT L(aT, αV) is ∂L/∂αV at the re-fitted aT (envelope
 *    theorem: ∂L/∂aT = 0 there), summed over the pair residuals in one walk:
 *      dF/dαV = Σ ψ(z)/z · w · r · ∂r/∂αV,  ∂r/∂αV = β_q (D_i − D_j),  D_k = ∂log10 bT_k/∂αV.
 *    A secant (one-dimensional Newton) on that slope converges in two or three re-fits; each
 *    re-fit starts from the shifts predicted by the last two (∂aT/∂αV), so it takes few steps.
 *  - The trial fits converge to PROFILE_TOLERANCE_DECADES or the user's tighter tolerance (the
 *    slope is only as good as the shifts it is taken at; on 200 × 2000 points a tenth of it moved
 *    αV by 0.02 of its standard error).
 *  - The sensitivity ∂log10 aT/∂αV comes from two re-fits a few standard errors of αV apart; with
 *    it, the curvature of the profile and the noise of its slope follow in one walk over the pair
 *    residuals (pathInformation: the engine's sandwich along the profile's path), so that
 *    s.e.(αV) counts that every point enters many pair comparisons. The sensitivity also carries
 *    αV's uncertainty into the shifts' covariance (shift-isotherms.ts).
 */
import type { Dataset, QuantityId } from '../data/types';
import { buildProblem } from './build-problem';
import { betaOf } from './drivers';
import type { FitProblem } from './problem';
import { fitOffsets, robustFitSettings } from './fit-offsets';
import type { OffsetFit } from './fit-offsets';
import { forEachPair } from './residuals';
import { ResidualBuffer } from './residual-buffer';
import { lossCode, robustRho, robustWeight } from './robust';
import type { ResolvedShiftOptions } from './types';
import { entropicLog10bT, entropicLog10bTSlope } from '../data/reduction';

/** Result of the profile of the horizontal fit's mismatch over αV. */
export interface ProfileFit {
  expansionPerK: number;
  expansionStdErr: number;
  /** 2·(L without bT − L at the best αV) / s², L the fit's loss: the evidence for a bT. */
  chi2Drop: number;
  /** (αV − 1/Tref)/s.e.: how far the data's bT lies from bT ≡ 1 in standard errors. */
  z: number;
  effectDecades: number;
  /** Per dataset index: ∂log10 aT/∂αV at the estimate, decades·K (0 where not fitted). */
  sensitivity: number[];
  /** Per dataset index: log10 aT at the estimate (NaN where not fitted), a warm start. */
  log10aT: number[];
  /** Horizontal fits the profile took. */
  fits: number;
}

/** Trial fits converge to this, decades (or to the user's tolerance when tighter). */
export const PROFILE_TOLERANCE_DECADES = 1e-3;
/**
 * Curves the horizontal fit bins (denser than its maxPointsPerDecade) are binned coarser for the
 * profile, to this many entries per decade: each trial fit then walks half the entries. Measured:
 * noise-free sets at 200 points per decade give αV within 0.02 % of the truth (as with 40 bins a
 * decade); on the 200 × 2000 sets of bench/vs-generator.ts the standard error of αV grew by 1 %
 * and the estimate moved by half a standard error (which the largest error of log10 aT, 0.0007
 * decades, does not show). Sparser curves are not binned, as in the horizontal fit.
 */
export const PROFILE_POINTS_PER_DECADE = 20;
/** The second trial αV: a value typical of polymer melts, 1/K (common practice). */
const TYPICAL_EXPANSION_PER_K = 6e-4;
/** The secant stops when a step is below this share of αV's standard error … */
const STOP_SHARE_OF_STD_ERR = 0.1;
/** … or below this, 1/K. */
const STOP_ABSOLUTE_PER_K = 1e-9;
/** Most secant steps. */
const MAX_STEPS = 8;
/**
 * Iterations of a trial fit that starts from predicted shifts (the secant and curvature trials).
 * Started that close, one iteration reaches the optimum; the rest of a full fit goes to rounds in
 * which a point at the edge of an overlap enters and leaves the comparison by turns (the loss
 * changes in its sixth digit), which moves nothing.
 */
const PREDICTED_TRIAL_ITERATIONS = 2;
/** The sensitivity pair lies this many (naive) standard errors apart, far enough that the fits' tolerance does not matter. */
const CURVATURE_SPAN_STD_ERR = 3;

/** The problem with each curve's log ordinate moved by β_q·log10 bT (the same binning). */
export function withOffsets(
  p: FitProblem,
  drivers: QuantityId[],
  active: number[],
  log10bT: number[],
): FitProblem {
  const beta = drivers.map(betaOf);
  return {
    ...p,
    curves: p.curves.map((series, c) =>
      series.map((ser, d) => {
        const v = beta[d] * log10bT[active[c]];
        if (v === 0) return ser;
        // Plain loops: Float64Array.from with a mapping function is several times slower.
        const y = new Float64Array(ser.y.length);
        for (let i = 0; i < y.length; i++) y[i] = ser.y[i] + v;
        const ySorted = new Float64Array(ser.ySorted.length);
        for (let i = 0; i < ySorted.length; i++) ySorted[i] = ser.ySorted[i] + v;
        return { ...ser, y, ySorted };
      }),
    ),
  };
}

/** The fit's loss and the profile's slope in αV at the fit's shifts (one walk over the pairs). */
function lossAndSlope(
  fit: OffsetFit,
  slopeByCurve: Float64Array,
  loss: number,
  scale: number,
): { loss: number; slope: number } {
  let total = 0;
  let slope = 0;
  const beta = fit.problem.beta;
  forEachPair(
    fit.problem,
    fit.theta,
    (b) => {
      for (let m = 0; m < b.size; m++) {
        const r = b.r[m];
        const w = b.w[m];
        const z = r * Math.sqrt(w);
        total += robustRho(loss, z, scale);
        const dr = beta[b.driver[m]] * (slopeByCurve[b.owner[m]] - slopeByCurve[b.other[m]]);
        slope += robustWeight(loss, z, scale) * w * r * dr;
      }
    },
    new ResidualBuffer(),
  );
  return { loss: total, slope };
}

/**
 * The profile's curvature and the propagated noise of its slope along the profile's path
 * u = (∂aT/∂αV, 1) in (aT, αV) space (the sandwich of the engine's covariance, sandwich.ts,
 * restricted to that one direction; Huber 1967, Proc. 5th Berkeley Symp. 1): with
 * J_m·u = β_q (D_i − D_j) + g_m (S_i − S_j) per residual m (g = ∂r/∂h_owner, S the sensitivity),
 *   curvature F'' = Σ wt_m (J_m·u)²   (the Schur complement of the aT block: u makes ∂L/∂aT stay 0),
 *   meat = Σ_p a_p² / n_p,  a_p = Σ_m wt_m (J_m·u) ∂r_m/∂e_p,
 * over the noise e_p of every entry p (n_p points averaged into it), and var(αV) = s²·meat/F''².
 * Each point enters many pair residuals (as owner and through the other curve's interpolant), so
 * treating the residuals as independent would understate the error 2–3× (measured on seeded sets).
 * The slopes g are the noise-damped ones, as in the engine's covariance (FitProblem.smoothSlopes).
 */
function pathInformation(
  fit: OffsetFit,
  slopeByCurve: Float64Array,
  sensitivity: Float64Array,
  loss: number,
  scale: number,
): { curvature: number; meat: number } {
  const p: FitProblem = { ...fit.problem, smoothSlopes: true };
  const acc = p.curves.map((c) => c.map((ser) => new Float64Array(ser.lx.length)));
  let curvature = 0;
  forEachPair(
    p,
    fit.theta,
    (b) => {
      for (let m = 0; m < b.size; m++) {
        const o = b.owner[m];
        const t = b.other[m];
        const d = b.driver[m];
        const w = b.w[m];
        const wt = w * robustWeight(loss, b.r[m] * Math.sqrt(w), scale);
        const ju =
          p.beta[d] * (slopeByCurve[o] - slopeByCurve[t]) +
          b.g[m] * (sensitivity[o] - sensitivity[t]);
        const q = wt * ju;
        curvature += q * ju;
        const lam = b.lam[m];
        acc[o][d][b.entry[m]] += q;
        const other = acc[t][d];
        other[b.knot[m]] -= q * (1 - lam);
        other[b.knot[m] + 1] -= q * lam;
      }
    },
    new ResidualBuffer(),
  );
  let meat = 0;
  p.curves.forEach((c, k) =>
    c.forEach((ser, d) => {
      const a = acc[k][d];
      for (let e = 0; e < a.length; e++) meat += (a[e] * a[e]) / ser.w[e];
    }),
  );
  return { curvature, meat };
}

interface Trial {
  alpha: number;
  fit: OffsetFit;
  loss: number;
  slope: number;
}

/**
 * Profile of the horizontal fit (the user's drivers, usually G′ and G″) over αV. One global
 * constant cannot trade off against the shift of each isotherm the way a free bT per isotherm does
 * (G′ and G″ have different slopes, so a vertical shift is not a horizontal one), so αV is as well
 * determined as the curves allow. Null when fewer than three isotherms overlap or only tan δ / δ
 * drive the shift.
 */
export function profileExpansion(
  dataset: Dataset,
  active: number[],
  s: ResolvedShiftOptions,
): ProfileFit | null {
  if (active.length < 3 || s.drivers.every((q) => betaOf(q) === 0)) return null;
  const temps = dataset.isotherms.map((i) => i.temperatureK);
  const Tr = s.referenceK;
  const activeTemps = active.map((k) => temps[k]);
  const alphaNone = 1 / Tr;
  const settings = {
    ...robustFitSettings(s),
    toleranceDecades: Math.min(s.toleranceDecades, PROFILE_TOLERANCE_DECADES),
  };
  let densest = 0;
  for (const k of active) {
    const x = dataset.isotherms[k].x;
    let lo = Infinity;
    let hi = -Infinity;
    for (const v of x)
      if (v > 0) {
        lo = Math.min(lo, v);
        hi = Math.max(hi, v);
      }
    const span = Math.log10(hi / lo);
    if (span > 0) densest = Math.max(densest, x.length / span);
  }
  const perDecade =
    densest > s.maxPointsPerDecade
      ? Math.min(s.maxPointsPerDecade, PROFILE_POINTS_PER_DECADE)
      : s.maxPointsPerDecade;
  let last: FitProblem | null = null;
  const build = (d: Set<number>[] | undefined): FitProblem =>
    (last = buildProblem(dataset, {
      active,
      drivers: s.drivers,
      fixedLog10bT: null,
      joint: false,
      minOverlapPoints: s.minOverlapPoints,
      maxPointsPerDecade: perDecade,
      dropped: d,
    }));
  const common = {
    temperaturesK: activeTemps,
    referenceK: Tr,
    locked: new Map<number, number>(),
    // Only the mismatch is compared between trial αV: no standard errors needed.
    uncertainty: false,
    scanStep: s.scanStepDecades,
    directionAllowance: s.reverseAllowanceDecades,
    maxOffset: Infinity,
  };
  // First fit without bT (αV = 1/Tref gives bT ≡ 1): the start, the outliers and the robust scale.
  const first = fitOffsets({ ...common, ...settings, build, initial: null });
  let fits = 1;
  const base = last!;
  const scale = s.robustScaleDecades ?? first.scale;
  const loss = lossCode(s.robustLoss);
  const usable = (f: OffsetFit): boolean =>
    f.weightedSquares > 0 && f.included.reduce((a, b) => a + b, 0) >= 3;
  if (!usable(first)) return null;
  const evaluate = (alpha: number, fit: OffsetFit): Trial => {
    const d = Float64Array.from(activeTemps, (T) => entropicLog10bTSlope(T, Tr, alpha));
    return { alpha, fit, ...lossAndSlope(fit, d, loss, scale) };
  };
  const trial = (alpha: number, start: Float64Array, predicted = true): Trial | null => {
    const log10bT = temps.map((T) => entropicLog10bT(T, Tr, alpha));
    const fit = fitOffsets({
      ...common,
      ...settings,
      scale,
      // A fixed bT only moves each curve's log ordinate by a constant: the curves binned once
      // (without the first fit's outliers) are offset for each trial αV.
      build: () => withOffsets(base, s.drivers, active, log10bT),
      initial: start,
      flagOutliers: false,
      ...(predicted && {
        maxIterations: Math.min(settings.maxIterations, PREDICTED_TRIAL_ITERATIONS),
      }),
    });
    fits++;
    return usable(fit) ? evaluate(alpha, fit) : null;
  };
  /** Shifts at `alpha` predicted linearly from two trials (a warm start). */
  const predict = (a: Trial, b: Trial, alpha: number): Float64Array => {
    const t = (alpha - b.alpha) / (b.alpha - a.alpha);
    return Float64Array.from(b.fit.theta, (v, c) => v + t * (v - a.fit.theta[c]));
  };
  const none = evaluate(alphaNone, first);
  // αV outside [−1/Tref, 3/Tref] is far beyond any polymer (0–2·10⁻³ /K): the search stays inside.
  const lo = -alphaNone;
  const hi = 3 * alphaNone;
  let a = none;
  let b = trial(TYPICAL_EXPANSION_PER_K, first.theta, false);
  if (!b) return null;
  let curvature = NaN;
  // The naive standard error (residuals taken as independent) only scales the stopping rule.
  const naiveSe = (c: number): number => Math.sqrt((2 * b!.fit.residualVariance) / c);
  let alpha = b.alpha;
  for (let step = 0; step < MAX_STEPS; step++) {
    const c = (b.slope - a.slope) / (b.alpha - a.alpha);
    // Where the profile is not convex between the two trials (far from the optimum, robust
    // weights changing), step on downhill by twice their distance instead.
    if (c > 0) curvature = c;
    const downhill = b.alpha - Math.sign(b.slope) * 2 * Math.abs(b.alpha - a.alpha);
    const next = Math.max(lo, Math.min(hi, c > 0 ? b.alpha - b.slope / c : downhill));
    alpha = next;
    if (!(c > 0) && next === b.alpha) break; // at the end of the range
    // A step this small changes nothing that matters: it is taken without another re-fit.
    const small = Math.max(STOP_SHARE_OF_STD_ERR * naiveSe(c), STOP_ABSOLUTE_PER_K);
    if (c > 0 && Math.abs(next - b.alpha) < small) break;
    const t = trial(next, predict(a, b, next));
    if (!t) return null;
    a = b;
    b = t;
    alpha = b.alpha;
  }
  // The sensitivity ∂aT/∂αV from a pair of fits a few standard errors apart (the last secant pair
  // when it is that wide already), so that the fits' tolerance does not matter.
  if (!(curvature > 0)) return null;
  const span = CURVATURE_SPAN_STD_ERR * naiveSe(curvature);
  if (!(Math.abs(b.alpha - a.alpha) >= span / CURVATURE_SPAN_STD_ERR)) {
    const other = b.alpha + (b.alpha + span < hi ? span : -span);
    const t = trial(other, predict(a, b, other));
    if (t) a = t;
  }
  const da = b.alpha - a.alpha;
  const sens = Float64Array.from(b.fit.theta, (v, c) =>
    b.fit.included[c] && a.fit.included[c] && da !== 0 ? (v - a.fit.theta[c]) / da : 0,
  );
  const slopes = Float64Array.from(activeTemps, (T) => entropicLog10bTSlope(T, Tr, alpha));
  const info = pathInformation(b.fit, slopes, sens, loss, scale);
  if (info.curvature > 0) curvature = info.curvature;
  const s2 = b.fit.residualVariance;
  const se = Math.sqrt(s2 * info.meat) / curvature;
  const chi2Drop = (2 * (none.loss - b.loss)) / s2;
  if (!(chi2Drop > 0)) alpha = alphaNone;
  const n = dataset.isotherms.length;
  const sensitivity = new Array<number>(n).fill(0);
  const log10aT = new Array<number>(n).fill(NaN);
  active.forEach((k, c) => {
    if (!b.fit.included[c]) return;
    sensitivity[k] = sens[c];
    log10aT[k] = b.fit.theta[c] + sens[c] * (alpha - b.alpha);
  });
  let effect = 0;
  for (const k of active) effect = Math.max(effect, Math.abs(entropicLog10bT(temps[k], Tr, alpha)));
  return {
    expansionPerK: alpha,
    expansionStdErr: se,
    chi2Drop: Math.max(0, chi2Drop),
    z: (alpha - alphaNone) / se,
    effectDecades: effect,
    sensitivity,
    log10aT,
    fits,
  };
}
