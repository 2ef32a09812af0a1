import { cellProblem, parseCell } from './cells';
import { QuotedLines } from './quoted-lines';
import type { CellProblemKind } from './cells';
import type { DelimiterName } from './types';

/** The first cell of a row that gave no number. */
export interface CellProblem {
  /** Row index in the scanned table and its 1-based line in the file. */
  row: number;
  line: number;
  /** 1-based column. */
  column: number;
  kind: CellProblemKind;
  text: string;
}

/** Numbers of the wanted columns of every table row (blank and comment lines skipped). */
export interface ScannedTable {
  rows: number;
  /** 1-based line number of each row. */
  line: Int32Array;
  /** Per column (0-based): the values, NaN where a cell gave no number; null for unwanted columns. */
  values: (Float64Array | null)[];
  /** Per row: 1 when a wanted cell gave no number. */
  bad: Uint8Array;
  /** The first `maxProblems` problems in detail (one per row); `problemCount` counts all. */
  problems: CellProblem[];
  problemCount: number;
  /**
   * Comment lines and rows with letters that failed, inside the table (at most MAX_NOTES): they may
   * start a new block ("# Temperature: 60 °C", a repeated header). `row` is the index of the next
   * table row for a comment line, or of the failed row itself.
   */
  notes: TableNote[];
  /** 1-based line number just after the scanned text (where the next chunk starts). */
  nextLine: number;
}

/** A comment line or a text row met inside the table body. */
export interface TableNote {
  row: number;
  line: number;
  text: string;
  comment: boolean;
}

const MAX_NOTES = 10_000;

export interface ScanSpec {
  delimiter: DelimiterName;
  decimalComma: boolean;
  /** Which columns to read (0-based); the length is the table's column count. */
  wanted: boolean[];
  maxProblems: number;
  /**
   * false (long tables): a bad cell spoils the whole row, reported once. true (wide tables): each
   * bad cell is reported and only that cell is NaN.
   */
  perCell: boolean;
}

const COMMENT = 35; // '#'

/** Counts line breaks from `start` on, to size the column arrays once. */
function countLines(text: string, start: number): number {
  let n = 1;
  for (let i = text.indexOf('\n', start); i >= 0; i = text.indexOf('\n', i + 1)) n++;
  return n;
}

/** A cell of digits, signs, "." and exponents only: safe for Number() (empty/space handled apart). */
function isPlainNumberChar(c: number): boolean {
  return (c >= 48 && c <= 57) || c === 46 || c === 45 || c === 43 || c === 101 || c === 69;
}

/**
 * Reads the table body from `start` (offset of the first data row, whose line is `firstLine`).
 * Fast path: unquoted lines are cut at the delimiter by hand and plain numeric cells go straight to
 * Number(); lines with quotes go through papaparse (QuotedLines), odd cells through the strict
 * `parseCell`.
 */
