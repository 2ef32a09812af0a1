import { describe, it, expect } from 'vitest';
import { toCelsius } from '../../../core/pipeline/temperature';

describe('toCelsius()', () => {
  it('toCelsius() removes float noise from K → °C (0 °C = 273.15 K exactly, SI Brochure 2019)', () => {
    expect(toCelsius(463.15)).toBe(190);
    expect(toCelsius(253.15)).toBe(-20);
    expect(toCelsius(273.15)).toBe(0);
    expect(toCelsius(300.1234567)).toBe(26.973457);
  });
});
