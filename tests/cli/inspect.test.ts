import { describe, it, expect } from 'vitest';
import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const repo = fileURLToPath(new URL('../../', import.meta.url));
const fixtures = 'tests/fixtures/io';

/** Runs `node bin/thermoshift.mjs inspect …` from the repository root (processes run in parallel). */
function inspect(
  ...args: string[]
): Promise<{ status: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      ['bin/thermoshift.mjs', 'inspect', ...args],
      { cwd: repo, encoding: 'utf8', timeout: 60_000 },
      (error, stdout, stderr) => {
        const status = error ? (typeof error.code === 'number' ? error.code : null) : 0;
        resolve({ status, stdout, stderr });
      },
    );
  });
}

interface Inspection {
  sample: { name: string; testKind: string; deformation: string; abscissa: string };
  files: { file: string; layout: string }[];
  isotherms: {
    id: string;
    temperatureC: number;
    spreadK: number;
    points: number;
    quantities: { symbol: string; unit: string }[];
  }[];
  warnings: { file: string; row: number; column: number; message: string }[];
  grouping: { separateSweeps: number; cutFromRamps: number; description: string };
}

describe('thermoshift inspect', () => {
  it('thermoshift inspect reads every demo sample (--json)', async () => {
    const expected: [string, string, string, number][] = [
      ['samples/melt-long', 'long', 'shear', 9],
      ['samples/seal-dma', 'perIsotherm', 'tension', 11],
      ['samples/adhesive-relaxation', 'wide', 'tension', 8],
      ['samples/ramp-dma', 'long', 'tension', 16],
    ];
    const runs = await Promise.all(expected.map(([dir]) => inspect('--json', dir)));
    for (const [k, [dir, layout, deformation, count]] of expected.entries()) {
      const r = runs[k];
      expect(r.status, r.stderr).toBe(0);
      const v = JSON.parse(r.stdout) as Inspection;
      expect(
        v.files.every((f) => f.layout === layout),
        dir,
      ).toBe(true);
      expect(v.sample.deformation).toBe(deformation);
      expect(v.isotherms).toHaveLength(count);
      expect(v.warnings).toEqual([]);
    }
  });

  it('thermoshift inspect prints isotherms, columns and warnings as text', async () => {
    const r = await inspect(`${fixtures}/bad/bad-cells.csv`);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/column 3 "G' \(Pa\)": storageModulus, Pa → Pa/);
    expect(r.stdout).toMatch(/T01\s+40\.00\s+0\.00\s+2\s+0\.6283 – 62830 /);
    expect(r.stdout).toMatch(/Warnings \(6\):/);
    expect(r.stdout).toContain(
      `${fixtures}/bad/bad-cells.csv, row 3, column 3: "abc" in column "G' (Pa)" is not a number; row skipped`,
    );
  });

  it('thermoshift inspect --tolerance keeps steady steps apart and says how isotherms were formed', async () => {
    const [n, c, bad, text] = await Promise.all([
      inspect('--json', `${fixtures}/ramp-spaces.txt`),
      inspect('--json', '--tolerance', '10', `${fixtures}/ramp-spaces.txt`),
      inspect('--tolerance', 'warm', `${fixtures}/ramp-spaces.txt`),
      inspect('--tolerance', '10', `${fixtures}/ramp-spaces.txt`),
    ]);
    expect(text.stdout).toMatch(
      /how they were formed: 2 isotherms: 2 kept apart as complete sweeps at steady, distinct temperatures closer than the 10 K tolerance/,
    );
    const normal = JSON.parse(n.stdout) as Inspection;
    expect(normal.isotherms.map((i) => i.points)).toEqual([4, 4]);
    const coarse = JSON.parse(c.stdout) as Inspection;
    // The two steps are complete sweeps at steady temperatures 4 K apart: they stay apart even
    // with a 10 K tolerance, and the inspection says why.
    expect(coarse.isotherms.map((i) => i.points)).toEqual([4, 4]);
    expect(coarse.grouping.separateSweeps).toBe(2);
    expect(coarse.warnings.filter((w) => /same frequency/.test(w.message))).toHaveLength(0);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/--tolerance/);
  });

  it('thermoshift inspect exits 1 with one line and no stack trace on a bad file', async () => {
    const cases = [
      ['bad/empty.csv', /the file is empty/],
      ['bad/unknown-unit.csv', /row 1, column 3: .*"kpsi" is not known/],
      ['bad/no-temperature.csv', /no temperature found/],
      ['no/such/file.csv', /no such file or folder/],
    ] as const;
    const runs = await Promise.all(cases.map(([file]) => inspect(`${fixtures}/${file}`)));
    for (const [k, [file, message]] of cases.entries()) {
      const r = runs[k];
      expect(r.status, file).toBe(1);
      expect(r.stdout).toBe('');
      expect(r.stderr.trim().split('\n'), file).toHaveLength(1);
      expect(r.stderr).toMatch(message);
      expect(r.stderr).not.toMatch(/\n\s+at /);
    }
  });

  it('thermoshift inspect --column and --file-temperature fix what recognition could not', async () => {
    const [mapped, forced, wrong] = await Promise.all([
      inspect(
        '--json',
        '--column',
        '3=storageModulus:psi',
        '--column',
        "G'' (kpsi)=lossModulus:psi",
        `${fixtures}/bad/unknown-unit.csv`,
      ),
      inspect(
        '--json',
        '--file-temperature',
        'no-temperature.csv=313.15K',
        `${fixtures}/bad/no-temperature.csv`,
      ),
      inspect('--column', '3=modulus', `${fixtures}/bad/unknown-unit.csv`),
    ]);
    expect(mapped.status, mapped.stderr).toBe(0);
    expect(
      (JSON.parse(mapped.stdout) as Inspection).isotherms[0].quantities.map((q) => q.symbol),
    ).toContain("G'");
    expect(forced.status, forced.stderr).toBe(0);
    expect((JSON.parse(forced.stdout) as Inspection).isotherms[0].temperatureC).toBe(40);
    expect(wrong.status).toBe(2);
    expect(wrong.stderr).toMatch(/ROLE is one of/);
  });
});
