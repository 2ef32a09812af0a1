import { describe, expect, it } from 'vitest';
import {
  shearFromTensile,
  tensileFactor,
  tensileFromShear,
} from '../../../core/spectrum/modulus-convert';
import { expectRelClose } from '../../helpers/assert-close';

describe('tensileFromShear()', () => {
  // E = 2(1 + ν)G for an isotropic solid; ν = 0.5 gives E = 3G (any elasticity text, e.g.
  // Timoshenko & Goodier, Theory of Elasticity, 1970).
  it('tensileFromShear() multiplies every modulus by 3 for ν = 0.5 and back', () => {
    const g = { equilibriumModulusPa: 1e6, tauS: [1, 10], modulusPa: [2e6, 3e6] };
    const e = tensileFromShear(g, 0.5);
    expect(e.modulusPa).toEqual([6e6, 9e6]);
    expect(e.equilibriumModulusPa).toBe(3e6);
    const back = shearFromTensile(e, 0.5);
    back.modulusPa.forEach((v, i) => expectRelClose(v, g.modulusPa[i], 1e-15));
    expectRelClose(tensileFactor(0.35), 2.7, 1e-15);
  });

  it('tensileFactor() rejects ν outside (−1, 0.5]', () => {
    expect(() => tensileFactor(0.6)).toThrow(/poissonRatio/);
    expect(() => tensileFactor(-1)).toThrow(/poissonRatio/);
    expect(() => tensileFactor(NaN)).toThrow(/poissonRatio/);
  });
});
