/**
 * Side by side with the numpy/scipy yardstick: `npm run bench -- vs` (not part of the plain
 * `npm run bench`, it takes minutes). Generates its own files with an independent generator
 * (bench/vs-generator.ts, not core/synthetic), then for each size runs, in the same run and one
 * after the other, the whole `thermoshift build FILE --tref 190 --vertical density …` process and
 * the yardstick (`/usr/bin/python3 $THERMOSHIFT_YARDSTICK`, default
 * /work/shared/yardstick/tts_ref.py) with the same vertical shift (density, the known αV), and
 * prints both whole-process times, their ratio, both max |Δlog10 aT| against the truth, the
 * warnings and the peak memory (/usr/bin/time -v). Then, in this process, where Thermoshift's time
 * goes (import, shift engine, models, Prony/indicators) and how the engine's time grows with the
 * number of isotherms and of points. Last, two big runs of Thermoshift alone (the yardstick is
 * not timed on them): 10⁶ points (500 × 2000, Prony series off) and 10,000 isotherms of three
 * points. Options after `vs`: `--repeat N` (whole-process runs per tool and size, the fastest is
 * kept; default 1), `--median` (keep the median of the N runs instead), `--only LABEL` (one
 * case), `--no-big` (skip the big runs).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { importFiles } from '../core/io/index.ts';
import { buildMasterCurve } from '../core/pipeline/build-master-curve.ts';
import { shiftIsotherms } from '../core/shift/index.ts';
import type { VsCase } from './vs-generator.ts';
import { REFERENCE_C, vsFile } from './vs-generator.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const YARDSTICK = process.env.THERMOSHIFT_YARDSTICK ?? '/work/shared/yardstick/tts_ref.py';
const PYTHON = '/usr/bin/python3';
const EXPANSION = 7e-4;
/** Any density: the entropic bT depends on αV only (the ratio ρref/ρ(T)). Invented. */
const DENSITY = 780;
const ARRHENIUS = { kind: 'arrhenius', activationEnergyJPerMol: 45e3 } as const;
/** WLF constants of an invented melt well above Tg, referred to 190 °C. */
const WLF = { kind: 'wlf', c1: 4.2, c2K: 210 } as const;

const arg = (name: string): string | undefined => {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
};

function cases(): VsCase[] {
  const base = { expansionPerK: EXPANSION, descending: true };
  const sizes: [number, number][] = [
    [20, 50],
    [100, 500],
    [200, 2000],
    [500, 100],
    [20, 5000],
  ];
  const list: VsCase[] = sizes.map(([n, p], i) => ({
    ...base,
    label: `${n}×${p}`,
    isotherms: n,
    points: p,
    law: ARRHENIUS,
    spectrum: 'bsw',
    seed: 101 + i,
  }));
  // The other shape and law: a broad (polydisperse) spectrum, WLF, sweeps from low to high ω.
  for (const [n, p] of [
    [20, 50],
    [200, 2000],
  ] as const)
    list.push({
      label: `${n}×${p} WLF`,
      isotherms: n,
      points: p,
      law: WLF,
      spectrum: 'lognormal',
      expansionPerK: EXPANSION,
      descending: false,
      seed: 900 + n,
    });
  const only = arg('--only');
  return only ? list.filter((c) => c.label === only) : list;
}

interface ProcessRun {
  seconds: number;
  peakMB: number;
  stdout: string;
  stderr: string;
  status: number | null;
}

/** One whole process under /usr/bin/time -v: wall time measured here, peak RSS from time(1). */
function timed(command: string, args: string[]): ProcessRun {
  const t0 = performance.now();
  const r = spawnSync('/usr/bin/time', ['-v', command, ...args], {
    cwd: ROOT,
    encoding: 'utf8',
    maxBuffer: 1 << 30,
  });
  const seconds = (performance.now() - t0) / 1000;
  const m = /Maximum resident set size \(kbytes\): (\d+)/.exec(r.stderr);
  return {
    seconds,
    peakMB: m ? Number(m[1]) / 1024 : NaN,
    stdout: r.stdout,
    stderr: r.stderr,
    status: r.status,
  };
}

