/**
 * Step 1 of the pipeline: the shift engine (core/shift) with the resolved options, its result
 * turned into the analysis's curves (with a note on every isotherm that is not plainly shifted).
 */
import { shiftIsotherms } from '../shift';
import type { ShiftOptions, ShiftResult } from '../shift/types';
import type { Dataset } from '../data/types';
import type { ResolvedAnalysisOptions } from './options';
import type { AnalysisCurve } from './types';

export function shiftOptionsFor(s: ResolvedAnalysisOptions): ShiftOptions {
  return {
    referenceK: s.referenceTemperatureK,
    ...(s.shiftQuantities !== 'auto' && { drivers: s.shiftQuantities }),
    vertical: s.verticalShift,
    ...(s.density && {
      density: {
        kind: 'expansion' as const,
        ...(s.density.referenceDensityKgPerM3 !== undefined && {
          referenceDensityKgPerM3: s.density.referenceDensityKgPerM3,
        }),
        volumetricExpansionPerK: s.density.volumetricExpansionPerK,
      },
    }),
    excluded: s.excludedIsothermIds,
    locked: Object.entries(s.lockedLog10aT).map(([id, log10aT]) => ({ id, log10aT })),
  };
}

/**
 * Shifts below 1e-12 decades are rounding noise (the reference isotherm's log10 aT = 0 by
 * definition may come back as 1e-19); `+ 0` also turns −0 into 0, which JSON cannot hold.
 */
export function cleanLog(v: number | null): number | null {
  if (v === null) return null;
  return Math.abs(v) < 1e-12 ? 0 : v + 0;
}

function noteOf(c: ShiftResult['curves'][number]): string | undefined {
  const notes: string[] = [];
  if (c.excluded) notes.push('excluded by the user');
  if (c.leftOut && c.leftOut.code !== 'excluded') notes.push(c.leftOut.message);
  else if (c.overlapsNothing) notes.push('overlaps no other isotherm: no shift can be found');
  if (c.locked) notes.push('shift fixed by hand');
  if (c.outlierPoints.length) notes.push(`${c.outlierPoints.length} outlier point(s) left out`);
  return notes.length ? notes.join('; ') : undefined;
}

export function runShift(
  dataset: Dataset,
  s: ResolvedAnalysisOptions,
  warmStartLog10aT?: Readonly<Record<string, number>>,
  heldExpansion?: ShiftOptions['heldExpansion'],
): { result: ShiftResult; curves: AnalysisCurve[] } {
  const result = shiftIsotherms(dataset, {
    ...shiftOptionsFor(s),
    ...(warmStartLog10aT && { initialLog10aT: { ...warmStartLog10aT } }),
    ...(heldExpansion && { heldExpansion: { ...heldExpansion } }),
  });
  const curves = result.curves.map((c): AnalysisCurve => {
    const note = noteOf(c);
    return {
      isothermId: c.id,
      temperatureK: c.temperatureK,
      log10aT: cleanLog(c.log10aT),
      log10aTStdErr: c.log10aTStdErr,
      log10bT: cleanLog(c.log10bT),
      log10bTStdErr: c.log10bTStdErr,
      included: c.included,
      qualityRmsDecades: c.rmsResidualDecades,
      ...(note && { note }),
      ...(c.leftOut && { leftOut: { ...c.leftOut } }),
    };
  });
  return { result, curves };
}
