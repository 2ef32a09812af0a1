/**
 * The committed invented workbook (samples/workbooks/seal-dma.xlsx) imports through the workbook
 * reader and the importer into exactly the isotherms of the text files in samples/seal-dma.
 */
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { importFiles, workbookToSourceFiles } from '../../core/io';

const SAMPLES = fileURLToPath(new URL('../../samples', import.meta.url));

describe('samples/workbooks/seal-dma.xlsx', () => {
  it('importFiles() reads the demo workbook into the same isotherms as samples/seal-dma', async () => {
    const sheets = await workbookToSourceFiles(
      'seal-dma.xlsx',
      new Uint8Array(readFileSync(join(SAMPLES, 'workbooks', 'seal-dma.xlsx'))),
    );
    expect(sheets).toHaveLength(11);
    for (const s of sheets) expect(s.text.split('\n')[0]).toMatch(/^# note: invented demo data/);
    const dir = join(SAMPLES, 'seal-dma');
    const text = readdirSync(dir)
      .filter((f) => f.endsWith('.txt'))
      .map((f) => ({ name: f, text: readFileSync(join(dir, f), 'utf8') }));
    const a = importFiles(sheets).dataset;
    const b = importFiles(text).dataset;
    expect(a.name).toBe(b.name);
    expect(a.isotherms.map((i) => i.temperatureK)).toEqual(b.isotherms.map((i) => i.temperatureK));
    a.isotherms.forEach((iso, k) => {
      expect(iso.x).toEqual(b.isotherms[k].x);
      expect(iso.quantities).toEqual(b.isotherms[k].quantities);
    });
  });
});
