import type { GroupingSummary } from './grouping';
import type { TextEncodingName } from './decode';
import type {
  AbscissaKind,
  DataWarning,
  Dataset,
  DeformationMode,
  QuantityId,
  TestKind,
} from '../data/types';

/** One file handed to the importer: its name (for messages) and its text. Reading is the caller's job. */
export interface SourceFile {
  name: string;
  /** The file content, decoded (UTF-8 recommended); a leading byte-order mark is ignored. */
  text: string;
  /**
   * Big files: the decoded content as chunks that each end at a line break (see `LineChunker`
   * in core/io/decode.ts), read one after another; `text` is then ignored and may be ''. The
   * importer never joins them into one string.
   */
  chunks?: Iterable<string>;
  /** How the bytes were decoded (see `detectEncoding`); reported in FileReport.encoding. */
  encoding?: TextEncodingName;
  /** Size of the file in bytes, when known: checked against `memoryBudgetBytes` before reading. */
  byteLength?: number;
}

/**
 * What a column holds. `frequency` (ordinary, Hz by default) and `angularFrequency` (rad/s by
 * default) both become ω in rad/s; the unit decides the factor. `ignore` leaves the column out.
 */
export type ColumnRole =
  'temperature' | 'frequency' | 'angularFrequency' | 'time' | QuantityId | 'ignore';

/** An explicit column mapping: overrides whatever the importer recognised for that column. */
export interface ColumnMapping {
  /** Only for this file (its `SourceFile.name`); every file when omitted. */
  file?: string;
  /** 1-based column index, or the header text (compared without case and surrounding spaces). */
  column: number | string;
  role: ColumnRole;
  /** Unit of the values ("MPa", "Hz", "°C" …); when omitted the header's unit, else the default. */
  unit?: string;
  /** Wide layout: the temperature this column was measured at, K. */
  temperatureK?: number;
  /** Shear (G, J) or tension (E, D); when omitted, taken from the header or the other columns. */
  deformation?: DeformationMode;
}

/** Import options. Every field is optional; `resolveImportOptions()` fills the defaults. */
export interface ImportOptions {
  /**
   * Measured temperatures closer than this are one isotherm, K, unless they are complete sweeps at
   * steady, distinct temperatures (see docs/import.md, "Grouping").
   * @default 1
   */
  groupingToleranceK?: number;
  /** Explicit column mappings; they win over recognition. @default [] */
  columns?: ColumnMapping[];
  /** Forces the temperature of per-isotherm files, K, keyed by file name. @default {} */
  fileTemperatureK?: Record<string, number>;
  /** Test kind; 'auto' infers it from the quantities found. @default 'auto' */
  testKind?: TestKind | 'auto';
  /** Deformation mode; 'auto' infers it from the symbols (G/J shear, E/D tension). @default 'auto' */
  deformation?: DeformationMode | 'auto';
  /**
   * Sample name shown to users.
   * @default undefined — then from metadata (sample, name, material) or the first file name
   */
  sampleName?: string;
  /**
   * Row-level warnings listed per file; further ones are counted in one summary warning.
   * @default 200
   */
  maxWarningsPerFile?: number;
  /**
   * Derive G' = |G*| cos δ and G'' = |G*| sin δ when a file gives only |G*| with δ or tan δ, and
   * tan δ = G''/G' when tan δ is missing.
   * @default true
   */
  deriveQuantities?: boolean;
  /**
   * Memory the import may use, bytes: a file whose estimated point count (from its size and the
   * length of its first lines) needs more is refused before its table is read, naming the file.
   * The estimate uses the measured cost per point in core/io/memory-budget.ts.
   * @default 4e9
   */
  memoryBudgetBytes?: number;
}

/** ImportOptions with every default applied. */
export type ResolvedImportOptions = Required<Omit<ImportOptions, 'sampleName'>> & {
  sampleName: string | undefined;
};

/**
 * Id of the file layout that read a file: one of the built-in layouts, or the id of a layout
 * added to the registry (core/io/layouts.ts).
 */
