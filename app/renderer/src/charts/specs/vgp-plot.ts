/**
 * van Gurp–Palmen plot: phase angle δ against |G*| for every measured point, no horizontal shift
 * needed (van Gurp & Palmen, Rheology Bulletin 67, 1998). Isotherms on one line support
 * superposition; a fan of lines says it fails. With a vertical shift, |G*| is multiplied by bT.
 * The points come from core (vanGurpPalmenSeries); this only styles them.
 */
import { appliedVertical } from '@core/pipeline';
import { quantitySymbol } from '@core/data';
import type { IsothermState } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { vanGurpPalmenSeries } from '@core/pipeline';
import { SI_DISPLAY, type DisplayUnits } from '../../format/display-units';
import { formatSig } from '../../format/numbers';
import type { PlotSeries, PlotSpec } from '../plot-spec';
import { colourBar, datasetScale, stateMarks, statesById } from './isotherm-style';
import { celsiusText, inDisplay, unitOf } from './plot-labels';
import { plotThinner } from './thin-series';

/** null when the data are not oscillatory (no phase angle). */
export function vgpPlot(
  a: Analysis,
  units: DisplayUnits = SI_DISPLAY,
  states?: readonly IsothermState[],
): PlotSpec | null {
  if (a.sample.testKind !== 'oscillatory') return null;
  const scale = datasetScale(a.dataset);
  const byState = statesById(states);
  const all = vanGurpPalmenSeries(a);
  const thinner = plotThinner(
    all.map((v) => ({ x: v.complexModulusPa, y: v.phaseAngleDeg })),
    'log',
    'linear',
  );
  const series: PlotSeries[] = all.map((v) => {
    const marks = stateMarks(byState.get(v.isothermId));
    return {
      id: `${v.isothermId}:vgp`,
      label: celsiusText(v.temperatureK) + marks.suffix,
      colour: scale.colour(v.temperatureK),
      style: 'disc',
      ...(marks.faint && { faint: true, note: marks.note }),
      isothermId: v.isothermId,
      points: thinner.keep(v.complexModulusPa, v.phaseAngleDeg).map((i) => ({
        x: inDisplay('complexModulus', v.complexModulusPa[i], units),
        y: v.phaseAngleDeg[i],
      })),
    };
  });
  if (!series.length) return null;
  const sym = quantitySymbol('complexModulus', a.sample.deformation);
  const prefix = appliedVertical(a) === 'none' ? '' : 'bT·';
  const unit = unitOf('complexModulus', units);
  return {
    id: 'van-gurp-palmen',
    title: `van Gurp–Palmen plot (no shift needed)${thinner.note()}`,
    x: { kind: 'log', label: `${prefix}${sym} (${unit})` },
    y: { kind: 'linear', label: 'phase angle δ (°)' },
    series,
    bands: [],
    legend: [{ label: 'δ against ' + prefix + sym, colour: '#4a5358', style: 'disc' }],
    colourBar: colourBar(scale),
    describe: (_s, p) => `${prefix}${sym} = ${formatSig(p.x, 4)} ${unit} · δ = ${p.y.toFixed(1)}°`,
  };
}
