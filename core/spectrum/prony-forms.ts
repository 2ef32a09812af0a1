import type { PronySeries } from './prony-model';
import { pronyInstantaneous } from './prony-model';
import type { NormalisedProny } from './types';

/**
 * Normalised form of a Prony series, as FEA programs usually take it: g_i/G0 and Ge/G0 with
 * G0 = Ge + Σ g_i (docs/conventions.md §5). Give it together with G0 and the shift model.
 */
export function normaliseProny(series: PronySeries): NormalisedProny {
  const g0 = pronyInstantaneous(series);
  if (!(g0 > 0)) throw new RangeError('The Prony series has no positive modulus to normalise by');
  return {
    instantaneousModulusPa: g0,
    equilibriumFraction: series.equilibriumModulusPa / g0,
    tauS: [...series.tauS],
    fractions: series.modulusPa.map((g) => g / g0),
  };
}

/** The absolute series back from its normalised form. */
export function denormaliseProny(n: NormalisedProny): PronySeries {
  return {
    equilibriumModulusPa: n.equilibriumFraction * n.instantaneousModulusPa,
    tauS: [...n.tauS],
    modulusPa: n.fractions.map((f) => f * n.instantaneousModulusPa),
  };
}

/** Zero-shear viscosity of a fluid Prony series η0 = Σ g_i τ_i, Pa·s (Ferry 1980, ch. 3). */
export function pronyZeroShearViscosity(series: PronySeries): number {
  return series.modulusPa.reduce((s, g, i) => s + g * series.tauS[i], 0);
}
