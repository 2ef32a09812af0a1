/**
 * Turns an invented demo scenario into measurements: measured temperatures, noise-free values from
 * the true model at each point's measured temperature, then seeded multiplicative noise.
 * Conventions as in docs/conventions.md §2: measured at T, G(ω) = G_ref(aT·ω) / bT and G(t) = G_ref(t/aT) / bT.
 */
import { ZERO_CELSIUS_K } from '../data/temperature';
import {
  densityFromExpansion,
  entropicBT,
  measuredFromReduced,
  reducedAbscissa,
} from '../data/reduction';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../spectrum/prony-model';
import type { DemoMeasurements, DemoPoint, DemoScenario } from './demo-types';
import { shiftLawLog10aT } from './isotherm-set';
import type { Random } from './random';
import { seededRandom } from './random';
import { wanderingOffsetsK } from './wander';

const C_TO_K = ZERO_CELSIUS_K;

/** A point counts as low-torque when the torque floor is at least this share of its true value. */
export const LOW_TORQUE_SHARE = 0.1;

/** True log10 aT and log10 bT of a scenario at a temperature in °C. */
export function demoShiftAt(
  s: DemoScenario,
  temperatureC: number,
): { log10aT: number; log10bT: number } {
  const T = temperatureC + C_TO_K;
  const log10aT = shiftLawLog10aT(s.law, T, s.referenceK);
  if (!s.density) return { log10aT, log10bT: 0 };
  const rho = s.density.referenceDensityKgPerM3;
  const density = densityFromExpansion(T, s.referenceK, rho, s.density.volumetricExpansionPerK);
  return { log10aT, log10bT: Math.log10(entropicBT(T, s.referenceK, density, rho)) };
}

/** The independent variable in SI (ω in rad/s, t in s) from the file's unit. */
export function demoXToSI(s: DemoScenario, xFile: number): number {
  return s.xUnit === 'Hz' ? 2 * Math.PI * xFile : xFile;
}

/**
 * Noise-free true values at a measured temperature (°C) and x in SI: storage (or relaxation)
 * modulus and loss modulus, Pa (loss is NaN for relaxation tests).
 */
export function demoModelAt(
  s: DemoScenario,
  temperatureC: number,
  xSI: number,
): { primaryPa: number; lossPa: number } {
  const { log10aT, log10bT } = demoShiftAt(s, temperatureC);
  const aT = 10 ** log10aT;
  const bT = 10 ** log10bT;
  if (s.testKind === 'relaxation') {
    const reduced = pronyRelaxation(s.prony, reducedAbscissa('time', xSI, aT));
    return {
      primaryPa: measuredFromReduced('relaxationModulus', reduced, aT, bT),
      lossPa: Number.NaN,
    };
  }
  const wr = reducedAbscissa('angularFrequency', xSI, aT);
  return {
    primaryPa: measuredFromReduced('storageModulus', pronyStorage(s.prony, wr), aT, bT),
    lossPa: measuredFromReduced('lossModulus', pronyLoss(s.prony, wr), aT, bT),
  };
}

/** Measured temperatures (°C, rounded to 0.01 as the files write them) of one isotherm. */
function measuredTemperaturesC(s: DemoScenario, setPointC: number, rng: Random): number[] {
  const n = s.xValues.length;
  const t = s.temperature;
  let offsets: number[];
  if (t.kind === 'wander') offsets = wanderingOffsetsK(n, t.amplitudeK, rng);
  else if (t.kind === 'ramp') {
    offsets = s.xValues.map((_, i) => (i - (n - 1) / 2) * t.stepK + t.jitterK * rng.normal());
  } else offsets = s.xValues.map(() => 0);
  return offsets.map((o) => Math.round((setPointC + o) * 100) / 100);
}

/** Checks a scenario once, before any maths, naming the bad field. */
function checkScenario(s: DemoScenario): void {
  if (s.setPointsC.length === 0) throw new RangeError('setPointsC must not be empty');
  if (s.xValues.length < 2) throw new RangeError('xValues needs at least two values');
  if (s.xValues.some((x) => !(x > 0))) throw new RangeError('xValues must all be positive');
  if (!(s.relativeNoise >= 0)) throw new RangeError('relativeNoise must be ≥ 0');
  if (s.lowTorque && !(s.lowTorque.floorPa >= 0)) {
    throw new RangeError('lowTorque.floorPa must be ≥ 0');
  }
}

/**
 * Measures a scenario: for each set point, each x in measuring order, one point with seeded noise.
 * The same scenario always gives the same numbers (one mulberry32 stream from `seed`).
 */
export function measureDemoScenario(s: DemoScenario): DemoMeasurements {
  checkScenario(s);
  const rng = seededRandom(s.seed);
  const isotherms = s.setPointsC.map((setPointC) => {
    const temps = measuredTemperaturesC(s, setPointC, rng);
    const floorPa = s.lowTorque?.floorPa ?? 0;
    const points: DemoPoint[] = s.xValues.map((xFile, i) => {
      const xSI = demoXToSI(s, xFile);
      const truth = demoModelAt(s, temps[i], xSI);
      let primaryPa = truth.primaryPa * Math.exp(s.relativeNoise * rng.normal());
      let lossPa =
        s.testKind === 'oscillatory'
          ? truth.lossPa * Math.exp(s.relativeNoise * rng.normal())
          : Number.NaN;
      if (floorPa > 0) {
        primaryPa += floorPa * rng.normal();
        if (s.testKind === 'oscillatory') lossPa += floorPa * rng.normal();
      }
      const lowTorque = floorPa >= LOW_TORQUE_SHARE * truth.primaryPa;
      return { temperatureC: temps[i], xFile, xSI, primaryPa, lossPa, lowTorque };
    });
    return { setPointC, points };
  });
  return { scenario: s, isotherms };
}
