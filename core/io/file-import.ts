import { draftColumns } from './column-draft';
import { planColumns } from './column-plan';
import type { ColumnPlan } from './column-plan';
import { detectDialect } from './dialect';
import { ImportError } from './import-error';
import { cleanText, headLines, isBlank, isComment } from './lines';
import { deformationFromMetadata, quantityFromMetadata } from './metadata';
import { layoutById } from './layouts';
import type { PointRecords } from './records';
import { scanTable } from './scan-table';
import type { ScanSpec, ScannedTable } from './scan-table';
import { estimateImportBytes } from './memory-budget';
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

/** Reads one file: layout, dialect, header and units, columns, then every row into points. */
export function importFile(file: SourceFile, o: ResolvedImportOptions): FileImport {
  const name = file.name;
  const chunks = file.chunks?.[Symbol.iterator]();
  if (!chunks && typeof file.text !== 'string') {
    throw new ImportError('notText', name, 0, 0, 'the file content is not text.');
  }
  // Chunked files: the first chunks (at least HEAD_CHARS) are the head; the rest is scanned
  // chunk by chunk below, so the whole file is never one string.
  const rawHead = chunks ? firstChunks(chunks) : file.text;
  const text = cleanText(rawHead);
  // Old-Mac files (CR only) are cleaned the same way chunk by chunk.
  const crOnly = chunks !== undefined && text.length === rawHead.length && text !== rawHead;
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
    metadata: structure.metadata,
  });
  const reading = layoutById(plan.layout).read({
    file: name,
    options: o,
    structure,
    plan,
    delimiter: dialect.delimiter,
    sink,
  });
  const read = new Set([
    plan.xColumn,
    plan.temperatureColumn,
    ...plan.quantityColumns.map((q) => q.column),
    ...(reading.extraColumns ?? []),
  ]);
  const wanted = plan.columns.map((c) => read.has(c.index - 1));
  if (file.byteLength !== undefined && text.length > structure.firstDataOffset) {
    // Rows estimated from the file size and the mean length of the head's table lines.
    const headRows = Math.max(1, countBreaks(text, structure.firstDataOffset));
    const bytesPerLine = Math.max(1, (text.length - structure.firstDataOffset) / headRows);
    const rows = file.byteLength / bytesPerLine;
    const need = estimateImportBytes(rows, read.size);
    if (need > o.memoryBudgetBytes) {
      throw new ImportError(
        'overBudget',
        name,
        0,
        0,
        `out of memory budget: about ${fmtCount(rows)} rows would need about ${fmtBytes(need)}, ` +
          `more than the ${fmtBytes(o.memoryBudgetBytes)} allowed. Split the file (for example ` +
          'one file per temperature) or thin the rows.',
      );
    }
  }
  const spec: ScanSpec = {
    delimiter: dialect.delimiter,
    decimalComma: dialect.decimalComma,
    wanted,
    maxProblems: o.maxWarningsPerFile,
    perCell: reading.perCell,
  };
  let table = scanTable(text, structure.firstDataOffset, structure.firstDataRow, spec);
  if (chunks) {
    const parts = [table];
    let line = table.nextLine;
    for (let r = chunks.next(); !r.done; r = chunks.next()) {
      const part = scanTable(crOnly ? r.value.replace(/\r/g, '\n') : r.value, 0, line, spec);
      line = part.nextLine;
      if (part.rows > 0 || part.notes.length > 0) parts.push(part);
    }
    table = joinTables(parts, spec.maxProblems);
  }
  const { records, report: layoutReport } = reading.assemble(table);
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
      encoding: file.encoding ?? 'utf-8',
      headerRow: structure.headerRow,
      unitsRow: structure.unitsRow,
      firstDataRow: structure.firstDataRow,
      dataRows: table.rows,
      usedRows: records.usedRows,
      metadata: structure.metadata,
      ...layoutReport,
      testKind: plan.testKind,
      columns: plan.columns,
    },
    plan,
    ...(metadataDeformation ? { metadataDeformation } : {}),
    records,
    sink,
  };
}

/** Characters of a chunked file taken as its head (layout, header, units, dialect). */
const HEAD_CHARS = 1 << 20;

/** Joins the first chunks until HEAD_CHARS characters (or the end). */
function firstChunks(chunks: Iterator<string>): string {
  const head: string[] = [];
  let n = 0;
  while (n < HEAD_CHARS) {
    const r = chunks.next();
    if (r.done) break;
    head.push(r.value);
    n += r.value.length;
  }
  return head.join('');
}

function countBreaks(text: string, from: number): number {
  let n = 0;
  for (let i = text.indexOf('\n', from); i >= 0; i = text.indexOf('\n', i + 1)) n++;
  return n;
}

const fmtCount = (n: number): string =>
  n >= 1e6 ? `${(n / 1e6).toFixed(1)} million` : `${Math.round(n)}`;
const fmtBytes = (b: number): string => `${(b / 1e9).toFixed(1)} GB`;

/** One table from the tables of consecutive chunks (rows, lines, values, problems, notes). */
export function joinTables(parts: ScannedTable[], maxProblems: number): ScannedTable {
  if (parts.length === 1) return parts[0];
  const rows = parts.reduce((s, p) => s + p.rows, 0);
  const line = new Int32Array(rows);
  const bad = new Uint8Array(rows);
  const values = parts[0].values.map((v) => (v ? new Float64Array(rows) : null));
  const problems: ScannedTable['problems'] = [];
  const notes: ScannedTable['notes'] = [];
  let problemCount = 0;
  let at = 0;
  for (const p of parts) {
    line.set(p.line.subarray(0, p.rows), at);
    bad.set(p.bad.subarray(0, p.rows), at);
    values.forEach((v, c) => v?.set(p.values[c]!.subarray(0, p.rows), at));
    for (const q of p.problems)
      if (problems.length < maxProblems) problems.push({ ...q, row: q.row + at });
    problemCount += p.problemCount;
    for (const n of p.notes) if (notes.length < 10_000) notes.push({ ...n, row: n.row + at });
    at += p.rows;
  }
  return {
    rows,
    line,
    values,
    bad,
    problems,
    problemCount,
    notes,
    nextLine: parts[parts.length - 1].nextLine,
  };
}
