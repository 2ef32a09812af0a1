import { describe, it, expect } from 'vitest';
import { demoScenario, demoScenarios, demoModelAt, demoShiftAt } from '../../../core/synthetic';
import type { DemoScenario } from '../../../core/synthetic';
import { pronyInstantaneous } from '../../../core/spectrum/prony-model';

/** Reduced log10 x window [lo, hi] of one isotherm: log10(aT·ω), or log10(t/aT). */
function reducedWindow(s: DemoScenario, setPointC: number): [number, number] {
  const { log10aT } = demoShiftAt(s, setPointC);
  const xs = s.xValues.map((x) => Math.log10(s.xUnit === 'Hz' ? 2 * Math.PI * x : x));
  const sign = s.testKind === 'relaxation' ? -1 : 1;
  const ends = [Math.min(...xs) + sign * log10aT, Math.max(...xs) + sign * log10aT];
  return [Math.min(...ends), Math.max(...ends)];
}

describe('demoScenarios()', () => {
  it('demoScenarios() gives at least three scenarios, each in a different layout', () => {
    const all = demoScenarios();
    expect(all.length).toBeGreaterThanOrEqual(3);
    expect(new Set(all.map((s) => s.layout)).size).toBe(all.length);
    expect(new Set(all.map((s) => s.id)).size).toBe(all.length);
    expect(new Set(all.map((s) => s.seed)).size).toBe(all.length);
  });

  it('demoScenarios() returns fresh copies: changing one does not change the next call', () => {
    const a = demoScenarios();
    a[0].relativeNoise = 0;
    a[0].xValues.push(1e9);
    const b = demoScenarios();
    expect(b[0].relativeNoise).toBe(0.02);
    expect(b[0].xValues).not.toContain(1e9);
  });

  it('demoScenarios() keeps the shift constants in their physical ranges', () => {
    // Ranges are common practice for the material classes (melt Ea 30–60 kJ/mol; WLF C1 about
    // 8–17 and C2 about 50–120 K near and above Tg; cf. the 'universal' 17.44 / 51.6 K at Tg,
    // Williams, Landel & Ferry, J. Am. Chem. Soc. 77, 3701, 1955).
    for (const s of demoScenarios()) {
      if (s.law.kind === 'arrhenius') {
        expect(s.law.activationEnergyJPerMol).toBeGreaterThanOrEqual(30e3);
        expect(s.law.activationEnergyJPerMol).toBeLessThanOrEqual(60e3);
      } else {
        expect(s.law.c1).toBeGreaterThanOrEqual(8);
        expect(s.law.c1).toBeLessThanOrEqual(17.44);
        expect(s.law.c2K).toBeGreaterThanOrEqual(50);
        expect(s.law.c2K).toBeLessThanOrEqual(120);
      }
    }
  });

  it('demoScenarios() models a melt with Ge = 0 and rubbers with glassy and rubbery plateaus', () => {
    // Common practice (orders of magnitude in Ferry 1980): glassy modulus in tension 1–3 GPa,
    // rubbery plateau 0.1–10 MPa.
    for (const s of demoScenarios()) {
      if (s.id === 'melt-long') {
        expect(s.prony.equilibriumModulusPa).toBe(0);
        continue;
      }
      expect(pronyInstantaneous(s.prony)).toBeGreaterThanOrEqual(1e9);
      expect(pronyInstantaneous(s.prony)).toBeLessThanOrEqual(3e9);
      expect(s.prony.equilibriumModulusPa).toBeGreaterThanOrEqual(1e5);
      expect(s.prony.equilibriumModulusPa).toBeLessThanOrEqual(1e7);
    }
  });

  it.each(demoScenarios().filter((s) => s.layout !== 'ramp'))(
    'demoScenarios() $id: neighbouring isotherms overlap by at least a decade when reduced',
    (s) => {
      for (let k = 1; k < s.setPointsC.length; k++) {
        const [lo1, hi1] = reducedWindow(s, s.setPointsC[k - 1]);
        const [lo2, hi2] = reducedWindow(s, s.setPointsC[k]);
        expect(Math.min(hi1, hi2) - Math.max(lo1, lo2)).toBeGreaterThanOrEqual(1);
      }
    },
  );

  it('demoScenarios() ramp-dma: neighbouring steps still overlap on the reduced axis', () => {
    const s = demoScenario('ramp-dma');
    for (let k = 1; k < s.setPointsC.length; k++) {
      const [lo1, hi1] = reducedWindow(s, s.setPointsC[k - 1]);
      const [lo2, hi2] = reducedWindow(s, s.setPointsC[k]);
      expect(Math.min(hi1, hi2) - Math.max(lo1, lo2)).toBeGreaterThan(0.3);
    }
  });

  it.each(demoScenarios())('demoScenarios() $id: every isotherm has a slope to grip', (s) => {
    // The noise-free modulus must change by at least 0.15 decades across each window (ten
    // times the 2 % noise in log10), or a horizontal shift would be ill-determined.
    for (const T of s.setPointsC) {
      const values = s.xValues.map(
        (x) => demoModelAt(s, T, s.xUnit === 'Hz' ? 2 * Math.PI * x : x).primaryPa,
      );
      expect(Math.log10(Math.max(...values) / Math.min(...values))).toBeGreaterThan(0.15);
    }
  });
});

describe('demoScenario()', () => {
  it('demoScenario() finds a scenario by id', () => {
    expect(demoScenario('seal-dma').layout).toBe('per-isotherm');
  });

  it('demoScenario() names the known ids when the id is unknown', () => {
    expect(() => demoScenario('nope')).toThrow(/melt-long/);
  });
});
