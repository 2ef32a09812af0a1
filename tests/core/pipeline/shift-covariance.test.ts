import { describe, expect, it } from 'vitest';
import { shiftCovarianceFor } from '../../../core/pipeline/shift-covariance';

describe('shiftCovarianceFor()', () => {
  it('shiftCovarianceFor() picks the rows and columns of the fitted isotherms, in their order', () => {
    const result = {
      covariance: {
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
    const none = shiftCovarianceFor({ covariance: null }, ['T01']);
    expect(none.matrix).toBeNull();
    expect(none.reason).toMatch(/gave no covariance/);
  });
});
