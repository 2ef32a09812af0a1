/**
 * The invented demo scenarios behind samples/. Firms, products and numbers are invented; the
 * material parameters are chosen to be physically plausible (orders of magnitude as in Ferry,
 * Viscoelastic Properties of Polymers, 3rd ed., 1980) and so that every isotherm shows curvature
 * and neighbouring isotherms overlap by more than a decade on the reduced axis.
 *
 * `demoScenarios()` returns fresh objects each call, so callers may change a copy (e.g. set the
 * noise to zero) without affecting anyone else.
 */
import { ZERO_CELSIUS_K } from '../data/temperature';
import type { DemoScenario } from './demo-types';
import { meltProny, transitionProny } from './spectrum-shapes';

const C_TO_K = ZERO_CELSIUS_K;

/** Log-spaced values from `from` to `to` (either order), rounded to `digits` significant digits. */
function roundedLogGrid(from: number, to: number, perDecade: number, digits = 5): number[] {
  const decades = Math.log10(to / from);
  const n = Math.round(Math.abs(decades) * perDecade) + 1;
  return Array.from({ length: n }, (_, i) =>
    Number((from * 10 ** ((i * decades) / (n - 1))).toPrecision(digits)),
  );
}

function range(fromC: number, toC: number, stepC: number): number[] {
  const out: number[] = [];
  for (let t = fromC; t <= toC + 1e-9; t += stepC) out.push(t);
  return out;
}

/** a) Polyolefin melt, oscillatory shear, one long CSV with measured temperatures. */
function meltLong(): DemoScenario {
  return {
    id: 'melt-long',
    firm: 'Halvoren Polymers',
    product: 'HX-310 film-grade polyolefin',
    description:
      'A polyolefin melt measured in oscillatory shear on a rotational rheometer (parallel ' +
      'plates), frequency sweeps from 100 down to 0.1 rad/s at nine temperatures from 150 to ' +
      '230 °C. The measured temperature wanders up to ±0.3 K around each set point. A torque ' +
      'floor makes the smallest moduli noisy: at the highest temperatures the lowest frequencies ' +
      'are low-torque points whose G′ scatters by 10–30 % (one standard deviation).',
    layout: 'long',
    testKind: 'oscillatory',
    deformation: 'shear',
    referenceK: 190 + C_TO_K,
    prony: meltProny({ plateauModulusPa: 3e5, peakTauS: 0.01, widthDecades: 1.1 }),
    law: { kind: 'arrhenius', activationEnergyJPerMol: 45_000 },
    density: { referenceDensityKgPerM3: 760, volumetricExpansionPerK: 7.0e-4 },
    setPointsC: range(150, 230, 10),
    xValues: roundedLogGrid(100, 0.1, 5),
    xUnit: 'rad/s',
    modulusUnit: 'Pa',
    temperature: { kind: 'wander', amplitudeK: 0.3 },
    relativeNoise: 0.02,
    lowTorque: { floorPa: 120 },
    seed: 310_150,
  };
}

/** b) Elastomer seal compound, tensile DMA, one file per isotherm (European export). */
function sealDma(): DemoScenario {
  return {
    id: 'seal-dma',
    firm: 'Quillmark Seals',
    product: 'QS-72 elastomer seal compound',
    description:
      'An elastomer seal compound measured by dynamic mechanical analysis in tension, frequency ' +
      'sweeps from 0.1 to 100 Hz at eleven temperatures from −40 to 60 °C. The instrument ' +
      'exports one file per temperature with semicolons, decimal commas and CRLF line ends; ' +
      'some files state the temperature in a header line, the others only in the file name.',
    layout: 'per-isotherm',
    testKind: 'oscillatory',
    deformation: 'tension',
    referenceK: -20 + C_TO_K,
    prony: transitionProny({
      glassyModulusPa: 2.5e9,
      rubberyModulusPa: 6e6,
      centreTauS: 1,
      widthDecades: 1.6,
    }),
    law: { kind: 'wlf', c1: 10.5, c2K: 95 },
    density: null,
    setPointsC: range(-40, 60, 10),
    xValues: roundedLogGrid(0.1, 100, 4),
    xUnit: 'Hz',
    modulusUnit: 'MPa',
    temperature: { kind: 'set' },
    relativeNoise: 0.02,
    lowTorque: null,
    seed: 72_040,
  };
}

