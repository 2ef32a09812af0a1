/**
 * Every view of the app in one list, grouped in a few tabs: what each shows, when it is
 * available, and how its plot is built (the plot specs draw; the maths is core's). The tab bar,
 * the keyboard shortcuts, the help and the browser tests all read this list.
 */
import type { IsothermState } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { fittedShiftModels } from '@core/pipeline';
import type { PlotSpec } from '../charts/plot-spec';
import { arrheniusSpec } from '../charts/specs/arrhenius-plot';
import { coleColePlot, lossTangentPlot, overlapResidualsPlot } from '../charts/specs/check-plots';
import { hasMasterView, masterPlot } from '../charts/specs/master-plot';
import { measuredPlot } from '../charts/specs/measured-plot';
import { modelResidualsPlot } from '../charts/specs/model-residuals-plot';
import { shiftPlot } from '../charts/specs/shift-plot';
import { spectrumPlot } from '../charts/specs/spectrum-plot';
import { verticalShiftPlot } from '../charts/specs/vertical-shift-plot';
import { vgpPlot } from '../charts/specs/vgp-plot';
import type { AnalysisDocument } from '../document/analysis-document';
import type { DisplayUnits } from '../format/display-units';

export interface ViewContext {
  doc: AnalysisDocument;
  analysis: Analysis | null;
  units: DisplayUnits;
  states: readonly IsothermState[] | undefined;
}

export interface SubView {
  id: string;
  label: string;
  /** 'plot' views have a plot spec; the others are the tables and the prediction form. */
  kind: 'plot' | 'tables' | 'predict';
  plot?: (c: ViewContext) => PlotSpec | null;
  /** Available for this analysis (default: when there is an analysis). */
  available?: (c: ViewContext) => boolean;
}

export interface ViewGroup {
  id: string;
  label: string;
  views: SubView[];
}

const withAnalysis =
  (f: (a: Analysis, c: ViewContext) => PlotSpec | null) =>
  (c: ViewContext): PlotSpec | null =>
    c.analysis ? f(c.analysis, c) : null;

const has = (f: (a: Analysis, c: ViewContext) => boolean) => (c: ViewContext) =>
  !!c.analysis && f(c.analysis, c);

export const VIEW_GROUPS: readonly ViewGroup[] = [
  {
    id: 'measured',
    label: 'Isotherms',
    views: [
      {
        id: 'measured',
        label: 'As measured',
        kind: 'plot',
        plot: (c) => measuredPlot(c.doc.dataset, c.doc.options, c.units, c.states),
        available: () => true,
      },
    ],
  },
  {
    id: 'master',
    label: 'Master curve',
    views: [
      {
        id: 'master',
        label: 'Moduli',
        kind: 'plot',
        plot: withAnalysis((a, c) => masterPlot(a, c.units, 'moduli', c.states)),
      },
      {
        id: 'master-tan-delta',
        label: 'tan δ',
        kind: 'plot',
        plot: withAnalysis((a, c) => masterPlot(a, c.units, 'tanDelta', c.states)),
        available: has((a) => hasMasterView(a, 'tanDelta')),
      },
      {
        id: 'master-viscosity',
        label: '|η*|',
        kind: 'plot',
        plot: withAnalysis((a, c) => masterPlot(a, c.units, 'viscosity', c.states)),
        available: has((a) => hasMasterView(a, 'viscosity')),
      },
      {
        id: 'master-relaxation',
        label: 'G(t) from Prony',
        kind: 'plot',
        plot: withAnalysis((a, c) => masterPlot(a, c.units, 'relaxation', c.states)),
        available: has((a) => hasMasterView(a, 'relaxation')),
      },
    ],
  },
  {
    id: 'shift',
    label: 'Shift factors',
    views: [
      {
        id: 'shift-factors',
        label: 'log aT against T',
        kind: 'plot',
        plot: withAnalysis((a, c) => shiftPlot(a, c.states)),
      },
      {
        id: 'arrhenius',
        label: 'Arrhenius (ln aT, 1/T)',
        kind: 'plot',
        plot: withAnalysis((a, c) => arrheniusSpec(a, c.states)),
      },
      {
        id: 'vertical-shift',
        label: 'bT against T',
        kind: 'plot',
        plot: withAnalysis((a, c) => verticalShiftPlot(a, c.states)),
      },
      {
        id: 'model-residuals',
        label: 'Model residuals',
        kind: 'plot',
        plot: withAnalysis((a) => modelResidualsPlot(a)),
        available: has((a) => fittedShiftModels(a.models).length > 0),
      },
    ],
  },
  {
    id: 'checks',
    label: 'Superposition checks',
    views: [
      {
        id: 'van-gurp-palmen',
        label: 'van Gurp–Palmen',
        kind: 'plot',
        plot: withAnalysis((a, c) => vgpPlot(a, c.units, c.states)),
        available: has((a) => a.sample.testKind === 'oscillatory'),
      },
      {
        id: 'cole-cole',
        label: 'Cole–Cole',
        kind: 'plot',
        plot: withAnalysis((a, c) => coleColePlot(a, c.units, c.states)),
        available: has((a) => a.sample.testKind === 'oscillatory'),
      },
      {
        id: 'loss-tangent',
        label: 'tan δ against |G*|',
        kind: 'plot',
        plot: withAnalysis((a, c) => lossTangentPlot(a, c.units, c.states)),
        available: has((a) => a.sample.testKind === 'oscillatory'),
      },
      {
        id: 'overlap-residuals',
        label: 'Residuals by isotherm',
        kind: 'plot',
        plot: withAnalysis((a, c) => overlapResidualsPlot(a, c.units, c.states)),
      },
    ],
  },
  {
    id: 'models',
    label: 'Spectrum & models',
    views: [
      {
        id: 'spectrum',
        label: 'Spectrum H(τ)',
        kind: 'plot',
        plot: withAnalysis((a, c) => spectrumPlot(a, c.units)),
        available: has((a) => !!a.prony),
      },
      { id: 'tables', label: 'Tables', kind: 'tables' },
    ],
  },
  {
    id: 'predict',
    label: 'Predict',
    views: [
      {
        id: 'predict',
        label: 'Design question',
        kind: 'predict',
        available: has((a) => !!a.prony),
      },
    ],
  },
];

export function isAvailable(v: SubView, c: ViewContext | null): boolean {
  if (!c) return false;
  return v.available ? v.available(c) : !!c.analysis;
}

/** The views of a tab that this analysis can show. */
export function availableViews(g: ViewGroup, c: ViewContext | null): SubView[] {
  return g.views.filter((v) => isAvailable(v, c));
}
