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

  it('preparePoints() skips NaN temperatures and shift factors with a warning naming the temperature, never a position', () => {
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
      'A shift factor without a usable temperature (missing or not positive in K) was skipped.',
      'The shift factor at 36.9 °C is missing; skipped.',
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

  it('preparePoints() treats the reference isotherm within 0.01 K of Tref as exact and leaves locked shifts out without a warning', () => {
    const p = preparePoints(
      [
        { temperatureK: 463.154, log10aT: 0, stdErr: 0 },
        { temperatureK: 473.15, log10aT: -0.2, stdErr: 0, locked: true },
        { temperatureK: 483.15, log10aT: -0.4, stdErr: 0.01 },
      ],
      463.15,
    );
    expect(p.index).toEqual([2]);
    expect(p.warnings).toEqual([]);
    expect(p.leftOut).toEqual([
      { temperatureK: 473.15, reason: 'shift fixed by hand: not a measurement' },
    ]);
    expect(p.rangeK).toEqual([463.154, 483.15]);
  });

  it('preparePoints() names a zero standard error by temperature when it replaces it', () => {
    const p = preparePoints(
      [
        { temperatureK: 443.15, log10aT: 0.3, stdErr: 0 },
        { temperatureK: 483.15, log10aT: -0.4, stdErr: 0.01 },
      ],
      463.15,
    );
    expect(p.sigma).toEqual([0.01, 0.01]);
    expect(p.warnings.map((w) => w.message)).toEqual([
      'The shift factor at 170.0 °C has an unusable (0) standard error; the median error 0.0100 decades is used instead.',
    ]);
  });

  it('preparePoints() handles an empty list and rejects a bad reference', () => {
    expect(preparePoints([], 300).index).toEqual([]);
    expect(() => preparePoints([], 0)).toThrow(/referenceK/);
  });
});
