import { describe, expect, it } from 'vitest';
import { syntheticIsotherms } from '../../../core/synthetic';
import { vanGurpPalmenSeries } from '../../../core/pipeline/van-gurp-palmen';
import { fixtureAnalysis } from '../report/analysis-fixture';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

describe('vanGurpPalmenSeries()', () => {
  it('vanGurpPalmenSeries() gives δ = atan(1/ωτ) and |G*| = gωτ/√(1+ω²τ²) for one Maxwell element', () => {
    // Analytic Maxwell element: G′ = gω²τ²/(1+ω²τ²), G″ = gωτ/(1+ω²τ²) (Ferry, Viscoelastic
    // Properties of Polymers, 3rd ed., 1980), hence tan δ = 1/(ωτ).
    const g = 1e5;
    const tau = 0.5;
    const { dataset } = syntheticIsotherms({
      testKind: 'oscillatory',
      deformation: 'shear',
      referenceK: 400,
      temperaturesK: [400],
      components: [
        {
          prony: { equilibriumModulusPa: 0, tauS: [tau], modulusPa: [g] },
          law: { kind: 'arrhenius', activationEnergyJPerMol: 50e3 },
        },
      ],
      xMin: 0.01,
      xMax: 100,
      pointsPerDecade: 3,
      relativeNoise: 0,
      seed: 1,
    });
    const base = fixtureAnalysis();
    const a = {
      ...base,
      dataset,
      curves: [{ ...base.curves[0], isothermId: dataset.isotherms[0].id, log10bT: 0 }],
    };
    const [s] = vanGurpPalmenSeries(a);
    const xs = dataset.isotherms[0].x;
    expect(s.complexModulusPa).toHaveLength(xs.length);
    xs.forEach((w, i) => {
      const wt = w * tau;
      expectAbsClose(s.phaseAngleDeg[i], (Math.atan(1 / wt) * 180) / Math.PI, 1e-9, 'δ (degrees)');
      expectRelClose(s.complexModulusPa[i], (g * wt) / Math.sqrt(1 + wt * wt), 1e-12, '|G*|');
    });
  });

  it('vanGurpPalmenSeries() multiplies |G*| by bT and leaves masked points out', () => {
    const base = fixtureAnalysis();
    const plain = vanGurpPalmenSeries(base);
    const iso = base.dataset.isotherms[0];
    const masked = {
      ...base,
      dataset: {
        ...base.dataset,
        isotherms: [{ ...iso, mask: iso.mask.map((m, i) => m && i !== 0) }],
      },
      curves: base.curves.map((c) => ({ ...c, log10bT: 0.1 })),
    };
    const [s] = vanGurpPalmenSeries(masked);
    expect(s.complexModulusPa).toHaveLength(plain[0].complexModulusPa.length - 1);
    expectRelClose(
      s.complexModulusPa[0],
      10 ** 0.1 * plain[0].complexModulusPa[1],
      1e-12,
      'bT·|G*|',
    );
  });

  it('vanGurpPalmenSeries() is empty for relaxation data', () => {
    expect(vanGurpPalmenSeries(fixtureAnalysis('relaxation'))).toEqual([]);
  });
});
