import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { importFiles } from '../../../core/io';
import type { ImportResult, SourceFile } from '../../../core/io';
import type { Dataset, QuantityId } from '../../../core/data/types';
import { smoothProny, syntheticIsotherms } from '../../../core/synthetic';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';
import { writeLong, writePerIsotherm, writeWide } from './helpers/write-table';
import type { WriteOptions } from './helpers/write-table';

// Known truth: isotherms from core/synthetic with 2 % noise, written as text and read back.
const prony = smoothProny({
  tauMinS: 1e-5,
  tauMaxS: 1e3,
  modesPerDecade: 2,
  glassyModulusPa: 1e9,
  equilibriumModulusPa: 1e6,
});
const temperaturesK = [-20, 0, 20, 40, 60].map((c) => c + 273.15);
const base = {
  deformation: 'shear' as const,
  referenceK: 293.15,
  temperaturesK,
  components: [{ prony, law: { kind: 'wlf' as const, c1: 10, c2K: 90 } }],
  pointsPerDecade: 4,
  relativeNoise: 0.02,
  seed: 7,
};
const oscillatory = syntheticIsotherms({
  ...base,
  testKind: 'oscillatory',
  xMin: 0.1,
  xMax: 100,
}).dataset;
const relaxation = syntheticIsotherms({
  ...base,
  testKind: 'relaxation',
  xMin: 1,
  xMax: 1e4,
}).dataset;

/**
 * Every imported value equals the truth within `rel` (written with 17 significant digits, so only
 * the unit conversion's rounding remains).
 */
function expectSameAsTruth(
  r: ImportResult,
  truth: Dataset,
  rel = 1e-12,
  quantities?: QuantityId[],
): void {
  expect(r.dataset.isotherms).toHaveLength(truth.isotherms.length);
  r.dataset.isotherms.forEach((iso, k) => {
    const t = truth.isotherms[k];
    expectAbsClose(iso.temperatureK, t.temperatureK, 1e-9, 'temperature, K');
    expect(iso.x).toHaveLength(t.x.length);
    iso.x.forEach((x, i) => expectRelClose(x, t.x[i], rel, `x[${i}]`));
    for (const q of quantities ?? (Object.keys(t.quantities) as QuantityId[])) {
      const got = iso.quantities[q];
      expect(got, q).toBeDefined();
      got!.forEach((v, i) => expectRelClose(v, t.quantities[q]![i], rel, `${q}[${i}]`));
    }
    expect(iso.mask.every(Boolean)).toBe(true);
  });
}

const fixture = (name: string): SourceFile => ({
  name,
  text: readFileSync(fileURLToPath(new URL(`../../fixtures/io/${name}`, import.meta.url)), 'utf8'),
});

const long = (o: WriteOptions, ds = oscillatory, name = 'long.csv'): SourceFile[] => [
  { name, text: writeLong(ds, o) },
];

