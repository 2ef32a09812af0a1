/**
 * Fuzz harness for the command line: `npm run fuzz -- --minutes N [--seed S] [--out DIR]`.
 * Not part of CI or `npm test`. Each case copies one sample of samples/ into a temporary folder,
 * applies 1–3 seeded random mutations to one of its data files (byte flips, deleted lines,
 * swapped columns, junk cells, truncation, huge or absurd numbers) and runs the bundled CLI:
 * `inspect DIR --json` and `build DIR --out OUT --json`. It counts
 *   - internal errors (exit 70),
 *   - hangs (no exit within 30 s),
 *   - silent nonsense (exit 0 with a missing or non-finite shift factor or standard error on an
 *     included curve — JSON writes NaN as null — or no included curve at all),
 * and saves each finding (the mutated files, the command, its output) into DIR (default
 * test-results/fuzz/). Copy a finding into tests/fixtures/fuzz-findings/ to make it a regression
 * test (tests/cli/fuzz-findings.test.ts runs every folder there).
 */
import {
  cpSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { judge, runCli } from './fuzz-judge.ts';

const ROOT = fileURLToPath(new URL('..', import.meta.url));
const BIN = join(ROOT, 'bin/thermoshift.mjs');

function arg(name: string, fallback: string): string {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 && process.argv[i + 1] ? process.argv[i + 1] : fallback;
}

/** mulberry32: a small seeded generator, so a case can be replayed from its seed. */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Rand = () => number;
const pick = <T>(r: Rand, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)];

const JUNK = [
  '',
  'NaN',
  '-',
  'n/a',
  '1e-300',
  '1e308',
  '9.9e37',
  '-1e300',
  'x',
  '0',
  '-0',
  '1,5e3',
];

/** Each mutation takes the file's bytes and returns new bytes and a one-line description. */
const MUTATIONS: ((b: Buffer, r: Rand) => [Buffer, string])[] = [
  (b, r) => {
    const out = Buffer.from(b);
    const n = 1 + Math.floor(r() * 8);
    for (let k = 0; k < n && out.length; k++) out[Math.floor(r() * out.length)] ^= 1 << (r() * 8);
    return [out, `flip ${n} bits`];
  },
  (b, r) => {
    const lines = b.toString('utf8').split('\n');
    const i = Math.floor(r() * lines.length);
    const n = 1 + Math.floor(r() * 5);
    lines.splice(i, n);
    return [Buffer.from(lines.join('\n')), `delete lines ${i + 1}-${i + n}`];
  },
  (b, r) => {
    const text = b.toString('utf8');
    const sep = text.includes('\t') ? '\t' : text.includes(';') ? ';' : ',';
    const lines = text.split('\n').map((l) => l.split(sep));
    let width = 1;
    for (const l of lines.slice(0, 50)) width = Math.max(width, l.length);
    const a = Math.floor(r() * width);
    const c = Math.floor(r() * width);
    for (const l of lines) if (l.length > Math.max(a, c)) [l[a], l[c]] = [l[c], l[a]];
    return [
      Buffer.from(lines.map((l) => l.join(sep)).join('\n')),
      `swap columns ${a + 1},${c + 1}`,
    ];
  },
  (b, r) => {
    const text = b.toString('utf8');
    const sep = text.includes('\t') ? '\t' : text.includes(';') ? ';' : ',';
    const lines = text.split('\n');
    const i = Math.floor(r() * lines.length);
    const cells = lines[i].split(sep);
    const j = Math.floor(r() * cells.length);
    const junk = pick(r, JUNK);
    cells[j] = junk;
    lines[i] = cells.join(sep);
    return [Buffer.from(lines.join('\n')), `cell line ${i + 1} column ${j + 1} = "${junk}"`];
  },
  (b, r) => {
    const at = Math.floor(r() * b.length);
    return [b.subarray(0, at), `truncate at byte ${at}`];
  },
  (b, r) => {
    const text = b.toString('utf8');
    const exp = pick(r, [30, 100, 300, 308, -300, -100]);
    let count = 0;
    const out = text.replace(/\d+\.\d+/g, (m) => (r() < 0.05 && ++count ? `${m}e${exp}` : m));
    return [Buffer.from(out), `${count} numbers × 1e${exp}`];
  },
];

