import { describe, it, expect } from 'vitest';
import {
  DEFAULT_MODELS,
  defaultReferenceK,
  OptionsError,
  resolveAnalysisOptions,
} from '../../../core/pipeline/options';

describe('resolveAnalysisOptions()', () => {
  it('resolveAnalysisOptions() applies every documented default', () => {
    expect(resolveAnalysisOptions({}, [300, 310, 320])).toEqual({
      referenceTemperatureK: 310,
      referenceTemperatureAuto: true,
      shiftQuantities: 'auto',
      verticalShift: 'auto',
      density: null,
      models: DEFAULT_MODELS,
      pronyModesPerDecade: 2,
      pronyEquilibrium: 'auto',
      glassTransitionK: null,
      excludedIsothermIds: [],
      maskedPoints: [],
      lockedLog10aT: {},
    });
  });
  it('resolveAnalysisOptions() keeps given values and drops duplicate models', () => {
    const r = resolveAnalysisOptions(
      { referenceTemperatureK: 400, models: ['wlf', 'wlf'], pronyModesPerDecade: 0 },
      [300],
    );
    expect(r.referenceTemperatureK).toBe(400);
    expect(r.referenceTemperatureAuto).toBe(false);
    expect(r.models).toEqual(['wlf']);
    expect(r.pronyModesPerDecade).toBe(0);
  });
  it('resolveAnalysisOptions() names the bad key', () => {
    const run = (o: object) => () => resolveAnalysisOptions(o as never, [300]);
    expect(run({ referenceTemperatureK: -5 })).toThrow(/referenceTemperatureK/);
    expect(run({ models: ['williams'] })).toThrow(/models\.0/);
    expect(run({ tref: 300 })).toThrow(/unknown setting tref/);
    expect(run({ density: { referenceDensityKgPerM3: 900 } })).toThrow(
      /density\.volumetricExpansionPerK/,
    );
    expect(run({ verticalShift: 'density' })).toThrow(OptionsError);
    try {
      run({ shiftQuantities: ['storage'] })();
    } catch (e) {
      expect((e as OptionsError).key).toBe('shiftQuantities');
    }
  });
  it('resolveAnalysisOptions() ignores the non-setting fields onProgress and importWarnings', () => {
    expect(() =>
      resolveAnalysisOptions({ onProgress: () => undefined, importWarnings: [] }, [300]),
    ).not.toThrow();
  });
});

describe('defaultReferenceK()', () => {
  it('defaultReferenceK() picks the measured temperature nearest the middle of the range', () => {
    expect(defaultReferenceK([250, 260, 300, 350])).toBe(300);
    expect(defaultReferenceK([250, 350])).toBe(250); // tie: the lower one
    expect(defaultReferenceK([333])).toBe(333);
  });
  it('defaultReferenceK() throws when there is no temperature', () => {
    expect(() => defaultReferenceK([])).toThrow(OptionsError);
  });
});
