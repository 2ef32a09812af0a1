/**
 * The interface every file layout implements. A layout says how the rows of one table become
 * points, each with its temperature: the long table has a temperature column, the one-isotherm
 * file takes one temperature for the whole file (or per block), the wide table reads it from the
 * column headers. The importer asks every registered layout whether it recognises a file
 * (`recognise`), takes the most confident, and lets it read the table (`read`). Adding a layout:
 * docs/architecture.md, "Adding a file layout".
 */
import type { DelimiterName, ColumnPlan, FileReport, ResolvedImportOptions } from './types';
import type { FileStructure } from './structure';
import type { PointRecords } from './records';
import type { ScannedTable } from './scan-table';
import type { WarningSink } from './warning-sink';

/** What a layout may look at to recognise a file: its head and how its columns were understood. */
export interface LayoutSample {
  file: string;
  /** Header cells ([] when none). */
  header: string[];
  /** "key: value" lines above the table. */
  metadata: Record<string, string>;
  /** The columns as recognised (roles, units, per-column temperatures). */
  columns: ColumnPlan['columns'];
  /** 0-based temperature column, -1 = none. */
  temperatureColumn: number;
  quantityColumns: ColumnPlan['quantityColumns'];
}

/** How sure a layout is that it fits a file, and why (shown by `inspect --json`). */
export interface LayoutMatch {
  /** 0 … 1; the most confident layout wins, the first registered on a tie. */
  confidence: number;
  /** One sentence for people: what in the file made the layout recognise it. */
  evidence: string;
}

/** Everything a layout may use while reading a file. */
export interface LayoutContext {
  /** File name (for messages) and its options. */
  file: string;
  options: ResolvedImportOptions;
  structure: FileStructure;
  plan: ColumnPlan;
  delimiter: DelimiterName;
  /** Warnings of this file, with row and column. */
  sink: WarningSink;
}

/** Report fields a layout may add for its file (FileReport). */
export type LayoutReportFields = Partial<
  Pick<FileReport, 'temperatureK' | 'temperatureFrom' | 'blockTemperaturesK'>
>;

/** How a layout reads one file: decided before the table is scanned, applied after. */
export interface LayoutReading {
  /** 0-based columns to scan besides the plan's abscissa, temperature and quantity columns. */
  extraColumns?: number[];
  /**
   * false: a bad cell spoils its row (reported once); true: each bad cell loses only its point
   * (a wide table, where one row holds several isotherms).
   */
  perCell: boolean;
  /** The scanned table → points in stored units, each with its temperature (the isotherm drafts). */
  assemble(table: ScannedTable): { records: PointRecords; report?: LayoutReportFields };
}

export interface FileLayout {
  /** Stable identifier, stored in FileReport.layout and `inspect --json` ("long", "wide" …). */
  id: string;
  /** Short name for `thermoshift inspect` ("long table (temperature column)"). */
  name: string;
  /** What the layout looks like, for the import preview ("one table with a temperature column"). */
  description: string;
  /**
   * How the grouping splits this layout's points into sweeps: 'runs' (in file order, a new sweep
   * where the abscissa turns back or the temperature jumps) or 'temperature' (one sweep per
   * distinct temperature, as each column of a wide table is one sweep).
   */
  sweeps: 'runs' | 'temperature';
  /** Whether this layout fits the file; undefined when it does not. */
  recognise(sample: LayoutSample): LayoutMatch | undefined;
  /** Reads the file (may throw ImportError, e.g. when the file has no temperature). */
  read(ctx: LayoutContext): LayoutReading;
}
