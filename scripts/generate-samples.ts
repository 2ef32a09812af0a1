/**
 * `npm run samples`: writes the invented demo samples into samples/.
 *
 * Everything written is invented: the firms, products and numbers come from seeded models in
 * core/synthetic (demoScenarios(): true Prony series, shift law, vertical shift, noise and seed
 * per scenario; demoSampleFiles(): the text of every file). Each scenario folder gets its data
 * files in its own layout (long CSV with a units row; one file per isotherm with decimal commas
 * and CRLF; a wide tab-delimited table; a space-aligned temperature-ramp table), a README, and
 * truth.json with the true parameters, so tests can check how well a master curve recovers them.
 * samples/workbooks/ holds the seal-dma data once more as an .xlsx workbook (one sheet per
 * isotherm), for trying the workbook import.
 * The output is byte-for-byte reproducible; tests/scripts/generate-samples.test.ts checks that
 * the committed files match. See docs/samples.md.
 *
 * Usage: npm run samples [-- <output folder>]   (default: samples/ in the repository)
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  DEMO_WORKBOOK_PATH,
  demoSampleFiles,
  demoWorkbook,
  demoWorkbookReadme,
} from '../core/synthetic/index.ts';
import { lotReleaseFiles } from '../core/synthetic/lot-release.ts';

/** Writes every demo sample file under `outDir`; returns the paths written, relative to it. */
export function generateSamples(outDir: string): string[] {
  // the scenarios, plus the invented lot-release demo (reference lot, three lots, a spec)
  const files = [...demoSampleFiles(), ...lotReleaseFiles()];
  for (const f of files) {
    const target = join(outDir, f.path);
    mkdirSync(dirname(target), { recursive: true });
    writeFileSync(target, f.content, 'utf8');
  }
  // The seal-dma data once more as an .xlsx workbook (one sheet per isotherm), with its README.
  const book = join(outDir, DEMO_WORKBOOK_PATH);
  mkdirSync(dirname(book), { recursive: true });
  writeFileSync(book, demoWorkbook());
  writeFileSync(join(dirname(book), 'README.md'), demoWorkbookReadme(), 'utf8');
  return [...files.map((f) => f.path), DEMO_WORKBOOK_PATH, 'workbooks/README.md'];
}

const isEntry = process.argv[1] && resolve(process.argv[1]) === fileURLToPath(import.meta.url);
if (isEntry) {
  const outDir = resolve(
    process.argv[2] ?? join(dirname(fileURLToPath(import.meta.url)), '..', 'samples'),
  );
  const written = generateSamples(outDir);
  console.log(`Wrote ${written.length} invented demo sample files to ${outDir}`);
}
