/**
 * αV of the entropic bT fitted to the moduli (core/shift/expansion-profile.ts). The entropic law
 * bT = Tref(1 + αV(T − Tref))/T is Ferry's (Viscoelastic Properties of Polymers, 3rd ed., 1980);
 * αV = 6·10⁻⁴ /K is a typical melt value (common practice). All data are invented and seeded
 * (core/synthetic): the true αV is the generator's, an analytic truth.
 */
import { describe, expect, it } from 'vitest';
import { shiftIsotherms } from '../../../core/shift';
import { syntheticIsotherms } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';
import { MELT_ARRHENIUS, MELT_WLF_PB } from './fixtures';
import type { Case } from './fixtures';

const ALPHA_V = 6e-4;
const density = { referenceDensity: 900, volumetricExpansionPerK: ALPHA_V };

function withBT(c: Case, pointsPerDecade: number, relativeNoise: number, seed: number) {
  return syntheticIsotherms({ ...c.options, pointsPerDecade, relativeNoise, seed, density });
}

describe('profileExpansion() through shiftIsotherms()', () => {
  // Noise-free data: the profile must return the generator's αV. What remains is the error of
  // linear interpolation between points on curved log–log curves (it shrinks as the square of the
  // point spacing): measured 5.961 and 5.969·10⁻⁴ /K at 5 points per decade (0.2 decades apart),
  // 5.9994·10⁻⁴ at 20. The tolerances, 1 % and 0.1 %, leave room for that and nothing more; the
  // earlier estimator (a parabola through weighted squares with a robust scale per trial) gave
  // 6.41 and 7.50·10⁻⁴ at 5 per decade and 6.28 and 10.98·10⁻⁴ at 20 on these very sets.
  for (const c of [MELT_ARRHENIUS, MELT_WLF_PB])
    for (const [pointsPerDecade, relTol] of [
      [5, 0.01],
      [20, 0.001],
    ] as const)
      it(`profileExpansion() recovers αV from noise-free moduli (${c.name}, ${pointsPerDecade} points per decade)`, () => {
        const { dataset, truth } = withBT(c, pointsPerDecade, 0, 1);
        const r = shiftIsotherms(dataset, { referenceK: c.options.referenceK, vertical: 'data' });
        expect(r.vertical.chosen).toBe('data');
        expectAbsClose(r.vertical.expansionPerK!, ALPHA_V, relTol * ALPHA_V, 'αV');
        // And the default run applies it: the shifts come back within 0.001 decades.
        const auto = shiftIsotherms(dataset, { referenceK: c.options.referenceK });
        expect(auto.vertical.chosen).toBe('data');
        auto.curves.forEach((cv, k) =>
          expectAbsClose(cv.log10aT!, truth.log10aT[k], 0.001, `${cv.id} log10 aT`),
        );
      });

  it('profileExpansion() gives αV a standard error that matches its scatter (20 seeds × 2 melts, 2 % noise)', () => {
    const z: number[] = [];
    for (const c of [MELT_ARRHENIUS, MELT_WLF_PB])
      for (let seed = 1; seed <= 20; seed++) {
        const { dataset } = withBT(c, 5, 0.02, 7000 + seed);
        const r = shiftIsotherms(dataset, {
          referenceK: c.options.referenceK,
          vertical: 'data',
          checks: false,
        });
        z.push((r.vertical.expansionPerK! - ALPHA_V) / r.vertical.expansionStdErr!);
      }
    const mean = z.reduce((a, b) => a + b, 0) / z.length;
    const rms = Math.sqrt(z.reduce((a, b) => a + b * b, 0) / z.length);
    // Measured: mean −0.30, RMS 0.95 (40 sets). Unbiased: the mean of 40 standard normal values
    // lies within ±0.5 (3.2 of its standard errors); calibrated: RMS 0.7–1.4 (the band the
    // engine's own standard errors are held to, docs/shifting.md).
    expect(Math.abs(mean)).toBeLessThan(0.5);
    expect(rms).toBeGreaterThan(0.7);
    expect(rms).toBeLessThan(1.4);
  });

  it('shiftIsotherms() with heldExpansion takes bT from the given αV without fitting it again', () => {
    const { dataset } = withBT(MELT_ARRHENIUS, 5, 0.02, 3);
    const referenceK = MELT_ARRHENIUS.options.referenceK;
    const held = { expansionPerK: 6.3e-4, expansionStdErr: 1e-5 };
    const r = shiftIsotherms(dataset, { referenceK, heldExpansion: held });
    expect(r.vertical.chosen).toBe('data');
    expect(r.vertical.expansionPerK).toBe(held.expansionPerK);
    expect(r.vertical.reason).toMatch(/held from the last full fit/);
    // The same shifts as with that αV given as a density.
    const d = shiftIsotherms(dataset, {
      referenceK,
      vertical: 'density',
      density: { kind: 'expansion', volumetricExpansionPerK: held.expansionPerK },
    });
    r.curves.forEach((cv, k) => {
      expectAbsClose(cv.log10bT!, d.curves[k].log10bT!, 1e-12, `${cv.id} log10 bT`);
      expectAbsClose(cv.log10aT!, d.curves[k].log10aT!, 0.002, `${cv.id} log10 aT`);
    });
    // A given density wins over a held αV, as it wins over the fit.
    const given = shiftIsotherms(dataset, {
      referenceK,
      heldExpansion: held,
      density: { kind: 'expansion', volumetricExpansionPerK: ALPHA_V },
    });
    expect(given.vertical.chosen).toBe('density');
    // A last full fit that found no bT is held as bT = 1.
    const off = shiftIsotherms(dataset, {
      referenceK,
      heldExpansion: { expansionPerK: null, expansionStdErr: null },
    });
    expect(off.vertical.chosen).toBe('none');
    expect(off.vertical.reason).toMatch(/held from the last full fit/);
    off.curves.forEach((cv) => expect(cv.log10bT).toBe(0));
  });

  it("shiftIsotherms() carries αV's uncertainty into the shifts' standard errors and covariance", () => {
    const { dataset } = withBT(MELT_WLF_PB, 5, 0.02, 5);
    const r = shiftIsotherms(dataset, { referenceK: MELT_WLF_PB.options.referenceK });
    expect(r.vertical.chosen).toBe('data');
    const d = shiftIsotherms(dataset, {
      referenceK: MELT_WLF_PB.options.referenceK,
      vertical: 'density',
      density: { kind: 'expansion', volumetricExpansionPerK: r.vertical.expansionPerK! },
    });
    const cov = r.covariance!;
    cov.ids.forEach((id, a) => {
      const k = r.curves.findIndex((c) => c.id === id);
      const se = r.curves[k].log10aTStdErr!;
      // The diagonal of the covariance is the square of the standard error.
      expectAbsClose(cov.log10aT[a][a], se * se, 1e-12, `${id} variance`);
      // Away from Tref the shifts are less certain than with αV known.
      if (Math.abs(r.curves[k].temperatureK - MELT_WLF_PB.options.referenceK) > 10)
        expect(se, id).toBeGreaterThan(d.curves[k].log10aTStdErr!);
    });
  });
});
