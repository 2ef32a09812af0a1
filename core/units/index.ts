export type { UnitConversion, UnitDimension } from './types';
export type { UnitParse } from './parse-unit';
export {
  parseUnit,
  toStoredUnit,
  describeConversion,
  describeDimension,
  normaliseUnitText,
} from './parse-unit';
export { siUnitOf, unitsOf } from './unit-table';
export { parseTemperatureText } from './temperature';
export {
  FREQUENCY_UNIT_CHOICES,
  QUERY_FREQUENCY_UNITS,
  QUERY_TIME_UNITS,
  TIME_UNIT_CHOICES,
  YEAR_S,
  type QueryUnitChoice,
} from './query-units';
export type { TemperatureReading } from './temperature';
export {
  MODULUS_UNITS,
  type ModulusUnit,
  FREQUENCY_UNITS,
  type FrequencyUnit,
  type DisplayUnits,
  SI_DISPLAY,
  modulusFactor,
  outputFrequencyFactor,
  toOutputFrequency,
  toOutputUnit,
  outputUnitLabel,
} from './output-units';
