import { describe, expect, it } from 'vitest';
import { checkShiftModelRange } from '../../../core/models/range-check';
import type { ShiftModelSpec } from '../../../core/models/types';

const wlf: ShiftModelSpec = {
  kind: 'wlf',
  referenceK: 300,
  values: [9, 60],
  fittedRangeK: [280, 340],
  glassTransitionK: 270,
};

describe('checkShiftModelRange()', () => {
  it('checkShiftModelRange() raises nothing inside the fitted range', () => {
    expect(checkShiftModelRange(wlf, 300)).toEqual({
      outsideFittedRange: false,
      belowGlassTransition: false,
      beyondPole: false,
      messages: [],
    });
  });

  it('checkShiftModelRange() flags extrapolation, WLF below Tg and the WLF pole', () => {
    const hot = checkShiftModelRange(wlf, 360);
    expect(hot.outsideFittedRange).toBe(true);
    expect(hot.messages[0]).toMatch(/86\.9 °C is outside the fitted range 6\.9 °C to 66\.9 °C/);
    const cold = checkShiftModelRange(wlf, 239);
    expect(cold).toMatchObject({
      outsideFittedRange: true,
      belowGlassTransition: true,
      beyondPole: true,
    });
    expect(cold.messages).toHaveLength(3);
  });

  it('checkShiftModelRange() never flags Tg or the pole for Arrhenius', () => {
    const f = checkShiftModelRange(
      { kind: 'arrhenius', referenceK: 300, values: [50], glassTransitionK: 350 },
      200,
    );
    expect(f).toMatchObject({
      outsideFittedRange: false,
      belowGlassTransition: false,
      beyondPole: false,
    });
  });
});
