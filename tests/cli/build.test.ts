import { describe, it, expect, beforeAll } from 'vitest';
import { existsSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import { runCli, tempDir, writeSyntheticSample, SYNTHETIC_WLF } from './cli-helpers';
import type { AnalysisSummary } from '../../core/pipeline/summary';
import { EXIT } from '../../app/cli/exit-codes';
import { OUTPUT_FILES } from '../../core/report/output-files';
import { expectAbsClose, expectRelClose } from '../helpers/assert-close';

interface Truth {
  referenceTemperatureC: number;
  shiftLaw: { kind: string; C1?: number; C2K?: number; activationEnergyKJPerMol?: number };
  verticalShift: {
    kind: string;
    referenceDensityKgPerM3?: number;
    volumetricExpansionPerK?: number;
  };
  isotherms: { log10aT: number; log10bT: number }[];
  prony: { zeroShearViscosityPaS?: number };
}
const truthOf = (s: string): Truth =>
  JSON.parse(readFileSync(join('samples', s, 'truth.json'), 'utf8')) as Truth;

function csvRows(path: string): Record<string, string>[] {
  const body = readFileSync(path, 'utf8')
    .split('\n')
    .filter((l) => !l.startsWith('#'))
    .join('\n');
  return Papa.parse<Record<string, string>>(body, { header: true, skipEmptyLines: true }).data;
}

describe('thermoshift build (samples/)', () => {
  // Tolerances per sample, in decades of log10 aT. seal, melt and adhesive have 2 % noise and
  // several decades per isotherm: the shift engine's 0.02-0.05 targets apply. ramp-dma holds only
  // 4 frequencies per isotherm (a multi-frequency temperature ramp), outside the accuracy
  // conditions; 0.15 decades is its measured error (0.10) with margin, stated in the report.
  const cases: [string, number, string[]][] = [
    ['seal-dma', 0.03, []],
    ['melt-long', 0.05, ['--vertical', 'density', '--density', '760', '--expansion', '0.0007']],
    ['adhesive-relaxation', 0.03, []],
    ['ramp-dma', 0.15, []],
  ];
  for (const [sample, tol, extra] of cases)
    it(`build samples/${sample} --json recovers the generator's log10 aT and shift law`, () => {
      const truth = truthOf(sample);
      const r = runCli([
        'build',
        `samples/${sample}`,
        '--tref',
        String(truth.referenceTemperatureC),
        '--json',
        '--quiet',
        ...extra,
      ]);
      expect(r.status, r.stderr).toBe(EXIT.ok);
      const s = JSON.parse(r.stdout) as AnalysisSummary;
      expect(s.curves).toHaveLength(truth.isotherms.length);
      s.curves.forEach((c, i) => {
        expectAbsClose(c.log10aT!, truth.isotherms[i].log10aT, tol, `${sample} ${c.isothermId}`);
        expectAbsClose(
          c.log10bT!,
          truth.isotherms[i].log10bT,
          0.005,
          `${sample} bT (bT target, docs/conventions.md §7: 0.005 decades)`,
        );
      });
      expectAbsClose(s.referenceTemperature, truth.referenceTemperatureC, 1e-9, 'as given');
      if (truth.shiftLaw.kind === 'wlf' && sample !== 'ramp-dma') {
        expectRelClose(s.models.wlf!.C1, truth.shiftLaw.C1!, 0.05, 'C1 within 5 %');
        expectRelClose(s.models.wlf!.C2, truth.shiftLaw.C2K!, 0.05, 'C2 within 5 %');
      }
      if (truth.shiftLaw.kind === 'arrhenius')
        expectRelClose(
          s.models.arrhenius!.activationEnergy,
          truth.shiftLaw.activationEnergyKJPerMol!,
          0.02,
          'model target, docs/conventions.md §7: Ea within 2 %',
        );
      expect(s.prony?.terms.length).toBeGreaterThan(0);
      if (truth.prony.zeroShearViscosityPaS)
        // η0 = Σ g_i τ_i of the generating Maxwell modes (Ferry 1980, ch. 3); the report's value
        // comes from a Cross fit of |η*|, 2.6 % off when measured: 10 % allows for the fit's bias.
        expectRelClose(
          s.indicators.zeroShearViscosity.value,
          truth.prony.zeroShearViscosityPaS,
          0.1,
          'η0',
        );
    });
});

describe('thermoshift build (synthetic files with known truth)', () => {
  const dir = tempDir();
  const data = join(dir, 'lab-files');
  const out = join(dir, 'out');
  let truth: ReturnType<typeof writeSyntheticSample>['truth'];
  let first: ReturnType<typeof runCli>;
  beforeAll(() => {
    truth = writeSyntheticSample(data).truth;
    first = runCli([
      'build',
      data,
      '--tref',
      '373.15K',
      '--out',
      out,
      '--json',
      '--modulus-unit',
      'MPa',
      '--modes-per-decade',
      '2',
      '--date',
      '2026-12-01',
    ]);
  });

  it('build DIR --out --json writes every output file and prints the summary', () => {
    expect(first.status, first.stderr).toBe(EXIT.ok);
    for (const f of Object.values(OUTPUT_FILES)) expect(existsSync(join(out, f)), f).toBe(true);
    const s = JSON.parse(first.stdout) as AnalysisSummary;
    expect(JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'))).toEqual(s);
    expect(s.sample.files).toHaveLength(9);
    // No --vertical given: the choice and its reason are in the summary.
    expect(s.vertical.requested).toBe('auto');
    expect(['none', 'data']).toContain(s.vertical.chosen);
    expect(s.vertical.reason.length).toBeGreaterThan(20);
  });

  it('build without --json or --out prints which vertical shift was chosen and why', () => {
    const r = runCli(['build', data, '--tref', '373.15K', '--vertical', 'auto']);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    expect(r.stdout).toMatch(/^vertical shift: (none|data) \((bT = 1|bT from the data)/m);
  });

  it('build recovers log10 aT within 0.02 decades and the WLF constants of the truth', () => {
    const s = JSON.parse(first.stdout) as AnalysisSummary;
    s.curves.forEach((c, i) =>
      expectAbsClose(
        c.log10aT!,
        truth.log10aT[i],
        0.02,
        'shift target, docs/conventions.md §7: 2 % noise, 9 isotherms',
      ),
    );
    expectRelClose(
      s.models.wlf!.C1,
      SYNTHETIC_WLF.c1,
      0.05,
      'C1 within 5 % (strongly correlated with C2)',
    );
    expectRelClose(s.models.wlf!.C2, SYNTHETIC_WLF.c2K, 0.08, 'C2 within 8 %');
  });

  it('build writes a shift table and a Prony table a spreadsheet can read', () => {
    const shift = csvRows(join(out, OUTPUT_FILES.shiftTable));
    expect(shift).toHaveLength(9);
    shift.forEach((r, i) =>
      expectAbsClose(Number(r.log10_aT), truth.log10aT[i], 0.02, 'shift table'),
    );
    expect(readFileSync(join(out, OUTPUT_FILES.shiftTable), 'utf8')).toMatch(
      /^# .*log10 aT < 0 above Tref/m,
    );
    const prony = csvRows(join(out, OUTPUT_FILES.prony));
    expect(prony.length).toBeGreaterThan(5);
    expect(Object.keys(prony[0])).toEqual(['i', 'tau_s', 'g_i_MPa', 'g_i_over_G0']);
    const master = csvRows(join(out, OUTPUT_FILES.masterCurve));
    expect(Object.keys(master[0])).toContain('storage_modulus_MPa');
    expect(readFileSync(join(out, OUTPUT_FILES.report), 'utf8')).toContain('2026-12-01');
  });

  it('build refuses to overwrite without --force, writes nothing, and overwrites with it', () => {
    const target = join(out, OUTPUT_FILES.summary);
    writeFileSync(target, 'kept');
    const before = statSync(join(out, OUTPUT_FILES.report)).mtimeMs;
    const again = runCli(['build', data, '--tref', '100', '--out', out]);
    expect(again.status).toBe(EXIT.outputError);
    expect(again.stderr.trim().split('\n')).toHaveLength(1);
    expect(again.stderr).toMatch(/already holds Thermoshift results; use --force/);
    expect(readFileSync(target, 'utf8')).toBe('kept');
    expect(statSync(join(out, OUTPUT_FILES.report)).mtimeMs).toBe(before);
    const forced = runCli(['build', data, '--tref', '100', '--out', out, '--force', '--quiet']);
    expect(forced.status, forced.stderr).toBe(EXIT.ok);
    expect(readFileSync(target, 'utf8')).toContain('"schema"');
  });

  it('build reads a settings file, and the command line overrides it', () => {
    const settings = join(dir, 'lab-settings.json');
    writeFileSync(
      settings,
      JSON.stringify({ referenceTemperature: 90, models: ['arrhenius'], pronyModesPerDecade: 0 }),
    );
    const r = runCli(['build', data, '--settings', settings, '--tref', '100', '--json', '--quiet']);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    const s = JSON.parse(r.stdout) as AnalysisSummary;
    expect(s.referenceTemperature).toBe(100);
    expect(Object.keys(s.models).filter((k) => k !== 'hint')).toEqual(['arrhenius']);
    expect(s.prony).toBeNull();
  });
});

describe('thermoshift build (errors)', () => {
  const dir = tempDir();
  it('build names a missing file in one line, without a stack trace, exit 1', () => {
    const r = runCli(['build', join(dir, 'nope.csv')]);
    expect(r.status).toBe(EXIT.dataError);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/nope\.csv: no such file/);
    expect(r.stderr).not.toMatch(/ at /);
  });
  it('build names the file, row and column of unreadable data, exit 1', () => {
    const bad = join(dir, 'bad_80C.csv');
    writeFileSync(bad, "omega (rad/s),G' (furlongs),G'' (Pa)\n1,2,3\n");
    const r = runCli(['build', bad]);
    expect(r.status).toBe(EXIT.dataError);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/bad_80C\.csv", row 1, column 2/);
    const debug = runCli(['build', bad, '--debug']);
    expect(debug.status).toBe(EXIT.dataError);
    expect(debug.stderr).toMatch(/\n\s+at /); // --debug adds where the error came from
  });
  it('build rejects a bad option value and a bad settings key with exit 2', () => {
    const tref = runCli(['build', 'samples/seal-dma', '--tref', 'warm']);
    expect(tref.status).toBe(EXIT.usage);
    expect(tref.stderr).toMatch(/--tref: "warm" is not a temperature/);
    const settings = join(dir, 's.json');
    writeFileSync(settings, JSON.stringify({ refTemp: 20 }));
    const s = runCli(['build', 'samples/seal-dma', '--settings', settings]);
    expect(s.status).toBe(EXIT.usage);
    expect(s.stderr).toMatch(/s\.json: unknown setting refTemp/);
  });
});
