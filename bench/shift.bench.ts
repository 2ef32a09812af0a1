/**
 * Shift engine speed: `npm run bench -- shift`. Invented synthetic sets (core/synthetic) with
 * isotherms × points per isotherm of 10×16, 50×100 and 200×2000, G' and G'' driving; then the live
 * re-fit of the desktop app: one curve locked at a new shift, warm start from the previous result,
 * on 15 isotherms. Targets on one core: 5 ms, 100 ms, 1 s; re-fit 16 ms. Prints wall time
 * (median after warm-up calls, bench/timing.ts) and CPU time per call, which is less disturbed
 * by other load on a shared machine, and the largest error of log10 aT against the known truth;
 * the very first call of a fresh process (which also compiles the code) is printed on its own.
 */
import { shiftIsotherms } from '../core/shift/index.ts';
import type { ShiftOptions } from '../core/shift/index.ts';
import { smoothProny, syntheticIsotherms } from '../core/synthetic/index.ts';
import { medianMs } from './timing.ts';

/** Power-law melt spectrum wide enough for every reduced window used below (invented). */
const spectrum = smoothProny({
  tauMinS: 1e-40,
  tauMaxS: 1e12,
  modesPerDecade: 1,
  glassyModulusPa: 1e9,
  equilibriumModulusPa: 0,
  slope: 0.5,
});

/** About 0.25 decades of shift between neighbouring isotherms, 2 K apart (invented law). */
function synthetic(isotherms: number, points: number) {
  const decades = 3;
  return syntheticIsotherms({
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: 450,
    temperaturesK: Array.from(
      { length: isotherms },
      (_, i) => 450 + 2 * (i - Math.floor(isotherms / 2)),
    ),
    components: [{ prony: spectrum, law: { kind: 'arrhenius', activationEnergyJPerMol: 4.8e5 } }],
    xMin: 0.1,
    xMax: 0.1 * 10 ** decades,
    pointsPerDecade: (points - 1) / decades,
    relativeNoise: 0.02,
    seed: 1,
    name: 'invented benchmark melt',
  });
}

const dataset = (isotherms: number, points: number) => synthetic(isotherms, points).dataset;

/** CPU time per call (user + system), ms: less sensitive than wall time to other load. */
function cpuMs(fn: () => unknown, repeats: number): number {
  const c0 = process.cpuUsage();
  for (let i = 0; i < repeats; i++) fn();
  const c = process.cpuUsage(c0);
  return (c.user + c.system) / 1000 / repeats;
}

interface Figures {
  wallMs: number;
  cpuMs: number;
  error: number;
}

/** Median wall and CPU time per call of one configuration (after warm-up) and its accuracy. */
function measure(
  d: ReturnType<typeof synthetic>,
  options: Partial<ShiftOptions>,
  repeats: number,
  warmup: number,
): Figures {
  const run = () => shiftIsotherms(d.dataset, { referenceK: 450, ...options });
  const wallMs = medianMs(run, repeats, warmup);
  const cpu = cpuMs(run, repeats);
  const r = run();
  const error = r.curves.reduce(
    (m, c, k) => Math.max(m, Math.abs((c.log10aT ?? NaN) - d.truth.log10aT[k])),
    0,
  );
  return { wallMs, cpuMs: cpu, error };
}

function line(label: string, n: number, p: number, f: Figures, target: number): string {
  return `${label.padEnd(26)} ${String(n).padStart(3)}×${String(p).padEnd(5)} wall ${f.wallMs.toFixed(1).padStart(7)} ms, cpu ${f.cpuMs.toFixed(1).padStart(7)} ms (target ≤ ${target} ms); max |Δlog10 aT| ${f.error.toFixed(4)}`;
}

export async function run(): Promise<void> {
  // [isotherms, points, target ms, repeats, warm-up calls]: small calls need many warm-up calls
  // before the JIT has optimised the hot loops (a long-running app is in that state).
  const sizes: [number, number, number, number, number][] = [
    [10, 16, 5, 41, 100],
    [50, 100, 100, 9, 4],
    [200, 2000, 1000, 3, 1],
  ];
  const modes = [
    ['full (with checks)', {}],
    ['fit only (checks: false)', { checks: false }],
  ] as const;
  const rows = new Map<string, { n: number; p: number; target: number; f: Figures }[]>();
  for (const [n, p, target, repeats, warmup] of sizes) {
    const d = synthetic(n, p);
    // The first call in a fresh process also compiles the code (JIT): reported on its own.
    const t0 = performance.now();
    shiftIsotherms(d.dataset, { referenceK: 450 });
    const cold = performance.now() - t0;
    console.log(
      `${'first call, cold'.padEnd(26)} ${String(n).padStart(3)}×${String(p).padEnd(5)} wall ${cold.toFixed(1).padStart(7)} ms`,
    );
    for (const [label, options] of modes) {
      const f = measure(d, options, repeats, warmup);
      if (!rows.has(label)) rows.set(label, []);
      rows.get(label)!.push({ n, p, target, f });
    }
  }
  for (const [label, list] of rows) {
    list.forEach((row, i) => {
      console.log(line(label, row.n, row.p, row.f, row.target));
      if (i > 0) {
        const prev = list[i - 1];
        console.log(
          `${''.padEnd(26)} growth: ${(row.f.cpuMs / prev.f.cpuMs).toFixed(1)}× cpu time for ${((row.n * row.p) / (prev.n * prev.p)).toFixed(0)}× points`,
        );
      }
    });
  }
  // Live re-fit: lock one curve at a new shift, warm start from the previous result.
  const d = dataset(15, 16);
  const first = shiftIsotherms(d, { referenceK: 450 });
  const initial = Object.fromEntries(first.curves.map((c) => [c.id, c.log10aT ?? 0]));
  const dragged = { id: d.isotherms[3].id, log10aT: (first.curves[3].log10aT ?? 0) + 0.1 };
  for (const [label, checks] of [
    ['re-fit, warm, with checks', true],
    ['re-fit, warm, no checks', false],
  ] as const) {
    const ms = medianMs(
      () =>
        shiftIsotherms(d, { referenceK: 450, locked: [dragged], initialLog10aT: initial, checks }),
      21,
      3,
    );
    console.log(`${label.padEnd(26)}  15×16     ${ms.toFixed(1).padStart(8)} ms  (target ≤ 16 ms)`);
  }
}
