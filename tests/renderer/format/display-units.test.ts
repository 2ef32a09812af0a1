import { describe, expect, it } from 'vitest';
import { toDisplay, unitsFromImport } from '../../../app/renderer/src/format/display-units';
import type { ColumnReport, FileReport } from '../../../core/io/types';

const col = (role: ColumnReport['role'], unit: string, siUnit: string): ColumnReport =>
  ({ role, unit, siUnit }) as ColumnReport;

describe('toDisplay()', () => {
  it('toDisplay() shows moduli, viscosity and compliance in the chosen unit and ω as f = ω/2π', () => {
    const u = { modulus: 'MPa', frequency: 'Hz' } as const;
    expect(toDisplay(2.5e6, 'Pa', u)).toEqual({ value: 2.5, unit: 'MPa' });
    expect(toDisplay(3e6, 'Pa·s', u)).toEqual({ value: 3, unit: 'MPa·s' });
    expect(toDisplay(1e-6, '1/Pa', u)).toEqual({ value: 1, unit: '1/MPa' });
    expect(toDisplay(2 * Math.PI, 'rad/s', u)).toEqual({ value: 1, unit: 'Hz' });
    expect(toDisplay(300, 'K', u)).toEqual({ value: 300, unit: 'K' });
  });
});

describe('unitsFromImport()', () => {
  it('unitsFromImport() takes the units the files came in: MPa and Hz for a DMA export', () => {
    const files = [
      { columns: [col('frequency', 'Hz', 'rad/s'), col('storageModulus', 'MPa', 'Pa')] },
    ] as FileReport[];
    expect(unitsFromImport({ files })).toEqual({ modulus: 'MPa', frequency: 'Hz' });
    const melt = [
      { columns: [col('angularFrequency', 'rad/s', 'rad/s'), col('lossModulus', 'Pa', 'Pa')] },
    ] as FileReport[];
    expect(unitsFromImport({ files: melt })).toEqual({ modulus: 'Pa', frequency: 'rad/s' });
  });
});
