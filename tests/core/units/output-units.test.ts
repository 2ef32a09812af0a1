import { describe, it, expect } from 'vitest';
import { modulusFactor, outputUnitLabel, toOutputUnit } from '../../../core/units/output-units';
import { expectRelClose } from '../../helpers/assert-close';

describe('toOutputUnit()', () => {
  it('toOutputUnit() divides moduli and viscosities and multiplies compliances (exact SI prefixes)', () => {
    expectRelClose(toOutputUnit('storageModulus', 2.5e6, 'MPa'), 2.5, 1e-15, 'exact');
    expectRelClose(toOutputUnit('complexViscosity', 3e4, 'kPa'), 30, 1e-15, 'exact');
    expectRelClose(toOutputUnit('creepCompliance', 1e-9, 'GPa'), 1, 1e-15, 'exact');
    expect(toOutputUnit('tanDelta', 0.7, 'MPa')).toBe(0.7);
    expect(toOutputUnit('phaseAngle', 45, 'GPa')).toBe(45);
    expect(modulusFactor('Pa')).toBe(1);
  });
  it('outputUnitLabel() names the unit of each quantity', () => {
    expect(outputUnitLabel('lossModulus', 'MPa')).toBe('MPa');
    expect(outputUnitLabel('complexViscosity', 'Pa')).toBe('Pa·s');
    expect(outputUnitLabel('creepCompliance', 'MPa')).toBe('1/MPa');
    expect(outputUnitLabel('tanDelta', 'MPa')).toBe('');
    expect(outputUnitLabel('phaseAngle', 'MPa')).toBe('°');
  });
});
