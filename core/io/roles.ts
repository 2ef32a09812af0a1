import type { QuantityId, TestKind } from '../data/types';
import { QUANTITY_IDS } from '../data/types';
import type { UnitDimension } from '../units';
import type { ColumnRole } from './types';

/**
 * Each column role once: what it measures, the unit assumed when a file gives none, and the words
 * used for it in messages ("storage modulus", "tan δ" …).
 */
type RoleRow = [dimension: UnitDimension, defaultUnit: string, words: string];

const ROLE_TABLE: Record<ColumnRole, RoleRow> = {
  temperature: ['temperature', '°C', 'temperature'],
  frequency: ['frequency', 'Hz', 'frequency'],
  angularFrequency: ['frequency', 'rad/s', 'angular frequency'],
  time: ['time', 's', 'time'],
  storageModulus: ['modulus', 'Pa', 'storage modulus'],
  lossModulus: ['modulus', 'Pa', 'loss modulus'],
  complexModulus: ['modulus', 'Pa', 'complex modulus magnitude'],
  relaxationModulus: ['modulus', 'Pa', 'relaxation modulus'],
  complexViscosity: ['viscosity', 'Pa·s', 'complex viscosity magnitude'],
  creepCompliance: ['compliance', '1/Pa', 'creep compliance'],
  phaseAngle: ['angle', '°', 'phase angle'],
  tanDelta: ['dimensionless', '', 'tan δ'],
  ignore: ['dimensionless', '', 'ignored'],
};

/** One column of ROLE_TABLE, keyed by role (in the table's order). */
const byRole = <T>(pick: (row: RoleRow) => T): Record<ColumnRole, T> =>
  Object.fromEntries(Object.entries(ROLE_TABLE).map(([role, row]) => [role, pick(row)])) as Record<
    ColumnRole,
    T
  >;

/** What each column role measures, and the unit assumed when a file gives none. */
export const ROLE_UNITS: Record<ColumnRole, { dimension: UnitDimension; defaultUnit: string }> =
  byRole(([dimension, defaultUnit]) => ({ dimension, defaultUnit }));

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
export const ROLE_WORDS: Record<ColumnRole, string> = byRole(([, , words]) => words);
