/**
 * Names for exported files. The list of files and their contents is core/report's
 * (`OUTPUT_FILE_SPECS`), the same the command line writes.
 */

/** "HX-310 melt" → "hx-310-melt": a file-name stem for exports. */
export function fileStem(sampleName: string): string {
  return (
    sampleName
      .toLowerCase()
      .replace(/\(invented\)/g, '')
      .replace(/[^\p{L}\p{N}]+/gu, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'thermoshift'
  );
}
