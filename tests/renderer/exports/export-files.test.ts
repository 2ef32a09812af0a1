import { describe, expect, it } from 'vitest';
import { EXPORT_NAMES, fileStem } from '../../../app/renderer/src/exports/export-files';
import { OUTPUT_FILES } from '../../../app/cli/outputs.ts';

describe('EXPORT_NAMES', () => {
  it('EXPORT_NAMES are the command line’s output file names, so both export the same files', () => {
    expect(EXPORT_NAMES).toEqual(OUTPUT_FILES);
  });
});

describe('fileStem()', () => {
  it('fileStem() turns a sample name into a file-name stem', () => {
    expect(fileStem('HX-310 film-grade polyolefin (invented)')).toBe(
      'hx-310-film-grade-polyolefin',
    );
    expect(fileStem('***')).toBe('thermoshift');
  });
});
