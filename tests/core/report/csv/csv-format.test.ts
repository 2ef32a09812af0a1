import { describe, it, expect } from 'vitest';
import { csvCell, csvDocument, csvNumber } from '../../../../core/report/csv/csv-format';

describe('csvNumber()', () => {
  it('csvNumber() writes up to 10 significant digits and blanks for missing values', () => {
    expect(csvNumber(1 / 3)).toBe('0.3333333333');
    expect(csvNumber(1.5e-12)).toBe('1.5e-12');
    expect(csvNumber(190.00000000000003)).toBe('190');
    expect(csvNumber(null)).toBe('');
    expect(csvNumber(NaN)).toBe('');
  });
});

describe('csvCell()', () => {
  it('csvCell() quotes cells with commas, quotes and line breaks (RFC 4180)', () => {
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell('two\nlines')).toBe('"two\nlines"');
    expect(csvCell('plain')).toBe('plain');
  });
});

describe('csvDocument()', () => {
  it('csvDocument() puts # comments first, then the header, one line per row', () => {
    const text = csvDocument(['first', '# second\nline'], ['a', 'b'], [['1', '2']]);
    expect(text).toBe('# first\n# second line\na,b\n1,2\n');
  });
});
