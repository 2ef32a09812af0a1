/**
 * The shift-model registry: a toy model added through `registerShiftModel` alone is fitted by the
 * pipeline, written into the summary, the models CSV, the report and the shift-factor chart, and
 * accepted by the settings, with no other file naming it (tests/core/models/registry/linear-toy-model.ts).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  fitLinearShiftLaw,
  registerShiftModel,
  shiftModelKinds,
  shiftModels,
} from '../../../../core/models';
import { buildMasterCurve } from '../../../../core/pipeline/build-master-curve';
import { analysisSummary } from '../../../../core/pipeline/summary';
import { modelResult } from '../../../../core/pipeline/model-results';
import { fitShiftModels } from '../../../../core/pipeline/fit-models';
import { parseSettings } from '../../../../core/pipeline/settings';
import { predictFromAnalysis } from '../../../../core/pipeline/predict-from-analysis';
import { outputFiles } from '../../../../core/report/output-files';
import { shiftFactorChart } from '../../../../core/report/charts';
import { modelTable } from '../../../../core/report/tables';
import { meltProny, syntheticIsotherms } from '../../../../core/synthetic';
import { GAS_CONSTANT_J_PER_MOL_K } from '../../../../core/models/shift-laws';
import { expectAbsClose, expectRelClose } from '../../../helpers/assert-close';
import { linearToyModel } from './linear-toy-model';

const K = 273.15;

describe('registerShiftModel()', () => {
  it('registerShiftModel() refuses a taken, reserved or malformed kind and mismatched names', () => {
    expect(() => registerShiftModel({ ...linearToyModel, kind: 'other' })).toThrow(
      /its law is registered as "linear"/,
    );
    const wlf = shiftModels()[0];
    expect(() => registerShiftModel(wlf)).toThrow(/already registered/);
    const hint = { ...linearToyModel, kind: 'hint', law: { ...linearToyModel.law, kind: 'hint' } };
    expect(() => registerShiftModel(hint)).toThrow(/reserved/);
    expect(() => registerShiftModel({ ...linearToyModel, kind: 'Linear' })).toThrow(/lower case/);
    expect(() => registerShiftModel({ ...linearToyModel, parameters: [] })).toThrow(
      /0 output names for 1 constants/,
    );
    expect(shiftModelKinds()).toEqual(['wlf', 'arrhenius', 'polynomial']);
  });

  it('registerShiftModel() adds a model after the built-in ones and its return value removes it', () => {
    const remove = registerShiftModel(linearToyModel);
    expect(shiftModelKinds()).toEqual(['wlf', 'arrhenius', 'polynomial', 'linear']);
    expect(parseSettings({ models: ['linear'] }, 'settings.json').models).toEqual(['linear']);
    remove();
    expect(shiftModelKinds()).toEqual(['wlf', 'arrhenius', 'polynomial']);
    // the settings check reads the registry when it parses: the same message as for any unknown kind
    expect(() => parseSettings({ models: ['linear'] }, 'settings.json')).toThrow(
      /models\.0.*expected one of "wlf"\|"arrhenius"\|"polynomial"/,
    );
  });
});

describe('fitLinearShiftLaw()', () => {
  // Weighted least squares through the origin, y = b·x with weights 1/σ²: b = Σ(xy/σ²)/Σ(x²/σ²),
  // Var(b) = 1/Σ(x²/σ²) when σ are the true errors, × χ²/(n − 1) when they are only relative
  // (Draper & Smith, Applied Regression Analysis, 3rd ed., 1998, ch. 3, regression through the origin and
  // weighted least squares; from memory for the chapter).
  const Tr = 400;
  const temps = [370, 380, 390, 410, 420, 430];
  const noise = [0.012, -0.02, 0.007, -0.011, 0.018, -0.004];
  const sigma = [0.02, 0.015, 0.01, 0.01, 0.015, 0.02];
  const points = temps.map((T, i) => ({
    temperatureK: T,
    log10aT: -0.05 * (T - Tr) + noise[i],
    stdErr: sigma[i],
  }));
  const x = temps.map((T) => T - Tr);
  const sxx = x.reduce((s, v, i) => s + (v * v) / sigma[i] ** 2, 0);
  const sxy = x.reduce((s, v, i) => s + (v * points[i].log10aT) / sigma[i] ** 2, 0);
  const b = sxy / sxx;
  const chi2 = x.reduce((s, v, i) => s + ((points[i].log10aT - b * v) / sigma[i]) ** 2, 0);

  it('fitLinearShiftLaw() gives the closed-form weighted slope through the origin and its error', () => {
    const reported = fitLinearShiftLaw(linearToyModel.law, points, {
      referenceK: Tr,
      errorScaling: 'reported',
    });
    expectRelClose(reported.values[0], b, 1e-12, 'slope');
    expectRelClose(reported.parameters[0].stdErr, Math.sqrt(1 / sxx), 1e-10, 'reported s.e.');
    expectRelClose(reported.chiSquare, chi2, 1e-10, 'chi-square');
    const residual = fitLinearShiftLaw(linearToyModel.law, points, { referenceK: Tr });
    const se = Math.sqrt(chi2 / (temps.length - 1) / sxx);
    expectRelClose(residual.parameters[0].stdErr, se, 1e-10, 'scaled s.e.');
    // t(0.975, 5 degrees of freedom) = 2.571 (NIST/SEMATECH e-Handbook of Statistical Methods,
    // §1.3.6.7.2, critical values of Student's t)
    expectAbsClose((residual.parameters[0].ci95[1] - b) / se, 2.571, 1e-3, 't quantile');
    expect(residual.parameters[0]).toMatchObject({ name: 'b', unit: '1/K' });
    expect(residual.kind).toBe('linear');
  });

  it('fitLinearShiftLaw() recovers an exact linear law', () => {
    const exact = temps.map((T) => ({ temperatureK: T, log10aT: -0.05 * (T - Tr), stdErr: 0.01 }));
    const f = fitLinearShiftLaw(linearToyModel.law, exact, { referenceK: Tr });
    expectAbsClose(f.values[0], -0.05, 1e-14, 'slope');
    expect(f.converged).toBe(true);
  });
});

describe('a toy model through the registry alone', () => {
  let remove: () => void = () => undefined;
  beforeAll(() => {
    remove = registerShiftModel(linearToyModel);
  });
  afterAll(() => remove());

  // an invented melt whose shift factors follow Arrhenius with Ea = 45 kJ/mol, 150–210 °C, Tr = 180 °C
  const Tr = 180 + K;
  const Ea = 45e3;
  const build = () => {
    const { dataset } = syntheticIsotherms({
      seed: 3,
      testKind: 'oscillatory',
      deformation: 'shear',
      components: [
        {
          prony: meltProny({ plateauModulusPa: 2e5, peakTauS: 0.1, widthDecades: 1.2 }),
          law: { kind: 'arrhenius', activationEnergyJPerMol: Ea },
        },
      ],
      xMin: 0.1,
      xMax: 100,
      pointsPerDecade: 5,
      temperaturesK: [150, 160, 170, 180, 190, 200, 210].map((c) => c + K),
      referenceK: Tr,
      relativeNoise: 0.02,
    });
    // no `models` setting: the default is every registered model
    return buildMasterCurve(dataset, { referenceTemperatureK: Tr, pronyModesPerDecade: 1 });
  };

  it('buildMasterCurve() fits the registered toy model with the built-in ones', () => {
    const a = build();
    expect(a.settings.models).toEqual(['wlf', 'arrhenius', 'polynomial', 'linear']);
    const m = modelResult(a.models, 'linear');
    expect(m).toBeDefined();
    const r = m as NonNullable<typeof m> & { bPerK: number; bPerKStdErr: number | null };
    expect(r.converged).toBe(true);
    expect(r.spec.kind).toBe('linear');
    expect(r.spec.values).toEqual([r.bPerK]);
    expect(r.bPerKStdErr).toBeGreaterThan(0);
    // Arrhenius: d log10 aT/dT = −Ea/(R ln10 T²) (differentiating ln aT = (Ea/R)(1/T − 1/Tr)); the
    // slope of a line through (Tr, 0) lies between its values at the ends of the range
    const slope = (T: number): number => -Ea / (GAS_CONSTANT_J_PER_MOL_K * Math.LN10 * T * T);
    const margin = 3 * (r.bPerKStdErr ?? 0);
    expect(r.bPerK).toBeGreaterThan(slope(150 + K) - margin);
    expect(r.bPerK).toBeLessThan(slope(210 + K) + margin);
    // the band is the toy law over the fitted range, zero at Tr
    r.band.temperatureK.forEach((T, i) =>
      expectAbsClose(r.band.log10aT[i], r.bPerK * (T - Tr), 1e-12, `band at ${T} K`),
    );
    // a prediction can be carried by the toy model
    const p = predictFromAnalysis(a, {
      quantity: 'storage',
      model: 'linear',
      temperatureK: 175 + K,
      frequencyHz: 1,
    });
    expect(p.model).toBe('linear');
    expectAbsClose(p.log10aT, r.bPerK * -5, 1e-12, 'log10 aT at 175 °C');
  });

  it('fitShiftModels() says so when a kind in the options is no longer registered', () => {
    const a = build();
    const options = { ...a.settings, models: ['arrhenius', 'gone'] };
    const warnings: { code: string; message: string; model?: string }[] = [];
    const models = fitShiftModels(a.curves, options, warnings);
    expect(modelResult(models, 'arrhenius')).toBeDefined();
    expect(warnings).toContainEqual({
      code: 'model-failed',
      message: 'The gone model could not be fitted: no shift model of that kind is registered',
      model: 'gone',
    });
  });

  it('the summary, the models CSV, the report and the shift-factor chart carry the toy model', () => {
    const a = build();
    const m = modelResult(a.models, 'linear') as unknown as {
      bPerK: number;
      bPerKStdErr: number;
      bPerKCi95: [number, number];
    };
    const s = analysisSummary(a).models as Record<string, Record<string, unknown>>;
    expect(Object.keys(s.linear).slice(0, 5)).toEqual([
      'b',
      'bStdErr',
      'bCi95',
      'referenceTemperature',
      'r2',
    ]);
    expect(s.linear.b).toBe(m.bPerK);
    expect(s.linear.referenceTemperature).toBe(180);
    const files = outputFiles(a, { date: '2026-01-01' });
    const csv = files.find((f) => f.name === 'shift-models.csv')!.content;
    expect(csv).toContain(
      'polynomial: log10 aT = a1 (T - Tr) + a2 (T - Tr)^2; linear: log10 aT = b (T - Tr)',
    );
    expect(csv).toContain('the linear toy law holds only close to Tr');
    const row = csv.split('\n').find((l) => l.startsWith('linear,'));
    expect(row?.split(',').slice(0, 3)).toEqual([
      'linear',
      'b',
      String(Number(m.bPerK.toPrecision(10))),
    ]);
    const table = modelTable(a)!;
    const tableRow = table.rows.find((r) => r[0] === 'linear')!;
    expect(tableRow.slice(0, 2)).toEqual(['linear', 'b']);
    expect(tableRow[5]).toBe('1/K');
    expect(table.note).toContain('Linear: log10 aT = b (T − Tr).');
    const report = files.find((f) => f.name === 'report.html')!.content;
    expect(report).toContain('Linear: log10 aT = b (T − Tr).');
    expect(report).toContain(tableRow[2]);
    const chart = shiftFactorChart(a);
    const line = chart.series.find((x) => x.name === 'linear')!;
    expect(line.colour).toBe('#2f6f3e');
    expect(line.y).toEqual(modelResult(a.models, 'linear')!.band.log10aT);
    expect(chart.bands?.map((b) => b.name)).toContain('linear 95 %');
    expect(chart.legend?.map((l) => l.name)).toContain('linear ± 95 %');
  });
});
