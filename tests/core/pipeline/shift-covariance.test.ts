import { describe, expect, it } from 'vitest';
import { shiftCovarianceFor } from '../../../core/pipeline/shift-covariance';
import { buildMasterCurve } from '../../../core/pipeline/build-master-curve';
import { smoothProny, syntheticIsotherms } from '../../../core/synthetic';

describe('shiftCovarianceFor()', () => {
  it('shiftCovarianceFor() picks the rows and columns of the fitted isotherms, in their order', () => {
    const result = {
      log10aTCovariance: {
        ids: ['T01', 'T02', 'T03'],
        log10aT: [
          [4, 1, 2],
          [1, 5, 3],
          [2, 3, 6],
        ],
      },
    };
    expect(shiftCovarianceFor(result, ['T03', 'T01']).matrix).toEqual([
      [6, 2],
      [2, 4],
    ]);
    expect(shiftCovarianceFor(result, ['T04']).matrix).toBeNull();
    const none = shiftCovarianceFor({ log10aTCovariance: null }, ['T01']);
    expect(none.matrix).toBeNull();
    expect(none.reason).toMatch(/gave no covariance/);
  });
});

describe('model fits after the user excludes an isotherm', () => {
  // A lab's complaint: after excluding one isotherm, three fits warned "Point 4 at 190.0 °C:
  // standard error is 0" — the reference isotherm, whose zero error is exact, under an index.
  it('buildMasterCurve() gives no warning about the reference isotherm or a locked shift, and names no point index', () => {
    const prony = smoothProny({
      tauMinS: 1e-6,
      tauMaxS: 1e4,
      modesPerDecade: 2,
      glassyModulusPa: 1e9,
      equilibriumModulusPa: 1e6,
    });
    const { dataset } = syntheticIsotherms({
      testKind: 'oscillatory',
      deformation: 'shear',
      referenceK: 373.15,
      temperaturesK: Array.from({ length: 8 }, (_, i) => 343.15 + 10 * i),
      components: [{ prony, law: { kind: 'wlf', c1: 8.86, c2K: 101.6 } }],
      xMin: 0.1,
      xMax: 100,
      pointsPerDecade: 5,
      relativeNoise: 0.02,
      seed: 4,
    });
    // Tref given 0.004 K off the isotherm at 100 °C (a measured mean), one isotherm excluded,
    // one shift locked
    const a = buildMasterCurve(dataset, {
      referenceTemperatureK: 373.154,
      excludedIsothermIds: ['T02'],
      lockedLog10aT: { T07: -1.3 },
      pronyModesPerDecade: 0,
    });
    const text = a.warnings.map((w) => w.message).join('\n');
    expect(text).not.toMatch(/standard error/);
    expect(text).not.toMatch(/\bPoint \d/);
    for (const m of [a.models.wlf!, a.models.arrhenius!, a.models.polynomial!]) {
      expect(m.weighting.kind).toBe('full-covariance');
      expect(m.weighting.leftOut.map((l) => l.isothermId)).toEqual(['T07']);
    }
  });
});
