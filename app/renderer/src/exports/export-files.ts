/**
 * Names for exported files, all from one stem made of the analysis name (the sample name), so
 * the analysis file, the tables, the report, the figures and the zip of everything belong
 * together: `hx-310-film-grade-polyolefin.thermoshift.json`, `…-shift-factors.csv`,
 * `…-master.png`, `…-exports.zip`. The list of files and their contents is core/report's
 * (`OUTPUT_FILE_SPECS`), the same the command line writes.
 */

/** "HX-310 melt" → "hx-310-melt": the file-name stem of every export of an analysis. */
export function fileStem(sampleName: string): string {
  return (
    sampleName
      .toLowerCase()
      .replace(/\(invented\)/g, '')
      .replace(/[^\p{L}\p{N}]+/gu, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'analysis'
  );
}

/** The name of one export: `<stem>-<what>`. */
export const exportName = (sampleName: string, what: string): string =>
  `${fileStem(sampleName)}-${what}`;
