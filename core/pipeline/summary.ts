/**
 * The stable JSON summary of an analysis (`thermoshift build --json`, `summary.json`).
 * Keys are documented in docs/cli.md; add keys, never rename or remove them.
 * Temperatures in °C unless the key ends in K; log quantities in decades.
 */
import { appliedVertical } from './vertical-at';
import type {
  Analysis,
  AnalysisCurve,
  AnalysisProny,
  AnalysisWarning,
  ModelFitStats,
} from './types';
import { pronySymbols } from '../spectrum/prony-symbols';
import type { ResolvedAnalysisOptions } from './options';
import { CONVENTIONS } from './conventions';
import { fittedShiftModels, modelConstant } from './model-results';
import { roundKelvin, toCelsius } from './temperature';

export const SUMMARY_SCHEMA = 'thermoshift-summary/1';

/** An isotherm's shift in the summary: the analysis' curve plus its temperature in °C. */
export interface SummaryCurve extends AnalysisCurve {
  /** °C */
  temperature: number;
}

interface SummaryFit {
  r2: number | null;
  rmsResidualDecades: number | null;
  /** °C */
  fittedRange: [number, number];
  converged: boolean;
  /** Why the fit stopped (converged or not). */
  convergence: string;
  /** 'full-covariance' (generalised least squares) or 'diagonal' (each shift's own error). */
  weighting: 'full-covariance' | 'diagonal';
  weightingNote: string;
  /** Isotherms left out of the fit (shifts fixed by hand), with the reason. */
  leftOut: { isothermId: string; temperature: number; reason: string }[];
  reducedChiSquare: number | null;
}

export interface AnalysisSummary {
  schema: typeof SUMMARY_SCHEMA;
  version: string;
  sample: {
    name: string;
    testKind: string;
    deformation: string;
    abscissa: string;
    files: string[];
  };
  /** °C */
  referenceTemperature: number;
  referenceTemperatureK: number;
  conventions: typeof CONVENTIONS;
  shiftQuantities: string[];
  /** The vertical shift applied ('auto' resolved: `chosen`) and why (`reason`). */
  vertical: {
    requested: string;
    chosen: 'none' | 'density' | 'data';
    reason: string;
    /** αV used or fitted, 1/K; null without one. */
    expansionPerK: number | null;
    expansionStdErr: number | null;
    /** Largest |log10 bT| the data (or the density) imply over the measured temperatures, decades. */
    effectDecades: number | null;
  };
  curves: SummaryCurve[];
  overallQualityRmsDecades: number | null;
  /**
   * One entry per fitted model under its registry kind, each written from its descriptor: the
   * constants (`summaryKey`, `…StdErr`, `…Ci95`), `referenceTemperature`, derived fields, then the
   * fit figures. The built-in ones are typed here.
   */
  models: {
    wlf?: SummaryFit & {
      C1: number;
      C1StdErr: number | null;
      C1Ci95: [number, number] | null;
      /** K */
      C2: number;
      C2StdErr: number | null;
      C2Ci95: [number, number] | null;
      /** °C */
      referenceTemperature: number;
      atGlassTransition?: { C1: number; C2: number; referenceTemperature: number };
      apparentActivationEnergy?: number | null;
      freeVolume?: { fractionalFreeVolume: number; expansionPerK: number } | null;
    };
    arrhenius?: SummaryFit & {
      /** kJ/mol */
      activationEnergy: number;
      activationEnergyStdErr: number | null;
      activationEnergyCi95: [number, number] | null;
      referenceTemperature: number;
    };
    polynomial?: SummaryFit & {
      a1: number;
      a1StdErr: number | null;
      a2: number;
      a2StdErr: number | null;
      referenceTemperature: number;
    };
    hint?: { model: string; reason: string };
  };
  prony: {
    fittedTo: string[];
    /** 'shear' (terms are G-moduli) or 'tension' (E-moduli). */
    deformation: string;
    /** The symbols of this deformation: relaxation G(t)/E(t), equilibrium Ge/Ee, instantaneous G0/E0, term g_i/E_i. */
    symbols: { relaxation: string; equilibrium: string; instantaneous: string; term: string };
    /** Ge (shear) or Ee (tension), Pa. */
    equilibriumModulusPa: number;
    /** 'fitted' or 'zero', and why. */
    equilibrium: { mode: string; reason: string };
    terminalSlopes: { storage: number | null; loss: number | null; relaxation: number | null };
    pointCount: number;
    binCount: number;
    instantaneousModulusPa: number;
    modesPerDecade: number;
    rmsRelativeError: number | null;
    reducedWindow: [number, number];
    terms: { tauS: number; modulusPa: number; normalized: number }[];
  } | null;
  indicators: Record<string, { label: string; value: number; unit: string; note?: string }>;
  warnings: AnalysisWarning[];
  settings: ResolvedAnalysisOptions & { referenceTemperature: number };
}

