/**
 * Spreadsheet workbooks (.xlsx): each sheet becomes one table text that the ordinary importer
 * reads, so every rule for text files — header spellings, units rows, metadata lines, layouts,
 * grouping — applies to sheets unchanged. A sheet is named like a file, "seal.xlsx › 40 °C", in
 * every message; its rows and columns are the sheet's own (row 5, column 3 is cell C5).
 *
 * The workbook is unpacked and its XML read by read-excel-file (universal build: fflate and a
 * plain-JavaScript XML parser; no Node built-ins, no eval), so this stays a pure function of the
 * workbook's bytes.
 */
import readXlsxFile from 'read-excel-file/universal';
import { ImportError } from './import-error';
import type { SourceFile } from './types';

/** Between a workbook's name and a sheet's name: "seal.xlsx › 40 °C". */
export const SHEET_SEPARATOR = ' › ';

/** True for names the importer reads as workbooks (.xlsx; not the older binary .xls). */
export function isWorkbookName(name: string): boolean {
  return /\.xlsx$/i.test(name);
}

/** "seal.xlsx › 40 °C" → { workbook: "seal.xlsx", sheet: "40 °C" }; undefined for plain files. */
export function splitSheetName(name: string): { workbook: string; sheet: string } | undefined {
  const at = name.indexOf(SHEET_SEPARATOR);
  if (at <= 0 || !isWorkbookName(name.slice(0, at))) return undefined;
  return { workbook: name.slice(0, at), sheet: name.slice(at + SHEET_SEPARATOR.length) };
}

type Cell = string | number | boolean | Date | null | object;

/**
 * One cell as table text. Numbers keep the text the workbook stores (read-excel-file hands it to
 * `parseNumber` unchanged), so nothing is rounded on the way. Tabs and line breaks inside a text
 * cell would split the table, so they become spaces.
 */
function cellText(v: Cell): string {
  if (v === null || v === undefined) return '';
  if (typeof v === 'string') return v.replace(/[\t\r\n]+/g, ' ');
  if (typeof v === 'number' || typeof v === 'boolean') return String(v);
  if (v instanceof Date) return Number.isNaN(v.getTime()) ? '' : v.toISOString();
  return '';
}

/** Rows of cells as tab-separated lines; line k is the sheet's row k. */
export function sheetRowsToText(rows: readonly (readonly Cell[])[]): string {
  return rows.map((r) => r.map(cellText).join('\t').replace(/\t+$/, '')).join('\n');
}

function reason(e: unknown): string {
  const m = e instanceof Error ? e.message : String(e);
  return m.length > 200 ? `${m.slice(0, 200)}…` : m;
}

/**
 * Reads a workbook's sheets as table texts, in the workbook's sheet order. Sheets without any
 * cell are left out; a workbook with no filled sheet, or bytes that are not a workbook, throw an
 * ImportError naming the file.
 */
export async function workbookToSourceFiles(
  fileName: string,
  bytes: Uint8Array,
): Promise<SourceFile[]> {
  if (typeof fileName !== 'string' || fileName === '') {
    throw new TypeError('workbookToSourceFiles(fileName, bytes): fileName must be a file name');
  }
  if (!(bytes instanceof Uint8Array)) {
    throw new TypeError('workbookToSourceFiles(fileName, bytes): bytes must be a Uint8Array');
  }
  if (bytes.length === 0) throw new ImportError('emptyFile', fileName, 0, 0, 'the file is empty.');
  // A copy: the reader wants an ArrayBuffer of exactly the workbook's bytes.
  const buffer = bytes.slice().buffer;
  let sheets: { sheet: string; data: Cell[][] }[];
  try {
    sheets = await readXlsxFile(buffer, { parseNumber: (s: string) => s, trim: true });
  } catch (e) {
    throw new ImportError(
      'notWorkbook',
      fileName,
      0,
      0,
      `this is not a readable .xlsx workbook (${reason(e)}). Save it again as .xlsx (Excel 2007 or ` +
        'newer) or export each sheet as CSV.',
    );
  }
  const out: SourceFile[] = [];
  for (const s of sheets) {
    const text = sheetRowsToText(s.data);
    if (text.trim() === '') continue;
    out.push({ name: `${fileName}${SHEET_SEPARATOR}${s.sheet}`, text });
  }
  if (out.length === 0) {
    throw new ImportError('emptyFile', fileName, 0, 0, 'the workbook has no sheet with any cell.');
  }
  return out;
}

/**
 * Replaces every workbook among `files` by its sheets (in place of the workbook, in order);
 * text files pass through. `bytes` is read only for workbooks.
 */
export async function expandWorkbooks(
  files: readonly (Omit<SourceFile, 'text'> & { text?: string; bytes?: Uint8Array })[],
): Promise<SourceFile[]> {
  const out: SourceFile[] = [];
  for (const f of files) {
    if (isWorkbookName(f.name) && f.bytes)
      for (const sheet of await workbookToSourceFiles(f.name, f.bytes)) out.push(sheet);
    else {
      // Text files pass through whole, with their decoded chunks (big files) if they have them.
      const { bytes: _bytes, ...file } = f;
      out.push({ ...file, text: f.text ?? '' });
    }
  }
  return out;
}
