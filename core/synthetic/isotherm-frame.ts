/**
 * The parts every synthetic isotherm set shares, whatever it measures: the entropic vertical shift
 * from an optional density model, the seeded per-point noise level (with optional disturbed
 * points), and the isotherm record with its invented file rows. Used by syntheticIsotherms and
 * syntheticCreep so both generate the same way (and regenerate the same numbers from a seed).
 */
import type { Isotherm, QuantityId } from '../data/types';
import { densityFromExpansion, entropicBT } from '../data/reduction';

/** Density model for an entropic vertical shift. */
export interface SyntheticDensity {
  referenceDensity: number;
  volumetricExpansionPerK: number;
}

/** Disturbed points: the first `count` points of each listed isotherm get `relativeNoise`. */
export interface SyntheticOutliers {
  isothermIndices: number[];
  count: number;
  relativeNoise: number;
}

/** Options every synthetic set takes, whatever it measures. */
export interface SyntheticSetOptions {
  /** Reference temperature of the true model, K. */
  referenceK: number;
  temperaturesK: number[];
  /** Multiplicative noise, relative standard deviation (0.02 = 2 %). */
  relativeNoise: number;
  /**
   * Optional disturbed points: the first `count` points of each listed isotherm (the lowest ω, as
   * at low torque, or the earliest t) get `relativeNoise`.
   */
  outliers?: SyntheticOutliers;
  /** Optional density model for an entropic vertical shift. */
  density?: SyntheticDensity;
  seed: number;
  name?: string;
}

/** bT at `temperatureK` (docs/conventions.md §2, entropic: Tref·ρref/(T·ρ)); 1 without a density model. */
export function syntheticBT(
  temperatureK: number,
  referenceK: number,
  density: SyntheticDensity | undefined,
): number {
  if (!density) return 1;
  const rho = densityFromExpansion(
    temperatureK,
    referenceK,
    density.referenceDensity,
    density.volumetricExpansionPerK,
  );
  return entropicBT(temperatureK, referenceK, rho, density.referenceDensity);
}

/** Relative noise of point `i` of isotherm `k`: the outlier level on disturbed points. */
export function pointNoise(
  relativeNoise: number,
  outliers: SyntheticOutliers | undefined,
  k: number,
  i: number,
): number {
  const disturbed = outliers !== undefined && outliers.isothermIndices.includes(k);
  return disturbed && i < outliers.count ? outliers.relativeNoise : relativeNoise;
}

/**
 * Isotherm `k` (id T01, T02, …) of a set whose isotherms all share the grid `xs`, written one
 * point a row after a header row: point i of isotherm k sits on row 2 + k·xs.length + i.
 */
export function syntheticIsotherm(
  k: number,
  temperatureK: number,
  xs: number[],
  quantities: Partial<Record<QuantityId, number[]>>,
  file: string,
): Isotherm {
  const firstRow = 2 + k * xs.length;
  return {
    id: `T${String(k + 1).padStart(2, '0')}`,
    temperatureK,
    temperatureSpreadK: 0,
    x: [...xs],
    quantities,
    mask: xs.map(() => true),
    source: xs.map((_, i) => ({ file, row: firstRow + i })),
  };
}
