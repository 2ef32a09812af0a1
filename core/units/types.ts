/**
 * What a unit measures. `angle` is converted to degrees (the data model keeps the phase angle in
 * degrees, as instruments show it); every other dimension is converted to its SI unit.
 */
export type UnitDimension =
  | 'temperature'
  | 'frequency'
  | 'time'
  | 'modulus'
  | 'viscosity'
  | 'compliance'
  | 'angle'
  | 'dimensionless';

/**
 * A recognised unit and its linear conversion to the unit Thermoshift stores:
 * `stored = value × factor + offset` (offset is non-zero only for °C and °F).
 */
export interface UnitConversion {
  /** The unit as Thermoshift writes it, e.g. "°C", "MPa", "rad/s". */
  unit: string;
  dimension: UnitDimension;
  /** The unit values are converted to: K, rad/s, s, Pa, Pa·s, 1/Pa, ° or "" (dimensionless). */
  siUnit: string;
  factor: number;
  offset: number;
}
