import { describe, expect, it } from 'vitest';
import {
  denormaliseProny,
  normaliseProny,
  pronyZeroShearViscosity,
} from '../../../core/spectrum/prony-forms';
import { expectRelClose } from '../../helpers/assert-close';

describe('normaliseProny()', () => {
  it('normaliseProny() divides by G0 = Ge + Σ g_i and denormaliseProny() undoes it', () => {
    const s = { equilibriumModulusPa: 1, tauS: [0.1, 1], modulusPa: [6, 3] };
    const n = normaliseProny(s);
    expect(n.instantaneousModulusPa).toBe(10);
    expect(n.fractions).toEqual([0.6, 0.3]);
    expect(n.equilibriumFraction).toBe(0.1);
    const back = denormaliseProny(n);
    back.modulusPa.forEach((g, i) => expectRelClose(g, s.modulusPa[i], 1e-15));
    expect(() => normaliseProny({ equilibriumModulusPa: 0, tauS: [], modulusPa: [] })).toThrow(
      /no positive modulus/,
    );
  });

  it('pronyZeroShearViscosity() is Σ g_i τ_i (Ferry 1980, ch. 3)', () => {
    expect(
      pronyZeroShearViscosity({ equilibriumModulusPa: 0, tauS: [0.1, 2], modulusPa: [10, 5] }),
    ).toBe(11);
  });
});
