import { describe, expect, it } from 'vitest';
import { resolveShiftFitOptions } from '../../../core/models/shift-fit-options';

describe('resolveShiftFitOptions()', () => {
  it('resolveShiftFitOptions() applies the documented default errorScaling = residual', () => {
    expect(resolveShiftFitOptions({ referenceK: 300 })).toEqual({
      referenceK: 300,
      glassTransitionK: undefined,
      errorScaling: 'residual',
      covariance: null,
      diagonalReason: undefined,
    });
    expect(
      resolveShiftFitOptions({ referenceK: 300, errorScaling: 'reported', glassTransitionK: 250 })
        .errorScaling,
    ).toBe('reported');
  });

  it('resolveShiftFitOptions() names the bad option', () => {
    expect(() => resolveShiftFitOptions({ referenceK: 0 })).toThrow(/referenceK/);
    expect(() => resolveShiftFitOptions({ referenceK: 300, glassTransitionK: -1 })).toThrow(
      /glassTransitionK/,
    );
    // @ts-expect-error: checking the runtime guard for a wrong value
    expect(() => resolveShiftFitOptions({ referenceK: 300, errorScaling: 'both' })).toThrow(
      /errorScaling/,
    );
  });
});
