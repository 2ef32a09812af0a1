import { describe, it, expect } from 'vitest';
import { splitHeader } from '../../../core/io/header-split';
import { expectAbsClose } from '../../helpers/assert-close';

describe('splitHeader()', () => {
  const table: [string, string, string, string | undefined][] = [
    ['Temperature (°C)', 'Temperature', '°C', 'temperature'],
    ["G' [MPa]", "G'", 'MPa', 'storageModulus'],
    ['Storage modulus in MPa', 'Storage modulus', 'MPa', 'storageModulus'],
    ['f/Hz', 'f', 'Hz', 'frequency'],
    ['T/°C', 'T', '°C', 'temperature'],
    ['omega/rad/s', 'omega', 'rad/s', 'angularFrequency'],
    ['freq_Hz', 'freq', 'Hz', 'frequency'],
    ['Temp_C', 'Temp', 'C', 'temperature'],
    ['Complex Viscosity, Pa.s', 'Complex Viscosity', 'Pa.s', 'complexViscosity'],
    ['G(t) (Pa)', 'G(t)', 'Pa', 'relaxationModulus'],
    ['G(t)', 'G(t)', '', 'relaxationModulus'],
    ['J(t) [1/MPa]', 'J(t)', '1/MPa', 'creepCompliance'],
    ['tan(delta) [-]', 'tan(delta)', '-', 'tanDelta'],
    ['"|η*| (Pa·s)"', '|η*|', 'Pa·s', 'complexViscosity'],
    ['Strain (%)', 'Strain', '%', undefined],
  ];
  for (const [cell, name, unit, role] of table) {
    it(`splitHeader() splits "${cell}" into name, unit and role`, () => {
      const h = splitHeader(cell);
      expect(h.name).toBe(name);
      expect(h.unitText).toBe(unit);
      expect(h.recognised?.role).toBe(role);
      expect(h.temperature).toBeUndefined();
    });
  }

  const wide: [string, string, number, boolean][] = [
    ["G' 40°C", "G'", 313.15, false],
    ["E'(T=-20 C) [MPa]", "E'", 253.15, false],
    ["G' @ 150 °C (Pa)", "G'", 423.15, false],
    ["G'_40C", "G'", 313.15, false],
    ['E(t) 20°C [MPa]', 'E(t)', 293.15, false],
    ['tan δ 313 K', 'tan δ', 313, false],
    ["T=40 G'", "G'", 313.15, true],
    ['40', '', 313.15, true],
    ['-20', '', 253.15, true],
    ['40 °C', '', 313.15, false],
  ];
  for (const [cell, name, kelvin, assumed] of wide) {
    it(`splitHeader() finds the temperature in the wide-table header "${cell}"`, () => {
      const h = splitHeader(cell);
      expect(h.name).toBe(name);
      expectAbsClose(h.temperature!.temperatureK, kelvin, 1e-9, cell);
      expect(h.temperature!.assumed).toBe(assumed);
    });
  }

  it('splitHeader() gives up quietly on very long cells', () => {
    const h = splitHeader('x'.repeat(500));
    expect(h.recognised).toBeUndefined();
    expect(h.unitText).toBe('');
  });
});
