// Conversion values are checked against the sources named beside each test; the section and
// table numbers of those sources are cited from memory.
import { describe, it, expect } from 'vitest';
import {
  describeConversion,
  normaliseUnitText,
  parseUnit,
  siUnitOf,
  toStoredUnit,
  unitsOf,
} from '../../../core/units';
import type { UnitDimension } from '../../../core/units';
import { expectRelClose } from '../../helpers/assert-close';

/** Converts `value` written in `unit` to the stored unit, failing the test if the unit is refused. */
function convert(value: number, unit: string, dimension?: UnitDimension): number {
  const r = parseUnit(unit, dimension);
  if (!r.ok) throw new Error(r.message);
  return toStoredUnit(value, r.conversion);
}

describe('parseUnit()', () => {
  // SI Brochure (BIPM, 9th ed., 2019): 1 Hz = 1 s⁻¹ for periodic phenomena, and the angular
  // frequency of a periodic phenomenon is ω = 2πf, so a frequency of 1 Hz is ω = 2π rad/s.
  it('parseUnit() converts 1 Hz to 2π rad/s (ω = 2πf, SI Brochure, BIPM 2019)', () => {
    expectRelClose(convert(1, 'Hz'), 2 * Math.PI, 1e-15, 'exact up to rounding');
    expectRelClose(convert(10, 'kHz'), 2 * Math.PI * 1e4, 1e-15, 'exact up to rounding');
    expectRelClose(convert(1, 'mHz'), 2 * Math.PI * 1e-3, 1e-15, 'exact up to rounding');
  });

  it('parseUnit() keeps rad/s and its spellings 1/s, s^-1, s⁻¹, rad·s⁻¹ as they are', () => {
    for (const u of ['rad/s', '1/s', 's^-1', 's⁻¹', 'rad·s⁻¹', 'rad s^-1', '[rad/s]', '(1/s)']) {
      expect(convert(3.5, u), u).toBe(3.5);
    }
  });

  // NIST SP 811 (2008), appendix B.8: dyne per square centimeter = 1.0 E−01 Pa; poise =
  // 1.0 E−01 Pa·s; centipoise = 1.0 E−03 Pa·s; pound-force per square inch = 6.894 757 E+03 Pa.
  // The same CGS values are in the SI Brochure (BIPM, 8th ed., 2006, Table 9; from memory).
  it('parseUnit() converts 1 dyn/cm² to 0.1 Pa (NIST SP 811, 2008, B.8)', () => {
    for (const u of ['dyn/cm²', 'dyn/cm2', 'dyn/cm^2', 'dyne/cm2', 'dyn cm^-2']) {
      expectRelClose(convert(1, u), 0.1, 1e-15, u);
    }
  });

  it('parseUnit() converts 1 P to 0.1 Pa·s and 1 cP to 1 mPa·s (NIST SP 811, 2008, B.8)', () => {
    expectRelClose(convert(1, 'P', 'viscosity'), 0.1, 1e-15, 'poise');
    expectRelClose(convert(1, 'poise'), 0.1, 1e-15, 'poise');
    expectRelClose(convert(1, 'cP'), 1e-3, 1e-15, 'centipoise');
    expectRelClose(convert(1, 'mPa·s'), 1e-3, 1e-15, 'mPa·s');
  });

  it('parseUnit() converts 1 psi to 6894.757 Pa (NIST SP 811, 2008, B.8)', () => {
    expectRelClose(convert(1, 'psi'), 6894.757, 1e-12, 'table value');
    expectRelClose(convert(1, 'ksi'), 6894757, 1e-12, 'table value');
  });

  it('parseUnit() converts the SI prefixes of the pascal (SI Brochure, BIPM 2019, Table 7)', () => {
    expect(convert(2, 'Pa')).toBe(2);
    expect(convert(2, 'kPa')).toBe(2e3);
    expect(convert(2, 'MPa')).toBe(2e6);
    expect(convert(2, 'GPa')).toBe(2e9);
    expect(convert(2, 'N/mm²')).toBe(2e6);
  });

  it('parseUnit() converts compliances to 1/Pa', () => {
    expect(convert(2, '1/Pa')).toBe(2);
    expect(convert(2, 'Pa^-1')).toBe(2);
    expectRelClose(convert(2, '1/MPa'), 2e-6, 1e-15, 'prefix');
    expectRelClose(convert(2, 'MPa⁻¹'), 2e-6, 1e-15, 'prefix');
    expectRelClose(convert(2, '1/GPa'), 2e-9, 1e-15, 'prefix');
    // 1 cm²/dyn = 1/(0.1 Pa) = 10 1/Pa (NIST SP 811, 2008, B.8, inverted)
    expectRelClose(convert(1, 'cm²/dyn'), 10, 1e-15, 'inverse of dyn/cm²');
  });

  it('parseUnit() converts viscosities to Pa·s in every common spelling', () => {
    for (const u of ['Pa·s', 'Pa s', 'Pa.s', 'Pa*s', 'Pas', 'Pa⋅s'])
      expect(convert(4, u), u).toBe(4);
    expect(convert(4, 'kPa·s')).toBe(4000);
  });

  // SI Brochure (BIPM, 9th ed., 2019), Table 8: 1 min = 60 s, 1 h = 3600 s, 1 d = 86 400 s.
  it('parseUnit() converts time units to seconds (SI Brochure, BIPM 2019, Table 8)', () => {
    expect(convert(1, 's')).toBe(1);
    expect(convert(1, 'sec')).toBe(1);
    expect(convert(1, 'ms')).toBe(1e-3);
    expect(convert(1, 'min')).toBe(60);
    expect(convert(1, 'h')).toBe(3600);
    expect(convert(1, 'hr')).toBe(3600);
    expect(convert(1, 'd', 'time')).toBe(86400);
  });

  // SI Brochure (BIPM, 9th ed., 2019), Table 8: 1° = (π/180) rad. Phase angles are kept in degrees.
  it('parseUnit() converts radians to degrees, 1° = (π/180) rad (SI Brochure, BIPM 2019, Table 8)', () => {
    expectRelClose(convert(Math.PI / 4, 'rad', 'angle'), 45, 1e-14, 'rounding only');
    expect(convert(45, '°')).toBe(45);
    expect(convert(45, 'deg')).toBe(45);
    expect(convert(45, 'degrees', 'angle')).toBe(45);
  });

  it('parseUnit() reads "-", "1", "" and "[-]" as dimensionless', () => {
    for (const u of ['-', '1', '', '[-]', '( - )']) {
      const r = parseUnit(u, 'dimensionless');
      expect(r.ok && r.conversion.dimension, u).toBe('dimensionless');
    }
  });

  it('parseUnit() refuses a unit of the wrong dimension and says what it is', () => {
    const r = parseUnit('Hz', 'modulus');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.reason).toBe('wrongDimension');
      expect(r.message).toMatch(/frequency/);
    }
  });

  it('parseUnit() refuses an unknown unit and lists the known ones', () => {
    const r = parseUnit('kpsi', 'modulus');
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.reason).toBe('unknown');
      expect(r.message).toMatch(/MPa/);
    }
  });

  it('parseUnit() tells millipascal from megapascal', () => {
    const r = parseUnit('mPa', 'modulus');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toBe('ambiguous');
    expect(convert(1, 'MPa·s', 'viscosity')).toBe(1e6);
    expect(convert(1, 'mPa·s', 'viscosity')).toBe(1e-3);
  });

  it('parseUnit() does not read very long texts', () => {
    expect(parseUnit('Pa'.repeat(100)).ok).toBe(false);
  });
});

