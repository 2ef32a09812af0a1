import { describe, it, expect } from 'vitest';
import { fitShiftModels } from '../../../core/pipeline/fit-models';
import { resolveAnalysisOptions } from '../../../core/pipeline/options';
import { wlfLog10aT, arrheniusLog10aT } from '../../../core/models/shift-laws';
import type { AnalysisCurve, AnalysisWarning } from '../../../core/pipeline/types';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

const TREF = 373.15;
const temps = [343.15, 353.15, 363.15, 373.15, 383.15, 393.15, 403.15];
const curves = (f: (T: number) => number): AnalysisCurve[] =>
  temps.map((T, i) => ({
    isothermId: `T0${i + 1}`,
    temperatureK: T,
    log10aT: f(T),
    log10aTStdErr: T === TREF ? 0 : 0.01,
    log10bT: 0,
    log10bTStdErr: 0,
    included: true,
    qualityRmsDecades: 0.01,
  }));

describe('fitShiftModels()', () => {
  it('fitShiftModels() recovers exact WLF constants and re-references them to Tg by C1g = C1·C2/(C2 + Tg − Tr), C2g = C2 + Tg − Tr (Williams, Landel & Ferry 1955)', () => {
    const w: AnalysisWarning[] = [];
    const s = resolveAnalysisOptions(
      { referenceTemperatureK: TREF, glassTransitionK: 323.15 },
      temps,
    );
    const m = fitShiftModels(
      curves((T) => wlfLog10aT(T, 8.86, 101.6, TREF)),
      s,
      w,
    );
    expectRelClose(m.wlf!.c1, 8.86, 1e-4, 'exact data: only the solver tolerance');
    expectRelClose(m.wlf!.c2K, 101.6, 1e-4, 'exact data');
    // 17.44 / 51.6 K at Tg = Tr − 50 K: the 'universal' constants of the same paper
    expectRelClose(m.wlf!.atGlassTransition!.c1, 17.44, 0.002, 'the paper rounds to 4 digits');
    expectRelClose(m.wlf!.atGlassTransition!.c2K, 51.6, 0.002, 'the paper rounds to 4 digits');
    expect(m.wlf!.band.temperatureK).toHaveLength(61);
    expect(m.wlf!.fittedRangeK).toEqual([343.15, 403.15]);
    expect(m.wlf!.residuals.map((r) => r.isothermId)).not.toContain('');
    expect(m.hint?.model).toBe('wlf');
  });
  it('fitShiftModels() recovers an exact Arrhenius energy and lists its interval', () => {
    const s = resolveAnalysisOptions({ referenceTemperatureK: TREF, models: ['arrhenius'] }, temps);
    const m = fitShiftModels(
      curves((T) => arrheniusLog10aT(T, 80e3, TREF)),
      s,
      [],
    );
    expectRelClose(
      m.arrhenius!.activationEnergyKJPerMol,
      80,
      1e-9,
      'closed-form fit of exact data',
    );
    expect(m.wlf).toBeUndefined();
    expect(m.polynomial).toBeUndefined();
    expect(m.arrhenius!.activationEnergyKJPerMolCi95![0]).toBeLessThanOrEqual(80);
  });
  it('fitShiftModels() ignores excluded curves and curves without a shift', () => {
    const c = curves((T) => wlfLog10aT(T, 8.86, 101.6, TREF));
    c[0] = { ...c[0], included: false, log10aT: 99 };
    c[1] = { ...c[1], log10aT: null };
    const s = resolveAnalysisOptions(
      { referenceTemperatureK: TREF, models: ['polynomial'] },
      temps,
    );
    const m = fitShiftModels(c, s, []);
    expect(m.polynomial!.fittedRangeK[0]).toBe(363.15);
    expectAbsClose(
      m.polynomial!.band.log10aT[0],
      wlfLog10aT(363.15, 8.86, 101.6, TREF),
      0.05,
      'quadratic close to WLF over 40 K',
    );
  });
  it('fitShiftModels() turns a model that cannot be fitted into a warning', () => {
    const w: AnalysisWarning[] = [];
    const s = resolveAnalysisOptions({ referenceTemperatureK: TREF }, temps);
    const m = fitShiftModels(curves(() => 0).slice(3, 4), s, w);
    expect(m).toEqual({});
    expect(w.filter((x) => x.code === 'model-failed')).toHaveLength(3);
  });

  it('fitShiftModels() uses the covariance it is given (generalised least squares) and says so', () => {
    const s = resolveAnalysisOptions({ referenceTemperatureK: TREF, models: ['arrhenius'] }, temps);
    const c = curves((T) => arrheniusLog10aT(T, 80e3, TREF));
    // shared reference noise: 1e-4 on every pair of non-reference shifts, 2e-4 on the diagonal
    const cov = (ids: string[]) => ({
      matrix: ids.map((a, i) =>
        ids.map((b, j) => (a === 'T04' || b === 'T04' ? 0 : i === j ? 2e-4 : 1e-4)),
      ),
      reason: '',
    });
    const m = fitShiftModels(c, s, [], cov);
    expect(m.arrhenius!.weighting.kind).toBe('full-covariance');
    const d = fitShiftModels(c, s, []);
    expect(d.arrhenius!.weighting.kind).toBe('diagonal');
    expect(d.arrhenius!.weighting.note).toMatch(/no covariance/);
  });

  it('fitShiftModels() leaves a shift fixed by hand out of the fits, listed by isotherm, with no warning', () => {
    const w: AnalysisWarning[] = [];
    const s = resolveAnalysisOptions(
      { referenceTemperatureK: TREF, models: ['arrhenius'], lockedLog10aT: { T06: -0.9 } },
      temps,
    );
    const c = curves((T) => arrheniusLog10aT(T, 80e3, TREF));
    c[5] = { ...c[5], log10aT: -0.9, log10aTStdErr: 0 };
    const m = fitShiftModels(c, s, w);
    expect(w).toEqual([]);
    expect(m.arrhenius!.weighting.leftOut).toEqual([
      {
        isothermId: 'T06',
        temperatureK: 393.15,
        reason: 'shift fixed by hand: not a measurement',
      },
    ]);
    expectRelClose(m.arrhenius!.activationEnergyKJPerMol, 80, 1e-9, 'the lock does not pull Ea');
  });

  it('fitShiftModels() gives a not-converged warning naming the model when a fit stops short', () => {
    const w: AnalysisWarning[] = [];
    const s = resolveAnalysisOptions({ referenceTemperatureK: TREF, models: ['wlf'] }, temps);
    // straight in T: WLF's C2 runs away to its bound, the fit does not converge
    fitShiftModels(
      curves((T) => -0.01 * (T - TREF)),
      s,
      w,
    );
    const nc = w.filter((x) => x.code === 'not-converged');
    expect(nc).toHaveLength(1);
    expect(nc[0].model).toBe('wlf');
    expect(nc[0].message).toMatch(/^The WLF fit of the shift factors did not converge/);
  });
});
