import { describe, it, expect } from 'vitest';
import {
  ChunkDecoder,
  InvalidUtf8Error,
  LineChunker,
  decodeBytes,
  detectEncoding,
} from '../../../core/io/decode';

const utf8 = (s: string): Uint8Array => new TextEncoder().encode(s);

describe('detectEncoding()', () => {
  it('detectEncoding() reads byte-order marks and tells UTF-8 from Windows-1252', () => {
    expect(detectEncoding(Uint8Array.from([0xef, 0xbb, 0xbf, 0x41]))).toBe('utf-8 (BOM)');
    expect(detectEncoding(Uint8Array.from([0xff, 0xfe, 0x41, 0]))).toBe('utf-16le (BOM)');
    expect(detectEncoding(Uint8Array.from([0xfe, 0xff, 0, 0x41]))).toBe('utf-16be (BOM)');
    expect(detectEncoding(utf8('T (°C)'))).toBe('utf-8');
    // "T (°C)" with ° as the single byte 0xB0 (Windows-1252 / Latin-1).
    expect(detectEncoding(Uint8Array.from([0x54, 0x20, 0x28, 0xb0, 0x43, 0x29]))).toBe(
      'windows-1252',
    );
  });

  it('detectEncoding() accepts UTF-8 whose last character is cut off at the end of the head', () => {
    const bytes = utf8('abc°');
    expect(detectEncoding(bytes.subarray(0, bytes.length - 1))).toBe('utf-8');
  });
});

describe('ChunkDecoder', () => {
  it('ChunkDecoder decodes a character split between two chunks once, whole', () => {
    const bytes = utf8('T (°C)\n40 °C\n');
    const cut = bytes.indexOf(0xb0); // second byte of "°"
    const d = new ChunkDecoder('utf-8');
    expect(d.push(bytes.subarray(0, cut)) + d.push(bytes.subarray(cut)) + d.end()).toBe(
      'T (°C)\n40 °C\n',
    );
  });

  it('ChunkDecoder drops the byte-order mark and decodes UTF-16 split in odd places', () => {
    const text = 'G′ (Pa)\n1,2\n';
    const be = new Uint8Array(2 + 2 * text.length);
    be.set([0xfe, 0xff]);
    for (let i = 0; i < text.length; i++) {
      be[2 + 2 * i] = text.charCodeAt(i) >> 8;
      be[3 + 2 * i] = text.charCodeAt(i) & 0xff;
    }
    const d = new ChunkDecoder('utf-16be (BOM)');
    let out = '';
    for (let i = 0; i < be.length; i += 3) out += d.push(be.subarray(i, i + 3));
    expect(out + d.end()).toBe(text);
  });

  it('ChunkDecoder decodes UTF-8 fed one byte at a time, a 4-byte character included', () => {
    const text = 'T (°C),G′ (Pa) 𝜔\n40,1\n';
    const bytes = utf8(text);
    const d = new ChunkDecoder('utf-8');
    let out = '';
    for (let i = 0; i < bytes.length; i++) out += d.push(bytes.subarray(i, i + 1));
    expect(out + d.end()).toBe(text);
  });

  it('ChunkDecoder drops a UTF-8 byte-order mark split over chunks, but keeps U+FEFF later on', () => {
    const bytes = utf8('\ufeffab\ufeffc');
    const d = new ChunkDecoder('utf-8 (BOM)');
    const out =
      d.push(bytes.subarray(0, 2)) + d.push(bytes.subarray(2, 5)) + d.push(bytes.subarray(5));
    expect(out + d.end()).toBe('ab\ufeffc');
  });

  it('ChunkDecoder throws InvalidUtf8Error on a character cut off at the end of the file', () => {
    const bytes = utf8('a°');
    const d = new ChunkDecoder('utf-8');
    expect(d.push(bytes.subarray(0, 2))).toBe('a');
    expect(() => d.end()).toThrow(InvalidUtf8Error);
  });

  it('ChunkDecoder throws InvalidUtf8Error on a byte that is not UTF-8', () => {
    const d = new ChunkDecoder('utf-8');
    expect(() => d.push(Uint8Array.from([0x41, 0xb0, 0x43]))).toThrow(InvalidUtf8Error);
  });
});

describe('decodeBytes()', () => {
  it('decodeBytes() decodes 0xB0 as "°" in a Windows-1252 file', () => {
    const r = decodeBytes(Uint8Array.from([0x54, 0x20, 0x28, 0xb0, 0x43, 0x29]));
    expect(r).toEqual({ text: 'T (°C)', encoding: 'windows-1252' });
  });
});

describe('LineChunker', () => {
  it('LineChunker returns only whole lines and keeps the unfinished one', () => {
    const c = new LineChunker();
    expect(c.push('a,1\nb,')).toBe('a,1\n');
    expect(c.push('2')).toBe('');
    expect(c.push('\nc,3')).toBe('b,2\n');
    expect(c.end()).toBe('c,3');
  });
});
