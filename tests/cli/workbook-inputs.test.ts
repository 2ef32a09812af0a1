import { describe, expect, it } from 'vitest';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import {
  buildDemoSample,
  demoScenario,
  sheetRowsFromText,
  writeWorkbook,
} from '../../core/synthetic';
import { temperatureFromFileName } from '../../core/io/file-name';
import { runCli, tempDir } from './cli-helpers';

/** The seeded seal-dma demo files: as text files in one folder, as one workbook in another. */
function sealFolders(): { textDir: string; bookDir: string } {
  const root = tempDir('thermoshift-xlsx-');
  const textDir = join(root, 'text');
  const bookDir = join(root, 'book');
  mkdirSync(textDir);
  mkdirSync(bookDir);
  const files = buildDemoSample(demoScenario('seal-dma')).written.files;
  for (const f of files) writeFileSync(join(textDir, f.path), f.content);
  const book = writeWorkbook(
    files.map((f) => ({
      name: `${Math.round((temperatureFromFileName(f.path)?.temperatureK ?? NaN) - 273.15)}C`,
      rows: sheetRowsFromText(f.content, ';', true),
    })),
  );
  writeFileSync(join(bookDir, 'seal.xlsx'), book);
  writeFileSync(join(bookDir, 'notes.md'), 'not data');
  return { textDir, bookDir };
}

interface Summary {
  curves: { temperatureK: number; log10aT: number | null }[];
}

describe('thermoshift with .xlsx workbooks', () => {
  const { textDir, bookDir } = sealFolders();

  it('thermoshift inspect lists every sheet as a file and reads a folder holding a workbook', () => {
    const r = runCli(['inspect', '--json', bookDir]);
    // The folder walk names what it skipped (the notes file) and nothing else goes to stderr.
    expect(r.stderr.trim()).toMatch(
      /^skipped \S*notes\.md: not a data file ending \([^)]*\.xlsx\)$/,
    );
    expect(r.status).toBe(0);
    const j = JSON.parse(r.stdout) as { files: { file: string }[]; isotherms: unknown[] };
    expect(j.files).toHaveLength(11);
    expect(j.files[0].file).toBe(`${join(bookDir, 'seal.xlsx')} › -40C`);
    expect(j.isotherms).toHaveLength(11);
  });

  it('thermoshift build gives the same shift factors from the workbook as from the text files', () => {
    const args = ['build', '--json', '--quiet', '--tref', '-20'];
    const fromText = runCli([...args, textDir]);
    const fromBook = runCli([...args, join(bookDir, 'seal.xlsx')]);
    expect(fromBook.status).toBe(0);
    const a = JSON.parse(fromText.stdout) as Summary;
    const b = JSON.parse(fromBook.stdout) as Summary;
    expect(b.curves.map((c) => c.log10aT)).toEqual(a.curves.map((c) => c.log10aT));
    expect(b.curves).toHaveLength(11);
    expect(b.curves.filter((c) => typeof c.log10aT === 'number' && c.log10aT !== 0).length).toBe(
      10,
    );
  });

  it('thermoshift inspect names the file of a damaged workbook and exits 1', () => {
    const dir = tempDir('thermoshift-xlsx-bad-');
    writeFileSync(join(dir, 'broken.xlsx'), 'PK\u0003\u0004 not really a zip');
    const r = runCli(['inspect', join(dir, 'broken.xlsx')]);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/broken\.xlsx": this is not a readable \.xlsx workbook/);
  });
});
