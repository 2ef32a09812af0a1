/**
 * Display units: the modulus unit (Pa, kPa, MPa, GPa; compliance and viscosity follow as 1/unit
 * and unit·s) and the frequency unit (rad/s or Hz, f = ω/2π) the app shows and exports in.
 * Inside, everything stays SI; conversion happens only here, on the way to the screen or a file.
 * The default follows the units the data came in.
 */
import type { AbscissaKind } from '@core/data';
import type { ImportResult } from '@core/io';
import {
  FREQUENCY_UNITS,
  MODULUS_UNITS,
  SI_DISPLAY,
  modulusFactor,
  outputFrequencyFactor,
  toOutputFrequency,
  type DisplayUnits,
  type FrequencyUnit,
  type ModulusUnit,
} from '@core/units';

// The units themselves are core's (core/units/output-units.ts), saved with every analysis.
export { FREQUENCY_UNITS, MODULUS_UNITS, SI_DISPLAY, type DisplayUnits, type FrequencyUnit };
export type { ModulusUnit };

/** The units the imported files used: the first modulus column's unit, Hz if f was given. */
export function unitsFromImport(r: Pick<ImportResult, 'files'>): DisplayUnits {
  const cols = r.files.flatMap((f) => f.columns);
  const mod = cols.find(
    (c) => c.siUnit === 'Pa' && (MODULUS_UNITS as readonly string[]).includes(c.unit),
  );
  const freq = cols.some((c) => c.role === 'frequency');
  return { modulus: (mod?.unit as ModulusUnit) ?? 'Pa', frequency: freq ? 'Hz' : 'rad/s' };
}

/** A value in an SI unit ("Pa", "Pa·s", "1/Pa", "rad/s", anything else unchanged) for display. */
export function toDisplay(
  value: number,
  siUnit: string,
  u: DisplayUnits,
): { value: number; unit: string } {
  const f = modulusFactor(u.modulus);
  switch (siUnit) {
    case 'Pa':
      return { value: value / f, unit: u.modulus };
    case 'Pa·s':
      return { value: value / f, unit: `${u.modulus}·s` };
    case '1/Pa':
      return { value: value * f, unit: `1/${u.modulus}` };
    case 'rad/s':
      return u.frequency === 'Hz'
        ? { value: toOutputFrequency(value, 'Hz'), unit: 'Hz' }
        : { value, unit: 'rad/s' };
    default:
      return { value, unit: siUnit };
  }
}

/** Factor from the stored abscissa (ω in rad/s, t in s) to the displayed one. */
export function abscissaFactor(kind: AbscissaKind, u: DisplayUnits): number {
  return kind === 'angularFrequency' ? outputFrequencyFactor(u.frequency) : 1;
}
