/**
 * The wide table: one abscissa column and one column per quantity and temperature, the
 * temperature written in the column header ("G' 40 °C"). A row holds one point of each isotherm,
 * so a bad cell loses only its point, and each temperature column is one sweep.
 */
import { findBlocks } from './blocks';
import type { FileLayout } from './layout-types';
import { buildRecords } from './records';

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
  read(ctx) {
    return {
      perCell: true,
      assemble(table) {
        const blocks = findBlocks(table.notes, ctx.structure.header, ctx.delimiter);
        return { records: buildRecords(table, ctx.plan, undefined, ctx.sink, blocks) };
      },
    };
  },
};
