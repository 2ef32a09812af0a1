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

/** 10⁰ … 10²²: every one exact in a double (Clinger's fast path, see plainNumber). */
const POW10 = [
  1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17,
  1e18, 1e19, 1e20, 1e21, 1e22,
];

/** Where the last readPlainNumber stopped: the first character not part of the number. */
let readEnd = 0;

/**
 * Reads a number in place from `from` (before `to`), without making a string: [+-] digits
 * [. or , digits] [e [+-] digits], stopping at the first character that does not continue it
 * (its position is left in `readEnd`). Only numbers of at most 15 significant digits with a decimal
 * exponent within ±22 are read, else NaN. Then the digits m are an exact integer and m·10^e (or
 * m/10^−e) is one correctly rounded operation on exact operands, so the result is the correctly
 * rounded value of the decimal, exactly what Number() returns for the same text (Clinger, "How
 * to read floating point numbers accurately", PLDI 1990: the fast path). `comma`: "," is a
 * decimal separator too (as `cell.replace(',', '.')` makes it). The caller takes the value only
 * when the cell ends at `readEnd`; any other cell is read as a string, as before.
 */
function readPlainNumber(text: string, from: number, to: number, comma: boolean): number {
  let i = from;
  let negative = false;
  let c = i < to ? text.charCodeAt(i) : -1;
  if (c === 45 || c === 43) {
    negative = c === 45;
    c = ++i < to ? text.charCodeAt(i) : -1;
  }
  let m = 0;
  let digits = 0; // significant digits taken into m
  let any = false;
  let fraction = 0; // digits after the separator
  let separator = false;
  for (; i < to; c = ++i < to ? text.charCodeAt(i) : -1) {
    if (c >= 48 && c <= 57) {
      any = true;
      if (separator) fraction++;
      if (m === 0 && c === 48) continue;
      if (++digits > 15) return NaN;
      m = m * 10 + (c - 48);
    } else if ((c === 46 || (c === 44 && comma)) && !separator) separator = true;
    else break;
  }
  if (!any) return NaN;
  let exponent = 0;
  if (c === 101 || c === 69) {
    c = ++i < to ? text.charCodeAt(i) : -1;
    let expNegative = false;
    if (c === 45 || c === 43) {
      expNegative = c === 45;
      c = ++i < to ? text.charCodeAt(i) : -1;
    }
    if (!(c >= 48 && c <= 57)) return NaN;
    for (; c >= 48 && c <= 57; c = ++i < to ? text.charCodeAt(i) : -1) {
      exponent = exponent * 10 + (c - 48);
      if (exponent > 1000) return NaN;
    }
    if (expNegative) exponent = -exponent;
  }
  readEnd = i;
  const e = exponent - fraction;
  let v: number;
  if (m === 0) v = 0;
  else if (e >= 0 && e <= 22) v = m * POW10[e];
  else if (e < 0 && e >= -22) v = m / POW10[-e];
  else return NaN;
  return negative ? -v : v;
}

/** Whether the cell is plain (see scanTable's store): digits, signs, ".", exponents, "," with a decimal comma. */
function isPlainCell(cell: string, decimalComma: boolean): boolean {
  for (let i = 0; i < cell.length; i++) {
    const c = cell.charCodeAt(i);
    if (!isPlainNumberChar(c) && !(c === 44 && decimalComma)) return false;
  }
  return true;
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
  const lastWanted = spec.wanted.lastIndexOf(true);
  // a comma delimiter never sits inside a cell, whatever the decimal mark
  const commaDecimal = spec.decimalComma && delim !== 44;
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
      } else if (!spaces) {
        // Cells read in place (readPlainNumber); a cell it cannot read goes the string way.
        let col = 0;
        let i = pos;
        while (col <= lastWanted) {
          const out = values[col];
          let end = -1;
          if (out) {
            const v = readPlainNumber(text, i, stop, commaDecimal);
            if (v === v && (readEnd === stop || text.charCodeAt(readEnd) === delim)) {
              out[rows] = v;
              end = readEnd;
            }
          }
          if (end < 0) {
            end = i;
            while (end < stop && text.charCodeAt(end) !== delim) end++;
            if (out) {
              const cell = text.slice(i, end);
              store(col, cell, isPlainCell(cell, decimalComma));
            }
          }
          col++;
          if (end >= stop) break;
          i = end + 1;
        }
        for (; col < ncols; col++) if (values[col]) flag(col, 'missing', '');
      } else {
        let col = 0;
        let cellStart = k;
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
