import { describe, expect, it } from 'vitest';
import { cellText, toTsv } from '../../../app/renderer/src/tables/tsv';

describe('toTsv()', () => {
  it('toTsv() writes one line per row, cells separated by tabs, full precision', () => {
    expect(
      toTsv(
        ['T (°C)', 'log10 aT'],
        [
          [150, -0.123456789],
          [160, null],
        ],
      ),
    ).toBe('T (°C)\tlog10 aT\n150\t-0.123456789\n160\t\n');
  });

  it('cellText() keeps the grid intact: tabs and line breaks in a cell become spaces, NaN empty', () => {
    expect(cellText('a\tb\nc')).toBe('a b c');
    expect(cellText(Number.NaN)).toBe('');
    expect(cellText(undefined)).toBe('');
  });
});
