import { describe, it, expect } from 'vitest';
import { syntheticIsotherms, smoothProny } from '../../../core/synthetic';
import { pronyStorage } from '../../../core/spectrum/prony-model';
import { wlfLog10aT } from '../../../core/models/shift-laws';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

const prony = smoothProny({
  tauMinS: 1e-6,
  tauMaxS: 1e3,
  modesPerDecade: 2,
  glassyModulusPa: 1e9,
  equilibriumModulusPa: 1e6,
});

describe('syntheticIsotherms()', () => {
  it('syntheticIsotherms() without noise reproduces G_ref(aT·ω) at each temperature', () => {
    const { dataset, truth } = syntheticIsotherms({
      testKind: 'oscillatory',
      deformation: 'shear',
      referenceK: 300,
      temperaturesK: [280, 300, 320],
      components: [{ prony, law: { kind: 'wlf', c1: 10, c2K: 80 } }],
      xMin: 0.1,
      xMax: 100,
      pointsPerDecade: 5,
      relativeNoise: 0,
      seed: 1,
    });
    expect(dataset.isotherms).toHaveLength(3);
    expectAbsClose(truth.log10aT[1], 0, 1e-12, 'aT(Tref)');
    expectAbsClose(truth.log10aT[2], wlfLog10aT(320, 10, 80, 300), 1e-12);
    const iso = dataset.isotherms[2];
    const aT = 10 ** truth.log10aT[2];
    iso.x.forEach((w, i) =>
      expectRelClose(iso.quantities.storageModulus![i], pronyStorage(prony, aT * w), 1e-12),
    );
  });

  it('syntheticIsotherms() is reproducible from its seed', () => {
    const make = () =>
      syntheticIsotherms({
        testKind: 'relaxation',
        deformation: 'tension',
        referenceK: 300,
        temperaturesK: [290, 310],
        components: [{ prony, law: { kind: 'arrhenius', activationEnergyJPerMol: 1e5 } }],
        xMin: 1,
        xMax: 1e4,
        pointsPerDecade: 4,
        relativeNoise: 0.02,
        seed: 42,
      }).dataset.isotherms[0].quantities.relaxationModulus;
    expect(make()).toEqual(make());
  });
});
