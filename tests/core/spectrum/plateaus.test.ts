import { describe, expect, it } from 'vitest';
import { modulusPlateaus, plateauModulus } from '../../../core/spectrum/plateaus';
import { expectRelClose } from '../../helpers/assert-close';

describe('plateauModulus()', () => {
  // Two well-separated groups: a terminal mode g = 1e5 Pa at τ = 1 s and a fast mode 1e8 Pa at
  // τ = 1e-7 s. Between them G' ≈ 1e5 Pa (the plateau) and tan δ has its minimum; the
  // tan δ-minimum reading (common practice) must return about 1e5 Pa.
  it('plateauModulus() reads G′ ≈ the plateau strength at the tan δ minimum', () => {
    const s = { equilibriumModulusPa: 0, tauS: [1e-7, 1], modulusPa: [1e8, 1e5] };
    const p = plateauModulus(s, { abscissa: 'angularFrequency', min: 1e-2, max: 1e6 });
    expect(p.atEdge).toBe(false);
    expectRelClose(p.modulusPa, 1e5, 0.01, 'G_N');
    // between the groups G' ≈ g1 and G'' ≈ g1/(ωτ1) + g2·ωτ2, so tan δ is smallest at
    // ω ≈ √(g1/(g2·τ1·τ2)) = 100 rad/s (asymptotic algebra; neglected terms ~1e-3)
    expectRelClose(p.omegaRadPerS, 100, 0.01, 'ω at tan δ min');
  });

  it('plateauModulus() marks a minimum at the window edge', () => {
    const s = { equilibriumModulusPa: 0, tauS: [1], modulusPa: [1e5] };
    expect(plateauModulus(s, { abscissa: 'angularFrequency', min: 1, max: 100 }).atEdge).toBe(true);
  });
});

describe('modulusPlateaus()', () => {
  it('modulusPlateaus() gives G0 and Ge and says whether each plateau is inside the window', () => {
    const s = { equilibriumModulusPa: 1e6, tauS: [1e-3], modulusPa: [1e9] };
    const wide = modulusPlateaus(s, { abscissa: 'angularFrequency', min: 1e-3, max: 1e9 });
    expectRelClose(wide.glassyModulusPa, 1.001e9, 1e-12);
    expect(wide.rubberyModulusPa).toBe(1e6);
    expect(wide.glassyPlateauReached).toBe(true);
    expect(wide.rubberyPlateauReached).toBe(true);
    const narrow = modulusPlateaus(s, { abscissa: 'angularFrequency', min: 100, max: 1e3 });
    expect(narrow.glassyPlateauReached).toBe(false);
    expect(narrow.rubberyPlateauReached).toBe(false);
  });
});
