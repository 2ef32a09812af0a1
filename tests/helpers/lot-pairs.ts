/**
 * Invented lots for the comparison tests: a smooth transition spectrum (core/synthetic
 * smoothProny) under an Arrhenius law, measured in oscillatory shear 0.1–100 rad/s at five
 * temperatures, 6 points a decade, 2 % noise. Small sets so that hundreds of pairs stay cheap.
 * A lot can have its relaxation times scaled, its moduli scaled, or another activation energy.
 */
import { smoothProny, syntheticIsotherms } from '../../core/synthetic';
import { buildMasterCurve } from '../../core/pipeline';
import type { Analysis } from '../../core/pipeline/types';

export const LOT_REFERENCE_K = 303.15;
export const LOT_EA_J_PER_MOL = 150_000;

export interface LotChange {
  /** log10 of the factor on every relaxation time. @default 0 */
  log10TauFactor?: number;
  /** Factor on every modulus. @default 1 */
  modulusFactor?: number;
  /** Activation energy, J/mol. @default LOT_EA_J_PER_MOL */
  activationEnergyJPerMol?: number;
}

export function lotAnalysis(seed: number, change: LotChange = {}): Analysis {
  const base = smoothProny({
    tauMinS: 1e-6,
    tauMaxS: 1e3,
    modesPerDecade: 3,
    glassyModulusPa: 1e9,
    equilibriumModulusPa: 1e6,
  });
  const f = 10 ** (change.log10TauFactor ?? 0);
  const m = change.modulusFactor ?? 1;
  const prony = {
    equilibriumModulusPa: base.equilibriumModulusPa * m,
    tauS: base.tauS.map((t) => t * f),
    modulusPa: base.modulusPa.map((g) => g * m),
  };
  const { dataset } = syntheticIsotherms({
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: LOT_REFERENCE_K,
    temperaturesK: [283.15, 293.15, 303.15, 313.15, 323.15],
    components: [
      {
        prony,
        law: {
          kind: 'arrhenius',
          activationEnergyJPerMol: change.activationEnergyJPerMol ?? LOT_EA_J_PER_MOL,
        },
      },
    ],
    xMin: 0.1,
    xMax: 100,
    pointsPerDecade: 6,
    relativeNoise: 0.02,
    seed,
    name: `lot-${seed}`,
  });
  return buildMasterCurve(dataset, {
    referenceTemperatureK: LOT_REFERENCE_K,
    pronyModesPerDecade: 0,
  });
}
