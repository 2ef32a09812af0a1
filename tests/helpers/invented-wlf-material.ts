/**
 * An invented amorphous material used by the spectrum and model tests: a smooth Prony spectrum
 * (2 GPa glassy, 2 MPa rubbery, 1e-7–1e3 s, 3 modes a decade) that follows WLF with C1 = 9,
 * C2 = 100 K at 30 °C (invented constants of the usual size), measured in shear from 0.1 to
 * 100 rad/s. Seeded, so every call with the same arguments gives the same data.
 */
import { smoothProny, syntheticIsotherms } from '../../core/synthetic';
import type { PronySeries } from '../../core/spectrum/prony-model';

/** Reference temperature of the invented material, K (30 °C). */
export const INVENTED_REFERENCE_K = 303.15;

/** True relaxation spectrum of the invented material at the reference temperature. */
export const inventedWlfProny = (): PronySeries =>
  smoothProny({
    tauMinS: 1e-7,
    tauMaxS: 1e3,
    modesPerDecade: 3,
    glassyModulusPa: 2e9,
    equilibriumModulusPa: 2e6,
  });

/** Oscillatory shear isotherms of `prony` under the invented WLF law, 0.1–100 rad/s. */
export function inventedWlfIsotherms(
  prony: PronySeries,
  temperaturesK: number[],
  pointsPerDecade: number,
  relativeNoise: number,
  seed: number,
) {
  return syntheticIsotherms({
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: INVENTED_REFERENCE_K,
    temperaturesK,
    components: [{ prony, law: { kind: 'wlf', c1: 9, c2K: 100 } }],
    xMin: 0.1,
    xMax: 100,
    pointsPerDecade,
    relativeNoise,
    seed,
  });
}
