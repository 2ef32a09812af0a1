export { importFiles } from './import-files';
export { ImportError } from './import-error';
export type { ImportErrorCode } from './import-error';
export { resolveImportOptions } from './options';
export { COLUMN_ROLES } from './roles';
export { groupTemperatures } from './grouping';
export type { GroupingSummary, TemperatureBand } from './grouping';
export { temperatureFromFileName } from './file-name';
export { fileLayouts, layoutById, layoutText, registerLayout } from './layouts';
export type {
  FileLayout,
  LayoutContext,
  LayoutMatch,
  LayoutReading,
  LayoutReportFields,
  LayoutSample,
} from './layout-types';
export type { PointRecords } from './records';
export type { ScannedTable } from './scan-table';
export type { FileStructure } from './structure';
export type {
  ColumnMapping,
  ColumnPlan,
  ColumnReport,
  ColumnRole,
  DelimiterName,
  FileReport,
  ImportOptions,
  ImportResult,
  IsothermGroupReport,
  Layout,
  ResolvedImportOptions,
  SourceFile,
} from './types';
export {
  expandWorkbooks,
  isWorkbookName,
  SHEET_SEPARATOR,
  splitSheetName,
  workbookToSourceFiles,
} from './workbook';
export {
  ChunkDecoder,
  InvalidUtf8Error,
  completeUtf8End,
  LineChunker,
  decodeBytes,
  detectEncoding,
} from './decode';
export type { TextEncodingName } from './decode';
