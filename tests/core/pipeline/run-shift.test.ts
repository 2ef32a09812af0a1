import { describe, it, expect } from 'vitest';
import { cleanLog, shiftOptionsFor } from '../../../core/pipeline/run-shift';
import { resolveAnalysisOptions } from '../../../core/pipeline/options';

describe('shiftOptionsFor()', () => {
  it('shiftOptionsFor() passes Tref, drivers, density, exclusions and locks to the shift engine', () => {
    const s = resolveAnalysisOptions(
      {
        referenceTemperatureK: 400,
        shiftQuantities: ['tanDelta'],
        verticalShift: 'density',
        density: { referenceDensityKgPerM3: 900, volumetricExpansionPerK: 7e-4 },
        excludedIsothermIds: ['T02'],
        lockedLog10aT: { T03: -1.5 },
      },
      [390, 400],
    );
    expect(shiftOptionsFor(s)).toEqual({
      referenceK: 400,
      drivers: ['tanDelta'],
      vertical: 'density',
      density: { kind: 'expansion', referenceDensityKgPerM3: 900, volumetricExpansionPerK: 7e-4 },
      excluded: ['T02'],
      locked: [{ id: 'T03', log10aT: -1.5 }],
    });
  });
  it('shiftOptionsFor() leaves the drivers to the engine when they are auto', () => {
    const o = shiftOptionsFor(resolveAnalysisOptions({}, [300]));
    expect(o.drivers).toBeUndefined();
    expect(o.density).toBeUndefined();
    expect(o.vertical).toBe('auto');
  });
});

describe('cleanLog()', () => {
  it('cleanLog() turns rounding noise and −0 into 0 and keeps real shifts', () => {
    expect(Object.is(cleanLog(-0), 0)).toBe(true);
    expect(cleanLog(-2e-19)).toBe(0);
    expect(cleanLog(-1.5e-6)).toBe(-1.5e-6);
    expect(cleanLog(null)).toBeNull();
  });
});
