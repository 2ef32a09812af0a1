/**
 * The vertical shift bT against temperature (reduced modulus = bT × measured), ±1 s.e. to first
 * order (bT·ln 10·s.e. of log10 bT). Large or erratic bT is itself a sign that superposition
 * fails; with bT from density the points lie on Tref·ρref/(T·ρ).
 */
import { appliedVertical } from '@core/pipeline';
import type { IsothermState } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import { formatWithError } from '../../format/numbers';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { colourBar, datasetScale, stateMarks, statesById } from './isotherm-style';

export function verticalShiftPlot(a: Analysis, states?: readonly IsothermState[]): PlotSpec {
  const scale = datasetScale(a.dataset);
  const byState = statesById(states);
  const series: PlotSeries[] = a.curves.flatMap((c): PlotSeries[] => {
    if (c.log10bT === null) return [];
    const bT = 10 ** c.log10bT;
    const marks = stateMarks(byState.get(c.isothermId));
    return [
      {
        id: `curve:${c.isothermId}`,
        label: `${toCelsius(c.temperatureK).toFixed(1)} °C${marks.suffix}`,
        colour: scale.colour(c.temperatureK),
        style: c.included ? 'disc' : 'ring',
        ...(marks.faint && { faint: true, note: marks.note }),
        isothermId: c.isothermId,
        points: [{ x: toCelsius(c.temperatureK), y: bT }],
        yError: [c.log10bTStdErr === null ? null : bT * Math.LN10 * c.log10bTStdErr],
      },
    ];
  });
  const how =
    appliedVertical(a) === 'none'
      ? 'none (bT = 1)'
      : appliedVertical(a) === 'density'
        ? 'from density, Tref·ρref/(T·ρ)'
        : 'estimated from the data';
  return {
    id: 'vertical-shift',
    title: `Vertical shift bT, Tref = ${toCelsius(a.referenceTemperatureK).toFixed(1)} °C: ${how}`,
    x: { kind: 'linear', label: 'temperature T (°C)' },
    y: { kind: 'linear', label: 'bT (reduced modulus = bT × measured)' },
    series,
    bands: [],
    legend: [{ label: 'bT of an isotherm (±1 s.e.)', colour: '#4a5358', style: 'disc' }],
    colourBar: colourBar(scale),
    describe: (s, p) => `T = ${p.x.toFixed(1)} °C · bT = ${formatWithError(p.y, s.yError?.[0])}`,
  };
}
