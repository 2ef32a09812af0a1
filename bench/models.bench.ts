/**
 * `npm run bench -- models`: timing of the shift-model fits, the Prony fit and interconversion,
 * on invented synthetic data (core/synthetic). Prints median wall times and the accuracy reached.
 */
import { fitArrhenius, fitWlf, wlfLog10aT } from '../core/models/index.ts';
import {
  creepCompliance,
  creepFromProny,
  fitProny,
  fitViscosityCurve,
  pronyLoss,
  pronyStorage,
} from '../core/spectrum/index.ts';
import { seededRandom, smoothProny } from '../core/synthetic/index.ts';
import { medianMs } from './timing.ts';

export async function run(): Promise<void> {
  const rng = seededRandom(2026);
  const refK = 323.15;
  const temps = Array.from({ length: 12 }, (_, i) => 263.15 + 10 * i);
  const pts = temps.map((T) => ({
    temperatureK: T,
    log10aT: T === refK ? 0 : wlfLog10aT(T, 8.86, 101.6, refK) + 0.015 * rng.normal(),
    stdErr: T === refK ? 0 : 0.015,
  }));
  const wlfMs = medianMs(() => fitWlf(pts, { referenceK: refK }), 21, 3);
  const arrMs = medianMs(() => fitArrhenius(pts, { referenceK: refK }), 21, 3);
  const wlf = fitWlf(pts, { referenceK: refK });
  console.log(
    `WLF fit, 12 temperatures: ${wlfMs.toFixed(2)} ms (${wlf.iterations} LM iterations, C1 ${wlf.c1.toFixed(2)}, C2 ${wlf.c2K.toFixed(1)} K)`,
  );
  console.log(`Arrhenius fit, 12 temperatures: ${arrMs.toFixed(3)} ms`);

  // Prony: 2000 reduced points over 12 decades, G' and G'' with 2 % noise, 2 modes/decade
  const truth = smoothProny({
    tauMinS: 1e-8,
    tauMaxS: 1e4,
    modesPerDecade: 3,
    glassyModulusPa: 2e9,
    equilibriumModulusPa: 1e6,
  });
  const x = Array.from({ length: 2000 }, (_, i) => 10 ** (-4 + (12 * i) / 1999));
  const storage = x.map((w) => pronyStorage(truth, w) * Math.exp(0.02 * rng.normal()));
  const loss = x.map((w) => pronyLoss(truth, w) * Math.exp(0.02 * rng.normal()));
  const pronyMs = medianMs(() => fitProny({ x, storage, loss }, { modesPerDecade: 2 }), 5, 1);
  const p = fitProny({ x, storage, loss }, { modesPerDecade: 2 });
  console.log(
    `Prony fit, 2000 points × (G', G''), ${p.series.tauS.length} modes over 12 decades: ${pronyMs.toFixed(1)} ms ` +
      `(RMS error G' ${(100 * p.fitError.storageRms).toFixed(2)} %, G'' ${(100 * p.fitError.lossRms).toFixed(2)} %, ${p.activeModes} active modes)`,
  );

  // 10⁶ points: the master curve is log-binned before the fit (20 bins a decade)
  const big = 1_000_000;
  const bx = new Float64Array(big);
  const bs = new Float64Array(big);
  const bl = new Float64Array(big);
  const beta = new Float64Array(big);
  for (let i = 0; i < big; i++) {
    const w = 10 ** (-4 + 12 * rng.uniform());
    bx[i] = w;
    bs[i] = pronyStorage(truth, w) * Math.exp(0.02 * rng.normal());
    bl[i] = pronyLoss(truth, w) * Math.exp(0.02 * rng.normal());
    beta[i] = Math.hypot(bs[i], bl[i]) / w;
  }
  const bigMs = medianMs(() => fitProny({ x: bx, storage: bs, loss: bl }), 3, 1);
  const bp = fitProny({ x: bx, storage: bs, loss: bl });
  console.log(
    `Prony fit, 10⁶ points × (G', G''), binned to ${bp.binCount} rows, ${bp.series.tauS.length} modes: ${bigMs.toFixed(0)} ms ` +
      `(RMS error G' ${(100 * bp.fitError.storageRms).toFixed(2)} %, G'' ${(100 * bp.fitError.lossRms).toFixed(2)} % against every point)`,
  );
  const bigVisMs = medianMs(() => fitViscosityCurve(bx, beta), 3, 1);
  console.log(`Viscosity-law fit of |η*|, 10⁶ points (binned): ${bigVisMs.toFixed(0)} ms`);

  const times = Array.from({ length: 200 }, (_, i) => 10 ** (-8 + (14 * i) / 199));
  const creepMs = medianMs(
    () => {
      const r = creepFromProny(p.series);
      return times.map((t) => creepCompliance(r, t));
    },
    21,
    3,
  );
  console.log(
    `Interconversion G(t) → J(t), ${p.series.tauS.length} modes, 200 times: ${creepMs.toFixed(2)} ms`,
  );

  const omega = Array.from({ length: 60 }, (_, i) => 10 ** (-3 + (6 * i) / 59));
  const eta = omega.map((w) => (1e4 / (1 + (0.5 * w) ** 0.7)) * Math.exp(0.02 * rng.normal()));
  const visMs = medianMs(() => fitViscosityCurve(omega, eta), 11, 2);
  console.log(
    `Cross and Carreau–Yasuda fits of |η*| (the data choose), 60 points: ${visMs.toFixed(2)} ms`,
  );
}
