/**
 * Shift factors against temperature: the fitted log10 aT of each isotherm (±1 s.e. in the SVG
 * export) with each fitted model's curve and 95 % band.
 */
import type { Analysis } from '../../../../../core/pipeline/types';
import { toCelsius } from '../../../../../core/pipeline/temperature';
import { formatFixed } from '../../../../../core/report/format';
import type { PlotBand, PlotSeries, PlotSpec } from '../plot-spec';
import { temperatureScale } from '../temperature-colours';

export const MODEL_COLOURS = {
  wlf: '#23676b',
  arrhenius: '#9a5b12',
  polynomial: '#5d4f8f',
} as const;
export const MODEL_NAMES = {
  wlf: 'WLF',
  arrhenius: 'Arrhenius',
  polynomial: 'polynomial',
} as const;

export function shiftPlot(a: Analysis): PlotSpec {
  const scale = temperatureScale(a.dataset.isotherms.map((i) => i.temperatureK));
  const series: PlotSeries[] = [];
  const bands: PlotBand[] = [];
  const legend: PlotSpec['legend'] = [
    { label: 'log10 aT of an isotherm', colour: '#4a5358', style: 'disc' },
  ];
  for (const kind of ['wlf', 'arrhenius', 'polynomial'] as const) {
    const m = a.models[kind];
    if (!m) continue;
    const x = m.band.temperatureK.map(toCelsius);
    bands.push({
      label: `${MODEL_NAMES[kind]} 95 % band`,
      colour: MODEL_COLOURS[kind],
      x,
      lower: m.band.lower95,
      upper: m.band.upper95,
    });
    series.push({
      id: `model:${kind}`,
      label: MODEL_NAMES[kind],
      colour: MODEL_COLOURS[kind],
      style: kind === 'wlf' ? 'line' : 'dashed',
      points: x.map((t, i) => ({ x: t, y: m.band.log10aT[i] })),
    });
    legend.push({
      label: `${MODEL_NAMES[kind]} with 95 % band`,
      colour: MODEL_COLOURS[kind],
      style: kind === 'wlf' ? 'line' : 'dashed',
    });
  }
  for (const c of a.curves) {
    if (c.log10aT === null) continue;
    series.push({
      id: `curve:${c.isothermId}`,
      label: `${toCelsius(c.temperatureK).toFixed(1)} °C${c.included ? '' : ' (excluded)'}`,
      colour: scale.colour(c.temperatureK),
      style: c.included ? 'disc' : 'ring',
      faint: !c.included,
      isothermId: c.isothermId,
      points: [{ x: toCelsius(c.temperatureK), y: c.log10aT }],
      yError: [c.log10aTStdErr],
    });
  }
  const err = new Map(a.curves.map((c) => [c.isothermId, c.log10aTStdErr]));
  return {
    id: 'shift-factors',
    title: `Shift factors, Tref = ${toCelsius(a.referenceTemperatureK).toFixed(1)} °C`,
    x: { kind: 'linear', label: 'temperature T (°C)' },
    y: { kind: 'linear', label: 'log10 aT (decades; < 0 above Tref)' },
    series,
    bands,
    legend,
    colourBar: {
      minC: toCelsius(scale.minK),
      maxC: toCelsius(scale.maxK),
      gradient: scale.gradient,
    },
    describe: (s, p) => {
      const e = s.isothermId ? err.get(s.isothermId) : undefined;
      return `T = ${p.x.toFixed(1)} °C · log10 aT = ${formatFixed(p.y, 3)}${e != null ? ` ± ${formatFixed(e, 3)}` : ''}`;
    },
  };
}
