/** One line of a file: its text (without line break) and 1-based line number. */
export interface Line {
  text: string;
  lineNo: number;
  /** Offset of the line's first character in the file text. */
  start: number;
}

/** Removes a leading byte-order mark and turns old-Mac CR-only line breaks into LF. */
export function cleanText(text: string): string {
  let t = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const head = t.slice(0, 65536);
  if (head.indexOf('\r') >= 0 && head.indexOf('\n') < 0) t = t.replace(/\r\n?/g, '\n');
  return t;
}

/**
 * The first lines of a text (at most `maxLines`, and none past `maxChars`) for recognising the
 * layout; CR before LF is dropped.
 */
export function headLines(text: string, maxLines: number, maxChars = 1 << 20): Line[] {
  const out: Line[] = [];
  let pos = 0;
  let lineNo = 1;
  while (pos <= text.length && out.length < maxLines && pos < maxChars) {
    let end = text.indexOf('\n', pos);
    if (end < 0) end = text.length;
    let stop = end;
    if (stop > pos && text.charCodeAt(stop - 1) === 13) stop--;
    out.push({ text: text.slice(pos, Math.min(stop, pos + maxChars)), lineNo, start: pos });
    pos = end + 1;
    lineNo++;
  }
  return out;
}

/** Blank (whitespace or delimiters only). */
export function isBlank(line: string): boolean {
  return /^[\s,;]*$/.test(line);
}

/** A comment line: starts with #, %, ! or //. Comment lines may carry metadata. */
export function isComment(line: string): boolean {
  return /^\s*(#|%|!|\/\/)/.test(line);
}
