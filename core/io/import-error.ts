/** Kinds of fatal import problems, for programs that react to them. */
export type ImportErrorCode =
  | 'emptyFile'
  | 'notText'
  | 'notWorkbook'
  | 'noNumericData'
  | 'noHeader'
  | 'noTemperature'
  | 'unknownUnit'
  | 'missingColumn'
  | 'conflict'
  | 'noIsotherms'
  | 'badOption'
  | 'overBudget';

/**
 * A problem that stops the import. `file`, `row` and `column` locate it (1-based; 0 = not
 * applicable) and the message, which already names them, says what to do.
 */
export class ImportError extends Error {
  constructor(
    readonly code: ImportErrorCode,
    readonly file: string,
    readonly row: number,
    readonly column: number,
    detail: string,
  ) {
    super(`${locate(file, row, column)}${detail}`);
    this.name = 'ImportError';
  }
}

/** "File "a.csv", row 3, column 2: " — the prefix every import message starts with. */
export function locate(file: string, row: number, column: number): string {
  const parts: string[] = [];
  if (file) parts.push(`File "${file}"`);
  if (row > 0) parts.push(`row ${row}`);
  if (column > 0) parts.push(`column ${column}`);
  return parts.length > 0 ? `${parts.join(', ')}: ` : '';
}
