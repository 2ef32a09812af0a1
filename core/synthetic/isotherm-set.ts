/**
 * Synthetic isotherms from a known Prony model and a known shift law: the yardstick for every
 * accuracy test and the source of the invented demo samples. Everything is reproducible from the
 * seed. Sign conventions as in docs/conventions.md §2: measured at T, G(ω) = G_ref(aT·ω) / bT.
 */
import { measuredFromReduced } from '../data/reduction';
import type { Dataset, DeformationMode, Isotherm, QuantityId, TestKind } from '../data/types';
import type { PronySeries } from '../spectrum/prony-model';
import { pronyLoss, pronyRelaxation, pronyStorage } from '../spectrum/prony-model';
import { arrheniusLog10aT, wlfLog10aT } from '../models/shift-laws';
import { seededRandom } from './random';
import { pointNoise, syntheticBT, syntheticIsotherm } from './isotherm-frame';
import type { SyntheticSetOptions } from './isotherm-frame';

export type ShiftLaw =
  { kind: 'wlf'; c1: number; c2K: number } | { kind: 'arrhenius'; activationEnergyJPerMol: number };

export interface SyntheticComponent {
  prony: PronySeries;
  law: ShiftLaw;
}

export interface SyntheticOptions extends SyntheticSetOptions {
  testKind: Exclude<TestKind, 'creep'>;
  deformation: DeformationMode;
  /** One component for a thermorheologically simple material; two or more make it complex. */
  components: SyntheticComponent[];
  /** Measurement window of the instrument: ω in rad/s or t in s. */
  xMin: number;
  xMax: number;
  pointsPerDecade: number;
}

export interface SyntheticTruth {
  log10aT: number[];
  log10bT: number[];
}

export function shiftLawLog10aT(law: ShiftLaw, temperatureK: number, referenceK: number): number {
  return law.kind === 'wlf'
    ? wlfLog10aT(temperatureK, law.c1, law.c2K, referenceK)
    : arrheniusLog10aT(temperatureK, law.activationEnergyJPerMol, referenceK);
}

function logGrid(min: number, max: number, perDecade: number): number[] {
  const n = Math.max(2, Math.round(Math.log10(max / min) * perDecade) + 1);
  const step = Math.log10(max / min) / (n - 1);
  return Array.from({ length: n }, (_, i) => min * 10 ** (i * step));
}

export function syntheticIsotherms(o: SyntheticOptions): {
  dataset: Dataset;
  truth: SyntheticTruth;
} {
  const rng = seededRandom(o.seed);
  const xs = logGrid(o.xMin, o.xMax, o.pointsPerDecade);
  const file = `${o.name ?? 'synthetic'}.csv`;
  const truth: SyntheticTruth = { log10aT: [], log10bT: [] };
  const isotherms: Isotherm[] = o.temperaturesK.map((T, k) => {
    const bT = syntheticBT(T, o.referenceK, o.density);
    truth.log10aT.push(shiftLawLog10aT(o.components[0].law, T, o.referenceK));
    truth.log10bT.push(Math.log10(bT));
    const shifts = o.components.map((c) => 10 ** shiftLawLog10aT(c.law, T, o.referenceK));
    const noisy = (v: number, i: number): number => {
      return v * Math.exp(pointNoise(o.relativeNoise, o.outliers, k, i) * rng.normal());
    };
    const quantities: Partial<Record<QuantityId, number[]>> = {};
    if (o.testKind === 'oscillatory') {
      const gp: number[] = [];
      const gpp: number[] = [];
      xs.forEach((w, i) => {
        let s = 0;
        let l = 0;
        o.components.forEach((c, j) => {
          s += pronyStorage(c.prony, shifts[j] * w);
          l += pronyLoss(c.prony, shifts[j] * w);
        });
        // Each component has its own aT (thermorheologically complex); moduli do not depend on it.
        gp.push(noisy(measuredFromReduced('storageModulus', s, shifts[0], bT), i));
        gpp.push(noisy(measuredFromReduced('lossModulus', l, shifts[0], bT), i));
      });
      quantities.storageModulus = gp;
      quantities.lossModulus = gpp;
      quantities.tanDelta = gpp.map((v, i) => v / gp[i]);
    } else {
      quantities.relaxationModulus = xs.map((t, i) => {
        let s = 0;
        o.components.forEach((c, j) => (s += pronyRelaxation(c.prony, t / shifts[j])));
        return noisy(measuredFromReduced('relaxationModulus', s, shifts[0], bT), i);
      });
    }
    return syntheticIsotherm(k, T, xs, quantities, file);
  });
  const dataset: Dataset = {
    name: o.name ?? 'synthetic',
    testKind: o.testKind,
    deformation: o.deformation,
    abscissa: o.testKind === 'oscillatory' ? 'angularFrequency' : 'time',
    isotherms,
    files: [file],
    metadata: { invented: 'yes', generator: 'core/synthetic', seed: String(o.seed) },
  };
  return { dataset, truth };
}

/**
 * A smooth relaxation spectrum: `modesPerDecade` Maxwell modes between tauMin and tauMax with
 * strengths following a log-normal-like bump on top of a power law, so that G' and G'' are smooth
 * and every part of the window has curvature for the shift to grip.
 */
export function smoothProny(opts: {
  tauMinS: number;
  tauMaxS: number;
  modesPerDecade: number;
  glassyModulusPa: number;
  equilibriumModulusPa: number;
  slope?: number;
}): PronySeries {
  const taus = logGrid(opts.tauMinS, opts.tauMaxS, opts.modesPerDecade);
  const slope = opts.slope ?? 0.5;
  const raw = taus.map((t) => (t / opts.tauMinS) ** -slope);
  const sum = raw.reduce((a, b) => a + b, 0);
  const total = opts.glassyModulusPa - opts.equilibriumModulusPa;
  return {
    equilibriumModulusPa: opts.equilibriumModulusPa,
    tauS: taus,
    modulusPa: raw.map((r) => (r / sum) * total),
  };
}
