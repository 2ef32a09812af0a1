import { describe, expect, it } from 'vitest';
import { shiftIsotherms } from '../../../core/shift';
import type { ShiftResult } from '../../../core/shift';
import { syntheticCreep } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';
import {
  CREEP_ARRHENIUS,
  CREEP_WLF,
  makeCreep,
  maxError,
  pushStandardisedErrors,
  rootMeanSquare,
} from './fixtures';
import type { CreepCase } from './fixtures';

const SEEDS = [1, 2, 3, 4, 5];
const aTs = (r: ShiftResult): (number | null)[] => r.curves.map((c) => c.log10aT);

describe('shiftIsotherms() on creep data', () => {
  // The bounds of docs/conventions.md §7 for relaxation data, applied to creep: 0.02 decades at 2 % noise;
  // 0.05 decades at 8 % noise with 30 %-noise early points on two isotherms.
  const row = (c: CreepCase, noise: number, disturbed: boolean, tol: number) =>
    [c.name, noise * 100, disturbed ? ' + disturbed early points' : '', tol, c] as const;
  it.each([
    row(CREEP_WLF, 0.02, false, 0.02),
    row(CREEP_ARRHENIUS, 0.02, false, 0.02),
    row(CREEP_WLF, 0.08, true, 0.05),
    row(CREEP_ARRHENIUS, 0.08, true, 0.05),
  ])(
    'shiftIsotherms() recovers log10 aT of %s (%s %% noise%s) within %s decades',
    (_name, noisePercent, disturbedText, tol, c) => {
      for (const seed of SEEDS) {
        const { dataset, truth } = makeCreep(c, noisePercent / 100, seed, disturbedText !== '');
        const r = shiftIsotherms(dataset, { referenceK: c.options.referenceK });
        expect(r.settings.drivers).toEqual(['creepCompliance']);
        expect(r.abscissa).toBe('time');
        expect(r.curves.every((cv) => cv.included)).toBe(true);
        expectAbsClose(maxError(aTs(r), truth.log10aT), 0, tol, `${c.name} seed ${seed}`);
        expect(r.checks.grade, `${c.name} seed ${seed}`).not.toBe('poor');
      }
    },
  );

  it('shiftIsotherms() gives creep standard errors that describe the actual scatter', () => {
    // RMS of error / standard error near 1 (0.6–1.8, as for oscillatory and relaxation data).
    const z: number[] = [];
    for (const seed of SEEDS) {
      const { dataset, truth } = makeCreep(CREEP_WLF, 0.02, seed);
      pushStandardisedErrors(z, shiftIsotherms(dataset, { referenceK: 300 }).curves, truth.log10aT);
    }
    const rmsZ = rootMeanSquare(z);
    expect(rmsZ).toBeGreaterThan(0.6);
    expect(rmsZ).toBeLessThan(1.8);
  });

  it('shiftIsotherms() takes bT from density for creep, entering as reduced J = measured / bT', () => {
    // bT = Tref·ρref/(T·ρ) (Ferry, Viscoelastic Properties of Polymers, 3rd ed., 1980); a large
    // expansion coefficient makes bT matter (about ±3 % over the set).
    const density = { referenceDensity: 1100, volumetricExpansionPerK: 2e-3 };
    const { dataset, truth } = syntheticCreep({
      ...CREEP_WLF.options,
      relativeNoise: 0.02,
      seed: 21,
      density,
    });
    const r = shiftIsotherms(dataset, {
      referenceK: 300,
      vertical: 'density',
      density: {
        kind: 'expansion',
        referenceDensityKgPerM3: 1100,
        volumetricExpansionPerK: 2e-3,
      },
    });
    r.curves.forEach((cv, k) => {
      expectAbsClose(cv.log10bT!, truth.log10bT[k], 0.005, `${cv.id} log10 bT`);
      expect(cv.log10bTStdErr).toBe(0);
    });
    expect(Math.max(...truth.log10bT.map(Math.abs))).toBeGreaterThan(0.005);
    expectAbsClose(maxError(aTs(r), truth.log10aT), 0, 0.02, 'aT of creep with bT from density');
    // Ignoring bT puts it into aT: the shifts are then worse (bT is not a no-op here).
    const without = shiftIsotherms(dataset, { referenceK: 300 });
    expect(maxError(aTs(without), truth.log10aT)).toBeGreaterThan(maxError(aTs(r), truth.log10aT));
  });

  it("shiftIsotherms() refuses vertical 'data' for creep, explaining why", () => {
    const { dataset } = makeCreep(CREEP_WLF, 0.02, 1);
    expect(() => shiftIsotherms(dataset, { referenceK: 300, vertical: 'data' })).toThrow(/density/);
  });
});