describe('importFiles() — long layout', () => {
  it('importFiles() reads a comma file with metadata, BOM and CRLF, in °C and Hz', () => {
    const r = importFiles(
      long({
        bom: true,
        crlf: true,
        xUnit: 'Hz',
        metadata: ['sample: Invented X-1', 'operator = nobody'],
      }),
    );
    expectSameAsTruth(r, oscillatory);
    expect(r.files[0]).toMatchObject({
      layout: 'long',
      delimiter: 'comma',
      decimalSeparator: '.',
      headerRow: 3,
    });
    expect(r.dataset.name).toBe('Invented X-1');
    expect(r.dataset.metadata.operator).toBe('nobody');
    expect(r.dataset).toMatchObject({
      testKind: 'oscillatory',
      deformation: 'shear',
      abscissa: 'angularFrequency',
    });
    expect(r.warnings).toEqual([]);
  });

  it('importFiles() reads semicolons with decimal commas', () => {
    const r = importFiles(
      long({
        delimiter: ';',
        decimalComma: true,
        units: { storageModulus: ['MPa', 1e6], lossModulus: ['MPa', 1e6] },
      }),
    );
    expectSameAsTruth(r, oscillatory);
    expect(r.files[0]).toMatchObject({ delimiter: 'semicolon', decimalSeparator: ',' });
  });

  it('importFiles() reads tabs and runs of spaces', () => {
    expectSameAsTruth(importFiles(long({ delimiter: '\t' })), oscillatory);
    const r = importFiles(long({ delimiter: '   ' }));
    expectSameAsTruth(r, oscillatory);
    expect(r.files[0].delimiter).toBe('spaces');
  });

  it('importFiles() reads a units row under the header', () => {
    const r = importFiles(
      long({
        unitsRow: true,
        xUnit: 'Hz',
        units: { storageModulus: ['kPa', 1e3], lossModulus: ['kPa', 1e3] },
      }),
    );
    expectSameAsTruth(r, oscillatory);
    expect(r.files[0]).toMatchObject({ headerRow: 1, unitsRow: 2, firstDataRow: 3 });
    expect(r.files[0].columns[2]).toMatchObject({ unitText: 'kPa', factor: 1e3, siUnit: 'Pa' });
  });

  it('importFiles() reads temperatures in K and °F (NIST SP 811, 2008, B.9)', () => {
    expectSameAsTruth(importFiles(long({ temperatureUnit: 'K' })), oscillatory);
    expectSameAsTruth(importFiles(long({ temperatureUnit: '°F' })), oscillatory);
  });

  it('importFiles() reads every modulus unit (SI Brochure, BIPM 2019; NIST SP 811, 2008, B.8)', () => {
    const units: [string, number][] = [
      ['Pa', 1],
      ['kPa', 1e3],
      ['MPa', 1e6],
      ['GPa', 1e9],
      ['dyn/cm²', 0.1],
      ['psi', 6894.757],
    ];
    for (const u of units) {
      const r = importFiles(long({ units: { storageModulus: u, lossModulus: u } }));
      expectSameAsTruth(r, oscillatory, 1e-12, ['storageModulus', 'lossModulus']);
    }
  });

  it('importFiles() reads |η*| in Pa·s, mPa·s, P and cP, and δ in degrees or radians', () => {
    const withEta = structuredClone(oscillatory);
    for (const iso of withEta.isotherms) {
      const gp = iso.quantities.storageModulus!;
      const gpp = iso.quantities.lossModulus!;
      iso.quantities.complexViscosity = iso.x.map((w, i) => Math.hypot(gp[i], gpp[i]) / w);
      iso.quantities.phaseAngle = gp.map((v, i) => (Math.atan2(gpp[i], v) * 180) / Math.PI);
    }
    for (const u of [
      ['Pa·s', 1],
      ['mPa·s', 1e-3],
      ['P', 0.1],
      ['cP', 1e-3],
    ] as [string, number][]) {
      const r = importFiles(long({ units: { complexViscosity: u } }, withEta));
      expectSameAsTruth(r, withEta, 1e-12, ['complexViscosity', 'phaseAngle']);
    }
    const r = importFiles(long({ units: { phaseAngle: ['rad', 180 / Math.PI] } }, withEta));
    expectSameAsTruth(r, withEta, 1e-12, ['phaseAngle']);
  });

  it('importFiles() reads relaxation data with time in s, min or h', () => {
    for (const xUnit of ['s', 'min', 'h'] as const) {
      const r = importFiles(long({ xUnit }, relaxation));
      expectSameAsTruth(r, relaxation);
      expect(r.dataset).toMatchObject({ testKind: 'relaxation', abscissa: 'time' });
    }
  });

  it('importFiles() reads creep compliance J(t) and D(t) in 1/Pa, 1/MPa, 1/GPa', () => {
    const creep = structuredClone(relaxation);
    creep.isotherms.forEach((iso) => {
      iso.quantities = { creepCompliance: iso.quantities.relaxationModulus!.map((g) => 1 / g) };
    });
    for (const u of [
      ['1/Pa', 1],
      ['1/MPa', 1e-6],
      ['1/GPa', 1e-9],
    ] as [string, number][]) {
      const r = importFiles(long({ units: { creepCompliance: u } }, creep));
      expectSameAsTruth(r, creep);
      expect(r.dataset).toMatchObject({ testKind: 'creep', deformation: 'shear' });
    }
    const d = importFiles(long({ names: { creepCompliance: 'D(t)' } }, creep));
    expect(d.dataset.deformation).toBe('tension');
  });

  it('importFiles() sorts x ascending and keeps the file row of every point', () => {
    const text = "T (°C),f (Hz),G' (Pa),G'' (Pa)\n40,10,30,3\n40,1,20,2\n40,0.1,10,1\n";
    const r = importFiles([{ name: 'down.csv', text }]);
    const iso = r.dataset.isotherms[0];
    expect(iso.x).toEqual([0.1, 1, 10].map((f) => 2 * Math.PI * f));
    expect(iso.quantities.storageModulus).toEqual([10, 20, 30]);
    expect(iso.source).toEqual([4, 3, 2].map((row) => ({ file: 'down.csv', row })));
  });
});

