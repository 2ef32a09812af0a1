import Papa from 'papaparse';
import type { DelimiterName } from './types';

/** Why a cell gave no number. */
export type CellProblemKind = 'empty' | 'missing' | 'nan' | 'nonNumeric';

const STRICT_NUMBER = /^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/;

/**
 * Reads one cell strictly: "1.5", "-2e5", " 3 ", "1,5" (only with `decimalComma`), "−4" (Unicode
 * minus). Anything else, including "0x10", "Infinity" and "12 abc", gives NaN: callers ask
 * `cellProblem()` why.
 */
export function parseCell(text: string, decimalComma: boolean): number {
  let s = text.trim();
  if (s.length === 0 || s.length > 64) return NaN;
  if (s.charCodeAt(0) === 0x2212) s = '-' + s.slice(1);
  if (decimalComma) s = s.replace(',', '.');
  if (!STRICT_NUMBER.test(s)) return NaN;
  const v = Number(s);
  return Number.isFinite(v) ? v : NaN;
}

/** Why `parseCell(text)` gave NaN. */
export function cellProblem(text: string): CellProblemKind {
  const s = text.trim();
  if (s.length === 0) return 'empty';
  if (/^[-+]?nan$/i.test(s)) return 'nan';
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
