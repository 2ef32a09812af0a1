import { describe, it, expect } from 'vitest';
import { ImportError, locate } from '../../../core/io/import-error';

describe('ImportError', () => {
  it('ImportError names file, row and column in its message and fields', () => {
    const e = new ImportError('unknownUnit', 'a.csv', 3, 2, 'unit "x" is not known.');
    expect(e).toBeInstanceOf(Error);
    expect(e.name).toBe('ImportError');
    expect(e.message).toBe('File "a.csv", row 3, column 2: unit "x" is not known.');
    expect([e.code, e.file, e.row, e.column]).toEqual(['unknownUnit', 'a.csv', 3, 2]);
  });

  it('locate() leaves out what does not apply', () => {
    expect(locate('a.csv', 0, 0)).toBe('File "a.csv": ');
    expect(locate('', 0, 0)).toBe('');
    expect(locate('a.csv', 0, 4)).toBe('File "a.csv", column 4: ');
  });
});
