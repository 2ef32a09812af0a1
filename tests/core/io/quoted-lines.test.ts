import { describe, it, expect } from 'vitest';
import { QuotedLines } from '../../../core/io/quoted-lines';

function cellsOfAll(text: string): string[][] {
  const q = new QuotedLines(text, 'comma');
  const out: string[][] = [];
  let pos = 0;
  let lineNo = 1;
  while (pos < text.length) {
    let end = text.indexOf('\n', pos);
    if (end < 0) end = text.length;
    const stop = text.charCodeAt(end - 1) === 13 ? end - 1 : end;
    out.push(q.cells(pos, stop, lineNo).map((c) => c.trim()));
    pos = end + 1;
    lineNo++;
  }
  return out;
}

describe('QuotedLines', () => {
  it('QuotedLines.cells() gives the cells of each line, with LF or CRLF', () => {
    expect(cellsOfAll('"1","a,b"\n"2",3\n')).toEqual([
      ['1', 'a,b'],
      ['2', '3'],
    ]);
    expect(cellsOfAll('"1","2"\r\n"3","4"')).toEqual([
      ['1', '2'],
      ['3', '4'],
    ]);
  });

  it('QuotedLines.cells() falls back to one line at a time when a quote spans lines', () => {
    const rows = cellsOfAll('"1","2"\n"3\n4","5"\n"6","7"');
    expect(rows[0]).toEqual(['1', '2']);
    expect(rows[3]).toEqual(['6', '7']);
  });
});
