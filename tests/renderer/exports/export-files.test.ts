import { describe, expect, it } from 'vitest';
import { fileStem } from '../../../app/renderer/src/exports/export-files';

describe('fileStem()', () => {
  it('fileStem() turns a sample name into a file-name stem', () => {
    expect(fileStem('HX-310 film-grade polyolefin (invented)')).toBe(
      'hx-310-film-grade-polyolefin',
    );
    expect(fileStem('***')).toBe('analysis');
  });
});
