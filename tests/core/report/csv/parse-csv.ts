import { expect } from 'vitest';
import Papa from 'papaparse';

/** Parses our CSV the way a spreadsheet user would: comment lines skipped, header row. */
export function parseCsv(text: string): { comments: string[]; rows: Record<string, string>[] } {
  const comments = text.split('\n').filter((l) => l.startsWith('#'));
  const body = text
    .split('\n')
    .filter((l) => !l.startsWith('#'))
    .join('\n');
  const r = Papa.parse<Record<string, string>>(body, { header: true, skipEmptyLines: true });
  expect(r.errors).toEqual([]);
  return { comments, rows: r.data };
}
