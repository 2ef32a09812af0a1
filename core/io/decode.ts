/**
 * Byte-to-text decoding shared by every command and the app: the same bytes always give the same
 * text. Detection (docs/import.md, "Encodings"):
 *   1. a byte-order mark: UTF-8 (EF BB BF), UTF-16 LE (FF FE) or UTF-16 BE (FE FF);
 *   2. otherwise UTF-8 when the bytes are valid UTF-8;
 *   3. otherwise Windows-1252 (a superset of Latin-1's printable range: "°C" is the byte 0xB0),
 *      the usual code page of instrument PCs (common practice).
 * Decoding is incremental (ChunkDecoder), so a character split between two chunks is decoded
 * once, whole.
 */

/** The decodings the importer knows; reported by `inspect` and in FileReport.encoding. */
export type TextEncodingName =
  'utf-8' | 'utf-8 (BOM)' | 'utf-16le (BOM)' | 'utf-16be (BOM)' | 'windows-1252';

/** How many leading bytes `detectEncoding` reads to decide between UTF-8 and Windows-1252. */
export const ENCODING_SNIFF_BYTES = 1 << 20;

/** The decoding of a file whose first bytes are `head` (see the rules above). */
export function detectEncoding(head: Uint8Array): TextEncodingName {
  if (head.length >= 3 && head[0] === 0xef && head[1] === 0xbb && head[2] === 0xbf)
    return 'utf-8 (BOM)';
  if (head.length >= 2 && head[0] === 0xff && head[1] === 0xfe) return 'utf-16le (BOM)';
  if (head.length >= 2 && head[0] === 0xfe && head[1] === 0xff) return 'utf-16be (BOM)';
  return validUtf8Prefix(head.subarray(0, ENCODING_SNIFF_BYTES)) ? 'utf-8' : 'windows-1252';
}

/**
 * Where the last complete UTF-8 character of `bytes` ends: the length, less an incomplete
 * trailing sequence (at most 3 bytes) that the next chunk may complete.
 */
export function completeUtf8End(bytes: Uint8Array): number {
  const len = bytes.length;
  for (let k = 1; k <= 3 && len - k >= 0; k++) {
    const b = bytes[len - k];
    if ((b & 0xc0) !== 0x80) {
      const need = b >= 0xf0 ? 4 : b >= 0xe0 ? 3 : b >= 0xc0 ? 2 : 1;
      return need > k ? len - k : len;
    }
  }
  return len;
}

/** True when `bytes` is valid UTF-8, allowing a character cut off at the very end. */
function validUtf8Prefix(bytes: Uint8Array): boolean {
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(0, completeUtf8End(bytes)));
    return true;
  } catch {
    return false;
  }
}

function webLabel(e: TextEncodingName): string {
  if (e.startsWith('utf-16le')) return 'utf-16le';
  if (e.startsWith('utf-16be')) return 'utf-16be';
  return e === 'windows-1252' ? 'windows-1252' : 'utf-8';
}

/**
 * Incremental decoder for one file: `push(bytes)` returns the text of the bytes so far (a
 * character split at the chunk end waits for the next chunk), `end()` the rest. The byte-order
 * mark is dropped. UTF-8 found invalid after the sniffed head throws `InvalidUtf8Error`, so the
 * caller can decode the file again as Windows-1252 (no bytes are silently replaced).
 * UTF-8 is decoded a chunk at a time without `stream: true` (about 3 times faster on a large
 * file): the complete characters of each chunk at once, the bytes of a character cut at its end
 * (at most 3) carried to the next chunk.
 */
