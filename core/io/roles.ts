import type { QuantityId, TestKind } from '../data/types';
import { QUANTITY_IDS } from '../data/types';
import type { UnitDimension } from '../units';
import type { ColumnRole } from './types';

/** What each column role measures, and the unit assumed when a file gives none. */
export const ROLE_UNITS: Record<ColumnRole, { dimension: UnitDimension; defaultUnit: string }> = {
  temperature: { dimension: 'temperature', defaultUnit: '°C' },
  frequency: { dimension: 'frequency', defaultUnit: 'Hz' },
  angularFrequency: { dimension: 'frequency', defaultUnit: 'rad/s' },
  time: { dimension: 'time', defaultUnit: 's' },
  storageModulus: { dimension: 'modulus', defaultUnit: 'Pa' },
  lossModulus: { dimension: 'modulus', defaultUnit: 'Pa' },
  complexModulus: { dimension: 'modulus', defaultUnit: 'Pa' },
  relaxationModulus: { dimension: 'modulus', defaultUnit: 'Pa' },
  complexViscosity: { dimension: 'viscosity', defaultUnit: 'Pa·s' },
  creepCompliance: { dimension: 'compliance', defaultUnit: '1/Pa' },
  phaseAngle: { dimension: 'angle', defaultUnit: '°' },
  tanDelta: { dimension: 'dimensionless', defaultUnit: '' },
  ignore: { dimension: 'dimensionless', defaultUnit: '' },
};

export const COLUMN_ROLES = Object.keys(ROLE_UNITS) as ColumnRole[];

export function isQuantity(role: ColumnRole): role is QuantityId {
  return (QUANTITY_IDS as readonly string[]).includes(role);
}

export function isFrequency(role: ColumnRole): boolean {
  return role === 'frequency' || role === 'angularFrequency';
}

/** The test a quantity belongs to. */
export function testKindOf(q: QuantityId): TestKind {
  return q === 'relaxationModulus'
    ? 'relaxation'
    : q === 'creepCompliance'
      ? 'creep'
      : 'oscillatory';
}

/** Words for messages: "storage modulus", "tan δ" … */
export const ROLE_WORDS: Record<ColumnRole, string> = {
  temperature: 'temperature',
  frequency: 'frequency',
  angularFrequency: 'angular frequency',
  time: 'time',
  storageModulus: 'storage modulus',
  lossModulus: 'loss modulus',
  complexModulus: 'complex modulus magnitude',
  relaxationModulus: 'relaxation modulus',
  complexViscosity: 'complex viscosity magnitude',
  creepCompliance: 'creep compliance',
  phaseAngle: 'phase angle',
  tanDelta: 'tan δ',
  ignore: 'ignored',
};
