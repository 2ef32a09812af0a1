/**
 * The master curve at the reference temperature: every included isotherm moved by its shift, in
 * its temperature colour, with the fitted Prony series drawn through it. Curves can be dragged.
 */
import { quantitySymbol } from '../../../../../core/data/quantities';
import type { QuantityId } from '../../../../../core/data/types';
import type { Analysis } from '../../../../../core/pipeline/types';
import { toCelsius } from '../../../../../core/pipeline/temperature';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../../../../../core/spectrum/prony-model';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { temperatureScale } from '../temperature-colours';
import { celsiusText, valueText, xAxisLabel, xText, yAxisLabel } from './plot-labels';
import { plotQuantities, QUANTITY_STYLE } from './measured-plot';
import { plotThinner } from './thin-series';
import { extent } from '../../../../../core/data/extent';

export const PRONY_COLOUR = '#1e2326';

export function masterPlot(a: Analysis): PlotSpec {
  const qs = plotQuantities(a.dataset);
  const mc = a.masterCurve;
  const scale = temperatureScale(a.dataset.isotherms.map((i) => i.temperatureK));
  const byId = new Map<string, number[]>();
  mc.isothermId.forEach((id, i) => {
    const list = byId.get(id);
    if (list) list.push(i);
    else byId.set(id, [i]);
  });
  const mode = a.sample.deformation;
  // one (x, y) pair of columns per isotherm and quantity, thinned together before any point object
  const columns: {
    id: string;
    q: QuantityId;
    k: number;
    t: number;
    x: Float64Array;
    y: Float64Array;
  }[] = [];
  for (const [id, idx] of byId) {
    qs.forEach((q, k) => {
      const v = mc.quantities[q];
      if (!v) return;
      const x = new Float64Array(idx.length);
      const y = new Float64Array(idx.length);
      idx.forEach((i, j) => {
        x[j] = mc.reducedX[i];
        y[j] = v[i] ?? NaN;
      });
      columns.push({ id, q, k, t: mc.temperatureK[idx[0]], x, y });
    });
  }
  const thinner = plotThinner(columns, 'log', 'log');
  const series: PlotSeries[] = columns.map(({ id, q, k, t, x, y }) => ({
    id: `${id}:${q}`,
    label: `${celsiusText(t)} ${quantitySymbol(q, mode)}`,
    colour: scale.colour(t),
    style: QUANTITY_STYLE[k % 2],
    isothermId: id,
    points: thinner.keep(x, y).map((i) => ({ x: x[i], y: y[i] })),
  }));
  const legend = qs.map((q, k) => ({
    label: `${quantitySymbol(q, mode)} (shifted)`,
    colour: '#4a5358',
    style: QUANTITY_STYLE[k % 2],
  }));
  if (a.prony && mc.reducedX.length > 1) {
    const p = a.prony;
    const [lo, hi] = extent(mc.reducedX);
    const grid = Array.from({ length: 160 }, (_, i) => lo * (hi / lo) ** (i / 159));
    const fns: [QuantityId, (x: number) => number][] =
      a.sample.abscissa === 'angularFrequency'
        ? [
            ['storageModulus', (w) => pronyStorage(p, w)],
            ['lossModulus', (w) => pronyLoss(p, w)],
          ]
        : [['relaxationModulus', (t) => pronyRelaxation(p, t)]];
    for (const [q, f] of fns.filter(([q]) => qs.includes(q))) {
      series.push({
        id: `prony:${q}`,
        label: `Prony series ${quantitySymbol(q, mode)}`,
        colour: PRONY_COLOUR,
        style: q === 'lossModulus' ? 'dashed' : 'line',
        points: grid.map((x) => ({ x, y: f(x) })).filter((pt) => pt.y > 0),
      });
    }
    legend.push({
      label: `Prony series (${p.tauS.length} modes)`,
      colour: PRONY_COLOUR,
      style: 'line',
    });
  }
  const quantityOf = (s: PlotSeries): QuantityId => s.id.split(':')[1] as QuantityId;
  return {
    id: 'master',
    title: `Master curve at Tref = ${toCelsius(a.referenceTemperatureK).toFixed(1)} °C${thinner.note()}`,
    x: { kind: 'log', label: xAxisLabel(a.sample.abscissa, true) },
    y: { kind: 'log', label: yAxisLabel(qs, mode, a.settings.verticalShift !== 'none') },
    series,
    bands: [],
    legend,
    colourBar: {
      minC: toCelsius(scale.minK),
      maxC: toCelsius(scale.maxK),
      gradient: scale.gradient,
    },
    describe: (s, pt) =>
      `${xText(a.sample.abscissa, true, pt.x)} · ${valueText(quantityOf(s), mode, pt.y)}`,
    draggable: true,
  };
}
