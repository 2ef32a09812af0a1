import { describe, expect, it } from 'vitest';
import { formatValue } from '../../../app/renderer/src/tables/format-value';

describe('formatValue()', () => {
  it('formatValue() writes plain significant digits between 1e-3 and 1e6', () => {
    expect(formatValue(273312.7)).toBe('273300');
    expect(formatValue(0.0123456)).toBe('0.01235');
    expect(formatValue(-5.0)).toBe('-5');
  });

  it('formatValue() uses ×10ⁿ outside that range and a dash for missing values', () => {
    expect(formatValue(2.5e9)).toBe('2.5×10⁹');
    expect(formatValue(null)).toBe('–');
    expect(formatValue(Number.NaN)).toBe('–');
  });
});
