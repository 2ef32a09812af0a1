/**
 * Tables as tab-separated text, which spreadsheets paste into cells. Tabs and line breaks inside
 * a cell become spaces so the grid stays intact.
 */
export type Cell = string | number | null | undefined;

export function cellText(c: Cell): string {
  if (c === null || c === undefined) return '';
  if (typeof c === 'number') return Number.isFinite(c) ? String(c) : '';
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
