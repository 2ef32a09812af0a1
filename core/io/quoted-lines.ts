import Papa from 'papaparse';
import { DELIMITER_CHAR, splitCells } from './cells';
import type { DelimiterName } from './types';

/** Lines handed to papaparse at once: large enough to pay its set-up cost once per chunk. */
const CHUNK_LINES = 4096;

/**
 * Cells of quoted lines, parsed by papaparse a chunk of lines at a time and looked up by line
 * number. A chunk is used only when papaparse returns exactly one row per line (no line breaks
 * inside quotes, no unbalanced quote); otherwise each line is parsed on its own, so line numbers
 * stay exact either way.
 */
export class QuotedLines {
  private first = -1;
  private rows: string[][] = [];

  constructor(
    private readonly text: string,
    private readonly delimiter: DelimiterName,
  ) {}

  /** Cells of the line starting at `pos` and ending (without its break) at `stop`. */
  cells(pos: number, stop: number, lineNo: number): string[] {
    const k = lineNo - this.first;
    if (this.first >= 0 && k >= 0 && k < this.rows.length) return this.rows[k];
    if (this.delimiter !== 'spaces' && this.load(pos, lineNo)) return this.rows[0];
    return splitCells(this.text.slice(pos, stop), this.delimiter);
  }

  private load(pos: number, lineNo: number): boolean {
    const text = this.text;
    let end = pos;
    let lines = 0;
    while (lines < CHUNK_LINES && end < text.length) {
      const e = text.indexOf('\n', end);
      end = e < 0 ? text.length : e + 1;
      lines++;
    }
    const chunk = text.slice(pos, text.charCodeAt(end - 1) === 10 ? end - 1 : end);
    const crlf = chunk.indexOf('\r\n') >= 0;
    const parsed = Papa.parse<string[]>(chunk, {
      delimiter: DELIMITER_CHAR[this.delimiter as Exclude<DelimiterName, 'spaces'>],
      newline: crlf ? '\r\n' : '\n',
      quoteChar: '"',
      header: false,
      skipEmptyLines: false,
    });
    if (parsed.data.length !== lines) {
      this.first = -1;
      this.rows = [];
      return false;
    }
    this.first = lineNo;
    this.rows = parsed.data;
    return true;
  }
}