/** c) Adhesive film, tensile stress relaxation, wide table (one column per temperature). */
function adhesiveRelaxation(): DemoScenario {
  return {
    id: 'adhesive-relaxation',
    firm: 'Tessaline Films',
    product: 'TF-9 laminating adhesive film',
    description:
      'A laminating adhesive film measured in tensile stress relaxation after a small step ' +
      'strain, relaxation modulus E(t) from 1 to 10 000 s at eight temperatures from 20 to ' +
      '90 °C. The table is wide: one shared time column and one E(t) column per temperature, ' +
      'tab-delimited.',
    layout: 'wide',
    testKind: 'relaxation',
    deformation: 'tension',
    referenceK: 50 + C_TO_K,
    prony: transitionProny({
      glassyModulusPa: 2e9,
      rubberyModulusPa: 3e5,
      centreTauS: 3,
      widthDecades: 1.2,
    }),
    law: { kind: 'wlf', c1: 9.6, c2K: 98 },
    density: null,
    setPointsC: range(20, 90, 10),
    xValues: roundedLogGrid(1, 1e4, 5),
    xUnit: 's',
    modulusUnit: 'MPa',
    temperature: { kind: 'set' },
    relativeNoise: 0.02,
    lowTorque: null,
    seed: 9_020,
  };
}

/** d) Vibration-pad compound, multi-frequency DMA during a stepped heating ramp. */
function rampDma(): DemoScenario {
  return {
    id: 'ramp-dma',
    firm: 'Oberwick Damping',
    product: 'ODM-5 vibration pad compound',
    description:
      'A vibration-damping pad compound measured by tensile DMA at 1, 2, 5 and 10 Hz during a ' +
      'stepped heating ramp from 0 to 60 °C in 4 K steps. The temperature creeps upward while ' +
      'the four frequencies are measured, so each step spreads over about half a kelvin: the ' +
      'importer regroups the rows into isotherms. Each isotherm spans only one decade of ' +
      'frequency, so neighbouring steps overlap by less than a decade, and the rows of one step ' +
      'are not quite isothermal: expect shifts recovered from the step means to be less accurate ' +
      'than for the other samples (the truth is given at each step’s mean temperature).',
    layout: 'ramp',
    testKind: 'oscillatory',
    deformation: 'tension',
    referenceK: 20 + C_TO_K,
    prony: transitionProny({
      glassyModulusPa: 2e9,
      rubberyModulusPa: 3e6,
      centreTauS: 0.01,
      widthDecades: 1.3,
    }),
    law: { kind: 'wlf', c1: 9.5, c2K: 110 },
    density: null,
    setPointsC: range(0, 60, 4),
    xValues: [1, 2, 5, 10],
    xUnit: 'Hz',
    modulusUnit: 'MPa',
    temperature: { kind: 'ramp', stepK: 0.15, jitterK: 0.03 },
    relativeNoise: 0.02,
    lowTorque: null,
    seed: 5_000,
  };
}

/** All invented demo scenarios, in the order samples/ lists them. */
export function demoScenarios(): DemoScenario[] {
  return [meltLong(), sealDma(), adhesiveRelaxation(), rampDma()];
}

/** One scenario by its folder name; throws naming the known ids when it does not exist. */
export function demoScenario(id: string): DemoScenario {
  const all = demoScenarios();
  const found = all.find((s) => s.id === id);
  if (!found) {
    throw new RangeError(
      `Unknown demo scenario "${id}"; known: ${all.map((s) => s.id).join(', ')}`,
    );
  }
  return found;
}
