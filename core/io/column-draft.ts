import type { DeformationMode } from '../data/types';
import { splitHeader } from './header-split';
import type { ColumnMapping, ColumnRole } from './types';

/** A column as first understood, before the test kind and units are settled. */
export interface ColumnDraft {
  /** 0-based. */
  index: number;
  header: string;
  /** Header without unit and temperature ("G'"). */
  name: string;
  unitText: string;
  /** Where unitText came from: its row (0 for a mapping or none). */
  unitRow: number;
  role: ColumnRole | undefined;
  deformation?: DeformationMode;
  temperatureK?: number;
  temperatureAssumed?: boolean;
  by: 'header' | 'mapping' | 'none';
  note?: string;
}

export interface DraftInput {
  file: string;
  header: string[];
  headerRow: number;
  units: string[];
  unitsRow: number;
  ncols: number;
  mappings: ColumnMapping[];
  /** "quantity" metadata for tables headed by temperatures only. */
  quantityText?: string;
}

function findMapping(input: DraftInput, index: number): ColumnMapping | undefined {
  const header = (input.header[index] ?? '').trim().toLowerCase();
  return input.mappings.find(
    (m) =>
      (m.file === undefined || m.file === input.file) &&
      (m.column === index + 1 ||
        (typeof m.column === 'string' &&
          header !== '' &&
          m.column.trim().toLowerCase() === header)),
  );
}

/** Reads every column's header (or mapping) into a draft. */
export function draftColumns(input: DraftInput): ColumnDraft[] {
  const quantity = input.quantityText ? splitHeader(input.quantityText) : undefined;
  const drafts: ColumnDraft[] = [];
  for (let i = 0; i < input.ncols; i++) {
    const cell = input.header[i] ?? '';
    const info = splitHeader(cell);
    const unitsCell = (input.units[i] ?? '').trim();
    const fromUnits = unitsCell !== '';
    const unitText = fromUnits ? unitsCell : info.unitText;
    const unitRow = fromUnits ? input.unitsRow : unitText ? input.headerRow : 0;
    const t = info.temperature;
    const base = {
      index: i,
      header: info.raw,
      name: info.name,
      ...(t ? { temperatureK: t.temperatureK, temperatureAssumed: t.assumed } : {}),
    };
    const m = findMapping(input, i);
    if (m) {
      drafts.push({
        ...base,
        unitText: m.unit ?? unitText,
        unitRow: m.unit !== undefined ? 0 : unitRow,
        role: m.role,
        ...(m.temperatureK !== undefined
          ? { temperatureK: m.temperatureK, temperatureAssumed: false }
          : {}),
        ...((m.deformation ?? info.recognised?.deformation)
          ? { deformation: m.deformation ?? info.recognised?.deformation }
          : {}),
        by: 'mapping',
      });
    } else if (info.recognised) {
      const { role, deformation } = info.recognised;
      drafts.push({
        ...base,
        unitText,
        unitRow,
        role,
        ...(deformation ? { deformation } : {}),
        by: 'header',
      });
    } else if (t && info.name === '') {
      // A column headed by a temperature only ("40", "40 °C"): its quantity comes from metadata.
      const q = quantity?.recognised;
      drafts.push({
        ...base,
        unitText: unitText || quantity?.unitText || '',
        unitRow: unitText ? unitRow : 0,
        role: q?.role,
        ...(q?.deformation ? { deformation: q.deformation } : {}),
        by: 'header',
        ...(q ? { note: `quantity from the "quantity" line: ${input.quantityText}` } : {}),
      });
    } else {
      drafts.push({
        ...base,
        unitText,
        unitRow,
        role: 'ignore',
        by: 'none',
        note: cell.trim() === '' ? 'no header' : 'header not recognised',
      });
    }
  }
  return drafts;
}
