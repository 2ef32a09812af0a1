/**
 * The invented demo workbook, samples/workbooks/seal-dma.xlsx: the seal-dma scenario's eleven
 * per-isotherm files as one .xlsx workbook, one sheet per isotherm named by its set point
 * ("-40 °C" … "60 °C"), numbers as numeric cells, the "# note: invented demo data …" line
 * first on every sheet. Deterministic: the same bytes on every call.
 */
import { kelvinToCelsius } from '../data/temperature';
import { temperatureFromFileName } from '../io/file-name';
import { buildDemoSample } from './demo-samples';
import { demoScenario } from './demo-scenarios';
import { sheetRowsFromText, writeWorkbook } from './workbook-writer';

export interface DemoBinaryFile {
  /** Relative to samples/. */
  path: string;
  bytes: Uint8Array;
}

export const DEMO_WORKBOOK_PATH = 'workbooks/seal-dma.xlsx';

export function demoWorkbookReadme(): string {
  return [
    '# Invented demo workbook',
    '',
    '**All data here is invented** (QS-72 elastomer seal compound, Quillmark Seals: neither ' +
      'exists). `seal-dma.xlsx` holds the same points as `../seal-dma/`, one sheet per isotherm ' +
      'named by its temperature, written by `scripts/generate-samples.ts` (`npm run samples`). ' +
      'The true parameters are in `../seal-dma/truth.json`.',
    '',
    'Import it in the app (*Import data…* or drop it on the window) or with ' +
      '`npx thermoshift inspect samples/workbooks/seal-dma.xlsx`. See docs/import.md.',
    '',
    'Demo data only: not for design. Master curves need confirmation by testing and must follow ' +
      'the applicable codes and licensed engineering practice.',
    '',
  ].join('\n');
}

export function demoWorkbook(): Uint8Array {
  const files = buildDemoSample(demoScenario('seal-dma')).written.files;
  return writeWorkbook(
    files.map((f) => {
      const t = temperatureFromFileName(f.path);
      if (!t) throw new Error(`demoWorkbook(): no temperature in ${f.path}`);
      return {
        name: `${Math.round(kelvinToCelsius(t.temperatureK))} °C`,
        rows: sheetRowsFromText(f.content, ';', true),
      };
    }),
  );
}
