import { describe, expect, it } from 'vitest';
import {
  measuredPlot,
  plotQuantities,
} from '../../../../app/renderer/src/charts/specs/measured-plot';
import { tinyDataset } from '../../document/tiny-dataset';

describe('measuredPlot()', () => {
  it('measuredPlot() draws G′ and G″ per isotherm, skipping missing values', () => {
    const spec = measuredPlot(tinyDataset(), {});
    expect(plotQuantities(tinyDataset())).toEqual(['storageModulus', 'lossModulus']);
    const gp = spec.series.find((s) => s.id === 'T01:storageModulus')!;
    expect(gp.points.map((p) => p.y)).toEqual([1e3, 1e4]); // the NaN point is not drawn
    expect(gp.style).toBe('disc');
    expect(spec.series.find((s) => s.id === 'T01:lossModulus')!.style).toBe('ring');
    expect(spec.x.kind).toBe('log');
    expect(spec.maskable).toBe(true);
  });

  it('measuredPlot() keeps masked points and excluded isotherms visible but faint', () => {
    const spec = measuredPlot(tinyDataset(), {
      maskedPoints: [{ file: 'tiny.csv', row: 2 }],
      excludedIsothermIds: ['T02'],
    });
    const masked = spec.series.find((s) => s.id === 'T01:storageModulus:masked')!;
    expect(masked.faint).toBe(true);
    expect(masked.points[0].ref).toEqual({ isothermId: 'T01', index: 0, file: 'tiny.csv', row: 2 });
    expect(spec.series.find((s) => s.id === 'T02:storageModulus')!.faint).toBe(true);
    expect(spec.series.find((s) => s.id === 'T01:storageModulus')!.faint).toBeFalsy();
    expect(spec.series.find((s) => s.id === 'T02:storageModulus')!.label).toMatch(/excluded/);
  });
});
