import { describe, it, expect } from 'vitest';
import { roundKelvin, toCelsius, toKelvinText } from '../../../core/pipeline/temperature';

describe('toCelsius()', () => {
  it('toCelsius() removes float noise from K → °C (0 °C = 273.15 K exactly, SI Brochure 2019)', () => {
    expect(toCelsius(463.15)).toBe(190);
    expect(toCelsius(253.15)).toBe(-20);
    expect(toCelsius(273.15)).toBe(0);
    expect(toCelsius(300.1234567)).toBe(26.973457);
  });
});

describe('toKelvinText()', () => {
  it('toKelvinText() prints at most 10 significant digits', () => {
    expect(toKelvinText(253.14999999999998)).toBe('253.15');
    expect(toKelvinText(300)).toBe('300');
  });
});

describe('roundKelvin()', () => {
  it('roundKelvin() removes float noise left by °C → K and keeps 1e-6 K', () => {
    expect(roundKelvin(-40 + 273.15)).toBe(233.15);
    expect(roundKelvin(300.1234567)).toBe(300.123457);
  });
});
