/** core/shift: the shift engine — global robust overlap fit of aT and bT with checks. */
export * from './types';
export { shiftIsotherms, SHIFT_CONVENTION, COVARIANCE_MAX_ISOTHERMS } from './shift-isotherms';
export { resolveShiftOptions, ShiftOptionsError } from './options';
export { defaultDrivers } from './drivers';
export { prepareOverlap, overlapMismatch, NO_OVERLAP_PENALTY } from './overlap';
export type { PreparedOverlap } from './overlap';
