/** Datasheet report and export tables of an analysis: pure functions returning strings. */
export { reportHtml, type ReportOptions } from './report-html';
export * from './csv';
export {
  OUTPUT_FILES,
  OUTPUT_FILE_SPECS,
  outputFiles,
  type OutputFile,
  type OutputFileOptions,
  type OutputFileSpec,
} from './output-files';
// Number formatting, decimation and the SVG chart model, shared with the app's plots.
export { MISSING, formatNumber, formatFixed, superscript } from './format';
export { decimatedIndices, type DecimateOptions } from './decimate';
export { rampColour, rampStops, temperatureColour } from './svg/colour';
export type {
  ChartAxis,
  ChartBand,
  ChartSeries,
  ChartSpec,
  LegendEntry,
  LineStyle,
  Marker,
} from './svg/chart-types';
export { renderChart } from './svg/render-chart';
