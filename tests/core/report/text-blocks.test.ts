import { describe, it, expect } from 'vitest';
import { CAUTIONS, methodParagraphs } from '../../../core/report/text-blocks';
import { fixtureAnalysis } from './analysis-fixture';

describe('CAUTIONS', () => {
  it('CAUTIONS cover extrapolation, superposition, linear range, testing and codes', () => {
    const all = CAUTIONS.join(' ');
    for (const word of [
      'extrapolation',
      'superposition',
      'linear viscoelastic',
      'tests',
      'licensed engineering practice',
    ])
      expect(all.toLowerCase()).toContain(word.toLowerCase());
  });
});

describe('methodParagraphs()', () => {
  it('methodParagraphs() states Tref, the driving quantities, exclusions and the Prony grid', () => {
    const text = methodParagraphs(fixtureAnalysis()).join(' ');
    expect(text).toContain('100 °C');
    expect(text).toContain("G' and G''");
    expect(text).toContain('T07');
    expect(text).toContain('1 relaxation time(s) per decade');
    expect(text).toContain('No vertical shift');
  });
  it('methodParagraphs() describes the entropic vertical shift with its inputs', () => {
    const a = fixtureAnalysis();
    const text = methodParagraphs({
      ...a,
      settings: {
        ...a.settings,
        verticalShift: 'density',
        density: { referenceDensityKgPerM3: 950, volumetricExpansionPerK: 6e-4 },
      },
    }).join(' ');
    expect(text).toContain('ρref = 950 kg/m³');
  });
});
