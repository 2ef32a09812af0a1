/**
 * Prony spectra shaped like real materials, for synthetic data and the invented demo samples.
 *
 * Both shapes set mode strengths from a continuous relaxation spectrum H(τ) sampled on a log grid:
 * g_i = H(τ_i)·Δln τ (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980, ch. 3). The
 * Prony series built this way is the exact truth of the synthetic data; the continuous shapes
 * only make it look realistic.
 */
import type { PronySeries } from '../spectrum/prony-model';

function logGridByDecade(minS: number, maxS: number, perDecade: number): number[] {
  const decades = Math.log10(maxS / minS);
  const n = Math.max(2, Math.round(decades * perDecade) + 1);
  return Array.from({ length: n }, (_, i) => minS * 10 ** ((i * decades) / (n - 1)));
}

function requirePositive(value: number, name: string): void {
  if (!(value > 0) || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a positive finite number, got ${value}`);
  }
}

/** Options of {@link meltProny}. */
export interface MeltPronyOptions {
  /** Sum of all mode strengths (the high-frequency plateau of G'), Pa. */
  plateauModulusPa: number;
  /** Relaxation time at the peak of the log-normal spectrum, s. */
  peakTauS: number;
  /** Standard deviation of the log-normal spectrum, decades of τ. */
  widthDecades: number;
  /** Modes per decade of τ. @default 2 */
  modesPerDecade?: number;
  /** How far the modes reach on each side of the peak, in widths. @default 3 */
  reachWidths?: number;
}

/** Checks {@link MeltPronyOptions} and fills in the defaults, naming any bad field. */
export function resolveMeltPronyOptions(o: MeltPronyOptions): Required<MeltPronyOptions> {
  const r = { ...o, modesPerDecade: o.modesPerDecade ?? 2, reachWidths: o.reachWidths ?? 3 };
  for (const key of Object.keys(r) as (keyof MeltPronyOptions)[]) requirePositive(r[key], key);
  return r;
}

/**
 * A melt: Ge = 0 and a log-normal relaxation spectrum, so G' ∝ ω² and G'' ∝ ω in the terminal
 * zone below 1/τ_max and a rubbery-like plateau at high ω. Zero-shear viscosity η0 = Σ g_i τ_i.
 */
export function meltProny(options: MeltPronyOptions): PronySeries {
  const o = resolveMeltPronyOptions(options);
  const reach = o.reachWidths * o.widthDecades;
  const perDecade = o.modesPerDecade;
  const taus = logGridByDecade(o.peakTauS * 10 ** -reach, o.peakTauS * 10 ** reach, perDecade);
  const weights = taus.map((t) => {
    const z = Math.log10(t / o.peakTauS) / o.widthDecades;
    return Math.exp(-0.5 * z * z);
  });
  const sum = weights.reduce((a, b) => a + b, 0);
  return {
    equilibriumModulusPa: 0,
    tauS: taus,
    modulusPa: weights.map((w) => (w / sum) * o.plateauModulusPa),
  };
}

/** Options of {@link transitionProny}. */
export interface TransitionPronyOptions {
  /** Short-time (glassy) modulus Ge + Σ g_i, Pa. About 1–3 GPa in tension, 0.3–1 GPa in shear. */
  glassyModulusPa: number;
  /** Long-time (rubbery, equilibrium) modulus Ge, Pa. About 1–10 MPa in tension for a rubber. */
  rubberyModulusPa: number;
  /** Time at the middle of the transition (log-midpoint of the modulus), s. */
  centreTauS: number;
  /** Logistic width of the transition in log10 t, decades; it spans about ±4 widths. */
  widthDecades: number;
  /** Modes per decade of τ. @default 2 */
  modesPerDecade?: number;
  /** How far the modes reach on each side of the centre, in widths. @default 6 */
  reachWidths?: number;
}

/** Checks {@link TransitionPronyOptions} and fills in the defaults, naming any bad field. */
export function resolveTransitionPronyOptions(
  o: TransitionPronyOptions,
): Required<TransitionPronyOptions> {
  const r = { ...o, modesPerDecade: o.modesPerDecade ?? 2, reachWidths: o.reachWidths ?? 6 };
  for (const key of Object.keys(r) as (keyof TransitionPronyOptions)[]) {
    requirePositive(r[key], key);
  }
  if (r.glassyModulusPa <= r.rubberyModulusPa) {
    throw new RangeError('glassyModulusPa must be larger than rubberyModulusPa');
  }
  return r;
}

/**
 * A glass–rubber transition: log10 E(t) falls along a logistic curve in log10 t from the glassy to
 * the rubbery plateau. Strengths use the first-order (Alfrey) estimate H(τ) ≈ −dE/dln t at t = τ
 * (Ferry 1980, ch. 4), then are scaled so that Ge + Σ g_i is exactly the glassy modulus.
 */
export function transitionProny(options: TransitionPronyOptions): PronySeries {
  const o = resolveTransitionPronyOptions(options);
  const perDecade = o.modesPerDecade;
  const reach = o.reachWidths * o.widthDecades;
  const drop = Math.log10(o.glassyModulusPa / o.rubberyModulusPa);
  const taus = logGridByDecade(o.centreTauS * 10 ** -reach, o.centreTauS * 10 ** reach, perDecade);
  const raw = taus.map((t) => {
    const x = Math.log10(t / o.centreTauS) / o.widthDecades;
    const e = Math.exp(x);
    const log10E = Math.log10(o.rubberyModulusPa) + drop / (1 + e);
    // −dE/d ln t = E · drop · eˣ / (1 + eˣ)² / width  (chain rule through log10)
    return (10 ** log10E * drop * e) / ((1 + e) * (1 + e) * o.widthDecades);
  });
  const sum = raw.reduce((a, b) => a + b, 0);
  const total = o.glassyModulusPa - o.rubberyModulusPa;
  return {
    equilibriumModulusPa: o.rubberyModulusPa,
    tauS: taus,
    modulusPa: raw.map((r) => (r / sum) * total),
  };
}

/** Sum of Prony series (modes side by side, equilibrium moduli added), sorted by τ. */
export function combineProny(...parts: PronySeries[]): PronySeries {
  const modes = parts
    .flatMap((p) => p.tauS.map((tauS, i) => ({ tauS, modulusPa: p.modulusPa[i] })))
    .sort((a, b) => a.tauS - b.tauS);
  return {
    equilibriumModulusPa: parts.reduce((a, p) => a + p.equilibriumModulusPa, 0),
    tauS: modes.map((m) => m.tauS),
    modulusPa: modes.map((m) => m.modulusPa),
  };
}
