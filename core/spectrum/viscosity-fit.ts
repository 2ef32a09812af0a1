/**
 * Zero-shear viscosity from the reduced complex-viscosity curve |η*|(ω_r) by a Cross or a
 * Carreau–Yasuda fit in log space (η∞ = 0):
 *   Cross (Cross, J. Colloid Sci. 20, 1965):  η = η0 / (1 + (λω)^m)
 *   Carreau–Yasuda (Yasuda, Armstrong & Cohen, Rheol. Acta 20, 1981):  η = η0 [1 + (λω)^a]^((n−1)/a)
 * By default both are fitted and the data choose: Carreau–Yasuda when its extra transition
 * parameter earns its place (AICc lower by more than 2; Burnham & Anderson 2002), else Cross. The
 * curve is log-binned first (log-bins.ts), each bin weighted by its standard error, so the fit
 * costs the same at any number of points. Cross approaches η0 as ω^m with m < 1 usually; a liquid
 * that reaches its terminal zone approaches it as ω² (|η*| = η0(1 − O(ω²)) for any Prony series,
 * Ferry 1980, ch. 3), which Carreau–Yasuda follows with a ≈ 2 and Cross cannot: on such curves
 * Cross overshoots η0.
 * Applying it to shear viscosity η(γ̇) assumes the Cox–Merz rule η(γ̇) ≈ |η*|(ω) at γ̇ = ω
 * (Cox & Merz, J. Polym. Sci. 28, 1958), an empirical rule that fails for many filled or
 * structured materials.
 */
import { levenbergMarquardtFit } from '../models/levenberg-marquardt-fit';
import type { FitStatus } from '../models/types';
import { densestRun, logBins } from './log-bins';
import type { SpectrumWarning } from './types';

export type ViscosityModel = 'cross' | 'carreau-yasuda';

export interface ViscosityLawFit extends FitStatus {
  model: ViscosityModel;
  /** η0, Pa·s. */
  zeroShearViscosityPaS: number;
  /** Standard error of log10 η0 (decades). */
  log10ZeroShearViscosityStdErr: number;
  /** λ, s. */
  timeConstantS: number;
  /** Cross: exponent m. Carreau–Yasuda: power-law index n. */
  exponent: number;
  /** Carreau–Yasuda transition parameter a (NaN for Cross). */
  transition: number;
  /** RMS of log10(model/measured) over the bins, decades. */
  rmsLog10: number;
  /** Small-sample AICc of the weighted fit (lower is better). */
  aicc: number;
}

export interface ViscosityFitResult extends ViscosityLawFit {
  /** The fits of both laws when both were tried (the chosen one is repeated at the top level). */
  candidates: ViscosityLawFit[];
  /** Why this law: one sentence. */
  choice: string;
  /**
   * |η*| at the lowest reduced frequency (mean of the lowest bin, 1/binsPerDecade of a decade),
   * Pa·s: a model-free lower bound for η0 of a liquid (|η*| falls with ω for any Prony series).
   */
  lowestFrequencyViscosityPaS: number;
  /** Reduced frequency of that bin, rad/s. */
  lowestFrequencyRadPerS: number;
  /** Standard error of log10 of that bin's |η*|, decades. */
  lowestFrequencyLog10StdErr: number;
  /** η0 against the model-free bound: above it, below it within the bin's noise (2 s.e.), or below. */
  bound: 'above' | 'within-noise' | 'below';
  /** True when the lowest frequency's |η*| is below 90 % of η0: η0 lies beyond the data. */
  extrapolated: boolean;
  /** The Cox–Merz note to show with the result. */
  note: string;
  warnings: SpectrumWarning[];
}

const COX_MERZ =
  'η0 from the oscillatory master curve. Reading it as steady-shear viscosity η(γ̇) relies on the Cox–Merz rule (Cox & Merz 1958), which is empirical: confirm by steady-shear testing.';

