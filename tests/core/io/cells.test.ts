import { describe, it, expect } from 'vitest';
import {
  cellProblem,
  parseCell,
  splitCells,
  splitHeaderOnSpaces,
  splitOnSpaces,
} from '../../../core/io/cells';

describe('parseCell()', () => {
  it('parseCell() reads plain, signed, exponent and padded numbers', () => {
    expect(parseCell('1.5', false)).toBe(1.5);
    expect(parseCell(' -2e5 ', false)).toBe(-2e5);
    expect(parseCell('+.5', false)).toBe(0.5);
    expect(parseCell('3.', false)).toBe(3);
    expect(parseCell('1.6398E+03', false)).toBe(1639.8);
    expect(parseCell('−4', false)).toBe(-4);
  });

  it('parseCell() reads a decimal comma only when told to', () => {
    expect(parseCell('1,5', true)).toBe(1.5);
    expect(parseCell('2,3e5', true)).toBe(2.3e5);
    expect(parseCell('1,5', false)).toBeNaN();
  });

  it('parseCell() refuses what Number() would wrongly accept', () => {
    for (const s of [
      '',
      '  ',
      '0x10',
      'Infinity',
      '1e400',
      '12 abc',
      '1.2.3',
      'NaN',
      '1_000',
      '0b1',
    ]) {
      expect(parseCell(s, false), JSON.stringify(s)).toBeNaN();
    }
  });
});

describe('cellProblem()', () => {
  it('cellProblem() tells empty, NaN and text apart', () => {
    expect(cellProblem('  ')).toBe('empty');
    expect(cellProblem('NaN')).toBe('nan');
    expect(cellProblem('-nan')).toBe('nan');
    expect(cellProblem('abc')).toBe('nonNumeric');
  });
});

describe('splitCells()', () => {
  it('splitCells() splits on the delimiter and honours quotes through papaparse', () => {
    expect(splitCells('a,b,c', 'comma')).toEqual(['a', 'b', 'c']);
    expect(splitCells('"G\'\' (Pa)","x,y",3', 'comma')).toEqual(["G'' (Pa)", 'x,y', '3']);
    expect(splitCells('1,5;2,3', 'semicolon')).toEqual(['1,5', '2,3']);
    expect(splitCells('1\t2', 'tab')).toEqual(['1', '2']);
  });

  it('splitCells() splits runs of spaces and keeps quoted cells whole', () => {
    expect(splitOnSpaces('  1   2\t 3 ')).toEqual(['1', '2', '3']);
    expect(splitOnSpaces('"Storage modulus" 2')).toEqual(['Storage modulus', '2']);
    expect(splitCells('a  b', 'spaces')).toEqual(['a', 'b']);
  });
});

describe('splitHeaderOnSpaces()', () => {
  it('splitHeaderOnSpaces() keeps single spaces inside names when that matches the column count', () => {
    expect(splitHeaderOnSpaces('Storage modulus  Loss modulus  f Hz', 3)).toEqual([
      'Storage modulus',
      'Loss modulus',
      'f Hz',
    ]);
    expect(splitHeaderOnSpaces("T f G' G''", 4)).toEqual(['T', 'f', "G'", "G''"]);
  });
});

describe('parseCell() with Fortran exponents and thousands separators', () => {
  it('parseCell() reads Fortran D exponents', () => {
    expect(parseCell('1.0D+03', false)).toBe(1000);
    expect(parseCell('-2.5d-2', false)).toBe(-0.025);
    expect(parseCell('1,5D2', true)).toBe(150);
  });

  it('parseCell() removes thousands separators where they are unambiguous', () => {
    expect(parseCell('1,234,567.8', false)).toBe(1234567.8);
    expect(parseCell('1,234.5', false)).toBe(1234.5);
    expect(parseCell('1,234,567', false)).toBe(1234567);
    expect(parseCell('1.234.567,8', true)).toBe(1234567.8);
    expect(parseCell("1'234'567.8", false)).toBe(1234567.8);
    expect(parseCell('1 234,5', true)).toBe(1234.5);
    expect(parseCell('-1\u202f234.5', false)).toBe(-1234.5);
  });

  it('parseCell() refuses a single group that could be a decimal, and cellProblem() says why', () => {
    expect(parseCell('1,234', false)).toBeNaN();
    expect(cellProblem('1,234', false)).toBe('ambiguousGrouping');
    expect(parseCell('1.234', true)).toBeNaN();
    expect(cellProblem('1.234', true)).toBe('ambiguousGrouping');
    // Plain decimals are untouched.
    expect(parseCell('1.234', false)).toBe(1.234);
    expect(parseCell('1,234', true)).toBe(1.234);
    // Groups of other than three digits are not thousands separators.
    expect(parseCell('12,34,567.8', false)).toBeNaN();
  });
});
