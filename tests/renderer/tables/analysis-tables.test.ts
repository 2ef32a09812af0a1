import { describe, expect, it } from 'vitest';
import { modelTable, pronyTable } from '../../../app/renderer/src/tables/analysis-tables';
import { fixtureAnalysis, FIXTURE_TRUTH } from '../../core/report/analysis-fixture';

describe('modelTable()', () => {
  it('modelTable() gives one row per constant with s.e., 95 % interval, unit, Tr, fit figures, weighting and convergence', () => {
    const t = modelTable(fixtureAnalysis());
    expect(t.header).toHaveLength(13);
    const tail = ['70.0 … 130.0', 'shift covariance (GLS)', 'yes'];
    expect(t.rows).toEqual([
      ['WLF', 'C1', FIXTURE_TRUTH.c1, 0.3, 8.1, 9.6, '', 100, 0.999, 0.01, ...tail],
      ['WLF', 'C2', FIXTURE_TRUTH.c2K, 4, 92, 111, 'K', 100, 0.999, 0.01, ...tail],
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
