/**
 * resolveShiftOptions(): the one place where defaults are applied and wrong calls are caught
 * (mljs checkOptions pattern). Throws ShiftOptionsError naming the option and what was expected.
 */
import type { Dataset, QuantityId } from '../data/types';
import { QUANTITY_IDS } from '../data/types';
import { defaultDrivers } from './drivers';
import type { ResolvedShiftOptions, ShiftOptions } from './types';

export class ShiftOptionsError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ShiftOptionsError';
  }
}

function positive(name: string, v: number): number {
  if (!(Number.isFinite(v) && v > 0))
    throw new ShiftOptionsError(`The ${name} option must be a positive number (got ${v}).`);
  return v;
}

export function resolveShiftOptions(dataset: Dataset, o: ShiftOptions): ResolvedShiftOptions {
  if (!o || !(Number.isFinite(o.referenceK) && o.referenceK > 0))
    throw new ShiftOptionsError(
      `The referenceK option must be a temperature in kelvin above 0 (got ${o?.referenceK}).`,
    );
  const vertical = o.vertical ?? 'auto';
  if (!['auto', 'none', 'density', 'data'].includes(vertical))
    throw new ShiftOptionsError(
      `The vertical option must be 'auto', 'none', 'density' or 'data' (got ${vertical}).`,
    );
  if (vertical === 'density' && !o.density)
    throw new ShiftOptionsError(
      "The density option is required when vertical is 'density' (a density table or ρref with an expansion coefficient).",
    );
  if (o.density?.kind === 'expansion') {
    if (o.density.referenceDensityKgPerM3 !== undefined)
      positive('density.referenceDensityKgPerM3', o.density.referenceDensityKgPerM3);
    if (!Number.isFinite(o.density.volumetricExpansionPerK))
      throw new ShiftOptionsError(
        'The density.volumetricExpansionPerK option must be a number (1/K).',
      );
  }
  if (o.density?.kind === 'table') {
    if (!Array.isArray(o.density.points) || o.density.points.length === 0)
      throw new ShiftOptionsError(
        'The density.points option must list at least one temperature and density.',
      );
    o.density.points.forEach((pt, i) => {
      positive(`density.points[${i}].temperatureK`, pt.temperatureK);
      positive(`density.points[${i}].densityKgPerM3`, pt.densityKgPerM3);
    });
  }
  const drivers: QuantityId[] = o.drivers ?? defaultDrivers(dataset, vertical);
  for (const q of drivers)
    if (!QUANTITY_IDS.includes(q))
      throw new ShiftOptionsError(`The drivers option holds an unknown quantity '${q}'.`);
  if (o.drivers && o.drivers.length === 0)
    throw new ShiftOptionsError('The drivers option must name at least one quantity.');
  const robustLoss = o.robustLoss ?? 'huber';
  if (!['none', 'huber', 'cauchy'].includes(robustLoss))
    throw new ShiftOptionsError(
      `The robustLoss option must be 'none', 'huber' or 'cauchy' (got ${robustLoss}).`,
    );
  const locked = o.locked ?? [];
  locked.forEach((l, i) => {
    if (typeof l.id !== 'string' || !Number.isFinite(l.log10aT))
      throw new ShiftOptionsError(
        `The locked[${i}] option must be { id: string, log10aT: number }.`,
      );
  });
  if (
    o.heldExpansion !== undefined &&
    !(
      (o.heldExpansion.expansionPerK === null || Number.isFinite(o.heldExpansion.expansionPerK)) &&
      (o.heldExpansion.expansionStdErr === null || Number.isFinite(o.heldExpansion.expansionStdErr))
    )
  )
    throw new ShiftOptionsError(
      'The heldExpansion option must be { expansionPerK: number | null, expansionStdErr: number | null } (1/K).',
    );
  const minOverlapPoints = o.minOverlapPoints ?? 4;
  if (!(Number.isInteger(minOverlapPoints) && minOverlapPoints >= 2))
    throw new ShiftOptionsError(
      `The minOverlapPoints option must be an integer ≥ 2 (got ${minOverlapPoints}).`,
    );
  return {
    referenceK: o.referenceK,
    drivers,
    vertical,
    density: o.density ?? null,
    excluded: [...(o.excluded ?? [])],
    locked: locked.map((l) => ({ ...l })),
    initialLog10aT: o.initialLog10aT ? { ...o.initialLog10aT } : null,
    heldExpansion: o.heldExpansion ? { ...o.heldExpansion } : null,
    robustLoss,
    robustScaleDecades:
      o.robustScaleDecades === undefined
        ? null
        : positive('robustScaleDecades', o.robustScaleDecades),
    outlierThreshold: positive('outlierThreshold', o.outlierThreshold ?? 4),
    flagOutliers: o.flagOutliers ?? true,
    minOverlapPoints,
    maxPointsPerDecade: positive('maxPointsPerDecade', o.maxPointsPerDecade ?? 40),
    reverseAllowanceDecades: Math.max(0, o.reverseAllowanceDecades ?? 0.5),
    scanStepDecades: positive('scanStepDecades', o.scanStepDecades ?? 0.05),
    maxIterations: Math.round(positive('maxIterations', o.maxIterations ?? 60)),
    toleranceDecades: positive('toleranceDecades', o.toleranceDecades ?? 0.001),
    checks: o.checks ?? true,
  };
}
