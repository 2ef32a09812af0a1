/**
 * parseSpecification() and the verdict rule: pass when the 95 % interval lies inside the limits,
 * fail when wholly outside, inconclusive when it straddles a limit (docs/compare.md). The normal
 * quantile 1.959964 and Φ(1) = 0.841345 are table values (Abramowitz & Stegun, Handbook of
 * Mathematical Functions, 1964, table 26.1).
 */
import { describe, expect, it } from 'vitest';
import { parseSpecification, SpecError } from '../../../core/compare';
import { judge } from '../../../core/compare/verdicts';
import { bonferroniZ } from '../../../core/compare/normal';
import { normalCdf } from '../../../core/numeric';
import { expectAbsClose } from '../../helpers/assert-close';

const base = { format: 'thermoshift-spec', formatVersion: 1, name: 't' };

describe('parseSpecification()', () => {
  it('parseSpecification() names the file and the bad entry', () => {
    expect(() =>
      parseSpecification(
        JSON.stringify({
          ...base,
          criteria: [{ kind: 'curve', quantity: 'storageModulus', reducedRange: [1, 10] }],
        }),
        'a.spec.json',
      ),
    ).toThrow(/a\.spec\.json: criteria\.0/);
    expect(() =>
      parseSpecification(
        JSON.stringify({ ...base, formatVersion: 9, criteria: [] }),
        'b.spec.json',
      ),
    ).toThrow(/newer/);
    expect(() => parseSpecification('{', 'c.spec.json')).toThrow(SpecError);
  });
});

describe('judge()', () => {
  const spec = parseSpecification(
    JSON.stringify({ ...base, criteria: [{ kind: 'activationEnergy', toleranceKJPerMol: 3 }] }),
    's.json',
  );
  const verdict = (value: number, stdErr: number): string =>
    judge(spec, {
      differences: [],
      timeShiftDecades: null,
      modulusOffsetDecades: null,
      indicators: [],
      binDecades: 0.25,
      xUnit: 'rad/s',
      models: {
        activationEnergyKJPerMol: { value, stdErr },
        reference: { activationEnergyKJPerMol: null },
        sample: { activationEnergyKJPerMol: null },
        shiftAt: [],
      },
    })[0].verdict;

  it('judge() passes, fails or calls inconclusive by where the 95 % interval lies', () => {
    expect(verdict(1, 0.5)).toBe('pass'); // 1 ± 0.98 inside ±3
    expect(verdict(5, 0.5)).toBe('fail'); // 5 ± 0.98 wholly above 3
    expect(verdict(2.5, 0.5)).toBe('inconclusive'); // 2.5 ± 0.98 straddles 3
    expect(verdict(-2.5, 0.5)).toBe('inconclusive');
  });

  it('normalCdf() and bonferroniZ() match the normal table', () => {
    expectAbsClose(normalCdf(1), 0.841345, 1e-6, 'Φ(1)');
    expectAbsClose(normalCdf(-1.959964), 0.025, 1e-6, 'Φ(−1.96)');
    expectAbsClose(bonferroniZ(1), 1.959964, 1e-5, 'z for one test');
  });
});
