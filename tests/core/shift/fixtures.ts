/**
 * Invented, seeded test materials for the shift engine (no real lab data). Spectra are chosen so
 * that the measured windows hold features the shift can grip: a melt whose terminal zone
 * (G' ∝ ω², G'' ∝ ω) lies in the window, a rubber across its glass–rubber transition, and a
 * relaxation modulus falling steeply through the window. Temperatures are spaced so that
 * neighbouring isotherms overlap by two decades or more (common practice when planning TTS tests).
 */
import { smoothProny, syntheticCreep, syntheticIsotherms } from '../../../core/synthetic';
import type {
  ShiftLaw,
  SyntheticCreepOptions,
  SyntheticDensity,
  SyntheticOptions,
} from '../../../core/synthetic';
import type { ShiftResult } from '../../../core/shift';
import { expectAbsClose } from '../../helpers/assert-close';
import type { PronySeries } from '../../../core/spectrum/prony-model';
import type { Dataset } from '../../../core/data/types';
import { buildProblem } from '../../../core/shift/build-problem';

/** Invented Prony spectrum, two modes per decade (all fixtures use this density). */
const spectrum = (
  tauMinS: number,
  tauMaxS: number,
  glassyModulusPa: number,
  equilibriumModulusPa: number,
  slope: number,
): PronySeries =>
  smoothProny({
    tauMinS,
    tauMaxS,
    modesPerDecade: 2,
    glassyModulusPa,
    equilibriumModulusPa,
    slope,
  });

/** Melt: power-law modes up to 1 s, no equilibrium modulus → terminal zone below ~1 rad/s. */
export const MELT: PronySeries = spectrum(1e-5, 1, 1e6, 0, 0.3);

/** Rubber across its transition: 1 GPa glassy to 1 MPa rubbery. */
export const RUBBER: PronySeries = spectrum(1e-8, 1e3, 1e9, 1e6, 0.6);

/** Relaxation: G(t) ∝ t^−0.9 through the window (steep, so one quantity suffices). */
export const RELAXING: PronySeries = spectrum(1e-4, 1e7, 1e12, 1e3, 0.9);

/**
 * 'Universal' WLF constants at about Tg + 50 K: C1 = 8.86, C2 = 101.6 K (Williams, Landel & Ferry,
 * J. Am. Chem. Soc. 77, 3701, 1955).
 */
export const WLF_UNIVERSAL: ShiftLaw = { kind: 'wlf', c1: 8.86, c2K: 101.6 };
/**
 * Polybutadiene (96 % cis), T0 = 298 K: C1 = 3.44, C2 = 196.6 K (Physical Properties of Polymers
 * Handbook, J. E. Mark ed., table of WLF parameters; as quoted in docs/conventions.md §3).
 */
export const WLF_POLYBUTADIENE: ShiftLaw = { kind: 'wlf', c1: 3.44, c2K: 196.6 };
/** Melt flow activation energy 60 kJ/mol, the order quoted for branched polyethylene (from memory). */
export const ARRHENIUS_MELT: ShiftLaw = { kind: 'arrhenius', activationEnergyJPerMol: 6e4 };
/** A steeper Arrhenius law, 200 kJ/mol (a secondary-transition-like value, invented). */
export const ARRHENIUS_STEEP: ShiftLaw = { kind: 'arrhenius', activationEnergyJPerMol: 2e5 };

export const temperatures = (
  referenceK: number,
  count: number,
  below: number,
  stepK: number,
): number[] => Array.from({ length: count }, (_, i) => referenceK + (i - below) * stepK);

export interface Case {
  name: string;
  options: Omit<SyntheticOptions, 'relativeNoise' | 'seed'>;
}

const osc = {
  testKind: 'oscillatory',
  deformation: 'shear',
  xMin: 0.1,
  xMax: 100,
  pointsPerDecade: 5,
} as const;
const rel = {
  testKind: 'relaxation',
  deformation: 'shear',
  xMin: 1,
  xMax: 1000,
  pointsPerDecade: 5,
} as const;

