import { describe, expect, it } from 'vitest';
import { resolveShiftOptions } from '../../../core/shift';
import { make, MELT_ARRHENIUS, RELAX_WLF } from './fixtures';

describe('resolveShiftOptions()', () => {
  const { dataset } = make(MELT_ARRHENIUS, 0.02, 1);

  it('resolveShiftOptions() applies the documented defaults (docs/shifting.md, types.ts @default)', () => {
    const s = resolveShiftOptions(dataset, { referenceK: 463.15 });
    expect(s).toEqual({
      referenceK: 463.15,
      drivers: ['storageModulus', 'lossModulus'],
      vertical: 'auto',
      density: null,
      excluded: [],
      locked: [],
      initialLog10aT: null,
      heldExpansion: null,
      robustLoss: 'huber',
      robustScaleDecades: null,
      outlierThreshold: 4,
      flagOutliers: true,
      minOverlapPoints: 4,
      maxPointsPerDecade: 40,
      reverseAllowanceDecades: 0.5,
      scanStepDecades: 0.05,
      maxIterations: 60,
      toleranceDecades: 0.001,
      checks: true,
    });
  });

  it('resolveShiftOptions() picks the drivers from the data and the vertical mode', () => {
    // bT from the data is one global constant (vertical.ts), so G′ and G″ still drive the shift.
    expect(resolveShiftOptions(dataset, { referenceK: 463.15, vertical: 'data' }).drivers).toEqual([
      'storageModulus',
      'lossModulus',
    ]);
    expect(
      resolveShiftOptions(make(RELAX_WLF, 0.02, 1).dataset, { referenceK: 300 }).drivers,
    ).toEqual(['relaxationModulus']);
    const onlyTan = {
      ...dataset,
      isotherms: dataset.isotherms.map((i) => ({
        ...i,
        quantities: { tanDelta: i.quantities.tanDelta },
      })),
    };
    expect(resolveShiftOptions(onlyTan, { referenceK: 463.15 }).drivers).toEqual(['tanDelta']);
  });

  it('resolveShiftOptions() rejects wrong options naming them', () => {
    expect(() => resolveShiftOptions(dataset, { referenceK: NaN })).toThrow(/referenceK/);
    expect(() => resolveShiftOptions(dataset, { referenceK: 400, drivers: [] })).toThrow(/drivers/);
    expect(() => resolveShiftOptions(dataset, { referenceK: 400, outlierThreshold: 0 })).toThrow(
      /outlierThreshold/,
    );
    expect(() =>
      resolveShiftOptions(dataset, { referenceK: 400, locked: [{ id: 'T01', log10aT: NaN }] }),
    ).toThrow(/locked\[0\]/);
    expect(() =>
      resolveShiftOptions(dataset, {
        referenceK: 400,
        vertical: 'density',
        density: { kind: 'table', points: [] },
      }),
    ).toThrow(/density.points/);
  });
});
