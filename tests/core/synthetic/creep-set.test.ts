import { describe, expect, it } from 'vitest';
import { syntheticCreep } from '../../../core/synthetic';
import type { SyntheticCreepOptions } from '../../../core/synthetic';
import { creepCompliance } from '../../../core/spectrum';
import { wlfLog10aT } from '../../../core/models/shift-laws';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

/** Standard linear solid: G(t) = Ge + g·exp(−t/τ) (invented values). */
const SLS = { equilibriumModulusPa: 1e6, tauS: [10], modulusPa: [9e6] };

const base: SyntheticCreepOptions = {
  deformation: 'shear',
  referenceK: 300,
  temperaturesK: [290, 300, 310],
  prony: SLS,
  law: { kind: 'wlf', c1: 8.86, c2K: 101.6 },
  tMinS: 0.1,
  tMaxS: 1000,
  pointsPerDecade: 5,
  relativeNoise: 0,
  seed: 1,
};

describe('syntheticCreep()', () => {
  it('syntheticCreep() gives the analytic creep compliance of a standard linear solid at Tref', () => {
    // J(t) = 1/Ge − (1/Ge − 1/(Ge + g))·exp(−t/λ), λ = τ·(Ge + g)/Ge: the creep response of the
    // standard linear solid (Tschoegl, The Phenomenological Theory of Linear Viscoelastic
    // Behavior, 1989, ch. 3; from memory).
    const { dataset } = syntheticCreep(base);
    const ge = 1e6;
    const g0 = 1e7;
    const lambda = (10 * g0) / ge;
    const iso = dataset.isotherms[1];
    iso.x.forEach((t, i) => {
      const exact = 1 / ge - (1 / ge - 1 / g0) * Math.exp(-t / lambda);
      // Roots of the retardation spectrum come from bisection to ~1e-15: rounding only.
      expectRelClose(iso.quantities.creepCompliance![i], exact, 1e-9, `t = ${t} s`);
    });
  });

  it('syntheticCreep() shifts each isotherm: measured J(T, t) = bT · J_ref(t/aT)', () => {
    const density = { referenceDensity: 1000, volumetricExpansionPerK: 1e-3 };
    const { dataset, truth } = syntheticCreep({ ...base, density });
    dataset.isotherms.forEach((iso, k) => {
      const T = iso.temperatureK;
      expectAbsClose(truth.log10aT[k], wlfLog10aT(T, 8.86, 101.6, 300), 1e-12, `aT at ${T} K`);
      // bT = Tref·ρref/(T·ρ(T)), ρ = ρref/(1 + αV(T − Tref)) (Ferry 1980).
      const bT = (300 * (1 + 1e-3 * (T - 300))) / T;
      expectAbsClose(truth.log10bT[k], Math.log10(bT), 1e-12, `bT at ${T} K`);
      iso.x.forEach((t, i) => {
        const reduced = iso.quantities.creepCompliance![i] / bT;
        const expected = creepCompliance(truth.retardation, t / 10 ** truth.log10aT[k]);
        expectRelClose(reduced, expected, 1e-12, `${iso.id} t = ${t} s`);
      });
    });
    // Above Tref the material is faster: aT < 1 and, at equal t, more compliant.
    expect(truth.log10aT[2]).toBeLessThan(0);
    expect(dataset.isotherms[2].quantities.creepCompliance![0]).toBeGreaterThan(
      dataset.isotherms[1].quantities.creepCompliance![0],
    );
  });

  it('syntheticCreep() labels the data invented and creep, with file and row per point', () => {
    const { dataset } = syntheticCreep({ ...base, name: 'invented test' });
    expect(dataset.testKind).toBe('creep');
    expect(dataset.abscissa).toBe('time');
    expect(dataset.metadata.invented).toBe('yes');
    expect(dataset.isotherms[0].source[0]).toEqual({ file: 'invented test.csv', row: 2 });
    expect(dataset.isotherms[0].x.length).toBe(21); // 4 decades × 5 per decade + 1
  });

  it('syntheticCreep() is reproducible from the seed and noisy as asked', () => {
    const a = syntheticCreep({ ...base, relativeNoise: 0.05, seed: 7 }).dataset;
    const b = syntheticCreep({ ...base, relativeNoise: 0.05, seed: 7 }).dataset;
    const c = syntheticCreep({ ...base, relativeNoise: 0.05, seed: 8 }).dataset;
    const clean = syntheticCreep(base).dataset;
    expect(a).toEqual(b);
    expect(a).not.toEqual(c);
    const logs = a.isotherms.flatMap((iso, k) =>
      iso.quantities.creepCompliance!.map((v, i) =>
        Math.log(v / clean.isotherms[k].quantities.creepCompliance![i]),
      ),
    );
    const sd = Math.sqrt(logs.reduce((s, v) => s + v * v, 0) / logs.length);
    // 63 log-normal draws: their RMS lies within ±30 % of 0.05 with near certainty.
    expect(sd).toBeGreaterThan(0.035);
    expect(sd).toBeLessThan(0.065);
  });

  it('syntheticCreep() disturbs only the first points of the listed isotherms', () => {
    const outliers = { isothermIndices: [2], count: 3, relativeNoise: 0.5 };
    const clean = syntheticCreep(base).dataset;
    const d = syntheticCreep({ ...base, outliers }).dataset;
    d.isotherms.forEach((iso, k) =>
      iso.quantities.creepCompliance!.forEach((v, i) => {
        const same = v === clean.isotherms[k].quantities.creepCompliance![i];
        expect(same, `${iso.id} point ${i}`).toBe(!(k === 2 && i < 3));
      }),
    );
  });

  it('syntheticCreep() throws at once on wrong options, naming them', () => {
    expect(() => syntheticCreep({ ...base, tMinS: 0 })).toThrow(/tMinS/);
    expect(() => syntheticCreep({ ...base, tMaxS: 0.01 })).toThrow(/tMaxS/);
    expect(() => syntheticCreep({ ...base, relativeNoise: -1 })).toThrow(/relativeNoise/);
    expect(() => syntheticCreep({ ...base, temperaturesK: [] }).dataset.isotherms).not.toThrow();
  });
});
