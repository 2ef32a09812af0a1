/**
 * The output set of `build --out` / `batch --out` is replaced as a whole: a failed write (file
 * size limit, kill -9 at any moment) leaves the earlier set byte-identical, and no partial or
 * stale files remain.
 */
import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { EXIT } from '../../app/cli/exit-codes';
import { MANIFEST_NAME, recoverOutputSet } from '../../app/cli/io/output-set';
import { ROOT, runCli, tempDir, writeSyntheticSample } from './cli-helpers';

let dir: string;
let data: string;

beforeAll(() => {
  dir = tempDir('thermoshift-output-set-');
  data = join(dir, 'data');
  writeSyntheticSample(data);
});

/** Every file under `root` with its SHA-256, by relative path. */
function snapshot(root: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (d: string, rel: string): void => {
    for (const n of readdirSync(d).sort()) {
      const p = join(d, n);
      if (statSync(p).isDirectory()) walk(p, `${rel}${n}/`);
      else out[`${rel}${n}`] = createHash('sha256').update(readFileSync(p)).digest('hex');
    }
  };
  walk(root, '');
  return out;
}

const args = (out: string, tref: string, extra: string[] = []): string[] => [
  'build',
  data,
  '--tref',
  tref,
  '--out',
  out,
  '--date',
  '2026-12-01',
  '--quiet',
  '--force',
  ...extra,
];

/** Hidden staging or set-aside folders left beside `out`. */
const leftovers = (out: string): string[] =>
  readdirSync(dirname(out)).filter((n) => n.startsWith('.') && n.includes('thermoshift'));

describe('output sets', () => {
  it('--force with fewer outputs than last time leaves no stale file; the manifest lists the set', () => {
    const out = join(dir, 'fewer');
    expect(runCli(args(out, '100')).status).toBe(EXIT.ok);
    expect(existsSync(join(out, 'prony-terms.csv'))).toBe(true);
    const r = runCli(args(out, '90', ['--modes-per-decade', '0']));
    expect(r.status, r.stderr).toBe(EXIT.ok);
    expect(existsSync(join(out, 'prony-terms.csv'))).toBe(false);
    const manifest = JSON.parse(readFileSync(join(out, MANIFEST_NAME), 'utf8')) as {
      files: { name: string; sha256: string }[];
    };
    const files = snapshot(out);
    delete files[MANIFEST_NAME];
    expect(Object.fromEntries(manifest.files.map((f) => [f.name, f.sha256]))).toEqual(files);
    expect(leftovers(out)).toEqual([]);
  });

  it('a write that hits the file size limit exits 3 and leaves the earlier set byte-identical', () => {
    const out = join(dir, 'limited');
    expect(runCli(args(out, '100')).status).toBe(EXIT.ok);
    const before = snapshot(out);
    // ulimit -f counts 1024-byte blocks: 64 KB holds the tables but not report.html. SIGXFSZ is
    // ignored so the write fails with EFBIG, as on a full disk, instead of killing the process.
    const script = `trap '' XFSZ; ulimit -f 64; exec "$0" "$@"`;
    const r = spawnSync(
      'bash',
      ['-c', script, process.execPath, join(ROOT, 'bin/thermoshift.mjs'), ...args(out, '80')],
      { encoding: 'utf8', timeout: 60_000 },
    );
    expect(r.status, r.stderr).toBe(EXIT.outputError);
    expect(r.stderr).toMatch(/cannot write the output set .*earlier results are unchanged/);
    expect(snapshot(out)).toEqual(before);
    expect(leftovers(out)).toEqual([]);
  });

  it('kill -9 at random moments leaves either the old set or the new set, byte-identical', async () => {
    const out = join(dir, 'killed');
    const states: Record<string, Record<string, string>> = {};
    for (const tref of ['90', '100']) {
      const once = join(dir, `reference-${tref}`);
      expect(runCli(args(once, tref)).status).toBe(EXIT.ok);
      states[tref] = snapshot(once);
    }
    expect(runCli(args(out, '90')).status).toBe(EXIT.ok);
    // seeded delays (a linear congruential generator), spread over start-up, analysis and writing
    let seed = 20261202;
    const next = (): number => {
      seed = (seed * 1664525 + 1013904223) >>> 0;
      return seed / 4294967296;
    };
    const seen = new Set<string>();
    for (let k = 0; k < 12; k++) {
      const tref = k % 2 === 0 ? '100' : '90';
      const child = spawn(
        process.execPath,
        [join(ROOT, 'bin/thermoshift.mjs'), ...args(out, tref)],
        {
          stdio: 'ignore',
        },
      );
      const delay = 100 + next() * 1400;
      const exited = new Promise<void>((done) => child.on('exit', () => done()));
      const timer = setTimeout(() => child.kill('SIGKILL'), delay);
      await exited;
      clearTimeout(timer);
      // the next write repairs an interrupted swap first; the check does the same
      recoverOutputSet(out);
      const now = snapshot(out);
      const which = Object.keys(states).find(
        (t) => JSON.stringify(states[t]) === JSON.stringify(now),
      );
      expect(which, `after a kill at ${delay.toFixed(0)} ms`).toBeDefined();
      seen.add(which!);
      expect(leftovers(out)).toEqual([]);
    }
    // both sets turn up: some kills came before the swap, some runs finished
    expect(seen.size).toBe(2);
  }, 180_000);
});
