/**
 * The van Gurp–Palmen points of an analysis: phase angle δ against |G*| for every measured,
 * unmasked point, with |G*| multiplied by the isotherm's bT when a vertical shift applies. No
 * horizontal shift is needed (van Gurp & Palmen, Rheology Bulletin 67, 1998): isotherms on one
 * line support superposition. |G*| and δ as measured, else from G′ and G″ (one rule,
 * core/data/derived.ts; docs/conventions.md §1). The report and the app both plot these.
 */
import { quantityValues } from '../data/derived';
import type { Analysis } from './types';

export interface VanGurpPalmenSeries {
  isothermId: string;
  temperatureK: number;
  /** bT·|G*| (|G*| without a vertical shift), Pa; always > 0. */
  complexModulusPa: number[];
  /** Phase angle δ, degrees. */
  phaseAngleDeg: number[];
}

/** One series per isotherm with at least one point; [] for non-oscillatory data. */
export function vanGurpPalmenSeries(a: Analysis): VanGurpPalmenSeries[] {
  if (a.sample.testKind !== 'oscillatory') return [];
  const bT = new Map(a.curves.map((c) => [c.isothermId, 10 ** (c.log10bT ?? 0)]));
  const out: VanGurpPalmenSeries[] = [];
  for (const iso of a.dataset.isotherms) {
    const gs = quantityValues('complexModulus', iso.quantities);
    const ph = quantityValues('phaseAngle', iso.quantities);
    const b = bT.get(iso.id) ?? 1;
    const complexModulusPa: number[] = [];
    const phaseAngleDeg: number[] = [];
    iso.x.forEach((_, i) => {
      if (!iso.mask[i]) return;
      const g = gs?.[i];
      const d = ph?.[i];
      if (g === undefined || d === undefined || !(g > 0) || !Number.isFinite(g)) return;
      if (!Number.isFinite(d)) return;
      complexModulusPa.push(b * g);
      phaseAngleDeg.push(d);
    });
    if (complexModulusPa.length)
      out.push({
        isothermId: iso.id,
        temperatureK: iso.temperatureK,
        complexModulusPa,
        phaseAngleDeg,
      });
  }
  return out;
}
