/**
 * Material indicators from the Prony series of the master curve (core/spectrum): crossover,
 * zero-shear viscosity and plateau modulus for melts; glassy and rubbery moduli and the tan δ
 * peak (position, and temperature at 1 Hz through the shift model) for solids. Each one is
 * computed only where the data support it; the note says when a value is a bound or extrapolated.
 * Crossovers are reported only where the binned data confirm them inside the measured window;
 * labels use G-symbols for shear and E-symbols for tension.
 */
import type { Dataset } from '../data/types';
import { quantitySymbol } from '../data/quantities';
import type { PronySeries } from '../spectrum/prony-model';
import { pronyLoss, pronyStorage } from '../spectrum/prony-model';
import type { ReducedWindow } from '../spectrum/types';
import { confirmedCrossovers, findCrossovers } from '../spectrum/crossover';
import { terminalZone } from '../spectrum/terminal-zone';
import { logSpace } from '../spectrum/log-grid';
import { modulusPlateaus, plateauModulus } from '../spectrum/plateaus';
import { tanDeltaPeak, tanDeltaPeakTemperature } from '../spectrum/tan-delta-peak';
import type { ShiftModelSpec } from '../models/types';
import { toCelsius } from './temperature';
import { fittedShiftModels, modelConstant } from './model-results';
import { binnedMaster } from './binned-master';
import type { MasterColumns } from './master-columns';
import { zeroShearIndicators } from './zero-shear';
import type {
  AnalysisIndicator,
  AnalysisMasterCurve,
  AnalysisModels,
  AnalysisWarning,
} from './types';

/**
 * The shift model the tan δ peak temperature is computed with: the first fitted physical law of
 * the registry (WLF if fitted, else Arrhenius); an empirical curve is not used for it.
 */
function shiftModelSpec(models: AnalysisModels): ShiftModelSpec | null {
  const m = fittedShiftModels(models).find((f) => f.descriptor.physical);
  if (!m) return null;
  return {
    kind: m.descriptor.kind,
    referenceK: m.result.referenceK,
    values: m.descriptor.parameters.map((_, i) => modelConstant(m, i).value),
    fittedRangeK: m.result.fittedRangeK,
  };
}

export function computeIndicators(
  dataset: Dataset,
  mc: AnalysisMasterCurve,
  series: PronySeries,
  window: ReducedWindow,
  models: AnalysisModels,
  warnings: AnalysisWarning[],
  /** The master curve's typed columns, when the caller has them (reduceMasterCurve). */
  columns?: MasterColumns,
): AnalysisIndicator[] {
  const out: AnalysisIndicator[] = [];
  const G = (q: 'storageModulus' | 'lossModulus' | 'complexModulus'): string =>
    quantitySymbol(q, dataset.deformation);
  const M = dataset.deformation === 'shear' ? 'G' : 'E';
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

  const binned = oscillatory ? binnedMaster(mc, columns) : null;
  if (oscillatory && binned) {
    attempt('Crossover', () => {
      const w = logSpace(window.min, window.max, 50);
      const { crossovers: all } = findCrossovers(
        w,
        w.map((x) => pronyStorage(series, x)),
        w.map((x) => pronyLoss(series, x)),
      );
      const [storage, loss] = binned.bins.quantities;
      const crossovers = confirmedCrossovers(all, {
        log10x: binned.bins.log10x.subarray(binned.first, binned.last + 1),
        storage: {
          log10y: storage.log10y.subarray(binned.first, binned.last + 1),
          count: storage.count.subarray(binned.first, binned.last + 1),
        },
        loss: {
          log10y: loss.log10y.subarray(binned.first, binned.last + 1),
          count: loss.count.subarray(binned.first, binned.last + 1),
        },
      });
      const c = crossovers.find((x) => x.direction === 'storage-rises') ?? crossovers[0];
      if (!c) return;
      const dropped = all.length - crossovers.length;
      out.push(
        {
          key: 'crossoverFrequency',
          label: `crossover frequency (${G('storageModulus')} = ${G('lossModulus')})`,
          value: c.omegaRadPerS,
          unit: 'rad/s',
          note: `at Tref, from the Prony series, confirmed by the data on both sides${crossovers.length > 1 ? `; ${crossovers.length} crossovers in the window` : ''}${dropped > 0 ? `; ${dropped} crossing(s) of the series not shown by the data (at the window edge) left out` : ''}`,
        },
        {
          key: 'crossoverModulus',
          label: `crossover modulus (${G('storageModulus')} = ${G('lossModulus')})`,
          value: c.modulusPa,
          unit: 'Pa',
        },
      );
    });
  }
  if (oscillatory && melt && binned) {
    attempt('Zero-shear viscosity', () => {
      const terminal = terminalZone(binned.bins, binned.first, binned.last, 'angularFrequency');
      for (const i of zeroShearIndicators(
        mc,
        series,
        terminal.reached,
        dataset.deformation,
        warnings,
        binned.viscosity,
      ))
        out.push(i);
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
          label: `glassy modulus ${M}0 (${M}e + Σ ${M.toLowerCase()}_i of the Prony series)`,
          value: p.glassyModulusPa,
          unit: 'Pa',
          note: p.glassyPlateauReached
            ? 'plateau reached in the data'
            : 'plateau not reached in the data: extrapolated by the series',
        },
        {
          key: 'rubberyModulus',
          label: `rubbery (equilibrium) modulus ${M}e`,
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
        label: `tan δ peak (${G('lossModulus')}/${G('storageModulus')}), reduced frequency at Tref`,
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
