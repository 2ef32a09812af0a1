import { describe, it, expect } from 'vitest';
import {
  buildDemoSample,
  demoDataset,
  demoSampleFiles,
  demoScenario,
  demoScenarios,
} from '../../../core/synthetic';
import { expectRelClose } from '../../helpers/assert-close';

describe('demoSampleFiles()', () => {
  it('demoSampleFiles() is deterministic and lists README and truth.json per scenario', () => {
    const a = demoSampleFiles();
    expect(demoSampleFiles()).toEqual(a);
    const paths = a.map((f) => f.path);
    expect(paths).toContain('README.md');
    for (const s of demoScenarios()) {
      expect(paths).toContain(`${s.id}/README.md`);
      expect(paths).toContain(`${s.id}/truth.json`);
    }
    expect(new Set(paths).size).toBe(paths.length);
  });

  it('demoSampleFiles() of no scenarios is just the index README', () => {
    expect(demoSampleFiles([]).map((f) => f.path)).toEqual(['README.md']);
  });

  it('demoSampleFiles() READMEs say the data is invented and show the cautions', () => {
    for (const f of demoSampleFiles().filter((x) => x.path.endsWith('README.md'))) {
      expect(f.content).toMatch(/invented/i);
      expect(f.content).toMatch(/codes and licensed engineering practice/);
    }
  });
});

describe('demoDataset()', () => {
  it.each(demoScenarios())('demoDataset() of $id has the scenario’s isotherms in SI', (s) => {
    const sample = buildDemoSample(s);
    const d = demoDataset(sample);
    expect(d.isotherms).toHaveLength(s.setPointsC.length);
    expect(d.metadata.invented).toBe('yes');
    expect(d.name).toMatch(/invented/);
    d.isotherms.forEach((iso, k) => {
      const setPointK = s.setPointsC[k] + 273.15;
      expect(Math.abs(iso.temperatureK - setPointK)).toBeLessThanOrEqual(0.3);
      expect(iso.x).toHaveLength(s.xValues.length);
      for (let i = 1; i < iso.x.length; i++) expect(iso.x[i]).toBeGreaterThan(iso.x[i - 1]);
      for (const v of Object.values(iso.quantities)) expect(v).toHaveLength(iso.x.length);
    });
    const temps = d.isotherms.map((i) => i.temperatureK);
    expect([...temps].sort((a, b) => a - b)).toEqual(temps);
  });

  it('demoDataset() points each value to the file line that holds it', () => {
    const sample = buildDemoSample(demoScenario('melt-long'));
    const d = demoDataset(sample);
    const lines = sample.written.files[0].content.split('\n');
    for (const iso of d.isotherms) {
      iso.source.forEach((src, i) => {
        const cells = lines[src.row - 1].split(',');
        // The file keeps five significant digits of ω and G′.
        expectRelClose(Number(cells[1]), iso.x[i], 1e-12, 'ω');
        expectRelClose(Number(cells[2]), iso.quantities.storageModulus![i], 5e-5, "G'");
      });
    }
  });

  it('demoDataset() of the relaxation scenario holds the relaxation modulus only', () => {
    const d = demoDataset(buildDemoSample(demoScenario('adhesive-relaxation')));
    expect(d.testKind).toBe('relaxation');
    expect(d.abscissa).toBe('time');
    expect(Object.keys(d.isotherms[0].quantities)).toEqual(['relaxationModulus']);
  });
});
