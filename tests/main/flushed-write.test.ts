import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { writeFileAtomic, writeFlushedSync } from '../../app/shared/flushed-write';
import { writeFileAtomic as writeTextAtomic } from '../../app/main/text-files';

const dirs: string[] = [];
const fresh = () => {
  const d = mkdtempSync(join(tmpdir(), 'thermoshift-write-'));
  dirs.push(d);
  return d;
};
afterEach(() => {
  for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
});

describe('writeFlushedSync()', () => {
  it('writeFlushedSync() writes the bytes and refuses an existing file when exclusive', () => {
    const path = join(fresh(), 'a.txt');
    writeFlushedSync(path, Buffer.from('μ 1\n', 'utf8'));
    expect(readFileSync(path, 'utf8')).toBe('μ 1\n');
    expect(() => writeFlushedSync(path, Buffer.from('x'))).toThrow(/EEXIST/);
    writeFlushedSync(path, Buffer.from('x'), false);
    expect(readFileSync(path, 'utf8')).toBe('x');
  });
});

describe('writeFileAtomic()', () => {
  it('writeFileAtomic() replaces a file as a whole and leaves no temporary file', async () => {
    const dir = fresh();
    const path = join(dir, 'autosave.json');
    writeFileSync(path, 'old');
    await writeFileAtomic(path, Buffer.from('{"new":true}'));
    expect(readFileSync(path, 'utf8')).toBe('{"new":true}');
    await writeTextAtomic(path, Buffer.from('bytes').toString('base64'), 'base64');
    expect(readFileSync(path, 'utf8')).toBe('bytes');
    expect(readdirSync(dir)).toEqual(['autosave.json']);
  });
});
