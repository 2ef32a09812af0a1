import { describe, it, expect } from 'vitest';
import { ImportError, resolveImportOptions } from '../../../core/io';

describe('resolveImportOptions()', () => {
  it('resolveImportOptions() applies the documented defaults', () => {
    expect(resolveImportOptions()).toEqual({
      groupingToleranceK: 1,
      columns: [],
      fileTemperatureK: {},
      testKind: 'auto',
      deformation: 'auto',
      sampleName: undefined,
      maxWarningsPerFile: 200,
      deriveQuantities: true,
      memoryBudgetBytes: 4e9,
    });
  });

  it('resolveImportOptions() keeps given values', () => {
    const o = resolveImportOptions({
      groupingToleranceK: 2.5,
      testKind: 'creep',
      deriveQuantities: false,
    });
    expect(o.groupingToleranceK).toBe(2.5);
    expect(o.testKind).toBe('creep');
    expect(o.deriveQuantities).toBe(false);
  });

  it('resolveImportOptions() throws an ImportError naming the bad option', () => {
    const bad = [
      { groupingToleranceK: -1 },
      { groupingToleranceK: NaN },
      { maxWarningsPerFile: 1.5 },
      { fileTemperatureK: { 'a.csv': -3 } },
      { columns: [{ column: 0, role: 'time' as const }] },
      { columns: [{ column: ' ', role: 'time' as const }] },
      { columns: [{ column: 1, role: 'time' as const, temperatureK: 0 }] },
    ];
    for (const o of bad) {
      expect(() => resolveImportOptions(o), JSON.stringify(o)).toThrow(ImportError);
    }
    expect(() => resolveImportOptions({ groupingToleranceK: -1 })).toThrow(/groupingToleranceK/);
  });
});
