/**
 * Material indicators from the Prony series of the master curve (core/spectrum): crossover,
 * zero-shear viscosity and plateau modulus for melts; glassy and rubbery moduli and the tan δ
 * peak (position, and temperature at 1 Hz through the shift model) for solids. Each one is
 * computed only where the data support it; the note says when a value is a bound or extrapolated.
 */
import type { Dataset } from '../data/types';
import { quantitySymbol } from '../data/quantities';
import type { PronySeries } from '../spectrum/prony-model';
import { pronyLoss, pronyStorage } from '../spectrum/prony-model';
import type { ReducedWindow } from '../spectrum/types';
import { findCrossovers } from '../spectrum/crossover';
import { logSpace } from '../spectrum/log-grid';
import { modulusPlateaus, plateauModulus } from '../spectrum/plateaus';
import { tanDeltaPeak, tanDeltaPeakTemperature } from '../spectrum/tan-delta-peak';
import { fitViscosityCurve } from '../spectrum/viscosity-fit';
import type { ShiftModelSpec } from '../models/types';
import { toCelsius } from './temperature';
import type {
  AnalysisIndicator,
  AnalysisMasterCurve,
  AnalysisModels,
  AnalysisWarning,
} from './types';

/** The shift model the tan δ peak temperature is computed with: WLF if fitted, else Arrhenius. */
function shiftModelSpec(models: AnalysisModels): ShiftModelSpec | null {
  if (models.wlf)
    return {
      kind: 'wlf',
      referenceK: models.wlf.referenceK,
      values: [models.wlf.c1, models.wlf.c2K],
      fittedRangeK: models.wlf.fittedRangeK,
    };
  if (models.arrhenius)
    return {
      kind: 'arrhenius',
      referenceK: models.arrhenius.referenceK,
      values: [models.arrhenius.activationEnergyKJPerMol],
      fittedRangeK: models.arrhenius.fittedRangeK,
    };
  return null;
}

