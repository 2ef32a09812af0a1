import { describe, it, expect } from 'vitest';
import { assembleIsotherms, mergeRecords } from '../../../core/io/assemble';
import type { PointRecords } from '../../../core/io/records';
import type { QuantityId } from '../../../core/data/types';

function records(
  rows: [T: number, x: number, g: number, row: number][],
  q: QuantityId = 'storageModulus',
): PointRecords {
  return {
    n: rows.length,
    temperatureK: Float64Array.from(rows.map((r) => r[0])),
    x: Float64Array.from(rows.map((r) => r[1])),
    quantities: new Map([[q, Float64Array.from(rows.map((r) => r[2]))]]),
    row: Int32Array.from(rows.map((r) => r[3])),
    usedRows: rows.length,
  };
}

describe('mergeRecords()', () => {
  it('mergeRecords() concatenates files and fills quantities a file lacks with NaN', () => {
    const m = mergeRecords([records([[300, 1, 5, 2]]), records([[300, 2, 7, 3]], 'lossModulus')]);
    expect([...m.file]).toEqual([0, 1]);
    expect([...m.quantities.get('storageModulus')!]).toEqual([5, NaN]);
    expect([...m.quantities.get('lossModulus')!]).toEqual([NaN, 7]);
  });
});

describe('assembleIsotherms()', () => {
  it('assembleIsotherms() groups, sorts by temperature and x, averages temperatures and keeps sources', () => {
    const m = mergeRecords([
      records([
        [340, 10, 3, 2],
        [300.2, 2, 2, 3],
        [299.8, 1, 1, 4],
        [340, 1, 4, 5],
      ]),
    ]);
    const warnings: string[] = [];
    const { isotherms: isos } = assembleIsotherms(m, ['a.csv'], 1, 'frequency', (_f, _r, msg) =>
      warnings.push(msg),
    );
    expect(isos.map((i) => [i.id, i.temperatureK, i.x, i.quantities.storageModulus])).toEqual([
      ['T01', 300, [1, 2], [1, 2]],
      ['T02', 340, [1, 10], [4, 3]],
    ]);
    expect(isos[0].temperatureSpreadK).toBeCloseTo(0.4, 12);
    expect(isos[0].source).toEqual([
      { file: 'a.csv', row: 4 },
      { file: 'a.csv', row: 3 },
    ]);
    expect(warnings).toEqual([]);
  });

  it('assembleIsotherms() reports duplicates, repeated x and single-point groups', () => {
    const m = mergeRecords([
      records([
        [300, 1, 1, 2],
        [300, 1, 1, 3],
        [300, 1, 9, 4],
        [300, 2, 2, 5],
        [400, 1, 1, 6],
      ]),
    ]);
    const seen: [number, string][] = [];
    const { isotherms: isos } = assembleIsotherms(m, ['a.csv'], 1, 'frequency', (_f, row, msg) =>
      seen.push([row, msg]),
    );
    expect(isos).toHaveLength(1);
    expect(seen.map(([row]) => row)).toEqual([3, 4, 6]);
    expect(seen[0][1]).toMatch(/duplicated row/);
    expect(seen[1][1]).toMatch(/same frequency/);
    expect(seen[2][1]).toMatch(/only one frequency/);
  });
});
