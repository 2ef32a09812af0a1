/**
 * Synthetic creep isotherms from a known relaxation Prony model and a known shift law: the
 * yardstick for shifting creep data. The relaxation series is turned into its exact creep
 * compliance J(t) (core/spectrum creepFromProny: Tschoegl 1989, ch. 4; Park & Schapery 1999), and
 * each isotherm is measured as
 *   J(T, t) = bT · J_ref(t / aT)
 * so that the reduced compliance J(T, t)/bT at the reduced time t/aT falls on the reference curve
 * (docs/conventions.md §2: reduced compliance = measured / bT). Noise is multiplicative and seeded, as in
 * syntheticIsotherms. Everything is invented and reproducible from the seed.
 */
import { measuredFromReduced, reducedAbscissa } from '../data/reduction';
import type { Dataset, DeformationMode, Isotherm } from '../data/types';
import type { PronySeries } from '../spectrum/prony-model';
import type { RetardationSeries } from '../spectrum/creep-from-prony';
import { creepCompliance, creepFromProny } from '../spectrum/creep-from-prony';
import type { ShiftLaw } from './isotherm-set';
import { shiftLawLog10aT } from './isotherm-set';
import { seededRandom } from './random';
import { pointNoise, syntheticBT, syntheticIsotherm } from './isotherm-frame';
import type { SyntheticSetOptions } from './isotherm-frame';

export interface SyntheticCreepOptions extends SyntheticSetOptions {
  /** 'shear' gives J(t) in 1/Pa; tension or bending give D(t), stored the same way. */
  deformation: DeformationMode;
  /** Relaxation Prony series of the material at Tref; its creep compliance is derived exactly. */
  prony: PronySeries;
  law: ShiftLaw;
  /** Creep times of the instrument, s. */
  tMinS: number;
  tMaxS: number;
  pointsPerDecade: number;
}

export interface SyntheticCreepTruth {
  log10aT: number[];
  log10bT: number[];
  /** J_ref(t) of the material at Tref. */
  retardation: RetardationSeries;
}

function checkCreepOptions(o: SyntheticCreepOptions): void {
  const positive: [string, number][] = [
    ['referenceK', o.referenceK],
    ['tMinS', o.tMinS],
    ['tMaxS', o.tMaxS],
    ['pointsPerDecade', o.pointsPerDecade],
  ];
  for (const [name, v] of positive)
    if (!(Number.isFinite(v) && v > 0))
      throw new RangeError(`The ${name} option must be a positive number (got ${v}).`);
  if (!(o.tMaxS > o.tMinS))
    throw new RangeError(`The tMaxS option must exceed tMinS (got ${o.tMinS}–${o.tMaxS} s).`);
  if (!(Number.isFinite(o.relativeNoise) && o.relativeNoise >= 0))
    throw new RangeError(`The relativeNoise option must be ≥ 0 (got ${o.relativeNoise}).`);
}

function timeGrid(min: number, max: number, perDecade: number): number[] {
  const decades = Math.log10(max / min);
  const n = Math.max(2, Math.round(decades * perDecade) + 1);
  return Array.from({ length: n }, (_, i) => min * 10 ** ((i * decades) / (n - 1)));
}

export function syntheticCreep(o: SyntheticCreepOptions): {
  dataset: Dataset;
  truth: SyntheticCreepTruth;
} {
  checkCreepOptions(o);
  const rng = seededRandom(o.seed);
  const retardation = creepFromProny(o.prony);
  const ts = timeGrid(o.tMinS, o.tMaxS, o.pointsPerDecade);
  const file = `${o.name ?? 'synthetic creep'}.csv`;
  const truth: SyntheticCreepTruth = { log10aT: [], log10bT: [], retardation };
  const isotherms: Isotherm[] = o.temperaturesK.map((T, k) => {
    const bT = syntheticBT(T, o.referenceK, o.density);
    const log10aT = shiftLawLog10aT(o.law, T, o.referenceK);
    truth.log10aT.push(log10aT);
    truth.log10bT.push(Math.log10(bT));
    const aT = 10 ** log10aT;
    const compliance = ts.map((t, i) => {
      const sd = pointNoise(o.relativeNoise, o.outliers, k, i);
      const reduced = creepCompliance(retardation, reducedAbscissa('time', t, aT));
      return measuredFromReduced('creepCompliance', reduced, aT, bT) * Math.exp(sd * rng.normal());
    });
    return syntheticIsotherm(k, T, ts, { creepCompliance: compliance }, file);
  });
  const dataset: Dataset = {
    name: o.name ?? 'synthetic creep',
    testKind: 'creep',
    deformation: o.deformation,
    abscissa: 'time',
    isotherms,
    files: [file],
    metadata: { invented: 'yes', generator: 'core/synthetic creep', seed: String(o.seed) },
  };
  return { dataset, truth };
}