export function computeIndicators(
  dataset: Dataset,
  mc: AnalysisMasterCurve,
  series: PronySeries,
  window: ReducedWindow,
  models: AnalysisModels,
  warnings: AnalysisWarning[],
): AnalysisIndicator[] {
  const out: AnalysisIndicator[] = [];
  const G = (q: 'storageModulus' | 'lossModulus' | 'complexModulus'): string =>
    quantitySymbol(q, dataset.deformation);
  const attempt = (what: string, f: () => void): void => {
    try {
      f();
    } catch (e) {
      warnings.push({
        code: 'indicator',
        message: `${what} not computed: ${e instanceof Error ? e.message : String(e)}`,
      });
    }
  };
  const oscillatory = dataset.abscissa === 'angularFrequency';
  // Melt (liquid-like at long times): no equilibrium modulus to speak of, or G'' > G' at the
  // low-frequency end of the window (terminal zone). A solid's transition may have G'' > G' in
  // the middle of the window, so a crossover alone does not make a melt.
  const g0 = series.modulusPa.reduce((a, b) => a + b, 0) + series.equilibriumModulusPa;
  const lowW = window.abscissa === 'time' ? 1 / window.max : window.min;
  const melt =
    series.equilibriumModulusPa <= 1e-4 * g0 ||
    (oscillatory && pronyLoss(series, lowW) > pronyStorage(series, lowW));

  if (oscillatory) {
    attempt('Crossover', () => {
      const w = logSpace(window.min, window.max, 50);
      const { crossovers } = findCrossovers(
        w,
        w.map((x) => pronyStorage(series, x)),
        w.map((x) => pronyLoss(series, x)),
      );
      const c = crossovers.find((x) => x.direction === 'storage-rises') ?? crossovers[0];
      if (!c) return;
      out.push(
        {
          key: 'crossoverFrequency',
          label: `crossover frequency (${G('storageModulus')} = ${G('lossModulus')})`,
          value: c.omegaRadPerS,
          unit: 'rad/s',
          note: `at Tref, from the Prony series${crossovers.length > 1 ? `; ${crossovers.length} crossovers in the window` : ''}`,
        },
        { key: 'crossoverModulus', label: 'crossover modulus', value: c.modulusPa, unit: 'Pa' },
      );
    });
  }
  if (oscillatory && melt) {
    attempt('Zero-shear viscosity', () => {
      const visc = mc.quantities.complexViscosity;
      const s = mc.quantities.storageModulus;
      const l = mc.quantities.lossModulus;
      const w: number[] = [];
      const eta: number[] = [];
      mc.reducedX.forEach((x, i) => {
        if (mc.outlier[i]) return;
        const v =
          visc?.[i] ??
          (s?.[i] != null && l?.[i] != null
            ? Math.hypot(s[i] as number, l[i] as number) / x
            : null);
        if (v != null && v > 0 && Number.isFinite(v)) {
          w.push(x);
          eta.push(v);
        }
      });
      if (w.length < 5) return;
      const f = fitViscosityCurve(w, eta, 'cross');
      if (!f.converged) throw new Error(f.reason);
      out.push({
        key: 'zeroShearViscosity',
        label: 'zero-shear viscosity η0 (Cross fit of |η*|)',
        value: f.zeroShearViscosityPaS,
        unit: 'Pa·s',
        note: `${f.extrapolated ? 'extrapolated beyond the lowest reduced frequency; ' : ''}${f.note}`,
      });
    });
    attempt('Plateau modulus', () => {
      const p = plateauModulus(series, window);
      out.push({
        key: 'plateauModulus',
        label: `plateau modulus (${G('storageModulus')} at the tan δ minimum)`,
        value: p.modulusPa,
        unit: 'Pa',
        note: p.atEdge
          ? 'the tan δ minimum is at the edge of the window: a bound only'
          : 'common practice estimate',
      });
    });
  }
  if (!melt) {
    attempt('Glassy and rubbery moduli', () => {
      const p = modulusPlateaus(series, window);
      out.push(
        {
          key: 'glassyModulus',
          label: 'glassy modulus (G0 of the Prony series)',
          value: p.glassyModulusPa,
          unit: 'Pa',
          note: p.glassyPlateauReached
            ? 'plateau reached in the data'
            : 'plateau not reached in the data: extrapolated by the series',
        },
        {
          key: 'rubberyModulus',
          label: 'rubbery (equilibrium) modulus Ge',
          value: p.rubberyModulusPa,
          unit: 'Pa',
          note: p.rubberyPlateauReached
            ? 'plateau reached in the data'
            : 'plateau not reached in the data: extrapolated by the series',
        },
      );
    });
    attempt('tan δ peak', () => {
      const p = tanDeltaPeak(series, window);
      out.push({
        key: 'tanDeltaPeakFrequency',
        label: 'tan δ peak, reduced frequency at Tref',
        value: p.omegaRadPerS,
        unit: 'rad/s',
        note: `tan δ = ${p.tanDelta.toPrecision(3)}${p.atEdge ? '; at the edge of the window: the true peak lies outside it' : ''}`,
      });
      const spec = shiftModelSpec(models);
      if (!spec) return;
      const t = tanDeltaPeakTemperature(series, spec, window, { frequencyHz: 1 });
      out.push({
        key: 'tanDeltaPeakTemperature1Hz',
        label: `tan δ peak temperature at 1 Hz (${spec.kind.toUpperCase()})`,
        value: toCelsius(t.temperatureK),
        unit: '°C',
        note: [
          t.atEdge
            ? 'at the end of the fitted temperature range: the true peak lies outside it'
            : '',
          t.outsideReducedWindow ? 'outside the measured reduced window: extrapolated' : '',
          ...t.messages,
        ]
          .filter(Boolean)
          .join('; '),
      });
    });
  }
  return out;
}
