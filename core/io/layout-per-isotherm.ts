/**
 * One isotherm per file: no temperature column and no temperatures in the headers, so the whole
 * file was measured at one temperature, taken from the options, a metadata line or the file name.
 * The file may hold several blocks, each opened by its own temperature line (core/io/blocks.ts).
 */
import { findBlocks } from './blocks';
import { temperatureFromFileName } from './file-name';
import { ImportError } from './import-error';
import type { FileLayout, LayoutContext, LayoutReportFields } from './layout-types';
import { temperatureFromMetadata } from './metadata';
import { buildRecords } from './records';

function fileTemperature(ctx: LayoutContext): {
  temperatureK: number;
  from: 'option' | 'metadata' | 'fileName';
} {
  const { file, options: o, sink } = ctx;
  const forced = o.fileTemperatureK[file];
  if (forced !== undefined) return { temperatureK: forced, from: 'option' };
  const meta = temperatureFromMetadata(ctx.structure.metadata);
  if (meta) {
    if (meta.reading.assumed)
      sink.add(0, 0, `the temperature line "${meta.key}" has no unit; °C was assumed`);
    return { temperatureK: meta.reading.temperatureK, from: 'metadata' };
  }
  const named = temperatureFromFileName(file);
  if (named) return { temperatureK: named.temperatureK, from: 'fileName' };
  throw new ImportError(
    'noTemperature',
    file,
    0,
    0,
    'no temperature found: no temperature column, no temperatures in the column headers, no line ' +
      'such as "# temperature: 40 °C" above the table and none in the file name (e.g. "seal_40C.csv"). ' +
      'Add one of these, or give the temperature of this file explicitly (`--file-temperature` on the command line).',
  );
}

export const perIsothermLayout: FileLayout = {
  id: 'perIsotherm',
  name: 'one isotherm',
  description: 'one file per isotherm',
  sweeps: 'runs',
  recognise(sample) {
    if (sample.temperatureColumn >= 0) return undefined;
    if (sample.quantityColumns.some((q) => q.temperatureK !== undefined)) return undefined;
    // The fallback: any table without a temperature column is one isotherm.
    return {
      confidence: 0.5,
      evidence: 'no temperature column and no temperatures in the column headers',
    };
  },
  read(ctx) {
    const fileT = fileTemperature(ctx);
    return {
      perCell: false,
      assemble(table) {
        const blocks = findBlocks(table.notes, ctx.structure.header, ctx.delimiter);
        if (fileT.from === 'option') blocks.starts = [];
        const records = buildRecords(table, ctx.plan, fileT.temperatureK, ctx.sink, blocks);
        const report: LayoutReportFields = {
          temperatureK: fileT.temperatureK,
          temperatureFrom: fileT.from,
        };
        if (blocks.starts.length > 0)
          report.blockTemperaturesK = [
            ...(blocks.starts[0].row > 0 ? [fileT.temperatureK] : []),
            ...blocks.starts.map((b) => b.temperatureK),
          ];
        return { records, report };
      },
    };
  },
};
