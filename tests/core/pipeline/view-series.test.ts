/** The series the app's check and shift views draw (core/pipeline): each against its definition. */
import { describe, expect, it } from 'vitest';
import { arrheniusPlot } from '../../../core/pipeline/arrhenius-plot';
import { overlapResiduals } from '../../../core/pipeline/overlap-residuals';
import { pronyCurve } from '../../../core/pipeline/prony-curves';
import { coleColeSeries, lossTangentSeries } from '../../../core/pipeline/superposition-plots';
import { GAS_CONSTANT_J_PER_MOL_K } from '../../../core/models/shift-laws';
import { pronyRelaxation } from '../../../core/spectrum/prony-model';
import type { Analysis } from '../../../core/pipeline/types';
import { fixtureAnalysis } from '../report/analysis-fixture';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

const a = fixtureAnalysis();

describe('arrheniusPlot()', () => {
  it('arrheniusPlot() puts ln aT = ln 10 · log10 aT against 1000/T, and an Arrhenius line of slope Ea/(1000 R)', () => {
    const Ea = 85; // kJ/mol, an invented activation energy
    const Tr = 373.15;
    const grid = [343.15, 373.15, 403.15];
    // ln aT = (Ea/R)(1/T − 1/Tr), R = 8.314462618 J/(mol·K) (CODATA 2018)
    const log10 = grid.map(
      (T) => ((Ea * 1000) / (GAS_CONSTANT_J_PER_MOL_K * Math.LN10)) * (1 / T - 1 / Tr),
    );
    const withArrhenius: Analysis = {
      ...a,
      models: {
        arrhenius: {
          ...a.models.wlf!,
          activationEnergyKJPerMol: Ea,
          activationEnergyKJPerMolStdErr: 1.5,
          activationEnergyKJPerMolCi95: [82, 88],
          referenceK: Tr,
          band: { temperatureK: grid, log10aT: log10, lower95: log10, upper95: log10 },
        },
      },
    };
    const p = arrheniusPlot(withArrhenius);
    const c = a.curves[0];
    expect(p.points[0].inverseTemperature).toBe(1000 / c.temperatureK);
    expect(p.points[0].lnAT).toBe(Math.LN10 * c.log10aT!);
    const m = p.models[0];
    const slope = (m.lnAT[2] - m.lnAT[0]) / (m.inverseTemperature[2] - m.inverseTemperature[0]);
    expectRelClose((slope * 1000 * GAS_CONSTANT_J_PER_MOL_K) / 1000, Ea, 1e-9, 'Ea from the slope');
    expect(p.activationEnergy).toMatchObject({ kJPerMol: Ea, stdErr: 1.5 });
    expect(p.glassTransition).toBeNull();
  });
});

describe('overlapResiduals()', () => {
  it('overlapResiduals() shows an isotherm moved up by 0.05 decades as +0.05-decade residuals', () => {
    const base = overlapResiduals(a, 'storageModulus');
    const mean = (xs: number[]): number => xs.reduce((s, v) => s + v, 0) / xs.length;
    const t3 = base.find((r) => r.isothermId === 'T03')!;
    // true shifts, 2 % noise: no offset (σ of a mean of ~15 residuals ≈ 0.003 decades)
    expectAbsClose(mean(t3.residualDecades), 0, 0.01, 'mean residual with true shifts');
    const lifted: Analysis = {
      ...a,
      curves: a.curves.map((c) => (c.isothermId === 'T03' ? { ...c, log10bT: 0.05 } : c)),
    };
    const r = overlapResiduals(lifted, 'storageModulus').find((x) => x.isothermId === 'T03')!;
    expectAbsClose(mean(r.residualDecades), 0.05, 0.01, 'mean residual of the lifted isotherm');
    expect(r.rmsDecades).toBeGreaterThan(0.04);
  });
});

describe('coleColeSeries() and lossTangentSeries()', () => {
  it('coleColeSeries() pairs G″ with G′, lossTangentSeries() tan δ = G″/G′ with |G*|, both × bT on moduli', () => {
    const bT = 10 ** 0.02;
    const shifted: Analysis = {
      ...a,
      curves: a.curves.map((c, k) => (k === 0 ? { ...c, log10bT: 0.02 } : c)),
    };
    const iso = a.dataset.isotherms[0];
    const [gp, gpp] = [iso.quantities.storageModulus![0], iso.quantities.lossModulus![0]];
    const cc = coleColeSeries(shifted)[0];
    expectRelClose(cc.x[0], bT * gp, 1e-12, 'bT·G′');
    expectRelClose(cc.y[0], bT * gpp, 1e-12, 'bT·G″');
    const lt = lossTangentSeries(shifted)[0];
    expectRelClose(lt.x[0], bT * Math.hypot(gp, gpp), 1e-12, 'bT·|G*|');
    expect(lt.y[0]).toBe(gpp / gp);
    expect(coleColeSeries(fixtureAnalysis('relaxation'))).toEqual([]);
  });
});

describe('pronyCurve()', () => {
  it('pronyCurve() gives G(t) = Ge + Σ g_i e^(−t/τ_i) over t = 1/ω of the fitted window', () => {
    const c = pronyCurve(a, 'relaxationModulus')!;
    const [lo, hi] = a.prony!.reducedWindow;
    expectRelClose(c.x[0], 1 / hi, 1e-12, 'shortest time');
    expectRelClose(c.x[c.x.length - 1], 1 / lo, 1e-9, 'longest time');
    expect(c.y[10]).toBe(pronyRelaxation(a.prony!, c.x[10]));
    expect(pronyCurve({ ...a, prony: null }, 'storageModulus')).toBeNull();
  });
});
