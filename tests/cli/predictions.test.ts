/**
 * `thermoshift build --predict` end to end on synthetic data with known truth: the invented seal
 * of tests/core/pipeline/seal-fixture.ts (stress relaxation, WLF 8.86 / 101.6 K at 100 °C;
 * Williams, Landel & Ferry, JACS 77, 3701, 1955) and the CLI tests' oscillatory sample.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { wlfLog10aT } from '../../core/models/shift-laws';
import { pronyRelaxation, pronyStorage } from '../../core/spectrum/prony-model';
import type { PredictionEntry } from '../../app/cli/predictions';
import { EXIT } from '../../app/cli/exit-codes';
import {
  runCli,
  tempDir,
  writeSyntheticSample,
  SYNTHETIC_WLF,
  syntheticWlfComponent,
} from './cli-helpers';
import { expectRelClose } from '../helpers/assert-close';
import { SEAL_DATA, SEAL_PRONY, sealLog10aT, TEN_YEARS_S } from '../core/pipeline/seal-fixture';

const trueLog10aT = (T: number) =>
  wlfLog10aT(T, SYNTHETIC_WLF.c1, SYNTHETIC_WLF.c2K, SYNTHETIC_WLF.referenceK);

let relaxationDir = '';
let oscillatoryDir = '';
beforeAll(() => {
  relaxationDir = join(tempDir(), 'seal');
  writeSyntheticSample(relaxationDir, SEAL_DATA);
  oscillatoryDir = join(tempDir(), 'osc');
  writeSyntheticSample(oscillatoryDir);
});

describe('thermoshift build --predict', () => {
  it('build --predict relaxation@60C,10y gives the relaxed modulus after ten years at 60 °C', () => {
    const r = runCli([
      'build',
      relaxationDir,
      '--tref',
      '100',
      '--json',
      '--quiet',
      '--predict',
      'relaxation@60C,10y',
    ]);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    const [p] = (JSON.parse(r.stdout) as { predictions: PredictionEntry[] }).predictions;
    const T = 333.15;
    const expected = pronyRelaxation(SEAL_PRONY, TEN_YEARS_S / 10 ** sealLog10aT(T));
    // 5 %: 1 % noise, the shift error (≤ 0.02 decades, docs/conventions.md §7), the Prony fit (≤ 3 %, docs/conventions.md §7)
    expectRelClose(p.value, expected, 0.05, 'G(10 years) at 60 °C');
    expect(p.unit).toBe('Pa');
    expect(p.temperature).toBe(60);
    expectRelClose(p.timeS!, TEN_YEARS_S, 1e-12, 'ten years in seconds');
    expect(p.range95![0]).toBeLessThanOrEqual(p.value);
    expect(p.range95![1]).toBeGreaterThanOrEqual(p.value);
    expect(p.flags.outsideReducedWindow).toBe(false);
    expect(p.cautions.join(' ')).toMatch(/licensed engineering practice/);
  });

  it('build --predict prints G′ at 1 Hz in text, with the cautions, and flags an extrapolation', () => {
    const T = 120 + 273.15;
    const r = runCli([
      'build',
      oscillatoryDir,
      '--quiet',
      '--predict',
      'storage@120C,1Hz,wlf',
      '--predict',
      'storage@250C,1Hz',
    ]);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    const line = r.stdout.split('\n').find((l) => l.startsWith('storage@120C,1Hz,wlf:'))!;
    const value = Number(/= ([0-9.e+-]+) Pa/.exec(line)![1]);
    const prony = syntheticWlfComponent().prony;
    const expected = pronyStorage(prony, 10 ** trueLog10aT(T) * 2 * Math.PI);
    // 5 %: 2 % noise plus the shift and Prony errors; the text shows 4 significant digits
    expectRelClose(value, expected, 0.05, "G' at 120 °C, 1 Hz");
    expect(r.stdout).toMatch(/storage@250C,1Hz: .*\n(\s+- .*\n)*\s+- .*outside the fitted range/);
    expect(r.stdout).toMatch(/Confirm design values by testing/);
  });

  it('build --predict names a bad query and exits with the usage code before analysing', () => {
    const r = runCli(['build', oscillatoryDir, '--predict', 'stiffness@60C,10y']);
    expect(r.status).toBe(EXIT.usage);
    expect(r.stderr).toMatch(/--predict "stiffness@60C,10y": unknown quantity "stiffness"/);
  });
});
