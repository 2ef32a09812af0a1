import { parseUnit } from '../units';
import { splitCells, splitHeaderOnSpaces } from './cells';
import { numericCellCount } from './dialect';
import type { Dialect } from './dialect';
import { isBlank, isComment } from './lines';
import type { Line } from './lines';
import { parseMetadataLine } from './metadata';

/** Where things are in a file, found from its first lines. */
export interface FileStructure {
  /** Header cells ([] when the file has none) and their line (0 = none). */
  header: string[];
  headerRow: number;
  /** Units row cells under the header ([] when none) and their line (0 = none). */
  units: string[];
  unitsRow: number;
  /** First table row: its line number and offset in the text. */
  firstDataRow: number;
  firstDataOffset: number;
  metadata: Record<string, string>;
}

/** A row of units under the header: every non-empty cell is a unit ("°C", "[Hz]", "(Pa)", "-"). */
export function isUnitsRow(cells: string[]): boolean {
  const filled = cells.map((c) => c.trim()).filter((c) => c !== '');
  return filled.length > 0 && filled.every((c) => parseUnit(c).ok);
}

/** Finds header, units row, metadata and the first data row among the head lines of a file. */
export function findStructure(lines: Line[], dialect: Dialect): FileStructure | undefined {
  const { delimiter, decimalComma } = dialect;
  const first = lines.findIndex(
    (l) =>
      !isComment(l.text) &&
      !isBlank(l.text) &&
      numericCellCount(splitCells(l.text, delimiter), decimalComma) > 0,
  );
  if (first < 0) return undefined;
  const metadata: Record<string, string> = {};
  const plain: Line[] = [];
  for (const l of lines.slice(0, first)) {
    if (isBlank(l.text)) continue;
    if (isComment(l.text)) {
      addMetadata(metadata, l.text, dialect);
      continue;
    }
    plain.push(l);
  }
  const split = (l: Line): string[] =>
    delimiter === 'spaces'
      ? splitHeaderOnSpaces(l.text, dialect.columns)
      : splitCells(l.text, delimiter);
  let header: Line | undefined;
  let units: Line | undefined;
  const last = plain[plain.length - 1];
  if (last && split(last).length >= 2) {
    if (
      plain.length >= 2 &&
      isUnitsRow(split(last)) &&
      split(plain[plain.length - 2]).length >= 2
    ) {
      units = last;
      header = plain[plain.length - 2];
    } else {
      header = last;
    }
  }
  for (const l of plain) {
    if (l !== header && l !== units) addMetadata(metadata, l.text, dialect);
  }
  return {
    header: header ? split(header) : [],
    headerRow: header?.lineNo ?? 0,
    units: units ? split(units) : [],
    unitsRow: units?.lineNo ?? 0,
    firstDataRow: lines[first].lineNo,
    firstDataOffset: lines[first].start,
    metadata,
  };
}

function addMetadata(metadata: Record<string, string>, text: string, dialect: Dialect): void {
  const kv = parseMetadataLine(text, dialect.delimiter);
  if (kv) metadata[kv.key] = kv.value;
}
