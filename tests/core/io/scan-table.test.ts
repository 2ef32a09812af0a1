import { describe, it, expect } from 'vitest';
import { scanTable } from '../../../core/io/scan-table';
import type { ScanSpec } from '../../../core/io/scan-table';

const spec = (o: Partial<ScanSpec> = {}): ScanSpec => ({
  delimiter: 'comma',
  decimalComma: false,
  wanted: [true, true],
  maxProblems: 100,
  perCell: false,
  ...o,
});

describe('scanTable()', () => {
  it('scanTable() reads numbers with their line numbers, skipping blank and comment lines', () => {
    const t = scanTable('1,2\r\n\n# c\n3,4\n', 0, 1, spec());
    expect(t.rows).toBe(2);
    expect([...t.line.subarray(0, 2)]).toEqual([1, 4]);
    expect([...t.values[1]!.subarray(0, 2)]).toEqual([2, 4]);
  });

  it('scanTable() starts at an offset and reads only wanted columns', () => {
    const text = 'header\n1,2,3\n';
    const t = scanTable(text, 7, 2, spec({ wanted: [false, false, true] }));
    expect(t.values[0]).toBeNull();
    expect(t.values[2]![0]).toBe(3);
    expect(t.line[0]).toBe(2);
  });

  it('scanTable() reads quoted lines through papaparse, decimal commas and runs of spaces', () => {
    expect(scanTable('"1.5","2"\n', 0, 1, spec()).values[0]![0]).toBe(1.5);
    expect(
      scanTable('1,5;2\n', 0, 1, spec({ delimiter: 'semicolon', decimalComma: true }))
        .values[0]![0],
    ).toBe(1.5);
    const s = scanTable('  1   2 \n3\t4\n', 0, 1, spec({ delimiter: 'spaces' }));
    expect([...s.values[0]!.subarray(0, 2), ...s.values[1]!.subarray(0, 2)]).toEqual([1, 3, 2, 4]);
  });

  it('scanTable() keeps line numbers exact around quotes spanning lines', () => {
    const t = scanTable('"1","2"\n"3\n4","5"\n"6","7"\n', 0, 1, spec());
    const rowOf6 = [...t.values[0]!.subarray(0, t.rows)].indexOf(6);
    expect(t.line[rowOf6]).toBe(4);
    expect(t.values[1]![rowOf6]).toBe(7);
    expect(t.values[0]![0]).toBe(1);
  });

  it('scanTable() reads decimal commas on the fast path strictly', () => {
    const t = scanTable(
      '1,5;2\n1,2,3;4\n',
      0,
      1,
      spec({ delimiter: 'semicolon', decimalComma: true }),
    );
    expect(t.values[0]![0]).toBe(1.5);
    expect(t.problems).toEqual([
      expect.objectContaining({ line: 2, column: 1, kind: 'nonNumeric' }),
    ]);
  });

  it('scanTable() marks a bad row once in long tables and every bad cell in wide ones', () => {
    const long = scanTable('x,y\n1,2\n', 0, 1, spec());
    expect(long.problems).toEqual([{ row: 0, line: 1, column: 1, kind: 'nonNumeric', text: 'x' }]);
    expect(Number.isNaN(long.values[1]![0])).toBe(true);
    const wide = scanTable('x,\n', 0, 1, spec({ perCell: true }));
    expect(wide.problems.map((p) => p.kind)).toEqual(['nonNumeric', 'empty']);
  });

  it('scanTable() counts problems beyond maxProblems', () => {
    const t = scanTable('a,1\nb,2\nc,3\n', 0, 1, spec({ maxProblems: 1 }));
    expect(t.problems).toHaveLength(1);
    expect(t.problemCount).toBe(3);
  });

  it('scanTable() keeps comment lines and text rows of the body as notes', () => {
    const t = scanTable('1,2\n# Temperature: 60 C\nf,G\n3,4\n', 0, 1, spec());
    expect(t.notes).toEqual([
      { row: 1, line: 2, text: '# Temperature: 60 C', comment: true },
      { row: 1, line: 3, text: 'f,G', comment: false },
    ]);
  });

  it('scanTable() reports missing cells of short rows', () => {
    const t = scanTable('1\n', 0, 1, spec());
    expect(t.problems[0]).toMatchObject({ column: 2, kind: 'missing' });
  });
});
