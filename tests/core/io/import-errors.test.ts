import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { ImportError, importFiles } from '../../../core/io';
import type { ImportErrorCode, ImportOptions } from '../../../core/io';

const fixture = (name: string) => ({
  name,
  text: readFileSync(fileURLToPath(new URL(`../../fixtures/io/${name}`, import.meta.url)), 'utf8'),
});

/** Runs importFiles and returns the ImportError it must throw. */
function importError(
  files: { name: string; text: string }[],
  options?: ImportOptions,
): ImportError {
  try {
    importFiles(files, options);
  } catch (e) {
    if (e instanceof ImportError) return e;
    throw e;
  }
  throw new Error('importFiles() did not throw');
}

function expectError(
  e: ImportError,
  code: ImportErrorCode,
  file: string,
  row: number,
  column: number,
  message: RegExp,
): void {
  expect({ code: e.code, file: e.file, row: e.row, column: e.column }).toEqual({
    code,
    file,
    row,
    column,
  });
  expect(e.message).toMatch(message);
  if (file) expect(e.message).toContain(`"${file}"`);
  if (row) expect(e.message).toContain(`row ${row}`);
  if (column) expect(e.message).toContain(`column ${column}`);
}

describe('importFiles() — fatal problems', () => {
  it('importFiles() names an empty file', () => {
    expectError(
      importError([fixture('bad/empty.csv')]),
      'emptyFile',
      'bad/empty.csv',
      0,
      0,
      /empty/,
    );
    expectError(
      importError([{ name: 'w.csv', text: ' \r\n\t\n' }]),
      'emptyFile',
      'w.csv',
      0,
      0,
      /empty/,
    );
    expectError(
      importError([{ name: 'b.csv', text: '\uFEFF' }]),
      'emptyFile',
      'b.csv',
      0,
      0,
      /empty/,
    );
  });

  it('importFiles() names a file without numeric data', () => {
    expectError(
      importError([fixture('bad/comments-only.csv')]),
      'noNumericData',
      'bad/comments-only.csv',
      0,
      0,
      /no table of numbers/,
    );
    expectError(
      importError([{ name: 't.txt', text: 'just some words\nand more words\n' }]),
      'noNumericData',
      't.txt',
      0,
      0,
      /no table of numbers/,
    );
  });

  it('importFiles() names a file whose rows all fail', () => {
    const text = "T (°C),f (Hz),G' (Pa)\n40,0,1\n40,-1,2\n";
    expectError(
      importError([{ name: 'z.csv', text }]),
      'noNumericData',
      'z.csv',
      2,
      2,
      /none of the 2 table rows.*not positive/,
    );
  });

  it('importFiles() names a table without header row', () => {
    expectError(
      importError([{ name: 'h.csv', text: '40,0.1,1\n40,1,2\n' }]),
      'noHeader',
      'h.csv',
      1,
      0,
      /no header row/,
    );
  });

  it('importFiles() names a file without any temperature', () => {
    expectError(
      importError([fixture('bad/no-temperature.csv')]),
      'noTemperature',
      'bad/no-temperature.csv',
      0,
      0,
      /no temperature found.*file name/,
    );
  });

  it('importFiles() names the column of an unknown unit and says how to map it', () => {
    const e = importError([fixture('bad/unknown-unit.csv')]);
    expectError(
      e,
      'unknownUnit',
      'bad/unknown-unit.csv',
      1,
      3,
      /"kpsi" is not known.*MPa.*map the column/,
    );
  });

  it('importFiles() names a unit of the wrong kind, from the units row', () => {
    const text = "T,f,G'\n°C,Hz,Hz\n40,0.1,1\n40,1,2\n";
    expectError(
      importError([{ name: 'u.csv', text }]),
      'unknownUnit',
      'u.csv',
      2,
      3,
      /frequency unit where a modulus/,
    );
  });

  it('importFiles() names missing essential columns', () => {
    expectError(
      importError([{ name: 'q.csv', text: 'T (°C),f (Hz),Torque (mNm)\n40,1,2\n40,2,3\n' }]),
      'missingColumn',
      'q.csv',
      1,
      0,
      /no measured quantity/,
    );
    expectError(
      importError([{ name: 'x.csv', text: "T (°C),G' (Pa)\n40,1\n40,2\n" }]),
      'missingColumn',
      'x.csv',
      1,
      0,
      /frequency/,
    );
    expectError(
      importError([{ name: 'r.csv', text: 'T (°C),G(t) (Pa)\n40,1\n40,2\n' }]),
      'missingColumn',
      'r.csv',
      1,
      0,
      /time/,
    );
    expectError(
      importError([{ name: 'w.csv', text: 'f (Hz),20,40\n1,2,3\n2,3,4\n' }]),
      'missingColumn',
      'w.csv',
      1,
      2,
      /quantity: E'/,
    );
  });

  it('importFiles() refuses shear and tension quantities in one file', () => {
    const text = "T (°C),f (Hz),G' (Pa),E'' (Pa)\n40,1,2,3\n40,2,3,4\n";
    expectError(
      importError([{ name: 'm.csv', text }]),
      'conflict',
      'm.csv',
      1,
      4,
      /shear quantity.*tensile/,
    );
  });

  it('importFiles() refuses files of different test kinds or modes in one sample', () => {
    const osc = { name: 'a_40C.csv', text: "f (Hz),G' (Pa)\n1,2\n2,3\n" };
    const rel = { name: 'b_40C.csv', text: 't (s),G(t) (Pa)\n1,2\n2,3\n' };
    const ten = { name: 'c_40C.csv', text: "f (Hz),E' (Pa)\n1,2\n2,3\n" };
    expectError(
      importError([osc, rel]),
      'conflict',
      'b_40C.csv',
      1,
      0,
      /relaxation data but "a_40C.csv" holds oscillatory/,
    );
    expectError(
      importError([osc, ten]),
      'conflict',
      'c_40C.csv',
      1,
      0,
      /tension data but "a_40C.csv" holds shear/,
    );
  });

  it('importFiles() refuses binary files', () => {
    expectError(
      importError([{ name: 'p.xlsx', text: 'PK\u0003\u0004\u0000\u0000abc' }]),
      'notText',
      'p.xlsx',
      0,
      0,
      /not a text file/,
    );
  });

  it('importFiles() refuses an empty file list and a sample of single points', () => {
    expect(importError([]).code).toBe('badOption');
    const text = "T (°C),f (Hz),G' (Pa)\n40,1,2\n60,1,3\n";
    expect(importError([{ name: 's.csv', text }]).code).toBe('noIsotherms');
  });
});

