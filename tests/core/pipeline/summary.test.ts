import { describe, it, expect } from 'vitest';
import { analysisSummary, SUMMARY_SCHEMA } from '../../../core/pipeline/summary';
import { fixtureAnalysis, FIXTURE_TRUTH } from '../report/analysis-fixture';
import { expectAbsClose } from '../../helpers/assert-close';

describe('analysisSummary()', () => {
  const a = fixtureAnalysis();
  const s = analysisSummary(a);
  it('analysisSummary() has the stable keys with temperatures in °C', () => {
    expect(s.schema).toBe(SUMMARY_SCHEMA);
    expect(s.referenceTemperature).toBe(100);
    expect(Object.keys(s.curves[0])).toEqual(
      expect.arrayContaining(['temperature', 'log10aT', 'log10aTStdErr', 'log10bT', 'included']),
    );
    expect(s.curves[0].temperature).toBe(70);
    expect(s.curves[6].included).toBe(false);
    expect(s.warnings[0]).toMatchObject({ code: 'import', message: expect.any(String) });
  });
  it('analysisSummary() gives WLF as C1, C2 (K) and Tref (°C) with uncertainties', () => {
    expect(s.models.wlf).toMatchObject({
      C1: FIXTURE_TRUTH.c1,
      C2: FIXTURE_TRUTH.c2K,
      referenceTemperature: 100,
      C1StdErr: 0.3,
      C2StdErr: 4,
    });
  });
  it('analysisSummary() gives normalised Prony terms that sum with Ge/G0 to one', () => {
    const sum = s.prony!.terms.reduce((acc, t) => acc + t.normalized, 0);
    expectAbsClose(
      sum + s.prony!.equilibriumModulusPa / s.prony!.instantaneousModulusPa,
      1,
      1e-12,
      'exact up to rounding',
    );
  });
  it('analysisSummary() states the conventions and the settings', () => {
    expect(s.conventions.horizontal).toContain('aT(Tref) = 1');
    expect(s.conventions.vertical).toContain('bT = Tref·ρref/(T·ρ(T))');
    expect(s.settings.excludedIsothermIds).toEqual(['T07']);
    expect(s.settings.referenceTemperature).toBe(100);
  });
  it('analysisSummary() is plain JSON', () => {
    expect(JSON.parse(JSON.stringify(s))).toEqual(s);
  });
  it('analysisSummary() omits models that were not fitted', () => {
    const t = analysisSummary({ ...a, models: {}, prony: null });
    expect(t.models).toEqual({});
    expect(t.prony).toBeNull();
  });
});
