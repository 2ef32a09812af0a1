/**
 * The Arrhenius plot: ln aT against 1000/T (T in kelvin), where the Arrhenius law
 * ln aT = (Ea/R)(1/T − 1/Tr) is a straight line of slope Ea/(1000·R), so Ea can be read off;
 * a WLF material curves. Points carry ±1 s.e. (ln aT = ln 10 · log10 aT); each fitted model is
 * drawn with its 95 % band in the same coordinates.
 */
import { isothermStates, type IsothermUse } from './isotherm-states';
import type { Analysis, ShiftModelKind } from './types';
import { fittedShiftModels } from './model-results';

export interface ArrheniusPoint {
  isothermId: string;
  temperatureK: number;
  use: IsothermUse;
  /** 1000/T, 1/K. */
  inverseTemperature: number;
  lnAT: number;
  lnATStdErr: number | null;
}

export interface ArrheniusPlot {
  points: ArrheniusPoint[];
  models: {
    kind: ShiftModelKind;
    inverseTemperature: number[];
    lnAT: number[];
    lower95: number[];
    upper95: number[];
  }[];
  /** Activation energy of the Arrhenius fit, kJ/mol, with s.e. and 95 % interval. */
  activationEnergy: {
    kJPerMol: number;
    stdErr: number | null;
    ci95: [number, number] | null;
    referenceK: number;
  } | null;
  /** 1000/Tg when Tg is known. */
  glassTransition: number | null;
}

export function arrheniusPlot(a: Analysis): ArrheniusPlot {
  const points = isothermStates(a).flatMap((s): ArrheniusPoint[] => {
    const c = a.curves.find((x) => x.isothermId === s.isothermId);
    if (!c || c.log10aT === null) return [];
    return [
      {
        isothermId: s.isothermId,
        temperatureK: s.temperatureK,
        use: s.use,
        inverseTemperature: 1000 / s.temperatureK,
        lnAT: Math.LN10 * c.log10aT,
        lnATStdErr: c.log10aTStdErr === null ? null : Math.LN10 * c.log10aTStdErr,
      },
    ];
  });
  const models = fittedShiftModels(a.models).map(({ descriptor, result }) => {
    const b = result.band;
    return {
      kind: descriptor.kind,
      inverseTemperature: b.temperatureK.map((t) => 1000 / t),
      lnAT: b.log10aT.map((v) => Math.LN10 * v),
      lower95: b.lower95.map((v) => Math.LN10 * v),
      upper95: b.upper95.map((v) => Math.LN10 * v),
    };
  });
  const ar = a.models.arrhenius;
  return {
    points,
    models,
    activationEnergy: ar
      ? {
          kJPerMol: ar.activationEnergyKJPerMol,
          stdErr: ar.activationEnergyKJPerMolStdErr,
          ci95: ar.activationEnergyKJPerMolCi95,
          referenceK: ar.referenceK,
        }
      : null,
    glassTransition: a.settings.glassTransitionK ? 1000 / a.settings.glassTransitionK : null,
  };
}
