import { describe, it, expect } from 'vitest';
import { implausibleValue, implausibleX } from '../../../core/io/plausible';

describe('implausibleX()', () => {
  it('implausibleX() accepts 1e-12…1e12 and refuses values beyond', () => {
    expect(implausibleX(1e-12, 'rad/s')).toBeUndefined();
    expect(implausibleX(1e12, 's')).toBeUndefined();
    expect(implausibleX(1e-300, 'rad/s')).toMatch(/outside/);
    expect(implausibleX(9.9e37, 's')).toMatch(/outside/);
  });
});

describe('implausibleValue()', () => {
  it('implausibleValue() flags sentinels and moduli stiffer than any solid', () => {
    expect(implausibleValue('storageModulus', 3e9)).toBeUndefined();
    expect(implausibleValue('storageModulus', 2e13)).toMatch(/1e13 Pa/);
    expect(implausibleValue('tanDelta', 9.9e37)).toMatch(/placeholder/);
    expect(implausibleValue('creepCompliance', 9.99e99)).toMatch(/placeholder/);
    // Compliance and viscosity have no modulus cap: 1e14 Pa·s is an ordinary melt viscosity.
    expect(implausibleValue('complexViscosity', 1e14)).toBeUndefined();
  });
});
