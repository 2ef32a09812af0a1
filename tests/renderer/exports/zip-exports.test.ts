import { describe, expect, it } from 'vitest';
import { strFromU8, unzipSync } from 'fflate';
import { bytesToBase64, zipFiles } from '../../../app/renderer/src/exports/zip-exports';

describe('zipFiles()', () => {
  it('zipFiles() puts every export in one archive under a folder named after the analysis', () => {
    const zip = zipFiles(
      'qs-72',
      [
        { name: 'shift-factors.csv', content: 'a,b\n1,2\n' },
        { name: 'figures/master.svg', content: '<svg/>' },
      ],
      new Date('2026-01-02T03:04:05Z'),
    );
    const back = unzipSync(zip);
    expect(Object.keys(back).sort()).toEqual([
      'qs-72/figures/master.svg',
      'qs-72/shift-factors.csv',
    ]);
    expect(strFromU8(back['qs-72/shift-factors.csv'])).toBe('a,b\n1,2\n');
    expect(Buffer.from(bytesToBase64(zip), 'base64').equals(Buffer.from(zip))).toBe(true);
  });
});
