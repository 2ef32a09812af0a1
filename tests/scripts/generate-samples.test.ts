/**
 * The committed invented samples are exactly what the seeded generator writes, and each
 * truth.json describes its files: the model re-built from truth.json alone (not from the
 * generator's code) reproduces every written value within the stated noise.
 */
import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { mkdtempSync, readFileSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { generateSamples } from '../../scripts/generate-samples';
import { expectAbsClose, expectRelClose } from '../helpers/assert-close';
import { readSampleTruth } from '../helpers/sample-truth';
import type { SampleTruth } from '../helpers/sample-truth';

const SAMPLES = fileURLToPath(new URL('../../samples', import.meta.url));

function listFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = join(dir, name);
    return statSync(full).isDirectory() ? listFiles(full) : [full];
  });
}

/** One written point, parsed by this test's own reader (not the app's importer). */
interface FilePoint {
  temperatureC: number;
  x: number;
  primary: number;
  loss: number;
}

const readTruth = (id: string): SampleTruth => readSampleTruth(join(SAMPLES, id));

const dataLines = (text: string): string[] =>
  text.split(/\r?\n/).filter((l) => l !== '' && !l.startsWith('#'));

const num = (cell: string): number => Number(cell.replace(',', '.'));

/** Reads the points of one scenario, isotherm by isotherm in set-point order. */
function readPoints(t: SampleTruth): FilePoint[][] {
  const text = (f: string): string => readFileSync(join(SAMPLES, t.scenario, f), 'utf8');
  if (t.layout === 'long' || t.layout === 'ramp') {
    const split = (l: string): string[] => (t.layout === 'long' ? l.split(',') : l.split(/ +/));
    const rows = dataLines(text(t.files[0]))
      .slice(t.layout === 'long' ? 2 : 1)
      .map(split)
      .map((c) => ({ temperatureC: num(c[0]), x: num(c[1]), primary: num(c[2]), loss: num(c[3]) }));
    let start = 0;
    return t.isotherms.map((iso) => rows.slice(start, (start += iso.points)));
  }
  if (t.layout === 'per-isotherm') {
    return t.isotherms.map((iso) =>
      dataLines(text(iso.files[0]))
        .slice(1)
        .map((l) => l.split(';'))
        .map((c) => ({
          temperatureC: iso.setPointC,
          x: num(c[0]),
          primary: num(c[1]),
          loss: num(c[2]),
        })),
    );
  }
  const rows = dataLines(text(t.files[0])).map((l) => l.split('\t'));
  return t.isotherms.map((iso, k) =>
    rows.slice(1).map((c) => ({
      temperatureC: iso.setPointC,
      x: num(c[0]),
      primary: num(c[k + 1]),
      loss: Number.NaN,
    })),
  );
}

/** Shift laws written out from their papers, independent of core/models. */
function log10aT(t: SampleTruth, temperatureK: number): number {
  const dT = temperatureK - t.referenceTemperatureK;
  const law = t.shiftLaw;
  // WLF: Williams, Landel & Ferry, J. Am. Chem. Soc. 77, 3701 (1955), eq. for log aT.
  if (law.kind === 'wlf') return (-law.C1 * dT) / (law.C2K + dT);
  // Arrhenius: ln aT = (Ea/R)(1/T − 1/Tr) (Ferry, Viscoelastic Properties of Polymers, 1980).
  const ea = law.activationEnergyKJPerMol * 1000;
  return (
    ((ea / law.gasConstantJPerMolK) * (1 / temperatureK - 1 / t.referenceTemperatureK)) / Math.LN10
  );
}

/** Entropic vertical shift bT = Tref·ρref/(T·ρ) (Ferry 1980), ρ = ρref/(1 + αV (T − Tref)). */
function log10bT(t: SampleTruth, temperatureK: number): number {
  const v = t.verticalShift;
  if (v.kind === 'none') return 0;
  const rhoRatio = 1 / (1 + v.volumetricExpansionPerK * (temperatureK - t.referenceTemperatureK));
  return Math.log10(t.referenceTemperatureK / (temperatureK * rhoRatio));
}

