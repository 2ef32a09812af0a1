/**
 * The measured isotherms as they came from the files, one colour per temperature. Masked points
 * and excluded or left-out isotherms stay visible (faint, with the reason on hover) so they can
 * be brought back.
 */
import type { Dataset, QuantityId } from '@core/data';
import type { IsothermState } from '@core/pipeline';
import type { DocumentOptions } from '../../document/analysis-document';
import { abscissaFactor, SI_DISPLAY, type DisplayUnits } from '../../format/display-units';
import type { PlotSeries, PlotSpec, SeriesStyle } from '../plot-spec';
import { celsiusText, inDisplay, valueText, xAxisLabel, xText, yAxisLabel } from './plot-labels';
import { quantitySymbol } from '@core/data';
import { colourBar, datasetScale, stateMarks, statesById } from './isotherm-style';
import { plotThinner } from './thin-series';

/** The two quantities drawn for a kind of test (first solid discs, second rings). */
export function plotQuantities(dataset: Dataset): QuantityId[] {
  const have = new Set(dataset.isotherms.flatMap((i) => Object.keys(i.quantities) as QuantityId[]));
  const wanted: QuantityId[] =
    dataset.testKind === 'oscillatory'
      ? ['storageModulus', 'lossModulus']
      : dataset.testKind === 'creep'
        ? ['creepCompliance']
        : ['relaxationModulus'];
  const found = wanted.filter((q) => have.has(q));
  return found.length ? found : [...have].slice(0, 2);
}

export const QUANTITY_STYLE: SeriesStyle[] = ['disc', 'ring'];

export function measuredPlot(
  dataset: Dataset,
  options: DocumentOptions,
  units: DisplayUnits = SI_DISPLAY,
  /** The analysis's isotherm states (engine-dropped ones are drawn faint too). */
  states?: readonly IsothermState[],
): PlotSpec {
  const qs = plotQuantities(dataset);
  const scale = datasetScale(dataset);
  const masked = new Set((options.maskedPoints ?? []).map((p) => `${p.file}\u0000${p.row}`));
  const excluded = new Set(options.excludedIsothermIds ?? []);
  const byId = statesById(states);
  const fx = abscissaFactor(dataset.abscissa, units);
  const series: PlotSeries[] = [];
  const thinner = plotThinner(
    dataset.isotherms.flatMap((iso) =>
      qs.flatMap((q) => (iso.quantities[q] ? [{ x: iso.x, y: iso.quantities[q] }] : [])),
    ),
    'log',
    'log',
  );
  for (const iso of dataset.isotherms) {
    const colour = scale.colour(iso.temperatureK);
    const marks = stateMarks(
      byId.get(iso.id) ??
        (excluded.has(iso.id)
          ? { use: 'excluded', description: 'Excluded by you: not in the fit.' }
          : undefined),
    );
    qs.forEach((q, k) => {
      const v = iso.quantities[q];
      if (!v) return;
      const used: PlotSeries['points'] = [];
      const off: PlotSeries['points'] = [];
      for (const i of thinner.keep(iso.x, v)) {
        const x = iso.x[i];
        const src = iso.source[i];
        const point = {
          x: x * fx,
          y: inDisplay(q, v[i], units),
          ref: { isothermId: iso.id, index: i, file: src.file, row: src.row },
        };
        const isMasked = !iso.mask[i] || masked.has(`${src.file}\u0000${src.row}`);
        (isMasked ? off : used).push(point);
      }
      const base = { colour, style: QUANTITY_STYLE[k % 2], isothermId: iso.id };
      const label = `${celsiusText(iso.temperatureK)} ${quantitySymbol(q, dataset.deformation)}${marks.suffix}`;
      series.push({
        ...base,
        id: `${iso.id}:${q}`,
        label,
        points: used,
        ...(marks.faint && { faint: true, note: marks.note }),
      });
      if (off.length)
        series.push({
          ...base,
          id: `${iso.id}:${q}:masked`,
          label: `${label} (masked)`,
          points: off,
          faint: true,
          note: 'Masked points: left out of the fit.',
        });
    });
  }
  const quantityOf = (s: PlotSeries): QuantityId => s.id.split(':')[1] as QuantityId;
  return {
    id: 'measured',
    title: `Measured isotherms${thinner.note()}`,
    x: { kind: 'log', label: xAxisLabel(dataset.abscissa, false, units) },
    y: { kind: 'log', label: yAxisLabel(qs, dataset.deformation, false, units) },
    series,
    bands: [],
    legend: qs.map((q, k) => ({
      label: quantitySymbol(q, dataset.deformation),
      colour: '#4a5358',
      style: QUANTITY_STYLE[k % 2],
    })),
    colourBar: colourBar(scale),
    describe: (s, p) =>
      [
        xText(dataset.abscissa, false, p.x, units),
        valueText(quantityOf(s), dataset.deformation, p.y, units),
        p.ref ? `${p.ref.file} row ${p.ref.row}` : '',
      ]
        .filter(Boolean)
        .join(' · '),
    maskable: true,
  };
}
