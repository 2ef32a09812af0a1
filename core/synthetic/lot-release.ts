/**
 * Invented lot-release demo (samples/lot-release/): a released reference lot of an invented
 * polyolefin melt and three invented production lots, measured alike (oscillatory shear,
 * 100 → 0.1 rad/s, five temperatures 170–230 °C, long CSV), plus a specification file. The
 * lots differ from the reference by known amounts, stated in the folder README and truth.json:
 * lot 2 relaxes 0.02 decade more slowly, lot 3 is 3 % softer, lot 4 relaxes 0.25 decade more
 * slowly (a higher molar mass: η0 about 10^0.25 ≈ 1.8 times higher) and fails the specification.
 * Firm, product and numbers are invented; the generator is seeded and pure.
 */
import { ZERO_CELSIUS_K } from '../data/temperature';
import type { DemoFile, DemoScenario } from './demo-types';
import { measureDemoScenario } from './demo-measure';
import { writeLongLayout } from './demo-layout-long';
import { meltProny } from './spectrum-shapes';
import type { PronySeries } from '../spectrum/prony-model';

const C_TO_K = ZERO_CELSIUS_K;
export const LOT_FIRM = 'Fenwright Resins';
export const LOT_PRODUCT = 'FR-44 blow-moulding polyolefin';

export interface LotDefinition {
  /** File stem, e.g. "fr44-lot-1-reference". */
  stem: string;
  label: string;
  log10TauFactor: number;
  modulusFactor: number;
  seed: number;
}

export const LOTS: readonly LotDefinition[] = [
  {
    stem: 'fr44-lot-1-reference',
    label: 'lot 1 (released reference)',
    log10TauFactor: 0,
    modulusFactor: 1,
    seed: 44_001,
  },
  { stem: 'fr44-lot-2', label: 'lot 2', log10TauFactor: 0.02, modulusFactor: 1, seed: 44_002 },
  { stem: 'fr44-lot-3', label: 'lot 3', log10TauFactor: 0, modulusFactor: 0.97, seed: 44_003 },
  { stem: 'fr44-lot-4', label: 'lot 4', log10TauFactor: 0.25, modulusFactor: 1, seed: 44_004 },
];

function lotProny(l: LotDefinition): PronySeries {
  const p = meltProny({ plateauModulusPa: 2.5e5, peakTauS: 0.02, widthDecades: 1.0 });
  return {
    equilibriumModulusPa: 0,
    tauS: p.tauS.map((t) => t * 10 ** l.log10TauFactor),
    modulusPa: p.modulusPa.map((g) => g * l.modulusFactor),
  };
}

/** The scenario of one lot, in the demo generator's terms. */
export function lotScenario(l: LotDefinition): DemoScenario {
  const xs: number[] = [];
  for (let i = 0; i <= 15; i++) xs.push(Number((100 * 10 ** (-i / 5)).toPrecision(5)));
  return {
    id: `lot-release/${l.stem}`,
    firm: LOT_FIRM,
    product: `${LOT_PRODUCT}, ${l.label}`,
    description: `Invented production lot of ${LOT_PRODUCT} (${LOT_FIRM}, invented firm).`,
    layout: 'long',
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: 200 + C_TO_K,
    prony: lotProny(l),
    law: { kind: 'arrhenius', activationEnergyJPerMol: 42_000 },
    density: null,
    setPointsC: [170, 185, 200, 215, 230],
    xValues: xs,
    xUnit: 'rad/s',
    modulusUnit: 'Pa',
    temperature: { kind: 'set' },
    relativeNoise: 0.02,
    lowTorque: null,
    seed: l.seed,
  };
}

/** The specification the demo lots are judged by (invented limits of the usual kind). */
export function lotSpecification(): object {
  return {
    format: 'thermoshift-spec',
    formatVersion: 1,
    name: `${LOT_PRODUCT} release specification (invented)`,
    invented: true,
    note: 'Invented limits for the demo lots; not a real product specification.',
    referenceTemperature: 200,
    criteria: [
      {
        kind: 'curve',
        id: 'G′ band',
        quantity: 'storageModulus',
        reducedRange: [1, 100],
        tolerancePercent: 10,
      },
      {
        kind: 'curve',
        id: 'G″ band',
        quantity: 'lossModulus',
        reducedRange: [0.3, 100],
        tolerancePercent: 10,
      },
      { kind: 'timeShift', id: 'relaxation times', maxDecades: 0.1 },
      { kind: 'activationEnergy', id: 'Ea', toleranceKJPerMol: 3 },
    ],
  };
}

function readme(): string {
  const rows = LOTS.map(
    (l) =>
      `| \`${l.stem}.csv\` | ${l.label} | ${l.log10TauFactor === 0 ? '0' : `+${l.log10TauFactor}`} | ${((l.modulusFactor - 1) * 100).toFixed(0)} % | ${l.seed} |`,
  );
  return [
    `# Lot release demo: ${LOT_PRODUCT} (invented)`,
    '',
    `Everything here is **invented**: the firm (${LOT_FIRM}), the product, the lots and every number`,
    'come from the seeded generator `core/synthetic/lot-release.ts`, written by `npm run samples`',
    '(`scripts/generate-samples.ts`). Not a real material, firm or measurement.',
    '',
    'Each lot is a polyolefin melt measured in oscillatory shear, 100 → 0.1 rad/s, at 170, 185, 200,',
    '215 and 230 °C, 2 % noise, Arrhenius shift with Ea = 42 kJ/mol. The true differences from the',
    'reference lot:',
    '',
    '| file | lot | relaxation times (decades) | moduli | seed |',
    '| --- | --- | --- | --- | --- |',
    ...rows,
    '',
    '`fr44-release.spec.json` holds the invented release specification (G′ and G″ within ±10 %, relaxation',
    'times within ±0.1 decade, Ea within ±3 kJ/mol, at 200 °C). Lot 4 relaxes 0.25 decade more slowly and',
    'fails it; lots 2 and 3 pass. Try:',
    '',
    '    npx thermoshift compare samples/lot-release/fr44-lot-1-reference.csv samples/lot-release/fr44-lot-{2,3,4}.csv --spec samples/lot-release/fr44-release.spec.json',
    '',
    'See docs/compare.md and docs/samples.md.',
    '',
  ].join('\n');
}

/** Every file of samples/lot-release/, paths relative to samples/. */
export function lotReleaseFiles(): DemoFile[] {
  const files: DemoFile[] = [];
  for (const l of LOTS) {
    const w = writeLongLayout(measureDemoScenario(lotScenario(l)), `${l.stem}.csv`);
    for (const f of w.files) files.push({ path: `lot-release/${f.path}`, content: f.content });
  }
  files.push({
    path: 'lot-release/fr44-release.spec.json',
    content: `${JSON.stringify(lotSpecification(), null, 2)}\n`,
  });
  files.push({
    path: 'lot-release/truth.json',
    content: `${JSON.stringify({ invented: true, generator: 'core/synthetic/lot-release.ts', activationEnergyKJPerMol: 42, referenceTemperatureC: 200, lots: LOTS }, null, 2)}\n`,
  });
  files.push({ path: 'lot-release/README.md', content: readme() });
  return files;
}
