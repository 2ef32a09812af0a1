import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { ImportError, importFiles } from '../../../core/io';
import type { ImportOptions, ImportResult, SourceFile } from '../../../core/io';
import { COLUMN_ROLES } from '../../../core/io';

/** importFiles() either returns a well-formed result or throws ImportError — nothing else. */
function importOrImportError(
  files: SourceFile[],
  options?: ImportOptions,
): ImportResult | ImportError {
  try {
    const r = importFiles(files, options);
    checkResult(r, files);
    return r;
  } catch (e) {
    if (e instanceof ImportError) {
      expect(e.message.length).toBeGreaterThan(0);
      expect(e.row).toBeGreaterThanOrEqual(0);
      expect(e.column).toBeGreaterThanOrEqual(0);
      return e;
    }
    throw e;
  }
}

function checkResult(r: ImportResult, files: SourceFile[]): void {
  const names = new Set(files.map((f) => f.name));
  expect(r.dataset.isotherms.length).toBeGreaterThan(0);
  let lastT = -Infinity;
  for (const iso of r.dataset.isotherms) {
    expect(iso.temperatureK).toBeGreaterThan(0);
    expect(iso.temperatureK).toBeGreaterThanOrEqual(lastT);
    lastT = iso.temperatureK;
    expect(iso.x.length).toBeGreaterThanOrEqual(2);
    let ascending = true;
    for (let i = 1; i < iso.x.length; i++) ascending &&= iso.x[i] > iso.x[i - 1];
    expect(ascending, 'x strictly ascending').toBe(true);
    expect(iso.x.every((x) => x > 0 && Number.isFinite(x))).toBe(true);
    for (const v of Object.values(iso.quantities)) expect(v!.length).toBe(iso.x.length);
    expect(iso.mask.length).toBe(iso.x.length);
    expect(iso.source.every((s) => names.has(s.file) && s.row >= 1)).toBe(true);
  }
  for (const w of r.warnings) expect(names.has(w.file)).toBe(true);
}

const HEADERS = [
  'T (°C)',
  'Temperature [K]',
  'temp',
  'f (Hz)',
  'Frequency',
  'ω (rad/s)',
  'omega',
  't (s)',
  'Time [min]',
  "G' (Pa)",
  "G'' [MPa]",
  "E'",
  'E"',
  'tan δ',
  'Phase angle (rad)',
  '|G*| (kPa)',
  '|η*| (Pa·s)',
  'G(t) (Pa)',
  'J(t) [1/MPa]',
  "G' 40°C",
  "E'(T=-20 C) [MPa]",
  '40',
  '-20 °C',
  'Strain (%)',
  'x',
  '',
  '"quoted, header"',
  "G' (kpsi)",
  'δ [°]',
  '""',
  'T=40',
  'E(t) 20°C [MPa]',
];

const cell = fc.oneof(
  fc.double({ noNaN: false }).map(String),
  fc.integer({ min: -5, max: 400 }).map(String),
  fc.double({ min: 1e-3, max: 1e9, noNaN: true }).map((v) => v.toPrecision(5)),
  fc.double({ min: 1e-3, max: 1e3, noNaN: true }).map((v) => v.toFixed(2).replace('.', ',')),
  fc.constantFrom('', 'NaN', 'abc', '-', '"1,5"', '1e999', '0x10', '−3', ' 7 '),
);

const csvShape = fc.record({
  delimiter: fc.constantFrom(',', ';', '\t', ' ', '   '),
  eol: fc.constantFrom('\n', '\r\n', '\r'),
  bom: fc.boolean(),
  metadata: fc.array(
    fc.constantFrom(
      '# temperature: 40 °C',
      'T = 313 K',
      'sample: X',
      '# quantity: E(t) [MPa]',
      'key=value',
      '% note',
    ),
    { maxLength: 3 },
  ),
  header: fc.option(fc.array(fc.constantFrom(...HEADERS), { minLength: 1, maxLength: 6 })),
  units: fc.option(
    fc.array(fc.constantFrom('°C', 'Hz', 'Pa', 'MPa', '-', 'rad/s', 's', 'furlong'), {
      minLength: 1,
      maxLength: 6,
    }),
  ),
  rows: fc.array(fc.array(cell, { minLength: 0, maxLength: 7 }), { maxLength: 25 }),
  blank: fc.boolean(),
  name: fc.constantFrom('a.csv', 'seal_40C.txt', 'x-313K.dat', 'T=-20°C.csv', 'run.tsv'),
});

