/**
 * Types of the invented demo scenarios: the definition (what the generator is told), the
 * measurements it makes from it, and the files it writes. Everything here is invented data.
 */
import type { DeformationMode, PointSource } from '../data/types';
import type { PronySeries } from '../spectrum/prony-model';
import type { ShiftLaw } from './isotherm-set';

/** File layouts the demo samples use (the importer's layouts a, b, c, plus a ramp table). */
export type DemoLayout = 'long' | 'per-isotherm' | 'wide' | 'ramp';

/** Unit of the independent variable as written in the files. */
export type DemoXUnit = 'rad/s' | 'Hz' | 's';

/** Unit of the moduli as written in the files. */
export type DemoModulusUnit = 'Pa' | 'kPa' | 'MPa';

/** One invented scenario: material, true model, test plan and noise. */
export interface DemoScenario {
  /** Folder name under samples/, e.g. "melt-long". */
  id: string;
  /** Invented firm. */
  firm: string;
  /** Invented product. */
  product: string;
  /** One-paragraph description for the folder README. */
  description: string;
  layout: DemoLayout;
  testKind: 'oscillatory' | 'relaxation';
  deformation: DeformationMode;
  /** Reference temperature of the true model, K. */
  referenceK: number;
  /** True master curve at the reference temperature (moduli in Pa, τ in s). */
  prony: PronySeries;
  /** True horizontal shift law, referred to `referenceK`. */
  law: ShiftLaw;
  /** Entropic vertical shift from density (bT = Tref·ρref/(T·ρ)); null: bT = 1. */
  density: { referenceDensityKgPerM3: number; volumetricExpansionPerK: number } | null;
  /** Oven set points, °C, ascending. */
  setPointsC: number[];
  /** Independent variable as written in the files (unit `xUnit`), in measuring order. */
  xValues: number[];
  xUnit: DemoXUnit;
  modulusUnit: DemoModulusUnit;
  /**
   * How the measured temperature behaves: 'set' = exactly the set point; 'wander' = an AR(1)
   * walk within ±amplitudeK; 'ramp' = creeps up by stepK per point while heating, plus
   * normal jitter of `jitterK` standard deviation.
   */
  temperature:
    | { kind: 'set' }
    | { kind: 'wander'; amplitudeK: number }
    | { kind: 'ramp'; stepK: number; jitterK: number };
  /** Multiplicative log-normal noise on every measured modulus, relative SD (0.02 = 2 %). */
  relativeNoise: number;
  /**
   * Torque floor of the instrument, expressed as a modulus: every storage and loss modulus gets
   * additive normal noise of SD `floorPa` on top of the relative noise, so small values (low
   * frequency, high temperature) become noisy as at low torque. null: no floor.
   */
  lowTorque: { floorPa: number } | null;
  /** Seed of the pseudo-random generator (mulberry32). */
  seed: number;
}

/** One measured point in SI units, in measuring order. */
export interface DemoPoint {
  /** Measured temperature as written in the file, °C (already rounded). */
  temperatureC: number;
  /** Independent variable as written in the file, in the scenario's `xUnit` (already rounded). */
  xFile: number;
  /** Independent variable in SI: ω in rad/s or t in s. */
  xSI: number;
  /** Storage modulus (oscillatory) or relaxation modulus (relaxation), Pa, with noise. */
  primaryPa: number;
  /** Loss modulus, Pa, with noise (oscillatory only; NaN otherwise). */
  lossPa: number;
  /** True when the torque floor is at least 10 % of the true storage modulus here. */
  lowTorque: boolean;
}

/** The measurements of one scenario: one list of points per set point. */
export interface DemoMeasurements {
  scenario: DemoScenario;
  isotherms: { setPointC: number; points: DemoPoint[] }[];
}

/** A text file of a demo sample, path relative to the scenario folder. */
export interface DemoFile {
  path: string;
  content: string;
}

/** What a layout writer returns: the data files and where every point went (file, 1-based line). */
export interface DemoWritten {
  files: DemoFile[];
  /** sources[isotherm][point], points in measuring order. */
  sources: PointSource[][];
}