describe('importFiles() — one file per isotherm', () => {
  it('importFiles() takes the temperature from a "# Temperature:" line', () => {
    const texts = writePerIsotherm(oscillatory, { xUnit: 'Hz' });
    const files = texts.map((text, i) => ({ name: `run${i + 1}.txt`, text }));
    const r = importFiles(files.reverse());
    expectSameAsTruth(r, oscillatory);
    expect(
      r.files.every((f) => f.layout === 'perIsotherm' && f.temperatureFrom === 'metadata'),
    ).toBe(true);
    expect(r.groups[0].files).toEqual(['run1.txt']);
  });

  it('importFiles() takes the temperature from the file name', () => {
    const texts = writePerIsotherm(oscillatory, {
      temperatureLine: false,
      delimiter: ';',
      decimalComma: true,
      crlf: true,
    });
    const names = [
      'seal_m20C.csv',
      'seal_0C.csv',
      'seal_20C.csv',
      'seal_313.15K.csv',
      'seal_T=60°C.csv',
    ];
    const r = importFiles(texts.map((text, i) => ({ name: names[i], text })));
    expectSameAsTruth(r, oscillatory);
    expect(r.files.map((f) => f.temperatureFrom)).toEqual(new Array(5).fill('fileName'));
    expect(r.dataset.name).toBe('seal');
  });

  it('importFiles() splits a file of several blocks at their temperature lines', () => {
    const r = importFiles([fixture('blocks.csv')]);
    expect(r.groups.map((g) => Number((g.temperatureK - 273.15).toFixed(2)))).toEqual([40, 60, 80]);
    expect(r.groups.map((g) => g.points)).toEqual([3, 3, 2]);
    expect(r.files[0].blockTemperaturesK).toEqual([313.15, 333.15, 353.15]);
    expect(r.warnings).toEqual([]);
    expect(r.dataset.isotherms[1].source.map((s) => s.row)).toEqual([11, 12, 13]);
  });

  it('importFiles() lets an option force the temperature of a file', () => {
    const texts = writePerIsotherm(oscillatory, { temperatureLine: false });
    const files = texts.map((text, i) => ({ name: `iso${i}.csv`, text }));
    const fileTemperatureK = Object.fromEntries(files.map((f, i) => [f.name, temperaturesK[i]]));
    const r = importFiles(files, { fileTemperatureK });
    expectSameAsTruth(r, oscillatory);
    expect(r.files[0].temperatureFrom).toBe('option');
  });
});

describe('importFiles() — wide layout', () => {
  it('importFiles() reads one column per quantity and temperature ("G\' 40°C [MPa]")', () => {
    const r = importFiles([
      {
        name: 'wide.csv',
        text: writeWide(oscillatory, { units: { storageModulus: ['MPa', 1e6] } }),
      },
    ]);
    expectSameAsTruth(r, oscillatory);
    expect(r.files[0].layout).toBe('wide');
  });

  it('importFiles() reads wide relaxation tables with temperatures in K and time in min', () => {
    const r = importFiles([
      {
        name: 'wide.tsv',
        text: writeWide(relaxation, { delimiter: '\t', temperatureUnit: 'K', xUnit: 'min' }),
      },
    ]);
    expectSameAsTruth(r, relaxation);
  });

  it('importFiles() reads "E\'(T=-20 C) [MPa]" headers', () => {
    const text = "f [Hz];E'(T=-20 C) [MPa];E'(T=40 C) [MPa]\n0,1;2000;10\n1;2100;11\n";
    const r = importFiles([{ name: 'w.csv', text }]);
    expectAbsClose(r.groups[0].temperatureK, 253.15, 1e-9, '−20 °C');
    expectAbsClose(r.groups[1].temperatureK, 313.15, 1e-9, '40 °C');
    expect(r.dataset.deformation).toBe('tension');
    expect(r.dataset.isotherms[1].quantities.storageModulus).toEqual([10e6, 11e6]);
  });

  it('importFiles() reads bare temperature headers with a "quantity" line', () => {
    const text = '# quantity: E(t) [MPa]\nt (s),20,40 °C\n1,900,500\n10,800,400\n';
    const r = importFiles([{ name: 'w.csv', text }]);
    expect(r.dataset).toMatchObject({ testKind: 'relaxation', deformation: 'tension' });
    expect(r.dataset.isotherms[0].quantities.relaxationModulus).toEqual([900e6, 800e6]);
    expect(r.warnings.map((w) => w.column)).toEqual([2]); // "20" has no unit: °C assumed
  });
});

