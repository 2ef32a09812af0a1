import { describe, it, expect } from 'vitest';
import { seededRandom, wanderingOffsetsK } from '../../../core/synthetic';

describe('wanderingOffsetsK()', () => {
  it('wanderingOffsetsK() stays within ±amplitude and is reproducible from the seed', () => {
    const a = wanderingOffsetsK(2000, 0.3, seededRandom(7));
    expect(a).toHaveLength(2000);
    expect(Math.max(...a.map(Math.abs))).toBeLessThanOrEqual(0.3);
    expect(wanderingOffsetsK(2000, 0.3, seededRandom(7))).toEqual(a);
    expect(wanderingOffsetsK(2000, 0.3, seededRandom(8))).not.toEqual(a);
  });

  it('wanderingOffsetsK() wanders: neighbouring readings are correlated', () => {
    // An AR(1) walk with memory 0.7 has lag-1 autocorrelation 0.7 (Box & Jenkins, Time Series
    // Analysis, 1970); clipping and 2000 samples move the estimate by a few hundredths.
    const a = wanderingOffsetsK(2000, 0.3, seededRandom(11));
    const mean = a.reduce((s, v) => s + v, 0) / a.length;
    let num = 0;
    let den = 0;
    a.forEach((v, i) => {
      den += (v - mean) ** 2;
      if (i > 0) num += (v - mean) * (a[i - 1] - mean);
    });
    expect(num / den).toBeGreaterThan(0.6);
    expect(num / den).toBeLessThan(0.8);
  });

  it('wanderingOffsetsK() gives nothing for no points and zeros for zero amplitude', () => {
    expect(wanderingOffsetsK(0, 0.3, seededRandom(1))).toEqual([]);
    expect(wanderingOffsetsK(3, 0, seededRandom(1)).map(Math.abs)).toEqual([0, 0, 0]);
  });

  it('wanderingOffsetsK() rejects bad arguments, naming them', () => {
    expect(() => wanderingOffsetsK(-1, 0.3, seededRandom(1))).toThrow(/count/);
    expect(() => wanderingOffsetsK(2.5, 0.3, seededRandom(1))).toThrow(/count/);
    expect(() => wanderingOffsetsK(3, NaN, seededRandom(1))).toThrow(/amplitudeK/);
    expect(() => wanderingOffsetsK(3, 0.3, seededRandom(1), 1)).toThrow(/memory/);
  });
});
