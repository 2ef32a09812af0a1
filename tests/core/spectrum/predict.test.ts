import { describe, expect, it } from 'vitest';
import { predictQuantity, STANDING_CAUTIONS } from '../../../core/spectrum/predict';
import { creepCompliance, creepFromProny } from '../../../core/spectrum/creep-from-prony';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../../../core/spectrum/prony-model';
import { fitWlf } from '../../../core/models/fit-wlf';
import { wlfLog10aT } from '../../../core/models/shift-laws';
import type { ShiftModelSpec } from '../../../core/models/types';
import { expectRelClose } from '../../helpers/assert-close';

const series = {
  equilibriumModulusPa: 1e6,
  tauS: [1e-4, 1e-2, 1, 100, 1e4],
  modulusPa: [5e8, 1e8, 2e7, 5e6, 1e6],
};
const model: ShiftModelSpec = {
  kind: 'wlf',
  referenceK: 323.15,
  values: [8.86, 101.6],
  fittedRangeK: [293.15, 373.15],
};
const window = { abscissa: 'angularFrequency' as const, min: 1e-6, max: 1e6 };
const ctx = { series, shiftModel: model, window };

describe('predictQuantity()', () => {
  it('predictQuantity() at the reference temperature reads the series directly', () => {
    const p = predictQuantity({ quantity: 'storage', temperatureK: 323.15, frequencyHz: 1 }, ctx);
    expectRelClose(p.value, pronyStorage(series, 2 * Math.PI), 1e-14);
    expect(p.unit).toBe('Pa');
    expect(p.log10aT + 0).toBe(0); // −0 from the WLF formula at T = Tr
    expect(p.flags).toEqual({
      outsideReducedWindow: false,
      outsideFittedRange: false,
      belowGlassTransition: false,
      beyondPole: false,
    });
    expect(p.cautions).toEqual([...STANDING_CAUTIONS]);
  });

  // The design query of docs/conventions.md §5: relaxed modulus after ten years at 60 °C, t_r = t/aT.
  it('predictQuantity() gives the relaxed modulus after ten years at 60 °C through t_r = t/aT(60 °C)', () => {
    const t = 10 * 365.25 * 86400;
    const T = 333.15;
    const aT = 10 ** wlfLog10aT(T, 8.86, 101.6, 323.15);
    const p = predictQuantity({ quantity: 'relaxation', temperatureK: T, timeS: t }, ctx);
    expectRelClose(p.reducedX, t / aT, 1e-12);
    expectRelClose(p.value, pronyRelaxation(series, t / aT), 1e-12);
    // t_r ≈ 3e9 s lies beyond the measured window (ω_r ≥ 1e-6 rad/s ↔ t_r ≤ 1e6 s)
    expect(p.flags.outsideReducedWindow).toBe(true);
    expect(p.cautions[0]).toMatch(/outside the measured master curve/);
  });

  it('predictQuantity() applies aT to frequency and bT to moduli, compliance and viscosity', () => {
    const T = 343.15;
    const aT = 10 ** wlfLog10aT(T, 8.86, 101.6, 323.15);
    const w = 10;
    const withB = { ...ctx, log10bT: Math.log10(1.05) };
    expectRelClose(
      predictQuantity({ quantity: 'loss', temperatureK: T, omegaRadPerS: w }, withB).value,
      pronyLoss(series, aT * w) / 1.05,
      1e-12,
    );
    expectRelClose(
      predictQuantity({ quantity: 'tanDelta', temperatureK: T, omegaRadPerS: w }, withB).value,
      pronyLoss(series, aT * w) / pronyStorage(series, aT * w),
      1e-12,
    );
    expectRelClose(
      predictQuantity({ quantity: 'complexViscosity', temperatureK: T, omegaRadPerS: w }, withB)
        .value,
      Math.hypot(pronyStorage(series, aT * w), pronyLoss(series, aT * w)) / (1.05 * w),
      1e-12,
    );
    expectRelClose(
      predictQuantity({ quantity: 'creep', temperatureK: T, timeS: 100 }, withB).value,
      creepCompliance(creepFromProny(series), 100 / aT) * 1.05,
      1e-12,
    );
  });

  it('predictQuantity() flags temperatures outside the fitted range and below Tg', () => {
    const p = predictQuantity(
      { quantity: 'storage', temperatureK: 253.15, frequencyHz: 1 },
      { ...ctx, shiftModel: { ...model, glassTransitionK: 263.15 } },
    );
    expect(p.flags.outsideFittedRange).toBe(true);
    expect(p.flags.belowGlassTransition).toBe(true);
    expect(p.cautions.some((c) => /below Tg/.test(c))).toBe(true);
  });

  it('predictQuantity() brackets the value by the 95 % band of log10 aT when the model has a covariance', () => {
    const pts = [293.15, 303.15, 313.15, 323.15, 333.15, 343.15, 353.15].map((T, i) => ({
      temperatureK: T,
      log10aT: wlfLog10aT(T, 8.86, 101.6, 323.15) + 0.01 * Math.sin(3 * i),
      stdErr: 0.01,
    }));
    const fit = fitWlf(pts, { referenceK: 323.15 });
    const p = predictQuantity(
      { quantity: 'storage', temperatureK: 300, frequencyHz: 1 },
      { ...ctx, shiftModel: fit },
    );
    expect(p.valueRange).toBeDefined();
    expect(p.valueRange![0]).toBeLessThan(p.value);
    expect(p.valueRange![1]).toBeGreaterThan(p.value);
  });

  it('predictQuantity() rejects a query without its time or frequency', () => {
    expect(() => predictQuantity({ quantity: 'relaxation', temperatureK: 300 }, ctx)).toThrow(
      /timeS/,
    );
    expect(() => predictQuantity({ quantity: 'storage', temperatureK: 300 }, ctx)).toThrow(
      /omegaRadPerS or frequencyHz/,
    );
    expect(() =>
      predictQuantity({ quantity: 'storage', temperatureK: -3, frequencyHz: 1 }, ctx),
    ).toThrow(/temperatureK/);
  });
});
