/**
 * Reads one regular file as decoded text chunks that end at line breaks, for the importer's
 * chunked path: fs.readSync in CHUNK_BYTES pieces, decoded incrementally (core/io/decode.ts), so
 * no string of the whole file is ever built. The encoding is detected from the first chunk; a
 * file that looks like UTF-8 there but has an invalid byte later is decoded as Windows-1252 as a
 * whole (checked in a first streaming pass), so one file never mixes two decodings.
 */
import { closeSync, openSync, readSync } from 'node:fs';
import {
  ChunkDecoder,
  InvalidUtf8Error,
  LineChunker,
  detectEncoding,
} from '../../../core/io/index.ts';
import type { TextEncodingName } from '../../../core/io/index.ts';

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
 * iterate once. Throws InvalidUtf8Error when a UTF-8 file has an invalid byte after its head.
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
  // checked in one streaming pass first (cheap next to parsing: about 0.1 s per 100 MB).
  try {
    for (const _ of readTextChunks(path, 'utf-8')) void _;
    return { chunks: readTextChunks(path, 'utf-8'), encoding };
  } catch (e) {
    if (!(e instanceof InvalidUtf8Error)) throw e;
    return { chunks: readTextChunks(path, 'windows-1252'), encoding: 'windows-1252' };
  }
}
