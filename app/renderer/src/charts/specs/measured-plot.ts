/**
 * The measured isotherms as they came from the files, one colour per temperature. Masked points
 * and excluded isotherms stay visible (faint) so they can be brought back.
 */
import type { Dataset, QuantityId } from '../../../../../core/data/types';
import type { DocumentOptions } from '../../document/analysis-document';
import type { PlotSeries, PlotSpec, SeriesStyle } from '../plot-spec';
import { temperatureScale } from '../temperature-colours';
import { celsiusText, valueText, xAxisLabel, xText, yAxisLabel } from './plot-labels';
import { toCelsius } from '../../../../../core/pipeline/temperature';
import { quantitySymbol } from '../../../../../core/data/quantities';
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

export function measuredPlot(dataset: Dataset, options: DocumentOptions): PlotSpec {
  const qs = plotQuantities(dataset);
  const scale = temperatureScale(dataset.isotherms.map((i) => i.temperatureK));
  const masked = new Set((options.maskedPoints ?? []).map((p) => `${p.file}\u0000${p.row}`));
  const excluded = new Set(options.excludedIsothermIds ?? []);
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
    qs.forEach((q, k) => {
      const v = iso.quantities[q];
      if (!v) return;
      const used: PlotSeries['points'] = [];
      const off: PlotSeries['points'] = [];
      for (const i of thinner.keep(iso.x, v)) {
        const x = iso.x[i];
        const src = iso.source[i];
        const point = {
          x,
          y: v[i],
          ref: { isothermId: iso.id, index: i, file: src.file, row: src.row },
        };
        const isMasked = !iso.mask[i] || masked.has(`${src.file}\u0000${src.row}`);
        (isMasked ? off : used).push(point);
      }
      const base = { colour, style: QUANTITY_STYLE[k % 2], isothermId: iso.id };
      const label = `${celsiusText(iso.temperatureK)} ${quantitySymbol(q, dataset.deformation)}`;
      series.push({
        ...base,
        id: `${iso.id}:${q}`,
        label,
        points: used,
        faint: excluded.has(iso.id),
      });
      if (off.length)
        series.push({
          ...base,
          id: `${iso.id}:${q}:masked`,
          label: `${label} (masked)`,
          points: off,
          faint: true,
        });
    });
  }
  const quantityOf = (s: PlotSeries): QuantityId => s.id.split(':')[1] as QuantityId;
  return {
    id: 'measured',
    title: `Measured isotherms${thinner.note()}`,
    x: { kind: 'log', label: xAxisLabel(dataset.abscissa, false) },
    y: { kind: 'log', label: yAxisLabel(qs, dataset.deformation, false) },
    series,
    bands: [],
    legend: qs.map((q, k) => ({
      label: quantitySymbol(q, dataset.deformation),
      colour: '#4a5358',
      style: QUANTITY_STYLE[k % 2],
    })),
    colourBar: {
      minC: toCelsius(scale.minK),
      maxC: toCelsius(scale.maxK),
      gradient: scale.gradient,
    },
    describe: (s, p) =>
      [
        xText(dataset.abscissa, false, p.x),
        valueText(quantityOf(s), dataset.deformation, p.y),
        p.ref ? `${p.ref.file} row ${p.ref.row}` : '',
      ]
        .filter(Boolean)
        .join(' · '),
    maskable: true,
  };
}
