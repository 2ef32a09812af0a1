import { describe, it, expect } from 'vitest';
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { assertWritable, OutputExistsError, writeFileAtomic } from '../../app/cli/io/atomic-write';
import { CliError } from '../../app/cli/cli-error';
import { EXIT } from '../../app/cli/exit-codes';
import { tempDir } from './cli-helpers';

describe('writeFileAtomic()', () => {
  it('writeFileAtomic() creates the folder and the file and leaves no temporary file', () => {
    const dir = join(tempDir(), 'a', 'b');
    writeFileAtomic(join(dir, 'x.csv'), 'one', { force: false });
    expect(readFileSync(join(dir, 'x.csv'), 'utf8')).toBe('one');
    expect(readdirSync(dir)).toEqual(['x.csv']);
  });
  it('writeFileAtomic() never replaces an existing file without force', () => {
    const dir = tempDir();
    const p = join(dir, 'x.csv');
    writeFileSync(p, 'old');
    expect(() => writeFileAtomic(p, 'new', { force: false })).toThrow(OutputExistsError);
    expect(readFileSync(p, 'utf8')).toBe('old');
    expect(readdirSync(dir)).toEqual(['x.csv']);
    try {
      writeFileAtomic(p, 'new', { force: false });
    } catch (e) {
      expect((e as CliError).exitCode).toBe(EXIT.outputError);
      expect((e as Error).message).toMatch(/x\.csv already exists; use --force/);
    }
  });
  it('writeFileAtomic() replaces the file with force', () => {
    const dir = tempDir();
    const p = join(dir, 'x.csv');
    writeFileSync(p, 'old');
    writeFileAtomic(p, 'new', { force: true });
    expect(readFileSync(p, 'utf8')).toBe('new');
    expect(readdirSync(dir)).toEqual(['x.csv']);
  });
  it('writeFileAtomic() reports a folder it cannot create as an output error', () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'file'), '');
    expect(() => writeFileAtomic(join(dir, 'file', 'x.csv'), 'a', { force: false })).toThrow(
      /cannot create folder/,
    );
  });
});

describe('assertWritable()', () => {
  it('assertWritable() lists how many outputs exist, and passes with force', () => {
    const dir = tempDir();
    const a = join(dir, 'a');
    const b = join(dir, 'b');
    writeFileSync(a, '');
    writeFileSync(b, '');
    expect(() => assertWritable([a, b], false)).toThrow(/2 output files already exist/);
    expect(() => assertWritable([a], false)).toThrow(OutputExistsError);
    expect(() => assertWritable([a, b], true)).not.toThrow();
    expect(() => assertWritable([join(dir, 'c')], false)).not.toThrow();
  });
});
