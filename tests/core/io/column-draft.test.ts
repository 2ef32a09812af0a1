import { describe, it, expect } from 'vitest';
import { draftColumns } from '../../../core/io/column-draft';
import type { DraftInput } from '../../../core/io/column-draft';

const input = (o: Partial<DraftInput>): DraftInput => ({
  file: 'a.csv',
  header: [],
  headerRow: 1,
  units: [],
  unitsRow: 0,
  ncols: 0,
  mappings: [],
  ...o,
});

describe('draftColumns()', () => {
  it('draftColumns() reads roles and units from the header, units row first', () => {
    const d = draftColumns(
      input({
        header: ['T (K)', "G' [MPa]", 'Torque'],
        units: ['°C', '', ''],
        unitsRow: 2,
        ncols: 3,
      }),
    );
    expect(d.map((c) => [c.role, c.unitText, c.unitRow, c.by])).toEqual([
      ['temperature', '°C', 2, 'header'],
      ['storageModulus', 'MPa', 1, 'header'],
      ['ignore', '', 0, 'none'],
    ]);
    expect(d[1].deformation).toBe('shear');
    expect(d[2].note).toBe('header not recognised');
  });

  it('draftColumns() lets a mapping win, by index or header text, for this file only', () => {
    const d = draftColumns(
      input({
        header: ['x', 'y', 'z'],
        ncols: 3,
        mappings: [
          { column: 1, role: 'time', unit: 'min' },
          { column: 'Y', role: 'relaxationModulus', deformation: 'tension', temperatureK: 300 },
          { column: 3, role: 'time', file: 'other.csv' },
        ],
      }),
    );
    expect(d.map((c) => [c.role, c.unitText, c.by])).toEqual([
      ['time', 'min', 'mapping'],
      ['relaxationModulus', '', 'mapping'],
      ['ignore', '', 'none'],
    ]);
    expect(d[1]).toMatchObject({ deformation: 'tension', temperatureK: 300 });
  });

  it('draftColumns() takes the quantity of temperature-only headers from the "quantity" line', () => {
    const d = draftColumns(
      input({ header: ['t (s)', '20', '40 °C'], ncols: 3, quantityText: 'E(t) [MPa]' }),
    );
    expect(
      d.slice(1).map((c) => [c.role, c.unitText, c.temperatureK, c.temperatureAssumed]),
    ).toEqual([
      ['relaxationModulus', 'MPa', 293.15, true],
      ['relaxationModulus', 'MPa', 313.15, false],
    ]);
    const none = draftColumns(input({ header: ['t (s)', '20'], ncols: 2 }));
    expect(none[1].role).toBeUndefined();
  });

  it('draftColumns() gives columns beyond the header no role', () => {
    const d = draftColumns(input({ header: ['T'], ncols: 2 }));
    expect(d[1]).toMatchObject({ role: 'ignore', note: 'no header' });
  });
});
