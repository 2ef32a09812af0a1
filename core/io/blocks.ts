import { splitCells } from './cells';
import { parseMetadataLine, temperatureFromMetadata } from './metadata';
import type { TableNote } from './scan-table';
import { isUnitsRow } from './structure';
import type { DelimiterName } from './types';

/** Temperature blocks inside one file, and text rows that are structure rather than bad data. */
export interface BlockPlan {
  /** From table row `row` on, the points were measured at `temperatureK`. */
  starts: { row: number; line: number; temperatureK: number }[];
  /** Rows that are a repeated header or units row, or a metadata line: skipped without a warning. */
  quietRows: Set<number>;
}

/**
 * Reads the comment lines and text rows met inside a table. A file may hold several blocks, each
 * opened by a temperature line ("# Temperature: 60 °C", "T = 333.15 K") and often its own header:
 * the temperature applies to the rows that follow. Repeated header and units rows and
 * "key: value" lines are dropped quietly; other text rows keep their warning.
 */
export function findBlocks(
  notes: TableNote[],
  header: string[],
  delimiter: DelimiterName,
): BlockPlan {
  const starts: BlockPlan['starts'] = [];
  const quietRows = new Set<number>();
  const headerKey = header.map((h) => h.trim()).join('\u0000');
  for (const note of notes) {
    const kv = parseMetadataLine(note.text, delimiter);
    const t = kv ? temperatureFromMetadata({ [kv.key]: kv.value }) : undefined;
    if (t) starts.push({ row: note.row, line: note.line, temperatureK: t.reading.temperatureK });
    if (note.comment) continue;
    const cells = splitCells(note.text, delimiter).map((c) => c.trim());
    const keyValue = /^\s*[^:=;,\t]{1,80}[:=]/.test(note.text);
    if (t || keyValue || cells.join('\u0000') === headerKey || isUnitsRow(cells))
      quietRows.add(note.row);
  }
  return { starts, quietRows };
}