function symbolsOf(mode: AnalysisProny['deformation']) {
  const y = pronySymbols(mode);
  return {
    relaxation: y.relaxation,
    equilibrium: y.equilibrium,
    instantaneous: y.instantaneous,
    term: y.term,
  };
}

/** JSON has no −0: write 0 for the reference isotherm's shift. */
const noNegativeZero = (v: number | null): number | null => (v === null ? null : v + 0);

function fitStats(m: ModelFitStats): SummaryFit {
  return {
    r2: m.r2,
    rmsResidualDecades: m.rmsResidualDecades,
    fittedRange: [toCelsius(m.fittedRangeK[0]), toCelsius(m.fittedRangeK[1])],
    converged: m.converged,
    convergence: m.convergence,
    weighting: m.weighting.kind,
    weightingNote: m.weighting.note,
    leftOut: m.weighting.leftOut.map((l) => ({
      isothermId: l.isothermId,
      temperature: toCelsius(l.temperatureK),
      reason: l.reason,
    })),
    reducedChiSquare: m.reducedChiSquare,
  };
}

/** The stable summary of an analysis; plain JSON (no NaN, no functions). */
export function analysisSummary(analysis: Analysis): AnalysisSummary {
  const { models: m, prony: p } = analysis;
  const models: AnalysisSummary['models'] = {};
  for (const f of fittedShiftModels(m)) {
    const { descriptor: d, result } = f;
    const fields: Record<string, unknown> = {};
    d.parameters.forEach((p, i) => {
      const c = modelConstant(f, i);
      fields[p.summaryKey] = c.value;
      fields[`${p.summaryKey}StdErr`] = c.stdErr;
      if (p.interval) fields[`${p.summaryKey}Ci95`] = c.ci95;
    });
    (models as Record<string, unknown>)[d.kind] = {
      ...fields,
      referenceTemperature: toCelsius(result.referenceK),
      ...d.derived?.summary(result),
      ...fitStats(result),
    };
  }
  if (m.hint) models.hint = { ...m.hint };
  return {
    schema: SUMMARY_SCHEMA,
    version: analysis.version,
    sample: {
      name: analysis.sample.name,
      testKind: analysis.sample.testKind,
      deformation: analysis.sample.deformation,
      abscissa: analysis.sample.abscissa,
      files: [...analysis.sample.files],
    },
    referenceTemperature: toCelsius(analysis.referenceTemperatureK),
    referenceTemperatureK: roundKelvin(analysis.referenceTemperatureK),
    conventions: CONVENTIONS,
    shiftQuantities: [...analysis.shiftQuantities],
    vertical: {
      requested: analysis.settings.verticalShift,
      chosen: appliedVertical(analysis),
      reason: analysis.vertical?.reason ?? `requested: ${analysis.settings.verticalShift}`,
      expansionPerK: analysis.vertical?.expansionPerK ?? null,
      expansionStdErr: analysis.vertical?.expansionStdErr ?? null,
      effectDecades: analysis.vertical?.effectDecades ?? null,
    },
    curves: analysis.curves.map((c) => ({
      isothermId: c.isothermId,
      temperature: toCelsius(c.temperatureK),
      temperatureK: roundKelvin(c.temperatureK),
      log10aT: noNegativeZero(c.log10aT),
      log10aTStdErr: c.log10aTStdErr,
      log10bT: noNegativeZero(c.log10bT),
      log10bTStdErr: c.log10bTStdErr,
      included: c.included,
      qualityRmsDecades: c.qualityRmsDecades,
      ...(c.note !== undefined && { note: c.note }),
      ...(c.leftOut !== undefined && { leftOut: { ...c.leftOut } }),
    })),
    overallQualityRmsDecades: analysis.overallQualityRmsDecades,
    models,
    prony: p
      ? {
          fittedTo: [...p.fittedTo],
          deformation: p.deformation,
          symbols: symbolsOf(p.deformation),
          equilibriumModulusPa: p.equilibriumModulusPa,
          equilibrium: { ...p.equilibrium },
          terminalSlopes: { ...p.terminalSlopes },
          pointCount: p.pointCount,
          binCount: p.binCount,
          instantaneousModulusPa: p.instantaneousModulusPa,
          modesPerDecade: p.modesPerDecade,
          rmsRelativeError: p.rmsRelativeError,
          reducedWindow: p.reducedWindow,
          terms: p.tauS.map((tauS, i) => ({
            tauS,
            modulusPa: p.modulusPa[i],
            normalized: p.modulusPa[i] / p.instantaneousModulusPa,
          })),
        }
      : null,
    indicators: Object.fromEntries(
      analysis.indicators.map((i) => [
        i.key,
        { label: i.label, value: i.value, unit: i.unit, ...(i.note && { note: i.note }) },
      ]),
    ),
    warnings: analysis.warnings.map((w) => ({ ...w })),
    settings: {
      ...analysis.settings,
      referenceTemperature: toCelsius(analysis.settings.referenceTemperatureK),
    },
  };
}