interface Sample {
  name: string;
  folder: string;
  files: string[];
}

function samples(): Sample[] {
  const root = join(ROOT, 'samples');
  return readdirSync(root, { withFileTypes: true })
    .filter((d) => d.isDirectory())
    .map((d) => {
      const folder = join(root, d.name);
      const files = readdirSync(folder).filter((f) => /\.(csv|tsv|txt|dat)$/i.test(f));
      return { name: d.name, folder, files };
    })
    .filter((s) => s.files.length > 0);
}

function main(): void {
  const minutes = Number(arg('minutes', '1'));
  const seed0 = Number(arg('seed', String(Date.now() % 1_000_000)));
  const outDir = join(ROOT, arg('out', 'test-results/fuzz'));
  const all = samples();
  const counts = {
    cases: 0,
    runs: 0,
    internal: 0,
    hang: 0,
    nonsense: 0,
    exit: {} as Record<string, number>,
  };
  const end = Date.now() + minutes * 60_000;
  console.log(
    `fuzz: ${minutes} min, first seed ${seed0}, samples: ${all.map((s) => s.name).join(', ')}`,
  );
  for (let seed = seed0; Date.now() < end; seed++) {
    const r = rng(seed);
    const sample = pick(r, all);
    const work = mkdtempSync(join(tmpdir(), 'thermoshift-fuzz-'));
    try {
      const data = join(work, 'data');
      mkdirSync(data);
      for (const f of sample.files) cpSync(join(sample.folder, f), join(data, f));
      const target = pick(r, sample.files);
      let bytes: Buffer = readFileSync(join(data, target));
      const applied: string[] = [];
      const n = 1 + Math.floor(r() * 3);
      for (let k = 0; k < n; k++) {
        const [next, what] = pick(r, MUTATIONS)(bytes, r);
        bytes = next;
        applied.push(what);
      }
      writeFileSync(join(data, target), bytes);
      counts.cases++;
      for (const command of ['inspect', 'build']) {
        const args =
          command === 'inspect'
            ? ['inspect', data, '--json']
            : [
                'build',
                data,
                '--out',
                join(work, 'out'),
                '--json',
                '--quiet',
                '--date',
                '2026-12-01',
              ];
        const res = runCli(BIN, args);
        counts.runs++;
        const code = res.hung ? 'hang' : String(res.status);
        counts.exit[`${command} ${code}`] = (counts.exit[`${command} ${code}`] ?? 0) + 1;
        const verdict = judge(command, res);
        if (!verdict) continue;
        counts[verdict]++;
        const finding = join(outDir, `${verdict}-${command}-seed${seed}`);
        mkdirSync(finding, { recursive: true });
        cpSync(data, join(finding, 'data'), { recursive: true });
        writeFileSync(
          join(finding, 'finding.json'),
          `${JSON.stringify({ verdict, command, seed, sample: sample.name, file: target, mutations: applied, status: res.status, stderr: res.stderr.slice(0, 4000), stdout: res.stdout.slice(0, 4000) }, null, 2)}\n`,
        );
        console.log(
          `finding: ${verdict} in ${command}, seed ${seed} (${sample.name}/${target}: ${applied.join('; ')})`,
        );
      }
    } finally {
      rmSync(work, { recursive: true, force: true });
    }
  }
  console.log(
    `fuzz: ${counts.cases} cases, ${counts.runs} runs: ${counts.internal} exit 70, ${counts.hang} hangs, ${counts.nonsense} silent nonsense`,
  );
  console.log(`exit codes: ${JSON.stringify(counts.exit)}`);
  if (counts.internal + counts.hang + counts.nonsense > 0) {
    console.log(`findings saved in ${outDir}`);
    process.exitCode = 1;
  }
}

main();