/** Tables that are nearly right — a coherent header, plausible numbers — with a few faulty cells. */
const nearValid = fc.record({
  layout: fc.constantFrom('long', 'perIsotherm', 'wide'),
  delimiter: fc.constantFrom(',', ';', '\t', '  '),
  decimalComma: fc.boolean(),
  eol: fc.constantFrom('\n', '\r\n'),
  bom: fc.boolean(),
  tempsC: fc.uniqueArray(fc.integer({ min: -60, max: 250 }), { minLength: 1, maxLength: 4 }),
  freqs: fc.uniqueArray(fc.double({ min: 1e-3, max: 1e3, noNaN: true }), {
    minLength: 2,
    maxLength: 8,
  }),
  wander: fc.double({ min: 0, max: 0.4, noNaN: true }),
  faults: fc.array(
    fc.record({ at: fc.nat(), text: fc.constantFrom('', 'NaN', 'x', '-1', '0', '1e999', '"2"') }),
    { maxLength: 4 },
  ),
});

function renderNearValid(
  v: typeof nearValid extends fc.Arbitrary<infer R> ? R : never,
): SourceFile[] {
  const dc = v.decimalComma && v.delimiter !== ',';
  const n = (x: number) => (dc ? String(x).replace('.', ',') : String(x));
  const tables: { name: string; rows: string[][] }[] = [];
  const g = (f: number, t: number) => [n((1e5 / (1 + t + 200)) * (1 + f)), n(2e4 * (1 + f))];
  if (v.layout === 'long') {
    const rows = [['T (°C)', 'f (Hz)', "G' (Pa)", "G'' (Pa)"]];
    v.tempsC.forEach((t, k) =>
      v.freqs.forEach((f, i) =>
        rows.push([n(t + (i % 2 ? v.wander : -v.wander) + k * 0), n(f), ...g(f, t)]),
      ),
    );
    tables.push({ name: 'long.csv', rows });
  } else if (v.layout === 'perIsotherm') {
    for (const t of v.tempsC) {
      const rows = [['f (Hz)', "E' [MPa]", "E'' [MPa]"]];
      v.freqs.forEach((f) => rows.push([n(f), ...g(f, t)]));
      tables.push({ name: `iso_${t < 0 ? 'm' : ''}${Math.abs(t)}C.txt`, rows });
    }
  } else {
    const rows = [['t (s)', ...v.tempsC.map((t) => `G(t) ${t}°C [Pa]`)]];
    v.freqs.forEach((f) => rows.push([n(f), ...v.tempsC.map((t) => g(f, t)[0])]));
    tables.push({ name: 'wide.csv', rows });
  }
  const cells = tables.flatMap((t) =>
    t.rows.slice(1).flatMap((r) => r.map((_, j) => [r, j] as const)),
  );
  for (const f of v.faults)
    if (cells.length) {
      const [r, j] = cells[f.at % cells.length];
      r[j] = f.text;
    }
  return tables.map((t) => ({
    name: t.name,
    text:
      (v.bom ? '\uFEFF' : '') +
      ['# invented fuzz data', ...t.rows.map((r) => r.join(v.delimiter))].join(v.eol),
  }));
}

type Shape = typeof csvShape extends fc.Arbitrary<infer R> ? R : never;

