/** A small invented dataset for the renderer's unit tests (two isotherms, three points each). */
import type { Dataset } from '../../../core/data/types';

export function tinyDataset(): Dataset {
  const iso = (id: string, temperatureK: number, firstRow: number) => ({
    id,
    temperatureK,
    temperatureSpreadK: 0,
    x: [0.1, 1, 10],
    quantities: { storageModulus: [1e3, 1e4, Number.NaN], lossModulus: [2e3, 1.5e4, 4e4] },
    mask: [true, true, true],
    source: [0, 1, 2].map((i) => ({ file: 'tiny.csv', row: firstRow + i })),
  });
  return {
    name: 'Tiny invented sample',
    testKind: 'oscillatory',
    deformation: 'shear',
    abscissa: 'angularFrequency',
    isotherms: [iso('T01', 300, 2), iso('T02', 320, 5)],
    files: ['tiny.csv'],
    metadata: { invented: 'yes' },
  };
}
