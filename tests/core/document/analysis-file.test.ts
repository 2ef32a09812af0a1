import { describe, expect, it } from 'vitest';
import {
  ANALYSIS_FORMAT_VERSION,
  AnalysisFileError,
  parseAnalysis,
  serializeAnalysis,
} from '../../../core/document';
import type { SavedAnalysis } from '../../../core/document';
import { tinyDataset } from '../../renderer/document/tiny-dataset';

const doc: SavedAnalysis = {
  dataset: tinyDataset(),
  options: {
    referenceTemperatureK: 310,
    excludedIsothermIds: ['T02'],
    lockedLog10aT: { T01: 0.3 },
  },
  invented: false,
  origin: 'tiny.csv',
  importWarnings: [{ file: 'tiny.csv', row: 4, column: 2, message: 'empty cell' }],
  display: { modulus: 'Pa', frequency: 'rad/s' },
};

describe('serializeAnalysis() and parseAnalysis()', () => {
  it('parseAnalysis() reads back what serializeAnalysis() wrote, missing values included', () => {
    const text = serializeAnalysis(doc, new Date('2026-01-02T03:04:05Z'));
    const back = parseAnalysis(text, 'a.thermoshift.json');
    expect(back.options).toEqual(doc.options);
    expect(back.importWarnings).toEqual(doc.importWarnings);
    expect(back.dataset.isotherms[0].quantities.storageModulus![2]).toBeNaN();
    expect(back.dataset.isotherms[1].source).toEqual(doc.dataset.isotherms[1].source);
    expect(JSON.parse(text).savedAt).toBe('2026-01-02T03:04:05.000Z');
  });

  it('parseAnalysis() keeps the display units, and opens a format-1 file (no units) in Pa and rad/s', () => {
    const mpa = { ...doc, display: { modulus: 'MPa' as const, frequency: 'Hz' as const } };
    expect(parseAnalysis(serializeAnalysis(mpa), 'a.json').display).toEqual({
      modulus: 'MPa',
      frequency: 'Hz',
    });
    const v1 = JSON.parse(serializeAnalysis(doc));
    v1.formatVersion = 1;
    delete v1.display;
    const back = parseAnalysis(JSON.stringify(v1), 'old.thermoshift.json');
    expect(back.display).toEqual({ modulus: 'Pa', frequency: 'rad/s' });
    expect(back.options).toEqual(doc.options);
  });

  it('parseAnalysis() refuses a file from a newer version with a message saying so', () => {
    const raw = JSON.parse(serializeAnalysis(doc));
    raw.formatVersion = ANALYSIS_FORMAT_VERSION + 1;
    expect(() => parseAnalysis(JSON.stringify(raw), 'new.json')).toThrow(
      /newer Thermoshift.*update/,
    );
  });

  it('parseAnalysis() names the file and the problem for bad input', () => {
    expect(() => parseAnalysis('{ not json', 'x.json')).toThrow(AnalysisFileError);
    expect(() => parseAnalysis('{ not json', 'x.json')).toThrow(
      /x\.json is not a Thermoshift analysis: it is not valid JSON/,
    );
    expect(() => parseAnalysis('{"a":1}', 'data.json')).toThrow(/not a Thermoshift analysis file/);
    const raw = JSON.parse(serializeAnalysis(doc));
    raw.dataset.isotherms[0].mask = [true];
    expect(() => parseAnalysis(JSON.stringify(raw), 'cut.json')).toThrow(
      /cut\.json is damaged: .*mask has 1 values but x has 3/,
    );
    const raw2 = JSON.parse(serializeAnalysis(doc));
    raw2.options.referenceTemperatureK = -5;
    expect(() => parseAnalysis(JSON.stringify(raw2), 'neg.json')).toThrow(
      /neg\.json is damaged: options\.referenceTemperatureK/,
    );
  });
});
