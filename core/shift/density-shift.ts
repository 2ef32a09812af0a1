/**
 * Entropic vertical shift from density: bT = Tref·ρref / (T·ρ(T)), reduced modulus = bT × measured
 * (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980; docs/conventions.md §2).
 */
import { densityFromExpansion, entropicBT } from '../data/reduction';
import type { DensityInput } from './types';

export interface DensityShift {
  log10bT: number[];
  /** Temperatures at which the density table had to be extrapolated, K. */
  extrapolatedK: number[];
}

export function densityLog10bT(
  temperaturesK: number[],
  referenceK: number,
  density: DensityInput,
): DensityShift {
  const extrapolatedK: number[] = [];
  const rho = (T: number): number => {
    if (density.kind === 'expansion')
      return densityFromExpansion(
        T,
        referenceK,
        // ρref cancels in bT; 1 stands in when it was not given.
        density.referenceDensityKgPerM3 ?? 1,
        density.volumetricExpansionPerK,
      );
    const pts = [...density.points].sort((a, b) => a.temperatureK - b.temperatureK);
    if (pts.length === 1) {
      if (T !== pts[0].temperatureK) extrapolatedK.push(T);
      return pts[0].densityKgPerM3;
    }
    let i = 0;
    while (i < pts.length - 2 && pts[i + 1].temperatureK < T) i++;
    const [p, q] = [pts[i], pts[i + 1]];
    if (T < pts[0].temperatureK || T > pts[pts.length - 1].temperatureK) extrapolatedK.push(T);
    const t = (T - p.temperatureK) / (q.temperatureK - p.temperatureK);
    return p.densityKgPerM3 + t * (q.densityKgPerM3 - p.densityKgPerM3);
  };
  const rhoRef = rho(referenceK);
  const log10bT = temperaturesK.map((T) => Math.log10(entropicBT(T, referenceK, rho(T), rhoRef)));
  return { log10bT, extrapolatedK };
}
