/**
 * A complete Analysis assembled from synthetic truth (no fitting), so the report and the export
 * builders can be tested on their own: the shifts are the true ones, the "WLF model" is the true
 * law with a made-up ±0.05-decade band, the Prony series is the true spectrum. Not a result of
 * the engines: it only feeds the renderers.
 */
import { smoothProny, syntheticIsotherms } from '../../../core/synthetic';
import { wlfLog10aT } from '../../../core/models/shift-laws';
import { resolveAnalysisOptions } from '../../../core/pipeline/options';
import { reduceToMasterCurve } from '../../../core/pipeline/reduce';
import { THERMOSHIFT_VERSION } from '../../../core/pipeline/version';
import { sampleOf } from '../../../core/pipeline/build-master-curve';
import type { Analysis, AnalysisCurve } from '../../../core/pipeline/types';
import { pronyInstantaneous } from '../../../core/spectrum/prony-model';

export const FIXTURE_TRUTH = { c1: 8.86, c2K: 101.6, referenceK: 373.15 };

export function fixtureAnalysis(
  kind: 'oscillatory' | 'relaxation' = 'oscillatory',
  deformation: 'shear' | 'tension' = 'shear',
): Analysis {
  const prony = smoothProny({
    tauMinS: 1e-6,
    tauMaxS: 1e4,
    modesPerDecade: 1,
    glassyModulusPa: 1e9,
    equilibriumModulusPa: 1e6,
  });
  const temperaturesK = [343.15, 353.15, 363.15, 373.15, 383.15, 393.15, 403.15];
  const { dataset, truth } = syntheticIsotherms({
    testKind: kind,
    deformation,
    referenceK: FIXTURE_TRUTH.referenceK,
    temperaturesK,
    components: [{ prony, law: { kind: 'wlf', c1: FIXTURE_TRUTH.c1, c2K: FIXTURE_TRUTH.c2K } }],
    xMin: kind === 'oscillatory' ? 0.1 : 1,
    xMax: kind === 'oscillatory' ? 100 : 1e4,
    pointsPerDecade: 5,
    relativeNoise: 0.02,
    seed: 7,
    name: 'Invented Polymer XR-7',
  });
  const curves: AnalysisCurve[] = dataset.isotherms.map((iso, k) => ({
    isothermId: iso.id,
    temperatureK: iso.temperatureK,
    log10aT: truth.log10aT[k],
    log10aTStdErr: k === 3 ? 0 : 0.01,
    log10bT: 0,
    log10bTStdErr: 0,
    included: k !== 6,
    qualityRmsDecades: 0.008,
    ...(k === 6 && { note: 'excluded by the user' }),
  }));
  const settings = {
    ...resolveAnalysisOptions({ excludedIsothermIds: ['T07'] }, temperaturesK),
  };
  const grid = Array.from({ length: 21 }, (_, i) => 343.15 + 3 * i);
  const mid = grid.map((T) =>
    wlfLog10aT(T, FIXTURE_TRUTH.c1, FIXTURE_TRUTH.c2K, FIXTURE_TRUTH.referenceK),
  );
  return {
    version: THERMOSHIFT_VERSION,
    sample: {
      ...sampleOf(dataset),
      metadata: { ...dataset.metadata, supplier: 'Invented Resins <Ltd> & Co' },
    },
    settings,
    referenceTemperatureK: settings.referenceTemperatureK,
    dataset,
    shiftQuantities:
      kind === 'oscillatory' ? ['storageModulus', 'lossModulus'] : ['relaxationModulus'],
    curves,
    overallQualityRmsDecades: 0.009,
    masterCurve: reduceToMasterCurve(dataset, curves),
    models: {
      wlf: {
        c1: FIXTURE_TRUTH.c1,
        c1StdErr: 0.3,
        c1Ci95: [8.1, 9.6],
        c2K: FIXTURE_TRUTH.c2K,
        c2KStdErr: 4,
        c2KCi95: [92, 111],
        referenceK: FIXTURE_TRUTH.referenceK,
        apparentActivationEnergyKJPerMol: 210,
        freeVolume: null,
        r2: 0.999,
        rmsResidualDecades: 0.01,
        residuals: [],
        fittedRangeK: [343.15, 403.15],
        converged: true,
        convergence: 'fixture: not a fit',
        reducedChiSquare: 1,
        weighting: {
          kind: 'full-covariance',
          note: 'generalised least squares with the full covariance of the shifts',
          leftOut: [],
        },
        band: {
          temperatureK: grid,
          log10aT: mid,
          lower95: mid.map((v) => v - 0.05),
          upper95: mid.map((v) => v + 0.05),
        },
        // no covariance: the made-up band above is not the delta-method band of a real fit
        spec: {
          kind: 'wlf',
          referenceK: FIXTURE_TRUTH.referenceK,
          values: [FIXTURE_TRUTH.c1, FIXTURE_TRUTH.c2K],
          fittedRangeK: [343.15, 403.15],
        },
      },
      hint: { model: 'wlf', reason: 'fixture' },
    },
    prony: {
      fittedTo: kind === 'oscillatory' ? ['storageModulus', 'lossModulus'] : ['relaxationModulus'],
      deformation,
      equilibriumModulusPa: prony.equilibriumModulusPa,
      equilibrium: { mode: 'fitted', reason: 'fixture: the true spectrum' },
      terminalSlopes: { storage: 0.1, loss: 0.3, relaxation: null },
      pointCount: 100,
      binCount: 80,
      instantaneousModulusPa: pronyInstantaneous(prony),
      tauS: prony.tauS,
      modulusPa: prony.modulusPa,
      modesPerDecade: 1,
      rmsRelativeError: 0.012,
      reducedWindow: [1e-3, 1e5],
    },
    indicators: [{ key: 'glassyModulus', label: 'glassy modulus', value: 1e9, unit: 'Pa' }],
    warnings: [
      { code: 'import', message: 'Blank cell skipped', file: 'a.csv', row: 12, column: 3 },
      { code: 'fair-superposition', message: 'Superposition is only fair <check>' },
    ],
  };
}
