import { describe, expect, it } from 'vitest';
import { newDocument, setLocked } from '../../../app/renderer/src/document/analysis-document';
import { parseAnalysis, serializeAnalysis } from '../../../core/document';
import { analysisFileName } from '../../../app/renderer/src/document/analysis-file';
import { tinyDataset } from './tiny-dataset';

const doc = setLocked(
  newDocument(tinyDataset(), 'tiny.csv', {
    options: { referenceTemperatureK: 310, excludedIsothermIds: ['T02'] },
    importWarnings: [{ file: 'tiny.csv', row: 4, column: 2, message: 'empty cell' }],
  }),
  'T01',
  0.3,
);

describe('the app document and the saved-analysis format', () => {
  it('parseAnalysis() reads back the document the app builds (the format moved to core/document)', () => {
    const back = parseAnalysis(serializeAnalysis(doc), 'a.thermoshift.json');
    expect(back.options).toEqual(doc.options);
    expect(back.display).toEqual(doc.display);
  });
});

describe('analysisFileName()', () => {
  it('analysisFileName() uses the same stem as every export of the analysis, with our suffix', () => {
    expect(analysisFileName('QS-72 seal / batch 3')).toBe('qs-72-seal-batch-3.thermoshift.json');
    expect(analysisFileName('seal_dma')).toBe('seal-dma.thermoshift.json');
    expect(analysisFileName('')).toBe('analysis.thermoshift.json');
  });
});
