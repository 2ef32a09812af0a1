import { describe, it, expect } from 'vitest';
import { optionsToSettings, parseColumnOption } from '../../app/cli/sample-options';

describe('optionsToSettings()', () => {
  it('optionsToSettings() turns command-line values into settings', () => {
    expect(
      optionsToSettings({
        tref: '463.15K',
        shiftBy: 'storage,loss',
        vertical: 'density',
        density: '950',
        expansion: '6e-4',
        models: 'WLF,arrhenius',
        modesPerDecade: '2',
        exclude: ['40', 'T03'],
        mask: ['a.csv:3-5'],
        groupTolerance: '1.5',
        column: ['Freq=frequency:Hz', '3=storageModulus:MPa'],
        modulusUnit: 'MPa',
      }),
    ).toEqual({
      referenceTemperature: '463.15K',
      shiftBy: ['storageModulus', 'lossModulus'],
      verticalShift: 'density',
      densityKgPerM3: 950,
      expansionPerK: 6e-4,
      models: ['wlf', 'arrhenius'],
      pronyModesPerDecade: 2,
      exclude: ['40', 'T03'],
      mask: ['a.csv:3-5'],
      groupingToleranceK: 1.5,
      columns: [
        { column: 'Freq', role: 'frequency', unit: 'Hz' },
        { column: 3, role: 'storageModulus', unit: 'MPa' },
      ],
      modulusUnit: 'MPa',
    });
  });
  it('optionsToSettings() gives only what was given', () => {
    expect(optionsToSettings({})).toEqual({});
    expect(optionsToSettings({ models: 'none' })).toEqual({ models: [] });
    expect(optionsToSettings({ shiftBy: 'auto' })).toEqual({ shiftBy: 'auto' });
  });
  it('optionsToSettings() names the option of a bad value', () => {
    expect(() => optionsToSettings({ density: '-3' })).toThrow(/--density: "-3"/);
    expect(() => optionsToSettings({ shiftBy: 'stiffness' })).toThrow(
      /--shift-by: unknown quantity "stiffness"/,
    );
    expect(() => optionsToSettings({ models: 'spline' })).toThrow(/models/);
    expect(() => optionsToSettings({ tref: 'warm' })).toThrow(
      /--tref: "warm" is not a temperature/,
    );
    expect(() => optionsToSettings({ tg: '-500' })).toThrow(/--tg/);
  });
});

describe('parseColumnOption()', () => {
  it('parseColumnOption() splits COL=ROLE[:UNIT] and keeps = inside the header', () => {
    expect(parseColumnOption('a=b=lossModulus')).toEqual({ column: 'a=b', role: 'lossModulus' });
    expect(() => parseColumnOption('lossModulus')).toThrow(/COLUMN=ROLE/);
  });
});
