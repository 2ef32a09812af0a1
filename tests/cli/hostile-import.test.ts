/**
 * Hostile and odd input files through the command line (import side): encodings, Fortran
 * exponents, thousands separators, one-quantity files, absurd cells and sentinels. Every file is
 * generated here from a closed form (a one-mode Maxwell melt shifted by the WLF equation), so the
 * true shift factors are known.
 */
import { describe, it, expect } from 'vitest';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { runCli, tempDir } from './cli-helpers';

/**
 * WLF constants of the generated data: the "universal" values C1 = 17.44, C2 = 51.6 K about Tg
 * re-expressed about a higher reference, C1 = 8.86, C2 = 101.6 K (Williams, Landel & Ferry 1955,
 * J. Am. Chem. Soc. 77, 3701).
 */
const C1 = 8.86;
const C2 = 101.6;
const TREF_C = 20;
const TEMPS_C = [0, 20, 40, 60];

const log10aT = (tC: number): number => (-C1 * (tC - TREF_C)) / (C2 + tC - TREF_C);

interface Row {
  tC: number;
  fHz: number;
  gp: number;
  gpp: number;
}

/** Twelve frequencies per isotherm, 0.01…100 Hz; one Maxwell mode (1 MPa, 1 s) plus 1 kPa. */
function melt(): Row[] {
  const rows: Row[] = [];
  for (const tC of TEMPS_C)
    for (let k = 0; k < 12; k++) {
      const fHz = 10 ** (-2 + (4 * k) / 11);
      const w = 2 * Math.PI * fHz * 10 ** log10aT(tC);
      rows.push({
        tC,
        fHz,
        gp: (1e6 * w * w) / (1 + w * w) + 1e3,
        gpp: (1e6 * w) / (1 + w * w) + 1e3,
      });
    }
  return rows;
}

function csv(rows: Row[], cell: (r: Row, i: number) => string[], header: string): string {
  return `${header}\n${rows.map((r, i) => cell(r, i).join(',')).join('\n')}\n`;
}

function write(dir: string, name: string, content: string | Uint8Array): string {
  const p = join(dir, name);
  writeFileSync(p, content);
  return p;
}

interface Inspection {
  files: { file: string; encoding: string; usedRows: number; dataRows: number }[];
  warnings: { file: string; row: number; column: number; message: string }[];
  isotherms: { temperatureC: number; points: number }[];
}

interface Summary {
  shiftQuantities: string[];
  curves?: unknown;
}

const plain = (r: Row): string[] => [
  r.tC.toFixed(1),
  r.fHz.toPrecision(6),
  r.gp.toPrecision(6),
  r.gpp.toPrecision(6),
];

/** The shifts printed by `build` (text summary), by isotherm temperature in °C. */
function shifts(stdout: string): Map<number, number> {
  const out = new Map<number, number>();
  for (const m of stdout.matchAll(/(-?\d+\.\d+) °C {2}log10 aT = (-?\d+\.\d+)/g))
    out.set(Number(m[1]), Number(m[2]));
  return out;
}

function expectWlfShifts(stdout: string): void {
  const s = shifts(stdout);
  expect(s.size).toBe(TEMPS_C.length);
  // Noise-free data: 0.02 decades covers the interpolation error of 12 points per isotherm.
  for (const tC of TEMPS_C) expect(Math.abs(s.get(tC)! - log10aT(tC))).toBeLessThan(0.02);
}

