import { describe, expect, it } from 'vitest';
import { preparePoints } from '../../../core/models/prepare-points';

describe('preparePoints()', () => {
  it('preparePoints() drops the exact reference point quietly and keeps the others', () => {
    const p = preparePoints(
      [
        { temperatureK: 300, log10aT: 0, stdErr: 0 },
        { temperatureK: 320, log10aT: -1, stdErr: 0.02 },
      ],
      300,
    );
    expect(p.index).toEqual([1]);
    expect(p.warnings).toEqual([]);
    expect(p.rangeK).toEqual([300, 320]);
  });

  it('preparePoints() skips NaN temperatures and shift factors with a warning naming the point', () => {
    const p = preparePoints(
      [
        { temperatureK: NaN, log10aT: 1, stdErr: 0.01 },
        { temperatureK: 310, log10aT: Number.POSITIVE_INFINITY, stdErr: 0.01 },
        { temperatureK: 320, log10aT: -1, stdErr: 0.01 },
      ],
      300,
    );
    expect(p.index).toEqual([2]);
    expect(p.warnings.map((w) => w.message)).toEqual([
      'Point 1: temperature is missing or not positive in K; skipped.',
      'Point 2 at 36.9 °C: shift factor is missing; skipped.',
    ]);
  });

  it('preparePoints() falls back to an unweighted fit when no error is usable', () => {
    const p = preparePoints(
      [
        { temperatureK: 310, log10aT: -0.5 },
        { temperatureK: 320, log10aT: -1, stdErr: -2 },
      ],
      300,
    );
    expect(p.sigma).toEqual([1, 1]);
    expect(p.warnings).toHaveLength(1);
    expect(p.warnings[0].pointIndex).toBe(-1);
  });

  it('preparePoints() handles an empty list and rejects a bad reference', () => {
    expect(preparePoints([], 300).index).toEqual([]);
    expect(() => preparePoints([], 0)).toThrow(/referenceK/);
  });
});
