import { parseCell, splitCells } from './cells';
import type { DelimiterName } from './types';

/** How a table is written: delimiter, decimal separator and the usual number of columns. */
export interface Dialect {
  delimiter: DelimiterName;
  decimalComma: boolean;
  /** Most common number of cells in numeric rows. */
  columns: number;
  /** How many of the sampled lines are numeric rows under this dialect. */
  numericLines: number;
}

const CANDIDATES: [DelimiterName, boolean][] = [
  ['tab', false],
  ['semicolon', false],
  ['comma', false],
  ['spaces', false],
  ['tab', true],
  ['semicolon', true],
  ['spaces', true],
];

/** Number of numeric cells when every non-empty cell is a number and there are two or more; else 0. */
export function numericCellCount(cells: string[], decimalComma: boolean): number {
  let n = 0;
  for (const c of cells) {
    if (c.trim() === '') continue;
    if (Number.isNaN(parseCell(c, decimalComma))) return 0;
    n++;
  }
  return n >= 2 ? n : 0;
}

/**
 * Picks the delimiter and decimal separator under which most sample lines are rows of numbers
 * (ties: more columns, then tab, semicolon, comma, spaces; point before comma). Undefined when no
 * line is a row of two or more numbers.
 */
export function detectDialect(lines: string[]): Dialect | undefined {
  let best: Dialect | undefined;
  for (const [delimiter, decimalComma] of CANDIDATES) {
    const counts = new Map<number, number>();
    let numericLines = 0;
    for (const line of lines) {
      const cells = splitCells(line, delimiter);
      if (numericCellCount(cells, decimalComma) === 0) continue;
      numericLines++;
      counts.set(cells.length, (counts.get(cells.length) ?? 0) + 1);
    }
    if (numericLines === 0) continue;
    let columns = 0;
    let most = 0;
    for (const [c, k] of counts)
      if (k > most || (k === most && c > columns)) [columns, most] = [c, k];
    const d: Dialect = { delimiter, decimalComma, columns, numericLines };
    if (
      !best ||
      numericLines > best.numericLines ||
      (numericLines === best.numericLines && columns > best.columns)
    ) {
      best = d;
    }
  }
  return best;
}
