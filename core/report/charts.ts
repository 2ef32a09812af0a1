/**
 * The report's four charts, built from an Analysis: measured isotherms, master curve (with the
 * Prony series drawn through it), shift factors against temperature with each model's 95 % band,
 * and the van Gurp–Palmen plot (δ against |G*|, van Gurp & Palmen, Rheology Bulletin 67, 1998).
 */
import type { Analysis } from '../pipeline/types';
import type { QuantityId } from '../data/types';
import { abscissaLabel, quantitySymbol } from '../data/quantities';
import { extent } from '../data/extent';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../spectrum/prony-model';
import type { ChartSeries, ChartSpec, LegendEntry } from './svg/chart-types';
import { temperatureColour } from './svg/colour';
import { toCelsius } from '../pipeline/temperature';
import { appliedVertical } from '../pipeline/vertical-at';
import { vanGurpPalmenSeries } from '../pipeline/van-gurp-palmen';
import {
  outputUnitLabel,
  toOutputFrequency,
  toOutputUnit,
  type FrequencyUnit,
  type ModulusUnit,
} from '../units/output-units';
import { fittedShiftModels } from '../pipeline/model-results';

/** The abscissa of a chart in the output frequency unit (time stays in s). */
function xOut(a: Analysis, x: number, f: FrequencyUnit): number {
  return a.sample.abscissa === 'angularFrequency' ? toOutputFrequency(x, f) : x;
}

function measuredXLabel(a: Analysis, f: FrequencyUnit): string {
  return a.sample.abscissa === 'angularFrequency' && f === 'Hz'
    ? 'frequency f (Hz)'
    : abscissaLabel(a.sample.abscissa);
}

const W = 640;
const H = 380;

/** The quantities plotted for this kind of test, first one solid discs, second one rings. */
export function plottedQuantities(a: Analysis): QuantityId[] {
  const have = new Set(
    a.dataset.isotherms.flatMap((i) => Object.keys(i.quantities) as QuantityId[]),
  );
  const wanted: QuantityId[] =
    a.sample.testKind === 'oscillatory'
      ? ['storageModulus', 'lossModulus']
      : a.sample.testKind === 'creep'
        ? ['creepCompliance']
        : ['relaxationModulus'];
  const found = wanted.filter((q) => have.has(q));
  return found.length > 0 ? found : [...have].slice(0, 2);
}

function temperatureRange(a: Analysis): [number, number] {
  const ts = a.dataset.isotherms.map((i) => i.temperatureK);
  return ts.length ? extent(ts) : [0, 0];
}

const STYLE = [
  { marker: 'disc', line: 'solid' },
  { marker: 'ring', line: 'dashed' },
] as const;

function quantityLegend(a: Analysis, qs: QuantityId[], unit: ModulusUnit): LegendEntry[] {
  return qs.map((q, k) => ({
    name: `${quantitySymbol(q, a.sample.deformation)} (${outputUnitLabel(q, unit)})`,
    colour: '#444',
    ...STYLE[k % 2],
  }));
}

function yLabel(a: Analysis, qs: QuantityId[], unit: ModulusUnit, reduced: boolean): string {
  const sym = qs.map((q) => quantitySymbol(q, a.sample.deformation)).join(', ');
  const u = qs.length ? outputUnitLabel(qs[0], unit) : '';
  return `${reduced ? 'reduced ' : ''}${sym}${u ? ` (${u})` : ''}`;
}

export function isothermsChart(
  a: Analysis,
  unit: ModulusUnit,
  frequencyUnit: FrequencyUnit = 'rad/s',
): ChartSpec {
  const qs = plottedQuantities(a);
  const [lo, hi] = temperatureRange(a);
  const series: ChartSeries[] = [];
  for (const iso of a.dataset.isotherms) {
    const colour = temperatureColour(iso.temperatureK, lo, hi);
    qs.forEach((q, k) => {
      const v = iso.quantities[q];
      if (!v) return;
      const idx = iso.x.map((_, i) => i).filter((i) => iso.mask[i]);
      series.push({
        name: `${toCelsius(iso.temperatureK)} °C ${q}`,
        x: idx.map((i) => xOut(a, iso.x[i], frequencyUnit)),
        y: idx.map((i) => toOutputUnit(q, v[i], unit)),
        colour,
        ...STYLE[k % 2],
      });
    });
  }
  return {
    id: 'chart-isotherms',
    title: 'Measured isotherms',
    width: W,
    height: H,
    x: { kind: 'log', label: measuredXLabel(a, frequencyUnit) },
    y: { kind: 'log', label: yLabel(a, qs, unit, false) },
    series,
    legend: quantityLegend(a, qs, unit),
    colourBar: { minC: toCelsius(lo), maxC: toCelsius(hi) },
  };
}

