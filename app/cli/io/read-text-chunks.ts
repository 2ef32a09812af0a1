/**
 * Reads one regular file as decoded text chunks that end at line breaks, for the importer's
 * chunked path: fs.readSync in CHUNK_BYTES pieces, decoded incrementally (core/io/decode.ts), so
 * no string of the whole file is ever built. The encoding is detected from the first chunk; a
 * file that looks like UTF-8 there but has an invalid byte later is decoded as Windows-1252 as a
 * whole (checked in a first streaming pass), so one file never mixes two decodings.
 */
import { isUtf8 } from 'node:buffer';
import { closeSync, openSync, readSync } from 'node:fs';
import { ChunkDecoder, LineChunker, completeUtf8End, detectEncoding } from '@core/io';
import type { TextEncodingName } from '@core/io';

/** Bytes read per call: large enough for few calls, small enough to stay far below string limits. */
export const CHUNK_BYTES = 4 << 20;

/** The file's encoding, from its first chunk (see detectEncoding). */
export function sniffEncoding(path: string): TextEncodingName {
  const fd = openSync(path, 'r');
  try {
    const head = new Uint8Array(CHUNK_BYTES);
    const n = readSync(fd, head, 0, head.length, 0);
    return detectEncoding(head.subarray(0, n));
  } finally {
    closeSync(fd);
  }
}

/**
 * Decoded text chunks of the file, each ending at a line break (the last may not). Lazily read:
 * iterate once. With 'utf-8', an invalid byte throws InvalidUtf8Error (readDecodedChunks checks
 * first, so it does not happen there).
 */
export function* readTextChunks(path: string, encoding: TextEncodingName): Generator<string> {
  const fd = openSync(path, 'r');
  try {
    const decoder = new ChunkDecoder(encoding);
    const lines = new LineChunker();
    const buf = new Uint8Array(CHUNK_BYTES);
    for (;;) {
      const n = readSync(fd, buf, 0, buf.length, null);
      if (n === 0) break;
      const text = lines.push(decoder.push(buf.subarray(0, n)));
      if (text) yield text;
    }
    const rest = lines.push(decoder.end()) + lines.end();
    if (rest) yield rest;
  } finally {
    closeSync(fd);
  }
}

/** The whole file decoded into chunks, with a Windows-1252 retry for late invalid UTF-8. */
export function readDecodedChunks(path: string): {
  chunks: Iterable<string>;
  encoding: TextEncodingName;
} {
  const encoding = sniffEncoding(path);
  if (encoding !== 'utf-8') return { chunks: readTextChunks(path, encoding), encoding };
  // Lazy iteration cannot restart once the importer has consumed chunks, so a UTF-8 file is
  // checked in one streaming pass first (Buffer's isUtf8, far cheaper than parsing).
  return allUtf8(path)
    ? { chunks: readTextChunks(path, 'utf-8'), encoding }
    : { chunks: readTextChunks(path, 'windows-1252'), encoding: 'windows-1252' };
}

/** True when the whole file is valid UTF-8 (read in CHUNK_BYTES pieces). */
export function allUtf8(path: string): boolean {
  const fd = openSync(path, 'r');
  try {
    const buf = Buffer.alloc(CHUNK_BYTES + 4);
    let carried = 0;
    for (;;) {
      const n = readSync(fd, buf, carried, CHUNK_BYTES, null);
      const len = carried + n;
      if (n === 0) return carried === 0 || isUtf8(buf.subarray(0, len));
      // Keep an incomplete trailing sequence (at most 3 bytes) for the next piece.
      const end = completeUtf8End(buf.subarray(0, len));
      if (!isUtf8(buf.subarray(0, end))) return false;
      buf.copy(buf, 0, end, len);
      carried = len - end;
    }
  } finally {
    closeSync(fd);
  }
}
