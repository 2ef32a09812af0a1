import { describe, it, expect } from 'vitest';
import { cleanText, headLines, isBlank, isComment } from '../../../core/io/lines';

describe('cleanText()', () => {
  it('cleanText() drops a byte-order mark and turns CR-only line ends into LF', () => {
    expect(cleanText('\uFEFFa,b')).toBe('a,b');
    expect(cleanText('a\rb\r')).toBe('a\nb\n');
    expect(cleanText('a\r\nb')).toBe('a\r\nb');
  });
});

describe('headLines()', () => {
  it('headLines() numbers lines from 1, drops CR and stops at maxLines', () => {
    const lines = headLines('x\r\ny\n\nz', 3);
    expect(lines.map((l) => [l.text, l.lineNo, l.start])).toEqual([
      ['x', 1, 0],
      ['y', 2, 3],
      ['', 3, 5],
    ]);
  });

  it('headLines() cuts very long lines at maxChars', () => {
    const lines = headLines('a'.repeat(100), 5, 10);
    expect(lines[0].text).toHaveLength(10);
  });
});

describe('isBlank() and isComment()', () => {
  it('isBlank() accepts whitespace and lines of separators only', () => {
    expect(isBlank('  \t')).toBe(true);
    expect(isBlank(';;;')).toBe(true);
    expect(isBlank(',, ,')).toBe(true);
    expect(isBlank('1,,')).toBe(false);
  });

  it('isComment() accepts #, %, ! and // lines', () => {
    for (const l of ['# a', '  % b', '!c', '// d']) expect(isComment(l), l).toBe(true);
    expect(isComment('T (°C)')).toBe(false);
  });
});