export class ChunkDecoder {
  private readonly decoder: { decode(input?: Uint8Array, options?: { stream?: boolean }): string };
  private readonly utf8: boolean;
  /** UTF-8: bytes of a character cut at the end of the last chunk. */
  private carried: Uint8Array = new Uint8Array(0);
  /** UTF-8 with BOM: the mark is still to be dropped. */
  private bom: boolean;
  constructor(readonly encoding: TextEncodingName) {
    this.utf8 = encoding === 'utf-8' || encoding === 'utf-8 (BOM)';
    this.bom = encoding === 'utf-8 (BOM)';
    // ignoreBOM: false (the default) makes a streaming TextDecoder drop the byte-order mark
    // itself; the chunk-at-a-time UTF-8 decoder must not (a later chunk may start with U+FEFF).
    this.decoder = new TextDecoder(webLabel(encoding), { fatal: this.utf8, ignoreBOM: this.utf8 });
  }
  push(bytes: Uint8Array): string {
    if (!this.utf8) return this.decoder.decode(bytes, { stream: true });
    let input = bytes;
    if (this.carried.length > 0) {
      input = new Uint8Array(this.carried.length + bytes.length);
      input.set(this.carried);
      input.set(bytes, this.carried.length);
    }
    if (this.bom) {
      if (input.length < 3) {
        this.carried = input.slice();
        return '';
      }
      this.bom = false;
      if (input[0] === 0xef && input[1] === 0xbb && input[2] === 0xbf) input = input.subarray(3);
    }
    const end = completeUtf8End(input);
    this.carried = input.slice(end);
    return this.decodeUtf8(input.subarray(0, end));
  }
  end(): string {
    if (!this.utf8) return this.decoder.decode();
    const rest = this.carried;
    this.carried = new Uint8Array(0);
    this.bom = false;
    // a character still incomplete at the end of the file is invalid: decode throws
    return rest.length > 0 ? this.decodeUtf8(rest) : '';
  }
  private decodeUtf8(bytes: Uint8Array): string {
    try {
      return this.decoder.decode(bytes);
    } catch {
      throw new InvalidUtf8Error();
    }
  }
}

/** UTF-8 bytes that are not valid UTF-8 past the sniffed head. */
export class InvalidUtf8Error extends Error {
  constructor() {
    super('invalid UTF-8');
    this.name = 'InvalidUtf8Error';
  }
}

/** Decodes a whole byte array by the rules above (for small files and the app). */
export function decodeBytes(bytes: Uint8Array): { text: string; encoding: TextEncodingName } {
  let encoding = detectEncoding(bytes);
  try {
    const d = new ChunkDecoder(encoding);
    return { text: d.push(bytes) + d.end(), encoding };
  } catch (e) {
    if (!(e instanceof InvalidUtf8Error)) throw e;
    encoding = 'windows-1252';
    return { text: new TextDecoder('windows-1252').decode(bytes), encoding };
  }
}

/** Longest line kept whole by LineChunker, characters (no real table row comes close). */
export const MAX_LINE_CHARS = 16 << 20;

/**
 * Splits decoded text chunks into chunks that end at a line break: feed `push(text)` with each
 * decoded chunk; it returns the complete lines so far (ending with "\n"), keeping the unfinished
 * last line for the next call; `end()` returns what is left. Lines are never split between chunks,
 * so each chunk can be scanned on its own (except lines longer than MAX_LINE_CHARS).
 */
export class LineChunker {
  private carry = '';
  push(text: string): string {
    const cut = text.lastIndexOf('\n');
    if (cut < 0) {
      this.carry += text;
      // A "line" this long is no table row (a binary file, a file without line breaks): hand it
      // on in pieces so that no string grows with the file; the importer then refuses it.
      if (this.carry.length <= MAX_LINE_CHARS) return '';
      // Old-Mac files end lines with CR alone: cut after the last one so lines stay whole.
      const cr = this.carry.lastIndexOf('\r') + 1;
      const at = cr > 0 ? cr : this.carry.length;
      const out = this.carry.slice(0, at);
      this.carry = this.carry.slice(at);
      return out;
    }
    const out = this.carry + text.slice(0, cut + 1);
    this.carry = text.slice(cut + 1);
    return out;
  }
  end(): string {
    const out = this.carry;
    this.carry = '';
    return out;
  }
}
