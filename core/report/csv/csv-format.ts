/**
 * CSV building blocks (RFC 4180 quoting, comma separator, "\n" line ends) with `#` comment lines
 * on top for units and conventions; spreadsheets and pandas (`comment='#'`) skip them.
 */

/** A number with up to 10 significant digits; '' for null, undefined or non-finite. */
export function csvNumber(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '';
  return String(Number(value.toPrecision(10)));
}

/** Quotes a cell when it holds a comma, quote, or line break (RFC 4180). */
export function csvCell(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Joins comment lines (each prefixed with '# ' if it is not already), a header row and rows. */
export function csvDocument(comments: string[], header: string[], rows: string[][]): string {
  const lines = [
    ...comments.map((c) => (c.startsWith('#') ? c : `# ${c}`).replace(/[\r\n]+/g, ' ')),
    header.map(csvCell).join(','),
    ...rows.map((r) => r.map(csvCell).join(',')),
  ];
  return `${lines.join('\n')}\n`;
}
