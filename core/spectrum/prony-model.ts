/**
 * Generalised Maxwell model (Prony series). Ferry, Viscoelastic Properties of Polymers, 3rd ed.
 * (1980), ch. 3; see docs/conventions.md §5:
 *   G'(ω)  = Ge + Σ g_i ω²τ_i² / (1 + ω²τ_i²)
 *   G''(ω) = Σ g_i ωτ_i / (1 + ω²τ_i²)
 *   G(t)   = Ge + Σ g_i exp(−t/τ_i)
 * Moduli in Pa, τ in s, ω in rad/s, t in s.
 */
export interface PronySeries {
  /** Equilibrium (long-time) modulus, Pa. 0 for a melt. */
  equilibriumModulusPa: number;
  /** Relaxation times τ_i, s. */
  tauS: number[];
  /** Mode strengths g_i, Pa (same length as tauS). */
  modulusPa: number[];
}

export function pronyStorage(p: PronySeries, omegaRadPerS: number): number {
  let s = p.equilibriumModulusPa;
  for (let i = 0; i < p.tauS.length; i++) {
    const wt = omegaRadPerS * p.tauS[i];
    const wt2 = wt * wt;
    s += (p.modulusPa[i] * wt2) / (1 + wt2);
  }
  return s;
}

export function pronyLoss(p: PronySeries, omegaRadPerS: number): number {
  let s = 0;
  for (let i = 0; i < p.tauS.length; i++) {
    const wt = omegaRadPerS * p.tauS[i];
    s += (p.modulusPa[i] * wt) / (1 + wt * wt);
  }
  return s;
}

export function pronyRelaxation(p: PronySeries, timeS: number): number {
  let s = p.equilibriumModulusPa;
  for (let i = 0; i < p.tauS.length; i++) s += p.modulusPa[i] * Math.exp(-timeS / p.tauS[i]);
  return s;
}

/** Instantaneous (glassy) modulus G0 = Ge + Σ g_i, Pa. */
export function pronyInstantaneous(p: PronySeries): number {
  return p.modulusPa.reduce((a, b) => a + b, p.equilibriumModulusPa);
}
