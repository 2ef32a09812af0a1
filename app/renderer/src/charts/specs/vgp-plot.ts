/**
 * van Gurp–Palmen plot: phase angle δ against |G*| for every measured point, no horizontal shift
 * needed (van Gurp & Palmen, Rheology Bulletin 67, 1998). Isotherms on one line support
 * superposition; a fan of lines says it fails. With a vertical shift, |G*| is multiplied by bT.
 * The points come from core (vanGurpPalmenSeries); this only styles them.
 */
import { quantitySymbol } from '../../../../../core/data/quantities';
import type { Analysis } from '../../../../../core/pipeline/types';
import { toCelsius } from '../../../../../core/pipeline/temperature';
import { vanGurpPalmenSeries } from '../../../../../core/pipeline/van-gurp-palmen';
import { formatValue as formatNumber } from '../../tables/format-value';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { temperatureScale } from '../temperature-colours';
import { celsiusText } from './plot-labels';
import { plotThinner } from './thin-series';

/** null when the data are not oscillatory (no phase angle). */
export function vgpPlot(a: Analysis): PlotSpec | null {
  if (a.sample.testKind !== 'oscillatory') return null;
  const scale = temperatureScale(a.dataset.isotherms.map((i) => i.temperatureK));
  const all = vanGurpPalmenSeries(a);
  const thinner = plotThinner(
    all.map((v) => ({ x: v.complexModulusPa, y: v.phaseAngleDeg })),
    'log',
    'linear',
  );
  const series: PlotSeries[] = all.map((v) => ({
    id: `${v.isothermId}:vgp`,
    label: celsiusText(v.temperatureK),
    colour: scale.colour(v.temperatureK),
    style: 'disc',
    isothermId: v.isothermId,
    points: thinner
      .keep(v.complexModulusPa, v.phaseAngleDeg)
      .map((i) => ({ x: v.complexModulusPa[i], y: v.phaseAngleDeg[i] })),
  }));
  if (!series.length) return null;
  const sym = quantitySymbol('complexModulus', a.sample.deformation);
  const prefix = a.settings.verticalShift === 'none' ? '' : 'bT·';
  return {
    id: 'van-gurp-palmen',
    title: `van Gurp–Palmen plot (no shift needed)${thinner.note()}`,
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