export function masterCurveChart(
  a: Analysis,
  unit: ModulusUnit,
  frequencyUnit: FrequencyUnit = 'rad/s',
): ChartSpec {
  const qs = plottedQuantities(a);
  const [lo, hi] = temperatureRange(a);
  const mc = a.masterCurve;
  const series: ChartSeries[] = [];
  // indices of each isotherm's points in one pass (not one scan of the curve per isotherm)
  const byId = new Map<string, number[]>();
  mc.isothermId.forEach((id, i) => {
    if (mc.outlier[i]) return;
    const list = byId.get(id);
    if (list) list.push(i);
    else byId.set(id, [i]);
  });
  for (const [id, idx] of byId) {
    const colour = temperatureColour(mc.temperatureK[idx[0]], lo, hi);
    qs.forEach((q, k) => {
      const v = mc.quantities[q];
      if (!v) return;
      series.push({
        name: `${id} ${q}`,
        x: idx.map((i) => xOut(a, mc.reducedX[i], frequencyUnit)),
        y: idx.map((i) => {
          const value = v[i];
          return value === null ? Number.NaN : toOutputUnit(q, value, unit);
        }),
        colour,
        marker: STYLE[k % 2].marker,
        line: 'none',
      });
    });
  }
  const legend: LegendEntry[] = quantityLegend(a, qs, unit).map((e) => ({ ...e, line: 'none' }));
  const out = mc.reducedX.map((_, i) => i).filter((i) => mc.outlier[i]);
  if (out.length) {
    for (const q of qs) {
      const v = mc.quantities[q];
      if (v)
        series.push({
          name: `outliers ${q}`,
          x: out.map((i) => xOut(a, mc.reducedX[i], frequencyUnit)),
          y: out.map((i) => {
            const value = v[i];
            return value === null ? Number.NaN : toOutputUnit(q, value, unit);
          }),
          colour: '#9a9a9a',
          marker: 'square',
          line: 'none',
        });
    }
    legend.push({ name: 'outliers (left out)', colour: '#9a9a9a', marker: 'square', line: 'none' });
  }
  if (a.prony && mc.reducedX.length > 1) {
    const p = {
      equilibriumModulusPa: a.prony.equilibriumModulusPa,
      tauS: a.prony.tauS,
      modulusPa: a.prony.modulusPa,
    };
    const [xmin, xmax] = extent(mc.reducedX);
    const n = 120;
    const grid = Array.from({ length: n }, (_, i) => xmin * (xmax / xmin) ** (i / (n - 1)));
    const curves: [QuantityId, (x: number) => number][] =
      a.sample.abscissa === 'angularFrequency'
        ? [
            ['storageModulus', (w) => pronyStorage(p, w)],
            ['lossModulus', (w) => pronyLoss(p, w)],
          ]
        : [['relaxationModulus', (t) => pronyRelaxation(p, t)]];
    for (const [q, f] of curves.filter(([q]) => qs.includes(q)))
      series.push({
        name: `Prony ${q}`,
        x: grid.map((x) => xOut(a, x, frequencyUnit)),
        y: grid.map((x) => toOutputUnit(q, f(x), unit)),
        colour: '#111',
        line: 'solid',
        marker: 'none',
      });
    legend.push({ name: 'Prony series', colour: '#111', marker: 'none', line: 'solid' });
  }
  const xLabel =
    a.sample.abscissa === 'angularFrequency'
      ? frequencyUnit === 'Hz'
        ? 'reduced frequency aT·f (Hz)'
        : 'reduced frequency aT·ω (rad/s)'
      : 'reduced time t/aT (s)';
  return {
    id: 'chart-master',
    title: `Master curve at ${toCelsius(a.referenceTemperatureK)} °C`,
    width: W,
    height: H,
    x: { kind: 'log', label: xLabel },
    y: { kind: 'log', label: yLabel(a, qs, unit, true) },
    series,
    legend,
    colourBar: { minC: toCelsius(lo), maxC: toCelsius(hi) },
  };
}

