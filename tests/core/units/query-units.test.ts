import { describe, expect, it } from 'vitest';
import {
  FREQUENCY_UNIT_CHOICES,
  QUERY_FREQUENCY_UNITS,
  QUERY_TIME_UNITS,
  TIME_UNIT_CHOICES,
  YEAR_S,
} from '../../../core/units';

// 1 min = 60 s, 1 h = 3600 s, 1 d = 86 400 s, ω = 2πf (SI Brochure, BIPM, 9th ed., 2019, table 8);
// the Julian year of 365.25 d (common practice for service lives).
describe('QUERY_TIME_UNITS and QUERY_FREQUENCY_UNITS', () => {
  it('QUERY_TIME_UNITS gives seconds per unit, the year as 365.25 days', () => {
    expect(QUERY_TIME_UNITS.min).toBe(60);
    expect(QUERY_TIME_UNITS.h).toBe(3600);
    expect(QUERY_TIME_UNITS.days).toBe(86400);
    expect(YEAR_S).toBe(31_557_600);
    expect(QUERY_TIME_UNITS.years).toBe(YEAR_S);
  });

  it('QUERY_FREQUENCY_UNITS gives rad/s per unit (ω = 2πf)', () => {
    expect(QUERY_FREQUENCY_UNITS.Hz).toBe(2 * Math.PI);
    expect(QUERY_FREQUENCY_UNITS.kHz).toBe(2000 * Math.PI);
    expect(QUERY_FREQUENCY_UNITS.mHz).toBe(2e-3 * Math.PI);
    expect(QUERY_FREQUENCY_UNITS['rad/s']).toBe(1);
    expect(QUERY_FREQUENCY_UNITS.MHz).toBeUndefined();
  });

  it('TIME_UNIT_CHOICES and FREQUENCY_UNIT_CHOICES are taken from the same tables', () => {
    expect(TIME_UNIT_CHOICES.map((u) => u.id)).toEqual(['s', 'h', 'days', 'years']);
    for (const u of TIME_UNIT_CHOICES) expect(u.factor).toBe(QUERY_TIME_UNITS[u.id]);
    expect(FREQUENCY_UNIT_CHOICES.map((u) => [u.id, u.factor])).toEqual([
      ['Hz', 2 * Math.PI],
      ['rad/s', 1],
    ]);
  });
});