function evaluate(model: ViscosityModel, p: number[], lw: number): number {
  // indexed, not destructured: called some 10⁵ times per fit, often before it is optimised;
  // log10(1 + (λω)^e) as ln(1 + e^(e·ln λω))/ln 10: exp and log1p cost far less than two powers
  const lx = (p[1] + lw) * Math.LN10; // ln λω
  if (model === 'cross') return p[0] - Math.log1p(Math.exp(p[2] * lx)) / Math.LN10;
  return p[0] + ((p[2] - 1) / (p[3] * Math.LN10)) * Math.log1p(Math.exp(p[3] * lx));
}

/** One law fitted to binned log10 |η*| (x ascending) with statistical weights w. */
function fitLaw(model: ViscosityModel, x: number[], y: number[], w: number[]): ViscosityLawFit {
  if (model === 'cross') return fitLawFrom(model, x, y, w, NaN);
  // the Carreau–Yasuda sum of squares has several minima in a; start from a few (common practice)
  const starts = [0.5, 1, 2, 4];
  let best: ViscosityLawFit | null = null;
  for (const a of starts) {
    const f = fitLawFrom(model, x, y, w, a);
    if (!best || (f.converged && (!best.converged || f.aicc < best.aicc))) best = f;
  }
  return best!;
}

/** One fit from one starting transition parameter a0 (Carreau–Yasuda; ignored for Cross). */
function fitLawFrom(
  model: ViscosityModel,
  x: number[],
  y: number[],
  w: number[],
  a0: number,
): ViscosityLawFit {
  const m = x.length;
  let eta0 = -Infinity;
  for (const v of y) if (v > eta0) eta0 = v;
  // starting values: η0 from the low-frequency end, λ where |η*| has fallen to half of it,
  // the exponent from the high-frequency slope
  const half = x.find((_, i) => y[i] < eta0 - Math.log10(2)) ?? x[m - 1];
  const k = Math.max(1, m - 3);
  const slope = (y[m - 1] - y[k - 1]) / (x[m - 1] - x[k - 1] || 1);
  const m0 = Math.min(1, Math.max(0.2, -slope));
  const initial = model === 'cross' ? [eta0, -half, m0] : [eta0, -half, Math.max(0.05, 1 - m0), a0];
  const span = x[m - 1] - x[0];
  const lm = levenbergMarquardtFit(
    {
      x,
      y,
      weights: w,
      model: (p) => (v) => evaluate(model, p, v),
      initial,
      min: model === 'cross' ? [eta0 - 6, -x[m - 1] - 6, 0.05] : [eta0 - 6, -x[m - 1] - 1, 0, 0.1],
      // Carreau–Yasuda's knee 1/λ is kept within 2 decades below to 1 above the data: beyond
      // that λ and n trade off without bound (a power law)
      max: model === 'cross' ? [eta0 + 6, -x[0] + 6, 1.5] : [eta0 + 6, -x[0] + 2, 1, 10],
    },
    { step: initial.map(() => 1e-6 * Math.max(1, span)) },
  );
  const p = lm.params;
  const res = x.map((v, i) => y[i] - evaluate(model, p, v));
  const np = initial.length;
  const chi = lm.weightedSumSquares;
  return {
    model,
    zeroShearViscosityPaS: 10 ** p[0],
    log10ZeroShearViscosityStdErr: Math.sqrt(lm.covariance[0][0]),
    timeConstantS: 10 ** p[1],
    exponent: p[2],
    transition: model === 'cross' ? NaN : p[3],
    rmsLog10: Math.sqrt(res.reduce((s, r) => s + r * r, 0) / res.length),
    aicc: m - np - 1 > 0 ? chi + 2 * np + (2 * np * (np + 1)) / (m - np - 1) : NaN,
    converged: lm.converged,
    iterations: lm.iterations,
    reason: lm.reason,
  };
}

const NAME: Record<ViscosityModel, string> = { cross: 'Cross', 'carreau-yasuda': 'Carreau–Yasuda' };

/**
 * Fits the reduced |η*|(ω_r) curve (Pa·s against rad/s): `model` 'auto' (default) fits both laws
 * and keeps the one the data support, or fits the one named.
 */
