/** A small HTML table builder: escaped cells, optional caption and a note under the table. */
import { escapeHtml } from './escape';

export interface TableSpec {
  id: string;
  caption: string;
  head: string[];
  rows: string[][];
  /** Columns (0-based) aligned right, i.e. numbers. */
  numeric?: number[];
  /** Shown under the table (conventions, units); plain text. */
  note?: string;
  /** Class added to rows, by row index (e.g. "excluded"). */
  rowClass?: (string | undefined)[];
}

export function htmlTable(t: TableSpec): string {
  const num = new Set(t.numeric ?? []);
  const cell = (tag: 'th' | 'td', s: string, i: number): string =>
    `<${tag}${num.has(i) ? ' class="num"' : ''}>${escapeHtml(s)}</${tag}>`;
  const head = `<tr>${t.head.map((h, i) => cell('th', h, i)).join('')}</tr>`;
  const body = t.rows
    .map((r, k) => {
      const cls = t.rowClass?.[k];
      return `<tr${cls ? ` class="${escapeHtml(cls)}"` : ''}>${r.map((c, i) => cell('td', c, i)).join('')}</tr>`;
    })
    .join('');
  const note = t.note ? `<p class="table-note">${escapeHtml(t.note)}</p>` : '';
  return (
    `<figure class="table-block" id="${escapeHtml(t.id)}"><table><caption>${escapeHtml(t.caption)}</caption>` +
    `<thead>${head}</thead><tbody>${body}</tbody></table>${note}</figure>`
  );
}
