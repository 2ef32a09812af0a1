/**
 * The invented demo analysis a new user sees first: the melt sample from samples/melt-long
 * (written by the seeded generator, scripts/generate-samples.ts; the firm and the material are
 * invented), imported like any file, with the reference temperature and density of its scenario.
 */
import demoCsv from '../../../../samples/melt-long/hx310-melt-sweeps.csv?raw';
import { celsiusToKelvin } from '@core/data';
import type { UseEngineReturn } from '../engine/useEngine';
import { newDocument, type AnalysisDocument } from './analysis-document';

export const DEMO_FILE_NAME = 'hx310-melt-sweeps.csv';

export async function loadDemoDocument(engine: UseEngineReturn): Promise<AnalysisDocument> {
  const r = await engine.run({
    kind: 'import',
    files: [{ name: DEMO_FILE_NAME, text: demoCsv }],
    options: {},
  });
  if (r.kind !== 'imported')
    throw new Error(`The demo data could not be read: ${r.kind === 'failed' ? r.message : r.kind}`);
  return newDocument(r.result.dataset, 'invented demo · samples/melt-long', {
    invented: true,
    importWarnings: r.result.warnings,
    options: {
      referenceTemperatureK: celsiusToKelvin(190),
      verticalShift: 'density',
      // Density of the invented melt as the generator made it (samples/melt-long/truth.json).
      density: { referenceDensityKgPerM3: 760, volumetricExpansionPerK: 7e-4 },
    },
  });
}
