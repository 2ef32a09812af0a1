/**
 * Helpers for the command-line tests: run `node bin/thermoshift.mjs` as a user would, and write
 * synthetic per-isotherm files with known truth (core/synthetic, fixed seed) into a temp folder.
 */
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  smoothProny,
  syntheticIsotherms,
  type SyntheticOptions,
  type SyntheticTruth,
} from '../../core/synthetic';
import { kelvinToCelsius } from '../../core/data/quantities';

export const ROOT = fileURLToPath(new URL('../..', import.meta.url));

export interface CliRun {
  status: number;
  stdout: string;
  stderr: string;
}

export function runCli(args: string[], cwd = ROOT): CliRun {
  const r = spawnSync(process.execPath, [join(ROOT, 'bin/thermoshift.mjs'), ...args], {
    cwd,
    encoding: 'utf8',
    timeout: 60_000,
  });
  return { status: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}

export function tempDir(prefix = 'thermoshift-cli-'): string {
  return mkdtempSync(join(tmpdir(), prefix));
}

export const SYNTHETIC_WLF = { c1: 8.86, c2K: 101.6, referenceK: 373.15 };

/**
 * Writes one CSV per isotherm (`iso_<T>C.csv`, ω in rad/s, G' and G'' in Pa) into `dir`, made
 * from a known Prony model shifted by WLF 8.86 / 101.6 K at 100 °C, 2 % noise, seed fixed.
 */
export function writeSyntheticSample(
  dir: string,
  over: Partial<SyntheticOptions> = {},
): { truth: SyntheticTruth; temperaturesC: number[] } {
  const { dataset, truth } = syntheticIsotherms({
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: SYNTHETIC_WLF.referenceK,
    temperaturesK: Array.from({ length: 9 }, (_, i) => 343.15 + 10 * i),
    components: [
      {
        prony: smoothProny({
          tauMinS: 1e-6,
          tauMaxS: 1e4,
          modesPerDecade: 2,
          glassyModulusPa: 1e9,
          equilibriumModulusPa: 1e6,
        }),
        law: { kind: 'wlf', c1: SYNTHETIC_WLF.c1, c2K: SYNTHETIC_WLF.c2K },
      },
    ],
    xMin: 0.1,
    xMax: 100,
    pointsPerDecade: 5,
    relativeNoise: 0.02,
    seed: 20261201,
    ...over,
  });
  mkdirSync(dir, { recursive: true });
  const temperaturesC = dataset.isotherms.map(
    (iso) => Math.round(kelvinToCelsius(iso.temperatureK) * 100) / 100,
  );
  dataset.isotherms.forEach((iso, k) => {
    const rows = iso.x.map(
      (w, i) => `${w},${iso.quantities.storageModulus![i]},${iso.quantities.lossModulus![i]}`,
    );
    writeFileSync(
      join(dir, `iso_${temperaturesC[k]}C.csv`),
      `# sample: Invented test polymer (synthetic, seeded)\nomega (rad/s),G' (Pa),G'' (Pa)\n${rows.join('\n')}\n`,
    );
  });
  return { truth, temperaturesC };
}
