import Papa from 'papaparse';
import type { DelimiterName } from './types';

/** Why a cell gave no number. */
export type CellProblemKind = 'empty' | 'missing' | 'nan' | 'nonNumeric' | 'ambiguousGrouping';

const STRICT_NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;
/** Fortran double-precision exponent: "1.0D+03", "2d-5". */
const FORTRAN_EXPONENT = /^([-+]?(?:\d+\.?\d*|\.\d+))[dD]([-+]?\d+)$/;
/** Digits in groups of three split by one group mark ("1,234,567", "1'234", "1 234"). */
const GROUPED = /^([-+]?)(\d{1,3}(?:([,.' \u00a0\u202f])\d{3})(?:\3\d{3})*)(?:([.,])(\d+))?$/;

/**
 * Removes thousands separators where they are unambiguous: the group mark differs from the
 * decimal separator and either the number has a decimal part, or two or more groups, or the mark
 * is an apostrophe or a space (never a decimal mark). Returns the plain number text, `ambiguous`
 * when the cell is a grouped number that could also be a decimal ("1,234" in a decimal-point
 * file), or undefined when the cell is not grouped at all.
 */
export function ungroup(s: string, decimalComma: boolean): string | 'ambiguous' | undefined {
  const m = GROUPED.exec(s);
  if (!m) return undefined;
  const [, sign, digits, mark, decimal, fraction] = m;
  const decimalMark = decimalComma ? ',' : '.';
  if (mark === decimalMark) return undefined; // "1.234" with a decimal point is a plain decimal
  if (decimal !== undefined && decimal !== decimalMark) return undefined;
  const groups = digits.split(mark).length - 1;
  const safe = decimal !== undefined || groups >= 2 || !(mark === ',' || mark === '.');
  if (!safe) return 'ambiguous';
  return `${sign}${digits.split(mark).join('')}${fraction !== undefined ? `.${fraction}` : ''}`;
}

/**
 * Reads one cell strictly: "1.5", "-2e5", "1.0D+03" (Fortran exponent), " 3 ", "1,5" (only with
 * `decimalComma`), "−4" (Unicode minus), "1,234,567.8" / "1.234.567,8" / "1'234.5" (thousands
 * separators where unambiguous, see `ungroup`). Anything else, including "0x10", "Infinity" and "12 abc", gives NaN: callers ask
 * `cellProblem()` why.
 */
export function parseCell(text: string, decimalComma: boolean): number {
  let s = text.trim();
  if (s.length === 0 || s.length > 64) return NaN;
  if (s.charCodeAt(0) === 0x2212) s = '-' + s.slice(1);
  const grouped = ungroup(s, decimalComma);
  if (grouped === 'ambiguous') return NaN;
  if (grouped !== undefined) s = grouped;
  else if (decimalComma) s = s.replace(',', '.');
  const fortran = FORTRAN_EXPONENT.exec(s);
  if (fortran) s = `${fortran[1]}e${fortran[2]}`;
  if (!STRICT_NUMBER.test(s)) return NaN;
  const v = Number(s);
  return Number.isFinite(v) ? v : NaN;
}

/** Why `parseCell(text)` gave NaN. */
export function cellProblem(text: string, decimalComma = false): CellProblemKind {
  const s = text.trim();
  if (s.length === 0) return 'empty';
  if (/^[-+]?nan$/i.test(s)) return 'nan';
  if (ungroup(s, decimalComma) === 'ambiguous') return 'ambiguousGrouping';
  return 'nonNumeric';
}

export const DELIMITER_CHAR: Record<Exclude<DelimiterName, 'spaces'>, string> = {
  comma: ',',
  semicolon: ';',
  tab: '\t',
};

/** Splits one line into cells: papaparse for quoted fields, a plain split otherwise. */
export function splitCells(line: string, delimiter: DelimiterName): string[] {
  if (delimiter === 'spaces') return splitOnSpaces(line);
  const d = DELIMITER_CHAR[delimiter];
  if (line.indexOf('"') < 0) return line.split(d);
  const parsed = Papa.parse<string[]>(line, {
    delimiter: d,
    newline: '\n',
    quoteChar: '"',
    header: false,
  });
  return parsed.data[0] ?? [];
}

/** Whitespace-separated cells; "double quoted" cells may contain spaces. */
export function splitOnSpaces(line: string): string[] {
  const out: string[] = [];
  const re = /"([^"]*)"?|[^\s"]+/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(line)) !== null) out.push(m[1] ?? m[0]);
  return out;
}

/** Header cells of a space-separated file may contain single spaces ("Storage modulus"). */
export function splitHeaderOnSpaces(line: string, expected: number): string[] {
  const wide = line
    .trim()
    .split(/\t|\s{2,}/)
    .filter((c) => c !== '');
  if (wide.length === expected) return wide;
  // "T (°C) f (Hz)": a bracketed unit belongs to the name before it.
  const merged: string[] = [];
  for (const tok of splitOnSpaces(line)) {
    if (merged.length > 0 && /^[([]/.test(tok)) merged[merged.length - 1] += ` ${tok}`;
    else merged.push(tok);
  }
  return merged;
}
