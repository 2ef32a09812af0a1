/** The long table: one row per point, a temperature column gives each row its temperature. */
import { findBlocks } from './blocks';
import type { FileLayout } from './layout-types';
import { buildRecords } from './records';

export const longLayout: FileLayout = {
  id: 'long',
  name: 'long table (temperature column)',
  description: 'one table with a temperature column',
  sweeps: 'runs',
  recognise(sample) {
    const t = sample.temperatureColumn;
    if (t < 0) return undefined;
    const header = sample.columns[t]?.header ?? '';
    return {
      confidence: 1,
      evidence: `column ${t + 1}${header ? ` ("${header}")` : ''} gives the temperature of each row`,
    };
  },
  read(ctx) {
    return {
      perCell: false,
      assemble(table) {
        const blocks = findBlocks(table.notes, ctx.structure.header, ctx.delimiter);
        return { records: buildRecords(table, ctx.plan, undefined, ctx.sink, blocks) };
      },
    };
  },
};