/** Generalised Maxwell model (Ferry 1980, ch. 3) from truth.json's modes. */
function model(
  t: SampleTruth,
  temperatureC: number,
  xFile: number,
): { primary: number; loss: number } {
  const T = temperatureC + 273.15;
  const aT = 10 ** log10aT(t, T);
  const bT = 10 ** log10bT(t, T);
  const perUnit = { Pa: 1, kPa: 1e3, MPa: 1e6 }[t.fileUnits.modulus] ?? Number.NaN;
  const { equilibriumModulusPa: ge, modes } = t.prony;
  if (t.testKind === 'relaxation') {
    const g = modes.reduce((s, m) => s + m.modulusPa * Math.exp(-xFile / aT / m.tauS), ge);
    return { primary: g / bT / perUnit, loss: Number.NaN };
  }
  const w = (t.fileUnits.x === 'Hz' ? 2 * Math.PI * xFile : xFile) * aT;
  let gp = ge;
  let gpp = 0;
  for (const m of modes) {
    const wt = w * m.tauS;
    gp += (m.modulusPa * wt * wt) / (1 + wt * wt);
    gpp += (m.modulusPa * wt) / (1 + wt * wt);
  }
  return { primary: gp / bT / perUnit, loss: gpp / bT / perUnit };
}

const SCENARIOS = ['melt-long', 'seal-dma', 'adhesive-relaxation', 'ramp-dma'];

