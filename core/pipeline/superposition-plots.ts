/**
 * The two superposition checks that, like the van Gurp–Palmen plot, need no horizontal shift:
 * the Cole–Cole plot (G″ against G′) and tan δ against |G*| (the plot Mavridis & Shroff, Polym.
 * Eng. Sci. 32, 1992, use to read bT free of aT). Isotherms that do not fall on one curve mean
 * superposition fails. Moduli are multiplied by the isotherm's bT when a vertical shift applies;
 * every isotherm is listed with its state, so plots can draw left-out ones faded.
 */
import { isothermStates, type IsothermUse } from './isotherm-states';
import { isothermValues } from './reduced-isotherms';
import type { Analysis } from './types';

export interface CheckSeries {
  isothermId: string;
  temperatureK: number;
  use: IsothermUse;
  x: number[];
  y: number[];
}

/** One series per isotherm from a per-point rule; `point` returns [x, y] or null. */
function perIsotherm(
  a: Analysis,
  point: (v: { gp?: number; gpp?: number; gs?: number; tan?: number }) => [number, number] | null,
  bTScaled: (xy: [number, number], bT: number) => [number, number],
): CheckSeries[] {
  if (a.sample.testKind !== 'oscillatory') return [];
  const states = new Map(isothermStates(a).map((s) => [s.isothermId, s]));
  const out: CheckSeries[] = [];
  for (const iso of a.dataset.isotherms) {
    const s = states.get(iso.id);
    if (!s) continue;
    const gp = iso.quantities.storageModulus;
    const gpp = iso.quantities.lossModulus;
    const gs = isothermValues(iso, 'complexModulus');
    const tan = isothermValues(iso, 'tanDelta');
    const bT = 10 ** s.drawLog10bT;
    const series: CheckSeries = {
      isothermId: iso.id,
      temperatureK: iso.temperatureK,
      use: s.use,
      x: [],
      y: [],
    };
    iso.x.forEach((_, i) => {
      if (!iso.mask[i]) return;
      const xy = point({ gp: gp?.[i], gpp: gpp?.[i], gs: gs?.[i], tan: tan?.[i] });
      if (!xy || !(xy[0] > 0) || !(xy[1] > 0) || !Number.isFinite(xy[0] + xy[1])) return;
      const [x, y] = bTScaled(xy, bT);
      series.x.push(x);
      series.y.push(y);
    });
    if (series.x.length) out.push(series);
  }
  return out;
}

/** G″ against G′ (both × bT), Pa. Needs measured G′ and G″. */
export function coleColeSeries(a: Analysis): CheckSeries[] {
  return perIsotherm(
    a,
    ({ gp, gpp }) => (gp !== undefined && gpp !== undefined ? [gp, gpp] : null),
    ([x, y], bT) => [bT * x, bT * y],
  );
}

/** tan δ against bT·|G*| (Pa); tan δ carries no vertical shift. */
export function lossTangentSeries(a: Analysis): CheckSeries[] {
  return perIsotherm(
    a,
    ({ gs, tan }) => (gs !== undefined && tan !== undefined ? [gs, tan] : null),
    ([x, y], bT) => [bT * x, y],
  );
}
