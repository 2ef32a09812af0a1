import { describe, it, expect } from 'vitest';
import { ImportError } from '../../../core/io/import-error';
import { planHeader } from './helpers/plan-header';
import type { TestKind } from '../../../core/data/types';

function plan(header: string[], testKind: TestKind | 'auto' = 'auto') {
  const { plan: p, warnings } = planHeader(header, testKind);
  return { plan: p, warnings: warnings.list };
}

describe('planColumns()', () => {
  it('planColumns() settles a long oscillatory table', () => {
    const { plan: p } = plan(['Time (s)', 'T (°C)', 'f (Hz)', "G' (MPa)", "G'' (MPa)", 'tan δ']);
    expect(p).toMatchObject({
      layout: 'long',
      testKind: 'oscillatory',
      abscissa: 'angularFrequency',
      deformation: 'shear',
      temperatureColumn: 1,
      xColumn: 2,
    });
    expect(p.quantityColumns.map((q) => q.quantity)).toEqual([
      'storageModulus',
      'lossModulus',
      'tanDelta',
    ]);
    expect(p.columns[0]).toMatchObject({
      role: 'ignore',
      note: 'not used: column 3 is the frequency',
    });
    expect(p.columns[2]).toMatchObject({
      factor: 2 * Math.PI,
      siUnit: 'rad/s',
      conversion: '× 2π (Hz → rad/s)',
    });
    expect(p.columns[3]).toMatchObject({ factor: 1e6, siUnit: 'Pa' });
  });

  it('planColumns() recognises per-isotherm and wide layouts', () => {
    expect(plan(['t (s)', 'E(t) (MPa)']).plan).toMatchObject({
      layout: 'perIsotherm',
      testKind: 'relaxation',
      abscissa: 'time',
      temperatureColumn: -1,
    });
    const wide = plan(['T (°C)', 'f (Hz)', "G' 40°C", "G' 60°C", "G'"]).plan;
    expect(wide.layout).toBe('wide');
    expect(wide.quantityColumns.map((q) => q.temperatureK)).toEqual([313.15, 333.15]);
    expect(wide.columns[0].note).toMatch(/temperatures are in the column headers/);
    expect(wide.columns[4].note).toMatch(/no temperature in its header/);
  });

  it('planColumns() ignores quantities of another test kind and repeated quantities', () => {
    const { plan: p } = plan(['T', 'f', "G'", 'G(t)', "G'"]);
    expect(p.columns[3].note).toBe('not used in oscillatory data');
    expect(p.columns[4].note).toMatch(/earlier column/);
    expect(plan(['T', 't', 'G(t)', "G'"], 'relaxation').plan.quantityColumns).toHaveLength(1);
  });

  it('planColumns() warns about assumed units', () => {
    const { warnings } = plan(['T', 'f', 'tan δ']);
    expect(warnings.map((w) => w.column)).toEqual([1, 2]);
  });

  it('planColumns() throws ImportError for missing x, missing quantities, bad units and mixed modes', () => {
    expect(() => plan(['T', "G'"])).toThrow(ImportError);
    expect(() => plan(['T', 'f', 'Torque'])).toThrow(/no measured quantity/);
    expect(() => plan(['T', 'f', "G' (furlong)"])).toThrow(/"furlong" is not known/);
    expect(() => plan(['T', 'f', "G'", "E''"])).toThrow(/shear quantity/);
  });
});
