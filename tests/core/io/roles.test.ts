import { describe, it, expect } from 'vitest';
import {
  COLUMN_ROLES,
  ROLE_UNITS,
  isFrequency,
  isQuantity,
  testKindOf,
} from '../../../core/io/roles';
import { QUANTITY_IDS } from '../../../core/data/types';
import { parseUnit } from '../../../core/units';

describe('ROLE_UNITS', () => {
  it('ROLE_UNITS gives every role a default unit of its own dimension', () => {
    for (const role of COLUMN_ROLES) {
      const { dimension, defaultUnit } = ROLE_UNITS[role];
      const r = parseUnit(defaultUnit, dimension);
      expect(r.ok, role).toBe(true);
    }
  });
});

describe('isQuantity(), isFrequency() and testKindOf()', () => {
  it('isQuantity() is true exactly for the measured quantities', () => {
    expect(COLUMN_ROLES.filter(isQuantity).sort()).toEqual([...QUANTITY_IDS].sort());
    expect(
      isFrequency('angularFrequency') && isFrequency('frequency') && !isFrequency('time'),
    ).toBe(true);
  });

  it('testKindOf() sorts quantities into oscillatory, relaxation and creep', () => {
    expect(testKindOf('relaxationModulus')).toBe('relaxation');
    expect(testKindOf('creepCompliance')).toBe('creep');
    expect(testKindOf('tanDelta')).toBe('oscillatory');
  });
});
