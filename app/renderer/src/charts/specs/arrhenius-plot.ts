/**
 * The Arrhenius plot: ln aT against 1000/T with each fitted model and its 95 % band, and the
 * activation energy of the Arrhenius fit read off in the title (a straight line means Arrhenius
 * behaviour; WLF curves). The coordinates come from core (arrheniusPlot).
 */
import { arrheniusPlot } from '@core/pipeline';
import type { IsothermState } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import { formatWithError } from '../../format/numbers';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { colourBar, datasetScale, stateMarks, statesById } from './isotherm-style';
import { modelColour, modelName, TG_COLOUR, verticalLine } from './shift-plot';
import { extent } from '@core/data';

export function arrheniusSpec(a: Analysis, states?: readonly IsothermState[]): PlotSpec {
  const p = arrheniusPlot(a);
  const scale = datasetScale(a.dataset);
  const byState = statesById(states);
  const series: PlotSeries[] = [];
  const legend: PlotSpec['legend'] = [
    { label: 'ln aT of an isotherm (±1 s.e.)', colour: '#4a5358', style: 'disc' },
  ];
  const bands = p.models.map((m) => ({
    label: `${modelName(m.kind)} 95 % band`,
    colour: modelColour(m.kind),
    x: m.inverseTemperature,
    lower: m.lower95,
    upper: m.upper95,
  }));
  // the Arrhenius law is the straight line of this plot: drawn solid, the other models dashed
  for (const m of p.models) {
    series.push({
      id: `model:${m.kind}`,
      label: modelName(m.kind),
      colour: modelColour(m.kind),
      style: m.kind === 'arrhenius' ? 'line' : 'dashed',
      points: m.inverseTemperature.map((x, i) => ({ x, y: m.lnAT[i] })),
    });
    legend.push({
      label: `${modelName(m.kind)} with 95 % band`,
      colour: modelColour(m.kind),
      style: m.kind === 'arrhenius' ? 'line' : 'dashed',
    });
  }
  for (const pt of p.points) {
    const marks = stateMarks(byState.get(pt.isothermId));
    series.push({
      id: `curve:${pt.isothermId}`,
      label: `${toCelsius(pt.temperatureK).toFixed(1)} °C${marks.suffix}`,
      colour: scale.colour(pt.temperatureK),
      style: pt.use === 'used' ? 'disc' : 'ring',
      ...(marks.faint && { faint: true, note: marks.note }),
      isothermId: pt.isothermId,
      points: [{ x: pt.inverseTemperature, y: pt.lnAT }],
      yError: [pt.lnATStdErr],
    });
  }
  if (p.glassTransition !== null) {
    const [lo, hi] = extent([
      0,
      ...p.points.map((q) => q.lnAT),
      ...bands.flatMap((b) => [...b.lower, ...b.upper]),
    ]);
    const label = `Tg = ${toCelsius(1000 / p.glassTransition).toFixed(1)} °C`;
    series.push(verticalLine('tg', label, p.glassTransition, lo, hi));
    legend.push({ label, colour: TG_COLOUR, style: 'dashed' });
  }
  const ea = p.activationEnergy;
  const eaText = ea ? `Ea = ${formatWithError(ea.kJPerMol, ea.stdErr)} kJ/mol` : 'no Arrhenius fit';
  return {
    id: 'arrhenius',
    title: `Arrhenius plot, Tref = ${toCelsius(a.referenceTemperatureK).toFixed(1)} °C: ${eaText}`,
    x: { kind: 'linear', label: '1000/T (1/K), T in kelvin' },
    y: { kind: 'linear', label: 'ln aT' },
    series,
    bands,
    legend,
    colourBar: colourBar(scale),
    describe: (s, pt) =>
      s.id === 'tg'
        ? s.label
        : `1000/T = ${pt.x.toFixed(3)} 1/K (T = ${toCelsius(1000 / pt.x).toFixed(1)} °C) · ln aT = ${formatWithError(pt.y, s.yError?.[0])}`,
  };
}
