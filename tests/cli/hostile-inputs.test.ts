/**
 * Hostile and careless inputs through the command line: every case ends with a clear message
 * naming the file (exit 1, 2 or 3) or a correct result, never exit 70 and never a hang. Each test
 * is one kind of input found by trying the CLI as a careless user would.
 */
import { execFileSync } from 'node:child_process';
import {
  copyFileSync,
  existsSync,
  mkdirSync,
  readdirSync,
  readFileSync,
  symlinkSync,
  writeFileSync,
} from 'node:fs';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { EXIT } from '../../app/cli/exit-codes';
import { runCli, tempDir, writeSyntheticSample } from './cli-helpers';

let dir: string;
let data: string;

beforeAll(() => {
  dir = tempDir('thermoshift-hostile-');
  data = join(dir, 'data');
  writeSyntheticSample(data);
});

const csvRowCount = (path: string): number =>
  readFileSync(path, 'utf8')
    .split('\n')
    .filter((l) => l && !l.startsWith('#')).length - 1;

describe('thermoshift with hostile inputs', () => {
  it('build --out writes every file on 126,000 points (9 isotherms × 4700 points per decade)', () => {
    const big = join(dir, 'big');
    writeSyntheticSample(big, { pointsPerDecade: 4700 });
    const out = join(dir, 'big-out');
    const r = runCli(['build', big, '--tref', '100', '--out', out, '--quiet']);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    expect(csvRowCount(join(out, 'master-curve.csv'))).toBeGreaterThan(1000);
  });

  it('build --out on two identical isotherms (one file copied under another temperature) exits 0', () => {
    const twin = join(dir, 'twin');
    mkdirSync(twin);
    const first = readdirSync(data).sort()[0];
    const text = readFileSync(join(data, first), 'utf8');
    writeFileSync(join(twin, 'a_80C.csv'), text);
    writeFileSync(join(twin, 'b_90C.csv'), text);
    const r = runCli(['build', twin, '--out', join(dir, 'twin-out'), '--quiet']);
    expect(r.stderr).not.toMatch(/unexpected error/);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    const summary = JSON.parse(readFileSync(join(dir, 'twin-out', 'summary.json'), 'utf8')) as {
      curves: { log10aT: number }[];
    };
    // identical data: the shift between them is zero; 0.001 decades is far below any real
    // scatter and only allows for the optimiser's stopping tolerance (chosen here)
    expect(summary.curves).toHaveLength(2);
    expect(Math.abs(summary.curves[0].log10aT - summary.curves[1].log10aT)).toBeLessThan(1e-3);
  });

  it('--mask with rows beyond the file is refused with the valid range (command line and settings file)', () => {
    const file = readdirSync(data).sort()[0];
    const r = runCli(['build', data, '--mask', `${file}:1-4294967296`]);
    expect(r.status).toBe(EXIT.usage);
    expect(r.stderr).toMatch(/outside the rows of .* that hold data \(1-\d+\)/);
    const settings = join(dir, 'huge-mask.json');
    writeFileSync(settings, JSON.stringify({ mask: [`${file}:2-900000000`] }));
    const s = runCli(['build', data, '--settings', settings]);
    expect(s.status).toBe(EXIT.usage);
    expect(s.stderr).toMatch(/outside the rows/);
  });

  it('--date 2025-13-45, --tref 1e20 and absurd numbers are refused with the valid range', () => {
    const cases: [string[], RegExp][] = [
      [['--date', '2025-13-45'], /calendar date from 1900-01-01 to 9999-12-31/],
      [['--date', '2025-02-30'], /calendar date/],
      [['--tref', '1e20'], /outside the valid range \(above -273.15 °C, at most 1000 °C\)/],
      [['--tref', '-300'], /--tref: "-300"/],
      [['--tg', '5000K'], /outside the valid range/],
      [['--group-tolerance', '1e300'], /--group-tolerance: .*valid range \(0 to 1000\)/],
      [['--density', '1e9'], /--density: .*valid range/],
    ];
    for (const [args, message] of cases) {
      const r = runCli(['build', data, ...args]);
      expect(r.status, args.join(' ')).toBe(EXIT.usage);
      expect(r.stderr, args.join(' ')).toMatch(message);
    }
  });

  it('a file with no temperature: the hint names --file-temperature, which build has', () => {
    const plain = join(dir, 'plain');
    mkdirSync(plain);
    const first = readdirSync(data).sort()[0];
    writeFileSync(join(plain, 'run.csv'), readFileSync(join(data, first), 'utf8'));
    const r = runCli(['build', join(plain, 'run.csv')]);
    expect(r.status).toBe(EXIT.dataError);
    expect(r.stderr).toMatch(/--file-temperature/);
    const ok = runCli(['build', join(plain, 'run.csv'), '--file-temperature', 'run.csv=70C']);
    expect(ok.status, ok.stderr).toBe(EXIT.ok);
    expect(ok.stdout).toMatch(/Tref = 70 °C/);
  });

  it('a run in which nothing could be shifted exits 1 and says why', () => {
    // two isotherms whose moduli are four decades apart: they overlap nowhere
    const apart = join(dir, 'apart');
    mkdirSync(apart);
    const rows = (scale: number): string =>
      Array.from({ length: 12 }, (_, i) => {
        const w = 10 ** (-1 + (3 * i) / 11);
        return `${w},${scale * (1 + i * 0.1)},${scale * 0.5 * (1 + i * 0.1)}`;
      }).join('\n');
    writeFileSync(join(apart, 'p_20C.csv'), `omega (rad/s),G' (Pa),G'' (Pa)\n${rows(1e3)}\n`);
    writeFileSync(join(apart, 'p_80C.csv'), `omega (rad/s),G' (Pa),G'' (Pa)\n${rows(1e8)}\n`);
    const r = runCli(['build', apart, '--out', join(dir, 'apart-out')]);
    expect(r.status, r.stderr).toBe(EXIT.dataError);
    expect(r.stderr).toMatch(
      /nothing could be shifted: 0 of 2 isotherms .*overlaps no other isotherm/,
    );
    expect(existsSync(join(dir, 'apart-out'))).toBe(false);
  });

  it('a named pipe or /dev/zero given as a file is refused by name without opening it', () => {
    const fifo = join(dir, 'pipe.csv');
    execFileSync('mkfifo', [fifo]);
    const p = runCli(['build', fifo]);
    expect(p.status).toBe(EXIT.dataError);
    expect(p.stderr).toMatch(/pipe\.csv: a named pipe; only regular files are read/);
    const z = runCli(['inspect', '/dev/zero']);
    expect(z.status).toBe(EXIT.dataError);
    expect(z.stderr).toMatch(/\/dev\/zero: a character device/);
  });

  it('batch over a folder holding a pipe, a broken link and a link loop skips them with the reason', () => {
    const lab = join(dir, 'lab');
    mkdirSync(lab);
    writeSyntheticSample(join(lab, 'good'));
    execFileSync('mkfifo', [join(lab, 'stuck.csv')]);
    symlinkSync(join(dir, 'nowhere.csv'), join(lab, 'broken.csv'));
    symlinkSync(join(lab, 'loop.csv'), join(lab, 'loop.csv'));
    const r = runCli([
      'batch',
      '--samples-in',
      lab,
      '--out',
      join(dir, 'lab-out'),
      '--tref',
      '100',
    ]);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    expect(r.stderr).toMatch(/skipped .*stuck\.csv: not a regular file/);
    expect(r.stderr).toMatch(/skipped .*broken\.csv: a broken symbolic link/);
    expect(r.stderr).toMatch(/skipped .*loop\.csv: a symbolic link loop/);
    expect(r.stderr).toMatch(/1 of 1 samples done/);
  });

  it('inspect and build read the same files of a folder: links followed once, .asc and .prn read', () => {
    const mixed = join(dir, 'mixed');
    mkdirSync(mixed);
    const names = readdirSync(data).sort();
    copyFileSync(join(data, names[0]), join(mixed, names[0].replace('.csv', '.asc')));
    copyFileSync(join(data, names[1]), join(mixed, names[1].replace('.csv', '.prn')));
    symlinkSync(join(data, names[2]), join(mixed, names[2]));
    symlinkSync(join(mixed, names[2]), join(mixed, `again-${names[2]}`)); // same file twice
    writeFileSync(join(mixed, 'notes.md'), 'lab notes');
    const ins = runCli(['inspect', mixed, '--json']);
    expect(ins.status, ins.stderr).toBe(EXIT.ok);
    const isotherms = (JSON.parse(ins.stdout) as { isotherms: unknown[] }).isotherms.length;
    expect(isotherms).toBe(3);
    expect(ins.stderr).toMatch(/skipped .*notes\.md: not a data file ending/);
    const b = runCli(['build', mixed, '--json']);
    expect(b.status, b.stderr).toBe(EXIT.ok);
    expect((JSON.parse(b.stdout) as { curves: unknown[] }).curves).toHaveLength(isotherms);
    expect(b.stderr).toMatch(/skipped .*notes\.md: not a data file ending/);
  });

  it('batch output names never collide: "x y", "x_y", "x_y-2" get three folders and three index rows', () => {
    const names = join(dir, 'names');
    mkdirSync(names);
    const first = readdirSync(data).sort();
    const sample = (k: number): string => readFileSync(join(data, first[k]), 'utf8');
    // each file is a one-isotherm sample named after its file
    writeFileSync(join(names, 'x y_70C.csv'), sample(0));
    writeFileSync(join(names, 'x_y_70C.csv'), sample(1));
    writeFileSync(join(names, 'x_y_70C-2.csv'), sample(2));
    const out = join(dir, 'names-out');
    const r = runCli(['batch', '--samples-in', names, '--out', out, '--force']);
    expect(r.status, r.stderr).toBe(EXIT.ok);
    const folders = readdirSync(out).filter((n) => !n.includes('.'));
    expect(folders).toHaveLength(3);
    expect(new Set(folders.map((f) => f.toLowerCase())).size).toBe(3);
    const index = readFileSync(join(out, 'index.csv'), 'utf8')
      .split('\n')
      .filter((l) => l && !l.startsWith('#'));
    expect(index).toHaveLength(1 + 3);
  });

  it('--out inside the input folder: the next build of that folder skips the outputs with the reason', () => {
    const lab = join(dir, 'inside');
    writeSyntheticSample(lab);
    const first = runCli(['build', lab, '--tref', '100', '--out', join(lab, 'results'), '--quiet']);
    expect(first.status, first.stderr).toBe(EXIT.ok);
    // a user copies a result table into the data folder
    copyFileSync(join(lab, 'results', 'shift-factors.csv'), join(lab, 'shift-factors.csv'));
    const again = runCli(['build', lab, '--tref', '100', '--json']);
    expect(again.status, again.stderr).toBe(EXIT.ok);
    expect(again.stderr).toMatch(/skipped .*shift-factors\.csv: written by Thermoshift/);
    expect((JSON.parse(again.stdout) as { curves: unknown[] }).curves).toHaveLength(9);
    // --out naming the data folder itself is refused: it is not a Thermoshift output set
    const into = runCli(['build', lab, '--tref', '100', '--out', lab]);
    expect(into.status).toBe(EXIT.outputError);
    expect(into.stderr).toMatch(/non-empty folder that Thermoshift did not write/);
  });
});