/** `thermoshift build PATH --tref 190 --vertical density … --json --quiet` plus `extra`. */
function buildArgs(path: string, extra: string[]): string[] {
  return [
    join(ROOT, 'bin/thermoshift.mjs'),
    'build',
    path,
    '--tref',
    String(REFERENCE_C),
    '--vertical',
    'density',
    '--density',
    String(DENSITY),
    '--expansion',
    String(EXPANSION),
    ...extra,
    '--json',
    '--quiet',
  ];
}

/**
 * `runs` whole-process runs of one tool: the fastest, or with `--median` the median run (on a
 * machine shared with other jobs the median is the steadier figure).
 */
function fastest(runs: number, make: () => ProcessRun): ProcessRun {
  const all: ProcessRun[] = [];
  for (let i = 0; i < runs; i++) all.push(make());
  all.sort((a, b) => a.seconds - b.seconds);
  return process.argv.includes('--median') ? all[(all.length - 1) >> 1] : all[0];
}

/** Largest |estimated − true| over the isotherms matched by temperature (within 0.01 K). */
function maxError(
  found: { temperatureC: number; log10aT: number | null }[],
  truthC: number[],
  truth: number[],
): number {
  let worst = 0;
  truthC.forEach((tC, k) => {
    const f = found.find((c) => Math.abs(c.temperatureC - tC) < 0.01);
    const e = f && f.log10aT !== null ? Math.abs(f.log10aT - truth[k]) : Infinity;
    worst = Math.max(worst, e);
  });
  return worst;
}

interface ThermoshiftSummary {
  curves: { temperature: number; log10aT: number | null }[];
  warnings: { code: string }[];
}

interface YardstickOutput {
  curves: { temperature_C: number; log10_aT: number }[];
  warnings: string[];
  timing_s: { compute: number; read: number };
}

function countCodes(codes: string[]): string {
  const counts = new Map<string, number>();
  for (const c of codes) counts.set(c, (counts.get(c) ?? 0) + 1);
  return [...counts].map(([c, n]) => (n > 1 ? `${n}× ${c}` : c)).join(', ') || 'none';
}

interface Stages {
  importS: number;
  shiftS: number;
  modelsS: number;
  spectrumS: number;
  engineS: number;
}

/** Where Thermoshift's time goes, in this process (code already compiled and warmed up once). */
function stages(name: string, text: string, prony = true): Stages {
  const t0 = performance.now();
  const imported = importFiles([{ name, text }]);
  const t1 = performance.now();
  const marks: Record<string, number> = {};
  const options = {
    referenceTemperatureK: REFERENCE_C + 273.15,
    verticalShift: 'density' as const,
    density: { referenceDensityKgPerM3: DENSITY, volumetricExpansionPerK: EXPANSION },
    ...(!prony && { pronyModesPerDecade: 0 as const }),
    onProgress: (_f: number, stage: string) => (marks[stage] = performance.now()),
  };
  buildMasterCurve(imported.dataset, options);
  const e0 = performance.now();
  shiftIsotherms(imported.dataset, {
    referenceK: REFERENCE_C + 273.15,
    vertical: 'density',
    density: {
      kind: 'expansion',
      referenceDensityKgPerM3: DENSITY,
      volumetricExpansionPerK: EXPANSION,
    },
  });
  const e1 = performance.now();
  return {
    importS: (t1 - t0) / 1000,
    shiftS: (marks.models - marks.shift) / 1000,
    modelsS: (marks.spectrum - marks.models) / 1000,
    spectrumS: (marks.done - marks.spectrum) / 1000,
    engineS: (e1 - e0) / 1000,
  };
}

const f = (v: number, d = 2): string => (Number.isFinite(v) ? v.toFixed(d) : '–');

