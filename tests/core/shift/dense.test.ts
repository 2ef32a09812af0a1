/**
 * Dense sweeps and closely spaced isotherms (docs/conventions.md §7): accuracy, warnings and honest standard
 * errors from 5 to 1000 points per decade, on invented seeded melts from core/synthetic with an
 * entropic bT (αV = 7e-4 /K, the order of polyolefin melts; common practice).
 */
import { describe, expect, it } from 'vitest';
import { shiftIsotherms } from '../../../core/shift';
import type { ShiftResult } from '../../../core/shift';
import {
  expectShiftsWithin,
  inventedMelt,
  pushStandardisedErrors,
  rootMeanSquare,
  temperatures,
} from './fixtures';

const REFERENCE_K = 463.15;
const DENSITY = { referenceDensity: 780, volumetricExpansionPerK: 7e-4 };
const VERTICAL = {
  vertical: 'density',
  density: { kind: 'expansion', referenceDensityKgPerM3: 780, volumetricExpansionPerK: 7e-4 },
} as const;

const melt = (temperaturesK: number[], pointsPerDecade: number, seed: number) =>
  inventedMelt({ temperaturesK, pointsPerDecade, seed, density: DENSITY });

const shift = (d: ReturnType<typeof melt>) =>
  shiftIsotherms(d.dataset, { referenceK: REFERENCE_K, ...VERTICAL });

/** Codes a simple material must not get: outliers and superposition warnings. */
const FALSE_ALARMS = [
  'outliers-flagged',
  'poor-superposition',
  'fair-superposition',
  'quantities-disagree',
  'not-converged',
];
const falseAlarms = (r: ShiftResult) => r.warnings.filter((w) => FALSE_ALARMS.includes(w.code));

describe('shiftIsotherms() on dense sweeps', () => {
  it('shiftIsotherms() recovers 200 isotherms × 2000 points 0.4 K apart within 0.005 decades, without false alarms', () => {
    // Dense target (docs/conventions.md §7): max |Δlog10 aT| ≤ 0.005 at 2 % noise; the chain of 199 neighbours is where the
    // rounding of a nearest-neighbour start used to add up (0.154 decades).
    const temps = Array.from({ length: 200 }, (_, k) => REFERENCE_K + 0.4 * k);
    const d = melt(temps, 1999 / 3, 21);
    const r = shift(d);
    expect(r.fit.converged).toBe(true);
    expect(r.curves.every((c) => c.included)).toBe(true);
    expectShiftsWithin(r, d.truth.log10aT, 0.005, 'max');
    expect(falseAlarms(r)).toEqual([]);
    expect(r.checks.grade).toBe('good');
  });

  it.each([40, 200, 1000])(
    'shiftIsotherms() recovers 20 isotherms 1 K apart at %s points per decade within 0.005 decades',
    (ppd) => {
      for (const seed of [1, 2]) {
        const d = melt(temperatures(REFERENCE_K, 20, 0, 1), ppd, 100 * ppd + seed);
        const r = shift(d);
        expect(r.fit.converged, `seed ${seed}`).toBe(true);
        expectShiftsWithin(r, d.truth.log10aT, 0.005, `${ppd}/decade seed ${seed}`);
        expect(falseAlarms(r), `seed ${seed}`).toEqual([]);
      }
    },
  );

  // RMS of (error / standard error) within 0.7–1.4 (docs/conventions.md §7) over 20 seeded sets of 8 isotherms
  // 10 K apart at each density: binned curves (above 40 points per decade) count their squares
  // and degrees of freedom per bin alike.
  it.each([5, 40, 200, 1000])(
    'shiftIsotherms() gives standard errors that describe the actual scatter at %s points per decade',
    (ppd) => {
      const z: number[] = [];
      for (let seed = 1; seed <= 20; seed++) {
        const d = melt(temperatures(REFERENCE_K, 8, 3, 10), ppd, 1000 * ppd + seed);
        pushStandardisedErrors(z, shift(d).curves, d.truth.log10aT);
      }
      expect(z).toHaveLength(20 * 7); // the isotherm at Tref has s.e. 0 and is not counted
      const rms = rootMeanSquare(z);
      expect(rms, `${ppd}/decade`).toBeGreaterThan(0.7);
      expect(rms, `${ppd}/decade`).toBeLessThan(1.4);
    },
  );
});