/** Temperature plan of a case: reference, number of isotherms, how many below it, step. */
type Plan = [referenceK: number, count: number, below: number, stepK: number];

/** One-component case on the window `base`, with temperatures from `plan`. */
const oneComponent = (
  name: string,
  base: typeof osc | typeof rel,
  [referenceK, count, below, stepK]: Plan,
  prony: PronySeries,
  law: ShiftLaw,
): Case => ({
  name,
  options: {
    ...base,
    referenceK,
    temperaturesK: temperatures(referenceK, count, below, stepK),
    components: [{ prony, law }],
  },
});

export const MELT_ARRHENIUS: Case = oneComponent(
  'melt, Arrhenius 60 kJ/mol, 10 isotherms 150–240 °C',
  osc,
  [463.15, 10, 4, 10],
  MELT,
  ARRHENIUS_MELT,
);
export const MELT_WLF_PB: Case = oneComponent(
  'melt, WLF polybutadiene constants, 11 isotherms 0–50 °C',
  osc,
  [298, 11, 5, 5],
  MELT,
  WLF_POLYBUTADIENE,
);
export const MELT_WLF_UNIVERSAL: Case = oneComponent(
  'melt, WLF universal constants, 11 isotherms 3 K apart',
  osc,
  [400, 11, 3, 3],
  MELT,
  WLF_UNIVERSAL,
);
export const RUBBER_WLF: Case = oneComponent(
  'rubber transition, WLF universal constants, 10 isotherms 4 K apart',
  osc,
  [300, 10, 4, 4],
  RUBBER,
  WLF_UNIVERSAL,
);
export const RELAX_WLF: Case = oneComponent(
  'relaxation, WLF universal constants, 10 isotherms 4 K apart',
  rel,
  [300, 10, 4, 4],
  RELAXING,
  WLF_UNIVERSAL,
);
export const RELAX_ARRHENIUS: Case = oneComponent(
  'relaxation, Arrhenius 200 kJ/mol, 10 isotherms 4 K apart',
  rel,
  [350, 10, 4, 4],
  RELAXING,
  ARRHENIUS_STEEP,
);

/** Two components with different shift laws: a thermorheologically complex (invented) blend. */
export const BLEND: Case = {
  name: 'blend of two melts with Arrhenius 30 and 120 kJ/mol',
  options: {
    ...osc,
    referenceK: 463.15,
    temperaturesK: temperatures(463.15, 10, 4, 10),
    components: [
      {
        prony: spectrum(1e-5, 1, 1e6, 0, 0.3),
        law: { kind: 'arrhenius', activationEnergyJPerMol: 3e4 },
      },
      {
        prony: spectrum(1e-2, 1e2, 1e5, 0, 0.3),
        law: { kind: 'arrhenius', activationEnergyJPerMol: 1.2e5 },
      },
    ],
  },
};

/** 8 % noise plus 30 % noise on the three lowest-x points of isotherms 8 and 9 (low torque). */
export const LOW_TORQUE = { isothermIndices: [7, 8], count: 3, relativeNoise: 0.3 };

/** The noise, seed, optional low-torque outliers and invented name every fixture set shares. */
function run(name: string, relativeNoise: number, seed: number, lowTorque: boolean) {
  return {
    relativeNoise,
    seed,
    ...(lowTorque ? { outliers: LOW_TORQUE } : {}),
    name: `invented ${name}`,
  };
}

export function make(c: Case, relativeNoise: number, seed: number, lowTorque = false) {
  return syntheticIsotherms({ ...c.options, ...run(c.name, relativeNoise, seed, lowTorque) });
}

/** Fit problem over every isotherm of `dataset`, G′ and G″ as drivers, horizontal shifts only. */
export function horizontalProblem(dataset: Dataset) {
  return buildProblem(dataset, {
    active: dataset.isotherms.map((_, k) => k),
    drivers: ['storageModulus', 'lossModulus'],
    fixedLog10bT: null,
    joint: false,
    minOverlapPoints: 4,
    maxPointsPerDecade: 40,
  });
}