export function scanTable(
  text: string,
  start: number,
  firstLine: number,
  spec: ScanSpec,
): ScannedTable {
  const ncols = spec.wanted.length;
  const capacity = countLines(text, start);
  const line = new Int32Array(capacity);
  const bad = new Uint8Array(capacity);
  const values = spec.wanted.map((w) => (w ? new Float64Array(capacity) : null));
  const problems: CellProblem[] = [];
  const notes: TableNote[] = [];
  let problemCount = 0;
  const delim =
    spec.delimiter === 'comma'
      ? 44
      : spec.delimiter === 'semicolon'
        ? 59
        : spec.delimiter === 'tab'
          ? 9
          : -1;
  const spaces = delim < 0;
  const quoted = new QuotedLines(text, spec.delimiter);
  const decimalComma = spec.decimalComma;
  let rows = 0;
  let nextQuote = -1;
  let lineNo = firstLine;
  let pos = start;
  const n = text.length;
  // Per-row scratch: did the row already report a problem?
  let rowReported = false;
  const flag = (col: number, kind: CellProblemKind, cell: string): void => {
    bad[rows] = 1;
    if (rowReported && !spec.perCell) return;
    rowReported = true;
    problemCount++;
    if (problems.length < spec.maxProblems) {
      problems.push({ row: rows, line: lineNo, column: col + 1, kind, text: cell.slice(0, 40) });
    }
  };
  const store = (col: number, cell: string, plain: boolean): void => {
    const out = values[col];
    if (!out) return;
    // A plain cell is digits, signs, "." and exponents (and "," with a decimal comma): Number()
    // reads it strictly; anything else goes through the strict parseCell.
    let v =
      plain && cell.length > 0
        ? Number(decimalComma ? cell.replace(',', '.') : cell)
        : parseCell(cell, decimalComma);
    // "1.234.567" or "1.234,5" look plain but need the strict reader's thousands handling.
    if (v !== v && plain) v = parseCell(cell, decimalComma);
    if (!Number.isFinite(v)) v = NaN;
    out[rows] = v;
    if (v !== v) flag(col, cellProblem(cell, decimalComma), cell);
  };
  while (pos < n) {
    let end = text.indexOf('\n', pos);
    if (end < 0) end = n;
    let stop = end;
    if (stop > pos && text.charCodeAt(stop - 1) === 13) stop--;
    // Skip blank and comment lines.
    let k = pos;
    while (k < stop && (text.charCodeAt(k) === 32 || text.charCodeAt(k) === 9)) k++;
    const firstChar = k < stop ? text.charCodeAt(k) : -1;
    const blank = firstChar < 0 || isDelimiterOnly(text, k, stop, delim);
    if (!blank && firstChar === COMMENT && notes.length < MAX_NOTES) {
      notes.push({
        row: rows,
        line: lineNo,
        text: text.slice(pos, Math.min(stop, pos + 200)),
        comment: true,
      });
    }
    if (!blank && firstChar !== COMMENT) {
      rowReported = false;
      line[rows] = lineNo;
      if (nextQuote < pos) {
        nextQuote = text.indexOf('"', pos);
        if (nextQuote < 0) nextQuote = Infinity;
      }
      const hasQuote = nextQuote < stop;
      if (hasQuote) {
        const cells = quoted.cells(pos, stop, lineNo);
        for (let c = 0; c < ncols; c++) {
          if (!values[c]) continue;
          if (c >= cells.length) flag(c, 'missing', '');
          else store(c, cells[c], false);
        }
      } else {
        let col = 0;
        let cellStart = spaces ? k : pos;
        let plain = true;
        let i = cellStart;
        for (; i <= stop && col < ncols; i++) {
          const c = i < stop ? text.charCodeAt(i) : -2;
          const boundary = c === -2 || (spaces ? c === 32 || c === 9 : c === delim);
          if (!boundary) {
            if (plain && !isPlainNumberChar(c) && !(c === 44 && decimalComma)) plain = false;
            continue;
          }
          if (values[col]) store(col, text.slice(cellStart, i), plain);
          col++;
          if (spaces)
            while (i + 1 < stop && (text.charCodeAt(i + 1) === 32 || text.charCodeAt(i + 1) === 9))
              i++;
          cellStart = i + 1;
          plain = true;
        }
        for (; col < ncols; col++) if (values[col]) flag(col, 'missing', '');
      }
      if (bad[rows] && notes.length < MAX_NOTES) {
        const rowText = text.slice(pos, Math.min(stop, pos + 200));
        if (/[A-Za-z]/.test(rowText))
          notes.push({ row: rows, line: lineNo, text: rowText, comment: false });
      }
      if (bad[rows] && !spec.perCell)
        for (let c = 0; c < ncols; c++) values[c]?.fill(NaN, rows, rows + 1);
      rows++;
    }
    pos = end + 1;
    lineNo++;
  }
  return { rows, line, values, bad, problems, problemCount, notes, nextLine: lineNo };
}

function isDelimiterOnly(text: string, from: number, to: number, delim: number): boolean {
  for (let i = from; i < to; i++) {
    const c = text.charCodeAt(i);
    if (c !== 32 && c !== 9 && c !== delim && c !== 44 && c !== 59) return false;
  }
  return true;
}
