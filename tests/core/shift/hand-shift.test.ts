/**
 * A shift set by hand is a constraint the other isotherms fit around: it never throws the
 * reference isotherm out, never makes the others' points outliers, and an isotherm the engine
 * leaves out for overlapping nothing is not also reported as having disagreeing points.
 * Known-truth data from core/synthetic (seeded), as in shift-isotherms.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { shiftIsotherms } from '../../../core/shift';
import type { ShiftResult } from '../../../core/shift';
import { MELT_ARRHENIUS, make } from './fixtures';

const outliers = (r: ShiftResult): number =>
  r.curves.reduce((n, c) => n + c.outlierPoints.length, 0);

describe('shiftIsotherms() with a shift set by hand', () => {
  const referenceK = 463.15;

  /** Everything a hand shift must leave alone (see the file's opening comment). */
  function checkLocked(offset: number): void {
    const { dataset } = make(MELT_ARRHENIUS, 0.02, 6);
    const free = shiftIsotherms(dataset, { referenceK });
    const lockedValue = free.curves[2].log10aT! + offset;
    const r = shiftIsotherms(dataset, {
      referenceK,
      locked: [{ id: 'T03', log10aT: lockedValue }],
    });
    expect(r.curves[2].log10aT).toBe(lockedValue);
    const ref = r.curves.find((c) => Math.abs(c.temperatureK - referenceK) < 1e-9)!;
    expect(ref.included, 'the reference isotherm stays in').toBe(true);
    expect(ref.overlapsNothing).toBe(false);
    expect(ref.log10aT).toBe(0);
    expect(r.curves.every((c) => c.included)).toBe(true);
    for (const c of r.curves.filter((x) => x.overlapsNothing))
      expect(c.outlierPoints, `${c.id} overlaps nothing and has outliers`).toEqual([]);
    // Outliers are judged against the free fit: a hand shift adds none.
    expect(outliers(r)).toBeLessThanOrEqual(outliers(free));
  }

  it('shiftIsotherms() with T03 locked 0.05 decades off its free shift keeps every isotherm and flags no new outliers', () => {
    checkLocked(0.05);
  });

  it.each([-0.3, -0.05, 0.3])(
    'shiftIsotherms() with T03 locked %s decades off its free shift keeps every isotherm and flags no new outliers',
    (offset) => checkLocked(offset),
  );

  it('shiftIsotherms() never reports an isotherm that overlaps nothing as having disagreeing points', () => {
    const { dataset } = make(MELT_ARRHENIUS, 0.02, 3);
    // Move the coldest isotherm's frequencies six decades away: it overlaps nothing any more.
    const far = dataset.isotherms[0];
    const moved = { ...far, x: far.x.map((w) => w * 1e6) };
    const d = { ...dataset, isotherms: [moved, ...dataset.isotherms.slice(1)] };
    for (const drivers of [undefined, ['tanDelta' as const]]) {
      const r = shiftIsotherms(d, { referenceK, ...(drivers ? { drivers } : {}) });
      const lone = r.curves.filter((c) => c.overlapsNothing);
      for (const c of lone) {
        expect(c.outlierPoints, `${c.id} (${drivers ?? 'default'})`).toEqual([]);
        const about = r.warnings.filter(
          (w) => w.code === 'outliers-flagged' && w.message.includes(c.id),
        );
        expect(about, `${c.id}: no outlier warning`).toEqual([]);
      }
    }
  });
});
