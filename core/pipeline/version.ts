/** Thermoshift version written into every analysis, summary and report (kept equal to package.json by a test). */
export const THERMOSHIFT_VERSION = '0.1.0';
