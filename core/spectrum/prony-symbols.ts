import type { DeformationMode } from '../data/types';

/**
 * Symbols of a Prony series as users write them: G for shear, E for tension (docs/conventions.md §1: keep E
 * and G apart; for an incompressible rubber E ≈ 3G, so a tensile series typed in as shear terms is
 * off by about three).
 */
export interface PronySymbols {
  /** 'shear' or 'tension', as printed next to every set of terms. */
  mode: DeformationMode;
  /** G or E. */
  letter: 'G' | 'E';
  /** G(t) or E(t). */
  relaxation: string;
  /** Ge or Ee: equilibrium (long-time) modulus. */
  equilibrium: string;
  /** G0 or E0: instantaneous modulus, equilibrium plus all terms. */
  instantaneous: string;
  /** g_i or E_i: one term's strength. */
  term: string;
  /** The series in words, e.g. "G(t) = Ge + Σ g_i exp(−t/τ_i)". */
  formula: string;
  /** ASCII form for CSV headers, e.g. "G(t) = Ge + sum g_i exp(-t/tau_i)". */
  formulaAscii: string;
  /** "shear (G)" or "tension (E)". */
  modeLabel: string;
}

export function pronySymbols(mode: DeformationMode): PronySymbols {
  const shear = mode === 'shear';
  const m = shear ? 'G' : 'E';
  const term = shear ? 'g_i' : 'E_i';
  return {
    mode,
    letter: m,
    relaxation: `${m}(t)`,
    equilibrium: `${m}e`,
    instantaneous: `${m}0`,
    term,
    formula: `${m}(t) = ${m}e + Σ ${term} exp(−t/τ_i)`,
    formulaAscii: `${m}(t) = ${m}e + sum ${term} exp(-t/tau_i)`,
    modeLabel: shear ? 'shear (G)' : 'tension (E)',
  };
}
