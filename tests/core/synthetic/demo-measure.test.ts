import { describe, it, expect } from 'vitest';
import {
  demoModelAt,
  demoScenario,
  demoScenarios,
  demoShiftAt,
  demoXToSI,
  measureDemoScenario,
} from '../../../core/synthetic';
import type { DemoScenario } from '../../../core/synthetic';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

const noiseFree = (s: DemoScenario): DemoScenario => ({ ...s, relativeNoise: 0, lowTorque: null });

describe('demoXToSI()', () => {
  it('demoXToSI() turns hertz into rad/s with ω = 2πf and keeps rad/s and s', () => {
    // ω = 2πf: SI Brochure (BIPM, 9th ed., 2019), note on the hertz and rad/s.
    expectRelClose(demoXToSI(demoScenario('seal-dma'), 1), 2 * Math.PI, 1e-15, 'ω at 1 Hz');
    expect(demoXToSI(demoScenario('melt-long'), 3)).toBe(3);
    expect(demoXToSI(demoScenario('adhesive-relaxation'), 3)).toBe(3);
  });
});

describe('demoShiftAt()', () => {
  it.each(demoScenarios())('demoShiftAt() is zero at the reference temperature of $id', (s) => {
    const t = demoShiftAt(s, s.referenceK - 273.15);
    expectAbsClose(t.log10aT, 0, 1e-12, 'log10 aT(Tref)');
    expectAbsClose(t.log10bT, 0, 1e-12, 'log10 bT(Tref)');
  });

  it('demoShiftAt() follows the sign convention: log10 aT < 0 and bT < 1 above Tref', () => {
    const melt = demoScenario('melt-long');
    const hot = demoShiftAt(melt, 230);
    expect(hot.log10aT).toBeLessThan(0);
    expect(hot.log10bT).toBeLessThan(0);
    // bT = Tref·ρref/(T·ρ) (Ferry 1980) with ρ = ρref/(1 + αV ΔT): written out by hand here.
    const ratio = ((190 + 273.15) / (230 + 273.15)) * (1 + 7.0e-4 * 40);
    expectAbsClose(hot.log10bT, Math.log10(ratio), 1e-12, 'log10 bT at 230 °C');
  });
});

describe('measureDemoScenario()', () => {
  it.each(demoScenarios())(
    'measureDemoScenario() without noise gives the true model ($id)',
    (s) => {
      const m = measureDemoScenario(noiseFree(s));
      for (const iso of m.isotherms) {
        for (const p of iso.points) {
          const truth = demoModelAt(s, p.temperatureC, p.xSI);
          expect(p.primaryPa).toBe(truth.primaryPa);
          if (s.testKind === 'oscillatory') expect(p.lossPa).toBe(truth.lossPa);
          else expect(p.lossPa).toBeNaN();
        }
      }
    },
  );

  it('measureDemoScenario() is reproducible from the seed and changes with it', () => {
    const s = demoScenario('melt-long');
    const a = measureDemoScenario(s);
    expect(measureDemoScenario(demoScenario('melt-long'))).toEqual(a);
    const b = measureDemoScenario({ ...s, seed: s.seed + 1 });
    expect(b.isotherms[0].points[0].primaryPa).not.toBe(a.isotherms[0].points[0].primaryPa);
  });

  it('measureDemoScenario() keeps measured temperatures near their set points', () => {
    for (const s of demoScenarios()) {
      const m = measureDemoScenario(s);
      for (const iso of m.isotherms) {
        for (const p of iso.points) {
          expect(Math.abs(p.temperatureC - iso.setPointC)).toBeLessThanOrEqual(0.35);
          // Written with two decimals: the stored value is exactly the written one.
          expect(Number(p.temperatureC.toFixed(2))).toBe(p.temperatureC);
        }
      }
    }
  });

  it('measureDemoScenario() heats during each ramp step', () => {
    const m = measureDemoScenario(demoScenario('ramp-dma'));
    for (const iso of m.isotherms) {
      const t = iso.points.map((p) => p.temperatureC);
      expect(t[t.length - 1]).toBeGreaterThan(t[0]);
    }
  });

  it('measureDemoScenario() makes low-torque points only where the torque floor matters', () => {
    const m = measureDemoScenario(demoScenario('melt-long'));
    const flagged = m.isotherms.flatMap((iso) => iso.points.filter((p) => p.lowTorque));
    expect(flagged.length).toBeGreaterThanOrEqual(2);
    expect(flagged.every((p) => p.xFile <= 0.2 && p.temperatureC > 195)).toBe(true);
    expect(m.isotherms.flatMap((i) => i.points).every((p) => p.primaryPa > 0)).toBe(true);
  });

  it('measureDemoScenario() rejects an empty or broken scenario, naming the field', () => {
    const s = demoScenario('seal-dma');
    expect(() => measureDemoScenario({ ...s, setPointsC: [] })).toThrow(/setPointsC/);
    expect(() => measureDemoScenario({ ...s, xValues: [1] })).toThrow(/xValues/);
    expect(() => measureDemoScenario({ ...s, xValues: [0, 1] })).toThrow(/xValues/);
    expect(() => measureDemoScenario({ ...s, relativeNoise: -1 })).toThrow(/relativeNoise/);
    expect(() => measureDemoScenario({ ...s, lowTorque: { floorPa: NaN } })).toThrow(/floorPa/);
  });
});
