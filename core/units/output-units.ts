/**
 * Units for moduli in exports and reports. Inside Thermoshift everything is SI (Pa); users may
 * want MPa in a datasheet. Compliance follows as the inverse unit, viscosity as unit·s.
 */
import type { QuantityId } from '../data/types';
import { quantityUnit } from '../data/quantities';

export type ModulusUnit = 'Pa' | 'kPa' | 'MPa' | 'GPa';
export const MODULUS_UNITS: readonly ModulusUnit[] = ['Pa', 'kPa', 'MPa', 'GPa'];

const FACTOR: Record<ModulusUnit, number> = { Pa: 1, kPa: 1e3, MPa: 1e6, GPa: 1e9 };

/** The frequency units shown and exported (FrequencyUnit below); the data stay in rad/s. */
export const FREQUENCY_UNITS: readonly FrequencyUnit[] = ['rad/s', 'Hz'];

/** The units an analysis is shown and exported in (saved with it). */
export interface DisplayUnits {
  modulus: ModulusUnit;
  frequency: FrequencyUnit;
}

/** What the app showed before display units existed (and shows for SI data). */
export const SI_DISPLAY: DisplayUnits = { modulus: 'Pa', frequency: 'rad/s' };

/** Pascals per unit: value_in_unit = value_Pa / modulusFactor(unit). */
export function modulusFactor(unit: ModulusUnit): number {
  return FACTOR[unit];
}

/** Converts an SI value of quantity `q` to the chosen output unit. */
export function toOutputUnit(q: QuantityId, valueSi: number, unit: ModulusUnit): number {
  const f = FACTOR[unit];
  switch (quantityUnit(q)) {
    case 'Pa':
    case 'Pa·s':
      return valueSi / f;
    case '1/Pa':
      return valueSi * f;
    default:
      return valueSi;
  }
}

/** The label of quantity `q`'s unit in the output unit system ('' for dimensionless). */
export function outputUnitLabel(q: QuantityId, unit: ModulusUnit): string {
  switch (quantityUnit(q)) {
    case 'Pa':
      return unit;
    case 'Pa·s':
      return `${unit}·s`;
    case '1/Pa':
      return `1/${unit}`;
    default:
      return quantityUnit(q);
  }
}

/**
 * Unit of frequencies in exports and reports: angular frequency ω in rad/s (the SI value), or
 * ordinary frequency f = ω/2π in Hz (SI Brochure, BIPM 2019, §2.3.4: 1 Hz = 1 s⁻¹ for cycles).
 */
export type FrequencyUnit = 'rad/s' | 'Hz';

/** Radians per second to the chosen frequency unit: f = ω/(2π) for Hz, ω itself for rad/s. */
export function toOutputFrequency(omegaRadPerS: number, unit: FrequencyUnit): number {
  return unit === 'Hz' ? omegaRadPerS / (2 * Math.PI) : omegaRadPerS;
}

/** Factor from rad/s to the chosen frequency unit: 1/(2π) for Hz, 1 for rad/s. */
export function outputFrequencyFactor(unit: FrequencyUnit): number {
  return unit === 'Hz' ? 1 / (2 * Math.PI) : 1;
}
