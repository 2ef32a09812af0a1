/**
 * The app's live re-fit while a curve is dragged: each pointer step re-runs the shifts only (no
 * models, no Prony series) with the dragged curve locked and the other shifts started from the
 * last result (warm start) and the αV of the last full fit kept (bT from the data is not fitted
 * again during a drag) — the request useWorkbench sends, run by runRequest, the very function
 * in the analysis worker. Measured on the invented demo melt (samples/melt-long, as the app opens
 * it) and on 20 synthetic isotherms (the CLI tests' known Prony model and WLF law); prints the median per step, warm and cold (scan included).
 * One frame at 60 Hz is 16.7 ms; the worker keeps the window responsive either way.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { importFiles } from '../core/io/index.ts';
import { maxOf } from '../core/data/extent.ts';
import type { Dataset } from '../core/data/types.ts';
import type { Analysis } from '../core/pipeline/types.ts';
import type { HeldExpansion } from '../core/shift/types.ts';
import { syntheticIsotherms } from '../core/synthetic/index.ts';
import { syntheticWlfComponent } from '../tests/cli/cli-helpers.ts';
import { runRequest } from '../app/renderer/src/engine/run-request.ts';
import type { DocumentOptions } from '../app/renderer/src/document/analysis-document.ts';
import { newDocument } from '../app/renderer/src/document/analysis-document.ts';
import { heldExpansionFrom } from '../app/renderer/src/document/live-refit.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const STEPS = 25;
const STEP_DECADES = 0.02;

interface Case {
  name: string;
  dataset: Dataset;
  options: DocumentOptions;
}

function demoCase(): Case {
  const name = 'hx310-melt-sweeps.csv';
  const text = readFileSync(join(ROOT, 'samples', 'melt-long', name), 'utf8');
  return {
    name: 'demo melt (samples/melt-long)',
    dataset: importFiles([{ name, text }]).dataset,
    // as the app's demo document (app/renderer/src/document/demo.ts)
    options: {
      referenceTemperatureK: 463.15,
      verticalShift: 'density',
      density: { referenceDensityKgPerM3: 760, volumetricExpansionPerK: 7e-4 },
    },
  };
}

function syntheticCase(withBT = false): Case {
  const { dataset } = syntheticIsotherms({
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: 373.15,
    temperaturesK: Array.from({ length: 20 }, (_, i) => 333.15 + 5 * i),
    components: [syntheticWlfComponent()],
    xMin: 0.1,
    xMax: 100,
    pointsPerDecade: 5,
    relativeNoise: 0.02,
    seed: 20,
    // An entropic bT (αV = 6·10⁻⁴ /K, a typical melt value): the default run fits αV.
    ...(withBT && { density: { referenceDensity: 900, volumetricExpansionPerK: 6e-4 } }),
  });
  return {
    name: withBT ? '20 synthetic isotherms with bT (αV from the data)' : '20 synthetic isotherms',
    dataset,
    options: { referenceTemperatureK: 373.15 },
  };
}

function analyse(
  c: Case,
  options: DocumentOptions,
  warm?: Record<string, number>,
  held?: HeldExpansion,
): Analysis {
  const r = runRequest({
    kind: 'analyse',
    dataset: c.dataset,
    options,
    importWarnings: [],
    ...(warm && { warmStartLog10aT: warm }),
    ...(held && { heldExpansion: held }),
  });
  if (r.kind !== 'analysed')
    throw new Error(`${c.name}: ${r.kind === 'failed' ? r.message : r.kind}`);
  return r.analysis;
}

const shiftsOf = (a: Analysis): Record<string, number> =>
  Object.fromEntries(
    a.curves.filter((x) => x.log10aT !== null).map((x) => [x.isothermId, x.log10aT as number]),
  );

const median = (xs: number[]): number => [...xs].sort((p, q) => p - q)[Math.floor(xs.length / 2)];

/** One drag of the second-coldest isotherm over STEPS pointer steps; ms per step. */
function drag(c: Case, useWarmStart: boolean): number[] {
  const full = analyse(c, c.options);
  const dragged = [...full.curves].sort((p, q) => p.temperatureK - q.temperatureK)[1];
  const base = dragged.log10aT ?? 0;
  let shown = full;
  const times: number[] = [];
  for (let k = 1; k <= STEPS; k++) {
    const options: DocumentOptions = {
      ...c.options,
      models: [],
      pronyModesPerDecade: 0,
      lockedLog10aT: { [dragged.isothermId]: base + k * STEP_DECADES },
    };
    // As useWorkbench: a warm start, and the αV of the last full fit kept (heldExpansionFrom).
    const held = useWarmStart
      ? heldExpansionFrom(shown, newDocument(c.dataset, c.name, { options }))
      : undefined;
    const t0 = performance.now();
    shown = analyse(c, options, useWarmStart ? shiftsOf(shown) : undefined, held);
    times.push(performance.now() - t0);
  }
  return times;
}

export async function run(): Promise<void> {
  for (const c of [demoCase(), syntheticCase(), syntheticCase(true)]) {
    drag(c, true); // warm-up of the JIT
    const warm = drag(c, true);
    const cold = drag(c, false);
    const points = c.dataset.isotherms.reduce((n, i) => n + i.x.length, 0);
    console.log(
      `${c.name}: ${c.dataset.isotherms.length} isotherms, ${points} points; re-fit per drag step (shifts only, one curve locked): ` +
        `warm start median ${median(warm).toFixed(1)} ms (max ${maxOf(warm).toFixed(1)}), ` +
        `cold median ${median(cold).toFixed(1)} ms`,
    );
  }
}
