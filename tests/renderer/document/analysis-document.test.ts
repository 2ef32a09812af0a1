import { describe, expect, it } from 'vitest';
import {
  isMasked,
  newDocument,
  setLocked,
  toggleExcluded,
  toggleMasked,
  withOptions,
} from '../../../app/renderer/src/document/analysis-document';
import { tinyDataset } from './tiny-dataset';

const doc = newDocument(tinyDataset(), 'test');

describe('toggleExcluded()', () => {
  it('toggleExcluded() excludes then includes again, leaving the original untouched', () => {
    const a = toggleExcluded(doc, 'T01');
    expect(a.options.excludedIsothermIds).toEqual(['T01']);
    expect(toggleExcluded(a, 'T01').options.excludedIsothermIds).toEqual([]);
    expect(doc.options.excludedIsothermIds).toBeUndefined();
  });
});

describe('setLocked()', () => {
  it('setLocked() locks a shift in decades and unlocks it with null', () => {
    const a = setLocked(doc, 'T02', -0.25);
    expect(a.options.lockedLog10aT).toEqual({ T02: -0.25 });
    expect(setLocked(a, 'T02', null).options.lockedLog10aT).toEqual({});
  });
});

describe('toggleMasked()', () => {
  it('toggleMasked() masks new points and unmasks when all given points are masked', () => {
    const p = [
      { file: 'tiny.csv', row: 2 },
      { file: 'tiny.csv', row: 3 },
    ];
    const a = toggleMasked(doc, [p[0]]);
    expect(isMasked(a, p[0])).toBe(true);
    const b = toggleMasked(a, p);
    expect(b.options.maskedPoints).toHaveLength(2);
    const c = toggleMasked(b, p);
    expect(c.options.maskedPoints).toEqual([]);
    expect(toggleMasked(doc, [])).toBe(doc);
  });
});

describe('withOptions()', () => {
  it('withOptions() merges a patch into a new document', () => {
    const a = withOptions(doc, { referenceTemperatureK: 300 });
    expect(a).not.toBe(doc);
    expect(a.options.referenceTemperatureK).toBe(300);
    expect(a.dataset).toBe(doc.dataset);
  });
});
