/**
 * The wide table: one abscissa column and one column per quantity and temperature, the
 * temperature written in the column header ("G' 40 °C"). A row holds one point of each isotherm,
 * so a bad cell loses only its point, and each temperature column is one sweep.
 */
import { longLayout } from './layout-long';
import type { FileLayout } from './layout-types';

export const wideLayout: FileLayout = {
  id: 'wide',
  name: 'wide table (one column per temperature)',
  description: 'one column per temperature',
  sweeps: 'temperature',
  recognise(sample) {
    const withT = sample.quantityColumns.filter((q) => q.temperatureK !== undefined);
    if (withT.length === 0) return undefined;
    return {
      confidence: 1,
      evidence: `${withT.length} column${withT.length === 1 ? '' : 's'} carry a temperature in the header`,
    };
  },
  // Rows are read as in the long table, cell by cell: a bad cell loses only its point.
  read: (ctx) => ({ ...longLayout.read(ctx), perCell: true }),
};