describe('importFiles() — recoverable problems', () => {
  it('importFiles() skips bad rows with a warning naming file, row and column', () => {
    const r = importFiles([fixture('bad/bad-cells.csv')]);
    const f = 'bad/bad-cells.csv';
    expect(r.warnings).toEqual([
      {
        file: f,
        row: 3,
        column: 3,
        message: expect.stringMatching(/"abc" .*not a number; row skipped/),
      },
      {
        file: f,
        row: 4,
        column: 3,
        message: expect.stringMatching(/"NaN" .*not a measured value/),
      },
      { file: f, row: 5, column: 3, message: expect.stringMatching(/empty cell/) },
      { file: f, row: 6, column: 2, message: expect.stringMatching(/frequency 0 .*not positive/) },
      {
        file: f,
        row: 7,
        column: 3,
        message: expect.stringMatching(/storage modulus -5 .*not positive/),
      },
      { file: f, row: 9, column: 0, message: expect.stringMatching(/duplicated row .*row 8/) },
    ]);
    expect(r.files[0]).toMatchObject({ dataRows: 10, usedRows: 5 });
    expect(r.dataset.isotherms.map((i) => i.source.map((s) => s.row))).toEqual([
      [2, 8],
      [10, 11],
    ]);
  });

  it('importFiles() warns about short rows and same-x rows with other values', () => {
    const text = "T (°C),f (Hz),G' (Pa),G'' (Pa)\n40,1,2\n40,1,3,4\n40,1,5,6\n40,2,5,6\n";
    const r = importFiles([{ name: 's.csv', text }]);
    expect(r.warnings.map((w) => [w.row, w.column])).toEqual([
      [2, 4],
      [4, 0],
    ]);
    expect(r.warnings[0].message).toMatch(/row ends before/);
    expect(r.warnings[1].message).toMatch(/same frequency as s.csv row 3 .*kept s.csv row 3/);
  });

  it('importFiles() warns about non-positive tan δ, phase angles outside 0–90° and temperatures below 0 K', () => {
    const text =
      'T (K),f (Hz),tan δ,δ (°)\n-5,1,1,45\n300,1,0,45\n300,2,1,95\n300,3,1,45\n300,4,1,45\n';
    const r = importFiles([{ name: 'p.csv', text }], { deformation: 'shear' });
    expect(r.warnings.map((w) => [w.row, w.column])).toEqual([
      [2, 1],
      [3, 3],
      [4, 4],
    ]);
  });

  it('importFiles() warns about assumed units and an assumed deformation mode', () => {
    const text = 'T,f,Storage modulus\n40,1,2\n40,2,3\n';
    const r = importFiles([{ name: 'a.csv', text }]);
    expect(r.warnings.map((w) => w.message)).toEqual([
      expect.stringMatching(/"T" .*no unit; °C was assumed/),
      expect.stringMatching(/"f" .*no unit; Hz was assumed/),
      expect.stringMatching(/"Storage modulus" .*no unit; Pa was assumed/),
      expect.stringMatching(/shear was assumed/),
    ]);
    expect(r.dataset.deformation).toBe('shear');
    expect(
      importFiles([{ name: 'a.csv', text }], { deformation: 'tension' }).dataset.deformation,
    ).toBe('tension');
  });

  it('importFiles() lists at most maxWarningsPerFile warnings and counts the rest', () => {
    const rows = ["T (°C),f (Hz),G' (Pa)", '40,1,1', '40,2,2'];
    for (let i = 0; i < 50; i++) rows.push('40,3,x');
    const r = importFiles([{ name: 'many.csv', text: rows.join('\n') }], {
      maxWarningsPerFile: 10,
    });
    expect(r.warnings).toHaveLength(11);
    expect(r.warnings[10].message).toMatch(/^40 more problem rows/);
  });

  it('importFiles() skips blank lines, comment lines and repeated headers inside the table quietly', () => {
    const text = "T (°C),f (Hz),G' (Pa)\n\n40,1,1\n# pause\n,,\nT (°C),f (Hz),G' (Pa)\n40,2,2\n";
    const r = importFiles([{ name: 'g.csv', text }]);
    expect(r.dataset.isotherms[0].source.map((s) => s.row)).toEqual([3, 7]);
    expect(r.warnings).toEqual([]); // the repeated header row is skipped quietly
  });

  it('importFiles() still warns about other text rows inside the table', () => {
    const text = "T (°C),f (Hz),G' (Pa)\n40,1,1\npump stopped,,\n40,2,2\n";
    const r = importFiles([{ name: 't.csv', text }]);
    expect(r.warnings).toEqual([expect.objectContaining({ row: 3, column: 1 })]);
  });

  it('importFiles() reads old Mac line ends (CR only)', () => {
    const r = importFiles([{ name: 'cr.csv', text: "T (°C),f (Hz),G' (Pa)\r40,1,1\r40,2,2\r" }]);
    expect(r.dataset.isotherms[0].source.map((s) => s.row)).toEqual([2, 3]);
  });
});
