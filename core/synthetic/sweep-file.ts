/**
 * A synthetic oscillatory data set written as a lab would export it: one long CSV table, one row
 * per point, the isotherms one complete frequency sweep after another, with the measured
 * temperature of each row wandering about its set point (an AR(1) walk, wander.ts). Used to test
 * the importer's grouping on closely spaced isotherms and dense sweeps. Invented data.
 */
import { ZERO_CELSIUS_K } from '../data/temperature';
import type { Dataset } from '../data/types';
import { seededRandom } from './random';
import { wanderingOffsetsK } from './wander';

export interface SweepFileOptions {
  /** Largest excursion of the measured temperature from the set point, K. @default 0 */
  wanderK?: number;
  /** Sweep from high to low frequency, as many rheometers do. @default true */
  descending?: boolean;
  /** Seed of the temperature wander. @default 1 */
  seed?: number;
}

const C_TO_K = ZERO_CELSIUS_K;

/**
 * The isotherms of `dataset` (G′ and G″ required) as one long CSV text: Temperature (°C),
 * Angular frequency (rad/s), G′ (Pa), G″ (Pa). Row r + 2 holds the r-th point written.
 */
export function sweepFileText(dataset: Dataset, options: SweepFileOptions = {}): string {
  const wanderK = options.wanderK ?? 0;
  const descending = options.descending ?? true;
  const rng = seededRandom(options.seed ?? 1);
  const lines = [
    '# invented synthetic data (core/synthetic sweep-file), not a real material or measurement',
    "Temperature (°C),Angular frequency (rad/s),G' (Pa),G'' (Pa)",
  ];
  for (const iso of dataset.isotherms) {
    const gp = iso.quantities.storageModulus;
    const gpp = iso.quantities.lossModulus;
    if (!gp || !gpp)
      throw new RangeError(`sweepFileText(): isotherm ${iso.id} needs storage and loss moduli`);
    const order = iso.x.map((_, i) => i);
    if (descending) order.reverse();
    const offsets = wanderingOffsetsK(order.length, wanderK, rng);
    order.forEach((i, j) => {
      const t = iso.temperatureK - C_TO_K + offsets[j];
      lines.push(
        `${t.toFixed(3)},${iso.x[i].toPrecision(7)},${gp[i].toPrecision(6)},${gpp[i].toPrecision(6)}`,
      );
    });
  }
  return `${lines.join('\n')}\n`;
}
