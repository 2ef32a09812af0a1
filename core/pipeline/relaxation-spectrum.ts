/**
 * The relaxation spectrum H(τ) from the fitted Prony series. G(t) = Ge + ∫ H(τ) e^(−t/τ) d ln τ
 * (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980, ch. 3); a Prony series is the
 * same integral with H concentrated on its relaxation times, so on a logarithmic grid each term
 * stands for H over its share of ln τ: H(τ_i) ≈ g_i / Δ ln τ_i (the line-spectrum form of
 * Baumgaertel & Winter, Rheol. Acta 28, 1989). Δ ln τ_i is the mean distance to the neighbouring
 * times in ln τ (one-sided at the ends; ln 10 for a single term).
 */
import type { PronySeries } from '../spectrum/prony-model';

export interface RelaxationSpectrum {
  tauS: number[];
  /** H(τ_i), Pa. */
  spectrumPa: number[];
  /** The Prony terms g_i, Pa. */
  modulusPa: number[];
  equilibriumModulusPa: number;
}

export function relaxationSpectrum(p: PronySeries): RelaxationSpectrum {
  const order = p.tauS.map((_, i) => i).sort((i, j) => p.tauS[i] - p.tauS[j]);
  const tau = order.map((i) => p.tauS[i]);
  const g = order.map((i) => p.modulusPa[i]);
  const ln = tau.map(Math.log);
  const n = tau.length;
  const width = ln.map((v, i) => {
    if (n === 1) return Math.LN10;
    if (i === 0) return ln[1] - v;
    if (i === n - 1) return v - ln[n - 2];
    return (ln[i + 1] - ln[i - 1]) / 2;
  });
  return {
    tauS: tau,
    spectrumPa: g.map((gi, i) => (width[i] > 0 ? gi / width[i] : NaN)),
    modulusPa: g,
    equilibriumModulusPa: p.equilibriumModulusPa,
  };
}
