import { draftColumns } from './column-draft';
import { planColumns } from './column-plan';
import type { ColumnPlan } from './column-plan';
import { detectDialect } from './dialect';
import { temperatureFromFileName } from './file-name';
import { ImportError } from './import-error';
import { cleanText, headLines, isBlank, isComment } from './lines';
import { deformationFromMetadata, quantityFromMetadata, temperatureFromMetadata } from './metadata';
import { buildRecords } from './records';
import { findBlocks } from './blocks';
import type { PointRecords } from './records';
import { scanTable } from './scan-table';
import { findStructure } from './structure';
import type { FileReport, ResolvedImportOptions, SourceFile } from './types';
import { WarningSink } from './warning-sink';

/** One file read: what was recognised, its points and its warnings (still open for more). */
export interface FileImport {
  report: Omit<FileReport, 'deformation'>;
  plan: ColumnPlan;
  /** Deformation from the file's metadata ("mode: tension"), when the headers do not say. */
  metadataDeformation?: FileReport['deformation'];
  records: PointRecords;
  sink: WarningSink;
}

const HEAD_LINES = 400;

function fileTemperature(
  file: SourceFile,
  metadata: Record<string, string>,
  o: ResolvedImportOptions,
  sink: WarningSink,
): { temperatureK: number; from: 'option' | 'metadata' | 'fileName' } {
  const forced = o.fileTemperatureK[file.name];
  if (forced !== undefined) return { temperatureK: forced, from: 'option' };
  const meta = temperatureFromMetadata(metadata);
  if (meta) {
    if (meta.reading.assumed)
      sink.add(0, 0, `the temperature line "${meta.key}" has no unit; °C was assumed`);
    return { temperatureK: meta.reading.temperatureK, from: 'metadata' };
  }
  const named = temperatureFromFileName(file.name);
  if (named) return { temperatureK: named.temperatureK, from: 'fileName' };
  throw new ImportError(
    'noTemperature',
    file.name,
    0,
    0,
    'no temperature found: no temperature column, no temperatures in the column headers, no line ' +
      'such as "# temperature: 40 °C" above the table and none in the file name (e.g. "seal_40C.csv"). ' +
      'Add one of these, or give the temperature of this file explicitly (`--file-temperature` on the command line).',
  );
}

/** Reads one file: layout, dialect, header and units, columns, then every row into points. */
export function importFile(file: SourceFile, o: ResolvedImportOptions): FileImport {
  const name = file.name;
  if (typeof file.text !== 'string') {
    throw new ImportError('notText', name, 0, 0, 'the file content is not text.');
  }
  const text = cleanText(file.text);
  if (/^\s*$/.test(text)) throw new ImportError('emptyFile', name, 0, 0, 'the file is empty.');
  const head = headLines(text, HEAD_LINES);
  if (head.some((l) => l.text.indexOf('\u0000') >= 0)) {
    throw new ImportError(
      'notText',
      name,
      0,
      0,
      'this is not a text file (it contains zero bytes). Export the data as CSV or text (UTF-8).',
    );
  }
  const candidates = head.filter((l) => !isBlank(l.text) && !isComment(l.text)).slice(0, 200);
  // Detection looks at the first 64 k characters of each line: enough for any real table.
  const dialect = detectDialect(candidates.map((l) => l.text.slice(0, 65536)));
  const structure = dialect ? findStructure(head, dialect) : undefined;
  if (!dialect || !structure) {
    throw new ImportError(
      'noNumericData',
      name,
      0,
      0,
      `no table of numbers found in the first ${HEAD_LINES} lines: rows need two or more numbers ` +
        'separated by commas, semicolons, tabs or spaces.',
    );
  }
  const mappings = o.columns.filter((m) => m.file === undefined || m.file === name);
  if (structure.headerRow === 0 && mappings.length === 0) {
    throw new ImportError(
      'noHeader',
      name,
      structure.firstDataRow,
      0,
      'the table has no header row naming its columns. Add one, e.g. "T (°C), f (Hz), G\' (Pa), ' +
        "G'' (Pa)\", or map the columns explicitly.",
    );
  }
  const sink = new WarningSink(name, o.maxWarningsPerFile);
  const ncols = Math.max(dialect.columns, structure.header.length);
  const quantityText = quantityFromMetadata(structure.metadata);
  const drafts = draftColumns({
    file: name,
    header: structure.header,
    headerRow: structure.headerRow,
    units: structure.units,
    unitsRow: structure.unitsRow,
    ncols,
    mappings,
    ...(quantityText ? { quantityText } : {}),
  });
  const plan = planColumns(drafts, {
    file: name,
    headerRow: structure.headerRow,
    testKind: o.testKind,
    warnings: sink,
  });
  const fileT =
    plan.layout === 'perIsotherm' ? fileTemperature(file, structure.metadata, o, sink) : undefined;
  const read = new Set([
    plan.xColumn,
    plan.temperatureColumn,
    ...plan.quantityColumns.map((q) => q.column),
  ]);
  const wanted = plan.columns.map((c) => read.has(c.index - 1));
  const table = scanTable(text, structure.firstDataOffset, structure.firstDataRow, {
    delimiter: dialect.delimiter,
    decimalComma: dialect.decimalComma,
    wanted,
    maxProblems: o.maxWarningsPerFile,
    perCell: plan.layout === 'wide',
  });
  const blocks = findBlocks(table.notes, structure.header, dialect.delimiter);
  if (fileT?.from === 'option') blocks.starts = [];
  const records = buildRecords(table, plan, fileT?.temperatureK, sink, blocks);
  const blockTemperaturesK =
    plan.layout === 'perIsotherm' && blocks.starts.length > 0
      ? [
          ...(blocks.starts[0].row > 0 ? [fileT!.temperatureK] : []),
          ...blocks.starts.map((b) => b.temperatureK),
        ]
      : undefined;
  if (records.n === 0) {
    const first = sink.list.find((w) => w.row >= structure.firstDataRow);
    throw new ImportError(
      'noNumericData',
      name,
      first?.row ?? structure.firstDataRow,
      first?.column ?? 0,
      `none of the ${table.rows} table rows gave a usable point` +
        (first ? ` (first problem: ${first.message}).` : '.'),
    );
  }
  const metadataDeformation = deformationFromMetadata(structure.metadata);
  return {
    report: {
      file: name,
      layout: plan.layout,
      delimiter: dialect.delimiter,
      decimalSeparator: dialect.decimalComma ? ',' : '.',
      headerRow: structure.headerRow,
      unitsRow: structure.unitsRow,
      firstDataRow: structure.firstDataRow,
      dataRows: table.rows,
      usedRows: records.usedRows,
      metadata: structure.metadata,
      ...(fileT ? { temperatureK: fileT.temperatureK, temperatureFrom: fileT.from } : {}),
      ...(blockTemperaturesK ? { blockTemperaturesK } : {}),
      testKind: plan.testKind,
      columns: plan.columns,
    },
    plan,
    ...(metadataDeformation ? { metadataDeformation } : {}),
    records,
    sink,
  };
}
