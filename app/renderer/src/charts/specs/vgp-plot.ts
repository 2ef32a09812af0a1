/**
 * van Gurp–Palmen plot: phase angle δ against |G*| for every measured point, no horizontal shift
 * needed (van Gurp & Palmen, Rheology Bulletin 67, 1998). Isotherms on one line support
 * superposition; a fan of lines says it fails. With a vertical shift, |G*| is multiplied by bT.
 */
import { quantitySymbol } from '../../../../../core/data/quantities';
import type { Analysis } from '../../../../../core/pipeline/types';
import { toCelsius } from '../../../../../core/pipeline/temperature';
import { formatValue as formatNumber } from '../../tables/format-value';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { temperatureScale } from '../temperature-colours';
import { celsiusText } from './plot-labels';

/** null when the data are not oscillatory (no phase angle). */
export function vgpPlot(a: Analysis): PlotSpec | null {
  if (a.sample.testKind !== 'oscillatory') return null;
  const scale = temperatureScale(a.dataset.isotherms.map((i) => i.temperatureK));
  const bT = new Map(a.curves.map((c) => [c.isothermId, 10 ** (c.log10bT ?? 0)]));
  const series: PlotSeries[] = [];
  for (const iso of a.dataset.isotherms) {
    const {
      storageModulus: gp,
      lossModulus: gpp,
      complexModulus: gs,
      phaseAngle: ph,
    } = iso.quantities;
    const b = bT.get(iso.id) ?? 1;
    const points: PlotSeries['points'] = [];
    iso.x.forEach((_, i) => {
      if (!iso.mask[i]) return;
      const g = gp && gpp ? Math.hypot(gp[i], gpp[i]) : gs?.[i];
      const d = gp && gpp ? (Math.atan2(gpp[i], gp[i]) * 180) / Math.PI : ph?.[i];
      if (g !== undefined && d !== undefined && g > 0 && Number.isFinite(d))
        points.push({ x: b * g, y: d });
    });
    if (points.length)
      series.push({
        id: `${iso.id}:vgp`,
        label: celsiusText(iso.temperatureK),
        colour: scale.colour(iso.temperatureK),
        style: 'disc',
        isothermId: iso.id,
        points,
      });
  }
  if (!series.length) return null;
  const sym = quantitySymbol('complexModulus', a.sample.deformation);
  const prefix = a.settings.verticalShift === 'none' ? '' : 'bT·';
  return {
    id: 'van-gurp-palmen',
    title: 'van Gurp–Palmen plot (no shift needed)',
    x: { kind: 'log', label: `${prefix}${sym} (Pa)` },
    y: { kind: 'linear', label: 'phase angle δ (°)' },
    series,
    bands: [],
    legend: [{ label: 'δ against ' + prefix + sym, colour: '#4a5358', style: 'disc' }],
    colourBar: {
      minC: toCelsius(scale.minK),
      maxC: toCelsius(scale.maxK),
      gradient: scale.gradient,
    },
    describe: (_s, p) => `${prefix}${sym} = ${formatNumber(p.x, 4)} Pa · δ = ${p.y.toFixed(1)}°`,
  };
}
