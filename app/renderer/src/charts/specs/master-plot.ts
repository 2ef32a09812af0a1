/**
 * Master curves at the reference temperature: the moduli (G′ and G″, or G(t), J(t)), tan δ,
 * |η*|, and the relaxation modulus G(t) interconverted through the Prony series. Every isotherm
 * is drawn at its shift in its temperature colour, the fitted Prony series through it; isotherms
 * that are not in the fit and the engine's outlier points are drawn faded. Curves can be dragged
 * sideways. The points and curves come from core (reducedIsotherms, pronyCurve).
 */
import { appliedVertical } from '@core/pipeline';
import { quantitySymbol } from '@core/data';
import type { QuantityId } from '@core/data';
import type { IsothermState } from '@core/pipeline';
import { pronyCurve } from '@core/pipeline';
import { hasQuantity, reducedIsotherms } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import { abscissaFactor, SI_DISPLAY, type DisplayUnits } from '../../format/display-units';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { colourBar, datasetScale, stateMarks, statesById } from './isotherm-style';
import { celsiusText, inDisplay, valueText, xAxisLabel, xText, yAxisLabel } from './plot-labels';
import { plotQuantities, QUANTITY_STYLE } from './measured-plot';
import { plotThinner } from './thin-series';

export const PRONY_COLOUR = '#1e2326';

/** The master-curve views: which quantities each one draws. */
export type MasterView = 'moduli' | 'tanDelta' | 'viscosity' | 'relaxation';

const VIEW_ID: Record<MasterView, string> = {
  moduli: 'master',
  tanDelta: 'master-tan-delta',
  viscosity: 'master-viscosity',
  relaxation: 'master-relaxation',
};

function viewQuantities(a: Analysis, view: MasterView): QuantityId[] {
  if (view === 'moduli') return plotQuantities(a.dataset);
  if (view === 'tanDelta') return ['tanDelta'];
  if (view === 'viscosity') return ['complexViscosity'];
  return ['relaxationModulus'];
}

/** True when the analysis has something to draw in this view. */
export function hasMasterView(a: Analysis, view: MasterView): boolean {
  if (view === 'moduli') return true;
  // relaxation data already show G(t) as their moduli view
  if (view === 'relaxation')
    return a.sample.testKind === 'oscillatory' && pronyCurve(a, 'relaxationModulus') !== null;
  return (
    a.sample.testKind === 'oscillatory' && viewQuantities(a, view).every((q) => hasQuantity(a, q))
  );
}

export function masterPlot(
  a: Analysis,
  units: DisplayUnits = SI_DISPLAY,
  view: MasterView = 'moduli',
  states?: readonly IsothermState[],
): PlotSpec {
  const mode = a.sample.deformation;
  const qs = viewQuantities(a, view);
  const scale = datasetScale(a.dataset);
  const byState = statesById(states);
  const interconverted = view === 'relaxation' && a.sample.abscissa === 'angularFrequency';
  const fx = interconverted ? 1 : abscissaFactor(a.sample.abscissa, units);
  const series: PlotSeries[] = [];
  // every isotherm's reduced columns first, so the thinner sees the whole plot before any point
  const columns = interconverted
    ? []
    : qs.flatMap((q, k) => reducedIsotherms(a, q).map((r) => ({ q, k, r, x: r.x, y: r.y })));
  const thinner = plotThinner(columns, 'log', 'log');
  for (const { q, k, r } of columns) {
    const marks = stateMarks(byState.get(r.isothermId));
    const base = {
      colour: scale.colour(r.temperatureK),
      style: QUANTITY_STYLE[k % 2],
      isothermId: r.isothermId,
    };
    const label = `${celsiusText(r.temperatureK)} ${quantitySymbol(q, mode)}`;
    const kept = thinner.keep(r.x, r.y);
    const pts = (outlier: boolean): PlotSeries['points'] =>
      kept.flatMap((i) =>
        r.outlier[i] === outlier ? [{ x: r.x[i] * fx, y: inDisplay(q, r.y[i], units) }] : [],
      );
    series.push({
      ...base,
      id: `${r.isothermId}:${q}`,
      label: label + marks.suffix,
      points: pts(false),
      ...(marks.faint && { faint: true, note: marks.note }),
    });
    const out = pts(true);
    if (out.length)
      series.push({
        ...base,
        id: `${r.isothermId}:${q}:outliers`,
        label: `${label} (outliers)`,
        points: out,
        faint: true,
        note: 'Flagged by the shift engine as outliers and left out of the fit.',
      });
  }
  const legend: PlotSpec['legend'] = interconverted
    ? []
    : qs.map((q, k) => ({
        label: `${quantitySymbol(q, mode)} (shifted)`,
        colour: '#4a5358',
        style: QUANTITY_STYLE[k % 2],
      }));
  for (const [k, q] of qs.entries()) {
    const c = pronyCurve(a, q);
    if (!c) continue;
    const cx = c.abscissa === 'angularFrequency' ? abscissaFactor(c.abscissa, units) : 1;
    series.push({
      id: `prony:${q}`,
      label: `Prony series ${quantitySymbol(q, mode)}`,
      colour: PRONY_COLOUR,
      style: k === 1 ? 'dashed' : 'line',
      points: c.x.flatMap((x, i) =>
        c.y[i] > 0 ? [{ x: x * cx, y: inDisplay(q, c.y[i], units) }] : [],
      ),
    });
  }
  if (a.prony && series.some((s) => s.id.startsWith('prony:')))
    legend.push({
      label: interconverted
        ? `${quantitySymbol('relaxationModulus', mode)} from the Prony series (${a.prony.tauS.length} modes)`
        : `Prony series (${a.prony.tauS.length} modes)`,
      colour: PRONY_COLOUR,
      style: 'line',
    });
  const abscissa = interconverted ? 'time' : a.sample.abscissa;
  const quantityOf = (s: PlotSeries): QuantityId => s.id.split(':')[1] as QuantityId;
  const what =
    view === 'moduli'
      ? 'Master curve'
      : view === 'tanDelta'
        ? 'Master curve of tan δ'
        : view === 'viscosity'
          ? 'Master curve of |η*|'
          : `Master curve of ${quantitySymbol('relaxationModulus', mode)}${interconverted ? ' (from the Prony series)' : ''}`;
  return {
    id: VIEW_ID[view],
    title: `${what} at Tref = ${toCelsius(a.referenceTemperatureK).toFixed(1)} °C${thinner.note()}`,
    x: { kind: 'log', label: xAxisLabel(abscissa, true, units) },
    y: {
      kind: 'log',
      label: yAxisLabel(qs, mode, appliedVertical(a) !== 'none', units),
    },
    series,
    bands: [],
    legend,
    colourBar: interconverted ? undefined : colourBar(scale),
    describe: (s, pt) =>
      `${xText(abscissa, true, pt.x, units)} · ${valueText(quantityOf(s), mode, pt.y, units)}`,
    draggable: !interconverted,
  };
}
