import { describe, expect, it } from 'vitest';
import { importFiles, ImportError } from '../../../core/io';
import {
  expandWorkbooks,
  isWorkbookName,
  sheetRowsToText,
  splitSheetName,
  workbookToSourceFiles,
} from '../../../core/io/workbook';
import { temperatureFromFileName } from '../../../core/io/file-name';
import {
  buildDemoSample,
  demoScenario,
  sheetRowsFromText,
  writeWorkbook,
} from '../../../core/synthetic';
import type { WorkbookCell } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';

/** The seeded seal-dma demo (eleven semicolon files with decimal commas), as text files. */
function sealTextFiles(): { name: string; text: string }[] {
  return buildDemoSample(demoScenario('seal-dma')).written.files.map((f) => ({
    name: f.path,
    text: f.content,
  }));
}

/** The same files as one workbook: one sheet per file, the sheet named by its temperature only. */
function sealWorkbook(): Uint8Array {
  return writeWorkbook(
    sealTextFiles().map((f) => {
      const t = temperatureFromFileName(f.name);
      if (!t) throw new Error(`no temperature in ${f.name}`);
      // The "# Temperature: 40 °C" line is left in even sheets and taken out of odd ones, so
      // both sources of the temperature (metadata, sheet name) are read.
      const odd = Math.round(t.temperatureK - 273.15) % 20 !== 0;
      const rows = sheetRowsFromText(f.text, ';', true).map((r) =>
        odd && typeof r[0] === 'string' && /^# Temperature:/.test(r[0]) ? [] : r,
      );
      return { name: `${Math.round(t.temperatureK - 273.15)} °C`, rows };
    }),
  );
}

describe('workbookToSourceFiles()', () => {
  it('workbookToSourceFiles() gives one table per sheet, named "book.xlsx › sheet", row k = row k', async () => {
    const book = writeWorkbook([
      {
        name: 'Run A',
        rows: [
          ['f (Hz)', "G' (Pa)"],
          [1, 1000],
          [null, null],
          [2, 2000.5],
        ],
      },
      { name: 'Empty', rows: [] },
      { name: 'B & C', rows: [['x\ty'], [1e-7, 'text']] },
    ]);
    const files = await workbookToSourceFiles('lab/run.xlsx', book);
    expect(files.map((f) => f.name)).toEqual(['lab/run.xlsx › Run A', 'lab/run.xlsx › B & C']);
    expect(files[0].text.split('\n')).toEqual(["f (Hz)\tG' (Pa)", '1\t1000', '', '2\t2000.5']);
    // A tab inside a text cell would split the row: it becomes a space.
    expect(files[1].text.split('\n')).toEqual(['x y', '1e-7\ttext']);
  });

  it('workbookToSourceFiles() keeps numbers as the workbook stores them (no rounding)', async () => {
    const values = [1.6398e3, 0.1, 123456789.123456, 2.5e-12, -0.00031];
    const rows: WorkbookCell[][] = [['x'], ...values.map((v) => [v])];
    const [f] = await workbookToSourceFiles('n.xlsx', writeWorkbook([{ name: 'n', rows }]));
    expect(f.text.split('\n').slice(1).map(Number)).toEqual(values);
  });

  it('workbookToSourceFiles() refuses bytes that are not a workbook, naming the file', async () => {
    const text = new TextEncoder().encode('T,f,G\n1,2,3\n');
    await expect(workbookToSourceFiles('fake.xlsx', text)).rejects.toThrow(
      /^File "fake\.xlsx": this is not a readable \.xlsx workbook/,
    );
    await expect(workbookToSourceFiles('fake.xlsx', new Uint8Array())).rejects.toBeInstanceOf(
      ImportError,
    );
    await expect(
      workbookToSourceFiles('e.xlsx', writeWorkbook([{ name: 'S', rows: [] }])),
    ).rejects.toThrow(/no sheet with any cell/);
  });

  it('workbookToSourceFiles() throws at once for a wrong call', async () => {
    await expect(workbookToSourceFiles('', new Uint8Array([1]))).rejects.toThrow(/fileName/);
    await expect(workbookToSourceFiles('a.xlsx', 'text' as unknown as Uint8Array)).rejects.toThrow(
      /bytes/,
    );
  });
});

