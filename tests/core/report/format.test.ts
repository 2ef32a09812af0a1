import { describe, it, expect } from 'vitest';
import { formatFixed, formatNumber, MISSING, superscript } from '../../../core/report/format';

describe('formatNumber()', () => {
  it('formatNumber() keeps significant digits and trims trailing zeros', () => {
    expect(formatNumber(8.86)).toBe('8.86');
    expect(formatNumber(101.6)).toBe('101.6');
    expect(formatNumber(0.012345, 3)).toBe('0.0123');
  });
  it('formatNumber() switches to ×10ⁿ for very large and very small values', () => {
    expect(formatNumber(1.5e9)).toBe('1.5×10⁹');
    expect(formatNumber(-2.5e-5)).toBe('-2.5×10⁻⁵');
  });
  it('formatNumber() shows a dash for missing values', () => {
    for (const v of [null, undefined, NaN, Infinity]) expect(formatNumber(v)).toBe(MISSING);
    expect(formatNumber(0)).toBe('0');
  });
});

describe('formatFixed()', () => {
  it('formatFixed() never prints a negative zero', () => {
    expect(formatFixed(-0.0001, 3)).toBe('0.000');
    expect(formatFixed(-1.23456, 3)).toBe('-1.235');
    expect(formatFixed(null, 3)).toBe(MISSING);
  });
});

describe('superscript()', () => {
  it('superscript() writes signed integers as superscript digits', () => {
    expect(superscript(-12)).toBe('⁻¹²');
    expect(superscript(0)).toBe('⁰');
  });
});
