/**
 * Residuals of each shift-factor model against temperature (log10 aT of the isotherm − model,
 * decades, from core's fits), with the isotherm's ±1 s.e.: a pattern with temperature says the
 * model does not suit the data range; scatter within the error bars says it does.
 */
import type { Analysis } from '@core/pipeline';
import { fittedShiftModels, toCelsius } from '@core/pipeline';
import { formatFixed } from '@core/report';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { maxOf, minOf } from '@core/data';

export function modelResidualsPlot(a: Analysis): PlotSpec {
  const err = new Map(a.curves.map((c) => [c.isothermId, c.log10aTStdErr]));
  const series: PlotSeries[] = [];
  const legend: PlotSpec['legend'] = [];
  const ts: number[] = [];
  for (const { descriptor: d, result: m } of fittedShiftModels(a.models)) {
    const kind = d.kind;
    if (m.residuals.length === 0) continue;
    const rs = [...m.residuals].sort((p, q) => p.temperatureK - q.temperatureK);
    for (const r of rs) ts.push(toCelsius(r.temperatureK));
    series.push({
      id: `residuals:${kind}`,
      label: `${d.name} (RMS ${formatFixed(m.rmsResidualDecades, 3)} decades)`,
      colour: d.chart.appColour,
      style: d.chart.residualMarker,
      points: rs.map((r) => ({ x: toCelsius(r.temperatureK), y: r.residualDecades })),
      yError: rs.map((r) => err.get(r.isothermId) ?? null),
    });
    legend.push({
      label: `${d.name}: RMS ${formatFixed(m.rmsResidualDecades, 3)} decades`,
      colour: d.chart.appColour,
      style: d.chart.residualMarker,
    });
  }
  if (ts.length)
    series.unshift({
      id: 'zero',
      label: 'zero',
      colour: '#9aa3a0',
      style: 'line',
      points: [
        { x: minOf(ts), y: 0 },
        { x: maxOf(ts), y: 0 },
      ],
    });
  return {
    id: 'model-residuals',
    title: `Residuals of the shift-factor models, Tref = ${toCelsius(a.referenceTemperatureK).toFixed(1)} °C`,
    x: { kind: 'linear', label: 'temperature T (°C)' },
    y: { kind: 'linear', label: 'log10 aT − model (decades)' },
    series,
    bands: [],
    legend,
    describe: (s, p) =>
      `${s.label.split(' (')[0]} · T = ${p.x.toFixed(1)} °C · residual ${formatFixed(p.y, 3)} decades`,
  };
}
