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

  it('scanTable() reads plain cells in place exactly as Number() reads their text', () => {
    // seeded cells of every plain shape: signs, leading and trailing zeros, separators, exponents,
    // 1–20 digits; Number() (ECMA-262 StringToNumber, correctly rounded) is the reference
    let s = 12345;
    const rand = (): number => {
      s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
      return s / 4294967296;
    };
    const digits = (n: number): string =>
      Array.from({ length: n }, () => String(Math.floor(rand() * 10))).join('');
    const cells: string[] = ['0', '-0', '+0', '1.', '.5', '-.5e1', '0.000123', '60002.0', '1e22'];
    cells.push(
      '123456789012345',
      '1234567890123456',
      '9007199254740993',
      '1e-22',
      '1e23',
      '5e-324',
    );
    for (let k = 0; k < 3000; k++) {
      const sign = ['', '-', '+'][Math.floor(rand() * 3)];
      const int = digits(Math.floor(rand() * 12));
      const frac = rand() < 0.6 ? `.${digits(Math.floor(rand() * 10))}` : '';
      const exp =
        rand() < 0.3
          ? `${rand() < 0.5 ? 'e' : 'E'}${['', '-', '+'][Math.floor(rand() * 3)]}${digits(1 + Math.floor(rand() * 2))}`
          : '';
      const cell = `${sign}${int}${frac}${exp}`;
      if (Number.isFinite(Number(cell)) && cell !== '' && cell !== sign) cells.push(cell);
    }
    for (const decimalComma of [false, true]) {
      const text = cells
        .map((c) => (decimalComma ? `${c.replace('.', ',')};1` : `${c},1`))
        .join('\n');
      const t = scanTable(
        text,
        0,
        1,
        spec({ delimiter: decimalComma ? 'semicolon' : 'comma', decimalComma }),
      );
      const read = [...t.values[0]!.subarray(0, t.rows)];
      expect(read.map((v) => (Object.is(v, -0) ? 'neg0' : v))).toEqual(
        cells.map((c) => (Object.is(Number(c), -0) ? 'neg0' : Number(c))),
      );
    }
  });
});
