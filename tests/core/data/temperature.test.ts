import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  ZERO_CELSIUS_K,
  celsiusToKelvin,
  formatCelsius,
  kelvinToCelsius,
  toCelsius,
} from '../../../core/data/temperature';
import { readSources } from '../../../scripts/import-graph-files';

describe('formatCelsius()', () => {
  // 0 °C = 273.15 K exactly (SI Brochure, BIPM, 9th ed., 2019).
  it('formatCelsius() prints kelvin as °C with the decimals asked for', () => {
    expect(ZERO_CELSIUS_K).toBe(273.15);
    expect(formatCelsius(463.15)).toBe('190.0 °C');
    expect(formatCelsius(253.15, 2)).toBe('-20.00 °C');
    expect(toCelsius(celsiusToKelvin(190))).toBe(190);
    expect(kelvinToCelsius(273.15)).toBe(0);
  });
});

describe('one module per rule', () => {
  const code = (text: string): string =>
    text
      .split('\n')
      .filter((l) => !/^\s*(\/\/|\*|\/\*)/.test(l))
      .join('\n');
  const files = readSources();

  it('the kelvin offset is written only in core/data/temperature.ts', () => {
    const bare = files
      .filter((f) => f.path !== 'core/data/temperature.ts' && /\b273\.15\b/.test(code(f.text)))
      .map((f) => f.path);
    expect(bare).toEqual([]);
  });

  it('ShiftModelKind is declared once, in core/models/types.ts', () => {
    const declared = files
      .filter((f) => /export type ShiftModelKind\s*=/.test(f.text))
      .map((f) => f.path);
    expect(declared).toEqual(['core/models/types.ts']);
  });

  it('no file spells out the list of shift-model kinds outside core/models/types.ts', () => {
    const listed = files
      .filter((f) => f.path !== 'core/models/types.ts')
      .filter((f) => /\[\s*'wlf',\s*'arrhenius',\s*'polynomial'\s*\]/.test(code(f.text)))
      .map((f) => f.path);
    expect(listed).toEqual([]);
  });

  it('the K → °C text formatters of core are not redefined locally', () => {
    const local = files
      .filter((f) => /\(k - 273|kelvinToCelsius\(k\)\.toFixed\(\d\)\} °C`;/.test(code(f.text)))
      .map((f) => f.path);
    expect(local).toEqual([]);
    expect(
      readFileSync(join(import.meta.dirname, '../../../core/data/temperature.ts'), 'utf8'),
    ).toContain('export function formatCelsius');
  });
});
