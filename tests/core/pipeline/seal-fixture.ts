/**
 * Known truth for design-query tests: a rubber-like solid (invented) measured in stress relaxation,
 * 1 s to 10⁴ s at 60–140 °C, shifted by the WLF 'universal' constants at Tg + 50 K (8.86 / 101.6 K;
 * Williams, Landel & Ferry, JACS 77, 3701, 1955) with Tref = 100 °C, 1 % noise, fixed seed. Used
 * by the core test of predictFromAnalysis and by the command-line test of `build --predict`.
 */
import { smoothProny, type SyntheticOptions } from '../../../core/synthetic';
import { wlfLog10aT } from '../../../core/models/shift-laws';

export const SEAL_WLF = { c1: 8.86, c2K: 101.6, referenceK: 373.15 };

export const SEAL_PRONY = smoothProny({
  tauMinS: 1e-6,
  tauMaxS: 1e9,
  modesPerDecade: 2,
  glassyModulusPa: 1e9,
  equilibriumModulusPa: 2e6,
  slope: 0.15,
});

export const SEAL_DATA: SyntheticOptions = {
  testKind: 'relaxation',
  deformation: 'shear',
  referenceK: SEAL_WLF.referenceK,
  temperaturesK: Array.from({ length: 9 }, (_, i) => 333.15 + 10 * i),
  components: [{ prony: SEAL_PRONY, law: { kind: 'wlf', c1: SEAL_WLF.c1, c2K: SEAL_WLF.c2K } }],
  xMin: 1,
  xMax: 1e4,
  pointsPerDecade: 5,
  relativeNoise: 0.01,
  seed: 60,
};

/** Ten Julian years, s. */
export const TEN_YEARS_S = 10 * 365.25 * 86400;

/** The true log10 aT of the seal at T, K. */
export const sealLog10aT = (temperatureK: number): number =>
  wlfLog10aT(temperatureK, SEAL_WLF.c1, SEAL_WLF.c2K, SEAL_WLF.referenceK);
