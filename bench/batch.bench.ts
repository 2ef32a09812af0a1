/**
 * Batch speed: 100 invented synthetic samples (9 isotherms × 16 frequencies, one CSV file per
 * isotherm, 2 % noise, WLF shifts, seeds 1…100) written to a temp folder, then run through
 * `runBatch`, the very function behind `thermoshift batch`: import, shifts, models, Prony series,
 * indicators, and every output file including the HTML report. Prints total and per-sample time.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { syntheticWlfComponent, writeSyntheticSample } from '../tests/cli/cli-helpers.ts';
import { runBatch, listSamples } from '../app/cli/commands/batch.ts';
import { analyseSample } from '../app/cli/run-sample.ts';
import { readInputs } from '../app/cli/io/read-inputs.ts';

const SAMPLES = 100;

/** One invented sample: the CLI tests' synthetic files, WLF C1 varied with the seed. */
function writeSample(dir: string, seed: number): void {
  writeSyntheticSample(
    dir,
    { seed, components: [syntheticWlfComponent(8.86 + (seed % 5) * 0.2)] },
    { named: false },
  );
}

export async function run(): Promise<void> {
  const root = mkdtempSync(join(tmpdir(), 'thermoshift-batch-bench-'));
  try {
    const input = join(root, 'in');
    for (let s = 1; s <= SAMPLES; s++)
      writeSample(join(input, `sample-${String(s).padStart(3, '0')}`), s);
    const samples = listSamples([], [input]);
    let failed = 0;
    const t0 = performance.now();
    const rows = await runBatch(samples, {
      settings: { referenceTemperature: 100 },
      settingsSource: 'bench',
      out: join(root, 'out'),
      force: false,
      date: '2026-12-01',
      log: (line) => {
        if (line.includes('FAILED')) failed++;
      },
    });
    const ms = performance.now() - t0;
    console.log(
      `batch of ${rows.length} samples (9 isotherms × 16 points each, all outputs written):`,
    );
    console.log(
      `  total ${(ms / 1000).toFixed(2)} s, ${(ms / rows.length).toFixed(1)} ms per sample, ${failed} failed`,
    );
    // The same samples again without writing: how much of it is the analysis itself.
    const t1 = performance.now();
    for (const sample of samples)
      analyseSample(readInputs(sample.paths), { referenceTemperature: 100 }, 'bench');
    const analysisMs = (performance.now() - t1) / samples.length;
    console.log(
      `  of which read + analyse (import, shifts, models, Prony, indicators): ${analysisMs.toFixed(1)} ms per sample`,
    );
  } finally {
    rmSync(root, { recursive: true, force: true });
  }
}
