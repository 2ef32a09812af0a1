import { describe, expect, it } from 'vitest';
import { sampleFacts } from '../../../core/report/sample-facts';
import { fixtureAnalysis } from './analysis-fixture';

describe('sampleFacts()', () => {
  it('sampleFacts() leaves out one file’s temperature and strain and merges the files’ "test" into one row', () => {
    const a = fixtureAnalysis();
    const rows = sampleFacts({
      ...a,
      sample: {
        ...a.sample,
        metadata: {
          Temperature: '-40 °C',
          strain: '0.1 %',
          'Strain amplitude (%)': '0.05',
          test: 'frequency sweep',
          instrument: 'DMA, tension clamp',
          supplier: 'Invented Resins',
        },
      },
    });
    const keys = rows.map(([k]) => k);
    expect(keys.filter((k) => k === 'test')).toHaveLength(1);
    expect(rows.find(([k]) => k === 'test')![1]).toBe('oscillatory, shear (frequency sweep)');
    expect(keys.some((k) => /temperature$/i.test(k) && k !== 'reference temperature')).toBe(false);
    expect(keys.some((k) => /strain/i.test(k))).toBe(false);
    expect(keys).toContain('instrument');
    expect(keys).toContain('supplier');
  });
});
