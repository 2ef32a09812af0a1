import { describe, it, expect } from 'vitest';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { CHUNK_BYTES, allUtf8, readDecodedChunks } from '../../app/cli/io/read-text-chunks';
import { tempDir } from './cli-helpers';

describe('readDecodedChunks()', () => {
  it('readDecodedChunks() yields whole lines and keeps a "°" cut by the piece boundary whole', () => {
    const line = 'T (°C),40 °C\n'; // 14 bytes in UTF-8
    const reps = Math.ceil((CHUNK_BYTES * 1.5) / 14);
    const text = line.repeat(reps);
    const file = join(tempDir(), 'big.csv');
    writeFileSync(file, text);
    const { chunks, encoding } = readDecodedChunks(file);
    expect(encoding).toBe('utf-8');
    const parts = [...chunks];
    expect(parts.length).toBeGreaterThan(1);
    for (const p of parts.slice(0, -1)) expect(p.endsWith('\n')).toBe(true);
    expect(parts.join('')).toBe(text);
  });

  it('readDecodedChunks() decodes a file as Windows-1252 when an invalid byte comes after the first piece', () => {
    const head = 'x,1\n'.repeat(CHUNK_BYTES / 4 + 10);
    const bytes = Buffer.concat([Buffer.from(head), Buffer.from([0x54, 0xb0, 0x0a])]);
    const file = join(tempDir(), 'late.csv');
    writeFileSync(file, bytes);
    expect(allUtf8(file)).toBe(false);
    const { chunks, encoding } = readDecodedChunks(file);
    expect(encoding).toBe('windows-1252');
    expect([...chunks].join('').endsWith('T°\n')).toBe(true);
  });
});