function render(s: Shape): SourceFile {
  const lines: string[] = [...s.metadata];
  if (s.header) lines.push(s.header.join(s.delimiter));
  if (s.units) lines.push(s.units.join(s.delimiter));
  for (const r of s.rows) lines.push(r.join(s.delimiter));
  if (s.blank) lines.splice(Math.floor(lines.length / 2), 0, '');
  return { name: s.name, text: (s.bom ? '\uFEFF' : '') + lines.join(s.eol) };
}

describe('importFiles() under fuzzing', () => {
  it('importFiles() returns data or throws ImportError for random bytes', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 2000 }), fc.boolean(), (bytes, latin1) => {
        const text = latin1 ? String.fromCharCode(...bytes) : new TextDecoder().decode(bytes);
        importOrImportError([{ name: 'random.bin', text }]);
      }),
      { numRuns: 300, seed: 20261201 },
    );
  });

  it('importFiles() returns data or throws ImportError for random CSV shapes', () => {
    fc.assert(
      fc.property(fc.array(csvShape, { minLength: 1, maxLength: 3 }), (shapes) => {
        const files = shapes.map((s, i) => ({ ...render(s), name: `${i}-${s.name}` }));
        importOrImportError(files);
      }),
      { numRuns: 400, seed: 4242 },
    );
  });

  it('importFiles() returns data or throws ImportError for random options and mappings', () => {
    const mapping = fc.record({
      column: fc.oneof(
        fc.integer({ min: 1, max: 6 }),
        fc.constantFrom("G' (Pa)", 'T (°C)', 'nope'),
      ),
      role: fc.constantFrom(...COLUMN_ROLES),
      unit: fc.option(fc.constantFrom('MPa', 'Hz', '°C', 'K', 's', 'bogus', '1/Pa', '°'), {
        nil: undefined,
      }),
      temperatureK: fc.option(fc.double({ min: 1, max: 600, noNaN: true }), { nil: undefined }),
    });
    fc.assert(
      fc.property(
        csvShape,
        fc.array(mapping, { maxLength: 4 }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        (shape, columns, tol) => {
          importOrImportError([render(shape)], { columns, groupingToleranceK: tol });
        },
      ),
      { numRuns: 300, seed: 99 },
    );
  });

  it('importFiles() reads nearly right tables with faulty cells, or says why not', () => {
    let imported = 0;
    let runs = 0;
    fc.assert(
      fc.property(nearValid, (v) => {
        runs++;
        if (!(importOrImportError(renderNearValid(v)) instanceof ImportError)) imported++;
      }),
      { numRuns: 300, seed: 1717 },
    );
    // The generator must mostly make importable tables, or this property would test little.
    expect(imported / runs).toBeGreaterThan(0.5);
  });

  it('importFiles() accounts for every data row: it gives a point or is named in a warning', () => {
    fc.assert(
      fc.property(nearValid, (v) => {
        const files = renderNearValid(v);
        const r = importOrImportError(files, { maxWarningsPerFile: 10_000 });
        if (r instanceof ImportError) return;
        const seen = new Set<string>();
        for (const iso of r.dataset.isotherms)
          for (const s of iso.source) seen.add(`${s.file}:${s.row}`);
        for (const w of r.warnings) seen.add(`${w.file}:${w.row}`);
        for (const f of files) {
          const lines = f.text.split(/\r?\n/);
          // Line 1 is the comment, line 2 the header; every later line is a data row.
          for (let row = 3; row <= lines.length; row++) {
            if (/^[\s,;]*$/.test(lines[row - 1])) continue; // all cells empty: a blank line
            expect(seen.has(`${f.name}:${row}`), `${f.name} row ${row} vanished`).toBe(true);
          }
        }
        if (v.layout === 'wide') {
          // Each cell of a wide row is a point at its column's temperature, or has a warning.
          // A point's isotherm temperature is the mean of its group: within the 1 K tolerance.
          const points = new Map<number, number[]>();
          for (const iso of r.dataset.isotherms) {
            for (const src of iso.source) {
              points.set(src.row, [...(points.get(src.row) ?? []), iso.temperatureK - 273.15]);
            }
          }
          const near = (row: number, t: number) =>
            (points.get(row) ?? []).some((c) => Math.abs(c - t) <= 1 + 1e-9);
          const warned = new Set(r.warnings.map((w) => `${w.row}:${w.column}`));
          const rowWarned = new Set(r.warnings.filter((w) => w.column <= 1).map((w) => w.row));
          const rows = files[0].text.split(/\r?\n/).length;
          const wideLines = files[0].text.split(/\r?\n/);
          for (let row = 3; row <= rows; row++) {
            if (/^[\s,;]*$/.test(wideLines[row - 1])) continue;
            v.tempsC.forEach((t, j) => {
              const ok = near(row, t) || warned.has(`${row}:${j + 2}`) || rowWarned.has(row);
              expect(ok, `wide row ${row}, ${t} °C vanished`).toBe(true);
            });
          }
        }
      }),
      { numRuns: 300, seed: 31337 },
    );
  });

  it('importFiles() copes with a 200,000-character line', () => {
    const long = Array.from({ length: 70_000 }, (_, i) => String(i % 97)).join(',');
    expect(long.length).toBeGreaterThan(200_000);
    const header = "T (°C),f (Hz),G' (Pa)";
    for (const text of [
      `${header}\n40,1,2\n${long}\n40,2,3\n`,
      `${header}\n40,1,2\n40,2,${'9'.repeat(200_000)}\n40,3,4\n`,
      `${'x'.repeat(200_000)}\n${header}\n40,1,2\n40,2,3\n`,
      `# ${'key: '.repeat(50_000)}\n${header}\n40,1,2\n40,2,3\n`,
      long,
      'a'.repeat(200_000),
    ]) {
      const r = importOrImportError([{ name: 'long.csv', text }]);
      if (!(r instanceof ImportError))
        expect(r.dataset.isotherms[0].x.length).toBeGreaterThanOrEqual(2);
    }
  });

  it('importFiles() reads a 50 MB file', () => {
    const rows = ["T (°C),f (Hz),G' (Pa),G'' (Pa)"];
    const tails = Array.from(
      { length: 500 },
      (_, i) =>
        `,${(0.01 * 1.02 ** i).toPrecision(6)},${(1e5 + i).toExponential(6)},${(2e4 + i).toExponential(6)}`,
    );
    let size = rows[0].length;
    for (let k = 0; size < 50e6; k++) {
      const t = (k * 2).toFixed(1);
      for (const tail of tails) rows.push(t + tail);
      for (const tail of tails) size += t.length + tail.length + 1;
    }
    rows.splice(1000, 0, 'garbage,row,here,!');
    const text = rows.join('\n');
    expect(text.length).toBeGreaterThanOrEqual(50e6);
    const r = importOrImportError([{ name: 'big.csv', text }]);
    expect(r).not.toBeInstanceOf(ImportError);
    if (!(r instanceof ImportError)) {
      expect(r.files[0].dataRows).toBe(rows.length - 1);
      expect(r.warnings).toHaveLength(1);
    }
  });

  it('importFiles() reads a wide table of 5,000 temperature columns', () => {
    const temps = Array.from({ length: 5000 }, (_, i) => `G(t) ${i * 2 - 100}°C [Pa]`);
    const rows = [['t (s)', ...temps].join(',')];
    for (let r = 1; r <= 5; r++)
      rows.push([r, ...temps.map((_, i) => 1000 - r - i / 100)].join(','));
    const r = importOrImportError([{ name: 'wide.csv', text: rows.join('\n') }]);
    expect(r).not.toBeInstanceOf(ImportError);
    if (!(r instanceof ImportError)) expect(r.groups).toHaveLength(5000);
  });

  it('importFiles() refuses 50 MB without a table quickly', () => {
    const e = importOrImportError([{ name: 'junk.txt', text: 'lorem ipsum '.repeat(4_200_000) }]);
    expect(e).toBeInstanceOf(ImportError);
  });
});
