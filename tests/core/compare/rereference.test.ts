/**
 * moveToTemperature() against known truth: a noise-free invented creep set with an entropic bT,
 * measured as J(T, t) = bT · J_ref(t/aT) (reduced compliance = measured / bT, docs/conventions.md
 * §2; Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980, ch. 11), moved from Tref to one of
 * its own temperatures, must give the compliance measured there.
 */
import { describe, expect, it } from 'vitest';
import { moveToTemperature } from '../../../core/compare/rereference';
import { buildMasterCurve } from '../../../core/pipeline';
import { creepCompliance } from '../../../core/spectrum';
import { syntheticCreep } from '../../../core/synthetic';
import { CREEP_WLF } from '../shift/fixtures';

describe('moveToTemperature()', () => {
  it('moveToTemperature() gives creep compliance as measured at T*: bT · J_ref(t*/aT)', () => {
    const density = { referenceDensity: 1100, volumetricExpansionPerK: 2e-3 };
    const { dataset, truth } = syntheticCreep({
      ...CREEP_WLF.options,
      relativeNoise: 0,
      seed: 21,
      density,
    });
    const a = buildMasterCurve(dataset, {
      referenceTemperatureK: 300,
      verticalShift: 'density',
      density: { referenceDensityKgPerM3: 1100, volumetricExpansionPerK: 2e-3 },
    });
    const k = dataset.isotherms.length - 1;
    const target = dataset.isotherms[k];
    const moved = moveToTemperature(a, target.temperatureK, 'wlf', ['creepCompliance']);
    // bT matters here: about 0.011 decades at the warmest isotherm.
    expect(Math.abs(truth.log10bT[k])).toBeGreaterThan(0.01);
    const y = moved.log10y.creepCompliance!;
    let worst = 0;
    moved.log10x.forEach((lx, i) => {
      const t = 10 ** lx;
      const measured =
        10 ** truth.log10bT[k] * creepCompliance(truth.retardation, t / 10 ** truth.log10aT[k]);
      worst = Math.max(worst, Math.abs(y[i] - Math.log10(measured)));
    });
    // The shift factors and the WLF fit are fitted, not exact (about 3e-6 decades here): allow
    // 1e-4 decades, a hundredth of what a missing bT would leave.
    expect(worst).toBeLessThan(1e-4);
  });
});