describe('siUnitOf() and unitsOf()', () => {
  it('siUnitOf() names the stored unit and unitsOf() the accepted ones of each dimension', () => {
    expect(siUnitOf('frequency')).toBe('rad/s');
    expect(siUnitOf('angle')).toBe('°');
    expect(unitsOf('modulus')).toEqual(['Pa', 'kPa', 'MPa', 'GPa', 'dyn/cm²', 'psi', 'ksi']);
  });
});

describe('normaliseUnitText()', () => {
  it('normaliseUnitText() unifies brackets, superscripts and products', () => {
    expect(normaliseUnitText(' [dyn/cm²] ')).toBe('dyn/cm2');
    expect(normaliseUnitText('Pa s')).toBe('pa·s');
    expect(normaliseUnitText('rad / s')).toBe('rad/s');
    expect(normaliseUnitText('℃')).toBe('°c');
  });
});

describe('describeConversion()', () => {
  it('describeConversion() writes factor, offset and units for reports', () => {
    const hz = parseUnit('Hz');
    const c = parseUnit('°C');
    const mpa = parseUnit('MPa');
    const pa = parseUnit('Pa');
    if (!hz.ok || !c.ok || !mpa.ok || !pa.ok) throw new Error('units refused');
    expect(describeConversion(hz.conversion)).toBe('× 2π (Hz → rad/s)');
    expect(describeConversion(c.conversion)).toBe('+ 273.15 (°C → K)');
    expect(describeConversion(mpa.conversion)).toBe('× 1e6 (MPa → Pa)');
    expect(describeConversion(pa.conversion)).toBe('none');
  });
});