export function fitViscosityCurve(
  omegaRadPerS: ArrayLike<number>,
  complexViscosityPaS: ArrayLike<number>,
  model: ViscosityModel | 'auto' = 'auto',
  options: { binsPerDecade?: number } = {},
): ViscosityFitResult {
  if (omegaRadPerS.length !== complexViscosityPaS.length) {
    throw new RangeError('omegaRadPerS and complexViscosityPaS must have the same length');
  }
  if (model !== 'cross' && model !== 'carreau-yasuda' && model !== 'auto')
    throw new RangeError(`model must be 'auto', 'cross' or 'carreau-yasuda', got ${String(model)}`);
  const warnings: SpectrumWarning[] = [];
  let bad = 0;
  for (let i = 0; i < omegaRadPerS.length; i++) {
    const w = omegaRadPerS[i];
    const e = complexViscosityPaS[i];
    if (!(w > 0 && e > 0 && Number.isFinite(w + e)) && ++bad <= 20)
      warnings.push({
        pointIndex: i,
        message: `Point ${i + 1}: frequency or |η*| not positive; skipped.`,
      });
  }
  if (bad > 20)
    warnings.push({ pointIndex: -1, message: `${bad - 20} more unusable points were skipped.` });
  const bins = logBins(omegaRadPerS, [complexViscosityPaS], options.binsPerDecade ?? 20);
  const run = densestRun(bins);
  if (run.outside > 0)
    warnings.push({
      pointIndex: -1,
      message: `${run.outside} point(s) lie more than a decade from the rest of the curve and were left out of the viscosity fit.`,
    });
  const q = bins.quantities[0];
  const x: number[] = [];
  const y: number[] = [];
  const w: number[] = [];
  const se: number[] = [];
  for (let j = run.first; j <= run.last; j++) {
    if (!(q.count[j] > 0)) continue;
    x.push(bins.log10x[j]);
    y.push(q.log10y[j]);
    se.push(q.stdErr[j]);
    w.push(1 / (q.stdErr[j] * q.stdErr[j]));
  }
  const laws: ViscosityModel[] = model === 'auto' ? ['cross', 'carreau-yasuda'] : [model];
  const need = model === 'cross' ? 4 : 5;
  if (x.length < need)
    throw new RangeError(
      `A ${model === 'auto' ? 'Carreau–Yasuda' : NAME[model]} fit needs at least ${need} usable points (after binning to 1/${bins.binsPerDecade} decade)`,
    );
  const candidates = laws.map((l) => fitLaw(l, x, y, w));
  let chosen = candidates[0];
  let choice = `${NAME[chosen.model]} law, as asked.`;
  if (model === 'auto') {
    const [cross, cy] = candidates;
    if (cy.converged && (!cross.converged || cy.aicc < cross.aicc - 2)) {
      chosen = cy;
      choice = cross.converged
        ? `Carreau–Yasuda: its transition parameter describes the data better than Cross (AICc ${cy.aicc.toFixed(1)} against ${cross.aicc.toFixed(1)}).`
        : 'Carreau–Yasuda: the Cross fit did not converge.';
    } else {
      chosen = cross;
      choice = cy.converged
        ? `Cross: Carreau–Yasuda's extra parameter does not earn its place (AICc ${cy.aicc.toFixed(1)} against ${cross.aicc.toFixed(1)}).`
        : 'Cross: the Carreau–Yasuda fit did not converge.';
    }
  }
  const lowest = 10 ** y[0];
  const lowSe = se[0];
  const eta0 = chosen.zeroShearViscosityPaS;
  const ratio = Math.log10(eta0) - y[0];
  return {
    ...chosen,
    candidates,
    choice,
    lowestFrequencyViscosityPaS: lowest,
    lowestFrequencyRadPerS: 10 ** x[0],
    lowestFrequencyLog10StdErr: lowSe,
    bound: ratio >= 0 ? 'above' : ratio >= -2 * lowSe ? 'within-noise' : 'below',
    extrapolated: lowest < 0.9 * eta0,
    note: COX_MERZ,
    warnings,
  };
}
