/**
 * Predictions against the known truth of the invented melt sample (samples/melt-long/truth.json,
 * written by the seeded generator): its true Prony series, Arrhenius law (Ea = 45 kJ/mol) and
 * entropic bT give the exact modulus the master curve should predict.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { importFiles } from '../../../core/io';
import { buildMasterCurve } from '../../../core/pipeline';
import {
  arrheniusLog10aT,
  densityFromExpansion,
  entropicBT,
} from '../../../core/models/shift-laws';
import { pronyRelaxation, pronyStorage } from '../../../core/spectrum/prony-model';
import {
  log10bTAt,
  predictFromAnalysis,
} from '../../../app/renderer/src/prediction/predict-from-analysis';
import { expectAbsClose, expectRelClose } from '../../helpers/assert-close';

const dir = join(process.cwd(), 'samples', 'melt-long');
const truth = JSON.parse(readFileSync(join(dir, 'truth.json'), 'utf8')) as {
  referenceTemperatureK: number;
  shiftLaw: { activationEnergyKJPerMol: number };
  verticalShift: { referenceDensityKgPerM3: number; volumetricExpansionPerK: number };
  prony: { equilibriumModulusPa: number; modes: { tauS: number; modulusPa: number }[] };
};
const trueSeries = {
  equilibriumModulusPa: truth.prony.equilibriumModulusPa,
  tauS: truth.prony.modes.map((m) => m.tauS),
  modulusPa: truth.prony.modes.map((m) => m.modulusPa),
};
const Tref = truth.referenceTemperatureK;
const density = {
  referenceDensityKgPerM3: truth.verticalShift.referenceDensityKgPerM3,
  volumetricExpansionPerK: truth.verticalShift.volumetricExpansionPerK,
};
const trueBT = (T: number): number =>
  entropicBT(
    T,
    Tref,
    densityFromExpansion(T, Tref, density.referenceDensityKgPerM3, density.volumetricExpansionPerK),
    density.referenceDensityKgPerM3,
  );

const text = readFileSync(join(dir, 'hx310-melt-sweeps.csv'), 'utf8');
const imported = importFiles([{ name: 'hx310-melt-sweeps.csv', text }]);
const analysis = buildMasterCurve(imported.dataset, {
  referenceTemperatureK: Tref,
  verticalShift: 'density',
  density,
  pronyModesPerDecade: 2,
});

describe('predictFromAnalysis()', () => {
  it('predictFromAnalysis() gives G′ at 170 °C and 1 Hz close to the generator’s true value', () => {
    const T = 170 + 273.15;
    const omega = 2 * Math.PI;
    const p = predictFromAnalysis(analysis, {
      quantity: 'storage',
      model: 'arrhenius',
      temperatureK: T,
      x: omega,
    });
    const aT = 10 ** arrheniusLog10aT(T, truth.shiftLaw.activationEnergyKJPerMol * 1000, Tref);
    const expected = pronyStorage(trueSeries, aT * omega) / trueBT(T);
    // 5 %: 2 % noise on the invented data plus the Prony fit's own error (both stated in the issue)
    expectRelClose(p.value, expected, 0.05, "G' at 170 °C, 1 Hz");
    expectAbsClose(p.log10aT, Math.log10(aT), 0.02, 'log10 aT at 170 °C');
    expect(p.flags.outsideReducedWindow).toBe(false);
    expect(p.flags.outsideFittedRange).toBe(false);
    expect(p.valueRange![0]).toBeLessThanOrEqual(p.value);
    expect(p.valueRange![1]).toBeGreaterThanOrEqual(p.value);
  });

  it('predictFromAnalysis() gives G(t) inside the window close to the truth', () => {
    const T = 200 + 273.15;
    const t = 1;
    const p = predictFromAnalysis(analysis, {
      quantity: 'relaxation',
      model: 'arrhenius',
      temperatureK: T,
      x: t,
    });
    const aT = 10 ** arrheniusLog10aT(T, truth.shiftLaw.activationEnergyKJPerMol * 1000, Tref);
    // 10 %: G(t) comes from the series fitted to G′ and G″, a harder inversion near the terminal zone
    expectRelClose(
      p.value,
      pronyRelaxation(trueSeries, t / aT) / trueBT(T),
      0.1,
      'G(t) at 200 °C, 1 s',
    );
  });

  it('predictFromAnalysis() flags an answer outside the measured temperatures and window', () => {
    const p = predictFromAnalysis(analysis, {
      quantity: 'storage',
      model: 'wlf',
      temperatureK: 300 + 273.15,
      x: 1e4,
    });
    expect(p.flags.outsideFittedRange).toBe(true);
    expect(p.flags.outsideReducedWindow).toBe(true);
    expect(p.valueRange).toBeUndefined();
    expect(p.cautions.join(' ')).toMatch(/extrapolat/);
    expect(p.cautions.join(' ')).toMatch(/licensed engineering practice/);
  });

  it('predictFromAnalysis() refuses a model that was not fitted', () => {
    const noWlf = { ...analysis, models: { ...analysis.models, wlf: undefined } };
    expect(() =>
      predictFromAnalysis(noWlf, { quantity: 'storage', model: 'wlf', temperatureK: 450, x: 1 }),
    ).toThrow(/wlf model was not fitted/);
  });
});

describe('log10bTAt()', () => {
  it('log10bTAt() uses the entropic formula with density (Ferry 1980)', () => {
    const T = 150 + 273.15;
    expectAbsClose(
      log10bTAt(analysis, T).log10bT,
      Math.log10(trueBT(T)),
      1e-12,
      'log10 bT at 150 °C',
    );
  });
});
