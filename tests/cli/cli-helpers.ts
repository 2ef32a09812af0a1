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
  type SyntheticComponent,
  type SyntheticOptions,
  type SyntheticTruth,
} from '../../core/synthetic';
import type { Isotherm } from '../../core/data/types';
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

/** The known Prony model of the synthetic samples, shifted by WLF with constant C1 (default 8.86). */
export function syntheticWlfComponent(c1 = SYNTHETIC_WLF.c1): SyntheticComponent {
  return {
    prony: smoothProny({
      tauMinS: 1e-6,
      tauMaxS: 1e4,
      modesPerDecade: 2,
      glassyModulusPa: 1e9,
      equilibriumModulusPa: 1e6,
    }),
    law: { kind: 'wlf', c1, c2K: SYNTHETIC_WLF.c2K },
  };
}

/** Writes one isotherm's CSV text: ω and G′, G″ for oscillatory data, t and G(t) for relaxation. */
function isothermCsv(iso: Isotherm, header: string): string {
  const q = iso.quantities;
  const rows = q.relaxationModulus
    ? iso.x.map((t, i) => `${t},${q.relaxationModulus![i]}`)
    : iso.x.map((w, i) => `${w},${q.storageModulus![i]},${q.lossModulus![i]}`);
  const columns = q.relaxationModulus ? 't (s),G(t) (Pa)' : "omega (rad/s),G' (Pa),G'' (Pa)";
  return `${header}${columns}\n${rows.join('\n')}\n`;
}

/**
 * Writes one CSV per isotherm (`iso_<T>C.csv`, ω in rad/s, G' and G'' in Pa — or t in s and G(t)
 * in Pa for relaxation data) into `dir`, made from a known Prony model shifted by WLF
 * 8.86 / 101.6 K at 100 °C, 2 % noise, seed fixed. `named: false` leaves out the sample-name line.
 */
export function writeSyntheticSample(
  dir: string,
  over: Partial<SyntheticOptions> = {},
  { named = true }: { named?: boolean } = {},
): { truth: SyntheticTruth; temperaturesC: number[] } {
  const { dataset, truth } = syntheticIsotherms({
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: SYNTHETIC_WLF.referenceK,
    temperaturesK: Array.from({ length: 9 }, (_, i) => 343.15 + 10 * i),
    components: [syntheticWlfComponent()],
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
  const header = named ? '# sample: Invented test polymer (synthetic, seeded)\n' : '';
  dataset.isotherms.forEach((iso, k) =>
    writeFileSync(join(dir, `iso_${temperaturesC[k]}C.csv`), isothermCsv(iso, header)),
  );
  return { truth, temperaturesC };
}