describe('importFiles() on workbook sheets', () => {
  it('importFiles() reads one sheet per isotherm exactly as the same data in text files', async () => {
    const sheets = await workbookToSourceFiles('seal.xlsx', sealWorkbook());
    expect(sheets).toHaveLength(11);
    const fromBook = importFiles(sheets);
    const fromText = importFiles(sealTextFiles());
    expect(fromBook.dataset.isotherms.map((i) => i.temperatureK)).toEqual(
      fromText.dataset.isotherms.map((i) => i.temperatureK),
    );
    for (const [k, iso] of fromBook.dataset.isotherms.entries()) {
      const ref = fromText.dataset.isotherms[k];
      expect(iso.x).toEqual(ref.x);
      expect(iso.quantities.storageModulus).toEqual(ref.quantities.storageModulus);
      expect(iso.quantities.lossModulus).toEqual(ref.quantities.lossModulus);
    }
    expect(fromBook.dataset.deformation).toBe('tension');
    expect(fromBook.files[0].file).toMatch(/^seal\.xlsx › /);
  });

  it('importFiles() takes the temperature from the sheet name when the sheet has none', async () => {
    const book = writeWorkbook([
      {
        name: '40.5 °C',
        rows: [
          ['f (Hz)', "E' (MPa)", "E'' (MPa)"],
          [1, 10, 1],
          [10, 12, 1.5],
        ],
      },
      {
        name: 'T=-20C',
        rows: [
          ['f (Hz)', "E' (MPa)", "E'' (MPa)"],
          [1, 100, 9],
          [10, 120, 9.5],
        ],
      },
    ]);
    const r = importFiles(await workbookToSourceFiles('pad.xlsx', book));
    // 0 °C = 273.15 K (SI Brochure, BIPM 2019).
    const [cold, warm] = r.dataset.isotherms.map((i) => i.temperatureK);
    expectAbsClose(cold, 253.15, 1e-9, 'sheet "T=-20C"');
    expectAbsClose(warm, 313.65, 1e-9, 'sheet "40.5 °C"');
    expect(r.dataset.name).toBe('pad');
  });

  it('importFiles() reads one long sheet with a temperature column into its isotherms', async () => {
    const rows: WorkbookCell[][] = [
      ['sample', 'PX-9 melt (invented)'],
      ['Temperature (°C)', 'Angular frequency (rad/s)', "G' (Pa)", "G'' (Pa)"],
    ];
    for (const t of [150, 170, 190])
      for (const w of [1, 10, 100]) rows.push([t, w, 1e4 * w ** 0.5 * (200 / t), 5e3 * w ** 0.7]);
    const [sheet] = await workbookToSourceFiles(
      'melt.xlsx',
      writeWorkbook([{ name: 'Sheet1', rows }]),
    );
    const r = importFiles([sheet]);
    expect(r.dataset.isotherms).toHaveLength(3);
    expect(r.files[0].layout).toBe('long');
    expect(r.dataset.name).toBe('PX-9 melt (invented)');
  });

  it('importFiles() names the sheet, row and column of a bad cell', async () => {
    const book = writeWorkbook([
      {
        name: '40 °C',
        rows: [
          ['f (Hz)', "E' (MPa)", "E'' (MPa)"],
          [1, 10, 1],
          [2, 11, 1.2],
          [5, 'n/a', 1.3],
          [10, 12, 1.5],
        ],
      },
    ]);
    const r = importFiles(await workbookToSourceFiles('seal.xlsx', book));
    const w = r.warnings.find((x) => x.message.includes('n/a'));
    expect(w).toMatchObject({ file: 'seal.xlsx › 40 °C', row: 4, column: 2 });
  });
});

describe('sheet names', () => {
  it('splitSheetName() and isWorkbookName() tell sheets of .xlsx workbooks from files', () => {
    expect(splitSheetName('d/seal.xlsx › 40 °C')).toEqual({
      workbook: 'd/seal.xlsx',
      sheet: '40 °C',
    });
    expect(splitSheetName('seal › 40C.csv')).toBeUndefined();
    expect(isWorkbookName('A.XLSX')).toBe(true);
    expect(isWorkbookName('a.xls')).toBe(false);
    expect(sheetRowsToText([[1, null, 'a'], [], [true, null]])).toBe('1\t\ta\n\ntrue');
  });

  it('expandWorkbooks() puts the sheets in place of their workbook, text files pass', async () => {
    const book = writeWorkbook([
      { name: 'a', rows: [['x']] },
      { name: 'b', rows: [['y']] },
    ]);
    const out = await expandWorkbooks([
      { name: 'one.csv', text: 'T\n1' },
      { name: 'w.xlsx', bytes: book },
      { name: 'two.csv', text: 'T\n2' },
    ]);
    expect(out.map((f) => f.name)).toEqual(['one.csv', 'w.xlsx › a', 'w.xlsx › b', 'two.csv']);
  });
});
