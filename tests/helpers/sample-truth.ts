/**
 * truth.json of an invented demo sample as the tests read it: written out here from the file
 * format (docs/samples.md), not imported from the generator's types, so the tests that read the
 * committed samples check the files rather than the generator's own description of them.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

export interface SampleTruth {
  scenario: string;
  layout: 'long' | 'per-isotherm' | 'wide' | 'ramp';
  testKind: 'oscillatory' | 'relaxation';
  deformation: string;
  files: string[];
  fileUnits: { temperature: string; x: string; modulus: string };
  referenceTemperatureK: number;
  shiftLaw:
    | { kind: 'wlf'; C1: number; C2K: number }
    | { kind: 'arrhenius'; activationEnergyKJPerMol: number; gasConstantJPerMolK: number };
  verticalShift:
    | { kind: 'none' }
    | { kind: 'density'; referenceDensityKgPerM3: number; volumetricExpansionPerK: number };
  prony: { equilibriumModulusPa: number; modes: { tauS: number; modulusPa: number }[] };
  temperature: { kind: string };
  noise: { relativeStdDev: number; lowTorque: { floorPa: number } | null };
  xValuesInFileUnit: number[];
  isotherms: {
    setPointC: number;
    meanTemperatureC: number;
    spreadK: number;
    points: number;
    files: string[];
    log10aT: number;
    log10bT: number;
    lowTorquePointIndices: number[];
  }[];
}

/** Parses `<sampleFolder>/truth.json`. */
export const readSampleTruth = (sampleFolder: string): SampleTruth =>
  JSON.parse(readFileSync(join(sampleFolder, 'truth.json'), 'utf8')) as SampleTruth;
