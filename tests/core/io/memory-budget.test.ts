import { describe, it, expect } from 'vitest';
import { importFiles } from '../../../core/io';
import { LineChunker } from '../../../core/io/decode';
import { BYTES_PER_ROW_MEASURED, estimateImportBytes } from '../../../core/io/memory-budget';

/** A long table of `n` rows at 4 temperatures, with a deterministic (seeded) jitter in G'. */
function longTable(n: number): string {
  let seed = 7;
  const rnd = (): number => (seed = (seed * 16807) % 2147483647) / 2147483647;
  const lines = ["T (°C),f (Hz),G' (Pa),G'' (Pa)"];
  for (let i = 0; i < n; i++) {
    const t = [0, 20, 40, 60][Math.floor((4 * i) / n)];
    const f = 10 ** (-2 + (4 * (i % (n / 4))) / (n / 4));
    lines.push(
      `${t},${f.toPrecision(6)},${(1e5 * (1 + rnd())).toPrecision(6)},${(2e4).toFixed(1)}`,
    );
  }
  return `${lines.join('\n')}\n`;
}

/** Cuts text into pieces of `size` characters, then into whole-line chunks (as the CLI does). */
function* chunked(text: string, size: number): Generator<string> {
  const c = new LineChunker();
  for (let i = 0; i < text.length; i += size) {
    const s = c.push(text.slice(i, i + size));
    if (s) yield s;
  }
  const rest = c.end();
  if (rest) yield rest;
}

describe('estimateImportBytes()', () => {
  it('estimateImportBytes() grows with rows and with columns beyond four', () => {
    expect(estimateImportBytes(1e6, 4)).toBe(1e6 * BYTES_PER_ROW_MEASURED);
    expect(estimateImportBytes(1e6, 6)).toBeGreaterThan(estimateImportBytes(1e6, 4));
  });
});

describe('importFiles() on chunked files', () => {
  it('importFiles() gives the same points from chunks as from one string', () => {
    const text = longTable(40_000); // about 1.3 MB: more than the 1 MB head, many chunks
    const whole = importFiles([{ name: 'a.csv', text }]);
    const parts = importFiles([{ name: 'a.csv', text: '', chunks: chunked(text, 65_537) }]);
    expect(parts.dataset.isotherms.map((i) => i.x)).toEqual(
      whole.dataset.isotherms.map((i) => i.x),
    );
    expect(parts.dataset.isotherms.map((i) => i.quantities.storageModulus)).toEqual(
      whole.dataset.isotherms.map((i) => i.quantities.storageModulus),
    );
    expect(parts.dataset.isotherms.at(-1)!.source.at(-1)).toEqual(
      whole.dataset.isotherms.at(-1)!.source.at(-1),
    );
    expect(parts.files[0].dataRows).toBe(40_000);
  });

  it('importFiles() keeps row numbers right for a bad cell after the first chunk', () => {
    const lines = longTable(40_000).split('\n');
    lines[35_000] = lines[35_000].replace(/,[^,]+,/, ',junk,');
    const text = lines.join('\n');
    const r = importFiles([{ name: 'a.csv', text: '', chunks: chunked(text, 100_003) }]);
    expect(r.warnings).toHaveLength(1);
    expect(r.warnings[0]).toMatchObject({ file: 'a.csv', row: 35_001, column: 2 });
  });

  it('importFiles() reads an old-Mac (CR only) file longer than one line chunk like one string', () => {
    const text = longTable(600_000).replace(/\n/g, '\r'); // about 20 M characters, no LF at all
    const whole = importFiles([{ name: 'mac.csv', text }]);
    const parts = importFiles([{ name: 'mac.csv', text: '', chunks: chunked(text, 4 << 20) }]);
    expect(parts.files[0].dataRows).toBe(whole.files[0].dataRows);
    expect(parts.dataset.isotherms.map((i) => i.x.length)).toEqual(
      whole.dataset.isotherms.map((i) => i.x.length),
    );
  });

  it('importFiles() refuses a file over the memory budget before reading it, naming the file', () => {
    const text = longTable(4_000);
    // Stands for a 2 GB, 50-million-row file: only the head is read before the refusal.
    let chunksRead = 0;
    function* counted(): Generator<string> {
      for (const c of chunked(text, 1 << 20)) {
        chunksRead++;
        yield c;
      }
    }
    expect(() =>
      importFiles([{ name: 'huge.csv', text: '', chunks: counted(), byteLength: 2e9 }], {
        memoryBudgetBytes: 4e9,
      }),
    ).toThrow(/huge\.csv.*out of memory budget: about \d+(\.\d)? million rows/);
    expect(chunksRead).toBe(1);
  });
});
