export { csvCell, csvDocument, csvNumber } from './csv-format';
export { shiftTableCsv, SHIFT_TABLE_COLUMNS } from './shift-table-csv';
export { masterCurveCsv, quantityColumn } from './master-curve-csv';
export { modelsCsv, MODEL_COLUMNS } from './models-csv';
export { pronyCsv } from './prony-csv';
export { batchIndexCsv, BATCH_INDEX_COLUMNS, type BatchIndexRow } from './batch-index-csv';
