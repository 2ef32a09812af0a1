/**
 * Writes a minimal .xlsx workbook (Office Open XML, ECMA-376 Part 1: SpreadsheetML in a zip):
 * one worksheet per sheet, numbers as numeric cells, text as inline strings. Used by the sample
 * generator and the tests, which build their workbooks from seeded data at run time instead of
 * keeping binary files; it writes only what a reader needs (no styles, no shared strings).
 */
import { strToU8, zipSync } from 'fflate';

export type WorkbookCell = string | number | null;

export interface WorkbookSheetInput {
  name: string;
  rows: WorkbookCell[][];
}

const xml = (s: string): string =>
  s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

/** "A", "B", … "Z", "AA" … for a 0-based column index. */
export function columnLetters(index: number): string {
  let n = index + 1;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

function sheetXml(rows: WorkbookCell[][]): string {
  const body = rows
    .map((row, r) => {
      const cells = row
        .map((v, c) => {
          if (v === null || v === '') return '';
          const ref = `${columnLetters(c)}${r + 1}`;
          if (typeof v === 'number') {
            if (!Number.isFinite(v)) throw new RangeError(`cell ${ref}: ${v} is not finite`);
            return `<c r="${ref}"><v>${v}</v></c>`;
          }
          return `<c r="${ref}" t="inlineStr"><is><t xml:space="preserve">${xml(v)}</t></is></c>`;
        })
        .join('');
      return `<row r="${r + 1}">${cells}</row>`;
    })
    .join('');
  return (
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>' +
    '<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main">' +
    `<sheetData>${body}</sheetData></worksheet>`
  );
}

/** The workbook's bytes. Sheet names must be unique, 1–31 characters, without []:*?/\ . */
export function writeWorkbook(sheets: WorkbookSheetInput[]): Uint8Array {
  if (!Array.isArray(sheets) || sheets.length === 0) {
    throw new RangeError('writeWorkbook(sheets): give at least one sheet');
  }
  const seen = new Set<string>();
  for (const s of sheets) {
    if (!/^[^[\]:*?/\\]{1,31}$/.test(s.name) || seen.has(s.name.toLowerCase())) {
      throw new RangeError(`writeWorkbook(sheets): sheet name "${s.name}" is not allowed`);
    }
    seen.add(s.name.toLowerCase());
  }
  const ns = 'http://schemas.openxmlformats.org';
  const files: Record<string, Uint8Array> = {
    '[Content_Types].xml': strToU8(
      '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>' +
        `<Types xmlns="${ns}/package/2006/content-types">` +
        `<Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/>` +
        `<Default Extension="xml" ContentType="application/xml"/>` +
        `<Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>` +
        sheets
          .map(
            (_, i) =>
              `<Override PartName="/xl/worksheets/sheet${i + 1}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>`,
          )
          .join('') +
        '</Types>',
    ),
    '_rels/.rels': strToU8(
      '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>' +
        `<Relationships xmlns="${ns}/package/2006/relationships">` +
        `<Relationship Id="rId1" Type="${ns}/officeDocument/2006/relationships/officeDocument" Target="xl/workbook.xml"/>` +
        '</Relationships>',
    ),
    'xl/workbook.xml': strToU8(
      '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>' +
        `<workbook xmlns="${ns}/spreadsheetml/2006/main" xmlns:r="${ns}/officeDocument/2006/relationships"><sheets>` +
        sheets
          .map((s, i) => `<sheet name="${xml(s.name)}" sheetId="${i + 1}" r:id="rId${i + 1}"/>`)
          .join('') +
        '</sheets></workbook>',
    ),
    'xl/_rels/workbook.xml.rels': strToU8(
      '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>' +
        `<Relationships xmlns="${ns}/package/2006/relationships">` +
        sheets
          .map(
            (_, i) =>
              `<Relationship Id="rId${i + 1}" Type="${ns}/officeDocument/2006/relationships/worksheet" Target="worksheets/sheet${i + 1}.xml"/>`,
          )
          .join('') +
        '</Relationships>',
    ),
  };
  sheets.forEach((s, i) => {
    files[`xl/worksheets/sheet${i + 1}.xml`] = strToU8(sheetXml(s.rows));
  });
  // A fixed time stamp, so the same sheets always give the same bytes.
  return zipSync(files, { level: 6, mtime: new Date('2020-01-01T00:00:00Z') });
}

/**
 * A delimited text table as sheet rows, as a spreadsheet would hold it after opening the file:
 * cells that are numbers (decimal comma allowed when `decimalComma`) become numeric cells, the
 * rest text. Line k becomes row k, so row numbers in messages stay those of the text.
 */
export function sheetRowsFromText(
  text: string,
  delimiter: string,
  decimalComma = false,
): WorkbookCell[][] {
  return text
    .replace(/\r\n?/g, '\n')
    .replace(/\n$/, '')
    .split('\n')
    .map((line) => {
      if (/^\s*[#%!]/.test(line)) return [line];
      return line.split(delimiter).map((cell) => {
        const t = cell.trim();
        if (t === '') return null;
        const s = decimalComma ? t.replace(',', '.') : t;
        return /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i.test(s) ? Number(s) : t;
      });
    });
}
