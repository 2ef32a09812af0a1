/**
 * Shared types of the spectrum module: reduced master-curve data in, Prony series and the
 * quantities users make from it out. SI units: ω in rad/s, t in s, moduli in Pa.
 */
import type { PronySeries } from './prony-model';

/**
 * Reduced master-curve points at the reference temperature. Either dynamic data (`storage`
 * and/or `loss` against reduced angular frequency ω_r = aT·ω, rad/s) or relaxation data
 * (`relaxation` against reduced time t_r = t/aT, s). Shear (G) or tension (E): same maths.
 */
export interface ReducedCurve {
  /** ω_r in rad/s for dynamic data, t_r in s for relaxation data. */
  x: ArrayLike<number>;
  /** G'(ω_r) or E'(ω_r), Pa. */
  storage?: ArrayLike<number>;
  /** G''(ω_r) or E''(ω_r), Pa. */
  loss?: ArrayLike<number>;
  /** G(t_r) or E(t_r), Pa. Not combined with storage/loss. */
  relaxation?: ArrayLike<number>;
}

/** A problem with one input point that was handled, not fatal. `pointIndex` is 0-based. */
export interface SpectrumWarning {
  /** Index into the caller's arrays, or −1 for the whole data set. */
  pointIndex: number;
  message: string;
}

/** The reduced window the data covered; answers outside it are extrapolations. */
export interface ReducedWindow {
  abscissa: 'angularFrequency' | 'time';
  /** Lowest x (rad/s or s). */
  min: number;
  /** Highest x (rad/s or s). */
  max: number;
}

/** The same Prony series normalised for FEA input: g_i/G0 and Ge/G0 with G0 = Ge + Σ g_i. */
export interface NormalisedProny {
  /** G0 = Ge + Σ g_i, Pa (instantaneous, glassy modulus of the series). */
  instantaneousModulusPa: number;
  /** Ge/G0 (dimensionless). */
  equilibriumFraction: number;
  /** τ_i, s. */
  tauS: number[];
  /** g_i/G0 (dimensionless), same order as tauS. */
  fractions: number[];
}

export type { PronySeries };
