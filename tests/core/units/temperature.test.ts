// Conversion values are checked against the sources named beside each test; the section and
// table numbers of those sources are cited from memory.
import { describe, it, expect } from 'vitest';
import { parseTemperatureText, parseUnit, toStoredUnit } from '../../../core/units';
import { expectAbsClose } from '../../helpers/assert-close';

function kelvin(value: number, unit: string): number {
  const r = parseUnit(unit, 'temperature');
  if (!r.ok) throw new Error(r.message);
  return toStoredUnit(value, r.conversion);
}

describe('parseUnit() for temperatures', () => {
  // SI Brochure (BIPM, 9th ed., 2019), §2.3.1: t/°C = T/K − 273.15 (exact).
  it('parseUnit() puts 0 °C at 273.15 K (SI Brochure, BIPM 2019)', () => {
    for (const u of ['°C', 'degC', 'deg C', 'C', '℃', 'oC', 'ºC', 'Celsius', '[°C]']) {
      expect(kelvin(0, u), u).toBe(273.15);
    }
    expect(kelvin(-273.15, '°C')).toBe(0);
  });

  it('parseUnit() keeps kelvin as it is', () => {
    expect(kelvin(300, 'K')).toBe(300);
    expect(kelvin(300, 'kelvin')).toBe(300);
  });

  // NIST SP 811 (2008), B.9: T/K = (t/°F + 459.67)/1.8.
  it('parseUnit() converts °F by T/K = (t/°F + 459.67)/1.8 (NIST SP 811, 2008, B.9)', () => {
    expectAbsClose(kelvin(32, '°F'), 273.15, 1e-12, 'freezing point of water');
    expectAbsClose(kelvin(212, '°F'), 373.15, 1e-12, 'boiling point of water at 1 atm');
    expectAbsClose(kelvin(-40, 'degF'), 233.15, 1e-12, '−40 °F = −40 °C');
    expectAbsClose(kelvin(-459.67, 'F'), 0, 1e-12, 'absolute zero');
  });
});

describe('parseTemperatureText()', () => {
  it('parseTemperatureText() reads value and unit in the usual spellings', () => {
    const cases: [string, number][] = [
      ['40 °C', 313.15],
      ['40°C', 313.15],
      ['313.15 K', 313.15],
      ['-20C', 253.15],
      ['−20 °C', 253.15],
      ['40,5 °C', 313.65],
      ['104 °F', 313.15],
      ['40 deg C', 313.15],
    ];
    for (const [text, k] of cases) {
      const t = parseTemperatureText(text);
      expect(t, text).toBeDefined();
      expectAbsClose(t!.temperatureK, k, 1e-9, text);
      expect(t!.assumed, text).toBe(false);
    }
  });

  it('parseTemperatureText() assumes °C for a bare number and says so', () => {
    const t = parseTemperatureText('40');
    expect(t?.assumed).toBe(true);
    expectAbsClose(t!.temperatureK, 313.15, 1e-9);
    const k = parseTemperatureText('313', 'K');
    expect(k?.assumed).toBe(false);
    expect(k?.temperatureK).toBe(313);
  });

  it('parseTemperatureText() refuses texts that are no temperature, and values below 0 K', () => {
    for (const text of ['abc', '', '40 Pa', '-300 °C', '1e400 K', '40 °C and more'.repeat(10)]) {
      expect(parseTemperatureText(text), text).toBeUndefined();
    }
  });
});
