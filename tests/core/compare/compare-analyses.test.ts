/**
 * compareAnalyses() against known truth: seeded synthetic lots (tests/helpers/lot-pairs.ts) built
 * from a known Prony series, whose relaxation times, moduli or activation energy are changed by a
 * known amount. The truth is analytic: scaling every τ_i by 10^D moves G′(ω) and G″(ω) by exactly D
 * decades on the log ω axis, scaling every g_i by m moves them by log10 m (Ferry, Viscoelastic
 * Properties of Polymers, 3rd ed., 1980, ch. 3: G′ = Σ g_i ω²τ_i²/(1+ω²τ_i²)). Tolerances are those
 * the feature was specified with: 0.02 decades for the time shift, 2 % for the modulus level,
 * the activation energy difference within its own standard error, and ≥ 95 % of 200 identical
 * pairs passing and not differing beyond noise.
 */
import { describe, expect, it } from 'vitest';
import { compareAnalyses } from '../../../core/compare';
import { parseSpecification, type Specification } from '../../../core/compare';
import { expectAbsClose } from '../../helpers/assert-close';
import { lotAnalysis, LOT_EA_J_PER_MOL } from '../../helpers/lot-pairs';

const spec: Specification = parseSpecification(
  JSON.stringify({
    format: 'thermoshift-spec',
    formatVersion: 1,
    name: 'test band (invented)',
    criteria: [
      { kind: 'curve', quantity: 'storageModulus', reducedRange: [0.1, 100], tolerancePercent: 10 },
      { kind: 'timeShift', maxDecades: 0.1 },
      { kind: 'activationEnergy', toleranceKJPerMol: 3 },
    ],
  }),
  'test.spec.json',
);

describe('compareAnalyses()', () => {
  it('compareAnalyses() finds identical lots passing and not different beyond noise in ≥ 95 % of 200 pairs', () => {
    let passed = 0;
    let same = 0;
    for (let k = 0; k < 200; k++) {
      const c = compareAnalyses(lotAnalysis(10_000 + 2 * k), [lotAnalysis(10_001 + 2 * k)], {
        spec,
      });
      const s = c.comparisons[0];
      if (s.overall === 'pass') passed++;
      if (!s.differsBeyondNoise) same++;
    }
    console.info(
      `identical pairs: ${passed}/200 pass the spec, ${same}/200 not different beyond noise`,
    );
    expect(passed / 200).toBeGreaterThanOrEqual(0.95);
    expect(same / 200).toBeGreaterThanOrEqual(0.95);
  });

  it('compareAnalyses() recovers relaxation times 0.1 decade longer within 0.02 decades', () => {
    const c = compareAnalyses(lotAnalysis(7), [lotAnalysis(8, { log10TauFactor: 0.1 })]);
    const s = c.comparisons[0];
    expectAbsClose(s.timeShiftDecades?.value ?? NaN, 0.1, 0.02, 'time shift, decades');
    expect(s.differsBeyondNoise).toBe(true);
    // same moduli: the level is unchanged within 2 %
    expectAbsClose(10 ** (s.modulusOffsetDecades?.value ?? NaN), 1, 0.02, 'modulus ratio');
  });

  it('compareAnalyses() recovers a lot 8 % softer within 2 %', () => {
    const c = compareAnalyses(lotAnalysis(7), [lotAnalysis(9, { modulusFactor: 0.92 })]);
    const s = c.comparisons[0];
    expectAbsClose(10 ** (s.modulusOffsetDecades?.value ?? NaN), 0.92, 0.02, 'modulus ratio');
    expectAbsClose(s.timeShiftDecades?.value ?? NaN, 0, 0.02, 'time shift, decades');
    const g = s.differences.find((d) => d.quantity === 'storageModulus');
    expect(g?.largest?.log10Difference).toBeLessThan(0);
  });

  it('compareAnalyses() recovers a different activation energy within its standard error', () => {
    // A difference of 10 kJ/mol; "within its s.e." is a one-sigma statement, true for about
    // 68 % of seeds when the s.e. is honest: over 20 seeded pairs we require at least 60 % within
    // one s.e. and every one within three.
    let within = 0;
    for (let k = 0; k < 20; k++) {
      const d = compareAnalyses(lotAnalysis(500 + 2 * k), [
        lotAnalysis(501 + 2 * k, { activationEnergyJPerMol: LOT_EA_J_PER_MOL + 10_000 }),
      ]).comparisons[0].models.activationEnergyKJPerMol;
      expect(d?.stdErr).toBeGreaterThan(0);
      const z = Math.abs(((d?.value ?? NaN) - 10) / (d?.stdErr ?? NaN));
      expect(z).toBeLessThan(3);
      if (z <= 1) within++;
    }
    console.info(`ΔEa within its s.e. in ${within}/20 seeded pairs`);
    expect(within / 20).toBeGreaterThanOrEqual(0.6);
    const v = compareAnalyses(
      lotAnalysis(7),
      [lotAnalysis(11, { activationEnergyJPerMol: LOT_EA_J_PER_MOL + 10_000 })],
      { spec },
    ).comparisons[0].verdicts.find((x) => x.kind === 'activationEnergy');
    expect(v?.verdict).toBe('fail');
    expect(v?.reason).toMatch(/activation energy differs by \+\d/);
  });

  it('compareAnalyses() names a failed band criterion, by how much and with what probability', () => {
    const c = compareAnalyses(lotAnalysis(7), [lotAnalysis(13, { modulusFactor: 0.8 })], { spec });
    const s = c.comparisons[0];
    expect(s.overall).toBe('fail');
    const band = s.verdicts.find((v) => v.kind === 'curve');
    expect(band?.verdict).toBe('fail');
    expect(band?.value).toBeLessThan(-10);
    expectAbsClose(10 ** (s.modulusOffsetDecades?.value ?? NaN), 0.8, 0.02, 'modulus ratio');
    expect(band?.probabilityOutside).toBeGreaterThan(0.95);
    expect(band?.reason).toMatch(/^FAIL: storage modulus at .* beyond the lower limit -10.00 %/);
  });

  it('compareAnalyses() moves a curve to another temperature through its shift model and flags extrapolation', () => {
    const inside = compareAnalyses(lotAnalysis(7), [lotAnalysis(8)], {
      referenceTemperatureK: 313.15,
    });
    expect(inside.samples[0].extrapolated).toBe(false);
    expect(inside.samples[0].log10aTAtCommon.value).toBeLessThan(0); // above Tref: aT < 1
    expectAbsClose(inside.comparisons[0].timeShiftDecades?.value ?? NaN, 0, 0.03, 'same lot');
    const outside = compareAnalyses(lotAnalysis(7), [lotAnalysis(8)], {
      referenceTemperatureK: 353.15,
    });
    expect(outside.samples[0].extrapolated).toBe(true);
    expect(outside.comparisons[0].warnings.join(' ')).toMatch(/extrapolated/);
  });

  it('compareAnalyses() refuses an empty list of samples naming the parameter', () => {
    expect(() => compareAnalyses(lotAnalysis(7), [])).toThrow(/others/);
  });
});
