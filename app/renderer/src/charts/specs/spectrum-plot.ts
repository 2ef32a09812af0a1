/**
 * The relaxation spectrum H(τ) of the fitted Prony series (from core: H(τ_i) = g_i/Δ ln τ_i)
 * drawn as a line, with the Prony terms g_i at their relaxation times τ_i as discs; the
 * equilibrium modulus Ge is stated in the legend. Moduli in the display unit.
 */
import { relaxationSpectrum } from '@core/pipeline';
import type { Analysis } from '@core/pipeline';
import { toCelsius } from '@core/pipeline';
import { SI_DISPLAY, type DisplayUnits } from '../../format/display-units';
import { formatSig } from '../../format/numbers';
import type { PlotSpec } from '../plot-spec';
import { inDisplay, unitOf } from './plot-labels';
import { PRONY_COLOUR } from './master-plot';

export const TERM_COLOUR = '#9a5b12';

/** null when the analysis has no Prony series. */
export function spectrumPlot(a: Analysis, units: DisplayUnits = SI_DISPLAY): PlotSpec | null {
  if (!a.prony || a.prony.tauS.length === 0) return null;
  const h = relaxationSpectrum(a.prony);
  const unit = unitOf('relaxationModulus', units);
  const conv = (v: number): number => inDisplay('relaxationModulus', v, units);
  const m = a.sample.deformation === 'shear' ? 'G' : 'E';
  const pts = (ys: number[]) =>
    h.tauS.flatMap((t, i) => (ys[i] > 0 ? [{ x: t, y: conv(ys[i]) }] : []));
  return {
    id: 'spectrum',
    title: `Relaxation spectrum H(τ) at Tref = ${toCelsius(a.referenceTemperatureK).toFixed(1)} °C`,
    x: { kind: 'log', label: 'relaxation time τ (s)' },
    y: { kind: 'log', label: `H(τ), g_i (${unit})` },
    series: [
      {
        id: 'spectrum:H',
        label: 'H(τ)',
        colour: PRONY_COLOUR,
        style: 'line',
        points: pts(h.spectrumPa),
      },
      {
        id: 'spectrum:g',
        label: 'Prony term g_i',
        colour: TERM_COLOUR,
        style: 'disc',
        points: pts(h.modulusPa),
      },
    ],
    bands: [],
    legend: [
      { label: 'H(τ) = g_i / Δ ln τ', colour: PRONY_COLOUR, style: 'line' },
      {
        label: `Prony terms g_i (${a.prony.tauS.length}; ${m}e = ${formatSig(conv(h.equilibriumModulusPa), 4)} ${unit})`,
        colour: TERM_COLOUR,
        style: 'disc',
      },
    ],
    describe: (s, p) =>
      `τ = ${formatSig(p.x, 4)} s · ${s.id === 'spectrum:H' ? 'H(τ)' : 'g_i'} = ${formatSig(p.y, 4)} ${unit}`,
  };
}
