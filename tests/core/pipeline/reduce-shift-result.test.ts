/**
 * reduceToMasterCurve() fed straight from a shift result: the tests of the former
 * core/shift/master-curve.ts (a second master-curve builder, removed), on the one kept builder.
 */
import { describe, expect, it } from 'vitest';
import type { Dataset, QuantityId } from '../../../core/data/types';
import { reduceToMasterCurve } from '../../../core/pipeline/reduce';
import { shiftIsotherms } from '../../../core/shift';
import type { ShiftResult } from '../../../core/shift';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../../../core/spectrum/prony-model';
import { syntheticIsotherms } from '../../../core/synthetic';
import { analysisCurvesOf } from '../../helpers/analysis-curves';
import { expectRelClose } from '../../helpers/assert-close';
import { MELT, MELT_ARRHENIUS, RELAX_WLF, RELAXING } from '../shift/fixtures';

/** The master curve of a shift result, as one record per point. */
function masterCurve(dataset: Dataset, result: ShiftResult) {
  const curves = analysisCurvesOf(result);
  const outliers = Object.fromEntries(result.curves.map((c) => [c.id, c.outlierPoints]));
  const mc = reduceToMasterCurve(dataset, curves, outliers);
  return mc.reducedX.map((reducedX, i) => ({
    reducedX,
    isothermId: mc.isothermId[i],
    outlier: mc.outlier[i],
    values: Object.fromEntries(
      Object.entries(mc.quantities).map(([q, v]) => [q, v![i] ?? undefined]),
    ) as Partial<Record<QuantityId, number>>,
  }));
}

describe('reduceToMasterCurve() from a shift result', () => {
  it('reduceToMasterCurve() of noise-free isotherms lies on the reference curve G(ω_r) (ω_r = aT·ω, × bT)', () => {
    const { dataset } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0,
      seed: 1,
      density: { referenceDensity: 900, volumetricExpansionPerK: 6e-4 },
    });
    const result = shiftIsotherms(dataset, {
      referenceK: 463.15,
      toleranceDecades: 1e-6, // noise-free: converge fully
      vertical: 'density',
      density: { kind: 'expansion', referenceDensityKgPerM3: 900, volumetricExpansionPerK: 6e-4 },
    });
    const pts = masterCurve(dataset, result);
    expect(pts.length).toBe(dataset.isotherms.reduce((a, i) => a + i.x.length, 0));
    for (let i = 1; i < pts.length; i++)
      expect(pts[i].reducedX).toBeGreaterThanOrEqual(pts[i - 1].reducedX);
    for (const p of pts) {
      // Shifts are fitted: linear interpolation between points 0.2 decades apart and the stopping
      // tolerance leave errors up to about 0.001 decades; allow 0.5 % (0.001 decades on the
      // terminal slope 2 of G').
      expectRelClose(p.values.storageModulus!, pronyStorage(MELT, p.reducedX), 5e-3, "G'");
      expectRelClose(p.values.lossModulus!, pronyLoss(MELT, p.reducedX), 5e-3, "G''");
      expectRelClose(
        p.values.tanDelta!,
        pronyLoss(MELT, p.reducedX) / pronyStorage(MELT, p.reducedX),
        5e-3,
        'tan δ',
      );
    }
  });

  it('reduceToMasterCurve() reduces time as t/aT for relaxation data', () => {
    const { dataset } = syntheticIsotherms({ ...RELAX_WLF.options, relativeNoise: 0, seed: 1 });
    const result = shiftIsotherms(dataset, { referenceK: 300, toleranceDecades: 1e-6 });
    for (const p of masterCurve(dataset, result))
      expectRelClose(
        p.values.relaxationModulus!,
        pronyRelaxation(RELAXING, p.reducedX),
        5e-3,
        'G(t_r)',
      );
  });

  it('reduceToMasterCurve() leaves out excluded isotherms and masked points, and keeps outlier flags', () => {
    const { dataset } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0.02,
      seed: 2,
    });
    dataset.isotherms[0].mask[3] = false;
    const result = shiftIsotherms(dataset, { referenceK: 463.15, excluded: ['T10'] });
    const pts = masterCurve(dataset, result);
    expect(pts.some((p) => p.isothermId === 'T10')).toBe(false);
    // The removed builder kept a masked point with used = false; this one leaves it out.
    expect(pts.filter((p) => p.isothermId === 'T01').length).toBe(
      dataset.isotherms[0].x.length - 1,
    );
    const flagged = result.curves.flatMap((c) => c.outlierPoints.map(() => c.id));
    expect(
      pts
        .filter((p) => p.outlier)
        .map((p) => p.isothermId)
        .sort(),
    ).toEqual(flagged.filter((f) => f !== 'T10').sort());
  });

  it('reduceToMasterCurve() of a result with nothing included is empty', () => {
    const { dataset } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      temperaturesK: [480],
      relativeNoise: 0,
      seed: 1,
    });
    expect(masterCurve(dataset, shiftIsotherms(dataset, { referenceK: 463.15 }))).toEqual([]);
  });
});