describe('importFiles() — grouping', () => {
  it('importFiles() groups wandering temperatures (39.8, 40.1, 40.3 °C) and reports the spread', () => {
    const text = "T (°C),f (Hz),G' (Pa)\n39.8,0.1,1\n40.1,1,2\n40.3,10,3\n60.0,0.1,1\n60.0,1,2\n";
    const r = importFiles([{ name: 'w.csv', text }]);
    expect(r.groups).toHaveLength(2);
    expectAbsClose(r.groups[0].temperatureSpreadK, 0.5, 1e-9, 'max − min');
    expectAbsClose(r.groups[0].temperatureK, 273.15 + 40.0666666666667, 1e-9, 'mean');
    expect(r.groups[0].points).toBe(3);
  });

  it('importFiles() regroups a multi-frequency temperature ramp into isotherms', () => {
    const rows: string[] = ["T (°C) f (Hz) E' (MPa) E'' (MPa)"];
    for (let step = 0; step < 5; step++) {
      [1, 2, 5, 10].forEach((f, j) =>
        rows.push(`${(step * 4 + 0.15 * j).toFixed(2)} ${f} ${100 + j} ${10 + j}`),
      );
    }
    const r = importFiles([{ name: 'ramp.txt', text: rows.join('\n') }]);
    expect(r.groups.map((g) => g.points)).toEqual([4, 4, 4, 4, 4]);
    expect(r.groups.map((g) => Number((g.temperatureK - 273.15).toFixed(3)))).toEqual([
      0.225, 4.225, 8.225, 12.225, 16.225,
    ]);
    expect(r.grouping.separateSweeps).toBe(0);
    // With a 5 K tolerance the steps stay apart: each is a complete sweep whose temperature
    // creeps by 0.45 K, far less than the 4 K between steps.
    const wide = importFiles([{ name: 'ramp.txt', text: rows.join('\n') }], {
      groupingToleranceK: 5,
    });
    expect(wide.groups.map((g) => g.points)).toEqual([4, 4, 4, 4, 4]);
    expect(wide.grouping.separateSweeps).toBe(5);
    expect(wide.grouping.description).toMatch(/5 kept apart as complete sweeps/);
  });

  it('importFiles() cuts a continuous multi-frequency ramp into tolerance-wide isotherms', () => {
    // 1, 2, 5, 10 Hz over and over while heating 0.1 K per row: no sweep is steadier than the
    // step to the next, so the tolerance decides.
    const rows: string[] = ["T (°C) f (Hz) E' (MPa) E'' (MPa)"];
    for (let i = 0; i < 80; i++)
      rows.push(`${(20 + 0.1 * i).toFixed(2)} ${[1, 2, 5, 10][i % 4]} ${100 + i} ${10 + i}`);
    const narrow = importFiles([{ name: 'ramp.txt', text: rows.join('\n') }]);
    const wide = importFiles([{ name: 'ramp.txt', text: rows.join('\n') }], {
      groupingToleranceK: 2,
    });
    for (const r of [narrow, wide]) {
      expect(r.grouping.separateSweeps).toBe(0);
      expect(r.grouping.cutFromRamps).toBe(r.groups.length);
      expect(r.groups.every((g) => g.temperatureSpreadK <= r.grouping.toleranceK + 1e-9)).toBe(
        true,
      );
    }
    expect(narrow.groups.length).toBeGreaterThan(wide.groups.length);
    expect(narrow.grouping.description).toMatch(/cut from a continuous temperature ramp/);
  });

  it('importFiles() warns when a group has a single x value and leaves it out', () => {
    const text = "T (°C),f (Hz),G' (Pa)\n40,0.1,1\n40,1,2\n80,1,5\n";
    const r = importFiles([{ name: 'g.csv', text }]);
    expect(r.groups).toHaveLength(1);
    expect(r.warnings).toEqual([
      expect.objectContaining({
        file: 'g.csv',
        row: 4,
        message: expect.stringMatching(/only one frequency/),
      }),
    ]);
  });

  it('importFiles() warns that a continuous ramp was cut', () => {
    const rows = ["T (°C),f (Hz),G' (Pa)"];
    for (let i = 0; i < 40; i++)
      rows.push(`${(20 + 0.25 * i).toFixed(2)},${[1, 10][i % 2]},${i + 1}`);
    const r = importFiles([{ name: 'c.csv', text: rows.join('\n') }]);
    expect(r.warnings.some((w) => /change continuously/.test(w.message))).toBe(true);
    expect(r.groups.every((g) => g.temperatureSpreadK <= 1)).toBe(true);
  });
});