/**
 * Appends to `z` the error over the standard error, (estimated − true log10 aT)/stdErr, of every
 * isotherm that has a standard error, in isotherm order.
 */
export function pushStandardisedErrors(
  z: number[],
  curves: { log10aT: number | null; log10aTStdErr: number | null }[],
  truth: number[],
): void {
  curves.forEach((cv, k) => {
    if (cv.log10aTStdErr) z.push((cv.log10aT! - truth[k]) / cv.log10aTStdErr);
  });
}

/** Root mean square of `z`. */
export const rootMeanSquare = (z: number[]): number =>
  Math.sqrt(z.reduce((a, b) => a + b * b, 0) / z.length);

/** Largest |estimated − true log10 aT| over the isotherms, decades. */
export function maxError(estimated: (number | null)[], truth: number[]): number {
  return estimated.reduce<number>(
    (m, v, k) => Math.max(m, v === null ? Infinity : Math.abs(v - truth[k])),
    0,
  );
}

/** Creep cases: the creep compliance of RELAXING (J ∝ t^0.9 through the window), 1–1000 s. */
export interface CreepCase {
  name: string;
  options: Omit<SyntheticCreepOptions, 'relativeNoise' | 'seed'>;
}
const creep = { deformation: 'shear', tMinS: 1, tMaxS: 1000, pointsPerDecade: 5 } as const;
const creepCase = (
  name: string,
  [referenceK, count, below, stepK]: Plan,
  law: ShiftLaw,
): CreepCase => ({
  name,
  options: {
    ...creep,
    referenceK,
    temperaturesK: temperatures(referenceK, count, below, stepK),
    prony: RELAXING,
    law,
  },
});
export const CREEP_WLF: CreepCase = creepCase(
  'creep, WLF universal constants, 10 isotherms 4 K apart',
  [300, 10, 4, 4],
  WLF_UNIVERSAL,
);
export const CREEP_ARRHENIUS: CreepCase = creepCase(
  'creep, Arrhenius 200 kJ/mol, 10 isotherms 4 K apart',
  [350, 10, 4, 4],
  ARRHENIUS_STEEP,
);

/** Creep set; `disturbed` gives the first three points of isotherms 8 and 9 30 % noise. */
export function makeCreep(c: CreepCase, relativeNoise: number, seed: number, disturbed = false) {
  return syntheticCreep({ ...c.options, ...run(c.name, relativeNoise, seed, disturbed) });
}

/**
 * The invented melt (MELT, Arrhenius 60 kJ/mol, Tref 463.15 K) at any temperatures and density of
 * points, 2 % noise: dense sweeps, closely spaced isotherms and, with `density`, an entropic bT.
 */
export function inventedMelt(o: {
  temperaturesK: number[];
  pointsPerDecade: number;
  seed: number;
  xMin?: number;
  xMax?: number;
  density?: SyntheticDensity;
}) {
  return syntheticIsotherms({
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: 463.15,
    temperaturesK: o.temperaturesK,
    components: [{ prony: MELT, law: ARRHENIUS_MELT }],
    xMin: o.xMin ?? 0.1,
    xMax: o.xMax ?? 100,
    pointsPerDecade: o.pointsPerDecade,
    relativeNoise: 0.02,
    ...(o.density && { density: o.density }),
    seed: o.seed,
    name: 'invented melt',
  });
}

/** Asserts that the largest |estimated − true log10 aT| is at most `tolerance` decades. */
export function expectShiftsWithin(
  r: ShiftResult,
  truth: number[],
  tolerance: number,
  what: string,
): void {
  expectAbsClose(
    maxError(
      r.curves.map((c) => c.log10aT),
      truth,
    ),
    0,
    tolerance,
    what,
  );
}
