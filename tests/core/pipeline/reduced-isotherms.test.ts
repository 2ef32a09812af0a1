import { describe, expect, it } from 'vitest';
import { isothermValues, reducedIsotherms } from '../../../core/pipeline/reduced-isotherms';
import { pronyLoss, pronyStorage } from '../../../core/spectrum/prony-model';
import { fixtureAnalysis } from '../report/analysis-fixture';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

const a = fixtureAnalysis();

describe('isothermValues()', () => {
  it('isothermValues() derives tan δ, δ, |G*| and |η*| from G′ and G″ (docs/conventions.md §1 definitions)', () => {
    const iso = a.dataset.isotherms[0];
    const [gp, gpp, w] = [
      iso.quantities.storageModulus![2],
      iso.quantities.lossModulus![2],
      iso.x[2],
    ];
    expect(isothermValues(iso, 'tanDelta')![2]).toBe(gpp / gp);
    expectAbsClose(
      isothermValues(iso, 'phaseAngle')![2],
      (Math.atan2(gpp, gp) * 180) / Math.PI,
      1e-12,
      'δ',
    );
    expect(isothermValues(iso, 'complexModulus')![2]).toBe(Math.hypot(gp, gpp));
    expect(isothermValues(iso, 'complexViscosity')![2]).toBe(Math.hypot(gp, gpp) / w);
    expect(isothermValues(iso, 'creepCompliance')).toBeNull();
  });
});

describe('reducedIsotherms()', () => {
  it('reducedIsotherms() puts every point at aT·ω with |η*| × bT/aT and tan δ unshifted', () => {
    const eta = reducedIsotherms(a, 'complexViscosity');
    const tan = reducedIsotherms(a, 'tanDelta');
    const iso = a.dataset.isotherms[1];
    const c = a.curves[1];
    const aT = 10 ** c.log10aT!;
    const r = eta.find((x) => x.isothermId === iso.id)!;
    expectRelClose(r.x[0], iso.x[0] * aT, 1e-12, 'reduced frequency');
    expectRelClose(r.y[0], isothermValues(iso, 'complexViscosity')![0] / aT, 1e-12, '|η*| reduced');
    expect(tan.find((x) => x.isothermId === iso.id)!.y[0]).toBe(
      isothermValues(iso, 'tanDelta')![0],
    );
  });

  it('reducedIsotherms() with the true shifts lays tan δ of every isotherm on the true spectrum’s tan δ', () => {
    // the fixture's data are the Prony model of its spectrum with 2 % noise on G′ and G″, shifted
    // by the true WLF aT: G″/G′ at the reduced frequency must be the model's within that noise
    const p = a.prony!;
    const logs = reducedIsotherms(a, 'tanDelta')
      .filter((r) => r.use === 'used')
      .flatMap((r) =>
        r.x.map((x, i) => Math.log10(r.y[i] / (pronyLoss(p, x) / pronyStorage(p, x)))),
      );
    const rms = Math.sqrt(logs.reduce((s, v) => s + v * v, 0) / logs.length);
    // 2 % noise on each of G′, G″: σ(log10 ratio) ≈ 0.434·√2·0.02 = 0.012 decades
    expect(rms).toBeLessThan(0.02);
  });

  it('reducedIsotherms() keeps the excluded isotherm, marked, at the shift it is drawn at', () => {
    const r = reducedIsotherms(a, 'storageModulus').find((x) => x.isothermId === 'T07')!;
    expect(r.use).toBe('excluded');
    expect(r.x.length).toBeGreaterThan(0);
  });
});
