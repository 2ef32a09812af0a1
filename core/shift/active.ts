/** Which isotherms take part: not excluded, with two or more usable points for some driver. */
import type { Dataset } from '../data/types';
import { usableValue, quantityValues } from './drivers';
import type { ResolvedShiftOptions, ShiftWarning } from './types';
import { describeIsotherm, warn } from './warnings';

export function activeIsotherms(
  dataset: Dataset,
  s: ResolvedShiftOptions,
  warnings: ShiftWarning[],
): number[] {
  const excluded = new Set(s.excluded);
  const active: number[] = [];
  dataset.isotherms.forEach((iso, k) => {
    if (excluded.has(iso.id)) return;
    let usable = 0;
    for (const q of s.drivers) {
      const values = quantityValues(q, iso.quantities);
      if (!values) continue;
      let good = 0;
      let firstBad = -1;
      for (let i = 0; i < iso.x.length; i++) {
        if (!iso.mask[i]) continue;
        if (iso.x[i] > 0 && usableValue(q, values[i])) good++;
        else if (firstBad < 0) firstBad = i;
      }
      if (firstBad >= 0) {
        const src = iso.source[firstBad];
        warn(
          warnings,
          'bad-values',
          `Isotherm ${describeIsotherm(iso)}: ${q} has missing, zero or negative values (first at ` +
            `${src ? `${src.file} row ${src.row}` : `point ${firstBad + 1}`}); those points are left out.`,
        );
      }
      usable = Math.max(usable, good);
    }
    if (usable >= 2) active.push(k);
  });
  return active;
}
