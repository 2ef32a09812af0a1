/**
 * The automatic reference temperature is always an isotherm that stays in the fit (invented,
 * seeded melt): when the one nearest the middle overlaps nothing, another is chosen, and the
 * shifts come out as they would with that Tref given.
 */
import { describe, expect, it } from 'vitest';
import { buildMasterCurve } from '../../../core/pipeline';
import { syntheticIsotherms } from '../../../core/synthetic';
import { MELT_ARRHENIUS } from '../shift/fixtures';
import { expectAbsClose } from '../../helpers/assert-close';

describe('buildMasterCurve() automatic Tref', () => {
  it('buildMasterCurve() re-chooses an automatic Tref that was left out as no-overlap', () => {
    const { dataset } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0.02,
      seed: 4,
    });
    const first = buildMasterCurve(dataset, {});
    const middle = dataset.isotherms.find(
      (i) => Math.abs(i.temperatureK - first.referenceTemperatureK) < 0.01,
    )!;
    // Moduli 10⁴ times higher: values no other isotherm reaches, so it overlaps nothing.
    for (const q of ['storageModulus', 'lossModulus'] as const)
      middle.quantities[q] = middle.quantities[q]!.map((v) => v * 1e4);
    const a = buildMasterCurve(dataset, {});
    expect(a.settings.referenceTemperatureAuto).toBe(true);
    const ref = a.curves.find((c) => Math.abs(c.temperatureK - a.referenceTemperatureK) < 0.01)!;
    expect(ref.included).toBe(true);
    expect(ref.log10aT).toBe(0);
    const left = a.curves.find((c) => c.isothermId === middle.id)!;
    expect(left.included).toBe(false);
    expect(left.leftOut?.code).toBe('no-overlap');
    // The same as giving that Tref by hand.
    const given = buildMasterCurve(dataset, { referenceTemperatureK: a.referenceTemperatureK });
    a.curves.forEach((c, k) => {
      if (c.included) expectAbsClose(c.log10aT!, given.curves[k].log10aT!, 1e-9, c.isothermId);
    });
  });
});
