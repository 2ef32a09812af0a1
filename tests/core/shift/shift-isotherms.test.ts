import { describe, expect, it } from 'vitest';
import { shiftIsotherms } from '../../../core/shift';
import type { ShiftResult } from '../../../core/shift';
import { shiftLawLog10aT, syntheticIsotherms } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';
import {
  BLEND,
  MELT_ARRHENIUS,
  MELT_WLF_PB,
  MELT_WLF_UNIVERSAL,
  RELAX_ARRHENIUS,
  RELAX_WLF,
  RUBBER_WLF,
  WLF_UNIVERSAL,
  MELT,
  make,
  maxError,
  pushStandardisedErrors,
  rootMeanSquare,
  temperatures,
} from './fixtures';
import type { Case } from './fixtures';

const SEEDS = [1, 2, 3, 4, 5];
const aTs = (r: ShiftResult): (number | null)[] => r.curves.map((c) => c.log10aT);
const codes = (r: ShiftResult): string[] => r.warnings.map((w) => w.code);

describe('shiftIsotherms()', () => {
  // Tolerances are the shift targets of docs/conventions.md §7: 0.02 decades at 2 % noise; 0.05 decades at 8 % noise with
  // 30 %-noise low-frequency (low-torque) points on two isotherms.
  const row = (c: Case, noise: number, lowTorque: boolean, tol: number) =>
    [c.name, noise * 100, lowTorque ? ' + low-torque points' : '', tol, c] as const;
  const accuracy = [
    row(MELT_ARRHENIUS, 0.02, false, 0.02),
    row(MELT_WLF_PB, 0.02, false, 0.02),
    row(MELT_WLF_UNIVERSAL, 0.02, false, 0.02),
    row(RUBBER_WLF, 0.02, false, 0.02),
    row(RELAX_WLF, 0.02, false, 0.02),
    row(RELAX_ARRHENIUS, 0.02, false, 0.02),
    row(MELT_ARRHENIUS, 0.08, true, 0.05),
    row(MELT_WLF_PB, 0.08, true, 0.05),
    row(MELT_WLF_UNIVERSAL, 0.08, true, 0.05),
    row(RELAX_WLF, 0.08, true, 0.05),
    row(RELAX_ARRHENIUS, 0.08, true, 0.05),
  ];
  it.each(accuracy)(
    'shiftIsotherms() recovers log10 aT of %s (%s %% noise%s) within %s decades',
    (_name, noisePercent, low, tol, c) => {
      const noise = noisePercent / 100;
      const lowTorque = low !== '';
      for (const seed of SEEDS) {
        const { dataset, truth } = make(c, noise, seed, lowTorque);
        const r = shiftIsotherms(dataset, { referenceK: c.options.referenceK });
        expect(r.curves.every((cv) => cv.included)).toBe(true);
        expectAbsClose(maxError(aTs(r), truth.log10aT), 0, tol, `${c.name} seed ${seed} max error`);
      }
    },
  );

  it('shiftIsotherms() gives standard errors that describe the actual scatter', () => {
    // Over all cases and seeds the RMS of (error / standard error) should be near 1: between 0.6
    // and 1.8 allows for the reference isotherm's own noise, common to all curves of one set.
    const z: number[] = [];
    for (const c of [MELT_ARRHENIUS, MELT_WLF_PB, RELAX_WLF])
      for (const seed of SEEDS) {
        const { dataset, truth } = make(c, 0.02, seed);
        const r = shiftIsotherms(dataset, { referenceK: c.options.referenceK });
        pushStandardisedErrors(z, r.curves, truth.log10aT);
      }
    const rmsZ = rootMeanSquare(z);
    expect(rmsZ).toBeGreaterThan(0.6);
    expect(rmsZ).toBeLessThan(1.8);
  });

  it('shiftIsotherms() gives bT from density within 0.005 decades of Tref·ρref/(T·ρ) (Ferry 1980)', () => {
    const density = { referenceDensity: 900, volumetricExpansionPerK: 6e-4 };
    const { dataset, truth } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0.02,
      seed: 11,
      density,
    });
    const r = shiftIsotherms(dataset, {
      referenceK: MELT_ARRHENIUS.options.referenceK,
      vertical: 'density',
      density: {
        kind: 'expansion',
        referenceDensityKgPerM3: 900,
        volumetricExpansionPerK: 6e-4,
      },
    });
    r.curves.forEach((cv, k) => {
      expectAbsClose(cv.log10bT!, truth.log10bT[k], 0.005, `${cv.id} log10 bT`);
      expect(cv.log10bTStdErr).toBe(0);
    });
    expectAbsClose(maxError(aTs(r), truth.log10aT), 0, 0.02, 'aT with bT from density');
    expect(codes(r)).not.toContain('free-vertical-shift');
  });

  it('shiftIsotherms() takes bT from a density table the same way', () => {
    const Tref = 463.15;
    const rho = (T: number) => 900 / (1 + 6e-4 * (T - Tref));
    const { dataset, truth } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0.02,
      seed: 12,
      density: { referenceDensity: 900, volumetricExpansionPerK: 6e-4 },
    });
    const points = MELT_ARRHENIUS.options.temperaturesK.map((T) => ({
      temperatureK: T,
      densityKgPerM3: rho(T),
    }));
    const r = shiftIsotherms(dataset, {
      referenceK: Tref,
      vertical: 'density',
      density: { kind: 'table', points },
    });
    // The table is linear interpolation of a slightly curved ρ(T): well inside 0.005 decades.
    r.curves.forEach((cv, k) => expectAbsClose(cv.log10bT!, truth.log10bT[k], 0.005, cv.id));
  });

  it("shiftIsotherms() with vertical 'data' fits the entropic law's αV to the moduli and says so", () => {
    const { dataset, truth } = syntheticIsotherms({
      ...MELT_ARRHENIUS.options,
      relativeNoise: 0.02,
      seed: 13,
      density: { referenceDensity: 900, volumetricExpansionPerK: 6e-4 },
    });
    const r = shiftIsotherms(dataset, {
      referenceK: MELT_ARRHENIUS.options.referenceK,
      vertical: 'data',
    });
    expect(r.settings.drivers).toEqual(['storageModulus', 'lossModulus']);
    expect(r.vertical.chosen).toBe('data');
    expect(r.vertical.reason).toMatch(/αV/);
    // One constant for all isotherms: not a free vertical shift.
    expect(codes(r)).not.toContain('free-vertical-shift');
    r.curves.forEach((cv, k) => {
      // bT here reaches about 0.03 decades; 0.005 decades (1 %) is a sixth of that.
      expectAbsClose(cv.log10bT!, truth.log10bT[k], 0.005, `${cv.id} log10 bT from data`);
      expect(cv.log10bTStdErr).toBeGreaterThanOrEqual(0);
    });
    expectAbsClose(maxError(aTs(r), truth.log10aT), 0, 0.01, 'aT with bT from data');
  });

  it('shiftIsotherms() warns about a thermorheologically complex blend (several seeds)', () => {
    for (const seed of [1, 2, 3, 4]) {
      const { dataset } = make(BLEND, 0.02, seed);
      const r = shiftIsotherms(dataset, { referenceK: BLEND.options.referenceK });
      expect(codes(r), `seed ${seed}`).toContain('poor-superposition');
      expect(r.checks.superpositionOk).toBe(false);
      // G′ alone and G″ alone disagree by more than 0.05 decades, so the z-score is worked out.
      expect(r.checks.quantityDisagreementDecades!).toBeGreaterThan(0.05);
      expect(r.checks.quantityDisagreementZ!).toBeGreaterThan(2.5);
    }
  });

  it('shiftIsotherms() never calls a simple material poorly superposed (several seeds, 2 % and 8 %)', () => {
    for (const c of [MELT_ARRHENIUS, MELT_WLF_PB, RUBBER_WLF, RELAX_WLF])
      for (const [noise, low] of [
        [0.02, false],
        [0.08, true],
      ] as const)
        for (const seed of [1, 2, 3, 4]) {
          const { dataset } = make(c, noise, seed, low);
          const r = shiftIsotherms(dataset, { referenceK: c.options.referenceK });
          expect(codes(r), `${c.name} noise ${noise} seed ${seed}`).not.toContain(
            'poor-superposition',
          );
          expect(r.checks.grade).not.toBe('poor');
        }
  });

  it('shiftIsotherms() reports the van Gurp–Palmen dispersion and the G′/G″ disagreement', () => {
    const { dataset } = make(MELT_ARRHENIUS, 0.02, 3);
    const r = shiftIsotherms(dataset, { referenceK: MELT_ARRHENIUS.options.referenceK });
    expect(r.checks.vanGurpPalmenRmsDeg).toBeGreaterThan(0);
    expect(r.checks.vanGurpPalmenRatio).toBeLessThan(1.8);
    expect(r.checks.quantitiesCompared).toEqual(['storageModulus', 'lossModulus']);
    expect(r.checks.quantityDisagreementDecades).toBeLessThan(0.05);
    // Below 0.05 decades the difference cannot affect the grade: its z-score is not worked out.
    expect(r.checks.quantityDisagreementZ).toBeNull();
    expect(r.checks.noiseDecades).toBeGreaterThan(0.004); // 2 % noise = 0.0087 decades
    expect(r.checks.noiseDecades).toBeLessThan(0.015);
    expect(r.checks.grade).toBe('good');
  });

  it('shiftIsotherms() flags low-torque outliers and keeps them out of the fit', () => {
    const { dataset } = make(MELT_ARRHENIUS, 0.02, 4, true);
    const r = shiftIsotherms(dataset, { referenceK: MELT_ARRHENIUS.options.referenceK });
    const flagged = r.curves.flatMap((c) => c.outlierPoints.map((i) => `${c.id}:${i}`));
    expect(flagged.length).toBeGreaterThan(0);
    // 30 % noise points live in the three lowest frequencies of T08 and T09.
    const genuine = flagged.filter((f) => /^T0[89]:[012]$/.test(f));
    expect(genuine.length / flagged.length).toBeGreaterThan(0.5);
    expect(codes(r)).toContain('outliers-flagged');
  });

  it('shiftIsotherms() reports an isotherm that overlaps nothing and gives it no shift', () => {
    const temps = [...temperatures(400, 11, 3, 3), 560];
    const { dataset, truth } = syntheticIsotherms({
      ...MELT_WLF_UNIVERSAL.options,
      temperaturesK: temps,
      relativeNoise: 0.02,
      seed: 5,
    });
    const r = shiftIsotherms(dataset, { referenceK: 400 });
    const far = r.curves[11];
    expect(far.included).toBe(false);
    expect(far.overlapsNothing).toBe(true);
    expect(far.log10aT).toBeNull();
    expect(far.log10aTStdErr).toBeNull();
    expect(codes(r)).toContain('no-overlap');
    expectAbsClose(maxError(aTs(r).slice(0, 11), truth.log10aT.slice(0, 11)), 0, 0.02, 'others');
  });

  it('shiftIsotherms() keeps a locked shift and re-fits the others around it', () => {
    const { dataset, truth } = make(MELT_ARRHENIUS, 0.02, 6);
    const free = shiftIsotherms(dataset, { referenceK: 463.15 });
    const lockedValue = truth.log10aT[2] + 0.05;
    const r = shiftIsotherms(dataset, {
      referenceK: 463.15,
      locked: [{ id: 'T03', log10aT: lockedValue }],
    });
    expect(r.curves[2].log10aT).toBe(lockedValue);
    expect(r.curves[2].locked).toBe(true);
    expect(r.curves[2].log10aTStdErr).toBe(0);
    expectAbsClose(r.curves[4].log10aT!, 0, 1e-12, 'reference isotherm stays at aT = 1');
    // The locked curve stands aside: the others are fitted without it, so they stay where the
    // free fit put them (within 0.01 decades: they lose one curve's comparisons, nothing more).
    for (const k of [0, 1, 3, 5, 9])
      expectAbsClose(r.curves[k].log10aT!, free.curves[k].log10aT!, 0.01, r.curves[k].id);
    expect(r.fit.converged).toBe(true);
    // A warm start from the previous result reaches the same optimum as a cold start (outlier
    // flagging off: which points get flagged may depend on the path).
    const initial = Object.fromEntries(free.curves.map((c) => [c.id, c.log10aT!]));
    const opts = {
      referenceK: 463.15,
      locked: [{ id: 'T03', log10aT: lockedValue }],
      flagOutliers: false,
    };
    const cold = shiftIsotherms(dataset, opts);
    const warm = shiftIsotherms(dataset, { ...opts, initialLog10aT: initial });
    expect(warm.fit.warmStart).toBe(true);
    expect(cold.fit.warmStart).toBe(false);
    warm.curves.forEach((c, k) => expectAbsClose(c.log10aT!, cold.curves[k].log10aT!, 0.005, c.id));
  });

  it('shiftIsotherms() says not-converged, with the reason, when the refinement stops short of its tolerance', () => {
    const { dataset } = make(MELT_WLF_PB, 0.02, 3);
    const opts = { referenceK: MELT_WLF_PB.options.referenceK, flagOutliers: false };
    const full = shiftIsotherms(dataset, opts);
    expect(full.fit.converged).toBe(true);
    expect(full.fit.reason).toMatch(/tolerance/);
    expect(codes(full)).not.toContain('not-converged');
    // One iteration from the scan's start cannot meet 0.001 decades.
    const short = shiftIsotherms(dataset, { ...opts, maxIterations: 1 });
    expect(short.fit.converged).toBe(false);
    expect(short.fit.reason).toMatch(/iteration limit/);
    const w = short.warnings.find((x) => x.code === 'not-converged');
    expect(w?.message).toMatch(/without converging \(iteration limit/);
  });

  it('shiftIsotherms() ignores an excluded isotherm', () => {
    const { dataset, truth } = make(MELT_ARRHENIUS, 0.02, 7);
    const r = shiftIsotherms(dataset, { referenceK: 463.15, excluded: ['T06'] });
    expect(r.curves[5]).toMatchObject({ excluded: true, included: false, log10aT: null });
    const others = aTs(r).filter((_, k) => k !== 5);
    expectAbsClose(
      maxError(
        others,
        truth.log10aT.filter((_, k) => k !== 5),
      ),
      0,
      0.02,
      'others',
    );
  });

  it('shiftIsotherms() takes a reference temperature between measured ones from the neighbours', () => {
    const Tref = 300.5; // between the isotherms at 298 K and 303 K
    const { dataset, truth } = make(MELT_WLF_PB, 0.02, 8);
    const law = MELT_WLF_PB.options.components[0].law;
    const expected = truth.log10aT.map((v) => v - shiftLawLog10aT(law, Tref, 298));
    const r = shiftIsotherms(dataset, { referenceK: Tref });
    expect(r.referenceK).toBe(Tref);
    expectAbsClose(maxError(aTs(r), expected), 0, 0.02, 'log10 aT relative to 300.5 K');
    expect(codes(r)).not.toContain('reference-extrapolated');
    expect(r.curves.every((c) => c.log10aTStdErr! > 0)).toBe(true);
  });

  it('shiftIsotherms() warns when the reference lies outside the measured temperatures', () => {
    const { dataset } = make(MELT_WLF_PB, 0.02, 9);
    const r = shiftIsotherms(dataset, { referenceK: 250 });
    expect(codes(r)).toContain('reference-extrapolated');
  });

  it('shiftIsotherms() handles one isotherm, at Tref and away from it', () => {
    const one = (T: number) =>
      syntheticIsotherms({
        ...MELT_ARRHENIUS.options,
        temperaturesK: [T],
        relativeNoise: 0.02,
        seed: 1,
      }).dataset;
    const at = shiftIsotherms(one(463.15), { referenceK: 463.15 });
    expect(at.curves[0]).toMatchObject({ included: true, log10aT: 0 });
    const away = shiftIsotherms(one(480), { referenceK: 463.15 });
    expect(away.curves[0]).toMatchObject({ included: false, log10aT: null });
    expect(codes(away)).toContain('too-few-isotherms');
  });

  it('shiftIsotherms() handles an empty dataset', () => {
    const { dataset } = make(MELT_ARRHENIUS, 0.02, 1);
    const r = shiftIsotherms({ ...dataset, isotherms: [] }, { referenceK: 463.15 });
    expect(r.curves).toEqual([]);
    expect(codes(r)).toContain('no-data');
    expect(r.checks.grade).toBe('unknown');
    expect(() => JSON.stringify(r)).not.toThrow();
  });

  it('shiftIsotherms() leaves out NaN and non-positive values with a warning naming file and row', () => {
    const { dataset, truth } = make(MELT_ARRHENIUS, 0.02, 10);
    const iso = dataset.isotherms[3];
    iso.quantities.storageModulus![4] = NaN;
    iso.quantities.lossModulus![6] = -5;
    const r = shiftIsotherms(dataset, { referenceK: 463.15 });
    const bad = r.warnings.filter((w) => w.code === 'bad-values');
    expect(bad.length).toBe(2);
    expect(bad[0].message).toContain(`row ${iso.source[4].row}`);
    expect(bad[0].message).toContain(iso.source[4].file);
    expectAbsClose(maxError(aTs(r), truth.log10aT), 0, 0.02, 'with bad values');
  });

  it('shiftIsotherms() respects the dataset mask', () => {
    const { dataset, truth } = make(MELT_ARRHENIUS, 0.08, 2, true);
    for (const k of [7, 8]) for (const i of [0, 1, 2]) dataset.isotherms[k].mask[i] = false;
    const r = shiftIsotherms(dataset, { referenceK: 463.15, flagOutliers: false });
    expect(r.curves.every((c) => c.outlierPoints.length === 0)).toBe(true);
    expectAbsClose(maxError(aTs(r), truth.log10aT), 0, 0.05, 'masked low-torque points');
  });

  it('shiftIsotherms() returns plain JSON-serialisable data with the convention stated', () => {
    const { dataset } = make(RELAX_WLF, 0.02, 1);
    const r = shiftIsotherms(dataset, { referenceK: 300 });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect(r.convention).toContain('t_r = t/aT');
    expect(r.abscissa).toBe('time');
    // Above Tref the material is faster: log10 aT < 0 (docs/conventions.md §2).
    r.curves.forEach((c) => {
      if (c.temperatureK > 300) expect(c.log10aT!).toBeLessThan(0);
      if (c.temperatureK < 300) expect(c.log10aT!).toBeGreaterThan(0);
    });
  });

  it('shiftIsotherms() throws at once on wrong calls, naming the option', () => {
    const { dataset } = make(MELT_ARRHENIUS, 0.02, 1);
    expect(() => shiftIsotherms(dataset, { referenceK: -3 })).toThrow(/referenceK/);
    expect(() => shiftIsotherms(dataset, { referenceK: 463.15, excluded: ['T99'] })).toThrow(/T99/);
    expect(() => shiftIsotherms(dataset, { referenceK: 463.15, vertical: 'density' })).toThrow(
      /density/,
    );
    expect(() => shiftIsotherms(dataset, { referenceK: 463.15, minOverlapPoints: 1 })).toThrow(
      /minOverlapPoints/,
    );
  });

  it('shiftIsotherms() uses WLF-shifted rubber data the same way whatever the noise seed (sanity)', () => {
    // Noise-free data must be superposed exactly (analytic: the curves are one curve shifted).
    const { dataset, truth } = syntheticIsotherms({
      ...RUBBER_WLF.options,
      relativeNoise: 0,
      seed: 1,
    });
    const r = shiftIsotherms(dataset, { referenceK: 300, toleranceDecades: 1e-6 });
    expectAbsClose(maxError(aTs(r), truth.log10aT), 0, 1e-4, 'noise-free WLF');
    expect(WLF_UNIVERSAL.kind).toBe('wlf');
    expect(MELT.equilibriumModulusPa).toBe(0);
  });
});

describe('shiftIsotherms() with other drivers and modes', () => {
  it('shiftIsotherms() shifts |η*| with its own reduction (|η*|·bT/aT)', () => {
    const { dataset, truth } = make(MELT_ARRHENIUS, 0.02, 2);
    for (const iso of dataset.isotherms)
      iso.quantities.complexViscosity = iso.x.map(
        (w, i) => Math.hypot(iso.quantities.storageModulus![i], iso.quantities.lossModulus![i]) / w,
      );
    const r = shiftIsotherms(dataset, { referenceK: 463.15, drivers: ['complexViscosity'] });
    expectAbsClose(maxError(aTs(r), truth.log10aT), 0, 0.02, '|η*| alone');
  });

  it("shiftIsotherms() refuses vertical 'data' for relaxation data, explaining why", () => {
    const { dataset } = make(RELAX_WLF, 0.02, 1);
    expect(() => shiftIsotherms(dataset, { referenceK: 300, vertical: 'data' })).toThrow(/density/);
  });
});
