import { describe, expect, it } from 'vitest';
import { modelTable } from '../../../app/renderer/src/tables/analysis-tables';
import { fixtureAnalysis, FIXTURE_TRUTH } from '../../core/report/analysis-fixture';

describe('modelTable()', () => {
  it('modelTable() gives one row per constant with s.e., 95 % interval, unit, Tr and fit figures', () => {
    const t = modelTable(fixtureAnalysis());
    expect(t.header).toHaveLength(11);
    expect(t.rows).toEqual([
      ['WLF', 'C1', FIXTURE_TRUTH.c1, 0.3, 8.1, 9.6, '', 100, 0.999, 0.01, '70.0 … 130.0'],
      ['WLF', 'C2', FIXTURE_TRUTH.c2K, 4, 92, 111, 'K', 100, 0.999, 0.01, '70.0 … 130.0'],
    ]);
  });

  it('modelTable() is empty without fitted models', () => {
    expect(modelTable({ ...fixtureAnalysis(), models: {} }).rows).toEqual([]);
  });
});
