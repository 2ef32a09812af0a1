import { describe, expect, it } from 'vitest';
import {
  digitsForError,
  formatRange,
  formatSig,
  formatWithError,
  plainNumber,
  signedDecades,
  unifyExponents,
} from '../../../app/renderer/src/format/numbers';

describe('formatSig()', () => {
  it('formatSig() writes one exponent style: plain between 10⁻³ and 10⁶, ×10ⁿ outside', () => {
    expect(formatSig(5.88e10, 3)).toBe('5.88×10¹⁰');
    expect(formatSig(273312.7)).toBe('273300');
    expect(formatSig(0.0123456)).toBe('0.01235');
    expect(formatSig(2.5e-5, 2)).toBe('2.5×10⁻⁵');
    expect(formatSig(999999, 3)).toBe('1.00×10⁶'.replace('.00', '')); // rounds up to 10⁶
    expect(formatSig(10.5, 4, true)).toBe('10.50');
    expect(formatSig(null)).toBe('–');
  });
});

describe('formatWithError()', () => {
  it('formatWithError() quotes the error to two significant digits and the value to the same place (JCGM 100:2008 §7.2.6)', () => {
    expect(formatWithError(10.4912, 0.2345)).toBe('10.49 ± 0.23');
    expect(formatWithError(45.0213, 0.21)).toBe('45.02 ± 0.21');
    expect(formatWithError(13361, 812)).toBe('13360 ± 810');
    expect(formatWithError(5.8812e10, 1.234e9)).toBe('(5.88 ± 0.12)×10¹⁰');
    expect(formatWithError(1.5, null)).toBe('1.5');
  });

  it('digitsForError() counts the digits an error supports', () => {
    expect(digitsForError(10.4912, 0.2345)).toBe(4);
    expect(digitsForError(-0.4788, 0.0045)).toBe(4); // −0.4788 ± 0.0045
    expect(digitsForError(1, null)).toBe(4);
  });
});

describe('formatRange()', () => {
  it('formatRange() gives as many digits as the ends of the range need to differ', () => {
    // "13360; 95 % range 13400 … 13400" is what the app must not print
    expect(formatRange(13360, 13352, 13368)).toEqual({ value: '13360', lo: '13352', hi: '13368' });
    expect(formatRange(2.0e9, 1.5e9, 2.6e9)).toEqual({
      value: '2.00×10⁹',
      lo: '1.50×10⁹',
      hi: '2.60×10⁹',
    });
  });
});

describe('plainNumber(), signedDecades(), unifyExponents()', () => {
  it('plainNumber() is spreadsheet text; signedDecades() carries the sign; unifyExponents() rewrites e-notation', () => {
    expect(plainNumber(5.8812e10, 3)).toBe('5.88e+10');
    expect(plainNumber(10.5, 4)).toBe('10.50');
    expect(signedDecades(-0.05)).toBe('−0.050');
    expect(signedDecades(0.7767)).toBe('+0.777');
    expect(unifyExponents('reduced time 5.88e+10 s lies outside')).toBe(
      'reduced time 5.88×10¹⁰ s lies outside',
    );
    expect(unifyExponents('T05 at 1e-3 rad/s; file t2e5.csv')).toBe(
      'T05 at 1×10⁻³ rad/s; file t2e5.csv',
    );
  });
});