describe('importFiles() — explicit mapping and derived quantities', () => {
  it('importFiles() maps columns by index and by header text, with units', () => {
    const text = 'Temp,Freq,A,B,Strain\n40,0.1,1,2,5\n40,1,3,4,5\n';
    const r = importFiles([{ name: 'm.csv', text }], {
      columns: [
        { column: 1, role: 'temperature', unit: 'K' },
        { column: 'freq', role: 'angularFrequency' },
        { column: 'A', role: 'storageModulus', unit: 'MPa' },
        { column: 4, role: 'lossModulus', unit: 'MPa', deformation: 'tension' },
      ],
    });
    const iso = r.dataset.isotherms[0];
    expect(iso.temperatureK).toBe(40);
    expect(iso.x).toEqual([0.1, 1]);
    expect(iso.quantities.storageModulus).toEqual([1e6, 3e6]);
    expect(r.dataset.deformation).toBe('tension');
    expect(r.files[0].columns.map((c) => c.recognisedBy)).toEqual([
      'mapping',
      'mapping',
      'mapping',
      'mapping',
      'none',
    ]);
  });

  it('importFiles() lets a mapping ignore a column and overrides the test kind', () => {
    const text = "T (°C),t (s),G(t) (Pa),G' (Pa)\n40,1,10,5\n40,10,8,4\n";
    const r = importFiles([{ name: 'k.csv', text }], { columns: [{ column: 4, role: 'ignore' }] });
    expect(r.dataset.testKind).toBe('relaxation');
    expect(r.files[0].columns[3]).toMatchObject({ role: 'ignore', recognisedBy: 'mapping' });
    const forced = importFiles([{ name: 'k.csv', text }], {
      testKind: 'creep',
      columns: [{ column: 3, role: 'creepCompliance', unit: '1/Pa' }],
    });
    expect(forced.dataset.testKind).toBe('creep');
  });

  it('importFiles() maps wide columns with their temperature', () => {
    const text = 'time,a,b\n1,5,3\n10,4,2\n';
    const r = importFiles([{ name: 'w.csv', text }], {
      columns: [
        { column: 1, role: 'time' },
        { column: 2, role: 'relaxationModulus', unit: 'MPa', temperatureK: 300 },
        { column: 3, role: 'relaxationModulus', unit: 'MPa', temperatureK: 320 },
      ],
    });
    expect(r.groups.map((g) => g.temperatureK)).toEqual([300, 320]);
  });

  it("importFiles() derives G' and G'' from |G*| and δ, and tan δ from G'/G''", () => {
    const text = 'T (°C),f (Hz),|G*| (Pa),Phase angle (°)\n40,0.1,2,60\n40,1,4,30\n';
    const r = importFiles([{ name: 'c.csv', text }]);
    const q = r.dataset.isotherms[0].quantities;
    expectRelClose(q.storageModulus![0], 1, 1e-12, "G' = |G*| cos 60°");
    expectRelClose(q.lossModulus![1], 2, 1e-12, "G'' = |G*| sin 30°");
    expect(r.derived).toEqual(['storageModulus', 'lossModulus', 'tanDelta']);
    const none = importFiles([{ name: 'c.csv', text }], { deriveQuantities: false });
    expect(none.dataset.isotherms[0].quantities.storageModulus).toBeUndefined();
  });

  it('importFiles() reports units of the stored quantities and group details', () => {
    const r = importFiles(long({}));
    expect(r.units).toMatchObject({ storageModulus: 'Pa', lossModulus: 'Pa', tanDelta: '' });
    expect(r.groups[0]).toMatchObject({
      id: 'T01',
      points: oscillatory.isotherms[0].x.length,
      files: ['long.csv'],
    });
    expectRelClose(r.groups[0].xMin, 0.1, 1e-12, 'ω min');
  });
});
