/**
 * Tables as tab-separated text, which spreadsheets paste into cells. Tabs and line breaks inside
 * a cell become spaces so the grid stays intact. Numbers carry their precision (`Rounded`): they
 * paste with the digits they are known to (plain e-notation for very large or small values, which
 * every spreadsheet reads), never as 16-digit floats.
 */
import { plainNumber } from '../format/numbers';

/** A number with the significant digits it is known to. */
export interface Rounded {
  value: number | null;
  digits: number;
}

export type Cell = string | number | null | undefined | Rounded;

/** Significant digits for numbers given without a precision. */
export const DEFAULT_DIGITS = 4;

export const isRounded = (c: Cell): c is Rounded => typeof c === 'object' && c !== null;

export function cellText(c: Cell): string {
  if (c === null || c === undefined) return '';
  if (isRounded(c)) return c.value === null ? '' : plainNumber(c.value, c.digits);
  if (typeof c === 'number') return Number.isFinite(c) ? plainNumber(c, DEFAULT_DIGITS) : '';
  return c.replace(/[\t\r\n]+/g, ' ');
}

export function toTsv(header: readonly string[], rows: readonly (readonly Cell[])[]): string {
  return [header, ...rows].map((r) => r.map(cellText).join('\t')).join('\n') + '\n';
}

/** Copies text to the clipboard; resolves false when the browser refuses. */
export async function copyText(text: string): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    const ta = document.createElement('textarea');
    ta.value = text;
    ta.style.position = 'fixed';
    ta.style.opacity = '0';
    document.body.append(ta);
    ta.select();
    const ok = document.execCommand?.('copy') ?? false;
    ta.remove();
    return ok;
  }
}