describe('generateSamples()', () => {
  let outDir = '';
  let written: string[] = [];
  beforeAll(() => {
    outDir = mkdtempSync(join(tmpdir(), 'thermoshift-samples-'));
    written = generateSamples(outDir);
  });
  afterAll(() => rmSync(outDir, { recursive: true, force: true }));

  it('generateSamples() writes byte-identical copies of every committed sample file', () => {
    const committed = listFiles(SAMPLES)
      .map((f) => relative(SAMPLES, f).split('\\').join('/'))
      .sort();
    expect([...written].sort()).toEqual(committed);
    for (const f of committed) {
      const fresh = readFileSync(join(outDir, f));
      expect(fresh.equals(readFileSync(join(SAMPLES, f))), `${f} differs`).toBe(true);
    }
  });

  it('generateSamples() writes at least three scenarios, each with a README and truth.json', () => {
    for (const id of SCENARIOS) {
      expect(written).toContain(`${id}/README.md`);
      expect(written).toContain(`${id}/truth.json`);
      expect(readFileSync(join(outDir, id, 'README.md'), 'utf8')).toMatch(/invented/i);
    }
  });

  it('generateSamples() labels every data file as invented in its first line and keeps it small', () => {
    for (const id of SCENARIOS) {
      for (const f of readTruth(id).files) {
        const path = join(SAMPLES, id, f);
        expect(readFileSync(path, 'utf8').split(/\r?\n/)[0]).toMatch(/^# note: invented demo data/);
        expect(statSync(path).size).toBeLessThanOrEqual(100_000);
      }
    }
  });

  it('generateSamples() writes each scenario in its own layout and dialect', () => {
    const melt = readFileSync(join(SAMPLES, 'melt-long', readTruth('melt-long').files[0]), 'utf8');
    expect(melt).not.toContain('\r');
    expect(dataLines(melt)[1]).toBe('°C,rad/s,Pa,Pa,Pa·s'); // units row under the header
    const seal = readTruth('seal-dma');
    expect(seal.files).toHaveLength(seal.isotherms.length);
    const sealTexts = seal.files.map((f) => readFileSync(join(SAMPLES, 'seal-dma', f), 'utf8'));
    for (const s of sealTexts) {
      expect(
        s
          .split('\n')
          .slice(0, -1)
          .every((l) => l.endsWith('\r')),
      ).toBe(true);
      expect(dataLines(s)[1]).toMatch(/^\d+,\d+;\d+,\d+;/); // decimal comma, semicolons
    }
    const stated = sealTexts.filter((s) => /^# Temperature: /m.test(s)).length;
    expect(stated).toBeGreaterThan(0);
    expect(stated).toBeLessThan(seal.files.length); // the rest: temperature only in the name
    const wide = readTruth('adhesive-relaxation');
    const header = dataLines(readFileSync(join(SAMPLES, wide.scenario, wide.files[0]), 'utf8'))[0];
    expect(header.split('\t')).toHaveLength(wide.isotherms.length + 1);
  });
});

describe('truth.json', () => {
  it.each(SCENARIOS)('truth.json of %s matches the files: temperatures and point counts', (id) => {
    const t = readTruth(id);
    const points = readPoints(t);
    t.isotherms.forEach((iso, k) => {
      expect(points[k]).toHaveLength(iso.points);
      const temps = points[k].map((p) => p.temperatureC);
      const mean = temps.reduce((a, b) => a + b, 0) / temps.length;
      // Written temperatures have 0.01 °C resolution; the mean is exact arithmetic on them.
      expectAbsClose(mean, iso.meanTemperatureC, 1e-9, `${id} mean T at ${iso.setPointC} °C`);
      expectAbsClose(Math.max(...temps) - Math.min(...temps), iso.spreadK, 1e-9, 'spread');
      expect(Math.abs(mean - iso.setPointC)).toBeLessThanOrEqual(0.3);
      expect(points[k].map((p) => p.x)).toEqual(t.xValuesInFileUnit);
    });
  });

  it.each(SCENARIOS)(
    'truth.json of %s states log10 aT and bT as the published laws give them',
    (id) => {
      const t = readTruth(id);
      for (const iso of t.isotherms) {
        const T = iso.meanTemperatureC + 273.15;
        // Both are closed forms evaluated the same way; 1e-12 decades allows for rounding only.
        expectAbsClose(iso.log10aT, log10aT(t, T), 1e-12, `${id} log10 aT at ${iso.setPointC} °C`);
        expectAbsClose(iso.log10bT, log10bT(t, T), 1e-12, `${id} log10 bT at ${iso.setPointC} °C`);
      }
    },
  );

  it.each(SCENARIOS)(
    'truth.json of %s re-builds every written modulus within the stated noise',
    (id) => {
      const t = readTruth(id);
      const sd = t.noise.relativeStdDev;
      const residuals: number[] = [];
      readPoints(t).forEach((iso, k) => {
        const lowTorque = new Set(t.isotherms[k].lowTorquePointIndices);
        iso.forEach((p, i) => {
          const m = model(t, p.temperatureC, p.x);
          expect(p.primary).toBeGreaterThan(0);
          if (lowTorque.has(i)) return;
          residuals.push(Math.log(p.primary / m.primary));
          if (t.testKind === 'oscillatory') residuals.push(Math.log(p.loss / m.loss));
        });
      });
      const n = residuals.length;
      const mean = residuals.reduce((a, b) => a + b, 0) / n;
      const rms = Math.sqrt(residuals.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1));
      // Log residuals should be N(0, σ²) plus the torque floor (melt only) and 5-digit rounding.
      // Mean: within 4 standard errors of zero. SD: within 25 % of σ (n ≥ 100 gives a standard
      // error of the SD of about 7 %; the melt's torque floor adds a little above σ).
      expect(n).toBeGreaterThanOrEqual(100);
      expectAbsClose(mean, 0, (4 * sd) / Math.sqrt(n), `${id} mean log residual`);
      expectRelClose(rms, sd, 0.25, `${id} SD of log residuals`);
      // No point strays beyond 5 σ: the truth describes every value, not just the average.
      expect(Math.max(...residuals.map(Math.abs))).toBeLessThan(5 * sd + 0.05);
    },
  );

  it('truth.json of melt-long lists low-torque points only where the torque floor matters', () => {
    const t = readTruth('melt-long');
    const flagged = t.isotherms.flatMap((iso) => iso.lowTorquePointIndices.map((i) => [iso, i]));
    expect(flagged.length).toBeGreaterThanOrEqual(2);
    const floor = t.noise.lowTorque?.floorPa ?? 0;
    for (const iso of t.isotherms) {
      iso.lowTorquePointIndices.forEach((i) => {
        const trueG = model(t, iso.meanTemperatureC, t.xValuesInFileUnit[i]).primary;
        expect(floor).toBeGreaterThanOrEqual(0.1 * trueG);
        expect(iso.setPointC).toBeGreaterThanOrEqual(200); // high temperature, low frequency
      });
    }
  });
});
