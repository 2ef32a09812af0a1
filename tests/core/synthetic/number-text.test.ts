import { describe, it, expect } from 'vitest';
import { formatCelsius, formatSignificant } from '../../../core/synthetic';

describe('formatSignificant()', () => {
  it.each([
    [12345.67, 5, 'plain', false, '12346'],
    [185212.4, 5, 'plain', false, '185212'],
    [0.0123456, 3, 'plain', false, '0.0123'],
    [0.1, 5, 'plain', false, '0.10000'],
    [-2.5, 2, 'plain', false, '-2.5'],
    [0, 3, 'plain', false, '0.00'],
    [0.1, 5, 'plain', true, '0,10000'],
    [1.23456e5, 5, 'exp', false, '1.2346E+05'],
    [0.882, 5, 'exp', false, '8.8200E-01'],
    [1.5e-12, 2, 'exp', true, '1,5E-12'],
    [Number.MAX_VALUE, 3, 'exp', false, '1.80E+308'],
  ] as const)('formatSignificant(%d, %d, %s, %s) is %s', (v, d, style, comma, text) => {
    expect(formatSignificant(v, d, style, comma)).toBe(text);
  });

  it('formatSignificant() text parses back to the value within its digits', () => {
    for (const v of [3.14159e-7, 0.5, 987654.321, 6.02e23]) {
      const back = Number(formatSignificant(v, 5, 'exp'));
      expect(Math.abs(back - v) / v).toBeLessThanOrEqual(5e-5);
    }
  });

  it('formatSignificant() rejects bad digits and non-finite values', () => {
    expect(() => formatSignificant(1, 0)).toThrow(/digits/);
    expect(() => formatSignificant(1, 2.5)).toThrow(/digits/);
    expect(() => formatSignificant(NaN, 3)).toThrow(/value/);
    expect(() => formatSignificant(Infinity, 3)).toThrow(/value/);
  });
});

describe('formatCelsius()', () => {
  it('formatCelsius() writes fixed decimals, with a decimal comma on request', () => {
    expect(formatCelsius(-0.3, 2)).toBe('-0.30');
    expect(formatCelsius(150.066, 2)).toBe('150.07');
    expect(formatCelsius(-20, 0)).toBe('-20');
    expect(formatCelsius(21.5, 1, true)).toBe('21,5');
  });
});