export async function run(): Promise<void> {
  if (!existsSync(YARDSTICK) || !existsSync(PYTHON)) {
    console.log(`vs: yardstick ${YARDSTICK} or ${PYTHON} not found; skipped`);
    return;
  }
  const repeat = Number(arg('--repeat') ?? 1);
  const groupTolerance = arg('--group-tolerance');
  const dir = mkdtempSync(join(tmpdir(), 'thermoshift-vs-'));
  const rows: string[] = [];
  const engine: { c: VsCase; s: Stages }[] = [];
  try {
    for (const c of cases()) {
      const file = vsFile(c);
      const path = join(dir, `vs-${c.label.replace(/[^0-9a-zA-Z]+/g, '-')}.csv`);
      writeFileSync(path, file.text);
      const ts = fastest(repeat, () =>
        timed(
          process.execPath,
          buildArgs(path, groupTolerance ? ['--group-tolerance', groupTolerance] : []),
        ),
      );
      const py = fastest(repeat, () =>
        timed(PYTHON, [
          YARDSTICK,
          path,
          '--tref',
          String(REFERENCE_C),
          '--vertical',
          'density',
          '--alpha',
          String(EXPANSION),
        ]),
      );
      let tsErr = NaN;
      let tsWarn = `exit ${ts.status}: ${ts.stderr.split('\n').slice(-4).join(' ').slice(0, 160)}`;
      if (ts.status === 0) {
        const s = JSON.parse(ts.stdout) as ThermoshiftSummary;
        tsErr = maxError(
          s.curves.map((cv) => ({ temperatureC: cv.temperature, log10aT: cv.log10aT })),
          file.temperaturesC,
          file.log10aT,
        );
        tsWarn = `${s.curves.length} isotherms; ${countCodes(s.warnings.map((w) => w.code))}`;
      }
      let pyErr = NaN;
      let pyWarn = `exit ${py.status}: ${py.stderr.split('\n').slice(-3).join(' ').slice(0, 160)}`;
      if (py.status === 0) {
        const y = JSON.parse(py.stdout) as YardstickOutput;
        pyErr = maxError(
          y.curves.map((cv) => ({ temperatureC: cv.temperature_C, log10aT: cv.log10_aT })),
          file.temperaturesC,
          file.log10aT,
        );
        pyWarn = `${y.curves.length} curves; ${y.warnings.length} warning(s)${y.warnings.length ? `: ${y.warnings[0].slice(0, 80)}` : ''}; compute ${f(y.timing_s.compute)} s`;
      }
      const line =
        `${c.label.padEnd(13)} thermoshift ${f(ts.seconds).padStart(6)} s ${f(ts.peakMB, 0).padStart(5)} MB | ` +
        `yardstick ${f(py.seconds).padStart(6)} s ${f(py.peakMB, 0).padStart(5)} MB | ratio ${f(ts.seconds / py.seconds).padStart(5)} | ` +
        `max |Δlog10 aT| ${f(tsErr, 4)} vs ${f(pyErr, 4)}`;
      console.log(line);
      console.log(`${''.padEnd(13)} thermoshift: ${tsWarn}`);
      console.log(`${''.padEnd(13)} yardstick:   ${pyWarn}`);
      rows.push(line);
      stages(path, file.text); // compile and warm up once
      engine.push({ c, s: stages(path, file.text) });
    }
    console.log('\nThermoshift in this process (second call), seconds:');
    console.log('case          import  shift-stage  models  Prony+indicators  engine alone');
    for (const { c, s } of engine)
      console.log(
        `${c.label.padEnd(13)} ${f(s.importS, 3).padStart(6)}  ${f(s.shiftS, 3).padStart(11)}  ${f(s.modelsS, 3).padStart(6)}  ${f(s.spectrumS, 3).padStart(16)}  ${f(s.engineS, 3).padStart(12)}`,
      );
    growth();
    if (!process.argv.includes('--no-big')) big(dir);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** The 10⁶-point and 10,000-isotherm runs: whole process and, in this process, where time goes. */
function big(dir: string): void {
  const runs: { c: VsCase; extra: string[] }[] = [
    {
      c: {
        label: '10⁶ points (500×2000)',
        isotherms: 500,
        points: 2000,
        law: ARRHENIUS,
        spectrum: 'bsw',
        expansionPerK: EXPANSION,
        descending: true,
        seed: 77,
      },
      extra: ['--modes-per-decade', '0'],
    },
    {
      c: {
        label: '10,000 isotherms × 3',
        isotherms: 10_000,
        points: 3,
        law: ARRHENIUS,
        spectrum: 'bsw',
        expansionPerK: EXPANSION,
        descending: true,
        seed: 78,
        omegaRadPerS: [1, 10],
      },
      extra: [],
    },
  ];
  console.log('\nBig runs (Thermoshift only):');
  for (const { c, extra } of runs) {
    const file = vsFile(c);
    const path = join(dir, `big-${c.isotherms}.csv`);
    writeFileSync(path, file.text);
    const ts = timed(process.execPath, buildArgs(path, extra));
    let summary = `exit ${ts.status}: ${ts.stderr.split('\n').slice(-4).join(' ').slice(0, 160)}`;
    if (ts.status === 0) {
      const s = JSON.parse(ts.stdout) as ThermoshiftSummary;
      // Over the isotherms that got a shift (a few may overlap nothing).
      const shifted = s.curves.filter((cv) => cv.log10aT !== null);
      const err = maxError(
        shifted.map((cv) => ({ temperatureC: cv.temperature, log10aT: cv.log10aT })),
        shifted.map((cv) => cv.temperature),
        shifted.map(
          (cv) =>
            file.log10aT[file.temperaturesC.findIndex((t) => Math.abs(t - cv.temperature) < 0.01)],
        ),
      );
      summary = `${s.curves.length} isotherms (${shifted.length} shifted), max |Δlog10 aT| ${f(err, 4)}; ${countCodes(s.warnings.map((w) => w.code))}`;
    }
    console.log(
      `${c.label.padEnd(24)} whole process ${f(ts.seconds)} s, peak ${f(ts.peakMB, 0)} MB${extra.length ? ` (${extra.join(' ')})` : ''}; ${summary}`,
    );
    const s = stages(path, file.text, extra.length === 0);
    console.log(
      `${''.padEnd(24)} in process: import ${f(s.importS, 2)} s, shift stage ${f(s.shiftS, 2)} s, models ${f(s.modelsS, 2)} s, Prony+indicators ${f(s.spectrumS, 2)} s; engine alone ${f(s.engineS, 2)} s`,
    );
  }
}

/** Engine time against isotherms (100 points each) and against points (20 isotherms), in process. */
function growth(): void {
  const engineSeconds = (n: number, p: number): number => {
    const c: VsCase = {
      label: '',
      isotherms: n,
      points: p,
      law: ARRHENIUS,
      spectrum: 'bsw',
      expansionPerK: EXPANSION,
      descending: true,
      seed: 7,
    };
    const { dataset } = importFiles([{ name: 'growth.csv', text: vsFile(c).text }]);
    const options = {
      referenceK: REFERENCE_C + 273.15,
      vertical: 'density' as const,
      density: {
        kind: 'expansion' as const,
        referenceDensityKgPerM3: DENSITY,
        volumetricExpansionPerK: EXPANSION,
      },
    };
    shiftIsotherms(dataset, options);
    // CPU time of this process: less disturbed than wall time by other jobs on the machine.
    const c0 = process.cpuUsage();
    shiftIsotherms(dataset, options);
    const c1 = process.cpuUsage(c0);
    return (c1.user + c1.system) / 1e6;
  };
  const report = (
    label: string,
    sizes: [number, number][],
    key: (s: [number, number]) => number,
  ) => {
    let prev: { x: number; t: number } | null = null;
    const parts: string[] = [];
    for (const s of sizes) {
      const t = engineSeconds(s[0], s[1]);
      const x = key(s);
      const exponent = prev ? Math.log(t / prev.t) / Math.log(x / prev.x) : NaN;
      parts.push(`${s[0]}×${s[1]} ${f(t, 3)} s${prev ? ` (exponent ${f(exponent, 2)})` : ''}`);
      prev = { x, t };
    }
    console.log(`${label}: ${parts.join('; ')}`);
  };
  console.log('\nEngine CPU time growth (time ∝ size^exponent between neighbouring sizes):');
  report(
    'isotherms',
    [
      [50, 100],
      [100, 100],
      [200, 100],
      [400, 100],
      [800, 100],
      [1600, 100],
    ],
    (s) => s[0],
  );
  report(
    'points',
    [
      [20, 100],
      [20, 400],
      [20, 1600],
      [20, 6400],
    ],
    (s) => s[1],
  );
}
