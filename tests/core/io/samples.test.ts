import { describe, it, expect } from 'vitest';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';
import { importFiles } from '../../../core/io';
import type { ImportResult } from '../../../core/io';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../../../core/spectrum/prony-model';
import type { PronySeries } from '../../../core/spectrum/prony-model';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';
import { readSampleTruth } from '../../helpers/sample-truth';
import type { SampleTruth } from '../../helpers/sample-truth';

// The invented demo samples (samples/, written by scripts/generate-samples.ts) carry their true
// model in truth.json: the importer must read each one back exactly as generated.
const root = fileURLToPath(new URL('../../../samples/', import.meta.url));

const scenarios = readdirSync(root, { withFileTypes: true })
  // samples/workbooks holds the seal-dma data as .xlsx (tests/scripts/samples-workbook.test.ts);
  // samples/lot-release holds lots with their own truth format (tests/core/compare).
  .filter((d) => d.isDirectory() && existsSync(join(root, d.name, 'truth.json')))
  .filter((d) => d.name !== 'lot-release')
  .map((d) => d.name)
  .sort();

function load(dir: string): { truth: SampleTruth; result: ImportResult } {
  const truth = readSampleTruth(join(root, dir));
  const files = truth.files.map((f) => ({
    name: f,
    text: readFileSync(join(root, dir, f), 'utf8'),
  }));
  return { truth, result: importFiles(files) };
}

describe('importFiles() on the demo samples', () => {
  it('importFiles() finds the four invented demo samples', () => {
    expect(scenarios).toEqual(
      expect.arrayContaining(['adhesive-relaxation', 'melt-long', 'ramp-dma', 'seal-dma']),
    );
  });

  for (const dir of scenarios) {
    it(`importFiles() reads samples/${dir} as generated, without warnings`, () => {
      const { truth, result } = load(dir);
      const ds = result.dataset;
      expect(result.warnings).toEqual([]);
      expect(ds.testKind).toBe(truth.testKind);
      expect(ds.deformation).toBe(truth.deformation);
      expect(ds.isotherms).toHaveLength(truth.isotherms.length);
      const toSI = truth.fileUnits.x === 'Hz' ? 2 * Math.PI : 1; // ω = 2πf (SI Brochure, BIPM 2019)
      ds.isotherms.forEach((iso, k) => {
        const t = truth.isotherms[k];
        expectAbsClose(
          iso.temperatureK - 273.15,
          t.meanTemperatureC,
          1e-9,
          `${dir} T${k + 1} mean °C`,
        );
        expectAbsClose(iso.temperatureSpreadK, t.spreadK, 1e-9, `${dir} T${k + 1} spread`);
        expect(iso.x).toHaveLength(t.points);
        expect(result.groups[k].files.map((f) => f.split('/').pop())).toEqual(t.files);
        const expectedX = [...truth.xValuesInFileUnit].sort((a, b) => a - b).slice(0, t.points);
        if (t.points === truth.xValuesInFileUnit.length) {
          iso.x.forEach((x, i) => expectRelClose(x, expectedX[i] * toSI, 1e-12, 'x'));
        }
      });
    });
  }

  // At exact set points each written modulus is the true Prony value at aT·ω (or t/aT), divided
  // by bT, times exp(σz): the log residuals of what was imported must scatter like the noise.
  for (const dir of ['seal-dma', 'adhesive-relaxation']) {
    it(`importFiles() on samples/${dir} matches the true model within its stated noise`, () => {
      const { truth, result } = load(dir);
      expect(truth.temperature.kind).toBe('set');
      const prony: PronySeries = {
        equilibriumModulusPa: truth.prony.equilibriumModulusPa,
        tauS: truth.prony.modes.map((m) => m.tauS),
        modulusPa: truth.prony.modes.map((m) => m.modulusPa),
      };
      const residuals: number[] = [];
      result.dataset.isotherms.forEach((iso, k) => {
        const aT = 10 ** truth.isotherms[k].log10aT;
        const bT = 10 ** truth.isotherms[k].log10bT;
        iso.x.forEach((x, i) => {
          if (result.dataset.testKind === 'relaxation') {
            residuals.push(
              Math.log(
                iso.quantities.relaxationModulus![i] / (pronyRelaxation(prony, x / aT) / bT),
              ),
            );
          } else {
            residuals.push(
              Math.log(iso.quantities.storageModulus![i] / (pronyStorage(prony, aT * x) / bT)),
            );
            residuals.push(
              Math.log(iso.quantities.lossModulus![i] / (pronyLoss(prony, aT * x) / bT)),
            );
          }
        });
      });
      const rms = Math.sqrt(residuals.reduce((s, r) => s + r * r, 0) / residuals.length);
      const sd = truth.noise.relativeStdDev;
      // ≥ 168 residuals: their RMS lies within ±50 % of σ unless a unit or a column is wrong
      // (a factor 1e6 or 2π error gives an RMS of several units).
      expect(residuals.length).toBeGreaterThanOrEqual(168);
      expect(rms).toBeGreaterThan(0.5 * sd);
      expect(rms).toBeLessThan(1.5 * sd);
    });
  }
});
