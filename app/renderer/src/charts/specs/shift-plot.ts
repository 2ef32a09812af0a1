/**
 * Shift factors against temperature: the fitted log10 aT of each isotherm (±1 s.e.) with each
 * fitted model's curve and 95 % band, and a vertical line at Tg when Tg is known (WLF constants
 * fitted above Tg do not hold below it). Isotherms that are not in the fit are drawn as faded
 * rings.
 */
import { fittedShiftModels, shiftModel } from '@core/pipeline';
import type { IsothermState } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import { formatWithError } from '../../format/numbers';
import type { PlotBand, PlotSeries, PlotSpec } from '../plot-spec';
import { colourBar, datasetScale, stateMarks, statesById } from './isotherm-style';
import { maxOf, minOf } from '@core/data';

/** The app's colour of a shift model (its registry descriptor's `chart.appColour`). */
export const modelColour = (kind: string): string => shiftModel(kind).chart.appColour;
/** The name of a shift model as the plots show it. */
export const modelName = (kind: string): string => shiftModel(kind).name;
export const TG_COLOUR = '#8a2f1d';

/** A vertical line at x from y0 to y1 (Tg), as a plot series. */
export function verticalLine(
  id: string,
  label: string,
  x: number,
  y0: number,
  y1: number,
): PlotSeries {
  return {
    id,
    label,
    colour: TG_COLOUR,
    style: 'dashed',
    points: [
      { x, y: y0 },
      { x, y: y1 },
    ],
  };
}

export function shiftPlot(a: Analysis, states?: readonly IsothermState[]): PlotSpec {
  const scale = datasetScale(a.dataset);
  const byState = statesById(states);
  const series: PlotSeries[] = [];
  const bands: PlotBand[] = [];
  const legend: PlotSpec['legend'] = [
    { label: 'log10 aT of an isotherm (±1 s.e.)', colour: '#4a5358', style: 'disc' },
  ];
  for (const { descriptor: d, result: m } of fittedShiftModels(a.models)) {
    const kind = d.kind;
    const x = m.band.temperatureK.map(toCelsius);
    bands.push({
      label: `${d.name} 95 % band`,
      colour: d.chart.appColour,
      x,
      lower: m.band.lower95,
      upper: m.band.upper95,
    });
    series.push({
      id: `model:${kind}`,
      label: d.name,
      colour: d.chart.appColour,
      style: d.chart.appLine,
      points: x.map((t, i) => ({ x: t, y: m.band.log10aT[i] })),
    });
    legend.push({
      label: `${d.name} with 95 % band`,
      colour: d.chart.appColour,
      style: d.chart.appLine,
    });
  }
  const ys: number[] = [];
  for (const c of a.curves) {
    if (c.log10aT === null) continue;
    const marks = stateMarks(byState.get(c.isothermId));
    ys.push(c.log10aT);
    series.push({
      id: `curve:${c.isothermId}`,
      label: `${toCelsius(c.temperatureK).toFixed(1)} °C${marks.suffix}`,
      colour: scale.colour(c.temperatureK),
      style: c.included ? 'disc' : 'ring',
      ...(marks.faint && { faint: true, note: marks.note }),
      isothermId: c.isothermId,
      points: [{ x: toCelsius(c.temperatureK), y: c.log10aT }],
      yError: [c.log10aTStdErr],
    });
  }
  const tg = a.settings.glassTransitionK;
  if (tg !== null) {
    const all = [...ys, ...bands.flatMap((b) => [...b.lower, ...b.upper])];
    const lo = all.length ? minOf(all) : -1;
    const hi = all.length ? maxOf(all) : 1;
    const label = `Tg = ${toCelsius(tg).toFixed(1)} °C`;
    series.push(verticalLine('tg', label, toCelsius(tg), lo, hi));
    legend.push({ label, colour: TG_COLOUR, style: 'dashed' });
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
    colourBar: colourBar(scale),
    describe: (s, p) => {
      if (s.id === 'tg') return s.label;
      const e = s.isothermId ? err.get(s.isothermId) : undefined;
      return `T = ${p.x.toFixed(1)} °C · log10 aT = ${formatWithError(p.y, e)}`;
    },
  };
}
