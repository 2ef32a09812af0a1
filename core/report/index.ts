/** Datasheet report and export tables of an analysis: pure functions returning strings. */
export { reportHtml, type ReportOptions } from './report-html';
export * from './csv';
export { MODULUS_UNITS, type ModulusUnit, toOutputUnit, outputUnitLabel } from './output-units';
export {
  OUTPUT_FILES,
  OUTPUT_FILE_SPECS,
  outputFiles,
  type OutputFile,
  type OutputFileOptions,
  type OutputFileSpec,
} from './output-files';