export function shiftFactorChart(a: Analysis): ChartSpec {
  const [lo, hi] = temperatureRange(a);
  const series: ChartSeries[] = [];
  const bands: NonNullable<ChartSpec['bands']> = [];
  const legend: LegendEntry[] = [
    { name: 'fitted log10 aT ± s.e.', colour: '#444', marker: 'disc', line: 'none' },
  ];
  for (const { descriptor, result: m } of fittedShiftModels(a.models)) {
    const st = { ...descriptor.chart, name: descriptor.name };
    const xC = m.band.temperatureK.map(toCelsius);
    bands.push({
      name: `${st.name} 95 %`,
      x: xC,
      lower: m.band.lower95,
      upper: m.band.upper95,
      colour: st.colour,
    });
    series.push({
      name: st.name,
      x: xC,
      y: m.band.log10aT,
      colour: st.colour,
      line: st.line,
      marker: 'none',
    });
    legend.push({ name: `${st.name} ± 95 %`, colour: st.colour, marker: 'none', line: st.line });
  }
  for (const c of a.curves) {
    if (c.log10aT === null) continue;
    series.push({
      name: c.isothermId,
      x: [toCelsius(c.temperatureK)],
      y: [c.log10aT],
      yError: [c.log10aTStdErr],
      colour: c.included ? temperatureColour(c.temperatureK, lo, hi) : '#999',
      line: 'none',
      marker: c.included ? 'disc' : 'ring',
    });
  }
  return {
    id: 'chart-shift',
    title: 'Shift factors against temperature',
    width: W,
    height: H,
    x: { kind: 'linear', label: 'temperature (°C)' },
    y: {
      kind: 'linear',
      label: `log10 aT (decades; Tref = ${toCelsius(a.referenceTemperatureK)} °C)`,
    },
    series,
    bands,
    legend,
    colourBar: { minC: toCelsius(lo), maxC: toCelsius(hi) },
  };
}

/** δ (degrees) against |G*| (bT-reduced when a vertical shift applies); null for non-oscillatory data. */
export function vanGurpPalmenChart(a: Analysis, unit: ModulusUnit): ChartSpec | null {
  if (a.sample.testKind !== 'oscillatory') return null;
  const [lo, hi] = temperatureRange(a);
  const series: ChartSeries[] = vanGurpPalmenSeries(a).map((v) => ({
    name: v.isothermId,
    x: v.complexModulusPa.map((g) => toOutputUnit('complexModulus', g, unit)),
    y: v.phaseAngleDeg,
    colour: temperatureColour(v.temperatureK, lo, hi),
    line: 'none',
    marker: 'disc',
  }));
  if (series.length === 0) return null;
  const sym = quantitySymbol('complexModulus', a.sample.deformation);
  return {
    id: 'chart-vgp',
    title: 'van Gurp–Palmen plot',
    width: W,
    height: H,
    x: {
      kind: 'log',
      label: `${appliedVertical(a) === 'none' ? '' : 'bT·'}${sym} (${unit})`,
    },
    y: { kind: 'linear', label: 'phase angle δ (°)', domain: [0, 90] },
    series,
    colourBar: { minC: toCelsius(lo), maxC: toCelsius(hi) },
  };
}

/** log10 bT ± s.e. against temperature; null when no vertical shift was applied. */
export function verticalShiftChart(a: Analysis): ChartSpec | null {
  if (appliedVertical(a) === 'none') return null;
  const [lo, hi] = temperatureRange(a);
  const series: ChartSeries[] = a.curves
    .filter((c) => c.log10bT !== null)
    .map((c) => ({
      name: c.isothermId,
      x: [toCelsius(c.temperatureK)],
      y: [c.log10bT as number],
      yError: [c.log10bTStdErr],
      colour: c.included ? temperatureColour(c.temperatureK, lo, hi) : '#999',
      line: 'none',
      marker: c.included ? 'disc' : 'ring',
    }));
  if (series.length === 0) return null;
  const how =
    appliedVertical(a) === 'density' ? 'entropic, from density' : 'estimated from the data';
  return {
    id: 'chart-vertical',
    title: 'Vertical shift factors against temperature',
    width: W,
    height: 300,
    x: { kind: 'linear', label: 'temperature (°C)' },
    y: { kind: 'linear', label: `log10 bT (decades; ${how})` },
    series,
    legend: [{ name: 'log10 bT ± s.e.', colour: '#444', marker: 'disc', line: 'none' }],
    colourBar: { minC: toCelsius(lo), maxC: toCelsius(hi) },
  };
}
