import { describe, it, expect } from 'vitest';
import { applyMasks, checkExcluded } from '../../../core/pipeline/apply-masks';
import { OptionsError } from '../../../core/pipeline/options';
import type { Dataset } from '../../../core/data/types';
import type { AnalysisWarning } from '../../../core/pipeline/types';

const dataset: Dataset = {
  name: 's',
  testKind: 'relaxation',
  deformation: 'shear',
  abscissa: 'time',
  isotherms: [
    {
      id: 'T01',
      temperatureK: 300,
      temperatureSpreadK: 0,
      x: [1, 2],
      quantities: { relaxationModulus: [2, 1] },
      mask: [true, true],
      source: [
        { file: 'a.csv', row: 5 },
        { file: 'a.csv', row: 6 },
      ],
    },
  ],
  files: ['a.csv'],
  metadata: {},
};

describe('applyMasks()', () => {
  it('applyMasks() masks the point with that file and row, without touching the input', () => {
    const w: AnalysisWarning[] = [];
    const out = applyMasks(dataset, [{ file: 'a.csv', row: 6 }], w);
    expect(out.isotherms[0].mask).toEqual([true, false]);
    expect(dataset.isotherms[0].mask).toEqual([true, true]);
    expect(w).toEqual([]);
  });
  it('applyMasks() warns about a mask that matches no point', () => {
    const w: AnalysisWarning[] = [];
    applyMasks(dataset, [{ file: 'a.csv', row: 99 }], w);
    expect(w[0]).toMatchObject({ code: 'mask-unmatched', file: 'a.csv', row: 99 });
  });
  it('applyMasks() returns the dataset itself when nothing is masked', () => {
    expect(applyMasks(dataset, [], [])).toBe(dataset);
  });
});

describe('checkExcluded()', () => {
  it('checkExcluded() names an unknown isotherm id and lists the known ones', () => {
    expect(() => checkExcluded(dataset, ['T09'])).toThrow(OptionsError);
    expect(() => checkExcluded(dataset, ['T09'])).toThrow(/no isotherm "T09" \(isotherms: T01\)/);
    expect(() => checkExcluded(dataset, ['T01'])).not.toThrow();
  });
});
