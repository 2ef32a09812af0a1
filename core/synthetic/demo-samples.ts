/**
 * The invented demo samples as text files and as a Dataset: what `npm run samples` writes to
 * samples/, and what the app can rebuild without reading any file. Pure: no file system here.
 */
import { complexModulusOf, tanDeltaOf } from '../data/derived';
import { celsiusToKelvin } from '../data/temperature';
import type { Dataset, Isotherm, QuantityId } from '../data/types';
import { maxOf, minOf } from '../data/extent';
import type { DemoFile, DemoMeasurements, DemoScenario, DemoWritten } from './demo-types';
import type { DemoTruth } from './demo-truth';
import { demoTruth } from './demo-truth';
import { measureDemoScenario } from './demo-measure';
import { demoScenarios } from './demo-scenarios';
import { writeLongLayout } from './demo-layout-long';
import { writePerIsothermLayout } from './demo-layout-per-isotherm';
import { writeWideLayout } from './demo-layout-wide';
import { demoIndexReadme, demoScenarioReadme } from './demo-readme';
import { inventedNote } from './demo-header';

/** One scenario, measured and written. */
export interface DemoSample {
  scenario: DemoScenario;
  measurements: DemoMeasurements;
  written: DemoWritten;
  truth: DemoTruth;
}

const DATA_FILE: Record<DemoScenario['id'], string> = {
  'melt-long': 'hx310-melt-sweeps.csv',
  'seal-dma': 'seal',
  'adhesive-relaxation': 'tf9-relaxation.tsv',
  'ramp-dma': 'odm5-heating-ramp.txt',
};

function writeScenario(m: DemoMeasurements): DemoWritten {
  const s = m.scenario;
  const name = DATA_FILE[s.id] ?? s.id;
  switch (s.layout) {
    case 'per-isotherm':
      return writePerIsothermLayout(m, name);
    case 'wide':
      return writeWideLayout(m, name.includes('.') ? name : `${name}.tsv`);
    default:
      return writeLongLayout(m, name.includes('.') ? name : `${name}.txt`);
  }
}

/** Measures, writes and records the truth of one scenario. */
export function buildDemoSample(scenario: DemoScenario): DemoSample {
  const measurements = measureDemoScenario(scenario);
  const written = writeScenario(measurements);
  return { scenario, measurements, written, truth: demoTruth(measurements, written) };
}

/**
 * Every file of samples/, paths relative to samples/: per scenario its data files, README.md and
 * truth.json, plus samples/README.md. Deterministic: the same text on every call.
 */
export function demoSampleFiles(scenarios: DemoScenario[] = demoScenarios()): DemoFile[] {
  const files: DemoFile[] = [{ path: 'README.md', content: demoIndexReadme(scenarios) }];
  for (const s of scenarios) {
    const sample = buildDemoSample(s);
    for (const f of sample.written.files)
      files.push({ path: `${s.id}/${f.path}`, content: f.content });
    files.push({ path: `${s.id}/README.md`, content: demoScenarioReadme(s, sample.truth) });
    files.push({
      path: `${s.id}/truth.json`,
      content: `${JSON.stringify(sample.truth, null, 2)}\n`,
    });
  }
  return files;
}

/** Sorts one isotherm's points by ascending x, keeping quantities, mask and sources aligned. */
function sortedIsotherm(iso: Isotherm): Isotherm {
  const order = iso.x.map((_, i) => i).sort((a, b) => iso.x[a] - iso.x[b]);
  const quantities: Partial<Record<QuantityId, number[]>> = {};
  for (const [q, v] of Object.entries(iso.quantities) as [QuantityId, number[]][]) {
    quantities[q] = order.map((i) => v[i]);
  }
  return {
    ...iso,
    x: order.map((i) => iso.x[i]),
    quantities,
    mask: order.map((i) => iso.mask[i]),
    source: order.map((i) => iso.source[i]),
  };
}

/**
 * The demo sample as a Dataset in SI units, as the importer would read it from the files (values
 * here are unrounded; the files keep five significant digits). Isotherms ascending in
 * temperature, each at the mean of its measured temperatures.
 */
export function demoDataset(sample: DemoSample): Dataset {
  const s = sample.scenario;
  const isotherms = sample.measurements.isotherms.map((iso, k): Isotherm => {
    const temps = iso.points.map((p) => p.temperatureC);
    const mean = temps.reduce((a, b) => a + b, 0) / temps.length;
    const primary = iso.points.map((p) => p.primaryPa);
    const quantities: Partial<Record<QuantityId, number[]>> = {};
    if (s.testKind === 'relaxation') quantities.relaxationModulus = primary;
    else {
      const loss = iso.points.map((p) => p.lossPa);
      quantities.storageModulus = primary;
      quantities.lossModulus = loss;
      quantities.tanDelta = loss.map((l, i) => tanDeltaOf(primary[i], l));
      if (s.layout === 'long') {
        quantities.complexViscosity = iso.points.map(
          (p) => complexModulusOf(p.primaryPa, p.lossPa) / p.xSI,
        );
      }
    }
    return sortedIsotherm({
      id: `T${String(k + 1).padStart(2, '0')}`,
      temperatureK: celsiusToKelvin(mean),
      temperatureSpreadK: maxOf(temps) - minOf(temps),
      x: iso.points.map((p) => p.xSI),
      quantities,
      mask: iso.points.map(() => true),
      source: sample.written.sources[k],
    });
  });
  return {
    name: `${s.product} (invented)`,
    testKind: s.testKind,
    deformation: s.deformation,
    abscissa: s.testKind === 'relaxation' ? 'time' : 'angularFrequency',
    isotherms: [...isotherms].sort((a, b) => a.temperatureK - b.temperatureK),
    files: sample.written.files.map((f) => f.path),
    metadata: {
      note: inventedNote(s).replace(/^# note: /, ''),
      sample: `${s.product} (invented)`,
      supplier: `${s.firm} (invented firm)`,
      invented: 'yes',
      generator: 'core/synthetic demo scenarios',
      seed: String(s.seed),
    },
  };
}
