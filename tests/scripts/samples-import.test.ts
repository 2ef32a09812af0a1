/**
 * Every committed invented sample imports through the real importer (core/io) into the isotherms
 * its truth.json describes, with the same values the generator's in-memory dataset holds.
 */
import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { importFiles } from '../../core/io';
import { buildDemoSample, demoDataset, demoScenarios } from '../../core/synthetic';
import type { DemoTruth } from '../../core/synthetic';
import { expectAbsClose, expectRelClose } from '../helpers/assert-close';

const SAMPLES = fileURLToPath(new URL('../../samples', import.meta.url));

function importSample(id: string): { truth: DemoTruth; result: ReturnType<typeof importFiles> } {
  const truth = JSON.parse(readFileSync(join(SAMPLES, id, 'truth.json'), 'utf8')) as DemoTruth;
  const files = truth.files.map((name) => ({
    name,
    text: readFileSync(join(SAMPLES, id, name), 'utf8'),
  }));
  return { truth, result: importFiles(files) };
}

describe('importFiles() on the invented samples', () => {
  it.each(demoScenarios().map((s) => s.id))(
    'importFiles() reads %s into the isotherms, temperatures and point counts of truth.json',
    (id) => {
      const { truth, result } = importSample(id);
      const d = result.dataset;
      expect(result.warnings).toEqual([]);
      expect(d.testKind).toBe(truth.testKind);
      expect(d.deformation).toBe(truth.deformation);
      expect(d.isotherms).toHaveLength(truth.isotherms.length);
      d.isotherms.forEach((iso, k) => {
        const t = truth.isotherms[k];
        // Both are means of the same written temperatures, in K and °C: rounding only.
        expectAbsClose(iso.temperatureK - 273.15, t.meanTemperatureC, 1e-9, `${id} T${k + 1}`);
        expectAbsClose(iso.temperatureSpreadK, t.spreadK, 1e-9, `${id} spread T${k + 1}`);
        expect(iso.x).toHaveLength(t.points);
      });
    },
  );

  it.each(demoScenarios())(
    'importFiles() of $id gives the values of demoDataset() within the files’ 5 digits',
    (s) => {
      const { result } = importSample(s.id);
      const expected = demoDataset(buildDemoSample(s));
      result.dataset.isotherms.forEach((iso, k) => {
        const want = expected.isotherms[k];
        iso.x.forEach((x, i) => {
          // x is written with 5 significant digits and then converted (Hz → rad/s): exact
          // apart from the conversion's rounding.
          expectRelClose(x, want.x[i], 1e-12, `${s.id} x`);
          for (const q of ['storageModulus', 'lossModulus', 'relaxationModulus'] as const) {
            const got = iso.quantities[q];
            const ref = want.quantities[q];
            if (!ref) continue;
            expect(got, `${s.id} ${q}`).toBeDefined();
            // Five significant digits: relative rounding error at most 5e-5.
            expectRelClose(got?.[i] ?? NaN, ref[i], 5e-5, `${s.id} ${q}`);
          }
        });
      });
    },
  );
});
