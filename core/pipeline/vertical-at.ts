/**
 * log10 bT at any temperature, as the analysis defines it: 0 without a vertical shift; the
 * entropic estimate bT = Tref·ρref/(T·ρ(T)) with density (Ferry, Viscoelastic Properties of
 * Polymers, 3rd ed., 1980); with bT estimated from the data, linear interpolation between the
 * included isotherms (the nearest one's value outside them, said in the note).
 */
import { densityFromExpansion, entropicBT } from '../data/reduction';
import type { Analysis } from './types';
import { entropicLog10bT } from '../data/reduction';

/** The vertical-shift mode the analysis applied ('auto' resolved to its choice). */
export function appliedVertical(a: Analysis): 'none' | 'density' | 'data' {
  const requested = a.settings.verticalShift;
  return a.vertical?.chosen ?? (requested === 'auto' ? 'none' : requested);
}

export interface VerticalShiftAt {
  log10bT: number;
  /** How the value was obtained, for the user. */
  note: string;
  /** True when bT was taken from outside the measured temperatures (estimated-from-data mode). */
  extrapolated: boolean;
}

/** Linear interpolation in sorted `xs`; null outside [xs[0], xs[n−1]]. */
export function interpolateSorted(
  xs: readonly number[],
  ys: readonly number[],
  x: number,
): number | null {
  for (let i = 1; i < xs.length; i++) {
    if (x >= xs[i - 1] && x <= xs[i]) {
      const f = xs[i] === xs[i - 1] ? 0 : (x - xs[i - 1]) / (xs[i] - xs[i - 1]);
      return ys[i - 1] + f * (ys[i] - ys[i - 1]);
    }
  }
  return xs.length === 1 && x === xs[0] ? ys[0] : null;
}

export function log10bTAt(a: Analysis, temperatureK: number): VerticalShiftAt {
  const s = a.settings;
  const mode = appliedVertical(a);
  if (mode === 'none')
    return { log10bT: 0, note: 'no vertical shift (bT = 1)', extrapolated: false };
  if (mode === 'data' && a.vertical?.expansionPerK != null)
    return {
      log10bT: entropicLog10bT(temperatureK, s.referenceTemperatureK, a.vertical.expansionPerK),
      note: 'bT from the entropic law with αV fitted to the moduli',
      extrapolated: false,
    };
  if (mode === 'density' && s.density) {
    const { volumetricExpansionPerK: alpha } = s.density;
    // ρref cancels in bT (1 stands in when it was not given).
    const rhoRef = s.density.referenceDensityKgPerM3 ?? 1;
    const rho = densityFromExpansion(temperatureK, s.referenceTemperatureK, rhoRef, alpha);
    const bT = entropicBT(temperatureK, s.referenceTemperatureK, rho, rhoRef);
    return {
      log10bT: Math.log10(bT),
      note: 'bT from density, Tref·ρref/(T·ρ)',
      extrapolated: false,
    };
  }
  const pts = a.curves
    .filter((c) => c.included && c.log10bT !== null)
    .sort((p, q) => p.temperatureK - q.temperatureK);
  const v = interpolateSorted(
    pts.map((c) => c.temperatureK),
    pts.map((c) => c.log10bT as number),
    temperatureK,
  );
  if (v !== null)
    return {
      log10bT: v,
      note: 'bT interpolated between the measured isotherms',
      extrapolated: false,
    };
  const nearest = pts.length
    ? pts.reduce((b, c) =>
        Math.abs(c.temperatureK - temperatureK) < Math.abs(b.temperatureK - temperatureK) ? c : b,
      )
    : null;
  return {
    log10bT: nearest?.log10bT ?? 0,
    note: 'bT outside the measured temperatures: the nearest isotherm’s value is used (extrapolation)',
    extrapolated: true,
  };
}
