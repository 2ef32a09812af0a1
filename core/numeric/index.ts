/** Numeric kernels shared by the fits and the shift engine (no domain rules). */
export { studentTCdf, studentTQuantile } from './student-t';
export { normalCdf } from './normal';