describe('thermoshift inspect/build on hostile files', () => {
  it('thermoshift reads a Windows-1252 file ("°C" as byte 0xB0) the same in inspect and build', () => {
    const dir = tempDir();
    const text = csv(melt(), plain, "T (°C),f (Hz),G' (Pa),G'' (Pa)");
    const bytes = Uint8Array.from(text, (ch) => ch.charCodeAt(0)); // every character is < 0x100
    expect(bytes.includes(0xb0)).toBe(true);
    const file = write(dir, 'latin1.csv', bytes);
    const ins = runCli(['inspect', file, '--json']);
    expect(ins.status).toBe(0);
    const j = JSON.parse(ins.stdout) as Inspection;
    expect(j.files[0].encoding).toBe('windows-1252');
    expect(runCli(['inspect', file]).stdout).toContain('windows-1252');
    const b = runCli(['build', file, '--tref', '20C']);
    expect(b.status).toBe(0);
    expectWlfShifts(b.stdout);
  });

  it('thermoshift reads UTF-16 LE and BE files with a byte-order mark in inspect and build', () => {
    const dir = tempDir();
    const text = csv(melt(), plain, "T (°C),f (Hz),G' (Pa),G'' (Pa)");
    const le = new Uint8Array(2 + text.length * 2);
    const be = new Uint8Array(2 + text.length * 2);
    le.set([0xff, 0xfe]);
    be.set([0xfe, 0xff]);
    for (let i = 0; i < text.length; i++) {
      const c = text.charCodeAt(i);
      le[2 + 2 * i] = c & 0xff;
      le[3 + 2 * i] = c >> 8;
      be[2 + 2 * i] = c >> 8;
      be[3 + 2 * i] = c & 0xff;
    }
    for (const [name, bytes, enc] of [
      ['le.csv', le, 'utf-16le (BOM)'],
      ['be.csv', be, 'utf-16be (BOM)'],
    ] as const) {
      const file = write(dir, name, bytes);
      const j = JSON.parse(runCli(['inspect', file, '--json']).stdout) as Inspection;
      expect(j.files[0].encoding).toBe(enc);
      const b = runCli(['build', file, '--tref', '20C']);
      expect(b.status, b.stderr).toBe(0);
      expectWlfShifts(b.stdout);
    }
  });

  it('thermoshift reads Fortran D exponents and unambiguous thousands separators', () => {
    const dir = tempDir();
    // Semicolon-separated so that "1,234.5"-style cells are one cell each.
    const text =
      "T (°C);f (Hz);G' (Pa);G'' (Pa)\n" +
      melt()
        .map((r) =>
          [
            r.tC.toFixed(1),
            r.fHz.toExponential(5).replace('e', 'D'),
            Number(r.gp.toFixed(1)).toLocaleString('en-US', { minimumFractionDigits: 1 }),
            r.gpp.toExponential(6).replace('e', 'd'),
          ].join(';'),
        )
        .join('\n');
    expect(text).toMatch(/\d,\d{3}\.\d/);
    const file = write(dir, 'fortran.txt', text);
    const b = runCli(['build', file, '--tref', '20C']);
    expect(b.status, b.stderr).toBe(0);
    expectWlfShifts(b.stdout);
  });

  it('thermoshift refuses an ambiguous thousands separator with a hint naming file, row and column', () => {
    const dir = tempDir();
    const rows = melt();
    const text =
      "T (°C);f (Hz);G' (Pa);G'' (Pa)\n" +
      rows
        .map((r, i) =>
          [
            r.tC.toFixed(1),
            r.fHz.toPrecision(6),
            i === 4 ? '1,234' : r.gp.toPrecision(6),
            r.gpp.toPrecision(6),
          ].join(';'),
        )
        .join('\n');
    const file = write(dir, 'ambiguous.txt', text);
    const j = JSON.parse(runCli(['inspect', file, '--json']).stdout) as Inspection;
    const w = j.warnings.find((x) => x.message.includes('thousands separator'));
    expect(w).toMatchObject({ file, row: 6, column: 3 });
  });

  it("thermoshift build shifts a G'-only file on G' and says so", () => {
    const dir = tempDir();
    const file = write(
      dir,
      'gp.csv',
      csv(
        melt(),
        (r) => [r.tC.toFixed(1), r.fHz.toPrecision(6), r.gp.toPrecision(6)],
        "T (°C),f (Hz),G' (Pa)",
      ),
    );
    const b = runCli(['build', file, '--tref', '20C']);
    expect(b.status, b.stderr).toBe(0);
    expect(b.stdout).toContain("shifted on G'\n");
    expectWlfShifts(b.stdout);
    const j = JSON.parse(runCli(['build', file, '--tref', '20C', '--json']).stdout) as Summary;
    expect(j.shiftQuantities).toEqual(['storageModulus']);
  });

  it("thermoshift build shifts an E''-only file on E''", () => {
    const dir = tempDir();
    const file = write(
      dir,
      'epp.csv',
      csv(
        melt(),
        (r) => [r.tC.toFixed(1), r.fHz.toPrecision(6), r.gpp.toPrecision(6)],
        "T (°C),f (Hz),E'' (Pa)",
      ),
    );
    const b = runCli(['build', file, '--tref', '20C']);
    expect(b.status, b.stderr).toBe(0);
    expect(b.stdout).toContain("shifted on E''\n");
    expectWlfShifts(b.stdout);
  });

  it('thermoshift build shifts a tan δ-only file on tan δ', () => {
    const dir = tempDir();
    const file = write(
      dir,
      'tand.csv',
      csv(
        melt(),
        (r) => [r.tC.toFixed(1), r.fHz.toPrecision(6), (r.gpp / r.gp).toPrecision(6)],
        'T (°C),f (Hz),tan δ',
      ),
    );
    const b = runCli(['build', file, '--tref', '20C']);
    expect(b.status, b.stderr).toBe(0);
    expect(b.stdout).toContain('shifted on tan δ\n');
    expectWlfShifts(b.stdout);
  });

  it.each([['1e-300'], ['1e308'], ['9.9e37'], ['-9.99e99']])(
    'thermoshift flags the absurd frequency cell %s by file, row and column and keeps the good points',
    (cell) => {
      const dir = tempDir();
      const rows = melt();
      const file = write(
        dir,
        'absurd.csv',
        csv(
          rows,
          (r, i) => (i === 7 ? [r.tC.toFixed(1), cell, ...plain(r).slice(2)] : plain(r)),
          "T (°C),f (Hz),G' (Pa),G'' (Pa)",
        ),
      );
      const j = JSON.parse(runCli(['inspect', file, '--json']).stdout) as Inspection;
      expect(j.warnings.map((w) => [w.row, w.column])).toEqual([[9, 2]]);
      expect(j.isotherms.reduce((s, g) => s + g.points, 0)).toBe(rows.length - 1);
      const b = runCli(['build', file, '--tref', '20C']);
      expect(b.status, b.stderr).toBe(0);
      expectWlfShifts(b.stdout);
    },
  );

  it('thermoshift flags a 9.9e37 sentinel in a modulus cell, not a good point', () => {
    const dir = tempDir();
    const rows = melt();
    const file = write(
      dir,
      'sentinel.csv',
      csv(
        rows,
        (r, i) => (i === 30 ? [...plain(r).slice(0, 2), '9.9e37', plain(r)[3]] : plain(r)),
        "T (°C),f (Hz),G' (Pa),G'' (Pa)",
      ),
    );
    const j = JSON.parse(runCli(['inspect', file, '--json']).stdout) as Inspection;
    expect(j.warnings).toHaveLength(1);
    expect(j.warnings[0]).toMatchObject({ file, row: 32, column: 3 });
    expect(j.warnings[0].message).toContain('placeholder');
    const b = runCli(['build', file, '--tref', '20C']);
    expect(b.status, b.stderr).toBe(0);
    expectWlfShifts(b.stdout);
  });
});

