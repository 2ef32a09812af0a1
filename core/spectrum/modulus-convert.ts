import type { PronySeries } from './prony-model';

/**
 * Shear ↔ tension for an isotropic material with a constant Poisson's ratio ν:
 * E = 2(1 + ν)G (docs/conventions.md §1). ν = 0.5 (incompressible rubber) gives E = 3G. A constant ν is
 * itself an approximation for viscoelastic solids (ν changes from the glass to the rubber).
 */
export function tensileFactor(poissonRatio: number): number {
  if (!(poissonRatio > -1 && poissonRatio <= 0.5)) {
    throw new RangeError(`poissonRatio must lie in (−1, 0.5], got ${poissonRatio}`);
  }
  return 2 * (1 + poissonRatio);
}

/** E-series from a G-series: every modulus × 2(1 + ν). */
export function tensileFromShear(series: PronySeries, poissonRatio: number): PronySeries {
  const f = tensileFactor(poissonRatio);
  return {
    equilibriumModulusPa: series.equilibriumModulusPa * f,
    tauS: [...series.tauS],
    modulusPa: series.modulusPa.map((g) => g * f),
  };
}

/** G-series from an E-series: every modulus ÷ 2(1 + ν). */
export function shearFromTensile(series: PronySeries, poissonRatio: number): PronySeries {
  const f = tensileFactor(poissonRatio);
  return {
    equilibriumModulusPa: series.equilibriumModulusPa / f,
    tauS: [...series.tauS],
    modulusPa: series.modulusPa.map((g) => g / f),
  };
}
