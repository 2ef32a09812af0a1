/**
 * The data model every part of Thermoshift shares: a dataset is a set of isotherms measured on one
 * sample. Everything inside is SI: temperatures in kelvin, angular frequency in rad/s, time in s,
 * moduli in Pa, compliances in 1/Pa, viscosities in Pa·s, phase angle in degrees (the one non-SI
 * unit, kept because every instrument and datasheet shows δ in degrees).
 */

/** What kind of test produced the isotherms. */
export type TestKind = 'oscillatory' | 'relaxation' | 'creep';

/** Shear (G, J) or tension/bending (E, D). Kept apart in every label. */
export type DeformationMode = 'shear' | 'tension';

/** The independent variable of an isotherm. */
export type AbscissaKind = 'angularFrequency' | 'time';

/**
 * Measured quantities, named independently of the deformation mode: `storageModulus` is G' in
 * shear and E' in tension. Units (SI): moduli Pa, compliance 1/Pa, viscosity Pa·s, phase angle
 * degrees, tan δ dimensionless.
 */
export type QuantityId =
  | 'storageModulus'
  | 'lossModulus'
  | 'tanDelta'
  | 'phaseAngle'
  | 'complexModulus'
  | 'complexViscosity'
  | 'relaxationModulus'
  | 'creepCompliance';

export const QUANTITY_IDS: readonly QuantityId[] = [
  'storageModulus',
  'lossModulus',
  'tanDelta',
  'phaseAngle',
  'complexModulus',
  'complexViscosity',
  'relaxationModulus',
  'creepCompliance',
];

/** Where one data point came from: file name and 1-based line number in that file. */
export interface PointSource {
  file: string;
  row: number;
}

/** One isotherm: all points measured at (nominally) one temperature. */
export interface Isotherm {
  /** Stable identifier within the dataset, e.g. "T03". */
  id: string;
  /** Mean measured temperature of the group, K. */
  temperatureK: number;
  /** Max − min of the measured temperatures grouped into this isotherm, K (0 for a set point). */
  temperatureSpreadK: number;
  /** The independent variable: angular frequency ω (rad/s) or time t (s), sorted ascending. */
  x: number[];
  /** Measured quantities in SI units, each the same length as `x`; NaN where a value is missing. */
  quantities: Partial<Record<QuantityId, number[]>>;
  /** Per-point mask: true = the point is used; false = masked out by the user or the importer. */
  mask: boolean[];
  /** Per-point provenance (file and row). */
  source: PointSource[];
}

/** A whole sample: isotherms sorted by ascending temperature. */
export interface Dataset {
  /** Sample name shown to users (from metadata or file name). */
  name: string;
  testKind: TestKind;
  deformation: DeformationMode;
  abscissa: AbscissaKind;
  isotherms: Isotherm[];
  /** Files the data came from, in the order given. */
  files: string[];
  /** Free metadata found in the files (`# key: value` lines), last one wins. */
  metadata: Record<string, string>;
}

/** A problem in lab data that was skipped, not fatal. Row and column are 1-based; 0 = not applicable. */
export interface DataWarning {
  file: string;
  row: number;
  column: number;
  message: string;
}