describe('thermoshift on big and odd files', () => {
  it('thermoshift inspect reads a file of several 4 MB pieces and names the right row of a late bad cell', () => {
    const dir = tempDir();
    const lines = ["T (°C),f (Hz),G' (Pa),G'' (Pa)"];
    const n = 200_000; // about 7 MB: two pieces of the chunked reader
    for (let i = 0; i < n; i++) {
      const tC = TEMPS_C[Math.floor((4 * i) / n)];
      const fHz = 10 ** (-2 + (4 * (i % (n / 4))) / (n / 4));
      lines.push(`${tC},${fHz.toPrecision(8)},${(1e5 + i).toFixed(2)},${(2e4 + i).toFixed(2)}`);
    }
    lines[190_000] = lines[190_000].replace(/,[^,]+$/, ',oops');
    const file = write(dir, 'long.csv', `${lines.join('\n')}\n`);
    const r = runCli(['inspect', file, '--json']);
    expect(r.status, r.stderr).toBe(0);
    const j = JSON.parse(r.stdout) as Inspection;
    expect(j.files[0].dataRows).toBe(n);
    expect(j.files[0].usedRows).toBe(n - 1);
    expect(j.warnings).toHaveLength(1);
    expect(j.warnings[0]).toMatchObject({ file, row: 190_001, column: 4 });
  });

  it('thermoshift build refuses a 20 MB file without line breaks by name, without a crash', () => {
    const dir = tempDir();
    const file = write(dir, 'oneline.csv', '1,'.repeat(10 << 20));
    const r = runCli(['build', file, '--tref', '20C']);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('oneline.csv');
    expect(r.stderr).not.toMatch(/unexpected error/);
  });
});

describe('thermoshift build with many temperatures', () => {
  it('thermoshift build shifts 10,000 temperatures of 3 points each (30,000 rows)', () => {
    const dir = tempDir();
    const lines = ["T (°C),f (Hz),G' (Pa),G'' (Pa)"];
    const temps: number[] = [];
    for (let i = 0; i < 10_000; i++) {
      const tC = -10 + i * 0.01;
      temps.push(tC);
      for (let k = 0; k < 3; k++) {
        const fHz = 10 ** (k * 0.5 - 1);
        const w = fHz * 10 ** log10aT(tC);
        lines.push(
          `${tC.toFixed(3)},${fHz.toPrecision(6)},${((1e6 * w * w) / (1 + w * w) + 1e3).toPrecision(6)},${((1e6 * w) / (1 + w * w) + 1e3).toPrecision(6)}`,
        );
      }
    }
    const file = write(dir, 't10k.csv', `${lines.join('\n')}\n`);
    const b = runCli(['build', file, '--tref', '20C', '--group-tolerance', '0.002']);
    expect(b.status, b.stderr).toBe(0);
    const s = shifts(b.stdout);
    expect(s.size).toBe(10_000);
    expect(b.stdout).not.toContain('not included');
    // 0.1 decades: the cold isotherms span one decade on the rubbery plateau, where three points
    // carry little shift information (measured worst case 0.06 decades near −9 °C).
    let worst = 0;
    for (const tC of temps)
      worst = Math.max(worst, Math.abs(s.get(Number(tC.toFixed(2)))! - log10aT(tC)));
    expect(worst).toBeLessThan(0.1);
  }, 120_000);
});
