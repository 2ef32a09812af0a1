import { describe, expect, it } from 'vitest';
import { modelTable, pronyTable } from '../../../app/renderer/src/tables/analysis-tables';
import { cellText } from '../../../app/renderer/src/tables/tsv';
import { fixtureAnalysis } from '../../core/report/analysis-fixture';

describe('modelTable()', () => {
  it('modelTable() gives one row per constant with s.e., 95 % interval, unit, Tr, and fit figures (weighting and convergence are in the notes under the table)', () => {
    const t = modelTable(fixtureAnalysis());
    expect(t.header).toHaveLength(11);
    // each value to the digits its s.e. supports (s.e. to 2 significant digits, JCGM 100:2008
    // §7.2.6): C1 = 8.86 ± 0.30, C2 = 101.6 ± 4.0 K; Tr to 0.01 K, R² to 4, RMS to 2 digits
    expect(t.rows.map((r) => r.map(cellText))).toEqual([
      [
        'WLF',
        'C1',
        '8.86',
        '0.30',
        '8.10',
        '9.60',
        '',
        '100.00',
        '0.9990',
        '0.010',
        '70.0 … 130.0',
      ],
      [
        'WLF',
        'C2',
        '101.6',
        '4.0',
        '92.0',
        '111.0',
        'K',
        '100.00',
        '0.9990',
        '0.010',
        '70.0 … 130.0',
      ],
    ]);
  });

  it('pronyTable() names the terms by deformation: g_i, Ge, G0 in shear and E_i, Ee, E0 in tension', () => {
    const shear = pronyTable(fixtureAnalysis('oscillatory', 'shear'));
    expect(shear.header).toEqual(['mode', 'τ_i (s)', 'g_i (Pa, shear)', 'g_i / G0']);
    expect(shear.rows[0][0]).toBe('Ge (equilibrium)');
    const tension = pronyTable(fixtureAnalysis('oscillatory', 'tension'));
    expect(tension.header).toEqual(['mode', 'τ_i (s)', 'E_i (Pa, tension)', 'E_i / E0']);
    expect(tension.rows[0][0]).toBe('Ee (equilibrium)');
  });

  it('modelTable() is empty without fitted models', () => {
    expect(modelTable({ ...fixtureAnalysis(), models: {} }).rows).toEqual([]);
  });
});
