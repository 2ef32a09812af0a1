import { GAS_CONSTANT_J_PER_MOL_K } from './shift-laws';

/**
 * Apparent activation energy of a WLF law at temperature T, kJ/mol:
 * Ea(T) = ln10·R·C1·C2·T²/(C2 + T − Tr)² (from d ln aT / d(1/T); docs/conventions.md §3). T in kelvin.
 */
export function wlfApparentActivationEnergyKJPerMol(
  temperatureK: number,
  c1: number,
  c2K: number,
  referenceK: number,
): number {
  const d = c2K + temperatureK - referenceK;
  return (
    (Math.LN10 * GAS_CONSTANT_J_PER_MOL_K * c1 * c2K * temperatureK * temperatureK) / (d * d) / 1000
  );
}

/**
 * Free-volume reading of the WLF constants (Ferry, Viscoelastic Properties of Polymers, 3rd ed.,
 * 1980, ch. 11): fractional free volume at the reference temperature f_r = B/(ln10·C1) and its
 * thermal expansion coefficient α_f = f_r/C2, with the Doolittle constant B taken as 1.
 */
export function wlfFreeVolume(
  c1: number,
  c2K: number,
  doolittleB = 1,
): { fractionalFreeVolume: number; expansionPerK: number } {
  if (!(c1 > 0) || !(c2K > 0))
    throw new RangeError('C1 and C2 must be positive for a free-volume reading');
  const f = doolittleB / (Math.LN10 * c1);
  return { fractionalFreeVolume: f, expansionPerK: f / c2K };
}
