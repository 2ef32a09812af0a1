/**
 * The other superposition checks: the Cole–Cole plot (G″ against G′), tan δ against |G*|
 * (Mavridis & Shroff, Polym. Eng. Sci. 32, 1992) — neither needs a horizontal shift — and the
 * residual of every point against the isotherms it overlaps on the master curve. Points come
 * from core (coleColeSeries, lossTangentSeries, overlapResiduals); this styles them, with
 * left-out isotherms faded.
 */
import { appliedVertical } from '@core/pipeline';
import { quantitySymbol } from '@core/data';
import type { QuantityId } from '@core/data';
import type { IsothermState } from '@core/pipeline';
import { overlapResiduals } from '@core/pipeline';
import { coleColeSeries, lossTangentSeries, type CheckSeries } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import { formatFixed } from '@core/report';
import { abscissaFactor, SI_DISPLAY, type DisplayUnits } from '../../format/display-units';
import { formatSig } from '../../format/numbers';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { colourBar, datasetScale, stateMarks, statesById } from './isotherm-style';
import { celsiusText, inDisplay, unitOf, xAxisLabel, xText } from './plot-labels';
import { plotQuantities, QUANTITY_STYLE } from './measured-plot';
import { extent } from '@core/data';

function checkSeries(
  a: Analysis,
  data: CheckSeries[],
  map: (x: number, y: number) => [number, number],
  states?: readonly IsothermState[],
): PlotSeries[] {
  const scale = datasetScale(a.dataset);
  const byState = statesById(states);
  return data.map((d) => {
    const marks = stateMarks(byState.get(d.isothermId));
    return {
      id: `${d.isothermId}:check`,
      label: celsiusText(d.temperatureK) + marks.suffix,
      colour: scale.colour(d.temperatureK),
      style: 'disc',
      ...(marks.faint && { faint: true, note: marks.note }),
      isothermId: d.isothermId,
      points: d.x.map((x, i) => {
        const [px, py] = map(x, d.y[i]);
        return { x: px, y: py };
      }),
    };
  });
}

const bTPrefix = (a: Analysis): string => (appliedVertical(a) === 'none' ? '' : 'bT·');

/** G″ against G′; null without measured G′ and G″. */
export function coleColePlot(
  a: Analysis,
  units: DisplayUnits = SI_DISPLAY,
  states?: readonly IsothermState[],
): PlotSpec | null {
  const data = coleColeSeries(a);
  if (!data.length) return null;
  const m = a.sample.deformation;
  const [gp, gpp] = [quantitySymbol('storageModulus', m), quantitySymbol('lossModulus', m)];
  const unit = unitOf('storageModulus', units);
  const pre = bTPrefix(a);
  const conv = (v: number): number => inDisplay('storageModulus', v, units);
  return {
    id: 'cole-cole',
    title: `Cole–Cole plot: ${gpp} against ${gp} (no shift needed)`,
    x: { kind: 'log', label: `${pre}${gp} (${unit})` },
    y: { kind: 'log', label: `${pre}${gpp} (${unit})` },
    series: checkSeries(a, data, (x, y) => [conv(x), conv(y)], states),
    bands: [],
    legend: [{ label: `${gpp} against ${gp}`, colour: '#4a5358', style: 'disc' }],
    colourBar: colourBar(datasetScale(a.dataset)),
    describe: (_s, p) =>
      `${gp} = ${formatSig(p.x, 4)} ${unit} · ${gpp} = ${formatSig(p.y, 4)} ${unit}`,
  };
}

/** tan δ against |G*|; null for data without a phase angle. */
export function lossTangentPlot(
  a: Analysis,
  units: DisplayUnits = SI_DISPLAY,
  states?: readonly IsothermState[],
): PlotSpec | null {
  const data = lossTangentSeries(a);
  if (!data.length) return null;
  const gs = quantitySymbol('complexModulus', a.sample.deformation);
  const unit = unitOf('complexModulus', units);
  const pre = bTPrefix(a);
  return {
    id: 'loss-tangent',
    title: `tan δ against ${gs} (no horizontal shift needed; reads bT)`,
    x: { kind: 'log', label: `${pre}${gs} (${unit})` },
    y: { kind: 'log', label: 'tan δ' },
    series: checkSeries(a, data, (x, y) => [inDisplay('complexModulus', x, units), y], states),
    bands: [],
    legend: [{ label: `tan δ against ${pre}${gs}`, colour: '#4a5358', style: 'disc' }],
    colourBar: colourBar(datasetScale(a.dataset)),
    describe: (_s, p) =>
      `${pre}${gs} = ${formatSig(p.x, 4)} ${unit} · tan δ = ${formatSig(p.y, 3)}`,
  };
}

/** Each point's residual against the isotherms it overlaps, decades, for the plotted quantities. */
export function overlapResidualsPlot(
  a: Analysis,
  units: DisplayUnits = SI_DISPLAY,
  states?: readonly IsothermState[],
): PlotSpec | null {
  const qs: QuantityId[] = plotQuantities(a.dataset);
  const scale = datasetScale(a.dataset);
  const byState = statesById(states);
  const fx = abscissaFactor(a.sample.abscissa, units);
  const m = a.sample.deformation;
  const series: PlotSeries[] = [];
  const xs: number[] = [];
  qs.forEach((q, k) => {
    for (const r of overlapResiduals(a, q)) {
      if (!r.x.length) continue;
      const marks = stateMarks(byState.get(r.isothermId));
      for (const x of r.x) xs.push(x * fx);
      series.push({
        id: `${r.isothermId}:${q}:residuals`,
        label: `${celsiusText(r.temperatureK)} ${quantitySymbol(q, m)}${marks.suffix}`,
        colour: scale.colour(r.temperatureK),
        style: QUANTITY_STYLE[k % 2],
        ...(marks.faint && { faint: true, note: marks.note }),
        isothermId: r.isothermId,
        points: r.x.map((x, i) => ({ x: x * fx, y: r.residualDecades[i] })),
      });
    }
  });
  if (!series.length) return null;
  const [x0, x1] = extent(xs);
  series.unshift({
    id: 'zero',
    label: 'zero',
    colour: '#9aa3a0',
    style: 'line',
    points: [
      { x: x0, y: 0 },
      { x: x1, y: 0 },
    ],
  });
  return {
    id: 'overlap-residuals',
    title: `Residuals against the overlapping isotherms, Tref = ${toCelsius(a.referenceTemperatureK).toFixed(1)} °C`,
    x: { kind: 'log', label: xAxisLabel(a.sample.abscissa, true, units) },
    y: { kind: 'linear', label: 'log10(point) − log10(overlapping isotherms) (decades)' },
    series,
    bands: [],
    legend: qs.map((q, k) => ({
      label: `${quantitySymbol(q, m)} residual`,
      colour: '#4a5358',
      style: QUANTITY_STYLE[k % 2],
    })),
    colourBar: colourBar(scale),
    describe: (_s, p) =>
      `${xText(a.sample.abscissa, true, p.x, units)} · residual ${formatFixed(p.y, 3)} decades`,
  };
}
