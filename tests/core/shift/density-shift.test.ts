import { describe, expect, it } from 'vitest';
import { densityLog10bT } from '../../../core/shift/density-shift';
import { expectAbsClose } from '../../helpers/assert-close';

describe('densityLog10bT()', () => {
  it('densityLog10bT() evaluates bT = Tref·ρref/(T·ρ) (Ferry 1980) by hand for one temperature', () => {
    // Tref = 300 K, ρref = 900, αV = 6e-4 1/K, T = 350 K: ρ = 900/(1 + 0.03) = 873.786…;
    // bT = 300·900/(350·873.786) = 0.88286; log10 bT = −0.054108 (worked by hand).
    const d = densityLog10bT([300, 350], 300, {
      kind: 'expansion',
      referenceDensityKgPerM3: 900,
      volumetricExpansionPerK: 6e-4,
    });
    expect(d.log10bT[0]).toBe(0);
    expectAbsClose(d.log10bT[1], Math.log10((300 * 1.03) / 350), 1e-12, 'closed form');
    expectAbsClose(d.log10bT[1], -0.054108, 1e-5, 'hand value');
  });

  it('densityLog10bT() interpolates a density table and lists extrapolated temperatures', () => {
    const d = densityLog10bT([300, 320, 400], 310, {
      kind: 'table',
      points: [
        { temperatureK: 300, densityKgPerM3: 1000 },
        { temperatureK: 320, densityKgPerM3: 980 },
      ],
    });
    // ρ(310) = 990 by interpolation; at 400 K the line is extrapolated to 900.
    expectAbsClose(d.log10bT[0], Math.log10((310 * 990) / (300 * 1000)), 1e-12, '300 K');
    expectAbsClose(d.log10bT[2], Math.log10((310 * 990) / (400 * 900)), 1e-12, '400 K');
    expect(d.extrapolatedK).toEqual([400]);
  });
});
