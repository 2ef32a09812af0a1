/**
 * Zero-shear viscosity from the reduced complex-viscosity curve |η*|(ω_r) by a Cross or a
 * Carreau–Yasuda fit in log space (η∞ = 0):
 *   Cross (Cross, J. Colloid Sci. 20, 1965):  η = η0 / (1 + (λω)^m)
 *   Carreau–Yasuda (Yasuda, Armstrong & Cohen, Rheol. Acta 20, 1981):  η = η0 [1 + (λω)^a]^((n−1)/a)
 * Applying it to shear viscosity η(γ̇) assumes the Cox–Merz rule η(γ̇) ≈ |η*|(ω) at γ̇ = ω
 * (Cox & Merz, J. Polym. Sci. 28, 1958), an empirical rule that fails for many filled or
 * structured materials.
 */
import { levenbergMarquardtFit } from '../models/levenberg-marquardt-fit';
import type { FitStatus } from '../models/types';
import type { SpectrumWarning } from './types';

export type ViscosityModel = 'cross' | 'carreau-yasuda';

export interface ViscosityFitResult extends FitStatus {
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
  /** RMS of log10(model/measured), decades. */
  rmsLog10: number;
  /** |η*| at the lowest frequency, Pa·s: a model-free lower bound for η0 of a melt. */
  lowestFrequencyViscosityPaS: number;
  /** True when the lowest frequency's |η*| is below 90 % of η0: η0 lies beyond the data. */
  extrapolated: boolean;
  /** The Cox–Merz note to show with the result. */
  note: string;
  warnings: SpectrumWarning[];
}

const COX_MERZ =
  'η0 from |η*|(ω). Reading it as steady-shear viscosity η(γ̇) relies on the Cox–Merz rule (Cox & Merz 1958), which is empirical: confirm by steady-shear testing.';

function evaluate(model: ViscosityModel, p: number[], lw: number): number {
  const [logEta0, logLam, e, aRaw] = p;
  const x = 10 ** (logLam + lw); // λω
  if (model === 'cross') return logEta0 - Math.log10(1 + x ** e);
  return logEta0 + ((e - 1) / aRaw) * Math.log10(1 + x ** aRaw);
}

/**
 * Fits the reduced |η*|(ω_r) curve (Pa·s against rad/s) with a Cross or Carreau–Yasuda law.
 * Carreau–Yasuda is the default: its extra transition parameter follows broad transitions that
 * make the Cross form overshoot η0 by several per cent (see the tests).
 */
export function fitViscosityCurve(
  omegaRadPerS: ArrayLike<number>,
  complexViscosityPaS: ArrayLike<number>,
  model: ViscosityModel = 'carreau-yasuda',
): ViscosityFitResult {
  if (omegaRadPerS.length !== complexViscosityPaS.length) {
    throw new RangeError('omegaRadPerS and complexViscosityPaS must have the same length');
  }
  if (model !== 'cross' && model !== 'carreau-yasuda')
    throw new RangeError(`model must be 'cross' or 'carreau-yasuda', got ${String(model)}`);
  const warnings: SpectrumWarning[] = [];
  const lw: number[] = [];
  const le: number[] = [];
  for (let i = 0; i < omegaRadPerS.length; i++) {
    const w = omegaRadPerS[i];
    const e = complexViscosityPaS[i];
    if (w > 0 && e > 0 && Number.isFinite(w + e)) {
      lw.push(Math.log10(w));
      le.push(Math.log10(e));
    } else
      warnings.push({
        pointIndex: i,
        message: `Point ${i + 1}: frequency or |η*| not positive; skipped.`,
      });
  }
  const nPar = model === 'cross' ? 3 : 4;
  if (lw.length < nPar + 1)
    throw new RangeError(`A ${model} fit needs at least ${nPar + 1} usable points`);
  const order = lw.map((_, i) => i).sort((a, b) => lw[a] - lw[b]);
  const x = order.map((i) => lw[i]);
  const y = order.map((i) => le[i]);
  // starting values: η0 from the low-frequency end, λ where |η*| has fallen to half of it,
  // the exponent from the high-frequency slope
  const eta0 = Math.max(...y);
  const half = x.find((_, i) => y[i] < eta0 - Math.log10(2)) ?? x[x.length - 1];
  const k = Math.max(1, x.length - 3);
  const slope = (y[x.length - 1] - y[k - 1]) / (x[x.length - 1] - x[k - 1] || 1);
  const m0 = Math.min(1, Math.max(0.2, -slope));
  const initial = model === 'cross' ? [eta0, -half, m0] : [eta0, -half, Math.max(0.05, 1 - m0), 2];
  const span = x[x.length - 1] - x[0];
  const lm = levenbergMarquardtFit(
    {
      x,
      y,
      model: (p) => (v) => evaluate(model, p, v),
      initial,
      min:
        model === 'cross'
          ? [eta0 - 6, -x[x.length - 1] - 6, 0.05]
          : [eta0 - 6, -x[x.length - 1] - 6, 0, 0.1],
      max: model === 'cross' ? [eta0 + 6, -x[0] + 6, 1.5] : [eta0 + 6, -x[0] + 6, 1, 10],
    },
    { step: initial.map(() => 1e-6 * Math.max(1, span)) },
  );
  const p = lm.params;
  const res = x.map((v, i) => y[i] - evaluate(model, p, v));
  const zero = 10 ** p[0];
  const lowest = 10 ** y[0];
  return {
    model,
    zeroShearViscosityPaS: zero,
    log10ZeroShearViscosityStdErr: Math.sqrt(lm.covariance[0][0]),
    timeConstantS: 10 ** p[1],
    exponent: p[2],
    transition: model === 'cross' ? NaN : p[3],
    rmsLog10: Math.sqrt(res.reduce((s, r) => s + r * r, 0) / res.length),
    lowestFrequencyViscosityPaS: lowest,
    extrapolated: lowest < 0.9 * zero,
    note: COX_MERZ,
    warnings,
    converged: lm.converged,
    iterations: lm.iterations,
    reason: lm.reason,
  };
}
