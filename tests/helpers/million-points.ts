/**
 * An analysis with about 10⁶ measured points (7 isotherms × 3 decades of a dense sweep, 2 %
 * noise), assembled like tests/core/report/analysis-fixture.ts: true shifts, the master curve
 * reduced from them and the Prony series and indicators fitted by the pipeline's own spectrum
 * step. For the size tests of the report and the plot specs.
 */
import { reduceToMasterCurve } from '../../core/pipeline/reduce';
import { runSpectrum } from '../../core/pipeline/run-spectrum';
import { resolveAnalysisOptions } from '../../core/pipeline/options';
import type { Analysis, AnalysisCurve } from '../../core/pipeline/types';
import { fixtureAnalysis } from '../core/report/analysis-fixture';
import { meltProny, syntheticIsotherms } from '../../core/synthetic';

export function millionPointAnalysis(deformation: 'shear' | 'tension' = 'shear'): Analysis {
  const base = fixtureAnalysis('oscillatory', deformation);
  const temperaturesK = [423.15, 433.15, 443.15, 453.15, 463.15, 473.15, 483.15];
  const { dataset, truth } = syntheticIsotherms({
    testKind: 'oscillatory',
    deformation,
    referenceK: 453.15,
    temperaturesK,
    components: [
      {
        prony: meltProny({ plateauModulusPa: 2e5, peakTauS: 1e-3, widthDecades: 0.8 }),
        law: { kind: 'arrhenius', activationEnergyJPerMol: 45e3 },
      },
    ],
    xMin: 0.1,
    xMax: 100,
    pointsPerDecade: 47_619, // 7 × (3 × 47 619 + 1) ≈ 1.0 × 10⁶ points
    relativeNoise: 0.02,
    seed: 5,
    name: 'Invented dense melt',
  });
  const curves: AnalysisCurve[] = dataset.isotherms.map((iso, k) => ({
    isothermId: iso.id,
    temperatureK: iso.temperatureK,
    log10aT: truth.log10aT[k],
    log10aTStdErr: k === 3 ? 0 : 0.002,
    log10bT: 0,
    log10bTStdErr: 0,
    included: true,
    qualityRmsDecades: 0.009,
  }));
  const settings = resolveAnalysisOptions({ referenceTemperatureK: 453.15 }, temperaturesK);
  const masterCurve = reduceToMasterCurve(dataset, curves);
  const { prony, indicators } = runSpectrum(dataset, masterCurve, {}, settings, []);
  return {
    ...base,
    sample: { ...base.sample, name: dataset.name, deformation },
    settings,
    referenceTemperatureK: 453.15,
    dataset,
    curves,
    masterCurve,
    models: {},
    prony,
    indicators,
  };
}
