import { describe, it, expect } from 'vitest';
import {
  mergeSettings,
  parseMask,
  parseSettings,
  settingsToAnalysisOptions,
  settingsToImportOptions,
  settingTemperatureK,
  SettingsError,
} from '../../../core/pipeline/settings';
import { syntheticIsotherms, smoothProny } from '../../../core/synthetic';
import { expectAbsClose } from '../../helpers/assert-close';

const { dataset } = syntheticIsotherms({
  testKind: 'oscillatory',
  deformation: 'shear',
  referenceK: 373.15,
  temperaturesK: [353.15, 373.15, 393.15],
  components: [
    {
      prony: smoothProny({
        tauMinS: 1e-3,
        tauMaxS: 1e3,
        modesPerDecade: 1,
        glassyModulusPa: 1e8,
        equilibriumModulusPa: 1e5,
      }),
      law: { kind: 'wlf', c1: 9, c2K: 100 },
    },
  ],
  xMin: 1,
  xMax: 10,
  pointsPerDecade: 2,
  relativeNoise: 0,
  seed: 1,
  name: 'lab/run1',
});

describe('parseSettings()', () => {
  it('parseSettings() accepts a full settings file', () => {
    const s = parseSettings(
      {
        referenceTemperature: '463.15K',
        shiftBy: ['storageModulus', 'lossModulus'],
        verticalShift: 'density',
        densityKgPerM3: 950,
        expansionPerK: 6e-4,
        models: ['wlf'],
        pronyModesPerDecade: 2,
        exclude: [80, 'T03'],
        mask: ['run1.csv:3-4'],
        groupingToleranceK: 1.5,
        columns: [{ column: 'Freq', role: 'frequency', unit: 'Hz' }],
        modulusUnit: 'MPa',
      },
      'lab.json',
    );
    expect(s.modulusUnit).toBe('MPa');
  });
  it('parseSettings() names the file and the bad key', () => {
    expect(() => parseSettings({ modulusUnit: 'psi' }, 'lab.json')).toThrow(
      /^lab\.json: modulusUnit/,
    );
    expect(() => parseSettings({ tref: 190 }, 'lab.json')).toThrow(
      /lab\.json: unknown setting tref/,
    );
    expect(() => parseSettings({ columns: [{ column: 2, role: 'strain' }] }, 'x.json')).toThrow(
      /columns\.0\.role/,
    );
    try {
      parseSettings({ pronyModesPerDecade: 5 }, 'x.json');
    } catch (e) {
      expect(e).toBeInstanceOf(SettingsError);
      expect((e as SettingsError).key).toBe('pronyModesPerDecade');
    }
  });
});

describe('settingTemperatureK()', () => {
  it('settingTemperatureK() reads °C numbers and text with units', () => {
    expectAbsClose(
      settingTemperatureK(190, 'k', 's'),
      463.15,
      1e-9,
      'exact conversion (SI: 0 °C = 273.15 K)',
    );
    expectAbsClose(settingTemperatureK('463.15K', 'k', 's'), 463.15, 1e-9, 'kelvin as given');
    expect(settingTemperatureK('-20', 'k', 's')).toBe(253.15); // rounded to 1e-9 K: no float noise
  });
  it('settingTemperatureK() rejects text that is not a temperature', () => {
    expect(() => settingTemperatureK('hot', 'referenceTemperature', 'command line')).toThrow(
      /referenceTemperature: "hot" is not a temperature/,
    );
    expect(() => settingTemperatureK('-300', 'k', 's')).toThrow(SettingsError);
  });
});

describe('mergeSettings()', () => {
  it('mergeSettings() lets later layers win key by key', () => {
    expect(mergeSettings({ models: ['wlf'], modulusUnit: 'MPa' }, { modulusUnit: 'kPa' })).toEqual({
      models: ['wlf'],
      modulusUnit: 'kPa',
    });
  });
});

describe('settingsToAnalysisOptions()', () => {
  it('settingsToAnalysisOptions() matches exclusions by temperature or id and masks by file base name', () => {
    const o = settingsToAnalysisOptions(
      { exclude: ['120', 'T01'], mask: ['run1.csv:3'], referenceTemperature: 100 },
      dataset,
      's',
    );
    expect(o.excludedIsothermIds).toEqual(['T03', 'T01']);
    expect(o.maskedPoints).toEqual([{ file: 'lab/run1.csv', row: 3 }]);
    expectAbsClose(o.referenceTemperatureK!, 373.15, 1e-9, 'exact conversion');
  });
  it('settingsToAnalysisOptions() says which temperatures exist when an exclusion matches none', () => {
    expect(() => settingsToAnalysisOptions({ exclude: [95] }, dataset, 'cli')).toThrow(
      /no isotherm at 95 °C \(measured: 80 °C, 100 °C, 120 °C\)/,
    );
  });
  it('settingsToAnalysisOptions() asks for density inputs with verticalShift density', () => {
    expect(() =>
      settingsToAnalysisOptions({ verticalShift: 'density', densityKgPerM3: 900 }, dataset, 'cli'),
    ).toThrow(/expansionPerK/);
  });
  it('settingsToImportOptions() passes grouping tolerance and columns only when given', () => {
    expect(settingsToImportOptions({})).toEqual({});
    expect(settingsToImportOptions({ groupingToleranceK: 2 })).toEqual({ groupingToleranceK: 2 });
  });
});

describe('parseMask()', () => {
  it('parseMask() expands row ranges and rejects bad text', () => {
    expect(parseMask('lab/run1.csv:3-5', dataset, 's').map((m) => m.row)).toEqual([3, 4, 5]);
    expect(() => parseMask('run1.csv', dataset, 's')).toThrow(/FILE:ROW/);
    expect(() => parseMask('other.csv:3', dataset, 's')).toThrow(/not one of the input files/);
    expect(() => parseMask('run1.csv:5-3', dataset, 's')).toThrow(/last row before its first/);
  });
});
