// Temperature conversion and text live in core/data/temperature.ts; re-exported for the pipeline's callers.
export { toCelsius, toKelvinText, roundKelvin } from '../data/temperature';
