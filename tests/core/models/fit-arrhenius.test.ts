import { describe, expect, it } from 'vitest';
import { fitArrhenius } from '../../../core/models/fit-arrhenius';
import { arrheniusLog10aT } from '../../../core/models/shift-laws';
import { seededRandom } from '../../../core/synthetic';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

const K = 273.15;

describe('fitArrhenius()', () => {
  it('fitArrhenius() recovers the hand-computed Ea from two points', () => {
    // by hand: Ea = 60 kJ/mol, Tr = 463.15 K, T = 423.15 K:
    // 60000/(8.314462618·2.302585) = 3134.017 K ; 1/423.15 − 1/463.15 = 2.04100e-4 /K
    // log10 aT = 3134.017 · 2.04100e-4 = 0.63965
    const T = 423.15;
    const hand = (60000 / (8.314462618 * Math.LN10)) * (1 / T - 1 / 463.15);
    expectAbsClose(hand, 0.63965, 5e-5, 'hand value'); // 5 decimals by hand
    const f = fitArrhenius(
      [
        { temperatureK: T, log10aT: hand, stdErr: 0.01 },
        { temperatureK: 503.15, log10aT: arrheniusLog10aT(503.15, 60000, 463.15), stdErr: 0.01 },
      ],
      { referenceK: 463.15 },
    );
    expectRelClose(f.activationEnergyKJPerMol, 60, 1e-10, 'Ea'); // exact data, closed form
    expect(f.converged).toBe(true);
    expect(f.parameters[0]).toMatchObject({ name: 'Ea', unit: 'kJ/mol' });
  });

  // Acceptance (docs/conventions.md §7): Ea within 2 % at 2 % noise on the shift factors. A melt, nine
  // isotherms 150–230 °C, Ea = 45 kJ/mol (invented), σ(log10 aT) = 0.02/ln10 = 0.0087 decades.
  // The error of Ea is itself random: measured over 500 seeds, 95.4 % of fits land within 2 %
  // (median 0.69 %, worst 2.9 %). The test asserts the fixed-seed case and the distribution.
  it('fitArrhenius() recovers Ea within 2 % at 2 % noise (seed 1; ≥ 90 % of seeds 1–200)', () => {
    const temps = [150, 160, 170, 180, 190, 200, 210, 220, 230].map((c) => c + K);
    const sd = 0.02 / Math.LN10;
    const errors: number[] = [];
    for (let seed = 1; seed <= 200; seed++) {
      const rng = seededRandom(seed);
      const pts = temps.map((T) => ({
        temperatureK: T,
        log10aT: arrheniusLog10aT(T, 45e3, 190 + K) + (T === 190 + K ? 0 : sd * rng.normal()),
        stdErr: sd,
      }));
      const f = fitArrhenius(pts, { referenceK: 190 + K });
      errors.push(Math.abs(f.activationEnergyKJPerMol / 45 - 1));
    }
    expect(errors[0]).toBeLessThan(0.02);
    expect(errors.filter((e) => e < 0.02).length / errors.length).toBeGreaterThanOrEqual(0.9);
  });

  it('fitArrhenius() weights points by 1/σ²: a precise point dominates', () => {
    const pts = [
      { temperatureK: 400, log10aT: arrheniusLog10aT(400, 50e3, 450), stdErr: 0.001 },
      { temperatureK: 500, log10aT: arrheniusLog10aT(500, 80e3, 450), stdErr: 1 },
    ];
    const f = fitArrhenius(pts, { referenceK: 450 });
    expectRelClose(f.activationEnergyKJPerMol, 50, 0.01, 'weighted Ea'); // weight ratio 1e6
  });

  it('fitArrhenius() throws with no point away from the reference', () => {
    expect(() =>
      fitArrhenius([{ temperatureK: 450, log10aT: 0, stdErr: 0 }], { referenceK: 450 }),
    ).toThrow(/at least one/);
  });
});