export type Layout = 'long' | 'perIsotherm' | 'wide' | (string & Record<never, never>);
export type DelimiterName = 'comma' | 'semicolon' | 'tab' | 'spaces';

/** How one column was understood. */
export interface ColumnReport {
  /** 1-based column index. */
  index: number;
  /** Header text as written ('' when the file has no header). */
  header: string;
  /** Unit as written in the header or units row ('' when none). */
  unitText: string;
  role: ColumnRole;
  /** Deformation mode implied by the symbol (G/J shear, E/D tension), when there is one. */
  deformation?: DeformationMode;
  /** Wide layout: temperature of this column, K. */
  temperatureK?: number;
  /** Unit the values are read in ("MPa"), after defaults. '' for ignored columns. */
  unit: string;
  /** Unit the values are stored in ("Pa", "rad/s", "K", "°" …). */
  siUnit: string;
  /** stored = value × factor + offset. */
  factor: number;
  offset: number;
  /** Human-readable conversion, e.g. "× 1e6 (MPa → Pa)". */
  conversion: string;
  /** header: recognised from the header; mapping: from ImportOptions.columns; none: ignored. */
  recognisedBy: 'header' | 'mapping' | 'none';
  /** Why the column is ignored, or which default was assumed. */
  note?: string;
}

/** Which columns the importer reads, and how. */
export interface ColumnPlan {
  columns: ColumnReport[];
  /** Id of the file layout that reads the table (see core/io/layouts.ts). */
  layout: Layout;
  testKind: TestKind;
  abscissa: AbscissaKind;
  /** Deformation stated by the symbols or mappings of the used columns, if any. */
  deformation?: DeformationMode;
  /** 0-based indices; -1 = none. */
  temperatureColumn: number;
  xColumn: number;
  quantityColumns: { column: number; quantity: QuantityId; temperatureK?: number }[];
  /** Why the layout was recognised (its LayoutMatch evidence). */
  layoutEvidence: string;
}

/** What the importer recognised in one file. */
export interface FileReport {
  file: string;
  layout: Layout;
  delimiter: DelimiterName;
  decimalSeparator: '.' | ',';
  /** How the bytes were decoded ('utf-8' when the caller passed text and did not say). */
  encoding: TextEncodingName;
  /** 1-based line numbers; 0 = none. */
  headerRow: number;
  unitsRow: number;
  firstDataRow: number;
  /** Table rows read (blank and comment lines not counted) and rows that gave points. */
  dataRows: number;
  usedRows: number;
  metadata: Record<string, string>;
  /** Per-isotherm files: the file's temperature and where it came from. */
  temperatureK?: number;
  temperatureFrom?: 'option' | 'metadata' | 'fileName';
  /**
   * One-isotherm files made of several blocks, each opened by a temperature line: the block
   * temperatures in file order, K (the first may be the file's own temperature).
   */
  blockTemperaturesK?: number[];
  testKind: TestKind;
  deformation: DeformationMode;
  columns: ColumnReport[];
}

/** One isotherm as grouped: shown in the import preview and by `thermoshift inspect`. */
export interface IsothermGroupReport {
  id: string;
  /** Mean of the grouped measured temperatures, K. */
  temperatureK: number;
  /** Max − min of the grouped measured temperatures, K. */
  temperatureSpreadK: number;
  points: number;
  /** Range of x (ω in rad/s or t in s). */
  xMin: number;
  xMax: number;
  files: string[];
  quantities: QuantityId[];
}

export interface ImportResult {
  /** Every isotherm in SI units, sorted by temperature; x ascending; per-point file and row. */
  dataset: Dataset;
  warnings: DataWarning[];
  files: FileReport[];
  groups: IsothermGroupReport[];
  /** How the points were formed into isotherms (steady sweeps, temperature bands, ramps cut). */
  grouping: GroupingSummary;
  /** Quantities computed from others (see `deriveQuantities`), not read from the files. */
  derived: QuantityId[];
  abscissa: AbscissaKind;
  /** Unit of each quantity as stored in the dataset. */
  units: Partial<Record<QuantityId, string>>;
  options: ResolvedImportOptions;
}
