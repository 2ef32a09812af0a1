import { describe, expect, it } from 'vitest';
import { cellText, toTsv } from '../../../app/renderer/src/tables/tsv';

describe('toTsv()', () => {
  it('toTsv() writes one line per row, cells separated by tabs, numbers to their precision', () => {
    expect(
      toTsv(
        ['T (°C)', 'log10 aT', 'G0 (Pa)'],
        [
          [150, { value: -0.123456789, digits: 3 }, { value: 5.8812345e10, digits: 3 }],
          [160, null, { value: 10.5, digits: 4 }],
        ],
      ),
    ).toBe('T (°C)\tlog10 aT\tG0 (Pa)\n150.0\t-0.123\t5.88e+10\n160.0\t\t10.50\n');
  });

  it('cellText() keeps the grid intact: tabs and line breaks in a cell become spaces, NaN empty', () => {
    expect(cellText('a\tb\nc')).toBe('a b c');
    expect(cellText(Number.NaN)).toBe('');
    expect(cellText(undefined)).toBe('');
  });
});
